/**
 * The humid-air facade: `humidAir.state({ T, RH, p })`. Quantities in, quantities out; the SI core
 * in ./core does the work; the facade kit reads the inputs (in the caller's units), maps core
 * statuses to typed errors whose bounds are numbers in the caller's units, and builds the results.
 *
 * @module
 */
import { CallUnits } from '../core/call-units.js';
import { throwForStatus } from '../core/fail.js';
import { rangeError, readAbsolutePressure, readInput, readPair, readTemperature, type Bounds } from '../core/read.js';
import { optionalQuantity, resultQuantity } from '../core/result.js';
import { Status } from '../core/status.js';
import { formatNumber, InvalidInputError, ResultError, type OutOfRangeError } from '../errors.js';
import type { Dimension } from '../units/dimensions.js';
import { Quantity, type QuantityLike } from '../units/quantity.js';
import { ALTITUDE_MAX, ALTITUDE_MIN, standardAtmospherePressure } from './core/altitude.js';
import { CP_DRY_AIR, humidityRatioFromVaporPressure, humidityRatioFromWetBulb, moistAirEnthalpy, saturatorConstant, saturatorWaterEnthalpy, vaporPressureFromHumidityRatio } from './core/relations.js';
import { saturationTemperatureAt, waterSaturationPressure } from './core/saturation.js';
import { HumidAirState, humidAirState as coreState, P_MAX, PAIR, REASON, saturationHumidityRatioAt, T_MAX, T_MIN } from './core/state.js';
import { readHumidityRatio, readRelativeHumidity, relativeHumidityError, type Checked, type HumidityRatioInput, type RelativeHumidityInput } from './inputs.js';

/** The properties a state can be given by. Give exactly two, plus optionally `p` or `altitude`. */
export interface HumidAirInputs {
  /** Dry-bulb temperature. */
  readonly T?: QuantityLike<'temperature'>;
  /** Thermodynamic wet-bulb temperature (not a psychrometer reading; see the guide). */
  readonly Twb?: QuantityLike<'temperature'>;
  /** Dew-point temperature (frost point below 0 °C). */
  readonly Tdp?: QuantityLike<'temperature'>;
  /** Relative humidity, 0–1 or `'50 %'` (over ice below 0 °C). */
  readonly RH?: RelativeHumidityInput;
  /** Humidity ratio: a number in kg water per kg dry air, or `'10 g/kg'`, `'70 gr/lbm'`, a quantity. */
  readonly W?: HumidityRatioInput;
  /** Enthalpy per kg of dry air (zero for dry air at 0 °C). */
  readonly h?: QuantityLike<'specificEnergy'>;
}

/** The total pressure beside the two properties: `p` or `altitude`, not both. */
export interface HumidAirPressure {
  /** Total (barometric) pressure, absolute. Default 101.325 kPa (or from `altitude`). */
  readonly p?: QuantityLike<'pressure'>;
  /** Altitude for the standard-atmosphere pressure (ASHRAE Fundamentals ch. 1, Eq. 3), −5000 m … 11 000 m. */
  readonly altitude?: QuantityLike<'length'>;
}

/** Arguments of {@link humidAirState}. */
export type HumidAirStateInput = HumidAirInputs & HumidAirPressure;

/**
 * {@link HumidAirStateInput} with plain `string`s allowed in every field (unit text known only at
 * run time, checked then). Literal text is still checked by the compiler.
 */
export type HumidAirInputsLoose = { readonly [K in keyof HumidAirStateInput]?: HumidAirStateInput[K] | string };

/** The keys {@link humidAirState} takes. */
export type HumidAirStateKey = keyof HumidAirStateInput;

