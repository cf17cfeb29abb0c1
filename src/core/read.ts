/**
 * The facade kit's input readers: one place where each class of bad input is caught. Each reader
 * takes the caller's value, checks its type, dimension and bounds, records the caller's unit in the
 * call's {@link CallUnits}, and returns the SI number, or throws a typed error naming the input and
 * the valid range in the caller's unit (with SI beside it).
 *
 * @module
 */
import { formatNumber, InvalidInputError, OutOfRangeError } from '../errors.js';
import type { Dimension } from '../units/dimensions.js';
import { SI_UNIT } from '../units/dimensions.js';
import { readQuantity } from '../units/quantity.js';
import { CallUnits } from './call-units.js';

/** Bounds of an input in SI, inclusive unless stated, with the scope named in messages. */
export interface Bounds {
  /** Lower bound (SI). */
  readonly min: number;
  /** Upper bound (SI). */
  readonly max: number;
  /** Whose range it is: `IAPWS-IF97`, `the data for copper`. */
  readonly scope: string;
  /** True when `min` itself is excluded (absolute pressure > 0). */
  readonly minExclusive?: boolean;
  /** A hint appended to the message (`pass { extrapolate: true } …`). */
  readonly hint?: string;
}

/**
 * An OutOfRangeError for `value` (SI) outside `bounds`, in the caller's unit when one was noted.
 * Bounds are always numbers (never NaN).
 */
export function rangeError(parameter: string, value: number, dimension: Dimension, bounds: Bounds, units?: CallUnits, message?: string): OutOfRangeError {
  const siUnit = SI_UNIT[dimension];
  const given = units?.range(value, bounds.min, bounds.max, dimension);
  const range = { quantity: parameter, value, min: bounds.min, max: bounds.max, unit: siUnit, scope: bounds.scope, ...(given !== undefined && given.unit !== siUnit ? { given } : {}) };
  const err = new OutOfRangeError(range, message);
  if (bounds.hint !== undefined && message === undefined) {
    return new OutOfRangeError(range, `${err.message}${bounds.hint}`);
  }
  return err;
}

function inBounds(x: number, b: Bounds): boolean {
  return (b.minExclusive === true ? x > b.min : x >= b.min) && x <= b.max;
}

/**
 * Reads a quantity of `dimension` and returns its SI value; checks `bounds` when given.
 * @throws {@link DimensionError} wrong dimension; {@link InvalidInputError} NaN, infinity, a bare
 *   number or a wrong type; {@link OutOfRangeError} outside `bounds`
 * @example
 * ```ts
 * readInput('212 °F', 'temperature', 'T');   //=> 373.15
 * ```
 */
export function readInput<D extends Dimension>(input: unknown, dimension: D, parameter: string, bounds?: Bounds, units?: CallUnits): number {
  const si = readQuantity<D, string>(input as string, dimension, parameter);
  units?.note(input, dimension);
  if (bounds !== undefined && !inBounds(si, bounds)) throw rangeError(parameter, si, dimension, bounds, units);
  return si;
}

/** Bounds of an absolute temperature with no model limit: above 0 K. */
export const ABSOLUTE_TEMPERATURE: Bounds = { min: 0, max: Infinity, scope: 'absolute temperature', minExclusive: true };

/**
 * Reads an absolute temperature (K) within `bounds` (default: above absolute zero).
 * @example
 * ```ts
 * readTemperature('25 °C', 'T');   //=> 298.15
 * ```
 */
export function readTemperature(input: unknown, parameter: string, bounds: Bounds = ABSOLUTE_TEMPERATURE, units?: CallUnits): number {
  return readInput(input, 'temperature', parameter, bounds, units);
}

/**
 * Reads an absolute pressure (Pa): positive, and within `max` of `bounds` when given. Gauge units
 * (`psig`, `barg`) are converted with their ambient pressure before the check.
 * @example
 * ```ts
 * readAbsolutePressure('14.7 psia', 'p');   //=> 101352.93...
 * readAbsolutePressure('-20 psig', 'p');    // throws OutOfRangeError: below vacuum
 * ```
 */
export function readAbsolutePressure(input: unknown, parameter: string, bounds?: { readonly max: number; readonly scope: string }, units?: CallUnits): number {
  const p = readQuantity<'pressure', string>(input as string, 'pressure', parameter);
  units?.note(input, 'pressure');
  const max = bounds?.max ?? Infinity;
  const scope = bounds?.scope ?? 'absolute pressure';
  if (!(p > 0)) {
    throw rangeError(parameter, p, 'pressure', { min: 0, max, scope, minExclusive: true }, units, `${parameter} = ${units?.describe(p, 'pressure', 'Pa') ?? `${formatNumber(p)} Pa`}: absolute pressure must be positive (write gauge pressures as "psig", "barg" or "kPag")`);
  }
  if (p > max) throw rangeError(parameter, p, 'pressure', { min: 0, max, scope, minExclusive: true }, units);
  return p;
}

