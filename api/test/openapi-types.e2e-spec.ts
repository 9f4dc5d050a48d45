import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GENERATED_TYPES_PATH, renderApiTypes } from '../../scripts/lib/openapi-types';
import { startTestApp, type TestApp } from './support/test-app';

const repoRoot = join(__dirname, '..', '..');

describe('the web app payload types', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('are generated from the OpenAPI document the API serves now', async () => {
    const document = await request(testApp.server).get('/api/docs-json').expect(200);
    const expected = await renderApiTypes(document.body, repoRoot);
    if (process.env.UPDATE_OPENAPI_TYPES === '1') {
      // Like a snapshot update: write the file from this API instead of comparing (no server
      // needed); the normal run compares again.
      writeFileSync(join(repoRoot, GENERATED_TYPES_PATH), expected);
    }
    const committed = readFileSync(join(repoRoot, GENERATED_TYPES_PATH), 'utf8');
    expect(committed, `${GENERATED_TYPES_PATH} is stale: run \`npm run openapi:types\``).toBe(
      expected,
    );
  });
});
