import { Injectable, type OnApplicationBootstrap } from '@nestjs/common';
import { hash, needsRehash, verify } from 'argon2';
import { ARGON2_OPTIONS } from './password.constants';

/** Hashes and checks passwords with the settings in password.constants.ts. */
@Injectable()
export class PasswordHasher implements OnApplicationBootstrap {
  private dummyHash?: Promise<string>;

  /** Made at start-up, so the first unknown e-mail is not slower than the others. */
  async onApplicationBootstrap(): Promise<void> {
    await this.dummy();
  }

  hash(password: string): Promise<string> {
    return hash(password, ARGON2_OPTIONS);
  }

  async verify(passwordHash: string, password: string): Promise<boolean> {
    try {
      return await verify(passwordHash, password);
    } catch {
      // A malformed stored hash never matches.
      return false;
    }
  }

  /** True when the stored hash was made with weaker settings than the current ones. */
  needsRehash(passwordHash: string): boolean {
    return needsRehash(passwordHash, ARGON2_OPTIONS);
  }

  /**
   * Spends the same work as a real check, for an e-mail address that has no account, so the
   * answer time does not tell whether the account exists.
   */
  async verifyAgainstDummy(password: string): Promise<void> {
    await verify(await this.dummy(), password);
  }

  private dummy(): Promise<string> {
    this.dummyHash ??= hash('liftwright-no-such-account', ARGON2_OPTIONS);
    return this.dummyHash;
  }
}
