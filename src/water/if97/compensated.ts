/**
 * Compensated IF97 basic equations: the same equations and coefficients as {@link region1},
 * {@link region2}, {@link region3} and {@link region5} (IAPWS R7-97(2012) Eqs. 7, 15-17, 28, 32-34,
 * coefficients Tables 2, 10-11, 30, 37-38 from data/if97, relations Tables 3, 12, 31, 39), evaluated in
 * double-double arithmetic (./double-double.ts: error-free TwoSum and TwoProduct by Veltkamp
 * splitting) from the inputs' exact binary values and rounded once per property at the end.
 *
 * What is compensated: the reduced variables (π = p/p*, τ = T* / T, δ = ρ/ρ* and the shifted 7.1 − π,
 * τ − 1.222, τ − 0.5, with the decimal constants of the release, such as T* = 647.096 K, held to
 * 106 bits), every power, every term n·xᴵ·yᴶ, the six sums Σ, ΣI, ΣI(I−1), ΣJ, ΣJ(J−1), ΣIJ (TwoSum
 * accumulation with the low parts and the rounding errors carried in a second sum, as in the Sum2
 * algorithm of T. Ogita, S. M. Rump, S. Oishi, "Accurate sum and dot product", SIAM J. Sci. Comput. 26,
 * 2005), the logarithms (ln π, ln δ) and the property relations (differences such as τγτ − πγπ, and
 * a²/b near the critical point). R = 461.526 J/(kg·K) is taken as its double, as the fast kernels do.
 * On 1000 random states per region every property is within 16 ulp of a 60-digit evaluation of the
 * same equations (scripts/ulp-report.ts; docs/guide/accuracy.md has the table), where the fast kernels
 * miss by up to thousands of ulp in region 3 and near the zeros of u and s in region 1.
 *
 * They cost about 10 to 30 times the fast kernels (bench/cases/accuracy.ts), so they are an option,
 * not the default: call them where the last digits matter (reference tables, differences of nearby
 * states, checking other code). Same contract as the fast region functions: plain SI in, the
 * caller's {@link WaterProperties} filled and returned, no range check (callers check first), no
 * allocation, no throw.
 *
 * @module
 */
import r1 from '../../../data/if97/region1.json';
import r2 from '../../../data/if97/region2.json';
import r3 from '../../../data/if97/region3.json';
import r5 from '../../../data/if97/region5.json';
import { R_IF97 } from './constants.js';
import { ddAdd, ddCopy, ddDiv, ddFromDecimal, ddLog, ddMul, ddMulNumber, ddNeg, ddSet, ddSqrtValue, ddSub, ddValue } from './double-double.js';
import type { WaterProperties } from './properties.js';

const SPLIT = 134217729;

/**
 * One set of terms Σ nₖ xᴵᵏ yᴶᵏ prepared for double-double evaluation: the coefficients with their
 * Veltkamp halves, the integer weights of the derivative sums, and power tables for x and y.
 */
class CompensatedTerms {
  readonly count: number;
  readonly I: Int32Array;
  readonly J: Int32Array;
  readonly n: Float64Array;
  readonly n1: Float64Array;
  readonly n2: Float64Array;
  /** Weights I, I(I−1), J, J(J−1), IJ per term (5 per term). */
  readonly weights: Float64Array;
  readonly iMin: number;
  readonly iMax: number;
  readonly jMin: number;
  readonly jMax: number;
  /** x^i (hi, lo) at 2(i − iMin), and y^j at 2(j − jMin). */
  readonly xPowers: Float64Array;
  readonly yPowers: Float64Array;
  /** Scratch: 1/x, 1/y. */
  readonly scratch = new Float64Array(8);

  constructor(I: readonly number[], J: readonly number[], n: readonly number[]) {
    this.count = n.length;
    this.I = Int32Array.from(I);
    this.J = Int32Array.from(J);
    this.n = Float64Array.from(n);
    this.n1 = this.n.map((v) => {
      const t = SPLIT * v;
      return t - (t - v);
    });
    this.n2 = this.n.map((v, k) => v - this.n1[k]!);
    this.weights = new Float64Array(5 * this.count);
    for (let k = 0; k < this.count; k++) {
      const i = I[k]!;
      const j = J[k]!;
      this.weights.set([i, i * (i - 1), j, j * (j - 1), i * j], 5 * k);
    }
    this.iMin = Math.min(0, ...I);
    this.iMax = Math.max(0, ...I);
    this.jMin = Math.min(0, ...J);
    this.jMax = Math.max(0, ...J);
    this.xPowers = new Float64Array(2 * (this.iMax - this.iMin + 1));
    this.yPowers = new Float64Array(2 * (this.jMax - this.jMin + 1));
  }
}

