/**
 * Handbook values: specific heats and densities of liquids and solids, and gas constants.
 * Each value is marked with where it comes from; "from memory" means recalled from handbook
 * tables, not transcribed.
 */
import { describe, expect, it } from 'vitest';
import { gasConstant } from '../../src/chem/index.js';
import { densityAt, incompressible } from '../../src/incompressible/index.js';
import { lookupIncompressible } from '../../src/incompressible/catalogue.js';
import { molarMass } from '../../src/chem/index.js';
import { expectClose } from '../helpers/tolerance.js';

describe('liquid water (common practice)', () => {
  it('c ≈ 1 Btu/(lbm·°F), about 4.18 kJ/(kg·K), at room temperature', () => {
    const water = incompressible('water');
    expectClose(water.c('68 °F').in('Btu/(lbm·°F)'), 1.0, { rel: 0.002 });
    expectClose(water.c('20 °C').in('kJ/(kg·K)'), 4.18, { rel: 0.002 });
  });
  it('IAPWS-95 cp at 1 atm: 4.1816 kJ/(kg·K) at 25 °C (from memory)', () => {
    expectClose(incompressible('water').c('25 °C').in('kJ/(kg·K)'), 4.1816, { rel: 2e-4 });
  });
  it('density ≈ 62.2 lbm/ft³ at 77 °F (from memory)', () => {
    expectClose(incompressible('water').rho.in('lbm/ft³'), 62.24, { rel: 1e-3 });
  });
});

describe('metals from NIST-JANAF against handbook values near 300 K (thermophysical property tables of solids, from memory; the data are JANAF, so this compares two sources)', () => {
  it.each([
    ['copper', '300 K', 385],
    ['aluminium', '300 K', 903],
    ['lead', '300 K', 129],
    ['mercury', '300 K', 139.5],
    ['iron', '300 K', 447],
  ] as const)('%s at %s: c = %d J/(kg·K) within 1 %', (name, T, c) => {
    expectClose(incompressible(name).c(T).si, c, { rel: 0.01 });
  });
  it('ice: cp = 2096.78 J/(kg·K) at the triple point, 273.16 K (IAPWS R10-06 verification table, from memory), checked at 273.15 K', () => {
    expectClose(incompressible('ice').c('273.15 K').si, 2096.78, { rel: 0.01 });
  });
});

describe('organic liquids against a second handbook table (CRC Handbook of Chemistry and Physics, from memory): molar cp at 25 °C from the standard thermodynamic properties table, density at 20 °C from the physical constants of organic compounds', () => {
  it.each([
    // name, formula, cp J/(mol·K) at 25 °C, ρ g/cm³ at 20 °C
    ['ethanol', 'C2H6O', 112.3, 0.7893],
    ['methanol', 'CH4O', 81.1, 0.7914],
    ['ethylene glycol', 'C2H6O2', 149.8, 1.1135],
    ['propylene glycol', 'C3H8O2', 190.8, 1.0361],
    ['glycerin', 'C3H8O3', 218.9, 1.2613],
  ] as const)('%s (%s): cp = %d J/(mol·K) within 3 %, ρ(20 °C) = %d g/cm³ within 0.7 %', (name, formula, cpMolar, rho) => {
    const s = incompressible(name);
    expectClose(s.c('25 °C').si * molarMass(formula).si, cpMolar, { rel: 0.03 });
    expectClose(densityAt(lookupIncompressible(name).model, 293.15) / 1000, rho, { rel: 0.007 });
  });
});

describe('gas constants R = R̄/M against handbook ideal-gas tables (from memory)', () => {
  it.each([
    ['28.97 g/mol', 'air', 0.287],
    ['N2', 'nitrogen', 0.2968],
    ['O2', 'oxygen', 0.2598],
    ['CO2', 'carbon dioxide', 0.1889],
    ['H2O', 'water vapour', 0.4615],
    ['Ar', 'argon', 0.2081],
    ['He', 'helium', 2.0769],
    ['H2', 'hydrogen', 4.124],
    ['CH4', 'methane', 0.5182],
  ] as const)('%s (%s): R = %d kJ/(kg·K)', (input, _name, R) => {
    expectClose(gasConstant(input).in('kJ/(kg·K)'), R, { rel: 2e-4 });
  });
  it('air: R = 0.06855 Btu/(lbm·°R) and 53.35 ft·lbf/(lbm·°R) (from memory)', () => {
    expectClose(gasConstant('28.97 g/mol').in('Btu/(lbm·°R)'), 0.06855, { rel: 2e-4 });
    expectClose(gasConstant('28.97 g/mol').in('ft·lbf/(lbm·°R)'), 53.35, { rel: 2e-4 });
  });
});

import { idealGas } from '../../src/ideal-gas/index.js';

describe('ideal-gas air (common practice)', () => {
  it('cp ≈ 1.005 kJ/(kg·K) and k ≈ 1.400 at 300 K; R ≈ 0.2870 kJ/(kg·K)', () => {
    const air = idealGas('air');
    expectClose(air.cp('300 K').in('kJ/(kg·K)'), 1.005, { rel: 2e-3 });
    expectClose(air.k('300 K'), 1.4, { rel: 1e-3 });
    expectClose(air.R.in('kJ/(kg·K)'), 0.287, { rel: 2e-4 });
  });
});

