import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, newPage, screenshot, type ViewportName } from '../support/browser';
import { demoUsers } from '../support/env';
import { signIn } from '../support/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('the manager keeps staff accounts', () => {
  for (const viewport of ['desktop', 'phone'] as ViewportName[]) {
    it(`adds a technician, changes them to front desk, and they sign in to the desk (${viewport})`, async () => {
      const email = `new.hand.${viewport}.${Date.now()}@liftwright.example`;
      const name = `Sam Spanner ${viewport} ${Date.now() % 100000}`;
      const manager = await newPage(browser, viewport);
      await signIn(manager.page, demoUsers.manager);
      await manager.page.waitForURL('**/manage');
      await manager.page.goto('/manage/staff');

      await manager.page.getByLabel('Name', { exact: true }).fill(name);
      await manager.page.getByLabel('E-mail', { exact: true }).fill(email);
      await manager.page.getByLabel('Role', { exact: true }).selectOption('tech');
      await manager.page.getByLabel('Password', { exact: true }).fill('spanner-passphrase-1');
      await manager.page.getByRole('button', { name: 'Add staff member' }).click();
      await expect.poll(() => manager.page.getByRole('cell', { name: email }).count()).toBe(1);
      await screenshot(manager.page, 'manage-staff', 'staff-added');

      await manager.page.getByRole('button', { name: `Edit ${name}` }).click();
      const dialog = manager.page.getByRole('dialog', { name: `Edit ${name}` });
      await dialog.getByLabel('Role', { exact: true }).selectOption('desk');
      await dialog.getByRole('button', { name: 'Save changes' }).click();
      await expect.poll(() => dialog.count()).toBe(0);

      // The server holds the change, not only the page.
      const staff = await manager.page.evaluate(async () => (await fetch('/api/staff')).json());
      const added = (staff.items as { email: string; role: string; active: boolean }[]).find(
        (member) => member.email === email,
      );
      expect(added).toMatchObject({ role: 'desk', active: true });
      await manager.context.close();

      const newcomer = await newPage(browser, viewport);
      await signIn(newcomer.page, { email, password: 'spanner-passphrase-1' });
      await newcomer.page.waitForURL('**/desk');
      await expect
        .poll(() =>
          newcomer.page.getByRole('heading', { level: 1, name: 'Front desk' }).isVisible(),
        )
        .toBe(true);
      await newcomer.context.close();
    });
  }

  it('a technician cannot open the staff page or call its API', async () => {
    const { context, page } = await newPage(browser, 'phone');
    await signIn(page, demoUsers.tech);
    await page.waitForURL('**/workshop');
    await page.goto('/manage/staff');
    await page.waitForURL('**/workshop');
    const status = await page.evaluate(async () => (await fetch('/api/staff')).status);
    expect(status).toBe(403);
    await context.close();
  });
});
