import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  depositParams,
  payByHook,
  startHarness,
  thrown,
  WEBHOOK_SECRET,
  type Harness,
} from './support';

let h: Harness;
beforeEach(async () => {
  h = await startHarness();
});
afterEach(async () => {
  await h.stop();
});

/** A paid deposit of A$150.00; returns its PaymentIntent id. */
async function paidDeposit(): Promise<string> {
  const session = await h.stripe.checkout.sessions.create(depositParams());
  await payByHook(h.fake, session.id, '4242424242424242');
  await h.receiver.waitFor(2);
  h.receiver.received.length = 0;
  return (await h.stripe.checkout.sessions.retrieve(session.id)).payment_intent as string;
}

function refundedEvents(): Stripe.Event[] {
  return h.receiver.received.map((delivery) =>
    // Source: the provider's webhook signature scheme (t=…,v1= HMAC-SHA256 of "t.payload"), as implemented by its official SDK's constructEvent
    h.stripe.webhooks.constructEvent(
      delivery.body,
      delivery.headers['stripe-signature'] as string,
      WEBHOOK_SECRET,
    ),
  );
}

describe('PaymentIntents', () => {
  it('retrieves the paid PaymentIntent with its charge and metadata', async () => {
    const id = await paidDeposit();
    const paymentIntent = await h.stripe.paymentIntents.retrieve(id);
    // Source: the provider's API reference, "The PaymentIntent object"
    expect(paymentIntent).toMatchObject({
      id,
      object: 'payment_intent',
      amount: 15000,
      amount_received: 15000,
      currency: 'aud',
      status: 'succeeded',
      livemode: false,
      // Only payment_intent_data[metadata] reaches the PaymentIntent, as with the provider.
      metadata: { booking_id: 'bk_demo_0042' },
    });
    expect(paymentIntent.id).toMatch(/^pi_/);
    expect(paymentIntent.latest_charge).toMatch(/^ch_/);

    const expanded = await h.stripe.paymentIntents.retrieve(id, { expand: ['latest_charge'] });
    const charge = expanded.latest_charge as Stripe.Charge;
    expect(charge).toMatchObject({ object: 'charge', amount: 15000, paid: true, refunded: false });
    expect(charge.payment_method_details?.card?.last4).toBe('4242');
  });

  it('answers an unknown PaymentIntent with 404', async () => {
    const error = await thrown(() => h.stripe.paymentIntents.retrieve('pi_missing'));
    expect(error.statusCode).toBe(404);
    expect(error.code).toBe('resource_missing');
  });
});

describe('Refunds', () => {
  it('refunds the full amount when no amount is given and sends charge.refunded', async () => {
    const paymentIntent = await paidDeposit();
    const refund = await h.stripe.refunds.create({
      payment_intent: paymentIntent,
      reason: 'requested_by_customer',
      metadata: { booking_id: 'bk_demo_0042' },
    });
    // Source: the provider's API reference, "The Refund object" and "Create a refund" (amount defaults to the whole unrefunded amount)
    expect(refund).toMatchObject({
      object: 'refund',
      amount: 15000,
      status: 'succeeded',
      payment_intent: paymentIntent,
      reason: 'requested_by_customer',
      metadata: { booking_id: 'bk_demo_0042' },
    });
    expect(refund.id).toMatch(/^re_/);
    expect(refund.charge).toMatch(/^ch_/);

    await h.receiver.waitFor(1);
    const [event] = refundedEvents();
    expect(event.type).toBe('charge.refunded');
    const charge = event.data.object as Stripe.Charge;
    expect(charge).toMatchObject({
      id: refund.charge,
      amount: 15000,
      amount_refunded: 15000,
      refunded: true,
      payment_intent: paymentIntent,
      metadata: { booking_id: 'bk_demo_0042' },
    });
    expect(charge.refunds?.data.map((r) => r.id)).toEqual([refund.id]);
  });

  it('refunds in parts, then refuses more than what is left', async () => {
    const paymentIntent = await paidDeposit();
    const first = await h.stripe.refunds.create({ payment_intent: paymentIntent, amount: 5000 });
    expect(first.amount).toBe(5000);

    const over = await thrown(() =>
      h.stripe.refunds.create({ payment_intent: paymentIntent, amount: 10001 }),
    );
    expect(over).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(over.statusCode).toBe(400);
    expect(over.param).toBe('amount');
    expect(over.message).toBe(
      'Refund amount (A$100.01) is greater than unrefunded amount on charge (A$100.00)',
    );

    const rest = await h.stripe.refunds.create({ payment_intent: paymentIntent });
    expect(rest.amount).toBe(10000);

    const more = await thrown(() =>
      h.stripe.refunds.create({ payment_intent: paymentIntent, amount: 1 }),
    );
    expect(more.code).toBe('charge_already_refunded');

    await h.receiver.waitFor(2);
    const charges = refundedEvents().map((event) => event.data.object as Stripe.Charge);
    expect(charges.map((c) => [c.amount_refunded, c.refunded, c.refunds?.data.length])).toEqual([
      [5000, false, 1],
      [15000, true, 2],
    ]);
    expect(Object.keys(h.fake.store.state.refunds)).toHaveLength(2);
  });

  it('replays a refund for the same idempotency key instead of refunding twice', async () => {
    const paymentIntent = await paidDeposit();
    const a = await h.stripe.refunds.create(
      { payment_intent: paymentIntent, amount: 2000 },
      { idempotencyKey: 'refund-bk_demo_0042-1' },
    );
    const b = await h.stripe.refunds.create(
      { payment_intent: paymentIntent, amount: 2000 },
      { idempotencyKey: 'refund-bk_demo_0042-1' },
    );
    expect(b.id).toBe(a.id);
    expect(Object.keys(h.fake.store.state.refunds)).toHaveLength(1);
    expect(h.fake.store.state.charges[a.charge as string].amount_refunded).toBe(2000);
  });

  it('names a bad parameter and changes nothing', async () => {
    const paymentIntent = await paidDeposit();
    const missing = await thrown(() => h.stripe.refunds.create({ payment_intent: 'pi_nope' }));
    expect(missing.statusCode).toBe(404);
    expect(missing.param).toBe('payment_intent');

    const zero = await thrown(() =>
      h.stripe.refunds.create({ payment_intent: paymentIntent, amount: 0 }),
    );
    expect(zero.param).toBe('amount');

    const reason = await thrown(() =>
      h.stripe.refunds.create({
        payment_intent: paymentIntent,
        reason: 'changed_mind' as Stripe.RefundCreateParams.Reason,
      }),
    );
    expect(reason.param).toBe('reason');
    expect(Object.keys(h.fake.store.state.refunds)).toHaveLength(0);
  });
});
