import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../../src/errors.js';
import { idealGas, idealGasBatch, mixture } from '../../src/ideal-gas/index.js';
import { quantity } from '../../src/units/index.js';
import { water, waterBatch } from '../../src/water/index.js';
import { Status as STATUS, stateFromPH, stateFromPT, WaterState } from '../../src/water/if97/index.js';

describe('waterBatch', () => {
  it('equals the per-call results bit for bit (fast-check over liquid, vapour and two-phase states)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.double({ min: 1e3, max: 60e6, noNaN: true }), fc.double({ min: 280, max: 1500, noNaN: true })), { minLength: 1, maxLength: 40 }), (pts) => {
        const p = Float64Array.from(pts, ([x]) => x);
        const T = Float64Array.from(pts, ([, y]) => y);
        const r = waterBatch({ p, T }, ['h', 's', 'v', 'cp', 'w', 'k']);
        const st = new WaterState();
        pts.forEach(([pp, TT], i) => {
          const code = stateFromPT(pp, TT, st);
          expect(r.status[i]).toBe(code);
          if (code === STATUS.ok) {
            const facade = water.state({ p: quantity(pp, 'Pa'), T: quantity(TT, 'K') });
            expect(r.h[i]).toBe(facade.h.si);
            expect(r.s[i]).toBe(facade.s.si);
            expect(r.v[i]).toBe(facade.v.si);
            expect(r.cp[i]).toBe(facade.cp!.si);
            expect(r.w[i]).toBe(facade.w!.si);
            expect(r.k[i]).toBe(facade.k);
          }
        });
      }),
      { numRuns: 40 },
    );
  });
  it('(p, h) batches equal the flash, and mark two-phase states where cp is not defined', () => {
    const sat = water.saturation({ p: '1 MPa' });
    const p = Float64Array.of(1e6, 1e6, 1e6);
    const h = Float64Array.of(sat.liquid.h.si - 1e5, sat.liquid.h.si + 0.5 * sat.hfg.si, sat.vapor.h.si + 2e5);
    const r = waterBatch({ p, h }, ['T', 'x', 'cp']);
    const st = new WaterState();
    stateFromPH(1e6, h[1]!, st);
    expect(r.T[1]).toBe(st.T);
    expect(r.x[1]).toBe(st.x);
    expect(Array.from(r.status)).toEqual([STATUS.ok, STATUS.undefinedProperty, STATUS.ok]);
    expect(Number.isNaN(r.cp[1]!)).toBe(true);
    expect(Number.isNaN(r.x[0]!)).toBe(true);
  });
  it('a batch salted with bad inputs marks them and computes the rest', () => {
    const p = Float64Array.of(1e6, NaN, -5, 1e6, 200e6, 1e6, Infinity);
    const T = Float64Array.of(300, 400, 400, 3000, 400, 500, 400);
    const r = waterBatch({ p, T }, ['h']);
    expect(Array.from(r.status)).toEqual([0, 3, 1, 1, 1, 0, 3]);
    expect(r.h[0]).toBe(water.state({ p: '1 MPa', T: '300 K' }).h.si);
    expect(Number.isNaN(r.h[1]!)).toBe(true);
    expect(r.h[5]).toBe(water.state({ p: '1 MPa', T: '500 K' }).h.si);
  });
  it('fills caller-provided arrays in place', () => {
    const h = new Float64Array(2);
    const status = new Uint8Array(2);
    const r = waterBatch({ p: Float64Array.of(1e5, 2e5), T: Float64Array.of(300, 310) }, ['h'], { h, status });
    expect(r.h).toBe(h);
    expect(r.status).toBe(status);
    expect(h[1]).toBe(water.state({ p: '200 kPa', T: '310 K' }).h.si);
  });
  it('a malformed call throws (unequal lengths, unknown property)', () => {
    expect(() => waterBatch({ p: new Float64Array(2), T: new Float64Array(3) }, ['h'])).toThrow(InvalidInputError);
    // @ts-expect-error not a property
    expect(() => waterBatch({ p: new Float64Array(1), T: new Float64Array(1) }, ['enthalpy'])).toThrow(/unknown property/);
  });
});

