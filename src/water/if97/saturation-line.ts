/**
 * The saturation line as the IF97 solvers use it: Eq. 30 and Eq. 31 of IAPWS R7-97(2012), made to end
 * exactly at the critical point (T_c, p_c) of Eqs. 3–4. Kept apart from the saturated phases
 * (saturation.ts) so that the region 3 density search can choose its branch by the same line without
 * a circular import.
 *
 * @module
 */
import { P_CRITICAL, T_13, T_CRITICAL, T_LINEAR_SATURATION_ZONE, T_MIN, T_NEAR_CRITICAL_BAND } from './constants.js';
import { saturationPressure, saturationTemperature } from './region4.js';

/** Pressure at the saturation line's lower end, p_s(273.15 K), Pa. */
export const P_SAT_MIN = saturationPressure(T_MIN);
/** Pressure on the B23 line at 623.15 K (16.529 MPa): above it saturation lies in region 3. */
export const P_SAT_13 = saturationPressure(T_13);

/**
 * The saturation pressure used on the saturation line: Eq. 30, and inside the near-critical band
 * Eq. 30 plus a linear share of its miss at the critical point (Eq. 30 gives p_s(T_c) = p_c +
 * 0.32 mPa, within its stated accuracy), so that the line ends exactly at (T_c, p_c) and T_s(p_c) = T_c.
 * The correction is at most 0.32 mPa (1.5e-11 relative). Within 1 µK of T_c the line is its tangent
 * at T_c (Eq. 30 departs from it by under 1e-7 Pa there, about the rounding of Eq. 30 near T_c, which
 * scatters by a few 1e-8 Pa; the step where the two meet is under 3e-7 Pa), so that the line falls
 * strictly and T_s(p) inverts it exactly up to p_c.
 * @example
 * ```ts
 * saturationLinePressure(373.15);   //=> 101417.978 (Pa; Eq. 30 alone away from T_c)
 * saturationLinePressure(647.096);  //=> 22064000 (Pa: p_c exactly)
 * ```
 */
export function saturationLinePressure(T: number): number {
  if (T > T_CRITICAL - T_LINEAR_SATURATION_ZONE) return P_CRITICAL - CRITICAL_SLOPE * (T_CRITICAL - T);
  return bandLinePressure(T);
}

/** Eq. 30 with the near-critical band's correction (see {@link saturationLinePressure}). */
function bandLinePressure(T: number): number {
  const ps = saturationPressure(T);
  if (!(T > T_CRITICAL - T_NEAR_CRITICAL_BAND)) return ps;
  return ps - CRITICAL_MISS * ((T - (T_CRITICAL - T_NEAR_CRITICAL_BAND)) / T_NEAR_CRITICAL_BAND);
}

/** Eq. 30's miss at the critical point, p_s(T_c) − p_c, Pa. */
const CRITICAL_MISS = saturationPressure(T_CRITICAL) - P_CRITICAL;

/**
 * The slope of the saturation line at T_c, dp_s/dT = 268 136 Pa/K, from differences of the band's
 * line 10 µK and 20 µK under T_c (Richardson extrapolation; Eq. 30 is evaluated to a few 1e-8 Pa
 * near T_c, 2e-14 relative, so the slope is good to about 1e-8 relative).
 */
export const CRITICAL_SLOPE = 2 * lineSlopeBelowCritical(1e-5) - lineSlopeBelowCritical(2e-5);

/** (p_c − p_band(T_c − dT))/dT, Pa/K. */
function lineSlopeBelowCritical(dT: number): number {
  return (P_CRITICAL - bandLinePressure(T_CRITICAL - dT)) / dT;
}

/** p_c − p_s at the linear zone's edge, Pa. */
export const LINEAR_ZONE_PRESSURE = CRITICAL_SLOPE * T_LINEAR_SATURATION_ZONE;

/**
 * T_s(p) above 16.5 MPa: Eq. 31, then Newton steps on the saturation line's pressure
 * ({@link saturationLinePressure}). Near the critical point Eq. 31 loses digits to cancellation
 * (1e-9 K at p_c); the Newton steps keep them, so T_s(p) runs continuously into T_c.
 */
function nearCriticalSaturationTemperature(p: number): number {
  let T = Math.min(T_CRITICAL, saturationTemperature(p));
  for (let i = 0; i < 4; i++) {
    const h = 1e-6;
    const slope = (saturationLinePressure(T) - saturationLinePressure(T - h)) / h;
    const next = Math.min(T_CRITICAL, T - (saturationLinePressure(T) - p) / slope);
    if (next === T) break;
    T = next;
  }
  return T;
}

/**
 * T_s(p) in K for 611.213 Pa ≤ p ≤ 22.064 MPa as the saturation functions use it: Eq. 31, refined
 * above 16.5 MPa so that it ends exactly at T_c (see {@link saturationLinePressure}).
 * @example
 * ```ts
 * saturationTemperatureOnLine(22.064e6);   //=> 647.096
 * ```
 */
export function saturationTemperatureOnLine(p: number): number {
  if (p >= P_CRITICAL) return T_CRITICAL;
  if (P_CRITICAL - p < LINEAR_ZONE_PRESSURE) return T_CRITICAL - (P_CRITICAL - p) / CRITICAL_SLOPE;
  return p > P_SAT_13 ? nearCriticalSaturationTemperature(p) : Math.min(T_CRITICAL, Math.max(T_MIN, saturationTemperature(p)));
}