/** Fills table[2(i − min)] with base^i for i = min … max (double-double products, 1/base for i < 0). */
function fillPowers(table: Float64Array, min: number, max: number, bh: number, bl: number, scratch: Float64Array): void {
  const zero = -min;
  table[2 * zero] = 1;
  table[2 * zero + 1] = 0;
  let ph = 1;
  let pl = 0;
  for (let i = 1; i <= max; i++) {
    const idx = 2 * (zero + i);
    mulInto(table, idx, ph, pl, bh, bl);
    ph = table[idx]!;
    pl = table[idx + 1]!;
  }
  if (min < 0) {
    ddSet(scratch, 0, 1, 0);
    ddSet(scratch, 1, bh, bl);
    ddDiv(scratch, 2, 0, 1);
    const rh = scratch[4]!;
    const rl = scratch[5]!;
    ph = 1;
    pl = 0;
    for (let i = -1; i >= min; i--) {
      const idx = 2 * (zero + i);
      mulInto(table, idx, ph, pl, rh, rl);
      ph = table[idx]!;
      pl = table[idx + 1]!;
    }
  }
}

/** table[idx], table[idx + 1] = (ah + al)(bh + bl), double-double. */
function mulInto(table: Float64Array, idx: number, ah: number, al: number, bh: number, bl: number): void {
  let t = SPLIT * ah;
  const a1 = t - (t - ah);
  const a2 = ah - a1;
  t = SPLIT * bh;
  const b1 = t - (t - bh);
  const b2 = bh - b1;
  const ph = ah * bh;
  const pl = a1 * b1 - ph + a1 * b2 + a2 * b1 + a2 * b2 + (ah * bl + al * bh);
  const zh = ph + pl;
  table[idx] = zh;
  table[idx + 1] = pl - (zh - ph);
}

/**
 * The six weighted sums of Σ n xᴵ yᴶ at x = slot xs, y = slot ys of `w`, written to slots d … d + 5:
 * [Σt, ΣI·t, ΣI(I−1)·t, ΣJ·t, ΣJ(J−1)·t, ΣIJ·t] with t = n xᴵ yᴶ, that is
 * [S, x·S_x, x²·S_xx, y·S_y, y²·S_yy, xy·S_xy]. Each term is formed in double-double; each sum keeps its
 * high part by TwoSum and carries every rounding error and low part in a second double (Sum2).
 */
