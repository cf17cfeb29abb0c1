/**
 * Region 3 density at given (p, T): a bracketed search on the region 3 pressure p₃(ρ, T), the solve
 * IAPWS R7-97(2012) allows in place of the SR5-05 backward equations, choosing the liquid or vapour
 * branch by the saturation line of Eq. 30 (as the solvers use it, ending exactly at p_c: see
 * saturation-line.ts). Step sizes come from the approximate saturated
 * densities of IAPWS SR1-86 (Eqs. 2.3 and 2.4), used for search step sizes only.
 *
 * @module
 */
import satData from '../../../data/if97/saturation-densities.json';
import { brent } from '../../core/root.js';
import { Status, type StatusCode } from '../../core/status.js';
import { RHO_CRITICAL, RHO_SEARCH_MAX_3, RHO_SEARCH_MIN_3, T_CRITICAL, T_LOOP_FREE_WINDOW } from './constants.js';
import type { SolverContext } from './context.js';
import { region3Pressure } from './region3.js';
import { saturationLinePressure } from './saturation-line.js';

const SAT_B = satData.liquid.b;
const SAT_BE = satData.liquid.exponents;
const SAT_C = satData.vapour.c;
const SAT_CE = satData.vapour.exponents;

/** Approximate saturated-liquid density (SR1-86 Eq. 2.3), for search step sizes only. */
function approxLiquidDensity(T: number): number {
  const th = 1 - T / T_CRITICAL;
  let s = 1;
  for (let i = 0; i < 6; i++) s += SAT_B[i]! * th ** SAT_BE[i]!;
  return s * RHO_CRITICAL;
}

/** Approximate saturated-vapour density (SR1-86 Eq. 2.4), for search step sizes only. */
function approxVaporDensity(T: number): number {
  const th = 1 - T / T_CRITICAL;
  let s = 0;
  for (let i = 0; i < 6; i++) s += SAT_C[i]! * th ** SAT_CE[i]!;
  return Math.exp(s) * RHO_CRITICAL;
}

function pressure3(rho: number, T: number, ctx: SolverContext): number {
  region3Pressure(rho, T, ctx.pr);
  return ctx.pr[0]!;
}

/**
 * The root of p₃(ρ, T) = p inside [a, b], where p₃(a) − p < 0 < p₃(b) − p; writes ctx.rho. Newton steps
 * on ln p (on p where p₃ ≤ 0) with the slope (∂p/∂ρ)_T that comes with each pressure evaluation, kept
 * inside the shrinking bracket (bisection whenever a step would leave it), from near the dense end of
 * a wide bracket or by linear interpolation in a narrow one; Brent's method if that has not converged
 * after 40 steps. `pa`, `pb`: p₃ at a and b when the
 * caller has them.
 */
function polishDensity(p: number, T: number, a: number, b: number, ctx: SolverContext, pa = pressure3(a, T, ctx), pb = pressure3(b, T, ctx)): StatusCode {
  let lo = a;
  let hi = b;
  const pr = ctx.pr;
  const fa = pa - p;
  const fb = pb - p;
  if (fa === 0) return found(lo, ctx);
  if (fb === 0) return found(hi, ctx);
  // a narrow bracket (a step of the branch search): linear interpolation; a wide one (up to 800 kg/m³,
  // where the isotherm climbs steeply): near its dense end, from which Newton on ln p runs down the convex part
  let x = hi - lo > 100 ? hi - 0.1 * (hi - lo) : fa < 0 && fb > 0 ? lo + (hi - lo) * (-fa / (fb - fa)) : 0.5 * (lo + hi);
  if (!(x > lo && x < hi)) x = 0.5 * (lo + hi);
  let last = Infinity;
  for (let i = 0; i < 40; i++) {
    region3Pressure(x, T, pr);
    const f = pr[0]! - p;
    if (f === 0) return found(x, ctx);
    if (f < 0) lo = x;
    else hi = x;
    const d = pr[1]!;
    // Newton on ln p where p₃ > 0 (the isotherms rise nearly exponentially in ρ there), else on p
    const P = pr[0]!;
    let next = d > 0 ? (P > 0 ? x - (Math.log(P / p) * P) / d : x - f / d) : 0.5 * (lo + hi);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    const step = Math.abs(next - x);
    // done at 1e-15; or after a Newton step below 1e-9 that followed a larger one (quadratic convergence
    // puts the next iterate at the rounding level of p₃); or where the steps stop shrinking at that level
    if (step <= 1e-15 * x || hi - lo <= 1e-15 * x || (step <= 1e-9 * x && step <= 0.1 * last) || (step <= 1e-11 * x && step >= 0.5 * last)) return found(next, ctx);
    last = step;
    x = next;
  }
  ctx.density.target = p;
  ctx.density.T = T;
  const status = brent(ctx.density, a, b, 1e-15, ctx.root);
  if (status !== Status.ok) return Status.noConvergence;
  return found(ctx.root.x, ctx);
}

