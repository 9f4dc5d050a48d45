import { argon2id, hash } from 'argon2';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import {
  anonymousSession,
  cookieFrom,
  demoUser,
  registerCustomer,
  signIn,
  signInAs,
} from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

const WRONG_CREDENTIALS = 'E-mail or password is not right';

describe('auth (HTTP)', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  // Every test starts with no failed sign-ins counted (they share one client address).
  afterEach(async () => {
    await testApp.db.query('delete from auth_throttle');
  });

  it('registers a customer, who is then signed in', async () => {
    const session = await registerCustomer(testApp);
    const me = await session.agent.get('/api/auth/me').expect(200);
    expect(me.body).toEqual({
      user: { id: session.id, email: session.email, name: 'Test Customer', role: 'customer' },
    });
  });

  it('regenerates the session at register and keeps only the user id in it', async () => {
    const before = await request(testApp.server).get('/api/auth/csrf').expect(200);
    const anonymousCookie = cookieFrom(before)!;
    const email = `fresh-${Date.now()}@example.test`;
    const registered = await request(testApp.server)
      .post('/api/auth/register')
      .set('Cookie', anonymousCookie)
      .set('x-csrf-token', (before.body as { csrfToken: string }).csrfToken)
      .send({ email, password: 'a-good-long-password', name: 'Fresh Customer' })
      .expect(201);
    const cookie = cookieFrom(registered)!;
    expect(cookie).not.toBe(anonymousCookie);
    await request(testApp.server).get('/api/auth/me').set('Cookie', anonymousCookie).expect(401);
    await request(testApp.server).get('/api/auth/me').set('Cookie', cookie).expect(200);

    const sid = decodeURIComponent(cookie.replace(/^lw\.sid=/, ''))
      .replace(/^s:/, '')
      .split('.')[0];
    const { rows } = await testApp.db.query<{ sess: { passport: unknown } }>(
      'select sess from session where sid = $1',
      [sid],
    );
    expect(rows[0].sess.passport).toEqual({
      user: (registered.body as { user: { id: string } }).user.id,
    });
    expect(JSON.stringify(rows[0].sess)).not.toContain(email);
  });

  it('stores the e-mail address lower-cased and refuses the same address in other letters (409)', async () => {
    const { email } = await registerCustomer(testApp);
    const session = await anonymousSession(testApp);
    const response = await session.agent
      .post('/api/auth/register')
      .set('x-csrf-token', session.csrfToken)
      .send({ email: email.toUpperCase(), password: 'another-long-password', name: 'Someone Else' })
      .expect(409);
    expect(response.body).toMatchObject({ statusCode: 409, error: 'Conflict' });
    expect(response.body.fieldErrors.email).toEqual([expect.any(String)]);
  });

  it('signs in the seeded demo users and returns a new CSRF token', async () => {
    const session = await anonymousSession(testApp);
    const response = await session.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', session.csrfToken)
      .send({ email: 'Manager@Liftwright.example', password: demoUser('manager').password })
      .expect(200);
    expect(response.body.user).toMatchObject({
      email: 'manager@liftwright.example',
      role: 'manager',
    });
    expect(response.body.csrfToken).toEqual(expect.any(String));
    expect(response.body.csrfToken).not.toBe(session.csrfToken);
    expect(response.body.user).not.toHaveProperty('passwordHash');
  });

  it('answers a wrong password and an unknown e-mail with the same 401', async () => {
    const session = await anonymousSession(testApp);
    const wrongPassword = await session.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', session.csrfToken)
      .send({ email: demoUser('desk').email, password: 'not-the-password' })
      .expect(401);
    const unknownEmail = await session.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', session.csrfToken)
      .send({ email: 'nobody@example.test', password: 'not-the-password' })
      .expect(401);
    expect(wrongPassword.body.message).toBe(WRONG_CREDENTIALS);
    const { requestId: _a, ...wrongPasswordBody } = wrongPassword.body as Record<string, unknown>;
    const { requestId: _b, ...unknownEmailBody } = unknownEmail.body as Record<string, unknown>;
    expect(unknownEmailBody).toEqual(wrongPasswordBody);
  });

  it('throttles an account after 5 failed sign-ins with 429 and Retry-After, even for the right password', async () => {
    const customer = await registerCustomer(testApp);
    const session = await anonymousSession(testApp);
    const attempt = (password: string) =>
      session.agent
        .post('/api/auth/sign-in')
        .set('x-csrf-token', session.csrfToken)
        .send({ email: customer.email, password });
    for (let failure = 1; failure <= 5; failure += 1) {
      await attempt('wrong-password').expect(401);
    }
    const throttled = await attempt('wrong-password').expect(429);
    expect(Number(throttled.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(throttled.headers['retry-after'])).toBeLessThanOrEqual(15 * 60);
    expect(throttled.body.message).toMatch(/^Too many attempts\. Try again in \d+ minutes?\.$/);
    await attempt(customer.password).expect(429);
  });

  it('forgets an account’s failures after a successful sign-in', async () => {
    const customer = await registerCustomer(testApp);
    const session = await anonymousSession(testApp);
    const attempt = (password: string) =>
      session.agent
        .post('/api/auth/sign-in')
        .set('x-csrf-token', session.csrfToken)
        .send({ email: customer.email, password });
    for (let failure = 1; failure <= 4; failure += 1) await attempt('wrong-password').expect(401);
    const success = await attempt(customer.password).expect(200);
    session.csrfToken = (success.body as { csrfToken: string }).csrfToken;
    // Four more failures would have made nine without the reset.
    for (let failure = 1; failure <= 4; failure += 1) await attempt('wrong-password').expect(401);
    await attempt(customer.password).expect(200);
  });

  it('throttles a client address after 20 failed sign-ins across accounts', async () => {
    const session = await anonymousSession(testApp);
    const attempt = (email: string, password: string) =>
      session.agent
        .post('/api/auth/sign-in')
        .set('x-csrf-token', session.csrfToken)
        .send({ email, password });
    for (let failure = 1; failure <= 20; failure += 1) {
      await attempt(`stranger-${failure}@example.test`, 'wrong-password').expect(401);
    }
    await attempt('stranger-21@example.test', 'wrong-password').expect(429);
    await attempt(demoUser('tech').email, demoUser('tech').password).expect(429);
  });

  it('gives a new session cookie at sign-in; the cookie from before sign-in is not signed in', async () => {
    const before = await request(testApp.server).get('/api/auth/csrf').expect(200);
    const anonymousCookie = cookieFrom(before);
    expect(anonymousCookie).toBeDefined();
    const signedIn = await request(testApp.server)
      .post('/api/auth/sign-in')
      .set('Cookie', anonymousCookie!)
      .set('x-csrf-token', (before.body as { csrfToken: string }).csrfToken)
      .send({ email: demoUser('customer').email, password: demoUser('customer').password })
      .expect(200);
    const signedInCookie = cookieFrom(signedIn);
    expect(signedInCookie).toBeDefined();
    expect(signedInCookie).not.toBe(anonymousCookie);

    await request(testApp.server).get('/api/auth/me').set('Cookie', signedInCookie!).expect(200);
    await request(testApp.server).get('/api/auth/me').set('Cookie', anonymousCookie!).expect(401);
  });

  it('replaces a signed-in session when signing in again; the old cookie stops working', async () => {
    const { email, password } = demoUser('desk');
    const first = await signIn(testApp, email, password);
    const firstMe = await first.agent.get('/api/auth/me').expect(200);
    expect(firstMe.body.user.role).toBe('desk');
    const firstCookie = (await first.agent.get('/api/auth/csrf')).request.cookies;

    const again = await first.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', first.csrfToken)
      .send({ email, password })
      .expect(200);
    expect(cookieFrom(again)).toBeDefined();
    expect(cookieFrom(again)).not.toBe(firstCookie);
    await request(testApp.server).get('/api/auth/me').set('Cookie', firstCookie).expect(401);
    await first.agent.get('/api/auth/me').expect(200);
  });

  it('signs out: 204, the cookie is cleared and the old cookie is refused', async () => {
    const session = await signInAs(testApp, 'tech');
    const cookie = (await session.agent.get('/api/auth/me').expect(200)).request.cookies;
    // The cookie is "lw.sid=s:<sid>.<signature>", URL-encoded.
    const sid = decodeURIComponent(cookie.replace(/^lw\.sid=/, ''))
      .replace(/^s:/, '')
      .split('.')[0];
    expect((await testApp.db.query('select 1 from session where sid = $1', [sid])).rowCount).toBe(
      1,
    );

    const response = await session.agent
      .post('/api/auth/sign-out')
      .set('x-csrf-token', session.csrfToken)
      .expect(204);
    expect(String(response.headers['set-cookie'])).toMatch(/lw\.sid=;.*Expires=Thu, 01 Jan 1970/);
    expect((await testApp.db.query('select 1 from session where sid = $1', [sid])).rowCount).toBe(
      0,
    );
    await request(testApp.server).get('/api/auth/me').set('Cookie', cookie).expect(401);
  });

  it('ends a signed-in session older than SESSION_MAX_HOURS (absolute lifetime)', async () => {
    const session = await signInAs(testApp, 'customer');
    await session.agent.get('/api/auth/me').expect(200);
    const cookie = (await session.agent.get('/api/auth/me')).request.cookies;
    const sid = decodeURIComponent(cookie.replace(/^lw\.sid=/, ''))
      .replace(/^s:/, '')
      .split('.')[0];
    // 12 h (the default SESSION_MAX_HOURS) and one minute ago.
    const createdAtMs = Date.now() - (12 * 60 + 1) * 60_000;
    const updated = await testApp.db.query(
      `update session set sess = jsonb_set(sess::jsonb, '{createdAtMs}', to_jsonb($2::bigint))::json where sid = $1`,
      [sid, createdAtMs],
    );
    expect(updated.rowCount).toBe(1);
    await session.agent.get('/api/auth/me').expect(401);
    expect((await testApp.db.query('select 1 from session where sid = $1', [sid])).rowCount).toBe(
      0,
    );
  });

  it('ends a session that was idle past SESSION_IDLE_MINUTES', async () => {
    const session = await signInAs(testApp, 'customer');
    const cookie = (await session.agent.get('/api/auth/me').expect(200)).request.cookies;
    const sid = decodeURIComponent(cookie.replace(/^lw\.sid=/, ''))
      .replace(/^s:/, '')
      .split('.')[0];
    const row = await testApp.db.query<{ idle_minutes: number }>(
      `select round(extract(epoch from (expire - now()::timestamp)) / 60) as idle_minutes from session where sid = $1`,
      [sid],
    );
    // The store's expiry is the idle timeout (30 minutes by default), renewed on each request.
    expect(Number(row.rows[0].idle_minutes)).toBe(30);
    await testApp.db.query(
      `update session set expire = now() - interval '1 second' where sid = $1`,
      [sid],
    );
    await session.agent.get('/api/auth/me').expect(401);
  });

  it('sets the session cookie HttpOnly and SameSite=Lax (not Secure over http)', async () => {
    const response = await request(testApp.server).get('/api/auth/csrf').expect(200);
    const header = (response.headers['set-cookie'] as unknown as string[]).find((value) =>
      value.startsWith('lw.sid='),
    );
    expect(header).toMatch(/HttpOnly/);
    expect(header).toMatch(/SameSite=Lax/);
    expect(header).not.toMatch(/Secure/);
  });

  it('refuses a POST without the CSRF token (403) and creates nothing', async () => {
    const session = await anonymousSession(testApp);
    const email = `no-token-${Date.now()}@example.test`;
    const response = await session.agent
      .post('/api/auth/register')
      .send({ email, password: 'a-good-long-password', name: 'No Token' })
      .expect(403);
    expect(response.body).toMatchObject({
      statusCode: 403,
      error: 'Forbidden',
      message: 'Missing or invalid CSRF token',
    });
    await session.agent
      .post('/api/auth/register')
      .set('x-csrf-token', 'not-the-token')
      .send({ email, password: 'a-good-long-password', name: 'No Token' })
      .expect(403);
    const rows = await testApp.db.query('select 1 from "user" where email = $1', [email]);
    expect(rows.rowCount).toBe(0);
  });

  it('refuses the token of one session sent with another session', async () => {
    const first = await anonymousSession(testApp);
    const second = await anonymousSession(testApp);
    await second.agent
      .post('/api/auth/password-reset')
      .set('x-csrf-token', first.csrfToken)
      .send({ email: 'someone@example.test' })
      .expect(403);
  });

  it('stores the password as argon2id with at least m=19456 KiB and t=2', async () => {
    const customer = await registerCustomer(testApp);
    const { rows } = await testApp.db.query<{ password_hash: string }>(
      'select password_hash from "user" where id = $1',
      [customer.id],
    );
    const phc = rows[0].password_hash;
    const match =
      /^\$(argon2(?:id|i|d))\$v=(\d+)\$m=(\d+),t=(\d+),p=(\d+)\$[A-Za-z0-9+/]+\$[A-Za-z0-9+/]+$/.exec(
        phc.replace(/\$m=(\d+),p=(\d+),t=(\d+)\$/, '$m=$1,t=$3,p=$2$'),
      );
    expect(match).not.toBeNull();
    const [, variant, , memoryKiB, iterations, parallelism] = match!;
    // Source: OWASP Password Storage Cheat Sheet, Argon2id (m=19456 KiB (19 MiB), t=2, p=1 minimum)
    expect(variant).toBe('argon2id');
    expect(Number(memoryKiB)).toBeGreaterThanOrEqual(19456);
    expect(Number(iterations)).toBeGreaterThanOrEqual(2);
    expect(Number(parallelism)).toBeGreaterThanOrEqual(1);
    expect(phc).not.toContain(customer.password);
  });

  it('replaces a hash made with weaker settings at the next sign-in', async () => {
    const customer = await registerCustomer(testApp);
    const weak = await hash(customer.password, {
      type: argon2id,
      memoryCost: 4096,
      timeCost: 1,
      parallelism: 1,
    });
    await testApp.db.query('update "user" set password_hash = $2 where id = $1', [
      customer.id,
      weak,
    ]);
    await signIn(testApp, customer.email, customer.password);
    const { rows } = await testApp.db.query<{ password_hash: string }>(
      'select password_hash from "user" where id = $1',
      [customer.id],
    );
    expect(rows[0].password_hash).not.toBe(weak);
    expect(rows[0].password_hash).toMatch(/^\$argon2id\$v=19\$m=19456,/);
  });

  it('answers /me with 401 and the error shape when not signed in', async () => {
    const response = await request(testApp.server).get('/api/auth/me').expect(401);
    expect(response.body).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: expect.any(String),
      requestId: response.headers['x-request-id'],
    });
  });
});
