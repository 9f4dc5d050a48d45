import { createHash } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import type { Pool } from 'pg';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { TooManyAttemptsException } from '../common/errors/too-many-attempts.exception';
import { PG_POOL } from '../database/pg-pool.module';
import { PASSWORD_RESET_THROTTLE, SIGN_IN_THROTTLE } from './password.constants';

export const THROTTLE_TABLE = 'auth_throttle';

/** Keys are hashed: the table holds no e-mail or IP address, and every key fits its column. */
function keyOf(value: string): string {
  return createHash('sha256').update(value).digest('hex');
}

/**
 * Counts failed sign-ins in PostgreSQL (rate-limiter-flexible), per account and per client
 * address, so every API process sees the same counters and nothing lives in process memory.
 */
@Injectable()
export class SignInThrottleService {
  private readonly failuresByAccount: RateLimiterPostgres;
  private readonly failuresByAddress: RateLimiterPostgres;
  private readonly resetMailsByAccount: RateLimiterPostgres;

  constructor(@Inject(PG_POOL) pool: Pool) {
    const store = {
      storeClient: pool,
      storeType: 'pool',
      tableName: THROTTLE_TABLE,
      tableCreated: true,
    };
    this.failuresByAccount = new RateLimiterPostgres({
      ...store,
      keyPrefix: 'sign-in-account',
      points: SIGN_IN_THROTTLE.failuresPerAccount,
      duration: SIGN_IN_THROTTLE.windowSeconds,
    });
    this.failuresByAddress = new RateLimiterPostgres({
      ...store,
      keyPrefix: 'sign-in-address',
      points: SIGN_IN_THROTTLE.failuresPerAddress,
      duration: SIGN_IN_THROTTLE.windowSeconds,
    });
    this.resetMailsByAccount = new RateLimiterPostgres({
      ...store,
      keyPrefix: 'reset-mail-account',
      points: PASSWORD_RESET_THROTTLE.requestsPerAccount,
      duration: PASSWORD_RESET_THROTTLE.windowSeconds,
    });
  }

  /** Throws 429 when the account or the address has used up its failures. */
  async assertSignInAllowed(email: string, address: string): Promise<void> {
    const [account, client] = await Promise.all([
      this.failuresByAccount.get(keyOf(email)),
      this.failuresByAddress.get(keyOf(address)),
    ]);
    const waits = [
      account && account.consumedPoints >= SIGN_IN_THROTTLE.failuresPerAccount
        ? account.msBeforeNext
        : 0,
      client && client.consumedPoints >= SIGN_IN_THROTTLE.failuresPerAddress
        ? client.msBeforeNext
        : 0,
    ];
    const waitMs = Math.max(...waits);
    if (waitMs > 0) throw new TooManyAttemptsException(waitMs);
  }

  async recordFailure(email: string, address: string): Promise<void> {
    await Promise.all([
      this.consume(this.failuresByAccount, keyOf(email)),
      this.consume(this.failuresByAddress, keyOf(address)),
    ]);
  }

  /** A successful sign-in clears the account's failures (the address keeps its count). */
  async recordSuccess(email: string): Promise<void> {
    await this.failuresByAccount.delete(keyOf(email));
  }

  /** False once an account has had its reset e-mails for this window. */
  async allowResetMail(email: string): Promise<boolean> {
    try {
      await this.resetMailsByAccount.consume(keyOf(email));
      return true;
    } catch (error) {
      if (error instanceof RateLimiterRes) return false;
      throw error;
    }
  }

  private async consume(limiter: RateLimiterPostgres, key: string): Promise<void> {
    try {
      await limiter.consume(key);
    } catch (error) {
      // Over the limit already: the next attempt is refused by assertSignInAllowed.
      if (!(error instanceof RateLimiterRes)) throw error;
    }
  }
}
