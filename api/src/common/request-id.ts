import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';

export const REQUEST_ID_HEADER = 'x-request-id';

/** An incoming id is kept only if it is short and made of harmless characters. */
const SANE_REQUEST_ID = /^[A-Za-z0-9._:-]{1,128}$/;

/**
 * pino-http's genReqId: reuse a sane incoming x-request-id (from a proxy), otherwise a new UUID;
 * the id is echoed in the x-request-id response header.
 */
export function requestIdFor(request: IncomingMessage, response: ServerResponse): string {
  const incoming = request.headers[REQUEST_ID_HEADER];
  const id =
    typeof incoming === 'string' && SANE_REQUEST_ID.test(incoming) ? incoming : randomUUID();
  response.setHeader(REQUEST_ID_HEADER, id);
  return id;
}
