import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ReceivedMail } from './support/mailbox';
import { anonymousSession, registerCustomer, signIn, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

const LINK_INVALID = 'This link has expired or was already used';

function tokenFrom(mail: ReceivedMail): string {
  const match = /http:\/\/127\.0\.0\.1:4400\/reset-password\?token=([A-Za-z0-9_-]+)/.exec(
    mail.text,
  );
  if (!match) throw new Error(`No reset link in:\n${mail.text}`);
  return match[1];
}

describe('password reset (HTTP)', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  async function requestReset(session: Session, email: string): Promise<ReceivedMail> {
    const before = testApp.mailbox.messages.length;
    const response = await session.agent
      .post('/api/auth/password-reset')
      .set('x-csrf-token', session.csrfToken)
      .send({ email })
      .expect(202);
    expect(response.body).toEqual({});
    return testApp.mailbox.waitFor(email, before);
  }

  function confirm(session: Session, token: string, password: string) {
    return session.agent
      .post('/api/auth/password-reset/confirm')
      .set('x-csrf-token', session.csrfToken)
      .send({ token, password });
  }

  it('e-mails a link (text and HTML, no ids) that sets a new password once', async () => {
    const customer = await registerCustomer(testApp);
    const visitor = await anonymousSession(testApp);
    const mail = await requestReset(visitor, customer.email);

    expect(mail.subject).toBe('Reset your Liftwright password');
    expect(mail.text).toContain('Liftwright');
    expect(mail.html).toContain('<a href="http://127.0.0.1:4400/reset-password?token=');
    expect(mail.raw).not.toContain(customer.id);
    const token = tokenFrom(mail);
    expect(mail.html).toContain(token);

    // Only the hash of the token is stored.
    const stored = await testApp.db.query<{ token_hash: string }>(
      'select token_hash from password_reset_token t join "user" u on u.id = t.user_id where u.email = $1',
      [customer.email],
    );
    expect(stored.rows).toHaveLength(1);
    expect(stored.rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored.rows[0].token_hash).not.toContain(token);

    await confirm(visitor, token, 'the-new-long-password').expect(204);
    await signIn(testApp, customer.email, 'the-new-long-password');
    await visitor.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', visitor.csrfToken)
      .send({ email: customer.email, password: customer.password })
      .expect(401);

    const again = await confirm(visitor, token, 'yet-another-password').expect(400);
    expect(again.body.fieldErrors).toEqual({ token: [LINK_INVALID] });
  });

  it('refuses a link after its hour is over', async () => {
    const customer = await registerCustomer(testApp);
    const visitor = await anonymousSession(testApp);
    const token = tokenFrom(await requestReset(visitor, customer.email));
    const aged = await testApp.db.query(
      `update password_reset_token set expires_at = now() - interval '1 minute'
         where user_id = (select id from "user" where email = $1)`,
      [customer.email],
    );
    expect(aged.rowCount).toBe(1);
    const response = await confirm(visitor, token, 'the-new-long-password').expect(400);
    expect(response.body).toMatchObject({
      statusCode: 400,
      fieldErrors: { token: [LINK_INVALID] },
    });
    await signIn(testApp, customer.email, customer.password);
  });

  it('makes the link valid for one hour', async () => {
    const customer = await registerCustomer(testApp);
    const visitor = await anonymousSession(testApp);
    await requestReset(visitor, customer.email);
    const { rows } = await testApp.db.query<{ minutes: string }>(
      `select round(extract(epoch from (expires_at - created_at)) / 60) as minutes
         from password_reset_token where user_id = (select id from "user" where email = $1)`,
      [customer.email],
    );
    expect(Number(rows[0].minutes)).toBe(60);
  });

  it('signs the user out of their other sessions when the password is reset', async () => {
    const customer = await registerCustomer(testApp);
    await customer.agent.get('/api/auth/me').expect(200);
    const visitor = await anonymousSession(testApp);
    const token = tokenFrom(await requestReset(visitor, customer.email));
    await confirm(visitor, token, 'the-new-long-password').expect(204);
    await customer.agent.get('/api/auth/me').expect(401);
  });

  it('only the newest link works', async () => {
    const customer = await registerCustomer(testApp);
    const visitor = await anonymousSession(testApp);
    const first = tokenFrom(await requestReset(visitor, customer.email));
    const second = tokenFrom(await requestReset(visitor, customer.email));
    expect(second).not.toBe(first);
    await confirm(visitor, first, 'the-new-long-password').expect(400);
    await confirm(visitor, second, 'the-new-long-password').expect(204);
  });

  it('answers 202 for an unknown address and sends nothing', async () => {
    const visitor = await anonymousSession(testApp);
    const email = 'nobody-here@example.test';
    const response = await visitor.agent
      .post('/api/auth/password-reset')
      .set('x-csrf-token', visitor.csrfToken)
      .send({ email })
      .expect(202);
    expect(response.body).toEqual({});
    // A known address gets its e-mail within this time (see the tests above).
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(testApp.mailbox.countTo(email)).toBe(0);
  });

  it('refuses a made-up token and a too-short new password with field errors', async () => {
    const visitor = await anonymousSession(testApp);
    const madeUp = await confirm(visitor, 'made-up-token', 'the-new-long-password').expect(400);
    expect(madeUp.body.fieldErrors).toEqual({ token: [LINK_INVALID] });
    const short = await confirm(visitor, 'made-up-token', 'short').expect(400);
    expect(short.body.fieldErrors.password).toEqual(['must be 8 to 128 characters']);
  });

  it('sends an account at most 5 reset e-mails an hour, and still answers 202', async () => {
    const customer = await registerCustomer(testApp);
    const visitor = await anonymousSession(testApp);
    for (let request = 1; request <= 6; request += 1) {
      await visitor.agent
        .post('/api/auth/password-reset')
        .set('x-csrf-token', visitor.csrfToken)
        .send({ email: customer.email })
        .expect(202);
    }
    await testApp.mailbox.waitFor(customer.email, 0);
    await new Promise((resolve) => setTimeout(resolve, 500));
    expect(testApp.mailbox.countTo(customer.email)).toBe(5);
  });

  it('needs the CSRF token', async () => {
    await request(testApp.server)
      .post('/api/auth/password-reset')
      .send({ email: 'someone@example.test' })
      .expect(403);
  });
});
