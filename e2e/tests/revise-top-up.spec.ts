import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { holdFirstFreeTime, payDepositThroughStandIn } from '../support/booking-setup';
import { newPage } from '../support/browser';
import { baseUrl, demoUsers, paymentsUrl } from '../support/env';
import { waitForMessage } from '../support/inbox';
import { journey } from '../support/journey';
import { getJson, postJson, signIn } from '../support/session';
import { amountDigits, dollars, futureExpiry } from '../support/amounts';

const JOURNEY = 'revise-top-up';

/** The stand-in's test card that pays (fakes/payments/README.md). */
const CARD_PAYS = '4242 4242 4242 4242';

interface VehicleModel {
  id: string;
  yearTo: number;
}

interface PlannerOption {
  product: {
    id: string;
    name: string;
    kind: string;
    stockQty: number;
    attributes: { role?: string };
  };
  verdict: 'ok' | 'advisory' | 'needs-certification' | 'does-not-fit';
}

interface QuoteLine {
  productId: string | null;
  kind: string;
  quantity: number;
}

interface QuoteVersion {
  number: number;
  state: string;
  bookable: boolean;
  lines: QuoteLine[];
  price: { totalCents: number; depositCents: number };
}

interface Quote {
  id: string;
  reference: string;
  versions: QuoteVersion[];
}

interface Payment {
  kind: 'deposit' | 'top-up';
  status: string;
  amountCents: number;
  paidAt: string | null;
}

interface Booking {
  id: string;
  reference: string;
  state: string;
  quote: { id: string; versionNumber: number };
  payments: Payment[];
  depositDueCents: number;
  depositPaidCents: number;
  depositTopUpCents: number;
}

interface Policies {
  deposit: { percent: number; floorCents: number; capCents: number };
}

const { browser: currentBrowser, record } = journey(JOURNEY);

async function readBooking(page: Page, bookingId: string): Promise<Booking> {
  const answer = await getJson<Booking>(page, `/api/bookings/${bookingId}`);
  expect(answer.status).toBe(200);
  return answer.body;
}

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

const selectable = (option: PlannerOption) => option.verdict !== 'does-not-fit';

async function options(page: Page, vehicleModelId: string, items: unknown[], kind: string) {
  const answer = await postJson<{ items: PlannerOption[] }>(page, '/api/planner/options', {
    vehicleModelId,
    constantLoadKg: 0,
    items,
    kind,
  });
  expect(answer.status, `planner options for ${kind}`).toBe(200);
  return answer.body.items;
}

/**
 * A cheap package from the live demo catalogue: the wheel alignment on its own (workshop time,
 * so it can be booked), for the first vehicle that also has a tyre in stock, four of them, that
 * fits it with nothing else changed: the tyres the desk adds later.
 */
async function findAlignmentAndTyre(page: Page) {
  const models = await getJson<{ items: VehicleModel[] }>(page, '/api/vehicle-models');
  expect(models.status).toBe(200);
  for (const vehicle of models.body.items) {
    const alignment = (await options(page, vehicle.id, [], 'service')).find(
      (option) => selectable(option) && option.product.attributes.role === 'alignment',
    );
    if (!alignment) continue;
    const items = [{ productId: alignment.product.id, quantity: 1 }];
    const tyre = (await options(page, vehicle.id, items, 'tyre')).find(
      (option) => selectable(option) && option.product.stockQty >= 4,
    );
    if (tyre) return { vehicle, alignment, tyre };
  }
  throw new Error('The demo catalogue has no vehicle with an alignment and a tyre in stock');
}

/**
 * Set-up as a customer does it, through the API: a new customer, a saved quote for the
 * alignment only, a time held for it, and the deposit paid through the stand-in's JSON test
 * hook; the provider's webhook makes the booking requested.
 */
async function newRequestedAlignmentBooking(page: Page) {
  await page.goto('/');
  const customer = {
    email: `topup.${Date.now()}@example.test`,
    password: 'a-long-enough-passphrase',
    name: 'Wren Ashcombe',
  };
  const registered = await postJson(page, '/api/auth/register', customer);
  expect(registered.status, JSON.stringify(registered.body)).toBe(201);
  const { vehicle, alignment, tyre } = await findAlignmentAndTyre(page);
  const saved = await postJson<Quote>(page, '/api/quotes', {
    vehicleModelId: vehicle.id,
    vehicleYear: vehicle.yearTo,
    uses: ['daily'],
    constantLoadKg: 0,
    items: [{ productId: alignment.product.id, quantity: 1 }],
  });
  expect(saved.status, JSON.stringify(saved.body)).toBe(201);
  expect(versionOf(saved.body, 1).bookable).toBe(true);

  const bookingId = await holdFirstFreeTime(page, saved.body.id);
  await payDepositThroughStandIn(page, bookingId);
  return { customer, quote: saved.body, booking: await readBooking(page, bookingId), tyre };
}

