/**
 * IF97 states from (p, h): the isobar solver matching the enthalpy (see `isobar.ts`).
 *
 * @module
 */
import type { StatusCode } from '../../core/status.js';
import { defaultContext, type SolverContext } from './context.js';
import { BY_H, stateOnIsobar } from './isobar.js';
import type { WaterState } from './water-state.js';

/**
 * The state at p (Pa) and specific enthalpy h (J/kg).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPH(1e6, 3000e3, out);   //=> 0 (Status.ok)
 * out.T;                           //=> 549.1 (K)
 * stateFromPH(1e6, 9e6, out);      //=> 1 (Status.outOfRange)
 * ```
 */
export function stateFromPH(p: number, h: number, out: WaterState, ctx: SolverContext = defaultContext()): StatusCode {
  return stateOnIsobar(p, h, BY_H, out, ctx);
}
