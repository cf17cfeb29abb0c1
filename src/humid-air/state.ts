/**
 * The humid-air facade: `humidAir.state({ T, RH, p })` and friends. Quantities in, quantities out;
 * the SI core in ./core does the work.
 *
 * The humidity ratio W is a plain number in kg of water per kg of dry air (helpers convert g/kg and
 * grains per pound); relative humidity is a fraction 0–1 or text such as `'50 %'`.
 *
 * @module
 */
import { Status } from '../core/status.js';
import { ConvergenceError, InvalidInputError, OutOfRangeError } from '../errors.js';
import { Quantity, readQuantity, type QuantityLike } from '../units/quantity.js';
import { ALTITUDE_MAX, ALTITUDE_MIN, standardAtmospherePressure } from './core/altitude.js';
import { ENHANCED_P_MAX, ENHANCED_P_MIN, ENHANCED_T_MAX, ENHANCED_T_MIN, MODEL } from './core/saturation.js';
import { HumidAirState, humidAirState as coreState, P_MAX, PAIR, REASON, T_MAX, T_MIN } from './core/state.js';

/** `'enhanced'` (default): saturation pressure times Buck's (1981) enhancement factor; `'ideal'`: the ASHRAE ideal-mixture relations (f = 1). */
export type HumidAirModel = 'enhanced' | 'ideal';

/** Relative humidity: a fraction 0–1, or text in percent such as `'50 %'`. */
export type RelativeHumidityInput = number | `${number} %` | `${number}%`;

/** The properties a state can be given by. Give exactly two, plus optionally `p` or `altitude`. */
export interface HumidAirInputs {
  /** Dry-bulb temperature. */
  readonly T?: QuantityLike<'temperature'>;
  /** Thermodynamic wet-bulb temperature (not a psychrometer reading; see the guide). */
  readonly Twb?: QuantityLike<'temperature'>;
  /** Dew-point temperature (frost point below 0 °C). */
  readonly Tdp?: QuantityLike<'temperature'>;
  /** Relative humidity, 0–1 or `'50 %'`. */
  readonly RH?: RelativeHumidityInput;
  /** Humidity ratio, kg water per kg dry air (see {@link fromGramsPerKilogram}, {@link fromGrainsPerPound}). */
  readonly W?: number;
  /** Enthalpy per kg of dry air (zero for dry air at 0 °C). */
  readonly h?: QuantityLike<'specificEnergy'>;
}

/** Options beside the two properties. */
export interface HumidAirOptions {
  /** Total (barometric) pressure, absolute. Default 101.325 kPa (or from `altitude`). */
  readonly p?: QuantityLike<'pressure'>;
  /** Altitude for the standard-atmosphere pressure (ASHRAE Fundamentals ch. 1, Eq. 3), −5000 m … 11 000 m. */
  readonly altitude?: QuantityLike<'length'>;
  /** Model; default `'enhanced'`. */
  readonly model?: HumidAirModel;
}

/** Arguments of {@link humidAirState}. */
export type HumidAirStateInput = HumidAirInputs & HumidAirOptions;

/** A psychrometric state. Specific quantities (h, v, cp) are per kg of dry air. */
export interface HumidAirResult {
  /** Total pressure. */
  readonly p: Quantity<'pressure'>;
  /** Where p came from. */
  readonly pressureFrom: 'given' | 'altitude' | 'default 101.325 kPa';
  /** Dry-bulb temperature. */
  readonly T: Quantity<'temperature'>;
  /** Thermodynamic wet-bulb temperature; `undefined` when it lies below the model's range. */
  readonly Twb: Quantity<'temperature'> | undefined;
  /** Dew point (frost point below 0 °C); `undefined` for dry air (W = 0) or below the range. */
  readonly Tdp: Quantity<'temperature'> | undefined;
  /** Relative humidity pw/(f·pws), 0–1. */
  readonly RH: number;
  /** Humidity ratio, kg/kg dry air. */
  readonly W: number;
  /** Enthalpy per kg of dry air. */
  readonly h: Quantity<'specificEnergy'>;
  /** Specific volume per kg of dry air. */
  readonly v: Quantity<'specificVolume'>;
  /** Density of the moist air itself: (1 + W)/v. */
  readonly rho: Quantity<'density'>;
  /** Partial pressure of water vapour. */
  readonly pw: Quantity<'pressure'>;
  /** Saturation pressure of pure water at T: over liquid from 0 °C (IF97), over ice below (IAPWS R14-08). */
  readonly pws: Quantity<'pressure'>;
  /** Enhancement factor at (p, T): 1 in the ideal model. */
  readonly f: number;
  /** Saturation humidity ratio at (p, T); `undefined` at or above the boiling point at p. */
  readonly Ws: number | undefined;
  /** Degree of saturation W/Ws; `undefined` where Ws is. */
  readonly saturationDegree: number | undefined;
  /** Heat capacity at constant pressure per kg of dry air, 1006 + 1860 W J/(kg·K). */
  readonly cp: Quantity<'specificHeat'>;
  /** The model used. */
  readonly model: HumidAirModel;
}

