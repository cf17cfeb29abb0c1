/**
 * Batch evaluation of moist-air states over typed arrays, on the generic batch runner
 * (src/core/batch.ts): the SI core in a loop over one reused {@link HumidAirState}, one
 * Float64Array per property and one status per element. A bad element gets a status and NaN
 * outputs; the rest are still computed. A malformed call throws before any work.
 *
 * @module
 */
import { runBatch, type BatchInputSet, type BatchModel, type BatchOut, type BatchResult, type CompleteBatchLoop } from '../core/batch.js';
import { Status } from '../core/status.js';
import { InvalidInputError } from '../errors.js';
import { HumidAirState, humidAirState, PAIR, REASON } from './core/state.js';

/** Properties a humid-air batch can return, in SI (K, fractions, kg/kg, J/kg, m³/kg, kg/m³, Pa, J/(kg·K)). */
export type HumidAirBatchProperty = 'T' | 'Twb' | 'Tdp' | 'RH' | 'W' | 'h' | 'v' | 'rho' | 'pw' | 'pws' | 'Ws' | 'saturationDegree' | 'cp';

type InputKey = 'T' | 'Twb' | 'Tdp' | 'RH' | 'W' | 'h';

/** Batch inputs: two of T, Twb, Tdp, RH, W, h and the total pressure p, each a Float64Array in SI. */
export type HumidAirBatchInputs = { readonly p: Float64Array } & { readonly [K in InputKey]?: Float64Array };

/** Batch outputs: one Float64Array per requested property, and `status` per element. */
export type HumidAirBatchResult<P extends HumidAirBatchProperty> = BatchResult<P>;

/** Arrays to fill in place: one per requested property and `status`, each exactly as long as the inputs. */
export type HumidAirBatchOut<P extends HumidAirBatchProperty> = BatchOut<P>;

/**
 * Status codes per element (those of `src/core/status.ts`): 0 ok; 1 outOfRange; 2 noConvergence;
 * 3 invalidInput (NaN, or (h, Twb) at a wet-bulb of exactly 0 °C, a dependent pair); all outputs NaN. 4 undefinedProperty:
 * the state was computed, but a requested property is not defined there (Ws and the degree of
 * saturation above the boiling point, Tdp for dry air, Twb or Tdp below −100 °C); that output is
 * NaN, the others are valid.
 */
export const HUMID_AIR_BATCH_STATUS = Status;

const PAIRS: readonly [InputKey, InputKey, number][] = [
  ['T', 'RH', PAIR.T_RH], ['T', 'W', PAIR.T_W], ['T', 'h', PAIR.T_h], ['T', 'Tdp', PAIR.T_Tdp], ['T', 'Twb', PAIR.T_Twb],
  ['RH', 'W', PAIR.RH_W], ['RH', 'h', PAIR.RH_h], ['RH', 'Tdp', PAIR.RH_Tdp], ['RH', 'Twb', PAIR.RH_Twb],
  ['W', 'h', PAIR.W_h], ['W', 'Twb', PAIR.W_Twb], ['h', 'Tdp', PAIR.h_Tdp], ['h', 'Twb', PAIR.h_Twb], ['Tdp', 'Twb', PAIR.Tdp_Twb],
];

const PROPERTIES: { readonly [K in HumidAirBatchProperty]: (out: HumidAirState) => number } = {
  T: (o) => o.T,
  Twb: (o) => o.Twb,
  Tdp: (o) => o.Tdp,
  RH: (o) => o.RH,
  W: (o) => o.W,
  h: (o) => o.h,
  v: (o) => o.v,
  rho: (o) => o.rho,
  pw: (o) => o.pw,
  pws: (o) => o.pws,
  Ws: (o) => o.Ws,
  saturationDegree: (o) => o.mu,
  cp: (o) => o.cp,
};

/** Column codes of the fused loop, one per property (the order of {@link PROPERTIES}). */
const COLUMN: { readonly [K in HumidAirBatchProperty]: number } = { T: 0, Twb: 1, Tdp: 2, RH: 3, W: 4, h: 5, v: 6, rho: 7, pw: 8, pws: 9, Ws: 10, saturationDegree: 11, cp: 12 };

/** Property `code` of {@link COLUMN} from the state. */
function column(out: HumidAirState, code: number): number {
  switch (code) {
    case 0:
      return out.T;
    case 1:
      return out.Twb;
    case 2:
      return out.Tdp;
    case 3:
      return out.RH;
    case 4:
      return out.W;
    case 5:
      return out.h;
    case 6:
      return out.v;
    case 7:
      return out.rho;
    case 8:
      return out.pw;
    case 9:
      return out.pws;
    case 10:
      return out.Ws;
    case 11:
      return out.mu;
    default:
      return out.cp;
  }
}

/**
 * Whether column `code` may be NaN where the core reports a property undefined (Tdp, Twb, Ws, μ): the
 * core leaves reason = none when every output is defined.
 */
