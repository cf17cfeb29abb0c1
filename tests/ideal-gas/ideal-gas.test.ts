import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DefinitionError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError } from '../../src/errors.js';
import { dryAir, idealGas, massToMoleFractions, mixture, moleToMassFractions, speciesNames, speciesRecords, type NasaPolynomialModel } from '../../src/ideal-gas/index.js';
import { MOLAR_GAS_CONSTANT } from '../../src/chem/constants.js';
import { molarMass } from '../../src/chem/index.js';
import { quantity } from '../../src/units/index.js';
import { expectClose } from '../helpers/tolerance.js';

const K = (T: number) => quantity(T, 'K');

describe('exact identities (common practice)', () => {
  it.each(speciesNames())('%s: cp − cv = R at several temperatures', (name) => {
    const g = idealGas(name);
    for (const T of [g.range.T.min.si, 300, 800, g.range.T.max!.si]) {
      expectClose(g.cp(K(T)).si - g.cv(K(T)).si, g.R.si, { rel: 1e-12 });
    }
  });
  it.each(['Ar', 'He', 'Ne', 'H'])('%s (monatomic): k = 5/3', (name) => {
    for (const T of [300, 1000, 3000]) expectClose(idealGas(name).k(K(T)), 5 / 3, { rel: 1e-4 });
  });
  it.each(speciesNames())('%s: dh/dT = cp and T·ds/dT = cp (central differences, relative 1e-7)', (name) => {
    const g = idealGas(name);
    const core = g.core;
    for (const T of [250, 450, 900, 1100, 2500]) {
      if (T - 1 < core.Tmin || T + 1 > core.Tmax || Math.abs(T - 1000) < 2) continue;
      const d = 1e-5 * T;
      const dh = ((T + d) * core.hRT(T + d) - (T - d) * core.hRT(T - d)) / (2 * d);
      const ds = (core.sR(T + d) - core.sR(T - d)) / (2 * d);
      expectClose(dh, core.cpR(T), { rel: 1e-7 });
      expectClose(T * ds, core.cpR(T), { rel: 1e-7 });
    }
  });
  it.each(speciesRecords().filter((r) => r.T.mid < r.T.max).map((r) => r.id))('%s: cp, h and s continuous at the interval break', (name) => {
    const core = idealGas(name).core as NasaPolynomialModel;
    const Tm = core.Tmid;
    const below = Tm * (1 - 1e-12);
    // published fits join within their stated jump; ours are constrained continuous. Bounds: cp/R 1e-3, h/R 0.5 K, s/R 1e-3.
    expect(Math.abs(core.cpR(Tm) - core.cpR(below))).toBeLessThan(1e-3);
    expect(Math.abs(Tm * core.hRT(Tm) - below * core.hRT(below))).toBeLessThan(0.5);
    expect(Math.abs(core.sR(Tm) - core.sR(below))).toBeLessThan(1e-3);
  });
});

describe('property-based (fast-check): over random T in range', () => {
  it.each(speciesNames())('%s: cp > cv > 0, k > 1, h increasing in T', (name) => {
    const g = idealGas(name);
    const { Tmin, Tmax } = g.core;
    fc.assert(
      fc.property(fc.double({ min: Tmin, max: Tmax, noNaN: true }), fc.double({ min: Tmin, max: Tmax, noNaN: true }), (a, b) => {
        const cp = g.cp(K(a)).si;
        const cv = g.cv(K(a)).si;
        // strictly increasing wherever the temperatures differ by more than the evaluation's rounding (1e-9 relative)
        const [lo, hi] = a < b ? [a, b] : [b, a];
        const rising = hi - lo <= 1e-9 * hi || g.h(K(lo)).si < g.h(K(hi)).si;
        return cp > cv && cv > 0 && g.k(K(a)) > 1 && rising;
      }),
      { numRuns: 200 },
    );
  });
});

