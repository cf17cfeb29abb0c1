/**
 * Quantity arithmetic and comparisons. Expected values are arithmetic identities on the exact SP 811
 * factors (1 Btu_IT/lbm = 2.326 kJ/kg, 1 TR = 12 000 Btu_IT/h, 1 °F = 5/9 K) or plain products computed
 * by hand; the heat-balance examples use the IT calorie's 4.1868 kJ/(kg·K) (SP 811 B.8, exact) as cp.
 */
import { describe, expect, it } from 'vitest';
import { DimensionError, InvalidInputError, ResultError, OutOfRangeError } from '../../src/errors.js';
import { DIMENSIONS, DerivedQuantity, PRODUCTS, QUOTIENTS, Quantity, quantity, temperatureDifference, type Dimension } from '../../src/units/index.js';
import { productDimension, quotientDimension } from '../../src/units/arithmetic.js';
import { expectClose } from '../helpers/tolerance.js';

const dims = Object.keys(DIMENSIONS) as Dimension[];
const add = (a: readonly number[], b: readonly number[], s: number) => a.map((x, i) => x + s * b[i]!);

describe('the product and quotient tables', () => {
  it('every PRODUCTS entry has the exponents of its factors added (the table cannot lie)', () => {
    for (const [key, result] of Object.entries(PRODUCTS)) {
      const [a, b] = key.split('*') as [Dimension, Dimension];
      expect(add(DIMENSIONS[a], DIMENSIONS[b], 1), key).toEqual([...DIMENSIONS[result]]);
    }
  });
  it('every QUOTIENTS entry has the exponents subtracted', () => {
    for (const [key, result] of Object.entries(QUOTIENTS)) {
      const [a, b] = key.split('/') as [Dimension, Dimension];
      expect(add(DIMENSIONS[a], DIMENSIONS[b], -1), key).toEqual([...DIMENSIONS[result]]);
    }
  });
  it('for every pair of named dimensions, the run-time result has the right exponents', () => {
    for (const a of dims) {
      for (const b of dims) {
        for (const [op, sign] of [[productDimension, 1], [quotientDimension, -1]] as const) {
          const [d, v] = op(a, DIMENSIONS[a], b, DIMENSIONS[b]);
          const scalarB = b === 'dimensionless' || b === 'humidityRatio';
          const expected = scalarB ? [...DIMENSIONS[a]] : sign === -1 && a === b ? [0, 0, 0, 0, 0] : add(DIMENSIONS[a], DIMENSIONS[b], sign);
          if (!(sign === 1 && (a === 'dimensionless' || a === 'humidityRatio') && !scalarB)) expect(v, `${a} ${sign === 1 ? '×' : '/'} ${b}`).toEqual(expected);
          if (d !== 'derived') expect([...DIMENSIONS[d]], `${a} ${sign === 1 ? '×' : '/'} ${b} → ${d}`).toEqual([...v]);
        }
      }
    }
  });
});

