/**
 * The water and steam facade: `water.state(pair)` and `water.saturation({ T } | { p })`.
 * Quantities in, quantities out; the IF97 SI core does the work.
 *
 * @module
 */
import { ConvergenceError, InvalidInputError, OutOfRangeError } from '../errors.js';
import { Quantity, readQuantity, type QuantityLike } from '../units/quantity.js';
import { P_CRITICAL, P_MAX, P_MAX_5, T_CRITICAL, T_MAX_2, T_MAX_5, T_MIN } from './if97/constants.js';
import {
  P_SAT_MIN,
  PHASE,
  saturationAtP,
  saturationAtT,
  STATUS,
  stateFromHS,
  stateFromPH,
  stateFromPS,
  stateFromPT,
  stateFromPX,
  stateFromTV,
  stateFromTX,
  WaterState,
} from './if97/flash.js';
import { WaterProperties } from './if97/properties.js';
import { region1 } from './if97/region1.js';
import { region2 } from './if97/region2.js';
import { region5 } from './if97/region5.js';

/** The phase of a state. */
export type WaterPhase = 'liquid' | 'vapor' | 'two-phase' | 'supercritical';

/** A state of water or steam, as `water.state` returns it. */
export interface WaterStateResult {
  /** Temperature. */
  readonly T: Quantity<'temperature'>;
  /** Pressure (absolute). */
  readonly p: Quantity<'pressure'>;
  /** `'liquid'`, `'vapor'`, `'two-phase'` or `'supercritical'` (T ≥ 647.096 K and p ≥ 22.064 MPa). */
  readonly phase: WaterPhase;
  /** IAPWS-IF97 region: 1 (liquid), 2 (vapour), 3 (near-critical), 4 (two-phase), 5 (above 1073.15 K). */
  readonly region: 1 | 2 | 3 | 4 | 5;
  /** Quality (vapour mass fraction) in two-phase states; `undefined` in single-phase states. */
  readonly x: number | undefined;
  readonly v: Quantity<'specificVolume'>;
  readonly rho: Quantity<'density'>;
  readonly u: Quantity<'specificEnergy'>;
  readonly h: Quantity<'specificEnergy'>;
  readonly s: Quantity<'specificHeat'>;
  /** Isobaric heat capacity; `undefined` in two-phase states, where it is not defined. */
  readonly cp: Quantity<'specificHeat'> | undefined;
  /** Isochoric heat capacity; `undefined` in two-phase states. */
  readonly cv: Quantity<'specificHeat'> | undefined;
  /** Speed of sound; `undefined` in two-phase states. */
  readonly w: Quantity<'velocity'> | undefined;
  /** k = cp/cv; `undefined` in two-phase states. */
  readonly k: number | undefined;
}

/** Saturated liquid (f) and vapour (g) at a temperature or pressure. */
export interface SaturationResult {
  readonly T: Quantity<'temperature'>;
  readonly p: Quantity<'pressure'>;
  readonly liquid: { readonly v: Quantity<'specificVolume'>; readonly rho: Quantity<'density'>; readonly u: Quantity<'specificEnergy'>; readonly h: Quantity<'specificEnergy'>; readonly s: Quantity<'specificHeat'> };
  readonly vapor: { readonly v: Quantity<'specificVolume'>; readonly rho: Quantity<'density'>; readonly u: Quantity<'specificEnergy'>; readonly h: Quantity<'specificEnergy'>; readonly s: Quantity<'specificHeat'> };
  /** h_g − h_f, the enthalpy of vaporisation. */
  readonly hfg: Quantity<'specificEnergy'>;
  /** s_g − s_f. */
  readonly sfg: Quantity<'specificHeat'>;
  /** u_g − u_f. */
  readonly ufg: Quantity<'specificEnergy'>;
}

/** The pairs `water.state` accepts. Pressures are absolute; gauge units (`psig`) are converted with the ambient. */
export type WaterPair =
  | { readonly T: QuantityLike<'temperature'>; readonly p: QuantityLike<'pressure'> }
  | { readonly p: QuantityLike<'pressure'>; readonly h: QuantityLike<'specificEnergy'> }
  | { readonly p: QuantityLike<'pressure'>; readonly s: QuantityLike<'specificHeat'> }
  | { readonly h: QuantityLike<'specificEnergy'>; readonly s: QuantityLike<'specificHeat'> }
  | { readonly T: QuantityLike<'temperature'>; readonly x: number }
  | { readonly p: QuantityLike<'pressure'>; readonly x: number }
  | { readonly T: QuantityLike<'temperature'>; readonly v: QuantityLike<'specificVolume'> }
  | { readonly T: QuantityLike<'temperature'>; readonly rho: QuantityLike<'density'> };

