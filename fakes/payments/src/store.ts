/**
 * The stand-in's state: the API objects exactly as they are answered, the saved idempotent
 * responses and the webhook deliveries still due. Kept in memory, and also written to a JSON file
 * of its own after every change when PAYMENTS_STATE_FILE is set, so a restart keeps everything.
 */
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';

export type Metadata = Record<string, string>;

export interface ApiList<T> {
  object: 'list';
  data: T[];
  has_more: boolean;
  total_count: number;
  url: string;
}

export interface Price {
  id: string;
  object: 'price';
  active: boolean;
  currency: string;
  livemode: false;
  product: string;
  type: 'one_time';
  unit_amount: number;
}

export interface LineItem {
  id: string;
  object: 'item';
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  price: Price;
  quantity: number;
}

export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: null;
  customer_details: { email: string | null } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Metadata;
  mode: 'payment';
  payment_intent: string | null;
  payment_method_types: string[];
  payment_status: 'unpaid' | 'paid';
  status: 'open' | 'complete' | 'expired';
  success_url: string | null;
  url: string;
}

export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_capturable: number;
  amount_received: number;
  canceled_at: null;
  cancellation_reason: null;
  capture_method: 'automatic';
  client_secret: string;
  confirmation_method: 'automatic';
  created: number;
  currency: string;
  customer: null;
  description: string | null;
  last_payment_error: null;
  latest_charge: string;
  livemode: false;
  metadata: Metadata;
  next_action: null;
  payment_method: string;
  payment_method_types: string[];
  receipt_email: string | null;
  status: 'succeeded';
}

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  balance_transaction: null;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: 'duplicate' | 'fraudulent' | 'requested_by_customer' | null;
  receipt_number: null;
  status: 'succeeded';
}

export interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  balance_transaction: null;
  billing_details: { email: string | null; name: string | null };
  captured: boolean;
  created: number;
  currency: string;
  customer: null;
  description: string | null;
  disputed: boolean;
  failure_code: null;
  failure_message: null;
  livemode: false;
  metadata: Metadata;
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: {
    type: 'card';
    card: { brand: string; exp_month: number; exp_year: number; last4: string };
  };
  receipt_email: string | null;
  refunded: boolean;
  refunds: ApiList<Refund>;
  status: 'succeeded';
}

export type EventType =
  | 'checkout.session.completed'
  | 'checkout.session.expired'
  | 'payment_intent.succeeded'
  | 'charge.refunded';

export interface PaymentEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: CheckoutSession | PaymentIntent | Charge };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: EventType;
}

/** A response saved under an idempotency key. */
export interface SavedResponse {
  key: string;
  method: string;
  path: string;
  /** Canonical JSON of the parsed parameters the first request sent. */
  params: string;
  status: number;
  body: string;
  requestId: string;
  savedAt: number;
}

export interface Delivery {
  eventId: string;
  attempts: number;
  /** Unix milliseconds of the next attempt; null while the first attempt waits its turn. */
  nextAttemptAt: number | null;
}

export interface StoredSession {
  session: CheckoutSession;
  lineItems: LineItem[];
  paymentIntentMetadata: Metadata;
}

interface State {
  version: 1;
  sessions: Record<string, StoredSession>;
  paymentIntents: Record<string, PaymentIntent>;
  charges: Record<string, Charge>;
  refunds: Record<string, Refund>;
  events: Record<string, PaymentEvent>;
  /** Event ids in order of creation. */
  eventOrder: string[];
  idempotency: Record<string, SavedResponse>;
  /** Deliveries not yet answered with a 2xx, in order of event creation. */
  deliveries: Delivery[];
}

function emptyState(): State {
  return {
    version: 1,
    sessions: {},
    paymentIntents: {},
    charges: {},
    refunds: {},
    events: {},
    eventOrder: [],
    idempotency: {},
    deliveries: [],
  };
}

export class Store {
  readonly state: State;

  constructor(private readonly file?: string) {
    this.state = file && existsSync(file) ? Store.load(file) : emptyState();
  }

  private static load(file: string): State {
    let parsed: unknown;
    try {
      parsed = JSON.parse(readFileSync(file, 'utf8'));
    } catch (error) {
      throw new Error(
        `PAYMENTS_STATE_FILE ${file} is not readable JSON (${(error as Error).message}). ` +
          'Move it away to start with an empty state.',
      );
    }
    if (typeof parsed !== 'object' || parsed === null || (parsed as State).version !== 1) {
      throw new Error(`PAYMENTS_STATE_FILE ${file} is not a state file of this stand-in.`);
    }
    return { ...emptyState(), ...(parsed as State) };
  }

  /** Writes the whole state (to a temporary file first, so a crash never leaves half a file). */
  save(): void {
    if (!this.file) return;
    mkdirSync(dirname(this.file), { recursive: true });
    const temporary = `${this.file}.${process.pid}.tmp`;
    writeFileSync(temporary, JSON.stringify(this.state), { mode: 0o600 });
    renameSync(temporary, this.file);
  }
}

/** A deep copy, so an event keeps the object as it was when the event happened. */
export function snapshot<T>(value: T): T {
  return structuredClone(value);
}
