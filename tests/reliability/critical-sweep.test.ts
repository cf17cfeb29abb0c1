/**
 * IAPWS-IF97 at and around the critical point (T_c = 647.096 K, p_c = 22.064 MPa, IAPWS R7-97(2012)
 * Eqs. 1–3), the neighbourhood where issue 17 found flashes that did not converge, saturation that
 * threw, h_fg < 0 and wrong phase labels. A seeded sweep concentrated within 1e-3 (relative) of the
 * critical point, denser towards it (log-uniform distances down to 1e-16), plus the points the
 * issue names:
 * - saturation by T and by p up to T_c and p_c exactly: computed, h_fg ≥ 0, s_fg ≥ 0, ρ_f ≥ ρ_g,
 *   and T_s(p_s(T)) = T (common practice: the two sides of the saturation line are one curve);
 * - (T, x) states below T_c: two-phase, and (p, h), (p, s), (h, s) give them back;
 * - (p, T) states within 1 mPa and 1 µK of the critical point, and within 1e-3: the (p, h), (p, s)
 *   and (h, s) flashes converge and reproduce their inputs through the forward equation to 1e-9;
 * - the phase label follows the state: a saturated or compressed liquid in region 3 is 'liquid', a
 *   vapour 'vapor' (from the side of the dome, not from a pressure comparison that rounding flips).
 */
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { P_CRITICAL, T_CRITICAL, T_LINEAR_SATURATION_ZONE } from '../../src/water/if97/constants.js';
import { SolverContext } from '../../src/water/if97/context.js';
import { stateFromHS } from '../../src/water/if97/hs.js';
import { stateFromPH } from '../../src/water/if97/ph.js';
import { stateFromPS } from '../../src/water/if97/ps.js';
import { stateFromPT } from '../../src/water/if97/pt.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { stateFromPX, stateFromTX } from '../../src/water/if97/quality.js';
import { region3 } from '../../src/water/if97/region3.js';
import { saturationPressure } from '../../src/water/if97/region4.js';
import { saturationAtP, saturationAtT, saturationLinePressure, saturationTemperatureOnLine } from '../../src/water/if97/saturation.js';
import { PHASE, WaterState } from '../../src/water/if97/water-state.js';
import { water } from '../../src/water/index.js';
import { Failures, Random, closeRel } from './helpers.js';

const TOL = 1e-9;
const ctx = new SolverContext();
const liquid = new WaterProperties();
const vapor = new WaterProperties();
const a = new WaterState();
const b = new WaterState();

/** Relative distances below the critical point: exactly 0, a run of ulps, then log-uniform 1e-16 … 1e-3. */
function distances(r: Random, n: number): number[] {
  const d = [0, 2 ** -53, 2 ** -52, 3 * 2 ** -52, 1e-15, 1e-12, 1e-11, 1e-10, 1e-9, 1e-8, 1e-7, 1e-6, 1e-5, 1e-4, 1e-3];
  while (d.length < n) d.push(r.logUniform(1e-16, 1e-3));
  return d;
}

const finiteAll = (w: WaterProperties, keys: readonly string[]): boolean => keys.every((k) => Number.isFinite((w as unknown as Record<string, number>)[k]));
const PROPS = ['T', 'p', 'rho', 'v', 'u', 'h', 's'] as const;
const show = (st: WaterState): string => `p = ${st.p} Pa, T = ${st.T} K, h = ${st.h}, s = ${st.s}, region ${st.region}, phase ${st.phase}, x = ${st.x}`;

