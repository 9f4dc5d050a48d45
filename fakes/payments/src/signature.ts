/**
 * The provider's webhook signature: the `Stripe-Signature` header carries `t=<unix seconds>` and
 * `v1=<hex HMAC-SHA256 of "<t>.<raw body>">`, keyed with the endpoint's signing secret (the whole
 * `whsec_…` string).
 */
import { createHmac } from 'node:crypto';

export const SIGNATURE_HEADER = 'Stripe-Signature';

export function signatureHeader(payload: string, secret: string, timestampSeconds: number): string {
  const signature = createHmac('sha256', secret)
    .update(`${timestampSeconds}.${payload}`, 'utf8')
    .digest('hex');
  return `t=${timestampSeconds},v1=${signature}`;
}
