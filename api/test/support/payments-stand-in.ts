import { createServer, type Server } from 'node:http';
import { type AddressInfo, connect, createServer as createTcpServer, type Socket } from 'node:net';
import Stripe from 'stripe';
import { createPaymentsFake, type PaymentsFake } from '../../../fakes/payments/src/app';
import { PAYMENTS_WEBHOOK_PATH } from '../../src/payments/payments-webhook.path';

/** One call the stand-in made to the webhook, and what it was answered. */
export interface WebhookAttempt {
  eventId: string;
  type: string;
  status: number;
  /** Exactly as the stand-in sent them. */
  body: string;
  signature: string;
}

/**
 * Between the payments stand-in and the API: passes each webhook call on to the API unchanged
 * (body and signature) and hands back the API's answer, or, while told to, answers a failure
 * itself as an endpoint that is down would. It exists because the stand-in is told where to
 * deliver before the API (which needs the stand-in's address) has a port.
 */
export interface WebhookRelay {
  readonly url: string;
  /** The API's base address, set once it listens. */
  target: string;
  readonly attempts: WebhookAttempt[];
  /** Answer `status` to the next `count` calls without passing them on. */
  refuseNext(count: number, status?: number): void;
  close(): Promise<void>;
}

async function startWebhookRelay(): Promise<WebhookRelay> {
  let refusals = 0;
  let refusalStatus = 503;
  const attempts: WebhookAttempt[] = [];
  const server: Server = createServer((request, response) => {
    const chunks: Buffer[] = [];
    request.on('data', (chunk: Buffer) => chunks.push(chunk));
    request.on('end', () => {
      const body = Buffer.concat(chunks);
      let event: { id?: string; type?: string } = {};
      try {
        event = JSON.parse(body.toString('utf8')) as typeof event;
      } catch {
        // Passed on as it is: the API answers a body that is not JSON.
      }
      const signature = request.headers['stripe-signature'];
      const record = (status: number) =>
        attempts.push({
          eventId: event.id ?? '',
          type: event.type ?? '',
          status,
          body: body.toString('utf8'),
          signature: typeof signature === 'string' ? signature : '',
        });
      if (refusals > 0) {
        refusals -= 1;
        record(refusalStatus);
        response.writeHead(refusalStatus, { 'Content-Type': 'text/plain' });
        response.end('down for maintenance');
        return;
      }
      const headers: Record<string, string> = {};
      for (const name of ['content-type', 'stripe-signature', 'user-agent']) {
        const value = request.headers[name];
        if (typeof value === 'string') headers[name] = value;
      }
      fetch(`${relay.target}${request.url ?? '/'}`, { method: 'POST', headers, body })
        .then(async (answer) => {
          const text = await answer.text();
          record(answer.status);
          response.writeHead(answer.status, {
            'Content-Type': answer.headers.get('content-type') ?? 'text/plain',
          });
          response.end(text);
        })
        .catch(() => {
          record(502);
          response.writeHead(502, { 'Content-Type': 'text/plain' });
          response.end('the API did not answer');
        });
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const relay: WebhookRelay = {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    target: '',
    attempts,
    refuseNext(count, status = 503) {
      refusals = count;
      refusalStatus = status;
    },
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
  return relay;
}

/**
 * Between the API and the stand-in's API: passes TCP connections through, or, while the
 * provider is "unreachable", cuts every open connection and refuses new ones.
 */
interface ApiGate {
  readonly url: string;
  setReachable(reachable: boolean): void;
  close(): Promise<void>;
}

async function startApiGate(targetPort: number): Promise<ApiGate> {
  let reachable = true;
  const open = new Set<Socket>();
  const server = createTcpServer((client) => {
    if (!reachable) {
      client.destroy();
      return;
    }
    const upstream = connect(targetPort, '127.0.0.1');
    open.add(client);
    open.add(upstream);
    const end = () => {
      client.destroy();
      upstream.destroy();
      open.delete(client);
      open.delete(upstream);
    };
    for (const socket of [client, upstream]) {
      socket.on('error', end);
      socket.on('close', end);
    }
    client.pipe(upstream).pipe(client);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    setReachable(value) {
      reachable = value;
      if (!value) for (const socket of open) socket.destroy();
    },
    close: () =>
      new Promise<void>((resolve) => {
        for (const socket of open) socket.destroy();
        server.close(() => resolve());
      }),
  };
}

/** The payments stand-in of one HTTP spec, the relay in front of the API, and the SDK. */
export interface PaymentsStandIn {
  fake: PaymentsFake;
  relay: WebhookRelay;
  /** What the API gets as PAYMENTS_API_URL: the stand-in's API behind a gate the test can shut. */
  apiUrl: string;
  /** Makes the provider unreachable for the API (connections cut and refused), or reachable. */
  setReachable(reachable: boolean): void;
  /** The official SDK pointed at the stand-in (host, port and protocol only), as the API is. */
  sdk: Stripe;
  secretKey: string;
  webhookSecret: string;
  /** The stand-in's log lines (delivery attempts and notable actions). */
  logs: string[];
  /** Moves the stand-in's clock forward (milliseconds). */
  advance(ms: number): void;
  /** Pays a checkout session through the stand-in's test hook (not part of the provider API). */
  pay(sessionId: string, card?: string): Promise<{ status: number; body: Record<string, unknown> }>;
  close(): Promise<void>;
}

/** A card number the stand-in accepts, and one it declines (its README lists them). */
export const TEST_CARD = '4242 4242 4242 4242';
export const DECLINED_CARD = '4000 0000 0000 0002';

/**
 * Starts the stand-in in this process on a free port with the test keys of vitest.config.ts,
 * delivering webhooks through the relay to PAYMENTS_WEBHOOK_PATH, retrying failed deliveries
 * after PAYMENTS_RETRY_BASE_MS (100 ms unless set), doubling up to 2 s.
 */
export async function startPaymentsStandIn(): Promise<PaymentsStandIn> {
  const secretKey = process.env.PAYMENTS_SECRET_KEY ?? '';
  const webhookSecret = process.env.PAYMENTS_WEBHOOK_SECRET ?? '';
  const relay = await startWebhookRelay();
  const logs: string[] = [];
  let offsetMs = 0;
  const fake = createPaymentsFake(
    {
      host: '127.0.0.1',
      port: 0,
      secretKey,
      webhookUrl: `${relay.url}${PAYMENTS_WEBHOOK_PATH}`,
      webhookSecret,
      retryBaseMs: Number(process.env.PAYMENTS_RETRY_BASE_MS ?? 100),
      retryMaxMs: 2000,
      retryLimit: null,
      webhookTimeoutMs: 10_000,
    },
    { now: () => Date.now() + offsetMs, log: (line) => logs.push(line) },
  );
  await fake.listen();
  const gate = await startApiGate(fake.port);
  return {
    fake,
    relay,
    apiUrl: gate.url,
    setReachable: (reachable) => gate.setReachable(reachable),
    sdk: new Stripe(secretKey, {
      host: '127.0.0.1',
      port: fake.port,
      protocol: 'http',
      maxNetworkRetries: 0,
    }),
    secretKey,
    webhookSecret,
    logs,
    advance(ms) {
      offsetMs += ms;
    },
    async pay(sessionId, card = TEST_CARD) {
      const response = await fetch(`${fake.url}/__fake/pay/${sessionId}`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ card }),
      });
      return { status: response.status, body: (await response.json()) as Record<string, unknown> };
    },
    async close() {
      await fake.close();
      await gate.close();
      await relay.close();
    },
  };
}
