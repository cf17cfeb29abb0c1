/**
 * The isobar solver shared by the (p, h) and (p, s) pairs: at fixed pressure, find the state whose
 * enthalpy (or entropy) matches a target. IAPWS R7-97(2012) backward equations T(p, h), T(p, s)
 * (Sections 5.2, 6.3) and SR3-03 T, v of (p, h), (p, s) give starting values; Newton steps on the
 * basic equations polish them to about 1e-12 relative. Inside the dome the mixture follows from the
 * saturated values.
 *
 * @module
 */
import { brent } from '../../core/root.js';
import { Status, type StatusCode } from '../../core/status.js';
import { b23Temperature } from './b23.js';
import { region1TemperaturePH, region2TemperaturePH } from './backward-ph.js';
import { region1TemperaturePS, region2TemperaturePS } from './backward-ps.js';
import { region3TemperaturePH, region3TemperaturePS, region3VolumePH, region3VolumePS } from './backward-region3.js';
import { finishSinglePhase } from './classify.js';
import { P_CRITICAL, P_MAX, P_MAX_5, RHO_CRITICAL, RHO_SEARCH_MAX_3, RHO_SEARCH_MIN_3, T_13, T_CRITICAL, T_MAX_2, T_MAX_5, T_MIN, T_NEAR_CRITICAL_BAND } from './constants.js';
import type { SolverContext } from './context.js';
import type { WaterProperties } from './properties.js';
import { region3, region3Derivatives, region3Pressure } from './region3.js';
import { region3At } from './isobar-residual.js';
import { saturationTemperature } from './region4.js';
import { evaluateForward } from './regions.js';
import { mixPhases, P_SAT_13, P_SAT_MIN, saturationAtP, saturationTemperatureOnLine } from './saturation.js';
import { PHASE, type WaterState } from './water-state.js';

/** Which property an isobar solve matches: enthalpy or entropy. */
import { BY_H, valueOf, type Matched } from './isobar-residual.js';
export { BY_H, BY_S, type Matched } from './isobar-residual.js';

/** A target that misses the lowest value at 273.15 K by more than rounding is out of range. */
function belowFloor(target: number, floor: number): boolean {
  return target < floor - 1e-12 * Math.abs(floor) - 1e-9;
}

/**
 * Newton polish of T at fixed p in region 1, 2 or 5 so that h (or s) matches `target`:
 * dh/dT = cp, ds/dT = cp/T. Kept inside [Tlo, Thi]. Returns the state at the last evaluated T once
 * the next step is below 1e-13·T; a step pinned at a bound without a match is not a solution.
 */
function polishT(region: number, p: number, target: number, by: Matched, T0: number, Tlo: number, Thi: number, out: WaterState): StatusCode {
  let T = Math.min(Thi, Math.max(Tlo, T0));
  for (let i = 0; i < 30; i++) {
    evaluateForward(region, p, T, out);
    const f = valueOf(out, by) - target;
    const step = by === BY_H ? f / out.cp : (f * T) / out.cp;
    if (Math.abs(step) <= 1e-13 * T) return finishSinglePhase(out, region);
    let next = T - step;
    if (!(next >= Tlo)) next = 0.5 * (T + Tlo);
    if (!(next <= Thi)) next = 0.5 * (T + Thi);
    if (next === T) return Status.noConvergence; // pinned at a bound: no solution inside
    T = next;
  }
  return Status.noConvergence;
}

/** h or s at (p, T) in region 1, 2 or 5 (full evaluation into ctx.scratchB). */
function valueAt(region: number, p: number, T: number, by: Matched, ctx: SolverContext): number {
  return valueOf(evaluateForward(region, p, T, ctx.scratchB), by);
}

/**
 * Fast path of region 3 flashes: the SR3-03 backward equations give (v, T); Newton steps in (ρ, T) on
 * the region 3 equation match p and h (or s). The answer is kept only if it lies in [Tlo, Thi], on a
 * mechanically stable branch ((∂p/∂ρ)_T > 0) and, below the critical temperature, on the requested side
 * of the critical density; otherwise the bracketed search takes over.
 */
