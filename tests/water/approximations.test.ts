import { describe, expect, it } from 'vitest';
import { OutOfRangeError } from '../../src/errors.js';
import { quantity } from '../../src/units/index.js';
import { approximateLiquid, compareLiquidProcess, LIQUID_APPROXIMATIONS, water } from '../../src/water/index.js';
import { expectClose } from '../helpers/tolerance.js';

/** The largest |shortcut − IF97| of h (kJ/kg) over a grid of liquid states, as docs/guide/choosing-a-model.md states it. */
function worstEnthalpyDeviation(method: (typeof LIQUID_APPROXIMATIONS)[number], temperaturesC: number[], pressuresMPa: number[]): number {
  let worst = 0;
  for (const T of temperaturesC) {
    for (const p of pressuresMPa) {
      const sat = water.saturation({ T: quantity(T, '°C') });
      if (p * 1e6 < sat.p.si) continue;
      const d = approximateLiquid({ T: quantity(T, '°C'), p: quantity(p, 'MPa') }, method, { compare: true }).deviation!.h.absolute.in('kJ/kg');
      worst = Math.max(worst, Math.abs(d));
    }
  }
  return worst;
}

describe('compressed-liquid shortcuts against IAPWS-IF97', () => {
  it('the deviation reported is shortcut − IF97 at the same state', () => {
    const a = approximateLiquid({ T: '80 °C', p: '10 MPa' }, 'saturated-liquid', { compare: true });
    const exact = water.state({ T: '80 °C', p: '10 MPa' });
    const sat = water.saturation({ T: '80 °C' });
    expect(a.h.si).toBe(sat.liquid.h.si);
    expectClose(a.deviation!.h.absolute.si, sat.liquid.h.si - exact.h.si, { rel: 1e-12 });
    expectClose(a.deviation!.h.relative!, (sat.liquid.h.si - exact.h.si) / exact.h.si, { rel: 1e-12 });
  });
  it('pressure-corrected h = h_f + v_f·(p − p_sat)', () => {
    const a = approximateLiquid({ T: '150 °C', p: '20 MPa' }, 'pressure-corrected');
    const sat = water.saturation({ T: '150 °C' });
    expectClose(a.h.si, sat.liquid.h.si + sat.liquid.v.si * (20e6 - sat.p.si), { rel: 1e-14 });
  });
  it('common practice: the pressure-corrected h is much closer than h_f at high pressure and low temperature', () => {
    for (const [T, p] of [['20 °C', '50 MPa'], ['40 °C', '100 MPa'], ['60 °C', '30 MPa']] as const) {
      const a = approximateLiquid({ T, p }, 'saturated-liquid', { compare: true }).deviation!.h.absolute.si;
      const b = approximateLiquid({ T, p }, 'pressure-corrected', { compare: true }).deviation!.h.absolute.si;
      expect(Math.abs(b)).toBeLessThan(Math.abs(a) / 4);
    }
  });
  it('but it overshoots at high temperature and pressure, where (∂h/∂p)_T = v(1 − βT) falls well below v', () => {
    const b = approximateLiquid({ T: '300 °C', p: '100 MPa' }, 'pressure-corrected', { compare: true }).deviation!.h.absolute.in('kJ/kg');
    expect(b).toBeGreaterThan(100);
  });
  it('measured worst |Δh| over 1–300 °C and p_sat–100 MPa match what the guide states', () => {
    const Ts = [1, 20, 50, 100, 150, 200, 250, 300];
    const ps = [1, 5, 10, 20, 50, 100];
    // docs/guide/choosing-a-model.md: saturated liquid 95.1 kJ/kg (1 °C, 100 MPa), pressure corrected
    // 144.2 kJ/kg (300 °C, 100 MPa), incompressible 78.4 kJ/kg (300 °C, 10 MPa)
    expectClose(worstEnthalpyDeviation('saturated-liquid', Ts, ps), 95.1, { abs: 0.1 });
    expectClose(worstEnthalpyDeviation('pressure-corrected', Ts, ps), 144.2, { abs: 0.1 });
    expectClose(worstEnthalpyDeviation('incompressible', Ts, ps), 78.4, { abs: 0.1 });
  });
  it('a vapour state is refused', () => {
    expect(() => approximateLiquid({ T: '200 °C', p: '1 bar' }, 'saturated-liquid')).toThrow(OutOfRangeError);
    expect(() => approximateLiquid({ T: '200 °C', p: '1 bar' }, 'saturated-liquid')).toThrow(/is vapour/);
    expect(() => approximateLiquid({ T: '700 K', p: '30 MPa' }, 'incompressible')).toThrow(OutOfRangeError);
  });
});

describe('compareLiquidProcess', () => {
  it('a feed pump: Δh by each method beside IF97, with relative errors', () => {
    const r = compareLiquidProcess({ T: '40 °C', p: '10 kPa' }, { T: '41 °C', p: '15 MPa' });
    const exact = water.state({ T: '41 °C', p: '15 MPa' }).h.si - water.state({ T: '40 °C', p: '10 kPa' }).h.si;
    expectClose(r.if97.deltaH.si, exact, { rel: 1e-12 });
    // the saturated-liquid shortcut misses the pump work entirely
    expect(r.methods['saturated-liquid'].deltaHRelativeError!).toBeLessThan(-0.7);
    expect(Math.abs(r.methods['pressure-corrected'].deltaHRelativeError!)).toBeLessThan(0.15);
    for (const m of LIQUID_APPROXIMATIONS) {
      expectClose(r.methods[m].deltaHRelativeError!, (r.methods[m].deltaH.si - exact) / Math.abs(exact), { rel: 1e-12 });
    }
  });
  it('a heater at constant pressure: every method is within a few per cent', () => {
    const r = compareLiquidProcess({ T: '20 °C', p: '5 bar' }, { T: '80 °C', p: '5 bar' });
    for (const m of LIQUID_APPROXIMATIONS) expect(Math.abs(r.methods[m].deltaHRelativeError!)).toBeLessThan(0.01);
  });
});
