import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { holdFirstFreeTime, newCustomerWithSavedQuote } from '../support/booking-setup';
import { newPage } from '../support/browser';
import { demoUsers } from '../support/env';
import { waitForMessage } from '../support/inbox';
import { journey } from '../support/journey';
import { getJson, postJson, signIn } from '../support/session';

const JOURNEY = 'revise-quote';

interface QuoteLine {
  productId: string | null;
  name: string;
  kind: string;
  quantity: number;
}

interface QuoteVersion {
  id: string;
  number: number;
  state: string;
  revisionReason: string | null;
  lines: QuoteLine[];
  price: { totalCents: number; depositCents: number };
}

interface Quote {
  id: string;
  reference: string;
  vehicle: { vehicleModelId: string };
  versions: QuoteVersion[];
}

interface Booking {
  id: string;
  quote: { id: string; versionNumber: number };
  needsMove: { reason: string } | null;
}

const { browser: currentBrowser, record } = journey(JOURNEY);

async function readQuote(page: Page, quoteId: string): Promise<Quote> {
  const answer = await getJson<Quote>(page, `/api/quotes/${quoteId}`);
  expect(answer.status).toBe(200);
  return answer.body;
}

function versionOf(quote: Quote, number: number): QuoteVersion {
  const version = quote.versions.find((candidate) => candidate.number === number);
  if (!version) throw new Error(`Quote ${quote.reference} has no version ${number}`);
  return version;
}

/** "$4,321.50" or "$4,321.50 AUD" → 432150: the digits of an amount shown with cents. */
function centsOf(text: string): number {
  const match = /\$([\d,]+\.\d{2})/.exec(text);
  if (!match) throw new Error(`No amount in "${text}"`);
  return Number(match[1].replace(/[,.]/g, ''));
}

