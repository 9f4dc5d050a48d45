import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import { User } from './entities/user.entity';
import { UserRepository } from './user.repository';

@Injectable()
export class UsersService {
  constructor(
    private readonly em: EntityManager,
    private readonly users: UserRepository,
  ) {}

  /** The user behind a session, or null when the account is gone or switched off. */
  findActiveById(id: string): Promise<User | null> {
    return this.users.findOne({ id, active: true });
  }

  /** For sign-in: loads the (lazy) password hash too. */
  findByEmailWithPassword(email: string): Promise<User | null> {
    return this.users.findOne(
      { email: email.trim().toLowerCase() },
      { populate: ['passwordHash'] },
    );
  }

  findByEmail(email: string): Promise<User | null> {
    return this.users.findByEmail(email);
  }

  async emailTaken(email: string): Promise<boolean> {
    return (await this.users.count({ email: email.trim().toLowerCase() })) > 0;
  }

  async save(user: User): Promise<void> {
    await this.em.persistAndFlush(user);
  }
}
