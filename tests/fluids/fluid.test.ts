import { describe, expect, it } from 'vitest';
import { OutOfRangeError, UnknownNameError, InvalidInputError, DimensionError } from '../../src/errors.js';
import { fluid, fluidNames } from '../../src/fluids/index.js';
import { expectClose } from '../helpers/tolerance.js';

describe('fluid(name)', () => {
  it('finds water by name, formula and refrigerant designation (R-718)', () => {
    expect(fluid('water')).toBe(fluid('R-718'));
    expect(fluid('H2O')).toBe(fluid('r718'));
    expect(fluid('water').equation).toBe('IAPWS-95');
    expect(fluidNames()).toEqual(['water']);
  });

  it('refuses an unknown or unshipped name with the closest names', () => {
    expect(() => fluid('watr')).toThrow(UnknownNameError);
    try {
      fluid('R-744');
    } catch (e) {
      expect((e as UnknownNameError).suggestions).toContain('R-718');
    }
  });

  it("the doc comment's example values (IAPWS-95 Table 7; saturation at 101.325 kPa, common practice 373.124 K)", () => {
    const water = fluid('R-718');
    expectClose(water.state({ T: '500 K', rho: '838.025 kg/m³' }).p.to('MPa').value, 10.0003858, { rel: 5e-9 });
    expectClose(water.saturation({ p: '101.325 kPa' }).T.si, 373.1243, { abs: 5e-5 });
    expectClose(water.state({ T: '150 °C', p: '1 bar' }).superheat!.si, 50.394, { abs: 5e-4 });
  });

  it('states carry phase, quality, superheat and subcooling', () => {
    const water = fluid('water');
    const liquid = water.state({ T: '20 °C', p: '1 bar' });
    expect(liquid.phase).toBe('liquid');
    expect(liquid.superheat).toBeUndefined();
    expectClose(liquid.subcooling!.si, water.saturation({ p: '1 bar' }).T.si - 293.15, { abs: 1e-7 });
    const wet = water.state({ p: '1 bar', x: 0.5 });
    expect(wet.phase).toBe('two-phase');
    expect(wet.x).toBe(0.5);
    expect(wet.cp).toBeUndefined();
    const back = water.state({ p: '1 bar', h: wet.h });
    expectClose(back.x!, 0.5, { abs: 1e-9 });
    const hot = water.state({ T: '700 K', p: '30 MPa' });
    expect(hot.phase).toBe('supercritical');
    expect(hot.superheat).toBeUndefined();
    const sat = water.saturation({ T: '450 K' });
    expectClose(sat.p.si, 0.932203564e6, { rel: 5e-9 }); // IAPWS-95 Table 8 (from memory)
    expectClose(sat.hfg.si, (0.277441078e4 - 0.749161585e3) * 1e3, { rel: 1e-8 });
  });

  it('critical, triple and range as quantities', () => {
    const water = fluid('water');
    expect(water.critical.T.si).toBe(647.096);
    expect(water.critical.p.si).toBe(22.064e6);
    expect(water.triple.T.si).toBe(273.16);
    expect(water.range.T.max.si).toBe(1273);
    expect(water.source.year).toBe(2018);
  });

  it('bad input throws typed errors naming the input and the range', () => {
    const water = fluid('water');
    expect(() => water.state({ T: '1300 K', p: '1 bar' })).toThrow(/T = 1300 K is above the upper limit of IAPWS-95 \(water\) \(1273 K\)/);
    expect(() => water.state({ T: '300 K', p: '2000 MPa' })).toThrow(OutOfRangeError);
    expect(() => water.saturation({ T: '700 K' })).toThrow(/critical temperature/);
    expect(() => water.state({ T: '300 K', x: 2 })).toThrow(OutOfRangeError);
    expect(() => water.state({ T: '300 K', p: '300 K' } as never)).toThrow(DimensionError);
    expect(() => water.state({ T: '300 K' } as never)).toThrow(InvalidInputError);
    try {
      water.state({ T: '200 K', p: '1 bar' });
    } catch (e) {
      expect((e as OutOfRangeError).range).toMatchObject({ quantity: 'T', min: 273.16, max: 1273, unit: 'K' });
    }
  });
});
