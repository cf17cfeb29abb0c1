/**
 * IAPWS-IF97 constants. IAPWS R7-97(2012), Eqs. 1-2 (specific gas constant, critical point).
 *
 * @module
 */

/** Specific gas constant of water used by IF97, R = 0.461 526 kJ/(kg·K) (Eq. 1), in J/(kg·K). */
export const R_IF97 = 461.526;
/** Critical temperature Tc = 647.096 K (Eq. 3). */
export const T_CRITICAL = 647.096;
/** Critical pressure pc = 22.064 MPa (Eq. 4), in Pa. */
export const P_CRITICAL = 22.064e6;
/** Critical density ρc = 322 kg/m³ (Eq. 5). */
export const RHO_CRITICAL = 322;
/** Lower temperature limit of IF97, 273.15 K. */
export const T_MIN = 273.15;
/** Boundary between regions 1 and 3 (and 2 and 3 below the B23 line), 623.15 K. */
export const T_13 = 623.15;
/** Upper temperature limit of regions 1 to 3, 1073.15 K. */
export const T_MAX_2 = 1073.15;
/** Upper temperature limit of region 5, 2273.15 K. */
export const T_MAX_5 = 2273.15;
/** Upper pressure limit of regions 1 to 3, 100 MPa, in Pa. */
export const P_MAX = 100e6;
/** Upper pressure limit of region 5, 50 MPa, in Pa. */
export const P_MAX_5 = 50e6;
/** Triple-point temperature 273.16 K; IF97's saturation line starts at 273.15 K. */
export const T_TRIPLE = 273.16;
