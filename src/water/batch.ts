/**
 * Batch evaluation of water states over typed arrays: the IF97 SI core on the generic batch runner,
 * no allocation per element, one status code per element. A bad element is marked and the rest are
 * still computed. Transport properties (μ, λ, Pr, ν, α) come from the IAPWS R12-08 and R15-11 SI
 * cores at each element's (T, ρ), with their critical enhancements fed by IAPWS-95, as on the states
 * of `water.state`.
 *
 * @module
 */
import { runBatch, type BatchModel, type BatchOut, type BatchResult } from '../core/batch.js';
import { Status, type StatusCode } from '../core/status.js';
import { wantsCompensated } from './accuracy.js';
import { compensateState, HELD } from './if97/compensated-state.js';
import { SolverContext } from './if97/context.js';
import { loopFor, PAIR_PH, PAIR_PS, PAIR_PT } from './batch-fused.js';
import { stateFromPH } from './if97/ph.js';
import { stateFromPS } from './if97/ps.js';
import { stateFromPT } from './if97/pt.js';
import { PHASE, WaterState } from './if97/water-state.js';
import { ConductivityResult, conductivityPressureLimit, thermalConductivity } from './transport/conductivity.js';
import { CriticalEnhancementInputs } from './transport/critical.js';
import { iapws95EnhancementInputs, Iapws95InputsWork } from './transport/iapws95-inputs.js';
import { viscosity, viscosityPressureLimit, ViscosityResult, VISCOSITY_T_MAX, VISCOSITY_T_MIN } from './transport/viscosity.js';
import type { WaterAccuracy } from './state-types.js';

/**
 * Properties a water batch can return, in SI (K, Pa, m³/kg, kg/m³, J/kg, J/(kg·K), m/s, Pa·s, W/(m·K),
 * m²/s; x, k and Pr plain). `mu` (IAPWS R12-08), `lambda` (IAPWS R15-11), `Pr` = μ·cp/λ, `nu` = μ/ρ and
 * `alpha` = λ/(ρ·cp) are the transport properties.
 */
export type WaterBatchProperty = 'T' | 'p' | 'v' | 'rho' | 'u' | 'h' | 's' | 'cp' | 'cv' | 'w' | 'k' | 'x' | WaterTransportProperty;

/** The transport properties of a water batch. */
export type WaterTransportProperty = 'mu' | 'lambda' | 'Pr' | 'nu' | 'alpha';

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
 * - 1 `outOfRange`: no IAPWS-IF97 state for these inputs, or, when a transport property is requested,
 *   a state outside its correlation's range (T above 1173.15 K, p above the release's limit at T:
 *   R12-08 for `mu` and `nu`, R15-11 for `lambda` and `alpha`, both for `Pr`) (outputs NaN);
 * - 2 `noConvergence`: a flash did not converge (outputs NaN);
 * - 3 `invalidInput`: NaN or infinite input, or one whose state is not a finite number (outputs NaN);
 * - 4 `undefinedProperty`: computed, two-phase; cp, cv, w, k and the transport properties are NaN
 *   (not defined there; transport also at the critical point itself, where the enhancement diverges).
 * In single-phase states the quality `x` is NaN (it has no meaning there); the status stays 0.
 */
export const WATER_BATCH_STATUS = Status;

const TWO_PHASE_UNDEFINED: ReadonlySet<string> = new Set(['cp', 'cv', 'w', 'k', 'mu', 'lambda', 'Pr', 'nu', 'alpha']);
const TRANSPORT: ReadonlySet<string> = new Set(['mu', 'lambda', 'Pr', 'nu', 'alpha']);


/** A batch element's state with its transport values (NaN until computed). */
class WaterTransportState extends WaterState {
  mu = NaN;
  lambda = NaN;
}

/**
 * The transport scratch of one batch call: IAPWS-95 work for the enhancement inputs and the two
 * correlations' results, created once per call and reused for every element.
 */
class TransportWork {
  readonly work = new Iapws95InputsWork();
  readonly inputs = new CriticalEnhancementInputs();
  readonly mu = new ViscosityResult();
  readonly lambda = new ConductivityResult();
  constructor(
    readonly wantMu: boolean,
    readonly wantLambda: boolean,
  ) {}
}

/**
 * Adds μ and λ (as requested) to a single-phase state `st` computed `ok`, by the same rule as the
 * states of `water.state`: IAPWS R12-08 and R15-11 with their critical enhancements, inputs from
 * IAPWS-95 at (T, ρ). `outOfRange` when a requested correlation does not cover (T, p); `ok` otherwise,
 * with NaN left where the enhancement has no inputs (the critical point itself; `undefinedAt` marks it).
 */
