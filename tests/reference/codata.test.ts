/**
 * Constants of the 2019 SI (CODATA 2018 recommended values; all exact by definition).
 */
import Decimal from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { AVOGADRO_PER_MOL, BOLTZMANN_J_PER_K, MOLAR_GAS_CONSTANT, STANDARD_ATMOSPHERE_PA, STANDARD_GRAVITY } from '../../src/chem/constants.js';
import { nearestDouble } from '../../scripts/generate-factors.js';

describe('2019 SI / CODATA 2018', () => {
  it('N_A = 6.022 140 76e23 /mol and k = 1.380 649e-23 J/K (exact)', () => {
    expect(AVOGADRO_PER_MOL).toBe(6.02214076e23);
    expect(BOLTZMANN_J_PER_K).toBe(1.380649e-23);
  });
  it('R̄ = N_A·k = 8.314 462 618 153 24 J/(mol·K), stored as the correctly rounded double of the exact product', () => {
    const E = Decimal.clone({ precision: 120 });
    const exactProduct = new E('6.02214076e23').times('1.380649e-23');
    expect(exactProduct.toString()).toBe('8.31446261815324');
    expect(MOLAR_GAS_CONSTANT).toBe(nearestDouble(exactProduct));
  });
  it('standard atmosphere 101 325 Pa and standard gravity 9.806 65 m/s² (exact; NIST SP 811)', () => {
    expect(STANDARD_ATMOSPHERE_PA).toBe(101325);
    expect(STANDARD_GRAVITY).toBe(9.80665);
  });
});
