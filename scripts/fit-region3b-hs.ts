/**
 * Fits a starting equation p(h, s) for IF97 region 3b (region 3 states with s > s_c) to IF97 itself,
 * for the (h, s) flash (src/water/if97/hs.ts, `startPressureHS`), where SR4-04's p_3b(h, s)
 * coefficients are not verified (data/if97/backward-hs-region3.json).
 *
 * The fit: ln(p / 1 MPa) = Σ c_ij xⁱ yʲ (i + j ≤ DEGREE) with x = (h − H0)/HW, y = (s − S0)/SW mapped to
 * about [−1, 1] over the region, by least squares (Householder QR) on states of region 3 computed from
 * (p, T) with the IF97 region 3 equation (IAPWS R7-97(2012) Eq. 28). The maximum relative error in p is
 * measured on a second, independent sample and written, with a 25 % margin, as the fit's stated bound.
 *
 * Run: `npx tsx scripts/fit-region3b-hs.ts` (writes data/if97/fit-region3b-hs.json).
 * tests/water/fit-region3b-hs.test.ts checks the stated bound at fresh IF97 states of 3b.
 */
import { writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { b23Temperature } from '../src/water/if97/b23.js';
import { S_CRITICAL } from '../src/water/if97/constants.js';
import { stateFromPT } from '../src/water/if97/pt.js';
import { WaterState } from '../src/water/if97/water-state.js';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const FIT_PATH = resolve(root, 'data/if97/fit-region3b-hs.json');

const DEGREE = 6;
/** Reduction of h and s (J/kg, J/(kg·K)) to about [−1, 1] over region 3b. */
const H0 = 2.45e6;
const HW = 0.4e6;
const S0 = 4.85e3;
const SW = 0.45e3;

/** A deterministic generator (xorshift), so the fit is reproducible. */
function random(seed: number): () => number {
  let x = seed >>> 0 || 1;
  return () => {
    x ^= x << 13;
    x >>>= 0;
    x ^= x >>> 17;
    x ^= x << 5;
    x >>>= 0;
    return x / 4294967296;
  };
}

/** n states of region 3b: (p, T) uniform over region 3 (16.53–100 MPa, 623.15 K–T_B23(p)), kept where s > s_c. */
export function region3bSample(n: number, seed: number): { p: number; h: number; s: number }[] {
  const rnd = random(seed);
  const st = new WaterState();
  const out: { p: number; h: number; s: number }[] = [];
  while (out.length < n) {
    const p = 16.53e6 + rnd() * (100e6 - 16.53e6);
    const T = 623.15 + rnd() * (b23Temperature(p) - 623.15);
    if (stateFromPT(p, T, st) === 0 && st.region === 3 && st.s > S_CRITICAL) out.push({ p, h: st.h, s: st.s });
  }
  return out;
}

/** The exponent pairs (i, j), i + j ≤ DEGREE. */
function exponents(): [number, number][] {
  const e: [number, number][] = [];
  for (let d = 0; d <= DEGREE; d++) for (let i = d; i >= 0; i--) e.push([i, d - i]);
  return e;
}

/** Least squares by Householder QR: min |A c − b|. */
function leastSquares(A: number[][], b: number[]): number[] {
  const m = A.length;
  const n = A[0]!.length;
  const R = A.map((r) => [...r]);
  const y = [...b];
  for (let k = 0; k < n; k++) {
    let norm = 0;
    for (let i = k; i < m; i++) norm += R[i]![k]! ** 2;
    norm = Math.sqrt(norm);
    const alpha = R[k]![k]! > 0 ? -norm : norm;
    const v = new Array<number>(m).fill(0);
    v[k] = R[k]![k]! - alpha;
    for (let i = k + 1; i < m; i++) v[i] = R[i]![k]!;
    let vv = 0;
    for (let i = k; i < m; i++) vv += v[i]! ** 2;
    if (vv === 0) continue;
    for (let j = k; j < n; j++) {
      let dot = 0;
      for (let i = k; i < m; i++) dot += v[i]! * R[i]![j]!;
      const f = (2 * dot) / vv;
      for (let i = k; i < m; i++) R[i]![j]! -= f * v[i]!;
    }
    let dot = 0;
    for (let i = k; i < m; i++) dot += v[i]! * y[i]!;
    const f = (2 * dot) / vv;
    for (let i = k; i < m; i++) y[i]! -= f * v[i]!;
  }
  const c = new Array<number>(n).fill(0);
  for (let k = n - 1; k >= 0; k--) {
    let s = y[k]!;
    for (let j = k + 1; j < n; j++) s -= R[k]![j]! * c[j]!;
    c[k] = s / R[k]![k]!;
  }
  return c;
}

export interface Region3bFit {
  H0: number;
  HW: number;
  S0: number;
  SW: number;
  I: number[];
  J: number[];
  c: number[];
}

/** The fitted pressure in Pa at (h, s). */
export function evaluateFit(fit: Region3bFit, h: number, s: number): number {
  const x = (h - fit.H0) / fit.HW;
  const y = (s - fit.S0) / fit.SW;
  let sum = 0;
  for (let k = 0; k < fit.c.length; k++) sum += fit.c[k]! * x ** fit.I[k]! * y ** fit.J[k]!;
  return Math.exp(sum) * 1e6;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const fitting = region3bSample(6000, 20261202);
  const checking = region3bSample(20000, 97);
  const e = exponents();
  const A = fitting.map(({ h, s }) => e.map(([i, j]) => ((h - H0) / HW) ** i * ((s - S0) / SW) ** j));
  const c = leastSquares(A, fitting.map(({ p }) => Math.log(p / 1e6)));
  const fit: Region3bFit = { H0, HW, S0, SW, I: e.map(([i]) => i), J: e.map(([, j]) => j), c };
  let max = 0;
  let hMin = Infinity;
  let hMax = -Infinity;
  let sMax = -Infinity;
  for (const { p, h, s } of checking) {
    max = Math.max(max, Math.abs(evaluateFit(fit, h, s) / p - 1));
    hMin = Math.min(hMin, h);
    hMax = Math.max(hMax, h);
    sMax = Math.max(sMax, s);
  }
  const bound = Number((1.25 * max).toPrecision(2));
  const data = {
    source: {
      title: 'Fit of ln p over IF97 region 3b (s > s_c) to the region 3 basic equation of IAPWS R7-97(2012) (Eq. 28), by scripts/fit-region3b-hs.ts',
      authors: 'heatstate',
      year: 2026,
      table: 'none: computed from IAPWS R7-97(2012) Section 7 (region 3) and Section 4 (the B23 line)',
    },
    basis: 'computed',
    uncertainty: `A starting value only, not a property: the maximum relative deviation of p from IF97 over ${checking.length} independent region 3b states was ${max.toExponential(2)}; the stated bound (1.25 × that) is maxRelativeError.`,
    form: 'ln(p / 1 MPa) = Σ c_k x^I_k y^J_k, x = (h − H0)/HW (J/kg), y = (s − S0)/SW (J/(kg·K))',
    domain: { note: 'region 3 states with s > s_c = 4.41202148223476 kJ/(kg·K): 16.53 MPa ≤ p ≤ 100 MPa, 623.15 K ≤ T ≤ T_B23(p)', hMin, hMax, sMin: S_CRITICAL, sMax },
    maxRelativeError: bound,
    samples: { fit: fitting.length, check: checking.length },
    ...fit,
  };
  writeFileSync(FIT_PATH, `${JSON.stringify(data, null, 1)}\n`);
  console.log(`wrote ${FIT_PATH}: ${c.length} terms, max relative error in p ${max.toExponential(2)} (stated bound ${bound})`);
}
