/**
 * Run-time unit text in the facades (issue 11 item 4): a plain `string` (text known only at run
 * time) compiles everywhere a quantity is taken and is checked when read, while string literals keep
 * their compile-time dimension check. The `@ts-expect-error` lines are checked by `npm run typecheck`.
 */
import { describe, expect, expectTypeOf, it } from 'vitest';
import { DimensionError } from '../../src/errors.js';
import { compressor, idealGas, isentropicEnd } from '../../src/ideal-gas/index.js';
import { incompressible } from '../../src/incompressible/index.js';
import type { Quantity } from '../../src/units/index.js';
import { water } from '../../src/water/index.js';

/** Text as it arrives from a form, a file or an environment variable: its type is `string`. */
const fromForm = (text: string): string => text;

describe('a run-time string compiles and is read at run time', () => {
  it('water.state, saturation, deltaH and transport', () => {
    const T = fromForm('500 °C');
    const p = fromForm('10 MPa');
    expect(water.state({ T, p }).h.in('kJ/kg')).toBeCloseTo(3375.06, 2);
    expect(water.saturation({ p: fromForm('1 atm') }).T.in('°C')).toBeCloseTo(99.97, 2);
    expect(water.deltaH({ T, p }, { p: fromForm('10 kPa'), x: 0.9 }).in('kJ/kg')).toBeLessThan(0);
    expect(water.viscosity({ T: fromForm('25 °C'), rho: fromForm('997 kg/m³') }).in('mPa·s')).toBeCloseTo(0.89, 2);
    expect(() => water.state({ T: fromForm('5 bar'), p })).toThrow(DimensionError);
  });
  it('ideal gases: property functions, state, differences and processes', () => {
    const air = idealGas('air');
    const T = fromForm('300 K');
    expect(air.cp(T).in('kJ/(kg·K)')).toBeCloseTo(1.0049, 3);
    expect(air.state({ h: fromForm('300 kJ/kg'), p: fromForm('1 bar') }).T.si).toBeGreaterThan(0);
    expect(air.deltaH(T, fromForm('400 K')).si).toBeGreaterThan(0);
    expect(compressor(air, { T1: T, p1: fromForm('100 kPa'), p2: fromForm('800 kPa'), efficiency: 0.85 }).work.si).toBeGreaterThan(0);
    expect(isentropicEnd(air, { T1: T, p1: '100 kPa', p2: fromForm('800 kPa') }).T2.si).toBeGreaterThan(T.length);
    expect(() => air.cp(fromForm('1 bar'))).toThrow(DimensionError);
  });
  it('incompressible substances', () => {
    const copper = incompressible('copper');
    expect(copper.deltaU(fromForm('20 °C'), fromForm('120 °C')).si).toBeGreaterThan(0);
    expect(copper.state({ T: fromForm('300 K'), p: fromForm('1 atm') }).c.si).toBeGreaterThan(0);
  });
  it('result types stay exact', () => {
    expectTypeOf(water.state({ T: fromForm('300 K'), p: '1 MPa' }).s).toEqualTypeOf<Quantity<'specificEntropy'>>();
    expectTypeOf(idealGas('N2').cp('300 K')).toEqualTypeOf<Quantity<'specificHeat'>>();
  });
});

describe('literals keep their compile-time check (run time refuses them too)', () => {
  it('a literal of the wrong dimension does not compile', () => {
    // @ts-expect-error a pressure literal is not a temperature
    expect(() => water.state({ T: '5 bar', p: '1 MPa' })).toThrow(DimensionError);
    // @ts-expect-error an energy literal is not a density
    expect(() => water.viscosity({ T: '300 K', rho: '1 kJ/kg' })).toThrow(DimensionError);
    // @ts-expect-error a pressure literal is not a temperature
    expect(() => idealGas('N2').cp('1 bar')).toThrow(DimensionError);
    // @ts-expect-error a temperature literal is not a pressure
    expect(() => compressor(idealGas('air'), { T1: '300 K', p1: '300 K', p2: '8 bar' })).toThrow(DimensionError);
    // @ts-expect-error a pressure literal is not a temperature
    expect(() => incompressible('copper').c('1 bar')).toThrow(DimensionError);
    // @ts-expect-error a length is not an entropy
    expect(() => water.state({ p: '1 MPa', s: '1 m' })).toThrow(DimensionError);
  });
});
