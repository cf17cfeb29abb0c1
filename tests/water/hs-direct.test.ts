/**
 * The direct paths of the (h, s) flash (src/water/if97/hs.ts `directHS`: regions 1 and 2 by Newton in
 * (p, T) on the Gibbs equations, hs-region12.ts; region 3 by Newton in (ρ, T), hs-region3.ts; two-phase
 * below 623.15 K by Newton in T from a saturation-line table, hs-two-phase.ts). Consistency checks
 * against IF97's own equations, no outside values: a state built from (p, T) or (p, x) comes back
 * through the direct path of its region (never the (p, h)-flash Newton path or the bracketed search),
 * with p and T to 1e-9 relative and h, s at their rounding level; and the general path (Newton on ln p
 * over (p, h) flashes, then the bracketed search, as before the direct paths) gives the same state.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { b23Pressure } from '../../src/water/if97/b23.js';
import { P_CRITICAL, T_CRITICAL } from '../../src/water/if97/constants.js';
import { SolverContext } from '../../src/water/if97/context.js';
import { generalPathHS, HS_PATH, pathHS } from '../../src/water/if97/hs.js';
import { T_MARGIN_13, T_MARGIN_B23 } from '../../src/water/if97/hs-region12.js';
import { stateFromPT } from '../../src/water/if97/pt.js';
import { stateFromPX } from '../../src/water/if97/quality.js';
import { saturationPressure } from '../../src/water/if97/region4.js';
import { WaterState } from '../../src/water/if97/water-state.js';

const ctx = new SolverContext();
const status = new Int32Array(1);
const src = new WaterState();
const out = new WaterState();
const general = new WaterState();

/** h and s at their rounding level (the flash's own tolerances). */
function expectRounding(state: WaterState, h: number, s: number): void {
  expect(Math.abs(state.h - h)).toBeLessThanOrEqual(1e-13 * Math.abs(h) + 1e-8);
  expect(Math.abs(state.s - s)).toBeLessThanOrEqual(1e-13 * (Math.abs(s) + 1e3));
}

/**
 * The (h, s) state of `src` comes back by `path`, with its p and T, and the general path agrees: T to
 * 1e-10, p as sharply as s fixes it there (along an isenthalp (∂s/∂ln p)_h = −p·v/T, and the general
 * path stops at an s miss of 1e-13·(|s| + 1 kJ/(kg·K)), allowed ten times over; for a liquid at low pressure that is coarser
 * than 1e-9 in p). States within rounding of 100 MPa are left to the general path (the direct
 * paths keep p ≤ 100 MPa strictly), so the sweeps stop at 99.9 MPa.
 */
function expectDirect(path: number, label: string): void {
  const h = src.h;
  const s = src.s;
  expect(pathHS(h, s, out, ctx, status), label).toBe(path);
  expect(Math.abs(out.p / src.p - 1), label).toBeLessThanOrEqual(1e-9);
  expect(Math.abs(out.T / src.T - 1), label).toBeLessThanOrEqual(1e-9);
  expect(out.region, label).toBe(src.region);
  expect(out.phase, label).toBe(src.phase);
  expectRounding(out, h, s);
  expect(generalPathHS(h, s, general, ctx), label).toBe(Status.ok);
  expect(general.region, label).toBe(out.region);
  expect(Math.abs(general.T / out.T - 1), label).toBeLessThanOrEqual(1e-10);
  const lnpTolerance = (1e-12 * (Math.abs(s) + 1e3) * out.T) / (out.p * out.v) + 1e-11;
  expect(Math.abs(Math.log(general.p / out.p)), label).toBeLessThanOrEqual(lnpTolerance);
  if (src.region === 4) expect(Math.abs(general.x - out.x), label).toBeLessThanOrEqual(1e-10);
}