const SCOPE_IDEAL = 'humid air (ASHRAE ideal mixture)';
const SCOPE_ENHANCED = "humid air, enhanced model (Buck 1981 enhancement factor; pass model: 'ideal' for −100 °C … 200 °C and up to 1 MPa)";
const KEYS = ['T', 'RH', 'W', 'h', 'Tdp', 'Twb'] as const;
type Key = (typeof KEYS)[number];
const PAIR_CODES: Record<string, number> = {
  'T,RH': PAIR.T_RH,
  'T,W': PAIR.T_W,
  'T,h': PAIR.T_h,
  'T,Tdp': PAIR.T_Tdp,
  'T,Twb': PAIR.T_Twb,
  'RH,W': PAIR.RH_W,
  'RH,h': PAIR.RH_h,
  'RH,Tdp': PAIR.RH_Tdp,
  'RH,Twb': PAIR.RH_Twb,
  'W,h': PAIR.W_h,
  'W,Tdp': PAIR.W_Tdp,
  'W,Twb': PAIR.W_Twb,
  'h,Tdp': PAIR.h_Tdp,
  'h,Twb': PAIR.h_Twb,
  'Tdp,Twb': PAIR.Tdp_Twb,
};

function fmt(x: number): string {
  return String(Number(x.toPrecision(8)));
}

