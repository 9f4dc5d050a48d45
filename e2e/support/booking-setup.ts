import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { getJson, postJson } from './session';
import { paymentsUrl } from './env';

/**
 * Set-up shared by the journeys that start from a held booking: a new customer, a saved quote
 * of theirs with workshop time in it (from the live demo catalogue), and a time held for it
 * through the Book step, as a customer does it.
 */

interface PlannerOption {
  product: { id: string; kind: string };
  verdict: 'ok' | 'advisory' | 'needs-certification' | 'does-not-fit';
  suggestedBy: string[];
}

interface OptionsAnswer {
  items: PlannerOption[];
  suggestedAdditions: { role: string; required: boolean }[];
}

interface VehicleModel {
  id: string;
  yearTo: number;
}

export interface SavedQuote {
  id: string;
  reference: string;
  versions: { id: string; number: number; bookable: boolean }[];
}

export interface NewCustomer {
  email: string;
  password: string;
  name: string;
}

const selectable = (option: PlannerOption) => option.verdict !== 'does-not-fit';

/**
 * A package with workshop time in it (a lift kit, wheels and tyres, and the parts the fit
 * report requires with them, as the planner's add-ons step puts in): the first vehicle of the
 * demo catalogue for which all of it fits.
 */
export async function findBookablePackage(page: Page) {
  const models = await getJson<{ items: VehicleModel[] }>(page, '/api/vehicle-models');
  expect(models.status).toBe(200);
  const options = async (vehicleModelId: string, items: unknown[], kind: string) => {
    const answer = await postJson<OptionsAnswer>(page, '/api/planner/options', {
      vehicleModelId,
      constantLoadKg: 0,
      items,
      kind,
    });
    expect(answer.status, `planner options for ${kind}`).toBe(200);
    return answer.body;
  };
  for (const vehicle of models.body.items) {
    const items: { productId: string; quantity: number }[] = [];
    for (const [kind, quantity] of [
      ['suspension-kit', 1],
      ['wheel', 4],
      ['tyre', 4],
    ] as const) {
      const option = (await options(vehicle.id, items, kind)).items.find(selectable);
      if (!option) break;
      items.push({ productId: option.product.id, quantity });
    }
    if (items.length !== 3) continue;
    for (const kind of ['component', 'service']) {
      const answer = await options(vehicle.id, items, kind);
      for (const { role } of answer.suggestedAdditions.filter((s) => s.required)) {
        const extra = answer.items.find(
          (option) =>
            selectable(option) &&
            option.suggestedBy.includes(role) &&
            !items.some((item) => item.productId === option.product.id),
        );
        if (extra) items.push({ productId: extra.product.id, quantity: 1 });
      }
    }
    return { vehicle, items };
  }
  throw new Error('The demo catalogue has no vehicle with a fitting kit, wheels and tyres');
}

/**
 * Registers a new customer through the API (the page is then signed in as them) and saves a
 * bookable quote for them. `who` starts the e-mail address, e.g. "payer".
 */
export async function newCustomerWithSavedQuote(
  page: Page,
  who: string,
  name: string,
): Promise<{ customer: NewCustomer; quote: SavedQuote }> {
  await page.goto('/');
  const customer = {
    email: `${who}.${Date.now()}@example.test`,
    password: 'a-long-enough-passphrase',
    name,
  };
  const registered = await postJson(page, '/api/auth/register', customer);
  expect(registered.status, JSON.stringify(registered.body)).toBe(201);
  const { vehicle, items } = await findBookablePackage(page);
  const saved = await postJson<SavedQuote>(page, '/api/quotes', {
    vehicleModelId: vehicle.id,
    vehicleYear: vehicle.yearTo,
    uses: ['daily'],
    constantLoadKg: 0,
    items,
  });
  expect(saved.status, JSON.stringify(saved.body)).toBe(201);
  const version = [...saved.body.versions].sort((a, b) => b.number - a.number)[0];
  expect(version.bookable).toBe(true);
  return { customer, quote: saved.body };
}

/**
 * From the quote's page: "Book a time", the first start offered on the day the Book step opens
 * on, "Hold this time". Returns the held booking's id once its page is open.
 */
export async function holdFirstFreeTime(page: Page, quoteId: string): Promise<string> {
  await page.goto(`/account/quotes/${quoteId}`);
  await page.getByRole('link', { name: 'Book a time' }).first().click();
  await page.waitForURL(`**/plan/book/${quoteId}`);
  const times = page.getByRole('group', { name: /^Start times on / });
  await expect.poll(() => times.getByRole('button').count()).toBeGreaterThan(0);
  await times.getByRole('button').first().click();
  const covers = page.getByRole('region', { name: 'What this time covers' });
  await expect.poll(() => covers.isVisible()).toBe(true);
  await covers.getByRole('button', { name: 'Hold this time' }).click();
  await page.waitForURL(/\/account\/bookings\/[0-9a-f-]{36}$/);
  return new URL(page.url()).pathname.split('/').pop() as string;
}

/**
 * Pays the held booking's deposit the way a customer would, through the payments stand-in (its
 * test card that pays), and waits until the provider's notification has made it `requested`.
 */
export async function payDepositThroughStandIn(page: Page, bookingId: string): Promise<void> {
  const checkout = await postJson<{ checkoutUrl: string }>(
    page,
    `/api/bookings/${bookingId}/deposit-checkout`,
    {},
  );
  expect(checkout.status, JSON.stringify(checkout.body)).toBe(201);
  const sessionId = new URL(checkout.body.checkoutUrl).pathname.split('/').pop() ?? '';
  expect(sessionId).toMatch(/^cs_test_/);
  expect(paymentsUrl, 'E2E_PAYMENTS_URL names the payments stand-in').not.toBe('');
  const paid = await fetch(`${paymentsUrl}/__fake/pay/${sessionId}`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    // The stand-in's test card that pays (fakes/payments/README.md).
    body: JSON.stringify({ card: '4242424242424242' }),
  });
  expect(paid.status, await paid.clone().text()).toBe(200);
  await expect
    .poll(
      async () => {
        const booking = await getJson<{ state: string }>(page, `/api/bookings/${bookingId}`);
        return booking.body.state;
      },
      { timeout: 30_000, interval: 500 },
    )
    .toBe('requested');
}
