import { createHash } from 'node:crypto';

/**
 * The job id of a message, made from the key of what caused it (`booking-moved:<booking>:<n>`):
 * a name-based UUID (RFC 9562 §5.5, version 5: SHA-1 of a namespace and the name). The same cause
 * always gives the same id, so it cannot be queued twice.
 */
const NAMESPACE = Buffer.from('4b6f1d1e8a3c4f0e9b2a6c5d7e8f9a0b', 'hex');

export function outboxJobId(causeKey: string): string {
  return nameBasedUuid(NAMESPACE, causeKey);
}

/** A version 5 UUID of `name` in the namespace (its 16 bytes), RFC 9562 §5.5. */
export function nameBasedUuid(namespace: Buffer, name: string): string {
  const hash = createHash('sha1').update(namespace).update(name, 'utf8').digest();
  const bytes = Buffer.from(hash.subarray(0, 16));
  bytes[6] = (bytes[6] & 0x0f) | 0x50;
  bytes[8] = (bytes[8] & 0x3f) | 0x80;
  const hex = bytes.toString('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/** The domain of the workshop's address (`desk@shop.example` → `shop.example`). */
export function mailDomainOf(email: string, fallback = 'liftwright.example'): string {
  const at = email.lastIndexOf('@');
  const domain =
    at >= 0
      ? email
          .slice(at + 1)
          .trim()
          .toLowerCase()
      : '';
  return /^[a-z0-9.-]+\.[a-z]{2,}$/.test(domain) ? domain : fallback;
}

/** The Message-ID header of the job's message: the same on every delivery attempt. */
export function outboxMessageId(jobId: string, mailDomain: string): string {
  return `<msg-${jobId}@${mailDomain}>`;
}

/**
 * pg-boss writes `$1, $2 …` placeholders; MikroORM's connection (knex) takes `?`. Each `$n` is
 * replaced by `?` with its value put in that place (a value used twice is bound twice).
 */
export function toKnexBindings(
  text: string,
  values: readonly unknown[] = [],
): { sql: string; bindings: unknown[] } {
  const bindings: unknown[] = [];
  const sql = text.replace(/\$(\d+)/g, (_match, digits: string) => {
    bindings.push(values[Number(digits) - 1] ?? null);
    return '?';
  });
  return { sql, bindings };
}
