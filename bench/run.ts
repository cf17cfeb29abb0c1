/**
 * `npm run bench`: measures the hot functions with tinybench, prints a table, and writes
 * bench/results.json with the machine and Node version. Reports figures only; nothing here
 * asserts a time (machines are small and noisy).
 *
 * Each case may name a target (ns per call) and a baseline case measured in the same run;
 * the table shows the ratio to the baseline and how far a target is missed.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { Bench } from 'tinybench';
import { cases } from './cases.js';

const quick = process.argv.includes('--quick');
const bench = new Bench({ time: quick ? 50 : 500, warmupTime: quick ? 20 : 200, iterations: quick ? 3 : 32, warmupIterations: quick ? 1 : 8 });
for (const c of cases) bench.add(c.name, c.fn);
await bench.run();

interface Row {
  name: string;
  medianNs: number;
  meanNs: number;
  samples: number;
  targetNs?: number;
  versusTarget?: string;
  baseline?: string;
  speedupOverBaseline?: number;
}
const rows: Row[] = [];
const median = (name: string): number => {
  const t = bench.tasks.find((x) => x.name === name);
  const r = t?.result as { latency?: { p50?: number; mean?: number } } | undefined;
  return (r?.latency?.p50 ?? NaN) * 1e6;
};
for (const c of cases) {
  const t = bench.tasks.find((x) => x.name === c.name)!;
  const r = t.result as { latency?: { p50?: number; mean?: number; samples?: number[] } } | undefined;
  const perCall = c.perCall ?? 1;
  const med = (r?.latency?.p50 ?? NaN) * 1e6 / perCall;
  const row: Row = { name: c.name, medianNs: med, meanNs: ((r?.latency?.mean ?? NaN) * 1e6) / perCall, samples: r?.latency?.samples?.length ?? 0 };
  if (c.targetNs !== undefined) {
    row.targetNs = c.targetNs;
    row.versusTarget = med <= c.targetNs ? 'met' : `missed by ${(med / c.targetNs).toFixed(2)}×`;
  }
  if (c.baseline !== undefined) {
    row.baseline = c.baseline;
    row.speedupOverBaseline = median(c.baseline) / (c.baselinePerCall ?? 1) / med;
  }
  rows.push(row);
}

console.table(
  rows.map((r) => ({
    case: r.name,
    'median ns/call': Number(r.medianNs.toPrecision(3)),
    target: r.targetNs ?? '',
    'vs target': r.versusTarget ?? '',
    'vs baseline': r.speedupOverBaseline !== undefined ? `${r.speedupOverBaseline.toFixed(1)}× faster than ${r.baseline}` : '',
  })),
);

/** Time to import a built entry in a fresh Node process (measured inside the process, median of 7). */
function coldStart(entry: string): { entry: string; medianMs: number; runs: number[] } | { entry: string; skipped: string } {
  const url = new URL(`../dist/${entry}.js`, import.meta.url);
  if (!existsSync(url)) return { entry, skipped: 'dist/ not built: run `npm run build` (npm run bench does)' };
  const script = `const t = performance.now(); await import(${JSON.stringify(url.href)}); console.log(performance.now() - t);`;
  const runs: number[] = [];
  for (let i = 0; i < 7; i++) runs.push(Number(execFileSync(process.execPath, ['--input-type=module', '-e', script], { encoding: 'utf8' }).trim()));
  const sorted = [...runs].sort((a, b) => a - b);
  return { entry, medianMs: sorted[3]!, runs };
}

// the target (30 ms) is for the root entry; the subpaths are reported beside it
const cold = ['index', 'units/index', 'ideal-gas/index', 'water/index', 'tables/index'].map(coldStart);
console.log('');
for (const c of cold) {
  const name = c.entry === 'index' ? 'heatstate' : `heatstate/${c.entry.replace('/index', '')}`;
  if ('medianMs' in c) {
    const verdict = c.entry === 'index' ? ` (target 30 ms: ${c.medianMs <= 30 ? 'met' : `missed by ${(c.medianMs / 30).toFixed(2)}×`})` : '';
    console.log(`cold start: import of ${name} in a fresh Node process, median ${c.medianMs.toFixed(1)} ms${verdict}`);
  } else {
    console.log(`cold start of ${name}: skipped (${c.skipped})`);
  }
}

const cpu = os.cpus()[0]?.model ?? 'unknown';
const outPath = process.env.HEATSTATE_BENCH_OUT ?? fileURLToPath(new URL('./results.json', import.meta.url));
writeFileSync(
  outPath,
  `${JSON.stringify({ date: new Date().toISOString(), node: process.version, platform: `${os.platform()} ${os.arch()}`, cpu, cores: os.cpus().length, quick, coldStart: cold, rows }, null, 2)}\n`,
);
console.log(`\nwrote ${outPath} (${cpu}, ${os.cpus().length} cores, Node ${process.version})`);
