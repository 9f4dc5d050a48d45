import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, mkdirSync } from 'node:fs';
import { dirname } from 'node:path';

export interface Service {
  name: string;
  child: ChildProcess;
  alive: () => boolean;
  exited: Promise<number | null>;
}

const running: Service[] = [];

/**
 * Starts a long-running child. Its output goes to `logFile`; with `echo` it is also printed with
 * a `[name]` prefix.
 */
export function startService(options: {
  name: string;
  command: string;
  args: string[];
  env?: NodeJS.ProcessEnv;
  cwd?: string;
  logFile: string;
  echo: boolean;
}): Service {
  mkdirSync(dirname(options.logFile), { recursive: true });
  const logStream = createWriteStream(options.logFile, { flags: 'a' });
  const child = spawn(options.command, options.args, {
    cwd: options.cwd,
    env: { ...process.env, ...options.env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let alive = true;
  const exited = new Promise<number | null>((resolve) => {
    child.on('exit', (code) => {
      alive = false;
      resolve(code);
    });
  });
  const forward = (chunk: Buffer) => {
    logStream.write(chunk);
    if (options.echo) {
      for (const line of chunk.toString().split('\n')) {
        if (line.trim()) process.stdout.write(`[${options.name}] ${line}\n`);
      }
    }
  };
  child.stdout?.on('data', forward);
  child.stderr?.on('data', forward);
  const service = { name: options.name, child, alive: () => alive, exited };
  running.push(service);
  return service;
}

/** Sends SIGTERM to every child still running (newest first) and waits for them. */
export async function stopServices(): Promise<void> {
  const services = running.splice(0).reverse();
  for (const service of services) {
    if (service.alive()) service.child.kill('SIGTERM');
  }
  await Promise.all(
    services.map((service) =>
      Promise.race([
        service.exited,
        new Promise((r) =>
          setTimeout(() => {
            if (service.alive()) service.child.kill('SIGKILL');
            r(null);
          }, 8000),
        ),
      ]),
    ),
  );
}

/** Runs a command to completion with inherited output; resolves with its exit code. */
export function run(
  command: string,
  args: string[],
  env?: NodeJS.ProcessEnv,
  cwd?: string,
): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(command, args, { cwd, env: { ...process.env, ...env }, stdio: 'inherit' });
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 128 : 1)));
  });
}