const PHASES: readonly WaterPhase[] = ['liquid', 'vapor', 'two-phase', 'supercritical'];
const IF97 = 'IAPWS-IF97';

function toResult(st: WaterState): WaterStateResult {
  const two = st.phase === PHASE.twoPhase;
  return {
    T: Quantity.fromSI(st.T, 'temperature'),
    p: Quantity.fromSI(st.p, 'pressure'),
    phase: PHASES[st.phase]!,
    region: st.region as WaterStateResult['region'],
    x: two ? st.x : undefined,
    v: Quantity.fromSI(st.v, 'specificVolume'),
    rho: Quantity.fromSI(st.rho, 'density'),
    u: Quantity.fromSI(st.u, 'specificEnergy'),
    h: Quantity.fromSI(st.h, 'specificEnergy'),
    s: Quantity.fromSI(st.s, 'specificHeat'),
    cp: two ? undefined : Quantity.fromSI(st.cp, 'specificHeat'),
    cv: two ? undefined : Quantity.fromSI(st.cv, 'specificHeat'),
    w: two ? undefined : Quantity.fromSI(st.w, 'velocity'),
    k: two ? undefined : st.cp / st.cv,
  };
}

function temperatureRangeError(T: number, parameter = 'T'): OutOfRangeError {
  if (T < T_MIN) return new OutOfRangeError({ quantity: parameter, value: T, min: T_MIN, max: T_MAX_5, unit: 'K', scope: IF97 }, `${parameter} = ${fmt(T)} K is below the lower limit of ${IF97} (273.15 K)`);
  return new OutOfRangeError({ quantity: parameter, value: T, min: T_MIN, max: T_MAX_5, unit: 'K', scope: `${IF97} region 5` }, `${parameter} = ${fmt(T)} K is above the upper limit of ${IF97} region 5 (2273.15 K)`);
}

function fmt(x: number): string {
  return String(Number(x.toPrecision(8)));
}

/** Range checks of (p, T) with the messages the standard's limits call for. */
function checkPT(p: number, T: number): void {
  if (!(T >= T_MIN && T <= T_MAX_5)) throw temperatureRangeError(T);
  if (!(p > 0)) throw new OutOfRangeError({ quantity: 'p', value: p, min: 0, max: P_MAX, unit: 'Pa', scope: IF97 }, `p = ${fmt(p)} Pa: absolute pressure must be positive (write gauge pressures as "psig", "barg" or "kPag")`);
  if (T <= T_MAX_2 && p > P_MAX) {
    throw new OutOfRangeError({ quantity: 'p', value: p, min: 0, max: P_MAX, unit: 'Pa', scope: `${IF97} (273.15 K ≤ T ≤ 1073.15 K)` }, `p = ${fmt(p / 1e6)} MPa is above the upper limit of ${IF97} (100 MPa for T ≤ 1073.15 K)`);
  }
  if (T > T_MAX_2 && p > P_MAX_5) {
    throw new OutOfRangeError({ quantity: 'p', value: p, min: 0, max: P_MAX_5, unit: 'Pa', scope: `${IF97} region 5 (1073.15 K < T ≤ 2273.15 K)` }, `p = ${fmt(p / 1e6)} MPa is above the upper limit of ${IF97} region 5 (50 MPa for T > 1073.15 K)`);
  }
}

function checkPressure(p: number): void {
  if (!(p > 0)) throw new OutOfRangeError({ quantity: 'p', value: p, min: 0, max: P_MAX, unit: 'Pa', scope: IF97 }, `p = ${fmt(p)} Pa: absolute pressure must be positive (write gauge pressures as "psig", "barg" or "kPag")`);
  if (p > P_MAX) throw new OutOfRangeError({ quantity: 'p', value: p, min: 0, max: P_MAX, unit: 'Pa', scope: IF97 }, `p = ${fmt(p / 1e6)} MPa is above the upper limit of ${IF97} (100 MPa)`);
}

