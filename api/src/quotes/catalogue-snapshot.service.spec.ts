import type { EntityManager } from '@mikro-orm/postgresql';
import type { Pool } from 'pg';
import { describe, expect, it } from 'vitest';
import { CatalogueSnapshotService } from './catalogue-snapshot.service';

/** A pool whose revision reads the test answers one at a time, in order. */
function controlledPool() {
  const reads: { answer: (revision: string) => void }[] = [];
  const pool = {
    query: () =>
      new Promise((resolve) => {
        reads.push({ answer: (revision) => resolve({ rows: [{ revision }] }) });
      }),
  } as unknown as Pool;
  return { pool, reads };
}

const settle = () => new Promise((resolve) => setImmediate(resolve));

describe('CatalogueSnapshotService.revisionNow', () => {
  it('never answers a caller with a read sent before it asked', async () => {
    const { pool, reads } = controlledPool();
    const service = new CatalogueSnapshotService({} as EntityManager, pool);

    const first = service.revisionNow();
    await settle();
    expect(reads).toHaveLength(1);
    // Two callers ask while the first read is in flight: they wait for a read of their own.
    const second = service.revisionNow();
    const third = service.revisionNow();
    await settle();
    expect(reads).toHaveLength(1);

    reads[0].answer('7');
    expect(await first).toBe('7');
    await settle();
    expect(reads).toHaveLength(2);
    reads[1].answer('8');
    expect(await second).toBe('8');
    expect(await third).toBe('8');

    // Nothing in flight: the next caller starts a read at once.
    const fourth = service.revisionNow();
    await settle();
    expect(reads).toHaveLength(3);
    reads[2].answer('9');
    expect(await fourth).toBe('9');
  });

  it('reports a missing revision row to every caller that shares the read', async () => {
    const pool = { query: () => Promise.resolve({ rows: [] }) } as unknown as Pool;
    const service = new CatalogueSnapshotService({} as EntityManager, pool);
    await expect(service.revisionNow()).rejects.toThrow(/catalogue revision row is missing/);
  });
});
