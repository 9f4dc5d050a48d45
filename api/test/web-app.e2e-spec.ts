import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './support/test-app';

const INDEX_HTML =
  '<!doctype html><html><body><div id="root"></div><script type="module" src="/assets/app-3f2a.js"></script></body></html>';

describe('serving the built web app (WEB_DIST_DIR)', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    const folder = mkdtempSync(join(tmpdir(), 'liftwright-web-'));
    mkdirSync(join(folder, 'assets'));
    writeFileSync(join(folder, 'index.html'), INDEX_HTML);
    writeFileSync(join(folder, 'assets', 'app-3f2a.js'), 'console.log("planner");');
    process.env.WEB_DIST_DIR = folder;
    testApp = await startTestApp();
  });

  afterAll(async () => {
    delete process.env.WEB_DIST_DIR;
    await testApp.close();
  });

  it('serves index.html at / and for client-side routes', async () => {
    for (const path of ['/', '/sign-in', '/manage/staff', '/reset-password?token=abc']) {
      const response = await request(testApp.server).get(path).expect(200);
      expect(response.headers['content-type']).toMatch(/text\/html/);
      expect(response.text).toBe(INDEX_HTML);
      expect(response.headers['content-security-policy']).toContain("script-src 'self'");
    }
  });

  it('serves the built files, hashed assets with a long cache', async () => {
    const response = await request(testApp.server).get('/assets/app-3f2a.js').expect(200);
    expect(response.text).toContain('planner');
    expect(response.headers['cache-control']).toContain('immutable');
  });

  it('answers a missing file with 404, not index.html', async () => {
    await request(testApp.server).get('/assets/missing-1234.js').expect(404);
  });

  it('keeps /api for the API: unknown API paths are JSON 404s', async () => {
    const response = await request(testApp.server).get('/api/not-a-route').expect(404);
    expect(response.body).toMatchObject({ statusCode: 404, error: 'Not Found' });
    await request(testApp.server).get('/api/health/live').expect(200);
  });
});