function found(rho: number, ctx: SolverContext): StatusCode {
  ctx.rho = rho;
  return Status.ok;
}

/**
 * Density (kg/m³) in region 3 at (p [Pa], T [K]), written to `ctx.rho`.
 * `branch`: 1 = liquid (the largest root), 2 = vapour (the smallest root), 0 = choose by p_s(T)
 * of the saturation line
 * below the critical temperature. Above the critical temperature the isotherm rises monotonically
 * and one bracket suffices. Below it, the search stays on its branch: from the high-density end down
 * for the liquid, from the low-density end up for the vapour, in steps a tenth of the width of the
 * two-phase loop (sized by the SR1-86 saturated densities) wherever the loop could be crossed.
 *
 * @returns {@link Status.ok}, or {@link Status.noConvergence} when no root is found on the branch
 * @example
 * ```ts
 * const ctx = new SolverContext();
 * region3DensityAt(25.5837018e6, 650, 0, ctx);   //=> 0
 * ctx.rho;                                        //=> 500.0000 (kg/m³; IF97 Table 33)
 * ```
 */
export function region3DensityAt(p: number, T: number, branch: 0 | 1 | 2, ctx: SolverContext): StatusCode {
  const status = branchDensity(p, T, branch, ctx);
  if (status === Status.ok || !(T > T_CRITICAL - T_LOOP_FREE_WINDOW)) return status;
  // within T_LOOP_FREE_WINDOW below T_c the isotherm at this pressure may have lost its loop (the
  // region 3 and region 4 equations meet the critical point only within their tolerance): take the
  // single root over the whole density range, if it is mechanically stable
  if (!(pressure3(RHO_SEARCH_MIN_3, T, ctx) < p && pressure3(RHO_SEARCH_MAX_3, T, ctx) > p)) return status;
  if (polishDensity(p, T, RHO_SEARCH_MIN_3, RHO_SEARCH_MAX_3, ctx) !== Status.ok) return status;
  region3Pressure(ctx.rho, T, ctx.pr);
  return ctx.pr[1]! >= 0 ? Status.ok : status;
}

/** The density search on its branch (see {@link region3DensityAt}). */
function branchDensity(p: number, T: number, branch: 0 | 1 | 2, ctx: SolverContext): StatusCode {
  if (T >= T_CRITICAL) {
    const pMin = pressure3(RHO_SEARCH_MIN_3, T, ctx);
    const pMax = pressure3(RHO_SEARCH_MAX_3, T, ctx);
    if (!(pMin < p && pMax > p)) return Status.noConvergence;
    return polishDensity(p, T, RHO_SEARCH_MIN_3, RHO_SEARCH_MAX_3, ctx, pMin, pMax);
  }
  const b = branch === 0 ? (p >= saturationLinePressure(T) ? 1 : 2) : branch;
  const rl = approxLiquidDensity(T);
  const rv = approxVaporDensity(T);
  const fine = Math.max(0.02, (rl - rv) / 12);
  if (b === 1) {
    const pMax = pressure3(RHO_SEARCH_MAX_3, T, ctx);
    if (!(pMax > p)) return Status.noConvergence;
    // clear of the loop, the liquid isotherm rises monotonically: bracket directly
    const safe = Math.min(RHO_SEARCH_MAX_3, rl + 40);
    const pSafe = pressure3(safe, T, ctx);
    if (pSafe <= p) return polishDensity(p, T, safe, RHO_SEARCH_MAX_3, ctx, pSafe, pMax);
    let pPrev = pSafe;
    for (let prev = safe; prev > rv; prev -= fine) {
      const rho = prev - fine;
      const pRho = pressure3(rho, T, ctx);
      if (pRho <= p) return polishDensity(p, T, rho, prev, ctx, pRho, pPrev);
      pPrev = pRho;
    }
    return Status.noConvergence;
  }
  const pMin = pressure3(RHO_SEARCH_MIN_3, T, ctx);
  if (!(pMin < p)) return Status.noConvergence;
  const safe = Math.max(RHO_SEARCH_MIN_3, rv - 40);
  const pSafe = pressure3(safe, T, ctx);
  if (pSafe >= p) return polishDensity(p, T, RHO_SEARCH_MIN_3, safe, ctx, pMin, pSafe);
  let pPrev = pSafe;
  for (let prev = safe; prev < rl; prev += fine) {
    const rho = prev + fine;
    const pRho = pressure3(rho, T, ctx);
    if (pRho >= p) return polishDensity(p, T, prev, rho, ctx, pPrev, pRho);
    pPrev = pRho;
  }
  return Status.noConvergence;
}
