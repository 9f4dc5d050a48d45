/** Helpers shared by the benchmark scripts (`npm run bench:quote`, `npm run bench:size`). */
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, totalmem } from 'node:os';
import { join } from 'node:path';
import { format, resolveConfig } from 'prettier';

export const ROOT = join(import.meta.dirname, '..', '..');
export const BENCH_DIR = join(ROOT, 'docs', 'bench');
export const baseUrl = (process.env.BENCH_URL ?? 'http://127.0.0.1:4400').replace(/\/$/, '');

/** An error meant for the person running the benchmark: printed without a stack, exit 1. */
export class BenchError extends Error {}

/** The machine and the code a figure was measured on, stored beside every result. */
export interface MachineInfo {
  cores: number;
  cpuModel: string;
  memoryGiB: number;
  node: string;
  platform: string;
  commit: string;
  uncommittedChanges: boolean;
}

function git(args: string[]): string {
  try {
    return execFileSync('git', args, { cwd: ROOT, encoding: 'utf8' }).trim();
  } catch {
    return '';
  }
}

export function machineInfo(): MachineInfo {
  const cpuList = cpus();
  return {
    cores: cpuList.length,
    cpuModel: cpuList[0]?.model.trim() ?? 'unknown',
    memoryGiB: Math.round((totalmem() / 2 ** 30) * 10) / 10,
    node: process.version,
    platform: `${process.platform} ${process.arch}`,
    commit: git(['rev-parse', '--short', 'HEAD']) || 'unknown',
    uncommittedChanges: git(['status', '--porcelain']) !== '',
  };
}

/**
 * The 1, 5 and 15 minute load averages, taken just before measuring: how busy the box already
 * was (on 2 cores, 2 means both were fully used by other work).
 */
export function loadAverage(): number[] {
  return loadavg().map((value) => Math.round(value * 100) / 100);
}

/** Throws a BenchError that says what to start when nothing answers at `baseUrl`. */
export async function assertReachable(): Promise<void> {
  try {
    const response = await fetch(`${baseUrl}/api/health/live`);
    if (!response.ok) {
      throw new BenchError(
        `${baseUrl}/api/health/live answered ${response.status}; the API is not healthy.`,
      );
    }
  } catch (error) {
    if (error instanceof BenchError) throw error;
    throw new BenchError(
      [
        `Nothing answers at ${baseUrl} (${describeFetchError(error)}).`,
        'Start the stack first, in another terminal: `npm start` (API and web app on',
        'http://127.0.0.1:4400), then run this again. For another address set BENCH_URL,',
        'e.g. BENCH_URL=http://127.0.0.1:4499 npm run bench:quote',
      ].join('\n'),
    );
  }
}

function describeFetchError(error: unknown): string {
  const cause = (error as { cause?: { code?: string; message?: string } }).cause;
  return cause?.code ?? cause?.message ?? (error as Error).message;
}

/** `2026-12-02-031542` (UTC, to the second): file names that sort by time. */
export function stamp(date: Date): string {
  const iso = date.toISOString();
  return `${iso.slice(0, 10)}-${iso.slice(11, 19).replace(/:/g, '')}`;
}

/**
 * Writes `value` as JSON to docs/bench/<name>-<stamp>.json, formatted by Prettier as
 * `npm run lint` checks it, and returns the path.
 */
export async function writeResult(name: string, date: Date, value: unknown): Promise<string> {
  mkdirSync(BENCH_DIR, { recursive: true });
  const path = join(BENCH_DIR, `${name}-${stamp(date)}.json`);
  const options = (await resolveConfig(path)) ?? {};
  writeFileSync(path, await format(JSON.stringify(value), { ...options, filepath: path }));
  return path;
}

/** A plain text table: the first row is the header; numbers are right-aligned. */
export function table(rows: string[][]): string {
  const cells = rows;
  const widths = cells[0].map((_, column) => Math.max(...cells.map((row) => row[column].length)));
  const line = (row: string[]) =>
    row
      .map((cell, column) =>
        /^-?[\d.,]+( \w+)?$/.test(cell)
          ? cell.padStart(widths[column])
          : cell.padEnd(widths[column]),
      )
      .join('  ')
      .trimEnd();
  const [header, ...body] = cells;
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...body.map(line)].join('\n');
}

/** Runs `main` and turns a BenchError into one clear message and exit code 1. */
export function runMain(main: () => Promise<void>): void {
  main().catch((error: unknown) => {
    if (error instanceof BenchError) console.error(error.message);
    else console.error(error);
    process.exit(1);
  });
}
