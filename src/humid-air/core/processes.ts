/**
 * Air-conditioning processes on streams of moist air with a dry-air mass flow (kg/s): adiabatic
 * mixing, sensible heating and cooling, cooling with dehumidification, steam humidification and
 * adiabatic (evaporative) humidification. SI core: plain numbers, caller-owned {@link HumidAirState}
 * and {@link ProcessLoads}, a Status and a reason code; never throws, never allocates.
 *
 * Balances per kg of dry air (ASHRAE Handbook—Fundamentals ch. 1, "typical air-conditioning
 * processes"): water ṁa W1 + ṁw = ṁa W2, energy ṁa h1 + ṁw hw + Q = ṁa h2, where ṁw is the water
 * added (negative for condensate leaving) and hw its enthalpy (liquid from IAPWS-IF97 region 1,
 * steam from region 2, at the given state).
 *
 * Loads (W), positive when the air gains, negative when it loses:
 * - `total` = ṁa (h2 − h1), the change of the air's enthalpy;
 * - `sensible` = ṁa (h(T2, W1) − h(T1, W1)) = ṁa (1006 + 1860 W1)(T2 − T1);
 * - `latent` = ṁa (W2 − W1)(2501 kJ/kg + 1.86 kJ/(kg·K)·t2) = `total` − `sensible`;
 * - `heat` = Q = `total` − ṁw hw, the heat the apparatus adds to the streams (a coil's duty is −heat);
 * - `sensibleHeatRatio` = sensible/total (NaN with Status.undefinedProperty when total = 0).
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { region1Enthalpy } from '../../water/if97/region1.js';
import { region2Enthalpy } from '../../water/if97/region2.js';
import { saturationPressure, saturationTemperature } from '../../water/if97/region4.js';
import { brent, residual, RESIDUAL } from './root.js';
import { CP_DRY_AIR, CP_VAPOR, H_VAPOR_0 } from './relations.js';
import { HumidAirState, humidAirState, PAIR, REASON } from './state.js';

/** Why a process could not be computed, beside the state {@link REASON} codes (numbered after them). */
export const PROCESS_REASON = {
  /** A dry-air mass flow ≤ 0 (a mixing stream may be 0, their sum may not) or not finite. */
  flow: 101,
  /** Streams to be mixed at different total pressures. */
  pressureMismatch: 102,
  /** Sensible cooling would pass the entering dew point (condensation): use a cooling coil. */
  condensation: 103,
  /** A cooling coil whose leaving air would hold more water than the entering air. */
  wouldHumidify: 104,
  /** Bypass factor outside 0 ≤ BF < 1. */
  bypassFactor: 105,
  /** Liquid water (condensate, spray) outside 273.15 K … 373.15 K: frost and boiling water are not covered. */
  waterTemperature: 106,
  /** Steam not vapour (below its saturation temperature) or outside IF97 region 2 (≤ 1073.15 K, ≤ 10 MPa here). */
  steamState: 107,
  /** A humidifier target below the entering humidity, or one the humidifier's line cannot reach. */
  target: 108,
  /** A heat flow that is not finite, or a leaving temperature that is. */
  heat: 109,
} as const;

/** Loads of one process (W) and the water stream. Reuse one instance. */
export class ProcessLoads {
  /** ṁa (h(T2, W1) − h(T1, W1)), W. */
  sensible = 0;
  /** total − sensible, W. */
  latent = 0;
  /** ṁa (h2 − h1), W. */
  total = 0;
  /** Heat added by the apparatus, total − ṁw hw, W. */
  heat = 0;
  /** sensible/total. */
  sensibleHeatRatio = 0;
  /** Water added to the air, kg/s (negative: condensate removed). */
  waterFlow = 0;
  /** Enthalpy of that water or steam, J/kg (IAPWS-IF97). */
  waterEnthalpy = 0;
  /** Temperature of that water or steam, K. */
  waterTemperature = 0;
  /** Why the status is not ok ({@link REASON} or {@link PROCESS_REASON}). */
  reason = 0;
}

const T_WATER_MIN = 273.15;
const T_WATER_MAX = 373.15;
const STEAM_P_MAX = 10e6;
const STEAM_T_MAX = 1073.15;

function fail(loads: ProcessLoads, status: StatusCode, reason: number): StatusCode {
  loads.reason = reason;
  return status;
}

