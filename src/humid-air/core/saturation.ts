/**
 * Saturation pressure of pure water for psychrometrics, and its inverse (the dew or frost point).
 *
 * - Over liquid water (T ≥ 273.15 K): IAPWS-IF97 region 4, IAPWS R7-97(2012) Eq. 30, through the
 *   project's IF97 SI core (`saturationPressure`); its inverse is Eq. 31 (`saturationTemperature`),
 *   which is exact (both come from the same quadratic, Eq. 29), so the dew point over liquid takes
 *   no iteration. Valid 273.15 K to 647.096 K (611.213 Pa to 22.064 MPa).
 * - Over ice (T < 273.15 K): IAPWS R14-08(2011), Revised Release on the Pressure along the Melting
 *   and Sublimation Curves of Ordinary Water Substance, Eq. 6 with Table 3; valid 50 K to 273.16 K.
 *   The frost point is Newton's method on Eq. 6 in the variable u = Tt/T, in which ln p is nearly
 *   linear, from a start interpolated in a table computed once from Eq. 6 (one step to double
 *   precision from 150 K to 273.15 K).
 * - Supercooled liquid below 273.15 K is not offered (IF97 does not cover it and no recalled
 *   formulation could be checked against printed values); below 0 °C saturation is over ice, as in
 *   the ASHRAE Handbook—Fundamentals moist-air table.
 *
 * The enhancement factor of real moist air is not applied (the ideal-mixture relations of the
 * Handbook): see data/humid-air/enhancement-buck-1981.json for why.
 *
 * @module
 */
// named imports, so that a bundle carries the numbers and not the file's source text
import { a as SUBLIMATION_A, b as SUBLIMATION_B, pt as SUBLIMATION_PT, Tt as SUBLIMATION_TT } from '../../../data/humid-air/sublimation-iapws-r14.json';
import { saturationPressure, saturationTemperature } from '../../water/if97/region4.js';

const TT = SUBLIMATION_TT;
const PT = SUBLIMATION_PT;
const [A1, A2, A3] = SUBLIMATION_A as [number, number, number];
const [B1, B2, B3] = SUBLIMATION_B as [number, number, number];
const LN_PT = Math.log(PT);
/** 1 − b_i: ln(p/pt) = Σ a_i u^(1 − b_i) with u = Tt/T. */
const C1 = 1 - B1;
const C2 = 1 - B2;
const C3 = 1 - B3;
/** d ln(p/pt)/du at u = 1 (the triple point): Σ a_i (1 − b_i). */
const SLOPE_AT_TRIPLE = A1 * C1 + A2 * C2 + A3 * C3;

/** Temperature below which saturation is over ice, K (0 °C; IF97's saturation line starts here). */
export const T_ICE = 273.15;
/** Lowest saturation pressure over liquid water by IF97, Pa (at 273.15 K). */
export const P_WATER_AT_ICE = saturationPressure(T_ICE);

/**
 * Sublimation pressure of ice Ih in Pa, T in K (IAPWS R14-08(2011) Eq. 6). Valid 50 K to 273.16 K;
 * the caller checks the range.
 * @example
 * ```ts
 * sublimationPressure(230);   //=> 8.94735274... (Pa; the release's check value is 8.94735e-6 MPa)
 * ```
 */
export function sublimationPressure(T: number): number {
  const th = T / TT;
  // θ^b as exp(b ln θ): one logarithm for the three powers
  const L = Math.log(th);
  return PT * Math.exp((A1 * Math.exp(B1 * L) + A2 * Math.exp(B2 * L) + A3 * Math.exp(B3 * L)) / th);
}

/** Sublimation pressure at 273.15 K, Pa: the top of the ice branch. */
export const P_ICE_AT_WATER = sublimationPressure(T_ICE);

/**
 * Saturation pressure of pure water in Pa: over ice below 273.15 K (R14-08), over liquid from
 * 273.15 K (IF97). The caller checks 50 K ≤ T ≤ 647.096 K.
 * @example
 * ```ts
 * waterSaturationPressure(293.15);   //=> 2339.21... (Pa, over liquid, IF97)
 * waterSaturationPressure(253.15);   //=> 103.239... (Pa, over ice, IAPWS R14-08)
 * ```
 */
export function waterSaturationPressure(T: number): number {
  return T < T_ICE ? sublimationPressure(T) : saturationPressure(T);
}

