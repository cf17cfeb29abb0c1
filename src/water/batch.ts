/**
 * Batch evaluation of water states over typed arrays: the IF97 SI core on the generic batch runner,
 * no allocation per element, one status code per element. A bad element is marked and the rest are
 * still computed.
 *
 * @module
 */
import { runBatch, type BatchModel, type BatchOut, type BatchResult } from '../core/batch.js';
import { Status } from '../core/status.js';
import { SolverContext } from './if97/context.js';
import { stateFromPH } from './if97/ph.js';
import { stateFromPS } from './if97/ps.js';
import { stateFromPT } from './if97/pt.js';
import { PHASE, WaterState } from './if97/water-state.js';

/** Properties a water batch can return, in SI (K, Pa, m³/kg, kg/m³, J/kg, J/(kg·K), m/s; x and k plain). */
export type WaterBatchProperty = 'T' | 'p' | 'v' | 'rho' | 'u' | 'h' | 's' | 'cp' | 'cv' | 'w' | 'k' | 'x';

/** Batch inputs: pressures with temperatures, enthalpies or entropies, all SI (Pa, K, J/kg, J/(kg·K)). */
export type WaterBatchInputs =
  | { readonly p: Float64Array; readonly T: Float64Array }
  | { readonly p: Float64Array; readonly h: Float64Array }
  | { readonly p: Float64Array; readonly s: Float64Array };

/** Batch outputs: one Float64Array per requested property, and `status` per element. */
export type WaterBatchResult<P extends WaterBatchProperty> = BatchResult<P>;

/**
 * Status codes of {@link waterBatch}, per element (the library's one {@link Status}):
 * - 0 `ok`;
 * - 1 `outOfRange`: no IAPWS-IF97 state for these inputs (outputs NaN);
 * - 2 `noConvergence`: a flash did not converge (outputs NaN);
 * - 3 `invalidInput`: NaN or infinite input, or one whose state is not a finite number (outputs NaN);
 * - 4 `undefinedProperty`: computed, two-phase; cp, cv, w and k are NaN (not defined there).
 * In single-phase states the quality `x` is NaN (it has no meaning there); the status stays 0.
 */
export const WATER_BATCH_STATUS = Status;

const TWO_PHASE_UNDEFINED: ReadonlySet<string> = new Set(['cp', 'cv', 'w', 'k']);

function model(): BatchModel<WaterState, WaterBatchProperty> {
  const ctx = new SolverContext();
  return {
    name: 'waterBatch',
    inputs: [
      { keys: ['p', 'T'], solve: (p, T, out) => stateFromPT(p, T, out, ctx) },
      { keys: ['p', 'h'], solve: (p, h, out) => stateFromPH(p, h, out, ctx) },
      { keys: ['p', 's'], solve: (p, s, out) => stateFromPS(p, s, out, ctx) },
    ],
    properties: {
      T: (st) => st.T,
      p: (st) => st.p,
      v: (st) => st.v,
      rho: (st) => st.rho,
      u: (st) => st.u,
      h: (st) => st.h,
      s: (st) => st.s,
      cp: (st) => st.cp,
      cv: (st) => st.cv,
      w: (st) => st.w,
      k: (st) => st.cp / st.cv,
      x: (st) => st.x,
    },
    // the quality is NaN in single-phase states: it has no meaning there
    mayBeNaN: { x: true },
    undefinedAt: (st, prop) => st.phase === PHASE.twoPhase && TWO_PHASE_UNDEFINED.has(prop),
    createOutput: () => new WaterState(),
  };
}

/**
 * Water properties for many states at once, by IAPWS-IF97. Inputs and outputs are SI typed arrays;
 * the per-element results equal those of the SI core (`stateFromPT`, `stateFromPH`, `stateFromPS`)
 * and of `water.state` bit for bit.
 *
 * @param inputs exactly one of `{ p, T }`, `{ p, h }` or `{ p, s }`: Float64Arrays of equal length
 * @param props the properties wanted, for example `['h', 's', 'rho']`
 * @param out optional arrays to fill in place (reuse memory between calls), each exactly as long as
 *   the inputs; missing ones are allocated
 * @returns one Float64Array per property, and `status` (see {@link WATER_BATCH_STATUS})
 * @throws {@link InvalidInputError} only for a malformed call (unequal lengths, an unknown or extra
 *   input, an unknown property, an `out` array of the wrong length); never for a bad element
 * @example
 * ```ts
 * const p = Float64Array.of(1e6, 1e6, NaN, -5);
 * const T = Float64Array.of(300, 500, 400, 400);
 * const r = waterBatch({ p, T }, ['h', 'rho']);
 * r.h[0];        //=> 112.56e3 (J/kg)
 * r.status;      //=> Uint8Array [0, 0, 3, 1]
 * ```
 */
export function waterBatch<P extends WaterBatchProperty>(inputs: WaterBatchInputs, props: readonly P[], out?: BatchOut<P>): WaterBatchResult<P> {
  return runBatch(model(), inputs, props, out);
}
