import * as argon2 from 'argon2';
import { hash } from 'argon2';
import { describe, expect, it, vi } from 'vitest';

// The real argon2, with verify observable (to see the dummy check spend a real verification).
vi.mock('argon2', async (importOriginal) => {
  const original = await importOriginal<typeof import('argon2')>();
  return { ...original, verify: vi.fn(original.verify) };
});
import { PasswordHasher } from './password-hasher';
import { ARGON2_OPTIONS } from './password.constants';

/** Reads the parameters of an argon2 PHC string: $argon2id$v=19$m=...,t=...,p=...$salt$hash */
function parsePhc(phc: string): { variant: string; params: Record<string, number> } {
  const [, variant, , paramText] = phc.split('$');
  const params = Object.fromEntries(
    paramText.split(',').map((pair) => {
      const [key, value] = pair.split('=');
      return [key, Number(value)];
    }),
  );
  return { variant, params };
}

describe('PasswordHasher', () => {
  const hasher = new PasswordHasher();

  it('hashes with argon2id at or above the OWASP minimum', async () => {
    const { variant, params } = parsePhc(await hasher.hash('correct horse battery'));
    // Source: OWASP Password Storage Cheat Sheet, Argon2id: m=19456 (19 MiB), t=2, p=1 minimum
    expect(variant).toBe('argon2id');
    expect(params.m).toBeGreaterThanOrEqual(19456);
    expect(params.t).toBeGreaterThanOrEqual(2);
    expect(params.p).toBeGreaterThanOrEqual(1);
  });

  it('verifies the right password only', async () => {
    const stored = await hasher.hash('correct horse battery');
    expect(await hasher.verify(stored, 'correct horse battery')).toBe(true);
    expect(await hasher.verify(stored, 'Correct horse battery')).toBe(false);
  });

  it('treats a malformed stored hash as no match', async () => {
    expect(await hasher.verify('not-a-phc-string', 'anything')).toBe(false);
  });

  it('asks for a rehash of a hash made with weaker settings', async () => {
    const weak = await hash('pw', { ...ARGON2_OPTIONS, memoryCost: 4096, timeCost: 1 });
    expect(hasher.needsRehash(weak)).toBe(true);
    expect(hasher.needsRehash(await hasher.hash('pw'))).toBe(false);
  });

  it('spends a real verification on unknown accounts', async () => {
    const verify = vi.mocked(argon2.verify);
    verify.mockClear();
    await hasher.verifyAgainstDummy('whatever');
    expect(verify).toHaveBeenCalledTimes(1);
    const [stored, password] = verify.mock.calls[0];
    expect(password).toBe('whatever');
    // Against a hash made with the full settings, so it costs what a real check costs.
    const { variant, params } = parsePhc(stored);
    expect(variant).toBe('argon2id');
    expect(params.m).toBe(ARGON2_OPTIONS.memoryCost);
    expect(params.t).toBe(ARGON2_OPTIONS.timeCost);
  });
});