describe('IF97 saturation up to the critical point', () => {
  it('by T, within 1e-3 of T_c and at T_c exactly (3000 temperatures): computed, h_fg ≥ 0, ρ_f ≥ ρ_g, T_s(p_s(T)) = T', () => {
    const r = new Random(647);
    const fail = new Failures();
    for (const d of distances(r, 3000)) {
      const T = T_CRITICAL * (1 - d);
      const st = saturationAtT(T, liquid, vapor, ctx);
      if (st !== Status.ok) {
        fail.add(`saturationAtT(${T}) (1 − ${d}): status ${st}`);
        continue;
      }
      if (!finiteAll(liquid, PROPS) || !finiteAll(vapor, PROPS)) fail.add(`saturationAtT(${T}): a non-finite property`);
      if (!(vapor.h - liquid.h >= 0)) fail.add(`saturationAtT(${T}): h_fg = ${vapor.h - liquid.h}`);
      if (!(vapor.s - liquid.s >= 0)) fail.add(`saturationAtT(${T}): s_fg = ${vapor.s - liquid.s}`);
      if (!(liquid.rho >= vapor.rho)) fail.add(`saturationAtT(${T}): ρ_f = ${liquid.rho} < ρ_g = ${vapor.rho}`);
      if (!(liquid.p <= P_CRITICAL) || liquid.p !== vapor.p) fail.add(`saturationAtT(${T}): p_f = ${liquid.p}, p_g = ${vapor.p}`);
      if (saturationAtP(liquid.p, liquid, vapor, ctx) !== Status.ok || !closeRel(liquid.T, T, TOL)) fail.add(`saturationAtP(p_s(${T}) = ${liquid.p}): T = ${liquid.T}`);
    }
    fail.expectNone('saturation by T');
  });

  it('by p, within 1e-3 of p_c and at p_c exactly (3000 pressures): computed, h_fg ≥ 0, ρ_f ≥ ρ_g', () => {
    const r = new Random(22064);
    const fail = new Failures();
    for (const d of distances(r, 3000)) {
      const p = P_CRITICAL * (1 - d);
      const st = saturationAtP(p, liquid, vapor, ctx);
      if (st !== Status.ok) {
        fail.add(`saturationAtP(${p}) (1 − ${d}): status ${st}`);
        continue;
      }
      if (!finiteAll(liquid, PROPS) || !finiteAll(vapor, PROPS)) fail.add(`saturationAtP(${p}): a non-finite property`);
      if (!(vapor.h - liquid.h >= 0)) fail.add(`saturationAtP(${p}): h_fg = ${vapor.h - liquid.h}`);
      if (!(liquid.rho >= vapor.rho)) fail.add(`saturationAtP(${p}): ρ_f = ${liquid.rho} < ρ_g = ${vapor.rho}`);
      if (!(liquid.T <= T_CRITICAL)) fail.add(`saturationAtP(${p}): T = ${liquid.T} above T_c`);
    }
    fail.expectNone('saturation by p');
  });

  it('every p below p_c and every T below T_c, to the last ulp (64 each): two distinct phases (h_fg > 0, ρ_f > ρ_g), p_s(T) strictly below p_c and falling with T', () => {
    const fail = new Failures();
    let pPrev = P_CRITICAL;
    for (let k = 1; k <= 64; k++) {
      const p = P_CRITICAL - k * 2 ** -28; // ulp(p_c) = 2^-28 Pa
      if (saturationAtP(p, liquid, vapor, ctx) !== Status.ok || !(vapor.h - liquid.h > 0) || !(liquid.rho > vapor.rho)) fail.add(`saturationAtP(p_c − ${k} ulp): h_fg = ${vapor.h - liquid.h}, ρ_f = ${liquid.rho}, ρ_g = ${vapor.rho}`);
      const T = T_CRITICAL - k * 2 ** -43; // ulp(T_c) = 2^-43 K
      if (saturationAtT(T, liquid, vapor, ctx) !== Status.ok || !(vapor.h - liquid.h > 0) || !(liquid.rho > vapor.rho)) fail.add(`saturationAtT(T_c − ${k} ulp): h_fg = ${vapor.h - liquid.h}`);
      if (!(liquid.p < pPrev)) fail.add(`saturationAtT(T_c − ${k} ulp): p_s = ${liquid.p}, not below ${pPrev}`);
      pPrev = liquid.p;
    }
    fail.expectNone('last ulps of the saturation line');
  });

  it('the saturation line is continuous where it turns into its tangent at T_c (1 µK below T_c: a step under 3e-7 Pa, 1.4e-14 relative)', () => {
    const edge = T_CRITICAL - T_LINEAR_SATURATION_ZONE;
    const slope = 268136.2; // Pa/K, dp_s/dT of Eq. 30 at T_c (its change over 2 µK: 0.015 Pa/K)
    for (let k = 1; k < 200; k++) {
      const inside = edge + k * 2 ** -43;
      const outside = edge - k * 2 ** -43;
      expect(Math.abs(saturationLinePressure(inside) - saturationLinePressure(outside) - slope * (inside - outside))).toBeLessThan(3e-7);
    }
    expect(saturationLinePressure(T_CRITICAL)).toBe(P_CRITICAL);
    expect(saturationTemperatureOnLine(P_CRITICAL)).toBe(T_CRITICAL);
  });

  it('the facade at T_c and p_c exactly: both phases meet, h_fg = 0 (not negative), σ = 0', () => {
    for (const sat of [water.saturation({ T: '647.096 K' }), water.saturation({ p: '22.064 MPa' })]) {
      expect(sat.hfg.si).toBeGreaterThanOrEqual(0);
      expect(sat.sfg.si).toBeGreaterThanOrEqual(0);
      expect(sat.liquid.rho.si).toBeGreaterThanOrEqual(sat.vapor.rho.si);
      expect(sat.hfg.si).toBeLessThan(1); // the phases coincide: J/kg, from an h of about 2.09 MJ/kg
    }
    expect(water.saturation({ T: '647.096 K' }).sigma?.si).toBe(0); // IAPWS R1-76(2014): σ = 0 at T_c
  });
});

