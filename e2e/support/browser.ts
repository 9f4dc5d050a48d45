import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { artifactsDir, baseUrl } from './env';

export const viewports = {
  phone: { width: 390, height: 844 },
  desktop: { width: 1280, height: 800 },
} as const;

export type ViewportName = keyof typeof viewports;

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function newPage(
  browser: Browser,
  viewport: ViewportName,
): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: viewports[viewport], baseURL: baseUrl });
  const page = await context.newPage();
  return { context, page };
}

/**
 * Saves a full-page screenshot under e2e/artifacts/<journey>/<name>-<viewport>.png. Pass
 * `{ fullPage: false }` for what the screen shows, e.g. with a dialog open (a full-page capture
 * stretches the viewport, and the dialog's fixed backdrop with it).
 */
export async function screenshot(
  page: Page,
  journey: string,
  name: string,
  options: { fullPage?: boolean } = {},
): Promise<string> {
  const dir = join(artifactsDir, journey);
  mkdirSync(dir, { recursive: true });
  const size = page.viewportSize();
  const path = join(dir, `${name}-${size ? `${size.width}x${size.height}` : 'page'}.png`);
  // From the top, so that the fixed app bar sits where a person sees it.
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path, fullPage: options.fullPage ?? true });
  return path;
}