function addTransport(st: WaterTransportState, t: TransportWork): StatusCode {
  st.mu = NaN;
  st.lambda = NaN;
  if (st.phase === PHASE.twoPhase) return Status.ok;
  const T = st.T;
  if (!(T >= VISCOSITY_T_MIN && T <= VISCOSITY_T_MAX)) return Status.outOfRange;
  if ((t.wantMu && !(st.p <= viscosityPressureLimit(T))) || (t.wantLambda && !(st.p <= conductivityPressureLimit(T)))) return Status.outOfRange;
  if (iapws95EnhancementInputs(T, st.rho, t.inputs, t.work) !== Status.ok) return Status.ok;
  if (t.wantMu && viscosity(T, st.rho, true, t.inputs, t.mu) === Status.ok) st.mu = t.mu.mu;
  if (t.wantLambda && thermalConductivity(T, st.rho, true, t.inputs, t.lambda) === Status.ok) st.lambda = t.lambda.lambda;
  return Status.ok;
}

/** After the IF97 solve's `code`, adds the requested transport values. */
function withTransport(code: StatusCode, st: WaterTransportState, t: TransportWork): StatusCode {
  return code === Status.ok ? addTransport(st, t) : code;
}

/** After the IF97 solve's `code`, the compensated kernels at the solved state (every batch pair gives p). */
function compensatedAfter(code: StatusCode, st: WaterState, ctx: SolverContext): StatusCode {
  return code === Status.ok ? compensateState(st, HELD.pressure, ctx) : code;
}

/** The solve of each pair with the compensated kernels after it, and the transport values when wanted. */
function compensatedInputs(ctx: SolverContext, t: TransportWork | undefined): BatchModel<WaterTransportState, WaterBatchProperty>['inputs'] {
  if (t === undefined) {
    return [
      { keys: ['p', 'T'], solve: (p, T, out) => compensatedAfter(stateFromPT(p, T, out, ctx), out, ctx) },
      { keys: ['p', 'h'], solve: (p, h, out) => compensatedAfter(stateFromPH(p, h, out, ctx), out, ctx) },
      { keys: ['p', 's'], solve: (p, s, out) => compensatedAfter(stateFromPS(p, s, out, ctx), out, ctx) },
    ];
  }
  return [
    { keys: ['p', 'T'], solve: (p, T, out) => withTransport(compensatedAfter(stateFromPT(p, T, out, ctx), out, ctx), out, t) },
    { keys: ['p', 'h'], solve: (p, h, out) => withTransport(compensatedAfter(stateFromPH(p, h, out, ctx), out, ctx), out, t) },
    { keys: ['p', 's'], solve: (p, s, out) => withTransport(compensatedAfter(stateFromPS(p, s, out, ctx), out, ctx), out, t) },
  ];
}

function model(transport: TransportWork | undefined, compensated: boolean): BatchModel<WaterTransportState, WaterBatchProperty> {
  const ctx = new SolverContext();
  const t = transport;
  const undefinedTransport = (st: WaterTransportState, prop: string): boolean =>
    ((prop === 'mu' || prop === 'nu' || prop === 'Pr') && Number.isNaN(st.mu)) || ((prop === 'lambda' || prop === 'alpha' || prop === 'Pr') && Number.isNaN(st.lambda));
  return {
    name: 'waterBatch',
    inputs: compensated
      ? compensatedInputs(ctx, t)
      : t === undefined
        ? [
            { keys: ['p', 'T'], solve: (p, T, out) => stateFromPT(p, T, out, ctx), loop: loopFor(PAIR_PT, ctx) },
            { keys: ['p', 'h'], solve: (p, h, out) => stateFromPH(p, h, out, ctx), loop: loopFor(PAIR_PH, ctx) },
            { keys: ['p', 's'], solve: (p, s, out) => stateFromPS(p, s, out, ctx), loop: loopFor(PAIR_PS, ctx) },
          ]
        : [
            { keys: ['p', 'T'], solve: (p, T, out) => withTransport(stateFromPT(p, T, out, ctx), out, t) },
            { keys: ['p', 'h'], solve: (p, h, out) => withTransport(stateFromPH(p, h, out, ctx), out, t) },
            { keys: ['p', 's'], solve: (p, s, out) => withTransport(stateFromPS(p, s, out, ctx), out, t) },
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
      // the expressions of water.state's getters, so the values agree bit for bit
      mu: (st) => st.mu,
      lambda: (st) => st.lambda,
      Pr: (st) => (st.mu * st.cp) / st.lambda,
      nu: (st) => st.mu / st.rho,
      alpha: (st) => st.lambda / (st.rho * st.cp),
    },
    // the quality is NaN in single-phase states: it has no meaning there
    mayBeNaN: { x: true },
    undefinedAt: (st, prop) => (st.phase === PHASE.twoPhase && TWO_PHASE_UNDEFINED.has(prop)) || (TRANSPORT.has(prop) && undefinedTransport(st, prop)),
    createOutput: () => new WaterTransportState(),
  };
}

