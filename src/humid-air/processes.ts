/**
 * Process facades on moist-air streams: mixing, sensible heating and cooling, cooling coils,
 * steam and evaporative humidifiers. Flows are dry-air mass flows (or volume flows, converted at
 * the stream's own state with its v per kg of dry air); loads are powers, positive when the air
 * gains heat, negative when it loses it (a cooling coil's duty is −`heat`).
 *
 * @module
 */
import { CallUnits } from '../core/call-units.js';
import { throwForStatus } from '../core/fail.js';
import { describeValue, rangeError, readAbsolutePressure, readInput, readTemperature, type Bounds } from '../core/read.js';
import { resultQuantity } from '../core/result.js';
import { Status } from '../core/status.js';
import { InvalidInputError, OutOfRangeError } from '../errors.js';
import { Quantity, quantity, type QuantityLike } from '../units/quantity.js';
import { saturationTemperature } from '../water/if97/region4.js';
import {
  coolingCoilBypass,
  coolingCoilToState,
  evaporativeHumidifier as coreEvaporativeHumidifier,
  mixStreams,
  ProcessLoads,
  sensibleByHeat,
  sensibleToTemperature,
  steamHumidifier as coreSteamHumidifier,
  TARGET,
} from './core/processes.js';
import { moistAirEnthalpy } from './core/relations.js';
import { P_WATER_AT_ICE, waterSaturationPressure } from './core/saturation.js';
import { HumidAirState, humidAirState as coreState, PAIR, T_MAX, T_MIN } from './core/state.js';
import { readHumidityRatio, readRelativeHumidity, relativeHumidityError, type Checked, type HumidityRatioInput, type RelativeHumidityInput } from './inputs.js';
import { SCOPE, throwForState, toResult, type HumidAirResult, type StatePair } from './state.js';

/** A dry-air mass flow, or a volume flow of the moist air (converted with the stream's v per kg dry air). */
export type AirFlowInput = QuantityLike<'massFlow'> | QuantityLike<'volumeFlow'>;

/** A stream: its state (from `humidAir.state`) and its flow. */
export interface AirStream {
  readonly state: HumidAirResult;
  /** Mass flow of dry air (not of moist air), or the stream's volume flow (`'2 m³/s'`, `'4000 cfm'`). */
  readonly flow: AirFlowInput;
}