describe('IF97 two-phase states just below the critical point', () => {
  /**
   * (T, x) and (p, x) states at relative distances `ds` below the critical point, flashed back by
   * (p, h), (p, s) and (h, s). Checked in the input variables (the flash's own forward equations
   * reproduce h, s and p to 1e-9) and by the side of the dome; x is checked against the lever rule at
   * the given p (for (h, s), whose tie lines converge at the critical point, x is not fixed well
   * enough by h and s to check).
   */
  function twoPhaseBack(ds: readonly number[], seed: number, fail: Failures): void {
    const r = new Random(seed);
    for (let i = 0; i < 2 * ds.length; i++) {
      const d = ds[i % ds.length]!;
      const byT = i < ds.length;
      const x = i === 0 ? 0.125 : r.next();
      const st = byT ? stateFromTX(T_CRITICAL * (1 - d), x, a, ctx) : stateFromPX(P_CRITICAL * (1 - d), x, a, ctx);
      if (st !== Status.ok) {
        fail.add(`${byT ? 'TX' : 'PX'}(1 − ${d}, x = ${x}): status ${st}`);
        continue;
      }
      if (a.phase !== PHASE.twoPhase || !finiteAll(a, [...PROPS, 'x'])) fail.add(`${show(a)}: phase ${a.phase} or a non-finite property`);
      if (saturationAtP(a.p, liquid, vapor, ctx) !== Status.ok) {
        fail.add(`saturationAtP(${a.p}) failed`);
        continue;
      }
      const hfg = vapor.h - liquid.h;
      const sfg = vapor.s - liquid.s;
      for (const [name, solve, lever] of [
        ['ph', () => stateFromPH(a.p, a.h, b, ctx), (a.h - liquid.h) / hfg],
        ['ps', () => stateFromPS(a.p, a.s, b, ctx), (a.s - liquid.s) / sfg],
        ['hs', () => stateFromHS(a.h, a.s, b, ctx), NaN],
      ] as const) {
        const s2 = solve();
        if (s2 !== Status.ok) {
          fail.add(`${name} of ${show(a)}: status ${s2}`);
          continue;
        }
        if (!closeRel(b.h, a.h, TOL) || !closeRel(b.s, a.s, TOL)) fail.add(`${name} of ${show(a)}: forward h = ${b.h}, s = ${b.s}`);
        if (name !== 'hs' && !closeRel(b.p, a.p, TOL)) fail.add(`${name} of ${show(a)}: p = ${b.p}`);
        // the lever rule fixes x to (1e-9·h)/h_fg: h_fg → 0 at the critical point
        const xTol = 1e-12 + (TOL * Math.abs(name === 'ps' ? a.s / sfg : a.h / hfg));
        const onEdge = lever < xTol || lever > 1 - xTol || name === 'hs';
        if (b.phase !== PHASE.twoPhase && !onEdge) fail.add(`${name} of ${show(a)}: single-phase (phase ${b.phase}, region ${b.region}) for x = ${lever}`);
        if (b.phase === PHASE.twoPhase && name !== 'hs' && !(Math.abs(b.x - lever) <= xTol)) fail.add(`${name} of ${show(a)}: x = ${b.x}, lever rule ${lever} (tolerance ${xTol})`);
      }
    }
  }

  it('(T, x) and (p, x) from 1e-13 to 1e-3 below the critical point (2000 states): two-phase; (p, h), (p, s), (h, s) give them back', () => {
    const fail = new Failures();
    twoPhaseBack(distances(new Random(3), 1000).filter((d) => d >= 1e-13), 3, fail);
    fail.expectNone('near-critical two-phase');
  });

  // issue 17 (fixed): within 1e-13 of T_c, p_s(T) rounded to p_c itself, T_s(p) rounded to T_c with
  // both phases at ρc, and the (p, h) and (p, s) flashes at p = p_c answered status 0 with a state
  // whose h or s was off by about 1.5e-5 (relative)
  it('(T, x) and (p, x) within 1e-13 of the critical point, to its last ulp: likewise', () => {
    const fail = new Failures();
    twoPhaseBack([2 ** -53, 2 ** -52, 3 * 2 ** -52, 1e-15, 3e-15, 1e-14, 3e-14], 33, fail);
    fail.expectNone('last ulps below the critical point');
  });

  it('T = T_c − 3 µK, x = 0.125 flashes back as two-phase (issue 17)', () => {
    expect(stateFromTX(T_CRITICAL - 3e-6, 0.125, a, ctx)).toBe(Status.ok);
    expect(stateFromPH(a.p, a.h, b, ctx)).toBe(Status.ok);
    expect(b.phase).toBe(PHASE.twoPhase);
    expect(Math.abs(b.x - 0.125)).toBeLessThan(1e-3);
  });
});

