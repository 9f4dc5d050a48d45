import { Logger } from '@nestjs/common';
import { afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../src/create-app';

/**
 * Start-up with a bad environment: building the application (AppModule.forRoot(), as main.ts
 * does) must fail with a message that names the variable.
 */
describe('configuration at start-up', () => {
  let saved: NodeJS.ProcessEnv;

  beforeAll(() => {
    // Nest logs the start-up error too; the assertion below is what matters here.
    Logger.overrideLogger(false);
  });

  beforeEach(() => {
    saved = { ...process.env };
  });

  afterEach(() => {
    process.env = saved;
  });

  async function bootstrap(): Promise<unknown> {
    const app = await createApp();
    await app.close();
    return app;
  }

  it.each([
    [
      'SESSION_SECRET',
      'too-short',
      'Configuration error: SESSION_SECRET must be at least 32 characters',
    ],
    ['PORT', 'eighty', 'Configuration error: PORT must be a whole number between 1 and 65535'],
    ['DATABASE_URL', undefined, 'Configuration error: DATABASE_URL is required'],
    [
      'PUBLIC_URL',
      'liftwright.example',
      'Configuration error: PUBLIC_URL must be an http:// or https:// URL',
    ],
    [
      'SMTP_URL',
      'http://127.0.0.1:1025',
      'Configuration error: SMTP_URL must be an smtp:// or smtps:// URL',
    ],
    [
      'PAYMENTS_WEBHOOK_SECRET',
      undefined,
      'Configuration error: PAYMENTS_WEBHOOK_SECRET is required',
    ],
    [
      'PAYMENTS_SECRET_KEY',
      'pk_live_abc',
      'Configuration error: PAYMENTS_SECRET_KEY must be a secret key starting with sk_test_ or sk_live_',
    ],
  ])('refuses to start when %s is %s', async (name, value, message) => {
    if (value === undefined) delete process.env[name];
    else process.env[name] = value;
    await expect(bootstrap()).rejects.toThrow(message);
  });
});
