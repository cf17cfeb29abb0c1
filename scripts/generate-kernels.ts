/**
 * Generates src/water/if97/kernels.generated.ts: straight-line code for the IF97 term sums (basic
 * equations, R7-97 backward equations, SR2-01 p(h, s), SR3-03 region 3 T and v, SR4-04 h-s equations)
 * Σ nᵢ·xᴵⁱ·yᴶⁱ (and their first and second derivatives) from the coefficient files in data/if97.
 *
 * Powers are built by short multiplication chains (each needed power from two already built),
 * each term's xᴵ·yᴶ is formed once, and the derivative sums carry the constants n·I, n·I·(I−1), …
 * inline; they are divided by x, x², y, y², x·y at the end. No Math.pow, no arrays, no loops.
 *
 * Run: `npm run kernels`. tests/water/kernels-generated.test.ts fails if the committed module
 * differs from this script's output, and checks every kernel against a plain loop evaluation.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const KERNELS_PATH = resolve(root, 'src/water/if97/kernels.generated.ts');

interface Terms {
  I: number[];
  J: number[];
  n: number[];
}

const read = (name: string): Record<string, unknown> => JSON.parse(readFileSync(resolve(root, 'data/if97', `${name}.json`), 'utf8')) as Record<string, unknown>;

/** Statements that define `${v}${k}` = base^k for every k in `needed` (k ≠ 0), by a short multiplication chain. */
function powerChain(v: string, needed: Iterable<number>): string[] {
  const lines: string[] = [];
  const name = (k: number) => (k === 0 ? '1' : k === 1 ? v : k === -1 ? `i${v}` : k > 0 ? `${v}${k}` : `${v}m${-k}`);
  const have = new Set<number>([0, 1, -1]);
  const ensure = (k: number): void => {
    if (have.has(k)) return;
    const sign = Math.sign(k);
    const m = Math.abs(k);
    // the largest power of the same sign already built, below m
    let a = 1;
    for (const h of have) if (Math.sign(h) === sign && Math.abs(h) < m && Math.abs(h) > a) a = Math.abs(h);
    const d = m - a;
    if (d > a) {
      // square up first: m = 2·(m/2) + (m mod 2)
      const half = Math.floor(m / 2);
      ensure(sign * half);
      ensure(sign * (m - half));
      lines.push(`const ${name(k)} = ${name(sign * half)} * ${name(sign * (m - half))};`);
    } else {
      ensure(sign * d);
      lines.push(`const ${name(k)} = ${name(sign * a)} * ${name(sign * d)};`);
    }
    have.add(k);
  };
  for (const k of [...new Set(needed)].sort((p, q) => Math.abs(p) - Math.abs(q))) ensure(k);
  return lines;
}

const powName = (v: string, k: number) => (k === 0 ? '' : k === 1 ? v : k === -1 ? `i${v}` : k > 0 ? `${v}${k}` : `${v}m${-k}`);

function product(xi: number, yj: number): string {
  const parts = [powName('x', xi), powName('y', yj)].filter((p) => p !== '');
  return parts.length === 0 ? '1' : parts.join(' * ');
}

function sum(coefficients: number[], terms: string[]): string {
  const parts = coefficients.map((c, i) => (c === 0 ? '' : `${String(c)} * ${terms[i]}`)).filter((p) => p !== '');
  return parts.length === 0 ? '0' : parts.join(' +\n    ').replace(/\+ -/g, '- ');
}