describe('h, u, s and the two enthalpy conventions', () => {
  const co2 = idealGas('CO2', { basis: 'molar' });
  it('h includes the enthalpy of formation; hSensible is zero at 298.15 K', () => {
    expectClose(co2.h('298.15 K').in('kJ/mol'), -393.52, { abs: 0.05 }); // NIST-JANAF C-095, ΔfH°(298.15 K) = −393.522 kJ/mol
    expect(co2.hSensible('298.15 K').si).toBeCloseTo(0, 6);
    expectClose(co2.hSensible('1000 K').si, co2.h('1000 K').si - co2.h('298.15 K').si, { rel: 1e-12 });
  });
  it('u = h − R̄T on a molar basis and h − RT on a mass basis', () => {
    expectClose(co2.u('600 K').si, co2.h('600 K').si - MOLAR_GAS_CONSTANT * 600, { rel: 1e-12 });
    const n2 = idealGas('N2');
    expectClose(n2.u('600 K').si, n2.h('600 K').si - n2.R.si * 600, { rel: 1e-12, abs: 1e-9 });
  });
  it('s(T, p) = s°(T) − R ln(p/p°), p° = 100 kPa; deltaS adds both terms', () => {
    const n2 = idealGas('N2');
    expectClose(n2.s('500 K', '100 kPa').si, n2.sStandard('500 K').si, { rel: 1e-14 });
    expectClose(n2.s('500 K', '1 MPa').si, n2.sStandard('500 K').si - n2.R.si * Math.log(10), { rel: 1e-14 });
    expectClose(n2.deltaS({ T: '300 K', p: '1 bar' }, { T: '600 K', p: '4 bar' }).si, n2.sStandard('600 K').si - n2.sStandard('300 K').si - n2.R.si * Math.log(4), { rel: 1e-12 });
  });
  it('mass and molar bases differ by M', () => {
    const mass = idealGas('CH4');
    const molar = idealGas('CH4', { basis: 'molar' });
    expectClose(molar.cp('700 K').si, mass.cp('700 K').si * mass.M.si, { rel: 1e-12 });
    expect(molar.R.si).toBe(MOLAR_GAS_CONSTANT);
  });
  it('works in US units', () => {
    const air = idealGas('air');
    expectClose(air.cp('80 °F').in('Btu/(lbm·°R)'), 0.2403, { rel: 2e-3 }); // common practice: air cp ≈ 0.240 Btu/(lbm·°R) near room temperature
    expectClose(air.deltaH('540 °R', '1000 °R').in('Btu/lbm'), air.deltaH('300 K', K(1000 / 1.8)).in('Btu/lbm'), { rel: 1e-12 });
  });
});

describe('constant-cp model', () => {
  it('freezes cp at 298.15 K by default, keeps h and s° there, and k = cp/cv', () => {
    const poly = idealGas('N2');
    const cold = idealGas('N2', { model: 'constant-cp' });
    expect(cold.model).toBe('constant-cp');
    expect(cold.cp('1500 K').si).toBe(cold.cp('300 K').si);
    expectClose(cold.cp('900 K').si, poly.cp('298.15 K').si, { rel: 1e-14 });
    expectClose(cold.h('298.15 K').si, poly.h('298.15 K').si, { abs: 1e-9 });
    expectClose(cold.deltaH('300 K', '500 K').si, cold.cp('300 K').si * 200, { rel: 1e-12 });
    expectClose(cold.deltaS({ T: '300 K', p: '1 bar' }, { T: '600 K', p: '1 bar' }).si, cold.cp('300 K').si * Math.log(2), { rel: 1e-12 });
  });
  it('takes a given cp or a reference temperature', () => {
    expectClose(idealGas('air', { cp: '1.005 kJ/(kg·K)' }).k('300 K'), 1.005 / (1.005 - 0.287051), { rel: 1e-5 });
    expectClose(idealGas('air', { model: 'constant-cp', referenceT: '1000 K' }).cp('300 K').si, idealGas('air').cp('1000 K').si, { rel: 1e-14 });
    expectClose(idealGas('air').withConstantCp('600 K').cp('300 K').si, idealGas('air').cp('600 K').si, { rel: 1e-14 });
  });
});

