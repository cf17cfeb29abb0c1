/**
 * Process facades on moist-air streams: mixing, sensible heating and cooling, cooling coils,
 * steam and evaporative humidifiers. Flows are dry-air mass flows; loads are powers, positive when
 * the air gains heat, negative when it loses it (a cooling coil's duty is −`heat`).
 *
 * @module
 */
import { Status } from '../core/status.js';
import { InvalidInputError, OutOfRangeError } from '../errors.js';
import { Quantity, readQuantity, type QuantityLike } from '../units/quantity.js';
import {
  coolingCoilBypass,
  coolingCoilToState,
  evaporativeHumidifier as coreEvaporativeHumidifier,
  mixStreams,
  PROCESS_REASON,
  ProcessLoads,
  sensibleByHeat,
  sensibleToTemperature,
  steamHumidifier as coreSteamHumidifier,
  TARGET,
} from './core/processes.js';
import { MODEL } from './core/saturation.js';
import { HumidAirState, humidAirState as coreState, PAIR } from './core/state.js';
import { humidAirError, readRelativeHumidity, toResult, type HumidAirResult } from './state.js';

/** A stream: its state (from `humidAir.state`) and its dry-air mass flow. */
export interface AirStream {
  readonly state: HumidAirResult;
  /** Mass flow of dry air (not of moist air). */
  readonly flow: QuantityLike<'massFlow'>;
}

/** Result of a process: the leaving state and the loads. */
export interface ProcessResult {
  readonly leaving: HumidAirResult;
  /** Dry-air mass flow through the process. */
  readonly flow: Quantity<'massFlow'>;
  /** ṁa (h(T2, W1) − h(T1, W1)). */
  readonly sensible: Quantity<'power'>;
  /** total − sensible. */
  readonly latent: Quantity<'power'>;
  /** ṁa (h2 − h1). */
  readonly total: Quantity<'power'>;
  /** Heat added by the apparatus: total − ṁw hw (zero for humidifiers, −duty for a coil). */
  readonly heat: Quantity<'power'>;
  /** sensible/total; `undefined` when total is zero. */
  readonly sensibleHeatRatio: number | undefined;
  /** Water added (negative: condensate removed), its enthalpy (IAPWS-IF97) and temperature; `undefined` when no water crosses. */
  readonly water: { readonly flow: Quantity<'massFlow'>; readonly h: Quantity<'specificEnergy'>; readonly T: Quantity<'temperature'> } | undefined;
}

