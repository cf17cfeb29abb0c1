/**
 * Generates the straight-line kernels from the coefficient files listed in {@link KERNEL_SOURCES}:
 *
 * - src/water/if97/kernels.generated.ts: the IF97 term sums (basic equations, R7-97 backward
 *   equations, SR2-01 p(h, s), SR3-03 region 3 T and v, SR4-04 h-s equations) Σ nᵢ·xᴵⁱ·yᴶⁱ (and
 *   their first and second derivatives) from data/if97; the τ-derivatives alone of regions 1 and 2
 *   (for the enthalpy); and region 1's batch block `region1Rows` (the sums and relations in a loop);
 * - src/fluids/kernels.generated.ts: for every loadable fluid in data/fluids, the residual
 *   Helmholtz energy αʳ(δ, τ) of a reference equation of state with αʳ_δ, αʳ_δδ, αʳ_τ, αʳ_ττ,
 *   αʳ_δτ in one pass (term shapes n δᵈ τᵗ, n δᵈ τᵗ exp(−δᶜ), Gaussian bells
 *   n δᵈ τᵗ exp(−α(δ−ε)² − β(τ−γ)²), and the non-analytic terms n Δᵇ δ ψ of IAPWS-95 and CO2), and
 *   the ideal-gas part α°(τ) (without ln δ) with α°_τ, α°_ττ.
 *
 * Powers are built by short multiplication chains (each needed power from two already built),
 * each term's xᴵ·yᴶ is formed once, and the derivative sums carry the constants n·I, n·I·(I−1), …
 * inline; they are divided by x, x², y, y², x·y at the end. No Math.pow, no arrays, and no loops
 * except the element loop of `region1Rows`.
 *
 * Run: `npm run kernels`. tests/water/kernels-generated.test.ts fails if the committed module
 * differs from this script's output, and checks every kernel against a plain loop evaluation.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const KERNELS_PATH = resolve(root, 'src/water/if97/kernels.generated.ts');

export interface Terms {
  I: number[];
  J: number[];
  n: number[];
}

export const FLUID_KERNELS_PATH = resolve(root, 'src/fluids/kernels.generated.ts');

/**
 * The coefficient files each generated module is built from (paths relative to the repository).
 * The IF97 module reads the named files of data/if97; the fluid module reads the listed fluid
 * files and generates kernels for those marked `"loadable": true` (verified against their source).
 */
export const KERNEL_SOURCES = {
  if97: {
    directory: 'data/if97',
    files: ['region1', 'region2', 'region3', 'region5', 'backward-region1', 'backward-region2', 'backward-hs', 'backward-region3', 'backward-hs-region3'],
  },
  fluids: {
    directory: 'data/fluids',
    files: ['water', 'nitrogen'],
  },
} as const;

const readFrom = (directory: string, name: string): Record<string, unknown> =>
  JSON.parse(readFileSync(resolve(root, directory, `${name}.json`), 'utf8')) as Record<string, unknown>;
const read = (name: (typeof KERNEL_SOURCES.if97.files)[number]): Record<string, unknown> => readFrom(KERNEL_SOURCES.if97.directory, name);

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

/**
 * The statements before a term sum: 1/x (when `ix`), 1/y, the power chains of x and y for every
 * exponent of `t` (the same chains whichever terms are kept, so that a kernel of some sums gives the
 * full kernel's values bit for bit), and tᵢ = xᴵⁱ·yᴶⁱ for the terms `keep` accepts.
 */
function sumPrelude(t: Terms, ix: boolean, keep: (i: number) => boolean = () => true): string[] {
  const lines: string[] = [];
  if (ix) lines.push('  const ix = 1 / x;');
  lines.push('  const iy = 1 / y;');
  for (const l of powerChain('x', t.I)) lines.push(`  ${l}`);
  for (const l of powerChain('y', t.J)) lines.push(`  ${l}`);
  t.n.forEach((_, i) => {
    if (keep(i)) lines.push(`  const t${i} = ${product(t.I[i]!, t.J[i]!)};`);
  });
  return lines;
}