/** A psychrometric state. Specific quantities (h, v, cp) are per kg of dry air. */
export interface HumidAirResult {
  /** Total pressure. */
  readonly p: Quantity<'pressure'>;
  /** Where p came from. */
  readonly pressureFrom: 'given' | 'altitude' | 'default 101.325 kPa';
  /** Dry-bulb temperature. */
  readonly T: Quantity<'temperature'>;
  /** Thermodynamic wet-bulb temperature; `undefined` when it lies below −100 °C. */
  readonly Twb: Quantity<'temperature'> | undefined;
  /** Dew point (frost point below 0 °C); `undefined` for dry air (W = 0) or below −100 °C. */
  readonly Tdp: Quantity<'temperature'> | undefined;
  /** Relative humidity pw/pws, 0–1 (over ice below 0 °C). */
  readonly RH: number;
  /** Humidity ratio, per kg of dry air: `.in('g/kg')`, `.in('gr/lbm')`; `.si` in kg/kg. */
  readonly W: Quantity<'humidityRatio'>;
  /** Enthalpy per kg of dry air (0 for dry air at 0 °C). */
  readonly h: Quantity<'specificEnergy'>;
  /** Specific volume per kg of dry air. */
  readonly v: Quantity<'specificVolume'>;
  /** Density of the moist air itself: (1 + W)/v. */
  readonly rho: Quantity<'density'>;
  /** Partial pressure of water vapour. */
  readonly pw: Quantity<'pressure'>;
  /** Saturation pressure of pure water at T: over liquid from 0 °C (IF97), over ice below (IAPWS R14-08). */
  readonly pws: Quantity<'pressure'>;
  /** Saturation humidity ratio at (p, T); `undefined` at or above the boiling point at p. */
  readonly Ws: Quantity<'humidityRatio'> | undefined;
  /** Degree of saturation W/Ws; `undefined` where Ws is. */
  readonly saturationDegree: number | undefined;
  /** Heat capacity at constant pressure per kg of dry air, 1006 + 1860 W J/(kg·K). */
  readonly cp: Quantity<'specificHeat'>;
}

/** The model's name in messages. */
export const SCOPE = 'humid air (ASHRAE ideal mixture, −100 °C to 200 °C, p ≤ 1 MPa)';
const T_BOUNDS: Bounds = { min: T_MIN, max: T_MAX, scope: SCOPE };
const P_BOUNDS = { max: P_MAX, scope: SCOPE };
const ALTITUDE_BOUNDS: Bounds = { min: ALTITUDE_MIN, max: ALTITUDE_MAX, scope: 'the standard-atmosphere relation (ASHRAE Fundamentals ch. 1, Eq. 3)' };
const STANDARD_PRESSURE = 101325;
const NAME = 'humidAir.state';

const PAIRS: readonly (readonly string[])[] = [
  ['T', 'RH'], ['T', 'W'], ['T', 'h'], ['T', 'Tdp'], ['T', 'Twb'],
  ['RH', 'W'], ['RH', 'h'], ['RH', 'Tdp'], ['RH', 'Twb'],
  ['W', 'h'], ['W', 'Twb'], ['h', 'Tdp'], ['h', 'Twb'], ['Tdp', 'Twb'],
];
const PAIR_CODES: Readonly<Record<string, number>> = {
  'T,RH': PAIR.T_RH, 'T,W': PAIR.T_W, 'T,h': PAIR.T_h, 'T,Tdp': PAIR.T_Tdp, 'T,Twb': PAIR.T_Twb,
  'RH,W': PAIR.RH_W, 'RH,h': PAIR.RH_h, 'RH,Tdp': PAIR.RH_Tdp, 'RH,Twb': PAIR.RH_Twb,
  'W,h': PAIR.W_h, 'W,Twb': PAIR.W_Twb, 'h,Tdp': PAIR.h_Tdp, 'h,Twb': PAIR.h_Twb, 'Tdp,Twb': PAIR.Tdp_Twb,
};
const PROPERTY_KEYS = ['T', 'Twb', 'Tdp', 'RH', 'W', 'h'];

/** The total pressure of a call, in Pa, and where it came from. */
export interface TotalPressure {
  readonly p: number;
  readonly from: HumidAirResult['pressureFrom'];
}

/** Reads the total pressure from `p`, `altitude` or the default; throws for a bad one. */
export function readTotalPressure(input: { readonly p?: unknown; readonly altitude?: unknown }, units: CallUnits): TotalPressure {
  if (input.p !== undefined && input.altitude !== undefined) {
    throw new InvalidInputError('input.invalid', 'p', `${NAME}: give either p or altitude, not both (altitude stands for the standard-atmosphere pressure there)`);
  }
  if (input.p !== undefined) return { p: readAbsolutePressure(input.p as QuantityLike<'pressure'>, 'p', P_BOUNDS, units), from: 'given' };
  if (input.altitude !== undefined) {
    const Z = readInput(input.altitude as QuantityLike<'length'>, 'length', 'altitude', ALTITUDE_BOUNDS, units);
    return { p: standardAtmospherePressure(Z), from: 'altitude' };
  }
  return { p: STANDARD_PRESSURE, from: 'default 101.325 kPa' };
}

