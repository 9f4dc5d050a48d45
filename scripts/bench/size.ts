/**
 * `npm run bench:size`: the JavaScript a phone downloads to open the build planner.
 *
 * Opens BENCH_URL/plan/vehicle (default http://127.0.0.1:4400, which serves web/dist) in
 * Chromium at 390x844 with an empty cache, waits until the network has been quiet, and sums
 * every script the page requested: raw bytes and gzip (node:zlib, level 9, as bundle reports
 * count it). Then it walks through the other five steps (first make, model and year, daily
 * driving, the standard parts) and reports the JavaScript of the whole planner as a second figure. Builds web/dist first when it is missing.
 * Writes docs/bench/size-<UTC stamp>.json. A measurement: exit code 0 whether or not the
 * target is met.
 *
 * Environment: BENCH_URL, CHROMIUM_PATH (/usr/bin/chromium).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium, type Page, type Response } from 'playwright-core';
import {
  assertReachable,
  baseUrl,
  BenchError,
  loadAverage,
  machineInfo,
  ROOT,
  runMain,
  table,
  writeResult,
} from './lib';

/** Target of the issue for the planner's initial JavaScript, gzip; kB = 1000 bytes. */
const TARGET_KB = 250;
const START_PATH = '/plan/vehicle';
/** The planner's step headings, in order (the walk through the steps waits for each). */
const STEP_HEADINGS = [
  'Your vehicle',
  'How you use it',
  'Lift & suspension',
  'Wheels & tyres',
  'Add-ons',
  'Review & save',
];
/** Text that only MUI X Data Grid's code contains; the planner must not load it. */
const DATA_GRID_MARKER = 'MuiDataGrid';

interface ScriptFigure {
  file: string;
  bytes: number;
  gzipBytes: number;
  hasDataGrid: boolean;
}

const kb = (bytes: number) => (bytes / 1000).toFixed(1);

function ensureWebBuild(): string {
  const indexFile = join(ROOT, 'web', 'dist', 'index.html');
  if (!existsSync(indexFile)) {
    console.log('› web/dist is missing: building it (npm run -w web build)');
    const result = spawnSync('npm', ['run', '-w', 'web', 'build'], { cwd: ROOT, stdio: 'inherit' });
    if (result.status !== 0) throw new BenchError('Building the web app failed.');
  }
  return readFileSync(indexFile, 'utf8');
}

/** The entry script named by an index.html (`<script type="module" src="/assets/index-….js">`). */
function entryScript(html: string): string | null {
  return /<script[^>]*type="module"[^>]*src="([^"]+)"/.exec(html)?.[1] ?? null;
}

async function figure(response: Response): Promise<ScriptFigure> {
  const body = await response.body();
  return {
    file: new URL(response.url()).pathname,
    bytes: body.length,
    gzipBytes: gzipSync(body, { level: 9 }).length,
    hasDataGrid: body.includes(DATA_GRID_MARKER),
  };
}

async function waitForStep(page: Page, heading: string): Promise<void> {
  await page
    .getByRole('heading', { level: 1, name: heading, exact: true })
    .waitFor({ state: 'visible', timeout: 15_000 });
  await settle(page);
}

/** Walks from the vehicle step to the review; returns the step headings it reached. */
async function walkThroughSteps(page: Page): Promise<string[]> {
  const reached: string[] = [];
  try {
    await waitForStep(page, STEP_HEADINGS[0]);
    reached.push(STEP_HEADINGS[0]);
    for (const label of ['Make', 'Model', 'Year']) {
      const select = page.getByLabel(label, { exact: true });
      await page.waitForFunction(
        (element) => (element as HTMLSelectElement).options.length > 1,
        await select.elementHandle(),
      );
      const value = await select.locator('option').nth(1).getAttribute('value');
      await select.selectOption(value ?? '');
    }
    const next = page.getByRole('button', { name: 'Next', exact: true });
    await next.click();
    await waitForStep(page, STEP_HEADINGS[1]);
    reached.push(STEP_HEADINGS[1]);
    await page.getByRole('checkbox', { name: 'Daily driving' }).check();
    for (const heading of STEP_HEADINGS.slice(2)) {
      await next.click();
      await waitForStep(page, heading);
      reached.push(heading);
    }
  } catch (error) {
    console.warn(
      `! The walk through the steps stopped: ${(error as Error).message.split('\n')[0]}`,
    );
  }
  return reached;
}

/** Every figure of `pending`, including those whose responses arrive while waiting. */
async function allSettled(pending: Promise<ScriptFigure>[]): Promise<ScriptFigure[]> {
  let count = -1;
  while (count !== pending.length) {
    count = pending.length;
    await Promise.all(pending);
  }
  return Promise.all(pending);
}

