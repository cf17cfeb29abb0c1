import { describe, expect, it } from 'vitest';
import { DimensionError, InvalidInputError, OutOfRangeError, ResultError, UnitError } from '../../src/errors.js';
import { Quantity, quantity, readQuantity, temperatureDifference } from '../../src/units/index.js';
import { expectClose } from '../helpers/tolerance.js';

describe('quantity()', () => {
  it('reads "500 psia" and converts to kPa (psi factor: NIST SP 811 B.8)', () => {
    expectClose(quantity('500 psia').in('kPa'), 3447.378646584181, { rel: 1e-15 });
  });
  it('reads the forms engineers write: "300 °F", "300 degF", "2.5 kJ/(kg·K)", "2.5 kJ/kg/K", "14.7 psig"', () => {
    expectClose(quantity('300 °F').in('K'), 422.0388888888889, { rel: 1e-15 });
    expect(quantity('300 degF').si).toBe(quantity('300 °F').si);
    expect(quantity('2.5 kJ/(kg·K)').si).toBe(2500);
    expect(quantity('2.5 kJ/kg/K').si).toBe(2500);
    expect(quantity('14.7 psig').dimension).toBe('pressure');
  });
  it('keeps the value as given, so reading it back in its own unit is exact', () => {
    const q = quantity(0.1, '°F');
    expect(q.in('°F')).toBe(0.1);
    expect(q.value).toBe(0.1);
    expect(q.unit).toBe('°F');
  });
});

describe('temperature and temperature difference are distinct (common practice)', () => {
  it('50 °F is 283.15 K', () => {
    expectClose(quantity(50, '°F').in('K'), 283.15, { abs: 1e-12 });
  });
  it('a 50 °F difference is 27.777… K', () => {
    expectClose(temperatureDifference(50, '°F').in('K'), 250 / 9, { rel: 1e-15 });
    expectClose(quantity(50, 'Δ°F').in('ΔK'), 250 / 9, { rel: 1e-15 });
    expectClose(quantity('50 delta degF').in('ΔK'), 250 / 9, { rel: 1e-15 });
  });
  it('temperature minus temperature is a difference; temperature plus a difference is a temperature', () => {
    const rise = quantity(80, '°F').minus(quantity(50, '°F'));
    expect(rise.dimension).toBe('temperatureDifference');
    expectClose(rise.in('Δ°F'), 30, { abs: 1e-12 });
    const t = quantity(20, '°C').plus(temperatureDifference(10, 'K'));
    expect(t.dimension).toBe('temperature');
    expectClose(t.in('°C'), 30, { abs: 1e-12 });
  });
  it('adding two temperatures throws DimensionError', () => {
    // @ts-expect-error a temperature cannot be added to a temperature
    expect(() => quantity(20, '°C').plus(quantity(10, '°C'))).toThrow(DimensionError);
  });
  it('a temperature below absolute zero throws OutOfRangeError with the range as data', () => {
    try {
      quantity(-500, '°F');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(OutOfRangeError);
      const r = (e as OutOfRangeError).range;
      expect(r.min).toBe(0);
      expect(r.unit).toBe('K');
      expect((e as Error).message).toContain('Δ°F');
    }
  });
});

describe('gauge pressure needs an ambient pressure', () => {
  it('defaults to the standard atmosphere, 101 325 Pa (NIST SP 811 B.8, exact)', () => {
    expect(quantity(0, 'psig').si).toBe(101325);
    expectClose(quantity('14.7 psig').in('psia'), 14.7 + 101325 / 6894.757293168361, { rel: 1e-15 });
  });
  it('takes another ambient pressure when given (a plant at altitude)', () => {
    const p = quantity(30, 'psig', { ambient: '12.2 psia' });
    expectClose(p.in('psia'), 42.2, { rel: 1e-15 });
    expectClose(p.in('psig'), 30, { rel: 1e-15 });
    expectClose(p.in('psig', { ambient: '14.7 psia' }), 27.5, { rel: 1e-14 });
  });
  it('a gauge pressure below vacuum throws', () => {
    expect(() => quantity(-20, 'psig')).toThrow(OutOfRangeError);
  });
});

describe('bad input never yields NaN', () => {
  it.each([NaN, Infinity, -Infinity])('quantity(%s, "K") throws InvalidInputError', (v) => {
    expect(() => quantity(v, 'K')).toThrow(InvalidInputError);
  });
  it('an unknown unit throws UnitError with code unit.unknown', () => {
    expect(() => quantity(1, 'furlong')).toThrow(UnitError);
    try {
      quantity(1, 'furlong');
    } catch (e) {
      expect((e as UnitError).code).toBe('unit.unknown');
      expect((e as UnitError).unit).toBe('furlong');
    }
  });
  it('text without a number throws UnitError', () => {
    expect(() => quantity('psia')).toThrow(UnitError);
  });
  it('converting to a unit of another dimension throws DimensionError', () => {
    expect(() => quantity(1, 'kPa').in('K')).toThrow(DimensionError);
  });
  it('readQuantity refuses a bare number, since its unit would be a guess', () => {
    expect(() => readQuantity(300 as never, 'temperature', 'T')).toThrow(/has no unit/);
  });
  it('readQuantity names the parameter when the dimension is wrong', () => {
    try {
      readQuantity('500 psia' as never, 'temperature', 'T');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(DimensionError);
      expect((e as DimensionError).parameter).toBe('T');
      expect((e as Error).message).toMatch(/^T must be a temperature; got 500 psia \(a pressure\)/);
    }
  });
  it('as() narrows a run-time quantity or throws', () => {
    const unitFromConfig: string = 'kPa';
    const q = quantity(101.325, unitFromConfig);
    expect(q.as('pressure').in('atm')).toBeCloseTo(1, 14);
    expect(() => q.as('temperature')).toThrow(DimensionError);
  });
});

describe('Quantity', () => {
  it('to() keeps the SI value and changes the unit', () => {
    const q = quantity(1, 'Btu/lbm').to('kJ/kg');
    expect(q.value).toBe(2.326);
    expect(q.si).toBe(2326);
    expect(q.toString()).toBe('2.326 kJ/kg');
  });
  it('fromSI wraps SI core results', () => {
    expect(Quantity.fromSI(2500, 'specificHeat').toString()).toBe('2500 J/(kg·K)');
    expect(Quantity.fromSI(2500, 'specificHeat', 'kJ/(kg·K)').value).toBe(2.5);
    expect(() => Quantity.fromSI(NaN, 'pressure')).toThrow(ResultError);
  });
  it('serialises to JSON as value, unit and dimension', () => {
    expect(JSON.stringify(quantity(3, 'bar'))).toBe('{"value":3,"unit":"bar","dimension":"pressure"}');
  });
});
