import type { Locator, Page } from 'playwright-core';

export interface Account {
  email: string;
  password: string;
}

/** Fills in and sends the sign-in form, without waiting for the outcome. */
export async function submitSignIn(page: Page, account: Account): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(account.email);
  await page.getByLabel('Password').fill(account.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Signs in through the sign-in page and waits until the app has left it. */
export async function signIn(page: Page, account: Account): Promise<void> {
  await submitSignIn(page, account);
  await page.waitForURL((url) => url.pathname !== '/sign-in');
}

/** The page's main navigation landmark (side bar on wide screens, bottom bar on phones). */
export function mainNavigation(page: Page): Locator {
  return page.getByRole('navigation', { name: 'Main' });
}

/** A JSON GET from inside the page, so it carries the page's session cookie. */
export async function getJson<T>(page: Page, path: string): Promise<{ status: number; body: T }> {
  return page.evaluate(async (target) => {
    const response = await fetch(target, { headers: { accept: 'application/json' } });
    const text = await response.text();
    return { status: response.status, body: (text ? JSON.parse(text) : null) as T };
  }, path);
}

/**
 * A JSON POST from inside the page, with the session's CSRF token (GET /api/auth/csrf), so it
 * runs as the page's visitor. For reading what the API computes, not for driving the journey.
 */
export async function postJson<T>(
  page: Page,
  path: string,
  body: unknown,
): Promise<{ status: number; body: T }> {
  return page.evaluate(
    async ({ target, payload }) => {
      const csrf = await fetch('/api/auth/csrf', { headers: { accept: 'application/json' } });
      const { csrfToken } = (await csrf.json()) as { csrfToken: string };
      const response = await fetch(target, {
        method: 'POST',
        headers: {
          accept: 'application/json',
          'content-type': 'application/json',
          'x-csrf-token': csrfToken,
        },
        body: JSON.stringify(payload),
      });
      const text = await response.text();
      return { status: response.status, body: (text ? JSON.parse(text) : null) as T };
    },
    { target: path, payload: body },
  );
}