function weightedSums(t: CompensatedTerms, w: Float64Array, xs: number, ys: number, d: number): void {
  fillPowers(t.xPowers, t.iMin, t.iMax, w[2 * xs]!, w[2 * xs + 1]!, t.scratch);
  fillPowers(t.yPowers, t.jMin, t.jMax, w[2 * ys]!, w[2 * ys + 1]!, t.scratch);
  const X = t.xPowers;
  const Y = t.yPowers;
  const I = t.I;
  const J = t.J;
  const N = t.n;
  const N1 = t.n1;
  const N2 = t.n2;
  const M = t.weights;
  const iMin = t.iMin;
  const jMin = t.jMin;
  let s0 = 0, c0 = 0, s1 = 0, c1 = 0, s2 = 0, c2 = 0, s3 = 0, c3 = 0, s4 = 0, c4 = 0, s5 = 0, c5 = 0;
  for (let k = 0; k < t.count; k++) {
    const xi = 2 * (I[k]! - iMin);
    const yj = 2 * (J[k]! - jMin);
    const xh = X[xi]!;
    const xl = X[xi + 1]!;
    const yh = Y[yj]!;
    const yl = Y[yj + 1]!;
    // P = xᴵ yᴶ
    let c = SPLIT * xh;
    const x1 = c - (c - xh);
    const x2 = xh - x1;
    c = SPLIT * yh;
    const y1 = c - (c - yh);
    const y2 = yh - y1;
    let ph = xh * yh;
    let pl = x1 * y1 - ph + x1 * y2 + x2 * y1 + x2 * y2 + (xh * yl + xl * yh);
    let q = ph + pl;
    pl -= q - ph;
    ph = q;
    // t = n P
    const nh = N[k]!;
    const n1 = N1[k]!;
    const n2 = N2[k]!;
    c = SPLIT * ph;
    const p1 = c - (c - ph);
    const p2 = ph - p1;
    let th = nh * ph;
    let tl = n1 * p1 - th + n1 * p2 + n2 * p1 + n2 * p2 + nh * pl;
    q = th + tl;
    tl -= q - th;
    th = q;
    c = SPLIT * th;
    const t1 = c - (c - th);
    const t2 = th - t1;
    // s0 += t
    q = s0 + th;
    let v = q - s0;
    c0 += s0 - (q - v) + (th - v) + tl;
    s0 = q;
    // s_i += m t for the integer weights m (|m| < 2²⁶: m t.hi = t1 m + t2 m exactly)
    const o = 5 * k;
    let m = M[o]!;
    let mh = th * m;
    let ml = t1 * m - mh + t2 * m + tl * m;
    q = s1 + mh;
    v = q - s1;
    c1 += s1 - (q - v) + (mh - v) + ml;
    s1 = q;
    m = M[o + 1]!;
    mh = th * m;
    ml = t1 * m - mh + t2 * m + tl * m;
    q = s2 + mh;
    v = q - s2;
    c2 += s2 - (q - v) + (mh - v) + ml;
    s2 = q;
    m = M[o + 2]!;
    mh = th * m;
    ml = t1 * m - mh + t2 * m + tl * m;
    q = s3 + mh;
    v = q - s3;
    c3 += s3 - (q - v) + (mh - v) + ml;
    s3 = q;
    m = M[o + 3]!;
    mh = th * m;
    ml = t1 * m - mh + t2 * m + tl * m;
    q = s4 + mh;
    v = q - s4;
    c4 += s4 - (q - v) + (mh - v) + ml;
    s4 = q;
    m = M[o + 4]!;
    mh = th * m;
    ml = t1 * m - mh + t2 * m + tl * m;
    q = s5 + mh;
    v = q - s5;
    c5 += s5 - (q - v) + (mh - v) + ml;
    s5 = q;
  }
  // normalise each (s, c) pair (Fast2Sum after a TwoSum-safe ordering)
  store(w, d, s0, c0);
  store(w, d + 1, s1, c1);
  store(w, d + 2, s2, c2);
  store(w, d + 3, s3, c3);
  store(w, d + 4, s4, c4);
  store(w, d + 5, s5, c5);
}

/** Slot d = s + c, normalised (TwoSum). */
function store(w: Float64Array, d: number, s: number, c: number): void {
  const h = s + c;
  const v = h - s;
  w[2 * d] = h;
  w[2 * d + 1] = s - (h - v) + (c - v);
}

// ---------------------------------------------------------------------------------------------
// Gibbs regions (1, 2, 5): slots of the shared relations (R7-97 Tables 3, 12, 39)

/** Slots of a Gibbs workspace. */
const enum G {
  pi = 0,
  tau,
  gamma,
  gPi,
  gPiPi,
  gTau,
  gTauTau,
  gPiTau,
  RT,
  R,
  a,
  b,
  c,
  e,
  x,
  y,
  one,
  tStar,
  k1,
  k2,
  sums, // six slots
  ideal = sums + 6, // six slots
  size = ideal + 6,
}

/**
 * Properties from γ and its derivatives in slots G.gamma … G.gPiTau (R7-97 Table 3): v = πγπRT/p,
 * h = RTτγτ, u = RT(τγτ − πγπ), s = R(τγτ − γ), cp = −Rτ²γττ, cv = R(−τ²γττ + (γπ − τγπτ)²/γππ),
 * w = √(RTγπ² / ((γπ − τγπτ)²/(τ²γττ) − γππ)), each rounded once.
 */
