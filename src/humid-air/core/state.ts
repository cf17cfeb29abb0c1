/**
 * The humid-air SI core: a psychrometric state from the total pressure and any two of T, Twb, Tdp,
 * RH, W, h. Plain SI numbers (K, Pa, fractions, kg/kg dry air, J/kg dry air), a caller-owned
 * {@link HumidAirState}, a {@link Status} code and a {@link REASON} code; never throws, never
 * allocates.
 *
 * Relations: the ideal-mixture relations of the ASHRAE Handbook—Fundamentals (SI) ch. 1 (see
 * `relations.ts`); saturation over liquid by IAPWS-IF97 region 4, over ice by IAPWS R14-08(2011)
 * (see `saturation.ts`). No enhancement factor (see data/humid-air/enhancement-buck-1981.json).
 *
 * Range: 173.15 K ≤ T, Tdp, Twb ≤ 473.15 K (−100 °C to 200 °C), 0 < p ≤ 1 MPa, 0 ≤ RH ≤ 1, W ≥ 0.
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { brent, humidityRatioAtRH, residual, RESIDUAL } from './root.js';
import {
  CP_DRY_AIR,
  CP_VAPOR,
  EPSILON,
  H_VAPOR_0,
  humidityRatioFromVaporPressure,
  humidityRatioFromWetBulb,
  moistAirEnthalpy,
  moistAirVolume,
  NO_SATURATION,
  saturatorConstant,
  saturatorWaterEnthalpy,
  temperatureFromEnthalpy,
  vaporPressureFromHumidityRatio,
} from './relations.js';
import { saturationTemperatureAt, T_ICE, waterSaturationPressure } from './saturation.js';

/** Lowest temperature (dry-bulb, dew point, wet-bulb) of the humid-air core, K (−100 °C). */
export const T_MIN = 173.15;
/** Highest temperature of the humid-air core, K (200 °C). */
export const T_MAX = 473.15;
/** Highest total pressure, Pa (1 MPa). */
export const P_MAX = 1e6;
/** Solves stop when the temperature bracket is this narrow, K. */
const T_TOLERANCE = 1e-13;
/** A solved dry-bulb may fall this far (relative) below Twb or Tdp by rounding and count as equal. */
const ROUNDING = 1e-12;
/** A humidity ratio may exceed Ws by this relative amount (rounding of round trips) and still count as saturated. */
const SATURATION_SLACK = 1e-10;

/** The input pairs of {@link humidAirState}. */
export const PAIR = {
  T_RH: 0,
  T_W: 1,
  T_h: 2,
  T_Tdp: 3,
  T_Twb: 4,
  RH_W: 5,
  RH_h: 6,
  RH_Tdp: 7,
  RH_Twb: 8,
  W_h: 9,
  W_Tdp: 10,
  W_Twb: 11,
  h_Tdp: 12,
  h_Twb: 13,
  Tdp_Twb: 14,
} as const;

/** Why a state could not be computed (or which output is not defined), beside the {@link Status}. */
export const REASON = {
  none: 0,
  /** NaN or infinite input (Status.invalidInput). */
  notFinite: 1,
  /** p ≤ 0 or p > 1 MPa (Status.outOfRange). */
  pressure: 2,
  /** An input or solved temperature outside 173.15 K … 473.15 K (Status.outOfRange). */
  temperature: 3,
  /** RH outside 0 … 1 (Status.outOfRange). */
  relativeHumidity: 4,
  /** W < 0, or an h below that of dry air at T (Status.outOfRange). */
  humidityRatio: 5,
  /** Twb > T (Status.outOfRange). */
  wetBulbAboveDryBulb: 6,
  /** Tdp > T (Status.outOfRange). */
  dewPointAboveDryBulb: 7,
  /** Tdp > Twb (Status.outOfRange). */
  dewPointAboveWetBulb: 8,
  /** More water than saturated air holds at T (W > Ws): fog or frost, not a moist-air state (Status.outOfRange). */
  supersaturated: 9,
  /** The two inputs fix the same thing (W and Tdp; h and Twb at t* = 0 °C) (Status.invalidInput). */
  dependentPair: 10,
  /** No state in range has these inputs (RH = 0 with W > 0, a wet-bulb too low for dry air …) (Status.outOfRange). */
  noState: 12,
  /** Not a pair code (Status.invalidInput). */
  unknownPair: 13,
  /** Computed, but T is at or above the boiling point at p: Ws and μ are NaN (Status.undefinedProperty). */
  saturationUndefined: 14,
  /** Computed, but the dew point (W = 0, or below the range) is not defined: Tdp is NaN (Status.undefinedProperty). */
  dewPointUndefined: 15,
  /** Computed, but the wet-bulb lies below the range: Twb is NaN (Status.undefinedProperty). */
  wetBulbUndefined: 16,
} as const;

