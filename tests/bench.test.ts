import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { builtDist } from './helpers/dist.js';
import { runCommand } from './helpers/run.js';

const root = fileURLToPath(new URL('..', import.meta.url));

// the cold-start figures import this run's dist/
beforeAll(() => builtDist(), 300_000);

describe('bench/ (figures only: nothing here asserts a time)', () => {
  // smoke mode: a few calls per case, one cold start per entry, a small native comparison; it proves
  // that bench/ runs and reports everything (the figures come from `npm run bench`)
  it('runs to completion in smoke mode and reports every case, the cold starts, the machine and Node version', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'heatstate-bench-'));
    const out = join(dir, 'results.json');
    await runCommand(process.execPath, ['--import', 'tsx', 'bench/run.ts', '--smoke'], { cwd: root, env: { ...process.env, HEATSTATE_BENCH_OUT: out }, timeout: 240_000 });
    const text = readFileSync(out, 'utf8');
    rmSync(dir, { recursive: true, force: true });
    const results = JSON.parse(text) as { node: string; cores: number; smoke: boolean; cases: string[]; rows: { name: string; medianNs: number }[]; coldStart: { entry: string; medianMs?: number; skipped?: string }[] };
    expect(results.smoke).toBe(true);
    expect(results.node).toBe(process.version);
    expect(results.cores).toBeGreaterThan(0);
    // every case bench/cases.ts collects (its own and those of every bench/cases/*.ts), as the run
    // loaded them (importing them here as well would build their inputs a second time), has a row
    expect(results.cases.length).toBeGreaterThan(0);
    expect(new Set(results.cases).size, 'case names are unique').toBe(results.cases.length);
    expect(results.rows.map((r) => r.name).sort()).toEqual([...results.cases].sort());
    for (const r of results.rows) expect(r.medianNs, r.name).toBeGreaterThan(0);
    // every entry measured (none skipped for want of dist/)
    expect(results.coldStart.map((c) => c.entry)).toEqual(['index', 'units/index', 'ideal-gas/index', 'water/index', 'tables/index', 'tables/water/index']);
    // one pair of processes per entry: the difference is a number (it may be noise), never a skip
    for (const c of results.coldStart) expect(Number.isFinite(c.medianMs), `${c.entry}: ${c.skipped ?? ''}`).toBe(true);
    // the first calls (import and one facade call) of three entries, each a number
    const firstCalls = (results as unknown as { firstCalls: { entry: string; medianMs?: number; skipped?: string }[] }).firstCalls;
    expect(firstCalls.map((c) => c.entry)).toEqual(['water/index', 'humid-air/index', 'ideal-gas/index']);
    for (const c of firstCalls) expect(Number.isFinite(c.medianMs), `${c.entry}: ${c.skipped ?? ''}`).toBe(true);
    // the floor the entries are read against: an empty ES module, measured the same way
    expect(Number.isFinite((results as unknown as { coldStartFloorMs: number }).coldStartFloorMs)).toBe(true);
  }, 300_000);
});
