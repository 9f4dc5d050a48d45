import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousSession, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

function expectNoStack(body: unknown): void {
  const text = JSON.stringify(body);
  expect(text).not.toMatch(/\bat .+\.(?:js|ts):\d+/);
  expect(body).not.toHaveProperty('stack');
}

describe('validation and error shape (HTTP)', () => {
  let testApp: TestApp;
  let visitor: Session;

  beforeAll(async () => {
    testApp = await startTestApp();
    visitor = await anonymousSession(testApp);
  });

  afterAll(async () => {
    await testApp.close();
  });

  const register = (body: unknown) =>
    visitor.agent
      .post('/api/auth/register')
      .set('x-csrf-token', visitor.csrfToken)
      .send(body as object);

  it('answers bad fields with 400, fieldErrors per field and no stack', async () => {
    const response = await register({
      email: 'not-an-address',
      password: 'short',
      name: '',
    }).expect(400);
    expect(response.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Some fields are not valid',
      fieldErrors: {
        email: ['must be an e-mail address'],
        password: ['must be 8 to 128 characters'],
        name: ['must be 1 to 100 characters'],
      },
      requestId: response.headers['x-request-id'],
    });
    expectNoStack(response.body);
  });

  it('rejects an unknown property by its name and creates nothing', async () => {
    const email = `extra-${Date.now()}@example.test`;
    const response = await register({
      email,
      password: 'a-good-long-password',
      name: 'Extra',
      role: 'manager',
    }).expect(400);
    expect(response.body.fieldErrors).toEqual({ role: ['is not an expected field'] });
    const rows = await testApp.db.query('select 1 from "user" where email = $1', [email]);
    expect(rows.rowCount).toBe(0);
  });

  it('refuses a password longer than 128 characters', async () => {
    const response = await register({
      email: 'long@example.test',
      password: 'x'.repeat(129),
      name: 'Long',
    }).expect(400);
    expect(response.body.fieldErrors).toEqual({ password: ['must be 8 to 128 characters'] });
  });

  it('validates the sign-in body with the same shape (before passport runs)', async () => {
    const response = await visitor.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', visitor.csrfToken)
      .send({ email: 'nope', password: 'whatever', remember: true })
      .expect(400);
    expect(response.body.fieldErrors).toEqual({
      email: ['must be an e-mail address'],
      remember: ['is not an expected field'],
    });
  });

  it('answers malformed JSON with 400 in the same shape', async () => {
    const response = await visitor.agent
      .post('/api/auth/register')
      .set('x-csrf-token', visitor.csrfToken)
      .set('content-type', 'application/json')
      .send('{"email": "a@b.example",')
      .expect(400);
    expect(response.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'The request body is not valid JSON',
      requestId: expect.any(String),
    });
    expectNoStack(response.body);
  });

  it('answers an unknown API path with a JSON 404', async () => {
    const response = await request(testApp.server).get('/api/no-such-thing').expect(404);
    expect(response.body).toMatchObject({ statusCode: 404, error: 'Not Found' });
  });

  it('echoes a sane incoming x-request-id and replaces an unsafe one', async () => {
    const kept = await request(testApp.server)
      .get('/api/auth/me')
      .set('x-request-id', 'proxy-1234.abc')
      .expect(401);
    expect(kept.headers['x-request-id']).toBe('proxy-1234.abc');
    expect(kept.body.requestId).toBe('proxy-1234.abc');
    const replaced = await request(testApp.server)
      .get('/api/auth/me')
      .set('x-request-id', '<script>alert(1)</script>')
      .expect(401);
    expect(replaced.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    expect(replaced.body.requestId).toBe(replaced.headers['x-request-id']);
  });
});
