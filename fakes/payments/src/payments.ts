/**
 * What the stand-in does with a request once it is parsed: Checkout Sessions, the payment made on
 * the hosted page, PaymentIntents, Charges, Refunds and the Events they raise. Every change is
 * made in full before the state is saved; a refused request changes nothing.
 */
import { missingParam, noSuch, paramError, stateError } from './errors';
import { newId } from './ids';
import { formatAmount, isCurrency } from './money';
import {
  arrayParam,
  enumParam,
  expandParam,
  hashParam,
  integerParam,
  metadataParam,
  rejectUnknown,
  stringParam,
  urlParam,
  type Params,
} from './params';
import {
  snapshot,
  type Charge,
  type CheckoutSession,
  type EventType,
  type LineItem,
  type PaymentEvent,
  type PaymentIntent,
  type Refund,
  type Store,
  type StoredSession,
} from './store';

/** The API request behind a change, as events record it (`request.id`, `idempotency_key`). */
export interface RequestInfo {
  id: string | null;
  idempotencyKey: string | null;
}

const NO_REQUEST: RequestInfo = { id: null, idempotencyKey: null };

export interface PaymentsOptions {
  store: Store;
  apiVersion: string;
  /** Base of the hosted page's address, read when a session is created. */
  publicUrl: () => string;
  /** Unix milliseconds; the tests move it to see sessions expire. */
  now: () => number;
  /** Called after an event is stored, to deliver it. */
  onEvent: (event: PaymentEvent) => void;
}

/** The provider allows a session to expire between 30 minutes and 24 hours after creation. */
const MIN_EXPIRY_S = 30 * 60;
const MAX_EXPIRY_S = 24 * 60 * 60;
/** The provider's largest amount: eight digits in the smallest currency unit. */
const MAX_AMOUNT = 99_999_999;

export const TEST_CARDS = {
  succeeds: '4242424242424242',
  declined: '4000000000000002',
} as const;

export const CARD_MESSAGES = {
  declined: 'Your card was declined.',
  invalidNumber: 'Your card number is invalid.',
  invalidExpiry: "Your card's expiry date is invalid. Enter it as MM/YY.",
  invalidCvc: "Your card's security code is invalid. Enter its 3 or 4 digits.",
} as const;

export interface CardInput {
  number: string;
  /** MM/YY or MM/YYYY; optional on the JSON test hook. */
  expiry?: string;
  cvc?: string;
}

export type PayOutcome =
  | { kind: 'paid'; session: CheckoutSession; redirectTo: string | null }
  | { kind: 'declined'; message: string }
  | {
      kind: 'invalid';
      fieldErrors: Partial<Record<'number' | 'expiry' | 'cvc', string>>;
    }
  | { kind: 'not_open'; session: CheckoutSession };

export class Payments {
  constructor(private readonly options: PaymentsOptions) {}

  private get state() {
    return this.options.store.state;
  }

  private nowSeconds(): number {
    return Math.floor(this.options.now() / 1000);
  }

  private save(): void {
    this.options.store.save();
  }

  private emit(type: EventType, object: PaymentEvent['data']['object'], request: RequestInfo) {
    const event: PaymentEvent = {
      id: newId.event(),
      object: 'event',
      api_version: this.options.apiVersion,
      created: this.nowSeconds(),
      data: { object: snapshot(object) },
      livemode: false,
      pending_webhooks: 1,
      request: { id: request.id, idempotency_key: request.idempotencyKey },
      type,
    };
    this.state.events[event.id] = event;
    this.state.eventOrder.push(event.id);
    return event;
  }

  /** Events are handed on only after the state that produced them is saved. */
  private publish(events: PaymentEvent[]): void {
    this.save();
    for (const event of events) this.options.onEvent(event);
  }

  // --- Checkout Sessions -------------------------------------------------------------------

