/**
 * Flashes of a Helmholtz-energy equation of state: states from (p, T), (T, ρ) or (T, v), (T, x),
 * (p, x), (p, h), (p, s) and (h, s), written into a caller-owned {@link FluidState}.
 *
 * (p, T): the density solving p(T, ρ) = p by Newton steps kept inside a bracket on the branch of the
 * stable phase. Below T_c the stable phase is the one of lower Gibbs energy, which is the liquid
 * when p > p_s(T) and the vapour when p < p_s(T): the ancillary vapour pressure decides when p is
 * farther from it than its margin, else the saturation solve does. The branch's bracket is
 * [ρ', ρ_max] (liquid) or [0, ρ''] (vapour), from the ancillary densities when they bracket the
 * root, else from the saturation solve.
 * (p, h), (p, s): Newton steps in T along the isobar ((∂h/∂T)_p = cp, (∂s/∂T)_p = cp/T) inside a
 * bracket (the saturation temperature splits liquid from vapour), each step a (p, T) solve.
 * (h, s): Newton steps in ln p with (∂h/∂p)_s = v, each step a (p, s) flash.
 *
 * @module
 */
import { Status, type StatusCode } from '../core/status.js';
import { ancillaryLiquidDensity, ancillaryPressure, ancillaryVaporDensity, FLUID_PHASE, propertiesAt, type FluidContext, type FluidState } from './model.js';
import { saturationAtP, saturationAtT, solveSaturationDensities } from './saturation.js';

/**
 * Density (kg/m³) with p(T, ρ) = p on [lo, hi], where p(T, lo) < p is known; p(T, hi) > p is
 * checked only if the iteration needs the upper end. NaN when there is no root (or no convergence).
 */
function solveDensity(ctx: FluidContext, p: number, T: number, lo: number, hi: number, guess: number): number {
  const m = ctx.model;
  const ar = ctx.ar;
  const tau = m.Tr / T;
  const RT = m.R * T;
  const ir = 1 / m.rhor;
  let a = lo;
  let b = hi;
  let hiChecked = false;
  let x = guess > a && guess < b ? guess : a > 0 ? Math.sqrt(a * b) : Math.min(p / RT, 0.5 * b);
  for (let i = 0; i < 100; i++) {
    const delta = x * ir;
    m.residual(delta, tau, ar);
    const f = x * RT * (1 + delta * ar[1]!) - p;
    const df = RT * (1 + 2 * delta * ar[1]! + delta * delta * ar[2]!);
    if (f < 0) a = x;
    else {
      b = x;
      hiChecked = true;
    }
    // converged: a step below 1e-13 (Newton's next would be at rounding), or f at its rounding level
    if (Math.abs(f) <= 4e-16 * x * Math.abs(df)) return x;
    let next = df > 0 ? x - f / df : NaN;
    if (Math.abs(next - x) <= 1e-13 * x) return next;
    if (!(next > a && next < b)) {
      if (!hiChecked) {
        // the upper end is needed: check that it brackets the root
        m.residual(b * ir, tau, ar);
        if (!(b * RT * (1 + b * ir * ar[1]!) - p >= 0)) return NaN;
        hiChecked = true;
      }
      next = a > 0 && b > 4 * a ? Math.sqrt(a * b) : 0.5 * (a + b);
      if (b - a <= 1e-15 * b) return next;
    }
    x = next;
  }
  return NaN;
}

/** Single-phase label of a state at (p, T) solved on the liquid (true) or vapour branch. */
function label(ctx: FluidContext, p: number, T: number, liquidBranch: boolean): number {
  const m = ctx.model;
  if (T >= m.Tc) return p >= m.pc ? FLUID_PHASE.supercritical : FLUID_PHASE.vapor;
  return liquidBranch ? FLUID_PHASE.liquid : FLUID_PHASE.vapor;
}

/**
 * The density at (p, T) of the stable phase, in ctx.work.rho (with the branch in ctx.work.phase).
 * `guess` (kg/m³, or 0) starts the iteration.
 */
