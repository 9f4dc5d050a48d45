import { Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import { User } from '../../users/entities/user.entity';

/** A one-time password reset link; only the SHA-256 of the token is kept. */
@Entity()
export class PasswordResetToken extends BaseEntity<'usedAt'> {
  @ManyToOne(() => User, { deleteRule: 'cascade' })
  @Index()
  user: User;

  /** Hex SHA-256 of the token sent in the e-mail. */
  @Property({ type: 'string', length: 64, unique: true })
  tokenHash: string;

  @Property({ type: 'datetime', columnType: 'timestamptz' })
  expiresAt: Date;

  @Property({ type: 'datetime', columnType: 'timestamptz', nullable: true })
  usedAt?: Date;

  constructor(user: User, tokenHash: string, expiresAt: Date) {
    super();
    this.user = user;
    this.tokenHash = tokenHash;
    this.expiresAt = expiresAt;
  }
}
