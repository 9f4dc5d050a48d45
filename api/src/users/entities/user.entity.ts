import { Check, Entity, EntityRepositoryType, Enum, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import { ROLES, type Role } from '../user-role';
import { UserRepository } from '../user.repository';

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

@Entity({ repository: () => UserRepository })
@Check({ name: 'user_email_lower_case_check', expression: 'email = lower(email)' })
export class User extends BaseEntity<'active'> {
  [EntityRepositoryType]?: UserRepository;

  /** Stored lower-cased, so the unique index makes e-mail addresses case-insensitive. */
  @Property({ type: 'string', length: 254, unique: true })
  email: string;

  @Property({ type: 'string', length: 100 })
  name: string;

  @Enum({ items: () => [...ROLES], type: 'string' })
  role: Role;

  /** argon2id PHC string; never serialised. */
  @Property({ type: 'text', hidden: true, lazy: true })
  passwordHash: string;

  @Property({ type: 'boolean', default: true })
  active: boolean = true;

  constructor(email: string, name: string, role: Role, passwordHash: string) {
    super();
    this.email = normaliseEmail(email);
    this.name = name.trim();
    this.role = role;
    this.passwordHash = passwordHash;
  }
}
