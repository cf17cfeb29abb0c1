/**
 * The moist-air relations of the ASHRAE Handbook—Fundamentals (SI), chapter 1 (2017 edition;
 * equation numbers from memory): humidity ratio from the partial pressure of water vapour
 * (Eqs. 22-23, W = 0.621945 pw/(p − pw)), specific volume per kg of dry air (Eq. 28,
 * v = 0.287042 (t + 273.15)(1 + 1.607858 W)/p), enthalpy per kg of dry air (Eq. 32,
 * h = 1.006 t + W (2501 + 1.86 t) kJ/kg), and the adiabatic-saturation energy balance that defines
 * the thermodynamic wet-bulb temperature t* (Eqs. 35 and 37, with the enthalpy of the added water
 * hw = 4.186 t* over liquid and hw = −333.4 + 2.1 t* over ice). Here in SI: K, Pa, J/kg.
 * Coefficients: data/humid-air/ashrae-moist-air.json.
 *
 * Every function takes and returns plain numbers and never allocates.
 *
 * @module
 */
// named imports, so that a bundle carries the numbers and not the file's source text
import { cIce, cLiquid, cpDryAir, cpVapor, dryAirGasConstant, hIceAt0C, hVaporAt0C, molarMassRatio, vaporVolumeFactor } from '../../../data/humid-air/ashrae-moist-air.json';
import { T_ICE, waterSaturationPressure } from './saturation.js';

/** Ratio of the molar masses of water and dry air, 0.621945 (ASHRAE Eq. 22). */
export const EPSILON = molarMassRatio;
/** Gas constant of dry air used by ASHRAE Eq. 28, J/(kg·K). */
export const R_DRY_AIR = dryAirGasConstant;
/** 1.607858 = 1/0.621945, the vapour volume factor of Eq. 28. */
export const VAPOR_VOLUME_FACTOR = vaporVolumeFactor;
/** cp of dry air in Eq. 32, J/(kg·K). */
export const CP_DRY_AIR = cpDryAir;
/** Enthalpy of water vapour at 0 °C in Eq. 32, J/kg. */
export const H_VAPOR_0 = hVaporAt0C;
/** cp of water vapour in Eq. 32, J/(kg·K). */
export const CP_VAPOR = cpVapor;
/** Specific heat of liquid water in hw = 4.186 t, J/(kg·K). */
export const C_LIQUID = cLiquid;
/** Enthalpy of ice at 0 °C, J/kg (hw = −333.4 + 2.1 t kJ/kg). */
export const H_ICE_0 = hIceAt0C;
/** Specific heat of ice, J/(kg·K). */
export const C_ICE = cIce;

/** Returned by the relations below when water vapour would reach the total pressure (no saturated state). */
export const NO_SATURATION = 1e300;

/**
 * Humidity ratio W (kg/kg dry air) from the partial pressure of water vapour pw < p.
 * @example
 * ```ts
 * humidityRatioFromVaporPressure(101325, 2000);   //=> 0.01252343 (kg/kg)
 * ```
 */
export function humidityRatioFromVaporPressure(p: number, pw: number): number {
  return (EPSILON * pw) / (p - pw);
}

/**
 * Partial pressure of water vapour (Pa) from the humidity ratio.
 * @example
 * ```ts
 * vaporPressureFromHumidityRatio(101325, 0.01);   //=> 1603.383 (Pa)
 * ```
 */
export function vaporPressureFromHumidityRatio(p: number, W: number): number {
  return (p * W) / (EPSILON + W);
}

/**
 * Enthalpy of moist air per kg of dry air, J/kg (Eq. 32); zero for dry air at 0 °C.
 * @example
 * ```ts
 * moistAirEnthalpy(303.15, 0.01);   //=> 55748 (J/kg dry air)
 * ```
 */
export function moistAirEnthalpy(T: number, W: number): number {
  const t = T - 273.15;
  return CP_DRY_AIR * t + W * (H_VAPOR_0 + CP_VAPOR * t);
}

/**
 * Dry-bulb temperature (K) from enthalpy per kg of dry air and humidity ratio (Eq. 32 solved for t).
 * @example
 * ```ts
 * temperatureFromEnthalpy(64000, 0.0133);   //=> 302.9701 (K)
 * ```
 */
export function temperatureFromEnthalpy(h: number, W: number): number {
  return 273.15 + (h - H_VAPOR_0 * W) / (CP_DRY_AIR + CP_VAPOR * W);
}

/**
 * Enthalpy of the water (liquid at t ≥ 0 °C, ice below) added in the adiabatic saturator, J/kg.
 * @example
 * ```ts
 * saturatorWaterEnthalpy(295.15);   //=> 92092 (J/kg)
 * ```
 */
export function saturatorWaterEnthalpy(Tstar: number): number {
  const t = Tstar - 273.15;
  return Tstar >= T_ICE ? C_LIQUID * t : H_ICE_0 + C_ICE * t;
}

/**
 * Saturation humidity ratio Ws(p, T) of the ideal mixture (ASHRAE Eq. 23 with pws of pure water),
 * or `NO_SATURATION` when p_ws ≥ p (T at or above the boiling point at p).
 * @example
 * ```ts
 * saturationHumidityRatio(101325, 303.15);   //=> 0.02720697 (kg/kg)
 * ```
 */
export function saturationHumidityRatio(p: number, T: number): number {
  const ps = waterSaturationPressure(T);
  return ps < p ? (EPSILON * ps) / (p - ps) : NO_SATURATION;
}

/**
 * The constant K(t*) = h(t*, Ws*) − Ws*·hw(t*) of the adiabatic-saturation balance
 * h(t, W) − W·hw(t*) = K(t*), or `NO_SATURATION` when Ws* does not exist.
 * @example
 * ```ts
 * saturatorConstant(101325, 295.15);   //=> 62975.20
 * ```
 */
export function saturatorConstant(p: number, Tstar: number): number {
  const Wss = saturationHumidityRatio(p, Tstar);
  if (Wss === NO_SATURATION) return NO_SATURATION;
  return moistAirEnthalpy(Tstar, Wss) - Wss * saturatorWaterEnthalpy(Tstar);
}

/**
 * Humidity ratio W of air at dry-bulb T whose thermodynamic wet-bulb is t* (ASHRAE Eqs. 35 and 37,
 * written as the energy balance h(T, W) + (Ws* − W)·hw(t*) = h(t*, Ws*)), or
 * `NO_SATURATION` when Ws* does not exist. May be negative (no such state).
 * @example
 * ```ts
 * humidityRatioFromWetBulb(101325, 303.15, 295.15);   //=> 0.01330592 (kg/kg: 30 °C dry-bulb, 22 °C wet-bulb)
 * ```
 */
export function humidityRatioFromWetBulb(p: number, T: number, Tstar: number): number {
  const K = saturatorConstant(p, Tstar);
  if (K === NO_SATURATION) return NO_SATURATION;
  const t = T - 273.15;
  return (K - CP_DRY_AIR * t) / (H_VAPOR_0 + CP_VAPOR * t - saturatorWaterEnthalpy(Tstar));
}

/**
 * Specific volume of moist air per kg of dry air, m³/kg (Eq. 28).
 * @example
 * ```ts
 * moistAirVolume(101325, 303.15, 0.01);   //=> 0.872597 (m³/kg dry air)
 * ```
 */
export function moistAirVolume(p: number, T: number, W: number): number {
  return (R_DRY_AIR * T * (1 + VAPOR_VOLUME_FACTOR * W)) / p;
}
