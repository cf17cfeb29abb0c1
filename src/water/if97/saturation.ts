/**
 * Saturation: both phases at a temperature or a pressure, and two-phase mixtures of a given quality.
 * IAPWS R7-97(2012): p_s(T) and T_s(p) of region 4 (Eqs. 30, 31); the phases from regions 1 and 2
 * below 623.15 K and from region 3 at the two densities where its pressure equals p_s(T) above.
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { P_CRITICAL, RHO_CRITICAL, T_13, T_CRITICAL, T_MIN } from './constants.js';
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
 * saturationAtT(373.15, liquid, vapor);   //=> 0 (Status.ok); liquid.p = 101418 Pa
 * ```
 */
export function saturationAtT(T: number, liquid: WaterProperties, vapor: WaterProperties, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(T)) return Status.invalidInput;
  if (!(T >= T_MIN && T <= T_CRITICAL)) return Status.outOfRange;
  const p = T === T_CRITICAL ? P_CRITICAL : saturationPressure(T);
  if (T <= T_13) {
    region1(p, T, liquid);
    region2(p, T, vapor);
    return Status.ok;
  }
  if (T === T_CRITICAL) {
    region3(RHO_CRITICAL, T, liquid);
    region3(RHO_CRITICAL, T, vapor);
  } else {
    if (region3DensityAt(p, T, 1, ctx) !== Status.ok) return Status.noConvergence;
    const rl = ctx.rho;
    if (region3DensityAt(p, T, 2, ctx) !== Status.ok) return Status.noConvergence;
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
 * saturationAtP(101325, liquid, vapor);   //=> 0 (Status.ok); vapor.h - liquid.h is h_fg
 * ```
 */
export function saturationAtP(p: number, liquid: WaterProperties, vapor: WaterProperties, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(p)) return Status.invalidInput;
  if (!(p >= P_SAT_MIN && p <= P_CRITICAL)) return Status.outOfRange;
  const T = p === P_CRITICAL ? T_CRITICAL : Math.min(T_CRITICAL, Math.max(T_MIN, saturationTemperature(p)));
  if (p <= P_SAT_13) {
    // by pressure, so that p_s(623.15 K) itself stays with regions 1 and 2 as saturationAtT does
    const Tl = Math.min(T, T_13);
    region1(p, Tl, liquid);
    region2(p, Tl, vapor);
    return Status.ok;
  }
  const status = saturationAtT(T, liquid, vapor, ctx);
  liquid.p = p;
  vapor.p = p;
  return status;
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