/** A property of a state read in SI, with the caller's units noted. */
function readProperty(key: string, value: unknown, units: CallUnits): number {
  switch (key) {
    case 'RH':
      return readRelativeHumidity(value, 'RH');
    case 'W':
      return readHumidityRatio(value, 'W', units);
    case 'h':
      return readInput(value as QuantityLike<'specificEnergy'>, 'specificEnergy', 'h', undefined, units);
    default:
      return readTemperature(value as QuantityLike<'temperature'>, key, T_BOUNDS, units);
  }
}

/** The two properties of a state: the pair's code and its SI inputs in the pair's order. */
export interface StatePair {
  readonly key: string;
  readonly pair: number;
  readonly a: number;
  readonly b: number;
  /** RH was written as percent text (for messages). */
  readonly percent: boolean;
}

/**
 * Reads exactly two properties from `input` (ignoring `p` and `altitude`): refuses the dependent
 * pair W with Tdp (saying why), over- and under-determined input (naming what was given and the
 * pairs accepted) and unknown keys.
 */
export function readStatePair(input: unknown, units: CallUnits, fn = NAME): StatePair {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) readPair(input, fn, PAIRS); // throws
  const all = input as Record<string, unknown>;
  const props: Record<string, unknown> = {};
  for (const k of Object.keys(all)) if (k !== 'p' && k !== 'altitude') props[k] = all[k];
  const given = Object.keys(props).filter((k) => props[k] !== undefined);
  if (given.length === 2 && given.includes('W') && given.includes('Tdp')) {
    throw new InvalidInputError(
      'input.invalid',
      'input',
      `${fn} got { W, Tdp }: they do not fix a state, since each fixes the vapour pressure (W = 0.621945 pw/(p − pw), pw = pws(Tdp)) and neither fixes the dry-bulb; give W or Tdp with T, RH, h or Twb`,
    );
  }
  const key = readPair(props, fn, PAIRS);
  const [k1, k2] = key.split(',') as [string, string];
  return { key, pair: PAIR_CODES[key]!, a: readProperty(k1, props[k1], units), b: readProperty(k2, props[k2], units), percent: typeof props.RH === 'string' };
}

const DIMENSION_OF: Readonly<Record<string, Dimension>> = { T: 'temperature', Twb: 'temperature', Tdp: 'temperature', W: 'humidityRatio', h: 'specificEnergy', RH: 'dimensionless' };
const SI_UNIT_OF: Readonly<Record<string, string>> = { T: 'K', Twb: 'K', Tdp: 'K', W: 'kg/kg', h: 'J/kg', RH: '' };

/** `T = 86 °F (303.15 K)` in the caller's units. */
function show(key: string, si: number, units: CallUnits): string {
  if (key === 'RH') return `RH = ${formatNumber(si)}`;
  return `${key} = ${units.describe(si, DIMENSION_OF[key]!, SI_UNIT_OF[key]!)}`;
}

/** The boiling point of water at p (pws = p), K. */
function boilingPoint(p: number): number {
  return saturationTemperatureAt(p, 0, 1e4);
}

/** Ws(p, T), or Infinity where saturated air does not exist (above the boiling point at p). */
function saturationW(p: number, T: number): number {
  const W = saturationHumidityRatioAt(p, T);
  return W < 0 ? Infinity : W;
}

/** The dew point of humidity ratio W at p, or T_MIN when it lies below the range. */
function dewPointOf(p: number, W: number): number {
  const T = W > 0 ? saturationTemperatureAt(vaporPressureFromHumidityRatio(p, W), 0, 1e4) : -1;
  return T < T_MIN ? T_MIN : T;
}

/** A probe state from the core (for the bounds of an error), or undefined when it has none. */
function probe(pair: number, a: number, b: number, p: number): HumidAirState | undefined {
  const st = new HumidAirState();
  const s = coreState(pair, a, b, p, true, st);
  return s === Status.ok || s === Status.undefinedProperty ? st : undefined;
}

