import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, newPage, screenshot, type ViewportName } from '../support/browser';
import { demoUsers } from '../support/env';
import { signIn, submitSignIn } from '../support/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Where each role lands, its page heading, and the areas its navigation may link to. */
const roles = {
  customer: { home: '/account', heading: 'Your garage', areas: ['/account'] },
  desk: { home: '/desk', heading: 'Front desk', areas: ['/desk'] },
  tech: { home: '/workshop', heading: 'Workshop', areas: ['/workshop'] },
  manager: { home: '/manage', heading: 'Manage', areas: ['/desk', '/manage'] },
} as const;

async function navigationTargets(page: Page): Promise<string[]> {
  return page
    .locator('nav[aria-label="Main"] a[href]')
    .evaluateAll((links) => links.map((a) => new URL((a as HTMLAnchorElement).href).pathname));
}

describe('each role signs in and sees its own navigation', () => {
  for (const viewport of ['phone', 'desktop'] as ViewportName[]) {
    for (const [role, expected] of Object.entries(roles)) {
      it(`${role} (${viewport})`, async () => {
        const { context, page } = await newPage(browser, viewport);
        const account = demoUsers[role as keyof typeof demoUsers];
        await signIn(page, account);
        await page.waitForURL(`**${expected.home}`);
        await expect
          .poll(() => page.getByRole('heading', { level: 1, name: expected.heading }).isVisible())
          .toBe(true);

        const targets = await navigationTargets(page);
        expect(targets.length).toBeGreaterThan(0);
        for (const target of targets) {
          expect(
            expected.areas.some((area) => target.startsWith(area)),
            `${role} nav links to ${target}`,
          ).toBe(true);
        }
        for (const area of expected.areas) {
          expect(
            targets.some((t) => t.startsWith(area)),
            `${role} nav has ${area}`,
          ).toBe(true);
        }
        await screenshot(page, 'staff-sign-in', role);

        // Another role's area is not reachable by URL either: the app sends the user home.
        const foreign = role === 'tech' ? '/manage' : '/workshop';
        await page.goto(foreign);
        await page.waitForURL(`**${expected.home}`);
        await context.close();
      });
    }
  }

  it('a wrong password is refused with one generic message', async () => {
    const { context, page } = await newPage(browser, 'phone');
    await submitSignIn(page, { email: demoUsers.desk.email, password: 'not-the-password' });
    await expect
      .poll(() => page.getByText('E-mail or password is not right').count())
      .toBeGreaterThan(0);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await screenshot(page, 'staff-sign-in', 'wrong-password');
    await context.close();
  });
});