describe('products engineers write have the dimension the compiler says', () => {
  it('massFlow × specificEnergy = power: 2 kg/s × 100 kJ/kg = 200 kW', () => {
    const P = quantity('2 kg/s').times(quantity('100 kJ/kg'));
    expect(P).toBeInstanceOf(Quantity);
    expect(P.dimension).toBe('power');
    expect(P.in('kW')).toBe(200);
    expect(P.unit).toBe('W');
  });
  it('volumeFlow × density = massFlow: 1 m³/s × 1000 kg/m³ = 1000 kg/s', () => {
    expect(quantity('1 m³/s').times(quantity('1000 kg/m³')).in('kg/s')).toBe(1000);
  });
  it('power × time = energy: 1 kW × 1 h = 1 kWh (SP 811: 1 kWh = 3.6 MJ exact)', () => {
    const E = quantity('1 kW').times(quantity('1 h'));
    expect(E.dimension).toBe('energy');
    expect(E.in('MJ')).toBe(3.6);
  });
  it('mass × specificHeat × temperatureDifference = energy: 1 kg × 4.1868 kJ/(kg·K) × 10 K = 41.868 kJ', () => {
    const C = quantity('1 kg').times(quantity('4.1868 kJ/(kg·K)'));
    expect(C.dimension).toBe('entropy'); // a heat capacity, J/K
    const Q = C.times(temperatureDifference(10, 'K'));
    expect(Q.dimension).toBe('energy');
    expectClose(Q.in('kJ'), 41.868, { rel: 1e-15 });
  });
  it('1 lbm × 1 Btu/(lbm·°F) × 1 Δ°F = 1 Btu (SP 811 B.8 exact factors)', () => {
    const Q = quantity('1 lbm').times(quantity('1 Btu/(lbm·°F)')).times(quantity('1 Δ°F'));
    expectClose(Q.in('Btu'), 1, { rel: 4e-16 });
  });
  it('pressure × specificVolume = specificEnergy: 100 kPa × 0.5 m³/kg = 50 kJ/kg', () => {
    expect(quantity('100 kPa').times(quantity('0.5 m³/kg')).in('kJ/kg')).toBe(50);
  });
  it('specificEnergy / specificHeat = temperatureDifference: 41.868 kJ/kg / 4.1868 kJ/(kg·K) = 10 K', () => {
    const dT = quantity('41.868 kJ/kg').div(quantity('4.1868 kJ/(kg·K)'));
    expect(dT.dimension).toBe('temperatureDifference');
    expectClose(dT.in('ΔK'), 10, { rel: 1e-15 });
    expectClose(dT.in('Δ°F'), 18, { rel: 1e-15 });
  });
  it('power / massFlow = specificEnergy; energy / time = power', () => {
    expect(quantity('200 kW').div(quantity('2 kg/s')).in('kJ/kg')).toBe(100);
    expect(quantity('3.6 MJ').div(quantity('1 h')).in('kW')).toBe(1);
  });
  it('a ton of refrigeration over an hour is 12 000 Btu (SP 811: 1 TR = 12 000 Btu_IT/h)', () => {
    expectClose(quantity('1 TR').times(quantity('1 h')).in('Btu'), 12000, { rel: 4e-16 });
  });
  it('R·T/p = v: 0.287 kJ/(kg·K) × 300 K / 100 kPa = 0.861 m³/kg (an absolute temperature enters as kelvins)', () => {
    const v = quantity('0.287 kJ/(kg·K)').times(quantity('300 K')).div(quantity('100 kPa'));
    expect(v.dimension).toBe('specificVolume');
    expectClose(v.in('m³/kg'), 0.861, { rel: 1e-15 });
  });
  it('T2/T1 is a plain number in kelvins: 80 °F / 40 °F = 539.67/499.67', () => {
    const r = quantity('80 °F').div(quantity('40 °F'));
    expect(r.dimension).toBe('dimensionless');
    expectClose(r.in('1'), 539.67 / 499.67, { rel: 1e-15 });
  });
  it('a humidity ratio scales a mass flow: 10 kg/s of dry air × 7 g/kg = 0.07 kg/s of water', () => {
    const w = quantity('10 kg/s').times(quantity('7 g/kg'));
    expect(w.dimension).toBe('massFlow');
    expectClose(w.in('kg/s'), 0.07, { rel: 1e-15 });
  });
  it('nu/alpha is a plain number (a Prandtl number)', () => {
    const Pr = quantity(1.5e-5, 'm²/s').div(quantity(2.1e-5, 'm²/s').as('thermalDiffusivity'));
    expect(Pr.dimension).toBe('dimensionless');
    expectClose(Pr.in('1'), 1.5 / 2.1, { rel: 1e-15 });
  });
});