function mayBeUndefined(code: number): boolean {
  return code === 1 || code === 2 || code === 10 || code === 11;
}

/**
 * The loop of one pair (see `BatchLoop` in src/core/batch.ts): the SI core per element over one
 * reused state, the columns read by code. undefinedProperty from the core counts as ok, a requested
 * property that is NaN where the core says it is undefined is NaN with status undefinedProperty, any
 * other non-finite value is invalidInput, and a failed element is NaN in every column. Every set has
 * three inputs (the pair and p), so the runner always passes `b`, and this loop handles every request:
 * the runner needs no per-element `solve` (tests/humid-air/batch.test.ts compares it, bit for bit, with
 * the runner's own loop over the core).
 */
function pairLoop(pair: number, p: Float64Array, wetBulb: boolean): CompleteBatchLoop<HumidAirBatchProperty> {
  return (a, second, props, columns, status) => {
    const b = second!;
    const m = props.length;
    const codes = new Int32Array(m);
    for (let c = 0; c < m; c++) codes[c] = COLUMN[props[c]!];
    const st = new HumidAirState();
    const n = a.length;
    for (let i = 0; i < n; i++) {
      let code: number = humidAirState(pair, a[i]!, b[i]!, p[i]!, wetBulb, st);
      if (code === Status.undefinedProperty) code = Status.ok;
      if (code === Status.ok) {
        const partial = st.reason !== REASON.none;
        for (let c = 0; c < m; c++) {
          const k = codes[c]!;
          const v = column(st, k);
          if (partial && v !== v && mayBeUndefined(k)) {
            code = Status.undefinedProperty;
          } else if (!(v - v === 0)) {
            // not finite: a core that answered ok with a non-finite value is not a result
            code = Status.invalidInput;
            break;
          }
          columns[c]![i] = v;
        }
      }
      if (code !== Status.ok && code !== Status.undefinedProperty) for (let c = 0; c < m; c++) columns[c]![i] = NaN;
      status[i] = code;
    }
    return true;
  };
}

/** The input sets for one call: each pair with p, solved by its loop. */
function inputSets(p: Float64Array, wetBulb: boolean): BatchInputSet<HumidAirState, HumidAirBatchProperty>[] {
  return PAIRS.map(([k1, k2, pair]) => ({ keys: [k1, k2, 'p'], loop: pairLoop(pair, p, wetBulb) }));
}

/**
 * Moist-air properties for many states at once. Inputs and outputs are SI typed arrays; the
 * per-element results equal those of the SI core and of `humidAir.state` bit for bit. The wet-bulb
 * (a solve) is computed only when `Twb` is requested.
 *
 * @param inputs `{ T, RH, p }` or any other two of T, Twb, Tdp, RH, W, h with p: Float64Arrays of
 *   equal length (K, fraction, kg/kg, J/kg, Pa)
 * @param props the properties wanted, for example `['Tdp', 'W', 'h']`
 * @param out optional arrays to fill in place; each must have exactly the inputs' length
 * @throws {@link InvalidInputError} only for a malformed call (not two inputs and p, unequal arrays,
 *   an `out` array of the wrong length or type, an unknown property); never for a bad element
 * @example
 * ```ts
 * const T = Float64Array.of(303.15, 293.15, NaN);
 * const RH = Float64Array.of(0.5, 1, 0.5);
 * const p = Float64Array.of(101325, 101325, 101325);
 * const r = humidAirBatch({ T, RH, p }, ['Tdp', 'W', 'h']);
 * r.W[0];       //=> 0.01331...
 * r.status;     //=> Uint8Array [0, 0, 3]
 * ```
 */
export function humidAirBatch<P extends HumidAirBatchProperty>(inputs: HumidAirBatchInputs, props: readonly P[], out?: HumidAirBatchOut<P>): HumidAirBatchResult<P> {
  const record = (typeof inputs === 'object' && inputs !== null ? inputs : {}) as Readonly<Record<string, Float64Array | undefined>>;
  if (record.W !== undefined && record.Tdp !== undefined) {
    throw new InvalidInputError('input.invalid', 'inputs', 'humidAirBatch got W and Tdp: they do not fix a state, since each fixes the vapour pressure and neither fixes the dry-bulb; give W or Tdp with T, RH, h or Twb');
  }
  const p = record.p instanceof Float64Array ? record.p : new Float64Array(0);
  const wetBulb = Array.isArray(props) && props.includes('Twb' as P);
  const model: BatchModel<HumidAirState, HumidAirBatchProperty> = {
    name: 'humidAirBatch',
    inputs: inputSets(p, wetBulb),
    properties: PROPERTIES,
    createOutput: () => new HumidAirState(),
  };
  return runBatch(model, inputs, props, out) as HumidAirBatchResult<P>;
}
