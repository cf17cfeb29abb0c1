/**
 * Dimension safety at compile time. `npm run typecheck` (tsc) checks this file: every
 * `@ts-expect-error` line must be an error, or tsc fails. The same lines also run here and
 * throw at run time, for JavaScript callers.
 */
import { describe, expect, expectTypeOf, it } from 'vitest';
import { DimensionError } from '../../src/errors.js';
import { incompressible } from '../../src/incompressible/index.js';
import { Quantity, quantity, readQuantity, temperatureDifference, type QuantityLike } from '../../src/units/index.js';

function boilingMargin(T: QuantityLike<'temperature'>): number {
  return 373.15 - readQuantity(T, 'temperature', 'T');
}

describe('dimensions the compiler checks', () => {
  it('infers the dimension from a known unit or unit text', () => {
    expectTypeOf(quantity(500, 'psia')).toEqualTypeOf<Quantity<'pressure'>>();
    expectTypeOf(quantity('300 °F')).toEqualTypeOf<Quantity<'temperature'>>();
    expectTypeOf(quantity('50 Δ°F')).toEqualTypeOf<Quantity<'temperatureDifference'>>();
    expectTypeOf(quantity('2.5 kJ/(kg·K)')).toEqualTypeOf<Quantity<'specificHeat'>>();
    expectTypeOf(temperatureDifference(5, 'K')).toEqualTypeOf<Quantity<'temperatureDifference'>>();
  });

  it('a pressure passed as a temperature does not compile, and throws at run time', () => {
    // @ts-expect-error a pressure is not a temperature
    expect(() => boilingMargin(quantity(500, 'psia'))).toThrow(DimensionError);
    // @ts-expect-error unit text of the wrong dimension
    expect(() => boilingMargin('500 psia')).toThrow(DimensionError);
    expect(boilingMargin('300 K')).toBeCloseTo(73.15, 12);
  });

  it('a temperature difference is not a temperature', () => {
    // @ts-expect-error a 50 °F rise is not the temperature 50 °F
    expect(() => boilingMargin(temperatureDifference(50, '°F'))).toThrow(DimensionError);
  });

  it('the incompressible facade takes only temperatures and pressures where it says so', () => {
    const copper = incompressible('copper');
    // @ts-expect-error a pressure passed as a temperature
    expect(() => copper.c(quantity(500, 'psia'))).toThrow(DimensionError);
    // @ts-expect-error a temperature passed as a pressure
    expect(() => copper.deltaH({ T: '300 K', p: '300 K' }, { T: '300 K', p: '1 bar' })).toThrow(DimensionError);
    expectTypeOf(copper.deltaU('300 K', '400 K')).toEqualTypeOf<Quantity<'specificEnergy'>>();
  });

  it('a quantity of run-time unit text must be narrowed before use', () => {
    const unit: string = 'K';
    const q = quantity(300, unit);
    // @ts-expect-error the dimension of run-time text is unknown to the compiler
    expect(boilingMargin(q)).toBeCloseTo(73.15, 12);
    expect(boilingMargin(q.as('temperature'))).toBeCloseTo(73.15, 12);
  });
});