/** (p, T) in a box around the critical point, relative half-widths dp and dT (absolute when `absolute`). */
function criticalBox(r: Random, dp: number, dT: number, absolute: boolean): [number, number] {
  const p = absolute ? P_CRITICAL + r.uniform(-dp, dp) : P_CRITICAL * (1 + r.uniform(-dp, dp));
  const T = absolute ? T_CRITICAL + r.uniform(-dT, dT) : T_CRITICAL * (1 + r.uniform(-dT, dT));
  return [p, T];
}

/**
 * True when the phase of a single-phase (p, T) state is unambiguous: more than 1e-9 (relative) away
 * from the saturation line and from the critical isotherm and isobar that bound 'supercritical'.
 */
function labelIsClear(st: WaterState): boolean {
  if (Math.abs(st.T - T_CRITICAL) <= 1e-9 * T_CRITICAL || Math.abs(st.p - P_CRITICAL) <= 1e-9 * P_CRITICAL) return false;
  if (st.T >= T_CRITICAL) return true;
  const ps = saturationPressure(st.T);
  return Math.abs(st.p - ps) > 1e-9 * ps;
}

function flashBack(label: string, p: number, T: number, fail: Failures): void {
  const st = stateFromPT(p, T, a, ctx);
  if (st !== Status.ok) {
    fail.add(`${label}: stateFromPT(${p}, ${T}) status ${st}`);
    return;
  }
  if (!finiteAll(a, [...PROPS, 'cp', 'cv', 'w'])) fail.add(`${label}: stateFromPT(${p}, ${T}) has a non-finite property`);
  for (const [name, solve, keys] of [
    ['ph', () => stateFromPH(p, a.h, b, ctx), ['p', 'h']],
    ['ps', () => stateFromPS(p, a.s, b, ctx), ['p', 's']],
    ['hs', () => stateFromHS(a.h, a.s, b, ctx), ['h', 's']],
  ] as const) {
    const s2 = solve();
    if (s2 !== Status.ok) {
      fail.add(`${label}: ${name} of ${show(a)}: status ${s2}`);
      continue;
    }
    for (const k of keys) if (!closeRel(b[k], a[k], TOL)) fail.add(`${label}: ${name} of ${show(a)}: forward ${k} = ${b[k]} (given ${a[k]})`);
    // the answer is the state it came from: the same side of the dome, and p within 1e-6 (h and s
    // fix p loosely at the critical point, where (∂h/∂p)_s = v and (∂s/∂p)_h = −v/T barely separate)
    if (!closeRel(b.p, p, 1e-6)) fail.add(`${label}: ${name} of ${show(a)}: p = ${b.p}, started from ${p}`);
    if (b.phase !== a.phase && labelIsClear(a)) fail.add(`${label}: ${name} of ${show(a)}: phase ${b.phase} (${show(b)})`);
  }
}

