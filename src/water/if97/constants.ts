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
/** Upper temperature of the B23 line and of region 3, 863.15 K (IF97 Eq. 5 range; region 3 lies below it). */
export const T_B23_MAX = 863.15;
/** Lowest pressure the (h, s) and (T, v) searches consider, 1 mPa, in Pa. */
export const P_SEARCH_MIN = 1e-3;
/**
 * The entropy at the critical point, s_c = 4.412 021 482 234 76 kJ/(kg·K) (IAPWS SR4-04 and SR3-03), in
 * J/(kg·K): it divides regions 3a and 3b in the backward equations.
 */
export const S_CRITICAL = 4.41202148223476e3;
/** Entropy of saturated vapour at 273.15 K, s″ = 9.155 759 395 kJ/(kg·K) (SR4-04 range of h″(s)), in J/(kg·K). */
export const S_VAPOR_MAX = 9.155759395e3;
/** Entropy of the B13 boundary's lower end in (h, s), s = 3.397 782 955 kJ/(kg·K) (SR4-04 Eq. 7 range), in J/(kg·K). */
export const S_B13_MIN = 3.397782955e3;
/** Entropy of saturated liquid at 623.15 K, s′ = 3.778 281 340 kJ/(kg·K) (SR4-04), in J/(kg·K): the B13 line's upper end. */
export const S_B13_MAX = 3.77828134e3;
/** Lowest density searched in region 3, kg/m³ (the B23 line's vapour densities lie well above it). */
export const RHO_SEARCH_MIN_3 = 5;
/**
 * Highest density searched in region 3, kg/m³: the region 3 equation peaks in pressure near 800 kg/m³
 * (above 200 MPa on every isotherm of region 3) and is not valid beyond.
 */
export const RHO_SEARCH_MAX_3 = 800;
/**
 * Width of the near-critical band of the saturation line, K: within 1e-4 K of T_c the region 3
 * isotherms no longer cross p_s(T) of Eq. 30 twice (IF97's region 3 and region 4 equations meet the
 * critical point within their consistency tolerance, not exactly: region 3 gives p(ρc, Tc) =
 * 22.063 999 999 95 MPa), so the saturated densities are scaled toward ρc from the band's edge
 * (see saturation.ts).
 */
export const T_NEAR_CRITICAL_BAND = 1e-4;
/**
 * Width of the linear zone of the saturation line next to T_c, K: within 1 µK (0.27 Pa) of the
 * critical point the line is its tangent there (see saturation-line.ts), so the saturated phases of any
 * p < p_c are distinct even where T_s(p) rounds to T_c.
 */
export const T_LINEAR_SATURATION_ZONE = 1e-6;
/** Critical exponent β of the coexistence curve, ρ′ − ρ″ ∝ (Tc − T)^β (common practice, β ≈ 0.325). */
export const CRITICAL_EXPONENT_BETA = 0.325;
/** Temperature window around T_c where a region 3 density search on a branch may fall back to the single root of a loop-free isotherm, K. */
export const T_LOOP_FREE_WINDOW = 1e-2;

/**
 * Above this pressure (Pa) every state up to 623.15 K lies in region 1 without computing p_s(T): the
 * saturation pressure of Eq. 30 peaks at 16.529 MPa there (p_s(623.15 K), IF97 Section 4).
 */
export const P_REGION1_WITHOUT_SATURATION = 16.6e6;