function newtonRegion3(p: number, target: number, by: Matched, Tlo: number, Thi: number, branch: 0 | 1 | 2, out: WaterState, ctx: SolverContext): StatusCode {
  let T = by === BY_H ? region3TemperaturePH(p, target) : region3TemperaturePS(p, target);
  let rho = 1 / (by === BY_H ? region3VolumePH(p, target) : region3VolumePS(p, target));
  if (!(T > 0 && rho > 0)) return Status.noConvergence;
  const d3 = ctx.d3;
  const k = by === BY_H ? 3 : 6;
  for (let i = 0; i < 20; i++) {
    region3Derivatives(rho, T, d3);
    const f1 = d3[0]! - p;
    const f2 = d3[k]! - target;
    const a = d3[1]!;
    const b = d3[2]!;
    const c = d3[k + 1]!;
    const e = d3[k + 2]!;
    const det = a * e - b * c;
    if (!(det !== 0 && Number.isFinite(det))) return Status.noConvergence;
    const dRho = (f1 * e - b * f2) / det;
    const dT = (a * f2 - c * f1) / det;
    rho -= dRho;
    T -= dT;
    if (!(rho > 0 && T > 0)) return Status.noConvergence;
    if (Math.abs(dRho) <= 1e-13 * rho && Math.abs(dT) <= 1e-13 * T) {
      if (!(T >= Tlo - 1e-9 && T <= Thi + 1e-9) || !(d3[1]! > 0)) return Status.noConvergence;
      if (T < T_CRITICAL && branch !== 0 && (branch === 1) !== rho >= RHO_CRITICAL) return Status.noConvergence;
      region3(rho, T, out);
      out.p = p;
      return finishSinglePhase(out, 3);
    }
  }
  return Status.noConvergence;
}

/**
 * Solves T on a region 3 isobar between Tlo and Thi so that h (or s) matches. The basic equations
 * differ slightly at the region boundaries (IF97 Section 10): a target that falls in that gap at the
 * 1/3 boundary (Tlo = 623.15 K) is solved on region 1 just above 623.15 K (at the B23 line the gas
 * side does the same on region 2), so the flash still matches it exactly. Every answer is checked
 * against the target; next to the critical point, where the search in T meets a jump of h(T) (see
 * {@link region3ByDensity}), the search in ρ takes over. `branch` (1 liquid, 2 vapour: the side of
 * the dome the target lies on, from the saturated values) labels the phase.
 */
function solveRegion3(p: number, target: number, by: Matched, Tlo: number, Thi: number, branch: 0 | 1 | 2, out: WaterState, ctx: SolverContext): StatusCode {
  if (Tlo === T_13 && region3At(p, Tlo, branch, ctx.scratchB, ctx) && valueOf(ctx.scratchB, by) > target) {
    return polishT(1, p, target, by, T_13, T_MIN, T_13 + 5, out);
  }
  if (newtonRegion3(p, target, by, Tlo, Thi, branch, out, ctx) === Status.ok) return labelSide(out, branch);
  const residual = ctx.isobar;
  residual.p = p;
  residual.target = target;
  residual.by = by;
  residual.branch = branch;
  const found = brent(residual, Tlo, Thi, 1e-14, ctx.root) === Status.ok && region3At(p, ctx.root.x, branch, out, ctx);
  if (found && matches(valueOf(out, by), target, 1e-11)) return region3Answer(out, branch);
  const T = ctx.root.x;
  if (Math.abs(p - P_CRITICAL) <= NEAR_CRITICAL_PRESSURE && region3ByDensity(p, target, by, out, ctx) === Status.ok) return labelSide(out, branch);
  // away from the critical point, an answer of the search in T within the flash tolerance stands
  if (found && region3At(p, T, branch, out, ctx) && matches(valueOf(out, by), target, 1e-9)) return region3Answer(out, branch);
  return Status.noConvergence;
}

/** |value − target| within `rel` of the target (and 1e-9 absolute, for values near 0). */
function matches(value: number, target: number, rel: number): boolean {
  return Math.abs(value - target) <= rel * Math.abs(target) + 1e-9;
}

/** Marks a region 3 answer single-phase, on the side of the dome its target lies on. */
function region3Answer(out: WaterState, branch: 0 | 1 | 2): StatusCode {
  finishSinglePhase(out, 3);
  return labelSide(out, branch);
}

/**
 * The phase of a region 3 answer by the saturation test that chose its branch: a target at or below
 * the saturated liquid's value is liquid, at or above the vapour's is vapour, even where rounding or
 * IF97's inconsistency at the critical point puts T a fraction of a nK above T_c. Branch 0 (at and
 * above p_c) keeps the label from p, T and ρ.
 */
function labelSide(out: WaterState, branch: 0 | 1 | 2): StatusCode {
  if (branch !== 0) out.phase = branch === 1 ? PHASE.liquid : PHASE.vapor;
  return Status.ok;
}

/** Below p_c, {@link region3Inside} is tried up to this pressure (Pa, 0.1 % under p_c), clear of the critical point. */
const P_SIDES_FAST_MAX = P_CRITICAL * (1 - 1e-3);

/**
 * The region 3 fast path ({@link newtonRegion3}) when its answer lies strictly inside region 3 at p:
 * between 623.15 K and T_B23(p) (`TB`), and below p_c also strictly on one side of T_s(p) on that
 * side's density branch (a stable state). h and s rise with T along the isobar, so the target then
 * lies between the region 3 values at the edges and on that side of the saturated value: the answer
 * the general path of {@link stateOnIsobar} reaches after computing those states (density solves),
 * which this skips. True with `out` filled and labelled; false to take the general path.
 */