function densityPT(ctx: FluidContext, p: number, T: number, guess: number): StatusCode {
  const m = ctx.model;
  const w = ctx.work;
  if (T >= m.Tc) {
    const rho = solveDensity(ctx, p, T, 0, m.rhoMax, guess > 0 ? guess : p < 0.3 * m.pc ? p / (m.R * T) : m.rhoc);
    if (!(rho > 0)) return Status.outOfRange;
    w.rho = rho;
    w.phase = label(ctx, p, T, false);
    return Status.ok;
  }
  const ps = ancillaryPressure(m, T);
  const margin = m.pressureMargin;
  let liquid: boolean;
  let lo = 0;
  let hi = m.rhoMax;
  let exact = false;
  if (p > ps * (1 + margin)) {
    liquid = true;
    lo = ancillaryLiquidDensity(m, T);
    if (!(pressureBelow(ctx, T, lo, p))) exact = true;
  } else if (p < ps * (1 - margin)) {
    liquid = false;
    hi = ancillaryVaporDensity(m, T);
    if (pressureBelow(ctx, T, hi, p)) exact = true;
  } else {
    liquid = true;
    exact = true;
  }
  if (exact) {
    const s = solveSaturationDensities(ctx, T, ancillaryLiquidDensity(m, T) / m.rhor, ancillaryVaporDensity(m, T) / m.rhor);
    if (s !== Status.ok) return s;
    liquid = p >= ctx.satP;
    if (p === ctx.satP) {
      w.rho = ctx.satDL * m.rhor;
      w.phase = FLUID_PHASE.liquid;
      return Status.ok;
    }
    lo = liquid ? ctx.satDL * m.rhor : 0;
    hi = liquid ? m.rhoMax : ctx.satDV * m.rhor;
  }
  const rho = solveDensity(ctx, p, T, lo, hi, guess > lo && guess < hi ? guess : liquid ? lo * 1.0001 : Math.min(p / (m.R * T), hi * 0.9999));
  if (!(rho > 0)) return Status.outOfRange;
  w.rho = rho;
  w.phase = label(ctx, p, T, liquid);
  return Status.ok;
}

function pressureBelow(ctx: FluidContext, T: number, rho: number, p: number): boolean {
  const m = ctx.model;
  const delta = rho / m.rhor;
  m.residual(delta, m.Tr / T, ctx.ar);
  return rho * m.R * T * (1 + delta * ctx.ar[1]!) < p;
}

function checkPT(ctx: FluidContext, p: number, T: number): StatusCode {
  const m = ctx.model;
  if (!Number.isFinite(p) || !Number.isFinite(T)) return Status.invalidInput;
  if (!(p > 0 && p <= m.pMax && T >= m.Tmin && T <= m.Tmax)) return Status.outOfRange;
  return Status.ok;
}

/**
 * The stable single-phase state at (p [Pa], T [K]).
 * @returns `Status.ok`; `Status.outOfRange` outside the fluid's range; `Status.invalidInput`
 * @example
 * ```ts
 * stateFromPT(ctx, 101325, 300, out);   //=> 0; out.rho = 996.5 kg/m³, out.phase = FLUID_PHASE.liquid
 * ```
 */
export function stateFromPT(ctx: FluidContext, p: number, T: number, out: FluidState): StatusCode {
  const c = checkPT(ctx, p, T);
  if (c !== Status.ok) return c;
  const s = densityPT(ctx, p, T, 0);
  if (s !== Status.ok) return s;
  const phase = ctx.work.phase;
  const st = propertiesAt(ctx, T, ctx.work.rho, out);
  out.phase = phase;
  return st;
}

/** Two-phase mixture of quality x from the saturated states in ctx.liquid, ctx.vapor. */
function mix(ctx: FluidContext, x: number, out: FluidState): StatusCode {
  const l = ctx.liquid;
  const v = ctx.vapor;
  out.T = l.T;
  out.p = l.p;
  out.v = l.v + x * (v.v - l.v);
  out.rho = 1 / out.v;
  out.u = l.u + x * (v.u - l.u);
  out.h = l.h + x * (v.h - l.h);
  out.s = l.s + x * (v.s - l.s);
  out.g = l.g + x * (v.g - l.g);
  out.cp = NaN;
  out.cv = NaN;
  out.w = NaN;
  out.jouleThomson = NaN;
  out.dpdrho = 0;
  out.dpdT = (v.s - l.s) / (v.v - l.v);
  out.x = x;
  out.phase = FLUID_PHASE.twoPhase;
  return Status.undefinedProperty;
}

/**
 * The two-phase mixture of quality x at T (K): saturation by temperature, then the lever rule.
 * @returns `Status.undefinedProperty` (the state is computed; cp, cv, w are not defined), or an error status
 */
export function stateFromTX(ctx: FluidContext, T: number, x: number, out: FluidState): StatusCode {
  if (!Number.isFinite(T) || !Number.isFinite(x)) return Status.invalidInput;
  if (!(x >= 0 && x <= 1)) return Status.outOfRange;
  const s = saturationAtT(ctx, T, ctx.liquid, ctx.vapor);
  if (s !== Status.ok && s !== Status.undefinedProperty) return s;
  return mix(ctx, x, out);
}

