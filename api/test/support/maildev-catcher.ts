import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** One message as MailDev's REST API (`GET /email`) gives it. */
export interface CaughtMail {
  id: string;
  subject: string;
  text: string;
  html: string;
  to: { address: string }[];
  headers: Record<string, string>;
}

const MAILDEV_BIN = join(__dirname, '..', '..', '..', 'node_modules', 'maildev', 'bin', 'maildev');

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

/**
 * The stack's e-mail catcher (MailDev, the same package `npm start` runs) as a child process of
 * a spec: stopped and started again on the same ports, its messages kept in a folder of this
 * run, read back through its REST API.
 */
export class MailDevCatcher {
  private child: ChildProcess | null = null;
  private smtpPort = 0;
  private webPort = 0;
  private readonly directory = mkdtempSync(join(tmpdir(), 'liftwright-maildev-'));

  get smtpUrl(): string {
    return `smtp://127.0.0.1:${this.smtpPort}`;
  }

  get apiUrl(): string {
    return `http://127.0.0.1:${this.webPort}`;
  }

  async start(): Promise<void> {
    if (this.smtpPort === 0) {
      this.smtpPort = await freePort();
      this.webPort = await freePort();
    }
    this.child = spawn(
      process.execPath,
      [
        MAILDEV_BIN,
        '--ip',
        '127.0.0.1',
        '--smtp',
        String(this.smtpPort),
        '--web',
        String(this.webPort),
        '--mail-directory',
        this.directory,
        '--silent',
      ],
      { stdio: 'ignore' },
    );
    const deadline = Date.now() + 15_000;
    for (;;) {
      try {
        const response = await fetch(`${this.apiUrl}/email`);
        if (response.ok) return;
      } catch {
        // Not listening yet.
      }
      if (Date.now() > deadline) throw new Error('MailDev did not start within 15 s');
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  }

  /** Stops the process and waits for it to exit: its SMTP port refuses connections after. */
  async stop(): Promise<void> {
    const child = this.child;
    this.child = null;
    if (!child || child.exitCode !== null) return;
    await new Promise<void>((resolve) => {
      child.once('exit', () => resolve());
      child.kill('SIGTERM');
    });
  }

  async emails(): Promise<CaughtMail[]> {
    const response = await fetch(`${this.apiUrl}/email`);
    if (!response.ok) throw new Error(`MailDev answered ${response.status}`);
    return (await response.json()) as CaughtMail[];
  }

  async close(): Promise<void> {
    await this.stop();
    rmSync(this.directory, { recursive: true, force: true });
  }
}
