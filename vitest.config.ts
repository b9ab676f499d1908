import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    // Native SQLite and child processes: keep the pool small on a 2-core machine.
    pool: 'forks',
    testTimeout: 30_000,
  },
});