describe('IF97 flashes at the critical point', () => {
  it('(p, T) within 1 mPa and 1 µK of the critical point (1000 states): (p, h), (p, s), (h, s) converge and reproduce their inputs to 1e-9', () => {
    const r = new Random(1);
    const fail = new Failures();
    flashBack('the critical point', P_CRITICAL, T_CRITICAL, fail);
    for (let i = 0; i < 1000; i++) {
      const [p, T] = criticalBox(r, 1e-3, 1e-6, true);
      flashBack('±1 mPa, ±1 µK', p, T, fail);
    }
    fail.expectNone('critical box');
  });

  it('(p, T) within 1e-3 (relative) of the critical point (1500 states): likewise', () => {
    const r = new Random(2);
    const fail = new Failures();
    for (let i = 0; i < 1500; i++) {
      const [p, T] = criticalBox(r, 1e-3, i % 2 === 0 ? 1e-3 : 1e-6, false);
      flashBack('±1e-3', p, T, fail);
    }
    fail.expectNone('critical neighbourhood');
  });

  it("the facade's own critical state flashes back by (p, h), (p, s) and (h, s)", () => {
    const c = water.state({ p: '22.064 MPa', T: '647.096 K' });
    expect(c.phase).toBe('supercritical');
    const ph = water.state({ p: c.p, h: c.h });
    const ps = water.state({ p: c.p, s: c.s });
    const hs = water.state({ h: c.h, s: c.s });
    for (const st of [ph, ps, hs]) {
      expect(closeRel(st.h.si, c.h.si, TOL)).toBe(true);
      expect(closeRel(st.s.si, c.s.si, TOL)).toBe(true);
      expect(closeRel(st.p.si, c.p.si, 1e-6)).toBe(true);
    }
  });
});

