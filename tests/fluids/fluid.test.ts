/**
 * The fluid facade on the kit: names and aliases, the one result shape, errors in the caller's
 * units with numeric bounds, differences between states, and the doc comments' examples.
 */
import { describe, expect, expectTypeOf, it } from 'vitest';
import { ConvergenceError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError } from '../../src/errors.js';
import { fluid, fluidNames, type FluidStateResult } from '../../src/fluids/index.js';
import { Quantity, quantity } from '../../src/units/quantity.js';
import { water } from '../../src/water/state.js';
import { expectClose } from '../helpers/tolerance.js';

const w = fluid('water');

/** The error a call throws (fails the test when it does not throw). */
function thrown(fn: () => unknown): Error {
  try {
    fn();
  } catch (e) {
    return e as Error;
  }
  throw new Error('expected the call to throw');
}

describe('fluid(name)', () => {
  it('finds water by name, formula and refrigerant designation (R-718)', () => {
    expect(fluid('water')).toBe(fluid('R-718'));
    expect(fluid('H2O')).toBe(fluid('r718'));
    expect(fluid('water').equation).toBe('IAPWS-95');
    expect(fluidNames()).toEqual(['water', 'nitrogen']);
  });

  it('refuses an unknown or unshipped name with UnknownNameError and the closest names', () => {
    const e = thrown(() => fluid('R-7180'));
    expect(e).toBeInstanceOf(UnknownNameError);
    expect((e as UnknownNameError).suggestions).toContain('R-718');
    expect(thrown(() => fluid('R-744'))).toBeInstanceOf(UnknownNameError); // carbon dioxide does not ship (see data/fluids/carbon-dioxide.json)
    expect(thrown(() => fluid(42 as never))).toBeInstanceOf(UnknownNameError);
  });

  it("the doc comment's example values (IAPWS-95 Table 7; 373.124 K at 101.325 kPa, common practice)", () => {
    const water95 = fluid('R-718');
    expectClose(water95.state({ T: '500 K', rho: '838.025 kg/m³' }).p.in('MPa'), 10.0003858, { rel: 5e-9 });
    expectClose(water95.saturation({ p: '101.325 kPa' }).T.in('K'), 373.1243, { abs: 5e-5 });
    expectClose(water95.state({ T: '150 °C', p: '1 bar' }).superheat!.in('K'), 50.394, { abs: 5e-4 });
    expect(water95.state({ p: '1 bar', x: 0.5 }).cp).toBeUndefined();
    expect(thrown(() => water95.state({ T: '1300 K', p: '1 bar' })).message).toBe('T = 1300 K is above the upper limit of IAPWS-95 (water) (1273 K); valid range 273.16 to 1273 K');
  });

  it('states carry phase, quality, Tsat, superheat and subcooling', () => {
    const liquid = w.state({ T: '20 °C', p: '1 bar' });
    expect(liquid.phase).toBe('liquid');
    expect(liquid.superheat).toBeUndefined();
    const Ts = w.saturation({ p: '1 bar' }).T.si;
    expect(liquid.Tsat!.si).toBe(Ts);
    expectClose(liquid.subcooling!.si, Ts - 293.15, { abs: 1e-9 });
    const wet = w.state({ p: '1 bar', x: 0.5 });
    expect(wet.phase).toBe('two-phase');
    expect(wet.x).toBe(0.5);
    expect(wet.Tsat!.si).toBe(wet.T.si);
    expect([wet.cp, wet.cv, wet.w, wet.k, wet.jouleThomson, wet.superheat, wet.subcooling]).toEqual([undefined, undefined, undefined, undefined, undefined, undefined, undefined]);
    const back = w.state({ p: '1 bar', h: wet.h });
    expectClose(back.x!, 0.5, { abs: 1e-9 });
    const hot = w.state({ T: '700 K', p: '30 MPa' });
    expect(hot.phase).toBe('supercritical');
    expect([hot.Tsat, hot.superheat, hot.subcooling]).toEqual([undefined, undefined, undefined]);
    const sat = w.saturation({ T: '450 K' });
    expectClose(sat.p.si, 0.932203564e6, { rel: 5e-9 }); // IAPWS-95 Table 8 (from memory)
    expectClose(sat.hfg.si, (0.277441078e4 - 0.749161585e3) * 1e3, { rel: 1e-8 });
    expect(sat.ufg.si).toBe(sat.vapor.u.si - sat.liquid.u.si);
    expect(sat.sfg.dimension).toBe('specificEntropy');
  });

  it('has the result shape of water.state and water.saturation (same keys; water adds its IF97 region and IAPWS transport properties)', () => {
    const transport = ['mu', 'lambda', 'nu', 'alpha', 'Pr', 'sigma'];
    const a = Object.keys(w.state({ T: '300 K', p: '1 bar' })).sort();
    const b = Object.keys(water.state({ T: '300 K', p: '1 bar' })).filter((k) => k !== 'region' && !transport.includes(k)).sort();
    expect(a.filter((k) => k !== 'jouleThomson')).toEqual(b);
    expect(Object.keys(w.saturation({ T: '300 K' })).sort()).toEqual(Object.keys(water.saturation({ T: '300 K' })).filter((k) => !transport.includes(k)).sort());
    expect(Object.keys(w.saturation({ T: '300 K' }).liquid).sort()).toEqual(Object.keys(water.saturation({ T: '300 K' }).liquid).filter((k) => !transport.includes(k)).sort());
  });

  it('every pair gives the same state (round trips through the facade)', () => {
    const s = w.state({ T: '450 K', p: '2 MPa' });
    const close = (r: FluidStateResult) => {
      expectClose(r.T.si, 450, { rel: 1e-9 });
      expectClose(r.p.si, 2e6, { rel: 1e-8 });
    };
    close(w.state({ p: '2 MPa', h: s.h }));
    close(w.state({ p: '2 MPa', s: s.s }));
    close(w.state({ h: s.h, s: s.s }));
    close(w.state({ T: '450 K', v: s.v }));
    close(w.state({ T: '450 K', rho: s.rho }));
    // an entropy of the IF97 facade (a specificHeat quantity of the same shape) is accepted
    expect(w.state({ p: '1 MPa', s: water.state({ p: '1 MPa', T: '500 K' }).s }).phase).toBe('vapor');
  });

  it('deltaH, deltaU, deltaS between two states of any pairs', () => {
    const a = w.state({ p: '10 MPa', T: '500 °C' });
    const b = w.state({ p: '10 kPa', x: 0.9 });
    expect(w.deltaH({ p: '10 MPa', T: '500 °C' }, { p: '10 kPa', x: 0.9 }).si).toBe(b.h.si - a.h.si);
    expect(w.deltaU({ p: '10 MPa', T: '500 °C' }, { p: '10 kPa', x: 0.9 }).si).toBe(b.u.si - a.u.si);
    const ds = w.deltaS({ p: '10 MPa', T: '500 °C' }, { p: '10 kPa', x: 0.9 });
    expect(ds.si).toBe(b.s.si - a.s.si);
    expect(ds.dimension).toBe('specificEntropy');
    // IF97 gives nearly the same difference (its states are within its release's distance of IAPWS-95)
    expectClose(w.deltaH({ p: '10 MPa', T: '500 °C' }, { p: '10 kPa', x: 0.9 }).in('kJ/kg'), water.deltaH({ p: '10 MPa', T: '500 °C' }, { p: '10 kPa', x: 0.9 }).in('kJ/kg'), { abs: 1 });
    expect(thrown(() => w.deltaH(null as never, { p: '1 bar', x: 0 })).message).toMatch(/^state1 must be a pair/);
  });

  it('critical, triple and range as quantities, from the source', () => {
    expect(w.critical.T.si).toBe(647.096);
    expect(w.critical.p.si).toBe(22.064e6);
    expect(w.critical.rho.si).toBe(322);
    expect(w.triple.T.si).toBe(273.16);
    expect(w.triple.p.si).toBe(611.654771);
    expect(w.triple.rhoLiquid.si).toBe(999.793);
    expect(w.range.T.max.si).toBe(1273);
    expect(w.range.p.max.si).toBe(1e9);
    expect(w.source.year).toBe(2018);
  });

  it('accepts text known only at run time, checked when the call runs', () => {
    const fromForm: string = '300 K';
    const pressure: string = '1 bar';
    expect(w.state({ T: fromForm, p: pressure }).phase).toBe('liquid');
    const wrong: string = '5 bar';
    expect(thrown(() => w.state({ T: wrong, p: pressure }))).toBeInstanceOf(DimensionError);
    expect(w.saturation({ T: fromForm }).p.si).toBeGreaterThan(3500);
  });

  it('type checks: literals of the wrong dimension do not compile; results are typed', () => {
    const check = () => {
      // @ts-expect-error a pressure is not a temperature
      w.state({ T: '5 bar', p: '1 bar' });
      // @ts-expect-error an enthalpy is not an entropy
      w.state({ p: '1 bar', s: '2000 kJ/kg' });
      // @ts-expect-error a density is not a pressure
      w.saturation({ p: '1 kg/m³' });
      // @ts-expect-error the quality is a plain number
      w.state({ T: '300 K', x: '0.5' });
    };
    expect(typeof check).toBe('function');
    expectTypeOf(w.state({ T: '300 K', p: '1 bar' }).s).toEqualTypeOf<Quantity<'specificEntropy'>>();
    expectTypeOf(w.state({ T: '300 K', p: '1 bar' }).cp).toEqualTypeOf<Quantity<'specificHeat'> | undefined>();
    expectTypeOf(w.deltaS({ T: '300 K', p: '1 bar' }, { T: '400 K', p: '1 bar' })).toEqualTypeOf<Quantity<'specificEntropy'>>();
    expectTypeOf(w.state({ T: quantity(300, 'K'), p: '1 bar' }).T).toEqualTypeOf<Quantity<'temperature'>>();
  });
});

