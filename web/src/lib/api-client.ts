import type { ApiErrorBody, CsrfTokenResponse } from '@/types/api';

/** A failed request, carrying what the API said about it. */
export class ApiError extends Error {
  readonly statusCode: number;
  /** HTTP reason phrase from the body ("Bad Request"), or "Network Error" when nothing came back. */
  readonly error: string;
  /** Validation messages keyed by the DTO property name ("a.b" when nested). */
  readonly fieldErrors: Record<string, string[]>;
  readonly requestId?: string;
  /** Seconds from a Retry-After header (throttled requests). */
  readonly retryAfterSeconds?: number;
  /**
   * The whole JSON body of the answer, for refusals that carry more than a message (a 409 on a
   * booking lists the next free starts). Read it through a type guard; null when none came.
   */
  readonly body: unknown;

  constructor(init: {
    statusCode: number;
    error: string;
    message: string;
    fieldErrors?: Record<string, string[]>;
    requestId?: string;
    retryAfterSeconds?: number;
    body?: unknown;
  }) {
    super(init.message);
    this.name = 'ApiError';
    this.statusCode = init.statusCode;
    this.error = init.error;
    this.fieldErrors = init.fieldErrors ?? {};
    this.requestId = init.requestId;
    this.retryAfterSeconds = init.retryAfterSeconds;
    this.body = init.body ?? null;
  }

  get isValidation(): boolean {
    return Object.keys(this.fieldErrors).length > 0;
  }
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}

const CSRF_HEADER = 'x-csrf-token';
const CSRF_PATH = '/api/auth/csrf';
const MUTATING_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

let csrfToken: string | null = null;
let csrfTokenRequest: Promise<string> | null = null;

/**
 * Replaces the CSRF token, e.g. with the one sign-in and register return (the session is
 * regenerated there, so the old token stops working). `null` makes the next mutating request
 * ask the API for a fresh one.
 */
export function setCsrfToken(token: string | null): void {
  csrfToken = token;
  csrfTokenRequest = null;
}

async function fetchCsrfToken(): Promise<string> {
  csrfTokenRequest ??= request<CsrfTokenResponse>('GET', CSRF_PATH)
    .then((body) => {
      csrfToken = body.csrfToken;
      return body.csrfToken;
    })
    .finally(() => {
      csrfTokenRequest = null;
    });
  return csrfTokenRequest;
}

async function currentCsrfToken(): Promise<string> {
  return csrfToken ?? fetchCsrfToken();
}

type UnauthorizedListener = () => void;
const unauthorizedListeners = new Set<UnauthorizedListener>();

/**
 * Called when a request outside /api/auth/ answers 401, i.e. the session ended while the page
 * was open. Returns a function that removes the listener.
 */
export function onUnauthorized(listener: UnauthorizedListener): () => void {
  unauthorizedListeners.add(listener);
  return () => unauthorizedListeners.delete(listener);
}

function isCsrfRejection(error: ApiError): boolean {
  return error.statusCode === 403 && /csrf/i.test(error.message);
}

function parseRetryAfter(header: string | null): number | undefined {
  if (!header) return undefined;
  const seconds = Number(header);
  if (Number.isFinite(seconds)) return seconds;
  const date = Date.parse(header);
  return Number.isNaN(date) ? undefined : Math.max(0, Math.round((date - Date.now()) / 1000));
}

function isErrorBody(value: unknown): value is ApiErrorBody {
  return (
    typeof value === 'object' &&
    value !== null &&
    'message' in value &&
    typeof (value as { message: unknown }).message === 'string'
  );
}

async function toApiError(response: Response): Promise<ApiError> {
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    // Not JSON (e.g. a proxy page): fall back to the status line below.
  }
  const retryAfterSeconds = parseRetryAfter(response.headers.get('retry-after'));
  if (isErrorBody(body)) {
    return new ApiError({
      statusCode: body.statusCode ?? response.status,
      error: body.error ?? response.statusText,
      message: body.message,
      fieldErrors: body.fieldErrors,
      requestId: body.requestId,
      retryAfterSeconds,
      body,
    });
  }
  return new ApiError({
    statusCode: response.status,
    error: response.statusText || 'Error',
    message:
      response.status >= 500
        ? 'The workshop server had a problem. Please try again in a moment.'
        : `The request was refused (${response.status}).`,
    retryAfterSeconds,
  });
}

/** What a request expects back: JSON (the default), or the raw bytes of a download. */
type ResponseKind = 'json' | 'blob';

async function send(
  method: string,
  path: string,
  body: unknown,
  token: string | null,
  accept: string,
) {
  const headers: Record<string, string> = { accept };
  // A FormData body (a file upload) sets its own multipart content type and boundary.
  const isForm = body instanceof FormData;
  if (body !== undefined && !isForm) headers['content-type'] = 'application/json';
  if (token) headers[CSRF_HEADER] = token;
  try {
    return await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
    });
  } catch {
    throw new ApiError({
      statusCode: 0,
      error: 'Network Error',
      message: 'Could not reach the workshop server. Check your connection and try again.',
    });
  }
}

async function request<T>(
  method: string,
  path: string,
  body?: unknown,
  kind: ResponseKind = 'json',
  withCsrf = true,
): Promise<T> {
  const mutating = withCsrf && MUTATING_METHODS.has(method);
  const accept = kind === 'blob' ? '*/*' : 'application/json';
  let response = await send(method, path, body, mutating ? await currentCsrfToken() : null, accept);

  let error = response.ok ? null : await toApiError(response);
  if (error && mutating && isCsrfRejection(error)) {
    // The session (and with it the token) may have been renewed: ask once more, then retry once.
    setCsrfToken(null);
    response = await send(method, path, body, await fetchCsrfToken(), accept);
    error = response.ok ? null : await toApiError(response);
  }

  if (error) {
    if (error.statusCode === 401 && !path.startsWith('/api/auth/')) {
      unauthorizedListeners.forEach((listener) => listener());
    }
    throw error;
  }

  if (response.status === 204 || response.status === 205) return undefined as T;
  if (kind === 'blob') return (await response.blob()) as T;
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

/** JSON over fetch to the API on this origin; mutating requests carry the CSRF token. */
export const api = {
  get: <T>(path: string) => request<T>('GET', path),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, body ?? {}),
  /**
   * A POST to a route that only computes (the price preview, the planner options): the API
   * needs no CSRF token there, so a guest planning a build opens no session until they save.
   */
  compute: <T>(path: string, body: unknown) => request<T>('POST', path, body, 'json', false),
  put: <T>(path: string, body?: unknown) => request<T>('PUT', path, body ?? {}),
  patch: <T>(path: string, body?: unknown) => request<T>('PATCH', path, body ?? {}),
  delete: <T = void>(path: string) => request<T>('DELETE', path),
  /** A multipart/form-data POST (a file upload), with the CSRF token like any other. */
  postForm: <T>(path: string, form: FormData) => request<T>('POST', path, form),
  /** A GET whose answer is a file to save (a CSV export); errors still come back as ApiError. */
  getBlob: (path: string) => request<Blob>('GET', path, undefined, 'blob'),
};
