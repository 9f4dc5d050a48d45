import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { holdFirstFreeTime, newCustomerWithSavedQuote } from '../support/booking-setup';
import { newPage, screenshot } from '../support/browser';
import { journey } from '../support/journey';
import { baseUrl, paymentsUrl } from '../support/env';
import { waitForMessage } from '../support/inbox';
import { getJson } from '../support/session';
import { amountDigits, dollars, futureExpiry } from '../support/amounts';

const JOURNEY = 'pay-deposit';

/** The stand-in's test cards (fakes/payments/README.md): one pays, one is declined. */
const CARD_PAYS = '4242 4242 4242 4242';
const CARD_DECLINED = '4000 0000 0000 0002';

interface Booking {
  id: string;
  reference: string;
  state: string;
  holdExpiresAt: string | null;
  payments: { kind: string; status: string; amountCents: number; paidAt: string | null }[];
  depositDueCents: number;
  depositPaidCents: number;
  refundedCents: number;
  balanceDueCents: number;
  cancellationPolicy: {
    fullRefundHoursBefore: number;
    lateCancelRefundPercent: number;
    refundIfCancelledNowCents: number;
  };
}

const { browser: currentBrowser, record } = journey(JOURNEY);

async function readBooking(page: Page, bookingId: string): Promise<Booking> {
  const answer = await getJson<Booking>(page, `/api/bookings/${bookingId}`);
  expect(answer.status).toBe(200);
  return answer.body;
}

/**
 * "Pay the deposit (<amount>)" on the held booking, then the provider's page on its own origin.
 * Returns that page's origin.
 */
async function openCheckout(page: Page, booking: Booking): Promise<string> {
  const pay = page.getByRole('button', {
    name: `Pay the deposit (${dollars(booking.depositDueCents)})`,
  });
  await expect.poll(() => pay.isVisible()).toBe(true);
  await pay.click();
  await page.waitForURL((url) => url.origin !== new URL(baseUrl).origin, { timeout: 20_000 });
  const origin = new URL(page.url()).origin;
  expect(origin).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
  if (paymentsUrl) expect(origin).toBe(new URL(paymentsUrl).origin);
  // The provider's page asks for the deposit, to the cent.
  await expect
    .poll(() => page.getByRole('heading', { level: 1 }).textContent())
    .toContain(amountDigits(booking.depositDueCents));
  return origin;
}

async function fillCard(page: Page, number: string): Promise<void> {
  await page.getByLabel('Card number', { exact: true }).fill(number);
  await page.getByLabel('Expiry date', { exact: true }).fill(futureExpiry());
  await page.getByLabel('Security code', { exact: true }).fill('123');
  await page.getByRole('button', { name: /^Pay / }).click();
}

