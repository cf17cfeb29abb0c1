/**
 * Two-phase (h, s) states up to 623.15 K without (p, h) flashes: the saturation temperature where the
 * qualities that h and s give agree, by Newton steps in T on the saturation line, each step one p_s(T)
 * (IAPWS R7-97(2012) region 4, Eq. 30) and the two saturated phases (regions 1 and 2).
 *
 * With Δh = h″ − h′, Δs = s″ − s′, the qualities agree where (h − h′)Δs = (s − s′)Δh, that is where
 * f(T) = h − s·τ(T) − γ(T) = 0 with τ = Δh/Δs (equal to T where IF97 keeps Clausius–Clapeyron, to
 * within its consistency tolerance) and γ = h′ − s′·τ: linear in h and s, so a table of τ and γ over
 * the saturation line, computed once from the same equations on first use (every 5 K from 273.15 K to
 * 623.15 K, with their T-derivatives), gives the start by a cubic Hermite interpolation of f. The
 * start lands within a few µK, and one or two Newton steps finish.
 *
 * @module
 */
import { T_13, T_MIN } from './constants.js';
import type { SolverContext } from './context.js';
import { WaterProperties } from './properties.js';
import { region1 } from './region1.js';
import { region2 } from './region2.js';
import { saturationPressure } from './region4.js';
import { mixPhases } from './saturation.js';
import type { WaterState } from './water-state.js';

/** Spacing of the table's nodes on the saturation line, K. */
const STEP = 5;
/** Nodes: 273.15 K, 278.15 K, …, 623.15 K. */
const NODES = Math.round((T_13 - T_MIN) / STEP) + 1;
/** Values per node: τ, dτ/dT, γ, dγ/dT, s′. */
const W = 5;

/** τ = Δh/Δs and γ = h′ − s′τ at T on the saturation line, into pair[0], pair[1]; s′ into pair[2]. */
function tauGamma(T: number, liquid: WaterProperties, vapor: WaterProperties, pair: Float64Array): void {
  const p = saturationPressure(T);
  region1(p, T, liquid);
  region2(p, T, vapor);
  const tau = (vapor.h - liquid.h) / (vapor.s - liquid.s);
  pair[0] = tau;
  pair[1] = liquid.h - liquid.s * tau;
  pair[2] = liquid.s;
}

/**
 * The table of τ, γ (with their T-derivatives by central differences over ±1 mK) and s′ at the nodes:
 * computed from regions 1, 2 and 4, not stored data.
 */
function buildTable(): Float64Array {
  const table = new Float64Array(NODES * W);
  const liquid = new WaterProperties();
  const vapor = new WaterProperties();
  const a = new Float64Array(3);
  const b = new Float64Array(3);
  const delta = 1e-3;
  for (let i = 0; i < NODES; i++) {
    const T = T_MIN + i * STEP;
    tauGamma(T + delta, liquid, vapor, a);
    tauGamma(T - delta, liquid, vapor, b);
    const k = i * W;
    table[k + 1] = (a[0]! - b[0]!) / (2 * delta);
    table[k + 3] = (a[1]! - b[1]!) / (2 * delta);
    tauGamma(T, liquid, vapor, a);
    table[k] = a[0]!;
    table[k + 2] = a[1]!;
    table[k + 4] = a[2]!;
  }
  return table;
}
/** Built on the first two-phase (h, s) flash, not at import (no work at module scope). */
let TABLE: Float64Array | undefined;

/** f at node i for (h, s): h − s·τᵢ − γᵢ. */
function fAt(table: Float64Array, i: number, h: number, s: number): number {
  const k = i * W;
  return h - s * table[k]! - table[k + 2]!;
}

/** Node i lies below the root for (h, s): s′ < s there and f > 0. */
function below(table: Float64Array, i: number, h: number, s: number): boolean {
  return table[i * W + 4]! < s && fAt(table, i, h, s) > 0;
}

/**
 * The starting temperature for the two-phase state with enthalpy h and entropy s: the root of the
 * cubic Hermite interpolant of f between the nodes that bracket it. Below the root f > 0 and s′ < s;
 * above it f ≤ 0 or s′ ≥ s (past the temperature where the liquid itself has entropy s, f has a
 * second root of no meaning, with x < 0), so a bisection over the nodes finds the bracket. NaN when
 * no node pair brackets a root.
 */
