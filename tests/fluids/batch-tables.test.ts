/**
 * fluidBatch (the generic batch runner over the Helmholtz core) and saturationTable (the typed table
 * layer): batch elements equal the SI core bit for bit; table rows equal direct saturation calls bit
 * for bit, and the error between rows is measured and reported.
 */
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { InvalidInputError, OutOfRangeError } from '../../src/errors.js';
import { waterModel } from '../../src/fluids/catalogue.js';
import { stateFromPH, stateFromPT, stateFromTRho } from '../../src/fluids/flash.js';
import { fluid, fluidBatch, saturationTable } from '../../src/fluids/index.js';
import { FluidContext, FluidState } from '../../src/fluids/model.js';
import { Quantity } from '../../src/units/quantity.js';

const ctx = new FluidContext(waterModel());
const st = new FluidState();

describe('fluidBatch', () => {
  it('(p, T), (p, h), (T, rho): every element equals the SI core bit for bit', () => {
    const p = Float64Array.of(1e5, 5e6, 3e7, 1e4, 2e7);
    const T = Float64Array.of(300, 500, 700, 350, 640);
    const r = fluidBatch(fluid('water'), { p, T }, ['rho', 'h', 's', 'cp', 'w']);
    for (let i = 0; i < p.length; i++) {
      expect(stateFromPT(ctx, p[i]!, T[i]!, st)).toBe(Status.ok);
      expect([r.rho[i], r.h[i], r.s[i], r.cp[i], r.w[i], r.status[i]]).toEqual([st.rho, st.h, st.s, st.cp, st.w, 0]);
    }
    const rh = fluidBatch('water', { p, h: r.h }, ['T', 'x']);
    for (let i = 0; i < p.length; i++) {
      stateFromPH(ctx, p[i]!, r.h[i]!, st);
      expect(rh.T[i]).toBe(st.T);
    }
    const rr = fluidBatch('R-718', { T, rho: r.rho }, ['p']);
    for (let i = 0; i < p.length; i++) {
      stateFromTRho(ctx, T[i]!, r.rho[i]!, st);
      expect(rr.p[i]).toBe(st.p);
    }
  });

  it('two-phase elements: computed (status 0) unless a property undefined there is requested (status 4)', () => {
    const p = Float64Array.of(1e5, 1e5);
    const h = Float64Array.of(4e5, 1.5e6);
    const a = fluidBatch('water', { p, h }, ['T', 'x', 'h']);
    expect([...a.status]).toEqual([0, 0]);
    expect(Number.isNaN(a.x[0])).toBe(true);
    expect(a.x[1]).toBeGreaterThan(0.47);
    const b = fluidBatch('water', { p, h }, ['T', 'cp']);
    expect([...b.status]).toEqual([0, Status.undefinedProperty]);
    expect(Number.isNaN(b.cp[1])).toBe(true);
    expect(b.T[1]).toBe(a.T[1]);
  });

  it('bad elements get a status and NaN outputs; malformed calls throw before any work', () => {
    const r = fluidBatch('water', { p: Float64Array.of(1e5, NaN, 2e9, 1e5), T: Float64Array.of(300, 300, 300, 100) }, ['h']);
    expect([...r.status]).toEqual([0, Status.invalidInput, Status.outOfRange, Status.outOfRange]);
    expect(Number.isNaN(r.h[1]) && Number.isNaN(r.h[2]) && Number.isNaN(r.h[3])).toBe(true);
    expect(() => fluidBatch('water', { p: Float64Array.of(1), T: Float64Array.of(1), h: Float64Array.of(1) } as never, ['h'])).toThrow(InvalidInputError);
    expect(() => fluidBatch('water', { p: Float64Array.of(1), s: Float64Array.of(1) } as never, ['h'])).toThrow(InvalidInputError);
    expect(() => fluidBatch('water', { p: Float64Array.of(1), T: Float64Array.of(1) }, ['nope' as never])).toThrow(InvalidInputError);
    const out = { h: new Float64Array(1) };
    expect(fluidBatch('water', { p: Float64Array.of(1e5), T: Float64Array.of(300) }, ['h'], out).h).toBe(out.h);
  });
});