/** The six sums S, Sx, Sxx, Sy, Syy, Sxy over the prelude's terms, as expressions (each on its own lines). */
function sumExpressions(t: Terms): string[] {
  const terms = t.n.map((_, i) => `t${i}`);
  const k = (f: (I: number, J: number, n: number) => number) => t.n.map((n, i) => f(t.I[i]!, t.J[i]!, n));
  return [
    `${sum(k((_I, _J, n) => n), terms)}`,
    `(${sum(k((I, _J, n) => n * I), terms)}) * ix`,
    `(${sum(k((I, _J, n) => n * I * (I - 1)), terms)}) * ix * ix`,
    `(${sum(k((_I, J, n) => n * J), terms)}) * iy`,
    `(${sum(k((_I, J, n) => n * J * (J - 1)), terms)}) * iy * iy`,
    `(${sum(k((I, J, n) => n * I * J), terms)}) * ix * iy`,
  ];
}

/** A function filling out[0..5] with S, Sx, Sxx, Sy, Syy, Sxy (also the body of the C reference, scripts/generate-c-reference.ts). */
export function sumsFunction(fn: string, doc: string, t: Terms): string {
  const lines: string[] = [];
  lines.push(`/** ${doc} */`);
  lines.push(`export function ${fn}(x: number, y: number, out: Float64Array): void {`);
  lines.push(...sumPrelude(t, true));
  sumExpressions(t).forEach((e, k) => lines.push(`  out[${k}] =\n    ${e};`));
  lines.push('}');
  return lines.join('\n');
}

/**
 * A function returning Sy alone (out[3] of {@link sumsFunction}): the same power chains, term products
 * and operation order, so its value is bit for bit that of the full kernel. For callers that need
 * one derivative (the enthalpy, h = RTτγ_τ) and would otherwise ship all six sums.
 */
function tauSumFunction(fn: string, doc: string, t: Terms): string {
  const lines: string[] = [];
  lines.push(`/** ${doc} */`);
  lines.push(`export function ${fn}(x: number, y: number): number {`);
  const coefficients = t.n.map((n, i) => n * t.J[i]!);
  lines.push(...sumPrelude(t, t.I.some((i) => i < 0), (i) => coefficients[i] !== 0));
  lines.push(`  return (\n    ${sum(coefficients, t.n.map((_, i) => `t${i}`))}\n  ) * iy;`);
  lines.push('}');
  return lines.join('\n');
}

/**
 * The region 1 rows of a batch block: for each element i of [start, end) in region 1 by bounds alone
 * (p ≥ 16.6 MPa, T ≤ 623.15 K, the test of `certainlyRegion1`), mask 1 and the twelve fields T, p, v,
 * ρ, u, h, s, cp, cv, w, k (cp/cv when `wantK`, else NaN) and x (NaN) at rows[12·(i − start) …].
 * The term sums are {@link sumsFunction}'s, written inside the loop: the JavaScript engine does not
 * inline a kernel this size, and the call per element with its output array and the state object in
 * between took about a fifth of a batch state. The relations of IAPWS R7-97(2012) Table 3 follow in
 * the order and form of src/water/if97/region1.ts, so every value is bit for bit `region1`'s
 * (tests/numeric/kernel-oracle.test.ts, tests/batch/batch.test.ts).
 */
