/**
 * IF97 backward equations T(p, h) for regions 1 and 2, and the B2bc boundary.
 * IAPWS R7-97(2012): Section 5.2.1, Eq. 11, Table 6 (region 1; verification Table 7);
 * Section 6.3.1: Eqs. 20-21 (B2bc, Table 19), Eqs. 22-24 (2a, 2b, 2c; Tables 20-22; verification Table 24).
 * Used as starting values; the flash polishes them against the basic equations.
 *
 * @module
 */
import data2 from '../../../data/if97/backward-region2.json';
import { backward1PH, backward2aPH, backward2bPH, backward2cPH } from './kernels.generated.js';

const [b1, b2, b3, b4, b5] = data2.b2bc as [number, number, number, number, number];

/**
 * Region 1: T(p, h) in K, p in Pa, h in J/kg (Eq. 11).
 * @example
 * ```ts
 * region1TemperaturePH(3e6, 500e3);   //=> 391.798509 (K; IF97 Table 7)
 * ```
 */
export function region1TemperaturePH(p: number, h: number): number {
  return backward1PH(p / 1e6, h / 2500e3 + 1);
}

/**
 * B2bc: pressure on the 2b/2c boundary at h (J/kg), in Pa (Eq. 20).
 * @example
 * ```ts
 * b2bcPressure(3516.004323e3);   //=> 100.00000e6 (Pa; IF97 Eq. 20's check point, 100 MPa)
 * ```
 */
export function b2bcPressure(h: number): number {
  const eta = h / 1e3;
  return (b1 + b2 * eta + b3 * eta * eta) * 1e6;
}

/**
 * B2bc: enthalpy on the 2b/2c boundary at p (Pa), in J/kg (Eq. 21).
 * @example
 * ```ts
 * b2bcEnthalpy(100e6);   //=> 3516.004e3 (J/kg)
 * ```
 */
export function b2bcEnthalpy(p: number): number {
  return (b4 + Math.sqrt((p / 1e6 - b5) / b3)) * 1e3;
}

/**
 * Region 2: T(p, h) in K, choosing subregion 2a (p ≤ 4 MPa), 2b or 2c (by B2bc).
 * @example
 * ```ts
 * region2TemperaturePH(3e6, 3000e3);   //=> 575.37337 (K; IF97 Table 24)
 * ```
 */
export function region2TemperaturePH(p: number, h: number): number {
  const pi = p / 1e6;
  const eta = h / 2000e3;
  if (p <= 4e6) return backward2aPH(pi, eta - 2.1);
  if (h >= b2bcEnthalpy(p)) return backward2bPH(pi - 2, eta - 2.6);
  return backward2cPH(pi + 25, eta - 1.8);
}