/** {@link AirStream} with a run-time `string` allowed for the flow. */
export interface AirStreamLoose {
  readonly state: HumidAirResult;
  readonly flow: AirFlowInput | string;
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

const T_BOUNDS: Bounds = { min: T_MIN, max: T_MAX, scope: SCOPE };
const LIQUID_WATER: Bounds = { min: 273.15, max: 373.15, scope: 'liquid water (condensate or spray; frosting coils and boiling water are not covered)' };

/** The core state of a stream's state (recomputed from its T, W and p, bit for bit the same). */
function coreOf(state: unknown, parameter: string): HumidAirState {
  const s = state as HumidAirResult | null;
  if (typeof s !== 'object' || s === null || !(s.T instanceof Quantity) || !(s.W instanceof Quantity) || !(s.p instanceof Quantity)) {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a state from humidAir.state; got ${describeValue(state)}`);
  }
  const st = new HumidAirState();
  const code = coreState(PAIR.T_W, s.T.si, s.W.si, s.p.si, true, st);
  if (code !== Status.ok && code !== Status.undefinedProperty) {
    const sp: StatePair = { key: 'T,W', pair: PAIR.T_W, a: s.T.si, b: s.W.si, percent: false };
    throwForState(code, st.reason, sp, s.p.si, new CallUnits(), parameter);
  }
  return st;
}

/** A dry-air mass flow in kg/s from a mass flow or a volume flow at `state` (ṁa = V̇/v). */
function readFlow(flow: unknown, parameter: string, state: HumidAirState, units: CallUnits): number {
  let dimension: 'massFlow' | 'volumeFlow' = 'massFlow';
  if (flow instanceof Quantity && flow.dimension === 'volumeFlow') dimension = 'volumeFlow';
  else if (typeof flow === 'string') {
    try {
      if (quantity(flow).dimension === 'volumeFlow') dimension = 'volumeFlow';
    } catch {
      // unreadable text: the reader below words the error
    }
  }
  const bounds: Bounds = { min: 0, max: Infinity, minExclusive: true, scope: dimension === 'massFlow' ? 'a dry-air mass flow (must be positive)' : 'a volume flow (must be positive)' };
  const x = readInput(flow as QuantityLike<'massFlow'>, dimension, parameter, bounds, units);
  return dimension === 'massFlow' ? x : x / state.v;
}

function loadsResult(outlet: HumidAirState, loads: ProcessLoads, mda: number, from: HumidAirResult['pressureFrom'], water: boolean): ProcessResult {
  return {
    leaving: toResult(outlet, from),
    flow: resultQuantity(mda, 'massFlow', 'flow'),
    sensible: resultQuantity(loads.sensible, 'power', 'sensible'),
    latent: resultQuantity(loads.latent, 'power', 'latent'),
    total: resultQuantity(loads.total, 'power', 'total'),
    heat: resultQuantity(loads.heat, 'power', 'heat'),
    sensibleHeatRatio: Number.isFinite(loads.sensibleHeatRatio) ? loads.sensibleHeatRatio : undefined,
    water: water
      ? { flow: resultQuantity(loads.waterFlow, 'massFlow', 'water.flow'), h: resultQuantity(loads.waterEnthalpy, 'specificEnergy', 'water.h'), T: resultQuantity(loads.waterTemperature, 'temperature', 'water.T') }
      : undefined,
  };
}

/** Throws for a failed process status: `range` words the out-of-range case (numeric bounds). */
function fail(status: number, what: string, inputs: string, range: () => OutOfRangeError): never {
  return throwForStatus(status, { what, inputs, range, parameter: 'input' });
}

function ok(status: number): boolean {
  return status === Status.ok || status === Status.undefinedProperty;
}

/** The inlet as text for messages. */
function describeInlet(st: HumidAirState, units: CallUnits): string {
  return `inlet T = ${units.describe(st.T, 'temperature', 'K')}, W = ${units.describe(st.W, 'humidityRatio', 'kg/kg')}`;
}

/**
 * Adiabatic mixing of two or more streams at one total pressure: the flow-weighted W and h.
 * @throws {@link OutOfRangeError} the mixture would be supersaturated (fog)
 * @throws {@link InvalidInputError} fewer than two streams, streams at different pressures
 * @example
 * ```ts
 * const outdoor = humidAir.state({ T: '32 °C', RH: 0.5 });
 * const ret = humidAir.state({ T: '24 °C', RH: 0.5 });
 * const mixed = humidAir.mix([{ state: outdoor, flow: '1 kg/s' }, { state: ret, flow: '3 kg/s' }]);
 * mixed.leaving.T.in('°C');   //=> 26.0... (about the flow-weighted dry-bulb)
 * ```
 */
export function mix<const S extends readonly AirStreamLoose[]>(streams: S & { readonly [I in keyof S]: Checked<S[I], 'flow', 'state'> }): ProcessResult {
  const list = streams as readonly AirStreamLoose[];
  if (!Array.isArray(list) || list.length < 2) throw new InvalidInputError('input.invalid', 'streams', `humidAir.mix needs an array of at least two { state, flow } streams; got ${describeValue(list)}`);
  const n = list.length;
  const W = new Float64Array(n);
  const h = new Float64Array(n);
  const m = new Float64Array(n);
  const units = new CallUnits();
  let p = 0;
  for (let i = 0; i < n; i++) {
    const stream = list[i] as AirStreamLoose | undefined;
    if (typeof stream !== 'object' || stream === null) throw new InvalidInputError('input.invalid', `streams[${i}]`, `streams[${i}] must be { state, flow }; got ${describeValue(stream)}`);
    const st = coreOf(stream.state, `streams[${i}].state`);
    if (i === 0) p = st.p;
    else if (Math.abs(st.p - p) > 1e-9 * p) {
      throw new InvalidInputError('input.invalid', `streams[${i}].state`, `streams to be mixed must be at the same total pressure: streams[0] is at ${units.describe(p, 'pressure', 'Pa')}, streams[${i}] at ${units.describe(st.p, 'pressure', 'Pa')}`);
    }
    W[i] = st.W;
    h[i] = st.h;
    m[i] = readFlow(stream.flow, `streams[${i}].flow`, st, units);
  }
  const out = new HumidAirState();
  const s = mixStreams(p, W, h, m, n, true, out);
  let total = 0;
  let mW = 0;
  let mh = 0;
  for (let i = 0; i < n; i++) {
    total += m[i]!;
    mW += m[i]! * W[i]!;
    mh += m[i]! * h[i]!;
  }
  if (!ok(s)) {
    fail(s, 'the adiabatic mixture', `${n} streams at p = ${units.describe(p, 'pressure', 'Pa')}`, () => {
      // the most water saturated air with the mixture's enthalpy holds
      const sat = new HumidAirState();
      const c = coreState(PAIR.RH_h, 1, mh / total, p, false, sat);
      const max = ok(c) ? sat.W : 0;
      return rangeError('W (mixed)', mW / total, 'humidityRatio', { min: 0, max, scope: `saturated air with the mixture's enthalpy h = ${units.describe(mh / total, 'specificEnergy', 'J/kg')}`, hint: '; the mixture would be fog: mix warmer or drier streams, or heat one first' }, units);
    });
  }
  const loads = new ProcessLoads();
  loads.sensibleHeatRatio = NaN;
  return loadsResult(out, loads, total, list[0]!.state.pressureFrom, false);
}