/** The two-phase mixture of quality x at p (Pa). Returns as {@link stateFromTX}. */
export function stateFromPX(ctx: FluidContext, p: number, x: number, out: FluidState): StatusCode {
  if (!Number.isFinite(p) || !Number.isFinite(x)) return Status.invalidInput;
  if (!(x >= 0 && x <= 1)) return Status.outOfRange;
  const s = saturationAtP(ctx, p, ctx.liquid, ctx.vapor);
  if (s !== Status.ok && s !== Status.undefinedProperty) return s;
  return mix(ctx, x, out);
}

/**
 * The state at (T [K], ρ [kg/m³]): single-phase from the equation directly, or a two-phase
 * mixture when T < T_c and ρ'' < ρ < ρ'.
 */
export function stateFromTRho(ctx: FluidContext, T: number, rho: number, out: FluidState): StatusCode {
  const m = ctx.model;
  if (!Number.isFinite(T) || !Number.isFinite(rho) || !(rho > 0)) return Status.invalidInput;
  if (!(T >= m.Tmin && T <= m.Tmax && rho <= m.rhoMax)) return Status.outOfRange;
  if (T < m.Tc && rho < 1.5 * ancillaryLiquidDensity(m, T) && rho > 0.5 * ancillaryVaporDensity(m, T)) {
    const s = saturationAtT(ctx, T, ctx.liquid, ctx.vapor);
    if (s !== Status.ok) return s;
    if (rho < ctx.liquid.rho && rho > ctx.vapor.rho) return mix(ctx, (1 / rho - ctx.liquid.v) / (ctx.vapor.v - ctx.liquid.v), out);
  }
  const st = propertiesAt(ctx, T, rho, out);
  if (st === Status.invalidInput) return st;
  if (out.p > m.pMax) return Status.outOfRange;
  out.phase = T >= m.Tc ? (out.p >= m.pc ? FLUID_PHASE.supercritical : FLUID_PHASE.vapor) : rho >= m.rhoc ? FLUID_PHASE.liquid : FLUID_PHASE.vapor;
  return st;
}

/** The state at (T [K], v [m³/kg]): {@link stateFromTRho} at ρ = 1/v. */
export function stateFromTV(ctx: FluidContext, T: number, v: number, out: FluidState): StatusCode {
  if (!Number.isFinite(v) || !(v > 0)) return Status.invalidInput;
  return stateFromTRho(ctx, T, 1 / v, out);
}

const BY_H = 0;
const BY_S = 1;

/** h or s of `st`. */
const valueOf = (st: FluidState, by: number): number => (by === BY_H ? st.h : st.s);
/** (∂h/∂T)_p = cp or (∂s/∂T)_p = cp/T. */
const slopeOf = (st: FluidState, by: number): number => (by === BY_H ? st.cp : st.cp / st.T);

/**
 * T on the isobar p where h (by = BY_H) or s equals `target`, in [lo, hi]; the value at the lower
 * end is below the target if `loKnown`, the value at the upper end above it if `hiKnown` (unknown
 * ends are checked when the iteration needs them). Result in `out`.
 */
function solveIsobar(ctx: FluidContext, p: number, target: number, by: number, lo: number, hi: number, loKnown: boolean, hiKnown: boolean, T0: number, out: FluidState): StatusCode {
  let a = lo;
  let b = hi;
  let aOk = loKnown;
  let bOk = hiKnown;
  let T = T0 > a && T0 < b ? T0 : 0.5 * (a + b);
  let rho = 0;
  const scale = by === BY_H ? Math.max(Math.abs(target), ctx.model.R * ctx.model.Tc) : Math.max(Math.abs(target), ctx.model.R);
  for (let i = 0; i < 100; i++) {
    const s = densityPT(ctx, p, T, rho);
    if (s !== Status.ok) return s;
    rho = ctx.work.rho;
    const phase = ctx.work.phase;
    const st = propertiesAt(ctx, T, rho, out);
    out.phase = phase;
    if (st !== Status.ok) return st;
    const f = valueOf(out, by) - target;
    if (f < 0) {
      a = T;
      aOk = true;
    } else {
      b = T;
      bOk = true;
    }
    if (Math.abs(f) <= 1e-15 * scale) return Status.ok;
    let next = T - f / slopeOf(out, by);
    if (Math.abs(next - T) <= 1e-12 * T && next > a && next < b) {
      T = next;
      const s2 = densityPT(ctx, p, T, rho);
      if (s2 !== Status.ok) return s2;
      const ph = ctx.work.phase;
      const st2 = propertiesAt(ctx, T, ctx.work.rho, out);
      out.phase = ph;
      return st2;
    }
    if (!(next > a && next < b)) {
      const end = next <= a ? a : b;
      if ((end === a && !aOk) || (end === b && !bOk)) {
        // check the unverified end once
        const s3 = densityPT(ctx, p, end, 0);
        if (s3 !== Status.ok) return s3;
        const ph = ctx.work.phase;
        propertiesAt(ctx, end, ctx.work.rho, out);
        out.phase = ph;
        const fe = valueOf(out, by) - target;
        if (end === a) {
          if (fe > 0) return Status.outOfRange;
          aOk = true;
        } else {
          if (fe < 0) return Status.outOfRange;
          bOk = true;
        }
        if (fe === 0) return Status.ok;
      }
      next = 0.5 * (a + b);
      if (b - a <= 1e-13 * b) return Status.ok;
      rho = 0;
    }
    T = next;
  }
  return Status.noConvergence;
}

