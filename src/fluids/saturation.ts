/**
 * Saturation from a Helmholtz-energy equation of state: the phase equilibrium condition
 * p(T, ρ') = p(T, ρ'') and g(T, ρ') = g(T, ρ'') (the Maxwell criterion).
 *
 * By temperature: Newton's method on δ' and δ'' for the pair
 *   J(δ) = δ(1 + δαʳ_δ)   (= p/(ρᵣRT)),   K(δ) = δαʳ_δ + αʳ + ln δ   (= g/(RT) less terms equal in both phases),
 * with J_δ = 1 + 2δαʳ_δ + δ²αʳ_δδ and K_δ = 2αʳ_δ + δαʳ_δδ + 1/δ (the scheme of Akasaka,
 * J. Thermal Sci. Technol. 3 (2008) 442), from the ancillary equations' starting values.
 * By pressure: Newton's method on ln p in T with the Clapeyron slope dp/dT = (s'' − s')/(v'' − v'),
 * each step a saturation solve by temperature started from the previous densities.
 *
 * @module
 */
import { Status, type StatusCode } from '../core/status.js';
import { ancillaryLiquidDensity, ancillaryPressure, ancillaryTemperature, ancillaryVaporDensity, FLUID_PHASE, propertiesAt, type FluidContext, type FluidState } from './model.js';

/**
 * Solves the equilibrium at T from reduced densities dL, dV into ctx.satDL, ctx.satDV, ctx.satP.
 * Stops when |ΔJ| ≤ 1e-13·J (plus the rounding level of the liquid's J, a small difference of large
 * terms at low temperatures) and |ΔK| ≤ 1e-12 (g equal to 1e-12·RT); after six steps, at the rounding floor of K (a sum
 * of terms of order 10), 10·tol J and 1e-11.
 */
export function solveSaturationDensities(ctx: FluidContext, T: number, dL0: number, dV0: number): StatusCode {
  const m = ctx.model;
  const tau = m.Tr / T;
  const ar = ctx.ar;
  let dL = dL0;
  let dV = dV0;
  for (let i = 0; i < 60; i++) {
    m.residual(dL, tau, ar);
    const JL = dL * (1 + dL * ar[1]!);
    const KL = dL * ar[1]! + ar[0]! + Math.log(dL);
    const JdL = 1 + 2 * dL * ar[1]! + dL * dL * ar[2]!;
    const KdL = 2 * ar[1]! + dL * ar[2]! + 1 / dL;
    m.residual(dV, tau, ar);
    const JV = dV * (1 + dV * ar[1]!);
    const KV = dV * ar[1]! + ar[0]! + Math.log(dV);
    const JdV = 1 + 2 * dV * ar[1]! + dV * dV * ar[2]!;
    const KdV = 2 * ar[1]! + dV * ar[2]! + 1 / dV;
    const dJ = JV - JL;
    const dK = KV - KL;
    // J of the liquid is a small difference of large terms (δ² αʳ_δ, with αʳ_δ a sum of terms of
    // order 10): allow its rounding level, about 2e-14·δ'²
    const tolJ = 1e-13 * Math.abs(JV) + 2e-14 * dL * dL;
    if ((Math.abs(dJ) <= tolJ && Math.abs(dK) <= 1e-12) || (i >= 6 && Math.abs(dJ) <= 10 * tolJ && Math.abs(dK) <= 1e-11)) {
      ctx.satDL = dL;
      ctx.satDV = dV;
      ctx.satP = JV * m.rhor * m.R * T;
      return Status.ok;
    }
    const det = JdV * KdL - JdL * KdV;
    if (!(det !== 0 && Number.isFinite(det))) return Status.noConvergence;
    let stepL = (dK * JdV - dJ * KdV) / det;
    let stepV = (dK * JdL - dJ * KdL) / det;
    // keep δ'' < δ' and both positive: halve the step until they are
    for (let k = 0; k < 30 && !(dL + stepL > dV + stepV && dV + stepV > 0); k++) {
      stepL *= 0.5;
      stepV *= 0.5;
    }
    const stall = Math.abs(stepL) <= 4e-16 * dL && Math.abs(stepV) <= 4e-16 * dV;
    if (i >= 1 && Math.abs(stepL) <= 1e-7 * dL && Math.abs(stepV) <= 1e-7 * dV) {
      // quadratic convergence: the error after this step is of order (1e-7)² (times a constant of
      // order one), at the rounding level of the densities; take
      // it without another evaluation (J at the new point to first order, J_δ·step, is exact here)
      ctx.satDL = dL + stepL;
      ctx.satDV = dV + stepV;
      ctx.satP = (JV + JdV * stepV) * m.rhor * m.R * T;
      return Status.ok;
    }
    dL += stepL;
    dV += stepV;
    if (stall && i > 2) {
      // at the rounding level (close to the critical point J and K are flat): accept if near
      if (Math.abs(dJ) <= 10 * tolJ && Math.abs(dK) <= 1e-11) {
        ctx.satDL = dL;
        ctx.satDV = dV;
        ctx.satP = JV * m.rhor * m.R * T;
        return Status.ok;
      }
      return Status.noConvergence;
    }
  }
  return Status.noConvergence;
}

