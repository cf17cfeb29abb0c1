/**
 * Properties from a Gibbs free energy split into an ideal-gas and a residual part, γ = γ° + γʳ, as
 * regions 2 and 5 of IF97 write it: IAPWS R7-97(2012) Table 12 (region 2) and Table 39 (region 5)
 * give the same relations.
 *
 * @module
 */
import { R_IF97 } from './constants.js';
import type { WaterProperties } from './properties.js';

/**
 * Fills `out` at (p [Pa], T [K]) from π, τ, the ideal part γ° (with ln π) and its τ-derivatives, and
 * the residual sums r = [γʳ, γʳ_π, γʳ_ππ, γʳ_τ, γʳ_ττ, γʳ_πτ].
 */
export function fillFromIdealAndResidual(p: number, T: number, pi: number, tau: number, g0: number, g0Tau: number, g0TauTau: number, r: Float64Array, out: WaterProperties): WaterProperties {
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
