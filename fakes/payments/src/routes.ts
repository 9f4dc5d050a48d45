/**
 * The HTTP surface: the provider's REST subset under /v1 (secret key, form-encoded parameters,
 * idempotency keys, JSON answers), the hosted checkout page under /pay, and the stand-in's own
 * helpers under /__fake (not part of the provider's API).
 */
import { createHash, timingSafeEqual } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { messagePage, payPage } from './checkout-page';
import { ApiError, paramError } from './errors';
import { BodyTooLarge, readBody, redirect, sendHtml, sendJson } from './http';
import type { IdempotencyKeys } from './idempotency';
import { newId } from './ids';
import { formatAmount } from './money';
import { canonicalParams, parseParams, type Params } from './params';
import type { Payments, RequestInfo } from './payments';

export interface RouteContext {
  secretKey: string;
  apiVersion: string;
  payments: Payments;
  idempotency: IdempotencyKeys;
  log: (line: string) => void;
  /** Test control: drop the connection instead of answering the next N API POSTs. */
  faults: { dropNextResponses: number };
}

type ApiHandler = (params: Params, id: string, request: RequestInfo) => unknown;

interface ApiRoute {
  method: 'GET' | 'POST';
  pattern: RegExp;
  handle: (ctx: RouteContext) => ApiHandler;
}

const ID = '([^/]+)';

const API_ROUTES: ApiRoute[] = [
  {
    method: 'POST',
    pattern: /^\/v1\/checkout\/sessions$/,
    handle: (ctx) => (params) => ctx.payments.createSession(params),
  },
  {
    method: 'GET',
    pattern: new RegExp(`^/v1/checkout/sessions/${ID}$`),
    handle: (ctx) => (params, id) => ctx.payments.retrieveSession(id, params),
  },
  {
    method: 'POST',
    pattern: new RegExp(`^/v1/checkout/sessions/${ID}/expire$`),
    handle: (ctx) => (params, id, request) => ctx.payments.expireSession(id, params, request),
  },
  {
    method: 'GET',
    pattern: new RegExp(`^/v1/payment_intents/${ID}$`),
    handle: (ctx) => (params, id) => ctx.payments.retrievePaymentIntent(id, params),
  },
  {
    method: 'POST',
    pattern: /^\/v1\/refunds$/,
    handle: (ctx) => (params, _id, request) => ctx.payments.createRefund(params, request),
  },
  {
    method: 'GET',
    pattern: new RegExp(`^/v1/events/${ID}$`),
    handle: (ctx) => (params, id) => ctx.payments.retrieveEvent(id, params),
  },
];

function digest(text: string): Buffer {
  return createHash('sha256').update(text).digest();
}

/** The key from `Authorization: Bearer sk_…` or HTTP Basic with the key as user name. */
function presentedKey(header: string | undefined): string | undefined {
  if (!header) return undefined;
  const match = /^(\w+)\s+(.+)$/.exec(header.trim());
  if (!match) return undefined;
  const scheme = match[1].toLowerCase();
  if (scheme === 'bearer') return match[2].trim();
  if (scheme === 'basic') {
    const decoded = Buffer.from(match[2], 'base64').toString('utf8');
    return decoded.split(':')[0];
  }
  return undefined;
}

function masked(key: string): string {
  if (key.length <= 12) return '*'.repeat(key.length);
  return `${key.slice(0, 8)}${'*'.repeat(Math.max(4, key.length - 12))}${key.slice(-4)}`;
}

/**
 * The provider answers a missing or wrong key with 401; its documented error types have no
 * separate one for this, so the body is an `invalid_request_error` (the official SDK turns any 401
 * into a StripeAuthenticationError).
 */
function authenticationFailure(ctx: RouteContext, header: string | undefined): ApiError | null {
  const key = presentedKey(header);
  if (!key) {
    return new ApiError(
      401,
      {
        type: 'invalid_request_error',
        message:
          "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').",
      },
      false,
    );
  }
  if (!timingSafeEqual(digest(key), digest(ctx.secretKey))) {
    return new ApiError(
      401,
      { type: 'invalid_request_error', message: `Invalid API Key provided: ${masked(key)}` },
      false,
    );
  }
  return null;
}

function internalError(ctx: RouteContext, error: unknown): ApiError {
  ctx.log(`internal error: ${(error as Error).stack ?? String(error)}`);
  return new ApiError(
    500,
    { type: 'api_error', message: 'The payments stand-in failed to handle this request.' },
    true,
  );
}

/** A path segment, percent-decoded; a malformed escape is kept as sent (and then names nothing). */
function segment(raw: string): string {
  try {
    return decodeURIComponent(raw);
  } catch {
    return raw;
  }
}

function headerValue(req: IncomingMessage, name: string): string | undefined {
  const value = req.headers[name];
  return Array.isArray(value) ? value[0] : value;
}

