/**
 * Argument checks shared by the public functions of `heatstate/units`: each names the argument,
 * what was expected and what was given, and throws a typed error (never a TypeError).
 *
 * @module
 */
import { InvalidInputError } from '../errors.js';

/** A short description of any value for error messages: `null`, `undefined`, `the number 5`, `an object`. */
export function describeValue(x: unknown): string {
  if (x === null) return 'null';
  if (x === undefined) return 'undefined';
  switch (typeof x) {
    case 'string':
      return x.length <= 60 ? `the text "${x}"` : `a text of ${x.length} characters`;
    case 'number':
      return `the number ${String(x)}`;
    case 'boolean':
      return `the boolean ${String(x)}`;
    case 'bigint':
      return `the bigint ${String(x)}n`;
    case 'symbol':
      return 'a symbol';
    case 'function':
      return 'a function';
    default:
      return Array.isArray(x) ? 'an array' : 'an object';
  }
}

/** Throws `input.invalid` naming `parameter` unless `x` is a string. */
export function checkString(x: unknown, parameter: string, what = 'unit text (a string)'): asserts x is string {
  if (typeof x !== 'string') throw new InvalidInputError('input.invalid', parameter, `${parameter} must be ${what}; got ${describeValue(x)}`);
}

/** Throws `input.invalid` unless `x` is a number, `input.not-finite` unless it is finite. */
export function checkFinite(x: unknown, parameter: string): asserts x is number {
  if (typeof x !== 'number') throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a number; got ${describeValue(x)}`);
  if (!Number.isFinite(x)) throw new InvalidInputError('input.not-finite', parameter, `${parameter} must be a finite number; got ${x}`);
}

/** Throws `input.invalid` unless `x` is undefined or a plain object (an options bag). */
export function checkOptions(x: unknown, parameter: string): void {
  if (x === undefined) return;
  if (x === null || typeof x !== 'object' || Array.isArray(x)) {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be an options object or left out; got ${describeValue(x)}`);
  }
}
