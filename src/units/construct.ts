/**
 * Making quantities from numbers and text, and reading inputs of an expected dimension: `quantity`,
 * `temperatureDifference` and `readQuantity`, the entry points every facade reads through.
 *
 * @module
 */
import { DimensionError, HeatstateError, InvalidInputError, OutOfRangeError } from '../errors.js';
import { checkFinite, checkOptions, checkString, describeValue } from './check.js';
import { DIMENSIONS, isDimension, SI_UNIT, type Dimension } from './dimensions.js';
import { previewText } from './expression.js';
import { ambientPa, describe, Quantity, type DimensionOfText, type QuantityInput, type QuantityLike, type QuantityOptions } from './quantity.js';
import { asDimension, DEFAULT_AMBIENT_PA, resolveUnit, toSI } from './registry.js';
import type { DimensionOfUnit, KnownUnit, UnitOf } from './spellings.js';
import { splitQuantityText } from './text.js';

/** A quantity from a number and a unit (the checks every path shares). */
export function build(value: number, unit: string, options: QuantityOptions | undefined, forced?: Dimension, parameter = 'unit'): Quantity {
  if (!Number.isFinite(value)) {
    throw new InvalidInputError('input.not-finite', 'value', `a quantity needs a finite number; got ${value} ${previewText(unit)}`);
  }
  let resolved = resolveUnit(unit);
  if (forced !== undefined) resolved = asDimension(resolved, forced, parameter);
  const amb = ambientPa(options, DEFAULT_AMBIENT_PA);
  const si = toSI(value, resolved, amb);
  if (!Number.isFinite(si)) {
    throw new InvalidInputError('input.not-finite', 'value', `${value} ${unit} overflows double precision in SI (${SI_UNIT[resolved.dimension]})`);
  }
  if (si === 0 && value !== 0 && resolved.kind !== 'temperature' && resolved.kind !== 'gauge') {
    throw new InvalidInputError('input.invalid', 'value', `${value} ${unit} underflows to 0 in SI (${SI_UNIT[resolved.dimension]}); no measurement is that small`);
  }
  if (resolved.dimension === 'temperature' && si < 0) {
    throw new OutOfRangeError(
      { quantity: 'T', value: si, min: 0, max: Infinity, unit: 'K', scope: 'absolute temperature' },
      `${value} ${unit} is below absolute zero (${si.toPrecision(6)} K); if you meant a temperature difference, write it as "Δ${unit}" or use temperatureDifference()`,
    );
  }
  if (resolved.kind === 'gauge' && si < 0) {
    throw new OutOfRangeError(
      { quantity: 'p', value: si, min: 0, max: Infinity, unit: 'Pa', scope: 'absolute pressure' },
      `${value} ${unit} is below vacuum (absolute ${si.toPrecision(6)} Pa with ambient ${amb} Pa)`,
    );
  }
  return new Quantity(resolved.dimension, si, value, unit, amb);
}


/**
 * Makes a quantity from a number and a unit, or from text such as `"500 psia"`.
 *
 * Units: SI with prefixes, US customary, and bar, atm, mmHg, inHg, inH2O, kgf/cm², kcal, kWh, therm,
 * MMBtu, TR; compound units as written in data sheets (`kJ/(kg·K)`, `kJ/kg/K`, `Btu/(lbm·°R)`,
 * `ft³/lbm`). Factors are the exact NIST SP 811 definitions. `°F`, `°C` alone are absolute
 * temperatures; prefix `Δ` for a difference (`Δ°F`). Gauge units (`psig`, `barg`, `kPag`,
 * `kgf/cm²g`) add the ambient pressure (default 101 325 Pa; set `options.ambient`).
 * `ton` is refused as ambiguous: write `TR` (refrigeration), `t` (metric) or `ton_short`.
 *
 * Unit text known only at run time (a `string`) is accepted and checked at run time; the result's
 * dimension is then unknown to the compiler until narrowed with `.as(...)`.
 *
 * @throws {@link UnitError} unknown unit (with suggestions) or unreadable text
 * @throws {@link InvalidInputError} NaN, infinite or overflowing value; arguments of the wrong type
 * @throws {@link OutOfRangeError} a temperature below absolute zero, a gauge pressure below vacuum
 *
 * @example
 * ```ts
 * quantity(500, 'psia').in('MPa');      //=> 3.4473786465841805
 * quantity('300 °F').in('K');           //=> 422.03888888888895
 * quantity('2.5 kJ/kg/K').in('Btu/(lbm·°R)'); //=> 0.5971147415687398
 * quantity('-500 °F');                  // throws OutOfRangeError: below absolute zero
 * quantity(1, 'C');                     // throws UnitError: unknown unit "C"; did you mean "°C" or "degC"?
 * ```
 */
