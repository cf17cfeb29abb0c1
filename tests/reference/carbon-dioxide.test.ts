/**
 * Carbon dioxide by Span & Wagner, J. Phys. Chem. Ref. Data 25 (1996) 1509, with the
 * coefficients recalled from memory in data/fluids/carbon-dioxide.json. The set does NOT verify and
 * does not ship ("loadable": false); these tests reproduce the recorded finding, so that a corrected
 * transcription shows up here (and then its checks decide whether it ships).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { UnknownNameError } from '../../src/errors.js';
import { fluid, fluidNames } from '../../src/fluids/index.js';
import { idealCp, pressure, readFluidFile, saturation } from '../fluids/unverified.js';

const co2 = readFluidFile('carbon-dioxide');

describe('carbon dioxide, Span & Wagner 1996 (from memory): the recorded finding', () => {
  it('is not loadable, carries its finding, and the library refuses R-744', () => {
    expect(co2.loadable).toBe(false);
    expect(co2.finding).toMatch(/Does not verify/);
    expect(fluidNames()).not.toContain('carbon dioxide');
    expect(() => fluid('R-744')).toThrow(UnknownNameError);
  });

  it('the critical point fails: p(Tc, ρc) = 7.50686 MPa, not pc = 7.3773 MPa (Table 3, from memory); (∂p/∂ρ)_T ≠ 0', () => {
    // just off δ = 1, where the non-analytic terms' derivatives are 0/0 in the oracle's form
    const [p] = pressure(co2, co2.critical.T, co2.critical.rho * (1 + 1e-9));
    expect(p / 1e6).toBeCloseTo(7.50686, 4);
    expect(Math.abs(p / co2.critical.p - 1)).toBeGreaterThan(0.01);
    const slope = (pressure(co2, co2.critical.T, co2.critical.rho * 1.001)[0] - pressure(co2, co2.critical.T, co2.critical.rho * 0.999)[0]) / (0.002 * co2.critical.rho);
    expect(slope).toBeGreaterThan(1000);
  });

  it('near the triple point it is close but not right: p_t = 0.517972 MPa vs 0.51795 MPa (Table 3, from memory)', () => {
    const s = saturation(co2, 216.592, 1178, 13.8);
    expect(s.p / 1e6).toBeCloseTo(0.517972, 5);
    const s0 = saturation(co2, 273.15, 927, 97.6);
    expect(s0.p / 1e6).toBeCloseTo(3.48727, 4); // 3.4851 MPa (common practice)
  });

  it('the ideal-gas part verifies: cp° within 2e-4 of NIST-JANAF C-095 (200-1000 K)', () => {
    const janaf = readFileSync(new URL('./data/janaf/C-095.txt', import.meta.url), 'utf8').split('\n');
    const M = 0.0440098;
    for (const T of [200, 300, 500, 1000]) {
      const row = janaf.find((l) => l.split('\t')[0] === String(T))!.split('\t');
      const cp = Number(row[1]) / M; // J/(mol·K) to J/(kg·K)
      expect(Math.abs(idealCp(co2, T) / cp - 1)).toBeLessThan(2e-4);
    }
  });
});