/** Arguments of {@link heat}: a leaving temperature or a heat flow. */
export type SensibleInput =
  | { readonly inlet: HumidAirResult; readonly flow: AirFlowInput; readonly T2: QuantityLike<'temperature'> }
  | { readonly inlet: HumidAirResult; readonly flow: AirFlowInput; readonly Q: QuantityLike<'power'> };

/** {@link SensibleInput} with run-time strings allowed. */
export interface SensibleInputLoose {
  readonly inlet: HumidAirResult;
  readonly flow: AirFlowInput | string;
  readonly T2?: QuantityLike<'temperature'> | string;
  readonly Q?: QuantityLike<'power'> | string;
}

/**
 * Sensible heating or cooling at constant humidity ratio, to a leaving dry-bulb `T2` or by a heat
 * flow `Q` (negative for cooling).
 * @throws {@link OutOfRangeError} cooling below the entering dew point (use {@link coolingCoil}),
 *   with the lowest T2 (or Q) allowed
 * @example
 * ```ts
 * humidAir.heat({ inlet: humidAir.state({ T: '24 °C', RH: 0.5 }), flow: '2 kg/s', T2: '35 °C' }).heat.in('kW');   //=> 22.51...
 * ```
 */
export function heat<const I extends SensibleInputLoose>(input: I & Checked<I, 'flow' | 'T2' | 'Q', 'inlet'>): ProcessResult {
  const a = input as SensibleInputLoose;
  if (typeof a !== 'object' || a === null) throw new InvalidInputError('input.invalid', 'input', `humidAir.heat needs { inlet, flow, T2 } or { inlet, flow, Q }; got ${describeValue(a)}`);
  const units = new CallUnits();
  const inlet = coreOf(a.inlet, 'inlet');
  const mda = readFlow(a.flow, 'flow', inlet, units);
  const out = new HumidAirState();
  const loads = new ProcessLoads();
  const dew = inlet.Tdp === inlet.Tdp ? inlet.Tdp : T_MIN;
  if ((a.T2 === undefined) === (a.Q === undefined)) throw new InvalidInputError('input.invalid', 'input', 'humidAir.heat needs exactly one of T2 (leaving dry-bulb) or Q (heat flow)');
  if (a.T2 !== undefined) {
    const T2 = readTemperature(a.T2 as QuantityLike<'temperature'>, 'T2', T_BOUNDS, units);
    const s = sensibleToTemperature(inlet, mda, T2, true, out, loads);
    if (!ok(s)) {
      fail(s, 'sensible heating or cooling', `${describeInlet(inlet, units)}, T2 = ${units.describe(T2, 'temperature', 'K')}`, () =>
        rangeError('T2', T2, 'temperature', { min: dew, max: T_MAX, scope: `sensible cooling of air with dew point ${units.describe(dew, 'temperature', 'K')}`, hint: '; below the dew point water condenses: use humidAir.coolingCoil' }, units),
      );
    }
  } else {
    const Q = readInput(a.Q as QuantityLike<'power'>, 'power', 'Q', undefined, units);
    const s = sensibleByHeat(inlet, mda, Q, true, out, loads);
    if (!ok(s)) {
      fail(s, 'sensible heating or cooling', `${describeInlet(inlet, units)}, Q = ${units.describe(Q, 'power', 'W')}`, () =>
        rangeError('Q', Q, 'power', { min: mda * (moistAirEnthalpy(dew, inlet.W) - inlet.h), max: mda * (moistAirEnthalpy(T_MAX, inlet.W) - inlet.h), scope: `sensible heating or cooling of this stream (from its dew point ${units.describe(dew, 'temperature', 'K')} to 200 °C)`, hint: '; below the dew point water condenses: use humidAir.coolingCoil' }, units),
      );
    }
  }
  return loadsResult(out, loads, mda, a.inlet.pressureFrom, false);
}

