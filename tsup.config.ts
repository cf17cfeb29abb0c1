import { defineConfig } from 'tsup';

export default defineConfig([
  /** One entry per public subpath, so a user who imports only `heatstate/units` loads nothing else. */
  {
    entry: {
      index: 'src/index.ts',
      'units/index': 'src/units/index.ts',
      'incompressible/index': 'src/incompressible/index.ts',
      'ideal-gas/index': 'src/ideal-gas/index.ts',
      'water/index': 'src/water/index.ts',
      'tables/index': 'src/tables/index.ts',
      'tables/water/index': 'src/tables/water.ts',
    },
    format: ['esm', 'cjs'],
    dts: true,
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
    entry: { cli: 'src/cli/main.ts' },
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
