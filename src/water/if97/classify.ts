/**
 * Region and phase of a (p, T) point: IAPWS R7-97(2012) Section 4, Figure 1 (regions 1, 2, 3, 5
 * divided by the saturation line of region 4 below 623.15 K and by the B23 line above it).
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { b23Pressure } from './b23.js';
import { P_CRITICAL, P_MAX, P_MAX_5, RHO_CRITICAL, T_13, T_B23_MAX, T_CRITICAL, T_MAX_2, T_MAX_5, T_MIN } from './constants.js';
import { saturationPressure } from './region4.js';
import { PHASE, type WaterState } from './water-state.js';

/**
 * The IF97 region of (p [Pa], T [K]): 1, 2, 3 or 5; 0 outside the range of IF97.
 * On the saturation line itself (p = p_s(T)), the liquid (region 1) is returned.
 * @example
 * ```ts
 * regionOfPT(1e6, 300);    //=> 1
 * regionOfPT(1e6, 3000);   //=> 0 (outside IF97)
 * ```
 */
export function regionOfPT(p: number, T: number): number {
  if (!(p > 0) || !(T >= T_MIN) || !(T <= T_MAX_5) || !(p <= P_MAX)) return 0;
  if (T > T_MAX_2) return p <= P_MAX_5 ? 5 : 0;
  if (T <= T_13) return p >= saturationPressure(T) ? 1 : 2;
  if (T <= T_B23_MAX && p > b23Pressure(T)) return 3;
  return 2;
}

/**
 * Phase of a single-phase state: supercritical above both critical values; otherwise liquid in
 * region 1 and vapour in regions 2 and 5; in region 3 below T_c by the side of the dome the state lies
 * on, that is by its density against ρc when `rho` is given (single-phase region 3 states lie outside
 * the dome, whose liquid side is denser than ρc and vapour side lighter): on the saturation line a
 * pressure comparison flips by rounding, the density does not.
 * @example
 * ```ts
 * phaseOf(1e6, 300, 1);   //=> 0 (PHASE.liquid)
 * ```
 */
export function phaseOf(p: number, T: number, region: number, rho = NaN): number {
  if (T >= T_CRITICAL) return p >= P_CRITICAL ? PHASE.supercritical : PHASE.vapor;
  if (region === 1) return PHASE.liquid;
  if (region === 2 || region === 5) return PHASE.vapor;
  if (rho === rho) return rho >= RHO_CRITICAL ? PHASE.liquid : PHASE.vapor;
  return p >= saturationPressure(T) ? PHASE.liquid : PHASE.vapor;
}

/** Marks `out` as a single-phase state of `region` (x NaN, phase from p and T). */
export function finishSinglePhase(out: WaterState, region: number): StatusCode {
  out.region = region;
  out.x = NaN;
  out.phase = phaseOf(out.p, out.T, region, out.rho);
  return Status.ok;
}
