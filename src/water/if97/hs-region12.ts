/**
 * Region 1 and region 2 (h, s) states without (p, h) flashes: Newton steps in (p, T) on the basic
 * equation itself, h(p, T) = h and s(p, T) = s, with the Jacobian from the same evaluation of the
 * Gibbs function γ(π, τ) (IAPWS R7-97(2012) Tables 3-4 and 12-14):
 * (∂h/∂T)_p = cp, (∂s/∂T)_p = cp/T, (∂h/∂p)_T = v − T(∂v/∂T)_p = R·T*·γ_πτ/p*,
 * (∂s/∂p)_T = −(∂v/∂T)_p = R(τγ_πτ − γ_π)/p*.
 * Starting values: p from IAPWS SR2-01 p(h, s) (regions 1, 2a, 2b, 2c), T from R7-97 T(p, h).
 *
 * An answer is accepted only when h and s come back to their rounding level and it lies in the region
 * it was computed in, clear of the boundaries where the regions' equations disagree within IF97's
 * consistency (R7-97 Section 10): region 1 at 273.15 K ≤ T ≤ 623.15 K − {@link T_MARGIN_13},
 * p_s(T) ≤ p ≤ 100 MPa; region 2 at 273.15 K ≤ T ≤ 1073.15 K − {@link T_MARGIN_B23}, 1 mPa < p ≤ 100 MPa,
 * p ≤ p_s(T) up to 623.15 K and p ≤ p_B23(T − {@link T_MARGIN_B23}) above. Anything else returns a negative count and the
 * caller's general path (Newton in ln p over (p, h) flashes, then a bracketed search) decides.
 *
 * @module
 */
import { pStar as P1_STAR, TStar as T1_STAR } from '../../../data/if97/region1.json';
import { pStar as P2_STAR, TStar as T2_STAR } from '../../../data/if97/region2.json';
import { b23Pressure } from './b23.js';
import { region1PressureHS, region2PressureHS } from './backward-hs.js';
import { region1TemperaturePH, region2TemperaturePH } from './backward-ph.js';
import { finishSinglePhase } from './classify.js';
import { P_MAX, P_SEARCH_MIN, R_IF97, T_13, T_B23_MAX, T_MAX_2, T_MIN } from './constants.js';
import { region1Sums, region2IdealSums, region2ResidualSums } from './kernels.generated.js';
import { region1 } from './region1.js';
import { region2 } from './region2.js';
import { saturationPressure } from './region4.js';
import type { WaterState } from './water-state.js';

/**
 * Region 1 answers within this distance (K) below 623.15 K are left to the general path: there the
 * region 1 and region 3 equations differ by up to IF97's consistency tolerance, and which one an
 * (h, s) state belongs to is the general path's decision.
 */
export const T_MARGIN_13 = 0.5;
/**
 * Region 2 answers within this distance (K) above the B23 line, or below 1073.15 K (the region 2/5
 * boundary), are left to the general path (as {@link T_MARGIN_13}).
 */
export const T_MARGIN_B23 = 0.5;

/**
 * Residuals below NEAR times their rounding level (1e-8 relative) are within one Newton step of the
 * answer: the error left after that step is of the order of their square. So the step is taken and
 * the state evaluated there in full, which is the answer if h and s come back to their rounding
 * level (otherwise the steps go on).
 */
const NEAR = 1e5;
/** Most Newton steps before handing over. */
const MAX_STEPS = 8;
/** Sums of the Gibbs function: private scratch of one call (region 2 uses the ideal and residual parts). */
const g = new Float64Array(6);
const g0 = new Float64Array(3);

/**
 * One Newton step on (h(p, T) − h, s(p, T) − s) given the residuals and the Jacobian; writes the new
 * (p, T) into step[0], step[1]. Returns false for a singular Jacobian.
 */
function newtonStep(p: number, T: number, rh: number, rs: number, hp: number, hT: number, sp: number, sT: number, step: Float64Array): boolean {
  const det = hp * sT - hT * sp;
  if (!(Math.abs(det) > 0)) return false;
  const dp = (-rh * sT + rs * hT) / det;
  const dT = (-rs * hp + rh * sp) / det;
  // at most a factor 2 in p and 50 K in T per step
  step[0] = p + Math.max(-0.5 * p, Math.min(p, dp));
  step[1] = T + Math.max(-50, Math.min(50, dT));
  return true;
}
const next = new Float64Array(2);

/** The tolerances of a converged answer: h and s at their rounding level. */
function hTolerance(h: number): number {
  return 1e-13 * Math.abs(h) + 1e-8;
}
function sTolerance(s: number): number {
  return 1e-13 * (Math.abs(s) + 1e3);
}

/**
 * The region 1 state with enthalpy h (J/kg) and entropy s (J/(kg·K)).
 * @returns the number of evaluations of the region 1 equation (> 0) with `out` filled and marked
 *   single-phase; a negative number when the steps do not settle or the answer is not a region 1
 *   state clear of its boundaries (the caller then decides)
 */