/** One psychrometric state in SI. Create one and reuse it: the core writes into it without allocating. */
export class HumidAirState {
  /** Total (barometric) pressure, Pa. */
  p = 0;
  /** Dry-bulb temperature, K. */
  T = 0;
  /** Thermodynamic wet-bulb temperature, K (NaN when not computed, see {@link HumidAirState.wetBulbComputed}). */
  Twb = 0;
  /** Dew-point temperature (frost point below 0 °C), K. */
  Tdp = 0;
  /** Relative humidity pw/pws, 0 … 1. */
  RH = 0;
  /** Humidity ratio, kg water per kg dry air. */
  W = 0;
  /** Enthalpy per kg of dry air, J/kg (0 for dry air at 0 °C). */
  h = 0;
  /** Specific volume per kg of dry air, m³/kg. */
  v = 0;
  /** Density of the moist air (mass of air and vapour per volume), kg/m³. */
  rho = 0;
  /** Partial pressure of water vapour, Pa. */
  pw = 0;
  /** Saturation pressure of pure water at T (over ice below 0 °C), Pa. */
  pws = 0;
  /** Saturation humidity ratio at (p, T), kg/kg dry air. */
  Ws = 0;
  /** Degree of saturation W/Ws. */
  mu = 0;
  /** Heat capacity at constant p per kg of dry air, J/(kg·K): ∂h/∂T at constant W. */
  cp = 0;
  /** Whether Twb was computed (states asked for without the wet-bulb leave it NaN). */
  wetBulbComputed = false;
  /** Why the status is not `ok` ({@link REASON}). */
  reason = 0;
}

function fail(out: HumidAirState, status: StatusCode, reason: number): StatusCode {
  out.reason = reason;
  return status;
}

/** Status of a temperature input or solved temperature, or ok. */
function checkTemperature(out: HumidAirState, T: number): StatusCode {
  if (!(T >= T_MIN && T <= T_MAX)) return fail(out, Status.outOfRange, REASON.temperature);
  return Status.ok;
}

/**
 * The highest temperature at or below `T` at which saturated air exists at p (f·pws < p), K.
 * Equal to T except above the boiling point at p.
 */
function belowBoiling(p: number, T: number): number {
  if (waterSaturationPressure(T) < p) return T;
  const Tb = saturationTemperatureAt(p, 0, 1e4);
  return Tb * (1 - 1e-12);
}

/**
 * Fills every output from (p, T, W), which the caller has written into `out.p`, `out.T` and `out.W`
 * (in the object rather than as arguments: a double passed to a call that is not inlined is boxed,
 * and this one is too large to inline); `out.Tdp`, `out.Twb` and `out.pws` (pws(T)) are used as
 * given when not NaN (the caller knows them exactly), computed otherwise.
 */