describe('ideal gases at 298.15 K without a JANAF table here: ΔfH°, S°, cp° (handbook thermochemical tables, from memory)', () => {
  it.each([
    // species, ΔfH° kJ/mol, S° J/(mol·K), cp° J/(mol·K)
    ['Ne', 0, 146.33, 20.786],
    ['C2H6', -83.8, 229.2, 52.5],
    ['C3H8', -104.7, 270.3, 73.6],
    ['n-C4H10', -125.8, 310.0, 98.5],
    ['NO', 91.3, 210.76, 29.86],
    ['SO2', -296.8, 248.2, 39.9],
  ] as const)('%s: ΔfH° = %d kJ/mol, S° = %d J/(mol·K), cp° = %d J/(mol·K)', (name, fH, S, cp) => {
    const g = idealGas(name, { basis: 'molar' });
    expectClose(g.h('298.15 K').in('kJ/mol'), fH, { abs: 1.5 });
    expectClose(g.sStandard('298.15 K').in('J/(mol·K)'), S, { rel: 2e-3 });
    expectClose(g.cp('298.15 K').in('J/(mol·K)'), cp, { rel: 1e-2 });
  });
});

import { water } from '../../src/water/index.js';

describe('steam tables (handbook values, from memory; IF97 agrees with the IAPWS-95-based tables to the last printed digit)', () => {
  it('saturated water at 1 atm (14.696 psia): T = 211.95 °F, h_g = 1150.3 Btu/lbm, h_fg = 970.1 Btu/lbm, s_f = 0.3121, s_g = 1.7566 Btu/(lbm·°R), v_g = 26.80 ft³/lbm', () => {
    const sat = water.saturation({ p: '14.695948775513449 psia' });
    expectClose(sat.T.in('°F'), 211.95, { abs: 0.005 });
    expectClose(sat.vapor.h.in('Btu/lbm'), 1150.3, { abs: 0.05 });
    expectClose(sat.hfg.in('Btu/lbm'), 970.1, { abs: 0.05 });
    expectClose(sat.liquid.s.in('Btu/(lbm·°R)'), 0.3121, { abs: 0.00005 });
    expectClose(sat.vapor.s.in('Btu/(lbm·°R)'), 1.7566, { abs: 0.00005 });
    expectClose(sat.vapor.v.in('ft³/lbm'), 26.8, { abs: 0.005 });
  });
  it('saturated water at 100 °C: p = 101.42 kPa, h_f = 419.10 kJ/kg, h_fg = 2256.5 kJ/kg, s_g = 7.3541 kJ/(kg·K)', () => {
    const sat = water.saturation({ T: '100 °C' });
    expectClose(sat.p.in('kPa'), 101.42, { abs: 0.005 });
    expectClose(sat.liquid.h.in('kJ/kg'), 419.1, { abs: 0.005 });
    expectClose(sat.hfg.in('kJ/kg'), 2256.5, { abs: 0.05 });
    expectClose(sat.vapor.s.in('kJ/(kg·K)'), 7.3541, { abs: 0.0001 });
  });
  it('superheated steam at 100 psia, 500 °F: v = 5.5875 ft³/lbm, h = 1279.3 Btu/lbm, s = 1.7089 Btu/(lbm·°R)', () => {
    const st = water.state({ p: '100 psia', T: '500 °F' });
    expectClose(st.v.in('ft³/lbm'), 5.5875, { abs: 0.00005 });
    expectClose(st.h.in('Btu/lbm'), 1279.3, { abs: 0.05 });
    expectClose(st.s.in('Btu/(lbm·°R)'), 1.7089, { abs: 0.00005 });
  });
  it('superheated steam at 1 MPa, 300 °C: v = 0.25799 m³/kg, h = 3051.6 kJ/kg, s = 7.1246 kJ/(kg·K) (±1 in the last digit: tables from IAPWS-95)', () => {
    const st = water.state({ p: '1 MPa', T: '300 °C' });
    expectClose(st.v.in('m³/kg'), 0.25799, { abs: 0.000015 });
    expectClose(st.h.in('kJ/kg'), 3051.6, { abs: 0.15 });
    expectClose(st.s.in('kJ/(kg·K)'), 7.1246, { abs: 0.00015 });
  });
  it('compressed liquid at 500 psia, 200 °F: above h_f(200 °F), below h_f + v_f·(p − p_sat) since (∂h/∂p)_T = v(1 − βT) < v (common practice)', () => {
    const st = water.state({ p: '500 psia', T: '200 °F' });
    const sat = water.saturation({ T: '200 °F' });
    expect(st.phase).toBe('liquid');
    expectClose(sat.p.in('psia'), 11.538, { abs: 0.002 }); // saturation pressure at 200 °F, 11.538 psia (from memory)
    expect(st.h.si).toBeGreaterThan(sat.liquid.h.si);
    expect(st.h.si).toBeLessThan(sat.liquid.h.si + sat.liquid.v.si * (st.p.si - sat.p.si));
    expectClose(st.v.in('ft³/lbm'), 0.01661, { abs: 0.00001 }); // v ≈ 0.01661 ft³/lbm (from memory)
  });
});
