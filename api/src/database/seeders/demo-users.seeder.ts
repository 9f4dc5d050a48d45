import type { EntityManager } from '@mikro-orm/core';
import { Seeder } from '@mikro-orm/seeder';
import { PasswordHasher } from '../../auth/password-hasher';
import { User } from '../../users/entities/user.entity';
import type { Role } from '../../users/user-role';

/** The demo sign-ins (fictional people, reserved .example addresses). */
export const DEMO_USERS: ReadonlyArray<{
  email: string;
  password: string;
  name: string;
  role: Role;
}> = [
  {
    email: 'manager@liftwright.example',
    password: 'manager-demo-1',
    name: 'Dana Ridgeway',
    role: 'manager',
  },
  { email: 'desk@liftwright.example', password: 'desk-demo-1', name: 'Bea Corran', role: 'desk' },
  {
    email: 'tech@liftwright.example',
    password: 'tech-demo-1',
    name: 'Jules Hartigan',
    role: 'tech',
  },
  {
    email: 'customer@liftwright.example',
    password: 'customer-demo-1',
    name: 'Robin Yarrow',
    role: 'customer',
  },
];

/** Idempotent: an account that already exists is left exactly as it is. */
export class DemoUsersSeeder extends Seeder {
  async run(em: EntityManager): Promise<void> {
    const hasher = new PasswordHasher();
    const existing = await em.find(User, { email: { $in: DEMO_USERS.map((demo) => demo.email) } });
    const existingEmails = new Set(existing.map((user) => user.email));
    for (const demo of DEMO_USERS) {
      if (existingEmails.has(demo.email)) continue;
      em.persist(new User(demo.email, demo.name, demo.role, await hasher.hash(demo.password)));
    }
    await em.flush();
  }
}