/** Newton on g(u) = Σ a_i u^(1 − b_i) − c from u; at most `steps` steps; the root, or −1. */
function newtonFrost(c: number, u: number, steps: number): number {
  for (let i = 0; i < steps; i++) {
    const L = Math.log(u);
    const e1 = A1 * Math.exp(C1 * L);
    const e2 = A2 * Math.exp(C2 * L);
    const e3 = A3 * Math.exp(C3 * L);
    const step = (e1 + e2 + e3 - c) / ((C1 * e1 + C2 * e2 + C3 * e3) / u);
    u -= step;
    if (!(u > 0)) return -1;
    // quadratic convergence: after a step below 1e-7 the next would be below 1e-16 (measured)
    if (Math.abs(step) <= 1e-7) return u;
  }
  return -1;
}

/**
 * A start table for the frost point, computed from Eq. 6 itself (no new data) on the first frost
 * point asked for, not at import (48 Newton solves): u = Tt/T at equally spaced c = ln(p/pt) from
 * 150 K to 273.15 K, with du/dc = 1/g'(u), for cubic Hermite interpolation. The start is then within
 * 3e-10 of the root in u (measured), and one Newton step reaches double precision.
 */
const FROST_NODES = 48;
const FROST_C_LO = A1 * (TT / 150) ** C1 + A2 * (TT / 150) ** C2 + A3 * (TT / 150) ** C3;
const FROST_C_HI = Math.log(P_ICE_AT_WATER) - LN_PT;
const FROST_H = (FROST_C_HI - FROST_C_LO) / FROST_NODES;
const FROST_U = new Float64Array(FROST_NODES + 1);
const FROST_SLOPE = new Float64Array(FROST_NODES + 1);
let frostTableBuilt = false;

function buildFrostTable(): void {
  for (let k = 0; k <= FROST_NODES; k++) {
    const c = FROST_C_LO + k * FROST_H;
    const u = newtonFrost(c, 1 + c / SLOPE_AT_TRIPLE, 8);
    const L = Math.log(u);
    FROST_U[k] = u;
    FROST_SLOPE[k] = u / (C1 * A1 * Math.exp(C1 * L) + C2 * A2 * Math.exp(C2 * L) + C3 * A3 * Math.exp(C3 * L));
  }
  frostTableBuilt = true;
}

/**
 * The frost point of a partial pressure pw below {@link P_ICE_AT_WATER}: T with p_subl(T) = pw, K,
 * or −1. Newton on g(u) = Σ a_i u^(1 − b_i) − ln(pw/pt), u = Tt/T: from the start table above
 * 150 K (one step), below it from the tangent at the triple point (a few steps).
 */
function frostPoint(pw: number): number {
  const c = Math.log(pw) - LN_PT;
  let u: number;
  if (c >= FROST_C_LO && c <= FROST_C_HI) {
    if (!frostTableBuilt) buildFrostTable();
    const x = (c - FROST_C_LO) / FROST_H;
    let k = Math.floor(x);
    if (k >= FROST_NODES) k = FROST_NODES - 1;
    const t = x - k;
    const t2 = t * t;
    const t3 = t2 * t;
    u = (2 * t3 - 3 * t2 + 1) * FROST_U[k]! + (t3 - 2 * t2 + t) * FROST_H * FROST_SLOPE[k]! + (3 * t2 - 2 * t3) * FROST_U[k + 1]! + (t3 - t2) * FROST_H * FROST_SLOPE[k + 1]!;
  } else {
    u = 1 + c / SLOPE_AT_TRIPLE;
  }
  const root = newtonFrost(c, u, 8);
  return root > 0 ? TT / root : -1;
}

/**
 * The temperature at which pure water's saturation pressure is `pw` (the dew point, or the frost
 * point below 0 °C, of that partial pressure), in K: over liquid from IF97 Eq. 31 (exact inverse
 * of Eq. 30), over ice by `frostPoint`. Partial pressures between the ice branch's top
 * (611.154 Pa at 273.15 K) and the liquid branch's bottom (611.213 Pa) return 273.15 K.
 * Returns −1 when the answer lies outside [Tlo, Thi], for pw ≤ 0, or when Newton fails.
 * @example
 * ```ts
 * saturationTemperatureAt(2339.2148, 0, 1000);   //=> 293.15000... (K, over liquid)
 * saturationTemperatureAt(103.23903, 0, 1000);   //=> 253.15000... (K, over ice)
 * ```
 */
export function saturationTemperatureAt(pw: number, Tlo: number, Thi: number): number {
  if (!(pw > 0)) return -1;
  let T: number;
  if (pw >= P_WATER_AT_ICE) T = saturationTemperature(pw);
  else if (pw < P_ICE_AT_WATER) T = frostPoint(pw);
  else T = T_ICE;
  if (!(T >= Tlo && T <= Thi)) return -1;
  return T;
}
