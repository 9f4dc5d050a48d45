import { createHash } from 'node:crypto';
import { existsSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { spawnSync } from 'node:child_process';
import { log, StackError } from './log';

function listFiles(path: string, out: string[]): void {
  if (!existsSync(path)) return;
  const stat = statSync(path);
  if (stat.isFile()) {
    out.push(path);
    return;
  }
  for (const entry of readdirSync(path)) {
    if (entry === 'node_modules' || entry === 'dist') continue;
    listFiles(join(path, entry), out);
  }
}

/** A hash over the names and contents of every file under `inputs`. */
export function sourceHash(root: string, inputs: string[]): string {
  const files: string[] = [];
  for (const input of inputs) listFiles(join(root, input), files);
  const hash = createHash('sha256');
  for (const file of files.sort()) {
    hash.update(relative(root, file));
    hash.update('\0');
    hash.update(readFileSync(file));
    hash.update('\0');
  }
  return hash.digest('hex');
}

/**
 * Runs `command` when the sources under `inputs` changed since the last build recorded in
 * `<outDir>/.source-hash` (or when there is no build yet).
 */
export function buildIfChanged(options: {
  root: string;
  name: string;
  inputs: string[];
  outDir: string;
  command: string[];
}): void {
  const { root, name, inputs, outDir, command } = options;
  const stampFile = join(root, outDir, '.source-hash');
  const hash = sourceHash(root, inputs);
  if (existsSync(stampFile) && readFileSync(stampFile, 'utf8').trim() === hash) {
    log.ok(`${name} is up to date`);
    return;
  }
  log.step(`Building ${name}`);
  const started = Date.now();
  const result = spawnSync(command[0], command.slice(1), { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) throw new StackError(`Building ${name} failed (${command.join(' ')}).`);
  writeFileSync(stampFile, `${hash}\n`);
  log.ok(`${name} built in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}
