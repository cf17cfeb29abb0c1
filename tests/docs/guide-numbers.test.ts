/**
 * The figures quoted in docs/guide/choosing-a-model.md and reference-states.md, recomputed: the guide
 * states measurements of the code, so this test keeps them true (the compressed-liquid figures are in
 * tests/water/approximations.test.ts).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { compareLiquidProcess, constantCpDeviation, idealGas, incompressible, water } from '../../src/index.js';
import { waterTables } from '../../src/tables/water.js';
import { expectClose } from '../helpers/tolerance.js';

const guide = readFileSync(new URL('../../docs/guide/choosing-a-model.md', import.meta.url), 'utf8');
const pct = (x: number, digits = 1) => `${x >= 0 ? '+' : '−'}${Math.abs(x * 100).toFixed(digits)} %`;

describe('docs/guide/choosing-a-model.md', () => {
  const h2o = idealGas('H2O');
  it.each([
    ['10 kPa', '50 °C', '+0.3 %'],
    ['0.1 MPa', '150 °C', '+0.8 %'],
    ['1 MPa', '300 °C', '+2.5 %'],
    ['10 MPa', '400 °C', '+17.5 %'],
  ] as const)('water vapour as an ideal gas: error in v at %s, %s is %s', (p, T, stated) => {
    const st = water.state({ p, T });
    const ideal = (h2o.R.si * st.T.si) / st.p.si;
    expect(pct((ideal - st.v.si) / st.v.si)).toBe(stated);
    expect(guide).toContain(stated);
  });
  it.each([
    ['10 kPa', '50 °C', '300 °C', '−0.5 %'],
    ['1 MPa', '200 °C', '400 °C', '−8.3 %'],
    ['10 MPa', '350 °C', '500 °C', '−30.8 %'],
  ] as const)('water vapour as an ideal gas: error in Δh at %s, %s → %s is %s', (p, T1, T2, stated) => {
    const real = water.state({ p, T: T2 }).h.si - water.state({ p, T: T1 }).h.si;
    expect(pct((h2o.deltaH(T1, T2).si - real) / real)).toBe(stated);
  });
  it.each([
    ['compressor', '300 K', '100 kPa', '400 kPa', 1, '+0.08 %', '+1.1 K'],
    ['compressor', '300 K', '100 kPa', '1.6 MPa', 0.85, '+0.51 %', '+14.3 K'],
    ['turbine', '900 K', '800 kPa', '100 kPa', 0.88, '−2.06 %', '−18.4 K'],
    ['turbine', '1400 K', '1.6 MPa', '100 kPa', 0.9, '−4.56 %', '−59.0 K'],
  ] as const)('constant cp for a %s from %s, %s → %s: work %s, outlet T %s', (machine, T1, p1, p2, efficiency, work, dT) => {
    const d = constantCpDeviation(idealGas('air'), { machine, T1, p1, p2, efficiency });
    expect(pct(d.workRelativeDifference, 2)).toBe(work);
    const t = d.T2Difference.in('ΔK');
    expect(`${t >= 0 ? '+' : '−'}${Math.abs(t).toFixed(1)} K`).toBe(dT);
  });
  it('constant cp under-estimates Δh of air from 300 K by 5.7 % to 1000 K and 12.4 % to 2000 K', () => {
    const air = idealGas('air');
    const cold = air.withConstantCp();
    expect(pct((cold.deltaH('300 K', '1000 K').si - air.deltaH('300 K', '1000 K').si) / air.deltaH('300 K', '1000 K').si)).toBe('−5.7 %');
    expect(pct((cold.deltaH('300 K', '2000 K').si - air.deltaH('300 K', '2000 K').si) / air.deltaH('300 K', '2000 K').si)).toBe('−12.4 %');
  });
  it('the liquid process table: feed pump and heater', () => {
    const pump = compareLiquidProcess({ T: '40 °C', p: '10 kPa' }, { T: '41 °C', p: '15 MPa' });
    expect(pump.if97.deltaH.in('kJ/kg').toFixed(2)).toBe('17.38');
    expect(pct(pump.methods['saturated-liquid'].deltaHRelativeError!)).toBe('−75.9 %');
    expect(pct(pump.methods['pressure-corrected'].deltaHRelativeError!)).toBe('+11.0 %');
    expect(pct(pump.methods.incompressible.deltaHRelativeError!)).toBe('+10.6 %');
    const heater = compareLiquidProcess({ T: '20 °C', p: '5 bar' }, { T: '80 °C', p: '5 bar' });
    expect(heater.if97.deltaH.in('kJ/kg').toFixed(1)).toBe('250.9');
    expect(pct(heater.methods['saturated-liquid'].deltaHRelativeError!, 2)).toBe('+0.04 %');
  });
  it('incompressible liquid water gives Δu within about 0.1 % of IF97 between 0 and 100 °C at 1 atm', () => {
    const w = incompressible('water');
    for (const [a, b] of [['1 °C', '99 °C'], ['20 °C', '80 °C'], ['10 °C', '30 °C']] as const) {
      const exact = water.state({ T: b, p: '1 atm' }).u.si - water.state({ T: a, p: '1 atm' }).u.si;
      expect(Math.abs(w.deltaU(a, b).si - exact) / exact).toBeLessThan(1.5e-3);
    }
  });
  it('saturation-table interpolation: below 0.25 % for enthalpies below 370 °C, 72 % for h_fg next to the critical point', () => {
    const e = waterTables.saturationByT().data.interpolationError!;
    expect(e.hf!['linear, below the critical interval']!.maxRelative).toBeLessThan(0.0025);
    expect(e.hg!['linear, below the critical interval']!.maxRelative).toBeLessThan(0.0025);
    expect(e.hfg!.linear!.maxRelative).toBeCloseTo(0.72, 2);
    expect(e.p!['log-linear']!.maxRelative).toBeCloseTo(0.0018, 4);
    expect(e.p!.linear!.maxRelative).toBeCloseTo(0.014, 3);
  });
});

describe('docs/guide/reference-states.md', () => {
  it('steam at 10 kPa, 50 °C: about 2592 kJ/kg from IF97 and −13.4 MJ/kg as an ideal gas (total enthalpy)', () => {
    expectClose(water.state({ p: '10 kPa', T: '50 °C' }).h.in('kJ/kg'), 2592, { abs: 1 });
    expectClose(idealGas('H2O').h('50 °C').in('MJ/kg'), -13.38, { abs: 0.01 });
    expectClose(idealGas('CO2', { basis: 'molar' }).h('298.15 K').in('kJ/mol'), -393.5, { abs: 0.05 });
  });
});
