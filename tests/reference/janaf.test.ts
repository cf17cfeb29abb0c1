/**
 * Ideal-gas polynomials against NIST-JANAF Thermochemical Tables, 4th edition (Chase 1998): cp°, S°
 * and H° − H°(298.15 K) at every tabulated temperature from 200 to 6000 K (the fitted range), within
 * 0.1 %, for every species fitted to a table (data/ideal-gas/janaf-fits.json). Exceptions, each
 * recorded as a finding in the data file: H2S S° at 200 K (table H-080 is not self-consistent there)
 * and NH3 cp° near 5100 K.
 * Table ids: N-023 N2, O-029 O2, Ar-001 Ar, H-050 H2, C-093 CO, C-095 CO2, H-064 H2O, C-067 CH4,
 * H-083 NH3, He-001 He, C-128 C2H4, C-127 C2H2, N-007 NO2, N-026 N2O, H-080 H2S, O-056 O3, H-038 OH,
 * H-001 H, O-001 O, N-002 N.
 */
import { describe, expect, it } from 'vitest';
import { idealGas } from '../../src/ideal-gas/index.js';
import { quantity } from '../../src/units/index.js';
import { expectClose } from '../helpers/tolerance.js';
import { janafAt, readJanaf } from './janaf.js';

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
  ['He', 'He-001.txt'],
  ['C2H4', 'C-128.txt'],
  ['C2H2', 'C-127.txt'],
  ['NO2', 'N-007.txt'],
  ['N2O', 'N-026.txt'],
  ['H2S', 'H-080.txt'],
  ['O3', 'O-056.txt'],
  ['OH', 'H-038.txt'],
  ['H', 'H-001.txt'],
  ['O', 'O-001.txt'],
  ['N', 'N-002.txt'],
] as const;

/** Rows where the 0.1 % check does not hold, with the reason (recorded as findings in janaf-fits.json). */
const EXCEPTIONS: Record<string, { T: number; property: 'Cp' | 'S'; rel: number; why: string }[]> = {
  H2S: [{ T: 200, property: 'S', rel: 1.5e-3, why: 'table H-080: S°(298.15 K) − S°(200 K) exceeds any ∫cp°/T dT its own cp° allows' }],
  NH3: [{ T: 5100, property: 'Cp', rel: 1.4e-3, why: 'seven cp terms do not follow the curvature of table H-083 near 5100 K' }],
};

describe.each(TABLES)('%s against NIST-JANAF table %s', (species, file) => {
  const gas = idealGas(species, { basis: 'molar' });
  const rows = readJanaf(file).filter((r) => r.T >= 200 && r.T <= 6000);
  const exceptions = EXCEPTIONS[species] ?? [];
  const tolerance = (T: number, property: 'Cp' | 'S') => exceptions.find((e) => e.T === T && e.property === property)?.rel ?? 1e-3;

  it(`at every tabulated temperature 200–6000 K (${rows.length} rows): cp°, S°, H° − H°(298.15 K) within 0.1 %`, () => {
    expect(rows.length).toBeGreaterThan(50);
    for (const row of rows) {
      const t = quantity(row.T, 'K');
      expectClose(gas.cp(t).in('J/(mol·K)'), row.Cp, { rel: tolerance(row.T, 'Cp') });
      expectClose(gas.sStandard(t).in('J/(mol·K)'), row.S, { rel: tolerance(row.T, 'S') });
      // 0.1 % of the tabulated value, and the table's last printed digit (0.001 kJ/mol) near 298.15 K
      expectClose(gas.hSensible(t).in('kJ/mol'), row.dH, { rel: 1e-3, abs: 5e-4 });
    }
  });
  it.each(exceptions)('the exception at $T K ($property) is real: outside 0.1 %, inside its recorded bound ($why)', ({ T, property, rel }) => {
    const row = janafAt(file, T);
    const t = quantity(T, 'K');
    const value = property === 'Cp' ? gas.cp(t).in('J/(mol·K)') : gas.sStandard(t).in('J/(mol·K)');
    const tabulated = property === 'Cp' ? row.Cp : row.S;
    expect(Math.abs(value - tabulated) / tabulated).toBeGreaterThan(1e-3);
    expect(Math.abs(value - tabulated) / tabulated).toBeLessThan(rel);
  });
  it('the enthalpy of formation at 298.15 K is JANAF ΔfH° (the fit follows JANAF’s formation enthalpy)', () => {
    const row = janafAt(file, 298.15);
    expectClose(gas.h('298.15 K').in('kJ/mol'), row.fH, { abs: 1e-6 });
  });
});

describe('the H2S finding is in the table itself (NIST-JANAF H-080)', () => {
  it('S°(298.15 K) − S°(200 K) exceeds the largest ∫cp°/T dT the tabulated cp° allows, while H° − H°(298.15 K) lies inside the bounds of ∫cp° dT', () => {
    const a = janafAt('H-080.txt', 200);
    const b = janafAt('H-080.txt', 298.15);
    // for any cp° between its tabulated ends (33.380 and 34.192 J/(mol·K)) over the interval:
    // ∫cp°/T dT ≤ max cp° · ln(T2/T1) and min cp° · ΔT ≤ ∫cp° dT ≤ max cp° · ΔT
    const lo = Math.min(a.Cp, b.Cp);
    const hi = Math.max(a.Cp, b.Cp);
    expect(b.S - a.S).toBeGreaterThan(hi * Math.log(b.T / a.T) + 0.05);
    expect((b.dH - a.dH) * 1000).toBeGreaterThan(lo * (b.T - a.T));
    expect((b.dH - a.dH) * 1000).toBeLessThan(hi * (b.T - a.T));
  });
});
