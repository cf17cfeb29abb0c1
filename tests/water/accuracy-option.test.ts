/**
 * `water.state(pair, { accuracy })` (issue 16, item 2):
 * - the default (`'fast'`, or no options) gives the fast kernels' values bit for bit, as before;
 * - `'compensated'` keeps the solve (same T, p, ρ, x) and gives the compensated kernels' values
 *   (src/water/if97/compensated.ts) at the solved state, so (p, T) states are within 16 ulp of the
 *   60-digit evaluation of the IAPWS R7-97(2012) equations stored in
 *   tests/water/data/if97-high-precision.json (written by scripts/ulp-report.ts, basis "computed");
 * - a bad option is refused with an InvalidInputError naming the valid values.
 */
import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import sample from './data/if97-high-precision.json';
import { ulps, type Property } from '../../scripts/ulp-report.js';
import { InvalidInputError, OutOfRangeError } from '../../src/errors.js';
import { Quantity, quantity } from '../../src/units/index.js';
import { waterBatch } from '../../src/water/batch.js';
import { water, type WaterStateResult } from '../../src/water/state.js';
import { region1Compensated, region2Compensated, region3Compensated, region5Compensated } from '../../src/water/if97/compensated.js';
import { P_SAT_13, saturationAtP, saturationAtT, stateFromHS, stateFromPH, stateFromPS, stateFromPT, stateFromPX, stateFromTV, stateFromTX, WaterState } from '../../src/water/if97/index.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { region1 } from '../../src/water/if97/region1.js';
import { region2 } from '../../src/water/if97/region2.js';
import { region3 } from '../../src/water/if97/region3.js';
import { region5 } from '../../src/water/if97/region5.js';

const D = Decimal.clone({ precision: 60 });
const GOAL = 16;
const C = { accuracy: 'compensated' } as const;
const K = (T: number) => quantity(T, 'K');
const Pa = (p: number) => quantity(p, 'Pa');
const GIBBS: readonly Property[] = ['v', 'h', 'u', 's', 'cp', 'cv', 'w'];
const ALL: readonly Property[] = ['p', 'v', 'h', 'u', 's', 'cp', 'cv', 'w'];

/** The (T, ρ) state, or undefined where water.state refuses it (p above 100 MPa at that (ρ, T)). */
function atDensity(rho: number, T: number, options?: { readonly accuracy: 'compensated' }): WaterStateResult | undefined {
  try {
    return water.state({ T: K(T), rho: quantity(rho, 'kg/m³') }, options);
  } catch (e) {
    if (e instanceof OutOfRangeError) return undefined;
    throw e;
  }
}

type Kernel = (x: number, y: number, out: WaterProperties) => WaterProperties;
const FAST: Record<number, Kernel> = { 1: region1, 2: region2, 3: region3, 5: region5 };
const COMPENSATED: Record<number, Kernel> = { 1: region1Compensated, 2: region2Compensated, 3: region3Compensated, 5: region5Compensated };

/** The SI values of a result, NaN where undefined (two-phase cp, cv, w). */
function si(r: WaterStateResult): Record<Property | 'T' | 'rho', number> {
  return { T: r.T.si, p: r.p.si, rho: r.rho.si, v: r.v.si, h: r.h.si, u: r.u.si, s: r.s.si, cp: r.cp?.si ?? NaN, cv: r.cv?.si ?? NaN, w: r.w?.si ?? NaN };
}

/** Every property of `r` equals the kernel's output `k` bit for bit (p too unless `skipP`). */
function expectSame(r: WaterStateResult, k: WaterProperties, label: string): void {
  const v = si(r);
  for (const prop of ALL) expect(Object.is(v[prop], k[prop]), `${label}: ${prop} ${v[prop]} vs ${k[prop]}`).toBe(true);
  expect(v.T, `${label}: T`).toBe(k.T);
  expect(v.rho, `${label}: rho`).toBe(k.rho);
}

const gibbsStates = sample.states.filter((s) => s.region !== 3);
const region3States = sample.states.filter((s) => s.region === 3);