function fill(out: HumidAirState, wetBulb: boolean): StatusCode {
  const p = out.p;
  const T = out.T;
  let W = out.W;
  const Tdp = out.Tdp;
  const Twb = out.Twb;
  const pwsAtT = out.pws;
  const pws = pwsAtT === pwsAtT ? pwsAtT : waterSaturationPressure(T);
  const psat = pws;
  const Ws = psat < p ? humidityRatioFromVaporPressure(p, psat) : NO_SATURATION;
  if (Ws !== NO_SATURATION && W > Ws) {
    // an h carries W only to about ε·|h|/h_g: at −100 °C, W ~ 1e-8, that is 1e-9 of W
    const slack = Ws * SATURATION_SLACK + (8 * 2.220446049250313e-16 * (Math.abs(CP_DRY_AIR * (T - 273.15)) + W * H_VAPOR_0)) / H_VAPOR_0;
    if (W > Ws + slack) return fail(out, Status.outOfRange, REASON.supersaturated);
    W = Ws; // saturated within rounding
  }
  let status: StatusCode = Status.ok;
  let reason: number = REASON.none;
  const pw = vaporPressureFromHumidityRatio(p, W);
  out.W = W;
  out.pw = pw;
  out.pws = pws;
  const RH = pw / psat;
  out.RH = RH > 1 ? 1 : RH; // W ≤ Ws was checked: above 1 only by rounding
  if (Ws === NO_SATURATION) {
    out.Ws = NaN;
    out.mu = NaN;
    status = Status.undefinedProperty;
    reason = REASON.saturationUndefined;
  } else {
    out.Ws = Ws;
    out.mu = W / Ws;
    if (out.mu > 1) out.mu = 1;
  }
  out.h = moistAirEnthalpy(T, W);
  out.v = moistAirVolume(p, T, W);
  out.rho = (1 + W) / out.v;
  out.cp = CP_DRY_AIR + CP_VAPOR * W;
  // dew point
  let dew = Tdp;
  if (!(dew === dew)) {
    dew = W > 0 ? saturationTemperatureAt(pw, T_MIN, T * (1 + 1e-12)) : -1;
    if (dew < 0) {
      dew = NaN;
      status = Status.undefinedProperty;
      reason = REASON.dewPointUndefined;
    } else if (dew > T) {
      dew = T;
    }
  }
  out.Tdp = dew;
  // wet-bulb
  out.wetBulbComputed = wetBulb;
  if (!wetBulb) {
    out.Twb = NaN;
  } else if (Twb === Twb) {
    out.Twb = Twb;
  } else {
    const wb = wetBulbOf(p, T, W, dew === dew ? dew : T_MIN);
    if (wb < 0) {
      out.Twb = NaN;
      status = Status.undefinedProperty;
      reason = REASON.wetBulbUndefined;
    } else {
      out.Twb = wb;
    }
  }
  out.reason = reason;
  return status;
}

/** Thermodynamic wet-bulb of (p, T, W) in [lo, T], K, or −1 when it lies below lo. */
function wetBulbOf(p: number, T: number, W: number, lo: number): number {
  const hi = belowBoiling(p, T);
  const fhi = residual(RESIDUAL.wetBulbFromTW, hi, T, W, 0, p);
  if (fhi <= 0) return hi;
  const flo = residual(RESIDUAL.wetBulbFromTW, lo, T, W, 0, p);
  if (flo > 0) return lo === T_MIN ? -1 : lo;
  return brent(RESIDUAL.wetBulbFromTW, lo, hi, flo, fhi, T, W, 0, p, T_TOLERANCE);
}

/**
 * A psychrometric state from the total pressure p (Pa) and a pair of inputs (a, b) in the order of
 * the pair's name: `PAIR.T_RH` takes (T, RH), `PAIR.h_Twb` takes (h, Twb). SI: K, fractions,
 * kg/kg dry air, J/kg dry air.
 *
 * @param wetBulb whether to compute the thermodynamic wet-bulb (a solve) when it is not an input
 * @returns Status.ok; Status.outOfRange, Status.invalidInput with `out.reason` saying why; or
 *   Status.undefinedProperty when the state is computed but Ws and μ (above boiling), Tdp (W = 0) or
 *   Twb (below the range) are not defined there (those are NaN, the rest valid)
 * @example
 * ```ts
 * const out = new HumidAirState();
 * humidAirState(PAIR.T_RH, 303.15, 0.5, 101325, true, out);   //=> 0 (Status.ok)
 * out.W;     //=> 0.0133123... (kg/kg dry air)
 * out.Twb;   //=> 295.154... (K)
 * humidAirState(PAIR.W_Tdp, 0.01, 285, 101325, true, out);    //=> 3 (invalidInput)
 * out.reason === REASON.dependentPair;   //=> true
 * ```
 */
