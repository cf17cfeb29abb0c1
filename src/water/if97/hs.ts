/**
 * IF97 states from (h, s). At fixed h, entropy falls strictly with pressure ((∂s/∂p)_h = −v/T), in
 * every region and across the saturation dome, so p follows from a one-dimensional solve on the
 * (p, h) flash: Newton steps on ln p from the backward equations' starting pressure (IAPWS SR2-01
 * p(h, s) for regions 1 and 2; SR4-04 p_3a(h, s), h′(s), h″(s), h_B13(s) and T_sat(h, s)), with a
 * bracketed search over the whole pressure span of h as the fallback. SR4-04's p_3b(h, s) is not
 * used (see data/if97/backward-hs-region3.json): region 3b starts from SR2-01's region 2 equation.
 *
 * @module
 */
import { brent } from '../../core/root.js';
import { Status, type StatusCode } from '../../core/status.js';
import { region1PressureHS, region2PressureHS } from './backward-hs.js';
import { b23Pressure } from './b23.js';
import { b13EnthalpyHS, b23TemperatureHS, region3aPressureHS, saturatedLiquidEnthalpyHS, saturatedVaporEnthalpyHS, saturationTemperatureHS } from './backward-hs-region3.js';
import { P_MAX, P_SEARCH_MIN, S_B13_MAX, S_B13_MIN, S_CRITICAL, S_VAPOR_MAX, T_13, T_CRITICAL, T_MIN } from './constants.js';
import { defaultContext, type SolverContext } from './context.js';
import { BY_H } from './isobar-residual.js';
import { stateOnIsobar } from './isobar.js';
import { saturationPressure } from './region4.js';
import { region3bStartPressureHS } from './start-region3b-hs.js';
import { region1HS, region2HS } from './hs-region12.js';
import { region3HS } from './hs-region3.js';
import { twoPhaseHS } from './hs-two-phase.js';
import { mixPhases, P_SAT_MIN } from './saturation.js';
import { evaluateForward } from './regions.js';
import type { WaterState } from './water-state.js';

/** Pressures tried, highest first, to find one where a (p, h) state exists for h. */
const PROBE_PRESSURES = [P_MAX, 1e6, P_SAT_MIN, 1e3, P_SEARCH_MIN];

/**
 * The state with specific enthalpy h (J/kg) and entropy s (J/(kg·K)). Pressures below 1 mPa are not
 * searched.
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromHS(3000e3, 6.8e3, out);   //=> 0 (Status.ok)
 * out.p;   //=> 1.6883e6 (Pa)
 * ```
 */
export function stateFromHS(h: number, s: number, out: WaterState, ctx: SolverContext = defaultContext()): StatusCode {
  if (!Number.isFinite(h) || !Number.isFinite(s)) return Status.invalidInput;
  if (directHS(h, s, out, ctx) !== HS_PATH.none) return Status.ok;
  if (newtonHS(h, s, out, ctx) === Status.ok) return Status.ok;
  return bracketHS(h, s, out, ctx);
}

function validPH(p: number, h: number, ctx: SolverContext): boolean {
  return stateOnIsobar(p, h, BY_H, ctx.inner, ctx) === Status.ok;
}

/** The end of the valid pressure span between a valid and an invalid pressure, by bisection in ln p. */
function spanEdge(valid: number, invalid: number, h: number, ctx: SolverContext): number {
  let a = valid;
  let b = invalid;
  for (let i = 0; i < 100 && Math.abs(Math.log(b / a)) > 1e-15; i++) {
    const mid = Math.sqrt(a * b);
    if (validPH(mid, h, ctx)) a = mid;
    else b = mid;
  }
  return a;
}

/**
 * The pressures between which (p, h) states exist for this h: an interval, since h(p, 273.15 K)
 * rises with p and the hottest state's h falls with p. Sets the span of ctx.entropyAlongEnthalpy.
 * Returns false when no pressure works.
 */
function pressureSpanFor(h: number, ctx: SolverContext): boolean {
  let inside = NaN;
  for (const p of PROBE_PRESSURES) {
    if (validPH(p, h, ctx)) {
      inside = p;
      break;
    }
  }
  if (Number.isNaN(inside)) return false;
  let lo = validPH(P_SEARCH_MIN, h, ctx) ? P_SEARCH_MIN : spanEdge(inside, P_SEARCH_MIN, h, ctx);
  let hi = validPH(P_MAX, h, ctx) ? P_MAX : spanEdge(inside, P_MAX, h, ctx);
  // at an edge set by a temperature limit, validity flickers within rounding: step the ends inward
  // until the flash succeeds there, so that the search can evaluate them
  for (let k = 0; k < 40 && !validPH(lo, h, ctx); k++) lo = lo * (1 + 1e-13 * 2 ** k);
  for (let k = 0; k < 40 && !validPH(hi, h, ctx); k++) hi = hi * (1 - 1e-13 * 2 ** k);
  ctx.entropyAlongEnthalpy.setSpan(lo, hi);
  return true;
}

