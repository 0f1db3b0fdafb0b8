// A mutation run of one folder against that folder's own tests: far faster than the whole core set,
// a lower bound on the score (a mutant another folder's tests would catch counts as surviving).
//   MUTATE_GROUP=math MUTATE_TESTS='test/core/math/**/*.test.ts' \
//     npx stryker run stryker.group.config.mjs --mutate 'src/core/math/*.ts,!src/core/math/index.ts'
// The JSON report goes to reports/mutation/<MUTATE_GROUP>.json.
import base from './stryker.config.mjs';

/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  ...base,
  vitest: { configFile: 'vitest.group.config.ts', related: false },
  reporters: ['clear-text', 'progress', 'json'],
  jsonReporter: { fileName: `reports/mutation/${process.env.MUTATE_GROUP ?? 'group'}.json` },
};
