/**
 * Batch evaluation of moist-air states over typed arrays: the SI core in a loop, no allocation per
 * element, one status per element. A bad element is marked and the rest are still computed.
 *
 * @module
 */
import { Status } from '../core/status.js';
import { InvalidInputError } from '../errors.js';
import { MODEL } from './core/saturation.js';
import { HumidAirState, humidAirState, PAIR } from './core/state.js';
import type { HumidAirModel } from './state.js';

/** Properties a humid-air batch can return, in SI (K, fractions, kg/kg, J/kg, m³/kg, kg/m³, Pa, J/(kg·K)). */
export type HumidAirBatchProperty = 'T' | 'Twb' | 'Tdp' | 'RH' | 'W' | 'h' | 'v' | 'rho' | 'pw' | 'pws' | 'Ws' | 'mu' | 'cp' | 'f';

const PROPERTIES: readonly HumidAirBatchProperty[] = ['T', 'Twb', 'Tdp', 'RH', 'W', 'h', 'v', 'rho', 'pw', 'pws', 'Ws', 'mu', 'cp', 'f'];
type InputKey = 'T' | 'Twb' | 'Tdp' | 'RH' | 'W' | 'h';
const INPUT_KEYS: readonly InputKey[] = ['T', 'RH', 'W', 'h', 'Tdp', 'Twb'];
const PAIRS: Record<string, number> = {
  'T,RH': PAIR.T_RH, 'T,W': PAIR.T_W, 'T,h': PAIR.T_h, 'T,Tdp': PAIR.T_Tdp, 'T,Twb': PAIR.T_Twb,
  'RH,W': PAIR.RH_W, 'RH,h': PAIR.RH_h, 'RH,Tdp': PAIR.RH_Tdp, 'RH,Twb': PAIR.RH_Twb,
  'W,h': PAIR.W_h, 'W,Tdp': PAIR.W_Tdp, 'W,Twb': PAIR.W_Twb, 'h,Tdp': PAIR.h_Tdp, 'h,Twb': PAIR.h_Twb, 'Tdp,Twb': PAIR.Tdp_Twb,
};

/** Batch inputs: two of T, Twb, Tdp, RH, W, h and the total pressure p, each a Float64Array in SI. */
export type HumidAirBatchInputs = { readonly p: Float64Array } & { readonly [K in InputKey]?: Float64Array };

/** Batch outputs: one Float64Array per requested property, and `status` per element. */
export type HumidAirBatchResult<P extends HumidAirBatchProperty> = { [K in P]: Float64Array } & { readonly status: Uint8Array };

/**
 * Status codes per element (those of `src/core/status.ts`): 0 ok; 1 outOfRange (outputs NaN);
 * 2 noConvergence (NaN); 3 invalidInput (NaN or a dependent pair; NaN); 4 undefinedProperty: computed,
 * but Ws and μ (above boiling), Tdp (W = 0) or Twb (below the range) are NaN.
 */
export const HUMID_AIR_BATCH_STATUS = Status;

/**
 * Moist-air properties for many states at once. Inputs and outputs are SI typed arrays; the
 * per-element results equal those of the SI core and of `humidAir.state` bit for bit. The wet-bulb
 * (a solve) is computed only when `Twb` is requested.
 *
 * @param inputs `{ p, T, RH }` or any other two of T, Twb, Tdp, RH, W, h with p: Float64Arrays of equal length
 * @param props the properties wanted, for example `['Tdp', 'W', 'h']`
 * @param out optional arrays to fill in place; each must have at least the inputs' length
 * @param options `model`: 'enhanced' (default) or 'ideal'
 * @throws {@link InvalidInputError} only for a malformed call (not two inputs, unequal or short arrays,
 *   an unknown property); never for a bad element
 * @example
 * ```ts
 * const T = Float64Array.of(303.15, 293.15, NaN);
 * const RH = Float64Array.of(0.5, 1, 0.5);
 * const p = Float64Array.of(101325, 101325, 101325);
 * const r = humidAirBatch({ T, RH, p }, ['Tdp', 'W', 'h']);
 * r.W[0];       //=> 0.0133735
 * r.status;     //=> Uint8Array [0, 0, 3]
 * ```
 */
