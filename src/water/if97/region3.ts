/**
 * IF97 region 3 (near-critical): the basic equation f(ρ, T).
 * IAPWS R7-97(2012), Section 7: Eq. 28 (dimensionless Helmholtz free energy φ(δ, τ), δ = ρ/322 kg/m³,
 * τ = 647.096 K/T), coefficients Table 30, relations Table 31, derivatives Table 32,
 * verification Table 33. Range: 623.15 K ≤ T ≤ T_B23(p), p_B23(T) ≤ p ≤ 100 MPa.
 *
 * @module
 */
import data from '../../../data/if97/region3.json';
import { R_IF97 } from './constants.js';
import type { WaterProperties } from './properties.js';
import { region3Sums } from './kernels.generated.js';

const N1 = data.n1;
const RHO_STAR = data.rhoStar;
const T_STAR = data.TStar;
const f = new Float64Array(6);
/** φ and its derivatives at (δ, τ): [φ, φδ, φδδ, φτ, φττ, φδτ], filled by {@link phiAt}. */
const phi = new Float64Array(6);

/** Fills {@link phi} at (δ, τ) (IAPWS R7-97(2012) Table 32). */
function phiAt(delta: number, tau: number): void {
  region3Sums(delta, tau, f);
  phi[0] = N1 * Math.log(delta) + f[0]!;
  phi[1] = N1 / delta + f[1]!;
  phi[2] = -N1 / (delta * delta) + f[2]!;
  phi[3] = f[3]!;
  phi[4] = f[4]!;
  phi[5] = f[5]!;
}

/**
 * Fills `out` with all properties at (ρ [kg/m³], T [K]) from the region 3 equation.
 * @example
 * ```ts
 * region3(500, 650, new WaterProperties()).p;   //=> 25.5837018e6 (Pa; IF97 Table 33)
 * ```
 */
export function region3(rho: number, T: number, out: WaterProperties): WaterProperties {
  const delta = rho / RHO_STAR;
  const tau = T_STAR / T;
  phiAt(delta, tau);
  const pD = phi[1]!;
  const pDD = phi[2]!;
  const pT = phi[3]!;
  const pTT = phi[4]!;
  const pDT = phi[5]!;
  const RT = R_IF97 * T;
  out.T = T;
  out.rho = rho;
  out.v = 1 / rho;
  out.p = rho * RT * delta * pD;
  out.u = RT * tau * pT;
  out.h = RT * (tau * pT + delta * pD);
  out.s = R_IF97 * (tau * pT - phi[0]!);
  out.cv = -R_IF97 * tau * tau * pTT;
  const a = delta * pD - delta * tau * pDT;
  const b = 2 * delta * pD + delta * delta * pDD;
  out.cp = R_IF97 * (-tau * tau * pTT + (a * a) / b);
  out.w = Math.sqrt(RT * (b - (a * a) / (tau * tau * pTT)));
  return out;
}

/**
 * Pressure p(ρ, T) in Pa and its derivative (∂p/∂ρ)_T in Pa·m³/kg, written to out[0], out[1]
 * (for density solves).
 * @example
 * ```ts
 * const pr = new Float64Array(2);
 * region3Pressure(500, 650, pr);
 * pr[0];   //=> 25583701.82 (Pa; IF97 Table 33)
 * ```
 */
export function region3Pressure(rho: number, T: number, out: Float64Array): void {
  const delta = rho / RHO_STAR;
  region3Sums(delta, T_STAR / T, f);
  const pD = N1 / delta + f[1]!;
  const pDD = -N1 / (delta * delta) + f[2]!;
  const RT = R_IF97 * T;
  out[0] = rho * RT * delta * pD;
  out[1] = RT * (2 * delta * pD + delta * delta * pDD);
}

/**
 * Values and first derivatives in (ρ, T) for region 3 Newton steps, written to out:
 * [p, ∂p/∂ρ, ∂p/∂T, h, ∂h/∂ρ, ∂h/∂T, s, ∂s/∂ρ, ∂s/∂T] (SI units).
 * From IAPWS R7-97(2012) Table 31: p = ρRTδφδ, h = RT(τφτ + δφδ), s = R(τφτ − φ); the derivatives
 * follow by differentiation, with (∂s/∂ρ)_T = −(∂p/∂T)_ρ/ρ² (a Maxwell relation).
 * @example
 * ```ts
 * const d = new Float64Array(9);
 * region3Derivatives(500, 650, d);
 * d[0];   //=> 25583701.82 (Pa; IF97 Table 33)
 * ```
 */
export function region3Derivatives(rho: number, T: number, out: Float64Array): void {
  const delta = rho / RHO_STAR;
  const tau = T_STAR / T;
  phiAt(delta, tau);
  const pD = phi[1]!;
  const pDD = phi[2]!;
  const pT = phi[3]!;
  const pTT = phi[4]!;
  const pDT = phi[5]!;
  const RT = R_IF97 * T;
  const dpdT = rho * R_IF97 * delta * (pD - tau * pDT);
  out[0] = rho * RT * delta * pD;
  out[1] = RT * (2 * delta * pD + delta * delta * pDD);
  out[2] = dpdT;
  out[3] = RT * (tau * pT + delta * pD);
  out[4] = (RT / rho) * (tau * delta * pDT + delta * pD + delta * delta * pDD);
  out[5] = R_IF97 * (delta * pD - tau * tau * pTT - tau * delta * pDT);
  out[6] = R_IF97 * (tau * pT - phi[0]!);
  out[7] = -dpdT / (rho * rho);
  out[8] = (-R_IF97 * tau * tau * pTT) / T;
}