  createSession(params: Params): Record<string, unknown> {
    rejectUnknown(params, [
      'mode',
      'line_items',
      'metadata',
      'success_url',
      'cancel_url',
      'expires_at',
      'client_reference_id',
      'customer_email',
      'payment_intent_data',
      'payment_method_types',
      'expand',
    ]);
    const expand = expandParam(params.expand, ['payment_intent', 'line_items']);
    const mode = stringParam(params.mode, 'mode', { required: true });
    if (mode !== 'payment') {
      throw paramError(
        'mode',
        `This payments stand-in supports only mode=payment (got "${mode}").`,
      );
    }
    if (params.payment_method_types !== undefined) {
      const types = arrayParam(params.payment_method_types, 'payment_method_types');
      if (types.some((type) => type !== 'card')) {
        throw paramError(
          'payment_method_types',
          'This payments stand-in supports only the card payment method.',
        );
      }
    }
    if (params.line_items === undefined || params.line_items === '')
      throw missingParam('line_items');
    const rawItems = arrayParam(params.line_items, 'line_items');
    if (rawItems.length === 0) throw missingParam('line_items');
    if (rawItems.length > 100) {
      throw paramError('line_items', 'A Checkout Session can have at most 100 line items.');
    }

    const lineItems: LineItem[] = rawItems.map((raw, index) => this.lineItem(raw, index));
    const currency = lineItems[0].currency;
    lineItems.forEach((item, index) => {
      if (item.currency !== currency) {
        throw paramError(
          `line_items[${index}][price_data][currency]`,
          'All line items must use the same currency.',
        );
      }
    });
    const amountTotal = lineItems.reduce((sum, item) => sum + item.amount_total, 0);
    if (amountTotal < 1) {
      throw paramError('line_items', 'The total amount due must be greater than zero.');
    }
    if (amountTotal > MAX_AMOUNT) {
      throw paramError(
        'line_items',
        `The total amount due must be no more than ${formatAmount(MAX_AMOUNT, currency)}.`,
        'amount_too_large',
      );
    }

    const created = this.nowSeconds();
    const expiresAt =
      integerParam(params.expires_at, 'expires_at', { min: 0 }) ?? created + MAX_EXPIRY_S;
    if (expiresAt < created + MIN_EXPIRY_S) {
      throw paramError(
        'expires_at',
        'The `expires_at` timestamp must be at least 30 minutes from Checkout Session creation.',
      );
    }
    if (expiresAt > created + MAX_EXPIRY_S) {
      throw paramError(
        'expires_at',
        'The `expires_at` timestamp must be less than 24 hours from Checkout Session creation.',
      );
    }

    const customerEmail = stringParam(params.customer_email, 'customer_email', {
      maxLength: 800,
    });
    if (customerEmail !== undefined && !/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(customerEmail)) {
      throw paramError(
        'customer_email',
        `Invalid email address: ${customerEmail}`,
        'email_invalid',
      );
    }
    let paymentIntentMetadata = {};
    if (params.payment_intent_data !== undefined) {
      const data = hashParam(params.payment_intent_data, 'payment_intent_data');
      rejectUnknown(data, ['metadata'], 'payment_intent_data');
      paymentIntentMetadata = metadataParam(data.metadata, 'payment_intent_data[metadata]');
    }

    const id = newId.checkoutSession();
    const session: CheckoutSession = {
      id,
      object: 'checkout.session',
      amount_subtotal: amountTotal,
      amount_total: amountTotal,
      cancel_url: urlParam(params.cancel_url, 'cancel_url') ?? null,
      client_reference_id:
        stringParam(params.client_reference_id, 'client_reference_id', { maxLength: 200 }) ?? null,
      created,
      currency,
      customer: null,
      customer_details: null,
      customer_email: customerEmail ?? null,
      expires_at: expiresAt,
      livemode: false,
      metadata: metadataParam(params.metadata, 'metadata'),
      mode: 'payment',
      payment_intent: null,
      payment_method_types: ['card'],
      payment_status: 'unpaid',
      status: 'open',
      success_url: urlParam(params.success_url, 'success_url') ?? null,
      url: `${this.options.publicUrl()}/pay/${id}`,
    };
    this.state.sessions[id] = { session, lineItems, paymentIntentMetadata };
    this.save();
    return this.renderSession(this.state.sessions[id], expand);
  }

