/**
 * Dimension safety of arithmetic and of run-time unit text at compile time. `npm run typecheck`
 * checks this file: every `@ts-expect-error` line must be an error. The same lines run here and
 * throw at run time, for JavaScript callers.
 */
import { describe, expect, expectTypeOf, it } from 'vitest';
import { DimensionError, UnitError } from '../../src/errors.js';
import {
  BaseQuantity,
  DerivedQuantity,
  Quantity,
  quantity,
  readQuantity,
  temperatureDifference,
  type AnyDimension,
  type QuantityInput,
  type QuantityLike,
  type QuantityOf,
} from '../../src/units/index.js';

describe('the compiler knows the dimension of the products engineers write', () => {
  const mdot = quantity('2 kg/s');
  it('massFlow × specificEnergy = power, in either order', () => {
    expectTypeOf(mdot.times(quantity('100 kJ/kg'))).toEqualTypeOf<Quantity<'power'>>();
    expectTypeOf(quantity('100 kJ/kg').times(mdot)).toEqualTypeOf<Quantity<'power'>>();
  });
  it('mass × specificHeat × temperatureDifference = energy; volumeFlow × density = massFlow; power × time = energy', () => {
    expectTypeOf(quantity('1 kg').times(quantity('4.2 kJ/(kg·K)'))).toEqualTypeOf<Quantity<'entropy'>>();
    expectTypeOf(quantity('1 kg').times(quantity('4.2 kJ/(kg·K)')).times(temperatureDifference(10, 'K'))).toEqualTypeOf<Quantity<'energy'>>();
    expectTypeOf(quantity('1 m³/s').times(quantity('1000 kg/m³'))).toEqualTypeOf<Quantity<'massFlow'>>();
    expectTypeOf(quantity('1 kW').times(quantity('1 h'))).toEqualTypeOf<Quantity<'energy'>>();
    expectTypeOf(quantity('1 kPa').times(quantity('1 m³/kg'))).toEqualTypeOf<Quantity<'specificEnergy'>>();
  });
  it('quotients: specificEnergy / specificHeat = temperatureDifference, power / massFlow = specificEnergy, energy / time = power, like / like = dimensionless', () => {
    expectTypeOf(quantity('100 kJ/kg').div(quantity('4.2 kJ/(kg·K)'))).toEqualTypeOf<Quantity<'temperatureDifference'>>();
    expectTypeOf(quantity('100 kW').div(mdot)).toEqualTypeOf<Quantity<'specificEnergy'>>();
    expectTypeOf(quantity('1 kJ').div(quantity('1 s'))).toEqualTypeOf<Quantity<'power'>>();
    expectTypeOf(quantity('1 kPa').div(quantity('1 psi'))).toEqualTypeOf<Quantity<'dimensionless'>>();
    expectTypeOf(quantity('600 K').div(quantity('300 K'))).toEqualTypeOf<Quantity<'dimensionless'>>();
  });
  it('a number or a plain ratio scales: the dimension is kept', () => {
    expectTypeOf(quantity('1 kPa').times(2)).toEqualTypeOf<Quantity<'pressure'>>();
    expectTypeOf(quantity('1 kPa').div(2)).toEqualTypeOf<Quantity<'pressure'>>();
    expectTypeOf(mdot.times(quantity('7 g/kg'))).toEqualTypeOf<Quantity<'massFlow'>>();
  });
  it('a product off the table is typed as any quantity, to be narrowed with as()', () => {
    const q = mdot.times(quantity('4.2 kJ/(kg·K)'));
    expectTypeOf(q).toEqualTypeOf<QuantityOf<AnyDimension>>();
    expectTypeOf(q).toEqualTypeOf<BaseQuantity<AnyDimension>>();
    expect(q).toBeInstanceOf(DerivedQuantity);
    // it still multiplies, converts and narrows
    const heat = q.times(temperatureDifference(5, 'K'));
    expect(heat.as('power').in('kW')).toBeCloseTo(42, 12);
    const P = quantity('2 N').times(quantity('3 m/s'));
    expectTypeOf(P).toEqualTypeOf<Quantity<'power'>>();
  });
  it('temperature arithmetic keeps its rules', () => {
    const T = quantity('300 °F');
    expectTypeOf(T.minus(quantity('50 °F'))).toEqualTypeOf<Quantity<'temperatureDifference'>>();
    expectTypeOf(T.minus(temperatureDifference(5, 'K'))).toEqualTypeOf<Quantity<'temperature'>>();
    expectTypeOf(T.plus(temperatureDifference(5, 'K'))).toEqualTypeOf<Quantity<'temperature'>>();
    expectTypeOf(T.times(quantity('1 kJ/(kg·K)'))).toEqualTypeOf<Quantity<'specificEnergy'>>();
    // @ts-expect-error two temperatures cannot be added
    expect(() => T.plus(T)).toThrow(DimensionError);
    // @ts-expect-error scaling an absolute temperature depends on the scale
    expect(() => T.times(2)).toThrow(DimensionError);
    // @ts-expect-error nor by a plain-number quantity
    expect(() => T.times(quantity('2 1'))).toThrow(DimensionError);
    // @ts-expect-error a temperature difference minus a temperature has no meaning
    expect(() => temperatureDifference(5, 'K').minus(T)).toThrow(DimensionError);
    expect(() => T.negate()).toThrow(DimensionError); // refused at run time only (see Quantity docs)
  });
  it('comparisons take the same dimension', () => {
    const p = quantity('1 atm');
    expect(p.lt('14.7 psia')).toBe(true);
    // @ts-expect-error a temperature is not comparable with a pressure
    expect(() => p.lt('300 K')).toThrow(DimensionError);
    // @ts-expect-error nor a pressure quantity with a temperature one
    expect(() => p.eq(quantity('300 K'))).toThrow(DimensionError);
  });
});

