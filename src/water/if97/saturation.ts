/**
 * Saturation: both phases at a temperature or a pressure, and two-phase mixtures of a given quality.
 * IAPWS R7-97(2012): p_s(T) and T_s(p) of region 4 (Eqs. 30, 31); the phases from regions 1 and 2
 * below 623.15 K and from region 3 at the two densities where its pressure equals p_s(T) above.
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { CRITICAL_EXPONENT_BETA, P_CRITICAL, RHO_CRITICAL, T_13, T_CRITICAL, T_LINEAR_SATURATION_ZONE, T_MIN, T_NEAR_CRITICAL_BAND } from './constants.js';
import { defaultContext, type SolverContext } from './context.js';
import type { WaterProperties } from './properties.js';
import { region1 } from './region1.js';
import { region2 } from './region2.js';
import { region3 } from './region3.js';
import { region3DensityAt } from './region3-density.js';
import { saturationPressure, saturationTemperature } from './region4.js';
import { PHASE, type WaterState } from './water-state.js';

/** Pressure at the saturation line's lower end, p_s(273.15 K), Pa. */
export const P_SAT_MIN = saturationPressure(T_MIN);
/** Pressure on the B23 line at 623.15 K (16.529 MPa): above it saturation lies in region 3. */
export const P_SAT_13 = saturationPressure(T_13);

/**
 * Saturated liquid and vapour at T (K), 273.15 K ≤ T ≤ 647.096 K.
 * @example
 * ```ts
 * const liquid = new WaterProperties(), vapor = new WaterProperties();
 * saturationAtT(373.15, liquid, vapor);   //=> 0 (Status.ok)
 * liquid.p;                               //=> 101417.98 (Pa)
 * ```
 */
export function saturationAtT(T: number, liquid: WaterProperties, vapor: WaterProperties, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(T)) return Status.invalidInput;
  if (!(T >= T_MIN && T <= T_CRITICAL)) return Status.outOfRange;
  if (T <= T_13) {
    const p = saturationPressure(T);
    region1(p, T, liquid);
    region2(p, T, vapor);
    return Status.ok;
  }
  return saturatedPhases(T, T_CRITICAL - T, T === T_CRITICAL ? P_CRITICAL : saturationLinePressure(T), liquid, vapor, ctx);
}

/**
 * Both phases at T on the saturation line at p, `below` kelvin under T_c (T_c − T, or in the linear
 * zone next to T_c the distance that p itself fixes, finer than T's rounding): regions 1 and 2 up to
 * 623.15 K, region 3 at its two roots above, and in the near-critical band the densities scaled
 * toward ρc by `below`, so that every p under p_c has two distinct phases.
 */
function saturatedPhases(T: number, below: number, p: number, liquid: WaterProperties, vapor: WaterProperties, ctx: SolverContext): StatusCode {
  if (T <= T_13) {
    region1(p, T, liquid);
    region2(p, T, vapor);
    return Status.ok;
  }
  if (!(below > 0)) {
    region3(RHO_CRITICAL, T, liquid);
    region3(RHO_CRITICAL, T, vapor);
  } else if (below < T_NEAR_CRITICAL_BAND) {
    // the near-critical band: the saturated densities at the band's edge, scaled toward ρc with the
    // coexistence curve's exponent; properties from region 3 at (ρ, T). The isotherm is flat here,
    // so p₃(ρ, T) stays within a few 1e-10 of p_s(T).
    const edge = T_CRITICAL - T_NEAR_CRITICAL_BAND;
    const pEdge = saturationPressure(edge);
    if (region3DensityAt(pEdge, edge, 1, ctx) !== Status.ok) return Status.noConvergence;
    const rlEdge = ctx.rho;
    if (region3DensityAt(pEdge, edge, 2, ctx) !== Status.ok) return Status.noConvergence;
    const scale = (below / T_NEAR_CRITICAL_BAND) ** CRITICAL_EXPONENT_BETA;
    region3(RHO_CRITICAL + (rlEdge - RHO_CRITICAL) * scale, T, liquid);
    region3(RHO_CRITICAL + (ctx.rho - RHO_CRITICAL) * scale, T, vapor);
  } else {
    if (region3DensityAt(p, T, 1, ctx) !== Status.ok) return Status.noConvergence;
    const rl = ctx.rho;
    if (region3DensityAt(p, T, 2, ctx) !== Status.ok) return Status.noConvergence;
    if (!(rl > ctx.rho)) return Status.noConvergence;
    region3(rl, T, liquid);
    region3(ctx.rho, T, vapor);
  }
  liquid.p = p;
  vapor.p = p;
  return Status.ok;
}

/**
 * Saturated liquid and vapour at p (Pa), 611.213 Pa ≤ p ≤ 22.064 MPa.
 * @example
 * ```ts
 * const liquid = new WaterProperties(), vapor = new WaterProperties();
 * saturationAtP(101325, liquid, vapor);   //=> 0 (Status.ok)
 * vapor.h - liquid.h;                     //=> 2256.54e3 (J/kg: h_fg at 1 atm)
 * ```
 */
export function saturationAtP(p: number, liquid: WaterProperties, vapor: WaterProperties, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(p)) return Status.invalidInput;
  if (!(p >= P_SAT_MIN && p <= P_CRITICAL)) return Status.outOfRange;
  const T = saturationTemperatureOnLine(p);
  if (p <= P_SAT_13) {
    // by pressure, so that p_s(623.15 K) itself stays with regions 1 and 2 as saturationAtT does
    const Tl = Math.min(T, T_13);
    region1(p, Tl, liquid);
    region2(p, Tl, vapor);
    return Status.ok;
  }
  // in the linear zone T_s(p) rounds to within an ulp of T_c, p_c − p still fixes the distance
  const below = p >= P_CRITICAL ? 0 : P_CRITICAL - p < LINEAR_ZONE_PRESSURE ? (P_CRITICAL - p) / CRITICAL_SLOPE : T_CRITICAL - T;
  return saturatedPhases(T, below, p, liquid, vapor, ctx);
}