/**
 * A starting pressure for the (h, s) flash from the backward equations: below the saturation line of
 * the h–s plane (SR4-04 h′(s), h″(s)) the two-phase T_sat(h, s) and p_s(T); on the liquid side
 * p_1(h, s) (SR2-01) below the B13 boundary and p_3a(h, s) (SR4-04) above it; on the vapour side
 * p_2(h, s) (SR2-01) in region 2 and our fit to IF97 in region 3b (data/if97/fit-region3b-hs.json),
 * divided by the B23 line in (h, s) as SR4-04 divides them: 3b below s = 5.048 kJ/(kg·K) (the least
 * entropy on B23), region 2 above 5.261 kJ/(kg·K), and between them 3b where p_2(h, s) lies above
 * p_B23(T_B23(h, s)) (SR4-04 Eq. 8 within its box 2.563–2.812 MJ/kg).
 */
function startPressureHS(h: number, s: number): number {
  const Ts = twoPhaseStartTemperature(h, s);
  if (!Number.isNaN(Ts)) return saturationPressure(Ts);
  const p3 = region3StartPressureHS(h, s);
  if (!Number.isNaN(p3)) return p3;
  return s <= S_CRITICAL ? region1PressureHS(h, s) : region2PressureHS(h, s);
}

/** The starting pressure of a single-phase state the backward equations place in region 3, NaN for other states (see {@link startPressureHS}). */
function region3StartPressureHS(h: number, s: number): number {
  if (s <= S_CRITICAL) {
    // B13 in (h, s) spans 3.397–3.778 kJ/(kg·K); below it every liquid state is in region 1
    const inRegion1 = s < S_B13_MIN || (s <= S_B13_MAX && h <= b13EnthalpyHS(s));
    return inRegion1 ? NaN : region3aPressureHS(h, s);
  }
  if (s < 5.048e3 || (s <= 5.261e3 && h < 2.563e6)) return region3bStartPressureHS(h, s);
  if (s <= 5.261e3 && h <= 2.812e6 && region2PressureHS(h, s) > b23Pressure(b23TemperatureHS(h, s))) return region3bStartPressureHS(h, s);
  return NaN;
}

/**
 * T_sat(h, s) (SR4-04) for a state below the saturation line of the h–s plane (SR4-04 h′(s), h″(s)),
 * NaN elsewhere. Compressed liquid at low pressure lies barely above h′(s): the test keeps 1 kJ/kg
 * clear of the line (the backward boundary equations are good to a few hundredths of that).
 */
function twoPhaseStartTemperature(h: number, s: number): number {
  if (!(s >= 0 && s <= S_VAPOR_MAX)) return NaN;
  const hSat = s <= S_CRITICAL ? saturatedLiquidEnthalpyHS(s) : saturatedVaporEnthalpyHS(s);
  if (!(h < hSat - 1e3)) return NaN;
  const T = saturationTemperatureHS(h, s);
  return T >= T_MIN && T <= T_CRITICAL ? T : NaN;
}

/** Which path solved an (h, s) state: the returns of {@link pathHS}. */
export const HS_PATH = { none: 0, twoPhase: 1, region3: 2, region12: 3, flashNewton: 4, bracket: 5 } as const;

/**
 * The direct paths of the (h, s) flash, none of them built on (p, h) flashes: two-phase states below
 * 623.15 K by {@link twoPhaseHS}, region 3 by Newton in (ρ, T) ({@link region3HS}), regions 1 and 2 by
 * Newton in (p, T) ({@link region1HS}, {@link region2HS}; region 1 at s ≤ s_c, region 2 above).
 * @returns the {@link HS_PATH} code of the path that solved it, `HS_PATH.none` when none did
 * @internal
 */