describe('a customer pays the deposit for a held time', () => {
  it('pays on the provider’s page, comes back to "Payment received", and the booking is Requested (phone)', async () => {
    const { context, page } = await newPage(currentBrowser(), 'phone');
    try {
      // Set-up: a new customer, a saved quote of theirs, a time held through the Book step.
      const { customer, quote } = await newCustomerWithSavedQuote(page, 'payer', 'Sam Payer');
      const bookingId = await holdFirstFreeTime(page, quote.id);
      const held = await readBooking(page, bookingId);
      expect(held.state).toBe('held');
      expect(held.depositDueCents).toBeGreaterThan(0);
      expect(held.depositPaidCents).toBe(0);

      // 1. The held booking: the deposit to pay, the Payments section, the provider's note.
      const payments = page.getByRole('region', { name: 'Payments' });
      await expect.poll(() => payments.textContent()).toContain('Deposit due');
      expect(await payments.textContent()).toContain(dollars(held.depositDueCents));
      expect(await payments.textContent()).toContain(dollars(held.balanceDueCents));
      await expect.poll(() => page.getByText(/payment provider’s own page/).isVisible()).toBe(true);

      // 2. Releasing it states the cancellation rule first; nothing is paid, so nothing back.
      await page.getByRole('button', { name: 'Release this time' }).click();
      const release = page.getByRole('dialog', { name: 'Release this time?' });
      await expect.poll(() => release.isVisible()).toBe(true);
      const releaseText = (await release.textContent()) ?? '';
      const { fullRefundHoursBefore, lateCancelRefundPercent } = held.cancellationPolicy;
      if (lateCancelRefundPercent < 100 && fullRefundHoursBefore > 0) {
        expect(releaseText).toContain(`${fullRefundHoursBefore} hour`);
      }
      expect(releaseText).toContain('Nothing has been paid, so there is nothing to refund.');
      await release.getByRole('button', { name: 'Keep the time' }).click();
      await expect.poll(() => release.isVisible()).toBe(false);
      await record(page, 'held-booking');

      // 3. Pay the deposit: the provider's page, on its own origin, for the deposit's amount.
      await openCheckout(page, held);
      await screenshot(page, JOURNEY, 'checkout');
      await fillCard(page, CARD_PAYS);

      // 4. Back on our success page, which reads the booking until the payment is recorded.
      await page.waitForURL(new RegExp(`/account/bookings/${bookingId}/paid(\\?|$)`), {
        timeout: 20_000,
      });
      await expect
        .poll(() => page.getByRole('heading', { level: 1, name: 'Payment received' }).isVisible(), {
          timeout: 35_000,
          interval: 500,
        })
        .toBe(true);
      const paid = await readBooking(page, bookingId);
      expect(paid.state).toBe('requested');
      expect(paid.holdExpiresAt).toBeNull();
      expect(paid.depositPaidCents).toBe(held.depositDueCents);
      const paidPayments = paid.payments.filter((payment) => payment.status === 'paid');
      expect(paidPayments).toHaveLength(1);
      expect(paidPayments[0].amountCents).toBe(held.depositDueCents);
      await expect
        .poll(() => page.getByRole('main').textContent())
        .toContain(dollars(paid.depositPaidCents));
      expect(await page.getByRole('main').textContent()).toContain(
        'the workshop will confirm your time',
      );
      await record(page, 'paid');

      // 5. The booking: Requested, the deposit paid with its date, the balance left.
      await page.getByRole('link', { name: 'See the booking' }).click();
      await page.waitForURL(new RegExp(`/account/bookings/${bookingId}$`));
      const status = page.getByRole('region', { name: 'Status' });
      await expect
        .poll(() => status.getByText('Requested', { exact: true }).isVisible())
        .toBe(true);
      await expect.poll(() => payments.textContent()).toContain('Deposit paid');
      const paymentsText = (await payments.textContent()) ?? '';
      expect(paymentsText).toContain(dollars(paid.depositPaidCents));
      expect(paymentsText).toContain(dollars(paid.balanceDueCents));
      expect(await page.getByRole('button', { name: /^Pay the deposit/ }).count()).toBe(0);
      await record(page, 'booking-requested');

      // 6. Cancelling would refund what the API says it would, and the dialog says so first.
      await page.getByRole('button', { name: 'Cancel booking' }).click();
      const cancel = page.getByRole('dialog', { name: `Cancel booking ${paid.reference}?` });
      await expect.poll(() => cancel.isVisible()).toBe(true);
      const refundNow = paid.cancellationPolicy.refundIfCancelledNowCents;
      expect(await cancel.textContent()).toContain(
        refundNow > 0
          ? `Cancelling now refunds ${dollars(refundNow)}`
          : 'Cancelling now refunds nothing.',
      );
      await record(page, 'cancel-dialog', false);
      await cancel.getByRole('button', { name: 'Keep the booking' }).click();
      await expect.poll(() => cancel.isVisible()).toBe(false);
      expect((await readBooking(page, bookingId)).state).toBe('requested');

      // 7. The receipt in the customer's inbox: the booking's reference and the amount paid.
      const receipt = await waitForMessage(
        customer.email,
        new RegExp(`^Receipt.*${paid.reference}`),
        30_000,
      );
      for (const part of [receipt.text ?? '', receipt.html ?? '']) {
        expect(part).toContain(paid.reference);
        expect(part).toContain(amountDigits(paid.depositPaidCents));
      }
    } finally {
      await context.close();
    }
  }, 240_000);

  it('is declined on the provider’s page and comes back to a booking still held (phone)', async () => {
    const { context, page } = await newPage(currentBrowser(), 'phone');
    try {
      const { quote } = await newCustomerWithSavedQuote(page, 'declined', 'Jo Declined');
      const bookingId = await holdFirstFreeTime(page, quote.id);
      const held = await readBooking(page, bookingId);
      expect(held.state).toBe('held');

      // 1. The declined card: the provider's page says so.
      await openCheckout(page, held);
      await fillCard(page, CARD_DECLINED);
      await expect
        .poll(() => page.getByRole('alert').textContent())
        .toContain('Your card was declined.');
      await screenshot(page, JOURNEY, 'checkout-declined');

      // 2. Leaving the provider's page: "Payment not completed", with Try again and Release.
      await page.getByRole('link', { name: 'Cancel', exact: true }).click();
      await page.waitForURL(new RegExp(`/account/bookings/${bookingId}/deposit-cancelled$`));
      await expect
        .poll(() =>
          page.getByRole('heading', { level: 1, name: 'Payment not completed' }).isVisible(),
        )
        .toBe(true);
      await expect
        .poll(() => page.getByRole('button', { name: 'Try again' }).isVisible())
        .toBe(true);
      expect(await page.getByRole('button', { name: 'Release this time' }).isVisible()).toBe(true);
      await record(page, 'deposit-cancelled');

      // 3. The booking is still held, nothing paid, its payment not complete.
      await page.getByRole('link', { name: 'See the booking' }).click();
      await page.waitForURL(new RegExp(`/account/bookings/${bookingId}$`));
      const status = page.getByRole('region', { name: 'Status' });
      await expect.poll(() => status.getByText('Held', { exact: true }).isVisible()).toBe(true);
      const still = await readBooking(page, bookingId);
      expect(still.state).toBe('held');
      expect(still.depositPaidCents).toBe(0);
      expect(still.payments.some((payment) => payment.status === 'paid')).toBe(false);
      await expect
        .poll(() => page.getByRole('region', { name: 'Payments' }).textContent())
        .toContain('the payment is not complete');
      await expect
        .poll(() =>
          page
            .getByRole('button', { name: `Pay the deposit (${dollars(held.depositDueCents)})` })
            .isVisible(),
        )
        .toBe(true);
      await record(page, 'booking-still-held');
    } finally {
      await context.close();
    }
  }, 180_000);
});
