/**
 * `npm run entries`: writes package.json's `exports`, tsconfig's `paths`, typedoc.json's
 * `entryPoints` and src/index.ts from entries.json. tests/entries.test.ts checks they are current.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { exportsMap, readManifest, rootIndex, ROOT, tsconfigPaths } from './entries.js';

const manifest = readManifest();
const json = (file: string): Record<string, unknown> => JSON.parse(readFileSync(resolve(ROOT, file), 'utf8')) as Record<string, unknown>;

const pkg = json('package.json');
pkg.exports = exportsMap(manifest);
writeFileSync(resolve(ROOT, 'package.json'), `${JSON.stringify(pkg, null, 2)}\n`);

const typedoc = json('typedoc.json');
typedoc.entryPoints = manifest.entries.map((e) => e.source);
writeFileSync(resolve(ROOT, 'typedoc.json'), `${JSON.stringify(typedoc, null, 2)}\n`);

const tsconfig = json('tsconfig.json');
(tsconfig.compilerOptions as Record<string, unknown>).paths = tsconfigPaths(manifest);
writeFileSync(resolve(ROOT, 'tsconfig.json'), `${JSON.stringify(tsconfig, null, 2)}\n`);

writeFileSync(resolve(ROOT, 'src/index.ts'), rootIndex(manifest));
console.log(`wrote exports, tsconfig paths and typedoc entry points for ${manifest.entries.length} entries, and src/index.ts`);
