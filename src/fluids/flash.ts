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

/** {@link solveDensity}: the lower end given is not below the root (p(T, lo) ≥ p). */
const LOW_END_ABOVE = -1;
/** {@link solveDensity}: the upper end given is not above the root (p(T, hi) < p). */
const HIGH_END_BELOW = -2;

/**
 * Density (kg/m³) with p(T, ρ) = p on [lo, hi], where p(T, lo) < p is expected (checked when the
 * iteration starts at lo: {@link LOW_END_ABOVE} when it is not); p(T, hi) > p is checked only if the
 * iteration needs the upper end ({@link HIGH_END_BELOW} when it is not). NaN when there is no
 * convergence. A Newton step below 1e-8·ρ is taken as the answer (the error after it is of order
 * 1e-16·ρ times a constant of order one: quadratic convergence).
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
  let x = guess >= a && guess < b ? guess : a > 0 ? Math.sqrt(a * b) : Math.min(p / RT, 0.5 * b);
  for (let i = 0; i < 100; i++) {
    const delta = x * ir;
    m.residual(delta, tau, ar);
    const f = x * RT * (1 + delta * ar[1]!) - p;
    const df = RT * (1 + 2 * delta * ar[1]! + delta * delta * ar[2]!);
    if (f < 0) a = x;
    else {
      if (x === lo && lo > 0) return LOW_END_ABOVE;
      b = x;
      hiChecked = true;
    }
    // converged: f at its rounding level
    if (Math.abs(f) <= 4e-16 * x * Math.abs(df)) return x;
    let next = df > 0 ? x - f / df : NaN;
    if (Math.abs(next - x) <= 1e-8 * x && next > a && next < b) return next;
    if (!(next > a && next < b)) {
      if (!hiChecked) {
        // the upper end is needed: check that it brackets the root
        m.residual(b * ir, tau, ar);
        if (!(b * RT * (1 + b * ir * ar[1]!) - p >= 0)) return HIGH_END_BELOW;
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
  if (p > ps * (1 + margin) || p < ps * (1 - margin)) {
    // clearly liquid (from the ancillary ρ' up) or clearly vapour (from p/(RT) below the ancillary ρ'')
    const liquid = p > ps;
    const lo = liquid ? ancillaryLiquidDensity(m, T) : 0;
    const hi = liquid ? m.rhoMax : ancillaryVaporDensity(m, T);
    const rho = solveDensity(ctx, p, T, lo, hi, liquid ? lo : guess > 0 && guess < hi ? guess : Math.min(p / (m.R * T), hi * 0.9999));
    if (rho > 0) {
      w.rho = rho;
      w.phase = label(ctx, p, T, liquid);
      return Status.ok;
    }
    if (rho !== LOW_END_ABOVE && rho !== HIGH_END_BELOW) return Status.outOfRange;
    // the ancillary density does not bracket the root: decide by the saturation solve
  }
  const s = solveSaturationDensities(ctx, T, ancillaryLiquidDensity(m, T) / m.rhor, ancillaryVaporDensity(m, T) / m.rhor);
  if (s !== Status.ok) return s;
  const liquid = p >= ctx.satP;
  if (p === ctx.satP) {
    w.rho = ctx.satDL * m.rhor;
    w.phase = FLUID_PHASE.liquid;
    return Status.ok;
  }
  const lo = liquid ? ctx.satDL * m.rhor : 0;
  const hi = liquid ? m.rhoMax : ctx.satDV * m.rhor;
  const rho = solveDensity(ctx, p, T, lo, hi, guess > lo && guess < hi ? guess : liquid ? lo * 1.0001 : Math.min(p / (m.R * T), hi * 0.9999));
  if (!(rho > 0)) return Status.outOfRange;
  w.rho = rho;
  w.phase = label(ctx, p, T, liquid);
  return Status.ok;
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
 * const ctx = new FluidContext(fluidModel('water')!), out = new FluidState();
 * stateFromPT(ctx, 101325, 300, out);   //=> 0 (Status.ok)
 * out.rho;                              //=> 996.556935... (kg/m³)
 * out.phase;                            //=> 0 (FLUID_PHASE.liquid)
 * stateFromPT(ctx, 101325, 200, out);   //=> 1 (Status.outOfRange: below the triple point)
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
  // the density solves p(T, ρ) = p to rounding: report the pressure asked for
  out.p = p;
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
  return Status.ok;
}

/**
 * The two-phase mixture of quality x at T (K): saturation by temperature, then the lever rule.
 * @returns `Status.ok` (the state is computed; cp, cv, w and jouleThomson are NaN there, not defined), or an error status
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), out = new FluidState();
 * stateFromTX(ctx, 373.15, 0.5, out);   //=> 0 (Status.ok)
 * out.p;                                //=> 101417.99665... (Pa)
 * out.cp;                               //=> NaN (not defined in the two-phase state)
 * ```
 */