/**
 * Reads a positive, finite density (kg/m³).
 * @example
 * ```ts
 * readPositiveDensity('1000 kg/m³', 'rho');   //=> 1000
 * ```
 */
export function readPositiveDensity(input: unknown, parameter: string, units?: CallUnits): number {
  return readInput(input, 'density', parameter, { min: 0, max: Infinity, scope: 'a density (must be positive)', minExclusive: true }, units);
}

/**
 * Reads a plain number in [min, max] (a fraction, a quality, an efficiency).
 * @throws {@link InvalidInputError} not a finite number; {@link OutOfRangeError} outside [min, max]
 * @example
 * ```ts
 * readNumber(0.5, 'x', { min: 0, max: 1, scope: 'quality (vapour mass fraction)' });   //=> 0.5
 * ```
 */
export function readNumber(input: unknown, parameter: string, bounds: Bounds): number {
  if (typeof input !== 'number' || !Number.isFinite(input)) {
    const code = typeof input === 'number' ? 'input.not-finite' : 'input.invalid';
    throw new InvalidInputError(code, parameter, `${parameter} must be a finite number from ${formatNumber(bounds.min)} to ${formatNumber(bounds.max)} (${bounds.scope}); got ${describeValue(input)}`);
  }
  if (!inBounds(input, bounds)) {
    throw new OutOfRangeError({ quantity: parameter, value: input, min: bounds.min, max: bounds.max, unit: '1', scope: bounds.scope });
  }
  return input;
}

/** Bounds of a vapour quality. */
export const QUALITY: Bounds = { min: 0, max: 1, scope: 'quality (vapour mass fraction)' };

/** Reads a quality x in [0, 1]. */
export function readQuality(input: unknown, parameter = 'x'): number {
  return readNumber(input, parameter, QUALITY);
}

/**
 * Reads fractions that sum to 1 (within 1e-6, or scaled to 1 with `normalize`): returns names and values.
 * @throws {@link InvalidInputError} not an object, empty, a fraction that is not a finite number ≥ 0
 * @throws {@link OutOfRangeError} fractions that do not sum to 1 (unless `normalize`)
 * @example
 * ```ts
 * readFractions({ N2: 0.79, O2: 0.21 }, 'composition');   //=> [['N2', 'O2'], [0.79, 0.21]]
 * ```
 */
export function readFractions(input: unknown, parameter: string, normalize = false): [string[], number[]] {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be an object of fractions such as { N2: 0.79, O2: 0.21 }; got ${describeValue(input)}`);
  }
  const names = Object.keys(input);
  if (names.length === 0) throw new InvalidInputError('input.invalid', parameter, `${parameter} needs at least one component`);
  const values = names.map((n) => (input as Record<string, unknown>)[n]);
  values.forEach((v, i) => {
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0) throw new InvalidInputError('input.invalid', `${parameter}.${names[i]}`, `fraction of ${names[i]} must be a finite number ≥ 0; got ${describeValue(v)}`);
  });
  const nums = values as number[];
  const sum = nums.reduce((a, b) => a + b, 0);
  if (!(sum > 0)) throw new InvalidInputError('input.invalid', parameter, 'fractions sum to 0');
  if (Math.abs(sum - 1) > 1e-6 && !normalize) {
    throw new OutOfRangeError(
      { quantity: 'sum of fractions', value: sum, min: 1 - 1e-6, max: 1 + 1e-6, unit: '1', scope: parameter },
      `fractions sum to ${sum}, not 1 (within 1e-6); fix them or pass { normalize: true }`,
    );
  }
  return [names, nums.map((v) => v / sum)];
}

/**
 * Reads an option that must be one of `allowed` (or undefined, giving `fallback`).
 * @throws {@link InvalidInputError} another value, listing the valid ones
 * @example
 * ```ts
 * readChoice('molar', 'basis', ['mass', 'molar'], 'mass');   //=> 'molar'
 * readChoice('molr', 'basis', ['mass', 'molar'], 'mass');    // throws InvalidInputError: basis must be one of "mass", "molar"
 * ```
 */
export function readChoice<T extends string>(input: unknown, parameter: string, allowed: readonly T[], fallback: T): T {
  if (input === undefined) return fallback;
  if (typeof input === 'string' && (allowed as readonly string[]).includes(input)) return input as T;
  throw new InvalidInputError('input.invalid', parameter, `${parameter} must be one of ${allowed.map((a) => `"${a}"`).join(', ')}; got ${describeValue(input)}`);
}

/** Reads an optional boolean option. */
export function readFlag(input: unknown, parameter: string): boolean {
  if (input === undefined) return false;
  if (typeof input === 'boolean') return input;
  throw new InvalidInputError('input.invalid', parameter, `${parameter} must be true or false; got ${describeValue(input)}`);
}

/** Checks that an options argument is an object (or undefined) and has only known keys. */
export function readOptions<T extends object>(input: unknown, parameter: string, known: readonly string[]): Partial<T> {
  if (input === undefined) return {};
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    // an index in the options' place is most often an array's map or forEach calling the function
    const hint = Number.isInteger(input) ? ' (map and forEach pass the element index as the second argument: write list.map((x) => f(x)))' : '';
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be an object; got ${describeValue(input)}${hint}`);
  }
  for (const key of Object.keys(input)) {
    if (!known.includes(key)) throw new InvalidInputError('input.invalid', `${parameter}.${key}`, `unknown option "${key}"; ${parameter} takes ${known.map((k) => `"${k}"`).join(', ')}`);
  }
  return input as Partial<T>;
}