describe('products heatstate does not name', () => {
  it('massFlow × specificHeat is a derived quantity (a thermal conductance) that reports its SI unit and converts', () => {
    const UA = quantity('2 kg/s').times(quantity('4.2 kJ/(kg·K)'));
    expect(UA).toBeInstanceOf(DerivedQuantity);
    expect(UA.dimension).toBe('derived');
    expect(UA.unit).toBe('kg·m²/(s³·K)');
    expectClose(UA.in('kW/K'), 8.4, { rel: 1e-15 });
    expectClose(UA.in('W/K'), 8400, { rel: 1e-15 });
    // 1 Btu/(h·°F) = 1055.055 852 62 J / 3600 s / (5/9 K) (SP 811 B.8 exact)
    expectClose(UA.in('Btu/(h·°F)'), 8400 / (1055.05585262 / 3600 / (5 / 9)), { rel: 1e-15 });
  });
  it('converting a derived quantity to a unit of another shape throws DimensionError', () => {
    expect(() => quantity('2 kg/s').times(quantity('4.2 kJ/(kg·K)')).in('kW')).toThrow(DimensionError);
  });
  it('a derived quantity times a temperature difference is a named dimension again: UA × ΔT = power', () => {
    const q = quantity('2 kg/s').times(quantity('4.2 kJ/(kg·K)')).times(temperatureDifference(5, 'K'));
    expect(q.dimension).toBe('power');
    expectClose(q.as('power').in('kW'), 42, { rel: 1e-15 });
  });
  it('a product of exponents that match a named dimension is that dimension even off the table: length × force… (N·m = J)', () => {
    const q = quantity('2 N').times(quantity('3 m'));
    expect(q.dimension).toBe('energy');
    expect(q.as('energy').in('J')).toBe(6);
  });
  it('a bare temperature shape from arithmetic is a difference, never an absolute temperature', () => {
    const q = quantity('10 kJ').div(quantity('2 kJ/K'));
    expect(q.dimension).toBe('temperatureDifference');
    expect(q.as('temperatureDifference').in('ΔK')).toBe(5);
  });
  it('derived quantities add when their shapes match, and refuse when they do not', () => {
    const a = quantity('2 kg/s').times(quantity('4.2 kJ/(kg·K)')) as DerivedQuantity;
    const b = quantity('1 kg/s').times(quantity('4.2 kJ/(kg·K)')) as DerivedQuantity;
    expectClose(a.plus(b).in('kW/K'), 12.6, { rel: 1e-15 });
    const c = quantity('1 m').times(quantity('1 kg/s')) as DerivedQuantity;
    expect(() => a.plus(c)).toThrow(DimensionError);
  });
});

describe('plus and minus keep value exact in a common unit', () => {
  it('300 °F − 50 °F is exactly 250 Δ°F', () => {
    const d = quantity('300 °F').minus(quantity('50 °F'));
    expect(d.dimension).toBe('temperatureDifference');
    expect(d.in('Δ°F')).toBe(250);
    expect(d.value).toBe(250);
    expect(d.unit).toBe('Δ°F');
    expect(d.in('ΔK')).toBe(250 * (5 / 9));
  });
  it('300 °F + 50 Δ°F is exactly 350 °F; a Δ°R has the same size as a Δ°F', () => {
    expect(quantity('300 °F').plus(quantity('50 Δ°F')).value).toBe(350);
    expect(quantity('300 °F').plus(temperatureDifference(50, '°R')).value).toBe(350);
    expect(quantity('300 °F').minus(temperatureDifference(50, 'Δ°F')).value).toBe(250);
  });
  it('0.1 + 0.2 in one unit is the double sum, held in that unit', () => {
    const q = quantity(0.1, 'MPa').plus(quantity(0.2, 'MPa'));
    expect(q.value).toBe(0.1 + 0.2);
    expect(q.unit).toBe('MPa');
  });
  it('units of different size go through SI and are held in the first unit', () => {
    const q = quantity('1 bar').plus(quantity('50 kPa'));
    expect(q.unit).toBe('bar');
    expectClose(q.value, 1.5, { rel: 1e-15 });
    const d = quantity('300 °F').minus(quantity('100 °C'));
    expect(d.unit).toBe('Δ°F');
    expectClose(d.value, 88, { rel: 1e-13 });
  });
  it('two temperatures cannot be added; a temperature below absolute zero is refused', () => {
    expect(() => quantity('20 °C').plus(quantity('10 °C') as never)).toThrow(DimensionError);
    expect(() => quantity('10 K').minus(temperatureDifference(20, 'K'))).toThrow(OutOfRangeError);
  });
  it('quantities of different dimensions cannot be added', () => {
    expect(() => quantity('1 kPa').plus(quantity('1 K') as never)).toThrow(DimensionError);
    expect(() => quantity('1 kJ/(kg·K)').plus(quantity('1 kJ/(kg·K)').as('specificEntropy') as never)).toThrow(DimensionError);
  });
  it('the extrapolated flag carries through arithmetic', () => {
    const a = Quantity.fromSI(1000, 'specificEnergy', undefined, true);
    expect(a.plus(quantity('1 kJ/kg')).extrapolated).toBe(true);
    expect(quantity('1 kg/s').times(a).extrapolated).toBe(true);
    expect(quantity('1 kg/s').times(quantity('1 kJ/kg')).extrapolated).toBe(false);
  });
});

