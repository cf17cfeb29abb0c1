/**
 * The critical-enhancement inputs of IAPWS R12-08 and R15-11 from the project's IAPWS-IF97 core
 * (IAPWS R7-97(2012)): cp, cv and (∂ρ/∂p)_T at (T, ρ), and (∂ρ/∂p)_T at T_R = 970.644 K and the same ρ.
 *
 * (∂ρ/∂p)_T = cp/(cv w²) (since (∂p/∂ρ)_s = w² and κ_T/κ_s = cp/cv); for region 3 this equals
 * 1/(RT(2δφδ + δ²φδδ)) from f(ρ, T), for regions 1, 2 and 5 −1/(ρ² (∂v/∂p)_T) from the Gibbs derivatives.
 *
 * The state at (T, ρ): region 3 directly from f(ρ, T); regions 1, 2 and 5 by a safeguarded Newton
 * iteration on p with the Gibbs equation at T (the region chosen by IAPWS R7-97 Section 4: saturation
 * densities at p_s(T) below 623.15 K, the region 2 density on the B23 line up to 863.15 K).
 *
 * The reference value at T_R: IF97 covers (T_R, ρ) only for ρ up to 283.7 kg/m³ (region 2 at 100 MPa).
 * Up to there it comes from region 2. Between that density and {@link REFERENCE_RHO_MAX} = 500 kg/m³ it
 * comes from the region 3 equation evaluated at T_R, outside its temperature range (623.15 K to
 * 863.15 K): an extrapolation, stated here because it is one. Where both equations give a value at T_R
 * (100 to 283.7 kg/m³) they differ by at most 1.5 % in (∂ρ/∂p)_T; the enhancement depends weakly on
 * this input near the critical point (see docs/guide/transport.md for the measured sensitivity).
 * Above 500 kg/m³ the extrapolated equation stops behaving like a supercritical isotherm (its
 * compressibility turns upward, then negative near 700 kg/m³): the helper returns `Status.outOfRange`
 * there, and callers leave the enhancement out (or use another equation of state).
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
import { b23Pressure } from '../if97/b23.js';
import { P_MAX, P_MAX_5, R_IF97, T_13, T_B23_MAX, T_CRITICAL, T_MAX_2, T_MAX_5, T_MIN } from '../if97/constants.js';
import { SolverContext } from '../if97/context.js';
import { region3DensityAt } from '../if97/region3-density.js';
import { WaterProperties } from '../if97/properties.js';
import { region1 } from '../if97/region1.js';
import { region2 } from '../if97/region2.js';
import { region3, region3Pressure } from '../if97/region3.js';
import { saturationPressure } from '../if97/region4.js';
import { region5 } from '../if97/region5.js';
import { CriticalEnhancementInputs, T_REFERENCE } from './critical.js';

/** Highest temperature for which this helper finds states: the transport releases end at 1173.15 K (IF97 region 5 goes on to 2273.15 K). */
export const IF97_INPUTS_T_MAX = Math.min(T_MAX_5, 1173.15);

/** Scratch and result of the IF97 helpers: after a call, `state` holds the IF97 state at (T, ρ). */
export class If97InputsWork {
  /** The IF97 state at (T, ρ) found by {@link if97EnhancementInputs} (T, p, ρ, cp, cv, w, …). */
  readonly state = new WaterProperties();
  /** Scratch for the region probes. */
  readonly probe = new WaterProperties();
  /** Scratch for the reference-temperature state. */
  readonly reference = new WaterProperties();
  /** [p, ∂p/∂ρ] of region 3. */
  readonly pressure = new Float64Array(2);
  /** IF97 region of `state` (1, 2, 3 or 5), 0 before a successful call. */
  region = 0;
  /** The IF97 solver context of the saturated-density searches. */
  readonly solver = new SolverContext();
}

/** Density of region 2 at T_R and 100 MPa, kg/m³ (283.7): the densest state IF97 has at T_R. */
export const REFERENCE_RHO_REGION2_MAX = region2(P_MAX, T_REFERENCE, new WaterProperties()).rho;
/** Highest density for which the reference derivative is offered (from the region 3 equation extrapolated to T_R), kg/m³. */
export const REFERENCE_RHO_MAX = 500;

function evaluateGibbs(region: number, p: number, T: number, out: WaterProperties): void {
  if (region === 1) region1(p, T, out);
  else if (region === 2) region2(p, T, out);
  else region5(p, T, out);
}

