/**
 * Saturation pressure of pure water for psychrometrics, and the water-vapour enhancement factor.
 *
 * - Over liquid water (T ≥ 273.15 K): IAPWS-IF97 region 4, IAPWS R7-97(2012) Eq. 30, through the
 *   project's IF97 SI core (`saturationPressure`); valid 273.15 K to 647.096 K.
 * - Over ice (T < 273.15 K): IAPWS R14-08(2011), Revised Release on the Pressure along the Melting
 *   and Sublimation Curves of Ordinary Water Substance, Eq. 6 with Table 3; valid 50 K to 273.16 K.
 *   Supercooled liquid below 273.15 K is not offered (IF97 does not cover it and no recalled
 *   formulation could be checked against printed values); below 0 °C saturation is over ice, as in
 *   the ASHRAE Handbook—Fundamentals moist-air table.
 * - Enhancement factor f(p, T), the ratio of the saturation partial pressure of water vapour in
 *   moist air to that of pure water: A. L. Buck, J. Appl. Meteorol. 20 (1981) 1527, f_w5 over water
 *   (−40 °C to 50 °C) and f_i5 over ice (−80 °C to 0 °C); see data/humid-air/enhancement-buck-1981.json.
 *
 * @module
 */
import sublimation from '../../../data/humid-air/sublimation-iapws-r14.json';
import buck from '../../../data/humid-air/enhancement-buck-1981.json';
import { saturationPressure, saturationTemperature } from '../../water/if97/region4.js';

const TT = sublimation.Tt;
const PT = sublimation.pt;
const [A1, A2, A3] = sublimation.a as [number, number, number];
const [B1, B2, B3] = sublimation.b as [number, number, number];
const LN_PT = Math.log(PT);

/** Temperature below which saturation is over ice, K (0 °C; IF97's saturation line starts here). */
export const T_ICE = 273.15;
/** Lowest saturation pressure over liquid water by IF97, Pa (at 273.15 K). */
export const P_WATER_AT_ICE = saturationPressure(T_ICE);

/**
 * Sublimation pressure of ice Ih in Pa, T in K (IAPWS R14-08(2011) Eq. 6). Valid 50 K to 273.16 K;
 * the caller checks the range.
 * @example
 * ```ts
 * sublimationPressure(230);   //=> 8.94735e-3 (Pa; the release's check value is 8.94735e-6 MPa)
 * ```
 */
export function sublimationPressure(T: number): number {
  const th = T / TT;
  // θ^b as exp(b ln θ): one logarithm for the three powers
  const L = Math.log(th);
  return PT * Math.exp((A1 * Math.exp(B1 * L) + A2 * Math.exp(B2 * L) + A3 * Math.exp(B3 * L)) / th);
}

/** d ln p_subl / dT in 1/K (derivative of Eq. 6). */
export function sublimationLogSlope(T: number): number {
  const th = T / TT;
  const L = Math.log(th);
  return (A1 * (B1 - 1) * Math.exp((B1 - 2) * L) + A2 * (B2 - 1) * Math.exp((B2 - 2) * L) + A3 * (B3 - 1) * Math.exp((B3 - 2) * L)) / TT;
}

/** Sublimation pressure at 273.15 K, Pa: the top of the ice branch. */
export const P_ICE_AT_WATER = sublimationPressure(T_ICE);

/**
 * Saturation pressure of pure water in Pa: over ice below 273.15 K (R14-08), over liquid from
 * 273.15 K (IF97). The caller checks 50 K ≤ T ≤ 647.096 K.
 * @example
 * ```ts
 * waterSaturationPressure(293.15);   //=> 2339.21 (Pa, over liquid, IF97)
 * waterSaturationPressure(253.15);   //=> 103.239 (Pa, over ice, IAPWS R14-08)
 * ```
 */
export function waterSaturationPressure(T: number): number {
  return T < T_ICE ? sublimationPressure(T) : saturationPressure(T);
}

/** Model codes: `enhanced` uses Buck's enhancement factor, `ideal` the ASHRAE ideal-mixture relations (f = 1). */
export const MODEL = { enhanced: 0, ideal: 1 } as const;
/** One of the {@link MODEL} codes. */
export type ModelCode = (typeof MODEL)[keyof typeof MODEL];

const FW_A = buck.water.A;
const FW_B = buck.water.B;
const FW_C = buck.water.C;
const FI_A = buck.ice.A;
const FI_B = buck.ice.B;
const FI_C = buck.ice.C;
/** Temperature range of the enhanced model, K: Buck's ice range starts at −80 °C, the water range ends at 50 °C. */
export const ENHANCED_T_MIN = 273.15 + buck.ice.tMin;
export const ENHANCED_T_MAX = 273.15 + buck.water.tMax;
/** Pressure range of the enhanced model, Pa (Buck's fit, from memory). */
export const ENHANCED_P_MIN = buck.pMin;
export const ENHANCED_P_MAX = buck.pMax;

