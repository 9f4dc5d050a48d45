import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './support/test-app';

describe('health, documentation and headers (HTTP)', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('is live', async () => {
    const response = await request(testApp.server).get('/api/health/live').expect(200);
    expect(response.body.status).toBe('ok');
  });

  it('is ready when the database answers', async () => {
    const response = await request(testApp.server).get('/api/health/ready').expect(200);
    expect(response.body).toMatchObject({ status: 'ok', info: { database: { status: 'up' } } });
  });

  it('publishes the OpenAPI document with the access rule of each operation', async () => {
    const response = await request(testApp.server).get('/api/docs-json').expect(200);
    const document = response.body as {
      openapi: string;
      paths: Record<string, Record<string, { 'x-roles'?: string[]; 'x-access'?: string }>>;
    };
    expect(document.openapi).toMatch(/^3\./);
    expect(document.paths['/api/staff'].get['x-roles']).toEqual(['manager']);
    expect(document.paths['/api/auth/sign-in'].post['x-access']).toBe('public');
    const viewer = await request(testApp.server).get('/api/docs').expect(200);
    expect(viewer.text).toContain('swagger');
  });

  it('sends a content security policy that allows the built web app and nothing else', async () => {
    const response = await request(testApp.server).get('/api/health/live').expect(200);
    const policy = String(response.headers['content-security-policy']);
    expect(policy).toContain("default-src 'self'");
    expect(policy).toContain("script-src 'self'");
    expect(policy).toContain("style-src 'self' 'unsafe-inline'");
    expect(policy).toContain("img-src 'self' data:");
    expect(policy).not.toContain("'unsafe-eval'");
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    // Terminus answers health checks with its own "no-cache, no-store, must-revalidate".
    expect(response.headers['cache-control']).toContain('no-store');
  });
});