describe('IF97 phase labels in region 3 follow the state', () => {
  function saturatedLabels(pressures: readonly number[], fail: Failures): void {
    for (const p of pressures) {
      if (saturationAtP(p, liquid, vapor, ctx) !== Status.ok) {
        fail.add(`saturationAtP(${p}) failed`);
        continue;
      }
      const f = { h: liquid.h, s: liquid.s };
      const g = { h: vapor.h, s: vapor.s };
      for (const [side, props, wrong, edge] of [['liquid', f, PHASE.vapor, 0], ['vapour', g, PHASE.liquid, 1]] as const) {
        for (const [name, solve] of [
          ['ph', () => stateFromPH(p, props.h, b, ctx)],
          ['ps', () => stateFromPS(p, props.s, b, ctx)],
        ] as const) {
          if (solve() !== Status.ok) {
            fail.add(`${name} of saturated ${side} at ${p} Pa: failed`);
            continue;
          }
          if (b.phase === wrong) fail.add(`${name} of saturated ${side} at ${p} Pa: labelled ${side === 'liquid' ? 'vapor' : 'liquid'} (${show(b)})`);
          if (b.phase === PHASE.twoPhase && !(Math.abs(b.x - edge) < 1e-6)) fail.add(`${name} of saturated ${side} at ${p} Pa: x = ${b.x}`);
        }
      }
    }
  }

  it('saturated liquid and vapour from (p, h) and (p, s) flashes, 16.6 MPa to p_c(1 − 1e-11) (2000 pressures): never the other phase', () => {
    const r = new Random(5);
    const fail = new Failures();
    saturatedLabels(Array.from({ length: 2000 }, (_, i) => (i % 2 === 0 ? r.uniform(16.6e6, P_CRITICAL * (1 - 1e-11)) : P_CRITICAL * (1 - r.logUniform(1e-11, 1e-3)))), fail);
    fail.expectNone('saturated phase labels');
  });

  // issue 17 (fixed): within about 3e-12 of p_c (66 µPa) the saturated liquid's (p, h_f) and
  // (p, s_f) flashes land about 1.8e-10 K above T_s, which is above T_c there, and were labelled
  // 'vapor' by a pressure comparison
  it('likewise within 1e-11 of p_c (500 pressures): saturated liquid never labelled vapor', () => {
    const r = new Random(55);
    const fail = new Failures();
    saturatedLabels(Array.from({ length: 500 }, () => P_CRITICAL * (1 - r.logUniform(1e-16, 1e-11))), fail);
    fail.expectNone('saturated phase labels next to p_c');
  });

  // issue 17 (fixed): status 0 with forward h = 2087582.11 J/kg (the search in T stopped at a jump of h(T))
  it('(p, h) at p = p_c exactly, h = 2087546.9891888113 J/kg: the answer reproduces h', () => {
    expect(stateFromPH(P_CRITICAL, 2087546.9891888113, b, ctx)).toBe(Status.ok);
    expect(closeRel(b.h, 2087546.9891888113, TOL), `forward h = ${b.h} at T = ${b.T}`).toBe(true);
    expect(closeRel(region3(b.rho, b.T, liquid).p, P_CRITICAL, TOL), `forward p = ${liquid.p}`).toBe(true);
  });

  // issue 17 (fixed): status 0 with forward s = 4411.96613 J/(kg·K)
  it('(p, s) at p = p_c exactly, s = 4412.022809284432 J/(kg·K): the answer reproduces s', () => {
    expect(stateFromPS(P_CRITICAL, 4412.022809284432, b, ctx)).toBe(Status.ok);
    expect(closeRel(b.s, 4412.022809284432, TOL), `forward s = ${b.s} at T = ${b.T}`).toBe(true);
    expect(closeRel(region3(b.rho, b.T, liquid).p, P_CRITICAL, TOL), `forward p = ${liquid.p}`).toBe(true);
  });

  it('compressed liquid and superheated vapour in region 3 (p, T) within 1e-6 of the saturation line (2000 states): liquid and vapor', () => {
    const r = new Random(6);
    const fail = new Failures();
    for (let i = 0; i < 2000; i++) {
      const T = r.uniform(623.15, T_CRITICAL - 1e-6);
      const ps = saturationPressure(T);
      const liquidSide = i % 2 === 0;
      const p = ps * (1 + (liquidSide ? 1 : -1) * r.logUniform(1e-9, 1e-6));
      if (stateFromPT(p, T, a, ctx) !== Status.ok) {
        fail.add(`stateFromPT(${p}, ${T}) failed`);
        continue;
      }
      if (a.phase !== (liquidSide ? PHASE.liquid : PHASE.vapor)) fail.add(`stateFromPT(${p}, ${T}) (${liquidSide ? 'above' : 'below'} p_s = ${ps}): ${show(a)}`);
      if (liquidSide && a.region === 3 && !(a.rho >= 322)) fail.add(`stateFromPT(${p}, ${T}): liquid with ρ = ${a.rho}`);
    }
    fail.expectNone('region 3 single-phase labels');
  });

  it("the facade's phase at 21.89 MPa for the saturated liquid's h is not 'vapor' (issue 17)", () => {
    const sat = water.saturation({ p: '21.89 MPa' });
    expect(water.state({ p: '21.89 MPa', h: sat.liquid.h }).phase).not.toBe('vapor');
    expect(water.state({ p: '21.89 MPa', h: sat.vapor.h }).phase).not.toBe('liquid');
  });
});
