/**
 * Region 3 (h, s) states without (p, h) flashes: Newton steps in (ρ, T) on the region 3 equation
 * itself, h(ρ, T) = h and s(ρ, T) = s, with the Jacobian from its first derivatives (IAPWS R7-97(2012)
 * Table 31, {@link region3Derivatives}). Starting values: the pressure from the caller (SR4-04
 * p_3a(h, s) or the project's 3b fit), then T and v from SR3-03 T_3(p, h), v_3(p, h).
 *
 * An answer is accepted only as a stable single-phase region 3 state: 623.15 K ≤ T ≤ T_B23(p),
 * p ≤ 100 MPa, (∂p/∂ρ)_T > 0, and below T_c on the stable side of the saturation line (a liquid,
 * ρ > ρc, at p ≥ p_s(T); a vapour, ρ < ρc, at p ≤ p_s(T)), not within 1 mK or 1e-4 p_c of the
 * critical point.
 * Anything else returns a non-ok status and the caller's general path (Newton in ln p over (p, h)
 * flashes, then a bracketed search) decides.
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { b23Temperature } from './b23.js';
import { region3TemperaturePH, region3VolumePH } from './backward-region3.js';
import { finishSinglePhase } from './classify.js';
import { P_CRITICAL, P_MAX, RHO_CRITICAL, T_13, T_CRITICAL } from './constants.js';
import type { SolverContext } from './context.js';
import { region3, region3Derivatives } from './region3.js';
import { saturationPressure } from './region4.js';
import { PHASE, type WaterState } from './water-state.js';

/**
 * The region 3 state with enthalpy h (J/kg) and entropy s (J/(kg·K)), from a starting pressure p0 (Pa).
 * @returns `Status.ok` with `out` filled; `Status.noConvergence` when the steps do not settle, the
 *   answer is not a stable single-phase region 3 state, or it lies within 1 mK of T_c or 1e-4 p_c
 *   of p_c, where the general path labels the phase (the caller then decides)
 */
export function region3HS(h: number, s: number, p0: number, out: WaterState, ctx: SolverContext): StatusCode {
  // a start a little above 100 MPa (the backward equations' error near the range's top) is held at it
  if (!(p0 > 0 && p0 <= 1.5 * P_MAX)) return Status.noConvergence;
  const pStart = Math.min(p0, P_MAX);
  let T = region3TemperaturePH(pStart, h);
  let rho = 1 / region3VolumePH(pStart, h);
  if (!(T > 0 && rho > 0)) return Status.noConvergence;
  const d = ctx.d3;
  const hTol = 1e-13 * Math.abs(h) + 1e-9;
  const sTol = 1e-13 * (Math.abs(s) + 1e3);
  let converged = false;
  for (let i = 0; i < 10; i++) {
    region3Derivatives(rho, T, d);
    const rh = d[3]! - h;
    const rs = d[6]! - s;
    if (Math.abs(rh) <= hTol && Math.abs(rs) <= sTol) {
      converged = true;
      break;
    }
    const hRho = d[4]!;
    const hT = d[5]!;
    const sRho = d[7]!;
    const sT = d[8]!;
    const det = hRho * sT - hT * sRho;
    if (!(Math.abs(det) > 0)) return Status.noConvergence;
    const dRho = (-rh * sT + rs * hT) / det;
    const dT = (-rs * hRho + rh * sRho) / det;
    rho += Math.max(-0.2 * rho, Math.min(0.2 * rho, dRho));
    T += Math.max(-20, Math.min(20, dT));
    if (!(rho > 0 && T > 0)) return Status.noConvergence;
  }
  // mechanically stable: (∂p/∂ρ)_T > 0 (the branch between the spinodals of the region 3 equation's
  // loop inside the dome has it negative)
  if (!converged || !(d[1]! > 0)) return Status.noConvergence;
  region3(rho, T, out);
  const p = out.p;
  if (!(p > 0 && p <= P_MAX && T >= T_13 && T <= b23Temperature(p))) return Status.noConvergence;
  if (Math.abs(T - T_CRITICAL) < 1e-3 || Math.abs(p - P_CRITICAL) < 1e-4 * P_CRITICAL) return Status.noConvergence;
  if (T < T_CRITICAL) {
    const ps = saturationPressure(T);
    const stable = rho > RHO_CRITICAL ? p >= ps : p <= ps;
    if (!stable) return Status.noConvergence;
  }
  finishSinglePhase(out, 3);
  if (T < T_CRITICAL && p < P_CRITICAL) out.phase = rho > RHO_CRITICAL ? PHASE.liquid : PHASE.vapor;
  return Status.ok;
}