async function handleApi(
  ctx: RouteContext,
  req: IncomingMessage,
  res: ServerResponse,
  url: URL,
): Promise<void> {
  const requestId = newId.request();
  const headers: Record<string, string> = {
    'Request-Id': requestId,
    'Stripe-Version': ctx.apiVersion,
  };
  const method = req.method ?? 'GET';
  const send = (status: number, body: unknown, extra: Record<string, string> = {}) =>
    sendJson(res, status, body, { ...headers, ...extra });

  const authFailure = authenticationFailure(ctx, headerValue(req, 'authorization'));
  if (authFailure) return send(authFailure.status, authFailure);

  let route: ApiRoute | undefined;
  let match: RegExpExecArray | null = null;
  for (const candidate of API_ROUTES) {
    match = candidate.method === method ? candidate.pattern.exec(url.pathname) : null;
    if (match) {
      route = candidate;
      break;
    }
  }
  if (!route || !match) {
    return send(404, {
      error: {
        type: 'invalid_request_error',
        message: `Unrecognized request URL (${method}: ${url.pathname}).`,
      },
    });
  }
  const id = segment(match[1] ?? '');

  let params: Params;
  try {
    if (method === 'GET') {
      params = parseParams(url.search.slice(1));
    } else {
      const body = await readBody(req);
      const contentType = headerValue(req, 'content-type') ?? '';
      if (body !== '' && !contentType.startsWith('application/x-www-form-urlencoded')) {
        throw paramError(
          'body',
          'The request body must be application/x-www-form-urlencoded, as the provider takes it.',
        );
      }
      params = parseParams(body);
    }
  } catch (error) {
    if (error instanceof ApiError) return send(error.status, error);
    if (error instanceof BodyTooLarge) {
      return send(413, { error: { type: 'invalid_request_error', message: error.message } });
    }
    throw error;
  }

  const idempotencyKey = method === 'POST' ? headerValue(req, 'idempotency-key') : undefined;
  const canonical = canonicalParams(params);
  if (idempotencyKey !== undefined) {
    headers['Idempotency-Key'] = idempotencyKey;
    const lookup = ctx.idempotency.lookup(idempotencyKey, method, url.pathname, canonical);
    if (lookup.kind === 'refused') return send(lookup.error.status, lookup.error);
    if (lookup.kind === 'replay') {
      return sendJson(res, lookup.saved.status, lookup.saved.body, {
        ...headers,
        'Request-Id': lookup.saved.requestId,
        'Idempotent-Replayed': 'true',
      });
    }
  }

  // From here to the answer nothing waits: the handler, the saved response and the reply happen
  // in one go, so a second request with the same key always sees the saved response.
  let status = 200;
  let body: unknown;
  let executed = true;
  try {
    body = route.handle(ctx)(params, id, { id: requestId, idempotencyKey: idempotencyKey ?? null });
  } catch (error) {
    const apiError = error instanceof ApiError ? error : internalError(ctx, error);
    status = apiError.status;
    body = apiError.toJSON();
    executed = apiError.executed;
  }
  const text = JSON.stringify(body, null, 2);
  if (idempotencyKey !== undefined && executed) {
    ctx.idempotency.save({
      key: idempotencyKey,
      method,
      path: url.pathname,
      params: canonical,
      status,
      body: text,
      requestId,
    });
  }
  if (method === 'POST' && ctx.faults.dropNextResponses > 0) {
    ctx.faults.dropNextResponses -= 1;
    ctx.log(`fault: dropping the answer to ${method} ${url.pathname} (${requestId})`);
    req.socket.destroy();
    return;
  }
  sendJson(res, status, text, headers);
}

function formField(params: Params, name: string): string {
  const value = params[name];
  return typeof value === 'string' ? value : '';
}

