/**
 * Ideal-gas polynomials against NIST-JANAF Thermochemical Tables, 4th edition (Chase 1998):
 * cp°, S° and H° − H°(298.15 K) at 298.15, 500, 1000, 1500 and 2000 K, within 0.1 %.
 * Table ids: N-023 N2, O-029 O2, Ar-001 Ar, H-050 H2, C-093 CO, C-095 CO2, H-064 H2O, C-067 CH4, H-083 NH3.
 */
import { describe, it } from 'vitest';
import { idealGas } from '../../src/ideal-gas/index.js';
import { quantity } from '../../src/units/index.js';
import { expectClose } from '../helpers/tolerance.js';
import { janafAt } from './janaf.js';

const TABLES = [
  ['N2', 'N-023.txt'],
  ['O2', 'O-029.txt'],
  ['Ar', 'Ar-001.txt'],
  ['H2', 'H-050.txt'],
  ['CO', 'C-093.txt'],
  ['CO2', 'C-095.txt'],
  ['H2O', 'H-064.txt'],
  ['CH4', 'C-067.txt'],
  ['NH3', 'H-083.txt'],
] as const;
const TEMPERATURES = [298.15, 500, 1000, 1500, 2000];

describe.each(TABLES)('%s against NIST-JANAF table %s', (species, file) => {
  const gas = idealGas(species, { basis: 'molar' });
  it.each(TEMPERATURES)('at %d K: cp°, S°, H° − H°(298.15 K) within 0.1 %', (T) => {
    const row = janafAt(file, T);
    const t = quantity(T, 'K');
    expectClose(gas.cp(t).in('J/(mol·K)'), row.Cp, { rel: 1e-3 });
    expectClose(gas.sStandard(t).in('J/(mol·K)'), row.S, { rel: 1e-3 });
    // at 298.15 K both are zero by definition; elsewhere 0.1 % of the tabulated value
    expectClose(gas.hSensible(t).in('kJ/mol'), row.dH, { rel: 1e-3, abs: 1e-9 });
  });
  it('the enthalpy of formation at 298.15 K agrees with JANAF ΔfH° within 0.5 kJ/mol', () => {
    const row = janafAt(file, 298.15);
    expectClose(gas.h('298.15 K').in('kJ/mol'), row.fH, { abs: 0.5 });
  });
});