function checkQuality(x: unknown): number {
  if (typeof x !== 'number' || !Number.isFinite(x)) throw new InvalidInputError('input.not-finite', 'x', `x (quality) must be a finite number between 0 and 1; got ${String(x)}`);
  if (x < 0 || x > 1) throw new OutOfRangeError({ quantity: 'x', value: x, min: 0, max: 1, unit: '1', scope: 'quality (vapour mass fraction)' }, `x = ${x} is outside 0 to 1 (quality is the vapour mass fraction)`);
  return x;
}

const probe = new WaterProperties();

/** The h or s range IF97 covers at pressure p, for messages. */
function rangeAtPressure(p: number, key: 'h' | 's'): [number, number] {
  if (p >= P_SAT_MIN) region1(p, T_MIN, probe);
  else region2(p, T_MIN, probe);
  const lo = probe[key];
  if (p <= P_MAX_5) region5(p, T_MAX_5, probe);
  else region2(p, T_MAX_2, probe);
  return [lo, probe[key]];
}

function fail(status: number, what: string, range?: () => OutOfRangeError): never {
  if (status === STATUS.outOfRange && range) throw range();
  if (status === STATUS.outOfRange) throw new OutOfRangeError({ quantity: what, value: NaN, min: NaN, max: NaN, unit: '', scope: IF97 }, `no ${IF97} state in range for ${what}`);
  if (status === STATUS.noConvergence) throw new ConvergenceError(`the ${IF97} solve for ${what} did not converge`, 0);
  throw new InvalidInputError('input.invalid', what, `invalid input for ${what}`);
}

const PAIRS = '{ T, p }, { p, h }, { p, s }, { h, s }, { T, x }, { p, x }, { T, v } or { T, rho }';

/**
 * The full state of water or steam from any usual pair, by IAPWS-IF97 (IAPWS R7-97(2012)):
 * `{ T, p }`, `{ p, h }`, `{ p, s }`, `{ h, s }`, `{ T, x }`, `{ p, x }`, `{ T, v }` or `{ T, rho }`.
 *
 * Range: 273.15 K ≤ T ≤ 1073.15 K at p ≤ 100 MPa, and 1073.15 K < T ≤ 2273.15 K at p ≤ 50 MPa.
 * Two-phase states (region 4) are quality-weighted mixtures of the saturated phases; cp, cv, w and k
 * are `undefined` there. A (p, T) exactly on the saturation line gives the liquid. Flashes are
 * polished on the basic equations to about 1e-12.
 *
 * @throws {@link OutOfRangeError} outside IF97's range (the message names the limit), x outside [0, 1],
 *   (T, x) or (p, x) above the critical point, pairs with no state in range
 * @throws {@link InvalidInputError} NaN or infinite inputs, an unsupported pair
 * @throws {@link DimensionError} a quantity of the wrong dimension
 * @throws {@link ConvergenceError} a flash that did not converge (never an unconverged value)
 * @example
 * ```ts
 * const s = water.state({ p: '10 MPa', T: '500 °C' });
 * s.h.in('kJ/kg');          //=> 3375.06...
 * s.phase;                  //=> 'vapor'
 * water.state({ p: '1 atm', h: '1500 kJ/kg' }).x;     //=> 0.4792... (two-phase)
 * water.state({ p: '150 psia', T: '400 °F' }).h.in('Btu/lbm');
 * water.state({ T: '2400 K', p: '1 MPa' });
 * // throws OutOfRangeError: T = 2400 K is above the upper limit of IAPWS-IF97 region 5 (2273.15 K)
 * ```
 */
