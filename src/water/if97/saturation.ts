/**
 * Saturation: both phases at a temperature or a pressure, and two-phase mixtures of a given quality.
 * IAPWS R7-97(2012): p_s(T) and T_s(p) of region 4 (Eqs. 30, 31); the phases from regions 1 and 2
 * below 623.15 K and from region 3 at the two densities where its pressure equals p_s(T) above.
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { CRITICAL_EXPONENT_BETA, P_CRITICAL, RHO_CRITICAL, T_13, T_CRITICAL, T_MIN, T_NEAR_CRITICAL_BAND } from './constants.js';
import { defaultContext, type SolverContext } from './context.js';
import type { WaterProperties } from './properties.js';
import { region1 } from './region1.js';
import { region2 } from './region2.js';
import { region3 } from './region3.js';
import { region3DensityAt } from './region3-density.js';
import { saturationPressure } from './region4.js';
import { CRITICAL_SLOPE, LINEAR_ZONE_PRESSURE, P_SAT_13, P_SAT_MIN, saturationLinePressure, saturationTemperatureOnLine } from './saturation-line.js';
import { PHASE, type WaterState } from './water-state.js';

export { P_SAT_13, P_SAT_MIN, saturationLinePressure, saturationTemperatureOnLine } from './saturation-line.js';

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
    if (!(ctx.bandEdgeLiquidDensity > 0)) {
      // the same two numbers for every call: solved once per context
      const edge = T_CRITICAL - T_NEAR_CRITICAL_BAND;
      const pEdge = saturationPressure(edge);
      if (region3DensityAt(pEdge, edge, 2, ctx) !== Status.ok) return Status.noConvergence;
      const rvEdge = ctx.rho;
      if (region3DensityAt(pEdge, edge, 1, ctx) !== Status.ok) return Status.noConvergence;
      ctx.bandEdgeVaporDensity = rvEdge;
      ctx.bandEdgeLiquidDensity = ctx.rho;
    }
    const scale = (below / T_NEAR_CRITICAL_BAND) ** CRITICAL_EXPONENT_BETA;
    region3(RHO_CRITICAL + (ctx.bandEdgeLiquidDensity - RHO_CRITICAL) * scale, T, liquid);
    region3(RHO_CRITICAL + (ctx.bandEdgeVaporDensity - RHO_CRITICAL) * scale, T, vapor);
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
 * saturationAtP(22.064e6 - 2 ** -28, liquid, vapor);   //=> 0 (one ulp under p_c)
 * liquid.rho > vapor.rho;                             //=> true (still two phases)
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
