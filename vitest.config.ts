import { BaseSequencer, type TestSpecification } from 'vitest/node';
import { defineConfig } from 'vitest/config';

// The files that take longest (they start processes: the compiler, npm, the command line; or run
// the fuzz round) start first, so that the two workers finish together instead of one of them
// starting a long file near the end.
const LONG = ['tests/packaging/package.test.ts', 'tests/cli/startup-bundles.test.ts', 'tests/fuzz/fuzz.test.ts', 'tests/types/typecheck.test.ts'];

class LongFirst extends BaseSequencer {
  override async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const rank = (f: TestSpecification) => {
      const i = LONG.findIndex((l) => f.moduleId.endsWith(l));
      return i === -1 ? LONG.length : i;
    };
    return (await super.sort(files)).sort((a, b) => rank(a) - rank(b));
  }
}

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    testTimeout: 30_000,
    pool: 'forks',
    // two workers on two cores; the default (cores - 1) runs one file at a time
    maxWorkers: 2,
    // test files share a worker's module cache instead of importing the library and the CLI
    // bundle again each (no test mocks modules or leaves global state behind)
    isolate: false,
    sequence: { sequencer: LongFirst },
  },
});
