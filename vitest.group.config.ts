import { defineConfig } from 'vitest/config';

// A narrowed test set for a mutation run of one folder (stryker.group.config.mjs): the test files in
// MUTATE_TESTS (comma-separated globs), or the whole core set of vitest.mutate.config.ts without it.
export default defineConfig({
  test: {
    include: (process.env.MUTATE_TESTS ?? 'test/core/**/*.test.ts').split(','),
    testTimeout: 60_000,
  },
});