function flashPY(ctx: FluidContext, p: number, target: number, by: number, out: FluidState): StatusCode {
  const m = ctx.model;
  if (!Number.isFinite(p) || !Number.isFinite(target)) return Status.invalidInput;
  if (!(p > 0 && p <= m.pMax)) return Status.outOfRange;
  if (p < m.pc && p >= m.pt) {
    const s = saturationAtP(ctx, p, ctx.liquid, ctx.vapor);
    if (s !== Status.ok) return s;
    const yl = valueOf(ctx.liquid, by);
    const yv = valueOf(ctx.vapor, by);
    const Ts = ctx.liquid.T;
    if (target >= yl && target <= yv) return mix(ctx, (target - yl) / (yv - yl), out);
    if (target < yl) return solveIsobar(ctx, p, target, by, m.Tmin, Ts, false, true, Ts + (target - yl) / slopeOf(ctx.liquid, by), out);
    return solveIsobar(ctx, p, target, by, Ts, m.Tmax, true, false, Ts + (target - yv) / slopeOf(ctx.vapor, by), out);
  }
  // above the critical pressure (or below the triple point: vapour only)
  return solveIsobar(ctx, p, target, by, m.Tmin, m.Tmax, false, false, p < m.pt ? m.Tmin + 50 : m.Tc, out);
}

/** The state at (p [Pa], h [J/kg]). Two-phase states return `Status.undefinedProperty` with x set. */
export function stateFromPH(ctx: FluidContext, p: number, h: number, out: FluidState): StatusCode {
  return flashPY(ctx, p, h, BY_H, out);
}

/** The state at (p [Pa], s [J/(kg·K)]). Two-phase states return `Status.undefinedProperty` with x set. */
export function stateFromPS(ctx: FluidContext, p: number, s: number, out: FluidState): StatusCode {
  return flashPY(ctx, p, s, BY_S, out);
}

/**
 * The state at (h [J/kg], s [J/(kg·K)]): Newton steps in ln p on h(p, s) = h, with (∂h/∂p)_s = v,
 * each step a (p, s) flash, inside a bracket from 1e-4 of the triple-point pressure to p_max.
 */
export function stateFromHS(ctx: FluidContext, h: number, s: number, out: FluidState): StatusCode {
  const m = ctx.model;
  if (!Number.isFinite(h) || !Number.isFinite(s)) return Status.invalidInput;
  let lo = Math.log(1e-4 * m.pt);
  let hi = Math.log(m.pMax);
  let loOk = false;
  let hiOk = false;
  let y = Math.log(m.pc * 0.1);
  const scale = Math.max(Math.abs(h), m.R * m.Tc);
  for (let i = 0; i < 100; i++) {
    const p = Math.exp(y);
    const st = stateFromPS(ctx, p, s, out);
    if (st !== Status.ok && st !== Status.undefinedProperty) {
      if (st !== Status.outOfRange) return st;
      // s not reachable at this pressure (below the triple point only vapour entropies are; at
      // high pressure only the lower ones): narrow the bracket from that side
      if (hi - lo < 1e-12 * Math.abs(hi)) return Status.outOfRange;
      if (p < m.pt) lo = y;
      else hi = y;
      y = 0.5 * (lo + hi);
      continue;
    }
    const f = out.h - h;
    if (f < 0) {
      lo = y;
      loOk = true;
    } else {
      hi = y;
      hiOk = true;
    }
    if (Math.abs(f) <= 1e-14 * scale) return st;
    // (∂h/∂ln p)_s = p·v
    let next = y - f / (p * out.v);
    if (Math.abs(next - y) <= 1e-15 * Math.abs(y) + 1e-15) return st;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (hi - lo < 1e-15 * Math.abs(hi)) return loOk && hiOk ? st : Status.outOfRange;
    y = next;
  }
  return Status.noConvergence;
}
