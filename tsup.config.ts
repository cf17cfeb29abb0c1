import { defineConfig } from 'tsup';
import { readManifest, tsupEntries } from './scripts/entries.js';

const manifest = readManifest();

export default defineConfig([
  /** One entry per public subpath (entries.json), so a user who imports only `heatstate/units` loads nothing else. */
  {
    entry: tsupEntries(manifest),
    format: ['esm', 'cjs'],
    // stripInternal: members marked @internal stay out of the published types
    dts: { compilerOptions: { stripInternal: true } },
    sourcemap: false,
    clean: true,
    splitting: true,
    treeshake: true,
    target: 'node20',
    outDir: 'dist',
    // bundle the (tree-shaken) validation code instead of loading the zod package at run time:
    // importing the whole package costs over 100 ms of cold start
    noExternal: ['zod'],
  },
  /** The command-line tool (ESM, with its shebang). */
  {
    entry: { [manifest.cli.out]: manifest.cli.source },
    format: ['esm'],
    sourcemap: false,
    clean: false,
    splitting: false,
    treeshake: true,
    target: 'node20',
    outDir: 'dist',
    noExternal: ['zod'],
  },
]);