/** Liquid water enthalpy at T (K) and pressure p (raised to p_s(T) if below), J/kg, into loads; status. */
function liquidWater(p: number, T: number, loads: ProcessLoads): StatusCode {
  if (!(T >= T_WATER_MIN && T <= T_WATER_MAX)) return fail(loads, Status.outOfRange, PROCESS_REASON.waterTemperature);
  const ps = saturationPressure(T);
  loads.waterEnthalpy = region1Enthalpy(p > ps ? p : ps, T);
  loads.waterTemperature = T;
  return Status.ok;
}

/** Fills the loads from inlet, outlet and the water stream already set in `loads`. */
function finishLoads(inlet: HumidAirState, mda: number, outlet: HumidAirState, loads: ProcessLoads, stateStatus: StatusCode): StatusCode {
  loads.total = mda * (outlet.h - inlet.h);
  loads.sensible = mda * (CP_DRY_AIR + CP_VAPOR * inlet.W) * (outlet.T - inlet.T);
  // h2 − h1 = (1006 + 1860 W1)(t2 − t1) + (W2 − W1)(2501e3 + 1860 t2) exactly: the second term is the latent part
  loads.latent = mda * (outlet.W - inlet.W) * (H_VAPOR_0 + CP_VAPOR * (outlet.T - 273.15));
  loads.waterFlow = mda * (outlet.W - inlet.W);
  loads.heat = loads.total - (loads.waterFlow === 0 ? 0 : loads.waterFlow * loads.waterEnthalpy);
  if (loads.total === 0) {
    loads.sensibleHeatRatio = NaN;
    loads.reason = REASON.none;
    return Status.undefinedProperty;
  }
  loads.sensibleHeatRatio = loads.sensible / loads.total;
  loads.reason = outlet.reason;
  return stateStatus;
}

function badFlow(mda: number): boolean {
  return !(mda > 0 && mda < Infinity);
}

/** A state status that is fatal (anything but ok and undefinedProperty). */
function fatal(s: StatusCode): boolean {
  return s !== Status.ok && s !== Status.undefinedProperty;
}

/**
 * Adiabatic mixing of `count` streams at total pressure p: humidity ratios W[i], enthalpies h[i]
 * (J/kg dry air) and dry-air flows mda[i] (kg/s). The mixture has the flow-weighted W and h
 * (mass and energy conservation). A mixture beyond saturation (fog) is Status.outOfRange with
 * `out.reason = REASON.supersaturated`.
 * @example
 * ```ts
 * const out = new HumidAirState();
 * mixStreams(101325, Float64Array.of(0.0186, 0.0093), Float64Array.of(80.9e3, 47.7e3), Float64Array.of(1, 3), 2, true, out);   //=> 0
 * out.W;   //=> 0.011625
 * ```
 */
export function mixStreams(p: number, W: Float64Array, h: Float64Array, mda: Float64Array, count: number, wetBulb: boolean, out: HumidAirState): StatusCode {
  let m = 0;
  let mW = 0;
  let mh = 0;
  if (!(count >= 1 && count <= W.length && count <= h.length && count <= mda.length)) {
    out.reason = PROCESS_REASON.flow;
    return Status.invalidInput;
  }
  for (let i = 0; i < count; i++) {
    const mi = mda[i]!;
    if (!(mi >= 0 && mi < Infinity)) {
      out.reason = PROCESS_REASON.flow;
      return Status.invalidInput;
    }
    m += mi;
    mW += mi * W[i]!;
    mh += mi * h[i]!;
  }
  if (!(m > 0)) {
    out.reason = PROCESS_REASON.flow;
    return Status.invalidInput;
  }
  return humidAirState(PAIR.W_h, mW / m, mh / m, p, wetBulb, out);
}

/**
 * Sensible heating or cooling (W constant) of a stream with dry-air flow mda (kg/s) to a leaving
 * dry-bulb T2 (K). Cooling below the entering dew point is refused (PROCESS_REASON.condensation).
 * @example
 * ```ts
 * const inlet = new HumidAirState(), outlet = new HumidAirState(), loads = new ProcessLoads();
 * humidAirStateSI(PAIR.T_RH, 293.15, 0.5, 101325, true, inlet);   // 20 °C, 50 %
 * sensibleToTemperature(inlet, 2, 308.15, true, outlet, loads);   //=> 0
 * loads.sensible;   //=> 30585.28 (W: 2 kg/s dry air × (h2 − h1))
 * ```
 */
