import { defineConfig } from 'vitest/config';

// Two projects: fast unit/published-value/CLI tests, and browser end-to-end tests that build
// the site and drive the system Chromium. `npm test` runs both.
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['test/core/**/*.test.ts', 'test/catalog/**/*.test.ts', 'test/site/**/*.test.ts', 'test/shared/**/*.test.ts', 'test/scripts/**/*.test.ts'],
          globalSetup: ['test/buildCliSetup.ts'],
          testTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'slow',
          include: ['test/slow/**/*.test.ts'],
          testTimeout: 1_800_000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['test/e2e/**/*.test.ts'],
          globalSetup: ['test/buildCliSetup.ts', 'test/e2e/globalSetup.ts'],
          testTimeout: 120_000,
          hookTimeout: 600_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
