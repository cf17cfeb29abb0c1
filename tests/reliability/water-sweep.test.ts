/**
 * Random-state sweep of water by IAPWS-IF97 (IAPWS R7-97(2012)), on the SI core the facade and the
 * batch call: (p, T) states over the whole range of the release (Section 3: 273.15 K to 1073.15 K
 * at up to 100 MPa, to 2273.15 K at up to 50 MPa), then round trips through the other input pairs.
 * Every state must be computed (status 0), carry no NaN, and each flash must reproduce its own
 * inputs through the forward equations to 1e-9 (the bound; relative, with an absolute floor
 * for h and s near their zero at the triple point), and the state it started from.
 *
 * States come from a seeded generator (tests/reliability/helpers.ts), so a failure reproduces.
 */
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { P_CRITICAL, P_MAX, P_MAX_5, P_SEARCH_MIN, T_CRITICAL, T_MAX_2, T_MAX_5, T_MIN } from '../../src/water/if97/constants.js';
import { SolverContext } from '../../src/water/if97/context.js';
import { stateFromHS } from '../../src/water/if97/hs.js';
import { stateFromPH } from '../../src/water/if97/ph.js';
import { stateFromPS } from '../../src/water/if97/ps.js';
import { stateFromPT } from '../../src/water/if97/pt.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { stateFromPX, stateFromTX } from '../../src/water/if97/quality.js';
import { saturationPressure } from '../../src/water/if97/region4.js';
import { P_SAT_MIN, saturationAtP, saturationAtT } from '../../src/water/if97/saturation.js';
import { stateFromTV } from '../../src/water/if97/tv.js';
import { PHASE, WaterState } from '../../src/water/if97/water-state.js';
import { water } from '../../src/water/index.js';
import { Failures, Random, closeRel } from './helpers.js';

const FIELDS = ['T', 'p', 'rho', 'v', 'u', 'h', 's', 'cp', 'cv', 'w'] as const;
const TWO_PHASE_FIELDS = ['T', 'p', 'rho', 'v', 'u', 'h', 's', 'x'] as const;
/** The round-trip bound of issue 17, relative in the input variables. */
const TOL = 1e-9;
/** Absolute floors (J/kg, J/(kg·K)): h and s pass through 0 near the triple point. */
const H_FLOOR = 1e4;
const S_FLOOR = 10;

/** Failures collected per check, reported together with the first few states. */
function finite(st: WaterProperties, fields: readonly string[]): string | undefined {
  for (const f of fields) if (!Number.isFinite((st as unknown as Record<string, number>)[f])) return `${f} = ${(st as unknown as Record<string, number>)[f]}`;
  return undefined;
}

const show = (st: WaterState): string => `p = ${st.p} Pa, T = ${st.T} K, h = ${st.h}, s = ${st.s}, region ${st.region}, phase ${st.phase}, x = ${st.x}`;

/** The phase a single-phase (p, T) state must have, or -1 when within 1e-9 of the saturation line (either side is right). */
function expectedPhase(p: number, T: number): number {
  if (T >= T_CRITICAL) return p >= P_CRITICAL ? PHASE.supercritical : PHASE.vapor;
  if (p >= P_CRITICAL) return PHASE.liquid;
  const ps = saturationPressure(T);
  if (Math.abs(p - ps) <= 1e-9 * ps) return -1;
  return p > ps ? PHASE.liquid : PHASE.vapor;
}

/** A random (p, T) in IF97's range: log-uniform p, uniform T; a fifth of them in region 5. */
function randomPT(r: Random): [number, number] {
  if (r.next() < 0.2) return [r.logUniform(P_SEARCH_MIN * 10, P_MAX_5), r.uniform(T_MAX_2 + 1e-6, T_MAX_5)];
  return [r.logUniform(P_SEARCH_MIN * 10, P_MAX), r.uniform(T_MIN, T_MAX_2)];
}

