import type { SessionData } from 'express-session';
import type { Pool } from 'pg';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { SESSION_TOUCH_INTERVAL_MS, ThrottledTouchPgStore } from './throttled-touch-pg-store';

/** A pool that records the statements the store sends and answers each with one row. */
function recordingPool(): { pool: Pool; statements: string[] } {
  const statements: string[] = [];
  const pool = {
    query: (text: string) => {
      statements.push(text.split(' ')[0]);
      return Promise.resolve({ rows: [{ sid: 'x', sess: {} }], rowCount: 1 });
    },
  } as unknown as Pool;
  return { pool, statements };
}

const sessionData = { cookie: { expires: new Date(Date.now() + 30 * 60_000) } } as SessionData;

function touch(store: ThrottledTouchPgStore, sid: string): Promise<void> {
  return new Promise((resolve, reject) =>
    store.touch(sid, sessionData, (error) => (error ? reject(error as Error) : resolve())),
  );
}

describe('ThrottledTouchPgStore', () => {
  let store: ThrottledTouchPgStore;
  let statements: string[];

  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-12-02T01:00:00Z'));
    const recorded = recordingPool();
    statements = recorded.statements;
    store = new ThrottledTouchPgStore({ pool: recorded.pool, pruneSessionInterval: false });
  });

  afterEach(() => {
    vi.useRealTimers();
  });

  it('writes the expiry once a minute per session, not on every request', async () => {
    await touch(store, 'a');
    await touch(store, 'a');
    vi.setSystemTime(Date.now() + SESSION_TOUCH_INTERVAL_MS - 1);
    await touch(store, 'a');
    expect(statements).toEqual(['UPDATE']);
    vi.setSystemTime(Date.now() + 1);
    await touch(store, 'a');
    expect(statements).toEqual(['UPDATE', 'UPDATE']);
  });

  it('keeps one clock per session', async () => {
    await touch(store, 'a');
    await touch(store, 'b');
    expect(statements).toEqual(['UPDATE', 'UPDATE']);
  });

  it('counts a save as a renewal and forgets a destroyed session', async () => {
    await new Promise<void>((resolve) => store.set('a', sessionData, () => resolve()));
    await touch(store, 'a');
    expect(statements).toEqual(['INSERT']);
    await new Promise<void>((resolve) => store.destroy('a', () => resolve()));
    await touch(store, 'a');
    expect(statements).toEqual(['INSERT', 'DELETE', 'UPDATE']);
  });
});
