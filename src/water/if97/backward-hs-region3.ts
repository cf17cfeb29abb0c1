/**
 * IF97 equations in (h, s) for region 3, the region boundaries and the saturation line.
 * IAPWS SR4-04(2014): Eq. 1 with Table 3 (p_3a(h, s)); Eqs. 3-6 with Tables 9-12 (the saturated-liquid
 * boundary h′_1(s) and h′_3a(s), the saturated-vapour boundary h″_2ab(s) and h″_2c3b(s)); Eq. 7 with
 * Table 17 (h_B13(s)); Eq. 8 with Table 25 (T_B23(h, s)); Eq. 9 with Table 28 (T_sat(h, s)).
 * Verification: Tables 5, 13, 18, 26 and 29. p_3b(h, s) (Eq. 2) is not used: see data/if97/backward-hs-region3.json.
 * Used as starting values of the (h, s) flash.
 *
 * @module
 */
import {
  sr4h1s,
  sr4h2abs,
  sr4h2c3bs,
  sr4h3as,
  sr4hB13s,
  sr4p3a,
  sr4TB23hs,
  sr4Tsaths,
} from './kernels.generated.js';
import { S_B13_MAX } from './constants.js';

export { S_CRITICAL } from './constants.js';

/**
 * Region 3a: p(h, s) in Pa for s ≤ s_c (SR4-04 Eq. 1).
 * @example
 * ```ts
 * region3aPressureHS(1700e3, 3.8e3);   //=> 25557032.46 (Pa)
 * ```
 */
export function region3aPressureHS(h: number, s: number): number {
  return sr4p3a(h / 2300e3 - 1.01, s / 4.4e3 - 0.75) * 99e6;
}

/**
 * Saturated-liquid enthalpy h′(s) in J/kg for 0 ≤ s ≤ s_c: h′_1 below s′(623.15 K), h′_3a above (SR4-04 Eqs. 3-4).
 * @example
 * ```ts
 * saturatedLiquidEnthalpyHS(1e3);   //=> 308550.9647 (J/kg)
 * ```
 */
export function saturatedLiquidEnthalpyHS(s: number): number {
  const sigma = s / 3.8e3;
  return s <= S_B13_MAX ? sr4h1s(sigma - 1.09, sigma + 0.366e-4) * 1700e3 : sr4h3as(sigma - 1.09, sigma + 0.366e-4) * 1700e3;
}

/**
 * Saturated-vapour enthalpy h″(s) in J/kg for s_c ≤ s ≤ s″(273.15 K): h″_2c3b below 5.85 kJ/(kg·K), h″_2ab above (SR4-04 Eqs. 5-6).
 * @example
 * ```ts
 * saturatedVaporEnthalpyHS(7e3);   //=> 2723729.985 (J/kg)
 * ```
 */
export function saturatedVaporEnthalpyHS(s: number): number {
  if (s >= 5.85e3) return Math.exp(sr4h2abs(1 / (s / 5.21e3) - 0.513, s / 9.2e3 - 0.524)) * 2800e3;
  const q = sr4h2c3bs(s / 5.9e3 - 1.02, s / 5.9e3 - 0.726);
  return q * q * q * q * 2800e3;
}

/**
 * The 1/3 boundary h_B13(s) in J/kg (SR4-04 Eq. 7).
 * @example
 * ```ts
 * b13EnthalpyHS(3.7e3);   //=> 1632525.047 (J/kg)
 * ```
 */
export function b13EnthalpyHS(s: number): number {
  return sr4hB13s(s / 3.8e3 - 0.884, s / 3.8e3 - 0.864) * 1700e3;
}

/**
 * The 2/3 boundary as T_B23(h, s) in K (SR4-04 Eq. 8).
 * @example
 * ```ts
 * b23TemperatureHS(2600e3, 5.1e3);   //=> 713.5259364 (K)
 * ```
 */
export function b23TemperatureHS(h: number, s: number): number {
  return sr4TB23hs(h / 3000e3 - 0.727, s / 5.3e3 - 0.864) * 900;
}

/**
 * Saturation temperature T_sat(h, s) in K for two-phase states (SR4-04 Eq. 9).
 * @example
 * ```ts
 * saturationTemperatureHS(2400e3, 6e3);   //=> 425.1373305 (K)
 * ```
 */
export function saturationTemperatureHS(h: number, s: number): number {
  return sr4Tsaths(h / 2800e3 - 0.119, s / 9.2e3 - 1.07) * 550;
}
