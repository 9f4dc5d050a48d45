import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { DEMO_USERS } from '../../src/database/seeders/demo-users.seeder';
import type { Role } from '../../src/users/user-role';
import type { TestApp } from './test-app';

export interface Session {
  agent: TestAgent;
  csrfToken: string;
}

export function cookieFrom(response: request.Response, name = 'lw.sid'): string | undefined {
  const header = response.headers['set-cookie'] as unknown;
  const cookies = Array.isArray(header)
    ? (header as string[])
    : typeof header === 'string'
      ? [header]
      : [];
  const cookie = cookies.find((value) => value.startsWith(`${name}=`));
  return cookie?.split(';')[0];
}

/** A cookie-keeping client with the CSRF token of its (anonymous) session. */
export async function anonymousSession(testApp: TestApp): Promise<Session> {
  const agent = request.agent(testApp.server);
  const response = await agent.get('/api/auth/csrf').expect(200);
  return { agent, csrfToken: (response.body as { csrfToken: string }).csrfToken };
}

export async function signIn(testApp: TestApp, email: string, password: string): Promise<Session> {
  const session = await anonymousSession(testApp);
  const response = await session.agent
    .post('/api/auth/sign-in')
    .set('x-csrf-token', session.csrfToken)
    .send({ email, password })
    .expect(200);
  return { agent: session.agent, csrfToken: (response.body as { csrfToken: string }).csrfToken };
}

export function demoUser(role: Role): { email: string; password: string; name: string } {
  const user = DEMO_USERS.find((demo) => demo.role === role);
  if (!user) throw new Error(`No demo user with role ${role}`);
  return user;
}

export function signInAs(testApp: TestApp, role: Role): Promise<Session> {
  const user = demoUser(role);
  return signIn(testApp, user.email, user.password);
}

let counter = 0;
/** A new customer account with a unique address, signed in. */
export async function registerCustomer(
  testApp: TestApp,
  password = 'a-good-long-password',
): Promise<Session & { email: string; password: string; id: string }> {
  counter += 1;
  const email = `customer-${Date.now()}-${counter}@example.test`;
  const session = await anonymousSession(testApp);
  const response = await session.agent
    .post('/api/auth/register')
    .set('x-csrf-token', session.csrfToken)
    .send({ email, password, name: 'Test Customer' })
    .expect(201);
  const body = response.body as { csrfToken: string; user: { id: string } };
  return { agent: session.agent, csrfToken: body.csrfToken, email, password, id: body.user.id };
}
