/**
 * Input types and readers of the humid-air facade: the compile-time check of each field (literal
 * unit text of the right dimension; a plain `string` is accepted and checked at run time), and the
 * readers for the two inputs the facade kit has no reader for: relative humidity (a fraction or
 * percent text) and humidity ratio (a plain number in kg/kg, or a humidity-ratio quantity).
 *
 * @module
 */
import type { CallUnits } from '../core/call-units.js';
import { describeValue, readInput } from '../core/read.js';
import { formatNumber, InvalidInputError, OutOfRangeError } from '../errors.js';
import type { Dimension } from '../units/dimensions.js';
import type { QuantityInput, QuantityLike } from '../units/quantity.js';

/** Relative humidity: a fraction 0–1, or text in percent such as `'50 %'`. */
export type RelativeHumidityInput = number | `${number} %` | `${number}%`;

/**
 * Humidity ratio (mass of water vapour per mass of dry air): a plain number in kg/kg, a
 * `Quantity<'humidityRatio'>`, or unit text such as `'10 g/kg'` or `'70 gr/lbm'`.
 */
export type HumidityRatioInput = number | QuantityLike<'humidityRatio'>;

/** The dimension of each quantity field of the humid-air facade's inputs. */
interface FieldDimensions {
  T: 'temperature';
  Twb: 'temperature';
  Tdp: 'temperature';
  h: 'specificEnergy';
  p: 'pressure';
  altitude: 'length';
  T2: 'temperature';
  Q: 'power';
  ADP: 'temperature';
  Tcondensate: 'temperature';
  Twater: 'temperature';
}

type QuantityField<D extends Dimension, I> = I extends undefined ? I : QuantityInput<D, I>;
type FlowField<I> = I extends undefined ? I : QuantityInput<'massFlow' | 'volumeFlow', I>;
type HumidityRatioField<I> = I extends undefined | number ? I : QuantityInput<'humidityRatio', I>;
type RelativeHumidityField<I> = I extends undefined | number ? I : string extends I ? I : I extends `${number} %` | `${number}%` ? I : `${number} %`;

/**
 * The compile-time check of a humid-air input object `P` whose allowed keys are `Allowed`: each
 * quantity field takes a `Quantity` of its dimension, literal unit text of that dimension, or a
 * plain `string` (checked at run time); `RH` takes a number or percent text; `W` a number or a
 * humidity ratio; keys in `Passed` (a state, a bypass factor) pass unchanged; any other key is an
 * error.
 */
export type Checked<P, Allowed extends string, Passed extends string = never> = {
  readonly [K in keyof P]: K extends Passed
    ? P[K]
    : K extends Allowed
      ? K extends keyof FieldDimensions
        ? QuantityField<FieldDimensions[K], P[K]>
        : K extends 'flow'
          ? FlowField<P[K]>
          : K extends 'RH' | 'RH2'
            ? RelativeHumidityField<P[K]>
            : K extends 'W' | 'W2'
              ? HumidityRatioField<P[K]>
              : K extends 'steam'
                ? Checked<P[K], 'p' | 'T'>
                : never
      : never;
};

/**
 * Reads a relative humidity (a fraction, or percent text such as `'50 %'`) as a fraction in [0, 1].
 * @example
 * ```ts
 * readRelativeHumidity('45 %');   //=> 0.45
 * readRelativeHumidity(45);       // throws OutOfRangeError: … (relative humidity is a fraction: write 0.45 or "45 %")
 * ```
 */
export function readRelativeHumidity(input: unknown, parameter = 'RH'): number {
  let value: number;
  let percent = false;
  if (typeof input === 'number') {
    value = input;
  } else if (typeof input === 'string') {
    const m = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*%\s*$/.exec(input.length > 80 ? '' : input);
    if (!m) throw new InvalidInputError('input.invalid', parameter, `cannot read ${parameter} = ${describeValue(input)}: give a fraction 0–1 (0.5) or percent text ("50 %")`);
    value = Number(m[1]) / 100;
    percent = true;
  } else {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a fraction 0–1 or percent text such as "50 %"; got ${describeValue(input)}`);
  }
  if (!Number.isFinite(value)) throw new InvalidInputError('input.not-finite', parameter, `${parameter} must be a finite number from 0 to 1 (relative humidity); got ${describeValue(input)}`);
  if (value < 0 || value > 1) throw relativeHumidityError(parameter, value, 0, 1, 'relative humidity', percent);
  return value;
}

/**
 * An OutOfRangeError for a relative humidity, with bounds as fractions (and in percent when the
 * caller wrote percent text). A number above 1 and at most 100 gets the hint that RH is a fraction.
 */
export function relativeHumidityError(parameter: string, value: number, min: number, max: number, scope: string, percent: boolean, minExclusive = false): OutOfRangeError {
  const given = percent ? { unit: '%', value: value * 100, min: min * 100, max: max * 100 } : undefined;
  const range = { quantity: parameter, value, min, max, unit: '1', scope, ...(given === undefined ? {} : { given }) };
  const show = (x: number) => (percent ? `${formatNumber(x * 100)} % (${formatNumber(x)})` : formatNumber(x));
  const where = value > max ? `above the upper limit of ${scope} (${show(max)})` : value < min || (minExclusive && value === min) ? `${minExclusive ? 'at or below' : 'below'} the lower limit of ${scope} (${show(min)})` : `outside the valid range of ${scope}`;
  const hint = !percent && value > 1 && value <= 100 ? ` (relative humidity is a fraction: write ${formatNumber(value / 100)} or "${formatNumber(value)} %")` : '';
  return new OutOfRangeError(range, `${parameter} = ${show(value)} is ${where}; valid range ${minExclusive ? 'above ' : ''}${show(min)} to ${show(max)}${hint}`);
}

/** Bounds of a humidity ratio: at least 0. */
const HUMIDITY_RATIO = { min: 0, max: Infinity, scope: 'a humidity ratio (at least 0)' };

/**
 * Reads a humidity ratio in kg/kg: a plain number (kg/kg), a `Quantity<'humidityRatio'>` or unit
 * text (`'10 g/kg'`, `'70 gr/lbm'`); at least 0.
 * @example
 * ```ts
 * readHumidityRatio('70 gr/lbm', 'W');   //=> 0.01
 * readHumidityRatio(0.012, 'W');         //=> 0.012
 * ```
 */
export function readHumidityRatio(input: unknown, parameter: string, units?: CallUnits): number {
  if (typeof input === 'number') {
    if (!Number.isFinite(input)) throw new InvalidInputError('input.not-finite', parameter, `${parameter} must be a finite humidity ratio (kg/kg, or text such as "10 g/kg"); got ${input}`);
    if (input < 0) throw new OutOfRangeError({ quantity: parameter, value: input, min: 0, max: Infinity, unit: 'kg/kg', scope: HUMIDITY_RATIO.scope });
    return input;
  }
  return readInput(input as QuantityLike<'humidityRatio'>, 'humidityRatio', parameter, HUMIDITY_RATIO, units);
}
