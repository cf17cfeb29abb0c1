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
import data from '../../../data/if97/region2.json';
import { R_IF97 } from './constants.js';
import type { WaterProperties } from './properties.js';
import { region2MetastableSums, region2ResidualSums } from './kernels.generated.js';

const J0 = Int32Array.from(data.J0);
const N0 = Float64Array.from(data.n0);
const N0_META = Float64Array.from(data.n0, (v, i) => (i === 0 ? data.metastable.n0_1 : i === 1 ? data.metastable.n0_2 : v));
const P_STAR = data.pStar;
const T_STAR = data.TStar;
const r = new Float64Array(6);

/** x^k for a small integer k (the ideal-gas parts' exponents, −5 … 3). */
export function powInt(x: number, k: number): number {
  let b = k < 0 ? 1 / x : x;
  let e = k < 0 ? -k : k;
  let acc = 1;
  while (e > 0) {
    if (e & 1) acc *= b;
    b *= b;
    e >>= 1;
  }
  return acc;
}

function evaluate(p: number, T: number, out: WaterProperties, residual: (x: number, y: number, out: Float64Array) => void, n0: Float64Array): WaterProperties {
  const pi = p / P_STAR;
  const tau = T_STAR / T;
  // ideal-gas part γ° = ln π + Σ n°ᵢ τ^J°ᵢ
  let g0 = Math.log(pi);
  let g0Tau = 0;
  let g0TauTau = 0;
  for (let i = 0; i < J0.length; i++) {
    const J = J0[i]!;
    const t = n0[i]! * powInt(tau, J);
    g0 += t;
    g0Tau += J * t;
    g0TauTau += J * (J - 1) * t;
  }
  g0Tau /= tau;
  g0TauTau /= tau * tau;
  residual(pi, tau - 0.5, r);
  const gr = r[0]!;
  const grPi = r[1]!;
  const grPiPi = r[2]!;
  const grTau = r[3]!;
  const grTauTau = r[4]!;
  const grPiTau = r[5]!;
  const RT = R_IF97 * T;
  const gPi = 1 / pi + grPi;
  const gTau = g0Tau + grTau;
  const gTauTau = g0TauTau + grTauTau;
  out.T = T;
  out.p = p;
  out.v = (pi * gPi * RT) / p;
  out.rho = 1 / out.v;
  out.h = RT * tau * gTau;
  out.u = RT * (tau * gTau - pi * gPi);
  out.s = R_IF97 * (tau * gTau - (g0 + gr));
  out.cp = -R_IF97 * tau * tau * gTauTau;
  const a = 1 + pi * grPi - tau * pi * grPiTau;
  const b = 1 - pi * pi * grPiPi;
  out.cv = R_IF97 * (-tau * tau * gTauTau - (a * a) / b);
  const c = 1 + pi * grPi;
  out.w = Math.sqrt((RT * c * c) / (b + (a * a) / (tau * tau * gTauTau)));
  return out;
}

/** Fills `out` with all properties at (p [Pa], T [K]) from the region 2 equation. */
export function region2(p: number, T: number, out: WaterProperties): WaterProperties {
  return evaluate(p, T, out, region2ResidualSums, N0);
}

/**
 * Fills `out` from the metastable-vapour equation (Eq. 18), valid from the saturated-vapour line
 * to the 5 % equilibrium-moisture line for 0 < p ≤ 10 MPa.
 */
export function region2Metastable(p: number, T: number, out: WaterProperties): WaterProperties {
  return evaluate(p, T, out, region2MetastableSums, N0_META);
}
