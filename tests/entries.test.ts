/**
 * The entries manifest drives the public surface: every derived list matches entries.json, and
 * every entry's source exists (common practice: one source of truth, generated copies checked).
 */
import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { exportsMap, readManifest, rootIndex, ROOT, tsconfigPaths, tsupEntries } from '../scripts/entries.js';
import tsupConfig from '../tsup.config.js';

const manifest = readManifest();
const json = (file: string) => JSON.parse(readFileSync(resolve(ROOT, file), 'utf8')) as Record<string, any>;

describe('entries.json drives the public surface', () => {
  it('every entry names a source that exists, a unique subpath and output', () => {
    for (const e of manifest.entries) expect(existsSync(resolve(ROOT, e.source)), e.source).toBe(true);
    expect(new Set(manifest.entries.map((e) => e.subpath)).size).toBe(manifest.entries.length);
    expect(new Set(manifest.entries.map((e) => e.out)).size).toBe(manifest.entries.length);
  });
  it("package.json's exports match (run `npm run entries` after editing entries.json)", () => {
    expect(json('package.json').exports).toEqual(exportsMap(manifest));
  });
  it("typedoc's entry points match", () => {
    expect(json('typedoc.json').entryPoints).toEqual(manifest.entries.map((e) => e.source));
  });
  it("tsconfig's paths match", () => {
    expect(json('tsconfig.json').compilerOptions.paths).toEqual(tsconfigPaths(manifest));
  });
  it('src/index.ts re-exports exactly the root entries', () => {
    expect(readFileSync(resolve(ROOT, 'src/index.ts'), 'utf8')).toBe(rootIndex(manifest));
  });
  it('tsup builds every entry in both formats with their declarations, and the CLI as an ES module', () => {
    const configs = tsupConfig as unknown as { entry: Record<string, string>; format: string[] }[];
    // `dts` is a getter that emits the declarations: ask whether a config has it without reading it
    const declares = (c: object) => Object.getOwnPropertyDescriptor(c, 'dts') !== undefined;
    const built = (format: string) => configs.filter((c) => c.format.includes(format) && !declares(c)).map((c) => c.entry);
    expect(built('esm')).toEqual([{ ...tsupEntries(manifest), [manifest.cli.out]: manifest.cli.source }]);
    expect(built('cjs')).toEqual([tsupEntries(manifest)]);
    expect(configs.filter(declares).map((c) => c.entry)).toEqual([tsupEntries(manifest)]);
  });
});
