/**
 * IF97 region 4 (saturation line): the saturation-pressure equation and its inverse.
 * IAPWS R7-97(2012), Section 8: Eq. 29 (implicit quadratic in β = (p/1 MPa)^¼ and ϑ), Eq. 30
 * (p_s(T)), Eq. 31 (T_s(p)), coefficients Table 34, verification Tables 35 and 36.
 * Range: 273.15 K ≤ T ≤ 647.096 K; 611.213 Pa ≤ p ≤ 22.064 MPa.
 *
 * @module
 */
import { n } from '../../../data/if97/region4.json';

const [n1, n2, n3, n4, n5, n6, n7, n8, n9, n10] = n as [number, number, number, number, number, number, number, number, number, number];

/**
 * Saturation pressure p_s(T) in Pa, T in K (Eq. 30).
 * @example
 * ```ts
 * saturationPressure(300);   //=> 3536.58941 (Pa; IF97 Table 35)
 * ```
 */
export function saturationPressure(T: number): number {
  const th = T + n9 / (T - n10);
  const A = th * th + n1 * th + n2;
  const B = n3 * th * th + n4 * th + n5;
  const C = n6 * th * th + n7 * th + n8;
  const x = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  const x2 = x * x;
  return x2 * x2 * 1e6;
}

/**
 * Saturation temperature T_s(p) in K, p in Pa (Eq. 31).
 * @example
 * ```ts
 * saturationTemperature(0.1e6);   //=> 372.755919 (K; IF97 Table 36)
 * ```
 */
export function saturationTemperature(p: number): number {
  const beta = Math.sqrt(Math.sqrt(p / 1e6));
  const E = beta * beta + n3 * beta + n6;
  const F = n1 * beta * beta + n4 * beta + n7;
  const G = n2 * beta * beta + n5 * beta + n8;
  const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
  return (n10 + D - Math.sqrt((n10 + D) * (n10 + D) - 4 * (n9 + n10 * D))) / 2;
}
