/**
 * Test set-up: the stand-in in-process on a free port, a local HTTP receiver for its webhooks,
 * and the official SDK pointed at it through host/port/protocol only.
 */
import { createServer, type IncomingHttpHeaders, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { expect } from 'vitest';
import { createPaymentsFake, type PaymentsFake } from '../src/app';
import type { PaymentsConfig } from '../src/config';

export const SECRET_KEY = 'sk_test_liftwright_stand_in_key';
export const WEBHOOK_SECRET = 'whsec_liftwright_stand_in_secret';

export interface Received {
  headers: IncomingHttpHeaders;
  body: string;
  /** The status the receiver answered with. */
  answered: number;
}

export interface Receiver {
  url: string;
  received: Received[];
  /** Statuses to answer with, one per request, before falling back to `fallback`. */
  script: number[];
  fallback: number;
  /** Called for each request before answering (tests use it to move the clock). */
  onRequest?: (body: string) => number | void;
  waitFor(count: number, timeoutMs?: number): Promise<Received[]>;
  close(): Promise<void>;
}

export async function startReceiver(): Promise<Receiver> {
  const receiver: Receiver = {
    url: '',
    received: [],
    script: [],
    fallback: 200,
    async waitFor(count, timeoutMs = 5000) {
      await expect
        .poll(() => receiver.received.length, { timeout: timeoutMs, interval: 10 })
        .toBeGreaterThanOrEqual(count);
      return receiver.received;
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
  const server: Server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('end', () => {
      const body = Buffer.concat(chunks).toString('utf8');
      const chosen = receiver.onRequest?.(body);
      const status =
        typeof chosen === 'number' ? chosen : (receiver.script.shift() ?? receiver.fallback);
      receiver.received.push({ headers: req.headers, body, answered: status });
      res.writeHead(status, { 'Content-Type': 'text/plain' });
      res.end(status < 300 ? 'ok' : 'not now');
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  receiver.url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/webhooks/payments`;
  return receiver;
}

export interface Harness {
  fake: PaymentsFake;
  receiver: Receiver;
  stripe: Stripe;
  logs: string[];
  /** Moves the stand-in's clock (milliseconds). */
  advance(ms: number): void;
  stop(): Promise<void>;
}

export async function startHarness(
  overrides: Partial<PaymentsConfig> = {},
  { clockOffsetMs = 0 } = {},
): Promise<Harness> {
  const receiver = await startReceiver();
  let offsetMs = clockOffsetMs;
  const logs: string[] = [];
  const fake = createPaymentsFake(
    {
      host: '127.0.0.1',
      port: 0,
      secretKey: SECRET_KEY,
      webhookUrl: receiver.url,
      webhookSecret: WEBHOOK_SECRET,
      retryBaseMs: 20,
      retryMaxMs: 200,
      retryLimit: null,
      webhookTimeoutMs: 2000,
      ...overrides,
    },
    { now: () => Date.now() + offsetMs, log: (line) => logs.push(line) },
  );
  await fake.listen();
  return {
    fake,
    receiver,
    stripe: sdkFor(fake),
    logs,
    advance(ms) {
      offsetMs += ms;
    },
    async stop() {
      await fake.close();
      await receiver.close();
    },
  };
}

/** The official SDK, reaching the stand-in only through its host/port/protocol settings. */
export function sdkFor(fake: PaymentsFake, key = SECRET_KEY, maxNetworkRetries = 0): Stripe {
  return new Stripe(key, {
    host: '127.0.0.1',
    port: fake.port,
    protocol: 'http',
    maxNetworkRetries,
  });
}

/** A deposit session as the app will create it (invented demo values). */
export function depositParams(
  overrides: Partial<Stripe.Checkout.SessionCreateParams> = {},
): Stripe.Checkout.SessionCreateParams {
  return {
    mode: 'payment',
    line_items: [
      {
        price_data: {
          currency: 'aud',
          unit_amount: 15000,
          product_data: { name: 'Deposit: 2-inch lift kit fitting, Bay 2' },
        },
        quantity: 1,
      },
    ],
    metadata: { booking_id: 'bk_demo_0042', kind: 'deposit' },
    payment_intent_data: { metadata: { booking_id: 'bk_demo_0042' } },
    client_reference_id: 'bk_demo_0042',
    customer_email: 'customer@liftwright.example',
    success_url: 'http://app.liftwright.example/bookings/paid?session={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://app.liftwright.example/bookings/deposit-cancelled',
    ...overrides,
  };
}

/** Pays through the fake-only JSON hook. */
export async function payByHook(
  fake: PaymentsFake,
  sessionId: string,
  card: string,
): Promise<{ status: number; body: Record<string, unknown> }> {
  const response = await fetch(`${fake.url}/__fake/pay/${sessionId}`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ card }),
  });
  return { status: response.status, body: (await response.json()) as Record<string, unknown> };
}

/** Runs `action` and returns what it threw (failing the test if it did not throw). */
export async function thrown(action: () => Promise<unknown>): Promise<Stripe.errors.StripeError> {
  try {
    await action();
  } catch (error) {
    return error as Stripe.errors.StripeError;
  }
  throw new Error('Expected the call to fail, but it succeeded.');
}
