/**
 * IF97 states from any usual pair: the plain-number SI core of `water.state`.
 *
 * Region selection follows IAPWS R7-97(2012) Section 4 and Figure 1 (regions 1 to 5, the B23 line,
 * the saturation line of region 4). Backward equations give starting values; Newton steps on the
 * basic equations polish them to about 1e-12 relative. Region 3 densities at given (p, T) come from
 * a bracketed search on the region 3 pressure (the solve the release allows in place of SR5-05),
 * choosing the liquid or vapour branch by the saturation pressure of Eq. 30.
 *
 * Every function fills a caller-owned {@link WaterState} and returns a status code (0 = ok); it
 * never throws and never allocates on the paths through regions 1, 2 and 5.
 *
 * @module
 */
import satData from '../../../data/if97/saturation-densities.json';
import { brentRoot } from '../../numeric/root.js';
import { b23Pressure, b23Temperature } from './b23.js';
import { region1TemperaturePH } from './backward-ph.js';
import { region2TemperaturePH } from './backward-ph.js';
import { region1TemperaturePS, region2TemperaturePS } from './backward-ps.js';
import { region1PressureHS, region2PressureHS } from './backward-hs.js';
import { b13EnthalpyHS, region3aPressureHS, S_CRITICAL, saturatedLiquidEnthalpyHS, saturatedVaporEnthalpyHS, saturationTemperatureHS } from './backward-hs-region3.js';
import { P_CRITICAL, P_MAX, P_MAX_5, RHO_CRITICAL, T_13, T_CRITICAL, T_MAX_2, T_MAX_5, T_MIN } from './constants.js';
import { WaterProperties } from './properties.js';
import { region1 } from './region1.js';
import { region2 } from './region2.js';
import { region3, region3Derivatives, region3Pressure } from './region3.js';
import { region3TemperaturePH, region3TemperaturePS, region3VolumePH, region3VolumePS } from './backward-region3.js';
import { saturationPressure, saturationTemperature } from './region4.js';
import { region5 } from './region5.js';

/** Status codes of the SI core (also used by the batch API). */
export const STATUS = {
  ok: 0,
  /** The inputs are valid numbers but no IF97 state exists for them in range. */
  outOfRange: 1,
  /** An iteration did not reach its tolerance. */
  noConvergence: 2,
  /** NaN, infinite, or otherwise unusable input. */
  invalidInput: 3,
  /**
   * Batch only: the state was computed and is two-phase, so cp, cv, w and k are not defined there
   * (their outputs are NaN); every other requested property is valid.
   */
  notDefinedInTwoPhase: 4,
} as const;

/** Phase codes. */
export const PHASE = { liquid: 0, vapor: 1, twoPhase: 2, supercritical: 3 } as const;

/** A full state: properties plus quality, IF97 region and phase. In two-phase states cp, cv and w are NaN (not defined). */
export class WaterState extends WaterProperties {
  /** Vapour mass fraction; NaN outside the two-phase region. */
  x = NaN;
  /** IF97 region 1-5 (4 = two-phase). */
  region = 0;
  /** One of {@link PHASE}. */
  phase = 0;
}

/** Pressure at the saturation line's lower end, p_s(273.15 K), Pa. */
export const P_SAT_MIN = saturationPressure(T_MIN);
/** Pressure on the B23 line at 623.15 K (16.529 MPa): above it saturation lies in region 3. */
export const P_SAT_13 = saturationPressure(T_13);

const scratch = new WaterProperties();
const scratchB = new WaterProperties();
const satLiquid = new WaterProperties();
const satVapor = new WaterProperties();
const pr = new Float64Array(2);

// ---------------------------------------------------------------- classification

/**
 * The IF97 region of (p [Pa], T [K]): 1, 2, 3 or 5; 0 outside the range of IF97.
 * On the saturation line itself (p = p_s(T)), the liquid (region 1) is returned.
 * @example
 * ```ts
 * regionOfPT(1e6, 300);    //=> 1
 * regionOfPT(1e6, 3000);   //=> 0 (outside IF97)
 * ```
 */
export function regionOfPT(p: number, T: number): number {
  if (!(p > 0) || !(T >= T_MIN) || !(T <= T_MAX_5) || !(p <= P_MAX)) return 0;
  if (T > T_MAX_2) return p <= P_MAX_5 ? 5 : 0;
  if (T <= T_13) return p >= saturationPressure(T) ? 1 : 2;
  if (T <= 863.15 && p > b23Pressure(T)) return 3;
  return 2;
}

