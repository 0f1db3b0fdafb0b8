import { defineConfig } from 'vitest/config';

// The test set that `npm run mutate` (StrykerJS) runs against each mutant of src/core: the core's own
// tests only. It is kept apart from vitest.config.ts so the mutation run never starts the catalog,
// site or browser tests, which are slow and exercise the core only indirectly.
export default defineConfig({
  test: {
    include: ['test/core/**/*.test.ts'],
    testTimeout: 60_000,
  },
});