export function directHS(h: number, s: number, out: WaterState, ctx: SolverContext): number {
  const Ts = twoPhaseStartTemperature(h, s);
  if (!Number.isNaN(Ts)) return twoPhaseHS(h, s, out, ctx) > 0 ? HS_PATH.twoPhase : HS_PATH.none;
  const p3 = region3StartPressureHS(h, s);
  if (!Number.isNaN(p3)) {
    if (region3HS(h, s, p3, out, ctx) === Status.ok) return HS_PATH.region3;
  } else {
    if ((s <= S_CRITICAL ? region1HS(h, s, out) : region2HS(h, s, out)) > 0) return HS_PATH.region12;
  }
  // mixtures next to the saturation line (little vapour, or little liquid) lie within 1 kJ/kg of
  // h′(s) or h″(s), where the test above does not take them for two-phase: not a single-phase state,
  // so try the saturation line (its answer is kept with s at its rounding level and x at least 1e-6
  // from 0 and 1: the saturated states themselves stay with the general path, which labels them)
  if (!(s >= 0 && s <= S_VAPOR_MAX)) return HS_PATH.none;
  const hSat = s <= S_CRITICAL ? saturatedLiquidEnthalpyHS(s) : saturatedVaporEnthalpyHS(s);
  if (h < hSat + 1e3 && twoPhaseHS(h, s, out, ctx) > 0 && out.x >= 1e-6 && out.x <= 1 - 1e-6) return HS_PATH.twoPhase;
  return HS_PATH.none;
}

/**
 * The (h, s) flash with the path that solved it ({@link HS_PATH}; `HS_PATH.none` with a non-ok
 * status in `status[0]`): {@link directHS}, then Newton steps on ln p over (p, h) flashes, then the
 * bracketed search. For tests and measurements; {@link stateFromHS} is the public entry.
 * @internal
 */
export function pathHS(h: number, s: number, out: WaterState, ctx: SolverContext, status: Int32Array): number {
  status[0] = Status.ok;
  if (!Number.isFinite(h) || !Number.isFinite(s)) {
    status[0] = Status.invalidInput;
    return HS_PATH.none;
  }
  const direct = directHS(h, s, out, ctx);
  if (direct !== HS_PATH.none) return direct;
  if (newtonHS(h, s, out, ctx) === Status.ok) return HS_PATH.flashNewton;
  const code = bracketHS(h, s, out, ctx);
  status[0] = code;
  return code === Status.ok ? HS_PATH.bracket : HS_PATH.none;
}

/**
 * The (h, s) flash without its direct paths: {@link newtonHS}, then the bracketed search. For tests
 * that compare the direct paths with it.
 * @internal
 */
export function generalPathHS(h: number, s: number, out: WaterState, ctx: SolverContext): StatusCode {
  if (newtonHS(h, s, out, ctx) === Status.ok) return Status.ok;
  return bracketHS(h, s, out, ctx);
}

/**
 * The general path of the (h, s) flash: Newton steps on ln p from {@link startPressureHS}, with
 * (∂s/∂ln p)_h = −p·v/T, each step a (p, h) flash. Any failed step hands over to the bracketed search.
 */
function newtonHS(h: number, s: number, out: WaterState, ctx: SolverContext): StatusCode {
  let p = startPressureHS(h, s);
  if (!(p > P_SEARCH_MIN && p <= P_MAX)) return Status.outOfRange;
  for (let i = 0; i < 12; i++) {
    if (stateOnIsobar(p, h, BY_H, out, ctx) !== Status.ok) return Status.noConvergence;
    const residual = out.s - s;
    // stop at the rounding level of s: for a liquid, (∂s/∂ln p)_h is tiny and p is only as sharp as s allows
    if (Math.abs(residual) <= 1e-13 * (Math.abs(s) + 1e3)) return Status.ok;
    const step = (residual * out.T) / (p * out.v);
    if (Math.abs(step) <= 1e-14) return Status.ok;
    const next = p * Math.exp(Math.max(-1, Math.min(1, step)));
    if (!(next > P_SEARCH_MIN && next <= P_MAX)) return Status.noConvergence;
    p = next;
  }
  return Status.noConvergence;
}

/** The bracketed search of the (h, s) flash over the whole pressure span of h. */
function bracketHS(h: number, s: number, out: WaterState, ctx: SolverContext): StatusCode {
  if (!pressureSpanFor(h, ctx)) return Status.outOfRange;
  const f = ctx.entropyAlongEnthalpy;
  f.h = h;
  f.s = s;
  const fLo = f.value(f.lnLo);
  const fHi = f.value(f.lnHi);
  if (!Number.isFinite(fLo) || !Number.isFinite(fHi)) return Status.outOfRange;
  // at the ends of the span, accept a miss within the (p, h) flash tolerance
  const roundoff = 1e-9 * Math.abs(s) + 1e-9;
  if (fLo < 0) return fLo >= -roundoff ? stateOnIsobar(f.pLo, h, BY_H, out, ctx) : Status.outOfRange;
  if (fHi > 0) return fHi <= roundoff ? stateOnIsobar(f.pHi, h, BY_H, out, ctx) : Status.outOfRange;
  if (brent(f, f.lnLo, f.lnHi, 1e-15, ctx.root) !== Status.ok) return Status.noConvergence;
  return stateOnIsobar(f.pressureOf(ctx.root.x), h, BY_H, out, ctx);
}