/** Phase of a single-phase state: supercritical above both critical values, otherwise liquid or vapour by the saturation pressure. */
function phaseOf(p: number, T: number, region: number): number {
  if (T >= T_CRITICAL) return p >= P_CRITICAL ? PHASE.supercritical : PHASE.vapor;
  if (region === 1) return PHASE.liquid;
  if (region === 2 || region === 5) return PHASE.vapor;
  return p >= saturationPressure(T) ? PHASE.liquid : PHASE.vapor;
}

function finish(out: WaterState, region: number): number {
  out.region = region;
  out.x = NaN;
  out.phase = phaseOf(out.p, out.T, region);
  return STATUS.ok;
}

// ---------------------------------------------------------------- region 3 densities

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

function pressure3(rho: number, T: number): number {
  region3Pressure(rho, T, pr);
  return pr[0]!;
}

const RHO_LOW = 5;
// the region 3 equation peaks in pressure near 800 kg/m³ (above 200 MPa on every isotherm of region 3) and is not valid beyond
const RHO_HIGH = 800;

let densityTarget = 0;
let densityT = 0;
function densityResidual(rho: number): number {
  return pressure3(rho, densityT) - densityTarget;
}

/** The root of p3(ρ, T) = p inside [a, b], where the pressure difference changes sign (Brent). */
function polishDensity(p: number, T: number, a: number, b: number): number {
  densityTarget = p;
  densityT = T;
  return brentRoot(densityResidual, a, b, 1e-15);
}

/**
 * Density (kg/m³) in region 3 at (p [Pa], T [K]), by a bracketed search on the region 3 pressure.
 * `branch`: 1 = liquid (the largest root), 2 = vapour (the smallest root), 0 = choose by p_s(T)
 * below the critical temperature. Above the critical temperature the isotherm rises monotonically
 * and one bracket suffices. Below it, the search stays on its branch: from the high-density end down
 * for the liquid, from the low-density end up for the vapour, in steps a tenth of the width of the
 * two-phase loop (sized by the SR1-86 saturated densities) wherever the loop could be crossed.
 * Returns NaN when no root is found.
 * @example
 * ```ts
 * region3Density(25.5837018e6, 650);   //=> 500 (kg/m³)
 * ```
 */
export function region3Density(p: number, T: number, branch: 0 | 1 | 2 = 0): number {
  if (T >= T_CRITICAL) {
    if (!(pressure3(RHO_LOW, T) < p && pressure3(RHO_HIGH, T) > p)) return NaN;
    return polishDensity(p, T, RHO_LOW, RHO_HIGH);
  }
  const b = branch === 0 ? (p >= saturationPressure(T) ? 1 : 2) : branch;
  const rl = approxLiquidDensity(T);
  const rv = approxVaporDensity(T);
  const fine = Math.max(0.02, (rl - rv) / 12);
  if (b === 1) {
    if (!(pressure3(RHO_HIGH, T) > p)) return NaN;
    // clear of the loop, the liquid isotherm rises monotonically: bracket directly
    const safe = Math.min(RHO_HIGH, rl + 40);
    if (pressure3(safe, T) <= p) return polishDensity(p, T, safe, RHO_HIGH);
    for (let prev = safe; prev > rv; prev -= fine) {
      const rho = prev - fine;
      if (pressure3(rho, T) <= p) return polishDensity(p, T, rho, prev);
    }
    return NaN;
  }
  if (!(pressure3(RHO_LOW, T) < p)) return NaN;
  const safe = Math.max(RHO_LOW, rv - 40);
  if (pressure3(safe, T) >= p) return polishDensity(p, T, RHO_LOW, safe);
  for (let prev = safe; prev < rl; prev += fine) {
    const rho = prev + fine;
    if (pressure3(rho, T) >= p) return polishDensity(p, T, prev, rho);
  }
  return NaN;
}

// ---------------------------------------------------------------- forward (p, T)

/**
 * All properties at (p [Pa], T [K]). Status `outOfRange` outside IF97. On the saturation line the
 * liquid is returned (use the saturation functions for both phases).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPT(10e6, 773.15, out);   //=> 0; out.h = 3375058 J/kg, out.region = 2
 * stateFromPT(10e6, 3000, out);     //=> 1 (STATUS.outOfRange)
 * ```
 */
