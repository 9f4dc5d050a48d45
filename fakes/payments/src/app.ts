/**
 * Builds the stand-in from its settings: state, idempotency keys, webhook deliveries and the HTTP
 * server. `server.ts` runs it as a process; the tests start it in-process on a free port.
 */
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import type { PaymentsConfig } from './config';
import { IdempotencyKeys } from './idempotency';
import { Payments } from './payments';
import { createHandler, type RouteContext } from './routes';
import { Store } from './store';
import { WebhookDispatcher } from './webhooks';

/** The API version the official SDK pins; events carry it as `api_version`. */
export const API_VERSION: string = Stripe.API_VERSION;

export interface PaymentsFakeOptions {
  /** Unix milliseconds; defaults to the real clock. */
  now?: () => number;
  /** One line per delivery attempt and notable action; defaults to stdout with a timestamp. */
  log?: (line: string) => void;
}

export interface PaymentsFake {
  /** Starts listening; resolves with the base URL (http://host:port). */
  listen(): Promise<string>;
  close(): Promise<void>;
  readonly url: string;
  readonly port: number;
  readonly payments: Payments;
  readonly store: Store;
  readonly webhooks: WebhookDispatcher;
  /** Test control, see RouteContext.faults. */
  readonly faults: RouteContext['faults'];
}

function defaultLog(line: string): void {
  console.log(`${new Date().toISOString()} [payments] ${line}`);
}

export function createPaymentsFake(
  config: PaymentsConfig,
  options: PaymentsFakeOptions = {},
): PaymentsFake {
  const now = options.now ?? (() => Date.now());
  const log = options.log ?? defaultLog;
  const store = new Store(config.stateFile);
  let server: Server | undefined;
  let sweep: NodeJS.Timeout | undefined;
  let port = config.port;

  const publicUrl = () => config.publicUrl ?? `http://${config.host}:${port}`;
  const webhooks = new WebhookDispatcher({
    store,
    url: config.webhookUrl,
    secret: config.webhookSecret,
    retryBaseMs: config.retryBaseMs,
    retryMaxMs: config.retryMaxMs,
    retryLimit: config.retryLimit,
    timeoutMs: config.webhookTimeoutMs,
    now,
    log,
  });
  const payments = new Payments({
    store,
    apiVersion: API_VERSION,
    publicUrl,
    now,
    onEvent: (event) => webhooks.enqueue(event),
  });
  const idempotency = new IdempotencyKeys(store, now);
  const faults = { dropNextResponses: 0 };
  const handler = createHandler({
    secretKey: config.secretKey,
    apiVersion: API_VERSION,
    payments,
    idempotency,
    log,
    faults,
  });

  return {
    get url() {
      return `http://${config.host}:${port}`;
    },
    get port() {
      return port;
    },
    payments,
    store,
    webhooks,
    faults,
    listen() {
      return new Promise((resolve, reject) => {
        server = createServer(handler);
        server.once('error', reject);
        server.listen(config.port, config.host, () => {
          port = (server?.address() as AddressInfo).port;
          webhooks.resume();
          sweep = setInterval(() => {
            payments.sweepExpired();
            idempotency.prune();
          }, 5_000);
          resolve(`http://${config.host}:${port}`);
        });
      });
    },
    async close() {
      if (sweep) clearInterval(sweep);
      await webhooks.close();
      const running = server;
      if (!running) return;
      await new Promise<void>((resolve) => {
        running.close(() => resolve());
        running.closeAllConnections();
      });
    },
  };
}