/** Arguments of {@link coolingCoil}. */
export type CoolingCoilInput =
  | {
      readonly inlet: HumidAirResult;
      readonly flow: AirFlowInput;
      /** Apparatus dew point: the coil's effective surface temperature. */
      readonly ADP: QuantityLike<'temperature'>;
      /** Bypass factor, 0 ≤ BF < 1 (1 − contact factor). */
      readonly bypassFactor: number;
      /** Condensate temperature; default the ADP. */
      readonly Tcondensate?: QuantityLike<'temperature'>;
    }
  | {
      readonly inlet: HumidAirResult;
      readonly flow: AirFlowInput;
      readonly T2: QuantityLike<'temperature'>;
      readonly RH2: RelativeHumidityInput;
      /** Condensate temperature; default the leaving dry-bulb. */
      readonly Tcondensate?: QuantityLike<'temperature'>;
    };

/** {@link CoolingCoilInput} with run-time strings allowed. */
export interface CoolingCoilInputLoose {
  readonly inlet: HumidAirResult;
  readonly flow: AirFlowInput | string;
  readonly ADP?: QuantityLike<'temperature'> | string;
  readonly bypassFactor?: number;
  readonly T2?: QuantityLike<'temperature'> | string;
  readonly RH2?: RelativeHumidityInput | string;
  readonly Tcondensate?: QuantityLike<'temperature'> | string;
}

/**
 * Cooling with dehumidification: leaving state from the apparatus dew point and bypass factor, or
 * from a leaving dry-bulb and RH. The condensate (−`water.flow`) leaves with its IAPWS-IF97 enthalpy.
 * @throws {@link OutOfRangeError} an ADP above the entering dew point, a leaving state with more
 *   water or a higher dry-bulb than the entering air, BF outside [0, 1), condensate outside 0–100 °C
 * @example
 * ```ts
 * const inlet = humidAir.state({ T: '30 °C', RH: 0.5 });
 * const coil = humidAir.coolingCoil({ inlet, flow: '4 kg/s', ADP: '10 °C', bypassFactor: 0.15 });
 * coil.heat.in('kW');   //=> -117.95 (negative: heat removed; the coil duty is about 118 kW)
 * ```
 */