function finish(ctx: FluidContext, T: number, liquid: FluidState, vapor: FluidState): StatusCode {
  const m = ctx.model;
  const a = propertiesAt(ctx, T, ctx.satDL * m.rhor, liquid);
  const b = propertiesAt(ctx, T, ctx.satDV * m.rhor, vapor);
  if (a === Status.invalidInput || b === Status.invalidInput || a === Status.noConvergence || b === Status.noConvergence) return Status.noConvergence;
  // one pressure for both phases: the vapour's (the liquid's is a small difference of large terms)
  liquid.p = ctx.satP;
  vapor.p = ctx.satP;
  liquid.phase = FLUID_PHASE.liquid;
  vapor.phase = FLUID_PHASE.vapor;
  return a === Status.ok && b === Status.ok ? Status.ok : Status.undefinedProperty;
}

/** Writes the critical state into both outputs. */
function critical(ctx: FluidContext, liquid: FluidState, vapor: FluidState): StatusCode {
  const m = ctx.model;
  ctx.satDL = m.rhoc / m.rhor;
  ctx.satDV = ctx.satDL;
  ctx.satP = m.pc;
  const s = finish(ctx, m.Tc, liquid, vapor);
  return s === Status.noConvergence ? s : Status.undefinedProperty;
}

/**
 * Saturated liquid and vapour at T (K), from the triple point to the critical point.
 * @returns `Status.ok`; `Status.outOfRange` outside [T_triple, T_c]; `Status.noConvergence`;
 *   `Status.undefinedProperty` at T = T_c exactly (cp, cv, w diverge there)
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), l = new FluidState(), v = new FluidState();
 * saturationAtT(ctx, 450, l, v);   //=> 0 (Status.ok)
 * l.p;                             //=> 932203.56362... (IAPWS-95 Table 8: 0.932203564 MPa)
 * v.rho;                           //=> 4.81200360... (Table 8: 0.481200360e1 kg/m³)
 * saturationAtT(ctx, 700, l, v);   //=> 1 (Status.outOfRange: above T_c)
 * ```
 */
export function saturationAtT(ctx: FluidContext, T: number, liquid: FluidState, vapor: FluidState): StatusCode {
  const m = ctx.model;
  if (!Number.isFinite(T)) return Status.invalidInput;
  if (!(T >= m.Tt && T <= m.Tc)) return Status.outOfRange;
  if (T === m.Tc) return critical(ctx, liquid, vapor);
  const s = solveSaturationDensities(ctx, T, ancillaryLiquidDensity(m, T) / m.rhor, ancillaryVaporDensity(m, T) / m.rhor);
  if (s !== Status.ok) return s;
  return finish(ctx, T, liquid, vapor);
}

