import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { depositParams, SECRET_KEY, sdkFor, startHarness, thrown, type Harness } from './support';

let h: Harness;
beforeEach(async () => {
  h = await startHarness();
});
afterEach(async () => {
  await h.stop();
});

function rawPost(path: string, body: string, key?: string) {
  return fetch(`${h.fake.url}${path}`, {
    method: 'POST',
    headers: {
      Authorization: `Bearer ${SECRET_KEY}`,
      'Content-Type': 'application/x-www-form-urlencoded',
      ...(key ? { 'Idempotency-Key': key } : {}),
    },
    body,
  });
}

// Source: the provider's "Idempotent requests" documentation (saved status and body replayed for
// the same key; parameters compared and a mismatch refused; keys pruned after 24 hours; results
// saved only once the endpoint has begun to execute)
describe('Idempotency-Key', () => {
  it('replays the saved response for the same key and parameters', async () => {
    const first = await h.stripe.checkout.sessions.create(depositParams(), {
      idempotencyKey: 'deposit-bk_demo_0042-1',
    });
    const second = await h.stripe.checkout.sessions.create(depositParams(), {
      idempotencyKey: 'deposit-bk_demo_0042-1',
    });
    expect(second.id).toBe(first.id);
    expect(first.lastResponse.headers['idempotent-replayed']).toBeUndefined();
    expect(second.lastResponse.headers['idempotent-replayed']).toBe('true');
    expect(Object.keys(h.fake.store.state.sessions)).toHaveLength(1);
  });

  it('replays status and body byte for byte, whatever order the parameters come in', async () => {
    const form1 =
      'mode=payment&line_items[0][quantity]=1&line_items[0][price_data][currency]=aud' +
      '&line_items[0][price_data][unit_amount]=5000&line_items[0][price_data][product_data][name]=Deposit';
    const form2 =
      'line_items[0][price_data][product_data][name]=Deposit&line_items[0][price_data][unit_amount]=5000' +
      '&line_items[0][price_data][currency]=aud&line_items[0][quantity]=1&mode=payment';
    const first = await rawPost('/v1/checkout/sessions', form1, 'k-reordered');
    const again = await rawPost('/v1/checkout/sessions', form2, 'k-reordered');
    expect(again.status).toBe(first.status);
    expect(await again.text()).toBe(await first.text());
    expect(again.headers.get('idempotent-replayed')).toBe('true');
  });

  it('refuses the same key with other parameters', async () => {
    await h.stripe.checkout.sessions.create(depositParams(), { idempotencyKey: 'k-mismatch' });
    const error = await thrown(() =>
      h.stripe.checkout.sessions.create(depositParams({ client_reference_id: 'bk_other' }), {
        idempotencyKey: 'k-mismatch',
      }),
    );
    expect(error).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect(error.statusCode).toBe(400);
    expect(error.type).toBe('StripeIdempotencyError');
    expect(Object.keys(h.fake.store.state.sessions)).toHaveLength(1);
  });

  it('refuses the same key on another endpoint', async () => {
    const session = await h.stripe.checkout.sessions.create(depositParams(), {
      idempotencyKey: 'k-endpoint',
    });
    const error = await thrown(() =>
      h.stripe.checkout.sessions.expire(session.id, {}, { idempotencyKey: 'k-endpoint' }),
    );
    expect(error).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('does not save a request refused while its parameters were checked', async () => {
    const bad = await thrown(() =>
      h.stripe.checkout.sessions.create(depositParams({ success_url: 'nope' }), {
        idempotencyKey: 'k-corrected',
      }),
    );
    expect(bad.statusCode).toBe(400);
    const corrected = await h.stripe.checkout.sessions.create(depositParams(), {
      idempotencyKey: 'k-corrected',
    });
    expect(corrected.lastResponse.headers['idempotent-replayed']).toBeUndefined();
    expect(corrected.status).toBe('open');
  });

  it('forgets a key after 24 hours', async () => {
    const first = await h.stripe.checkout.sessions.create(depositParams(), {
      idempotencyKey: 'k-old',
    });
    h.advance(24 * 60 * 60 * 1000 + 1);
    const later = await h.stripe.checkout.sessions.create(
      depositParams({ client_reference_id: 'bk_later' }),
      { idempotencyKey: 'k-old' },
    );
    expect(later.id).not.toBe(first.id);
    expect(later.lastResponse.headers['idempotent-replayed']).toBeUndefined();
  });

  it("makes the SDK's own retry after a lost answer safe", async () => {
    // The SDK adds an Idempotency-Key to every POST and retries on a connection error.
    const retrying = sdkFor(h.fake, SECRET_KEY, 2);
    h.fake.faults.dropNextResponses = 1;
    const session = await retrying.checkout.sessions.create(depositParams());
    expect(h.logs.some((line) => line.startsWith('fault: dropping the answer'))).toBe(true);
    expect(session.lastResponse.headers['idempotent-replayed']).toBe('true');
    expect(Object.keys(h.fake.store.state.sessions)).toEqual([session.id]);
  });
});
