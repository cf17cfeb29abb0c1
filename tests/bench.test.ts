import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { cases } from '../bench/cases.js';

const root = fileURLToPath(new URL('..', import.meta.url));

describe('bench/ (figures only: nothing here asserts a time)', () => {
  it('runs to completion in quick mode and reports every case, the machine and Node version', () => {
    const out = join(mkdtempSync(join(tmpdir(), 'heatstate-bench-')), 'results.json');
    execFileSync(fileURLToPath(new URL('../node_modules/.bin/tsx', import.meta.url)), ['bench/run.ts', '--quick'], { cwd: root, env: { ...process.env, HEATSTATE_BENCH_OUT: out }, stdio: 'pipe', timeout: 240_000 });
    const results = JSON.parse(readFileSync(out, 'utf8')) as { node: string; cores: number; rows: { name: string; medianNs: number }[]; coldStart: unknown };
    expect(results.node).toBe(process.version);
    expect(results.cores).toBeGreaterThan(0);
    expect(results.rows.map((r) => r.name).sort()).toEqual(cases.map((c) => c.name).sort());
    for (const r of results.rows) expect(r.medianNs, r.name).toBeGreaterThan(0);
    expect(results.coldStart).toBeDefined();
  }, 300_000);
});