/** Waits until no request has been in flight for 500 ms (and at most 20 s). */
async function settle(page: Page): Promise<void> {
  await page.waitForLoadState('networkidle', { timeout: 20_000 });
}

function sum(scripts: ScriptFigure[]) {
  return {
    files: scripts.length,
    bytes: scripts.reduce((total, s) => total + s.bytes, 0),
    gzipBytes: scripts.reduce((total, s) => total + s.gzipBytes, 0),
  };
}

async function main(): Promise<void> {
  const builtIndex = ensureWebBuild();
  await assertReachable();
  const servedIndex = await (await fetch(`${baseUrl}${START_PATH}`)).text();
  const builtEntry = entryScript(builtIndex);
  const servedEntry = entryScript(servedIndex);
  if (!servedEntry) throw new BenchError(`${baseUrl}${START_PATH} served no module entry script`);
  if (builtEntry !== servedEntry) {
    console.warn(
      `! ${baseUrl} serves ${servedEntry}, web/dist has ${builtEntry}: the figure is of the served build.`,
    );
  }

  const browser = await chromium.launch({
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
  try {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    const started = new Date();
    const loadBefore = loadAverage();
    const pending: Promise<ScriptFigure>[] = [];
    const seen = new Set<string>();
    page.on('response', (response) => {
      const url = new URL(response.url());
      const isScript =
        response.request().resourceType() === 'script' || url.pathname.endsWith('.js');
      if (!isScript || url.origin !== new URL(baseUrl).origin || seen.has(url.pathname)) return;
      seen.add(url.pathname);
      const measured = figure(response);
      // Never unhandled: a failure surfaces where the figures are awaited.
      measured.catch(() => undefined);
      pending.push(measured);
    });

    await page.goto(`${baseUrl}${START_PATH}`, { waitUntil: 'load' });
    await settle(page);
    const initial = await allSettled(pending);
    const heading = (await page.locator('h1').first().textContent({ timeout: 5_000 })) ?? '';

    // Then through every step as a visitor does (first make, model and year, daily driving,
    // the standard parts), so each step's code is counted. If the screens changed and the walk
    // gets stuck, the initial figure still stands and the steps reached are reported.
    const reached = await walkThroughSteps(page);
    const everyStep = await allSettled(pending);
    await context.close();

    const initialSum = sum(initial);
    const everySum = sum(everyStep);
    const reading = initialSum.gzipBytes <= TARGET_KB * 1000 ? 'PASS' : 'MISS';
    const dataGridFiles = everyStep.filter((s) => s.hasDataGrid).map((s) => s.file);

    console.log(`Opened ${baseUrl}${START_PATH} at 390x844 (first heading: "${heading.trim()}")`);
    console.log('');
    console.log(
      table([
        ['script', 'raw kB', 'gzip kB'],
        ...[...initial]
          .sort((a, b) => b.gzipBytes - a.gzipBytes)
          .map((s) => [s.file, kb(s.bytes), kb(s.gzipBytes)]),
        [`total (${initialSum.files} files)`, kb(initialSum.bytes), kb(initialSum.gzipBytes)],
      ]),
    );
    console.log('');
    console.log(
      table([
        ['figure', 'gzip kB', 'reading'],
        [`initial JS for ${START_PATH} ≤ ${TARGET_KB} kB`, kb(initialSum.gzipBytes), reading],
        [
          `JS of the steps reached (${reached.length} of 6, ${everySum.files} files)`,
          kb(everySum.gzipBytes),
          'for information',
        ],
        [
          'MUI X Data Grid in planner scripts',
          dataGridFiles.length === 0 ? 'none' : dataGridFiles.join(' '),
          dataGridFiles.length === 0 ? 'PASS' : 'MISS',
        ],
      ]),
    );

    const path = await writeResult('size', started, {
      benchmark: 'planner-javascript',
      measuredAt: started.toISOString(),
      baseUrl,
      startPath: START_PATH,
      servedEntry,
      matchesWebDist: builtEntry === servedEntry,
      machine: machineInfo(),
      loadAverageBefore: loadBefore,
      initial: { ...initialSum, scripts: initial },
      everyStep: { ...everySum, stepsReached: reached, scripts: everyStep },
      dataGridFiles,
      target: { initialGzipKb: TARGET_KB, kbIs: 1000 },
      reading,
    });
    console.log(`\nWrote ${path}`);
  } finally {
    await browser.close();
  }
}

runMain(main);
