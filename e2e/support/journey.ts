import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, expect } from 'vitest';
import { checkAccessibility, waitForAnimations, type AxeFinding } from './axe';
import { launchBrowser, screenshot } from './browser';
import { artifactsDir } from './env';

export interface Journey {
  /** The browser of this spec file (launched before its tests, closed after). */
  browser(): Browser;
  /**
   * One of our own pages, once it has settled and fits the screen's width: a screenshot into
   * e2e/artifacts/<journey>/, then axe on it (the findings are written when the file ends).
   */
  record(page: Page, name: string, fullPage?: boolean): Promise<void>;
}

/** Registers the browser and the axe report of one journey's spec file. */
export function journey(name: string): Journey {
  let browser: Browser | undefined;
  const findings: AxeFinding[] = [];
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    mkdirSync(join(artifactsDir, name), { recursive: true });
    writeFileSync(
      join(artifactsDir, name, 'axe-findings.json'),
      `${JSON.stringify(findings, null, 2)}\n`,
    );
  });
  return {
    browser() {
      if (!browser) throw new Error('The browser starts in beforeAll');
      return browser;
    },
    async record(page, shot, fullPage = true) {
      await waitForAnimations(page);
      await expect
        .poll(() => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth))
        .toBeLessThanOrEqual(0);
      await screenshot(page, name, shot, { fullPage });
      findings.push(...(await checkAccessibility(page, shot)));
    },
  };
}