describe('assignability', () => {
  it('every quantity is a BaseQuantity<AnyDimension>; a Quantity<D> is a Quantity', () => {
    const T: BaseQuantity<AnyDimension> = quantity('300 K');
    const p: BaseQuantity<AnyDimension> = quantity('1 kPa');
    const any: Quantity = quantity('300 K');
    const base: BaseQuantity<AnyDimension> = any;
    const derived: BaseQuantity<AnyDimension> = quantity('2 kg/s').times(quantity('4.2 kJ/(kg·K)'));
    expect([T, p, base, derived].every((q) => q instanceof BaseQuantity)).toBe(true);
    // @ts-expect-error a derived quantity is not a named one
    const named: Quantity = derived;
    expect(named).toBeInstanceOf(DerivedQuantity);
    // @ts-expect-error a pressure is not a temperature
    const wrong: Quantity<'temperature'> = p;
    expect(wrong.dimension).toBe('pressure');
  });
});

describe('units shared by two dimensions', () => {
  it('a known spelling reads as the first-listed dimension; QuantityLike of the second accepts it', () => {
    expectTypeOf(quantity(1, 'J/(kg·K)')).toEqualTypeOf<Quantity<'specificHeat'>>();
    expectTypeOf(quantity(1, 'm²/s')).toEqualTypeOf<Quantity<'kinematicViscosity'>>();
    expectTypeOf(quantity(1, 'cSt')).toEqualTypeOf<Quantity<'kinematicViscosity'>>();
    expectTypeOf(quantity(1, 'g/kg')).toEqualTypeOf<Quantity<'humidityRatio'>>();
    const s: QuantityLike<'specificEntropy'> = '6 kJ/(kg·K)';
    const alpha: QuantityLike<'thermalDiffusivity'> = '1.4e-7 m²/s';
    expect(readQuantity(s, 'specificEntropy', 's')).toBe(6000);
    expect(readQuantity(alpha, 'thermalDiffusivity', 'alpha')).toBe(1.4e-7);
    // @ts-expect-error cSt is a unit of kinematic viscosity only
    const wrong: QuantityLike<'thermalDiffusivity'> = '1 cSt';
    expect(readQuantity(wrong, 'thermalDiffusivity', 'alpha')).toBe(1e-6); // same shape: accepted at run time
  });
  it('a Quantity of one dimension is not the other: narrow with as()', () => {
    const cp = quantity('4.2 kJ/(kg·K)');
    // @ts-expect-error a specific heat is not a specific entropy
    expect(() => readQuantity(cp, 'specificEntropy', 's')).toThrow(DimensionError);
    expect(readQuantity(cp.as('specificEntropy'), 'specificEntropy', 's')).toBe(4200);
  });
});