/**
 * Which of the accepted input sets a call gave: exactly one set, by its keys (undefined values do
 * not count). Refuses over-determined and under-determined input, naming what was given and the
 * sets accepted.
 * @returns the accepted set's keys joined with commas in the order listed (`'T,p'`)
 * @example
 * ```ts
 * readPair({ p: '1 bar', T: '300 K' }, 'water.state', [['T', 'p'], ['p', 'h']]);   //=> 'T,p'
 * readPair({ p: '1 bar', T: '300 K', h: '1 kJ/kg' }, 'water.state', [['T', 'p'], ['p', 'h']]);
 * // throws InvalidInputError: water.state got { p, T, h }: that is more inputs than a state needs
 * ```
 */
export function readPair(input: unknown, fn: string, accepted: readonly (readonly string[])[]): string {
  // the hot path (a valid pair) builds no strings and no closures: the lists are made for errors only
  const listOf = () => accepted.map((set) => `{ ${set.join(', ')} }`).join(', ');
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    throw new InvalidInputError('input.invalid', 'input', `${fn} takes one of ${listOf()}; got ${describeValue(input)}`);
  }
  const record = input as Record<string, unknown>;
  const keys = Object.keys(record);
  let count = 0;
  for (let i = 0; i < keys.length; i++) if (record[keys[i]!] !== undefined) count++;
  for (let s = 0; s < accepted.length; s++) {
    const set = accepted[s]!;
    if (set.length !== count) continue;
    let all = true;
    for (let j = 0; j < set.length && all; j++) all = record[set[j]!] !== undefined && Object.hasOwn(record, set[j]!);
    if (all) return pairKey(set);
  }
  const list = listOf();
  const given = keys.filter((k) => record[k] !== undefined);
  const unknown = given.filter((k) => !accepted.some((set) => set.includes(k)));
  const why =
    unknown.length > 0
      ? `${unknown.map((k) => `"${k}"`).join(', ')} ${unknown.length === 1 ? 'is' : 'are'} not an input of ${fn}`
      : accepted.some((set) => set.every((k) => given.includes(k)))
        ? 'that is more inputs than a state needs (over-determined): give exactly one of the sets'
        : 'that is not enough to fix a state (under-determined)';
  throw new InvalidInputError('input.invalid', 'input', `${fn} got { ${given.join(', ')} }: ${why}; it takes ${list}`);
}

const PAIR_KEYS = new WeakMap<readonly string[], string>();

/** `set.join(',')`, made once per accepted set (the sets are module constants of each facade). */
function pairKey(set: readonly string[]): string {
  let key = PAIR_KEYS.get(set);
  if (key === undefined) {
    key = set.join(',');
    PAIR_KEYS.set(set, key);
  }
  return key;
}

/** A short description of any value, for messages (never throws). */
export function describeValue(value: unknown): string {
  if (value === null) return 'null';
  if (value === undefined) return 'undefined';
  if (typeof value === 'string') return `"${value.length > 60 ? `${value.slice(0, 60)}…` : value}"`;
  if (typeof value === 'number' || typeof value === 'boolean' || typeof value === 'bigint') return String(value);
  if (typeof value === 'function') return 'a function';
  if (Array.isArray(value)) return `an array of ${value.length}`;
  if (ArrayBuffer.isView(value)) return `a ${value.constructor.name}`;
  return 'an object';
}

export { CallUnits };