export function stateFromPT(p: number, T: number, out: WaterState): number {
  if (!Number.isFinite(p) || !Number.isFinite(T)) return STATUS.invalidInput;
  const region = regionOfPT(p, T);
  switch (region) {
    case 1:
      region1(p, T, out);
      break;
    case 2:
      region2(p, T, out);
      break;
    case 5:
      region5(p, T, out);
      break;
    case 3: {
      const rho = region3Density(p, T);
      if (Number.isNaN(rho)) return STATUS.noConvergence;
      region3(rho, T, out);
      out.p = p;
      break;
    }
    default:
      return STATUS.outOfRange;
  }
  return finish(out, region);
}

// ---------------------------------------------------------------- saturation

/**
 * Saturated liquid and vapour at T (K), 273.15 K ≤ T ≤ 647.096 K. Below 623.15 K from regions 1
 * and 2 at p_s(T); above, from region 3 at the two densities where its pressure equals p_s(T).
 * @example
 * ```ts
 * const liquid = new WaterProperties(), vapor = new WaterProperties();
 * saturationAtT(373.15, liquid, vapor);   //=> 0 (STATUS.ok); liquid.p = 101418 Pa
 * ```
 */
export function saturationAtT(T: number, liquid: WaterProperties, vapor: WaterProperties): number {
  if (!Number.isFinite(T)) return STATUS.invalidInput;
  if (!(T >= T_MIN && T <= T_CRITICAL)) return STATUS.outOfRange;
  const p = T === T_CRITICAL ? P_CRITICAL : saturationPressure(T);
  if (T <= T_13) {
    region1(p, T, liquid);
    region2(p, T, vapor);
    return STATUS.ok;
  }
  if (T === T_CRITICAL) {
    region3(RHO_CRITICAL, T, liquid);
    region3(RHO_CRITICAL, T, vapor);
  } else {
    const rl = region3Density(p, T, 1);
    const rv = region3Density(p, T, 2);
    if (Number.isNaN(rl) || Number.isNaN(rv)) return STATUS.noConvergence;
    region3(rl, T, liquid);
    region3(rv, T, vapor);
  }
  liquid.p = p;
  vapor.p = p;
  return STATUS.ok;
}

/**
 * Saturated liquid and vapour at p (Pa), 611.213 Pa ≤ p ≤ 22.064 MPa.
 * @example
 * ```ts
 * const liquid = new WaterProperties(), vapor = new WaterProperties();
 * saturationAtP(101325, liquid, vapor);   //=> 0 (STATUS.ok); vapor.h - liquid.h is h_fg
 * ```
 */
export function saturationAtP(p: number, liquid: WaterProperties, vapor: WaterProperties): number {
  if (!Number.isFinite(p)) return STATUS.invalidInput;
  if (!(p >= P_SAT_MIN && p <= P_CRITICAL)) return STATUS.outOfRange;
  const T = p === P_CRITICAL ? T_CRITICAL : Math.min(T_CRITICAL, Math.max(T_MIN, saturationTemperature(p)));
  if (p <= P_SAT_13) {
    // by pressure, so that p_s(623.15 K) itself stays with regions 1 and 2 as saturationAtT does
    const Tl = Math.min(T, T_13);
    region1(p, Tl, liquid);
    region2(p, Tl, vapor);
    return STATUS.ok;
  }
  const status = saturationAtT(T, liquid, vapor);
  liquid.p = p;
  vapor.p = p;
  return status;
}

function mix(x: number, liquid: WaterProperties, vapor: WaterProperties, out: WaterState): number {
  out.T = liquid.T;
  out.p = liquid.p;
  out.v = liquid.v + x * (vapor.v - liquid.v);
  out.rho = 1 / out.v;
  out.u = liquid.u + x * (vapor.u - liquid.u);
  out.h = liquid.h + x * (vapor.h - liquid.h);
  out.s = liquid.s + x * (vapor.s - liquid.s);
  out.cp = NaN;
  out.cv = NaN;
  out.w = NaN;
  out.x = x;
  out.region = 4;
  out.phase = PHASE.twoPhase;
  return STATUS.ok;
}

/**
 * The two-phase mixture of quality x (0 ≤ x ≤ 1) at T (K).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromTX(373.15, 0, out);   //=> 0; out.h = 419.1e3 J/kg
 * ```
 */
export function stateFromTX(T: number, x: number, out: WaterState): number {
  if (!Number.isFinite(T) || !Number.isFinite(x)) return STATUS.invalidInput;
  if (!(x >= 0 && x <= 1)) return STATUS.outOfRange;
  const status = saturationAtT(T, scratch, scratchB);
  return status === STATUS.ok ? mix(x, scratch, scratchB, out) : status;
}