  private lineItem(raw: Params[string], index: number): LineItem {
    const param = `line_items[${index}]`;
    const item = hashParam(raw, param);
    if (item.price !== undefined) {
      throw paramError(
        `${param}[price]`,
        'This payments stand-in takes line items with price_data only, not stored prices.',
      );
    }
    rejectUnknown(item, ['price_data', 'quantity'], param);
    if (item.price_data === undefined) throw missingParam(`${param}[price_data]`);
    const priceData = hashParam(item.price_data, `${param}[price_data]`);
    rejectUnknown(priceData, ['currency', 'unit_amount', 'product_data'], `${param}[price_data]`);
    const currency = stringParam(priceData.currency, `${param}[price_data][currency]`, {
      required: true,
    }) as string;
    if (!isCurrency(currency)) {
      throw paramError(
        `${param}[price_data][currency]`,
        `Invalid currency: ${currency}. Use a three-letter ISO code in lowercase.`,
      );
    }
    const unitAmount = integerParam(priceData.unit_amount, `${param}[price_data][unit_amount]`, {
      required: true,
      min: 0,
      max: MAX_AMOUNT,
    }) as number;
    if (priceData.product_data === undefined)
      throw missingParam(`${param}[price_data][product_data]`);
    const productData = hashParam(priceData.product_data, `${param}[price_data][product_data]`);
    rejectUnknown(productData, ['name'], `${param}[price_data][product_data]`);
    const name = stringParam(productData.name, `${param}[price_data][product_data][name]`, {
      required: true,
      maxLength: 250,
    }) as string;
    const quantity = integerParam(item.quantity, `${param}[quantity]`, {
      required: true,
      min: 1,
      max: 999_999,
    }) as number;
    const total = unitAmount * quantity;
    if (total > MAX_AMOUNT) {
      throw paramError(
        `${param}[quantity]`,
        `The line item's amount must be no more than ${formatAmount(MAX_AMOUNT, currency)}.`,
        'amount_too_large',
      );
    }
    return {
      id: newId.lineItem(),
      object: 'item',
      amount_discount: 0,
      amount_subtotal: total,
      amount_tax: 0,
      amount_total: total,
      currency,
      description: name,
      price: {
        id: newId.price(),
        object: 'price',
        active: false,
        currency,
        livemode: false,
        product: newId.product(),
        type: 'one_time',
        unit_amount: unitAmount,
      },
      quantity,
    };
  }

  /** A session past its `expires_at` becomes expired the first time anyone looks at it. */
  private expireIfDue(stored: StoredSession): void {
    const { session } = stored;
    if (session.status === 'open' && this.nowSeconds() >= session.expires_at) {
      session.status = 'expired';
      this.publish([this.emit('checkout.session.expired', session, NO_REQUEST)]);
    }
  }

  /** Expires every open session whose time is up (run on a timer by the server). */
  sweepExpired(): void {
    for (const stored of Object.values(this.state.sessions)) this.expireIfDue(stored);
  }

  findSession(id: string): StoredSession | undefined {
    const stored = Object.hasOwn(this.state.sessions, id) ? this.state.sessions[id] : undefined;
    if (stored) this.expireIfDue(stored);
    return stored;
  }

  private requireSession(id: string): StoredSession {
    const stored = this.findSession(id);
    if (!stored) throw noSuch('checkout.session', id);
    return stored;
  }

  retrieveSession(id: string, params: Params): Record<string, unknown> {
    rejectUnknown(params, ['expand']);
    const expand = expandParam(params.expand, ['payment_intent', 'line_items']);
    return this.renderSession(this.requireSession(id), expand);
  }

  expireSession(id: string, params: Params, request: RequestInfo): Record<string, unknown> {
    rejectUnknown(params, ['expand']);
    const expand = expandParam(params.expand, ['payment_intent', 'line_items']);
    const stored = this.requireSession(id);
    const { session } = stored;
    if (session.status !== 'open') {
      throw stateError(
        `Only Checkout Sessions with a status of "open" can be expired. This session's status is "${session.status}".`,
      );
    }
    session.status = 'expired';
    this.publish([this.emit('checkout.session.expired', session, request)]);
    return this.renderSession(stored, expand);
  }

  private renderSession(stored: StoredSession, expand: string[]): Record<string, unknown> {
    const out: Record<string, unknown> = { ...snapshot(stored.session) };
    if (expand.includes('payment_intent') && stored.session.payment_intent) {
      out.payment_intent = snapshot(this.state.paymentIntents[stored.session.payment_intent]);
    }
    if (expand.includes('line_items')) {
      out.line_items = {
        object: 'list',
        data: snapshot(stored.lineItems),
        has_more: false,
        total_count: stored.lineItems.length,
        url: `/v1/checkout/sessions/${stored.session.id}/line_items`,
      };
    }
    return out;
  }

