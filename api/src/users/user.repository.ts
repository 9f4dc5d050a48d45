import { EntityRepository } from '@mikro-orm/postgresql';
import type { User } from './entities/user.entity';

export class UserRepository extends EntityRepository<User> {
  findByEmail(email: string): Promise<User | null> {
    return this.findOne({ email: email.trim().toLowerCase() });
  }
}