/** A function filling out[0..5] with S, Sx, Sxx, Sy, Syy, Sxy. */
function sumsFunction(fn: string, doc: string, t: Terms): string {
  const lines: string[] = [];
  lines.push(`/** ${doc} */`);
  lines.push(`export function ${fn}(x: number, y: number, out: Float64Array): void {`);
  lines.push('  const ix = 1 / x;');
  lines.push('  const iy = 1 / y;');
  for (const l of powerChain('x', t.I)) lines.push(`  ${l}`);
  for (const l of powerChain('y', t.J)) lines.push(`  ${l}`);
  const terms = t.n.map((_, i) => `t${i}`);
  t.n.forEach((_, i) => lines.push(`  const t${i} = ${product(t.I[i]!, t.J[i]!)};`));
  const k = (f: (I: number, J: number, n: number) => number) => t.n.map((n, i) => f(t.I[i]!, t.J[i]!, n));
  lines.push(`  out[0] =\n    ${sum(k((_I, _J, n) => n), terms)};`);
  lines.push(`  out[1] =\n    (${sum(k((I, _J, n) => n * I), terms)}) * ix;`);
  lines.push(`  out[2] =\n    (${sum(k((I, _J, n) => n * I * (I - 1)), terms)}) * ix * ix;`);
  lines.push(`  out[3] =\n    (${sum(k((_I, J, n) => n * J), terms)}) * iy;`);
  lines.push(`  out[4] =\n    (${sum(k((_I, J, n) => n * J * (J - 1)), terms)}) * iy * iy;`);
  lines.push(`  out[5] =\n    (${sum(k((I, J, n) => n * I * J), terms)}) * ix * iy;`);
  lines.push('}');
  return lines.join('\n');
}

/** A function filling out[0..2] with G = Σ n τᴶ, Gτ and Gττ (the ideal-gas parts of regions 2 and 5). */
function idealFunction(fn: string, doc: string, J: number[], n: number[]): string {
  const lines: string[] = [];
  lines.push(`/** ${doc} */`);
  lines.push(`export function ${fn}(y: number, out: Float64Array): void {`);
  lines.push('  const iy = 1 / y;');
  for (const l of powerChain('y', J)) lines.push(`  ${l}`);
  const terms = J.map((j) => product(0, j));
  lines.push(`  out[0] =\n    ${sum(n, terms)};`);
  lines.push(`  out[1] =\n    (${sum(n.map((c, i) => c * J[i]!), terms)}) * iy;`);
  lines.push(`  out[2] =\n    (${sum(n.map((c, i) => c * J[i]! * (J[i]! - 1)), terms)}) * iy * iy;`);
  lines.push('}');
  return lines.join('\n');
}

/** A function returning S = Σ n xᴵ yᴶ only. */
function valueFunction(fn: string, doc: string, t: Terms): string {
  const lines: string[] = [];
  lines.push(`/** ${doc} */`);
  lines.push(`export function ${fn}(x: number, y: number): number {`);
  if (t.I.some((i) => i < 0)) lines.push('  const ix = 1 / x;');
  if (t.J.some((j) => j < 0)) lines.push('  const iy = 1 / y;');
  for (const l of powerChain('x', t.I)) lines.push(`  ${l}`);
  for (const l of powerChain('y', t.J)) lines.push(`  ${l}`);
  lines.push(`  return (\n    ${sum(t.n, t.n.map((_, i) => product(t.I[i]!, t.J[i]!)))}\n  );`);
  lines.push('}');
  return lines.join('\n');
}