/**
 * The range error for a state that has no answer: it names one input of the pair and its valid
 * range given the other input and p, as numbers in the caller's units (SI beside them).
 */
function stateRangeError(sp: StatePair, p: number, units: CallUnits): OutOfRangeError {
  const { a, b } = sp;
  const at = (key: string, si: number) => `${show(key, si, units)} and p = ${units.describe(p, 'pressure', 'Pa')}`;
  // which side of the range is saturation: passing it means fog or frost
  const fogAbove = 'above';
  const fogBelow = 'below';
  const err = (key: string, value: number, min: number, max: number, scope: string, fog?: 'above' | 'below', minExclusive?: boolean): OutOfRangeError => {
    if (key === 'RH') return relativeHumidityError('RH', value, min, max, scope, sp.percent, minExclusive);
    const foggy = (fog === 'above' && value > max) || (fog === 'below' && value < min);
    const hint = foggy ? `; ${fog === 'above' ? 'more water' : 'less enthalpy'} than that is fog or frost, not a moist-air state` : undefined;
    return rangeError(key, value, DIMENSION_OF[key]!, { min, max, scope, ...(hint === undefined ? {} : { hint }), ...(minExclusive === true ? { minExclusive } : {}) }, units);
  };
  const Tb = boilingPoint(p);
  const aboveBoiling = (key: string, T: number, upper: number) => err(key, T, T_MIN, Math.min(upper, Tb), `a saturated state at p = ${units.describe(p, 'pressure', 'Pa')} (at most the boiling point there, and at most the dry-bulb)`);
  switch (sp.pair) {
    case PAIR.T_RH:
      return err('RH', b, 0, Math.min(1, p / waterSaturationPressure(a)), `relative humidity at ${at('T', a)} (the vapour pressure must stay below p)`);
    case PAIR.T_W:
      return err('W', b, 0, saturationW(p, a), `moist air at ${at('T', a)} (saturation)`, fogAbove);
    case PAIR.T_h: {
      const Ws = saturationW(p, a);
      return err('h', b, moistAirEnthalpy(a, 0), Ws === Infinity ? Infinity : moistAirEnthalpy(a, Ws), `moist air at ${at('T', a)} (dry air to saturated air)`, fogAbove);
    }
    case PAIR.T_Tdp:
      return err('Tdp', b, T_MIN, Math.min(a, Tb), `the dew point at ${at('T', a)} (at most the dry-bulb and the boiling point)`);
    case PAIR.T_Twb: {
      const dry = probe(PAIR.T_W, a, 0, p);
      return err('Twb', b, dry !== undefined && dry.Twb === dry.Twb ? dry.Twb : T_MIN, Math.min(a, Tb), `the wet-bulb at ${at('T', a)} (from dry air's wet-bulb to the dry-bulb)`);
    }
    case PAIR.RH_W:
      if (a === 0) return err('RH', a, 0, 1, `relative humidity with ${show('W', b, units)} (water present)`, undefined, true);
      return err('W', b, humidityAt(p, T_MIN, a), humidityAt(p, T_MAX, a), `moist air at ${at('RH', a)} and T from −100 °C to 200 °C`);
    case PAIR.RH_h: {
      const lo = moistAirEnthalpy(T_MIN, humidityAt(p, T_MIN, a));
      const hi = moistAirEnthalpy(T_MAX, humidityAt(p, T_MAX, a));
      return err('h', b, lo, hi, `moist air at ${at('RH', a)} and T from −100 °C to 200 °C`);
    }
    case PAIR.RH_Tdp: {
      if (b > Tb) return aboveBoiling('Tdp', b, T_MAX);
      return err('RH', a, Math.min(1, waterSaturationPressure(b) / waterSaturationPressure(T_MAX)), 1, `relative humidity with ${show('Tdp', b, units)} (the dry-bulb must stay at most 200 °C)`);
    }
    case PAIR.RH_Twb: {
      if (b >= Tb) return aboveBoiling('Twb', b, T_MAX);
      const K = saturatorConstant(p, b);
      const top = Math.min(T_MAX, Math.max(b, 273.15 + K / CP_DRY_AIR));
      const st = probe(PAIR.T_Twb, top, b, p);
      return err('RH', a, st === undefined ? 0 : st.RH, 1, `relative humidity with ${show('Twb', b, units)} (the dry-bulb must stay at most 200 °C)`);
    }
    case PAIR.W_h:
      return err('h', b, moistAirEnthalpy(dewPointOf(p, a), a), moistAirEnthalpy(T_MAX, a), `moist air with ${show('W', a, units)} (from its dew point to 200 °C)`, fogBelow);
    case PAIR.W_Twb: {
      if (b >= Tb) return aboveBoiling('Twb', b, T_MAX);
      const lo = humidityRatioFromWetBulb(p, T_MAX, b);
      return err('W', a, lo > 0 ? lo : 0, saturationW(p, b), `moist air with ${show('Twb', b, units)} (from the dry-bulb 200 °C to saturation)`, fogAbove);
    }
    case PAIR.h_Tdp: {
      if (b >= Tb) return aboveBoiling('Tdp', b, T_MAX);
      const W = saturationW(p, b);
      return err('h', a, moistAirEnthalpy(b, W), moistAirEnthalpy(T_MAX, W), `moist air with ${show('Tdp', b, units)} (from saturation to 200 °C)`, fogBelow);
    }
    case PAIR.h_Twb: {
      if (b >= Tb) return aboveBoiling('Twb', b, T_MAX);
      const K = saturatorConstant(p, b);
      const hw = saturatorWaterEnthalpy(b);
      const Ws = saturationW(p, b);
      const Wtop = humidityRatioFromWetBulb(p, T_MAX, b);
      const hDry = Wtop > 0 ? K + Wtop * hw : K; // W = 0, or the dry-bulb 200 °C
      const hSat = moistAirEnthalpy(b, Ws);
      return err('h', a, Math.min(hDry, hSat), Math.max(hDry, hSat), `moist air with ${show('Twb', b, units)} (from dry air to saturation)`, hSat < hDry ? fogBelow : fogAbove);
    }
    default: {
      // Tdp, Twb
      if (b >= Tb) return aboveBoiling('Twb', b, T_MAX);
      const st = probe(PAIR.T_Twb, T_MAX, b, p);
      const lo = st !== undefined && st.Tdp === st.Tdp ? st.Tdp : T_MIN;
      return err('Tdp', a, lo, b, `the dew point with ${show('Twb', b, units)} (at most the wet-bulb; the dry-bulb at most 200 °C)`);
    }
  }
}

