/**
 * IF97 states from (p, T): region selection (R7-97(2012) Section 4) and the region's basic equation;
 * region 3 through its density at (p, T).
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { finishSinglePhase, regionOfPT } from './classify.js';
import { defaultContext, type SolverContext } from './context.js';
import { region3 } from './region3.js';
import { region3DensityAt } from './region3-density.js';
import { evaluateForward } from './regions.js';
import type { WaterState } from './water-state.js';

/**
 * All properties at (p [Pa], T [K]). Status `outOfRange` outside IF97. On the saturation line the
 * liquid is returned (use the saturation functions for both phases).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPT(10e6, 773.15, out);   //=> 0; out.h = 3375058 J/kg, out.region = 2
 * stateFromPT(10e6, 3000, out);     //=> 1 (Status.outOfRange)
 * ```
 */
export function stateFromPT(p: number, T: number, out: WaterState, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(p) || !Number.isFinite(T)) return Status.invalidInput;
  const region = regionOfPT(p, T);
  if (region === 0) return Status.outOfRange;
  if (region === 3) {
    if (region3DensityAt(p, T, 0, ctx) !== Status.ok) return Status.noConvergence;
    region3(ctx.rho, T, out);
    out.p = p;
  } else {
    evaluateForward(region, p, T, out);
  }
  return finishSinglePhase(out, region);
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
 * r.rho;                                      //=> 500 (kg/m³)
 * ```
 */
export function region3Density(p: number, T: number, branch: 0 | 1 | 2, out: DensityResult, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(p) || !Number.isFinite(T)) return Status.invalidInput;
  const status = region3DensityAt(p, T, branch, ctx);
  if (status === Status.ok) out.rho = ctx.rho;
  return status;
}
