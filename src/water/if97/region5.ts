/**
 * IF97 region 5 (high-temperature steam): the basic equation g(p, T), 2007 revision valid to 50 MPa.
 * IAPWS R7-97(2012), Section 9: Eqs. 32-34 (γ = γ° + γʳ, π = p/1 MPa, τ = 1000 K/T), coefficients
 * Tables 37 and 38, relations Table 39, derivatives Tables 40-41, verification Table 42.
 * Range: 1073.15 K ≤ T ≤ 2273.15 K, 0 < p ≤ 50 MPa.
 *
 * @module
 */
import data from '../../../data/if97/region5.json';
import { R_IF97 } from './constants.js';
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
  const grPi = r[1]!;
  const grPiPi = r[2]!;
  const grPiTau = r[5]!;
  const RT = R_IF97 * T;
  const gPi = 1 / pi + grPi;
  const gTau = g0Tau + r[3]!;
  const gTauTau = g0TauTau + r[4]!;
  out.T = T;
  out.p = p;
  out.v = (pi * gPi * RT) / p;
  out.rho = 1 / out.v;
  out.h = RT * tau * gTau;
  out.u = RT * (tau * gTau - pi * gPi);
  out.s = R_IF97 * (tau * gTau - (g0 + r[0]!));
  out.cp = -R_IF97 * tau * tau * gTauTau;
  const a = 1 + pi * grPi - tau * pi * grPiTau;
  const b = 1 - pi * pi * grPiPi;
  out.cv = R_IF97 * (-tau * tau * gTauTau - (a * a) / b);
  const c = 1 + pi * grPi;
  out.w = Math.sqrt((RT * c * c) / (b + (a * a) / (tau * tau * gTauTau)));
  return out;
}