export function waterState(pair: WaterPair): WaterStateResult {
  if (typeof pair !== 'object' || pair === null) throw new InvalidInputError('input.invalid', 'pair', `water.state needs one of ${PAIRS}`);
  const keys = Object.keys(pair).filter((k) => (pair as Record<string, unknown>)[k] !== undefined).sort().join(',');
  // the switch below has checked which keys are present
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  const a = pair as unknown as Record<string, any>;
  const out = new WaterState();
  switch (keys) {
    case 'T,p': {
      const T = readQuantity(a.T, 'temperature', 'T');
      const p = readQuantity(a.p, 'pressure', 'p');
      checkPT(p, T);
      const st = stateFromPT(p, T, out);
      if (st !== STATUS.ok) fail(st, `p = ${fmt(p)} Pa, T = ${fmt(T)} K`);
      return toResult(out);
    }
    case 'h,p':
    case 'p,s': {
      const key = keys === 'h,p' ? 'h' : 's';
      const p = readQuantity(a.p, 'pressure', 'p');
      const value = key === 'h' ? readQuantity(a.h, 'specificEnergy', 'h') : readQuantity(a.s, 'specificHeat', 's');
      checkPressure(p);
      const st = key === 'h' ? stateFromPH(p, value, out) : stateFromPS(p, value, out);
      const unit = key === 'h' ? 'J/kg' : 'J/(kg·K)';
      if (st !== STATUS.ok) {
        fail(st, `p = ${fmt(p)} Pa, ${key} = ${fmt(value)} ${unit}`, () => {
          const [lo, hi] = rangeAtPressure(p, key);
          return new OutOfRangeError(
            { quantity: key, value, min: lo, max: hi, unit, scope: `${IF97} at p = ${fmt(p)} Pa` },
            `no ${IF97} state at p = ${fmt(p / 1e6)} MPa with ${key} = ${fmt(value)} ${unit}: at this pressure ${key} runs from ${fmt(lo)} to ${fmt(hi)} ${unit} (273.15 K to ${p <= P_MAX_5 ? '2273.15' : '1073.15'} K)`,
          );
        });
      }
      return toResult(out);
    }
    case 'h,s': {
      const h = readQuantity(a.h, 'specificEnergy', 'h');
      const s = readQuantity(a.s, 'specificHeat', 's');
      const st = stateFromHS(h, s, out);
      if (st !== STATUS.ok) {
        fail(st, `h = ${fmt(h)} J/kg, s = ${fmt(s)} J/(kg·K)`, () =>
          new OutOfRangeError({ quantity: 's', value: s, min: NaN, max: NaN, unit: 'J/(kg·K)', scope: `${IF97} at h = ${fmt(h)} J/kg` }, `no ${IF97} state has h = ${fmt(h / 1e3)} kJ/kg and s = ${fmt(s / 1e3)} kJ/(kg·K) (273.15 K ≤ T ≤ 2273.15 K, p ≤ 100 MPa)`),
        );
      }
      return toResult(out);
    }
    case 'T,x': {
      const T = readQuantity(a.T, 'temperature', 'T');
      const x = checkQuality(a.x);
      if (!(T >= T_MIN && T <= T_CRITICAL)) {
        throw new OutOfRangeError({ quantity: 'T', value: T, min: T_MIN, max: T_CRITICAL, unit: 'K', scope: 'the saturation line' }, `T = ${fmt(T)} K is outside the saturation line (273.15 K to the critical point, 647.096 K): a quality is defined only there`);
      }
      const st = stateFromTX(T, x, out);
      if (st !== STATUS.ok) fail(st, `T = ${fmt(T)} K, x = ${x}`);
      return toResult(out);
    }
    case 'p,x': {
      const p = readQuantity(a.p, 'pressure', 'p');
      const x = checkQuality(a.x);
      if (!(p >= P_SAT_MIN && p <= P_CRITICAL)) {
        throw new OutOfRangeError({ quantity: 'p', value: p, min: P_SAT_MIN, max: P_CRITICAL, unit: 'Pa', scope: 'the saturation line' }, `p = ${fmt(p)} Pa is outside the saturation line (611.213 Pa to the critical point, 22.064 MPa): a quality is defined only there`);
      }
      const st = stateFromPX(p, x, out);
      if (st !== STATUS.ok) fail(st, `p = ${fmt(p)} Pa, x = ${x}`);
      return toResult(out);
    }
    case 'T,v':
    case 'T,rho': {
      const T = readQuantity(a.T, 'temperature', 'T');
      const v = keys === 'T,v' ? readQuantity(a.v, 'specificVolume', 'v') : 1 / readQuantity(a.rho, 'density', 'rho');
      if (!(T >= T_MIN && T <= T_MAX_5)) throw temperatureRangeError(T);
      if (!(v > 0) || !Number.isFinite(v)) throw new OutOfRangeError({ quantity: 'v', value: v, min: 0, max: Infinity, unit: 'm³/kg', scope: IF97 }, `specific volume must be positive and finite; got ${v} m³/kg`);
      const st = stateFromTV(T, v, out);
      if (st !== STATUS.ok) {
        fail(st, `T = ${fmt(T)} K, v = ${fmt(v)} m³/kg`, () => new OutOfRangeError({ quantity: 'v', value: v, min: NaN, max: NaN, unit: 'm³/kg', scope: `${IF97} at T = ${fmt(T)} K` }, `no ${IF97} state at T = ${fmt(T)} K with v = ${fmt(v)} m³/kg (p would be outside 0 to 100 MPa)`));
      }
      return toResult(out);
    }
    default:
      throw new InvalidInputError('input.invalid', 'pair', `water.state got { ${keys} }; it takes ${PAIRS}`);
  }
}