async function handlePayPage(
  ctx: RouteContext,
  req: IncomingMessage,
  res: ServerResponse,
  sessionId: string,
): Promise<void> {
  const stored = ctx.payments.findSession(sessionId);
  if (!stored) {
    return sendHtml(
      res,
      404,
      messagePage('Payment not found', 'There is no payment at this address. Check the link.'),
    );
  }
  const { session } = stored;
  const notOpen = (status: number) => {
    if (session.status === 'complete') {
      return sendHtml(
        res,
        status,
        messagePage(
          'Already paid',
          `This payment of ${formatAmount(session.amount_total, session.currency)} has been made. Nothing more is charged.`,
          session.success_url
            ? {
                href: session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id),
                text: 'Continue',
              }
            : undefined,
        ),
      );
    }
    return sendHtml(
      res,
      status,
      messagePage(
        'Payment page expired',
        'This payment page has expired and can no longer be used. Ask for a new payment link.',
        session.cancel_url ? { href: session.cancel_url, text: 'Return' } : undefined,
      ),
    );
  };

  if (req.method === 'GET') {
    if (session.status !== 'open') return notOpen(200);
    return sendHtml(res, 200, payPage({ session, lineItems: stored.lineItems }));
  }

  const form = parseParams(await readBody(req));
  const card = {
    number: formField(form, 'card_number'),
    expiry: formField(form, 'card_expiry'),
    cvc: formField(form, 'card_cvc'),
  };
  const outcome = ctx.payments.pay(sessionId, card);
  if (!outcome) return sendHtml(res, 404, messagePage('Payment not found', 'Check the link.'));
  const values = { number: card.number, expiry: card.expiry };
  switch (outcome.kind) {
    case 'not_open':
      return notOpen(409);
    case 'invalid':
      return sendHtml(
        res,
        400,
        payPage({ session, lineItems: stored.lineItems, values, fieldErrors: outcome.fieldErrors }),
      );
    case 'declined':
      return sendHtml(
        res,
        402,
        payPage({ session, lineItems: stored.lineItems, values, formError: outcome.message }),
      );
    case 'paid':
      ctx.log(`checkout ${session.id} paid on the hosted page`);
      if (outcome.redirectTo) return redirect(res, outcome.redirectTo);
      return sendHtml(
        res,
        200,
        messagePage(
          'Payment received',
          `${formatAmount(session.amount_total, session.currency)} has been paid. You can close this page.`,
        ),
      );
  }
}

/** Fake-only: POST /__fake/pay/:id {"card": "4242…", "expiry"?: "12/30", "cvc"?: "123"}. */
async function handlePayHook(
  ctx: RouteContext,
  req: IncomingMessage,
  res: ServerResponse,
  sessionId: string,
): Promise<void> {
  let input: unknown;
  try {
    input = JSON.parse((await readBody(req)) || '{}');
  } catch {
    input = null;
  }
  const record = (typeof input === 'object' && input !== null ? input : {}) as Record<
    string,
    unknown
  >;
  const optional = (name: string) =>
    typeof record[name] === 'string' ? (record[name] as string) : undefined;
  if (typeof record.card !== 'string') {
    return sendJson(
      res,
      400,
      paramError('card', 'Send a JSON body such as {"card": "4242 4242 4242 4242"}.').toJSON(),
    );
  }
  const outcome = ctx.payments.pay(sessionId, {
    number: record.card,
    expiry: optional('expiry'),
    cvc: optional('cvc'),
  });
  if (!outcome) {
    return sendJson(res, 404, {
      error: {
        type: 'invalid_request_error',
        code: 'resource_missing',
        message: `No such checkout.session: '${sessionId}'`,
      },
    });
  }
  switch (outcome.kind) {
    case 'not_open':
      return sendJson(res, 400, {
        error: {
          type: 'invalid_request_error',
          message: `This Checkout Session is no longer open (status: ${outcome.session.status}).`,
        },
      });
    case 'invalid': {
      const [fieldName, message] = Object.entries(outcome.fieldErrors)[0];
      const code = { number: 'invalid_number', expiry: 'invalid_expiry_month', cvc: 'invalid_cvc' }[
        fieldName as 'number' | 'expiry' | 'cvc'
      ];
      return sendJson(res, 402, { error: { type: 'card_error', code, param: fieldName, message } });
    }
    case 'declined':
      return sendJson(res, 402, {
        error: {
          type: 'card_error',
          code: 'card_declined',
          decline_code: 'generic_decline',
          message: outcome.message,
        },
      });
    case 'paid':
      ctx.log(`checkout ${outcome.session.id} paid through the test hook`);
      return sendJson(res, 200, { session: outcome.session, redirect_url: outcome.redirectTo });
  }
}

export function createHandler(ctx: RouteContext) {
  return (req: IncomingMessage, res: ServerResponse): void => {
    const url = new URL(req.url ?? '/', 'http://stand-in.invalid');
    const method = req.method ?? 'GET';
    const run = async () => {
      if (url.pathname.startsWith('/v1/')) return handleApi(ctx, req, res, url);
      const page = /^\/pay\/([^/]+)$/.exec(url.pathname);
      if (page && (method === 'GET' || method === 'POST')) {
        return handlePayPage(ctx, req, res, segment(page[1]));
      }
      const hook = /^\/__fake\/pay\/([^/]+)$/.exec(url.pathname);
      if (hook && method === 'POST') {
        return handlePayHook(ctx, req, res, segment(hook[1]));
      }
      if (url.pathname === '/__fake/health' && method === 'GET') {
        return sendJson(res, 200, { status: 'ok' });
      }
      return sendHtml(res, 404, messagePage('Not found', 'There is nothing at this address.'));
    };
    run().catch((error: unknown) => {
      if (error instanceof BodyTooLarge) {
        if (!res.headersSent)
          sendJson(res, 413, { error: { type: 'invalid_request_error', message: error.message } });
        return;
      }
      const apiError = internalError(ctx, error);
      if (!res.headersSent) sendJson(res, apiError.status, apiError.toJSON());
    });
  };
}