function gibbsProperties(w: Float64Array, p: number, T: number, out: WaterProperties): WaterProperties {
  ddSet(w, G.R, R_IF97, 0);
  ddMulNumber(w, G.RT, G.R, T);
  out.T = T;
  out.p = p;
  // v = RT γπ π / p
  ddMul(w, G.a, G.pi, G.gPi); // πγπ
  ddMul(w, G.b, G.RT, G.a);
  ddSet(w, G.c, p, 0);
  ddDiv(w, G.e, G.b, G.c);
  out.v = ddValue(w, G.e);
  ddDiv(w, G.e, G.c, G.b);
  out.rho = ddValue(w, G.e);
  // τγτ
  ddMul(w, G.c, G.tau, G.gTau);
  ddMul(w, G.e, G.RT, G.c);
  out.h = ddValue(w, G.e);
  ddSub(w, G.e, G.c, G.a);
  ddMul(w, G.e, G.RT, G.e);
  out.u = ddValue(w, G.e);
  ddSub(w, G.e, G.c, G.gamma);
  ddMul(w, G.e, G.R, G.e);
  out.s = ddValue(w, G.e);
  // t2 = τ²γττ (in G.b), cp = −R t2
  ddMul(w, G.b, G.tau, G.tau);
  ddMul(w, G.b, G.b, G.gTauTau);
  ddMul(w, G.e, G.R, G.b);
  out.cp = -ddValue(w, G.e);
  // a = γπ − τγπτ (in G.a), a² (in G.c)
  ddMul(w, G.a, G.tau, G.gPiTau);
  ddSub(w, G.a, G.gPi, G.a);
  ddMul(w, G.c, G.a, G.a);
  ddDiv(w, G.e, G.c, G.gPiPi);
  ddSub(w, G.e, G.e, G.b);
  ddMul(w, G.e, G.R, G.e);
  out.cv = ddValue(w, G.e);
  // w² = RT γπ² / (a²/t2 − γππ)
  ddDiv(w, G.e, G.c, G.b);
  ddSub(w, G.e, G.e, G.gPiPi);
  ddMul(w, G.c, G.gPi, G.gPi);
  ddMul(w, G.c, G.RT, G.c);
  ddDiv(w, G.e, G.c, G.e);
  out.w = ddSqrtValue(w, G.e);
  return out;
}

/** π = p/p*, τ = T* / T into slots G.pi, G.tau (p* and T* exact doubles here, or T* from a decimal slot). */
function reduced(w: Float64Array, p: number, pStar: number, T: number, tStarSlot: number): void {
  ddSet(w, G.a, p, 0);
  ddSet(w, G.b, pStar, 0);
  ddDiv(w, G.pi, G.a, G.b);
  ddSet(w, G.a, T, 0);
  ddDiv(w, G.tau, tStarSlot, G.a);
}

const terms1 = new CompensatedTerms(r1.I, r1.J, r1.n);
const w1 = new Float64Array(2 * G.size);
// R7-97 Eq. 7: γ = Σ nᵢ (7.1 − π)^Iᵢ (τ − 1.222)^Jᵢ; T* = 1386 K
ddFromDecimal(w1, G.k1, '7.1');
ddFromDecimal(w1, G.k2, '1.222');
ddSet(w1, G.tStar, r1.TStar, 0);

/**
 * Region 1 (compressed liquid, R7-97 Eq. 7) in double-double: fills `out` at (p [Pa], T [K]) with every
 * property within 16 ulp of the exact value of the equation (see the module notes).
 * @example
 * ```ts
 * const out = new WaterProperties();
 * region1Compensated(3e6, 300, out).h;   //=> 115331.273 (J/kg; IF97 Table 5)
 * ```
 */
export function region1Compensated(p: number, T: number, out: WaterProperties): WaterProperties {
  const w = w1;
  reduced(w, p, r1.pStar, T, G.tStar);
  ddSub(w, G.x, G.k1, G.pi);
  ddSub(w, G.y, G.tau, G.k2);
  weightedSums(terms1, w, G.x, G.y, G.sums);
  ddCopy(w, G.gamma, G.sums);
  // γπ = −S_x, γππ = S_xx, γτ = S_y, γττ = S_yy, γπτ = −S_xy (x = 7.1 − π, y = τ − 1.222)
  ddDiv(w, G.gPi, G.sums + 1, G.x);
  ddNeg(w, G.gPi, G.gPi);
  ddMul(w, G.a, G.x, G.x);
  ddDiv(w, G.gPiPi, G.sums + 2, G.a);
  ddDiv(w, G.gTau, G.sums + 3, G.y);
  ddMul(w, G.a, G.y, G.y);
  ddDiv(w, G.gTauTau, G.sums + 4, G.a);
  ddMul(w, G.a, G.x, G.y);
  ddDiv(w, G.gPiTau, G.sums + 5, G.a);
  ddNeg(w, G.gPiTau, G.gPiTau);
  return gibbsProperties(w, p, T, out);
}