describe('bad input: typed errors in the caller\'s units, SI in parentheses, numeric bounds', () => {
  it('a temperature out of range, in °F', () => {
    const e = thrown(() => w.state({ T: '2000 °F', p: '1 bar' })) as OutOfRangeError;
    expect(e).toBeInstanceOf(OutOfRangeError);
    expect(e.message).toMatch(/^T = 2000 °F \(1366\.4833 K\) is above the upper limit of IAPWS-95 \(water\) \(1831\.73 °F \(1273 K\)\)/);
    expect(e.range).toMatchObject({ quantity: 'T', min: 273.16, max: 1273, unit: 'K', given: { unit: '°F', value: 2000 } });
  });

  it('pressures: above 1000 MPa, not positive, gauge below vacuum', () => {
    const e = thrown(() => w.state({ T: '300 K', p: '2000 MPa' })) as OutOfRangeError;
    expect(e.range).toMatchObject({ quantity: 'p', max: 1e9, given: { unit: 'MPa', value: 2000 } });
    expect(thrown(() => w.state({ T: '300 K', p: '-20 psig' }))).toBeInstanceOf(OutOfRangeError);
  });

  it('an enthalpy no state reaches at p: the bounds are the enthalpies at the temperature limits (numbers, never NaN)', () => {
    const e = thrown(() => w.state({ p: '1 bar', h: '50000 kJ/kg' })) as OutOfRangeError;
    expect(e).toBeInstanceOf(OutOfRangeError);
    expect(e.range.quantity).toBe('h');
    expectClose(e.range.max, w.state({ p: '1 bar', T: '1273 K' }).h.si, { rel: 1e-12 });
    expect(Number.isFinite(e.range.min) && Number.isFinite(e.range.max)).toBe(true);
    expect(e.message).toMatch(/^h = 50000 kJ\/kg \(50000000 J\/kg\) is above the upper limit/);
    const hs = thrown(() => w.state({ h: '50000 kJ/kg', s: '1 kJ/(kg·K)' })) as OutOfRangeError;
    expect(Number.isFinite(hs.range.min) && Number.isFinite(hs.range.max)).toBe(true);
    const rho = thrown(() => w.state({ T: '300 K', rho: '1399 kg/m³' })) as OutOfRangeError;
    expect(rho.range.quantity).toBe('rho');
    expectClose(rho.range.max, w.state({ T: '300 K', p: '1000 MPa' }).rho.si, { rel: 1e-9 });
  });

  it('saturation and quality outside the saturation line', () => {
    const e = thrown(() => w.saturation({ T: '800 °F' })) as OutOfRangeError;
    expect(e.message).toMatch(/^T = 800 °F \(699\.81667 K\) is above the upper limit of the saturation line of IAPWS-95 \(water\)/);
    expect(e.range).toMatchObject({ min: 273.16, max: 647.096, given: { unit: '°F', value: 800 } });
    expect(thrown(() => w.saturation({ T: '700 K' })).message).toMatch(/saturation line of IAPWS-95 \(water\)/);
    expect(thrown(() => w.saturation({ p: '30 MPa' }))).toBeInstanceOf(OutOfRangeError);
    expect(thrown(() => w.state({ T: '300 K', x: 2 }))).toBeInstanceOf(OutOfRangeError);
    expect(thrown(() => w.state({ p: '100 Pa', x: 0.5 }))).toBeInstanceOf(OutOfRangeError);
    // the triple point written in °C is on the line (the conversion's rounding is admitted)
    expect(w.saturation({ T: '0.01 °C' }).T.si).toBe(273.16);
  });

  it('over-determined, under-determined, unknown inputs and wrong dimensions', () => {
    expect(thrown(() => w.state({ T: '300 K', p: '1 bar', h: '1 kJ/kg' } as never)).message).toMatch(/over-determined/);
    expect(thrown(() => w.state({ T: '300 K' } as never)).message).toMatch(/under-determined/);
    expect(thrown(() => w.state({ T: '300 K', q: 1 } as never))).toBeInstanceOf(InvalidInputError);
    expect(thrown(() => w.state({ T: '300 K', p: '300 K' } as never))).toBeInstanceOf(DimensionError);
    expect(thrown(() => w.saturation({ T: '300 K', p: '1 bar' } as never)).message).toMatch(/over-determined/);
    expect(thrown(() => w.state({ T: 300, p: '1 bar' } as never)).message).toMatch(/has no unit/);
    expect(thrown(() => w.state({ T: 'NaN K', p: '1 bar' } as never))).toBeInstanceOf(Error);
    expect(ConvergenceError).toBeDefined();
  });
});