  // --- Paying on the hosted page -----------------------------------------------------------

  pay(sessionId: string, card: CardInput): PayOutcome | undefined {
    const stored = this.findSession(sessionId);
    if (!stored) return undefined;
    const { session } = stored;
    if (session.status !== 'open') return { kind: 'not_open', session: snapshot(session) };

    const number = card.number.replace(/\s+/g, '');
    const fieldErrors: Partial<Record<'number' | 'expiry' | 'cvc', string>> = {};
    if (number !== TEST_CARDS.succeeds && number !== TEST_CARDS.declined) {
      fieldErrors.number = CARD_MESSAGES.invalidNumber;
    }
    const expiry = card.expiry === undefined ? undefined : parseExpiry(card.expiry);
    if (expiry === null) fieldErrors.expiry = CARD_MESSAGES.invalidExpiry;
    if (card.cvc !== undefined && !/^\d{3,4}$/.test(card.cvc.trim())) {
      fieldErrors.cvc = CARD_MESSAGES.invalidCvc;
    }
    if (Object.keys(fieldErrors).length > 0) return { kind: 'invalid', fieldErrors };
    if (number === TEST_CARDS.declined)
      return { kind: 'declined', message: CARD_MESSAGES.declined };

    const created = this.nowSeconds();
    const paymentIntentId = newId.paymentIntent();
    const chargeId = newId.charge();
    const paymentMethod = newId.paymentMethod();
    const metadata = { ...stored.paymentIntentMetadata };
    const paymentIntent: PaymentIntent = {
      id: paymentIntentId,
      object: 'payment_intent',
      amount: session.amount_total,
      amount_capturable: 0,
      amount_received: session.amount_total,
      canceled_at: null,
      cancellation_reason: null,
      capture_method: 'automatic',
      client_secret: `${paymentIntentId}_secret_${newId.secret()}`,
      confirmation_method: 'automatic',
      created,
      currency: session.currency,
      customer: null,
      description: null,
      last_payment_error: null,
      latest_charge: chargeId,
      livemode: false,
      metadata,
      next_action: null,
      payment_method: paymentMethod,
      payment_method_types: ['card'],
      receipt_email: session.customer_email,
      status: 'succeeded',
    };
    const fallbackYear = new Date(this.options.now()).getUTCFullYear() + 1;
    const charge: Charge = {
      id: chargeId,
      object: 'charge',
      amount: session.amount_total,
      amount_captured: session.amount_total,
      amount_refunded: 0,
      balance_transaction: null,
      billing_details: { email: session.customer_email, name: null },
      captured: true,
      created,
      currency: session.currency,
      customer: null,
      description: null,
      disputed: false,
      failure_code: null,
      failure_message: null,
      livemode: false,
      metadata: { ...metadata },
      paid: true,
      payment_intent: paymentIntentId,
      payment_method: paymentMethod,
      payment_method_details: {
        type: 'card',
        card: {
          brand: 'visa',
          exp_month: expiry?.month ?? 12,
          exp_year: expiry?.year ?? fallbackYear,
          last4: number.slice(-4),
        },
      },
      receipt_email: session.customer_email,
      refunded: false,
      refunds: {
        object: 'list',
        data: [],
        has_more: false,
        total_count: 0,
        url: `/v1/charges/${chargeId}/refunds`,
      },
      status: 'succeeded',
    };
    this.state.paymentIntents[paymentIntentId] = paymentIntent;
    this.state.charges[chargeId] = charge;
    session.status = 'complete';
    session.payment_status = 'paid';
    session.payment_intent = paymentIntentId;
    session.customer_details = { email: session.customer_email };
    this.publish([
      this.emit('checkout.session.completed', session, NO_REQUEST),
      this.emit('payment_intent.succeeded', paymentIntent, NO_REQUEST),
    ]);
    return {
      kind: 'paid',
      session: snapshot(session),
      redirectTo: session.success_url?.replaceAll('{CHECKOUT_SESSION_ID}', session.id) ?? null,
    };
  }

  // --- PaymentIntents ----------------------------------------------------------------------