export function twoPhaseStartTemperatureTable(h: number, s: number): number {
  const table = (TABLE ??= buildTable());
  if (!below(table, 0, h, s)) return NaN;
  let lo = 0;
  let hi = NODES - 1;
  if (below(table, hi, h, s)) return NaN;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (below(table, mid, h, s)) lo = mid;
    else hi = mid;
  }
  const f0 = fAt(table, lo, h, s);
  const f1 = fAt(table, hi, h, s);
  // slopes per unit of the local variable u ∈ [0, 1]
  const d0 = -(s * table[lo * W + 1]! + table[lo * W + 3]!) * STEP;
  const d1 = -(s * table[hi * W + 1]! + table[hi * W + 3]!) * STEP;
  // f is convex (f″ ≈ cp′/T), so Newton steps from the chord's root (f1 ≤ 0 and f still falling at the
  // upper node) or else from the node below (the interval may hold f's minimum and both roots) close
  // in on the first root from below
  let u = f1 <= 0 && d1 < 0 ? f0 / (f0 - f1) : 0;
  for (let k = 0; k < 8; k++) {
    const u2 = u * u;
    const u3 = u2 * u;
    const H = (2 * u3 - 3 * u2 + 1) * f0 + (u3 - 2 * u2 + u) * d0 + (-2 * u3 + 3 * u2) * f1 + (u3 - u2) * d1;
    const dH = (6 * u2 - 6 * u) * f0 + (3 * u2 - 4 * u + 1) * d0 + (-6 * u2 + 6 * u) * f1 + (3 * u2 - 2 * u) * d1;
    if (!(dH < 0)) break;
    const next = Math.min(1, Math.max(0, u - H / dH));
    const done = Math.abs(next - u) < 1e-12;
    u = next;
    if (done) break;
  }
  return T_MIN + (lo + u) * STEP;
}

/**
 * The two-phase state with enthalpy h (J/kg) and entropy s (J/(kg·K)) below 623.15 K, by Newton steps
 * in T from {@link twoPhaseStartTemperatureTable}. The residual is the gap between the qualities,
 * G(T) = x_h − x_s = f/(Δh·…); where Δh = TΔs, G = F/Δh with F(T) = h − T·s − g′(T) and, along the
 * saturation line, dg′ = −s′dT + v′dp_s with dp_s/dT = Δs/Δv (Clapeyron); so at the root
 * dG/dT = F′/Δh = −[(s − s′) + v′·Δs/Δv]/Δh, from the values already evaluated. The phases are left
 * in ctx.scratch and ctx.scratchB. Accepted only when s comes back to its rounding level
 * (s′ + x_h·Δs − s = Δs·G) with 0 ≤ x ≤ 1; anything else hands over to the general path.
 * @returns the number of saturation evaluations taken (> 0) with `out` filled, negative when not solved
 */
export function twoPhaseHS(h: number, s: number, out: WaterState, ctx: SolverContext): number {
  let T = twoPhaseStartTemperatureTable(h, s);
  if (!(T >= T_MIN && T <= T_13)) return -1;
  const liquid = ctx.scratch;
  const vapor = ctx.scratchB;
  const sTol = 1e-13 * (Math.abs(s) + 1e3);
  for (let i = 1; i <= 8; i++) {
    const p = saturationPressure(T);
    region1(p, T, liquid);
    region2(p, T, vapor);
    const dh = vapor.h - liquid.h;
    const ds = vapor.s - liquid.s;
    const x = (h - liquid.h) / dh;
    const sGap = liquid.s + x * ds - s;
    if (Math.abs(sGap) <= sTol) {
      if (!(x >= 0 && x <= 1)) return -i;
      mixPhases(x, liquid, vapor, out);
      return i;
    }
    const slope = s - liquid.s + (liquid.v * ds) / (vapor.v - liquid.v);
    // G = sGap/Δs; the step −G/G′ = G·Δh/[(s − s′) + v′Δs/Δv], at most 5 K
    const step = Math.max(-5, Math.min(5, ((sGap / ds) * dh) / slope));
    const next = T + step;
    if (!(next >= T_MIN && next <= T_13)) return -i;
    T = next;
  }
  return -9;
}
