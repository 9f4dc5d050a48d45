import { Entity, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * A counter of rate-limiter-flexible's RateLimiterPostgres (sign-in throttling), in the layout
 * that library creates. Mapped so that migrations own the table; written by the library only.
 */
@Entity({ tableName: 'auth_throttle' })
export class AuthThrottleCounter {
  @PrimaryKey({ type: 'string', length: 255 })
  key!: string;

  @Property({ type: 'integer', default: 0 })
  points!: number;

  /** Milliseconds since the epoch. */
  @Property({ type: 'bigint', nullable: true })
  expire?: string;
}
