import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DefinitionError, OutOfRangeError, UnknownNameError } from '../../src/errors.js';
import { incompressible, incompressibleCatalogue, incompressibleDefinitionSchema, incompressibleNames } from '../../src/incompressible/index.js';
import { quantity } from '../../src/units/index.js';
import { expectClose } from '../helpers/tolerance.js';

const REQUIRED = [
  'water', 'ice', 'seawater', 'light fuel oil', 'engine oil', 'ethanol', 'glycerin', 'ethylene glycol', 'mercury',
  'aluminium', 'copper', 'brass', 'carbon steel', 'stainless steel', 'cast iron', 'lead', 'concrete', 'brick', 'glass', 'granite', 'oak',
];

describe('the built-in catalogue', () => {
  it('holds the 21 required substances', () => {
    expect(incompressibleNames()).toEqual(expect.arrayContaining(REQUIRED));
  });
  it('every entry passes the schema, names a source and a basis, and compiles', () => {
    for (const def of incompressibleCatalogue()) {
      expect(incompressibleDefinitionSchema.safeParse(def).success, def.name).toBe(true);
      expect(def.source?.title.length ?? 0, def.name).toBeGreaterThan(10);
      expect(def.basis, def.name).toBeDefined();
      const s = incompressible(def.name);
      expect(s.range.T.max.si).toBeGreaterThan(s.range.T.min.si);
      expect(s.rho.si).toBeGreaterThan(0);
    }
  });
  it('finds substances by alias, ignoring case, spaces and hyphens', () => {
    expect(incompressible('Aluminum').name).toBe('aluminium');
    expect(incompressible('AISI-304').name).toBe('stainless steel');
    expect(incompressible('MEG').name).toBe('ethylene glycol');
  });
  it('an unknown name throws UnknownNameError with the closest names', () => {
    try {
      incompressible('coppper');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(UnknownNameError);
      expect((e as UnknownNameError).suggestions[0]).toBe('copper');
    }
  });
});

describe('the model: cp = cv = c, Δu = ∫c dT, Δh = Δu + vΔp (common practice)', () => {
  const water = incompressible('water');
  const copper = incompressible('copper');

  it('cp and cv are c', () => {
    expect(water.cp('40 °C').si).toBe(water.c('40 °C').si);
    expect(water.cv('40 °C').si).toBe(water.c('40 °C').si);
  });
  it('a liquid pumped at constant temperature: Δh = v·Δp', () => {
    const dh = water.deltaH({ T: '25 °C', p: '100 kPa' }, { T: '25 °C', p: '5 MPa' });
    expectClose(dh.si, (5e6 - 1e5) / 997, { rel: 1e-14 });
  });
  it('a solid heated at constant pressure: Δh = Δu', () => {
    const dh = copper.deltaH({ T: '300 K', p: '1 atm' }, { T: '500 K', p: '1 atm' });
    expect(dh.si).toBe(copper.deltaU('300 K', '500 K').si);
  });
  it('Δu ≈ c_avg·ΔT: averageC is Δu/ΔT', () => {
    const du = copper.deltaU('300 K', '600 K').si;
    expectClose(copper.averageC('300 K', '600 K').si * 300, du, { rel: 1e-14 });
    expect(copper.averageC('400 K', '400 K').si).toBe(copper.c('400 K').si);
  });
  it('constant c: Δu = c·ΔT and Δs = c·ln(T2/T1) exactly', () => {
    const brass = incompressible('brass');
    expectClose(brass.deltaU('300 K', '450 K').si, 380 * 150, { rel: 1e-14 });
    expectClose(brass.deltaS('300 K', '450 K').si, 380 * Math.log(450 / 300), { rel: 1e-14 });
  });
  it('works in US units: a 1 Btu/(lbm·°F) liquid heated 10 °F takes 10 Btu/lbm', () => {
    const oil = incompressible({ name: 'test oil', state: 'liquid', c: '1 Btu/(lbm·°F)', density: '55 lbm/ft³', T: { min: '32 °F', max: '300 °F' } });
    expectClose(oil.deltaU('70 °F', '80 °F').in('Btu/lbm'), 10, { rel: 1e-12 });
    expectClose(oil.deltaH({ T: '70 °F', p: '14.7 psia' }, { T: '70 °F', p: '114.7 psia' }).in('Btu/lbm'), (100 * 144) / 55 / 778.1692622659652, { rel: 1e-12 });
  });

  it('property: Δu is additive, antisymmetric, and increasing in T2 (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 200, max: 800, noNaN: true }), fc.double({ min: 200, max: 800, noNaN: true }), fc.double({ min: 200, max: 800, noNaN: true }), (a, b, c) => {
        const du = (x: number, y: number) => copper.deltaU(quantity(x, 'K'), quantity(y, 'K')).si;
        const sum = du(a, b) + du(b, c);
        return Math.abs(sum - du(a, c)) <= 1e-9 * (1 + Math.abs(sum)) && Math.abs(du(a, b) + du(b, a)) <= 1e-9 && (b <= a || du(a, b) > 0);
      }),
    );
  });
});

describe('bad input', () => {
  const copper = incompressible('copper');
  it('a temperature outside the data throws OutOfRangeError naming the range', () => {
    try {
      copper.c('900 K');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(OutOfRangeError);
      const r = (e as OutOfRangeError).range;
      expect([r.min, r.max, r.unit]).toEqual([200, 800, 'K']);
      expect((e as Error).message).toBe('T = 900 K is above the upper limit of the data for copper (800 K); valid range 200 to 800 K');
    }
  });
  it('a non-positive absolute pressure throws', () => {
    expect(() => copper.deltaH({ T: '300 K', p: '0 Pa' }, { T: '300 K', p: '1 bar' })).toThrow(OutOfRangeError);
  });
  it('a bad user definition is rejected with a message naming the field', () => {
    const bad = (patch: object) => () => incompressible({ name: 'x', state: 'liquid', c: '2 kJ/(kg·K)', density: '900 kg/m³', T: { min: '0 °C', max: '100 °C' }, ...patch } as never);
    expect(bad({ c: '2 kPa' })).toThrow(/c: expected a specificHeat/);
    expect(bad({ density: '-5 kg/m³' })).toThrow(/density: density must be positive/);
    expect(bad({ T: { min: '100 °C', max: '0 °C' } })).toThrow(/T: T.min must be below T.max/);
    expect(bad({ state: 'gas' })).toThrow(DefinitionError);
    expect(bad({ c: { table: { T: [0, 50, 40], c: [4, 4, 4] }, unit: 'kJ/(kg·K)', temperatureUnit: '°C' } })).toThrow(/c.table.T.2: temperatures must increase strictly/);
    expect(bad({ c: { polynomial: [1000, -10], unit: 'J/(kg·K)', temperatureUnit: 'K' } })).toThrow(/c\.polynomial: c\(T\) must be positive/);
    expect(bad({ colour: 'blue' })).toThrow(DefinitionError);
    try {
      bad({ c: '2 kPa' })();
    } catch (e) {
      expect((e as DefinitionError).issues[0]!.path).toEqual(['c']);
    }
  });
  it('a polynomial in °C is converted to one in K', () => {
    const s = incompressible({ name: 'p', state: 'liquid', c: { polynomial: [4000, 2], unit: 'J/(kg·K)', temperatureUnit: '°C' }, density: '1000 kg/m³', T: { min: '0 °C', max: '100 °C' } });
    expectClose(s.c('50 °C').si, 4100, { rel: 1e-12 });
  });
});