/** W at (p, T, RH), Infinity where it does not exist. */
function humidityAt(p: number, T: number, RH: number): number {
  const pw = RH * waterSaturationPressure(T);
  return pw < p ? humidityRatioFromVaporPressure(p, pw) : Infinity;
}

/** Throws the typed error for a failed core state. */
export function throwForState(status: number, reason: number, sp: StatePair, p: number, units: CallUnits, fn = NAME): never {
  const [k1, k2] = sp.key.split(',') as [string, string];
  const inputs = `${show(k1, sp.a, units)}, ${show(k2, sp.b, units)}, p = ${units.describe(p, 'pressure', 'Pa')}`;
  if (reason === REASON.dependentPair) {
    throw new InvalidInputError('input.invalid', 'input', `${fn}: ${inputs} do not fix a state: at a wet-bulb of exactly 0 °C over liquid water the added water carries no enthalpy (hw = 0), so every state on the line h = h(0 °C, Ws) has that wet-bulb; give another pair`);
  }
  return throwForStatus(status, { what: `the humid-air state from ${k1} and ${k2}`, inputs, range: () => stateRangeError(sp, p, units), parameter: 'input' });
}

/** A finite plain number of a result (a fraction), or a ResultError. */
function finite(x: number, property: string): number {
  if (!Number.isFinite(x)) throw new ResultError(property, `the model produced a non-finite ${property} (${x}); this is a fault of the model at this state, not of the input`);
  return x;
}

