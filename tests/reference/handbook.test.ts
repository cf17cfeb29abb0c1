/**
 * Handbook values: specific heats and densities of liquids and solids, and gas constants.
 * Each value is marked with where it comes from; "from memory" means recalled from handbook
 * tables, not transcribed.
 */
import { describe, it } from 'vitest';
import { gasConstant } from '../../src/chem/index.js';
import { incompressible } from '../../src/incompressible/index.js';
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

describe('solids and liquids near 300 K (handbook thermophysical property tables, from memory)', () => {
  it.each([
    ['copper', '300 K', 385, 8933],
    ['aluminium', '300 K', 903, 2702],
    ['stainless steel', '300 K', 477, 7900],
    ['carbon steel', '300 K', 434, 7854],
    ['lead', '300 K', 129, 11340],
    ['mercury', '300 K', 139.5, 13529],
    ['engine oil', '300 K', 1909, 884],
    ['ethylene glycol', '300 K', 2415, 1114],
    ['glass', '300 K', 750, 2500],
    ['granite', '300 K', 775, 2630],
  ] as const)('%s at %s: c = %d J/(kg·K), ρ = %d kg/m³', (name, T, c, rho) => {
    const s = incompressible(name);
    expectClose(s.c(T).si, c, { rel: 0.01 });
    expectClose(s.rho.si, rho, { rel: 0.01 });
  });
  it('ice: cp ≈ 2.1 kJ/(kg·K) near 0 °C (IAPWS R10-06, from memory)', () => {
    expectClose(incompressible('ice').c('0 °C').in('kJ/(kg·K)'), 2.097, { rel: 0.01 });
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