/**
 * Finds p in [pLo, pHi] with ρ(p, T) = rho on a Gibbs region (1, 2 or 5) by Newton steps on ln p
 * kept inside a shrinking bracket; fills `out`. ρ rises with p on every single-phase isotherm.
 */
function solveGibbsDensity(region: number, T: number, rho: number, pLo: number, pHi: number, p0: number, out: WaterProperties): StatusCode {
  const target = Math.log(rho);
  let a = Math.log(pLo);
  let b = Math.log(pHi);
  evaluateGibbs(region, pLo, T, out);
  if (Math.log(out.rho) - target > 1e-13) return Status.outOfRange;
  evaluateGibbs(region, pHi, T, out);
  if (Math.log(out.rho) - target < -1e-13) return Status.outOfRange;
  let x = Math.log(Math.min(pHi, Math.max(pLo, p0)));
  for (let i = 0; i < 60; i++) {
    const p = Math.exp(x);
    evaluateGibbs(region, p, T, out);
    const f = Math.log(out.rho) - target;
    if (Math.abs(f) <= 2e-15) return Status.ok;
    if (f < 0) a = x;
    else b = x;
    // d ln ρ / d ln p = p (∂ρ/∂p)_T / ρ, with (∂ρ/∂p)_T = cp/(cv w²)
    const slope = (p * out.cp) / (out.cv * out.w * out.w * out.rho);
    let next = x - f / slope;
    if (!(next > a && next < b)) next = 0.5 * (a + b);
    if (Math.abs(next - x) <= 1e-15 * Math.max(1, Math.abs(x))) {
      evaluateGibbs(region, Math.exp(next), T, out);
      return Status.ok;
    }
    x = next;
  }
  return Status.noConvergence;
}

/**
 * Finds the single-phase IF97 state at (T [K], ρ [kg/m³]) into `work.state` (and its region into
 * `work.region`). `Status.outOfRange` for states outside IF97 regions 1, 2, 3 and 5 (to 1173.15 K), and
 * inside the two-phase dome, where no single-phase state exists.
 * @example
 * ```ts
 * const work = new If97InputsWork();
 * if97StateAtDensity(647.35, 322, work);   //=> 0 (Status.ok)
 * work.region;                             //=> 3
 * work.state.p;                            //=> 22.132e6 (Pa)
 * if97StateAtDensity(373.15, 10, work);    //=> 1 (Status.outOfRange: inside the dome at 373.15 K)
 * ```
 */
export function if97StateAtDensity(T: number, rho: number, work: If97InputsWork): StatusCode {
  if (!Number.isFinite(T) || !Number.isFinite(rho) || !(rho >= 0)) return Status.invalidInput;
  work.region = 0;
  if (!(rho > 0) || !(T >= T_MIN && T <= IF97_INPUTS_T_MAX)) return Status.outOfRange;
  const out = work.state;
  const probe = work.probe;
  // starting pressure for the vapour regions: the ideal gas
  const pIdeal = rho * R_IF97 * T;
  let status: StatusCode;
  let region: number;
  if (T > T_MAX_2) {
    region = 5;
    status = solveGibbsDensity(5, T, rho, Math.min(1e-3, pIdeal), P_MAX_5, pIdeal, out);
  } else if (T > T_B23_MAX) {
    region = 2;
    status = solveGibbsDensity(2, T, rho, Math.min(1e-3, pIdeal), P_MAX, pIdeal, out);
  } else if (T <= T_13) {
    const ps = saturationPressure(T);
    region1(ps, T, probe);
    if (rho >= probe.rho) {
      region = 1;
      const pStart = ps + (rho - probe.rho) * (probe.cv * probe.w * probe.w) / probe.cp;
      status = solveGibbsDensity(1, T, rho, ps, P_MAX, pStart, out);
    } else {
      region2(ps, T, probe);
      if (rho > probe.rho) return Status.outOfRange;
      region = 2;
      status = solveGibbsDensity(2, T, rho, Math.min(1e-3, pIdeal), ps, pIdeal, out);
    }
  } else {
    const pB = b23Pressure(T);
    region2(pB, T, probe);
    if (rho <= probe.rho) {
      region = 2;
      status = solveGibbsDensity(2, T, rho, Math.min(1e-3, pIdeal), pB, pIdeal, out);
    } else {
      region = 3;
      if (T < T_CRITICAL) {
        const ps = saturationPressure(T);
        if (region3DensityAt(ps, T, 1, work.solver) !== Status.ok) return Status.noConvergence;
        const rl = work.solver.rho;
        if (region3DensityAt(ps, T, 2, work.solver) !== Status.ok) return Status.noConvergence;
        const rv = work.solver.rho;
        if (rho > rv && rho < rl) return Status.outOfRange;
      }
      region3(rho, T, out);
      status = out.p <= P_MAX * (1 + 1e-12) ? Status.ok : Status.outOfRange;
    }
  }
  if (status !== Status.ok) return status;
  work.region = region;
  return Status.ok;
}

