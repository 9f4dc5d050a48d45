import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ReceivedMail } from './support/mailbox';
import {
  anonymousSession,
  demoUser,
  registerCustomer,
  signIn,
  signInAs,
  type Session,
} from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface CustomerBody {
  id: string;
  name: string;
  email: string;
  createdAt: string;
}

interface ErrorBody {
  message: string;
  fieldErrors?: Record<string, string[]>;
}

function linkTokenFrom(mail: ReceivedMail): string {
  const match = /http:\/\/127\.0\.0\.1:4400\/reset-password\?token=([A-Za-z0-9_-]+)/.exec(
    mail.text,
  );
  if (!match) throw new Error(`No set-password link in:\n${mail.text}`);
  return match[1];
}

let counter = 0;
function uniqueEmail(label: string): string {
  counter += 1;
  return `${label}-${Date.now()}-${counter}@walk-in.example`;
}

describe('customers for walk-in quotes (HTTP, desk and manager)', () => {
  let testApp: TestApp;
  let desk: Session;
  let manager: Session;

  beforeAll(async () => {
    testApp = await startTestApp();
    desk = await signInAs(testApp, 'desk');
    manager = await signInAs(testApp, 'manager');
  });

  afterAll(async () => {
    await testApp.close();
  });

  const create = (session: Session, body: Record<string, unknown>) =>
    session.agent.post('/api/customers').set('x-csrf-token', session.csrfToken).send(body);

  const search = async (session: Session, q?: string): Promise<CustomerBody[]> => {
    const response = await session.agent
      .get('/api/customers')
      .query(q === undefined ? {} : { q })
      .expect(200);
    return (response.body as { items: CustomerBody[] }).items;
  };

  const usersWithEmail = async (email: string): Promise<number> =>
    (await testApp.db.query('select 1 from "user" where email = $1', [email])).rows.length;

  describe('creating', () => {
    it('creates a customer who gets a set-password e-mail whose link lets them sign in', async () => {
      const email = uniqueEmail('Ari.Pellow');
      const before = testApp.mailbox.messages.length;
      const response = await create(desk, { name: '  Ari   Pellow ', email: ` ${email} ` }).expect(
        201,
      );
      const customer = response.body as CustomerBody;
      expect(customer).toEqual({
        id: expect.any(String),
        name: 'Ari Pellow',
        email: email.toLowerCase(),
        createdAt: expect.any(String),
      });
      const row = await testApp.db.query<{ role: string; active: boolean }>(
        'select role, active from "user" where id = $1',
        [customer.id],
      );
      expect(row.rows).toEqual([{ role: 'customer', active: true }]);

      const mail = await testApp.mailbox.waitFor(customer.email, before);
      expect(mail.subject).toBe('Choose a password for your Liftwright account');
      expect(mail.text).toContain('Hello Ari Pellow,');
      expect(mail.text).toContain('within 72 hours');
      const token = linkTokenFrom(mail);
      expect(mail.html).toContain(token);
      expect(mail.raw).not.toContain(customer.id);

      // Only the token's hash is kept, valid for 72 hours from its creation.
      const stored = await testApp.db.query<{ token_hash: string; hours: number }>(
        `select token_hash, extract(epoch from expires_at - created_at) / 3600 as hours
           from password_reset_token where user_id = $1`,
        [customer.id],
      );
      expect(stored.rows).toHaveLength(1);
      expect(stored.rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/);
      expect(stored.rows[0].token_hash).not.toContain(token);
      expect(Number(stored.rows[0].hours)).toBeCloseTo(72, 2);

      // Nobody knows the account's first password.
      const visitor = await anonymousSession(testApp);
      await visitor.agent
        .post('/api/auth/sign-in')
        .set('x-csrf-token', visitor.csrfToken)
        .send({ email: customer.email, password: 'a-good-long-password' })
        .expect(401);

      await visitor.agent
        .post('/api/auth/password-reset/confirm')
        .set('x-csrf-token', visitor.csrfToken)
        .send({ token, password: 'ari-chose-this-one' })
        .expect(204);
      const signedIn = await signIn(testApp, customer.email, 'ari-chose-this-one');
      const me = await signedIn.agent.get('/api/auth/me').expect(200);
      expect(me.body).toMatchObject({
        user: { id: customer.id, email: customer.email, role: 'customer', name: 'Ari Pellow' },
      });

      // The link works once.
      const again = await visitor.agent
        .post('/api/auth/password-reset/confirm')
        .set('x-csrf-token', visitor.csrfToken)
        .send({ token, password: 'someone-else-tries' })
        .expect(400);
      expect((again.body as ErrorBody).fieldErrors).toEqual({
        token: ['This link has expired or was already used'],
      });
    });

    it('lets a manager create one too', async () => {
      const email = uniqueEmail('manager-made');
      await create(manager, { name: 'Lou Brambell', email }).expect(201);
      expect(await usersWithEmail(email)).toBe(1);
    });

    it('refuses a taken e-mail (any case) with 409 fieldErrors.email, and makes no new link', async () => {
      const email = uniqueEmail('taken');
      await create(desk, { name: 'First Holder', email }).expect(201);
      await testApp.mailbox.waitFor(email);
      const mailsBefore = testApp.mailbox.countTo(email);

      const duplicate = await create(desk, {
        name: 'Second Try',
        email: email.toUpperCase(),
      }).expect(409);
      expect((duplicate.body as ErrorBody).fieldErrors).toEqual({
        email: ['An account with this e-mail address already exists'],
      });
      const staffAddress = await create(desk, {
        name: 'Not A Customer',
        email: demoUser('tech').email,
      }).expect(409);
      expect((staffAddress.body as ErrorBody).fieldErrors).toHaveProperty('email');
      expect(await usersWithEmail(email)).toBe(1);
      // A set-password e-mail goes only with a new link: still the first account's one link.
      const links = await testApp.db.query(
        'select 1 from password_reset_token t join "user" u on u.id = t.user_id where u.email = $1',
        [email],
      );
      expect(links.rows).toHaveLength(1);
      expect(testApp.mailbox.countTo(email)).toBe(mailsBefore);
    });

    it.each([
      [{ email: 'no-name@walk-in.example' }, 'name'],
      [{ name: '   ', email: 'blank-name@walk-in.example' }, 'name'],
      [{ name: 'N'.repeat(101), email: 'long-name@walk-in.example' }, 'name'],
      [{ name: 'No Email' }, 'email'],
      [{ name: 'Bad Email', email: 'not-an-address' }, 'email'],
    ])('refuses %j with fieldErrors.%s and creates nothing', async (body, field) => {
      const response = await create(desk, body).expect(400);
      expect(Object.keys((response.body as ErrorBody).fieldErrors ?? {})).toEqual([field]);
      const email = (body as { email?: string }).email;
      if (email) expect(await usersWithEmail(email)).toBe(0);
    });

    it('refuses an unknown field and a role sent along', async () => {
      const email = uniqueEmail('with-role');
      const response = await create(desk, { name: 'Sneaky', email, role: 'manager' }).expect(400);
      expect((response.body as ErrorBody).fieldErrors).toEqual({
        role: ['is not an expected field'],
      });
      expect(await usersWithEmail(email)).toBe(0);
    });
  });

  describe('searching', () => {
    it('finds customers by part of the name or e-mail in any case, by name', async () => {
      const tag = `Quillon${Date.now()}`;
      const zed = await create(desk, {
        name: `Zed ${tag}`,
        email: uniqueEmail('zed'),
      }).expect(201);
      const amy = await create(desk, {
        name: `Amy ${tag}`,
        email: uniqueEmail(`amy-${tag.toLowerCase()}`),
      }).expect(201);

      const byName = await search(desk, tag.toUpperCase());
      expect(byName.map((item) => item.id)).toEqual([amy.body.id, zed.body.id]);
      expect(byName[0]).toEqual(amy.body);

      const byEmail = await search(manager, `AMY-${tag}`);
      expect(byEmail.map((item) => item.id)).toEqual([amy.body.id]);

      // Every word must match somewhere.
      expect((await search(desk, `zed ${tag}`)).map((item) => item.id)).toEqual([zed.body.id]);
      expect(await search(desk, `nobody ${tag}`)).toEqual([]);
    });

    it('answers customers only, never staff', async () => {
      const demoCustomer = demoUser('customer');
      expect((await search(desk, demoCustomer.email)).map((item) => item.email)).toEqual([
        demoCustomer.email,
      ]);
      for (const role of ['desk', 'tech', 'manager'] as const) {
        expect(await search(desk, demoUser(role).email)).toEqual([]);
      }
    });

    it('reads % and _ as themselves, not as patterns', async () => {
      const registered = await registerCustomer(testApp);
      expect(registered.email).not.toMatch(/[%_]/);
      expect(await search(desk, '%')).toEqual([]);
      expect(await search(desk, '_')).toEqual([]);
    });

    it('answers at most 50', async () => {
      const tag = `Bulkrow${Date.now()}`;
      for (let index = 0; index < 55; index += 1) {
        await testApp.db.query(
          `insert into "user" (id, created_at, updated_at, email, name, role, password_hash)
           values ($1, now(), now(), $2, $3, 'customer', 'not-a-hash')`,
          [randomUUID(), `bulk-${index}-${tag.toLowerCase()}@walk-in.example`, `${tag} ${index}`],
        );
      }
      expect(await search(desk, tag)).toHaveLength(50);
      expect(await search(desk)).toHaveLength(50);
    });

    it('refuses a search longer than 100 characters', async () => {
      const response = await desk.agent
        .get('/api/customers')
        .query({ q: 'x'.repeat(101) })
        .expect(400);
      expect((response.body as ErrorBody).fieldErrors).toHaveProperty('q');
    });
  });

  describe('access', () => {
    it('is for desk and manager: a customer or tech gets 403, a guest 401', async () => {
      const customer = await signInAs(testApp, 'customer');
      const tech = await signInAs(testApp, 'tech');
      for (const session of [customer, tech]) {
        await session.agent.get('/api/customers').expect(403);
        const email = uniqueEmail('forbidden');
        await create(session, { name: 'Not Allowed', email }).expect(403);
        expect(await usersWithEmail(email)).toBe(0);
      }
      const guest = await anonymousSession(testApp);
      await guest.agent.get('/api/customers').expect(401);
      await create(guest, { name: 'Guest', email: uniqueEmail('guest') }).expect(401);
      await desk.agent
        .post('/api/customers')
        .send({ name: 'No Token', email: uniqueEmail('no-token') })
        .expect(403);
    });
  });
});