/**
 * The two-phase mixture of quality x (0 ≤ x ≤ 1) at p (Pa).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPX(1e6, 0.9, out);   //=> 0; out.region = 4, out.cp is NaN (not defined)
 * ```
 */
export function stateFromPX(p: number, x: number, out: WaterState): number {
  if (!Number.isFinite(p) || !Number.isFinite(x)) return STATUS.invalidInput;
  if (!(x >= 0 && x <= 1)) return STATUS.outOfRange;
  const status = saturationAtP(p, scratch, scratchB);
  return status === STATUS.ok ? mix(x, scratch, scratchB, out) : status;
}

// ---------------------------------------------------------------- (p, h) and (p, s)

/** Which property a flash matches: enthalpy or entropy. */
const BY_H = 0;
const BY_S = 1;

function valueOf(props: WaterProperties, by: number): number {
  return by === BY_H ? props.h : props.s;
}

/**
 * Newton polish of T at fixed p in region 1, 2 or 5 so that h (or s) matches `target`:
 * dh/dT = cp, ds/dT = cp/T. Kept inside [Tlo, Thi]. Returns the state at the last evaluated T once
 * the next step is below 1e-13·T; a step pinned at a bound without a match is not a solution.
 */
function polishT(region: number, p: number, target: number, by: number, T0: number, Tlo: number, Thi: number, out: WaterState): number {
  let T = Math.min(Thi, Math.max(Tlo, T0));
  for (let i = 0; i < 30; i++) {
    if (region === 1) region1(p, T, out);
    else if (region === 2) region2(p, T, out);
    else region5(p, T, out);
    const f = valueOf(out, by) - target;
    const step = by === BY_H ? f / out.cp : (f * T) / out.cp;
    if (Math.abs(step) <= 1e-13 * T) {
      return finish(out, region);
    }
    let next = T - step;
    if (!(next >= Tlo)) next = 0.5 * (T + Tlo);
    if (!(next <= Thi)) next = 0.5 * (T + Thi);
    if (next === T) return STATUS.noConvergence; // pinned at a bound: no solution inside
    T = next;
  }
  return STATUS.noConvergence;
}

/** h or s at (p, T) in region 1, 2 or 5 (full evaluation into scratch). */
function valueAt(region: number, p: number, T: number, by: number): number {
  if (region === 1) region1(p, T, scratchB);
  else if (region === 2) region2(p, T, scratchB);
  else region5(p, T, scratchB);
  return valueOf(scratchB, by);
}

/** h or s on the region 3 isobar at T (density by search), evaluated into `into`. */
function region3At(p: number, T: number, branch: 0 | 1 | 2, into: WaterProperties): boolean {
  const rho = region3Density(p, T, branch);
  if (Number.isNaN(rho)) return false;
  region3(rho, T, into);
  into.p = p;
  return true;
}

/**
 * Solves T on a region 3 isobar between Tlo and Thi so that h (or s) matches. The basic equations
 * differ slightly at the region boundaries (IF97 Section 10): a target that falls in that gap at the
 * 1/3 boundary (Tlo = 623.15 K) is solved on region 1 just above 623.15 K (at the B23 line the gas
 * side does the same on region 2), so the flash still matches it exactly.
 */
function solveRegion3(p: number, target: number, by: number, Tlo: number, Thi: number, branch: 0 | 1 | 2, out: WaterState): number {
  if (Tlo === T_13 && region3At(p, Tlo, branch, scratchB) && valueOf(scratchB, by) > target) {
    return polishT(1, p, target, by, T_13, T_MIN, T_13 + 5, out);
  }
  if (newtonRegion3(p, target, by, Tlo, Thi, branch, out) === STATUS.ok) return STATUS.ok;
  let failed = false;
  const T = brentRoot(
    (t) => {
      if (!region3At(p, t, branch, scratchB)) {
        failed = true;
        return NaN;
      }
      return valueOf(scratchB, by) - target;
    },
    Tlo,
    Thi,
    1e-14,
  );
  if (failed || Number.isNaN(T)) return STATUS.noConvergence;
  if (!region3At(p, T, branch, out)) return STATUS.noConvergence;
  return finish(out, 3);
}

function backwardRegion1(p: number, target: number, by: number): number {
  return by === BY_H ? region1TemperaturePH(p, target) : region1TemperaturePS(p, target);
}

function backwardRegion2(p: number, target: number, by: number): number {
  return by === BY_H ? region2TemperaturePH(p, target) : region2TemperaturePS(p, target);
}

/**
 * The gas side above the liquid, saturation and region 3: regions 2 and 5, from Tlo up. `below`
 * lets region 2 reach a few kelvin under Tlo, for targets in the small gap IF97 leaves at the B23 line.
 */
