import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DefinitionError, InvalidInputError, OutOfRangeError, UnknownNameError } from '../../src/errors.js';
import { densityAt, incompressible, incompressibleCatalogue, incompressibleNames } from '../../src/incompressible/index.js';
import { incompressibleDefinitionSchema } from '../../src/incompressible/schema.js';
import { lookupIncompressible } from '../../src/incompressible/catalogue.js';
import { normaliseName } from '../../src/lookup.js';
import { quantity } from '../../src/units/index.js';
import { expectClose } from '../helpers/tolerance.js';

const REQUIRED = [
  'water', 'ice', 'seawater', 'light fuel oil', 'engine oil', 'ethanol', 'methanol', 'glycerin', 'ethylene glycol', 'propylene glycol', 'mercury',
  'aluminium', 'copper', 'brass', 'carbon steel', 'stainless steel', 'iron', 'cast iron', 'lead', 'liquid lead', 'concrete', 'brick', 'glass', 'granite', 'oak',
  'ethylene glycol solution', 'propylene glycol solution',
];

describe('the built-in catalogue', () => {
  it('holds the required substances', () => {
    expect(incompressibleNames()).toEqual(expect.arrayContaining(REQUIRED));
  });
  it('every entry passes the schema, names a source, a basis and an uncertainty of a named kind, and compiles', () => {
    for (const def of incompressibleCatalogue()) {
      expect(incompressibleDefinitionSchema().safeParse(def).success, def.name).toBe(true);
      expect(def.source?.title.length ?? 0, def.name).toBeGreaterThan(10);
      expect(def.basis, def.name).toBeDefined();
      expect(def.uncertainty, def.name).toMatch(/^(fit deviation|source|estimate): .{20,}/);
      expect(lookupIncompressible(def.name).provenance).toMatchObject({ title: def.source!.title, basis: def.basis, uncertainty: def.uncertainty });
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
  it('a liquid pumped at constant temperature: Δh = v(T)·Δp', () => {
    const dh = water.deltaH({ T: '25 °C', p: '100 kPa' }, { T: '25 °C', p: '5 MPa' });
    expectClose(dh.si, (5e6 - 1e5) / densityAt(lookupIncompressible('water').model, 298.15), { rel: 1e-14 });
    const oil = incompressible('engine oil');
    expectClose(oil.deltaH({ T: '350 K', p: '1 bar' }, { T: '350 K', p: '11 bar' }).si, 1e6 / 853.9, { rel: 1e-12 });
  });
  it('with ρ(T): h(T, p) = ∫c dT + v(T)·(p − p_ref), a function of the state; at p_ref Δh = Δu exactly', () => {
    const oil = incompressible('engine oil');
    // v at the tabulated nodes 300 K and 400 K (engine-oil density table), p_ref = 1 atm
    const expected = oil.deltaU('300 K', '400 K').si + (21e5 - 101325) / 825.1 - (1e5 - 101325) / 884.1;
    expectClose(oil.deltaH({ T: '300 K', p: '1 bar' }, { T: '400 K', p: '21 bar' }).si, expected, { rel: 1e-12 });
    expect(oil.deltaH({ T: '300 K', p: '1 atm' }, { T: '400 K', p: '1 atm' }).si).toBe(oil.deltaU('300 K', '400 K').si);
    // path independence: 1 → 2 → 3 equals 1 → 3, and deltaH is the difference of the states' h
    const s1 = { T: '300 K', p: '1 bar' } as const;
    const s2 = { T: '400 K', p: '50 bar' } as const;
    const s3 = { T: '350 K', p: '2 MPa' } as const;
    expectClose(oil.deltaH(s1, s2).si + oil.deltaH(s2, s3).si, oil.deltaH(s1, s3).si, { rel: 1e-12 });
    expectClose(oil.deltaH(s1, s2).si, oil.state(s2).h.si - oil.state(s1).h.si, { rel: 1e-12 });
  });
  it('densityAt: constant density, or linear between the tabulated nodes and exact at them', () => {
    expect(densityAt(lookupIncompressible('copper').model, 500)).toBe(8933);
    const oil = lookupIncompressible('engine oil').model;
    expect(densityAt(oil, 350)).toBe(853.9);
    expectClose(densityAt(oil, 375), (853.9 + 825.1) / 2, { rel: 1e-14 });
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
      fc.property(fc.double({ min: 200, max: 1358, noNaN: true }), fc.double({ min: 200, max: 1358, noNaN: true }), fc.double({ min: 200, max: 1358, noNaN: true }), (a, b, c) => {
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
      copper.c('1400 K');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(OutOfRangeError);
      const r = (e as OutOfRangeError).range;
      expect([r.min, r.max, r.unit]).toEqual([200, 1358, 'K']);
      expect((e as Error).message).toBe('T = 1400 K is above the upper limit of the data for copper (1358 K); valid range 200 to 1358 K; pass { extrapolate: true } to compute outside it (results are then flagged)');
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

describe('names resolve only where unique', () => {
  it("incompressible('steel') is refused with UnknownNameError listing the steels", () => {
    try {
      incompressible('steel');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(UnknownNameError);
      expect([...(e as UnknownNameError).suggestions].sort()).toEqual(['carbon steel', 'stainless steel']);
    }
  });
  it.each([
    ['glycol', ['ethylene glycol', 'ethylene glycol solution', 'propylene glycol', 'propylene glycol solution']],
    ['oil', ['engine oil', 'light fuel oil']],
  ] as const)('%s is refused, listing %j', (name, meant) => {
    try {
      incompressible(name);
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(UnknownNameError);
      expect([...(e as UnknownNameError).suggestions].sort()).toEqual([...meant]);
    }
  });
  it('no name or alias is given by two entries (registry-wide)', () => {
    const seen = new Map<string, string>();
    for (const def of incompressibleCatalogue()) {
      for (const n of new Set([def.name, ...(def.aliases ?? [])].map(normaliseName))) {
        expect(seen.get(n), `${n} in ${def.name} and ${seen.get(n)}`).toBeUndefined();
        seen.set(n, def.name);
      }
    }
  });
  it('an exact name wins over a word other names contain: iron is pure iron, lead is solid lead', () => {
    expect(incompressible('iron').name).toBe('iron');
    expect(incompressible('lead').phase).toBe('solid');
    expect(incompressible('liquid lead').phase).toBe('liquid');
  });
});

describe('liquid ranges start at the melting point; supercooled only on request', () => {
  it('glycerin starts at its melting point, 18.2 °C; { supercooled: true } reaches 0 °C', () => {
    const g = incompressible('glycerin');
    expectClose(g.range.T.min.si, 291.33, { rel: 1e-12 });
    expect(() => g.c('5 °C')).toThrow(/supercooled: true/);
    expect(incompressible('glycerin', { supercooled: true }).range.T.min.si).toBe(273.15);
  });
  it('asking for supercooled data a substance does not have is a DefinitionError', () => {
    expect(() => incompressible('ethanol', { supercooled: true })).toThrow(DefinitionError);
  });
  it('every liquid with a melting point in its note starts at or above it (common practice)', () => {
    const melting: Record<string, number> = { ethanol: 159.0, methanol: 175.5, 'ethylene glycol': 260.2, mercury: 234.29, 'liquid lead': 600.6, water: 273.15 };
    for (const [name, Tm] of Object.entries(melting)) expect(incompressible(name).range.T.min.si, name).toBeGreaterThanOrEqual(Tm);
  });
});

describe('aqueous glycol solutions (ASHRAE Handbook—Fundamentals ch. 31 values, from memory)', () => {
  it('are reached with a mass or volume fraction and return the same substance object as other entries', () => {
    const eg = incompressible('ethylene glycol solution', { massFraction: 0.3 });
    expect(eg.name).toBe('ethylene glycol solution, 30 % by mass');
    expect(Object.keys(eg).sort()).toEqual(Object.keys(incompressible('copper')).sort());
    expect(eg.c('20 °C').in('kJ/(kg·K)')).toBeGreaterThan(3.5);
    expect(eg.c('20 °C').in('kJ/(kg·K)')).toBeLessThan(3.9);
  });
  it('a volume fraction converts with the pure densities at 20 °C: w = φ·ρg/(φ·ρg + (1 − φ)·ρw)', () => {
    const w = (0.3 * 1113.5) / (0.3 * 1113.5 + 0.7 * 998.2);
    const byVolume = incompressible('ethylene glycol solution', { volumeFraction: 0.3 });
    const byMass = incompressible('ethylene glycol solution', { massFraction: w });
    expect(byVolume.c('40 °C').si).toBe(byMass.c('40 °C').si);
  });
  it('interpolates bilinearly: at 35 % and 30 °C, c is the mean of the four neighbouring grid values', () => {
    const s = incompressible('ethylene glycol solution', { massFraction: 0.35 });
    // grid values at (30 %, 20 °C) 3.71, (30 %, 40 °C) 3.76, (40 %, 20 °C) 3.55, (40 %, 40 °C) 3.61 kJ/(kg·K) (data/incompressible/brines.json)
    expectClose(s.c('30 °C').in('kJ/(kg·K)'), (3.71 + 3.76 + 3.55 + 3.61) / 4, { rel: 1e-12 });
  });
  it('below the freezing point the error names the concentration and the freezing point', () => {
    const s = incompressible('propylene glycol solution', { massFraction: 0.4 });
    try {
      s.c('-25 °C');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(OutOfRangeError);
      expect((e as Error).message).toMatch(/propylene glycol solution, 40 % by mass/);
      expect((e as Error).message).toMatch(/freezes at -21.1 °C/);
    }
  });
  it('more glycol freezes lower and is denser (ethylene glycol) at 20 °C', () => {
    let freezing = Infinity;
    let rho = 0;
    for (const w of [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6]) {
      const s = incompressible('ethylene glycol solution', { massFraction: w });
      expect(s.range.T.min.si).toBeLessThanOrEqual(freezing);
      freezing = s.range.T.min.si;
      const r = densityAt(lookupIncompressible('ethylene glycol solution', { massFraction: w }).model, 293.15);
      expect(r).toBeGreaterThan(rho);
      rho = r;
    }
  });
  it('without a concentration, with both, or beyond 60 % it throws', () => {
    expect(() => incompressible('ethylene glycol solution')).toThrow(InvalidInputError);
    expect(() => incompressible('ethylene glycol solution', { massFraction: 0.3, volumeFraction: 0.3 })).toThrow(InvalidInputError);
    expect(() => incompressible('ethylene glycol solution', { massFraction: 0.65 })).toThrow(OutOfRangeError);
  });
  it('the solutions carry their source, basis and uncertainty', () => {
    const p = lookupIncompressible('ethylene glycol solution', { massFraction: 0.2 }).provenance;
    expect(p.title).toMatch(/ASHRAE Handbook—Fundamentals, chapter 31/);
    expect(p.basis).toBe('from memory');
    expect(p.uncertainty).toMatch(/^estimate: /);
  });
});