/**
 * γ = γ° + γʳ with γ° = ln π + Σ n°ᵢ τ^J°ᵢ and γʳ = Σ nᵢ π^Iᵢ (τ − shift)^Jᵢ (regions 2 and 5):
 * the derivatives into the Gibbs slots.
 */
function idealResidual(w: Float64Array, ideal: CompensatedTerms, residual: CompensatedTerms): void {
  // ideal part: x = 1, y = τ
  ddSet(w, G.one, 1, 0);
  weightedSums(ideal, w, G.one, G.tau, G.ideal);
  weightedSums(residual, w, G.pi, G.y, G.sums);
  // γ = ln π + S° + Sʳ
  ddLog(w, G.gamma, G.pi);
  ddAdd(w, G.gamma, G.gamma, G.ideal);
  ddAdd(w, G.gamma, G.gamma, G.sums);
  // γπ = 1/π + Sʳ_π, γππ = −1/π² + Sʳ_ππ
  ddDiv(w, G.a, G.one, G.pi);
  ddDiv(w, G.gPi, G.sums + 1, G.pi);
  ddAdd(w, G.gPi, G.gPi, G.a);
  ddMul(w, G.b, G.a, G.a);
  ddMul(w, G.c, G.pi, G.pi);
  ddDiv(w, G.gPiPi, G.sums + 2, G.c);
  ddSub(w, G.gPiPi, G.gPiPi, G.b);
  // γτ = S°_τ + Sʳ_y, γττ = S°_ττ + Sʳ_yy, γπτ = Sʳ_πy (y = τ − shift)
  ddDiv(w, G.gTau, G.ideal + 3, G.tau);
  ddDiv(w, G.a, G.sums + 3, G.y);
  ddAdd(w, G.gTau, G.gTau, G.a);
  ddMul(w, G.b, G.tau, G.tau);
  ddDiv(w, G.gTauTau, G.ideal + 4, G.b);
  ddMul(w, G.b, G.y, G.y);
  ddDiv(w, G.a, G.sums + 4, G.b);
  ddAdd(w, G.gTauTau, G.gTauTau, G.a);
  ddMul(w, G.b, G.pi, G.y);
  ddDiv(w, G.gPiTau, G.sums + 5, G.b);
}

const ideal2 = new CompensatedTerms(r2.J0.map(() => 0), r2.J0, r2.n0);
const terms2 = new CompensatedTerms(r2.I, r2.J, r2.n);
const w2 = new Float64Array(2 * G.size);
// R7-97 Eqs. 16-17: π = p/1 MPa, τ = 540 K/T, residual in (τ − 0.5)
ddSet(w2, G.tStar, r2.TStar, 0);
ddFromDecimal(w2, G.k2, '0.5');

/**
 * Region 2 (vapour, R7-97 Eqs. 15-17) in double-double: fills `out` at (p [Pa], T [K]).
 * @example
 * ```ts
 * region2Compensated(0.0035e6, 700, new WaterProperties()).h;   //=> 3335683.75 (J/kg; IF97 Table 15)
 * ```
 */
export function region2Compensated(p: number, T: number, out: WaterProperties): WaterProperties {
  const w = w2;
  reduced(w, p, r2.pStar, T, G.tStar);
  ddSub(w, G.y, G.tau, G.k2);
  idealResidual(w, ideal2, terms2);
  return gibbsProperties(w, p, T, out);
}

const ideal5 = new CompensatedTerms(r5.J0.map(() => 0), r5.J0, r5.n0);
const terms5 = new CompensatedTerms(r5.I, r5.J, r5.n);
const w5 = new Float64Array(2 * G.size);
// R7-97 Eqs. 32-34: π = p/1 MPa, τ = 1000 K/T, residual in τ
ddSet(w5, G.tStar, r5.TStar, 0);

/**
 * Region 5 (high-temperature steam, R7-97 Eqs. 32-34) in double-double: fills `out` at (p [Pa], T [K]).
 * @example
 * ```ts
 * region5Compensated(0.5e6, 1500, new WaterProperties()).h;   //=> 5219768.55 (J/kg; IF97 Table 42)
 * ```
 */
export function region5Compensated(p: number, T: number, out: WaterProperties): WaterProperties {
  const w = w5;
  reduced(w, p, r5.pStar, T, G.tStar);
  ddCopy(w, G.y, G.tau);
  idealResidual(w, ideal5, terms5);
  return gibbsProperties(w, p, T, out);
}

// ---------------------------------------------------------------------------------------------
// Region 3 (R7-97 Eq. 28, Table 31)