describe("the default ('fast') is the fast kernels bit for bit", () => {
  it('(p, T) at the stored states of regions 1, 2, 5: no options, and { accuracy: "fast" }', () => {
    const k = new WaterProperties();
    expect(gibbsStates.length).toBe(120);
    for (const st of gibbsStates) {
      FAST[st.region]!(st.x, st.y, k);
      const plain = water.state({ p: Pa(st.x), T: K(st.y) });
      expect(plain.region).toBe(st.region);
      expectSame(plain, k, `region ${st.region} (${st.x} Pa, ${st.y} K)`);
      expectSame(water.state({ p: Pa(st.x), T: K(st.y) }, { accuracy: 'fast' }), k, `fast, region ${st.region}`);
      expectSame(water.state({ p: Pa(st.x), T: K(st.y) }, {}), k, `{}, region ${st.region}`);
    }
  });

  it('(T, ρ) at the stored region 3 states: region 3 at (ρ, T)', () => {
    const k = new WaterProperties();
    let n = 0;
    for (const st of region3States) {
      const r = atDensity(st.x, st.y);
      if (r === undefined || r.region !== 3 || r.rho.si !== st.x) continue; // p > 100 MPa, inside the dome, or 1/(1/ρ) ≠ ρ
      n++;
      expectSame(r, region3(st.x, st.y, k), `region 3 (${st.x} kg/m³, ${st.y} K)`);
    }
    // the stored states cover the (ρ, T) rectangle of scripts/ulp-report.ts: of the 40, 15 lie above
    // 100 MPa and 11 on the region 2 side of the B23 line, one has 1/(1/ρ) ≠ ρ; 13 remain
    expect(n).toBeGreaterThanOrEqual(12);
  });

  it('every pair gives the SI core solver output bit for bit (regions 1, 2, 3, 5 and two-phase)', () => {
    const core = new WaterState();
    const check = (r: WaterStateResult, status: number, label: string) => {
      expect(status, label).toBe(0);
      expectSame(r, core, label);
      expect(r.region, label).toBe(core.region);
      expect(Object.is(r.x ?? NaN, core.x), label).toBe(true);
    };
    for (const [p, T] of [[3e6, 300], [80e6, 500], [3500, 700], [30e6, 700], [25e6, 650], [20e6, 640], [0.5e6, 1500], [101325, 450]] as const) {
      check(water.state({ p: Pa(p), T: K(T) }), stateFromPT(p, T, core), `(p, T) ${p}, ${T}`);
      const h = core.h;
      const s = core.s;
      const v = core.v;
      check(water.state({ p: Pa(p), h: quantity(h, 'J/kg') }), stateFromPH(p, h, core), `(p, h) ${p}, ${T}`);
      check(water.state({ p: Pa(p), s: Quantity.fromSI(s, 'specificEntropy') }), stateFromPS(p, s, core), `(p, s) ${p}, ${T}`);
      check(water.state({ h: quantity(h, 'J/kg'), s: Quantity.fromSI(s, 'specificEntropy') }), stateFromHS(h, s, core), `(h, s) ${p}, ${T}`);
      check(water.state({ T: K(T), v: quantity(v, 'm³/kg') }), stateFromTV(T, v, core), `(T, v) ${p}, ${T}`);
    }
    for (const [p, T, x] of [[1e6, 400, 0.3], [20e6, 640, 0.6]] as const) {
      check(water.state({ p: Pa(p), x }), stateFromPX(p, x, core), `(p, x) ${p}`);
      check(water.state({ T: K(T), x }), stateFromTX(T, x, core), `(T, x) ${T}`);
      check(water.state({ p: Pa(p), h: quantity(core.h, 'J/kg') }), stateFromPH(p, core.h, core), `(p, h) two-phase ${T}`);
    }
  });
});