/**
 * The saturation pressure used on the saturation line: Eq. 30, and inside the near-critical band
 * Eq. 30 plus a linear share of its miss at the critical point (Eq. 30 gives p_s(T_c) = p_c +
 * 0.32 mPa, within its stated accuracy), so that the line ends exactly at (T_c, p_c) and T_s(p_c) = T_c.
 * The correction is at most 0.32 mPa (1.5e-11 relative). Within 1 µK of T_c the line is its tangent
 * at T_c (it departs from it by under 1e-7 Pa there, the rounding level of Eq. 30 near T_c), so that
 * it falls strictly and T_s(p) inverts it exactly up to p_c.
 * @example
 * ```ts
 * saturationLinePressure(373.15);   //=> 101417.978 (Pa; Eq. 30 alone away from T_c)
 * saturationLinePressure(647.096);  //=> 22064000 (Pa: p_c exactly)
 * ```
 */
export function saturationLinePressure(T: number): number {
  if (T > T_CRITICAL - T_LINEAR_SATURATION_ZONE) return P_CRITICAL - CRITICAL_SLOPE * (T_CRITICAL - T);
  return bandLinePressure(T);
}

/** Eq. 30 with the near-critical band's correction (see {@link saturationLinePressure}). */
function bandLinePressure(T: number): number {
  const ps = saturationPressure(T);
  if (!(T > T_CRITICAL - T_NEAR_CRITICAL_BAND)) return ps;
  return ps - CRITICAL_MISS * ((T - (T_CRITICAL - T_NEAR_CRITICAL_BAND)) / T_NEAR_CRITICAL_BAND);
}

/** Eq. 30's miss at the critical point, p_s(T_c) − p_c, Pa. */
const CRITICAL_MISS = saturationPressure(T_CRITICAL) - P_CRITICAL;

/**
 * The slope of the saturation line at T_c, dp_s/dT = 268 136 Pa/K, from differences of the band's
 * line 10 µK and 20 µK under T_c (Richardson extrapolation; Eq. 30 is evaluated to a few 1e-8 Pa
 * near T_c, 2e-14 relative, so the slope is good to about 1e-8 relative).
 */
const CRITICAL_SLOPE = 2 * lineSlopeBelowCritical(1e-5) - lineSlopeBelowCritical(2e-5);

/** (p_c − p_band(T_c − dT))/dT, Pa/K. */
function lineSlopeBelowCritical(dT: number): number {
  return (P_CRITICAL - bandLinePressure(T_CRITICAL - dT)) / dT;
}

/** p_c − p_s at the linear zone's edge, Pa. */
const LINEAR_ZONE_PRESSURE = CRITICAL_SLOPE * T_LINEAR_SATURATION_ZONE;

/**
 * T_s(p) above 16.5 MPa: Eq. 31, then Newton steps on the saturation line's pressure
 * ({@link saturationLinePressure}). Near the critical point Eq. 31 loses digits to cancellation
 * (1e-9 K at p_c); the Newton steps keep them, so T_s(p) runs continuously into T_c.
 */
function nearCriticalSaturationTemperature(p: number): number {
  let T = Math.min(T_CRITICAL, saturationTemperature(p));
  for (let i = 0; i < 4; i++) {
    const h = 1e-6;
    const slope = (saturationLinePressure(T) - saturationLinePressure(T - h)) / h;
    const next = Math.min(T_CRITICAL, T - (saturationLinePressure(T) - p) / slope);
    if (next === T) break;
    T = next;
  }
  return T;
}

/**
 * T_s(p) in K for 611.213 Pa ≤ p ≤ 22.064 MPa as the saturation functions use it: Eq. 31, refined
 * above 16.5 MPa so that it ends exactly at T_c (see {@link saturationLinePressure}).
 * @example
 * ```ts
 * saturationTemperatureOnLine(22.064e6);   //=> 647.096
 * ```
 */
export function saturationTemperatureOnLine(p: number): number {
  if (p >= P_CRITICAL) return T_CRITICAL;
  if (P_CRITICAL - p < LINEAR_ZONE_PRESSURE) return T_CRITICAL - (P_CRITICAL - p) / CRITICAL_SLOPE;
  return p > P_SAT_13 ? nearCriticalSaturationTemperature(p) : Math.min(T_CRITICAL, Math.max(T_MIN, saturationTemperature(p)));
}

/** Fills `out` with the mixture of quality x of the saturated phases `liquid` and `vapor`. */
export function mixPhases(x: number, liquid: WaterProperties, vapor: WaterProperties, out: WaterState): StatusCode {
  out.T = liquid.T;
  out.p = liquid.p;
  out.v = liquid.v + x * (vapor.v - liquid.v);
  out.rho = 1 / out.v;
  out.u = liquid.u + x * (vapor.u - liquid.u);
  out.h = liquid.h + x * (vapor.h - liquid.h);
  out.s = liquid.s + x * (vapor.s - liquid.s);
  out.cp = NaN;
  out.cv = NaN;
  out.w = NaN;
  out.x = x;
  out.region = 4;
  out.phase = PHASE.twoPhase;
  return Status.ok;
}