/** Wraps a core state as a result. */
export function toResult(st: HumidAirState, from: HumidAirResult['pressureFrom']): HumidAirResult {
  return {
    p: resultQuantity(st.p, 'pressure', 'p'),
    pressureFrom: from,
    T: resultQuantity(st.T, 'temperature', 'T'),
    Twb: optionalQuantity(st.Twb, 'temperature', 'Twb'),
    Tdp: optionalQuantity(st.Tdp, 'temperature', 'Tdp'),
    RH: finite(st.RH, 'RH'),
    W: resultQuantity(st.W, 'humidityRatio', 'W'),
    h: resultQuantity(st.h, 'specificEnergy', 'h'),
    v: resultQuantity(st.v, 'specificVolume', 'v'),
    rho: resultQuantity(st.rho, 'density', 'rho'),
    pw: resultQuantity(st.pw, 'pressure', 'pw'),
    pws: resultQuantity(st.pws, 'pressure', 'pws'),
    Ws: optionalQuantity(st.Ws, 'humidityRatio', 'Ws'),
    saturationDegree: Number.isNaN(st.mu) ? undefined : finite(st.mu, 'saturationDegree'),
    cp: resultQuantity(st.cp, 'specificHeat', 'cp'),
  };
}

/**
 * A moist-air state from the total pressure and any two of T, Twb, Tdp, RH, W, h.
 *
 * Model: the ideal-mixture relations of the ASHRAE Handbook—Fundamentals (SI) ch. 1, with the
 * saturation pressure of pure water over liquid from IAPWS-IF97 (from 0 °C) and over ice from IAPWS
 * R14-08(2011) (below 0 °C; RH, Ws and the frost point are over ice there). No enhancement factor:
 * saturated humidity ratios lie up to about 0.6 % below the Handbook's real-gas table (see the
 * guide). Range −100 °C to 200 °C (dry-bulb, dew point and wet-bulb), 0 < p ≤ 1 MPa. Pressure: `p`,
 * or `altitude` (standard atmosphere), default 101.325 kPa (stated in `pressureFrom`).
 *
 * Every field takes a quantity, unit text (checked by the compiler when literal) or a run-time
 * `string` (checked here); `RH` a fraction or `'50 %'`; `W` a number in kg/kg or `'10 g/kg'`,
 * `'70 gr/lbm'`.
 *
 * @throws {@link OutOfRangeError} an input outside the range, or a state with no answer (a
 *   supersaturated state, Twb or Tdp above T, a vapour pressure reaching p): the error names one
 *   input and its valid range given the other, in the caller's units with SI beside them
 * @throws {@link InvalidInputError} not exactly two properties (over- or under-determined), unknown
 *   keys, the dependent pair W with Tdp, NaN
 * @throws {@link DimensionError} a quantity of the wrong dimension
 * @example
 * ```ts
 * const s = humidAir.state({ T: '30 °C', RH: 0.5 });
 * s.W.in('g/kg');           //=> 13.3123...
 * s.Twb?.in('°C');          //=> 22.0...
 * s.pressureFrom;           //=> 'default 101.325 kPa'
 * humidAir.state({ T: '86 °F', RH: '50 %', altitude: '1500 m' }).W.in('gr/lbm');   //=> 112.1...
 * humidAir.state({ T: '68 °F', W: '200 gr/lbm' });
 * // throws OutOfRangeError: W = 200 gr/lbm (0.028571429 kg/kg) is above the upper limit of moist air at T = 68 °F (293.15 K) …
 * ```
 */
export function humidAirState<const P extends HumidAirInputsLoose>(input: P & Checked<P, HumidAirStateKey>): HumidAirResult {
  const units = new CallUnits();
  const sp = readStatePair(input, units);
  const { p, from } = readTotalPressure(input as HumidAirPressure, units);
  const st = new HumidAirState();
  const status = coreState(sp.pair, sp.a, sp.b, p, true, st);
  if (status !== Status.ok && status !== Status.undefinedProperty) throwForState(status, st.reason, sp, p, units);
  return toResult(st, from);
}

/**
 * Standard-atmosphere pressure at an altitude: ASHRAE Fundamentals ch. 1, Eq. 3, −5000 m … 11 000 m.
 * @example
 * ```ts
 * pressureAtAltitude('1000 m').in('kPa');   //=> 89.874... (Table 1: 89.875)
 * pressureAtAltitude('12000 m');            // throws OutOfRangeError: altitude = 12000 m is above …
 * ```
 */
export function pressureAtAltitude<const I extends QuantityLike<'length'> | string>(altitude: I & Checked<{ altitude: I }, 'altitude'>['altitude']): Quantity<'pressure'> {
  const units = new CallUnits();
  return resultQuantity(readTotalPressure({ altitude }, units).p, 'pressure', 'p');
}