describe('run-time unit text: plain strings are accepted, literals are still checked', () => {
  const n = 300;
  const fromAForm: string = '300 K';
  it('quantity(`${n} °F`) has the dimension of its unit; a plain string gives a quantity to narrow', () => {
    expectTypeOf(quantity(`${n} °F`)).toEqualTypeOf<Quantity<'temperature'>>();
    expectTypeOf(quantity(fromAForm)).toEqualTypeOf<Quantity>();
    const unit: string = 'psia';
    expectTypeOf(quantity(5, unit)).toEqualTypeOf<Quantity>();
  });
  it('readQuantity takes a plain string (checked at run time) and refuses a wrong literal at compile time', () => {
    expect(readQuantity(fromAForm, 'temperature', 'T')).toBe(300);
    expect(readQuantity(`${n} K`, 'temperature', 'T')).toBe(300);
    const wrongAtRunTime: string = '300 psia';
    expect(() => readQuantity(wrongAtRunTime, 'temperature', 'T')).toThrow(DimensionError);
    // @ts-expect-error literal text of another dimension
    expect(() => readQuantity('300 psia', 'temperature', 'T')).toThrow(DimensionError);
    // @ts-expect-error a quantity of another dimension
    expect(() => readQuantity(quantity('1 kPa'), 'temperature', 'T')).toThrow(DimensionError);
  });
  it('QuantityInput: the pattern for a facade function that takes run-time text too', () => {
    function boilingMargin<I extends QuantityLike<'temperature'> | string>(T: QuantityInput<'temperature', I>): number {
      return 373.15 - readQuantity(T, 'temperature', 'T');
    }
    expect(boilingMargin('300 K')).toBeCloseTo(73.15, 12);
    expect(boilingMargin(fromAForm)).toBeCloseTo(73.15, 12);
    expect(boilingMargin(quantity('300 K'))).toBeCloseTo(73.15, 12);
    // @ts-expect-error literal text of another dimension
    expect(() => boilingMargin('500 psia')).toThrow(DimensionError);
    // @ts-expect-error a quantity of another dimension
    expect(() => boilingMargin(quantity('500 psia'))).toThrow(DimensionError);
    const junk: string = '500 furlongs';
    expect(() => boilingMargin(junk)).toThrow(UnitError);
  });
  it('temperatureDifference takes a plain string unit too; a literal must be a temperature unit', () => {
    const unit: string = '°F';
    expect(temperatureDifference(9, unit).in('ΔK')).toBe(5);
    // @ts-expect-error psia is not a temperature unit
    expect(() => temperatureDifference(9, 'psia')).toThrow(DimensionError);
    // @ts-expect-error nor is an unknown literal
    expect(() => temperatureDifference(9, 'furlong')).toThrow(UnitError);
  });
  it('in() and to() take any string (checked at run time), as before', () => {
    const unit: string = 'kPa';
    expect(quantity('1 bar').in(unit)).toBe(100);
    const u: Quantity<'pressure'> | Quantity<'temperature'> = quantity('1 bar');
    expect(u.in('bar')).toBe(1);
  });
});