function coreOf(state: HumidAirResult, parameter: string): HumidAirState {
  if (typeof state !== 'object' || state === null || !(state.T instanceof Quantity)) {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a state from humidAir.state`);
  }
  const st = new HumidAirState();
  const s = coreState(PAIR.T_W, state.T.si, state.W, state.p.si, state.model === 'ideal' ? MODEL.ideal : MODEL.enhanced, true, st);
  if (s !== Status.ok && s !== Status.undefinedProperty) throw humidAirError(s, st.reason, parameter, st.model);
  return st;
}

function readFlow(flow: QuantityLike<'massFlow'>, parameter: string): number {
  const m = readQuantity(flow, 'massFlow', parameter);
  if (!(m > 0)) throw new OutOfRangeError({ quantity: parameter, value: m, min: 0, max: Infinity, unit: 'kg/s', scope: 'dry-air mass flow' }, `${parameter} = ${m} kg/s: a dry-air flow must be positive`);
  return m;
}

const PROCESS_MESSAGES: Record<number, string> = {
  [PROCESS_REASON.flow]: 'dry-air mass flows must be finite and at least 0, with a positive sum',
  [PROCESS_REASON.pressureMismatch]: 'streams to be mixed must be at the same total pressure',
  [PROCESS_REASON.condensation]: 'sensible cooling would pass the entering dew point (water would condense): use humidAir.coolingCoil',
  [PROCESS_REASON.wouldHumidify]: 'a cooling coil cannot leave the air with more water or warmer than it entered (check ADP against the entering dew point, or the leaving state)',
  [PROCESS_REASON.bypassFactor]: 'the bypass factor must be at least 0 and below 1',
  [PROCESS_REASON.waterTemperature]: 'liquid water (condensate or spray) must be between 0 °C and 100 °C (frosting coils and boiling water are not covered)',
  [PROCESS_REASON.steamState]: 'steam must be vapour (at or above its saturation temperature), at most 800 °C and 10 MPa (IAPWS-IF97 region 2)',
  [PROCESS_REASON.target]: "the humidifier target lies below the entering humidity or beyond what the humidifier's line can reach before saturation",
  [PROCESS_REASON.heat]: 'the heat flow must be finite',
};

function processError(status: number, reason: number, what: string, model: number): Error {
  const message = PROCESS_MESSAGES[reason];
  if (message === undefined) return humidAirError(status, reason, what, model);
  if (status === Status.invalidInput) return new InvalidInputError('input.invalid', what, `${what}: ${message}`);
  return new OutOfRangeError({ quantity: what, value: NaN, min: NaN, max: NaN, unit: '', scope: what }, `${what}: ${message}`);
}

function result(outlet: HumidAirState, loads: ProcessLoads, mda: number, from: HumidAirResult['pressureFrom'], water: boolean): ProcessResult {
  return {
    leaving: toResult(outlet, from),
    flow: Quantity.fromSI(mda, 'massFlow'),
    sensible: Quantity.fromSI(loads.sensible, 'power'),
    latent: Quantity.fromSI(loads.latent, 'power'),
    total: Quantity.fromSI(loads.total, 'power'),
    heat: Quantity.fromSI(loads.heat, 'power'),
    sensibleHeatRatio: Number.isFinite(loads.sensibleHeatRatio) ? loads.sensibleHeatRatio : undefined,
    water: water
      ? { flow: Quantity.fromSI(loads.waterFlow, 'massFlow'), h: Quantity.fromSI(loads.waterEnthalpy, 'specificEnergy'), T: Quantity.fromSI(loads.waterTemperature, 'temperature') }
      : undefined,
  };
}

function check(status: number, reason: number, what: string, model: number): void {
  if (status !== Status.ok && status !== Status.undefinedProperty) throw processError(status, reason, what, model);
}

/**
 * Adiabatic mixing of two or more streams at one total pressure: the flow-weighted W and h.
 * @throws {@link OutOfRangeError} the mixture would be supersaturated (fog)
 * @example
 * ```ts
 * const outdoor = humidAir.state({ T: '32 °C', RH: 0.5 });
 * const ret = humidAir.state({ T: '24 °C', RH: 0.5 });
 * const mixed = humidAir.mix([{ state: outdoor, flow: '1 kg/s' }, { state: ret, flow: '3 kg/s' }]);
 * mixed.leaving.T.in('°C');   //=> 26.0 (about the flow-weighted dry-bulb)
 * ```
 */
export function mix(streams: readonly AirStream[]): ProcessResult {
  if (!Array.isArray(streams) || streams.length < 2) throw new InvalidInputError('input.invalid', 'streams', 'humidAir.mix needs an array of at least two { state, flow } streams');
  const n = streams.length;
  const W = new Float64Array(n);
  const h = new Float64Array(n);
  const m = new Float64Array(n);
  const first = coreOf(streams[0]!.state, 'streams[0].state');
  for (let i = 0; i < n; i++) {
    const st = coreOf(streams[i]!.state, `streams[${i}].state`);
    if (Math.abs(st.p - first.p) > 1e-9 * first.p) throw processError(Status.invalidInput, PROCESS_REASON.pressureMismatch, 'streams', first.model);
    if (st.model !== first.model) throw new InvalidInputError('input.invalid', 'streams', 'streams to be mixed must use the same model');
    W[i] = st.W;
    h[i] = st.h;
    m[i] = readFlow(streams[i]!.flow, `streams[${i}].flow`);
  }
  const out = new HumidAirState();
  const s = mixStreams(first.p, W, h, m, n, first.model, true, out);
  check(s, out.reason, 'the mixed stream', first.model);
  let total = 0;
  for (let i = 0; i < n; i++) total += m[i]!;
  const loads = new ProcessLoads();
  loads.sensibleHeatRatio = NaN;
  return result(out, loads, total, streams[0]!.state.pressureFrom, false);
}

/** Arguments of {@link heat}: a leaving temperature or a heat flow. */
export type SensibleInput =
  | { readonly inlet: HumidAirResult; readonly flow: QuantityLike<'massFlow'>; readonly T2: QuantityLike<'temperature'> }
  | { readonly inlet: HumidAirResult; readonly flow: QuantityLike<'massFlow'>; readonly Q: QuantityLike<'power'> };

/**
 * Sensible heating or cooling at constant humidity ratio, to a leaving dry-bulb `T2` or by a heat
 * flow `Q` (negative for cooling).
 * @throws {@link OutOfRangeError} cooling below the entering dew point (use {@link coolingCoil})
 */
export function heat(input: SensibleInput): ProcessResult {
  const inlet = coreOf(input.inlet, 'inlet');
  const mda = readFlow(input.flow, 'flow');
  const out = new HumidAirState();
  const loads = new ProcessLoads();
  let s: number;
  if ('T2' in input && input.T2 !== undefined) s = sensibleToTemperature(inlet, mda, readQuantity(input.T2, 'temperature', 'T2'), true, out, loads);
  else if ('Q' in input && input.Q !== undefined) s = sensibleByHeat(inlet, mda, readQuantity(input.Q, 'power', 'Q'), true, out, loads);
  else throw new InvalidInputError('input.invalid', 'input', 'humidAir.heat needs T2 (leaving dry-bulb) or Q (heat flow)');
  check(s, loads.reason, 'sensible heating or cooling', inlet.model);
  return result(out, loads, mda, input.inlet.pressureFrom, false);
}

/** Arguments of {@link coolingCoil}. */
export type CoolingCoilInput =
  | {
      readonly inlet: HumidAirResult;
      readonly flow: QuantityLike<'massFlow'>;
      /** Apparatus dew point: the coil's effective surface temperature. */
      readonly ADP: QuantityLike<'temperature'>;
      /** Bypass factor, 0 ≤ BF < 1 (1 − contact factor). */
      readonly bypassFactor: number;
      /** Condensate temperature; default the ADP. */
      readonly Tcondensate?: QuantityLike<'temperature'>;
    }
  | {
      readonly inlet: HumidAirResult;
      readonly flow: QuantityLike<'massFlow'>;
      readonly T2: QuantityLike<'temperature'>;
      readonly RH2: number | `${number} %` | `${number}%`;
      /** Condensate temperature; default the leaving dry-bulb. */
      readonly Tcondensate?: QuantityLike<'temperature'>;
    };

/**
 * Cooling with dehumidification: leaving state from the apparatus dew point and bypass factor, or
 * from a leaving dry-bulb and RH. The condensate (−`water.flow`) leaves with its IAPWS-IF97 enthalpy.
 * @example
 * ```ts
 * const coil = humidAir.coolingCoil({ inlet: mixed.leaving, flow: '4 kg/s', ADP: '10 °C', bypassFactor: 0.15 });
 * coil.heat.in('kW');   //=> -81.98 (negative: heat removed; the coil duty is 82.0 kW)
 * ```
 */
export function coolingCoil(input: CoolingCoilInput): ProcessResult {
  const inlet = coreOf(input.inlet, 'inlet');
  const mda = readFlow(input.flow, 'flow');
  const out = new HumidAirState();
  const loads = new ProcessLoads();
  let s: number;
  if ('ADP' in input && input.ADP !== undefined) {
    const ADP = readQuantity(input.ADP, 'temperature', 'ADP');
    const BF = input.bypassFactor;
    if (typeof BF !== 'number' || !Number.isFinite(BF)) throw new InvalidInputError('input.invalid', 'bypassFactor', 'bypassFactor must be a number, 0 ≤ BF < 1');
    const Tc = input.Tcondensate === undefined ? ADP : readQuantity(input.Tcondensate, 'temperature', 'Tcondensate');
    s = coolingCoilBypass(inlet, mda, ADP, BF, Tc, true, out, loads);
  } else if ('T2' in input && input.T2 !== undefined) {
    const T2 = readQuantity(input.T2, 'temperature', 'T2');
    const RH2 = readRelativeHumidity(input.RH2, 'RH2');
    const Tc = input.Tcondensate === undefined ? T2 : readQuantity(input.Tcondensate, 'temperature', 'Tcondensate');
    s = coolingCoilToState(inlet, mda, T2, RH2, Tc, true, out, loads);
  } else {
    throw new InvalidInputError('input.invalid', 'input', 'humidAir.coolingCoil needs { ADP, bypassFactor } or { T2, RH2 }');
  }
  check(s, loads.reason, 'cooling coil', inlet.model);
  return result(out, loads, mda, input.inlet.pressureFrom, true);
}

/** Humidifier targets: a leaving humidity ratio `W2` or relative humidity `RH2` (evaporative also `T2`). */
interface TargetInput {
  readonly W2?: number;
  readonly RH2?: number | `${number} %` | `${number}%`;
  readonly T2?: QuantityLike<'temperature'>;
}

function readTarget(input: TargetInput, allowT: boolean): [number, number] {
  const given = [input.W2 !== undefined, input.RH2 !== undefined, allowT && input.T2 !== undefined].filter(Boolean).length;
  if (given !== 1) throw new InvalidInputError('input.invalid', 'target', `give exactly one target: W2 or RH2${allowT ? ' or T2' : ''}`);
  if (input.W2 !== undefined) {
    if (typeof input.W2 !== 'number' || !Number.isFinite(input.W2) || input.W2 < 0) throw new InvalidInputError('input.invalid', 'W2', 'W2 must be a humidity ratio in kg/kg, at least 0');
    return [TARGET.W, input.W2];
  }
  if (input.RH2 !== undefined) return [TARGET.RH, readRelativeHumidity(input.RH2, 'RH2')];
  return [TARGET.T, readQuantity(input.T2!, 'temperature', 'T2')];
}

/** Arguments of {@link steamHumidifier}. */
export interface SteamHumidifierInput extends TargetInput {
  readonly inlet: HumidAirResult;
  readonly flow: QuantityLike<'massFlow'>;
  /** The steam's state (vapour; IAPWS-IF97 region 2). */
  readonly steam: { readonly p: QuantityLike<'pressure'>; readonly T: QuantityLike<'temperature'> };
}

/**
 * Steam humidification to a leaving W2 or RH2: adiabatic, h2 = h1 + (W2 − W1) h_steam with the
 * steam enthalpy from IAPWS-IF97 region 2 at its given state. The air warms slightly.
 */
export function steamHumidifier(input: SteamHumidifierInput): ProcessResult {
  const inlet = coreOf(input.inlet, 'inlet');
  const mda = readFlow(input.flow, 'flow');
  const [target, value] = readTarget(input, false);
  if (typeof input.steam !== 'object' || input.steam === null) throw new InvalidInputError('input.invalid', 'steam', 'steam must be { p, T }');
  const ps = readQuantity(input.steam.p, 'pressure', 'steam.p');
  const Ts = readQuantity(input.steam.T, 'temperature', 'steam.T');
  const out = new HumidAirState();
  const loads = new ProcessLoads();
  const s = coreSteamHumidifier(inlet, mda, target, value, ps, Ts, true, out, loads);
  check(s, loads.reason, 'steam humidifier', inlet.model);
  return result(out, loads, mda, input.inlet.pressureFrom, true);
}

/** Arguments of {@link evaporativeHumidifier}. */
export interface EvaporativeHumidifierInput extends TargetInput {
  readonly inlet: HumidAirResult;
  readonly flow: QuantityLike<'massFlow'>;
  /** Temperature of the water evaporated; default the entering wet-bulb (recirculated spray), at least 0 °C. */
  readonly Twater?: QuantityLike<'temperature'>;
}

/**
 * Adiabatic (evaporative) humidification to a leaving W2, RH2 or dry-bulb T2: the air cools along
 * h2 = h1 + (W2 − W1) hw, close to its wet-bulb line.
 */
export function evaporativeHumidifier(input: EvaporativeHumidifierInput): ProcessResult {
  const inlet = coreOf(input.inlet, 'inlet');
  const mda = readFlow(input.flow, 'flow');
  const [target, value] = readTarget(input, true);
  const Tw = input.Twater === undefined ? inlet.Twb : readQuantity(input.Twater, 'temperature', 'Twater');
  const out = new HumidAirState();
  const loads = new ProcessLoads();
  const s = coreEvaporativeHumidifier(inlet, mda, target, value, Tw, true, out, loads);
  check(s, loads.reason, 'evaporative humidifier', inlet.model);
  return result(out, loads, mda, input.inlet.pressureFrom, true);
}
