import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { depositParams, payByHook, startHarness, type Harness } from './support';

let h: Harness;
beforeEach(async () => {
  h = await startHarness();
});
afterEach(async () => {
  await h.stop();
});

async function openPage(url: string): Promise<{ status: number; html: string }> {
  const response = await fetch(url);
  return { status: response.status, html: await response.text() };
}

function submit(sessionId: string, fields: Record<string, string>) {
  return fetch(`${h.fake.url}/pay/${sessionId}`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams(fields),
    redirect: 'manual',
  });
}

const GOOD_EXPIRY = { card_expiry: '04 / 31', card_cvc: '737' };

// Source: the provider's testing documentation: 4242 4242 4242 4242 pays, 4000 0000 0000 0002
// is declined with card_declined ("Your card was declined.")
describe('The hosted test checkout page', () => {
  it('shows the amount, the line item and labelled card fields', async () => {
    const session = await h.stripe.checkout.sessions.create(depositParams());
    const { status, html } = await openPage(session.url as string);
    expect(status).toBe(200);
    expect(html).toContain('<html lang="en">');
    expect(html).toContain('name="viewport"');
    expect(html).toContain('Pay A$150.00');
    expect(html).toContain('Deposit: 2-inch lift kit fitting, Bay 2');
    for (const [id, label] of [
      ['card-number', 'Card number'],
      ['card-expiry', 'Expiry date'],
      ['card-cvc', 'Security code'],
    ]) {
      expect(html).toContain(`<label for="${id}">${label}</label>`);
      expect(html).toContain(`<input id="${id}"`);
    }
    expect(html).toContain('autocomplete="cc-number"');
    expect(html).toContain(
      '<a class="cancel" href="http://app.liftwright.example/bookings/deposit-cancelled">Cancel</a>',
    );
  });

  it('escapes what the app put in the line item name', async () => {
    const session = await h.stripe.checkout.sessions.create(
      depositParams({
        line_items: [
          {
            price_data: {
              currency: 'aud',
              unit_amount: 100,
              product_data: { name: '<script>alert(1)</script> & "tyres"' },
            },
            quantity: 1,
          },
        ],
      }),
    );
    const { html } = await openPage(session.url as string);
    expect(html).not.toContain('<script>');
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt; &amp; &quot;tyres&quot;');
  });

  it('pays with 4242 4242 4242 4242 and redirects (303) to success_url with the session id', async () => {
    const session = await h.stripe.checkout.sessions.create(depositParams());
    const response = await submit(session.id, {
      card_number: '4242 4242 4242 4242',
      ...GOOD_EXPIRY,
    });
    expect(response.status).toBe(303);
    expect(response.headers.get('location')).toBe(
      `http://app.liftwright.example/bookings/paid?session=${session.id}`,
    );
    const paid = await h.stripe.checkout.sessions.retrieve(session.id);
    expect(paid.status).toBe('complete');
    expect(paid.payment_status).toBe('paid');
    expect(paid.payment_intent).toMatch(/^pi_/);

    const again = await openPage(session.url as string);
    expect(again.html).toContain('Already paid');
    expect(again.html).not.toContain('<form');
    const twice = await submit(session.id, { card_number: '4242424242424242', ...GOOD_EXPIRY });
    expect(twice.status).toBe(409);
    expect(Object.keys(h.fake.store.state.paymentIntents)).toHaveLength(1);
  });

  it('declines 4000 0000 0000 0002 with the message and leaves the session open', async () => {
    const session = await h.stripe.checkout.sessions.create(depositParams());
    const response = await submit(session.id, {
      card_number: '4000 0000 0000 0002',
      ...GOOD_EXPIRY,
    });
    expect(response.status).toBe(402);
    const html = await response.text();
    expect(html).toContain('role="alert"');
    expect(html).toContain('Your card was declined.');
    expect(html).toContain('<form');
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    expect(h.fake.store.state.eventOrder).toHaveLength(0);
  });

  it('says any other number is invalid, on the field', async () => {
    const session = await h.stripe.checkout.sessions.create(depositParams());
    const response = await submit(session.id, {
      card_number: '4242 4242 4242 4241',
      ...GOOD_EXPIRY,
    });
    expect(response.status).toBe(400);
    const html = await response.text();
    expect(html).toContain(
      '<p class="field-error" id="card-number-error">Your card number is invalid.</p>',
    );
    expect(html).toMatch(
      /id="card-number"[^>]*aria-describedby="card-number-hint card-number-error"[^>]*aria-invalid="true"/,
    );
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('asks for a well-formed expiry date and security code', async () => {
    const session = await h.stripe.checkout.sessions.create(depositParams());
    const response = await submit(session.id, {
      card_number: '4242424242424242',
      card_expiry: '13/30',
      card_cvc: '12',
    });
    expect(response.status).toBe(400);
    const html = await response.text();
    expect(html).toContain('id="card-expiry-error"');
    expect(html).toContain('id="card-cvc-error"');
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('says so on an expired session and takes no payment', async () => {
    const session = await h.stripe.checkout.sessions.create(depositParams());
    await h.stripe.checkout.sessions.expire(session.id);
    const { html } = await openPage(session.url as string);
    expect(html).toContain('Payment page expired');
    const response = await submit(session.id, { card_number: '4242424242424242', ...GOOD_EXPIRY });
    expect(response.status).toBe(409);
    expect(Object.keys(h.fake.store.state.paymentIntents)).toHaveLength(0);
  });

  it('answers an unknown session with 404', async () => {
    const { status, html } = await openPage(`${h.fake.url}/pay/cs_test_unknown`);
    expect(status).toBe(404);
    expect(html).toContain('Payment not found');
  });
});

describe('The fake-only JSON test hook', () => {
  it('pays, declines and refuses invalid numbers like the page', async () => {
    const session = await h.stripe.checkout.sessions.create(depositParams());

    const declined = await payByHook(h.fake, session.id, '4000000000000002');
    expect(declined.status).toBe(402);
    expect(declined.body.error).toMatchObject({
      type: 'card_error',
      code: 'card_declined',
      message: 'Your card was declined.',
    });

    const invalid = await payByHook(h.fake, session.id, '1234');
    expect(invalid.status).toBe(402);
    expect(invalid.body.error).toMatchObject({
      code: 'invalid_number',
      message: 'Your card number is invalid.',
    });

    const paid = await payByHook(h.fake, session.id, '4242424242424242');
    expect(paid.status).toBe(200);
    expect(paid.body.redirect_url).toBe(
      `http://app.liftwright.example/bookings/paid?session=${session.id}`,
    );
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe('paid');

    const again = await payByHook(h.fake, session.id, '4242424242424242');
    expect(again.status).toBe(400);
  });
});