export function sensibleToTemperature(inlet: HumidAirState, mda: number, T2: number, wetBulb: boolean, out: HumidAirState, loads: ProcessLoads): StatusCode {
  if (badFlow(mda)) return fail(loads, Status.invalidInput, PROCESS_REASON.flow);
  if (!Number.isFinite(T2)) return fail(loads, Status.invalidInput, REASON.notFinite);
  if (inlet.Tdp === inlet.Tdp && T2 < inlet.Tdp) return fail(loads, Status.outOfRange, PROCESS_REASON.condensation);
  const s = humidAirState(PAIR.T_W, T2, inlet.W, inlet.p, wetBulb, out);
  if (fatal(s)) return fail(loads, s, out.reason);
  loads.waterEnthalpy = 0;
  loads.waterTemperature = 0;
  return finishLoads(inlet, mda, out, loads, s);
}

/**
 * Sensible heating (Q > 0) or cooling (Q < 0) of a stream by a heat flow Q (W): h2 = h1 + Q/ṁa at
 * constant W.
 * @example
 * ```ts
 * const inlet = new HumidAirState(), out = new HumidAirState(), loads = new ProcessLoads();
 * humidAirStateSI(PAIR.T_RH, 303.15, 0.5, 101325, true, inlet);   // 30 °C, 50 %
 * sensibleByHeat(inlet, 2, 10e3, true, out, loads);   //=> 0
 * out.T;   //=> 308.0008 (K: 10 kW into 2 kg/s of air)
 * ```
 */
export function sensibleByHeat(inlet: HumidAirState, mda: number, Q: number, wetBulb: boolean, out: HumidAirState, loads: ProcessLoads): StatusCode {
  if (badFlow(mda)) return fail(loads, Status.invalidInput, PROCESS_REASON.flow);
  if (!Number.isFinite(Q)) return fail(loads, Status.invalidInput, PROCESS_REASON.heat);
  const h2 = inlet.h + Q / mda;
  const s = humidAirState(PAIR.W_h, inlet.W, h2, inlet.p, wetBulb, out);
  if (s === Status.outOfRange && out.reason === REASON.supersaturated) return fail(loads, s, PROCESS_REASON.condensation);
  if (fatal(s)) return fail(loads, s, out.reason);
  if (inlet.Tdp === inlet.Tdp && out.T < inlet.Tdp) return fail(loads, Status.outOfRange, PROCESS_REASON.condensation);
  loads.waterEnthalpy = 0;
  loads.waterTemperature = 0;
  return finishLoads(inlet, mda, out, loads, s);
}

/**
 * Cooling with dehumidification, from the apparatus dew point ADP (K, the coil's effective surface
 * temperature) and bypass factor BF (0 ≤ BF < 1): the leaving air is the fraction BF of entering air
 * mixed with 1 − BF of air saturated at ADP (W and h linear). Condensate leaves at `Tcondensate`
 * (K; liquid, 273.15 K … 373.15 K) with its IF97 region 1 enthalpy.
 * @example
 * ```ts
 * const inlet = new HumidAirState(), out = new HumidAirState(), loads = new ProcessLoads();
 * humidAirStateSI(PAIR.T_RH, 303.15, 0.5, 101325, true, inlet);   // 30 °C, 50 %
 * coolingCoilBypass(inlet, 2, 283.15, 0.15, 283.15, true, out, loads);   //=> 0
 * out.T;         //=> 286.1764 (K)
 * loads.total;   //=> -59379.7 (W: heat removed)
 * ```
 */
