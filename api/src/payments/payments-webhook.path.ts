/**
 * Where the payment provider posts its events (below the global /api prefix). The body parser
 * keeps the raw bytes of requests to this path only: the signature is over exactly those bytes.
 */
export const PAYMENTS_WEBHOOK_PATH = '/api/payments/webhook';