function region1RowsFunction(t: Terms, pStar: number, TStar: number): string {
  const lines: string[] = [];
  lines.push('/**');
  lines.push(' * Region 1 (Table 2, relations Table 3) for a block of a batch: for the elements of [start, end) in');
  lines.push(' * region 1 by bounds alone (as `certainlyRegion1`), mask 1 and the rows T, p, v, ρ, u, h, s, cp, cv, w,');
  lines.push(' * k, x at rows[12·(i − start)], bit for bit `region1`; mask 0 for the others. Returns how many are in.');
  lines.push(' */');
  lines.push('export function region1Rows(P: Float64Array, TT: Float64Array, start: number, end: number, mask: Uint8Array, rows: Float64Array, wantK: boolean): number {');
  lines.push('  let count = 0;');
  lines.push('  for (let i = start, j = 0; i < end; i++, j++) {');
  lines.push('    const p = P[i]!;');
  lines.push('    const T = TT[i]!;');
  lines.push('    if (!(p >= P_REGION1_WITHOUT_SATURATION && p <= P_MAX && T >= T_MIN && T <= T_13)) {');
  lines.push('      mask[j] = 0;');
  lines.push('      continue;');
  lines.push('    }');
  lines.push('    mask[j] = 1;');
  lines.push('    count++;');
  lines.push(`    const pi = p / ${String(pStar)};`);
  lines.push(`    const tau = ${String(TStar)} / T;`);
  lines.push('    const x = 7.1 - pi;');
  lines.push('    const y = tau - 1.222;');
  // the statements and sums of region1Sums, indented into the loop
  for (const l of sumPrelude(t, true)) lines.push(`  ${l}`);
  sumExpressions(t).forEach((e, k) => lines.push(`    const g${k} =\n      ${e.replace(/\n/g, '\n  ')};`));
  lines.push('    const gamma = g0;');
  lines.push('    const gPi = -g1;');
  lines.push('    const gPiPi = g2;');
  lines.push('    const gTau = g3;');
  lines.push('    const gTauTau = g4;');
  lines.push('    const gPiTau = -g5;');
  lines.push('    const RT = R_IF97 * T;');
  lines.push('    const v = (pi * gPi * RT) / p;');
  lines.push('    const cp = -R_IF97 * tau * tau * gTauTau;');
  lines.push('    const a = gPi - tau * gPiTau;');
  lines.push('    const cv = R_IF97 * (-tau * tau * gTauTau + (a * a) / gPiPi);');
  lines.push('    const r = 12 * j;');
  lines.push('    rows[r] = T;');
  lines.push('    rows[r + 1] = p;');
  lines.push('    rows[r + 2] = v;');
  lines.push('    rows[r + 3] = 1 / v;');
  lines.push('    rows[r + 4] = RT * (tau * gTau - pi * gPi);');
  lines.push('    rows[r + 5] = RT * tau * gTau;');
  lines.push('    rows[r + 6] = R_IF97 * (tau * gTau - gamma);');
  lines.push('    rows[r + 7] = cp;');
  lines.push('    rows[r + 8] = cv;');
  lines.push('    rows[r + 9] = Math.sqrt((RT * gPi * gPi) / ((a * a) / (tau * tau * gTauTau) - gPiPi));');
  lines.push('    rows[r + 10] = wantK ? cp / cv : NaN;');
  lines.push('    rows[r + 11] = NaN;');
  lines.push('  }');
  lines.push('  return count;');
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
    "import { P_MAX, P_REGION1_WITHOUT_SATURATION, R_IF97, T_13, T_MIN } from './constants.js';",
    '',
    sumsFunction('region1Sums', 'Region 1 (Table 2): x = 7.1 − π, y = τ − 1.222.', r1),
    '',
    tauSumFunction('region1TauSum', 'Region 1: γ_τ alone (out[3] of region1Sums, bit for bit).', r1),
    '',
    region1RowsFunction(r1, (r1 as unknown as { pStar: number }).pStar, (r1 as unknown as { TStar: number }).TStar),
    '',
    idealFunction('region2IdealSums', 'Region 2 ideal-gas part (Table 10) without ln π: y = τ.', r2.J0, r2.n0),
    '',
    sumsFunction('region2ResidualSums', 'Region 2 residual part (Table 11): x = π, y = τ − 0.5.', r2),
    '',
    tauSumFunction('region2ResidualTauSum', 'Region 2 residual part: γʳ_τ alone (out[3] of region2ResidualSums, bit for bit).', r2),
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

// ---------------------------------------------------------------------------------------------
// Reference equations of state in the reduced Helmholtz energy α(δ, τ) = α°(δ, τ) + αʳ(δ, τ)
// ---------------------------------------------------------------------------------------------

/** The coefficient sets of one fluid file (data/fluids/<file>.json) the generator reads. */
export interface FluidCoefficients {
  readonly name: string;
  readonly loadable?: boolean;
  readonly ideal: {
    readonly constant: number;
    readonly tau: number;
    readonly lnTau: number;
    readonly power: { readonly n: readonly number[]; readonly t: readonly number[] };
    readonly planckEinstein: { readonly n: readonly number[]; readonly theta: readonly number[] };
  };
  readonly residual: {
    readonly polynomial?: { readonly n: readonly number[]; readonly d: readonly number[]; readonly t: readonly number[] };
    readonly exponential?: { readonly n: readonly number[]; readonly d: readonly number[]; readonly t: readonly number[]; readonly c: readonly number[] };
    readonly gaussian?: {
      readonly n: readonly number[];
      readonly d: readonly number[];
      readonly t: readonly number[];
      readonly alpha: readonly number[];
      readonly beta: readonly number[];
      readonly gamma: readonly number[];
      readonly epsilon: readonly number[];
    };
    readonly nonAnalytic?: {
      readonly n: readonly number[];
      readonly a: readonly number[];
      readonly b: readonly number[];
      readonly B: readonly number[];
      readonly C: readonly number[];
      readonly D: readonly number[];
      readonly A: readonly number[];
      readonly beta: readonly number[];
    };
  };
}

/** The fluid files of {@link KERNEL_SOURCES}, parsed. */
export function readFluidCoefficients(): { file: string; data: FluidCoefficients }[] {
  return KERNEL_SOURCES.fluids.files.map((file) => ({ file, data: readFrom(KERNEL_SOURCES.fluids.directory, file) as unknown as FluidCoefficients }));
}

/** The generated kernel names of a fluid file: `water` → `waterResidual`, `waterIdeal`. */
export function fluidKernelNames(file: string): { residual: string; ideal: string } {
  const id = file.replace(/[^A-Za-z0-9]+(.)/g, (_m, c: string) => c.toUpperCase());
  return { residual: `${id}Residual`, ideal: `${id}Ideal` };
}

const num = (x: number): string => {
  const s = String(x);
  return x < 0 ? `(${s})` : s;
};

/**
 * Powers of τ with rational exponents: a common denominator q ≤ 24 of all exponents splits τᵗ into
 * τᴷ·(τ^(1/q))ʳ, both from multiplication chains; exponents without one use Math.pow.
 */
class TauPowers {
  readonly q: number;
  private readonly integer = new Set<number>();
  private readonly root = new Set<number>();
  private readonly fallback = new Map<number, string>();

  constructor(exponents: readonly number[]) {
    let q = 0;
    for (let c = 1; c <= 24 && q === 0; c++) if (exponents.every((t) => Math.abs(t * c - Math.round(t * c)) < 1e-9)) q = c;
    this.q = q;
  }

  /** The expression for τᵗ (registers what the chains must build). */
  power(t: number): string {
    if (this.q === 0) {
      if (t === 0) return '';
      if (!this.fallback.has(t)) this.fallback.set(t, `tp${this.fallback.size}`);
      return this.fallback.get(t)!;
    }
    const k = Math.round(t * this.q);
    const K = Math.floor(k / this.q);
    const r = k - K * this.q;
    if (K !== 0) this.integer.add(K);
    if (r !== 0) this.root.add(r);
    return [powName('t', K), powName('r', r)].filter((p) => p !== '').join(' * ');
  }

  /** Statements building the registered powers (after every {@link power} call). */
  statements(): string[] {
    const lines: string[] = [];
    if ([...this.integer].some((k) => k < 0)) lines.push('const it = 1 / t;');
    lines.push(...powerChain('t', this.integer));
    if (this.root.size > 0) {
      const q = this.q;
      const rootExpr = q === 2 ? 'Math.sqrt(t)' : q === 4 ? 'Math.sqrt(Math.sqrt(t))' : q === 8 ? 'Math.sqrt(Math.sqrt(Math.sqrt(t)))' : q === 3 ? 'Math.cbrt(t)' : q === 6 ? 'Math.cbrt(Math.sqrt(t))' : `Math.pow(t, ${1 / q})`;
      lines.push(`const r = ${rootExpr};`);
      lines.push(...powerChain('r', this.root));
    }
    if (this.fallback.size > 0) {
      lines.push('const lt = Math.log(t);');
      for (const [t, name] of this.fallback) lines.push(`const ${name} = Math.exp(${t} * lt);`);
    }
    return lines;
  }
}

const join = (parts: string[]): string => (parts.length === 0 ? '0' : parts.join(' +\n    ').replace(/\+ -/g, '- '));

/**
 * The residual kernel: out[0..5] = αʳ, αʳ_δ, αʳ_δδ, αʳ_τ, αʳ_ττ, αʳ_δτ at (δ, τ).
 * Terms n δᵈ τᵗ exp(−δᶜ) (c = 0: polynomial) are grouped by c: per group the sums
 * S = Σ n δᵈτᵗ, S_d = Σ n d δᵈτᵗ, … are formed once, and with k = c δᶜ
 * αʳ_δ·δ = e (S_d − k S), αʳ_δδ·δ² = e (S_dd − k (2 S_d + (c − 1) S) + k² S), αʳ_δτ·δτ = e (S_dt − k S_t).
 */
function residualFunction(fn: string, doc: string, f: FluidCoefficients): string {
  const r = f.residual;
  const tauExponents = [...(r.polynomial?.t ?? []), ...(r.exponential?.t ?? []), ...(r.gaussian?.t ?? [])];
  const tp = new TauPowers(tauExponents);
  const deltaNeeded = new Set<number>();
  interface Term {
    n: number;
    d: number;
    t: number;
    c: number;
  }
  const terms: Term[] = [];
  r.polynomial?.n.forEach((n, i) => terms.push({ n, d: r.polynomial!.d[i]!, t: r.polynomial!.t[i]!, c: 0 }));
  r.exponential?.n.forEach((n, i) => terms.push({ n, d: r.exponential!.d[i]!, t: r.exponential!.t[i]!, c: r.exponential!.c[i]! }));
  const body: string[] = [];
  const monomial = (d: number, t: number): string => {
    if (d !== 0) deltaNeeded.add(d);
    const parts = [powName('d', d), tp.power(t)].filter((p) => p !== '');
    return parts.length === 0 ? '1' : parts.join(' * ');
  };
  const A: string[] = [];
  const D: string[] = [];
  const DD: string[] = [];
  const T: string[] = [];
  const TT: string[] = [];
  const DT: string[] = [];
  const groups = [...new Set(terms.map((x) => x.c))].sort((a, b) => a - b);
  let m = 0;
  for (const c of groups) {
    const g = terms.filter((x) => x.c === c);
    const names = g.map(() => `m${m++}`);
    g.forEach((x, i) => body.push(`const ${names[i]} = ${monomial(x.d, x.t)};`));
    const s = (coef: (x: Term) => number) => sum(g.map(coef), names);
    body.push(`const s${c} =\n    ${s((x) => x.n)};`);
    body.push(`const sd${c} =\n    ${s((x) => x.n * x.d)};`);
    body.push(`const sdd${c} =\n    ${s((x) => x.n * x.d * (x.d - 1))};`);
    body.push(`const st${c} =\n    ${s((x) => x.n * x.t)};`);
    body.push(`const stt${c} =\n    ${s((x) => x.n * x.t * (x.t - 1))};`);
    body.push(`const sdt${c} =\n    ${s((x) => x.n * x.d * x.t)};`);
    if (c === 0) {
      A.push(`s0`);
      D.push(`sd0`);
      DD.push(`sdd0`);
      T.push(`st0`);
      TT.push(`stt0`);
      DT.push(`sdt0`);
    } else {
      deltaNeeded.add(c);
      body.push(`const e${c} = Math.exp(-${powName('d', c)});`);
      body.push(`const k${c} = ${c === 1 ? 'd' : `${c} * ${powName('d', c)}`};`);
      A.push(`e${c} * s${c}`);
      D.push(`e${c} * (sd${c} - k${c} * s${c})`);
      DD.push(`e${c} * (sdd${c} - k${c} * (2 * sd${c}${c === 1 ? '' : ` + ${c - 1} * s${c}`}) + k${c} * k${c} * s${c})`);
      T.push(`e${c} * st${c}`);
      TT.push(`e${c} * stt${c}`);
      DT.push(`e${c} * (sdt${c} - k${c} * st${c})`);
    }
  }
  // full derivatives (not multiplied by powers of δ and τ) of the bell-shaped and non-analytic terms
  const gA: string[] = [];
  const gD: string[] = [];
  const gDD: string[] = [];
  const gT: string[] = [];
  const gTT: string[] = [];
  const gDT: string[] = [];
  const G = r.gaussian;
  G?.n.forEach((n, j) => {
    const d = G.d[j]!;
    const t = G.t[j]!;
    const al = G.alpha[j]!;
    const be = G.beta[j]!;
    const ga = G.gamma[j]!;
    const ep = G.epsilon[j]!;
    body.push(`const gx${j} = d - ${num(ep)};`);
    body.push(`const gy${j} = t - ${num(ga)};`);
    const mono = monomial(d, t);
    body.push(`const g${j} = ${num(n)} * ${mono === '1' ? '' : `${mono} * `}Math.exp(${-al} * gx${j} * gx${j} - ${be} * gy${j} * gy${j});`);
    body.push(`const gd${j} = ${d === 0 ? '' : `${d} * id `}- ${2 * al} * gx${j};`);
    body.push(`const gt${j} = ${t === 0 ? '' : `${t} * it `}- ${2 * be} * gy${j};`);
    gA.push(`g${j}`);
    gD.push(`g${j} * gd${j}`);
    gDD.push(`g${j} * (gd${j} * gd${j}${d === 0 ? '' : ` - ${d} * id * id`} - ${2 * al})`);
    gT.push(`g${j} * gt${j}`);
    gTT.push(`g${j} * (gt${j} * gt${j}${t === 0 ? '' : ` - ${t} * it * it`} - ${2 * be})`);
    gDT.push(`g${j} * gd${j} * gt${j}`);
  });
  const N = r.nonAnalytic;
  if (N && N.n.length > 0) {
    body.push('const dm1 = d - 1;');
    body.push('const tm1 = t - 1;');
    body.push('const q = dm1 * dm1;');
  }
  // q^e for the exponents of the non-analytic terms: from cube and square roots of q when e is a
  // multiple of 1/6 (IAPWS-95: 1/(2β) − 1 = 2/3, a − 1 = 5/2, 1/β − 1 = 7/3), else Math.pow
  const qRoots = new Map<number, string>();
  const qPower = (e: number): string => {
    const k = Math.round(e * 6);
    if (Math.abs(e * 6 - k) > 1e-9 || k < 0) return `Math.pow(q, ${e})`;
    const whole = Math.floor(k / 6);
    const rest = k - 6 * whole;
    const parts: string[] = [];
    if (whole > 0) parts.push(whole === 1 ? 'q' : Array.from({ length: whole }, () => 'q').join(' * '));
    if (rest !== 0) {
      const root = rest % 3 === 0 ? 'qh' : rest % 2 === 0 ? 'qc' : 'qs';
      if (root === 'qh') qRoots.set(2, 'const qh = Math.sqrt(q);');
      else if (root === 'qc') qRoots.set(3, 'const qc = Math.cbrt(q);');
      else qRoots.set(6, 'const qs = Math.cbrt(Math.sqrt(q));');
      const n = root === 'qh' ? rest / 3 : root === 'qc' ? rest / 2 : rest;
      parts.push(Array.from({ length: n }, () => root).join(' * '));
    }
    return parts.length === 0 ? '1' : parts.join(' * ');
  };
  const naBody: string[] = [];
  N?.n.forEach((n, j) => {
    const a = N.a[j]!;
    const b = N.b[j]!;
    const B = N.B[j]!;
    const C = N.C[j]!;
    const Dd = N.D[j]!;
    const Aa = N.A[j]!;
    const be = N.beta[j]!;
    const e = 1 / (2 * be);
    const push = (line: string) => naBody.push(line);
    push(`// non-analytic term ${j}: n = ${n}, a = ${a}, b = ${b}, B = ${B}, C = ${C}, D = ${Dd}, A = ${Aa}, β = ${be}`);
    push(`let Db${j} = 0, Bd${j} = 0, Bdd${j} = 0, Bt${j} = 0, Btt${j} = 0, Bdt${j} = 0, ps${j} = 0, psd${j} = 0, psdd${j} = 0, pst${j} = 0, pstt${j} = 0, psdt${j} = 0;`);
    // ψ = exp(−C(δ−1)² − D(τ−1)²) below e^−200 makes the term vanish against every other term (the
    // largest factors, Δᵇ and 4D², stay below 1e6 in the range): skip it there
    push(`const pe${j} = ${C} * q + ${Dd} * tm1 * tm1;`);
    push(`if (pe${j} < 200) {`);
    const body: string[] = [];
    body.push(`const qe${j} = ${qPower(e - 1)};`);
    body.push(`const qa${j} = ${qPower(a - 1)};`);
    body.push(`const th${j} = 1 - t + ${Aa} * q * qe${j};`);
    body.push(`const D${j} = th${j} * th${j} + ${B} * q * qa${j};`);
    body.push(`const G${j} = ${(2 * Aa) / be} * th${j} * qe${j} + ${2 * B * a} * qa${j};`);
    body.push(`const Dd${j} = dm1 * G${j};`);
    body.push(`const Ddd${j} = G${j} + ${4 * B * a * (a - 1)} * qa${j} + ${2 * (Aa / be) ** 2} * ${qPower(1 / be - 1)} + ${(4 * Aa / be) * (e - 1)} * th${j} * qe${j};`);
    body.push(`Db${j} = Math.pow(D${j}, ${b});`);
    // Δ = 0 only at δ = τ = 1, where the first-derivative limits are 0 and the second derivatives diverge
    body.push(`const Db1${j} = D${j} > 0 ? Db${j} / D${j} : 0;`);
    body.push(`const Db2${j} = Db1${j} / D${j};`);
    body.push(`Bd${j} = ${b} * Db1${j} * Dd${j};`);
    body.push(`Bdd${j} = ${b} * (Db1${j} * Ddd${j} + ${b - 1} * Db2${j} * Dd${j} * Dd${j});`);
    body.push(`Bt${j} = ${-2 * b} * th${j} * Db1${j};`);
    body.push(`Btt${j} = ${2 * b} * Db1${j} + ${4 * b * (b - 1)} * th${j} * th${j} * Db2${j};`);
    body.push(`Bdt${j} = ${(-Aa * b * 2) / be} * Db1${j} * dm1 * qe${j} + ${-2 * b * (b - 1)} * th${j} * Db2${j} * Dd${j};`);
    body.push(`ps${j} = Math.exp(-pe${j});`);
    body.push(`psd${j} = ${-2 * C} * dm1 * ps${j};`);
    body.push(`psdd${j} = (${2 * C} * q - 1) * ${2 * C} * ps${j};`);
    body.push(`pst${j} = ${-2 * Dd} * tm1 * ps${j};`);
    body.push(`pstt${j} = (${2 * Dd} * tm1 * tm1 - 1) * ${2 * Dd} * ps${j};`);
    body.push(`psdt${j} = ${4 * C * Dd} * dm1 * tm1 * ps${j};`);
    for (const l of body) push(`  ${l}`);
    push('}');
    const k = num(n);
    gA.push(`${k} * Db${j} * d * ps${j}`);
    gD.push(`${k} * (Db${j} * (ps${j} + d * psd${j}) + Bd${j} * d * ps${j})`);
    gDD.push(`${k} * (Db${j} * (2 * psd${j} + d * psdd${j}) + 2 * Bd${j} * (ps${j} + d * psd${j}) + Bdd${j} * d * ps${j})`);
    gT.push(`${k} * d * (Bt${j} * ps${j} + Db${j} * pst${j})`);
    gTT.push(`${k} * d * (Btt${j} * ps${j} + 2 * Bt${j} * pst${j} + Db${j} * pstt${j})`);
    gDT.push(`${k} * (Db${j} * (pst${j} + d * psdt${j}) + d * Bd${j} * pst${j} + Bt${j} * (ps${j} + d * psd${j}) + Bdt${j} * d * ps${j})`);
  });
  if (naBody.length > 0) {
    // the roots of q are needed only where some term is not skipped; they are cheap next to exp
    for (const line of [...qRoots.keys()].sort().map((k) => qRoots.get(k)!)) body.push(line);
    body.push(...naBody);
  }
  const lines: string[] = [];
  lines.push(`/** ${doc} */`);
  lines.push(`export function ${fn}(delta: number, tau: number, out: Float64Array): void {`);
  lines.push('  const d = delta;');
  lines.push('  const t = tau;');
  lines.push('  const id = 1 / d;');
  const tauLines = tp.statements();
  if (!tauLines.includes('const it = 1 / t;')) lines.push('  const it = 1 / t;');
  for (const l of powerChain('d', deltaNeeded)) lines.push(`  ${l}`);
  for (const l of tauLines) lines.push(`  ${l}`);
  for (const l of body) lines.push(`  ${l}`);
  const with_ = (scaled: string[], scale: string, full: string[]): string => {
    const a = scaled.length > 0 ? `(${join(scaled)})${scale}` : '';
    return join([a, ...full].filter((x) => x !== ''));
  };
  lines.push(`  out[0] =\n    ${with_(A, '', gA)};`);
  lines.push(`  out[1] =\n    ${with_(D, ' * id', gD)};`);
  lines.push(`  out[2] =\n    ${with_(DD, ' * id * id', gDD)};`);
  lines.push(`  out[3] =\n    ${with_(T, ' * it', gT)};`);
  lines.push(`  out[4] =\n    ${with_(TT, ' * it * it', gTT)};`);
  lines.push(`  out[5] =\n    ${with_(DT, ' * id * it', gDT)};`);
  lines.push('}');
  return lines.join('\n');
}

/**
 * The ideal-gas kernel: out[0..2] = α° − ln δ, α°_τ, α°_ττ at τ, for
 * α° = ln δ + a₁ + a₂ τ + a₃ ln τ + Σ nᵢ τ^tᵢ + Σ nᵢ ln(1 − exp(−θᵢ τ)).
 */
function idealGasFunction(fn: string, doc: string, f: FluidCoefficients): string {
  const i = f.ideal;
  const tp = new TauPowers(i.power.t);
  const body: string[] = [];
  const names = i.power.t.map((t) => tp.power(t) || '1');
  const A: string[] = [String(i.constant), `${num(i.tau)} * t`];
  const T: string[] = [String(i.tau)];
  const TT: string[] = [];
  if (i.lnTau !== 0) {
    A.push(`${num(i.lnTau)} * Math.log(t)`);
    T.push(`${num(i.lnTau)} * it`);
    TT.push(`${num(-i.lnTau)} * it * it`);
  }
  if (i.power.n.length > 0) {
    A.push(sum([...i.power.n], names));
    T.push(`(${sum(i.power.n.map((n, k) => n * i.power.t[k]!), names)}) * it`);
    TT.push(`(${sum(i.power.n.map((n, k) => n * i.power.t[k]! * (i.power.t[k]! - 1)), names)}) * it * it`);
  }
  i.planckEinstein.n.forEach((n, k) => {
    const th = i.planckEinstein.theta[k]!;
    body.push(`const pe${k} = Math.exp(${-th} * t);`);
    body.push(`const pf${k} = pe${k} / (1 - pe${k});`);
    A.push(`${num(n)} * Math.log1p(-pe${k})`);
    T.push(`${n * th} * pf${k}`);
    TT.push(`${-n * th * th} * pf${k} * (1 + pf${k})`);
  });
  const lines: string[] = [];
  lines.push(`/** ${doc} */`);
  lines.push(`export function ${fn}(tau: number, out: Float64Array): void {`);
  lines.push('  const t = tau;');
  const tauLines = tp.statements();
  if (!tauLines.includes('const it = 1 / t;')) lines.push('  const it = 1 / t;');
  for (const l of tauLines) lines.push(`  ${l}`);
  for (const l of body) lines.push(`  ${l}`);
  lines.push(`  out[0] =\n    ${join(A)};`);
  lines.push(`  out[1] =\n    ${join(T)};`);
  lines.push(`  out[2] =\n    ${join(TT)};`);
  lines.push('}');
  return lines.join('\n');
}

/** The module src/fluids/kernels.generated.ts. */
export function renderFluidKernels(): string {
  const out = [
    `// GENERATED by scripts/generate-kernels.ts from ${KERNEL_SOURCES.fluids.directory}/{${KERNEL_SOURCES.fluids.files.join(',')}}.json (the loadable fluids). Do not edit.`,
    '/* eslint-disable */',
    '',
  ];
  for (const { file, data } of readFluidCoefficients()) {
    if (data.loadable !== true) continue;
    const k = fluidKernelNames(file);
    out.push(residualFunction(k.residual, `${data.name}: residual part αʳ and αʳ_δ, αʳ_δδ, αʳ_τ, αʳ_ττ, αʳ_δτ into out[0..5] (data/fluids/${file}.json).`, data), '');
    out.push(idealGasFunction(k.ideal, `${data.name}: ideal-gas part α° − ln δ, α°_τ, α°_ττ into out[0..2] (data/fluids/${file}.json).`, data), '');
  }
  return out.join('\n');
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  writeFileSync(KERNELS_PATH, renderKernels());
  console.log(`wrote ${KERNELS_PATH}`);
  writeFileSync(FLUID_KERNELS_PATH, renderFluidKernels());
  console.log(`wrote ${FLUID_KERNELS_PATH}`);
}