describe('idealGasBatch', () => {
  it('equals the per-call functions bit for bit, on mass and molar bases and for mixtures', () => {
    for (const gas of [idealGas('N2'), idealGas('CO2', { basis: 'molar' }), mixture({ N2: 0.79, O2: 0.21 })]) {
      const T = Float64Array.of(250, 300, 999.9, 1000, 2500);
      const p = Float64Array.of(1e5, 2e5, 3e5, 4e5, 5e6);
      const r = idealGasBatch(gas as ReturnType<typeof idealGas>, { T, p }, ['cp', 'cv', 'k', 'h', 'hSensible', 'u', 's', 'sStandard']);
      T.forEach((t, i) => {
        const q = quantity(t, 'K');
        expect(r.cp[i]).toBe(gas.cp(q).si);
        expect(r.cv[i]).toBe(gas.cv(q).si);
        expect(r.k[i]).toBe(gas.k(q));
        expect(r.h[i]).toBe(gas.h(q).si);
        expect(r.hSensible[i]).toBe(gas.hSensible(q).si);
        expect(r.u[i]).toBe(gas.u(q).si);
        expect(r.s[i]).toBe(gas.s(q, quantity(p[i]!, 'Pa')).si);
        expect(r.sStandard[i]).toBe(gas.sStandard(q).si);
      });
    }
  });
  it('marks bad elements: outside the data, p ≤ 0, NaN', () => {
    const r = idealGasBatch(idealGas('air'), { T: Float64Array.of(300, 9000, NaN, 400), p: Float64Array.of(1e5, 1e5, 1e5, 0) }, ['s', 'cp']);
    expect(Array.from(r.status)).toEqual([0, 1, 3, 1]);
    expect(Number.isNaN(r.cp[1]!)).toBe(true);
  });
  it('extrapolates only for a gas made with { extrapolate: true }', () => {
    const r = idealGasBatch(idealGas('N2', { extrapolate: true }), { T: Float64Array.of(7000) }, ['cp']);
    expect(r.status[0]).toBe(0);
  });
  it('s without pressures is a malformed call', () => {
    expect(() => idealGasBatch(idealGas('air'), { T: new Float64Array(2) }, ['s'])).toThrow(InvalidInputError);
  });
  // the fused loop (src/ideal-gas/batch.ts) against the runner's own loop over the same model
  const gases = [idealGas('N2'), idealGas('CO2', { basis: 'molar' }), idealGas('air'), mixture({ N2: 0.79, O2: 0.21 }), idealGas('H2O', { extrapolate: true })] as ReturnType<typeof idealGas>[];
  const allProps = ['cp', 'cv', 'k', 'h', 'hSensible', 'u', 's', 'sStandard'] as const;
  const temperature = fc.oneof(
    { weight: 12, arbitrary: fc.double({ min: 150, max: 6500, noNaN: true }) },
    { weight: 1, arbitrary: fc.constantFrom(NaN, Infinity, -Infinity, 0, -1, 5e-324, 1e-300, 1e300, 200, 6000) },
  );
  const pressure = fc.oneof({ weight: 12, arbitrary: fc.double({ min: 1, max: 1e8, noNaN: true }) }, { weight: 1, arbitrary: fc.constantFrom(NaN, Infinity, 0, -1e5, 5e-324) });
  it('the fused loop equals the runner over the per-element core bit for bit: statuses, values, NaN for bad elements (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: gases.length - 1 }),
        fc.array(fc.tuple(temperature, pressure), { minLength: 1, maxLength: 600 }),
        fc.array(fc.constantFrom(...allProps), { minLength: 1, maxLength: 9 }),
        fc.boolean(),
        (g, rows, props, withP) => {
          const gas = gases[g]!;
          const T = Float64Array.from(rows, (r) => r[0]);
          const p = Float64Array.from(rows, (r) => r[1]);
          const wanted = withP ? props : props.filter((k) => k !== 's');
          if (wanted.length === 0) return;
          const inputs = withP ? { T, p } : { T };
          const fused = idealGasBatch(gas, inputs, wanted) as unknown as Record<string, Float64Array> & { status: Uint8Array };
          const generic = runBatch(idealGasBatchModel(gas, false), inputs, wanted) as unknown as Record<string, Float64Array> & { status: Uint8Array };
          expect(Array.from(fused.status)).toEqual(Array.from(generic.status));
          for (const prop of wanted) expect(same(fused[prop]!, generic[prop]!), prop).toBe(true);
        },
      ),
      { numRuns: 200 },
    );
  });
  it('the non-finite rule: an extrapolating gas at a denormal temperature gives invalidInput and NaN in every column, as the runner does', () => {
    // h = R·T·h°/(R̄T) overflows for T = 5e-324 K (1/T is infinite) while cp stays finite
    const gas = idealGas('N2', { extrapolate: true });
    const T = Float64Array.of(300, 5e-324, 400);
    const fused = idealGasBatch(gas, { T }, ['cp', 'h']);
    const generic = runBatch(idealGasBatchModel(gas, false), { T }, ['cp', 'h']);
    expect(Array.from(fused.status)).toEqual([0, 3, 0]);
    expect(Array.from(generic.status)).toEqual([0, 3, 0]);
    expect(Number.isNaN(fused.cp[1]!) && Number.isNaN(fused.h[1]!)).toBe(true);
    expect(same(fused.h, generic.h) && same(fused.cp, generic.cp)).toBe(true);
  });
  it('the same results from a second batch of the same gas (its model is kept between calls)', () => {
    const gas = idealGas('air');
    const T = Float64Array.of(300, 9000, 1200);
    const first = idealGasBatch(gas, { T }, ['cp', 'h']);
    const second = idealGasBatch(gas, { T }, ['cp', 'h']);
    expect(same(first.h, second.h) && same(first.cp, second.cp)).toBe(true);
    expect(Array.from(second.status)).toEqual([0, 1, 0]);
  });
});

