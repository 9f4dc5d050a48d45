import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, newPage, screenshot } from '../support/browser';
import { waitForMessage } from '../support/inbox';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('a customer who forgot their password', () => {
  it('resets it through the e-mailed link, which then stops working', async () => {
    const { context, page } = await newPage(browser, 'phone');
    const email = `forgetful.${Date.now()}@example.test`;
    await page.goto('/register');
    await page.getByLabel('Name').fill('Robin Example');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill('first-passphrase-1');
    await page.getByLabel('Confirm password').fill('first-passphrase-1');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL('**/account');
    await page.getByRole('button', { name: 'Account menu' }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.waitForURL((url) => !url.pathname.startsWith('/account'));

    await page.goto('/forgot-password');
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('button', { name: /send/i }).click();
    await screenshot(page, 'password-reset', 'requested');

    const message = await waitForMessage(email, /password/i);
    const link = (message.text ?? '').match(/https?:\/\/\S+reset-password\?token=[\w-]+/)?.[0];
    expect(link, 'the e-mail carries a reset link').toBeTruthy();
    expect(message.html ?? '').toContain('reset-password?token=');

    await page.goto(link!);
    await page.getByLabel('New password', { exact: true }).fill('second-passphrase-2');
    await page.getByLabel('Confirm new password').fill('second-passphrase-2');
    await page.getByRole('button', { name: /set password|reset password|save/i }).click();
    await page.waitForURL('**/sign-in**');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('second-passphrase-2');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/account');

    // The link is single-use.
    const reuse = await page.evaluate(async (token) => {
      const csrf = (await (await fetch('/api/auth/csrf')).json()).csrfToken as string;
      const response = await fetch('/api/auth/password-reset/confirm', {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-csrf-token': csrf },
        body: JSON.stringify({ token, password: 'third-passphrase-3' }),
      });
      return response.status;
    }, new URL(link!).searchParams.get('token'));
    expect(reuse).toBe(400);
    await context.close();
  });
});