describe('The desk revises a booked quote; the customer compares and accepts it on a phone', () => {
  it('sends version 2 by e-mail, shows both versions side by side, and takes the answer once', async () => {
    const browser = currentBrowser();
    const reason = 'The tyres are now five, so the spare matches the other four.';

    // A customer with a saved quote and a time held for it.
    const setup = await newPage(browser, 'desktop');
    const { customer, quote: saved } = await newCustomerWithSavedQuote(
      setup.page,
      'reviser',
      'Rowan Tillbrook',
    );
    const bookingId = await holdFirstFreeTime(setup.page, saved.id);
    const original = await readQuote(setup.page, saved.id);
    const v1 = versionOf(original, 1);
    const tyre = v1.lines.find((line) => line.kind === 'tyre');
    expect(tyre, 'the package has a tyre line').toBeDefined();
    expect(tyre?.quantity).toBe(4);
    await setup.context.close();

    // The desk (desktop): the quote, "Revise", the tyres from 4 to 5, a reason, save and send.
    const desk = await newPage(browser, 'desktop');
    await signIn(desk.page, demoUsers.desk);
    await desk.page.goto(`/desk/quotes/${saved.id}`);
    await desk.page.getByRole('link', { name: 'Revise', exact: true }).click();
    await desk.page.waitForURL(`**/desk/quotes/${saved.id}/revise/review`);
    await expect
      .poll(() => desk.page.getByRole('heading', { name: 'Version 1 → version 2' }).isVisible())
      .toBe(true);
    const lines = desk.page.getByRole('list', { name: 'Lines of the revision' });
    const tyreLine = lines.getByRole('listitem', { name: tyre?.name });
    await tyreLine.getByLabel('Quantity').fill('5');
    await desk.page.getByLabel('Why the quote is revised').fill(reason);
    // The preview prices five tyres before the desk sends it: the total moves on.
    const summary = desk.page.getByRole('region', { name: 'Version 1 → version 2' });
    await expect
      .poll(() => summary.textContent(), { timeout: 10_000 })
      .toMatch(/Total\$[\d,]+\.\d{2} → \$[\d,]+\.\d{2}/);
    await record(desk.page, 'desk-revision');
    await desk.page.getByRole('button', { name: 'Save and send version 2' }).click();
    await desk.page.waitForURL((url) => url.pathname === `/desk/quotes/${saved.id}`);
    await expect
      .poll(() => desk.page.getByText('Version 2 is saved and e-mailed').isVisible())
      .toBe(true);

    const revised = await readQuote(desk.page, saved.id);
    const v2 = versionOf(revised, 2);
    expect(versionOf(revised, 1).state).toBe('superseded');
    expect(v2.state).toBe('sent');
    expect(v2.revisionReason).toBe(reason);
    expect(v2.lines.find((line) => line.productId === tyre?.productId)?.quantity).toBe(5);
    expect(v2.price.totalCents).toBeGreaterThan(v1.price.totalCents);
    await desk.context.close();

    // The e-mail: its total and its link to the comparison.
    const message = await waitForMessage(customer.email, /^Revised quote /);
    const text = message.text ?? '';
    const totalLine = /New total:?\s*(.+)/.exec(text)?.[1] ?? '';
    const mailedTotalCents = centsOf(totalLine);
    expect(mailedTotalCents).toBe(v2.price.totalCents);
    const link = /https?:\/\/\S+\/account\/quotes\/Q-\d{6}\/versions\/2\/compare/.exec(text);
    expect(link, 'the e-mail links to the comparison').not.toBeNull();
    // The link names the quote by its reference; the page finds it and shows it by its id.
    const mailedPath = new URL(link?.[0] ?? '').pathname;
    expect(mailedPath).toBe(`/account/quotes/${saved.reference}/versions/2/compare`);
    const comparePath = `/account/quotes/${saved.id}/versions/2/compare`;

    // The customer on a phone follows the link, signs in and lands on the comparison.
    const phone = await newPage(browser, 'phone');
    await phone.page.goto(mailedPath);
    await phone.page.waitForURL((url) => url.pathname === '/sign-in');
    await phone.page.getByLabel('E-mail').fill(customer.email);
    await phone.page.getByLabel('Password').fill(customer.password);
    await phone.page.getByRole('button', { name: 'Sign in' }).click();
    await phone.page.waitForURL((url) => url.pathname === comparePath);
    const changes = phone.page.getByRole('region', {
      name: 'What changed from version 1 to version 2',
    });
    await expect.poll(() => changes.isVisible()).toBe(true);
    await expect.poll(() => changes.getByText('Changed', { exact: true }).count()).toBe(1);
    expect(await changes.getByText(/quantity 4 → 5/i).count()).toBe(1);
    expect(await phone.page.getByText(reason).first().isVisible()).toBe(true);
    // Both versions in full, and the cautions before the answer.
    const full = phone.page.getByRole('region', { name: 'Both versions in full' });
    expect(await full.getByRole('heading', { name: /^Version 1/ }).count()).toBe(1);
    expect(await full.getByRole('heading', { name: /^Version 2/ }).count()).toBe(1);
    const answer = phone.page.getByRole('region', { name: 'Your answer to version 2' });
    expect(await answer.getByText('Before you drive', { exact: true }).isVisible()).toBe(true);
    // The total shown for the new version is the e-mail's.
    const shownTotal = await answer.getByTestId('compare-total').textContent();
    expect(centsOf(shownTotal ?? '')).toBe(mailedTotalCents);
    await record(phone.page, 'compare');

    await answer.getByRole('button', { name: 'Accept version 2' }).click();
    await expect
      .poll(() => answer.getByText('Thank you: version accepted').isVisible(), { timeout: 10_000 })
      .toBe(true);
    // What became of the booking is said once the bookings are read again.
    await expect
      .poll(
        () =>
          answer
            .getByText(/stays at its time|re-planned for the new work|will contact you to move/)
            .count(),
        { timeout: 10_000 },
      )
      .toBe(1);
    await record(phone.page, 'compare-accepted');

    const accepted = await readQuote(phone.page, saved.id);
    expect(versionOf(accepted, 2).state).toBe('accepted');
    // The replaced version cannot be accepted any more.
    const old = await postJson(phone.page, `/api/quotes/${saved.id}/versions/1/accept`, {});
    expect(old.status).toBe(409);
    const booking = await getJson<Booking>(phone.page, `/api/bookings/${bookingId}`);
    expect(booking.status).toBe(200);
    expect(booking.body.quote.versionNumber).toBe(2);
    await phone.context.close();

    // The same comparison on a desktop screen: side by side.
    const wide = await newPage(browser, 'desktop');
    await signIn(wide.page, customer);
    await wide.page.goto(comparePath);
    await expect
      .poll(() =>
        wide.page
          .getByRole('region', { name: 'What changed from version 1 to version 2' })
          .isVisible(),
      )
      .toBe(true);
    await record(wide.page, 'compare');
    await wide.context.close();
  });

  it('says a replaced version was replaced, and asks before declining the newest', async () => {
    const browser = currentBrowser();
    const { page, context } = await newPage(browser, 'phone');
    const { quote } = await newCustomerWithSavedQuote(page, 'decliner', 'Ada Quillon');
    const saved = await readQuote(page, quote.id);
    const v1 = versionOf(saved, 1);
    const items = v1.lines.map((line) => ({ productId: line.productId, quantity: line.quantity }));
    const body = {
      vehicleModelId: saved.vehicle.vehicleModelId,
      uses: ['daily'],
      constantLoadKg: 0,
      items,
    };

    // The desk sends two revisions through the API: a discount, then a larger one.
    const desk = await newPage(browser, 'desktop');
    await signIn(desk.page, demoUsers.desk);
    for (const [discountCents, reason] of [
      [2000, 'A goodwill discount for the wait.'],
      [5000, 'A larger discount, as agreed on the phone.'],
    ] as const) {
      const revised = await postJson(desk.page, `/api/quotes/${quote.id}/revisions`, {
        ...body,
        discountCents,
        reason,
      });
      expect(revised.status, JSON.stringify(revised.body)).toBe(201);
    }
    await desk.context.close();

    // Version 2 was replaced by version 3: the page says so instead of offering an answer.
    await page.goto(`/account/quotes/${quote.id}/versions/2/compare`);
    const answer2 = page.getByRole('region', { name: 'Your answer to version 2' });
    await expect
      .poll(() => answer2.getByText('has been replaced by version 3').isVisible())
      .toBe(true);
    expect(await answer2.getByRole('button', { name: 'Accept version 2' }).count()).toBe(0);
    await answer2.getByRole('link', { name: 'Compare version 3' }).click();
    await page.waitForURL(`**/account/quotes/${quote.id}/versions/3/compare`);

    // The workshop discount is a line of its own in version 3's price.
    const full = page.getByRole('region', { name: 'Both versions in full' });
    await expect.poll(() => full.getByRole('cell', { name: 'Workshop discount' }).count()).toBe(2);

    // Declining asks first; "Keep it open" leaves the version open.
    const answer3 = page.getByRole('region', { name: 'Your answer to version 3' });
    await answer3.getByRole('button', { name: 'Decline' }).click();
    const dialog = page.getByRole('dialog', { name: 'Decline version 3?' });
    await expect.poll(() => dialog.isVisible()).toBe(true);
    await dialog.getByRole('button', { name: 'Keep it open' }).click();
    expect(versionOf(await readQuote(page, quote.id), 3).state).toBe('sent');
    await answer3.getByRole('button', { name: 'Decline' }).click();
    await dialog.getByRole('button', { name: 'Decline version 3' }).click();
    await expect
      .poll(() => answer3.getByText('You declined version 3.', { exact: false }).isVisible())
      .toBe(true);
    expect(versionOf(await readQuote(page, quote.id), 3).state).toBe('declined');
    // Answered once: a second answer is refused.
    const again = await postJson(page, `/api/quotes/${quote.id}/versions/3/accept`, {});
    expect(again.status).toBe(409);
    await context.close();
  });
});
