import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, newPage, screenshot, type ViewportName } from '../support/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('a new customer registers', () => {
  for (const viewport of ['phone', 'desktop'] as ViewportName[]) {
    it(`registers and lands on their home, then signs out (${viewport})`, async () => {
      const { context, page } = await newPage(browser, viewport);
      const email = `new.owner.${viewport}.${Date.now()}@example.test`;
      await page.goto('/');
      await screenshot(page, 'customer-registers', 'home');
      await page.goto('/register');
      await page.getByLabel('Name').fill('Dana Example');
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password', { exact: true }).fill('short');
      await page.getByLabel('Confirm password').fill('short');
      await page.getByRole('button', { name: 'Create account' }).click();
      // The client-side schema mirrors the server: at least 8 characters.
      await expect.poll(() => page.getByText(/at least 8 characters/i).count()).toBeGreaterThan(0);
      await page.getByLabel('Password', { exact: true }).fill('a-long-enough-passphrase');
      await page.getByLabel('Confirm password').fill('a-long-enough-passphrase');
      await screenshot(page, 'customer-registers', 'register');
      await page.getByRole('button', { name: 'Create account' }).click();

      await page.waitForURL('**/account');
      await expect
        .poll(() => page.getByRole('heading', { level: 1, name: 'Your garage' }).isVisible())
        .toBe(true);
      await screenshot(page, 'customer-registers', 'customer-home');

      // The session is real: the API knows who this is.
      const me = await page.evaluate(async () => (await fetch('/api/auth/me')).json());
      expect(me.user).toMatchObject({ email, role: 'customer' });

      await page.getByRole('button', { name: 'Account menu' }).click();
      await page.getByRole('menuitem', { name: 'Sign out' }).click();
      await page.waitForURL((url) => !url.pathname.startsWith('/account'));
      const after = await page.evaluate(async () => (await fetch('/api/auth/me')).status);
      expect(after).toBe(401);
      // A signed-out visitor who asks for a customer page is sent to sign in.
      await page.goto('/account');
      await page.waitForURL('**/sign-in**');
      await context.close();
    });
  }
});