/** Reads a relative humidity (fraction or percent text) as a fraction, with range checks. */
export function readRelativeHumidity(input: unknown, parameter = 'RH'): number {
  let value: number;
  if (typeof input === 'number') {
    value = input;
  } else if (typeof input === 'string') {
    const m = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*%\s*$/.exec(input);
    if (!m) throw new InvalidInputError('input.invalid', parameter, `cannot read ${parameter} = "${input}": give a fraction 0–1 (0.5) or percent text ("50 %")`);
    value = Number(m[1]) / 100;
  } else {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a fraction 0–1 or percent text such as "50 %"; got ${String(input)}`);
  }
  if (!Number.isFinite(value)) throw new InvalidInputError('input.not-finite', parameter, `${parameter} must be finite; got ${String(input)}`);
  if (value < 0 || value > 1) {
    const hint = typeof input === 'number' && value > 1 && value <= 100 ? ` (relative humidity is a fraction: write ${value / 100} or "${value} %")` : '';
    throw new OutOfRangeError({ quantity: parameter, value, min: 0, max: 1, unit: '1', scope: 'relative humidity' }, `${parameter} = ${fmt(value)} is outside 0 to 1${hint}`);
  }
  return value;
}

function readHumidityRatio(input: unknown, parameter = 'W'): number {
  if (typeof input !== 'number') throw new InvalidInputError('input.invalid', parameter, `${parameter} (humidity ratio) must be a number in kg water per kg dry air; got ${String(input)} (convert with fromGramsPerKilogram or fromGrainsPerPound)`);
  if (!Number.isFinite(input)) throw new InvalidInputError('input.not-finite', parameter, `${parameter} must be finite; got ${input}`);
  if (input < 0) throw new OutOfRangeError({ quantity: parameter, value: input, min: 0, max: Infinity, unit: 'kg/kg', scope: 'humidity ratio' }, `${parameter} = ${fmt(input)} kg/kg is negative; a humidity ratio is at least 0`);
  return input;
}

function readModel(model: unknown): number {
  if (model === undefined || model === 'enhanced') return MODEL.enhanced;
  if (model === 'ideal') return MODEL.ideal;
  throw new InvalidInputError('input.invalid', 'model', `model must be 'enhanced' or 'ideal'; got ${String(model)}`);
}

/** Reads the total pressure from `p`, `altitude` or the default; throws for a bad one. */
export function readTotalPressure(options: HumidAirOptions, model: number): { p: number; from: HumidAirResult['pressureFrom'] } {
  let p: number;
  let from: HumidAirResult['pressureFrom'];
  if (options.p !== undefined && options.altitude !== undefined) throw new InvalidInputError('input.invalid', 'p', 'give either p or altitude, not both');
  if (options.p !== undefined) {
    p = readQuantity(options.p, 'pressure', 'p');
    from = 'given';
  } else if (options.altitude !== undefined) {
    const Z = readQuantity(options.altitude, 'length', 'altitude');
    p = standardAtmospherePressure(Z);
    if (p < 0) throw new OutOfRangeError({ quantity: 'altitude', value: Z, min: ALTITUDE_MIN, max: ALTITUDE_MAX, unit: 'm', scope: 'the standard-atmosphere relation (ASHRAE Fundamentals ch. 1, Eq. 3)' });
    from = 'altitude';
  } else {
    p = 101325;
    from = 'default 101.325 kPa';
  }
  if (!(p > 0) || p > P_MAX) {
    throw new OutOfRangeError({ quantity: 'p', value: p, min: 0, max: P_MAX, unit: 'Pa', scope: SCOPE_IDEAL }, p > 0 ? `p = ${fmt(p)} Pa is above the upper limit of humid air here (1 MPa)` : `p = ${fmt(p)} Pa: absolute pressure must be positive`);
  }
  if (model === MODEL.enhanced && (p < ENHANCED_P_MIN || p > ENHANCED_P_MAX)) {
    throw new OutOfRangeError({ quantity: 'p', value: p, min: ENHANCED_P_MIN, max: ENHANCED_P_MAX, unit: 'Pa', scope: SCOPE_ENHANCED });
  }
  return { p, from };
}

function checkTemperatureInput(T: number, parameter: string, model: number): void {
  if (T < T_MIN || T > T_MAX) throw new OutOfRangeError({ quantity: parameter, value: T, min: T_MIN, max: T_MAX, unit: 'K', scope: SCOPE_IDEAL });
  if (model === MODEL.enhanced && (T < ENHANCED_T_MIN || T > ENHANCED_T_MAX)) throw new OutOfRangeError({ quantity: parameter, value: T, min: ENHANCED_T_MIN, max: ENHANCED_T_MAX, unit: 'K', scope: SCOPE_ENHANCED });
}

/** Turns a core failure into the typed error that says why. */
export function humidAirError(status: number, reason: number, given: string, model: number, solvedT?: number): Error {
  const scope = model === MODEL.enhanced ? SCOPE_ENHANCED : SCOPE_IDEAL;
  switch (reason) {
    case REASON.dependentPair:
      return new InvalidInputError('input.invalid', given, `${given} do not fix a state: both determine the same thing (W and Tdp both fix the vapour pressure; at a wet-bulb of exactly 0 °C, h does too). Give another pair, such as T with either one`);
    case REASON.supersaturated:
      return new OutOfRangeError({ quantity: 'W', value: NaN, min: 0, max: NaN, unit: 'kg/kg', scope: 'unsaturated or saturated moist air' }, `${given} hold more water than saturated air at that temperature (fog or frost): no moist-air state`);
    case REASON.wetBulbAboveDryBulb:
      return new OutOfRangeError({ quantity: 'Twb', value: NaN, min: -Infinity, max: NaN, unit: 'K', scope: 'wet-bulb at most the dry-bulb' }, `${given}: the wet-bulb temperature cannot exceed the dry-bulb temperature`);
    case REASON.dewPointAboveDryBulb:
      return new OutOfRangeError({ quantity: 'Tdp', value: NaN, min: -Infinity, max: NaN, unit: 'K', scope: 'dew point at most the dry-bulb' }, `${given}: the dew point cannot exceed the dry-bulb temperature`);
    case REASON.dewPointAboveWetBulb:
      return new OutOfRangeError({ quantity: 'Tdp', value: NaN, min: -Infinity, max: NaN, unit: 'K', scope: 'dew point at most the wet-bulb' }, `${given}: the dew point cannot exceed the wet-bulb temperature`);
    case REASON.enhancementRange:
      return new OutOfRangeError({ quantity: 'T', value: solvedT ?? NaN, min: ENHANCED_T_MIN, max: ENHANCED_T_MAX, unit: 'K', scope: SCOPE_ENHANCED }, `${given} give a state outside the enhanced model's range (−80 °C … 50 °C, 30 kPa … 110 kPa); pass model: 'ideal' for −100 °C … 200 °C and up to 1 MPa`);
    case REASON.temperature:
      return new OutOfRangeError({ quantity: 'T', value: solvedT ?? NaN, min: T_MIN, max: T_MAX, unit: 'K', scope }, `${given} give no state with a dry-bulb temperature in the range of ${scope} (${model === MODEL.enhanced ? '193.15 K … 323.15 K' : '173.15 K … 473.15 K'})`);
    case REASON.humidityRatio:
      return new OutOfRangeError({ quantity: 'W', value: NaN, min: 0, max: Infinity, unit: 'kg/kg', scope: 'humidity ratio' }, `${given} give a negative humidity ratio (an enthalpy below that of dry air at that temperature)`);
    case REASON.noState:
      return new OutOfRangeError({ quantity: given, value: NaN, min: NaN, max: NaN, unit: '', scope }, `no moist-air state has ${given} (for example RH = 0 with water present, a wet-bulb depression larger than dry air allows, or vapour pressure reaching the total pressure)`);
    case REASON.pressure:
      return new OutOfRangeError({ quantity: 'p', value: NaN, min: 0, max: P_MAX, unit: 'Pa', scope }, 'p must be positive and at most 1 MPa');
    case REASON.notFinite:
      return new InvalidInputError('input.not-finite', given, `${given} must be finite numbers`);
    default:
      if (status === Status.noConvergence) return new ConvergenceError(`the humid-air solve for ${given} did not converge`, 100);
      return new InvalidInputError('input.invalid', given, `invalid input for ${given}`);
  }
}

