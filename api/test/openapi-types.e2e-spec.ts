import { readFileSync } from 'node:fs';
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
    const committed = readFileSync(join(repoRoot, GENERATED_TYPES_PATH), 'utf8');
    expect(committed, `${GENERATED_TYPES_PATH} is stale: run \`npm run openapi:types\``).toBe(
      expected,
    );
  });
});