export function coolingCoil<const I extends CoolingCoilInputLoose>(input: I & Checked<I, 'flow' | 'ADP' | 'T2' | 'RH2' | 'Tcondensate', 'inlet' | 'bypassFactor'>): ProcessResult {
  const a = input as CoolingCoilInputLoose;
  if (typeof a !== 'object' || a === null) throw new InvalidInputError('input.invalid', 'input', `humidAir.coolingCoil needs { inlet, flow, ADP, bypassFactor } or { inlet, flow, T2, RH2 }; got ${describeValue(a)}`);
  const units = new CallUnits();
  const inlet = coreOf(a.inlet, 'inlet');
  const mda = readFlow(a.flow, 'flow', inlet, units);
  const out = new HumidAirState();
  const loads = new ProcessLoads();
  const dew = inlet.Tdp === inlet.Tdp ? inlet.Tdp : T_MIN;
  const byADP = a.ADP !== undefined || a.bypassFactor !== undefined;
  const byState = a.T2 !== undefined || a.RH2 !== undefined;
  if (byADP === byState) throw new InvalidInputError('input.invalid', 'input', 'humidAir.coolingCoil needs either { ADP, bypassFactor } or { T2, RH2 } (and optionally Tcondensate)');
  let s: number;
  if (byADP) {
    const ADP = readTemperature(a.ADP as QuantityLike<'temperature'>, 'ADP', { min: T_MIN, max: dew, scope: `a cooling coil on air with dew point ${units.describe(dew, 'temperature', 'K')} (an ADP above it would add water)` }, units);
    const BF = readBypassFactor(a.bypassFactor);
    const Tc = a.Tcondensate === undefined ? ADP : readTemperature(a.Tcondensate as QuantityLike<'temperature'>, 'Tcondensate', LIQUID_WATER, units);
    if (!(Tc >= LIQUID_WATER.min)) throw rangeError('ADP', ADP, 'temperature', { ...LIQUID_WATER, scope: `${LIQUID_WATER.scope}, for the condensate at the ADP (give Tcondensate)` }, units);
    s = coolingCoilBypass(inlet, mda, ADP, BF, Tc, true, out, loads);
    if (!ok(s)) fail(s, 'the cooling coil', `${describeInlet(inlet, units)}, ADP = ${units.describe(ADP, 'temperature', 'K')}, bypassFactor = ${BF}`, () => rangeError('ADP', ADP, 'temperature', { min: T_MIN, max: dew, scope: 'a cooling coil on this air' }, units));
  } else {
    const T2 = readTemperature(a.T2 as QuantityLike<'temperature'>, 'T2', { min: T_MIN, max: inlet.T, scope: `a cooling coil on air at ${units.describe(inlet.T, 'temperature', 'K')} (the leaving air is not warmer)` }, units);
    if (a.RH2 === undefined) throw new InvalidInputError('input.invalid', 'RH2', 'humidAir.coolingCoil with T2 needs RH2 (the leaving relative humidity)');
    const RH2 = readRelativeHumidity(a.RH2, 'RH2');
    const maxRH = Math.min(1, inlet.pw / waterSaturationPressure(T2));
    if (RH2 > maxRH) throw relativeHumidityError('RH2', RH2, 0, maxRH, `air leaving a cooling coil at ${units.describe(T2, 'temperature', 'K')} with no more water than the entering ${units.describe(inlet.W, 'humidityRatio', 'kg/kg')}`, typeof a.RH2 === 'string');
    const Tc = a.Tcondensate === undefined ? T2 : readTemperature(a.Tcondensate as QuantityLike<'temperature'>, 'Tcondensate', LIQUID_WATER, units);
    if (!(Tc >= LIQUID_WATER.min)) throw rangeError('T2', T2, 'temperature', { ...LIQUID_WATER, scope: `${LIQUID_WATER.scope}, for the condensate at T2 (give Tcondensate)` }, units);
    s = coolingCoilToState(inlet, mda, T2, RH2, Tc, true, out, loads);
    if (!ok(s)) fail(s, 'the cooling coil', `${describeInlet(inlet, units)}, T2 = ${units.describe(T2, 'temperature', 'K')}, RH2 = ${RH2}`, () => relativeHumidityError('RH2', RH2, 0, maxRH, 'air leaving the coil', false));
  }
  return loadsResult(out, loads, mda, a.inlet.pressureFrom, true);
}

function readBypassFactor(input: unknown): number {
  if (typeof input !== 'number' || !Number.isFinite(input)) {
    throw new InvalidInputError(typeof input === 'number' ? 'input.not-finite' : 'input.invalid', 'bypassFactor', `bypassFactor must be a finite number, 0 ≤ BF < 1 (1 − the coil's contact factor); got ${describeValue(input)}`);
  }
  if (!(input >= 0 && input < 1)) {
    throw new OutOfRangeError({ quantity: 'bypassFactor', value: input, min: 0, max: 1, unit: '1', scope: 'a bypass factor (0 ≤ BF < 1)' }, `bypassFactor = ${input} is outside 0 ≤ BF < 1 (BF = 1 would be no coil at all)`);
  }
  return input;
}

/** Humidifier targets: a leaving humidity ratio `W2` or relative humidity `RH2` (evaporative also `T2`). */
interface TargetInput {
  readonly W2?: HumidityRatioInput | string;
  readonly RH2?: RelativeHumidityInput | string;
  readonly T2?: QuantityLike<'temperature'> | string;
}

interface Target {
  readonly code: number;
  readonly value: number;
  readonly name: 'W2' | 'RH2' | 'T2';
  readonly percent: boolean;
}

