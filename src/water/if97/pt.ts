/**
 * IF97 states from (p, T): region selection (R7-97(2012) Section 4) and the region's basic equation;
 * region 3 through its density at (p, T).
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { finishSinglePhase, regionOfPT } from './classify.js';
import { P_MAX, P_REGION1_WITHOUT_SATURATION, T_13, T_MIN } from './constants.js';
import { defaultContext, type SolverContext } from './context.js';
import { region1 } from './region1.js';
import { region2 } from './region2.js';
import { region3 } from './region3.js';
import { region3DensityAt } from './region3-density.js';
import { region5 } from './region5.js';
import { PHASE, type WaterState } from './water-state.js';

/**
 * All properties at (p [Pa], T [K]). Status `outOfRange` outside IF97. On the saturation line the
 * liquid is returned (use the saturation functions for both phases).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPT(10e6, 773.15, out);   //=> 0
 * out.h;        //=> 3375058.44 (J/kg)
 * out.region;   //=> 2
 * stateFromPT(10e6, 3000, out);     //=> 1 (Status.outOfRange)
 * ```
 */
export function stateFromPT(p: number, T: number, out: WaterState, ctx: SolverContext = defaultContext()): StatusCode {
  if (certainlyRegion1(p, T)) return region1State(p, T, out);
  if (!Number.isFinite(p) || !Number.isFinite(T)) return Status.invalidInput;
  const region = regionOfPT(p, T);
  if (region === 1) return region1State(p, T, out);
  if (region === 0) return Status.outOfRange;
  if (region === 3) return region3FromPT(p, T, out, ctx);
  if (region === 2) region2(p, T, out);
  else region5(p, T, out);
  return finishSinglePhase(out, region);
}

export { P_REGION1_WITHOUT_SATURATION };

/**
 * True when (p, T) is in region 1 by bounds alone (p ≥ 16.6 MPa, T ≤ 623.15 K): the same answer as
 * `regionOfPT` there, without the saturation pressure. NaN fails every comparison.
 */
export function certainlyRegion1(p: number, T: number): boolean {
  return p >= P_REGION1_WITHOUT_SATURATION && p <= P_MAX && T >= T_MIN && T <= T_13;
}

/** The region 1 state at (p, T), marked as {@link finishSinglePhase} would (region 1 is liquid: T ≤ 623.15 K < T_c). */
export function region1State(p: number, T: number, out: WaterState): StatusCode {
  region1(p, T, out);
  out.region = 1;
  out.x = NaN;
  out.phase = PHASE.liquid;
  return Status.ok;
}

/** Region 3 at (p, T): the density, then the basic equation (kept out of {@link stateFromPT}'s hot path). */
function region3FromPT(p: number, T: number, out: WaterState, ctx: SolverContext): StatusCode {
  if (region3DensityAt(p, T, 0, ctx) !== Status.ok) return Status.noConvergence;
  region3(ctx.rho, T, out);
  out.p = p;
  return finishSinglePhase(out, 3);
}

/** The output of {@link region3Density}. */
export class DensityResult {
  /** Density, kg/m³. */
  rho = 0;
}

/**
 * Density (kg/m³) in region 3 at (p [Pa], T [K]) into `out.rho`; see {@link region3DensityAt}.
 * @example
 * ```ts
 * const r = new DensityResult();
 * region3Density(25.5837018e6, 650, 0, r);   //=> 0
 * r.rho;                                      //=> 500.0000 (kg/m³)
 * ```
 */
export function region3Density(p: number, T: number, branch: 0 | 1 | 2, out: DensityResult, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(p) || !Number.isFinite(T)) return Status.invalidInput;
  const status = region3DensityAt(p, T, branch, ctx);
  if (status === Status.ok) out.rho = ctx.rho;
  return status;
}