describe('(h, s) flash, direct paths', () => {
  it('region 1 (1 kPa … 99.9 MPa, 273.16 K … 623.15 K less its margin): Newton in (p, T)', () => {
    fc.assert(
      fc.property(fc.double({ min: Math.log(1e3), max: Math.log(99.9e6), noNaN: true }), fc.double({ min: 273.16, max: 623.15 - T_MARGIN_13 - 0.01, noNaN: true }), (lnp, T) => {
        const p = Math.exp(lnp);
        fc.pre(p > saturationPressure(T) * (1 + 1e-6));
        expect(stateFromPT(p, T, src)).toBe(Status.ok);
        expectDirect(HS_PATH.region12, `p = ${p}, T = ${T}`);
      }),
      { numRuns: 1000 },
    );
  });

  it('region 2 (1 Pa … 99.9 MPa, 273.16 K … 1073.15 K less its margins): Newton in (p, T)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: Math.log(99.9e6), noNaN: true }), fc.double({ min: 273.16, max: 1073.15 - T_MARGIN_B23 - 0.01, noNaN: true }), (lnp, T) => {
        const p = Math.exp(lnp);
        fc.pre(T <= 623.15 ? p < saturationPressure(T) * (1 - 1e-6) : T > 863.15 + T_MARGIN_B23 + 0.01 || p < b23Pressure(T - T_MARGIN_B23 - 0.01));
        expect(stateFromPT(p, T, src)).toBe(Status.ok);
        expectDirect(HS_PATH.region12, `p = ${p}, T = ${T}`);
      }),
      { numRuns: 1000 },
    );
  });

  it('region 3 (above B23 up to 99.9 MPa, 623.16 K … 850 K, 1 % of the span clear of B23, clear of T_c by 2 mK and of p_c by 2e-4 p_c: region3HS hands over to the general path within 1 mK and 1e-4 p_c): Newton in (ρ, T)', () => {
    fc.assert(
      fc.property(fc.double({ min: 623.16, max: 850, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (T, f) => {
        fc.pre(Math.abs(T - T_CRITICAL) > 2e-3);
        const pB = Math.max(b23Pressure(T), T < T_CRITICAL ? saturationPressure(T) : 0);
        const p = pB + f * (99.9e6 - pB);
        // a random state at p = 22.0618 MPa, T = 641.92 K came back by the general path, as region3HS
        // is written to do within 1e-4 p_c of the critical pressure
        fc.pre(Math.abs(p - P_CRITICAL) > 2e-4 * P_CRITICAL);
        fc.pre(stateFromPT(p, T, src) === Status.ok && src.region === 3);
        expectDirect(HS_PATH.region3, `p = ${p}, T = ${T}`);
      }),
      { numRuns: 500 },
    );
  });

  it('region 3 within 1e-4 p_c of the critical pressure: the general path, and the state comes back', () => {
    // the random state that found the handover (p = 22.0618 MPa, T = 641.92 K)
    expect(stateFromPT(22061793.599998966, 641.9191662661196, src)).toBe(Status.ok);
    expect(src.region).toBe(3);
    expect(pathHS(src.h, src.s, out, ctx, status)).toBe(HS_PATH.flashNewton);
    expect(Math.abs(out.p / src.p - 1)).toBeLessThanOrEqual(1e-9);
    expect(Math.abs(out.T / src.T - 1)).toBeLessThanOrEqual(1e-9);
    expect(out.phase).toBe(src.phase);
  });

  it('two-phase (611.7 Pa … 16.4 MPa, x = 0.001 … 0.999): Newton in T on the saturation line', () => {
    fc.assert(
      fc.property(fc.double({ min: Math.log(611.7), max: Math.log(16.4e6), noNaN: true }), fc.double({ min: 0.001, max: 0.999, noNaN: true }), (lnp, x) => {
        const p = Math.exp(lnp);
        expect(stateFromPX(p, x, src)).toBe(Status.ok);
        expectDirect(HS_PATH.twoPhase, `p = ${p}, x = ${x}`);
        expect(Math.abs(out.x - x)).toBeLessThan(1e-9);
      }),
      { numRuns: 1000 },
    );
  });

  it('hands states next to a region boundary to the general path, which solves them', () => {
    // within T_MARGIN_13 of 623.15 K, where regions 1 and 3 differ within IF97's consistency tolerance
    expect(stateFromPT(50e6, 623.15 - T_MARGIN_13 / 2, src)).toBe(Status.ok);
    expect(pathHS(src.h, src.s, out, ctx, status)).toBe(HS_PATH.flashNewton);
    expect(out.region).toBe(1);
    expect(Math.abs(out.T / src.T - 1)).toBeLessThanOrEqual(1e-11);
    // saturated liquid: on the saturation line, the general path decides between region 1 and 4
    expect(stateFromPX(1e6, 0, src)).toBe(Status.ok);
    expect(pathHS(src.h, src.s, out, ctx, status)).not.toBe(HS_PATH.region12);
    expect(Math.abs(out.T / src.T - 1)).toBeLessThanOrEqual(1e-11);
  });
});
