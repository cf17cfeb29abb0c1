/**
 * The gas figures of docs/guide/transport.md, recomputed: the guide states measurements of the code,
 * so this test keeps them true. The real-gas comparison uses the IAPWS transport releases (R12-08,
 * R15-11, with their density terms) for steam and the nitrogen equation of state in src/fluids.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fluid } from '../../src/fluids/index.js';
import { idealGas } from '../../src/ideal-gas/gas.js';
import { water } from '../../src/water/state.js';
import { waterThermalConductivity, waterViscosity } from '../../src/water/transport-properties.js';

const guide = readFileSync(new URL('../../docs/guide/transport.md', import.meta.url), 'utf8');
const pct = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x * 100).toFixed(1)} %`;

describe('docs/guide/transport.md, dilute gases', () => {
  it.each([
    ['500 °C', '1 MPa', '500 °C, 1 MPa'],
    ['500 °C', '10 MPa', '500 °C, 10 MPa'],
    ['500 °C', '25 MPa', '500 °C, 25 MPa'],
    ['300 °C', '5 MPa', '300 °C, 5 MPa'],
  ] as const)('steam at %s, %s: real (IAPWS, with the density terms) against dilute', (T, p, label) => {
    const rho = water.state({ T, p }).rho.si;
    const at = { T, rho: `${rho} kg/m³` } as never;
    const dilute = { T, rho: '1e-9 kg/m³' } as never;
    const mu = waterViscosity(at, { criticalEnhancement: false }).si / waterViscosity(dilute, { criticalEnhancement: false }).si - 1;
    const lambda = waterThermalConductivity(at).si / waterThermalConductivity(dilute, { criticalEnhancement: false }).si - 1;
    const row = `| ${label} | ${rho < 10 ? rho.toFixed(2) : rho.toFixed(1)} | ${pct(mu)} | ${pct(lambda)} |`;
    expect(guide).toContain(row);
  });
  it('nitrogen at 300 K and 10 MPa: within 0.6 % of the ideal-gas density, ρ/ρc = 0.36', () => {
    const st = fluid('nitrogen').state({ T: '300 K', p: '10 MPa' });
    const ideal = idealGas('N2').state({ T: '300 K', p: '10 MPa' }).rho.si;
    expect(Math.abs(st.rho.si / ideal - 1)).toBeLessThan(0.006);
    expect((st.rho.si / 313.3).toFixed(2)).toBe('0.36'); // ρc = 313.3 kg/m³ (data/fluids/nitrogen.json)
    expect(guide).toContain('within 0.6 % of ideal-gas density up to 10 MPa');
    for (const p of ['1 MPa', '5 MPa']) expect(Math.abs(fluid('nitrogen').state({ T: '300 K', p }).rho.si / idealGas('N2').state({ T: '300 K', p }).rho.si - 1)).toBeLessThan(0.006);
  });
  it('the table of checks states what the code computes', () => {
    for (const [id, mu, lambda] of [['H2', '8.89', '184.3'], ['CO', '17.68', '26.65'], ['NO', '19.14', '27.53'], ['N2O', '14.90', '18.57'], ['C2H6', '9.46', '23.07'], ['C3H8', '8.27', '19.00'], ['C2H4', '10.22', '22.07'], ['n-C4H10', '7.46', '17.28']] as const) {
      const gas = idealGas(id);
      const digits = (s: string) => s.split('.')[1]!.length;
      expect(gas.viscosity('300 K').in('µPa·s').toFixed(digits(mu))).toBe(mu);
      expect(gas.thermalConductivity('300 K').in('mW/(m·K)').toFixed(digits(lambda))).toBe(lambda);
      expect(guide).toContain(`| ${id} |`);
    }
  });
});
