/**
 * R-134a by Tillner-Roth & Baehr, J. Phys. Chem. Ref. Data 23 (1994) 657, with the coefficients
 * recalled from memory in data/fluids/r-134a.json. The set does NOT verify and does not ship
 * ("loadable": false); these tests reproduce the recorded finding.
 */
import { describe, expect, it } from 'vitest';
import { UnknownNameError } from '../../src/errors.js';
import { fluid } from '../../src/fluids/index.js';
import { pressure, readFluidFile, saturation } from '../fluids/unverified.js';

const r134a = readFluidFile('r-134a');

describe('R-134a, Tillner-Roth & Baehr 1994 (from memory): the recorded finding', () => {
  it('is not loadable and the library refuses it', () => {
    expect(r134a.loadable).toBe(false);
    expect(r134a.finding).toMatch(/Does not verify/);
    expect(() => fluid('R-134a')).toThrow(UnknownNameError);
  });

  it('the critical point fails: p(Tc, ρc) = 4.37766 MPa, not 4.05629 MPa (from memory)', () => {
    const [p, slope] = pressure(r134a, r134a.critical.T, r134a.critical.rho);
    expect(p / 1e6).toBeCloseTo(4.37766, 4);
    expect(Math.abs(p / r134a.critical.p - 1)).toBeGreaterThan(0.05);
    expect(slope).toBeGreaterThan(1000);
  });

  it('the normal boiling point fails: 98.002 kPa at 247.076 K, not 101.325 kPa (common practice)', () => {
    const s = saturation(r134a, 247.076, 1377, 5.26);
    expect(s.p / 1e3).toBeCloseTo(98.002, 2);
    expect(Math.abs(s.p / 101325 - 1)).toBeGreaterThan(0.02);
  });
});