export function region1HS(h: number, s: number, out: WaterState): number {
  let p = region1PressureHS(h, s);
  if (!(p > 0 && p <= 1.5 * P_MAX)) return -1;
  let T = region1TemperaturePH(Math.min(p, P_MAX), h);
  if (!(T > 0.8 * T_MIN && T < 1.2 * T_13)) return -1;
  const hTol = hTolerance(h);
  const sTol = sTolerance(s);
  for (let i = 1; i <= MAX_STEPS; i++) {
    const pi = p / P1_STAR;
    const tau = T1_STAR / T;
    region1Sums(7.1 - pi, tau - 1.222, g);
    const gamma = g[0]!;
    const gPi = -g[1]!;
    const gTau = g[3]!;
    const gTauTau = g[4]!;
    const gPiTau = -g[5]!;
    const rh = R_IF97 * T1_STAR * gTau - h;
    const rs = R_IF97 * (tau * gTau - gamma) - s;
    const cp = -R_IF97 * tau * tau * gTauTau;
    const hp = (R_IF97 * T1_STAR * gPiTau) / P1_STAR;
    const sp = (R_IF97 * (tau * gPiTau - gPi)) / P1_STAR;
    const near = Math.abs(rh) <= NEAR * hTol && Math.abs(rs) <= NEAR * sTol;
    if (!newtonStep(p, T, rh, rs, hp, cp, sp, cp / T, next)) return -i;
    p = next[0]!;
    T = next[1]!;
    if (!(p > 0 && T > 0)) return -i;
    if (near) {
      region1(p, T, out);
      if (settled(h, s, out)) return acceptRegion1(out) ? i + 1 : -i;
    }
  }
  return -MAX_STEPS;
}

/**
 * How far (Pa) a state must lie from the saturation pressure to be taken for single-phase: along an
 * isenthalp (∂s/∂p)_h = −v/T, so an s known to its rounding level places p only within this distance
 * (ten times over), and closer states are left to the general path.
 */
function saturationMargin(s: number, T: number, v: number): number {
  return (10 * sTolerance(s) * T) / v;
}

/** h and s of `out` at their rounding level. */
function settled(h: number, s: number, out: WaterState): boolean {
  return Math.abs(out.h - h) <= hTolerance(h) && Math.abs(out.s - s) <= sTolerance(s);
}

/** The state in region 1 clear of its boundaries (then marked single-phase). */
function acceptRegion1(out: WaterState): boolean {
  const p = out.p;
  const T = out.T;
  if (!(T >= T_MIN && T <= T_13 - T_MARGIN_13 && p <= P_MAX)) return false;
  if (!(p - saturationPressure(T) >= saturationMargin(out.s, T, out.v))) return false;
  finishSinglePhase(out, 1);
  return true;
}

/**
 * The region 2 state with enthalpy h (J/kg) and entropy s (J/(kg·K)); returns as {@link region1HS}.
 */
export function region2HS(h: number, s: number, out: WaterState): number {
  let p = region2PressureHS(h, s);
  if (!(p > P_SEARCH_MIN && p <= 1.5 * P_MAX)) return -1;
  let T = region2TemperaturePH(Math.min(p, P_MAX), h);
  if (!(T > 0.8 * T_MIN && T < 1.2 * T_MAX_2)) return -1;
  const hTol = hTolerance(h);
  const sTol = sTolerance(s);
  for (let i = 1; i <= MAX_STEPS; i++) {
    const pi = p / P2_STAR;
    const tau = T2_STAR / T;
    region2IdealSums(tau, g0);
    region2ResidualSums(pi, tau - 0.5, g);
    const gamma = Math.log(pi) + g0[0]! + g[0]!;
    const gPi = 1 / pi + g[1]!;
    const gTau = g0[1]! + g[3]!;
    const gTauTau = g0[2]! + g[4]!;
    const gPiTau = g[5]!;
    const rh = R_IF97 * T2_STAR * gTau - h;
    const rs = R_IF97 * (tau * gTau - gamma) - s;
    const cp = -R_IF97 * tau * tau * gTauTau;
    const hp = (R_IF97 * T2_STAR * gPiTau) / P2_STAR;
    const sp = (R_IF97 * (tau * gPiTau - gPi)) / P2_STAR;
    const near = Math.abs(rh) <= NEAR * hTol && Math.abs(rs) <= NEAR * sTol;
    if (!newtonStep(p, T, rh, rs, hp, cp, sp, cp / T, next)) return -i;
    p = next[0]!;
    T = next[1]!;
    if (!(p > 0 && T > 0)) return -i;
    if (near) {
      region2(p, T, out);
      if (settled(h, s, out)) return acceptRegion2(out) ? i + 1 : -i;
    }
  }
  return -MAX_STEPS;
}

/** As {@link acceptRegion1}, for region 2. */
function acceptRegion2(out: WaterState): boolean {
  const p = out.p;
  const T = out.T;
  if (!(T >= T_MIN && T <= T_MAX_2 - T_MARGIN_B23 && p > P_SEARCH_MIN && p <= P_MAX)) return false;
  if (T <= T_13) {
    if (!(saturationPressure(T) - p >= saturationMargin(out.s, T, out.v))) return false;
  } else if (T <= T_B23_MAX + T_MARGIN_B23 && !(p <= b23Pressure(T - T_MARGIN_B23))) {
    return false;
  }
  finishSinglePhase(out, 2);
  return true;
}
