/**
 * A solved IF97 state re-evaluated with the compensated kernels (./compensated.ts): the solve stays
 * as it was (same iterations, same (p, T) or (ρ, T)); only the final properties are evaluated once
 * more, in double-double, with the basic equation of the state's region (IAPWS R7-97(2012) Eqs. 7,
 * 15-17, 28, 32-34). Two-phase states (region 4) get their saturated end states compensated and are
 * mixed again with the solved quality, as {@link mixPhases} mixes them.
 *
 * What is not compensated: the solve itself (region selection, the backward equations that start it,
 * the Newton steps on the fast kernels, p_s(T) and T_s(p) of region 4, the saturated densities of
 * region 3), and anything a caller combines after evaluation (k = cp/cv, superheat, transport
 * properties, Δh of two states).
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { region1Compensated, region2Compensated, region3Compensated, region5Compensated } from './compensated.js';
import { T_13 } from './constants.js';
import type { SolverContext } from './context.js';
import type { WaterProperties } from './properties.js';
import { mixPhases, P_SAT_13, saturationAtP, saturationAtT } from './saturation.js';
import type { WaterState } from './water-state.js';

/**
 * What the input pair of a solve held fixed, for {@link compensateState}:
 * - `pressure`: the pair gave p ((p, T), (p, h), (p, s), (p, x)); a region 3 state keeps the given p,
 *   as the fast solvers report it, and two-phase ends come from the saturation at p;
 * - `temperature`: the pair gave T but not p ((T, x), (T, v), (T, ρ)); region 3 p is the compensated
 *   p₃(ρ, T), and two-phase ends come from the saturation at T;
 * - `neither` ((h, s)): region 3 p is the compensated p₃(ρ, T), two-phase ends from the saturation at p.
 */
export const HELD = { neither: 0, pressure: 1, temperature: 2 } as const;

/** One of {@link HELD}. */
export type Held = (typeof HELD)[keyof typeof HELD];

/** Region 3 at (ρ, T) of `out`, compensated; p kept when `keepPressure`. */
function region3Again(out: WaterProperties, keepPressure: boolean): void {
  const p = out.p;
  region3Compensated(out.rho, out.T, out);
  if (keepPressure) out.p = p;
}

/**
 * Re-evaluates the solved state `out` (status ok from a solver) with the compensated kernel of its
 * region, in place: region 1, 2, 5 at (p, T); region 3 at (ρ, T); region 4 from compensated
 * saturated phases (regions 1 and 2 at (p, T) up to 623.15 K, region 3 at the saturated densities
 * above, found again by the same saturation call as the solve's) mixed with the solved quality. T,
 * the region, the phase and x are not changed; nor is p, except in region 3 when the pair did not
 * give it. Uses ctx.scratch and ctx.scratchB. Status `noConvergence` if the saturated phases found
 * again do not belong to the mixture (a state not made by this library's solvers); `ok` otherwise.
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPT(3e6, 300, out);                                 //=> 0
 * out.h;                                                      //=> 115331.27302143878 (J/kg, fast; R7-97 Table 5 prints 0.115331273e3 kJ/kg)
 * compensateState(out, HELD.pressure, defaultContext());      //=> 0
 * out.h;                                                      //=> 115331.27302143894 (J/kg, compensated: within 0.5 ulp of a 60-digit evaluation of Eq. 7)
 * ```
 */
export function compensateState(out: WaterState, held: Held, ctx: SolverContext): StatusCode {
  const region = out.region;
  if (region === 1) region1Compensated(out.p, out.T, out);
  else if (region === 2) region2Compensated(out.p, out.T, out);
  else if (region === 5) region5Compensated(out.p, out.T, out);
  else if (region === 3) region3Again(out, held === HELD.pressure);
  else if (region === 4) return compensateMixture(out, held, ctx);
  else return Status.invalidInput;
  return Status.ok;
}

/**
 * Region 4: the saturated phases at the mixture's (p, T), compensated, mixed with its quality. The
 * saturation functions evaluate regions 1 and 2 at (p, T) where `saturationAtT` has T ≤ 623.15 K and
 * `saturationAtP` has p ≤ p_s(623.15 K) or T ≤ 623.15 K (so do the two-phase paths of the (p, h),
 * (p, s) and (h, s) solvers); region 3 above, at densities that only the same call gives again.
 */
function compensateMixture(out: WaterState, held: Held, ctx: SolverContext): StatusCode {
  const liquid = ctx.scratch;
  const vapor = ctx.scratchB;
  const p = out.p;
  const T = out.T;
  const x = out.x;
  const byT = held === HELD.temperature;
  if (byT ? T <= T_13 : p <= P_SAT_13 || T <= T_13) {
    region1Compensated(p, T, liquid);
    region2Compensated(p, T, vapor);
    return mixPhases(x, liquid, vapor, out);
  }
  const status = byT ? saturationAtT(T, liquid, vapor, ctx) : saturationAtP(p, liquid, vapor, ctx);
  if (status !== Status.ok) return status;
  if (!(liquid.T === T && liquid.p === p && vapor.T === T && vapor.p === p)) return Status.noConvergence;
  region3Again(liquid, true);
  region3Again(vapor, true);
  return mixPhases(x, liquid, vapor, out);
}