describe('a revised quote with a higher deposit: the customer accepts and pays the difference', () => {
  it('keeps the booking, offers the top-up, takes it on the provider’s page and sends a receipt', async () => {
    const browser = currentBrowser();
    const reason = 'Four new tyres, as asked on the phone, fitted with the alignment.';

    // 1. Set-up: an alignment-only quote, booked and its deposit paid (the booking requested).
    const setup = await newPage(browser, 'desktop');
    const {
      customer,
      quote,
      booking: requested,
      tyre,
    } = await newRequestedAlignmentBooking(setup.page);
    const v1 = versionOf(await readQuote(setup.page, quote.id), 1);
    expect(requested.depositPaidCents).toBe(v1.price.depositCents);
    expect(requested.depositTopUpCents).toBe(0);
    await setup.context.close();

    // 2. The desk (desktop): the quote, Revise, four tyres on the wheels step, a reason, send.
    const desk = await newPage(browser, 'desktop');
    await signIn(desk.page, demoUsers.desk);
    const policies = await getJson<Policies>(desk.page, '/api/policies');
    expect(policies.status).toBe(200);
    // The scenario needs room above the deposit paid: version 1's deposit is below the cap.
    expect(v1.price.depositCents).toBeLessThan(policies.body.deposit.capCents);
    await desk.page.goto(`/desk/quotes/${quote.id}`);
    await desk.page.getByRole('link', { name: 'Revise', exact: true }).click();
    await desk.page.waitForURL(`**/desk/quotes/${quote.id}/revise/review`);
    await desk.page
      .getByRole('navigation', { name: 'Planner steps' })
      .getByRole('button', { name: 'Wheels & tyres' })
      .click();
    await desk.page.waitForURL(`**/desk/quotes/${quote.id}/revise/wheels`);
    const tyreChoice = desk.page.getByRole('radio', { name: tyre.product.name, exact: true });
    await expect.poll(() => tyreChoice.isVisible(), { timeout: 10_000 }).toBe(true);
    await tyreChoice.check();
    const four = desk.page.getByRole('radio', { name: /^4\b/ });
    await expect.poll(() => four.isVisible()).toBe(true);
    await four.check();
    await desk.page.getByRole('button', { name: 'Next' }).click();
    await desk.page.waitForURL(`**/desk/quotes/${quote.id}/revise/add-ons`);
    await desk.page.getByRole('button', { name: 'Next' }).click();
    await desk.page.waitForURL(`**/desk/quotes/${quote.id}/revise/review`);
    const lines = desk.page.getByRole('list', { name: 'Lines of the revision' });
    await expect
      .poll(() => lines.getByRole('listitem', { name: tyre.product.name }).count())
      .toBe(1);
    await desk.page.getByLabel('Why the quote is revised').fill(reason);
    // The preview prices the tyres before the desk sends it: the deposit goes up.
    const summary = desk.page.getByRole('region', { name: 'Version 1 → version 2' });
    await expect
      .poll(() => summary.textContent(), { timeout: 10_000 })
      .toMatch(
        new RegExp(`Deposit\\$${amountDigits(v1.price.depositCents)} → \\$[\\d,]+\\.\\d{2}`),
      );
    await record(desk.page, 'desk-revision');
    await desk.page.getByRole('button', { name: 'Save and send version 2' }).click();
    await desk.page.waitForURL((url) => url.pathname === `/desk/quotes/${quote.id}`);
    await expect
      .poll(() => desk.page.getByText('Version 2 is saved and e-mailed').isVisible())
      .toBe(true);
    const revised = await readQuote(desk.page, quote.id);
    const v2 = versionOf(revised, 2);
    expect(v2.state).toBe('sent');
    expect(v2.lines.find((line) => line.productId === tyre.product.id)?.quantity).toBe(4);
    expect(v2.price.depositCents).toBeGreaterThan(v1.price.depositCents);
    const differenceCents = v2.price.depositCents - requested.depositPaidCents;
    expect(differenceCents).toBeGreaterThan(0);
    await desk.context.close();

    // 3. The customer's e-mail: the new deposit beside the old, and the link to compare.
    const message = await waitForMessage(customer.email, /^Revised quote /);
    const text = message.text ?? '';
    expect(/^Deposit:\s*(.+)$/m.exec(text)?.[1]).toBe(
      `${dollars(v2.price.depositCents)} AUD (was ${dollars(v1.price.depositCents)} AUD)`,
    );
    // The link names the quote by its reference (or, from an older build, its id); the page
    // shows the comparison at the quote's id.
    const link = /https?:\/\/\S+\/account\/quotes\/([^/\s]+)\/versions\/2\/compare/.exec(text);
    expect(link, 'the e-mail links to the comparison').not.toBeNull();
    expect([quote.reference, quote.id]).toContain(link?.[1]);
    const mailedPath = new URL(link?.[0] ?? '').pathname;
    const comparePath = `/account/quotes/${quote.id}/versions/2/compare`;

    // 4. On a phone: follow the link, sign in, accept.
    const { context, page } = await newPage(browser, 'phone');
    try {
      await page.goto(mailedPath);
      await page.waitForURL((url) => url.pathname === '/sign-in');
      await page.getByLabel('E-mail').fill(customer.email);
      await page.getByLabel('Password').fill(customer.password);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL((url) => url.pathname === comparePath);
      const answer = page.getByRole('region', { name: 'Your answer to version 2' });
      const accept = answer.getByRole('button', { name: 'Accept version 2' });
      await expect.poll(() => accept.isVisible()).toBe(true);
      await accept.click();
      await expect
        .poll(() => answer.getByText('Thank you: version accepted').isVisible(), {
          timeout: 10_000,
        })
        .toBe(true);
      // What became of the booking, then the difference to pay, to the cent.
      await expect
        .poll(
          () =>
            answer
              .getByText(
                new RegExp(
                  `Booking ${requested.reference} (stays at its time|is re-planned for the new work|has a new time)|will contact you to move booking ${requested.reference}`,
                ),
              )
              .count(),
          { timeout: 10_000 },
        )
        .toBe(1);
      await expect
        .poll(() =>
          answer.getByText(`The deposit went up by ${dollars(differenceCents)}`).isVisible(),
        )
        .toBe(true);
      const payDifference = answer.getByRole('button', { name: 'Pay the difference' });
      expect(await payDifference.isVisible()).toBe(true);
      await record(page, 'compare-accepted-top-up');

      const accepted = await readBooking(page, requested.id);
      expect(accepted.quote.versionNumber).toBe(2);
      expect(accepted.depositTopUpCents).toBe(differenceCents);
      expect(versionOf(await readQuote(page, quote.id), 2).state).toBe('accepted');

      // 5. The provider's page, on its own origin, asks for the difference; pay it.
      await payDifference.click();
      await expect
        .poll(() => new URL(page.url()).origin, {
          timeout: 20_000,
          message: '"Pay the difference" on the comparison opens the provider’s page',
        })
        .not.toBe(new URL(baseUrl).origin);
      if (paymentsUrl) expect(new URL(page.url()).origin).toBe(new URL(paymentsUrl).origin);
      await expect
        .poll(() => page.getByRole('heading', { level: 1 }).textContent())
        .toContain(amountDigits(differenceCents));
      expect(
        await page.getByText(`Deposit top-up for booking ${requested.reference}`).count(),
      ).toBe(1);
      await page.getByLabel('Card number', { exact: true }).fill(CARD_PAYS);
      await page.getByLabel('Expiry date', { exact: true }).fill(futureExpiry());
      await page.getByLabel('Security code', { exact: true }).fill('123');
      await page.getByRole('button', { name: /^Pay / }).click();

      // 6. Back on our page: the top-up received, then the booking with both payments.
      await page.waitForURL(new RegExp(`/account/bookings/${requested.id}/paid(\\?|$)`), {
        timeout: 20_000,
      });
      await expect
        .poll(
          () =>
            page
              .getByText(
                `Deposit top-up of ${dollars(differenceCents)} received for booking ${requested.reference}`,
              )
              .isVisible(),
          { timeout: 35_000, interval: 500 },
        )
        .toBe(true);
      await page.getByRole('link', { name: 'See the booking' }).click();
      await page.waitForURL(new RegExp(`/account/bookings/${requested.id}$`));
      const payments = page.getByRole('region', { name: 'Payments' });
      const each = payments.getByRole('list', { name: 'Each payment' });
      const topUpLine = each.getByRole('listitem').filter({ hasText: 'Deposit top-up' });
      await expect.poll(() => topUpLine.count()).toBe(1);
      expect(await topUpLine.textContent()).toContain(dollars(differenceCents));
      expect(await topUpLine.textContent()).toMatch(/Paid /);
      const paymentsText = (await payments.textContent()) ?? '';
      expect(paymentsText).toContain(`Deposit paid${dollars(v2.price.depositCents)}`);
      expect(paymentsText).not.toContain('Deposit top-up due');
      expect(await page.getByRole('button', { name: /^Pay the difference/ }).count()).toBe(0);
      await record(page, 'booking-after-top-up');

      // 7. The API: a paid top-up of the difference beside the deposit, nothing more due.
      const after = await readBooking(page, requested.id);
      expect(after.state).toBe(requested.state);
      const topUps = after.payments.filter((payment) => payment.kind === 'top-up');
      expect(topUps).toHaveLength(1);
      expect(topUps[0].status).toBe('paid');
      expect(topUps[0].amountCents).toBe(differenceCents);
      expect(
        after.payments.filter((payment) => payment.kind === 'deposit' && payment.status === 'paid'),
      ).toHaveLength(1);
      expect(after.depositTopUpCents).toBe(0);
      expect(after.depositPaidCents).toBe(v2.price.depositCents);

      // 8. The receipt for the top-up, in the customer's inbox.
      const receipt = await waitForMessage(
        customer.email,
        new RegExp(`^Receipt: deposit top-up for booking ${requested.reference}$`),
        30_000,
      );
      for (const part of [receipt.text ?? '', receipt.html ?? '']) {
        expect(part).toContain(requested.reference);
        expect(part).toContain(amountDigits(differenceCents));
      }
    } finally {
      await context.close();
    }
  }, 240_000);
});
