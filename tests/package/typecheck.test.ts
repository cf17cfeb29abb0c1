/**
 * The whole tree type-checks: every file tsconfig.json includes (src, tests, scripts, examples and
 * bench) with its compiler options, as `npm run typecheck` (tsc --noEmit) checks them. This is also
 * what proves that every `@ts-expect-error` line in the tests still meets an error, i.e. that the
 * dimension checks still reject what they must.
 *
 * The compiler program is the API reference's (tests/helpers/api-reference.ts): typedoc builds it
 * from tsconfig.json and reports its diagnostics before documenting, so the tree is type-checked once
 * per run for both files instead of twice. It runs in the integration project, beside the build.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, inject, it } from 'vitest';
import { apiReference } from '../helpers/api-reference.js';

const root = fileURLToPath(new URL('../..', import.meta.url));

describe('the type check of the whole tree (tsconfig.json, as npm run typecheck)', () => {
  it('reports no errors', async () => {
    // the check is on: neither the command line nor typedoc.json skips it, and typedoc reads tsconfig.json
    const typedoc = JSON.parse(readFileSync(join(root, 'typedoc.json'), 'utf8')) as { skipErrorChecking?: boolean; tsconfig?: string };
    expect(typedoc.skipErrorChecking ?? false).toBe(false);
    expect(typedoc.tsconfig).toBe('tsconfig.json');
    const { args, code, output } = await apiReference(inject('heatstateJobs'));
    expect(args).not.toContain('--skipErrorChecking');
    // a type error is printed as `file:line:col - error TS…` and makes typedoc exit with code 3
    expect(output).not.toMatch(/error TS\d+/);
    expect(code, output).toBe(0);
  }, 300_000);
});
