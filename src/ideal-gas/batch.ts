/**
 * Batch evaluation of an ideal gas over typed arrays: the model's SI core in a loop, one status code
 * per element, results equal to the per-call functions bit for bit.
 *
 * @module
 */
import { MOLAR_GAS_CONSTANT } from '../chem/constants.js';
import { InvalidInputError } from '../errors.js';
import { cpOf, cvOf, hOf, hSensibleOf, kOf, sOf, sStandardOf, uOf } from './formulas.js';
import type { Basis, IdealGas } from './gas.js';

/** Properties an ideal-gas batch can return (SI, on the gas's basis; k plain). `s` needs pressures. */
export type IdealGasBatchProperty = 'cp' | 'cv' | 'k' | 'h' | 'hSensible' | 'u' | 's' | 'sStandard';

/**
 * Status codes of {@link idealGasBatch}, per element: 0 ok; 1 out of range (T outside the data, or
 * p ≤ 0; outputs NaN); 3 invalid input (NaN or infinite; outputs NaN).
 */
export const IDEAL_GAS_BATCH_STATUS = { ok: 0, outOfRange: 1, invalidInput: 3 } as const;

/**
 * Ideal-gas properties for many temperatures (and pressures, for `s`) at once.
 *
 * @param gas a gas from `idealGas` or `mixture` (its basis and extrapolation setting apply)
 * @param inputs `{ T }` in K, and `p` in Pa when `s` is requested
 * @param props the properties wanted
 * @param out optional arrays to fill in place
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
  out?: Partial<Record<P, Float64Array>> & { status?: Uint8Array },
): { [K in P]: Float64Array } & { readonly status: Uint8Array } {
  const T = inputs.T;
  if (!(T instanceof Float64Array)) throw new InvalidInputError('input.invalid', 'inputs.T', 'idealGasBatch takes { T } (and p for s) as Float64Arrays in K and Pa');
  const n = T.length;
  const needP = props.includes('s' as P);
  const p = inputs.p;
  if (needP && (!(p instanceof Float64Array) || p.length !== n)) throw new InvalidInputError('input.invalid', 'inputs.p', 's needs pressures: inputs.p as a Float64Array as long as inputs.T');
  const valid: readonly IdealGasBatchProperty[] = ['cp', 'cv', 'k', 'h', 'hSensible', 'u', 's', 'sStandard'];
  for (const prop of props) if (!valid.includes(prop)) throw new InvalidInputError('input.invalid', 'props', `unknown property "${String(prop)}"; choose from ${valid.join(', ')}`);
  const core = gas.core;
  const scale = gas.basis === 'molar' ? MOLAR_GAS_CONSTANT : core.R;
  const extrapolate = gas.extrapolate;
  const result = {} as Record<string, Float64Array | Uint8Array>;
  const columns = props.map((prop) => {
    const arr = out?.[prop] ?? new Float64Array(n);
    if (arr.length < n) throw new InvalidInputError('input.invalid', `out.${prop}`, `out.${prop} has ${arr.length} elements; ${n} are needed`);
    result[prop] = arr;
    return arr;
  });
  const status = out?.status ?? new Uint8Array(n);
  result.status = status;
  const m = props.length;
  for (let i = 0; i < n; i++) {
    const t = T[i]!;
    const pi = needP ? p![i]! : 1;
    let code: number = IDEAL_GAS_BATCH_STATUS.ok;
    if (!Number.isFinite(t) || !Number.isFinite(pi)) code = IDEAL_GAS_BATCH_STATUS.invalidInput;
    else if (!(pi > 0) || !(t > 0) || (!extrapolate && (t < core.Tmin || t > core.Tmax))) code = IDEAL_GAS_BATCH_STATUS.outOfRange;
    status[i] = code;
    for (let c = 0; c < m; c++) {
      let v = NaN;
      if (code === 0) {
        switch (props[c]!) {
          case 'cp':
            v = cpOf(core, scale, t);
            break;
          case 'cv':
            v = cvOf(core, scale, t);
            break;
          case 'k':
            v = kOf(core, t);
            break;
          case 'h':
            v = hOf(core, scale, t);
            break;
          case 'hSensible':
            v = hSensibleOf(core, scale, t);
            break;
          case 'u':
            v = uOf(core, scale, t);
            break;
          case 's':
            v = sOf(core, scale, t, pi);
            break;
          case 'sStandard':
            v = sStandardOf(core, scale, t);
            break;
        }
      }
      columns[c]![i] = v;
    }
  }
  return result as { [K in P]: Float64Array } & { readonly status: Uint8Array };
}