  retrievePaymentIntent(id: string, params: Params): Record<string, unknown> {
    rejectUnknown(params, ['expand']);
    const expand = expandParam(params.expand, ['latest_charge']);
    const paymentIntent = Object.hasOwn(this.state.paymentIntents, id)
      ? this.state.paymentIntents[id]
      : undefined;
    if (!paymentIntent) throw noSuch('payment_intent', id);
    const out: Record<string, unknown> = { ...snapshot(paymentIntent) };
    if (expand.includes('latest_charge')) {
      out.latest_charge = snapshot(this.state.charges[paymentIntent.latest_charge]);
    }
    return out;
  }

  // --- Refunds -----------------------------------------------------------------------------

  createRefund(params: Params, request: RequestInfo): Refund {
    rejectUnknown(params, ['payment_intent', 'charge', 'amount', 'metadata', 'reason', 'expand']);
    expandParam(params.expand, []);
    const paymentIntentId = stringParam(params.payment_intent, 'payment_intent');
    const chargeIdParam = stringParam(params.charge, 'charge');
    if (!paymentIntentId && !chargeIdParam) {
      throw paramError(
        'payment_intent',
        'One of the following params should be provided for this request: payment_intent or charge.',
        'parameter_missing',
      );
    }
    let charge: Charge | undefined;
    if (paymentIntentId) {
      const paymentIntent = Object.hasOwn(this.state.paymentIntents, paymentIntentId)
        ? this.state.paymentIntents[paymentIntentId]
        : undefined;
      if (!paymentIntent) throw noSuch('payment_intent', paymentIntentId, 'payment_intent');
      charge = this.state.charges[paymentIntent.latest_charge];
      if (chargeIdParam && chargeIdParam !== charge.id) {
        throw paramError(
          'charge',
          `Charge ${chargeIdParam} does not belong to ${paymentIntentId}.`,
        );
      }
    } else if (chargeIdParam) {
      charge = Object.hasOwn(this.state.charges, chargeIdParam)
        ? this.state.charges[chargeIdParam]
        : undefined;
      if (!charge) throw noSuch('charge', chargeIdParam, 'charge');
    }
    if (!charge) throw noSuch('charge', String(chargeIdParam), 'charge');
    const amountParam = integerParam(params.amount, 'amount', { min: 1 });
    const metadata = metadataParam(params.metadata, 'metadata');
    const reason =
      enumParam(params.reason, 'reason', [
        'duplicate',
        'fraudulent',
        'requested_by_customer',
      ] as const) ?? null;

    // From here on the endpoint is executing: refusals are saved under an idempotency key.
    const remaining = charge.amount - charge.amount_refunded;
    if (remaining <= 0) {
      throw stateError(`Charge ${charge.id} has already been refunded.`, {
        code: 'charge_already_refunded',
      });
    }
    const amount = amountParam ?? remaining;
    if (amount > remaining) {
      throw stateError(
        `Refund amount (${formatAmount(amount, charge.currency)}) is greater than unrefunded amount on charge (${formatAmount(remaining, charge.currency)})`,
        { param: 'amount' },
      );
    }

    const refund: Refund = {
      id: newId.refund(),
      object: 'refund',
      amount,
      balance_transaction: null,
      charge: charge.id,
      created: this.nowSeconds(),
      currency: charge.currency,
      metadata,
      payment_intent: charge.payment_intent,
      reason,
      receipt_number: null,
      status: 'succeeded',
    };
    this.state.refunds[refund.id] = refund;
    charge.amount_refunded += amount;
    charge.refunded = charge.amount_refunded === charge.amount;
    charge.refunds.data.unshift(snapshot(refund));
    charge.refunds.total_count += 1;
    this.publish([this.emit('charge.refunded', charge, request)]);
    return snapshot(refund);
  }

  // --- Events ------------------------------------------------------------------------------

  retrieveEvent(id: string, params: Params): PaymentEvent {
    rejectUnknown(params, ['expand']);
    expandParam(params.expand, []);
    const event = Object.hasOwn(this.state.events, id) ? this.state.events[id] : undefined;
    if (!event) throw noSuch('event', id);
    return snapshot(event);
  }
}

/** "MM/YY", "MM / YY" or "MM/YYYY" with a month from 01 to 12; null when malformed. */
export function parseExpiry(text: string): { month: number; year: number } | null {
  const match = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(text);
  if (!match) return null;
  const month = Number(match[1]);
  if (month < 1 || month > 12) return null;
  const year = match[2].length === 2 ? 2000 + Number(match[2]) : Number(match[2]);
  return { month, year };
}