/**
 * (∂ρ/∂p)_T at T_R = 970.644 K and ρ (kg/m³), in kg/(m³·Pa), written to `out.dRhoDpReference`: from
 * region 2 up to {@link REFERENCE_RHO_REGION2_MAX}, from the region 3 equation extrapolated to T_R up
 * to {@link REFERENCE_RHO_MAX} (see the module notes); `Status.outOfRange` above.
 * @example
 * ```ts
 * const d = new CriticalEnhancementInputs();
 * referenceDensityDerivative(322, d, new If97InputsWork());   //=> 0 (Status.ok)
 * d.dRhoDpReference;                                          //=> 2.7927e-6 (kg/(m³·Pa))
 * referenceDensityDerivative(750, d, new If97InputsWork());   //=> 1 (Status.outOfRange)
 * ```
 */
export function referenceDensityDerivative(rho: number, out: CriticalEnhancementInputs, work: If97InputsWork): StatusCode {
  if (!Number.isFinite(rho) || !(rho >= 0)) return Status.invalidInput;
  if (!(rho > 0) || rho > REFERENCE_RHO_MAX) return Status.outOfRange;
  if (rho <= REFERENCE_RHO_REGION2_MAX) {
    const r = work.reference;
    const pIdeal = rho * R_IF97 * T_REFERENCE;
    const status = solveGibbsDensity(2, T_REFERENCE, rho, Math.min(1e-3, pIdeal), P_MAX, pIdeal, r);
    if (status !== Status.ok) return status;
    out.dRhoDpReference = r.cp / (r.cv * r.w * r.w);
    return Status.ok;
  }
  region3Pressure(rho, T_REFERENCE, work.pressure);
  const dpdrho = work.pressure[1]!;
  if (!(dpdrho > 0)) return Status.outOfRange;
  out.dRhoDpReference = 1 / dpdrho;
  return Status.ok;
}

/**
 * Fills cp, cv and (∂ρ/∂p)_T of `out` from a single-phase IF97 state (its cp, cv and w), and the
 * reference value at (T_R, state.rho). `Status.undefinedProperty` where the state has no finite
 * positive cp, cv or w (two-phase states, the critical point itself).
 * @example
 * ```ts
 * const st = new WaterProperties(), d = new CriticalEnhancementInputs();
 * region3(322, 647.35, st);
 * enhancementInputsFromState(st, d, new If97InputsWork());   //=> 0 (Status.ok)
 * d.dRhoDp;                                                  //=> 6.9265e-3 (kg/(m³·Pa))
 * ```
 */
export function enhancementInputsFromState(state: WaterProperties, out: CriticalEnhancementInputs, work: If97InputsWork): StatusCode {
  const { cp, cv, w } = state;
  const dRhoDp = cp / (cv * w * w);
  if (!(cp > 0 && cp < Infinity && cv > 0 && cv < Infinity && dRhoDp > 0 && dRhoDp < Infinity)) return Status.undefinedProperty;
  out.cp = cp;
  out.cv = cv;
  out.dRhoDp = dRhoDp;
  return referenceDensityDerivative(state.rho, out, work);
}

/**
 * The critical-enhancement inputs at (T [K], ρ [kg/m³]) from IF97: finds the state
 * ({@link if97StateAtDensity}, left in `work.state`), then {@link enhancementInputsFromState}.
 * @example
 * ```ts
 * const d = new CriticalEnhancementInputs();
 * const work = new If97InputsWork();
 * if97EnhancementInputs(647.35, 322, d, work);   //=> 0 (Status.ok)
 * d.cp;                                          //=> 3.1209e6 (J/(kg·K))
 * work.state.p;                                  //=> 22.132e6 (Pa)
 * ```
 */
export function if97EnhancementInputs(T: number, rho: number, out: CriticalEnhancementInputs, work: If97InputsWork): StatusCode {
  const status = if97StateAtDensity(T, rho, work);
  if (status !== Status.ok) return status;
  return enhancementInputsFromState(work.state, out, work);
}