/** Options of {@link waterBatch}. */
export interface WaterBatchOptions {
  /**
   * `'fast'` (the default) or `'compensated'`: each element solved as by default, then its properties
   * evaluated once more by the compensated kernel of its region, as `water.state(pair, { accuracy })`
   * does (the same values bit for bit). A compensated batch runs element by element through the
   * generic runner, not the fused loop.
   */
  readonly accuracy?: WaterAccuracy;
}

/**
 * Water properties for many states at once, by IAPWS-IF97, with the transport properties of IAPWS
 * R12-08 (viscosity) and R15-11 (thermal conductivity) on request. Inputs and outputs are SI typed
 * arrays; the per-element results equal those of the SI core (`stateFromPT`, `stateFromPH`,
 * `stateFromPS`, `viscosity`, `thermalConductivity`) and of `water.state` (its `mu`, `lambda`, `Pr`,
 * `nu`, `alpha`) bit for bit.
 *
 * Transport properties cost an IAPWS-95 evaluation at (T, ρ) and at (T_R, ρ) per element (the
 * enhancements' inputs), several times the IF97 state alone; a request without them runs the fused
 * IF97 loop. Range: 273.15 K to 1173.15 K and up to each release's pressure limit at T (viscosity:
 * 1000 MPa to 433.15 K, 500 MPa to 873.15 K, 300 MPa above; conductivity: 1000 MPa to 398.15 K,
 * 200 MPa to 523.15 K, 150 MPa to 673.15 K, 100 MPa above, and IF97's own 100 MPa / 50 MPa); an element
 * outside it gets status 1 and NaN. Engineering estimates: defer to local codes and licensed
 * professionals for pressure equipment.
 *
 * @param inputs exactly one of `{ p, T }`, `{ p, h }` or `{ p, s }`: Float64Arrays of equal length
 * @param props the properties wanted, for example `['h', 's', 'rho']` or `['mu', 'lambda', 'Pr']`
 * @param out optional arrays to fill in place (reuse memory between calls), each exactly as long as
 *   the inputs; missing ones are allocated
 * @param options `{ accuracy: 'compensated' }` for the compensated kernels at each solved state
 *   ({@link WaterBatchOptions}; default `'fast'`)
 * @returns one Float64Array per property, and `status` (see {@link WATER_BATCH_STATUS})
 * @throws {@link InvalidInputError} only for a malformed call (unequal lengths, an unknown or extra
 *   input, an unknown property, an `out` array of the wrong length, a bad option); never for a bad element
 * @example
 * ```ts
 * const p = Float64Array.of(1e6, 1e6, NaN, -5);
 * const T = Float64Array.of(300, 500, 400, 400);
 * const r = waterBatch({ p, T }, ['h', 'rho']);
 * r.h[0];        //=> 113.4923e3 (J/kg)
 * r.status;      //=> Uint8Array [0, 0, 3, 1]
 * const t = waterBatch({ p: Float64Array.of(101325, 101325, 1e5), T: Float64Array.of(298.15, 373.15, 1200) }, ['mu', 'lambda', 'Pr']);
 * t.mu[0];       //=> 890.0e-6 (Pa·s, liquid at 25 °C)
 * t.Pr[1];       //=> 1.034 (steam at 100 °C, 1 atm)
 * t.status;      //=> Uint8Array [0, 0, 1]  (1200 K is above the transport releases' 1173.15 K)
 * const c = waterBatch({ p: Float64Array.of(3e6), T: Float64Array.of(300) }, ['h'], undefined, { accuracy: 'compensated' });
 * c.h[0];        //=> 115331.27302143894 (J/kg, compensated; the fast kernel gives 115331.27302143878; R7-97 Table 5 prints 0.115331273e3 kJ/kg)
 * ```
 */
export function waterBatch<P extends WaterBatchProperty>(inputs: WaterBatchInputs, props: readonly P[], out?: BatchOut<P>, options?: WaterBatchOptions): WaterBatchResult<P> {
  const compensated = wantsCompensated(options);
  const list: readonly unknown[] = Array.isArray(props) ? props : [];
  const wantMu = list.some((q) => q === 'mu' || q === 'nu' || q === 'Pr');
  const wantLambda = list.some((q) => q === 'lambda' || q === 'alpha' || q === 'Pr');
  return runBatch(model(wantMu || wantLambda ? new TransportWork(wantMu, wantLambda) : undefined, compensated), inputs, props, out);
}
