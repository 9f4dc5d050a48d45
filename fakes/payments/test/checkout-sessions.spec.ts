import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { depositParams, sdkFor, startHarness, thrown, type Harness } from './support';

let h: Harness;
beforeEach(async () => {
  h = await startHarness();
});
afterEach(async () => {
  await h.stop();
});

describe('Checkout Sessions through the official SDK', () => {
  it('creates a payment session with the fields the app reads', async () => {
    const before = Math.floor(Date.now() / 1000);
    const session = await h.stripe.checkout.sessions.create(depositParams());

    // Source: the provider's API reference, "The Checkout Session object" (id prefix, object, fields)
    expect(session.id).toMatch(/^cs_test_[A-Za-z0-9]+$/);
    expect(session.object).toBe('checkout.session');
    expect(session).toMatchObject({
      amount_total: 15000,
      currency: 'aud',
      status: 'open',
      payment_status: 'unpaid',
      payment_intent: null,
      mode: 'payment',
      livemode: false,
      metadata: { booking_id: 'bk_demo_0042', kind: 'deposit' },
      client_reference_id: 'bk_demo_0042',
      customer_email: 'customer@liftwright.example',
      cancel_url: 'http://app.liftwright.example/bookings/deposit-cancelled',
      success_url: 'http://app.liftwright.example/bookings/paid?session={CHECKOUT_SESSION_ID}',
    });
    expect(session.url).toBe(`${h.fake.url}/pay/${session.id}`);
    expect(session.created).toBeGreaterThanOrEqual(before);
    // Source: the provider's "Manage limited inventory" guide: without expires_at a session expires 24 hours after creation
    expect(session.expires_at - session.created).toBe(24 * 60 * 60);
  });

  it('adds up several line items and quantities', async () => {
    const session = await h.stripe.checkout.sessions.create(
      depositParams({
        line_items: [
          {
            price_data: {
              currency: 'aud',
              unit_amount: 2500,
              product_data: { name: 'Wheel alignment deposit' },
            },
            quantity: 2,
          },
          {
            price_data: {
              currency: 'aud',
              unit_amount: 999,
              product_data: { name: 'Tyre disposal' },
            },
            quantity: 3,
          },
        ],
      }),
    );
    expect(session.amount_total).toBe(2 * 2500 + 3 * 999);
    const expanded = await h.stripe.checkout.sessions.retrieve(session.id, {
      expand: ['line_items'],
    });
    expect(expanded.line_items?.data.map((item) => [item.description, item.amount_total])).toEqual([
      ['Wheel alignment deposit', 5000],
      ['Tyre disposal', 2997],
    ]);
  });

  it('retrieves the stored session', async () => {
    const created = await h.stripe.checkout.sessions.create(depositParams());
    const retrieved = await h.stripe.checkout.sessions.retrieve(created.id);
    const { lastResponse: _a, ...createdFields } = created;
    const { lastResponse: _b, ...retrievedFields } = retrieved;
    expect(retrievedFields).toEqual(createdFields);
  });

  it('expires an open session and then refuses to expire it again', async () => {
    const session = await h.stripe.checkout.sessions.create(depositParams());
    const expired = await h.stripe.checkout.sessions.expire(session.id);
    expect(expired.status).toBe('expired');
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired');

    const error = await thrown(() => h.stripe.checkout.sessions.expire(session.id));
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error.statusCode).toBe(400);
    expect(error.message).toContain('status is "expired"');
  });

  it('expires a session by itself once its expires_at has passed', async () => {
    const now = Math.floor(Date.now() / 1000);
    const session = await h.stripe.checkout.sessions.create(
      depositParams({ expires_at: now + 31 * 60 }),
    );
    h.advance(32 * 60 * 1000);
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired');
    const [delivery] = await h.receiver.waitFor(1);
    expect(JSON.parse(delivery.body).type).toBe('checkout.session.expired');
  });

  it('answers an unknown session id with 404 resource_missing', async () => {
    const error = await thrown(() => h.stripe.checkout.sessions.retrieve('cs_test_nothing'));
    // Source: the provider's API reference, "Errors": 404 when the requested resource doesn't exist
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error.statusCode).toBe(404);
    expect(error.code).toBe('resource_missing');
    expect(error.message).toBe("No such checkout.session: 'cs_test_nothing'");
  });
});