function readTarget(input: TargetInput, allowT: boolean, units: CallUnits): Target {
  const given = [input.W2 !== undefined, input.RH2 !== undefined, allowT && input.T2 !== undefined].filter(Boolean).length;
  if (given !== 1 || (!allowT && input.T2 !== undefined)) throw new InvalidInputError('input.invalid', 'target', `give exactly one target: W2 or RH2${allowT ? ' or T2' : ''}`);
  if (input.W2 !== undefined) return { code: TARGET.W, value: readHumidityRatio(input.W2, 'W2', units), name: 'W2', percent: false };
  if (input.RH2 !== undefined) return { code: TARGET.RH, value: readRelativeHumidity(input.RH2, 'RH2'), name: 'RH2', percent: typeof input.RH2 === 'string' };
  return { code: TARGET.T, value: readTemperature(input.T2 as QuantityLike<'temperature'>, 'T2', T_BOUNDS, units), name: 'T2', percent: false };
}

/** The range error for a humidifier target: from the entering air to saturation on the humidifier's line. */
function targetError(target: Target, inlet: HumidAirState, saturated: HumidAirState | undefined, units: CallUnits, what: string): OutOfRangeError {
  const scope = `the ${what} on this air (from the entering state to saturation along the humidifier's line)`;
  if (target.name === 'RH2') return relativeHumidityError('RH2', target.value, inlet.RH, 1, scope, target.percent);
  if (target.name === 'W2') return rangeError('W2', target.value, 'humidityRatio', { min: inlet.W, max: saturated?.W ?? inlet.W, scope }, units);
  return rangeError('T2', target.value, 'temperature', { min: saturated?.T ?? inlet.T, max: inlet.T, scope }, units);
}

/** Arguments of {@link steamHumidifier}. */
export interface SteamHumidifierInput {
  readonly inlet: HumidAirResult;
  readonly flow: AirFlowInput;
  /** Leaving humidity ratio (give this or RH2). */
  readonly W2?: HumidityRatioInput;
  /** Leaving relative humidity (give this or W2). */
  readonly RH2?: RelativeHumidityInput;
  /** The steam's state (vapour; IAPWS-IF97 region 2). */
  readonly steam: { readonly p: QuantityLike<'pressure'>; readonly T: QuantityLike<'temperature'> };
}

/** {@link SteamHumidifierInput} with run-time strings allowed. */
export interface SteamHumidifierInputLoose extends TargetInput {
  readonly inlet: HumidAirResult;
  readonly flow: AirFlowInput | string;
  readonly steam: { readonly p: QuantityLike<'pressure'> | string; readonly T: QuantityLike<'temperature'> | string };
}

/**
 * Steam humidification to a leaving W2 or RH2: adiabatic, h2 = h1 + (W2 − W1) h_steam with the
 * steam enthalpy from IAPWS-IF97 region 2 at its given state. The air warms slightly.
 * @throws {@link OutOfRangeError} steam that is not vapour (below its saturation temperature) or
 *   outside 10 MPa and 800 °C; a target below the entering humidity or beyond saturation
 * @example
 * ```ts
 * const winter = humidAir.state({ T: '20 °C', RH: 0.2 });
 * humidAir.steamHumidifier({ inlet: winter, flow: '2 kg/s', RH2: '45 %', steam: { p: '1 atm', T: '110 °C' } }).water?.flow.in('kg/h');   //=> 28.04...
 * ```
 */
export function steamHumidifier<const I extends SteamHumidifierInputLoose>(input: I & Checked<I, 'flow' | 'W2' | 'RH2' | 'steam', 'inlet'>): ProcessResult {
  const a = input as SteamHumidifierInputLoose;
  if (typeof a !== 'object' || a === null) throw new InvalidInputError('input.invalid', 'input', `humidAir.steamHumidifier needs { inlet, flow, steam, W2 or RH2 }; got ${describeValue(a)}`);
  const units = new CallUnits();
  const inlet = coreOf(a.inlet, 'inlet');
  const mda = readFlow(a.flow, 'flow', inlet, units);
  const target = readTarget(a, false, units);
  if (typeof a.steam !== 'object' || a.steam === null) throw new InvalidInputError('input.invalid', 'steam', `steam must be { p, T } (its pressure and temperature); got ${describeValue(a.steam)}`);
  const ps = readAbsolutePressure(a.steam.p as QuantityLike<'pressure'>, 'steam.p', { max: 10e6, scope: 'steam for a humidifier (IAPWS-IF97 region 2, at most 10 MPa)' }, units);
  const Tsat = ps >= P_WATER_AT_ICE ? saturationTemperature(ps) : 273.15;
  const Ts = readTemperature(a.steam.T as QuantityLike<'temperature'>, 'steam.T', { min: Tsat, max: 1073.15, scope: `steam at ${units.describe(ps, 'pressure', 'Pa')} (vapour: from its saturation temperature to 800 °C)` }, units);
  const out = new HumidAirState();
  const loads = new ProcessLoads();
  const s = coreSteamHumidifier(inlet, mda, target.code, target.value, ps, Ts, true, out, loads);
  if (!ok(s)) {
    fail(s, 'the steam humidifier', `${describeInlet(inlet, units)}, ${target.name} = ${target.value}`, () => {
      const sat = new HumidAirState();
      const c = coreSteamHumidifier(inlet, mda, TARGET.RH, 1, ps, Ts, false, sat, new ProcessLoads());
      return targetError(target, inlet, ok(c) ? sat : undefined, units, 'steam humidifier');
    });
  }
  return loadsResult(out, loads, mda, a.inlet.pressureFrom, true);
}