/**
 * Saturation at p by Newton's method on (δ', δ'', τ) together: J(δ', τ) = J(δ'', τ) = p/(ρᵣRT) and
 * K(δ', τ) = K(δ'', τ), from the ancillary densities at the ancillary temperature T0. Writes
 * ctx.satDL, ctx.satDV, ctx.satP and ctx.satT; `Status.noConvergence` sends the caller to the
 * bracketed solve.
 */
function saturationNewton3(ctx: FluidContext, p: number, T0: number): StatusCode {
  const m = ctx.model;
  const ar = ctx.ar;
  let tau = m.Tr / T0;
  let dL = ancillaryLiquidDensity(m, T0) / m.rhor;
  let dV = ancillaryVaporDensity(m, T0) / m.rhor;
  // P̂(τ) = p/(ρᵣ R T) = c·τ
  const c = p / (m.rhor * m.R * m.Tr);
  const tauMin = m.Tr / m.Tc;
  const tauMax = m.Tr / (m.Tt * 0.999);
  for (let i = 0; i < 12; i++) {
    m.residual(dL, tau, ar);
    const JL = dL * (1 + dL * ar[1]!);
    const KL = dL * ar[1]! + ar[0]! + Math.log(dL);
    const JdL = 1 + 2 * dL * ar[1]! + dL * dL * ar[2]!;
    const KdL = 2 * ar[1]! + dL * ar[2]! + 1 / dL;
    const JtL = dL * dL * ar[5]!;
    const KtL = dL * ar[5]! + ar[3]!;
    m.residual(dV, tau, ar);
    const JV = dV * (1 + dV * ar[1]!);
    const KV = dV * ar[1]! + ar[0]! + Math.log(dV);
    const JdV = 1 + 2 * dV * ar[1]! + dV * dV * ar[2]!;
    const KdV = 2 * ar[1]! + dV * ar[2]! + 1 / dV;
    const JtV = dV * dV * ar[5]!;
    const KtV = dV * ar[5]! + ar[3]!;
    const P = c * tau;
    // F = (JL − P, JV − P, KV − KL); Jacobian rows over (δ', δ'', τ)
    const f1 = JL - P;
    const f2 = JV - P;
    const f3 = KV - KL;
    const a11 = JdL, a12 = 0, a13 = JtL - c;
    const a21 = 0, a22 = JdV, a23 = JtV - c;
    const a31 = -KdL, a32 = KdV, a33 = KtV - KtL;
    const det = a11 * (a22 * a33 - a23 * a32) - a12 * (a21 * a33 - a23 * a31) + a13 * (a21 * a32 - a22 * a31);
    if (!(Number.isFinite(det) && det !== 0)) return Status.noConvergence;
    // Cramer's rule for the step −F
    const sL = -(f1 * (a22 * a33 - a23 * a32) - a12 * (f2 * a33 - a23 * f3) + a13 * (f2 * a32 - a22 * f3)) / det;
    const sV = -(a11 * (f2 * a33 - a23 * f3) - f1 * (a21 * a33 - a23 * a31) + a13 * (a21 * f3 - f2 * a31)) / det;
    const sT = -(a11 * (a22 * f3 - f2 * a32) - a12 * (a21 * f3 - f2 * a31) + f1 * (a21 * a32 - a22 * a31)) / det;
    const nL = dL + sL;
    const nV = dV + sV;
    const nT = tau + sT;
    if (!(nV > 0 && nL > nV && nT > tauMin && nT < tauMax)) return Status.noConvergence;
    // quadratic convergence: after steps below 1e-7 the error is of order 1e-14
    const small = Math.abs(sL) <= 1e-7 * dL && Math.abs(sV) <= 1e-7 * dV && Math.abs(sT) <= 1e-8 * tau;
    dL = nL;
    dV = nV;
    tau = nT;
    if (small && i >= 1) {
      ctx.satDL = dL;
      ctx.satDV = dV;
      ctx.satT = m.Tr / tau;
      ctx.satP = p;
      return Status.ok;
    }
  }
  return Status.noConvergence;
}

