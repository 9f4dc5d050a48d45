/**
 * Delivers events to PAYMENTS_WEBHOOK_URL as the provider does: a JSON POST signed in the
 * `Stripe-Signature` header, repeated until the receiver answers with a 2xx.
 *
 * - First attempts go out one at a time, in the order the events were created.
 * - After a failure (not a 2xx, a redirect, a connection error or no answer within the timeout)
 *   each event retries on its own schedule and never holds back the events after it: the delay is
 *   PAYMENTS_RETRY_BASE_MS, doubling with each failure, at most PAYMENTS_RETRY_MAX_MS.
 * - Every attempt is signed afresh with the current time.
 * - With PAYMENTS_RETRY_LIMIT set, an event is given up after that many retries; otherwise never.
 * - Deliveries still due are part of the saved state and resume after a restart.
 */
import { signatureHeader, SIGNATURE_HEADER } from './signature';
import type { Delivery, PaymentEvent, Store } from './store';

export interface WebhookOptions {
  store: Store;
  url: string;
  secret: string;
  retryBaseMs: number;
  retryMaxMs: number;
  retryLimit: number | null;
  timeoutMs: number;
  now: () => number;
  log: (line: string) => void;
}

export function retryDelayMs(failedAttempts: number, baseMs: number, maxMs: number): number {
  return Math.min(baseMs * 2 ** (failedAttempts - 1), maxMs);
}

export class WebhookDispatcher {
  private readonly firstAttempts: string[] = [];
  private pumping = false;
  private readonly timers = new Map<string, NodeJS.Timeout>();
  private readonly inFlight = new Set<AbortController>();
  private closed = false;
  private idleWaiters: (() => void)[] = [];

  constructor(private readonly options: WebhookOptions) {}

  private get deliveries(): Delivery[] {
    return this.options.store.state.deliveries;
  }

  /** Picks up the deliveries a previous run left unfinished. */
  resume(): void {
    for (const delivery of this.deliveries) {
      if (delivery.attempts === 0 || delivery.nextAttemptAt === null) {
        this.firstAttempts.push(delivery.eventId);
      } else {
        this.schedule(delivery.eventId, Math.max(0, delivery.nextAttemptAt - this.options.now()));
      }
    }
    void this.pump();
  }

  enqueue(event: PaymentEvent): void {
    this.deliveries.push({ eventId: event.id, attempts: 0, nextAttemptAt: null });
    this.options.store.save();
    this.firstAttempts.push(event.id);
    void this.pump();
  }

  /** Resolves once every event so far has been delivered or given up. */
  idle(): Promise<void> {
    if (this.isIdle()) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  async close(): Promise<void> {
    this.closed = true;
    for (const timer of this.timers.values()) clearTimeout(timer);
    this.timers.clear();
    for (const controller of this.inFlight) controller.abort();
  }

  private isIdle(): boolean {
    return this.deliveries.length === 0 && this.inFlight.size === 0;
  }

  private checkIdle(): void {
    if (!this.isIdle()) return;
    const waiters = this.idleWaiters;
    this.idleWaiters = [];
    for (const resolve of waiters) resolve();
  }

  private async pump(): Promise<void> {
    if (this.pumping) return;
    this.pumping = true;
    try {
      while (this.firstAttempts.length > 0 && !this.closed) {
        await this.attempt(this.firstAttempts.shift() as string);
      }
    } finally {
      this.pumping = false;
    }
  }

  private schedule(eventId: string, delayMs: number): void {
    const timer = setTimeout(() => {
      this.timers.delete(eventId);
      void this.attempt(eventId);
    }, delayMs);
    this.timers.set(eventId, timer);
  }

  private async attempt(eventId: string): Promise<void> {
    const { store, url, secret, log } = this.options;
    const delivery = this.deliveries.find((d) => d.eventId === eventId);
    const event = store.state.events[eventId];
    if (!delivery || !event || this.closed) return;
    delivery.attempts += 1;
    const attempt = delivery.attempts;
    const payload = JSON.stringify(event, null, 2);
    const timestamp = Math.floor(this.options.now() / 1000);

    const controller = new AbortController();
    const timeout = setTimeout(() => controller.abort(), this.options.timeoutMs);
    this.inFlight.add(controller);
    let outcome: string;
    let delivered = false;
    try {
      const response = await fetch(url, {
        method: 'POST',
        headers: {
          'Content-Type': 'application/json; charset=utf-8',
          'User-Agent': 'liftwright-payments-stand-in/0.1',
          [SIGNATURE_HEADER]: signatureHeader(payload, secret, timestamp),
        },
        body: payload,
        redirect: 'manual',
        signal: controller.signal,
      });
      await response.arrayBuffer().catch(() => undefined);
      delivered = response.status >= 200 && response.status < 300;
      outcome = `HTTP ${response.status}`;
    } catch (error) {
      outcome = controller.signal.aborted
        ? `no answer within ${this.options.timeoutMs} ms`
        : `connection failed (${(error as Error).cause ?? (error as Error).message})`;
    } finally {
      clearTimeout(timeout);
      this.inFlight.delete(controller);
    }
    if (this.closed) return;

    const label = `webhook ${event.id} (${event.type}) attempt ${attempt}: ${outcome}`;
    if (delivered) {
      this.remove(delivery);
      event.pending_webhooks = 0;
      store.save();
      log(`${label}; delivered`);
    } else if (this.options.retryLimit !== null && attempt - 1 >= this.options.retryLimit) {
      this.remove(delivery);
      store.save();
      log(`${label}; giving up after ${this.options.retryLimit} retries`);
    } else {
      const delay = retryDelayMs(attempt, this.options.retryBaseMs, this.options.retryMaxMs);
      delivery.nextAttemptAt = this.options.now() + delay;
      store.save();
      log(`${label}; next attempt in ${delay} ms`);
      this.schedule(event.id, delay);
    }
    this.checkIdle();
  }

  private remove(delivery: Delivery): void {
    const index = this.deliveries.indexOf(delivery);
    if (index >= 0) this.deliveries.splice(index, 1);
  }
}
