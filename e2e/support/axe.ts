import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { expect } from 'vitest';

/** One axe rule that failed on a page, as the journeys print and keep it. */
export interface AxeFinding {
  page: string;
  /** A failed rule, or one axe could not decide and leaves to a person. */
  outcome: 'violation' | 'needs-review';
  rule: string;
  impact: string;
  help: string;
  helpUrl: string;
  targets: string[];
}

/** Impacts that fail a journey; moderate and minor ones are kept for the report only. */
const BLOCKING = new Set(['serious', 'critical']);

function describe(finding: AxeFinding): string {
  return `  ${finding.rule} (${finding.impact}): ${finding.help}\n    at ${finding.targets.join(' | ')}`;
}

/**
 * Waits until no transition or finite animation is running (a dialog fading in, a card changing
 * colour, a button's ripple), so a screenshot or a colour-contrast check sees the settled page.
 * Endless animations (spinners) do not count.
 */
export async function waitForAnimations(page: Page): Promise<void> {
  await expect
    .poll(() =>
      page.evaluate(
        () =>
          document
            .getAnimations()
            .filter(
              (animation) =>
                animation.playState === 'running' &&
                animation.effect?.getComputedTiming().iterations !== Infinity,
            ).length,
      ),
    )
    .toBe(0);
}

/**
 * Runs axe-core (every rule of its default set: WCAG 2.x A and AA plus best practices) on the
 * page once it has settled. Throws when any violation is serious or critical, naming the rule,
 * its impact, axe's help text and the first elements it found. Returns every violation, and the
 * checks axe could not decide by itself ("needs review", e.g. contrast over an image), otherwise.
 */
export async function checkAccessibility(page: Page, label: string): Promise<AxeFinding[]> {
  await waitForAnimations(page);
  const results = await new AxeBuilder({ page }).analyze();
  const findingsOf = (outcome: AxeFinding['outcome'], list: typeof results.violations) =>
    list.map((result) => ({
      page: label,
      outcome,
      rule: result.id,
      impact: result.impact ?? 'unknown',
      help: result.help,
      helpUrl: result.helpUrl,
      targets: result.nodes.slice(0, 3).map((node) => node.target.join(' ')),
    }));
  const violations = findingsOf('violation', results.violations);
  const blocking = violations.filter((finding) => BLOCKING.has(finding.impact));
  if (blocking.length > 0) {
    throw new Error(
      `axe found ${blocking.length} serious or critical violation(s) on "${label}" (${page.url()}):\n` +
        blocking.map(describe).join('\n'),
    );
  }
  return [...violations, ...findingsOf('needs-review', results.incomplete)];
}