describe('saturationTable', () => {
  const water = fluid('water');

  it('by T (SI): every row equals water.saturation at its key, bit for bit, in the column unit', () => {
    const t = saturationTable(water, { by: 'T', from: '0.01 °C', to: '373.946 °C', step: '10 K' });
    expect(t.columnNames).toEqual(['T', 'p', 'vf', 'vg', 'uf', 'ufg', 'ug', 'hf', 'hfg', 'hg', 'sf', 'sfg', 'sg']);
    const keys = t.data.columns.T!.values as number[];
    expect(keys[1]).toBe(10.01);
    for (const k of keys.slice(0, -1)) {
      const sat = water.saturation({ T: `${k} °C` as `${number} °C` });
      expect(t.lookup('p', `${k} °C`).value.in('kPa')).toBe(sat.p.in('kPa'));
      expect(t.lookup('hfg', `${k} °C`).value.in('kJ/kg')).toBe(sat.hfg.in('kJ/kg'));
      expect(t.lookup('sg', `${k} °C`).value.in('kJ/(kg·K)')).toBe(sat.vapor.s.in('kJ/(kg·K)'));
      expect(t.lookup('vf', `${k} °C`).value.in('m³/kg')).toBe(sat.liquid.v.in('m³/kg'));
    }
    // the last row is the critical point
    expect(t.lookup('p', '373.946 °C').value.in('kPa')).toBe(22064);
  });

  it('between rows: the measured error of linear interpolation is reported, and is what a midpoint shows', () => {
    const t = saturationTable('water', { by: 'T', from: '10 °C', to: '300 °C', step: '10 K' });
    const e = t.data.interpolationError!;
    // measured (this table): p, the most curved column, is off by a few per cent at the cold end
    expect(e.p!.linear!.maxRelative).toBeGreaterThan(0.001);
    expect(e.p!.linear!.maxRelative).toBeLessThan(0.1);
    expect(e.hg!.linear!.maxRelative).toBeLessThan(1e-3);
    const mid = water.saturation({ T: '15 °C' });
    const rel = Math.abs(t.lookup('p', '15 °C').value.si / mid.p.si - 1);
    expect(rel).toBeLessThanOrEqual(e.p!.linear!.maxRelative * 1.05);
    expect(rel).toBeGreaterThan(0);
  });

  it('by p (US): rows equal saturation by p in psia, °F and Btu', () => {
    const t = saturationTable('water', { by: 'p', from: '1 psia', to: '3000 psia', step: '100 psia', units: 'US' });
    const sat = water.saturation({ p: '101 psia' });
    expect(t.lookup('T', '101 psia').value.in('°F')).toBe(sat.T.in('°F'));
    expect(t.lookup('hg', '101 psia').value.in('Btu/lbm')).toBe(sat.vapor.h.in('Btu/lbm'));
    expect(t.columnInfo('sf').unit).toBe('Btu/(lbm·°R)');
    // inverse through the table layer
    expect(t.inverse('T', Quantity.fromSI(sat.T.si, 'temperature')).value.in('psia')).toBeCloseTo(101, 6);
  });

  it('refuses keys outside the saturation line and bad options', () => {
    expect(() => saturationTable('water', { by: 'T', from: '-10 °C', to: '100 °C', step: '10 K' })).toThrow(OutOfRangeError);
    expect(() => saturationTable('water', { by: 'p', from: '1 kPa', to: '30 MPa', step: '1 MPa' })).toThrow(/saturation line/);
    expect(() => saturationTable('water', { by: 'T', from: '10 °C', to: '100 °C', step: '-10 K' })).toThrow(InvalidInputError);
    expect(() => saturationTable('water', { by: 'T', from: '10 °C', to: '300 °C', step: '0.001 K' })).toThrow(/at most 10000 are allowed/);
    expect(() => saturationTable('water', { by: 'x', from: '10 °C', to: '100 °C', step: '10 K' } as never)).toThrow(InvalidInputError);
  });
});
