/**
 * IF97 states from (T, v) (and so (T, ρ)). Inside the dome, the two-phase mixture with
 * x = (v − v′)/(v″ − v′); in region 3 directly from its basic equation f(ρ, T); elsewhere p from a
 * bracketed search on v(p, T), which falls strictly with p.
 *
 * @module
 */
import { brent } from '../../core/root.js';
import { Status, type StatusCode } from '../../core/status.js';
import { b23Pressure } from './b23.js';
import { finishSinglePhase } from './classify.js';
import { P_MAX, P_MAX_5, P_SEARCH_MIN, T_13, T_B23_MAX, T_CRITICAL, T_MAX_2, T_MAX_5, T_MIN } from './constants.js';
import { defaultContext, type SolverContext } from './context.js';
import { region3 } from './region3.js';
import { region3DensityAt } from './region3-density.js';
import { evaluateForward } from './regions.js';
import { mixPhases, saturationAtT } from './saturation.js';
import type { WaterState } from './water-state.js';

/**
 * The state at T (K) and specific volume v (m³/kg).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromTV(773.15, 0.0328, out);   //=> 0 (Status.ok)
 * out.p;                               //=> 10.004e6 (Pa)
 * ```
 */
export function stateFromTV(T: number, v: number, out: WaterState, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(T) || !Number.isFinite(v)) return Status.invalidInput;
  if (!(v > 0) || !(T >= T_MIN && T <= T_MAX_5)) return Status.outOfRange;
  const liq = ctx.scratch;
  const vap = ctx.scratchB;
  let pLiquidMin = 0;
  let pVaporMax = P_MAX;
  if (T <= T_CRITICAL) {
    const status = saturationAtT(T, liq, vap, ctx);
    if (status !== Status.ok) return status;
    if (v >= liq.v && v <= vap.v) return mixPhases(vap.v === liq.v ? 0 : (v - liq.v) / (vap.v - liq.v), liq, vap, out);
    pLiquidMin = liq.p;
    pVaporMax = vap.p;
  }
  // region 3 is a function of (ρ, T): use it where (1/v, T) falls inside it: the liquid side of the
  // dome, or densities above the region 3 vapour density on the B23 line
  if (T > T_13 && T <= T_B23_MAX) {
    const rho = 1 / v;
    const pB = b23Pressure(T);
    if (region3DensityAt(pB, T, 2, ctx) !== Status.ok) return Status.noConvergence;
    if ((T < T_CRITICAL && v < liq.v) || rho >= ctx.rho) {
      region3(rho, T, out);
      if (!(out.p <= P_MAX * (1 + 1e-9))) return Status.outOfRange;
      return finishSinglePhase(out, 3);
    }
    pVaporMax = Math.min(pVaporMax, pB);
  }
  const region = T > T_MAX_2 ? 5 : T <= T_13 && v < liq.v ? 1 : 2;
  const pTop = region === 5 ? P_MAX_5 : region === 1 ? P_MAX : pVaporMax;
  const pBottom = region === 1 ? pLiquidMin : P_SEARCH_MIN;
  const f = ctx.volumeAlongIsotherm;
  f.region = region;
  f.T = T;
  f.lnv = Math.log(v);
  const lnBottom = Math.log(pBottom);
  const lnTop = Math.log(pTop);
  const fBottom = f.value(lnBottom);
  const fTop = f.value(lnTop);
  // ln v may miss by rounding at the ends of the span: accept 1e-12 there
  if (fBottom < -1e-12 || fTop > 1e-12) return Status.outOfRange;
  let lnp: number;
  if (fBottom <= 0) lnp = lnBottom;
  else if (fTop >= 0) lnp = lnTop;
  else {
    if (brent(f, lnBottom, lnTop, 1e-15, ctx.root) !== Status.ok) return Status.noConvergence;
    lnp = ctx.root.x;
  }
  const p = Math.min(pTop, Math.max(pBottom, Math.exp(lnp)));
  evaluateForward(region, p, T, out);
  return finishSinglePhase(out, region);
}