export function humidAirState(pair: number, a: number, b: number, p: number, wetBulb: boolean, out: HumidAirState): StatusCode {
  if (!Number.isFinite(a) || !Number.isFinite(b) || !Number.isFinite(p)) return fail(out, Status.invalidInput, REASON.notFinite);
  if (!(p > 0 && p <= P_MAX)) return fail(out, Status.outOfRange, REASON.pressure);
  let T = NaN;
  let W = NaN;
  let Tdp = NaN;
  let Twb = NaN;
  let pwsT = NaN;
  let s: StatusCode;
  switch (pair) {
    case PAIR.T_RH: {
      T = a;
      if ((s = checkTemperature(out, T)) !== Status.ok) return s;
      if (!(b >= 0 && b <= 1)) return fail(out, Status.outOfRange, REASON.relativeHumidity);
      pwsT = waterSaturationPressure(T);
      const pw = b * pwsT;
      if (!(pw < p)) return fail(out, Status.outOfRange, REASON.noState);
      W = humidityRatioFromVaporPressure(p, pw);
      if (b === 1) Tdp = T;
      break;
    }
    case PAIR.T_W:
      T = a;
      W = b;
      if ((s = checkTemperature(out, T)) !== Status.ok) return s;
      if (!(W >= 0)) return fail(out, Status.outOfRange, REASON.humidityRatio);
      break;
    case PAIR.T_h:
      T = a;
      if ((s = checkTemperature(out, T)) !== Status.ok) return s;
      W = (b - CP_DRY_AIR * (T - 273.15)) / (H_VAPOR_0 + CP_VAPOR * (T - 273.15));
      if (!(W >= 0)) return fail(out, Status.outOfRange, REASON.humidityRatio);
      break;
    case PAIR.T_Tdp:
      T = a;
      Tdp = b;
      if ((s = checkTemperature(out, T)) !== Status.ok) return s;
      if ((s = checkTemperature(out, Tdp)) !== Status.ok) return s;
      if (Tdp > T) return fail(out, Status.outOfRange, REASON.dewPointAboveDryBulb);
      W = humidityRatioAtRH(p, Tdp, 1);
      if (W === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
      break;
    case PAIR.T_Twb:
      T = a;
      Twb = b;
      if ((s = checkTemperature(out, T)) !== Status.ok) return s;
      if ((s = checkTemperature(out, Twb)) !== Status.ok) return s;
      if (Twb > T) return fail(out, Status.outOfRange, REASON.wetBulbAboveDryBulb);
      W = humidityRatioFromWetBulb(p, T, Twb);
      if (W === NO_SATURATION || !(W >= 0)) return fail(out, Status.outOfRange, REASON.noState);
      if (Twb === T) Tdp = T;
      break;
    case PAIR.RH_W: {
      W = b;
      if (!(a >= 0 && a <= 1)) return fail(out, Status.outOfRange, REASON.relativeHumidity);
      if (!(W >= 0)) return fail(out, Status.outOfRange, REASON.humidityRatio);
      if (a === 0) return W === 0 ? fail(out, Status.invalidInput, REASON.dependentPair) : fail(out, Status.outOfRange, REASON.noState);
      if (W === 0) return fail(out, Status.outOfRange, REASON.noState);
      T = saturationTemperatureAt(vaporPressureFromHumidityRatio(p, W) / a, T_MIN, T_MAX);
      if (T < 0) return fail(out, Status.outOfRange, REASON.temperature);
      if (a === 1) Tdp = T;
      break;
    }
    case PAIR.RH_h: {
      if (!(a >= 0 && a <= 1)) return fail(out, Status.outOfRange, REASON.relativeHumidity);
      const lo = T_MIN;
      const hi = a > 0 ? belowRH(p, a) : T_MAX;
      const flo = residual(RESIDUAL.enthalpyAtRH, lo, a, b, 0, p);
      const fhi = residual(RESIDUAL.enthalpyAtRH, hi, a, b, 0, p);
      if (flo > 0 || fhi < 0) return fail(out, Status.outOfRange, REASON.temperature);
      T = brent(RESIDUAL.enthalpyAtRH, lo, hi, flo, fhi, a, b, 0, p, T_TOLERANCE);
      if (T < 0) return fail(out, Status.noConvergence, REASON.none);
      W = humidityRatioAtRH(p, T, a);
      if (a === 1) Tdp = T;
      break;
    }
    case PAIR.RH_Tdp: {
      Tdp = b;
      if (!(a >= 0 && a <= 1)) return fail(out, Status.outOfRange, REASON.relativeHumidity);
      if ((s = checkTemperature(out, Tdp)) !== Status.ok) return s;
      if (a === 0) return fail(out, Status.outOfRange, REASON.noState);
      W = humidityRatioAtRH(p, Tdp, 1);
      if (W === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
      T = a === 1 ? Tdp : saturationTemperatureAt(vaporPressureFromHumidityRatio(p, W) / a, T_MIN, T_MAX);
      if (T < 0) return fail(out, Status.outOfRange, REASON.temperature);
      break;
    }
    case PAIR.RH_Twb: {
      Twb = b;
      if (!(a >= 0 && a <= 1)) return fail(out, Status.outOfRange, REASON.relativeHumidity);
      if ((s = checkTemperature(out, Twb)) !== Status.ok) return s;
      if (a === 1) {
        T = Twb;
        Tdp = Twb;
        W = humidityRatioAtRH(p, T, 1);
        if (W === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
        break;
      }
      const K = saturatorConstant(p, Twb);
      if (K === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
      // above T0 = t* + K/cp_a the balance needs W < 0
      let hi = 273.15 + K / CP_DRY_AIR;
      const top = T_MAX;
      if (hi > top) hi = top;
      if (!(hi > Twb)) hi = Twb;
      const flo = residual(RESIDUAL.wetBulbAtRH, Twb, a, Twb, 0, p);
      const fhi = residual(RESIDUAL.wetBulbAtRH, hi, a, Twb, 0, p);
      if (fhi > 0) return fail(out, Status.outOfRange, REASON.temperature);
      // flo = Ws*·(1 − RH) ≥ 0 up to rounding: at RH within rounding of 1 the root is t* itself
      T = flo <= 0 ? Twb : brent(RESIDUAL.wetBulbAtRH, Twb, hi, flo, fhi, a, Twb, 0, p, T_TOLERANCE);
      if (T < 0) return fail(out, Status.noConvergence, REASON.none);
      W = humidityRatioAtRH(p, T, a);
      if (W === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
      break;
    }
    case PAIR.W_h:
      W = a;
      if (!(W >= 0)) return fail(out, Status.outOfRange, REASON.humidityRatio);
      T = temperatureFromEnthalpy(b, W);
      break;
    case PAIR.W_Tdp:
      return fail(out, Status.invalidInput, REASON.dependentPair);
    case PAIR.W_Twb: {
      W = a;
      Twb = b;
      if (!(W >= 0)) return fail(out, Status.outOfRange, REASON.humidityRatio);
      if ((s = checkTemperature(out, Twb)) !== Status.ok) return s;
      T = temperatureFromWetBulbAndW(p, Twb, W);
      if (T === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
      if (T < Twb * (1 - ROUNDING)) return fail(out, Status.outOfRange, REASON.supersaturated);
      if (T < Twb) T = Twb;
      break;
    }
    case PAIR.h_Tdp:
      Tdp = b;
      if ((s = checkTemperature(out, Tdp)) !== Status.ok) return s;
      W = humidityRatioAtRH(p, Tdp, 1);
      if (W === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
      T = temperatureFromEnthalpy(a, W);
      if (T < Tdp * (1 - ROUNDING)) return fail(out, Status.outOfRange, REASON.supersaturated);
      if (T < Tdp) T = Tdp;
      break;
    case PAIR.h_Twb: {
      Twb = b;
      if ((s = checkTemperature(out, Twb)) !== Status.ok) return s;
      const hw = saturatorWaterEnthalpy(Twb);
      // at t* = 0 °C over liquid hw = 0: every state on the line h = h(t*, Ws*) has this wet-bulb
      if (Math.abs(hw) < C_LIQUID_DEPENDENCE) return fail(out, Status.invalidInput, REASON.dependentPair);
      const K = saturatorConstant(p, Twb);
      if (K === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
      W = (a - K) / hw;
      if (!(W >= 0)) return fail(out, Status.outOfRange, REASON.noState);
      T = temperatureFromEnthalpy(a, W);
      if (T < Twb * (1 - ROUNDING)) return fail(out, Status.outOfRange, REASON.supersaturated);
      if (T < Twb) T = Twb;
      break;
    }
    case PAIR.Tdp_Twb: {
      Tdp = a;
      Twb = b;
      if ((s = checkTemperature(out, Tdp)) !== Status.ok) return s;
      if ((s = checkTemperature(out, Twb)) !== Status.ok) return s;
      if (Tdp > Twb) return fail(out, Status.outOfRange, REASON.dewPointAboveWetBulb);
      W = humidityRatioAtRH(p, Tdp, 1);
      if (W === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
      T = Tdp === Twb ? Twb : temperatureFromWetBulbAndW(p, Twb, W);
      if (T === NO_SATURATION) return fail(out, Status.outOfRange, REASON.noState);
      if (T < Twb * (1 - ROUNDING)) return fail(out, Status.outOfRange, REASON.supersaturated);
      if (T < Twb) T = Twb;
      break;
    }
    default:
      return fail(out, Status.invalidInput, REASON.unknownPair);
  }
  if ((s = checkTemperature(out, T)) !== Status.ok) return s;
  if (Tdp === Tdp && Tdp > T) Tdp = T;
  if (Twb === Twb && Twb > T) Twb = T;
  out.p = p;
  out.T = T;
  out.W = W;
  out.Tdp = Tdp;
  out.Twb = Twb;
  out.pws = pwsT;
  return fill(out, wetBulb);
}

/** |hw| below this (J/kg: t* within 1e-6 K of 0 °C over liquid) makes (h, Twb) a dependent pair. */
const C_LIQUID_DEPENDENCE = 4.186e-3;

/** Dry-bulb (K) of air with wet-bulb t* and humidity ratio W: the balance solved for T. */
function temperatureFromWetBulbAndW(p: number, Tstar: number, W: number): number {
  const K = saturatorConstant(p, Tstar);
  if (K === NO_SATURATION) return NO_SATURATION;
  const hw = saturatorWaterEnthalpy(Tstar);
  return 273.15 + (K - W * (H_VAPOR_0 - hw)) / (CP_DRY_AIR + CP_VAPOR * W);
}

/** The highest temperature of the range at which RH·pws < p, K. */
function belowRH(p: number, RH: number): number {
  const top = T_MAX;
  if (humidityRatioAtRH(p, top, RH) !== NO_SATURATION) return top;
  const T = saturationTemperatureAt(p / RH, 0, 1e4);
  return T * (1 - 1e-12);
}

/**
 * The humidity ratio of saturated air at (p, T), kg/kg, or −1 when it does not exist.
 * @example
 * ```ts
 * saturationHumidityRatioAt(101325, 303.15);   //=> 0.02720697 (kg/kg)
 * ```
 */
export function saturationHumidityRatioAt(p: number, T: number): number {
  const W = humidityRatioAtRH(p, T, 1);
  return W === NO_SATURATION ? -1 : W;
}

export { EPSILON, T_ICE };
