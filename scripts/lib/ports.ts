import { createServer } from 'node:net';
import { StackError } from './log';

/** Resolves when `port` can be bound on 127.0.0.1; otherwise throws a message naming the variable. */
export function assertPortFree(port: number, variable: string, what: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', (error: NodeJS.ErrnoException) => {
      if (error.code === 'EADDRINUSE') {
        reject(
          new StackError(
            `Port ${port} (${what}) is already in use. Stop whatever holds it, or choose another port: ${variable}=<port> npm start`,
          ),
        );
      } else {
        reject(error);
      }
    });
    server.listen(port, '127.0.0.1', () => server.close(() => resolve()));
  });
}

export async function waitForHttp(
  url: string,
  timeoutMs: number,
  isAlive: () => boolean,
): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let lastError = '';
  while (Date.now() < deadline) {
    if (!isAlive()) throw new StackError(`The process behind ${url} exited before it answered.`);
    try {
      const response = await fetch(url);
      if (response.ok) return;
      lastError = `HTTP ${response.status}`;
    } catch (error) {
      lastError = (error as Error).message;
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new StackError(`${url} did not answer within ${timeoutMs / 1000} s (${lastError}).`);
}