describe('IF97 random sweep over the whole range (seeded)', () => {
  const N = 20_000;
  const ctx = new SolverContext();
  const a = new WaterState();
  const b = new WaterState();

  it(`${N} (p, T) states: computed, finite, phase consistent with p_s(T); (p, h) and (p, s) flashes return them`, () => {
    const r = new Random(97);
    const fail = new Failures();
    let checked = 0;
    for (let i = 0; i < N; i++) {
      const [p, T] = randomPT(r);
      const st = stateFromPT(p, T, a, ctx);
      if (st !== Status.ok) {
        fail.add(`stateFromPT(${p}, ${T}) status ${st}`);
        continue;
      }
      const bad = finite(a, FIELDS);
      if (bad !== undefined) fail.add(`stateFromPT(${p}, ${T}): ${bad}`);
      const want = expectedPhase(p, T);
      if (want >= 0 && a.phase !== want) fail.add(`stateFromPT(${p}, ${T}): phase ${a.phase}, expected ${want} (region ${a.region})`);
      for (const [name, flash, key] of [['ph', stateFromPH, 'h'], ['ps', stateFromPS, 's']] as const) {
        const value = a[key];
        const s2 = flash(p, value, b, ctx);
        checked++;
        if (s2 !== Status.ok) {
          fail.add(`${name}(${p}, ${value}) of ${show(a)}: status ${s2}`);
          continue;
        }
        const floor = key === 'h' ? H_FLOOR : S_FLOOR;
        if (!closeRel(b[key], value, TOL, floor) || !closeRel(b.p, p, TOL)) fail.add(`${name}(${p}, ${value}): forward ${key} = ${b[key]}, p = ${b.p}`);
        // the state itself: T to 1e-9 relative, except where cp is huge (near the critical point), where h fixes T less tightly
        if (!closeRel(b.T, T, 1e-8)) fail.add(`${name}(${p}, ${value}): T = ${b.T}, started from ${T}`);
        if (finite(b, FIELDS) !== undefined && b.phase !== PHASE.twoPhase) fail.add(`${name}(${p}, ${value}): ${finite(b, FIELDS)}`);
      }
    }
    fail.expectNone('(p, T) sweep');
    expect(checked).toBe(2 * N);
  });

  it(`${N / 2} (h, s) flashes of random (p, T) states return the state`, () => {
    const r = new Random(9797);
    const fail = new Failures();
    for (let i = 0; i < N / 2; i++) {
      const [p, T] = randomPT(r);
      if (stateFromPT(p, T, a, ctx) !== Status.ok) continue;
      const st = stateFromHS(a.h, a.s, b, ctx);
      if (st !== Status.ok) {
        fail.add(`stateFromHS(${a.h}, ${a.s}) of ${show(a)}: status ${st}`);
        continue;
      }
      if (!closeRel(b.h, a.h, TOL, H_FLOOR) || !closeRel(b.s, a.s, TOL, S_FLOOR)) fail.add(`hs(${a.h}, ${a.s}): forward h = ${b.h}, s = ${b.s}`);
      if (!closeRel(b.p, p, 1e-6)) fail.add(`hs(${a.h}, ${a.s}): p = ${b.p}, started from ${p} (${show(a)})`);
    }
    fail.expectNone('(h, s) sweep');
  });

  it(`${N / 2} (T, v) states return the (p, T) state`, () => {
    const r = new Random(979797);
    const fail = new Failures();
    for (let i = 0; i < N / 2; i++) {
      const [p, T] = randomPT(r);
      if (stateFromPT(p, T, a, ctx) !== Status.ok) continue;
      const st = stateFromTV(T, a.v, b, ctx);
      if (st !== Status.ok) {
        fail.add(`stateFromTV(${T}, ${a.v}) of ${show(a)}: status ${st}`);
        continue;
      }
      if (!closeRel(b.v, a.v, TOL) || !closeRel(b.T, T, TOL)) fail.add(`tv(${T}, ${a.v}): forward v = ${b.v}, T = ${b.T}`);
      if (!closeRel(b.p, p, 1e-7)) fail.add(`tv(${T}, ${a.v}): p = ${b.p}, started from ${p} (${show(a)})`);
    }
    fail.expectNone('(T, v) sweep');
  });

  it(`${N / 2} two-phase states by (T, x) and (p, x): computed, finite; (p, h), (p, s) and (h, s) give x back`, () => {
    const r = new Random(4);
    const fail = new Failures();
    for (let i = 0; i < N / 2; i++) {
      const byT = i % 2 === 0;
      const x = r.next();
      const st = byT ? stateFromTX(r.uniform(T_MIN, T_CRITICAL), x, a, ctx) : stateFromPX(r.logUniform(P_SAT_MIN, P_CRITICAL), x, a, ctx);
      if (st !== Status.ok) {
        fail.add(`${byT ? 'TX' : 'PX'} x = ${x}: status ${st}`);
        continue;
      }
      const bad = finite(a, TWO_PHASE_FIELDS);
      if (bad !== undefined) fail.add(`${show(a)}: ${bad}`);
      if (a.phase !== PHASE.twoPhase) fail.add(`${show(a)}: phase ${a.phase}, expected two-phase`);
      for (const [name, solve] of [
        ['ph', () => stateFromPH(a.p, a.h, b, ctx)],
        ['ps', () => stateFromPS(a.p, a.s, b, ctx)],
        ['hs', () => stateFromHS(a.h, a.s, b, ctx)],
      ] as const) {
        // (h, s) in IF97's backward equations covers the dome only up to s at 623.15 K ... and the polished flash beyond: it must answer everywhere
        const s2 = solve();
        if (s2 !== Status.ok) {
          fail.add(`${name} of ${show(a)}: status ${s2}`);
          continue;
        }
        if (!(Math.abs(b.x - x) <= 1e-9) && !(b.phase !== PHASE.twoPhase && (x < 1e-9 || x > 1 - 1e-9))) fail.add(`${name} of ${show(a)}: x = ${b.x}, phase ${b.phase}`);
        if (!closeRel(b.h, a.h, TOL, H_FLOOR) || !closeRel(b.s, a.s, TOL, S_FLOOR)) fail.add(`${name} of ${show(a)}: h = ${b.h}, s = ${b.s}`);
      }
    }
    fail.expectNone('two-phase sweep');
  });

  it('1000 facade states by random pairs agree with the SI core bit for bit and carry no NaN', () => {
    const r = new Random(1000);
    const fail = new Failures();
    for (let i = 0; i < 1000; i++) {
      const [p, T] = randomPT(r);
      if (stateFromPT(p, T, a) !== Status.ok) continue;
      const s = water.state({ p: `${p} Pa`, T: `${T} K` } as never);
      if (s.h.si !== a.h || s.rho.si !== a.rho) fail.add(`water.state(p ${p}, T ${T}): h ${s.h.si} vs ${a.h}`);
      const back = water.state({ p: `${p} Pa`, h: `${a.h} J/kg` } as never);
      if (!closeRel(back.T.si, T, 1e-8)) fail.add(`water.state(p, h) T = ${back.T.si} vs ${T}`);
      for (const [k, v] of Object.entries(back)) if (typeof v === 'number' && Number.isNaN(v)) fail.add(`water.state(p, h).${k} is NaN`);
    }
    fail.expectNone('facade sweep');
  });
});