/** Slots of the region 3 workspace. */
const enum H {
  delta = 0,
  tau,
  phi,
  dPd, // δφδ
  ddPdd, // δ²φδδ
  tPt, // τφτ
  ttPtt, // τ²φττ
  dtPdt, // δτφδτ
  R,
  RT,
  a,
  b,
  c,
  e,
  n1,
  tStar,
  rhoStar,
  sums, // six slots
  size = sums + 6,
}

const terms3 = new CompensatedTerms(r3.I, r3.J, r3.n);
const w3 = new Float64Array(2 * H.size);
// R7-97 Eq. 28: φ = n₁ ln δ + Σ nᵢ δ^Iᵢ τ^Jᵢ, δ = ρ/322 kg/m³, τ = 647.096 K/T (the decimal value)
ddFromDecimal(w3, H.tStar, String(r3.TStar));
ddSet(w3, H.rhoStar, r3.rhoStar, 0);
ddSet(w3, H.n1, r3.n1, 0);

/**
 * Region 3 (near-critical, R7-97 Eq. 28) in double-double: fills `out` at (ρ [kg/m³], T [K]) with every
 * property within 16 ulp of the exact value of the equation (see the module notes).
 * @example
 * ```ts
 * region3Compensated(500, 650, new WaterProperties()).p;   //=> 25.5837018e6 (Pa; IF97 Table 33)
 * ```
 */
export function region3Compensated(rho: number, T: number, out: WaterProperties): WaterProperties {
  const w = w3;
  ddSet(w, H.a, rho, 0);
  ddDiv(w, H.delta, H.a, H.rhoStar);
  ddSet(w, H.a, T, 0);
  ddDiv(w, H.tau, H.tStar, H.a);
  weightedSums(terms3, w, H.delta, H.tau, H.sums);
  // φ = n₁ ln δ + S, δφδ = n₁ + ΣI t, δ²φδδ = −n₁ + ΣI(I−1) t; the τ sums directly
  ddLog(w, H.phi, H.delta);
  ddMul(w, H.phi, H.phi, H.n1);
  ddAdd(w, H.phi, H.phi, H.sums);
  ddAdd(w, H.dPd, H.sums + 1, H.n1);
  ddSub(w, H.ddPdd, H.sums + 2, H.n1);
  ddCopy(w, H.tPt, H.sums + 3);
  ddCopy(w, H.ttPtt, H.sums + 4);
  ddCopy(w, H.dtPdt, H.sums + 5);
  ddSet(w, H.R, R_IF97, 0);
  ddMulNumber(w, H.RT, H.R, T);
  out.T = T;
  out.rho = rho;
  out.v = 1 / rho;
  // p = ρRT δφδ
  ddMulNumber(w, H.e, H.RT, rho);
  ddMul(w, H.e, H.e, H.dPd);
  out.p = ddValue(w, H.e);
  // u = RT τφτ, h = RT(τφτ + δφδ), s = R(τφτ − φ)
  ddMul(w, H.e, H.RT, H.tPt);
  out.u = ddValue(w, H.e);
  ddAdd(w, H.e, H.tPt, H.dPd);
  ddMul(w, H.e, H.RT, H.e);
  out.h = ddValue(w, H.e);
  ddSub(w, H.e, H.tPt, H.phi);
  ddMul(w, H.e, H.R, H.e);
  out.s = ddValue(w, H.e);
  // cv = −R τ²φττ
  ddMul(w, H.e, H.R, H.ttPtt);
  out.cv = -ddValue(w, H.e);
  // a = δφδ − δτφδτ, b = 2δφδ + δ²φδδ; cp = R(−τ²φττ + a²/b), w = √(RT(b − a²/(τ²φττ)))
  ddSub(w, H.a, H.dPd, H.dtPdt);
  ddMul(w, H.a, H.a, H.a);
  ddAdd(w, H.b, H.dPd, H.dPd);
  ddAdd(w, H.b, H.b, H.ddPdd);
  ddDiv(w, H.c, H.a, H.b);
  ddSub(w, H.c, H.c, H.ttPtt);
  ddMul(w, H.c, H.R, H.c);
  out.cp = ddValue(w, H.c);
  ddDiv(w, H.c, H.a, H.ttPtt);
  ddSub(w, H.c, H.b, H.c);
  ddMul(w, H.c, H.RT, H.c);
  out.w = ddSqrtValue(w, H.c);
  return out;
}
