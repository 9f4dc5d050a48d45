import { describe, expect, it } from 'vitest';
import { providerAddressOf } from './payments-client';

describe('providerAddressOf', () => {
  it('takes host, port and protocol from PAYMENTS_API_URL', () => {
    expect(providerAddressOf('http://127.0.0.1:12111')).toEqual({
      host: '127.0.0.1',
      port: 12111,
      protocol: 'http',
    });
    expect(providerAddressOf('https://payments.liftwright.example:8443/')).toEqual({
      host: 'payments.liftwright.example',
      port: 8443,
      protocol: 'https',
    });
  });

  it('uses the protocol’s own port when the address names none', () => {
    // Source: RFC 9110 §4.2.1 and §4.2.2 (http: default port 80, https: 443).
    expect(providerAddressOf('https://payments.liftwright.example').port).toBe(443);
    expect(providerAddressOf('http://payments.liftwright.example').port).toBe(80);
  });
});
