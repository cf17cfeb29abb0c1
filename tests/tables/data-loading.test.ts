/**
 * The built package ships the generated steam tables of heatstate/tables/water (data/water-tables/*.json)
 * as JSON text (tsup.config.ts, `jsonAsText`), parsed on first use by src/tables/water.ts. These
 * tests bundle that module with the build's plugin and check that the bundle holds strings, not
 * object literals, and that the tables it builds are exactly those of the sources; and, for every
 * file the build ships as text, that the text parses to exactly the file.
 */
import { build, type OnLoadArgs, type OnLoadResult, type PluginBuild } from 'esbuild';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { jsonAsText, jsonAsTextPlugin } from '../../tsup.config.js';
import { waterTables } from '../../src/tables/water.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'heatstate-tables-loading-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

type Tables = typeof waterTables;
const readJson = (path: string) => JSON.parse(readFileSync(join(root, path), 'utf8')) as unknown;
/** In the order of {@link pick}: SI, then US customary. */
const files = ['si', 'us'].flatMap((u) => ['saturation-by-T', 'saturation-by-p', 'superheated-vapor', 'compressed-liquid'].map((t) => `data/water-tables/${t}-${u}.json`));
const pick = (t: Tables | Tables['us']) => [t.saturationByT(), t.saturationByP(), t.superheated(), t.compressedLiquid()];

describe('water tables data loading (the build ships the data as JSON text)', () => {
  it('every data/water-tables file is shipped as text through src/tables/water.ts', () => {
    const shipped = Object.entries(jsonAsText).filter(([file]) => file.startsWith('data/water-tables/'));
    expect(shipped.map(([f]) => f).sort()).toStrictEqual([...files].sort());
    expect(new Set(shipped.map(([, importer]) => importer))).toStrictEqual(new Set(['src/tables/water.ts']));
  });

  it('the bundle holds the tables as strings and builds exactly the tables of the sources (deep-equal)', async () => {
    const result = await build({ stdin: { contents: `export { waterTables } from './src/tables/water.ts';`, resolveDir: root, loader: 'ts' }, bundle: true, format: 'esm', platform: 'node', write: false, plugins: [jsonAsTextPlugin(root)], logLevel: 'silent' });
    const text = result.outputFiles[0]!.text;
    // keys of the table files appear as JSON text (quoted, no spaces), never as an object literal's key
    expect(text).toContain('"interpolationError":{');
    expect(text).not.toMatch(/\binterpolationError:\s*\{/);
    const file = join(dir, 'water-tables.mjs');
    writeFileSync(file, text);
    const bundled = (await import(pathToFileURL(file).href)) as { waterTables: Tables };
    const a = bundled.waterTables;
    // each table's stored data (names, source, units, every number, the interpolation error) is the file's
    const fromBundle = [...pick(a), ...pick(a.us)];
    expect(fromBundle.map((t) => t.data)).toStrictEqual(files.map(readJson));
    // and what the sources build from the same files
    expect(fromBundle.map((t) => t.data)).toStrictEqual([...pick(waterTables), ...pick(waterTables.us)].map((t) => t.data));
    expect(a.superheated().lookup('h', { p: '1 MPa', T: '300 °C' }).value.si).toBe(waterTables.superheated().lookup('h', { p: '1 MPa', T: '300 °C' }).value.si);
    // parsed and built once
    expect(a.superheated()).toBe(a.superheated());
  });
});

/** The module text the build's plugin loads for a data file (its onLoad callback, called directly). */
function pluginModule(path: string): string {
  let load: ((args: OnLoadArgs) => OnLoadResult) | undefined;
  const fake = { onResolve: () => undefined, onLoad: (_: unknown, cb: typeof load) => void (load = cb) } as unknown as PluginBuild;
  void jsonAsTextPlugin(root).setup(fake);
  return load!({ path: resolve(root, path), namespace: 'heatstate-json-text', suffix: '', pluginData: undefined, with: {} }).contents as string;
}

describe('data shipped as JSON text', () => {
  it.each(Object.keys(jsonAsText))('%s: the text the build ships parses to exactly the file (deep-equal)', (file) => {
    const m = /^export default ("(?:[^"\\]|\\.)*");\n$/s.exec(pluginModule(file));
    expect(m, 'a module whose only export is a string literal').not.toBeNull();
    const text = JSON.parse(m![1]!) as unknown;
    expect(typeof text).toBe('string');
    expect(JSON.parse(text as string)).toStrictEqual(readJson(file));
  });
});