export function coolingCoilBypass(inlet: HumidAirState, mda: number, ADP: number, BF: number, Tcondensate: number, wetBulb: boolean, out: HumidAirState, loads: ProcessLoads): StatusCode {
  if (badFlow(mda)) return fail(loads, Status.invalidInput, PROCESS_REASON.flow);
  if (!Number.isFinite(ADP) || !Number.isFinite(BF) || !Number.isFinite(Tcondensate)) return fail(loads, Status.invalidInput, REASON.notFinite);
  if (!(BF >= 0 && BF < 1)) return fail(loads, Status.outOfRange, PROCESS_REASON.bypassFactor);
  const p = inlet.p;
  let s = humidAirState(PAIR.T_RH, ADP, 1, p, false, out);
  if (fatal(s)) return fail(loads, s, out.reason);
  const Wadp = out.W;
  const hadp = out.h;
  if (Wadp > inlet.W) return fail(loads, Status.outOfRange, PROCESS_REASON.wouldHumidify);
  if ((s = liquidWater(p, Tcondensate, loads)) !== Status.ok) return s;
  s = humidAirState(PAIR.W_h, Wadp + BF * (inlet.W - Wadp), hadp + BF * (inlet.h - hadp), p, wetBulb, out);
  if (fatal(s)) return fail(loads, s, out.reason);
  return finishLoads(inlet, mda, out, loads, s);
}

/**
 * Cooling with dehumidification to a leaving dry-bulb T2 (K) and relative humidity RH2; the
 * condensate leaves at `Tcondensate` (K). Refused when the leaving air would hold more water than
 * the entering air (PROCESS_REASON.wouldHumidify) or be warmer.
 * @example
 * ```ts
 * const inlet = new HumidAirState(), out = new HumidAirState(), loads = new ProcessLoads();
 * humidAirStateSI(PAIR.T_RH, 303.15, 0.5, 101325, true, inlet);   // 30 °C, 50 %
 * coolingCoilToState(inlet, 2, 288.15, 0.9, 288.15, true, out, loads);   //=> 0
 * out.W;         //=> 0.009568025 (kg/kg)
 * loads.total;   //=> -49860.7 (W)
 * ```
 */
export function coolingCoilToState(inlet: HumidAirState, mda: number, T2: number, RH2: number, Tcondensate: number, wetBulb: boolean, out: HumidAirState, loads: ProcessLoads): StatusCode {
  if (badFlow(mda)) return fail(loads, Status.invalidInput, PROCESS_REASON.flow);
  if (!Number.isFinite(Tcondensate)) return fail(loads, Status.invalidInput, REASON.notFinite);
  let s = humidAirState(PAIR.T_RH, T2, RH2, inlet.p, wetBulb, out);
  if (fatal(s)) return fail(loads, s, out.reason);
  if (out.W > inlet.W || out.T > inlet.T) return fail(loads, Status.outOfRange, PROCESS_REASON.wouldHumidify);
  if ((s = liquidWater(inlet.p, Tcondensate, loads)) !== Status.ok) return s;
  return finishLoads(inlet, mda, out, loads, s);
}

/** Humidifier targets. */
export const TARGET = { W: 0, RH: 1, T: 2 } as const;

/**
 * Leaving state of a humidifier that adds water of enthalpy hw (J/kg) adiabatically, along
 * h = h1 + (W − W1)·hw, to a target W, RH or (evaporative only) T.
 */
function humidifyAlongLine(inlet: HumidAirState, hw: number, target: number, value: number, wetBulb: boolean, out: HumidAirState, loads: ProcessLoads): StatusCode {
  const p = inlet.p;
  const H0 = inlet.h - inlet.W * hw;
  let W2: number;
  if (target === TARGET.W) {
    W2 = value;
  } else if (target === TARGET.T) {
    const t = value - 273.15;
    W2 = (H0 - CP_DRY_AIR * t) / (H_VAPOR_0 + CP_VAPOR * t - hw);
  } else {
    if (!(value >= 0 && value <= 1)) return fail(loads, Status.outOfRange, REASON.relativeHumidity);
    if (value < inlet.RH) return fail(loads, Status.outOfRange, PROCESS_REASON.target);
    const flo = residual(RESIDUAL.humidifierRH, inlet.W, H0, hw, value, p);
    let hi = inlet.W + 1e-3;
    let fhi = residual(RESIDUAL.humidifierRH, hi, H0, hw, value, p);
    for (let i = 0; i < 40 && fhi < 0; i++) {
      hi = 2 * hi + 1e-3;
      fhi = residual(RESIDUAL.humidifierRH, hi, H0, hw, value, p);
    }
    if (fhi < 0) return fail(loads, Status.outOfRange, PROCESS_REASON.target);
    W2 = brent(RESIDUAL.humidifierRH, inlet.W, hi, flo, fhi, H0, hw, value, p, 1e-15);
    if (W2 < 0) return fail(loads, Status.noConvergence, REASON.none);
  }
  if (!(W2 >= inlet.W)) return fail(loads, Status.outOfRange, PROCESS_REASON.target);
  const s = humidAirState(PAIR.W_h, W2, H0 + W2 * hw, p, wetBulb, out);
  if (fatal(s)) return fail(loads, s, out.reason);
  return s;
}

