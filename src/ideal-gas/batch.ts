/**
 * Batch evaluation of an ideal gas over typed arrays: the model's SI core on the generic batch
 * runner, one status code per element, results equal to the per-call functions bit for bit.
 *
 * @module
 */
import { MOLAR_GAS_CONSTANT } from '../chem/constants.js';
import { runBatch, type BatchLoop, type BatchModel, type BatchOut, type BatchResult } from '../core/batch.js';
import { Status, type StatusCode } from '../core/status.js';
import { describeValue } from '../core/read.js';
import { InvalidInputError } from '../errors.js';
import { cpOf, cvOf, hOf, hSensibleOf, kOf, sOf, sStandardOf, uOf } from './formulas.js';
import type { Basis, IdealGas } from './gas.js';
import type { IdealGasModel } from './model.js';

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

/**
 * The batch model of a gas: `solve` checks an element's T (and p) and the readers are the per-call
 * formulas. With `fused` (the default), each input set also has {@link fusedLoop}; without it the
 * runner's generic loop does the work (the reference that tests/batch/batch.test.ts compares the fused
 * loop with).
 * @internal
 */
export function idealGasBatchModel<B extends Basis>(gas: IdealGas<B>, fused = true): BatchModel<GasPoint, IdealGasBatchProperty> {
  const core = gas.core;
  const scale = gas.basis === 'molar' ? MOLAR_GAS_CONSTANT : core.R;
  const { min, max } = gas.bounds;
  const exclusive = gas.bounds.minExclusive === true;
  const codeOf = (T: number, p: number, needP: boolean): StatusCode => {
    if (!Number.isFinite(T) || !Number.isFinite(p)) return Status.invalidInput;
    const inRange = (exclusive ? T > min : T >= min) && T <= max;
    if (!inRange || (needP && !(p > 0))) return Status.outOfRange;
    return Status.ok;
  };
  const check = (T: number, p: number, needP: boolean, out: GasPoint): StatusCode => {
    const code = codeOf(T, p, needP);
    if (code !== Status.ok) return code;
    out.T = T;
    out.p = p;
    return Status.ok;
  };
  const loop = fused ? fusedLoop(core, scale, codeOf) : undefined;
  return {
    name: 'idealGasBatch',
    inputs: [
      { keys: ['T'], solve: (T, _p, out) => check(T, 0, false, out), ...(loop && { loop }) },
      { keys: ['T', 'p'], solve: (T, p, out) => check(T, p, true, out), ...(loop && { loop }) },
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

/** Elements per block of {@link fusedLoop}. */
const BLOCK = 256;

/** A column filler: one requested property over the elements [start, end) whose status is ok (NaN for the others); false when an ok element got a value that is not finite. */
type Fill = (core: IdealGasModel, scale: number, Ts: Float64Array, ps: Float64Array | undefined, status: Uint8Array, col: Float64Array, start: number, end: number) => boolean;

/**
 * One small function per property, each a tight loop over a block with a direct call of that
 * property's formula, which the engine compiles with the formula inlined. Called once per block,
 * each is compiled early in a batch as a whole function; one function holding all eight loops over
 * the whole batch was compiled only on the stack, loop by loop, and was slow for two batches. They are
 * written out, not made by one factory: closures of one factory share their call site's feedback, the
 * formula call there sees every property and is not inlined (about 31 instead of 23–26 ns for air's
 * cp and h).
 */
const FILL: { readonly [K in IdealGasBatchProperty]: Fill } = {
  cp: (core, scale, Ts, _ps, status, col, start, end) => {
    let finite = true;
    for (let i = start; i < end; i++) {
      const v = status[i] === Status.ok ? cpOf(core, scale, Ts[i]!) : NaN;
      col[i] = v;
      if (v - v !== 0 && status[i] === Status.ok) finite = false;
    }
    return finite;
  },
  cv: (core, scale, Ts, _ps, status, col, start, end) => {
    let finite = true;
    for (let i = start; i < end; i++) {
      const v = status[i] === Status.ok ? cvOf(core, scale, Ts[i]!) : NaN;
      col[i] = v;
      if (v - v !== 0 && status[i] === Status.ok) finite = false;
    }
    return finite;
  },
  k: (core, _scale, Ts, _ps, status, col, start, end) => {
    let finite = true;
    for (let i = start; i < end; i++) {
      const v = status[i] === Status.ok ? kOf(core, Ts[i]!) : NaN;
      col[i] = v;
      if (v - v !== 0 && status[i] === Status.ok) finite = false;
    }
    return finite;
  },
  h: (core, scale, Ts, _ps, status, col, start, end) => {
    let finite = true;
    for (let i = start; i < end; i++) {
      const v = status[i] === Status.ok ? hOf(core, scale, Ts[i]!) : NaN;
      col[i] = v;
      if (v - v !== 0 && status[i] === Status.ok) finite = false;
    }
    return finite;
  },
  hSensible: (core, scale, Ts, _ps, status, col, start, end) => {
    let finite = true;
    for (let i = start; i < end; i++) {
      const v = status[i] === Status.ok ? hSensibleOf(core, scale, Ts[i]!) : NaN;
      col[i] = v;
      if (v - v !== 0 && status[i] === Status.ok) finite = false;
    }
    return finite;
  },
  u: (core, scale, Ts, _ps, status, col, start, end) => {
    let finite = true;
    for (let i = start; i < end; i++) {
      const v = status[i] === Status.ok ? uOf(core, scale, Ts[i]!) : NaN;
      col[i] = v;
      if (v - v !== 0 && status[i] === Status.ok) finite = false;
    }
    return finite;
  },
  // the runner refuses s without pressures before any loop runs
  s: (core, scale, Ts, ps, status, col, start, end) => {
    let finite = true;
    for (let i = start; i < end; i++) {
      const v = status[i] === Status.ok ? sOf(core, scale, Ts[i]!, ps![i]!) : NaN;
      col[i] = v;
      if (v - v !== 0 && status[i] === Status.ok) finite = false;
    }
    return finite;
  },
  sStandard: (core, scale, Ts, _ps, status, col, start, end) => {
    let finite = true;
    for (let i = start; i < end; i++) {
      const v = status[i] === Status.ok ? sStandardOf(core, scale, Ts[i]!) : NaN;
      col[i] = v;
      if (v - v !== 0 && status[i] === Status.ok) finite = false;
    }
    return finite;
  },
};

/** The statuses of the elements [start, end): `codeOf` of each T (and p, when given). */
function statuses(codeOf: (T: number, p: number, needP: boolean) => StatusCode, Ts: Float64Array, ps: Float64Array | undefined, status: Uint8Array, start: number, end: number): void {
  if (ps === undefined) for (let i = start; i < end; i++) status[i] = codeOf(Ts[i]!, 0, false);
  else for (let i = start; i < end; i++) status[i] = codeOf(Ts[i]!, ps[i]!, true);
}

/**
 * The fused loop of a gas's batch, property by property: the statuses first, then one tight loop per
 * requested property ({@link FILL}) over the elements that passed, where the runner calls a reader per
 * element and property through one call site; then, when a loop met one, the runner's rule for a
 * non-finite value (the element's status becomes invalidInput and its every column NaN). Bit for bit the runner's results:
 * the same formulas on the same doubles (tests/batch/batch.test.ts).
 */
function fusedLoop(core: IdealGasModel, scale: number, codeOf: (T: number, p: number, needP: boolean) => StatusCode): BatchLoop<IdealGasBatchProperty> {
  return (Ts, ps, props, columns, status) => {
    const n = Ts.length;
    let finite = true;
    const fills = props.map((p) => FILL[p]);
    // block by block: each filler is called often enough to be compiled early in a batch, and a
    // block's columns stay in the cache
    for (let start = 0; start < n; start += BLOCK) {
      const end = Math.min(n, start + BLOCK);
      statuses(codeOf, Ts, ps, status, start, end);
      for (let c = 0; c < fills.length; c++) if (!fills[c]!(core, scale, Ts, ps, status, columns[c]!, start, end)) finite = false;
    }
    if (finite) return true;
    // a formula that answered a non-finite value (a denormal input overflowing) is not a result
    const m = columns.length;
    for (let i = 0; i < n; i++) {
      if (status[i] !== Status.ok) continue;
      let allFinite = true;
      for (let c = 0; c < m; c++) if (!Number.isFinite(columns[c]![i]!)) allFinite = false;
      if (!allFinite) {
        status[i] = Status.invalidInput;
        for (let c = 0; c < m; c++) columns[c]![i] = NaN;
      }
    }
    return true;
  };
}

/**
 * Each gas's batch model, made on its first batch and kept while the gas lives: the same functions
 * on every call, so the engine's compiled loops (which inline them) stay valid from one batch to the
 * next instead of being compiled again for new closures.
 */
const MODELS = new WeakMap<object, { core: unknown; bounds: unknown; basis: unknown; model: BatchModel<GasPoint, IdealGasBatchProperty> }>();

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
  let kept = MODELS.get(gas);
  // made again if the object's parts were replaced (a gas is read-only, a look-alike object may not be)
  if (kept === undefined || kept.core !== gas.core || kept.bounds !== gas.bounds || kept.basis !== gas.basis) {
    kept = { core: gas.core, bounds: gas.bounds, basis: gas.basis, model: idealGasBatchModel(gas) };
    MODELS.set(gas, kept);
  }
  return runBatch(kept.model, inputs, props, out) as BatchResult<P>;
}
