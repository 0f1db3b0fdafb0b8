// Mutation testing of the science core: `npm run mutate` (not part of `npm test`).
// While iterating on one file: `npx stryker run --mutate src/core/dust/balmerDecrement.ts`.
// The machine is shared, so one test-runner process at a time.
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  plugins: ['@stryker-mutator/vitest-runner'],
  vitest: { configFile: 'vitest.mutate.config.ts', related: false },
  mutate: ['src/core/**/*.ts', '!src/core/**/index.ts'],
  coverageAnalysis: 'perTest',
  // Static mutants (code run at module load: records, tables) need the whole suite per mutant,
  // hours on this machine; they are left out of the score (see README, Mutation testing).
  ignoreStatic: true,
  concurrency: 1,
  reporters: ['clear-text', 'progress', 'html', 'json'],
  clearTextReporter: { allowColor: false, logTests: false, reportScoreTable: true },
  htmlReporter: { fileName: 'reports/mutation/index.html' },
  jsonReporter: { fileName: 'reports/mutation/mutation.json' },
  tempDirName: '.stryker-tmp',
  ignorePatterns: ['.stryker-tmp-*', '.venv*', '.scratch', 'data-demo/out', 'public/data', 'dist', '.astro', 'test/e2e', 'test/fixtures', 'reports'],
  cleanTempDir: true,
  thresholds: { high: 90, low: 85, break: null },
  timeoutMS: 20_000,
};