function gasSide(p: number, target: number, by: number, Tlo: number, below: number, out: WaterState): number {
  const v2max = valueAt(2, p, T_MAX_2, by);
  if (target <= v2max) {
    const floor = Tlo - below;
    const vlo = valueAt(2, p, floor, by);
    if (target < vlo - 1e-12 * Math.abs(vlo) - 1e-9) return STATUS.outOfRange;
    return polishT(2, p, target, by, backwardRegion2(p, target, by), floor, T_MAX_2, out);
  }
  if (p > P_MAX_5) return STATUS.outOfRange;
  const v5max = valueAt(5, p, T_MAX_5, by);
  if (target > v5max) return STATUS.outOfRange;
  const v5min = valueAt(5, p, T_MAX_2, by);
  // a linear first guess between the region 5 end values; region 5 may reach a few kelvin under
  // 1073.15 K for targets in the gap between the region 2 and 5 values there
  const T0 = T_MAX_2 + ((target - v5min) / (v5max - v5min)) * (T_MAX_5 - T_MAX_2);
  return polishT(5, p, target, by, T0, T_MAX_2 - 5, T_MAX_5, out);
}

const d3 = new Float64Array(9);

/**
 * Fast path of region 3 flashes: the SR3-03 backward equations give (v, T); Newton steps in (ρ, T) on
 * the region 3 equation match p and h (or s). The answer is kept only if it lies in [Tlo, Thi], on a
 * mechanically stable branch ((∂p/∂ρ)_T > 0) and, below the critical temperature, on the requested side
 * of the critical density; otherwise the bracketed search takes over.
 */
function newtonRegion3(p: number, target: number, by: number, Tlo: number, Thi: number, branch: 0 | 1 | 2, out: WaterState): number {
  let T = by === BY_H ? region3TemperaturePH(p, target) : region3TemperaturePS(p, target);
  let rho = 1 / (by === BY_H ? region3VolumePH(p, target) : region3VolumePS(p, target));
  if (!(T > 0 && rho > 0)) return STATUS.noConvergence;
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
    if (!(det !== 0 && Number.isFinite(det))) return STATUS.noConvergence;
    const dRho = (f1 * e - b * f2) / det;
    const dT = (a * f2 - c * f1) / det;
    rho -= dRho;
    T -= dT;
    if (!(rho > 0 && T > 0)) return STATUS.noConvergence;
    if (Math.abs(dRho) <= 1e-13 * rho && Math.abs(dT) <= 1e-13 * T) {
      if (!(T >= Tlo - 1e-9 && T <= Thi + 1e-9) || !(d3[1]! > 0)) return STATUS.noConvergence;
      if (T < T_CRITICAL && branch !== 0 && (branch === 1) !== rho >= RHO_CRITICAL) return STATUS.noConvergence;
      region3(rho, T, out);
      out.p = p;
      return finish(out, 3);
    }
  }
  return STATUS.noConvergence;
}

/**
 * The state at p (Pa) with enthalpy h (J/kg, by = 0) or entropy s (J/(kg·K), by = 1).
 */
