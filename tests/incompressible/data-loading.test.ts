/**
 * The built package ships data/incompressible.json and data/incompressible/brines.json as JSON text
 * (tsup.config.ts, `jsonAsTextPlugin`), parsed on first use by src/incompressible/data-files.ts.
 * These tests bundle the sources with the build's plugin and check that what the bundle reads is
 * exactly the data files, and that the catalogue it serves is the one the sources serve.
 */
import { build } from 'esbuild';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { jsonAsTextPlugin } from '../../tsup.config.js';
import { incompressibleCatalogue, incompressibleNames } from '../../src/incompressible/index.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'heatstate-data-loading-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Bundles `code` (resolved from the repository root) with the build's plugin, writes it and imports it. */
async function bundled(name: string, code: string): Promise<{ text: string; module: Record<string, (...a: unknown[]) => unknown> }> {
  const result = await build({ stdin: { contents: code, resolveDir: root, loader: 'ts' }, bundle: true, format: 'esm', platform: 'node', write: false, plugins: [jsonAsTextPlugin(root)], logLevel: 'silent' });
  const text = result.outputFiles[0]!.text;
  const file = join(dir, `${name}.mjs`);
  writeFileSync(file, text);
  return { text, module: (await import(pathToFileURL(file).href)) as Record<string, (...a: unknown[]) => unknown> };
}
const readJson = (path: string) => JSON.parse(readFileSync(join(root, path), 'utf8')) as unknown;

describe('incompressible data loading (the build ships the data as JSON text)', () => {
  it('the bundled data module holds the files as strings and parses them to exactly the files (deep-equal)', async () => {
    const { text, module } = await bundled('data-files', `export { catalogueData, brinesData } from './src/incompressible/data-files.ts';`);
    // the data are string literals: a key of the catalogue appears as JSON text (quoted, no spaces),
    // never as an object literal's key
    expect(text).toContain('"substances":[');
    expect(text).toContain('"solutions":[');
    expect(text).not.toMatch(/\bsubstances:\s*\[/);
    expect(text).not.toMatch(/\bsolutions:\s*\[/);
    expect(module.catalogueData!()).toStrictEqual(readJson('data/incompressible.json'));
    expect(module.brinesData!()).toStrictEqual(readJson('data/incompressible/brines.json'));
    // parsed once
    expect(module.catalogueData!()).toBe(module.catalogueData!());
  });
  it('the bundled catalogue serves the same definitions and names as the sources', async () => {
    const { module } = await bundled('catalogue', `export { incompressibleCatalogue, incompressibleNames } from './src/incompressible/index.ts';`);
    expect(module.incompressibleCatalogue!()).toStrictEqual(incompressibleCatalogue());
    expect(module.incompressibleNames!()).toStrictEqual(incompressibleNames());
  });
  it('the build refuses any other importer of a file shipped as text', async () => {
    await expect(build({ stdin: { contents: `import d from './data/incompressible.json'; console.log(d);`, resolveDir: root, loader: 'ts' }, bundle: true, write: false, plugins: [jsonAsTextPlugin(root)], logLevel: 'silent' })).rejects.toThrow(/ships as JSON text: import it through src\/incompressible\/data-files\.ts/);
  });
});
