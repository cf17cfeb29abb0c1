/**
 * IAPWS R14-08(2011), Revised Release on the Pressure along the Melting and Sublimation Curves of
 * Ordinary Water Substance: the sublimation-pressure equation (Eq. 6, Table 3) against the release's
 * computer-program check value (T = 230 K, printed to 6 significant digits) and its defining
 * triple-point condition. Also: the liquid branch of the humid-air saturation pressure is IAPWS-IF97
 * region 4, checked here against IAPWS R7-97(2012) Table 35 (the same values as
 * tests/reference/iapws-if97.test.ts, through the humid-air entry).
 */
import { describe, expect, it } from 'vitest';
import data from '../../data/humid-air/sublimation-iapws-r14.json';
import { saturationTemperatureAt, sublimationPressure, waterSaturationPressure } from '../../src/humid-air/core/saturation.js';
import { expectClose } from '../helpers/tolerance.js';

describe('IAPWS R14-08(2011) sublimation pressure', () => {
  it('p_subl(230 K) = 8.94735e-6 MPa (the release\'s check value, 6 digits)', () => {
    expectClose(sublimationPressure(230) / 1e6, 8.94735e-6, { rel: 5.0001e-6 });
  });
  it('p_subl(Tt = 273.16 K) = pt = 611.657 Pa (triple point; the release defines θ = T/Tt, p/pt)', () => {
    expectClose(sublimationPressure(273.16), 611.657, { rel: 1e-15 });
  });
  it('the data file carries its source and basis', () => {
    expect(data.basis).toBe('from memory');
    expect(data.source.title).toMatch(/R14-08\(2011\)/);
  });
  it('its inverse (the frost point, Newton on Eq. 6) returns T to 1e-12 over 150 K to 273.15 K', () => {
    for (let T = 150; T < 273.15; T += 0.37) expectClose(saturationTemperatureAt(sublimationPressure(T), 0, 1000), T, { rel: 1e-12 });
  });
  it('is used below 0 °C, increasing monotonically over the humid-air range (173.15 K to 273.15 K)', () => {
    let last = 0;
    for (let T = 173.15; T < 273.15; T += 0.5) {
      const p = waterSaturationPressure(T);
      expect(p).toBe(sublimationPressure(T));
      expect(p).toBeGreaterThan(last);
      last = p;
    }
  });
});

describe('IAPWS R7-97(2012) Table 35 through waterSaturationPressure (over liquid, T ≥ 273.15 K)', () => {
  it.each([
    [300, 0.353658941e-2],
    [500, 0.263889776e1],
    [600, 0.123443146e2],
  ])('p_s(%d K) = %d MPa', (T, p) => expectClose(waterSaturationPressure(T) / 1e6, p, { rel: 5.0001e-9 }));
  it.each([
    [0.1e6, 0.372755919e3],
    [1e6, 0.453035632e3],
  ])('the dew point of p = %d Pa is T_s = %d K (Table 36, through the humid-air inverse)', (p, T) => expectClose(saturationTemperatureAt(p, 0, 1000), T, { rel: 5.0001e-9 }));
});