function stateFromPAnd(p: number, target: number, by: number, out: WaterState): number {
  if (!Number.isFinite(p) || !Number.isFinite(target)) return STATUS.invalidInput;
  if (!(p > 0 && p <= P_MAX)) return STATUS.outOfRange;
  // below the triple-point pressure every state in range is vapour
  if (p < P_SAT_MIN) return gasSide(p, target, by, T_MIN, 0, out);

  if (p <= P_SAT_13) {
    const Ts = saturationTemperature(p);
    // fast paths: the backward equations are within 25 mK of the true temperature in their regions
    // (IF97 Sections 5.2 and 6.3), so a guess 0.1 K clear of T_s settles the phase once the polish
    // converges inside [273.15 K, T_s] or [T_s, 1073.15 K]
    const T1 = backwardRegion1(p, target, by);
    if (T1 < Ts - 0.1 && T1 > T_MIN && polishT(1, p, target, by, T1, T_MIN, Ts, out) === STATUS.ok) return STATUS.ok;
    const T2 = backwardRegion2(p, target, by);
    if (T2 > Ts + 0.1 && T2 < T_MAX_2 && polishT(2, p, target, by, T2, Ts, T_MAX_2, out) === STATUS.ok) return STATUS.ok;
    // near the dome, near the range limits, or in it: decide by the saturated and limiting values
    const vMin = valueAt(1, p, T_MIN, by);
    if (target < vMin - 1e-12 * Math.abs(vMin) - 1e-9) return STATUS.outOfRange;
    const liquidEnd = valueAt(1, p, Ts, by);
    if (target <= liquidEnd) return polishT(1, p, target, by, T1, T_MIN, Ts, out);
    const vaporEnd = valueAt(2, p, Ts, by);
    if (target < vaporEnd) {
      region1(p, Ts, scratch);
      region2(p, Ts, scratchB);
      const x = (target - valueOf(scratch, by)) / (valueOf(scratchB, by) - valueOf(scratch, by));
      return mix(x, scratch, scratchB, out);
    }
    return gasSide(p, target, by, Ts, 0, out);
  }

  const vMin = valueAt(1, p, T_MIN, by);
  if (target < vMin - 1e-12 * Math.abs(vMin) - 1e-9) return STATUS.outOfRange;
  const end1 = valueAt(1, p, T_13, by);
  if (target <= end1) return polishT(1, p, target, by, backwardRegion1(p, target, by), T_MIN, T_13, out);
  if (p < P_CRITICAL) {
    const Ts = saturationTemperature(p);
    const liq = satLiquid;
    const vap = satVapor;
    const status = saturationAtP(p, liq, vap);
    if (status !== STATUS.ok) return status;
    if (target <= valueOf(liq, by)) return solveRegion3(p, target, by, T_13, Ts, 1, out);
    if (target < valueOf(vap, by)) return mix((target - valueOf(liq, by)) / (valueOf(vap, by) - valueOf(liq, by)), liq, vap, out);
    const TB = b23Temperature(p);
    // region 3 owns T ≤ T_B23(p): divide by its value there (IF97's regions differ slightly on the line)
    if (!region3At(p, TB, 2, scratchB)) return STATUS.noConvergence;
    if (target <= valueOf(scratchB, by)) return solveRegion3(p, target, by, Ts, TB, 2, out);
    return gasSide(p, target, by, TB, 5, out);
  }
  const TB = b23Temperature(p);
  if (!region3At(p, TB, 0, scratchB)) return STATUS.noConvergence;
  if (target <= valueOf(scratchB, by)) return solveRegion3(p, target, by, T_13, TB, 0, out);
  return gasSide(p, target, by, TB, 5, out);
}

/**
 * The state at p (Pa) and specific enthalpy h (J/kg).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPH(1e6, 3000e3, out);   //=> 0; out.T = 549.1 K
 * stateFromPH(1e6, 9e6, out);      //=> 1 (STATUS.outOfRange)
 * ```
 */
export function stateFromPH(p: number, h: number, out: WaterState): number {
  return stateFromPAnd(p, h, BY_H, out);
}

/**
 * The state at p (Pa) and specific entropy s (J/(kg·K)).
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromPS(10e6, 6.6e3, out);   //=> 0; out.T ≈ 773 K
 * ```
 */
export function stateFromPS(p: number, s: number, out: WaterState): number {
  return stateFromPAnd(p, s, BY_S, out);
}

// ---------------------------------------------------------------- (h, s)

const hsState = new WaterState();

/** Lowest pressure the (h, s) and (T, v) searches consider, Pa. */
export const P_SEARCH_MIN = 1e-3;

function validPH(p: number, h: number): boolean {
  return stateFromPH(p, h, hsState) === STATUS.ok;
}

/**
 * The pressures between which (p, h) states exist for this h: an interval, since h(p, 273.15 K)
 * rises with p and the hottest state's h falls with p. Found by bisection in ln p.
 * Returns false when no pressure works.
 */
const span = new Float64Array(2);
function pressureSpanFor(h: number): boolean {
  let inside = NaN;
  for (const p of [P_MAX, 1e6, P_SAT_MIN, 1e3, P_SEARCH_MIN]) {
    if (validPH(p, h)) {
      inside = p;
      break;
    }
  }
  if (Number.isNaN(inside)) return false;
  const edge = (valid: number, invalid: number): number => {
    let a = valid;
    let b = invalid;
    for (let i = 0; i < 100 && Math.abs(Math.log(b / a)) > 1e-15; i++) {
      const mid = Math.sqrt(a * b);
      if (validPH(mid, h)) a = mid;
      else b = mid;
    }
    return a;
  };
  span[0] = validPH(P_SEARCH_MIN, h) ? P_SEARCH_MIN : edge(inside, P_SEARCH_MIN);
  span[1] = validPH(P_MAX, h) ? P_MAX : edge(inside, P_MAX);
  // at an edge set by a temperature limit, validity flickers within rounding: step the ends inward
  // until the flash succeeds there, so that the search can evaluate them
  for (let k = 0; k < 40 && !validPH(span[0]!, h); k++) span[0] = span[0]! * (1 + 1e-13 * 2 ** k);
  for (let k = 0; k < 40 && !validPH(span[1]!, h); k++) span[1] = span[1]! * (1 - 1e-13 * 2 ** k);
  return true;
}

