/**
 * The R7-97(2012) Table 29 row p = 90 MPa, s = 6 kJ/(kg·K) (region 2b, T(p, s), Eq. 26 with Table 26):
 * printed 1038.01126 K (from memory), computed 1038.011253 K. Is that rounding or data? This evaluates
 * the same equation from data/if97/backward-region2.json with decimal.js at 60 digits and in double
 * precision, and lists the terms whose coefficient would have to change (and by how much) to give the
 * printed value. Run: `npx tsx scripts/investigate-table29.ts`.
 */
import Decimal from 'decimal.js';
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { region2TemperaturePS } from '../src/water/if97/backward-ps.js';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const D = Decimal.clone({ precision: 60 });
const t = JSON.parse(readFileSync(resolve(root, 'data/if97/backward-region2.json'), 'utf8')).ps2b as { I: number[]; J: number[]; n: number[] };

function exact(p: number, s: number): InstanceType<typeof D> {
  const pi = new D(p);
  const y = new D(10).minus(new D(s).div('0.7853'));
  let sum = new D(0);
  for (let i = 0; i < t.n.length; i++) sum = sum.plus(new D(String(t.n[i])).mul(pi.pow(t.I[i]!)).mul(y.pow(t.J[i]!)));
  return sum;
}

const rows: [number, number, string][] = [
  [8, 6, '600.484040'],
  [8, 7.5, '1064.95556'],
  [90, 6, '1038.01126'],
];
for (const [p, s, printed] of rows) {
  const e = exact(p, s);
  console.log(`p = ${p} MPa, s = ${s} kJ/(kg·K): 60 digits ${e.toSignificantDigits(15)} K, double ${region2TemperaturePS(p * 1e6, s * 1e3)} K, printed ${printed} K`);
}
const miss = new D('1038.01126').minus(exact(90, 6));
console.log(`\nat 90 MPa the printed value is ${miss.toSignificantDigits(3)} K away; the 60-digit and double results agree, so this is not rounding.`);
console.log('a change of one coefficient that would close it, for the terms that matter at 90 MPa but hardly at 8 MPa (I ≥ 2):');
const pi90 = new D(90);
const y90 = new D(10).minus(new D(6).div('0.7853'));
const pi8 = new D(8);
const y8 = new D(10).minus(new D(6).div('0.7853'));
for (let i = 0; i < t.n.length; i++) {
  if (t.I[i]! < 2) continue;
  const term90 = new D(String(t.n[i])).mul(pi90.pow(t.I[i]!)).mul(y90.pow(t.J[i]!));
  const rel = miss.div(term90);
  const at8 = new D(String(t.n[i])).mul(pi8.pow(t.I[i]!)).mul(y8.pow(t.J[i]!)).mul(rel).abs();
  console.log(`  I = ${t.I[i]}, J = ${t.J[i]}, n = ${t.n[i]}: relative change ${rel.toSignificantDigits(3)} (moves the 8 MPa row by ${at8.toSignificantDigits(2)} K)`);
}
