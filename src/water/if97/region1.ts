/**
 * IF97 region 1 (compressed liquid): the basic equation g(p, T).
 * IAPWS R7-97(2012), Section 5.1: Eq. 7 (dimensionless Gibbs free energy γ(π, τ), π = p/16.53 MPa,
 * τ = 1386 K/T), coefficients Table 2, property relations Table 3, derivatives Table 4.
 * Verification: Table 5. Range: 273.15 K ≤ T ≤ 623.15 K, p_s(T) ≤ p ≤ 100 MPa.
 *
 * @module
 */
// named imports: a bundle keeps the constants the code reads, not the coefficient arrays (held by the generated kernels)
import { pStar, TStar } from '../../../data/if97/region1.json';
import { R_IF97 } from './constants.js';
import type { WaterProperties } from './properties.js';
import { region1Sums, region1TauSum } from './kernels.generated.js';

const P_STAR = pStar;
const T_STAR = TStar;
const g = new Float64Array(6);

/**
 * Fills `out` with all properties at (p [Pa], T [K]) from the region 1 equation.
 * @example
 * ```ts
 * const out = new WaterProperties();
 * region1(3e6, 300, out).h;   //=> 115331.273 (J/kg; IF97 Table 5)
 * ```
 */
export function region1(p: number, T: number, out: WaterProperties): WaterProperties {
  const pi = p / P_STAR;
  const tau = T_STAR / T;
  region1Sums(7.1 - pi, tau - 1.222, g);
  const gamma = g[0]!;
  const gPi = -g[1]!;
  const gPiPi = g[2]!;
  const gTau = g[3]!;
  const gTauTau = g[4]!;
  const gPiTau = -g[5]!;
  const RT = R_IF97 * T;
  out.T = T;
  out.p = p;
  out.v = (pi * gPi * RT) / p;
  out.rho = 1 / out.v;
  out.h = RT * tau * gTau;
  out.u = RT * (tau * gTau - pi * gPi);
  out.s = R_IF97 * (tau * gTau - gamma);
  out.cp = -R_IF97 * tau * tau * gTauTau;
  const a = gPi - tau * gPiTau;
  out.cv = R_IF97 * (-tau * tau * gTauTau + (a * a) / gPiPi);
  out.w = Math.sqrt((RT * gPi * gPi) / ((a * a) / (tau * tau * gTauTau) - gPiPi));
  return out;
}

/**
 * The specific enthalpy alone at (p [Pa], T [K]), J/kg, from γ_τ (Table 3: h = RTτγ_τ): bit for bit
 * {@link region1}'s `h`, for callers (humid-air processes: condensate and spray water) that need no
 * other property and would otherwise bundle the five other sums. Same range as {@link region1}.
 * @example
 * ```ts
 * region1Enthalpy(3e6, 300);   //=> 115331.273 (J/kg; IF97 Table 5)
 * ```
 */
export function region1Enthalpy(p: number, T: number): number {
  const tau = T_STAR / T;
  return R_IF97 * T * tau * region1TauSum(7.1 - p / P_STAR, tau - 1.222);
}
