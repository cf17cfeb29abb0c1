/**
 * IF97 boundary between regions 2 and 3 (the B23 line).
 * IAPWS R7-97(2012), Section 4: Eq. 5 (p(T)) and Eq. 6 (T(p)), coefficients Table 1.
 * Check value: T = 623.15 K ⇔ p = 16.5291643 MPa. Range 623.15 K ≤ T ≤ 863.15 K.
 *
 * @module
 */
import data from '../../../data/if97/b23.json';

const [n1, n2, n3, n4, n5] = data.n as [number, number, number, number, number];

/**
 * Pressure on the B23 line at T (K), in Pa (Eq. 5).
 * @example
 * ```ts
 * b23Pressure(623.15);   //=> 16.529e6 (Pa)
 * ```
 */
export function b23Pressure(T: number): number {
  return (n1 + n2 * T + n3 * T * T) * 1e6;
}

/**
 * Temperature on the B23 line at p (Pa), in K (Eq. 6).
 * @example
 * ```ts
 * b23Temperature(16.5291643e6);   //=> 623.15 (K)
 * ```
 */
export function b23Temperature(p: number): number {
  return n4 + Math.sqrt((p / 1e6 - n5) / n3);
}
