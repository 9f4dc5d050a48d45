import { createHmac } from 'node:crypto';
import Stripe from 'stripe';
import { afterEach, describe, expect, it } from 'vitest';
import { retryDelayMs } from '../src/webhooks';
import { depositParams, payByHook, startHarness, WEBHOOK_SECRET, type Harness } from './support';

let h: Harness;
afterEach(async () => {
  await h.stop();
});

function verify(stripe: Stripe, delivery: { body: string; headers: Record<string, unknown> }) {
  // Source: the provider's webhook signature scheme (t=…,v1= HMAC-SHA256 of "t.payload"), as implemented by its official SDK's constructEvent
  return stripe.webhooks.constructEvent(
    delivery.body,
    delivery.headers['stripe-signature'] as string,
    WEBHOOK_SECRET,
  );
}

describe('Webhook deliveries', () => {
  it('sends checkout.session.completed and payment_intent.succeeded, signed, in order', async () => {
    h = await startHarness();
    const session = await h.stripe.checkout.sessions.create(depositParams());
    await payByHook(h.fake, session.id, '4242 4242 4242 4242');
    const deliveries = await h.receiver.waitFor(2);

    const events = deliveries.map((delivery) => verify(h.stripe, delivery));
    expect(events.map((event) => event.type)).toEqual([
      'checkout.session.completed',
      'payment_intent.succeeded',
    ]);
    for (const event of events) {
      expect(event.id).toMatch(/^evt_/);
      expect(event.object).toBe('event');
      expect(event.livemode).toBe(false);
      expect(event.api_version).toBe(Stripe.API_VERSION);
      expect(event.request).toEqual({ id: null, idempotency_key: null });
    }
    expect(deliveries[0].headers['content-type']).toContain('application/json');

    const completed = events[0].data.object as Stripe.Checkout.Session;
    expect(completed).toMatchObject({
      id: session.id,
      status: 'complete',
      payment_status: 'paid',
      metadata: { booking_id: 'bk_demo_0042', kind: 'deposit' },
      client_reference_id: 'bk_demo_0042',
      amount_total: 15000,
    });
    const paymentIntent = events[1].data.object as Stripe.PaymentIntent;
    expect(paymentIntent.id).toBe(completed.payment_intent);
    expect(paymentIntent).toMatchObject({ status: 'succeeded', amount_received: 15000 });

    // Stored events are retrievable, and marked delivered once the receiver said 2xx.
    await h.fake.webhooks.idle();
    const stored = await h.stripe.events.retrieve(events[0].id);
    expect(stored.type).toBe('checkout.session.completed');
    expect(stored.pending_webhooks).toBe(0);
    expect((stored.data.object as Stripe.Checkout.Session).id).toBe(session.id);
  });

  it('fails verification with another secret (the check can fail)', async () => {
    h = await startHarness();
    const session = await h.stripe.checkout.sessions.create(depositParams());
    await payByHook(h.fake, session.id, '4242424242424242');
    const [delivery] = await h.receiver.waitFor(1);
    expect(() =>
      h.stripe.webhooks.constructEvent(
        delivery.body,
        delivery.headers['stripe-signature'] as string,
        'whsec_not_the_secret',
      ),
    ).toThrow(Stripe.errors.StripeSignatureVerificationError);
  });

  it('signs "<t>.<payload>" with HMAC-SHA256 of the secret', async () => {
    h = await startHarness();
    const session = await h.stripe.checkout.sessions.create(depositParams());
    await payByHook(h.fake, session.id, '4242424242424242');
    const [delivery] = await h.receiver.waitFor(1);
    const header = delivery.headers['stripe-signature'] as string;
    const match = /^t=(\d+),v1=([0-9a-f]{64})$/.exec(header);
    expect(match).not.toBeNull();
    const [, t, v1] = match as RegExpExecArray;
    // Source: RFC 2104 HMAC with SHA-256 (Node's crypto), over the provider's signed payload "<t>.<body>"
    expect(createHmac('sha256', WEBHOOK_SECRET).update(`${t}.${delivery.body}`).digest('hex')).toBe(
      v1,
    );
    expect(Math.abs(Number(t) - Date.now() / 1000)).toBeLessThan(60);
  });

  it('retries a receiver that answers 500 twice, then delivers with a fresh signature', async () => {
    h = await startHarness({ retryBaseMs: 30, retryMaxMs: 1000 });
    // The receiver fails checkout.session.completed twice. Each request it gets moves the
    // stand-in's clock 5 s on, so every attempt carries its own t.
    let completedSeen = 0;
    h.receiver.onRequest = (body) => {
      h.advance(5000);
      if (JSON.parse(body).type !== 'checkout.session.completed') return 200;
      completedSeen += 1;
      return completedSeen <= 2 ? 500 : 200;
    };
    const session = await h.stripe.checkout.sessions.create(depositParams());
    await payByHook(h.fake, session.id, '4242424242424242');
    await h.fake.webhooks.idle();

    const completedAttempts = h.receiver.received.filter(
      (delivery) => JSON.parse(delivery.body).type === 'checkout.session.completed',
    );
    expect(completedAttempts.map((delivery) => delivery.answered)).toEqual([500, 500, 200]);
    const signatures = completedAttempts.map((delivery) => delivery.headers['stripe-signature']);
    expect(new Set(signatures).size).toBe(3);
    expect(verify(h.stripe, completedAttempts[2]).type).toBe('checkout.session.completed');

    const attemptLines = h.logs.filter((line) => line.includes('(checkout.session.completed)'));
    expect(attemptLines).toEqual([
      expect.stringMatching(/attempt 1: HTTP 500; next attempt in 30 ms$/),
      expect.stringMatching(/attempt 2: HTTP 500; next attempt in 60 ms$/),
      expect.stringMatching(/attempt 3: HTTP 200; delivered$/),
    ]);
  });

  it('does not hold back later events while one is being retried', async () => {
    h = await startHarness({ retryBaseMs: 200, retryMaxMs: 200 });
    h.receiver.onRequest = (body) =>
      JSON.parse(body).type === 'checkout.session.completed' && h.receiver.received.length < 3
        ? 503
        : 200;
    const session = await h.stripe.checkout.sessions.create(depositParams());
    await payByHook(h.fake, session.id, '4242424242424242');
    await h.fake.webhooks.idle();
    const order = h.receiver.received.map((d) => [JSON.parse(d.body).type, d.answered]);
    expect(order[0]).toEqual(['checkout.session.completed', 503]);
    expect(order[1]).toEqual(['payment_intent.succeeded', 200]);
    expect(order[order.length - 1]).toEqual(['checkout.session.completed', 200]);
  });

  it('gives up after PAYMENTS_RETRY_LIMIT retries', async () => {
    h = await startHarness({ retryLimit: 2, retryBaseMs: 5, retryMaxMs: 10 });
    h.receiver.fallback = 500;
    const session = await h.stripe.checkout.sessions.expire(
      (await h.stripe.checkout.sessions.create(depositParams())).id,
    );
    await h.fake.webhooks.idle();
    expect(h.receiver.received).toHaveLength(3);
    expect(h.logs.at(-1)).toMatch(/attempt 3: HTTP 500; giving up after 2 retries$/);
    const [event] = Object.values(h.fake.store.state.events);
    expect(event.pending_webhooks).toBe(1);
    expect((event.data.object as { id: string }).id).toBe(session.id);
  });

  it('records the API request behind an event', async () => {
    h = await startHarness();
    const session = await h.stripe.checkout.sessions.create(depositParams());
    const expired = await h.stripe.checkout.sessions.expire(
      session.id,
      {},
      {
        idempotencyKey: 'expire-bk_demo_0042',
      },
    );
    const [delivery] = await h.receiver.waitFor(1);
    const event = verify(h.stripe, delivery);
    expect(event.type).toBe('checkout.session.expired');
    expect(event.request).toEqual({
      id: expired.lastResponse.requestId,
      idempotency_key: 'expire-bk_demo_0042',
    });
  });
});

describe('Retry delays', () => {
  it('double from the base and stop at the cap', () => {
    expect([1, 2, 3, 4, 5, 6, 7, 8].map((n) => retryDelayMs(n, 1000, 60_000))).toEqual([
      1000, 2000, 4000, 8000, 16_000, 32_000, 60_000, 60_000,
    ]);
  });
});
