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
 * miss by up to 7 678 ulp at the 99th percentile and 777 915 at most in region 3 (cp near the
 * critical point), and by up to 29 288 near the zeros of u and s in region 1.
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
import { CompensatedTerms, weightedSums } from './compensated-sums.js';
import { ddAdd, ddCopy, ddDiv, ddFromDecimal, ddLog, ddMul, ddMulNumber, ddNeg, ddSet, ddSqrtValue, ddSub, ddValue } from './double-double.js';
import type { WaterProperties } from './properties.js';

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

/** A region's compensated terms and its double-double workspace with the constants set. */
interface Kit {
  readonly terms: CompensatedTerms;
  readonly w: Float64Array;
}

/** A region 2 or 5 kit: the residual terms and the ideal-gas part's terms. */
interface IdealKit extends Kit {
  readonly ideal: CompensatedTerms;
}

// each region's kit is built on its first call (no work at import)
let kit1: Kit | undefined;
function region1Kit(): Kit {
  const w = new Float64Array(2 * G.size);
  // R7-97 Eq. 7: γ = Σ nᵢ (7.1 − π)^Iᵢ (τ − 1.222)^Jᵢ; T* = 1386 K
  ddFromDecimal(w, G.k1, '7.1');
  ddFromDecimal(w, G.k2, '1.222');
  ddSet(w, G.tStar, r1.TStar, 0);
  return (kit1 = { terms: new CompensatedTerms(r1.I, r1.J, r1.n), w });
}

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
  const { w, terms } = kit1 ?? region1Kit();
  reduced(w, p, r1.pStar, T, G.tStar);
  ddSub(w, G.x, G.k1, G.pi);
  ddSub(w, G.y, G.tau, G.k2);
  weightedSums(terms, w, G.x, G.y, G.sums);
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

let kit2: IdealKit | undefined;
function region2Kit(): IdealKit {
  const w = new Float64Array(2 * G.size);
  // R7-97 Eqs. 16-17: π = p/1 MPa, τ = 540 K/T, residual in (τ − 0.5)
  ddSet(w, G.tStar, r2.TStar, 0);
  ddFromDecimal(w, G.k2, '0.5');
  return (kit2 = { ideal: new CompensatedTerms(r2.J0.map(() => 0), r2.J0, r2.n0), terms: new CompensatedTerms(r2.I, r2.J, r2.n), w });
}

/**
 * Region 2 (vapour, R7-97 Eqs. 15-17) in double-double: fills `out` at (p [Pa], T [K]).
 * @example
 * ```ts
 * region2Compensated(0.0035e6, 700, new WaterProperties()).h;   //=> 3335683.75 (J/kg; IF97 Table 15)
 * ```
 */
export function region2Compensated(p: number, T: number, out: WaterProperties): WaterProperties {
  const { w, ideal, terms } = kit2 ?? region2Kit();
  reduced(w, p, r2.pStar, T, G.tStar);
  ddSub(w, G.y, G.tau, G.k2);
  idealResidual(w, ideal, terms);
  return gibbsProperties(w, p, T, out);
}

let kit5: IdealKit | undefined;
function region5Kit(): IdealKit {
  const w = new Float64Array(2 * G.size);
  // R7-97 Eqs. 32-34: π = p/1 MPa, τ = 1000 K/T, residual in τ
  ddSet(w, G.tStar, r5.TStar, 0);
  return (kit5 = { ideal: new CompensatedTerms(r5.J0.map(() => 0), r5.J0, r5.n0), terms: new CompensatedTerms(r5.I, r5.J, r5.n), w });
}

/**
 * Region 5 (high-temperature steam, R7-97 Eqs. 32-34) in double-double: fills `out` at (p [Pa], T [K]).
 * @example
 * ```ts
 * region5Compensated(0.5e6, 1500, new WaterProperties()).h;   //=> 5219768.55 (J/kg; IF97 Table 42)
 * ```
 */
export function region5Compensated(p: number, T: number, out: WaterProperties): WaterProperties {
  const { w, ideal, terms } = kit5 ?? region5Kit();
  reduced(w, p, r5.pStar, T, G.tStar);
  ddCopy(w, G.y, G.tau);
  idealResidual(w, ideal, terms);
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

let kit3: Kit | undefined;
function region3Kit(): Kit {
  const w = new Float64Array(2 * H.size);
  // R7-97 Eq. 28: φ = n₁ ln δ + Σ nᵢ δ^Iᵢ τ^Jᵢ, δ = ρ/322 kg/m³, τ = 647.096 K/T (the decimal value)
  ddFromDecimal(w, H.tStar, String(r3.TStar));
  ddSet(w, H.rhoStar, r3.rhoStar, 0);
  ddSet(w, H.n1, r3.n1, 0);
  return (kit3 = { terms: new CompensatedTerms(r3.I, r3.J, r3.n), w });
}

/**
 * Region 3 (near-critical, R7-97 Eq. 28) in double-double: fills `out` at (ρ [kg/m³], T [K]) with every
 * property within 16 ulp of the exact value of the equation (see the module notes).
 * @example
 * ```ts
 * region3Compensated(500, 650, new WaterProperties()).p;   //=> 25.5837018e6 (Pa; IF97 Table 33)
 * ```
 */
export function region3Compensated(rho: number, T: number, out: WaterProperties): WaterProperties {
  const { w, terms } = kit3 ?? region3Kit();
  ddSet(w, H.a, rho, 0);
  ddDiv(w, H.delta, H.a, H.rhoStar);
  ddSet(w, H.a, T, 0);
  ddDiv(w, H.tau, H.tStar, H.a);
  weightedSums(terms, w, H.delta, H.tau, H.sums);
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