describe("{ accuracy: 'compensated' }: (p, T) states within 16 ulp of the 60-digit values (tests/water/data/if97-high-precision.json)", () => {
  it.each([1, 2, 5])('region %d: every stored state, (p, T) pair, all properties', (id) => {
    const states = gibbsStates.filter((s) => s.region === id);
    expect(states.length).toBe(40);
    const k = new WaterProperties();
    for (const st of states) {
      const r = water.state({ p: Pa(st.x), T: K(st.y) }, C);
      expect(r.region).toBe(id);
      expectSame(r, COMPENSATED[id]!(st.x, st.y, k), `region ${id} (${st.x} Pa, ${st.y} K)`);
      const v = si(r);
      for (const prop of GIBBS) expect(ulps(v[prop], new D(st.values[prop as keyof typeof st.values]!)), `region ${id} ${prop} at (${st.x} Pa, ${st.y} K)`).toBeLessThanOrEqual(GOAL);
    }
  });

  it('region 3: the stored (ρ, T) states by the (T, ρ) pair (the stored values are at (ρ, T)), p included', () => {
    let n = 0;
    for (const st of region3States) {
      const r = atDensity(st.x, st.y, C);
      if (r === undefined || r.region !== 3 || r.rho.si !== st.x) continue; // as in the default test above
      n++;
      const v = si(r);
      for (const prop of ALL) expect(ulps(v[prop], new D(st.values[prop as keyof typeof st.values]!)), `region 3 ${prop} at (${st.x} kg/m³, ${st.y} K)`).toBeLessThanOrEqual(GOAL);
    }
    expect(n).toBeGreaterThanOrEqual(12);
  });

  it('region 3 by (p, T): the compensated kernel at the solved density, p as given', () => {
    const k = new WaterProperties();
    for (const [p, T] of [[25e6, 650], [20e6, 640], [50e6, 680], [100e6, 700], [23e6, 647.5]] as const) {
      const fast = water.state({ p: Pa(p), T: K(T) });
      const r = water.state({ p: Pa(p), T: K(T) }, C);
      expect(r.region).toBe(3);
      expect(r.rho.si).toBe(fast.rho.si);
      region3Compensated(fast.rho.si, T, k);
      k.p = p;
      expectSame(r, k, `region 3 (${p} Pa, ${T} K)`);
    }
  });
});

/** The compensated mixture at (p, T) and quality x, from compensated saturated phases (by p or by T as the solver found them). */
function compensatedMixture(p: number, T: number, x: number, byT: boolean): WaterProperties {
  const l = new WaterProperties();
  const g = new WaterProperties();
  if (byT ? T <= 623.15 : p <= P_SAT_13 || T <= 623.15) {
    region1Compensated(p, T, l);
    region2Compensated(p, T, g);
  } else {
    expect(byT ? saturationAtT(T, l, g) : saturationAtP(p, l, g)).toBe(0);
    region3Compensated(l.rho, T, l);
    region3Compensated(g.rho, T, g);
  }
  const m = new WaterProperties();
  m.T = T;
  m.p = p;
  m.v = l.v + x * (g.v - l.v);
  m.rho = 1 / m.v;
  m.u = l.u + x * (g.u - l.u);
  m.h = l.h + x * (g.h - l.h);
  m.s = l.s + x * (g.s - l.s);
  m.cp = NaN;
  m.cv = NaN;
  m.w = NaN;
  return m;
}

/** The compensated flash result equals the compensated kernel at the fast flash's solved state. */
function expectCompensatedAtSolved(pair: Parameters<typeof water.state>[0], label: string, byT = false, pGiven = true): void {
  const fast = water.state(pair);
  const r = water.state(pair, C);
  expect(r.region, label).toBe(fast.region);
  expect(r.phase, label).toBe(fast.phase);
  expect(r.T.si, `${label}: same T`).toBe(fast.T.si);
  expect(Object.is(r.x, fast.x), `${label}: same x`).toBe(true);
  const T = fast.T.si;
  const p = fast.p.si;
  if (fast.region === 4) {
    expect(r.p.si).toBe(p);
    expectSame(r, compensatedMixture(p, T, fast.x!, byT), `${label} (two-phase)`);
    return;
  }
  const k = new WaterProperties();
  if (fast.region === 3) {
    expect(r.rho.si, `${label}: same ρ`).toBe(fast.rho.si);
    region3Compensated(fast.rho.si, T, k);
    if (pGiven) k.p = p;
  } else {
    expect(r.p.si, `${label}: same p`).toBe(p);
    COMPENSATED[fast.region]!(p, T, k);
  }
  expectSame(r, k, label);
}