export function humidAirBatch<P extends HumidAirBatchProperty>(
  inputs: HumidAirBatchInputs,
  props: readonly P[],
  out?: Partial<Record<P, Float64Array>> & { status?: Uint8Array },
  options?: { readonly model?: HumidAirModel },
): HumidAirBatchResult<P> {
  if (typeof inputs !== 'object' || inputs === null || !(inputs.p instanceof Float64Array)) {
    throw new InvalidInputError('input.invalid', 'inputs', 'humidAirBatch takes { p, and two of T, Twb, Tdp, RH, W, h } as Float64Arrays in SI units');
  }
  const present = INPUT_KEYS.filter((k) => inputs[k] !== undefined);
  if (present.length !== 2) throw new InvalidInputError('input.invalid', 'inputs', `humidAirBatch needs exactly two of T, Twb, Tdp, RH, W, h besides p; got ${present.join(', ') || 'none'}`);
  const pair = PAIRS[present.join(',')]!;
  const A = inputs[present[0]!];
  const B = inputs[present[1]!];
  if (!(A instanceof Float64Array) || !(B instanceof Float64Array)) throw new InvalidInputError('input.invalid', 'inputs', `${present.join(' and ')} must be Float64Arrays`);
  const p = inputs.p;
  const n = p.length;
  if (A.length !== n || B.length !== n) throw new InvalidInputError('input.invalid', 'inputs', `input arrays differ in length (p ${n}, ${present[0]} ${A.length}, ${present[1]} ${B.length})`);
  const model = options?.model === undefined || options.model === 'enhanced' ? MODEL.enhanced : options.model === 'ideal' ? MODEL.ideal : -1;
  if (model < 0) throw new InvalidInputError('input.invalid', 'options.model', `model must be 'enhanced' or 'ideal'; got ${String(options?.model)}`);
  if (!Array.isArray(props) || props.length === 0) throw new InvalidInputError('input.invalid', 'props', `props must be a non-empty array of ${PROPERTIES.join(', ')}`);
  for (const prop of props) if (!PROPERTIES.includes(prop)) throw new InvalidInputError('input.invalid', 'props', `unknown property "${String(prop)}"; choose from ${PROPERTIES.join(', ')}`);
  const result = {} as Record<string, Float64Array | Uint8Array>;
  const columns: Float64Array[] = [];
  const codes: number[] = [];
  for (const prop of props) {
    const given = (out as Partial<Record<string, Float64Array>> | undefined)?.[prop as string];
    if (given !== undefined && !(given instanceof Float64Array)) throw new InvalidInputError('input.invalid', `out.${prop}`, `out.${prop} must be a Float64Array`);
    if (given !== undefined && given.length < n) throw new InvalidInputError('input.invalid', `out.${prop}`, `out.${prop} has ${given.length} elements; ${n} are needed`);
    const arr = given ?? new Float64Array(n);
    result[prop] = arr;
    columns.push(arr);
    codes.push(PROPERTIES.indexOf(prop));
  }
  const status = out?.status ?? new Uint8Array(n);
  if (!(status instanceof Uint8Array)) throw new InvalidInputError('input.invalid', 'out.status', 'out.status must be a Uint8Array');
  if (status.length < n) throw new InvalidInputError('input.invalid', 'out.status', `out.status has ${status.length} elements; ${n} are needed`);
  result.status = status;
  const wetBulb = props.includes('Twb' as P);
  const st = new HumidAirState();
  const m = columns.length;
  const propCodes = Int32Array.from(codes);
  for (let i = 0; i < n; i++) {
    const code = humidAirState(pair, A[i]!, B[i]!, p[i]!, model, wetBulb, st);
    status[i] = code;
    if (code !== Status.ok && code !== Status.undefinedProperty) {
      for (let c = 0; c < m; c++) columns[c]![i] = NaN;
      continue;
    }
    for (let c = 0; c < m; c++) columns[c]![i] = read(st, propCodes[c]!);
  }
  return result as unknown as HumidAirBatchResult<P>;
}

function read(st: HumidAirState, code: number): number {
  switch (code) {
    case 0: return st.T;
    case 1: return st.Twb;
    case 2: return st.Tdp;
    case 3: return st.RH;
    case 4: return st.W;
    case 5: return st.h;
    case 6: return st.v;
    case 7: return st.rho;
    case 8: return st.pw;
    case 9: return st.pws;
    case 10: return st.Ws;
    case 11: return st.mu;
    case 12: return st.cp;
    default: return st.f;
  }
}
