/**
 * The entries manifest (entries.json) and what derives from it: package.json's `exports`,
 * typedoc's entry points, src/index.ts (the root re-exports), tsup's entries, the source aliases
 * of vitest, tsconfig and the bundle test. One list; `npm run entries` rewrites the generated
 * files and tests/entries.test.ts fails when any of them drifts.
 *
 * @module
 */
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** One public entry. */
export interface Entry {
  /** The package subpath, `.` or `./water`. */
  readonly subpath: string;
  /** Its source module. */
  readonly source: string;
  /** Its output name in dist/ (without extension). */
  readonly out: string;
  /** Whether the root entry re-exports it (low-level entries stay out of the root). */
  readonly root?: boolean;
  /** One line for the docs. */
  readonly summary: string;
}

export interface Manifest {
  readonly entries: readonly Entry[];
  readonly cli: { readonly source: string; readonly out: string };
}

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');

/** The manifest as committed. */
export function readManifest(): Manifest {
  return JSON.parse(readFileSync(resolve(ROOT, 'entries.json'), 'utf8')) as Manifest;
}

/** The package specifier of an entry: `heatstate`, `heatstate/water`. */
export function specifier(e: Entry): string {
  return e.subpath === '.' ? 'heatstate' : `heatstate/${e.subpath.slice(2)}`;
}

/** package.json's `exports` map. */
export function exportsMap(m: Manifest): Record<string, unknown> {
  const map: Record<string, unknown> = {};
  for (const e of m.entries) {
    map[e.subpath] = {
      import: { types: `./dist/${e.out}.d.ts`, default: `./dist/${e.out}.js` },
      require: { types: `./dist/${e.out}.d.cts`, default: `./dist/${e.out}.cjs` },
    };
  }
  map['./package.json'] = './package.json';
  return map;
}

/** tsup's entry map: output name → source. */
export function tsupEntries(m: Manifest): Record<string, string> {
  return Object.fromEntries(m.entries.map((e) => [e.out, e.source]));
}

/** Source aliases (specifier → absolute source path), for vitest and the bundle test. */
export function sourceAliases(m: Manifest, root = ROOT): { find: RegExp; replacement: string }[] {
  // longest specifier first, so that heatstate/water/if97 is matched before heatstate/water
  return [...m.entries]
    .sort((a, b) => specifier(b).length - specifier(a).length)
    .map((e) => ({ find: new RegExp(`^${specifier(e).replace(/[/.-]/g, (c) => `\\${c}`)}$`), replacement: resolve(root, e.source) }));
}

/** tsconfig's `paths`. */
export function tsconfigPaths(m: Manifest): Record<string, string[]> {
  return Object.fromEntries(m.entries.map((e) => [specifier(e), [`./${e.source}`]]));
}

/** The text of src/index.ts. */
export function rootIndex(m: Manifest): string {
  const lines = [
    '/**',
    ' * heatstate: thermophysical properties for engineering software.',
    ' *',
    ' * The root entry re-exports the documented facade of every model subpath (generated from',
    ' * entries.json by `npm run entries`; do not edit by hand). Import a subpath (`heatstate/units`,',
    ' * `heatstate/water`) to load only what you use; low-level SI cores have entries of their own',
    ' * (`heatstate/water/if97`) and are not re-exported here.',
    ' *',
    ' * Results are engineering estimates: for pressure equipment, steam, refrigerants and heating',
    ' * systems, defer to the applicable codes and to licensed professionals.',
    ' *',
    ' * @packageDocumentation',
    ' */',
  ];
  for (const e of m.entries) {
    if (e.root !== true) continue;
    const rel = `./${e.source.replace(/^src\//, '').replace(/\.ts$/, '.js')}`;
    lines.push(`export * from '${rel}';`);
  }
  lines.push("export { molarMass, gasConstant, parseFormula, atomicWeight, knownElements } from './chem/index.js';");
  lines.push("export { MOLAR_GAS_CONSTANT, AVOGADRO_PER_MOL, BOLTZMANN_J_PER_K, STANDARD_ATMOSPHERE_PA, STANDARD_GRAVITY, STANDARD_STATE_PRESSURE_PA, REFERENCE_TEMPERATURE_K } from './chem/constants.js';");
  return `${lines.join('\n')}\n`;
}