export function stateFromTX(ctx: FluidContext, T: number, x: number, out: FluidState): StatusCode {
  if (!Number.isFinite(T) || !Number.isFinite(x)) return Status.invalidInput;
  if (!(x >= 0 && x <= 1)) return Status.outOfRange;
  const s = saturationAtT(ctx, T, ctx.liquid, ctx.vapor);
  if (s !== Status.ok && s !== Status.undefinedProperty) return s;
  return mix(ctx, x, out);
}

/**
 * The two-phase mixture of quality x at p (Pa). Returns as {@link stateFromTX}.
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), out = new FluidState();
 * stateFromPX(ctx, 1e6, 1, out);   //=> 0 (Status.ok)
 * out.T;                           //=> 453.02800788... (K, saturated vapour at 1 MPa)
 * ```
 */
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
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), out = new FluidState();
 * stateFromTRho(ctx, 647, 358, out);   //=> 0 (Status.ok)
 * out.p;                               //=> 22038475.5706... (IAPWS-95 Table 7: 0.220384756e2 MPa)
 * stateFromTRho(ctx, 400, 10, out);    //=> 0
 * out.x;       //=> 0.13567821...
 * out.phase;   //=> 2 (two-phase)
 * ```
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
  // above the pressure limit (beyond the rounding of a state solved at the limit itself)
  if (out.p > m.pMax * (1 + 1e-12)) return Status.outOfRange;
  out.phase = T >= m.Tc ? (out.p >= m.pc ? FLUID_PHASE.supercritical : FLUID_PHASE.vapor) : rho >= m.rhoc ? FLUID_PHASE.liquid : FLUID_PHASE.vapor;
  return st;
}

/**
 * The state at (T [K], v [m³/kg]): {@link stateFromTRho} at ρ = 1/v.
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), out = new FluidState();
 * stateFromTV(ctx, 300, 1e-3, out);   //=> 0 (Status.ok)
 * out.p;                              //=> 7833001.35... (Pa: compressed liquid)
 * ```
 */
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

/**
 * Newton's method in (T, ρ) on p(T, ρ) = p and h(T, ρ) = target (or s), from (T0, ρ0), with the
 * step scaled to keep T within 25 % and ρ within a factor 2 of the last point. Writes the state into
 * `out` and returns `Status.ok` when the step falls below 1e-7 (relative; the error after it is of
 * order 1e-14, quadratic convergence) with (∂p/∂ρ)_T > 0 at a
 * temperature in range; `Status.noConvergence` otherwise (the caller then takes the bracketed path).
 */