export function renderKernels(): string {
  const r1 = read('region1') as unknown as Terms;
  const r2 = read('region2') as unknown as Terms & { metastable: Terms; J0: number[]; n0: number[] };
  const r3 = read('region3') as unknown as Terms;
  const r5 = read('region5') as unknown as Terms & { J0: number[]; n0: number[] };
  const b1 = read('backward-region1') as unknown as { ph: Terms; ps: Terms };
  const b2 = read('backward-region2') as unknown as Record<string, Terms>;
  const hs = read('backward-hs') as unknown as Record<string, Terms>;
  const r3b = read('backward-region3') as unknown as Record<string, Terms>;
  const sr4 = read('backward-hs-region3') as unknown as Record<string, Terms>;
  const sr4Functions = ['p3a', 'h1s', 'h3as', 'h2abs', 'h2c3bs', 'hB13s', 'TB23hs', 'Tsaths'].flatMap((k) => [
    valueFunction(`sr4${k}`, `SR4-04 ${k}: the term sum in its reduced variables (see data/if97/backward-hs-region3.json).`, sr4[k]!),
    '',
  ]);
  const region3Backward = ['T3aPH', 'T3bPH', 'v3aPH', 'v3bPH', 'T3aPS', 'T3bPS', 'v3aPS', 'v3bPS'].flatMap((k) => [
    valueFunction(`backward${k}`, `SR3-03 ${k[0]}(p, ${k.slice(-1).toLowerCase()}) subregion 3${k[2]}: x = π + shift, y = η (or σ) + shift.`, r3b[k]!),
    '',
  ]);
  const quarter = (t: Terms): Terms => ({ I: t.I.map((i) => Math.round(4 * i)), J: t.J, n: t.n });
  const out = [
    '// GENERATED by scripts/generate-kernels.ts from data/if97/*.json (IAPWS R7-97(2012) coefficients). Do not edit.',
    '/* eslint-disable */',
    '',
    sumsFunction('region1Sums', 'Region 1 (Table 2): x = 7.1 − π, y = τ − 1.222.', r1),
    '',
    idealFunction('region2IdealSums', 'Region 2 ideal-gas part (Table 10) without ln π: y = τ.', r2.J0, r2.n0),
    '',
    sumsFunction('region2ResidualSums', 'Region 2 residual part (Table 11): x = π, y = τ − 0.5.', r2),
    '',
    sumsFunction('region2MetastableSums', 'Metastable-vapour residual part (Table 16): x = π, y = τ − 0.5.', r2.metastable),
    '',
    sumsFunction('region3Sums', 'Region 3 (Table 30, without the n1·ln δ term): x = δ, y = τ.', r3),
    '',
    idealFunction('region5IdealSums', 'Region 5 ideal-gas part (Table 37) without ln π: y = τ.', r5.J0, r5.n0),
    '',
    sumsFunction('region5ResidualSums', 'Region 5 residual part (Table 38): x = π, y = τ.', r5),
    '',
    valueFunction('backward1PH', 'T(p, h) region 1 (Table 6): x = π, y = η + 1.', b1.ph),
    '',
    valueFunction('backward1PS', 'T(p, s) region 1 (Table 8): x = π, y = σ + 2.', b1.ps),
    '',
    valueFunction('backward2aPH', 'T(p, h) region 2a (Table 20): x = π, y = η − 2.1.', b2.ph2a!),
    '',
    valueFunction('backward2bPH', 'T(p, h) region 2b (Table 21): x = π − 2, y = η − 2.6.', b2.ph2b!),
    '',
    valueFunction('backward2cPH', 'T(p, h) region 2c (Table 22): x = π + 25, y = η − 1.8.', b2.ph2c!),
    '',
    valueFunction('backward2aPS', 'T(p, s) region 2a (Table 25): x = π^¼ (exponents in quarters of π), y = σ − 2.', quarter(b2.ps2a!)),
    '',
    valueFunction('backward2bPS', 'T(p, s) region 2b (Table 26): x = π, y = 10 − σ.', b2.ps2b!),
    '',
    valueFunction('backward2cPS', 'T(p, s) region 2c (Table 27): x = π, y = 2 − σ.', b2.ps2c!),
    '',
    valueFunction('backward1HS', 'p(h, s) region 1 (SR2-01 Table 2): x = η + 0.05, y = σ + 0.05.', hs.region1!),
    '',
    valueFunction('backward2aHS', 'p(h, s) region 2a (SR2-01 Table 7), before the fourth power: x = η − 0.5, y = σ − 1.2.', hs.region2a!),
    '',
    valueFunction('backward2bHS', 'p(h, s) region 2b (SR2-01 Table 8), before the fourth power: x = η − 0.6, y = σ − 1.01.', hs.region2b!),
    '',
    valueFunction('backward2cHS', 'p(h, s) region 2c (SR2-01 Table 9), before the fourth power: x = η − 0.7, y = σ − 1.1.', hs.region2c!),
    '',
    ...region3Backward,
    ...sr4Functions,
  ];
  return out.join('\n');
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  writeFileSync(KERNELS_PATH, renderKernels());
  console.log(`wrote ${KERNELS_PATH}`);
}