describe('scaling, sign and magnitude', () => {
  it('times and div by a number keep the unit and an exact value', () => {
    expect(quantity('10 Δ°F').times(3).toString()).toBe('30 Δ°F');
    expect(quantity('7 psia').div(2).toString()).toBe('3.5 psia');
  });
  it('a gauge pressure scales as an absolute pressure: 2 × (10 psig) is 2 × 24.696 psia', () => {
    expectClose(quantity('10 psig').times(2).in('psia'), 2 * (10 + 101325 / 6894.757293168362), { rel: 1e-15 });
  });
  it('an absolute temperature is not scaled, negated or made absolute', () => {
    expect(() => (quantity('300 K') as unknown as Quantity<'pressure'>).times(2)).toThrow(DimensionError);
    expect(() => (quantity('300 K') as unknown as Quantity<'pressure'>).div(2)).toThrow(DimensionError);
    expect(() => quantity('300 K').times(quantity('2 1') as never)).toThrow(DimensionError);
    expect(() => quantity('2 1').times(quantity('300 K') as never)).toThrow(DimensionError);
    expect(() => quantity('300 K').negate()).toThrow(DimensionError);
    expect(() => quantity('300 K').abs()).toThrow(DimensionError);
  });
  it('negate and abs of a difference keep the unit', () => {
    expect(quantity('-3 Δ°F').abs().toString()).toBe('3 Δ°F');
    expect(quantity('3 Δ°F').negate().toString()).toBe('-3 Δ°F');
  });
  it('dividing by zero and overflowing throw typed errors, never Infinity', () => {
    expect(() => quantity('3 kW').div(0)).toThrow(InvalidInputError);
    expect(() => quantity('3 kW').div(quantity('0 kg/s'))).toThrow(InvalidInputError);
    try {
      quantity('1e300 MPa').times(quantity('1e300 m³/kg'));
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(ResultError);
      expect((e as ResultError).code).toBe('result.not-finite');
    }
    expect(() => quantity('1e300 Pa').times(1e10)).toThrow(ResultError);
  });
});

describe('comparisons', () => {
  it('compare, lt, le, gt, ge: 1 atm is 14.695 95 psia (SP 811 B.8), below 14.7 psia', () => {
    const atm = quantity('1 atm');
    expect(atm.compare('14.7 psia')).toBe(-1);
    expect(atm.lt('14.7 psia')).toBe(true);
    expect(atm.le(quantity('101.325 kPa'))).toBe(true);
    expect(atm.ge(quantity('101.325 kPa'))).toBe(true);
    expect(atm.gt('14.69 psia')).toBe(true);
    expect(atm.eq(quantity('101.325 kPa'))).toBe(true);
  });
  it('eq with a tolerance: relative, or absolute in the same dimension (a difference for temperatures)', () => {
    expect(quantity('1 atm').eq('14.7 psia')).toBe(false);
    expect(quantity('1 atm').eq('14.7 psia', { rel: 1e-3 })).toBe(true);
    expect(quantity('1 atm').eq('14.7 psia', { abs: '0.01 psi' })).toBe(true);
    expect(quantity('1 atm').eq('14.7 psia', { abs: '0.001 psi' })).toBe(false);
    expect(quantity('212 °F').eq('100.01 °C', { abs: '0.02 Δ°C' })).toBe(true);
  });
  it('gauge pressures with different ambient pressures compare as absolute pressures', () => {
    const high = quantity(10, 'psig');
    const low = quantity(10, 'psig', { ambient: '12.2 psia' });
    expect(low.lt(high)).toBe(true);
    expect(high.eq(low)).toBe(false);
  });
  it('same-unit comparison is by value, exactly', () => {
    expect(quantity(0.1, '°F').eq(quantity(0.1, '°F'))).toBe(true);
    expect(quantity(0.1, '°F').lt(quantity(0.1000000000000001, '°F'))).toBe(true);
  });
  it('comparing different dimensions throws DimensionError; bad tolerances throw InvalidInputError', () => {
    expect(() => quantity('1 atm').lt('300 K' as never)).toThrow(DimensionError);
    expect(() => quantity('300 K').lt(temperatureDifference(1, 'K') as never)).toThrow(DimensionError);
    expect(() => quantity('1 atm').eq('1 atm', { rel: -1 })).toThrow(InvalidInputError);
    expect(() => quantity('1 atm').eq('1 atm', { abs: 5 as never })).toThrow(InvalidInputError);
    expect(() => quantity('1 atm').lt(null as never)).toThrow(InvalidInputError);
  });
});
