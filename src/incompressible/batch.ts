/**
 * Batch evaluation of an incompressible substance over typed arrays: the SI core on the generic batch
 * runner, one status per element, results equal to `substance.state` bit for bit.
 *
 * @module
 */
import { STANDARD_ATMOSPHERE_PA } from '../chem/constants.js';
import { runBatch, type BatchModel, type BatchOut, type BatchResult } from '../core/batch.js';
import { Status, type StatusCode } from '../core/status.js';
import { describeValue } from '../core/read.js';
import { InvalidInputError } from '../errors.js';
import { densityAt, enthalpyChange, entropyChange, heatCapacityAt, internalEnergyChange } from './model.js';
import type { IncompressibleSubstance } from './substance.js';

/** Properties an incompressible batch can return (SI), u, h and s from the substance's reference state; `h` needs pressures. */
export type IncompressibleBatchProperty = 'c' | 'cp' | 'cv' | 'rho' | 'v' | 'u' | 'h' | 's';

/** Status codes of {@link incompressibleBatch}: the library's one status (0 ok, 1 out of range, 3 invalid input). */
export const INCOMPRESSIBLE_BATCH_STATUS = Status;

class Point {
  T = 0;
  p = 0;
}

/**
 * Properties of an incompressible substance at many temperatures (and pressures, for `h`) at once.
 *
 * @param substance from `incompressible(…)`
 * @param inputs `{ T }` in K, or `{ T, p }` with p in Pa (absolute; needed for `h`)
 * @throws {@link InvalidInputError} only for a malformed call; never for a bad element
 * @example
 * ```ts
 * const r = incompressibleBatch(incompressible('copper'), { T: Float64Array.of(300, 1400) }, ['c']);
 * r.c[0];       //=> 384.95 (J/(kg·K))
 * r.status;     //=> Uint8Array [0, 1]  (1400 K is above copper's data, which end at its melting point, 1358 K)
 * ```
 */
export function incompressibleBatch<P extends IncompressibleBatchProperty>(
  substance: IncompressibleSubstance,
  inputs: { readonly T: Float64Array; readonly p?: Float64Array },
  props: readonly P[],
  out?: BatchOut<P>,
): BatchResult<P> {
  if (typeof substance !== 'object' || substance === null || typeof (substance as Partial<IncompressibleSubstance>).core !== 'object') {
    throw new InvalidInputError('input.invalid', 'substance', `incompressibleBatch takes a substance from incompressible() as its first argument; got ${describeValue(substance)}`);
  }
  const m = substance.core;
  const Tref = substance.reference.T.si;
  const pRef = STANDARD_ATMOSPHERE_PA;
  const check = (T: number, p: number, needP: boolean, pt: Point): StatusCode => {
    if (!Number.isFinite(T) || !Number.isFinite(p)) return Status.invalidInput;
    if (!(T >= m.Tmin && T <= m.Tmax) || (needP && !(p > 0))) return Status.outOfRange;
    pt.T = T;
    pt.p = p;
    return Status.ok;
  };
  const model: BatchModel<Point, IncompressibleBatchProperty> = {
    name: 'incompressibleBatch',
    inputs: [
      { keys: ['T'], solve: (T, _p, pt) => check(T, 0, false, pt) },
      { keys: ['T', 'p'], solve: (T, p, pt) => check(T, p, true, pt) },
    ],
    properties: {
      c: (pt) => heatCapacityAt(m, pt.T),
      cp: (pt) => heatCapacityAt(m, pt.T),
      cv: (pt) => heatCapacityAt(m, pt.T),
      rho: (pt) => densityAt(m, pt.T),
      v: (pt) => 1 / densityAt(m, pt.T),
      u: (pt) => internalEnergyChange(m, Tref, pt.T),
      h: (pt) => enthalpyChange(m, Tref, pRef, pt.T, pt.p),
      s: (pt) => entropyChange(m, Tref, pt.T),
    },
    requires: { h: ['p'] },
    createOutput: () => new Point(),
  };
  return runBatch(model, inputs, props, out) as BatchResult<P>;
}
