import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { ConfigError, configFromEnv } from '../src/config';
import { depositParams, startHarness } from './support';

const REQUIRED = {
  PAYMENTS_SECRET_KEY: 'sk_test_abc123',
  PAYMENTS_WEBHOOK_URL: 'http://127.0.0.1:4400/api/payments/webhook',
  PAYMENTS_WEBHOOK_SECRET: 'whsec_abc123',
};

function problemsOf(env: Record<string, string>): string[] {
  try {
    configFromEnv(env);
  } catch (error) {
    if (error instanceof ConfigError) return error.problems;
    throw error;
  }
  return [];
}

describe('Configuration from the environment', () => {
  it('applies the documented defaults', () => {
    expect(configFromEnv(REQUIRED)).toMatchObject({
      host: '127.0.0.1',
      port: 12111,
      publicUrl: undefined,
      stateFile: undefined,
      retryBaseMs: 1000,
      retryMaxMs: 60_000,
      retryLimit: null,
    });
  });

  it('refuses to start without each required value, naming it', () => {
    const problems = problemsOf({});
    expect(problems).toHaveLength(3);
    expect(problems.join('\n')).toContain('PAYMENTS_SECRET_KEY is required');
    expect(problems.join('\n')).toContain('PAYMENTS_WEBHOOK_URL is required');
    expect(problems.join('\n')).toContain('PAYMENTS_WEBHOOK_SECRET is required');
  });

  it('refuses a live key, a secret without whsec_ and a bad port', () => {
    const problems = problemsOf({
      ...REQUIRED,
      PAYMENTS_SECRET_KEY: 'sk_live_abc',
      PAYMENTS_WEBHOOK_SECRET: 'abc',
      PAYMENTS_PORT: '70000',
    });
    expect(problems).toEqual([
      'PAYMENTS_SECRET_KEY must be a test secret key starting with sk_test_.',
      'PAYMENTS_WEBHOOK_SECRET must start with whsec_.',
      'PAYMENTS_PORT must be a whole number from 0 to 65535 (got "70000").',
    ]);
  });

  it('reads the retry settings and the public URL', () => {
    expect(
      configFromEnv({
        ...REQUIRED,
        PAYMENTS_RETRY_BASE_MS: '250',
        PAYMENTS_RETRY_MAX_MS: '4000',
        PAYMENTS_RETRY_LIMIT: '5',
        PAYMENTS_PUBLIC_URL: 'http://pay.liftwright.example/',
      }),
    ).toMatchObject({
      retryBaseMs: 250,
      retryMaxMs: 4000,
      retryLimit: 5,
      publicUrl: 'http://pay.liftwright.example',
    });
  });
});

describe('PAYMENTS_STATE_FILE', () => {
  const dir = mkdtempSync(join(tmpdir(), 'payments-state-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('keeps sessions and saved idempotent responses across a restart', async () => {
    const stateFile = join(dir, 'state.json');
    const first = await startHarness({ stateFile });
    const session = await first.stripe.checkout.sessions.create(depositParams(), {
      idempotencyKey: 'k-restart',
    });
    await first.stop();
    expect(JSON.parse(readFileSync(stateFile, 'utf8')).sessions[session.id]).toBeDefined();

    const second = await startHarness({ stateFile });
    try {
      const retrieved = await second.stripe.checkout.sessions.retrieve(session.id);
      expect(retrieved.status).toBe('open');
      expect(retrieved.amount_total).toBe(15000);
      const replayed = await second.stripe.checkout.sessions.create(depositParams(), {
        idempotencyKey: 'k-restart',
      });
      expect(replayed.id).toBe(session.id);
      expect(replayed.lastResponse.headers['idempotent-replayed']).toBe('true');
    } finally {
      await second.stop();
    }
  });

  it('keeps undelivered events and delivers them after a restart', async () => {
    const stateFile = join(dir, 'pending.json');
    const first = await startHarness({ stateFile, retryBaseMs: 60_000, retryMaxMs: 60_000 });
    first.receiver.fallback = 500;
    const session = await first.stripe.checkout.sessions.create(depositParams());
    await first.stripe.checkout.sessions.expire(session.id);
    await first.receiver.waitFor(1);
    await expect.poll(() => first.logs.join('\n')).toMatch(/attempt 1: HTTP 500; next attempt/);
    await first.stop();

    // The saved retry is due a minute after the failure; the restarted stand-in's clock is past it.
    const second = await startHarness({ stateFile }, { clockOffsetMs: 61_000 });
    try {
      const [delivery] = await second.receiver.waitFor(1);
      expect(JSON.parse(delivery.body).type).toBe('checkout.session.expired');
      await second.fake.webhooks.idle();
      expect(second.fake.store.state.deliveries).toHaveLength(0);
      expect(second.logs).toEqual([
        expect.stringMatching(/\(checkout\.session\.expired\) attempt 2: HTTP 200; delivered$/),
      ]);
    } finally {
      await second.stop();
    }
  });
});
