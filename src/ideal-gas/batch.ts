/**
 * Batch evaluation of an ideal gas over typed arrays: the model's SI core on the generic batch
 * runner, one status code per element, results equal to the per-call functions bit for bit.
 *
 * @module
 */
import { MOLAR_GAS_CONSTANT } from '../chem/constants.js';
import { runBatch, type BatchModel, type BatchOut, type BatchResult } from '../core/batch.js';
import { Status, type StatusCode } from '../core/status.js';
import { describeValue } from '../core/read.js';
import { InvalidInputError } from '../errors.js';
import { cpOf, cvOf, hOf, hSensibleOf, kOf, sOf, sStandardOf, uOf } from './formulas.js';
import type { Basis, IdealGas } from './gas.js';

/** Properties an ideal-gas batch can return (SI, on the gas's basis; k plain). `s` needs pressures. */
export type IdealGasBatchProperty = 'cp' | 'cv' | 'k' | 'h' | 'hSensible' | 'u' | 's' | 'sStandard';

/** One element's temperature and pressure (p is 0 when the batch has no pressures). */
class GasPoint {
  T = 0;
  p = 0;
}

/**
 * Status codes of {@link idealGasBatch}, per element (the library's one status): 0 ok; 1 out of
 * range (T outside the data, or p ≤ 0; outputs NaN); 3 invalid input (NaN or infinite; outputs NaN).
 */
export const IDEAL_GAS_BATCH_STATUS = Status;

function model<B extends Basis>(gas: IdealGas<B>): BatchModel<GasPoint, IdealGasBatchProperty> {
  const core = gas.core;
  const scale = gas.basis === 'molar' ? MOLAR_GAS_CONSTANT : core.R;
  const { min, max } = gas.bounds;
  const exclusive = gas.bounds.minExclusive === true;
  const check = (T: number, p: number, needP: boolean, out: GasPoint): StatusCode => {
    if (!Number.isFinite(T) || !Number.isFinite(p)) return Status.invalidInput;
    const inRange = (exclusive ? T > min : T >= min) && T <= max;
    if (!inRange || (needP && !(p > 0))) return Status.outOfRange;
    out.T = T;
    out.p = p;
    return Status.ok;
  };
  return {
    name: 'idealGasBatch',
    inputs: [
      { keys: ['T'], solve: (T, _p, out) => check(T, 0, false, out) },
      { keys: ['T', 'p'], solve: (T, p, out) => check(T, p, true, out) },
    ],
    properties: {
      cp: (pt) => cpOf(core, scale, pt.T),
      cv: (pt) => cvOf(core, scale, pt.T),
      k: (pt) => kOf(core, pt.T),
      h: (pt) => hOf(core, scale, pt.T),
      hSensible: (pt) => hSensibleOf(core, scale, pt.T),
      u: (pt) => uOf(core, scale, pt.T),
      s: (pt) => sOf(core, scale, pt.T, pt.p),
      sStandard: (pt) => sStandardOf(core, scale, pt.T),
    },
    requires: { s: ['p'] },
    createOutput: () => new GasPoint(),
  };
}

/**
 * Ideal-gas properties for many temperatures (and pressures, for `s`) at once.
 *
 * @param gas a gas from `idealGas` or `mixture` (its basis and extrapolation setting apply)
 * @param inputs `{ T }` in K, or `{ T, p }` with p in Pa (needed for `s`)
 * @param props the properties wanted
 * @param out optional arrays to fill in place, each exactly as long as the inputs
 * @throws {@link InvalidInputError} only for a malformed call; never for a bad element
 * @example
 * ```ts
 * const r = idealGasBatch(idealGas('air'), { T: Float64Array.of(300, 1000, 9000) }, ['cp', 'h']);
 * r.cp[0];      //=> 1004.9 (J/(kg·K))
 * r.status;     //=> Uint8Array [0, 0, 1]  (9000 K is outside the data)
 * ```
 */
export function idealGasBatch<P extends IdealGasBatchProperty, B extends Basis>(
  gas: IdealGas<B>,
  inputs: { readonly T: Float64Array; readonly p?: Float64Array },
  props: readonly P[],
  out?: BatchOut<P>,
): BatchResult<P> {
  const g = gas as Partial<IdealGas<B>> | null;
  if (typeof g !== 'object' || g === null || typeof g.core !== 'object' || typeof g.bounds !== 'object') {
    throw new InvalidInputError('input.invalid', 'gas', `idealGasBatch takes a gas from idealGas() or mixture() as its first argument; got ${describeValue(gas)}`);
  }
  return runBatch(model(gas), inputs, props, out) as BatchResult<P>;
}