/**
 * Enhancement factor f(p, T) (1 in the ideal model). Over ice below 273.15 K, over water above.
 * The caller checks the enhanced model's range ({@link ENHANCED_T_MIN} … {@link ENHANCED_T_MAX},
 * {@link ENHANCED_P_MIN} … {@link ENHANCED_P_MAX}).
 * @example
 * ```ts
 * enhancementFactor(MODEL.enhanced, 101325, 293.15);   //=> 1.00420 (Buck 1981, f_w5)
 * ```
 */
export function enhancementFactor(model: number, p: number, T: number): number {
  if (model === MODEL.ideal) return 1;
  const P = p / 100;
  const t = T - 273.15;
  return T < T_ICE ? 1 + 1e-4 * (FI_A + P * (FI_B + FI_C * t * t)) : 1 + 1e-4 * (FW_A + P * (FW_B + FW_C * t * t));
}

/** True when the enhancement factor of `model` may be evaluated at (p, T). */
export function enhancementInRange(model: number, p: number, T: number): boolean {
  return model === MODEL.ideal || (T >= ENHANCED_T_MIN && T <= ENHANCED_T_MAX && p >= ENHANCED_P_MIN && p <= ENHANCED_P_MAX);
}

/**
 * The temperature at which water vapour in moist air at total pressure p is saturated at partial
 * pressure `pw`: f(p, T)·p_ws(T) = pw (the dew point or frost point of that partial pressure), in K.
 * Over liquid it inverts IF97 with Eq. 31 (the exact inverse of Eq. 30) and iterates on f; over ice
 * it runs Newton on ln p_subl. Partial pressures between the ice branch's top (611.154 Pa at
 * 273.15 K) and the liquid branch's bottom (611.213 Pa) return 273.15 K. Returns −1 when the
 * answer lies outside [Tlo, Thi] or when the iteration fails (the caller turns that into a status).
 */
export function saturationTemperatureAt(pw: number, p: number, model: number, Tlo: number, Thi: number): number {
  if (!(pw > 0)) return -1;
  // f at 273.15 K decides the branch
  const fIce = enhancementFactor(model, p, T_ICE - 1e-9);
  const fWater = enhancementFactor(model, p, T_ICE);
  let T: number;
  if (pw / fWater >= P_WATER_AT_ICE) {
    T = saturationTemperature(pw / fWater);
    if (model !== MODEL.ideal) {
      // a contraction by about 4e-4 per pass (f varies slowly with T): once a step is below
      // 1e-9 K, one more pass leaves an error below 1e-12 K
      for (let i = 0; i < 20; i++) {
        const next = saturationTemperature(pw / enhancementFactor(model, p, T));
        const step = Math.abs(next - T);
        T = next;
        if (step <= 1e-9) {
          T = saturationTemperature(pw / enhancementFactor(model, p, T));
          break;
        }
      }
    }
  } else if (pw / fIce < P_ICE_AT_WATER) {
    const lnTarget = Math.log(pw);
    // start from the Clausius–Clapeyron line through the triple point (sublimation enthalpy ≈ 2.834 MJ/kg)
    T = 1 / (1 / TT - (Math.log(pw / PT) * 461.5) / 2.834e6);
    if (!(T > 20)) T = 20;
    if (T > T_ICE) T = T_ICE - 1e-6;
    let ok = false;
    for (let i = 0; i < 60; i++) {
      const th = T / TT;
      const L = Math.log(th);
      const e1 = A1 * Math.exp(B1 * L);
      const e2 = A2 * Math.exp(B2 * L);
      const e3 = A3 * Math.exp(B3 * L);
      // ln p_subl = ln pt + Σ a_i θ^(b_i − 1); its slope Σ a_i (b_i − 1) θ^(b_i − 2)/Tt
      const g = LN_PT + (e1 + e2 + e3) / th + (model === MODEL.ideal ? 0 : Math.log(enhancementFactor(model, p, T))) - lnTarget;
      const slope = (e1 * (B1 - 1) + e2 * (B2 - 1) + e3 * (B3 - 1)) / (th * th * TT);
      let next = T - g / slope;
      if (next >= T_ICE) next = 0.5 * (T + T_ICE);
      if (next < 0.5 * T) next = 0.5 * T;
      const step = Math.abs(next - T);
      T = next;
      if (step <= 1e-13 * T) {
        ok = true;
        break;
      }
    }
    if (!ok) return -1;
  } else {
    T = T_ICE;
  }
  if (!(T >= Tlo && T <= Thi)) return -1;
  return T;
}