/**
 * Saturated liquid and vapour at a temperature or a pressure, by IAPWS-IF97 (region 4 for p_s(T)
 * and T_s(p); regions 1 and 2 below 623.15 K, region 3 above), with h_fg, s_fg and u_fg.
 * Range: triple point (273.15 K in IF97; 611.213 Pa) to the critical point (647.096 K, 22.064 MPa),
 * where both phases meet.
 *
 * @throws {@link OutOfRangeError} outside the saturation line
 * @example
 * ```ts
 * const sat = water.saturation({ p: '1 atm' });
 * sat.T.in('°C');            //=> 99.97...
 * sat.hfg.in('kJ/kg');       //=> 2256.5...
 * water.saturation({ T: '212 °F' }).p.in('psia');  //=> 14.70...
 * ```
 */
export function waterSaturation(at: { readonly T: QuantityLike<'temperature'> } | { readonly p: QuantityLike<'pressure'> }): SaturationResult {
  const liquid = new WaterProperties();
  const vapor = new WaterProperties();
  if (typeof at !== 'object' || at === null) throw new InvalidInputError('input.invalid', 'at', 'water.saturation needs { T } or { p }');
  let status: number;
  if ('T' in at && at.T !== undefined) {
    const T = readQuantity(at.T, 'temperature', 'T');
    if (!(T >= T_MIN && T <= T_CRITICAL)) {
      throw new OutOfRangeError({ quantity: 'T', value: T, min: T_MIN, max: T_CRITICAL, unit: 'K', scope: 'the saturation line' }, `T = ${fmt(T)} K is outside the saturation line (273.15 K to 647.096 K, the critical point)`);
    }
    status = saturationAtT(T, liquid, vapor);
  } else if ('p' in at && at.p !== undefined) {
    const p = readQuantity(at.p, 'pressure', 'p');
    if (!(p >= P_SAT_MIN && p <= P_CRITICAL)) {
      throw new OutOfRangeError({ quantity: 'p', value: p, min: P_SAT_MIN, max: P_CRITICAL, unit: 'Pa', scope: 'the saturation line' }, `p = ${fmt(p)} Pa is outside the saturation line (611.213 Pa to 22.064 MPa, the critical point)`);
    }
    status = saturationAtP(p, liquid, vapor);
  } else {
    throw new InvalidInputError('input.invalid', 'at', 'water.saturation needs { T } or { p }');
  }
  if (status !== STATUS.ok) fail(status, 'saturation');
  const phase = (w: WaterProperties) => ({
    v: Quantity.fromSI(w.v, 'specificVolume'),
    rho: Quantity.fromSI(w.rho, 'density'),
    u: Quantity.fromSI(w.u, 'specificEnergy'),
    h: Quantity.fromSI(w.h, 'specificEnergy'),
    s: Quantity.fromSI(w.s, 'specificHeat'),
  });
  return {
    T: Quantity.fromSI(liquid.T, 'temperature'),
    p: Quantity.fromSI(liquid.p, 'pressure'),
    liquid: phase(liquid),
    vapor: phase(vapor),
    hfg: Quantity.fromSI(vapor.h - liquid.h, 'specificEnergy'),
    sfg: Quantity.fromSI(vapor.s - liquid.s, 'specificHeat'),
    ufg: Quantity.fromSI(vapor.u - liquid.u, 'specificEnergy'),
  };
}

/** Water and steam by IAPWS-IF97: `water.state(pair)` and `water.saturation({ T } | { p })`. */
export const water = {
  state: waterState,
  saturation: waterSaturation,
} as const;
