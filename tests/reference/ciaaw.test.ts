/**
 * Standard atomic weights: CIAAW/IUPAC "Standard atomic weights of the elements 2021"
 * (Prohaska et al., Pure Appl. Chem. 94, 573, 2022), conventional values for interval elements.
 * Values recalled from the published table (from memory).
 */
import { describe, expect, it } from 'vitest';
import { atomicWeight, knownElements, molarMass } from '../../src/chem/index.js';
import { expectClose } from '../helpers/tolerance.js';

describe('CIAAW standard atomic weights (from memory)', () => {
  it.each([
    ['H', 1.008],
    ['He', 4.002602],
    ['C', 12.011],
    ['N', 14.007],
    ['O', 15.999],
    ['Ne', 20.1797],
    ['S', 32.06],
    ['Cl', 35.45],
    ['Ar', 39.95],
    ['Fe', 55.845],
    ['Cu', 63.546],
    ['Kr', 83.798],
    ['Hg', 200.592],
    ['U', 238.02891],
  ])('%s = %d', (el, w) => {
    expect(atomicWeight(el)).toBe(w);
  });
  it('covers H to Kr plus I, Xe, Hg, Pb and U', () => {
    const symbols = knownElements();
    expect(symbols.slice(0, 36)).toHaveLength(36);
    for (const el of ['H', 'He', 'Li', 'Na', 'K', 'Kr', 'I', 'Xe', 'Hg', 'Pb', 'U']) expect(symbols).toContain(el);
    expect(symbols).toHaveLength(41);
  });
});

describe('molar masses from CIAAW weights (values as tabulated in handbooks, from memory)', () => {
  it.each([
    ['H2O', 18.015],
    ['CO2', 44.009],
    ['N2', 28.014],
    ['O2', 31.998],
    ['CH4', 16.043],
    ['C3H8', 44.097],
    ['NH3', 17.031],
    ['CuSO4·5H2O', 249.68],
    ['Ca(OH)2', 74.093],
  ])('M(%s) = %d g/mol', (formula, m) => {
    expectClose(molarMass(formula).in('g/mol'), m, { abs: 0.0006 + 1e-5 * m });
  });
});