/** Arguments of {@link evaporativeHumidifier}. */
export interface EvaporativeHumidifierInput {
  readonly inlet: HumidAirResult;
  readonly flow: AirFlowInput;
  /** Leaving humidity ratio (give one of W2, RH2, T2). */
  readonly W2?: HumidityRatioInput;
  /** Leaving relative humidity. */
  readonly RH2?: RelativeHumidityInput;
  /** Leaving dry-bulb. */
  readonly T2?: QuantityLike<'temperature'>;
  /** Temperature of the water evaporated; default the entering wet-bulb (recirculated spray), at least 0 °C. */
  readonly Twater?: QuantityLike<'temperature'>;
}

/** {@link EvaporativeHumidifierInput} with run-time strings allowed. */
export interface EvaporativeHumidifierInputLoose extends TargetInput {
  readonly inlet: HumidAirResult;
  readonly flow: AirFlowInput | string;
  readonly Twater?: QuantityLike<'temperature'> | string;
}

/**
 * Adiabatic (evaporative) humidification to a leaving W2, RH2 or dry-bulb T2: the air cools along
 * h2 = h1 + (W2 − W1) hw, close to its wet-bulb line.
 * @throws {@link OutOfRangeError} a target below the entering humidity or beyond saturation; water
 *   outside 0–100 °C (an entering wet-bulb below 0 °C needs `Twater`)
 * @example
 * ```ts
 * const hot = humidAir.state({ T: '35 °C', RH: 0.2 });
 * humidAir.evaporativeHumidifier({ inlet: hot, flow: '1 kg/s', T2: '25 °C' }).leaving.RH;   //=> 0.561...
 * ```
 */
export function evaporativeHumidifier<const I extends EvaporativeHumidifierInputLoose>(input: I & Checked<I, 'flow' | 'W2' | 'RH2' | 'T2' | 'Twater', 'inlet'>): ProcessResult {
  const a = input as EvaporativeHumidifierInputLoose;
  if (typeof a !== 'object' || a === null) throw new InvalidInputError('input.invalid', 'input', `humidAir.evaporativeHumidifier needs { inlet, flow, W2, RH2 or T2 }; got ${describeValue(a)}`);
  const units = new CallUnits();
  const inlet = coreOf(a.inlet, 'inlet');
  const mda = readFlow(a.flow, 'flow', inlet, units);
  const target = readTarget(a, true, units);
  const Tw = a.Twater === undefined ? inlet.Twb : readTemperature(a.Twater as QuantityLike<'temperature'>, 'Twater', LIQUID_WATER, units);
  if (!(Tw >= LIQUID_WATER.min && Tw <= LIQUID_WATER.max)) throw rangeError('Twb', Tw, 'temperature', { ...LIQUID_WATER, scope: `${LIQUID_WATER.scope}, for spray water at the entering wet-bulb (give Twater)` }, units);
  const out = new HumidAirState();
  const loads = new ProcessLoads();
  const s = coreEvaporativeHumidifier(inlet, mda, target.code, target.value, Tw, true, out, loads);
  if (!ok(s)) {
    fail(s, 'the evaporative humidifier', `${describeInlet(inlet, units)}, ${target.name} = ${target.value}`, () => {
      const sat = new HumidAirState();
      const c = coreEvaporativeHumidifier(inlet, mda, TARGET.RH, 1, Tw, false, sat, new ProcessLoads());
      return targetError(target, inlet, ok(c) ? sat : undefined, units, 'evaporative humidifier');
    });
  }
  return loadsResult(out, loads, mda, a.inlet.pressureFrom, true);
}
