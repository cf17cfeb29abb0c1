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
  'tests/cli.test.ts',
  'tests/serverless.test.ts',
  'tests/bundle.test.ts',
  'tests/docs/api.test.ts',
  'tests/errors-dual.test.ts',
];

export default defineConfig({
  resolve: {
    // examples import 'heatstate' as users do; in tests that is the source tree
    alias: sourceAliases(readManifest(), root),
  },
  test: {
    testTimeout: 60_000,
    // pool options are per pool, for all projects: the unit project is the only one on threads,
    // the integration project the only one on forks
    poolOptions: {
      // unit files share one module graph per worker thread (no test mocks modules or relies on
      // fresh module state): importing the source tree once per worker instead of once per file
      threads: { isolate: false, maxThreads: 2, minThreads: 1 },
      // integration files mostly wait on child processes (build, typedoc, npm, a browser): a process
      // for each (there are 11), so that every file is running while the build goes
      forks: { maxForks: 16, minForks: 1 },
    },
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/**/*.test.ts'],
          exclude: integration,
          pool: 'threads',
        },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: integration,
          pool: 'forks',
          globalSetup: ['tests/helpers/global-setup.ts'],
          testTimeout: 120_000,
          hookTimeout: 300_000,
        },
      },
    ],
  },
});
