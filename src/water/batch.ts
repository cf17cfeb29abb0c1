/**
 * Batch evaluation of water states over typed arrays: the SI core in a loop, no allocation per
 * element, one status code per element. A bad element is marked and the rest are still computed.
 *
 * @module
 */
import { InvalidInputError } from '../errors.js';
import { PHASE, STATUS, stateFromPH, stateFromPS, stateFromPT, WaterState } from './if97/flash.js';

/** Properties a water batch can return, in SI (K, m³/kg, kg/m³, J/kg, J/(kg·K), m/s; x and k plain). */
export type WaterBatchProperty = 'T' | 'p' | 'v' | 'rho' | 'u' | 'h' | 's' | 'cp' | 'cv' | 'w' | 'k' | 'x';

/** Batch inputs: pressures with temperatures, enthalpies or entropies, all SI (Pa, K, J/kg, J/(kg·K)). */
export type WaterBatchInputs =
  | { readonly p: Float64Array; readonly T: Float64Array }
  | { readonly p: Float64Array; readonly h: Float64Array }
  | { readonly p: Float64Array; readonly s: Float64Array };

/** Batch outputs: one Float64Array per requested property, and `status` per element. */
export type WaterBatchResult<P extends WaterBatchProperty> = { [K in P]: Float64Array } & { readonly status: Uint8Array };

/**
 * Status codes of {@link waterBatch}, per element:
 * - 0 `ok`;
 * - 1 `outOfRange`: no IAPWS-IF97 state for these inputs (outputs NaN);
 * - 2 `noConvergence`: a flash did not converge (outputs NaN);
 * - 3 `invalidInput`: NaN or infinite input (outputs NaN);
 * - 4 `notDefinedInTwoPhase`: computed, two-phase; cp, cv, w and k are NaN (not defined there).
 * In single-phase states the quality `x` is NaN (it has no meaning there); the status stays 0.
 */
export const WATER_BATCH_STATUS = STATUS;

const TWO_PHASE_UNDEFINED = new Set<WaterBatchProperty>(['cp', 'cv', 'w', 'k']);

function read(st: WaterState, prop: WaterBatchProperty): number {
  switch (prop) {
    case 'k':
      return st.cp / st.cv;
    case 'x':
      return st.x;
    default:
      return st[prop];
  }
}

/**
 * Water properties for many states at once, by IAPWS-IF97. Inputs and outputs are SI typed arrays;
 * the per-element results equal those of the SI core (`stateFromPT`, `stateFromPH`, `stateFromPS`)
 * and of `water.state` bit for bit.
 *
 * @param inputs `{ p, T }`, `{ p, h }` or `{ p, s }`: Float64Arrays of equal length
 * @param props the properties wanted, for example `['h', 's', 'rho']`
 * @param out optional arrays to fill in place (reuse memory between calls); missing ones are allocated
 * @returns one Float64Array per property, and `status` (see {@link WATER_BATCH_STATUS})
 * @throws {@link InvalidInputError} only for a malformed call (unequal lengths, an unknown property);
 *   never for a bad element
 * @example
 * ```ts
 * const p = Float64Array.of(1e6, 1e6, NaN, -5);
 * const T = Float64Array.of(300, 500, 400, 400);
 * const r = waterBatch({ p, T }, ['h', 'rho']);
 * r.h[0];        //=> 112.56e3 (J/kg)
 * r.status;      //=> Uint8Array [0, 0, 3, 1]
 * ```
 */
export function waterBatch<P extends WaterBatchProperty>(inputs: WaterBatchInputs, props: readonly P[], out?: Partial<Record<P, Float64Array>> & { status?: Uint8Array }): WaterBatchResult<P> {
  const p = inputs.p;
  const other = 'T' in inputs ? inputs.T : 'h' in inputs ? inputs.h : 's' in inputs ? inputs.s : undefined;
  if (!(p instanceof Float64Array) || !(other instanceof Float64Array)) {
    throw new InvalidInputError('input.invalid', 'inputs', 'waterBatch takes { p, T }, { p, h } or { p, s } as Float64Arrays in SI units');
  }
  const n = p.length;
  if (other.length !== n) throw new InvalidInputError('input.invalid', 'inputs', `input arrays differ in length (${n} and ${other.length})`);
  const valid: readonly WaterBatchProperty[] = ['T', 'p', 'v', 'rho', 'u', 'h', 's', 'cp', 'cv', 'w', 'k', 'x'];
  for (const prop of props) if (!valid.includes(prop)) throw new InvalidInputError('input.invalid', 'props', `unknown property "${String(prop)}"; choose from ${valid.join(', ')}`);
  const result = {} as Record<string, Float64Array | Uint8Array>;
  const columns: Float64Array[] = [];
  for (const prop of props) {
    const given = out?.[prop];
    if (given !== undefined && given.length < n) throw new InvalidInputError('input.invalid', `out.${prop}`, `out.${prop} has ${given.length} elements; ${n} are needed`);
    const arr = given ?? new Float64Array(n);
    result[prop] = arr;
    columns.push(arr);
  }
  const status = out?.status ?? new Uint8Array(n);
  if (status.length < n) throw new InvalidInputError('input.invalid', 'out.status', `out.status has ${status.length} elements; ${n} are needed`);
  result.status = status;
  const flash = 'T' in inputs ? stateFromPT : 'h' in inputs ? stateFromPH : stateFromPS;
  const needsSinglePhase = props.some((q) => TWO_PHASE_UNDEFINED.has(q));
  const st = new WaterState();
  const m = props.length;
  for (let i = 0; i < n; i++) {
    const code = flash(p[i]!, other[i]!, st);
    if (code !== STATUS.ok) {
      status[i] = code;
      for (let c = 0; c < m; c++) columns[c]![i] = NaN;
      continue;
    }
    status[i] = needsSinglePhase && st.phase === PHASE.twoPhase ? STATUS.notDefinedInTwoPhase : STATUS.ok;
    for (let c = 0; c < m; c++) columns[c]![i] = read(st, props[c]!);
  }
  return result as unknown as WaterBatchResult<P>;
}
