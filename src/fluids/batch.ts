/**
 * Batch evaluation of real-fluid states over typed arrays: the Helmholtz-energy SI core on the
 * generic batch runner, one reused output object, one status code per element. A bad element is
 * marked and the rest are still computed.
 *
 * @module
 */
import { runBatch, type BatchModel, type BatchOut, type BatchResult } from '../core/batch.js';
import { InvalidInputError } from '../errors.js';
import { stateFromPH, stateFromPT, stateFromTRho } from './flash.js';
import { fluid, modelOf, type Fluid } from './fluid.js';
import { FLUID_PHASE, FluidContext, FluidState } from './model.js';

/** Properties a fluid batch can return, in SI (K, Pa, kg/m³, m³/kg, J/kg, J/(kg·K), m/s, K/Pa; x and k plain). */
export type FluidBatchProperty = 'T' | 'p' | 'rho' | 'v' | 'u' | 'h' | 's' | 'g' | 'cp' | 'cv' | 'w' | 'k' | 'jouleThomson' | 'x';

/** Batch inputs, SI Float64Arrays of equal length: `{ p, T }`, `{ p, h }` or `{ T, rho }`. */
export type FluidBatchInputs =
  | { readonly p: Float64Array; readonly T: Float64Array }
  | { readonly p: Float64Array; readonly h: Float64Array }
  | { readonly T: Float64Array; readonly rho: Float64Array };

const TWO_PHASE_UNDEFINED: ReadonlySet<string> = new Set(['cp', 'cv', 'w', 'k', 'jouleThomson']);

function batchModel(f: Fluid): BatchModel<FluidState, FluidBatchProperty> {
  const ctx = new FluidContext(modelOf(f));
  return {
    name: 'fluidBatch',
    inputs: [
      { keys: ['p', 'T'], solve: (p, T, out) => stateFromPT(ctx, p, T, out) },
      { keys: ['p', 'h'], solve: (p, h, out) => stateFromPH(ctx, p, h, out) },
      { keys: ['T', 'rho'], solve: (T, rho, out) => stateFromTRho(ctx, T, rho, out) },
    ],
    properties: {
      T: (st) => st.T,
      p: (st) => st.p,
      rho: (st) => st.rho,
      v: (st) => st.v,
      u: (st) => st.u,
      h: (st) => st.h,
      s: (st) => st.s,
      g: (st) => st.g,
      cp: (st) => st.cp,
      cv: (st) => st.cv,
      w: (st) => st.w,
      k: (st) => st.cp / st.cv,
      jouleThomson: (st) => st.jouleThomson,
      x: (st) => st.x,
    },
    // the quality is NaN in single-phase states: it has no meaning there
    mayBeNaN: { x: true },
    undefinedAt: (st, prop) => st.phase === FLUID_PHASE.twoPhase && TWO_PHASE_UNDEFINED.has(prop),
    createOutput: () => new FluidState(),
  };
}

/**
 * Real-fluid properties for many states at once. Inputs and outputs are SI typed arrays; each
 * element equals the SI core's answer (`stateFromPT`, `stateFromPH`, `stateFromTRho`) bit for bit.
 * Status per element: 0 ok; 1 outOfRange; 2 noConvergence; 3 invalidInput (outputs NaN);
 * 4 undefinedProperty, only when a property undefined in the two-phase region (cp, cv, w, k,
 * jouleThomson) was requested for a two-phase element (that output NaN, the others valid). The
 * quality `x` is NaN in single-phase states with the status unchanged.
 *
 * @param f a fluid (`fluid('water')`) or its name
 * @param inputs exactly one of `{ p, T }`, `{ p, h }`, `{ T, rho }`
 * @param props the properties wanted, for example `['h', 's', 'rho']`
 * @param out optional arrays to fill in place, each exactly as long as the inputs
 * @throws {@link InvalidInputError} for a malformed call (never per element); {@link UnknownNameError} for an unknown name
 * @example
 * ```ts
 * const r = fluidBatch('water', { p: Float64Array.of(1e5, 1e5), h: Float64Array.of(4e5, 1.5e6) }, ['T', 'x', 'cp']);
 * r.T;        //=> Float64Array [368.601..., 372.755...]
 * r.x;        //=> Float64Array [NaN, 0.47952...]
 * r.status;   //=> Uint8Array [0, 4] (cp is not defined in the two-phase state)
 * ```
 */
export function fluidBatch<P extends FluidBatchProperty>(f: Fluid | string, inputs: FluidBatchInputs, props: readonly P[], out?: BatchOut<P>): BatchResult<P> {
  const resolved = typeof f === 'string' ? fluid(f) : f;
  if (typeof resolved !== 'object' || resolved === null || typeof (resolved as Fluid).name !== 'string') {
    throw new InvalidInputError('input.invalid', 'fluid', `fluidBatch needs a fluid (fluid('water')) or its name; got ${String(f)}`);
  }
  return runBatch(batchModel(resolved), inputs, props, out);
}
