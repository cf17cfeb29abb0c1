import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join, relative, resolve } from 'node:path';
import type { Plugin } from 'esbuild';
import { defineConfig, type Options } from 'tsup';
import type * as TypeScript from 'typescript';
import { readManifest, tsupEntries } from './scripts/entries.js';
import { mergeChunks } from './scripts/merge-chunks.js';

const manifest = readManifest();
const root = process.cwd();

/**
 * The declarations of every entry, emitted once by the TypeScript compiler into a temporary folder
 * (with `noCheck`: declaration emit without a type check of the bodies; `npm run typecheck`, run by
 * `npm test`, is the type check), for tsup to bundle into `.d.ts` and `.d.cts`. tsup's own `dts`
 * from the sources would type-check src/ a second time inside the build.
 *
 * Returns tsup's dts entry map: output name → the entry's emitted declaration file. The folder is
 * outside node_modules (the bundler leaves files there external) and removed when tsup exits.
 */
function emitDeclarations(): Record<string, string> {
  // loaded here, not at the top: importing this config (tests/entries.test.ts does) compiles nothing
  const ts = createRequire(import.meta.url)('typescript') as typeof TypeScript;
  const dir = mkdtempSync(join(tmpdir(), 'heatstate-declarations-'));
  process.on('exit', () => rmSync(dir, { recursive: true, force: true }));
  const host: TypeScript.ParseConfigFileHost = {
    ...ts.sys,
    onUnRecoverableConfigFileDiagnostic: (d) => {
      throw new Error(ts.flattenDiagnosticMessageText(d.messageText, '\n'));
    },
  };
  const config = ts.getParsedCommandLineOfConfigFile(join(root, 'tsconfig.json'), undefined, host)!;
  const options: TypeScript.CompilerOptions = {
    ...config.options,
    noEmit: false,
    declaration: true,
    emitDeclarationOnly: true,
    declarationMap: false,
    noCheck: true,
    // members marked @internal stay out of the published types
    stripInternal: true,
    incremental: false,
    rootDir: root,
    outDir: dir,
  };
  const program = ts.createProgram(
    manifest.entries.map((e) => resolve(root, e.source)),
    options,
  );
  const emitted = program.emit(undefined, undefined, undefined, true);
  const problems = [...program.getOptionsDiagnostics(), ...program.getSyntacticDiagnostics(), ...emitted.diagnostics];
  if (problems.length > 0) {
    throw new Error(`declaration emit failed:\n${ts.formatDiagnostics(problems, { getCanonicalFileName: (f) => f, getCurrentDirectory: () => root, getNewLine: () => '\n' })}`);
  }
  // a declaration that refers to a JSON module would reach the data file from the temporary folder
  // (where it is not): refuse instead of shipping a broken reference
  const files = (readdirSync(dir, { recursive: true }) as string[]).filter((f) => f.endsWith('.d.ts'));
  const json = files.filter((f) => /from\s+['"][^'"]+\.json['"]|import\(\s*['"][^'"]+\.json['"]/.test(readFileSync(join(dir, f), 'utf8')));
  if (json.length > 0) throw new Error(`declarations refer to JSON modules (type the data with an interface instead): ${json.join(', ')}`);
  return Object.fromEntries(manifest.entries.map((e) => [e.out, join(dir, e.source.replace(/\.ts$/, '.d.ts'))]));
}

/**
 * Data files the build ships as JSON text, each with the one module allowed to import it (paths from
 * the repository root). That module's default import is then a string, which it parses with
 * `JSON.parse` on first use (src/incompressible/data-files.ts, src/tables/water.ts): V8 only scans
 * a string at import, where a large object literal is compiled and built on every start. Any other
 * importer stops the build (it would get text where it expects an object).
 */
export const jsonAsText: Readonly<Record<string, string>> = {
  'data/incompressible.json': 'src/incompressible/data-files.ts',
  'data/incompressible/brines.json': 'src/incompressible/data-files.ts',
  // the generated steam tables of heatstate/tables/water: about 180 kB of number arrays
  'data/water-tables/saturation-by-T-si.json': 'src/tables/water.ts',
  'data/water-tables/saturation-by-T-us.json': 'src/tables/water.ts',
  'data/water-tables/saturation-by-p-si.json': 'src/tables/water.ts',
  'data/water-tables/saturation-by-p-us.json': 'src/tables/water.ts',
  'data/water-tables/superheated-vapor-si.json': 'src/tables/water.ts',
  'data/water-tables/superheated-vapor-us.json': 'src/tables/water.ts',
  'data/water-tables/compressed-liquid-si.json': 'src/tables/water.ts',
  'data/water-tables/compressed-liquid-us.json': 'src/tables/water.ts',
};

/** The esbuild plugin that applies {@link jsonAsText}: the file's JSON, re-serialised without spaces, as a string export. */
export function jsonAsTextPlugin(base: string = root): Plugin {
  const files = new Map(Object.entries(jsonAsText).map(([file, importer]) => [resolve(base, file), resolve(base, importer)]));
  return {
    name: 'heatstate-json-as-text',
    setup(b) {
      b.onResolve({ filter: /\.json$/ }, (args) => {
        const path = resolve(args.resolveDir, args.path);
        const importer = files.get(path);
        if (importer === undefined) return undefined;
        if (resolve(args.importer) !== importer) {
          return { errors: [{ text: `${relative(base, path)} ships as JSON text: import it through ${relative(base, importer)}, not from ${relative(base, args.importer)}` }] };
        }
        return { path, namespace: 'heatstate-json-text' };
      });
      b.onLoad({ filter: /.*/, namespace: 'heatstate-json-text' }, (args) => ({
        contents: `export default ${JSON.stringify(JSON.stringify(JSON.parse(readFileSync(args.path, 'utf8'))))};\n`,
        loader: 'js',
        resolveDir: dirname(args.path),
      }));
    },
  };
}

let declarations: Options['dts'] | undefined;

/** What every JavaScript build shares. */
const common = {
  sourcemap: false,
  splitting: true,
  treeshake: true,
  target: 'node20',
  outDir: 'dist',
  // bundle the (tree-shaken) validation code instead of loading the zod package at run time:
  // importing the whole package costs over 100 ms of cold start
  noExternal: ['zod'],
  esbuildPlugins: [jsonAsTextPlugin()],
} satisfies Options;

/**
 * Three builds, run side by side in one tsup process: the ES modules, the CommonJS modules and the
 * declarations. The command-line tool (with its shebang) is one more entry of the ES module build,
 * so it shares that build's chunks instead of bundling every model a second time; CommonJS has no
 * `bin`, so it builds only the public entries.
 */
export default defineConfig([
  /** One entry per public subpath (entries.json), so a user who imports only `heatstate/units` loads nothing else. */
  {
    ...common,
    entry: { ...tsupEntries(manifest), [manifest.cli.out]: manifest.cli.source },
    format: ['esm'],
    clean: true,
    // fewer, larger shared chunks and ASCII-only files for the ES module output: each file costs a
    // cold start about as much as 20 kB of code (scripts/merge-chunks.ts)
    async onSuccess() {
      const plan = await mergeChunks(join(root, 'dist'), [...manifest.entries.map((e) => `${e.out}.js`), `${manifest.cli.out}.js`]);
      console.log(`ESM merged ${plan.reduce((n, g) => n + g.length, 0)} shared chunks into ${plan.length}`);
    },
  },
  { ...common, entry: tsupEntries(manifest), format: ['cjs'], clean: false },
  /** The declarations emitted above, bundled per entry into .d.ts and .d.cts. */
  {
    entry: tsupEntries(manifest),
    format: ['esm', 'cjs'],
    outDir: 'dist',
    clean: false,
    // emitted when tsup reads this option (once, at the start of the build), not when the config is imported
    get dts(): Options['dts'] {
      declarations ??= { entry: emitDeclarations(), compilerOptions: { stripInternal: true }, only: true };
      return declarations;
    },
  },
]);
