/**
 * Barometric pressure of the standard atmosphere from altitude: ASHRAE Handbook—Fundamentals (SI)
 * ch. 1, Eq. 3, p = 101.325 (1 − 2.25577e-5 Z)^5.2559 kPa with Z in m. Stated range here:
 * −5000 m ≤ Z ≤ 11 000 m (the troposphere of the standard atmosphere the equation describes;
 * the Handbook's Table 1 lists −500 m to 10 000 m). Coefficients: data/humid-air/ashrae-moist-air.json.
 *
 * @module
 */
import { altitude } from '../../../data/humid-air/ashrae-moist-air.json';
import { Status, type StatusCode } from '../../core/status.js';

/** Lowest altitude of the standard-atmosphere relation, m. */
export const ALTITUDE_MIN = altitude.zMin;
/** Highest altitude of the standard-atmosphere relation, m. */
export const ALTITUDE_MAX = altitude.zMax;
const P0 = altitude.p0;
const K = altitude.k;
const N = altitude.exponent;

/**
 * Standard-atmosphere pressure (Pa) at altitude Z (m), or −1 outside {@link ALTITUDE_MIN} … {@link ALTITUDE_MAX}
 * (or for a non-finite Z); see {@link altitudePressureStatus} for the status.
 * @example
 * ```ts
 * standardAtmospherePressure(1000);   //=> 89874.5 (Pa; ASHRAE Table 1 prints 89.875 kPa)
 * ```
 */
export function standardAtmospherePressure(Z: number): number {
  if (!(Z >= ALTITUDE_MIN && Z <= ALTITUDE_MAX)) return -1;
  return P0 * (1 - K * Z) ** N;
}

/**
 * The status of {@link standardAtmospherePressure} for Z: invalidInput (not finite), outOfRange, or ok.
 * @example
 * ```ts
 * altitudePressureStatus(1000);    //=> 0 (Status.ok)
 * altitudePressureStatus(20000);   //=> 1 (Status.outOfRange: above 11 000 m)
 * ```
 */
export function altitudePressureStatus(Z: number): StatusCode {
  if (!Number.isFinite(Z)) return Status.invalidInput;
  return Z >= ALTITUDE_MIN && Z <= ALTITUDE_MAX ? Status.ok : Status.outOfRange;
}