/**
 * Steam humidification to a target W (kg/kg) or RH, with steam at (pSteam, TSteam) (Pa, K; vapour,
 * IF97 region 2: TSteam ≥ T_sat(pSteam), ≤ 1073.15 K, pSteam ≤ 10 MPa). Adiabatic:
 * h2 = h1 + (W2 − W1)·h_steam; heat = 0.
 * @example
 * ```ts
 * const inlet = new HumidAirState(), out = new HumidAirState(), loads = new ProcessLoads();
 * humidAirStateSI(PAIR.T_RH, 303.15, 0.5, 101325, true, inlet);   // 30 °C, 50 %
 * steamHumidifierSI(inlet, 2, TARGET.RH, 0.7, 200e3, 423.15, true, out, loads);   //=> 0
 * out.W;   //=> 0.02048373 (kg/kg)
 * ```
 */
export function steamHumidifier(inlet: HumidAirState, mda: number, target: number, value: number, pSteam: number, TSteam: number, wetBulb: boolean, out: HumidAirState, loads: ProcessLoads): StatusCode {
  if (badFlow(mda)) return fail(loads, Status.invalidInput, PROCESS_REASON.flow);
  if (!Number.isFinite(value) || !Number.isFinite(pSteam) || !Number.isFinite(TSteam)) return fail(loads, Status.invalidInput, REASON.notFinite);
  if (target !== TARGET.W && target !== TARGET.RH) return fail(loads, Status.invalidInput, PROCESS_REASON.target);
  if (!(pSteam > 0 && pSteam <= STEAM_P_MAX && TSteam >= 273.15 && TSteam <= STEAM_T_MAX)) return fail(loads, Status.outOfRange, PROCESS_REASON.steamState);
  if (pSteam >= saturationPressure(273.15) && TSteam < saturationTemperature(pSteam)) return fail(loads, Status.outOfRange, PROCESS_REASON.steamState);
  loads.waterEnthalpy = region2Enthalpy(pSteam, TSteam);
  loads.waterTemperature = TSteam;
  const s = humidifyAlongLine(inlet, loads.waterEnthalpy, target, value, wetBulb, out, loads);
  if (fatal(s)) return s;
  return finishLoads(inlet, mda, out, loads, s);
}

/**
 * Adiabatic (evaporative) humidification with liquid water at Twater (K, 273.15 … 373.15; IF97
 * region 1 enthalpy) to a target W, RH or leaving dry-bulb T. The air cools along
 * h2 = h1 + (W2 − W1)·hw, close to its wet-bulb line; heat = 0.
 * @example
 * ```ts
 * const inlet = new HumidAirState(), out = new HumidAirState(), loads = new ProcessLoads();
 * humidAirStateSI(PAIR.T_RH, 303.15, 0.5, 101325, true, inlet);   // 30 °C, 50 %
 * evaporativeHumidifierSI(inlet, 2, TARGET.RH, 0.7, 293.15, true, out, loads);   //=> 0
 * out.T;   //=> 299.2927 (K: cooled by evaporation)
 * ```
 */
export function evaporativeHumidifier(inlet: HumidAirState, mda: number, target: number, value: number, Twater: number, wetBulb: boolean, out: HumidAirState, loads: ProcessLoads): StatusCode {
  if (badFlow(mda)) return fail(loads, Status.invalidInput, PROCESS_REASON.flow);
  if (!Number.isFinite(value) || !Number.isFinite(Twater)) return fail(loads, Status.invalidInput, REASON.notFinite);
  if (target !== TARGET.W && target !== TARGET.RH && target !== TARGET.T) return fail(loads, Status.invalidInput, PROCESS_REASON.target);
  let s = liquidWater(inlet.p, Twater, loads);
  if (s !== Status.ok) return s;
  s = humidifyAlongLine(inlet, loads.waterEnthalpy, target, value, wetBulb, out, loads);
  if (fatal(s)) return s;
  return finishLoads(inlet, mda, out, loads, s);
}