/** The pair code and the two SI inputs read from `inputs`, with per-input range checks. */
export function readPair(inputs: HumidAirInputs, model: number): { pair: number; a: number; b: number; given: string } {
  const present = KEYS.filter((k) => (inputs as Record<string, unknown>)[k] !== undefined);
  if (present.length !== 2) {
    throw new InvalidInputError('input.invalid', 'inputs', `humidAir.state needs exactly two of T, Twb, Tdp, RH, W, h (plus p or altitude); got ${present.length === 0 ? 'none' : present.join(', ')}`);
  }
  const [k1, k2] = present as [Key, Key];
  const pair = PAIR_CODES[`${k1},${k2}`]!;
  const read = (k: Key): number => {
    const v = (inputs as Record<string, unknown>)[k];
    switch (k) {
      case 'RH':
        return readRelativeHumidity(v);
      case 'W':
        return readHumidityRatio(v);
      case 'h':
        return readQuantity(v as QuantityLike<'specificEnergy'>, 'specificEnergy', 'h');
      default: {
        const T = readQuantity(v as QuantityLike<'temperature'>, 'temperature', k);
        checkTemperatureInput(T, k, model);
        return T;
      }
    }
  };
  return { pair, a: read(k1), b: read(k2), given: `${k1} and ${k2}` };
}

/** Wraps a core state as a result. */
export function toResult(st: HumidAirState, from: HumidAirResult['pressureFrom']): HumidAirResult {
  return {
    p: Quantity.fromSI(st.p, 'pressure'),
    pressureFrom: from,
    T: Quantity.fromSI(st.T, 'temperature'),
    Twb: Number.isFinite(st.Twb) ? Quantity.fromSI(st.Twb, 'temperature') : undefined,
    Tdp: Number.isFinite(st.Tdp) ? Quantity.fromSI(st.Tdp, 'temperature') : undefined,
    RH: st.RH,
    W: st.W,
    h: Quantity.fromSI(st.h, 'specificEnergy'),
    v: Quantity.fromSI(st.v, 'specificVolume'),
    rho: Quantity.fromSI(st.rho, 'density'),
    pw: Quantity.fromSI(st.pw, 'pressure'),
    pws: Quantity.fromSI(st.pws, 'pressure'),
    f: st.f,
    Ws: Number.isFinite(st.Ws) ? st.Ws : undefined,
    saturationDegree: Number.isFinite(st.mu) ? st.mu : undefined,
    cp: Quantity.fromSI(st.cp, 'specificHeat'),
    model: st.model === MODEL.ideal ? 'ideal' : 'enhanced',
  };
}

