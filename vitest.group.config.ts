import { defineConfig } from 'vitest/config';

// A narrowed test set for a mutation run of one folder (stryker.group.config.mjs): the test files in
// MUTATE_TESTS (comma-separated globs), or the whole core set of vitest.mutate.config.ts without it.
// MUTATE_SKIP_TEST (optional): tests whose full name contains this text are skipped, for a test too slow
// under StrykerJS's per-test instrumentation (its mutants are then measured without it: a lower bound).
const skip = process.env.MUTATE_SKIP_TEST;
const escaped = skip?.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
export default defineConfig({
  test: {
    include: (process.env.MUTATE_TESTS ?? 'test/core/**/*.test.ts').split(','),
    testTimeout: 60_000,
    ...(escaped ? { testNamePattern: new RegExp(`^(?!.*${escaped})`) } : {}),
  },
});