describe('Checkout Session parameters', () => {
  // Source: the provider's "Manage limited inventory" guide: expires_at must be between 30 minutes and 24 hours after the current time
  it.each([
    ['29 minutes', 29 * 60, false],
    ['31 minutes', 31 * 60, true],
    ['23 hours 59 minutes', 24 * 60 * 60 - 60, true],
    ['24 hours 1 minute', 24 * 60 * 60 + 60, false],
  ])('expires_at %s from now is accepted: %s', async (_label, offset, accepted) => {
    const expiresAt = Math.floor(Date.now() / 1000) + offset;
    const attempt = () =>
      h.stripe.checkout.sessions.create(depositParams({ expires_at: expiresAt }));
    if (accepted) {
      expect((await attempt()).expires_at).toBe(expiresAt);
    } else {
      const error = await thrown(attempt);
      expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      expect(error.statusCode).toBe(400);
      expect(error.param).toBe('expires_at');
    }
  });

  it('names the missing or malformed parameter', async () => {
    const noItems = await thrown(() =>
      h.stripe.checkout.sessions.create({ ...depositParams(), line_items: undefined }),
    );
    expect(noItems.statusCode).toBe(400);
    expect(noItems.param).toBe('line_items');

    const badAmount = await thrown(() =>
      h.stripe.checkout.sessions.create(
        depositParams({
          line_items: [
            {
              price_data: {
                currency: 'aud',
                unit_amount: -5,
                product_data: { name: 'Deposit' },
              },
              quantity: 1,
            },
          ],
        }),
      ),
    );
    expect(badAmount.param).toBe('line_items[0][price_data][unit_amount]');

    const badCurrency = await thrown(() =>
      h.stripe.checkout.sessions.create(
        depositParams({
          line_items: [
            {
              price_data: { currency: 'zzz', unit_amount: 100, product_data: { name: 'Deposit' } },
              quantity: 1,
            },
          ],
        }),
      ),
    );
    expect(badCurrency.param).toBe('line_items[0][price_data][currency]');

    const badUrl = await thrown(() =>
      h.stripe.checkout.sessions.create(depositParams({ success_url: 'not a url' })),
    );
    expect(badUrl.param).toBe('success_url');

    const unknown = await thrown(() =>
      h.stripe.checkout.sessions.create({
        ...depositParams(),
        locale: 'en',
      }),
    );
    expect(unknown.message).toBe('Received unknown parameter: locale');
    expect(Object.keys(h.fake.store.state.sessions)).toHaveLength(0);
  });

  it('accepts the bracket notation sent by hand', async () => {
    const body = new URLSearchParams({
      mode: 'payment',
      'line_items[0][price_data][currency]': 'nzd',
      'line_items[0][price_data][unit_amount]': '4200',
      'line_items[0][price_data][product_data][name]': 'Deposit: suspension check',
      'line_items[0][quantity]': '1',
      'metadata[booking_id]': 'bk_demo_0077',
      'expand[]': 'line_items',
    });
    const response = await fetch(`${h.fake.url}/v1/checkout/sessions`, {
      method: 'POST',
      headers: {
        Authorization: `Bearer ${'sk_test_liftwright_stand_in_key'}`,
        'Content-Type': 'application/x-www-form-urlencoded',
      },
      body,
    });
    expect(response.status).toBe(200);
    const session = (await response.json()) as Stripe.Checkout.Session;
    expect(session.amount_total).toBe(4200);
    expect(session.metadata).toEqual({ booking_id: 'bk_demo_0077' });
    expect(session.line_items?.data[0].description).toBe('Deposit: suspension check');
  });
});

describe('The secret key', () => {
  it('makes the SDK throw StripeAuthenticationError for a wrong key', async () => {
    const wrong = sdkFor(h.fake, 'sk_test_somebody_elses_key');
    const error = await thrown(() => wrong.checkout.sessions.create(depositParams()));
    // Source: the provider's API reference, "Errors": 401 Unauthorized when no valid API key is provided
    expect(error).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect(error.statusCode).toBe(401);
    expect(error.message).toMatch(/^Invalid API Key provided: sk_test_\*+_key$/);
    expect(Object.keys(h.fake.store.state.sessions)).toHaveLength(0);
  });

  it('answers a request without a key with 401', async () => {
    const response = await fetch(`${h.fake.url}/v1/events/evt_x`);
    expect(response.status).toBe(401);
    const body = (await response.json()) as { error: { type: string; message: string } };
    expect(body.error.message).toContain('You did not provide an API key');
  });

  it('also takes the key as an HTTP Basic user name', async () => {
    const response = await fetch(`${h.fake.url}/v1/events/evt_missing`, {
      headers: {
        Authorization: `Basic ${Buffer.from('sk_test_liftwright_stand_in_key:').toString('base64')}`,
      },
    });
    // Source: the provider's API reference, "Authentication": the key as the Basic auth user name, no password
    expect(response.status).toBe(404);
  });
});
