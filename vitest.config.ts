import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';
import { readManifest, sourceAliases } from './scripts/entries.js';

const root = fileURLToPath(new URL('./', import.meta.url));

/**
 * Tests that build, pack, spawn processes or drive a browser. They run in the `integration` project:
 * one build of dist/ (tests/helpers/global-setup.ts) shared by every file that needs it.
 */
const integration = [
  'tests/package/**/*.test.ts',
  'tests/browser.test.ts',
  'tests/examples.test.ts',
  'tests/bench.test.ts',
  'tests/cli-bin.test.ts',
  'tests/bundle.test.ts',
  'tests/docs/api.test.ts',
  'tests/docs/examples-built.test.ts',
  'tests/errors-dual.test.ts',
];

export default defineConfig({
  resolve: {
    // examples import 'heatstate' as users do; in tests that is the source tree
    alias: sourceAliases(readManifest(), root),
  },
  test: {
    testTimeout: 60_000,
    // pool options belong to a pool, for every project on it: the unit project is the only one on
    // forks, the integration project the only one on threads
    poolOptions: {
      // unit files share one module graph in one worker process (no test mocks modules or relies on
      // fresh module state): the source tree is imported once, not once per file or per worker. A
      // second worker cost about 6 s more CPU (its own import of the tree) for under 2 s less wall
      // time alone, and in `npm test` the integration project keeps the other core busy
      forks: { isolate: false, maxForks: 1, minForks: 1 },
      // integration files mostly wait on child processes (build, typedoc, npm, a browser): a worker
      // thread for each (ten files; a fresh thread per file, as isolated as a process, without
      // starting a Node process per file), so that every file is running while the build goes
      threads: { isolate: true, maxThreads: 16, minThreads: 1 },
    },
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/**/*.test.ts'],
          exclude: integration,
          pool: 'forks',
          // the unit workers yield the CPU to the build and typedoc (see the file)
          setupFiles: ['tests/helpers/unit-priority.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: integration,
          pool: 'threads',
          globalSetup: ['tests/helpers/global-setup.ts'],
          testTimeout: 120_000,
          hookTimeout: 300_000,
        },
      },
    ],
  },
});
