/**
 * Gas constants from molar mass, molar masses from formulas, and physical constants.
 *
 * @module
 */
import { InvalidInputError, OutOfRangeError } from '../errors.js';
import { Quantity, readQuantity, type QuantityLike } from '../units/quantity.js';
import { MOLAR_GAS_CONSTANT } from './constants.js';
import { formulaMolarMass } from './formula.js';

export * from './constants.js';
export { parseFormula, formulaMolarMass, atomicWeight, knownElements } from './formula.js';

/**
 * Molar mass of a chemical formula from the CIAAW standard atomic weights (conventional values
 * for interval elements). Returned in g/mol.
 *
 * @param formula `"C3H8"`, `"CH3OH"`, `"Ca(OH)2"`, `"CuSO4·5H2O"`
 * @returns molar mass, shown in g/mol (SI value in kg/mol)
 * @throws {@link FormulaError} malformed formula or unknown element
 * @example
 * ```ts
 * molarMass('H2O').in('g/mol');   //=> 18.015
 * molarMass('C3H8').in('lbm/lbmol'); //=> 44.097
 * molarMass('H2o');               // throws FormulaError: unexpected "o"
 * ```
 */
export function molarMass(formula: string): Quantity<'molarMass'> {
  return Quantity.fromSI(formulaMolarMass(formula), 'molarMass', 'g/mol');
}

/**
 * Specific gas constant R = R̄/M, with R̄ = 8.314 462 618 153 24 J/(mol·K) (exact, 2019 SI).
 *
 * @param molarMassOrFormula a molar-mass quantity (`"28.97 g/mol"`, `quantity(28.97, 'g/mol')`)
 *   or a formula (`"N2"`, `"CO2"`)
 * @returns R, shown in kJ/(kg·K)
 * @throws {@link FormulaError} for a bad formula; {@link OutOfRangeError} for a molar mass ≤ 0
 * @example
 * ```ts
 * gasConstant('N2').in('kJ/(kg·K)');          //=> 0.29680...
 * gasConstant('28.97 g/mol').in('Btu/(lbm·°R)'); //=> 0.06855...
 * ```
 */
export function gasConstant(molarMassOrFormula: QuantityLike<'molarMass'> | string): Quantity<'specificHeat'> {
  let m: number;
  if (typeof molarMassOrFormula === 'string' && !/^\s*[+-]?[\d.]/.test(molarMassOrFormula)) {
    m = formulaMolarMass(molarMassOrFormula);
  } else if (typeof molarMassOrFormula === 'string' || molarMassOrFormula instanceof Quantity) {
    m = readQuantity(molarMassOrFormula as QuantityLike<'molarMass'>, 'molarMass', 'M');
  } else {
    throw new InvalidInputError('input.invalid', 'M', 'gasConstant needs a molar mass such as "28.97 g/mol" or a formula such as "N2"');
  }
  if (!(m > 0)) throw new OutOfRangeError({ quantity: 'M', value: m * 1000, min: 0, max: Infinity, unit: 'g/mol', scope: 'molar mass' }, `molar mass must be positive; got ${m * 1000} g/mol`);
  return Quantity.fromSI(MOLAR_GAS_CONSTANT / m, 'specificHeat', 'kJ/(kg·K)');
}
