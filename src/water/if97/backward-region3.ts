/**
 * IF97 region 3 backward equations T(p, h), v(p, h), T(p, s) and v(p, s).
 * IAPWS SR3-03(2014): Eq. 1 with Table 2 (the 3a/3b boundary h_3ab(p)); Eqs. 2-3 with Tables 3-4
 * (T_3a, T_3b of (p, h)); Eqs. 4-5 with Tables 6-7 (v_3a, v_3b of (p, h)); Eqs. 6-7 with Tables 10-11
 * (T of (p, s)); Eqs. 8-9 with Tables 13-14 (v of (p, s)); 3a/3b by s = s_c = 4.412 kJ/(kg·K) for (p, s).
 * Verification: Tables 5 and 12. Used as starting values of region 3 flashes.
 *
 * @module
 */
import data from '../../../data/if97/backward-region3.json';
import * as K from './kernels.generated.js';
import { S_CRITICAL } from './constants.js';

const [a1, a2, a3, a4] = data.h3ab as [number, number, number, number];

type Fn = (x: number, y: number) => number;
interface Spec {
  readonly star: readonly number[];
  readonly shift: readonly number[];
}
/** Evaluates value = star[0] · Σ(π + shift[0], y/star[2] + shift[1]) with π = p/(star[1] MPa). */
function make(spec: Spec, kernel: Fn, yScale: number): (p: number, y: number) => number {
  const [vStar, pStar, yStar] = spec.star as [number, number, number];
  const [dx, dy] = spec.shift as [number, number];
  const pDiv = pStar * 1e6;
  const yDiv = yStar * yScale;
  return (p, y) => vStar * kernel(p / pDiv + dx, y / yDiv + dy);
}

const T3aPH = make(data.T3aPH, K.backwardT3aPH, 1e3);
const T3bPH = make(data.T3bPH, K.backwardT3bPH, 1e3);
const v3aPH = make(data.v3aPH, K.backwardv3aPH, 1e3);
const v3bPH = make(data.v3bPH, K.backwardv3bPH, 1e3);
const T3aPS = make(data.T3aPS, K.backwardT3aPS, 1e3);
const T3bPS = make(data.T3bPS, K.backwardT3bPS, 1e3);
const v3aPS = make(data.v3aPS, K.backwardv3aPS, 1e3);
const v3bPS = make(data.v3bPS, K.backwardv3bPS, 1e3);

/** The 3a/3b boundary h_3ab(p) in J/kg, p in Pa (SR3-03 Eq. 1). */
export function h3abEnthalpy(p: number): number {
  const pi = p / 1e6;
  return (a1 + pi * (a2 + pi * (a3 + pi * a4))) * 1e3;
}

/**
 * Region 3: T(p, h) in K (3a for h ≤ h_3ab(p), else 3b).
 * @example
 * ```ts
 * region3TemperaturePH(20e6, 1700e3);   //=> 629.3083892 (K; SR3-03 Table 5)
 * ```
 */
export function region3TemperaturePH(p: number, h: number): number {
  return h <= h3abEnthalpy(p) ? T3aPH(p, h) : T3bPH(p, h);
}

/**
 * Region 3: v(p, h) in m³/kg.
 * @example
 * ```ts
 * region3VolumePH(20e6, 1700e3);   //=> 0.00174990396 (m³/kg; SR3-03 Table 5)
 * ```
 */
export function region3VolumePH(p: number, h: number): number {
  return h <= h3abEnthalpy(p) ? v3aPH(p, h) : v3bPH(p, h);
}

/**
 * Region 3: T(p, s) in K (3a for s ≤ s_c, else 3b).
 * @example
 * ```ts
 * region3TemperaturePS(20e6, 3.8e3);   //=> 628.2959869 (K; SR3-03 Table 12)
 * ```
 */
export function region3TemperaturePS(p: number, s: number): number {
  return s <= S_CRITICAL ? T3aPS(p, s) : T3bPS(p, s);
}

/**
 * Region 3: v(p, s) in m³/kg.
 * @example
 * ```ts
 * region3VolumePS(20e6, 3.8e3);   //=> 0.001733791463 (m³/kg; SR3-03 Table 12)
 * ```
 */
export function region3VolumePS(p: number, s: number): number {
  return s <= S_CRITICAL ? v3aPS(p, s) : v3bPS(p, s);
}
