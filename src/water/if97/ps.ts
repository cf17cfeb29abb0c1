/**
 * IF97 states from (p, s): the isobar solver matching the entropy (see `isobar.ts`).
 *
 * @module
 */
import type { StatusCode } from '../../core/status.js';
import { defaultContext, type SolverContext } from './context.js';
import { BY_S, stateOnIsobar } from './isobar.js';
import type { WaterState } from './water-state.js';

/**
 * The state at p (Pa) and specific entropy s (J/(kg·K)).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPS(10e6, 6.6e3, out);   //=> 0 (Status.ok)
 * out.T;                           //=> 773.35 (K)
 * ```
 */
export function stateFromPS(p: number, s: number, out: WaterState, ctx: SolverContext = defaultContext()): StatusCode {
  return stateOnIsobar(p, s, BY_S, out, ctx);
}
