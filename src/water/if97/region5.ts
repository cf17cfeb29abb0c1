/**
 * IF97 region 5 (high-temperature steam): the basic equation g(p, T), 2007 revision valid to 50 MPa.
 * IAPWS R7-97(2012), Section 9: Eqs. 32-34 (γ = γ° + γʳ, π = p/1 MPa, τ = 1000 K/T), coefficients
 * Tables 37 and 38, relations Table 39, derivatives Tables 40-41, verification Table 42.
 * Range: 1073.15 K ≤ T ≤ 2273.15 K, 0 < p ≤ 50 MPa.
 *
 * @module
 */
import data from '../../../data/if97/region5.json';
import { fillFromIdealAndResidual } from './gibbs-ideal-residual.js';
import type { WaterProperties } from './properties.js';
import { region5IdealSums, region5ResidualSums } from './kernels.generated.js';

const P_STAR = data.pStar;
const T_STAR = data.TStar;
const g = new Float64Array(3);
const r = new Float64Array(6);

/**
 * Fills `out` with all properties at (p [Pa], T [K]) from the region 5 equation.
 * @example
 * ```ts
 * region5(0.5e6, 1500, new WaterProperties()).h;   //=> 5219768.55 (J/kg; IF97 Table 42)
 * ```
 */
export function region5(p: number, T: number, out: WaterProperties): WaterProperties {
  const pi = p / P_STAR;
  const tau = T_STAR / T;
  region5IdealSums(tau, g);
  const g0 = Math.log(pi) + g[0]!;
  const g0Tau = g[1]!;
  const g0TauTau = g[2]!;
  region5ResidualSums(pi, tau, r);
  return fillFromIdealAndResidual(p, T, pi, tau, g0, g0Tau, g0TauTau, r, out);
}