function newtonPY(ctx: FluidContext, p: number, target: number, by: number, T0: number, rho0: number, out: FluidState): StatusCode {
  const m = ctx.model;
  let T = T0;
  let rho = rho0;
  for (let i = 0; i < 16; i++) {
    if (!(T > 0 && rho > 0)) return Status.noConvergence;
    const st = propertiesAt(ctx, T, rho, out);
    if (st !== Status.ok) return Status.noConvergence;
    const f1 = out.p - p;
    const f2 = valueOf(out, by) - target;
    const pT = out.dpdT;
    const pR = out.dpdrho;
    // (∂h/∂T)_ρ = cv + (∂p/∂T)_ρ/ρ, (∂h/∂ρ)_T = ((∂p/∂ρ)_T − T(∂p/∂T)_ρ/ρ)/ρ; (∂s/∂T)_ρ = cv/T, (∂s/∂ρ)_T = −(∂p/∂T)_ρ/ρ²
    const yT = by === BY_H ? out.cv + pT / rho : out.cv / T;
    const yR = by === BY_H ? (pR - (T * pT) / rho) / rho : -pT / (rho * rho);
    const det = pT * yR - pR * yT;
    if (!(det !== 0 && Number.isFinite(det))) return Status.noConvergence;
    let dT = -(f1 * yR - pR * f2) / det;
    let dR = -(pT * f2 - f1 * yT) / det;
    let lambda = 1;
    if (Math.abs(dT) > 0.25 * T) lambda = (0.25 * T) / Math.abs(dT);
    if (rho + lambda * dR < 0.5 * rho) lambda = (0.5 * rho) / -dR;
    if (rho + lambda * dR > 2 * rho) lambda = rho / dR;
    dT *= lambda;
    dR *= lambda;
    T += dT;
    rho += dR;
    if (lambda === 1 && i >= 1 && Math.abs(dT) <= 1e-7 * T && Math.abs(dR) <= 1e-7 * rho) {
      // the range ends, with rounding room (an (h, s) search at T_max probes pressures just past it)
      if (!(T >= m.Tmin * (1 - 1e-12) && T <= m.Tmax * (1 + 1e-12) && rho <= m.rhoMax)) return Status.noConvergence;
      if (propertiesAt(ctx, T, rho, out) !== Status.ok || !(out.dpdrho > 0)) return Status.noConvergence;
      return Status.ok;
    }
  }
  return Status.noConvergence;
}

/**
 * The state at (p, T) into ctx.start, and from it the isobaric step towards `target`: T0 and ρ0 of a
 * Newton start in ctx.start.T and ctx.start.rho (ΔT = Δy/(∂y/∂T)_p, Δρ = −(∂p/∂T)_ρ/(∂p/∂ρ)_T ΔT).
 * False when there is no state at (p, T).
 */
function isobaricStart(ctx: FluidContext, p: number, T: number, target: number, by: number, lo: number, hi: number): boolean {
  const st = ctx.start;
  if (densityPT(ctx, p, T, 0) !== Status.ok || propertiesAt(ctx, T, ctx.work.rho, st) !== Status.ok) return false;
  const T0 = Math.min(Math.max(T + (target - valueOf(st, by)) / slopeOf(st, by), lo), hi);
  let rho0 = st.rho - (st.dpdT / st.dpdrho) * (T0 - T);
  if (!(rho0 > 0.5 * st.rho && rho0 < 2 * st.rho)) rho0 = st.rho;
  st.T = T0;
  st.rho = rho0;
  return true;
}

