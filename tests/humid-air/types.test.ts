/**
 * Compile-time checks of the humid-air facade (vitest typecheck helpers and @ts-expect-error):
 * literal unit text of the wrong dimension does not compile, a plain string does (checked at run
 * time), unknown keys do not compile, W is a humidity-ratio quantity.
 */
import { describe, expect, expectTypeOf, it } from 'vitest';
import { DimensionError, humidAir, InvalidInputError, quantity, type HumidAirResult, type ProcessResult, type Quantity } from '../../src/humid-air/index.js';

const fromAForm: string = '25 °C';

describe('humidAir.state types', () => {
  it('returns HumidAirResult; W and Ws are humidity-ratio quantities', () => {
    const s = humidAir.state({ T: '30 °C', RH: 0.5 });
    expectTypeOf(s).toEqualTypeOf<HumidAirResult>();
    expectTypeOf(s.W).toEqualTypeOf<Quantity<'humidityRatio'>>();
    expectTypeOf(s.Ws).toEqualTypeOf<Quantity<'humidityRatio'> | undefined>();
    expectTypeOf(s.RH).toEqualTypeOf<number>();
  });
  it('accepts literal text of the right dimension, quantities, and plain strings (checked at run time)', () => {
    expect(humidAir.state({ T: '86 °F', W: '70 gr/lbm', p: '14.696 psia' }).T.in('°F')).toBeCloseTo(86, 10);
    expect(humidAir.state({ T: quantity(300, 'K'), RH: '40 %' }).RH).toBe(0.4);
    expect(humidAir.state({ T: fromAForm, RH: 0.5 }).T.in('°C')).toBeCloseTo(25, 10);
    const rh: string = '50 %';
    const w: string = '10 g/kg';
    expect(humidAir.state({ T: fromAForm, RH: rh }).RH).toBe(0.5);
    expect(humidAir.state({ T: fromAForm, W: w }).W.in('g/kg')).toBeCloseTo(10, 12);
  });
  it('refuses literal text of another dimension, quantities of another dimension and unknown keys at compile time', () => {
    // @ts-expect-error a pressure as a temperature
    expect(() => humidAir.state({ T: '500 psia', RH: 0.5 })).toThrow(DimensionError);
    // @ts-expect-error a quantity of another dimension
    expect(() => humidAir.state({ T: quantity('1 bar'), RH: 0.5 })).toThrow(DimensionError);
    // @ts-expect-error an enthalpy as a humidity ratio
    expect(() => humidAir.state({ T: '20 °C', W: '10 kJ/kg' })).toThrow(DimensionError);
    // @ts-expect-error RH text must be percent
    expect(() => humidAir.state({ T: '20 °C', RH: '50 percent' })).toThrow(InvalidInputError);
    // @ts-expect-error there is no model option (the enhanced model does not ship)
    expect(() => humidAir.state({ T: '20 °C', RH: 0.5, model: 'enhanced' })).toThrow(InvalidInputError);
    // @ts-expect-error an altitude is a length
    expect(() => humidAir.state({ T: '20 °C', RH: 0.5, altitude: '1500 kPa' })).toThrow(DimensionError);
  });
});

describe('process types', () => {
  const inlet = humidAir.state({ T: '24 °C', RH: 0.5 });
  it('take quantities, literal text and plain strings; return ProcessResult', () => {
    const flow: string = '2 kg/s';
    expectTypeOf(humidAir.heat({ inlet, flow, T2: '35 °C' })).toEqualTypeOf<ProcessResult>();
    expect(humidAir.heat({ inlet, flow: '1.6 m³/s', T2: fromAForm }).flow.si).toBeGreaterThan(1.3);
    expect(humidAir.mix([{ state: inlet, flow }, { state: inlet, flow: '1 kg/s' }]).flow.si).toBe(3);
  });
  it('refuse wrong literals at compile time', () => {
    // @ts-expect-error a temperature as a flow
    expect(() => humidAir.heat({ inlet, flow: '2 K', T2: '35 °C' })).toThrow(DimensionError);
    // @ts-expect-error a power as a leaving temperature
    expect(() => humidAir.heat({ inlet, flow: '2 kg/s', T2: '35 kW' })).toThrow(DimensionError);
    // @ts-expect-error a pressure as a stream's flow
    expect(() => humidAir.mix([{ state: inlet, flow: '1 bar' }, { state: inlet, flow: '1 kg/s' }])).toThrow(DimensionError);
    // @ts-expect-error the steam's temperature must be a temperature
    expect(() => humidAir.steamHumidifier({ inlet, flow: '1 kg/s', RH2: 0.6, steam: { p: '1 atm', T: '110 kPa' } })).toThrow(DimensionError);
  });
});