describe("{ accuracy: 'compensated' } on flashes: the same solve, the compensated kernel at the solved state", () => {
  // regions 1, 2, 3 (both sides of the dome and supercritical), 5, and two-phase below and above 623.15 K
  const states: [number, number][] = [[3e6, 300], [80e6, 500], [3500, 700], [30e6, 700], [25e6, 650], [20e6, 640], [17e6, 630], [21e6, 642], [0.5e6, 1500], [30e6, 1500], [101325, 450], [16e6, 620]];
  it.each(states)('(p, h) and (p, s) at the (p, T) state p = %d Pa, T = %d K', (p, T) => {
    const ref = water.state({ p: Pa(p), T: K(T) });
    expectCompensatedAtSolved({ p: Pa(p), h: ref.h }, `(p, h) ${p} Pa ${T} K`);
    expectCompensatedAtSolved({ p: Pa(p), s: ref.s }, `(p, s) ${p} Pa ${T} K`);
  });

  it.each([[1e6, 0.3], [101325, 0.9], [10e6, 0.5], [18e6, 0.4], [21.5e6, 0.7], [22.0639e6, 0.5]])('two-phase (p, h), (p, s), (p, x) at p = %d Pa, x = %d', (p, x) => {
    const mix = water.state({ p: Pa(p), x });
    expectCompensatedAtSolved({ p: Pa(p), x }, `(p, x) ${p}`);
    expectCompensatedAtSolved({ p: Pa(p), h: mix.h }, `(p, h) two-phase ${p}`);
    expectCompensatedAtSolved({ p: Pa(p), s: mix.s }, `(p, s) two-phase ${p}`);
  });

  it.each([[300, 0.5], [500, 0.2], [623.15, 0.5], [623.1500000000001, 0.5], [640, 0.3], [647.09, 0.5]])('two-phase (T, x), (T, v) at T = %d K, x = %d', (T, x) => {
    expectCompensatedAtSolved({ T: K(T), x }, `(T, x) ${T}`, true, false);
    const v = water.state({ T: K(T), x }).v;
    expectCompensatedAtSolved({ T: K(T), v }, `(T, v) ${T}`, true, false);
  });

  it('(h, s) and (T, v) single-phase: region 3 takes the compensated p₃(ρ, T), the others keep the solved p', () => {
    for (const [p, T] of [[3e6, 300], [25e6, 650], [20e6, 640], [3500, 700], [30e6, 1500], [4e6, 600]] as const) {
      const ref = water.state({ p: Pa(p), T: K(T) });
      expectCompensatedAtSolved({ h: ref.h, s: ref.s }, `(h, s) ${p} ${T}`, false, false);
      expectCompensatedAtSolved({ T: K(T), v: ref.v }, `(T, v) ${p} ${T}`, true, false);
    }
    // two-phase (h, s), below and above 623.15 K
    for (const [p, x] of [[1e6, 0.5], [19e6, 0.5]] as const) {
      const mix = water.state({ p: Pa(p), x });
      expectCompensatedAtSolved({ h: mix.h, s: mix.s }, `(h, s) two-phase ${p}`);
    }
  });

  it('random (p, h) flashes over IF97 (fast-check): the compensated kernel at the solved (p, T)', () => {
    fc.assert(
      fc.property(fc.double({ min: Math.log(1e3), max: Math.log(100e6), noNaN: true }), fc.double({ min: 273.15, max: 2273.15, noNaN: true }), (lnp, T) => {
        const p = Math.exp(lnp);
        if (T > 1073.15 && p > 50e6) return;
        const ref = water.state({ p: Pa(p), T: K(T) });
        expectCompensatedAtSolved({ p: Pa(p), h: ref.h }, `(p, h) at ${p} Pa, ${T} K`);
        expectCompensatedAtSolved({ p: Pa(p), s: ref.s }, `(p, s) at ${p} Pa, ${T} K`);
      }),
      { numRuns: 150, seed: 1612 },
    );
  });
});

describe('the accuracy option is checked', () => {
  const pair = { p: '3 MPa', T: '300 K' } as const;
  it('an unknown accuracy is an InvalidInputError naming the valid values', () => {
    expect(() => water.state(pair, { accuracy: 'exact' } as never)).toThrow(InvalidInputError);
    expect(() => water.state(pair, { accuracy: 'exact' } as never)).toThrow('options.accuracy must be one of "fast", "compensated"; got "exact"');
    expect(() => water.state(pair, { accuracy: 1 } as never)).toThrow('options.accuracy must be one of "fast", "compensated"; got 1');
  });
  it('an unknown option or options that are not an object are refused', () => {
    expect(() => water.state(pair, { accurcy: 'compensated' } as never)).toThrow('unknown option "accurcy"; options takes "accuracy"');
    expect(() => water.state(pair, 'compensated' as never)).toThrow(InvalidInputError);
  });
  it('compensated results differ from the fast ones in the last digits (the option is not ignored)', () => {
    let differ = 0;
    for (const st of sample.states.filter((s) => s.region !== 3)) {
      const a = si(water.state({ p: Pa(st.x), T: K(st.y) }));
      const b = si(water.state({ p: Pa(st.x), T: K(st.y) }, C));
      for (const prop of GIBBS) if (a[prop] !== b[prop]) differ++;
    }
    expect(differ).toBeGreaterThan(100);
  });
});