describe('mixtures', () => {
  it('a one-component mixture is that species', () => {
    const m = mixture({ CO2: 1 });
    const g = idealGas('CO2');
    for (const T of [300, 1200]) {
      expectClose(m.cp(K(T)).si, g.cp(K(T)).si, { rel: 1e-14 });
      expectClose(m.s(K(T), '2 bar').si, g.s(K(T), '2 bar').si, { rel: 1e-14 });
    }
  });
  it('includes the ideal entropy of mixing: s_mix = Σ y s_i(T, y_i p) per mole', () => {
    const m = mixture({ N2: 0.79, O2: 0.21 }, { basis: 'molar' });
    const n2 = idealGas('N2', { basis: 'molar' });
    const o2 = idealGas('O2', { basis: 'molar' });
    const p = 300e3;
    const expected = 0.79 * n2.s('400 K', quantity(0.79 * p, 'Pa')).si + 0.21 * o2.s('400 K', quantity(0.21 * p, 'Pa')).si;
    expectClose(m.s('400 K', quantity(p, 'Pa')).si, expected, { rel: 1e-12 });
  });
  it('mole and mass fractions convert both ways', () => {
    const w = moleToMassFractions({ N2: 0.79, O2: 0.21 });
    expectClose(w.N2!, (0.79 * 28.014) / (0.79 * 28.014 + 0.21 * 31.998), { rel: 1e-12 });
    const y = massToMoleFractions(w);
    expectClose(y.N2!, 0.79, { rel: 1e-14 });
    const byMass = mixture(w, { fractions: 'mass' });
    expectClose(byMass.cp('500 K').si, mixture({ N2: 0.79, O2: 0.21 }).cp('500 K').si, { rel: 1e-12 });
  });
  it('dry air as a mixture (JANAF fits) and as a pseudo-species (recalled 7-coefficient set) agree within 0.2 % in cp and h − h(298.15 K)', () => {
    const a = dryAir();
    const b = idealGas('air');
    expectClose(a.M.in('g/mol'), 28.9651, { rel: 1e-4 }); // common practice: M(dry air) ≈ 28.965 g/mol
    for (const T of [250, 300, 600, 1000, 2000, 3000]) {
      expectClose(a.cp(K(T)).si, b.cp(K(T)).si, { rel: 2e-3 });
      expectClose(a.hSensible(K(T)).si, b.hSensible(K(T)).si, { rel: 2e-3, abs: 50 });
    }
  });
  it('fractions that do not sum to 1 throw unless normalised', () => {
    expect(() => mixture({ N2: 0.8, O2: 0.3 })).toThrow(OutOfRangeError);
    expectClose(mixture({ N2: 79, O2: 21 }, { normalize: true }).M.si, mixture({ N2: 0.79, O2: 0.21 }).M.si, { rel: 1e-14 });
    expect(() => mixture({ N2: 1.2, O2: -0.2 })).toThrow(InvalidInputError);
  });
});

describe('bad input', () => {
  it('a temperature outside the data throws and names the interval', () => {
    try {
      idealGas('N2').cp('7000 K');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(OutOfRangeError);
      expect((e as OutOfRangeError).range).toMatchObject({ min: 200, max: 6000, unit: 'K', value: 7000 });
    }
    expect(() => idealGas('H2S').cp('6500 K')).toThrow(/200 to 6000 K/);
  });
  it('extrapolation only on request, and then flagged on the result', () => {
    const q = idealGas('N2', { extrapolate: true }).cp('6500 K');
    expect(q.extrapolated).toBe(true);
    expect(idealGas('N2', { extrapolate: true }).cp('600 K').extrapolated).toBe(false);
    expect(idealGas('N2').cp('600 K').extrapolated).toBe(false);
  });
  it('an unknown species throws with the closest names', () => {
    try {
      idealGas('nitrogn');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(UnknownNameError);
      expect((e as UnknownNameError).suggestions[0]).toBe('nitrogen');
    }
  });
  it('zero or negative pressure throws', () => {
    expect(() => idealGas('N2').s('300 K', '0 Pa')).toThrow(OutOfRangeError);
  });
  it('a pressure passed as a temperature throws', () => {
    // @ts-expect-error a pressure is not a temperature
    expect(() => idealGas('N2').cp('300 kPa')).toThrow(DimensionError);
  });
  it('a bad user definition names the field', () => {
    expect(() => idealGas({ name: 'x', M: '20 g/mol', nasa: { T: { min: 300, mid: 200, max: 1000 }, low: [1, 2, 3, 4, 5, 6, 7], high: [1, 2, 3, 4, 5, 6, 7] } })).toThrow(/nasa\.T/);
    expect(() => idealGas({ name: 'x', M: '20 g/mol', nasa: { T: { min: 200, mid: 1000, max: 3000 }, low: [1, 2, 3], high: [1, 2, 3] } })).toThrow(DefinitionError);
    expect(() => idealGas({ name: 'x', cp: '1 kJ/(kg·K)' } as never)).toThrow(/M: a molar mass M is required/);
    expect(() => idealGas({ name: 'x', formula: 'H2', M: molarMass('H2'), cp: '1 kJ/(kg·K)' })).toThrow(/cp must exceed R/);
  });
  it('a user definition works: constant cp, and NASA constants in either form', () => {
    const g = idealGas({ name: 'test gas', formula: 'N2', M: molarMass('N2'), cp: '1.04 kJ/(kg·K)', T: { min: '250 K', max: '900 K' } });
    expectClose(g.deltaH('300 K', '400 K').in('kJ/kg'), 104, { rel: 1e-12 });
    expect(() => g.cp('950 K')).toThrow(OutOfRangeError);
    const n2 = speciesRecords().find((r) => r.id === 'N2')!;
    const mine = idealGas({ name: 'my N2', formula: 'N2', M: molarMass('N2'), nasa: { T: n2.T, low: n2.low, high: n2.high } });
    expect(mine.cp('700 K').si).toBe(idealGas('N2').cp('700 K').si);
  });
});
