/**
 * ASHRAE Handbook—Fundamentals (SI), chapter 1, Psychrometrics. Values recalled from memory
 * (`from memory` beside each): Table 1 (standard atmosphere) and Table 2 (thermodynamic properties
 * of moist air at 101.325 kPa, computed by the Handbook from the Hyland–Wexler (1983) real-gas
 * formulation, which includes the enhancement factor).
 *
 * Our model is the Handbook's ideal-mixture relations without an enhancement factor (the recalled
 * Buck (1981) coefficients could not be verified and do not ship: data/humid-air/enhancement-buck-1981.json).
 * So the comparison holds within the ideal model's known difference from the real-gas table, not
 * to the printed digits. Tolerances, and why:
 * - Ws: the ideal model lies 0.35 % to 0.65 % BELOW the table from −40 °C to 50 °C. Real moist air
 *   holds more vapour at saturation than the ideal mixture (an enhancement factor f > 1, about
 *   1.004 to 1.006 at 101.325 kPa in this range), so the sign is fixed and the size is that of f − 1;
 *   measured: −0.40 % (0 °C) to −0.60 % (−40 °C and 50 °C).
 * - hs: within 0.65 % of Ws times the latent term (2501 + 1.86 t) kJ/kg (the Ws difference carried
 *   into h) plus 0.1 kJ/kg (the ideal-gas dry-air enthalpy 1.006 t against the table's real-gas one).
 * - v_s: within 0.1 % (the ideal-gas volume; measured within 0.06 %).
 * Table 2 rows above 50 °C and several v_s values that I recall were left out: the recalled numbers
 * disagree with one another (e.g. 60 °C and 70 °C match the f = 1 relation, 80 °C matches neither),
 * so they are unreliable recollections; someone with the Handbook at hand should transcribe Table 2.
 */
import { describe, expect, it } from 'vitest';
import { humidAir } from '../../src/humid-air/index.js';
import { quantity } from '../../src/units/quantity.js';
import { expectClose } from '../helpers/tolerance.js';

// [t °C, Ws kg/kg, hs kJ/kg] from Table 2 (from memory)
const saturated: [number, number, number][] = [
  [-40, 0.0000793, -40.108],
  [-20, 0.0006373, -18.54],
  [0, 0.0037895, 9.475],
  [10, 0.0076634, 29.344],
  [20, 0.0147603, 57.544],
  [25, 0.020166, 76.389],
  [30, 0.027344, 100.003],
  [40, 0.049136, 166.83],
  [50, 0.086858, 275.3],
];

describe('Table 2: moist air saturated at 101.325 kPa (from memory)', () => {
  it.each(saturated)('t = %d °C: the ideal model gives Ws 0.35 % to 0.65 % below the table (the enhancement factor it leaves out)', (t, Ws) => {
    const s = humidAir.state({ T: quantity(t, '°C'), RH: 1, p: '101.325 kPa' });
    expect(s.W.si).toBe(s.Ws!.si);
    const d = s.W.si / Ws - 1;
    expect(d).toBeLessThan(-0.0035);
    expect(d).toBeGreaterThan(-0.0065);
  });
  it.each(saturated)('t = %d °C: hs = %d kJ/kg within the Ws difference carried into h plus 0.1 kJ/kg', (t, Ws, hs) => {
    const s = humidAir.state({ T: quantity(t, '°C'), RH: 1 });
    expectClose(s.h.in('kJ/kg'), hs, { abs: 0.0065 * Ws * (2501 + 1.86 * t) + 0.1 });
  });
  it.each([
    [0, 0.7781],
    [20, 0.8498],
    [50, 1.0431],
  ])('t = %d °C: v_s = %d m³/kg dry air within 0.1 %', (t, v) => {
    expectClose(humidAir.state({ T: quantity(t, '°C'), RH: 1 }).v.si, v, { rel: 1e-3 });
  });
});

describe('Table 1: standard atmosphere from Eq. 3 (from memory)', () => {
  it.each([
    [-500, 107.478],
    [0, 101.325],
    [500, 95.461],
    [1000, 89.875],
    [1500, 84.556],
    [2000, 79.495],
    [3000, 70.109],
    [5000, 54.02],
    [10000, 26.436],
  ])('Z = %d m: p = %d kPa', (Z, p) => expectClose(humidAir.pressureAtAltitude(quantity(Z, 'm')).in('kPa'), p, { abs: 0.0015 }));
  it('refuses altitudes outside −5000 m … 11 000 m', () => {
    expect(() => humidAir.pressureAtAltitude('12000 m')).toThrow(/altitude = 12000 m is above/);
  });
});

describe('common practice', () => {
  it('standard air: about 1.2 kg/m³ at 20 °C, 101.325 kPa (common practice)', () => {
    expectClose(humidAir.state({ T: '20 °C', RH: 0.5 }).rho.si, 1.2, { abs: 0.005 });
    expectClose(humidAir.state({ T: '20 °C', W: 0 }).rho.si, 1.204, { abs: 0.001 });
  });
  it('1 ton of refrigeration = 12 000 Btu/h (common practice), the unit coil loads convert to', () => {
    expectClose(quantity(1, 'TR').in('Btu/h'), 12000, { rel: 1e-12 });
  });
  it('7000 grains = 1 lb: W = 0.01 kg/kg is 70 gr/lbm (NIST SP 811: 1 gr = 1/7000 lb exactly)', () => {
    expectClose(humidAir.state({ T: '25 °C', W: 0.01 }).W.in('gr/lbm'), 70, { rel: 1e-15 });
  });
});
