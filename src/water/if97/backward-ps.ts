/**
 * IF97 backward equations T(p, s) for regions 1 and 2.
 * IAPWS R7-97(2012): Section 5.2.2, Eq. 13, Table 8 (region 1; verification Table 9);
 * Section 6.3.2: Eqs. 25-27 (2a, 2b, 2c; Tables 25-27; subregion boundaries p = 4 MPa and
 * s = 5.85 kJ/(kg·K); verification Table 29).
 *
 * @module
 */
import { backward1PS, backward2aPS, backward2bPS, backward2cPS } from './kernels.generated.js';

/**
 * Region 1: T(p, s) in K, p in Pa, s in J/(kg·K) (Eq. 13).
 * @example
 * ```ts
 * region1TemperaturePS(3e6, 500);   //=> 307.842258 (K; IF97 Table 9)
 * ```
 */
export function region1TemperaturePS(p: number, s: number): number {
  return backward1PS(p / 1e6, s / 1e3 + 2);
}

/**
 * Region 2: T(p, s) in K, choosing subregion 2a (p ≤ 4 MPa), 2b (s ≥ 5.85 kJ/(kg·K)) or 2c.
 * @example
 * ```ts
 * region2TemperaturePS(0.1e6, 7500);   //=> 399.517097 (K; IF97 Table 29)
 * ```
 */
export function region2TemperaturePS(p: number, s: number): number {
  const pi = p / 1e6;
  if (p <= 4e6) return backward2aPS(Math.sqrt(Math.sqrt(pi)), s / 2e3 - 2);
  if (s >= 5.85e3) return backward2bPS(pi, 10 - s / 785.3);
  return backward2cPS(pi, 2 - s / 2925.1);
}