/**
 * The state with specific enthalpy h (J/kg) and entropy s (J/(kg·K)). At fixed h, entropy falls
 * strictly with pressure ((∂s/∂p)_h = −v/T), in every region and across the saturation dome, so p
 * follows from a bracketed one-dimensional search on the (p, h) flash. Pressures below 1 mPa are
 * not searched.
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromHS(3000e3, 6.8e3, out);   //=> 0 (STATUS.ok); out.p ≈ 1.69e6 Pa
 * ```
 */
export function stateFromHS(h: number, s: number, out: WaterState): number {
  if (!Number.isFinite(h) || !Number.isFinite(s)) return STATUS.invalidInput;
  if (newtonHS(h, s, out) === STATUS.ok) return STATUS.ok;
  return bracketHS(h, s, out);
}

/**
 * A starting pressure for the (h, s) flash from the backward equations: below the saturation line of
 * the h–s plane (SR4-04 h′(s), h″(s)) the two-phase T_sat(h, s) and p_s(T); on the liquid side
 * p_1(h, s) (SR2-01) below the B13 boundary and p_3a(h, s) (SR4-04) above it; on the vapour side
 * p_2(h, s) (SR2-01), also as the start for region 3b, where SR4-04's p_3b is not available here.
 */
function startPressureHS(h: number, s: number): number {
  if (s >= 0 && s <= 9.155759395e3) {
    const hSat = s <= S_CRITICAL ? saturatedLiquidEnthalpyHS(s) : saturatedVaporEnthalpyHS(s);
    // compressed liquid at low pressure lies barely above h′(s): keep 1 kJ/kg clear of the line
    // (the backward boundary equations are good to a few hundredths of that)
    if (h < hSat - 1e3) {
      const T = saturationTemperatureHS(h, s);
      if (T >= T_MIN && T <= T_CRITICAL) return saturationPressure(T);
    }
  }
  if (s <= S_CRITICAL) {
    // B13 in (h, s) spans 3.397–3.778 kJ/(kg·K); below it every liquid state is in region 1
    const region1 = s < 3.397782955e3 || (s <= 3.778281340e3 && h <= b13EnthalpyHS(s));
    return region1 ? region1PressureHS(h, s) : region3aPressureHS(h, s);
  }
  return region2PressureHS(h, s);
}

/**
 * Fast path of the (h, s) flash: Newton steps on ln p from {@link startPressureHS}, with
 * (∂s/∂ln p)_h = −p·v/T, each step a (p, h) flash. Any failed step hands over to the bracketed search.
 */
function newtonHS(h: number, s: number, out: WaterState): number {
  let p = startPressureHS(h, s);
  if (!(p > P_SEARCH_MIN && p <= P_MAX)) return STATUS.outOfRange;
  for (let i = 0; i < 12; i++) {
    if (stateFromPH(p, h, out) !== STATUS.ok) return STATUS.noConvergence;
    const residual = out.s - s;
    // stop at the rounding level of s: for a liquid, (∂s/∂ln p)_h is tiny and p is only as sharp as s allows
    if (Math.abs(residual) <= 1e-13 * (Math.abs(s) + 1e3)) return STATUS.ok;
    const step = (residual * out.T) / (p * out.v);
    if (Math.abs(step) <= 1e-14) return STATUS.ok;
    const next = p * Math.exp(Math.max(-1, Math.min(1, step)));
    if (!(next > P_SEARCH_MIN && next <= P_MAX)) return STATUS.noConvergence;
    p = next;
  }
  return STATUS.noConvergence;
}