/** The 2-D Newton from a start on one side of the dome (or above it); the phase is checked after. */
function tryNewtonPY(ctx: FluidContext, p: number, target: number, by: number, T0: number, rho0: number, side: number, Ts: number, out: FluidState): boolean {
  const m = ctx.model;
  if (newtonPY(ctx, p, target, by, T0, rho0, out) !== Status.ok) return false;
  const T = out.T;
  if (side === FLUID_PHASE.liquid) {
    // below the saturation temperature, on the liquid side of ρc
    if (!(T <= Ts && out.rho > m.rhoc)) return false;
    out.phase = FLUID_PHASE.liquid;
  } else if (side === FLUID_PHASE.vapor) {
    if (!(T >= Ts && out.rho < m.rhoc)) return false;
    out.phase = FLUID_PHASE.vapor;
  } else {
    // at or above the critical pressure: one phase; below T_c it is liquid
    out.phase = T >= m.Tc ? FLUID_PHASE.supercritical : FLUID_PHASE.liquid;
  }
  out.x = NaN;
  // the equation can have further roots of p(T, ρ) = p far from the stable one (a very compressed
  // state at the same p): keep the answer only if it is the (p, T) state itself
  const rho = out.rho;
  if (densityPT(ctx, p, T, rho) !== Status.ok || !(Math.abs(ctx.work.rho - rho) <= 1e-6 * rho)) return false;
  return true;
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
    // start from the saturated phase on the target's side, one isobaric step away:
    // ΔT = Δy/(∂y/∂T)_p, Δρ = (∂ρ/∂T)_p ΔT = −(∂p/∂T)_ρ/(∂p/∂ρ)_T ΔT
    const sat = target < yl ? ctx.liquid : ctx.vapor;
    const dT = (target - (target < yl ? yl : yv)) / slopeOf(sat, by);
    const T0 = Math.min(Math.max(sat.T + dT, m.Tmin), m.Tmax);
    let rho0 = sat.rho - (sat.dpdT / sat.dpdrho) * (T0 - sat.T);
    if (!(rho0 > 0.5 * sat.rho && rho0 < 2 * sat.rho)) rho0 = target < yl ? sat.rho : Math.min(sat.rho, p / (m.R * T0));
    const side = target < yl ? FLUID_PHASE.liquid : FLUID_PHASE.vapor;
    if (side === FLUID_PHASE.liquid && T0 < Ts - 0.25 * (Ts - m.Tmin)) {
      // far below saturation: the liquid at the lowest temperature is the nearer start
      if (isobaricStart(ctx, p, m.Tmin, target, by, m.Tmin, Ts) && tryNewtonPY(ctx, p, target, by, ctx.start.T, ctx.start.rho, side, Ts, out)) return Status.ok;
    } else if (tryNewtonPY(ctx, p, target, by, T0, rho0, side, Ts, out)) return Status.ok;
    if (target < yl) return solveIsobar(ctx, p, target, by, m.Tmin, Ts, false, true, Ts + (target - yl) / slopeOf(ctx.liquid, by), out);
    return solveIsobar(ctx, p, target, by, Ts, m.Tmax, true, false, Ts + (target - yv) / slopeOf(ctx.vapor, by), out);
  }
  if (p >= m.pc) {
    // above the critical pressure: one isobaric step from the state at T_c (away from the critical
    // point itself, where the start is poor and the bracketed path is used)
    if (p > 1.05 * m.pc && isobaricStart(ctx, p, m.Tc, target, by, m.Tmin, m.Tmax)) {
      // below T_c (a liquid-like target) the state at the lowest temperature is the nearer start
      const below = ctx.start.T < m.Tc;
      if (!below && tryNewtonPY(ctx, p, target, by, ctx.start.T, ctx.start.rho, FLUID_PHASE.supercritical, m.Tc, out)) return Status.ok;
      if (below && isobaricStart(ctx, p, m.Tmin, target, by, m.Tmin, m.Tc) && tryNewtonPY(ctx, p, target, by, ctx.start.T, ctx.start.rho, FLUID_PHASE.supercritical, m.Tc, out)) return Status.ok;
    }
    return solveIsobar(ctx, p, target, by, m.Tmin, m.Tmax, false, false, m.Tc, out);
  }
  // below the triple-point pressure: vapour only
  return solveIsobar(ctx, p, target, by, m.Tmin, m.Tmax, false, false, m.Tmin + 50, out);
}

/**
 * The state at (p [Pa], h [J/kg]). Two-phase states return `Status.ok` with x set and cp, cv, w NaN.
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), out = new FluidState();
 * stateFromPH(ctx, 1e6, 3e6, out);      //=> 0
 * out.T;       //=> 549.16849785... (K)
 * out.phase;   //=> 1 (vapour)
 * stateFromPH(ctx, 101325, 1.5e6, out);  //=> 0
 * out.x;    //=> 0.47904093...
 * out.cp;   //=> NaN (not defined in the two-phase dome)
 * ```
 */
export function stateFromPH(ctx: FluidContext, p: number, h: number, out: FluidState): StatusCode {
  const st = flashPY(ctx, p, h, BY_H, out);
  // solved to rounding in p: report the pressure asked for
  if (st === Status.ok) out.p = p;
  return st;
}

/**
 * The state at (p [Pa], s [J/(kg·K)]). Two-phase states return `Status.ok` with x set and cp, cv, w NaN.
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), out = new FluidState();
 * stateFromPS(ctx, 1e5, 7000, out);   //=> 0
 * out.T;   //=> 372.75592889... (K)
 * out.x;   //=> 0.94074577...
 * ```
 */
export function stateFromPS(ctx: FluidContext, p: number, s: number, out: FluidState): StatusCode {
  const st = flashPY(ctx, p, s, BY_S, out);
  if (st === Status.ok) out.p = p;
  return st;
}

export { stateFromHS } from './flash-hs.js';
