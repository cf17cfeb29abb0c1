/**
 * The published types match the runtime: the runtime bundles a private, tree-shaken copy of zod's
 * validation, so no declaration file may import zod (a consumer's zod would then be a different
 * copy from the one that validates). Definitions and tables are typed with plain interfaces.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { builtDist } from '../helpers/dist.js';

const dist = fileURLToPath(new URL('../../dist/', import.meta.url));
beforeAll(() => builtDist(), 300_000);

describe('declaration files', () => {
  it('import nothing from zod', () => {
    const files = (readdirSync(dist, { recursive: true }) as string[]).filter((f) => /\.d\.c?ts$/.test(f));
    expect(files.length).toBeGreaterThan(10);
    const importing = files.filter((f) => /(?:from\s+|import\s*\(?\s*)['"]zod/.test(readFileSync(join(dist, f), 'utf8')));
    expect(importing).toEqual([]);
  });
});