export function quantity<U extends KnownUnit>(value: number, unit: U, options?: QuantityOptions): Quantity<DimensionOfUnit<U>>;
export function quantity<T extends string>(text: T, options?: QuantityOptions): Quantity<DimensionOfText<T>>;
export function quantity(value: number, unit: string, options?: QuantityOptions): Quantity;
export function quantity(a: number | string, b?: string | QuantityOptions, c?: QuantityOptions): Quantity {
  if (typeof a === 'string') {
    checkOptions(b, 'options');
    const [value, unit] = splitQuantityText(a);
    return build(value, unit, b as QuantityOptions | undefined);
  }
  if (typeof a !== 'number') {
    throw new InvalidInputError('input.invalid', 'value', `quantity() needs a number and a unit, or text such as "500 psia"; got ${describeValue(a)}`);
  }
  checkString(b, 'unit', `a unit (a string such as "kPa") after the number ${a}`);
  checkOptions(c, 'options');
  return build(a, b, c);
}

type DifferenceUnit = UnitOf<'temperature'> | UnitOf<'temperatureDifference'>;
/** A literal must be a temperature or difference spelling; a run-time string is checked at run time. */
type DifferenceUnitCheck<U> = string extends U ? unknown : U extends DifferenceUnit ? unknown : DifferenceUnit;

/**
 * A temperature difference (a rise or a drop), in K, °C, °F or °R degrees.
 * A difference of 50 °F is 27.78 K; compare `quantity(50, '°F')`, the temperature 283.15 K.
 *
 * @example
 * ```ts
 * temperatureDifference(50, '°F').in('K');   //=> 27.77777777777778
 * temperatureDifference(10, 'K').in('Δ°F');  //=> 18
 * ```
 */
export function temperatureDifference<U extends DifferenceUnit | (string & {})>(value: number, unit: U & DifferenceUnitCheck<U>): Quantity<'temperatureDifference'> {
  checkFinite(value, 'value');
  checkString(unit, 'unit');
  return build(value, unit, undefined, 'temperatureDifference') as Quantity<'temperatureDifference'>;
}

/**
 * Reads an input of an expected dimension and returns its SI value: the single entry point of
 * every facade function. Accepts a `Quantity` or unit text (literal text is checked by the
 * compiler; a run-time `string` is checked here). Text in a unit shared by dimensions of one
 * shape reads as the expected one (`"6.5 kJ/(kg·K)"` as a specificEntropy). A bare number is
 * refused, since its unit would be a guess.
 *
 * @param input the caller's value
 * @param dimension what it must be
 * @param parameter its name in the caller's API, for messages (`T`, `p`, `T1`)
 * @throws {@link DimensionError} wrong dimension; {@link InvalidInputError} NaN, infinity, bare number
 * @example
 * ```ts
 * readQuantity('14.7 psig', 'pressure', 'p');   //=> 202677.9322095749 (Pa)
 * // @ts-expect-error: unit text of a temperature where a pressure belongs does not compile
 * readQuantity('300 K', 'pressure', 'p');      // throws DimensionError: p must be a pressure
 * ```
 */
export function readQuantity<D extends Dimension, I extends QuantityLike<D> | string = QuantityLike<D>>(input: QuantityInput<D, I>, dimension: D, parameter: string): number {
  if (typeof parameter !== 'string') throw new InvalidInputError('input.invalid', 'parameter', `readQuantity: parameter must be the input's name (a string); got ${describeValue(parameter)}`);
  if (!isDimension(dimension)) throw new InvalidInputError('input.invalid', 'dimension', `readQuantity: dimension must be one of ${Object.keys(DIMENSIONS).join(', ')}; got ${describeValue(dimension)}`);
  let q: Quantity;
  const given = input as unknown;
  if (given instanceof Quantity) {
    q = given;
  } else if (typeof given === 'string') {
    const [value, unit] = splitQuantityText(given);
    const u = resolveUnit(unit);
    let fits = true;
    try {
      asDimension(u, dimension, parameter);
    } catch (e) {
      if (!(e instanceof HeatstateError)) throw e;
      fits = false;
    }
    if (!fits) {
      throw new DimensionError(dimension, u.dimension, `${parameter} must be a ${describe(dimension)}; got ${previewText(given.trim())} (a ${describe(u.dimension)})`, parameter);
    }
    q = build(value, unit, undefined, dimension, parameter);
  } else if (typeof given === 'number') {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} = ${given} has no unit; pass a quantity or text such as "${exampleOf(dimension)}"`);
  } else {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a quantity or unit text such as "${exampleOf(dimension)}"; got ${describeValue(given)}`);
  }
  if (q.dimension !== dimension) {
    throw new DimensionError(dimension, q.dimension, `${parameter} must be a ${describe(dimension)}; got ${q.toString()} (a ${describe(q.dimension)})`, parameter);
  }
  if (!Number.isFinite(q.si)) throw new InvalidInputError('input.not-finite', parameter, `${parameter} must be finite; got ${q.toString()}`);
  return q.si;
}

function exampleOf(dimension: Dimension): string {
  return `1 ${SI_UNIT[dimension]}`;
}