describe("waterBatch(inputs, props, out, { accuracy: 'compensated' })", () => {
  const props = ['T', 'p', 'v', 'rho', 'u', 'h', 's', 'cp', 'cv', 'w', 'x'] as const;
  // regions 1, 2, 3, 5, two-phase below and above 623.15 K, and a bad element
  const pts: [number, number][] = [[3e6, 300], [80e6, 500], [3500, 700], [25e6, 650], [20e6, 640], [30e6, 1500], [101325, 450]];
  const p = Float64Array.from(pts, ([q]) => q);
  const T = Float64Array.from(pts, ([, t]) => t);

  it('(p, T), (p, h), (p, s): every element equals water.state with the option, bit for bit; the default batch is unchanged', () => {
    const fastRef = waterBatch({ p, T }, props);
    const h = fastRef.h;
    const mixP = Float64Array.of(...p, 1e6, 19e6, NaN);
    const mixH = Float64Array.of(...h, water.state({ p: Pa(1e6), x: 0.4 }).h.si, water.state({ p: Pa(19e6), x: 0.6 }).h.si, 1e6);
    const s = Float64Array.of(...fastRef.s, water.state({ p: Pa(1e6), x: 0.4 }).s.si, water.state({ p: Pa(19e6), x: 0.6 }).s.si, 1e3);
    const runs = [
      { inputs: { p, T }, pair: (i: number) => ({ p: Pa(p[i]!), T: K(T[i]!) }) },
      { inputs: { p: mixP, h: mixH }, pair: (i: number) => ({ p: Pa(mixP[i]!), h: quantity(mixH[i]!, 'J/kg') }) },
      { inputs: { p: mixP, s }, pair: (i: number) => ({ p: Pa(mixP[i]!), s: Quantity.fromSI(s[i]!, 'specificEntropy') }) },
    ];
    for (const run of runs) {
      const fast = waterBatch(run.inputs, props);
      const comp = waterBatch(run.inputs, props, undefined, C);
      expect(comp.status).toEqual(fast.status);
      const n = run.inputs.p.length;
      for (let i = 0; i < n; i++) {
        if (comp.status[i] !== 0 && comp.status[i] !== 4) {
          for (const prop of props) expect(comp[prop][i]).toBeNaN();
          continue;
        }
        const a = si(water.state(run.pair(i) as never));
        const b = si(water.state(run.pair(i) as never, C));
        for (const prop of ALL) {
          expect(Object.is(fast[prop][i], a[prop]), `fast ${prop}[${i}]`).toBe(true);
          expect(Object.is(comp[prop][i], b[prop]), `compensated ${prop}[${i}]`).toBe(true);
        }
      }
    }
  });

  it('with transport properties: μ and λ at the compensated state, as water.state gives them', () => {
    const r = waterBatch({ p, T }, ['rho', 'mu', 'lambda'], undefined, C);
    expect(Array.from(r.status)).toEqual([0, 0, 0, 0, 0, 1, 0]); // 1500 K is above the transport releases' 1173.15 K
    for (let i = 0; i < p.length; i++) {
      if (r.status[i] !== 0) continue;
      const st = water.state({ p: Pa(p[i]!), T: K(T[i]!) }, C);
      expect(r.rho[i]).toBe(st.rho.si);
      expect(r.mu[i]).toBe(st.mu?.si ?? NaN);
      expect(r.lambda[i]).toBe(st.lambda?.si ?? NaN);
    }
  });

  it('a bad option is an InvalidInputError naming the valid values', () => {
    expect(() => waterBatch({ p, T }, ['h'], undefined, { accuracy: 'double' } as never)).toThrow('options.accuracy must be one of "fast", "compensated"; got "double"');
    expect(() => waterBatch({ p, T }, ['h'], undefined, { fast: true } as never)).toThrow(InvalidInputError);
  });
});
