import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.spec.ts'],
    // One browser per file; files run one after another so journeys on the shared database
    // and inbox do not interleave, and the 2-core machine is not oversubscribed.
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
