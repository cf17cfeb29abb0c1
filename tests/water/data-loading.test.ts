/**
 * The built package ships data/if97/backward-region3.json as JSON text (tsup.config.ts, `jsonAsText`),
 * parsed on the first call of src/water/if97/backward-region3.ts. These tests check that the text the
 * build's plugin writes for every file it ships this way parses to exactly that file, and that the
 * bundled region 3 backward equations hold their data as a string and give the sources' values bit
 * for bit.
 */
import { build, type OnLoadArgs, type OnLoadResult, type PluginBuild } from 'esbuild';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { jsonAsText, jsonAsTextPlugin } from '../../tsup.config.js';
import * as sources from '../../src/water/if97/backward-region3.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'heatstate-water-loading-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The module text the plugin loads for a data file (its onLoad callback, called directly). */
function pluginModule(path: string): string {
  let load: ((args: OnLoadArgs) => OnLoadResult) | undefined;
  const fake = { onResolve: () => undefined, onLoad: (_: unknown, cb: typeof load) => void (load = cb) } as unknown as PluginBuild;
  void jsonAsTextPlugin(root).setup(fake);
  return load!({ path: resolve(root, path), namespace: 'heatstate-json-text', suffix: '', pluginData: undefined, with: {} }).contents as string;
}

describe('data shipped as JSON text', () => {
  it.each(Object.keys(jsonAsText))('%s: the text the build ships parses to exactly the file (deep-equal)', (file) => {
    const module = pluginModule(file);
    const m = /^export default ("(?:[^"\\]|\\.)*");\n$/s.exec(module);
    expect(m, 'a module whose only export is a string literal').not.toBeNull();
    const text = JSON.parse(m![1]!) as string;
    expect(typeof text).toBe('string');
    expect(JSON.parse(text)).toStrictEqual(JSON.parse(readFileSync(join(root, file), 'utf8')));
  });
});

describe('IF97 region 3 backward equations from the bundle', () => {
  it('hold their data as a string and give the values of the sources, bit for bit', async () => {
    const result = await build({ stdin: { contents: `export * from './src/water/if97/backward-region3.ts';`, resolveDir: root, loader: 'ts' }, bundle: true, format: 'esm', platform: 'node', write: false, plugins: [jsonAsTextPlugin(root)], logLevel: 'silent' });
    const text = result.outputFiles[0]!.text;
    // a key of the file appears as JSON text (quoted, no spaces), never as an object literal's key
    expect(text).toContain('"T3aPH":{');
    expect(text).not.toMatch(/\bT3aPH:\s*\{/);
    const file = join(dir, 'backward-region3.mjs');
    writeFileSync(file, text);
    const bundled = (await import(pathToFileURL(file).href)) as typeof sources;
    // the points of IAPWS SR3-03(2014) Tables 5 and 12, on both sides of the 3a/3b boundaries
    for (const [p, h] of [[20e6, 1700e3], [50e6, 2000e3], [100e6, 2100e3], [20e6, 2500e3], [50e6, 2400e3], [100e6, 2700e3]] as const) {
      expect(bundled.region3TemperaturePH(p, h)).toBe(sources.region3TemperaturePH(p, h));
      expect(bundled.region3VolumePH(p, h)).toBe(sources.region3VolumePH(p, h));
      expect(bundled.h3abEnthalpy(p)).toBe(sources.h3abEnthalpy(p));
    }
    for (const [p, s] of [[20e6, 3.8e3], [50e6, 3.6e3], [100e6, 4.0e3], [20e6, 5.0e3], [50e6, 4.5e3], [100e6, 5.0e3]] as const) {
      expect(bundled.region3TemperaturePS(p, s)).toBe(sources.region3TemperaturePS(p, s));
      expect(bundled.region3VolumePS(p, s)).toBe(sources.region3VolumePS(p, s));
    }
    // and the published value itself (SR3-03 Table 5: T_3a(20 MPa, 1700 kJ/kg) = 629.3083892 K)
    expect(bundled.region3TemperaturePH(20e6, 1700e3)).toBeCloseTo(629.3083892, 6);
  });
});
