import { describe, expect, it } from 'vitest';
import { FormulaError, OutOfRangeError } from '../../src/errors.js';
import { gasConstant, molarMass, parseFormula } from '../../src/chem/index.js';
import { quantity } from '../../src/units/index.js';

describe('parseFormula', () => {
  it.each([
    ['C3H8', { C: 3, H: 8 }],
    ['CH3OH', { C: 1, H: 4, O: 1 }],
    ['Ca(OH)2', { Ca: 1, O: 2, H: 2 }],
    ['CuSO4·5H2O', { Cu: 1, S: 1, O: 9, H: 10 }],
    ['CuSO4*5H2O', { Cu: 1, S: 1, O: 9, H: 10 }],
    ['[Co(NH3)6]Cl3', { Co: 1, N: 6, H: 18, Cl: 3 }],
    ['C7.8H15.6', { C: 7.8, H: 15.6 }],
    ['CO', { C: 1, O: 1 }],
    ['Co', { Co: 1 }],
  ])('%s', (formula, counts) => {
    expect(parseFormula(formula)).toEqual(counts);
  });

  it.each([
    ['', 0],
    ['H2o', 2],
    ['Ca(OH2', 6],
    ['CaOH)2', 4],
    ['Qq2', 0],
    ['C0H4', 1],
    ['H2O·', 4],
  ])('rejects %j with FormulaError at position %d', (formula, position) => {
    try {
      parseFormula(formula);
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(FormulaError);
      expect((e as FormulaError).code).toBe('formula.invalid');
      expect((e as FormulaError).position).toBe(position);
    }
  });
});

describe('gasConstant', () => {
  it('accepts a formula, a molar-mass quantity or molar-mass text', () => {
    const fromFormula = gasConstant('N2').si;
    expect(gasConstant(molarMass('N2')).si).toBe(fromFormula);
    expect(gasConstant(`${molarMass('N2').in('g/mol')} g/mol` as `${number} g/mol`).si).toBeCloseTo(fromFormula, 10);
    expect(gasConstant(quantity(28.014, 'kg/kmol')).si).toBeCloseTo(fromFormula, 10);
  });
  it('refuses a molar mass that is not positive', () => {
    expect(() => gasConstant('0 g/mol')).toThrow(OutOfRangeError);
  });
  it('refuses a quantity of another dimension', () => {
    // @ts-expect-error a pressure is not a molar mass
    expect(() => gasConstant(quantity(1, 'bar'))).toThrow(/must be a molar mass/);
  });
});
