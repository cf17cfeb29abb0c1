/**
 * No hand-written source file over 500 lines (common practice for a codebase others must read; the
 * model-contract issue set the limit). Generated files (`*.generated.ts`) are exempt.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const src = fileURLToPath(new URL('../src/', import.meta.url));

describe('source files', () => {
  it('are at most 500 lines each, generated kernels aside', () => {
    const files = (readdirSync(src, { recursive: true }) as string[]).filter((f) => f.endsWith('.ts') && !f.endsWith('.generated.ts'));
    expect(files.length).toBeGreaterThan(50);
    const long = files.map((f) => [f, readFileSync(join(src, f), 'utf8').split('\n').length - 1] as const).filter(([, n]) => n > 500);
    expect(long).toEqual([]);
  });
});