function region3Inside(p: number, target: number, by: Matched, TB: number, out: WaterState, ctx: SolverContext): boolean {
  if (p < P_CRITICAL && !(p < P_SIDES_FAST_MAX)) return false;
  if (newtonRegion3(p, target, by, T_13 + 2e-9, TB - 2e-9, 0, out, ctx) !== Status.ok) return false;
  if (p >= P_CRITICAL) return true;
  const Ts = saturationTemperatureOnLine(p);
  const side = out.T < Ts - 2e-9 && out.rho >= RHO_CRITICAL ? 1 : out.T > Ts + 2e-9 && out.rho < RHO_CRITICAL ? 2 : 0;
  if (side === 0) return false;
  labelSide(out, side);
  return true;
}

/** Pressures within this distance of p_c (Pa, 1e-5 relative) may need {@link region3ByDensity}. */
const NEAR_CRITICAL_PRESSURE = 1e-5 * P_CRITICAL;

/**
 * The region 3 isobar searched in ρ, from ρc outward, for where the search in T fails: the region 3
 * equation meets IF97's critical point only within its consistency tolerance (p₃(ρc, T_c) = p_c −
 * 0.05 mPa) and has a two-phase loop of its own up to T_c + 1.03 nK (its own critical point lies
 * there, at p_c + 0.23 mPa). An isobar through that loop crosses it at temperatures where the density
 * root changes branch, and h(T) jumps (by 40 J/kg at p_c). Along the isobar h and s are monotonic in
 * ρ: dh = T ds there, and (∂s/∂v)_p = [T(∂p/∂T)_v² − cv(∂p/∂v)_T]/(T(∂p/∂T)_v) stays positive across
 * so small a loop, where (∂p/∂v)_T is barely positive; so the search in ρ finds the one state with
 * the target value. Answers inside the loop (where (∂p/∂ρ)_T < 0) are kept only within the
 * near-critical band of the saturation line.
 */
function region3ByDensity(p: number, target: number, by: Matched, out: WaterState, ctx: SolverContext): StatusCode {
  const f = ctx.isobarByDensity;
  f.p = p;
  f.target = target;
  f.by = by;
  f.T = T_CRITICAL;
  let a = RHO_CRITICAL;
  let fa = f.value(a);
  if (!Number.isFinite(fa)) return Status.noConvergence;
  // h and s fall as ρ rises along the isobar: step toward the root, widening, until the sign changes
  const up = fa > 0;
  let b = a;
  let fb = fa;
  for (let step = 1e-4; fa * fb > 0; step *= 4) {
    if (!(step < 1e3)) return Status.noConvergence;
    a = b;
    fa = fb;
    b = up ? Math.min(RHO_SEARCH_MAX_3, a + step) : Math.max(RHO_SEARCH_MIN_3, a - step);
    if (b === a) return Status.noConvergence;
    fb = f.value(b);
    if (!Number.isFinite(fb)) return Status.noConvergence;
  }
  if (brent(f, Math.min(a, b), Math.max(a, b), 1e-15, ctx.root) !== Status.ok) return Status.noConvergence;
  const rho = ctx.root.x;
  if (!matches(f.value(rho) + target, target, 1e-11)) return Status.noConvergence;
  region3(rho, f.T, out);
  out.p = p;
  region3Pressure(rho, f.T, ctx.pr);
  if (!(ctx.pr[1]! > 0) && !(Math.abs(f.T - T_CRITICAL) <= T_NEAR_CRITICAL_BAND)) return Status.noConvergence;
  return finishSinglePhase(out, 3);
}

function backwardRegion1(p: number, target: number, by: Matched): number {
  return by === BY_H ? region1TemperaturePH(p, target) : region1TemperaturePS(p, target);
}

function backwardRegion2(p: number, target: number, by: Matched): number {
  return by === BY_H ? region2TemperaturePH(p, target) : region2TemperaturePS(p, target);
}

/**
 * The gas side above the liquid, saturation and region 3: regions 2 and 5, from Tlo up. `below`
 * lets region 2 reach a few kelvin under Tlo, for targets in the small gap IF97 leaves at the B23 line.
 */