/**
 * A moist-air state from the total pressure and any two of T, Twb, Tdp, RH, W, h.
 *
 * Model: ASHRAE Handbook—Fundamentals (SI) ch. 1 relations for an ideal mixture of dry air and
 * water vapour; saturation over liquid from IAPWS-IF97, over ice (below 0 °C) from IAPWS R14-08(2011).
 * The default `'enhanced'` model multiplies the saturation pressure by the enhancement factor of
 * Buck (1981) and covers −80 °C … 50 °C at 30 kPa … 110 kPa; `model: 'ideal'` covers −100 °C … 200 °C
 * at up to 1 MPa. Pressure: `p`, or `altitude` (standard atmosphere), default 101.325 kPa.
 *
 * @throws {@link OutOfRangeError} an input or the state outside the range (the message names it), a
 *   supersaturated state (fog), Twb or Tdp above T
 * @throws {@link InvalidInputError} not exactly two inputs, a dependent pair (W with Tdp), NaN
 * @throws {@link DimensionError} a quantity of the wrong dimension
 * @example
 * ```ts
 * const s = humidAir.state({ T: '30 °C', RH: 0.5 });
 * s.W;                      //=> 0.0133735 (kg/kg dry air)
 * s.Twb?.in('°C');          //=> 21.997
 * s.pressureFrom;           //=> 'default 101.325 kPa'
 * humidAir.state({ T: '86 °F', RH: '50 %', altitude: '1500 m' }).W;   //=> 0.016084
 * humidAir.state({ T: '60 °C', RH: 0.2 });
 * // throws OutOfRangeError: T = 333.15 K is above the upper limit of humid air, enhanced model (…) (323.15 K)
 * ```
 */
export function humidAirState(input: HumidAirStateInput): HumidAirResult {
  if (typeof input !== 'object' || input === null) throw new InvalidInputError('input.invalid', 'input', 'humidAir.state needs an object such as { T: "30 °C", RH: 0.5 }');
  const model = readModel(input.model);
  const { p, from } = readTotalPressure(input, model);
  const { pair, a, b, given } = readPair(input, model);
  const st = new HumidAirState();
  const status = coreState(pair, a, b, p, model, true, st);
  if (status !== Status.ok && status !== Status.undefinedProperty) throw humidAirError(status, st.reason, given, model);
  return toResult(st, from);
}


/** Humidity ratio in g/kg from kg/kg. */
export function toGramsPerKilogram(W: number): number {
  return W * 1000;
}
/** Humidity ratio in kg/kg from g/kg. */
export function fromGramsPerKilogram(gramsPerKilogram: number): number {
  return gramsPerKilogram / 1000;
}
/** Humidity ratio in grains of water per pound of dry air from kg/kg (7000 gr = 1 lb exactly). */
export function toGrainsPerPound(W: number): number {
  return W * 7000;
}
/** Humidity ratio in kg/kg from grains per pound (7000 gr = 1 lb exactly). */
export function fromGrainsPerPound(grainsPerPound: number): number {
  return grainsPerPound / 7000;
}

/**
 * Standard-atmosphere pressure at an altitude: ASHRAE Fundamentals ch. 1, Eq. 3, −5000 m … 11 000 m.
 * @example
 * ```ts
 * pressureAtAltitude('1000 m').in('kPa');   //=> 89.8745 (Table 1: 89.875)
 * ```
 */
export function pressureAtAltitude(altitude: QuantityLike<'length'>): Quantity<'pressure'> {
  return Quantity.fromSI(readTotalPressure({ altitude }, MODEL.ideal).p, 'pressure');
}