/**
 * Saturated liquid and vapour at p (Pa), from the triple-point to the critical pressure.
 * @returns as {@link saturationAtT}
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), l = new FluidState(), v = new FluidState();
 * saturationAtP(ctx, 101325, l, v);   //=> 0 (Status.ok)
 * l.T;                                //=> 373.12429584... (373.124 K, common practice)
 * v.h - l.h;                          //=> 2256471.59... (J/kg)
 * ```
 */
export function saturationAtP(ctx: FluidContext, p: number, liquid: FluidState, vapor: FluidState): StatusCode {
  const m = ctx.model;
  if (!Number.isFinite(p)) return Status.invalidInput;
  if (!(p >= m.pt && p <= m.pc)) return Status.outOfRange;
  if (p === m.pc) return critical(ctx, liquid, vapor);
  const lnp = Math.log(p);
  // starting value: invert the ancillary by Newton's method on ln p in T
  let T = ancillaryTemperature(m, lnp);
  if (p < 0.98 * m.pc) {
    const fast = saturationNewton3(ctx, p, T);
    if (fast === Status.ok) return finish(ctx, ctx.satT, liquid, vapor);
  }
  T = m.Tt + (m.Tc - m.Tt) * 0.5;
  for (let i = 0; i < 30; i++) {
    const f = Math.log(ancillaryPressure(m, T)) - lnp;
    const h = 1e-6 * T;
    const df = (Math.log(ancillaryPressure(m, Math.min(T + h, m.Tc))) - Math.log(ancillaryPressure(m, T - h))) / (Math.min(T + h, m.Tc) - (T - h));
    let next = T - f / df;
    if (!(next > m.Tt * 0.999)) next = 0.5 * (T + m.Tt);
    if (!(next < m.Tc)) next = 0.5 * (T + m.Tc);
    if (Math.abs(next - T) < 1e-10 * T) {
      T = next;
      break;
    }
    T = next;
  }
  let dL = ancillaryLiquidDensity(m, T) / m.rhor;
  let dV = ancillaryVaporDensity(m, T) / m.rhor;
  const tau0 = m.Tr;
  const ar = ctx.ar;
  let lo = m.Tt * 0.999;
  let hi = m.Tc;
  for (let i = 0; i < 60; i++) {
    const st = solveSaturationDensities(ctx, T, dL, dV);
    if (st !== Status.ok) {
      // restart from the ancillaries at this temperature
      const again = solveSaturationDensities(ctx, T, ancillaryLiquidDensity(m, T) / m.rhor, ancillaryVaporDensity(m, T) / m.rhor);
      if (again !== Status.ok) return again;
    }
    dL = ctx.satDL;
    dV = ctx.satDV;
    const f = Math.log(ctx.satP) - lnp;
    if (f > 0) hi = T;
    else lo = T;
    // Clapeyron: dp/dT = Δs/Δv; the ideal-gas τ parts cancel in Δs
    const tau = tau0 / T;
    m.residual(dL, tau, ar);
    const sL = tau * ar[3]! - ar[0]! - Math.log(dL);
    m.residual(dV, tau, ar);
    const sV = tau * ar[3]! - ar[0]! - Math.log(dV);
    const dpdT = (m.R * (sV - sL)) / (1 / (dV * m.rhor) - 1 / (dL * m.rhor));
    let next = T - f / (dpdT / ctx.satP);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(f) <= 2e-14 || Math.abs(next - T) <= 1e-14 * T) {
      if (Math.abs(f) > 1e-12) {
        T = next;
        continue;
      }
      return finish(ctx, T, liquid, vapor);
    }
    T = next;
  }
  return Status.noConvergence;
}
