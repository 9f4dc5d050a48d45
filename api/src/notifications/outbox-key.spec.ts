import { describe, expect, it } from 'vitest';
import {
  mailDomainOf,
  nameBasedUuid,
  outboxJobId,
  outboxMessageId,
  toKnexBindings,
} from './outbox-key';

describe('outbox keys', () => {
  it('makes one job id per cause, a version 5 UUID', () => {
    const id = outboxJobId('booking-moved:abc:1');
    expect(outboxJobId('booking-moved:abc:1')).toBe(id);
    expect(outboxJobId('booking-moved:abc:2')).not.toBe(id);
    // Source: RFC 9562 §5.5 (version 5: version nibble 5, variant bits 10)
    expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-5[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });

  it('computes version 5 UUIDs as the standard does', () => {
    const dns = Buffer.from('6ba7b8109dad11d180b400c04fd430c8', 'hex');
    // Source: RFC 9562 Appendix A.4 (UUIDv5 of "www.example.com" in the DNS namespace)
    expect(nameBasedUuid(dns, 'www.example.com')).toBe('2ed6657d-e927-568b-95e1-2665a8aea6a2');
  });

  it('names the Message-ID after the job, on the workshop mail domain', () => {
    expect(mailDomainOf('bookings@Kestrelmere.example')).toBe('kestrelmere.example');
    expect(mailDomainOf('not an address')).toBe('liftwright.example');
    // Source: RFC 5322 §3.6.4 (msg-id = "<" id-left "@" id-right ">")
    expect(outboxMessageId('0f0e', 'kestrelmere.example')).toBe('<msg-0f0e@kestrelmere.example>');
  });

  it('turns $n placeholders into ? bindings in order, repeating a value used twice', () => {
    expect(toKnexBindings('select $2, $1, $2', ['a', 'b'])).toEqual({
      sql: 'select ?, ?, ?',
      bindings: ['b', 'a', 'b'],
    });
    expect(toKnexBindings('select $1', [undefined]).bindings).toEqual([null]);
  });
});
