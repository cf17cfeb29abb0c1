import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';
import { readManifest, sourceAliases } from './scripts/entries.js';

const root = fileURLToPath(new URL('./', import.meta.url));

export default defineConfig({
  resolve: {
    // examples import 'heatstate' as users do; in tests that is the source tree
    alias: sourceAliases(readManifest(), root),
  },
  test: {
    include: ['tests/**/*.test.ts'],
    testTimeout: 60_000,
  },
});