function gasSide(p: number, target: number, by: Matched, Tlo: number, below: number, out: WaterState, ctx: SolverContext): StatusCode {
  const v2max = valueAt(2, p, T_MAX_2, by, ctx);
  if (target <= v2max) {
    const floor = Tlo - below;
    if (belowFloor(target, valueAt(2, p, floor, by, ctx))) return Status.outOfRange;
    return polishT(2, p, target, by, backwardRegion2(p, target, by), floor, T_MAX_2, out);
  }
  if (p > P_MAX_5) return Status.outOfRange;
  const v5max = valueAt(5, p, T_MAX_5, by, ctx);
  if (target > v5max) return Status.outOfRange;
  const v5min = valueAt(5, p, T_MAX_2, by, ctx);
  // a linear first guess between the region 5 end values; region 5 may reach a few kelvin under
  // 1073.15 K for targets in the gap between the region 2 and 5 values there
  const T0 = T_MAX_2 + ((target - v5min) / (v5max - v5min)) * (T_MAX_5 - T_MAX_2);
  return polishT(5, p, target, by, T0, T_MAX_2 - 5, T_MAX_5, out);
}

/**
 * The state at p (Pa) with enthalpy h (J/kg, `by` = {@link BY_H}) or entropy s (J/(kg·K), {@link BY_S}).
 */
export function stateOnIsobar(p: number, target: number, by: Matched, out: WaterState, ctx: SolverContext): StatusCode {
  if (!Number.isFinite(p) || !Number.isFinite(target)) return Status.invalidInput;
  if (!(p > 0 && p <= P_MAX)) return Status.outOfRange;
  // below the triple-point pressure every state in range is vapour
  if (p < P_SAT_MIN) return gasSide(p, target, by, T_MIN, 0, out, ctx);

  if (p <= P_SAT_13) {
    const Ts = saturationTemperature(p);
    // fast paths: the backward equations are within 25 mK of the true temperature in their regions
    // (IF97 Sections 5.2 and 6.3), so a guess 0.1 K clear of T_s settles the phase once the polish
    // converges inside [273.15 K, T_s] or [T_s, 1073.15 K]
    const T1 = backwardRegion1(p, target, by);
    if (T1 < Ts - 0.1 && T1 > T_MIN && polishT(1, p, target, by, T1, T_MIN, Ts, out) === Status.ok) return Status.ok;
    const T2 = backwardRegion2(p, target, by);
    if (T2 > Ts + 0.1 && T2 < T_MAX_2 && polishT(2, p, target, by, T2, Ts, T_MAX_2, out) === Status.ok) return Status.ok;
    // near the dome, near the range limits, or in it: decide by the saturated and limiting values
    if (belowFloor(target, valueAt(1, p, T_MIN, by, ctx))) return Status.outOfRange;
    const liquidEnd = valueAt(1, p, Ts, by, ctx);
    if (target <= liquidEnd) return polishT(1, p, target, by, T1, T_MIN, Ts, out);
    const vaporEnd = valueAt(2, p, Ts, by, ctx);
    if (target < vaporEnd) {
      const liquid = evaluateForward(1, p, Ts, ctx.scratch);
      const vapor = evaluateForward(2, p, Ts, ctx.scratchB);
      const x = (target - valueOf(liquid, by)) / (valueOf(vapor, by) - valueOf(liquid, by));
      return mixPhases(x, liquid, vapor, out);
    }
    return gasSide(p, target, by, Ts, 0, out, ctx);
  }

  if (belowFloor(target, valueAt(1, p, T_MIN, by, ctx))) return Status.outOfRange;
  const end1 = valueAt(1, p, T_13, by, ctx);
  if (target <= end1) return polishT(1, p, target, by, backwardRegion1(p, target, by), T_MIN, T_13, out);
  const TB = b23Temperature(p);
  if (region3Inside(p, target, by, TB, out, ctx)) return Status.ok;
  if (p < P_CRITICAL) {
    const liq = ctx.satLiquid;
    const vap = ctx.satVapor;
    const status = saturationAtP(p, liq, vap, ctx);
    if (status !== Status.ok) return status;
    const Ts = liq.T;
    if (target <= valueOf(liq, by)) return solveRegion3(p, target, by, T_13, Ts, 1, out, ctx);
    if (target < valueOf(vap, by)) return mixPhases((target - valueOf(liq, by)) / (valueOf(vap, by) - valueOf(liq, by)), liq, vap, out);
    // region 3 owns T ≤ T_B23(p): divide by its value there (IF97's regions differ slightly on the line)
    if (!region3At(p, TB, 2, ctx.scratchB, ctx)) return Status.noConvergence;
    if (target <= valueOf(ctx.scratchB, by)) return solveRegion3(p, target, by, Ts, TB, 2, out, ctx);
    return gasSide(p, target, by, TB, 5, out, ctx);
  }
  if (!region3At(p, TB, 0, ctx.scratchB, ctx)) return Status.noConvergence;
  if (target <= valueOf(ctx.scratchB, by)) return solveRegion3(p, target, by, T_13, TB, 0, out, ctx);
  return gasSide(p, target, by, TB, 5, out, ctx);
}