/** The bracketed search of the (h, s) flash over the whole pressure span of h. */
function bracketHS(h: number, s: number, out: WaterState): number {
  if (!pressureSpanFor(h)) return STATUS.outOfRange;
  const pLo = span[0]!;
  const pHi = span[1]!;
  let failed = false;
  // exp(log(p)) may round outside the span: clamp to it, and evaluate the ends themselves exactly
  const lnLo = Math.log(pLo);
  const lnHi = Math.log(pHi);
  const pressureOf = (lnp: number): number => (lnp <= lnLo ? pLo : lnp >= lnHi ? pHi : Math.min(pHi, Math.max(pLo, Math.exp(lnp))));
  const f = (lnp: number): number => {
    const st = stateFromPH(pressureOf(lnp), h, hsState);
    if (st !== STATUS.ok) {
      failed = true;
      return NaN;
    }
    return hsState.s - s;
  };
  const fLo = f(lnLo);
  const fHi = f(lnHi);
  if (failed) return STATUS.outOfRange;
  // at the ends of the span, accept a miss within the (p, h) flash tolerance
  const roundoff = 1e-9 * Math.abs(s) + 1e-9;
  if (fLo < 0) return fLo >= -roundoff ? stateFromPH(pLo, h, out) : STATUS.outOfRange;
  if (fHi > 0) return fHi <= roundoff ? stateFromPH(pHi, h, out) : STATUS.outOfRange;
  const lnp = brentRoot(f, lnLo, lnHi, 1e-15);
  if (failed || Number.isNaN(lnp)) return STATUS.noConvergence;
  return stateFromPH(pressureOf(lnp), h, out);
}

// ---------------------------------------------------------------- (T, v)

/**
 * The state at T (K) and specific volume v (m³/kg). Inside the dome, the two-phase mixture with
 * x = (v − v′)/(v″ − v′); in region 3 directly from f(ρ, T); elsewhere p from a bracketed search
 * on v(p, T), which falls strictly with p.
 * @example
 * ```ts
 * const out = new WaterState();
 * stateFromTV(773.15, 0.0328, out);   //=> 0; out.p ≈ 10 MPa
 * ```
 */
export function stateFromTV(T: number, v: number, out: WaterState): number {
  if (!Number.isFinite(T) || !Number.isFinite(v)) return STATUS.invalidInput;
  if (!(v > 0) || !(T >= T_MIN && T <= T_MAX_5)) return STATUS.outOfRange;
  const liq = scratch;
  const vap = scratchB;
  let pLiquidMin = 0;
  let pVaporMax = P_MAX;
  if (T <= T_CRITICAL) {
    const status = saturationAtT(T, liq, vap);
    if (status !== STATUS.ok) return status;
    if (v >= liq.v && v <= vap.v) return mix(vap.v === liq.v ? 0 : (v - liq.v) / (vap.v - liq.v), liq, vap, out);
    pLiquidMin = liq.p;
    pVaporMax = vap.p;
  }
  // region 3 is a function of (ρ, T): use it where (1/v, T) falls inside it: the liquid side of the
  // dome, or densities above the region 3 vapour density on the B23 line
  if (T > T_13 && T <= 863.15) {
    const rho = 1 / v;
    const pB = b23Pressure(T);
    const rhoB = region3Density(pB, T, 2);
    if (Number.isNaN(rhoB)) return STATUS.noConvergence;
    if ((T < T_CRITICAL && v < liq.v) || rho >= rhoB) {
      region3(rho, T, out);
      if (!(out.p <= P_MAX * (1 + 1e-9))) return STATUS.outOfRange;
      return finish(out, 3);
    }
    pVaporMax = Math.min(pVaporMax, pB);
  }
  const region = T > T_MAX_2 ? 5 : T <= T_13 && v < liq.v ? 1 : 2;
  const pTop = region === 5 ? P_MAX_5 : region === 1 ? P_MAX : pVaporMax;
  const pBottom = region === 1 ? pLiquidMin : P_SEARCH_MIN;
  const vAt = (lnp: number): number => {
    const p = Math.exp(lnp);
    if (region === 1) region1(p, T, scratchB);
    else if (region === 2) region2(p, T, scratchB);
    else region5(p, T, scratchB);
    return Math.log(scratchB.v) - Math.log(v);
  };
  const fBottom = vAt(Math.log(pBottom));
  const fTop = vAt(Math.log(pTop));
  // ln v may miss by rounding at the ends of the span: accept 1e-12 there
  if (fBottom < -1e-12 || fTop > 1e-12) return STATUS.outOfRange;
  const lnp = fBottom <= 0 ? Math.log(pBottom) : fTop >= 0 ? Math.log(pTop) : brentRoot(vAt, Math.log(pBottom), Math.log(pTop), 1e-15);
  if (Number.isNaN(lnp)) return STATUS.noConvergence;
  const p = Math.min(pTop, Math.max(pBottom, Math.exp(lnp)));
  if (region === 1) region1(p, T, out);
  else if (region === 2) region2(p, T, out);
  else region5(p, T, out);
  return finish(out, region);
}
