/**
 * IF97 two-phase states from (T, x) and (p, x): the quality-weighted mixture of the saturated phases.
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { defaultContext, type SolverContext } from './context.js';
import { mixPhases, saturationAtP, saturationAtT } from './saturation.js';
import type { WaterState } from './water-state.js';

/**
 * The two-phase mixture of quality x (0 ≤ x ≤ 1) at T (K).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromTX(373.15, 0, out);   //=> 0 (Status.ok)
 * out.h;                         //=> 419.1e3 (J/kg)
 * ```
 */
export function stateFromTX(T: number, x: number, out: WaterState, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(T) || !Number.isFinite(x)) return Status.invalidInput;
  if (!(x >= 0 && x <= 1)) return Status.outOfRange;
  const status = saturationAtT(T, ctx.scratch, ctx.scratchB, ctx);
  return status === Status.ok ? mixPhases(x, ctx.scratch, ctx.scratchB, out) : status;
}

/**
 * The two-phase mixture of quality x (0 ≤ x ≤ 1) at p (Pa).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPX(1e6, 0.9, out);   //=> 0 (Status.ok)
 * out.region;                   //=> 4
 * out.cp;                       //=> NaN (not defined inside the dome)
 * ```
 */
export function stateFromPX(p: number, x: number, out: WaterState, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(p) || !Number.isFinite(x)) return Status.invalidInput;
  if (!(x >= 0 && x <= 1)) return Status.outOfRange;
  const status = saturationAtP(p, ctx.scratch, ctx.scratchB, ctx);
  return status === Status.ok ? mixPhases(x, ctx.scratch, ctx.scratchB, out) : status;
}