import { runBatch, type BatchModel } from '../../src/core/batch.js';
import { idealGasBatchModel } from '../../src/ideal-gas/batch.js';
import { SolverContext } from '../../src/water/if97/context.js';
import { stateFromPS } from '../../src/water/if97/index.js';
import { PHASE } from '../../src/water/if97/water-state.js';
import type { WaterBatchProperty } from '../../src/water/index.js';

/** The properties of the fused loop (transport requests run on the runner's loop: tests/batch/water-transport.test.ts). */
type ThermoProperty = Exclude<WaterBatchProperty, 'mu' | 'lambda' | 'Pr' | 'nu' | 'alpha'>;

/** The water model on the runner's own loop (no fused loop): the reference the fused loop must equal bit for bit. */
function genericWaterModel(): BatchModel<WaterState, ThermoProperty> {
  const ctx = new SolverContext();
  const dome = new Set(['cp', 'cv', 'w', 'k']);
  return {
    name: 'reference',
    inputs: [
      { keys: ['p', 'T'], solve: (p, T, out) => stateFromPT(p, T, out, ctx) },
      { keys: ['p', 'h'], solve: (p, h, out) => stateFromPH(p, h, out, ctx) },
      { keys: ['p', 's'], solve: (p, s, out) => stateFromPS(p, s, out, ctx) },
    ],
    properties: { T: (o) => o.T, p: (o) => o.p, v: (o) => o.v, rho: (o) => o.rho, u: (o) => o.u, h: (o) => o.h, s: (o) => o.s, cp: (o) => o.cp, cv: (o) => o.cv, w: (o) => o.w, k: (o) => o.cp / o.cv, x: (o) => o.x },
    mayBeNaN: { x: true },
    undefinedAt: (o, prop) => o.phase === PHASE.twoPhase && dome.has(prop),
    createOutput: () => new WaterState(),
  };
}

const ALL: ThermoProperty[] = ['T', 'p', 'v', 'rho', 'u', 'h', 's', 'cp', 'cv', 'w', 'k', 'x'];
const same = (a: Float64Array, b: Float64Array) => a.every((x, i) => Object.is(x, b[i]));

describe('waterBatch fused loop', () => {
  // inputs over every region, the dome, the range edges and bad values; lengths across the 128-element blocks
  const pressure = fc.oneof(fc.double({ min: 500, max: 100e6, noNaN: true }), fc.constantFrom(NaN, -1, 0, Infinity, 16.6e6, 100e6, 22.064e6, 5e-324));
  const temperature = fc.oneof(fc.double({ min: 270, max: 2300, noNaN: true }), fc.constantFrom(NaN, 273.15, 623.15, 647.096, 1073.15));
  const enthalpy = fc.oneof(fc.double({ min: -1e4, max: 7e6, noNaN: true }), fc.constantFrom(NaN, 0));
  const entropy = fc.oneof(fc.double({ min: -100, max: 13e3, noNaN: true }), fc.constantFrom(NaN, 4.41e3));
  const request = fc.shuffledSubarray(ALL, { minLength: 1 });
  it.each([
    ['T', temperature],
    ['h', enthalpy],
    ['s', entropy],
  ] as const)('(p, %s) equals the runner over the SI core bit for bit, every status and every property set', (key, second) => {
    fc.assert(
      fc.property(fc.array(fc.tuple(pressure, second), { minLength: 1, maxLength: 300 }), request, (pairs, props) => {
        const p = Float64Array.from(pairs, ([x]) => x);
        const y = Float64Array.from(pairs, ([, v]) => v);
        const inputs = { p, [key]: y } as unknown as { p: Float64Array; T: Float64Array };
        const fused = waterBatch(inputs, props);
        const generic = runBatch(genericWaterModel(), inputs, props);
        expect(Array.from(fused.status)).toEqual(Array.from(generic.status));
        for (const prop of props) expect(same(fused[prop], generic[prop]), prop).toBe(true);
      }),
      { numRuns: key === 'T' ? 60 : 15 },
    );
  });
  it('a request naming a property twice goes through the runner and gives the same values', () => {
    const p = Float64Array.of(1e6, 20e6);
    const T = Float64Array.of(300, 700);
    const r = waterBatch({ p, T }, ['h', 'h'] as ThermoProperty[]);
    const g = runBatch(genericWaterModel(), { p, T }, ['h', 'h']);
    expect(same(r.h, g.h)).toBe(true);
  });
});
