/**
 * IF97 region 2 (vapour, superheated and supercritical): the basic equation g(p, T), and the
 * supplementary equation for the metastable-vapour region.
 * IAPWS R7-97(2012), Section 6.1: Eqs. 15-17 (γ = γ° + γʳ, π = p/1 MPa, τ = 540 K/T), coefficients
 * Tables 10 and 11, relations Table 12, derivatives Tables 13-14, verification Table 15.
 * Section 6.2: metastable vapour, Eq. 18, Tables 16-17 (n°1, n°2 replaced), verification Table 18.
 * Range: 273.15 K ≤ T ≤ 623.15 K, 0 < p ≤ p_s(T); 623.15 K < T ≤ 863.15 K, 0 < p ≤ p_B23(T);
 * 863.15 K < T ≤ 1073.15 K, 0 < p ≤ 100 MPa.
 *
 * @module
 */
// named imports: a bundle keeps the constants the code reads, not the coefficient arrays (held by the generated kernels)
import { metastable, n0, pStar, TStar } from '../../../data/if97/region2.json';
import { fillFromIdealAndResidual } from './gibbs-ideal-residual.js';
import type { WaterProperties } from './properties.js';
import { R_IF97 } from './constants.js';
import { region2IdealSums, region2MetastableSums, region2ResidualSums, region2ResidualTauSum } from './kernels.generated.js';

const P_STAR = pStar;
const T_STAR = TStar;
// the metastable-vapour equation replaces n°1 and n°2 (the τ⁰ and τ¹ terms) of the ideal-gas part
const META_DN1 = metastable.n0_1 - n0[0]!;
const META_DN2 = metastable.n0_2 - n0[1]!;
const g = new Float64Array(3);
const r = new Float64Array(6);

/**
 * The equation's properties from its ideal-gas sums and the residual sums in `r` (either set): split
 * by equation so that a bundle using region 2 alone leaves out the metastable-vapour kernel.
 */
function fill(p: number, T: number, pi: number, tau: number, metastable: boolean, out: WaterProperties): WaterProperties {
  // ideal-gas part γ° = ln π + Σ n°ᵢ τ^J°ᵢ
  region2IdealSums(tau, g);
  let g0 = Math.log(pi) + g[0]!;
  let g0Tau = g[1]!;
  if (metastable) {
    g0 += META_DN1 + META_DN2 * tau;
    g0Tau += META_DN2;
  }
  return fillFromIdealAndResidual(p, T, pi, tau, g0, g0Tau, g[2]!, r, out);
}

/**
 * Fills `out` with all properties at (p [Pa], T [K]) from the region 2 equation.
 * @example
 * ```ts
 * region2(0.0035e6, 700, new WaterProperties()).h;   //=> 3335683.75 (J/kg; IF97 Table 15)
 * ```
 */
export function region2(p: number, T: number, out: WaterProperties): WaterProperties {
  const pi = p / P_STAR;
  const tau = T_STAR / T;
  region2ResidualSums(pi, tau - 0.5, r);
  return fill(p, T, pi, tau, false, out);
}

/**
 * Fills `out` from the metastable-vapour equation (Eq. 18), valid from the saturated-vapour line
 * to the 5 % equilibrium-moisture line for 0 < p ≤ 10 MPa.
 * @example
 * ```ts
 * region2Metastable(1e6, 450, new WaterProperties()).v;   //=> 0.19251654 (m³/kg; IF97 Table 18)
 * ```
 */
export function region2Metastable(p: number, T: number, out: WaterProperties): WaterProperties {
  const pi = p / P_STAR;
  const tau = T_STAR / T;
  region2MetastableSums(pi, tau - 0.5, r);
  return fill(p, T, pi, tau, true, out);
}

/**
 * The specific enthalpy alone at (p [Pa], T [K]), J/kg, from γ°_τ + γʳ_τ (Table 12: h = RTτγ_τ):
 * bit for bit {@link region2}'s `h`, for callers (humid-air processes: steam for a humidifier) that
 * need no other property and would otherwise bundle the residual part's five other sums. Same range
 * as {@link region2}.
 * @example
 * ```ts
 * region2Enthalpy(0.0035e6, 700);   //=> 3335683.75 (J/kg; IF97 Table 15)
 * ```
 */
export function region2Enthalpy(p: number, T: number): number {
  const tau = T_STAR / T;
  region2IdealSums(tau, g);
  return R_IF97 * T * tau * (g[1]! + region2ResidualTauSum(p / P_STAR, tau - 0.5));
}
