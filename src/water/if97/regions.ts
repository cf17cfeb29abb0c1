/**
 * The IF97 region table: each region described once, with its basic equation and its bounds
 * (IAPWS R7-97(2012) Section 4 and Figure 1). Every solver dispatches through
 * {@link evaluateForward}, the one place that maps a region number to its (p, T) equation.
 *
 * @module
 */
import { P_MAX, P_MAX_5, T_13, T_B23_MAX, T_MAX_2, T_MAX_5, T_MIN } from './constants.js';
import type { WaterProperties } from './properties.js';
import { region1 } from './region1.js';
import { region2 } from './region2.js';
import { region3 } from './region3.js';
import { region5 } from './region5.js';

/** Temperature and pressure bounds of a region's rectangle (the curved boundaries live in the classifier). */
export interface RegionBounds {
  /** Lowest temperature, K. */
  readonly Tmin: number;
  /** Highest temperature, K. */
  readonly Tmax: number;
  /** Highest pressure, Pa. */
  readonly pMax: number;
  /** The boundaries beyond the rectangle, in words (for documentation and messages). */
  readonly curved: string;
}

/** A region whose basic equation is a Gibbs function of (p, T). */
export interface GibbsRegion {
  readonly id: 1 | 2 | 5;
  /** Fills `out` at (p [Pa], T [K]). */
  readonly evaluate: (p: number, T: number, out: WaterProperties) => WaterProperties;
  readonly bounds: RegionBounds;
}

/** Region 3, whose basic equation is a Helmholtz function of (ρ, T). */
export interface HelmholtzRegion {
  readonly id: 3;
  /** Fills `out` at (ρ [kg/m³], T [K]). */
  readonly evaluate: (rho: number, T: number, out: WaterProperties) => WaterProperties;
  readonly bounds: RegionBounds;
}

/** Region 1, compressed liquid (R7-97 Section 5). */
export const REGION_1: GibbsRegion = { id: 1, evaluate: region1, bounds: { Tmin: T_MIN, Tmax: T_13, pMax: P_MAX, curved: 'p ≥ p_s(T)' } };
/** Region 2, vapour (R7-97 Section 6). */
export const REGION_2: GibbsRegion = { id: 2, evaluate: region2, bounds: { Tmin: T_MIN, Tmax: T_MAX_2, pMax: P_MAX, curved: 'p ≤ p_s(T) below 623.15 K; p ≤ p_B23(T) from 623.15 K to 863.15 K' } };
/** Region 3, near-critical (R7-97 Section 7). */
export const REGION_3: HelmholtzRegion = { id: 3, evaluate: region3, bounds: { Tmin: T_13, Tmax: T_B23_MAX, pMax: P_MAX, curved: 'p ≥ p_B23(T)' } };
/** Region 5, high-temperature vapour (R7-97 Section 9). */
export const REGION_5: GibbsRegion = { id: 5, evaluate: region5, bounds: { Tmin: T_MAX_2, Tmax: T_MAX_5, pMax: P_MAX_5, curved: 'none' } };

/** The regions by number (4, the saturation line, has no single-phase equation). */
export const REGIONS = { 1: REGION_1, 2: REGION_2, 3: REGION_3, 5: REGION_5 } as const;

/**
 * Evaluates the basic equation of region 1, 2 or 5 at (p [Pa], T [K]) into `out`.
 * @example
 * ```ts
 * evaluateForward(1, 3e6, 300, new WaterProperties()).h;   //=> 115331.273 (J/kg; IF97 Table 5)
 * ```
 */
export function evaluateForward(region: number, p: number, T: number, out: WaterProperties): WaterProperties {
  if (region === 1) return region1(p, T, out);
  if (region === 2) return region2(p, T, out);
  return region5(p, T, out);
}
