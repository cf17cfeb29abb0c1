/**
 * The error classes of heatstate, in one place.
 *
 * Every error is a {@link HeatstateError} with a stable `code` (a short string that
 * will not change between releases) and machine-readable data beside the message.
 * Messages say what was given, what was expected and how to fix it.
 *
 * @module
 */

/** Stable error codes. New codes may be added; existing ones never change meaning. */
export type ErrorCode =
  | 'unit.unknown'
  | 'unit.syntax'
  | 'dimension.mismatch'
  | 'input.not-finite'
  | 'input.invalid'
  | 'result.not-finite'
  | 'range.outside'
  | 'name.unknown'
  | 'property.unavailable'
  | 'formula.invalid'
  | 'definition.invalid'
  | 'solve.no-convergence'
  | 'internal.unexpected';

/**
 * The kinds an error instance belongs to, under a registry symbol, so that `instanceof` holds across
 * copies of heatstate loaded into one process (its ESM and CommonJS builds, say): the check asks for
 * the kind, not for one copy's class object.
 */
const KINDS = Symbol.for('heatstate.error.kinds');

/**
 * Base class of every error heatstate throws on purpose.
 *
 * `instanceof` works across module formats: an error thrown by the CommonJS build is an instance of
 * the ESM build's classes and the other way round.
 */
export class HeatstateError extends Error {
  /** The kind this class stands for (its stable name), for `instanceof` across copies of the library. */
  static readonly kind: string = 'HeatstateError';

  /** True for errors of this kind from any copy of heatstate in the process. */
  static override [Symbol.hasInstance](value: unknown): boolean {
    if (!Object.hasOwn(this, 'kind')) return Function.prototype[Symbol.hasInstance].call(this, value);
    if (typeof value !== 'object' || value === null) return false;
    const kinds = (value as Record<symbol, unknown>)[KINDS];
    return Array.isArray(kinds) ? kinds.includes(this.kind) : Function.prototype[Symbol.hasInstance].call(this, value);
  }

  /** A stable, machine-readable code. */
  readonly code: ErrorCode;

  constructor(code: ErrorCode, message: string) {
    super(message);
    this.code = code;
    this.name = new.target.name;
    const kinds: string[] = [];
    for (let c: unknown = new.target; typeof c === 'function' && c !== Error; c = Object.getPrototypeOf(c)) {
      if (Object.hasOwn(c, 'kind')) kinds.push((c as unknown as { kind: string }).kind);
    }
    Object.defineProperty(this, KINDS, { value: kinds, enumerable: false });
  }

  /**
   * JSON form: name, code, message and the error's data fields. Infinite bounds are written as the
   * strings `"Infinity"` and `"-Infinity"` (JSON has no infinity; it would print `null`).
   */
  toJSON(): Record<string, unknown> {
    const data: Record<string, unknown> = { name: this.name, code: this.code, message: this.message };
    for (const [key, value] of Object.entries(this)) if (key !== 'name' && key !== 'code') data[key] = jsonSafe(value);
    return data;
  }
}

function jsonSafe(value: unknown): unknown {
  if (typeof value === 'number') return Number.isFinite(value) ? value : String(value);
  if (Array.isArray(value)) return value.map(jsonSafe);
  if (value !== null && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, jsonSafe(v)]));
  return value;
}

/** A unit text that could not be read, or a unit that is not in the registry. */
export class UnitError extends HeatstateError {
  static override readonly kind: string = 'UnitError';
  /** The unit text as given. */
  readonly unit: string;
  /** Known spellings close to an unknown name, best first (empty when none is close). */
  readonly suggestions: readonly string[];

  constructor(code: 'unit.unknown' | 'unit.syntax', unit: string, message: string, suggestions: readonly string[] = []) {
    super(code, message);
    this.unit = unit;
    this.suggestions = suggestions;
  }
}

/** A quantity of one dimension where another was expected (a pressure passed as a temperature). */
export class DimensionError extends HeatstateError {
  static override readonly kind: string = 'DimensionError';
  /** The dimension that was expected. */
  readonly expected: string;
  /** The dimension that was given. */
  readonly actual: string;
  /** The parameter or field that received it, when known. */
  readonly parameter: string | undefined;

  constructor(expected: string, actual: string, message: string, parameter?: string) {
    super('dimension.mismatch', message);
    this.expected = expected;
    this.actual = actual;
    this.parameter = parameter;
  }
}

/** A NaN or infinite number, or an input of the wrong shape (`input.not-finite`, `input.invalid`). */
export class InvalidInputError extends HeatstateError {
  static override readonly kind: string = 'InvalidInputError';
  /** The parameter or field that was wrong. */
  readonly parameter: string;

  constructor(code: 'input.not-finite' | 'input.invalid', parameter: string, message: string) {
    super(code, message);
    this.parameter = parameter;
  }
}

/** A value and its bounds in the unit the caller wrote the input in (`°F`, `psia`, `Btu/lbm`). */
export interface RangeInCallerUnit {
  /** The caller's unit. */
  readonly unit: string;
  /** The value given, in `unit`. */
  readonly value: number;
  /** Lower bound in `unit`. */
  readonly min: number;
  /** Upper bound in `unit`. */
  readonly max: number;
}

/** The valid range of an input, as data. Bounds are in `unit` (SI unless stated). */
export interface ValidRange {
  /** What the range applies to, for example `T` or `p`. */
  readonly quantity: string;
  /** The value given, in `unit`. */
  readonly value: number;
  /** Lower bound in `unit` (inclusive), or `-Infinity`. */
  readonly min: number;
  /** Upper bound in `unit` (inclusive), or `Infinity`. */
  readonly max: number;
  /** Unit of `value`, `min` and `max`. */
  readonly unit: string;
  /** The model, substance or region whose range it is. */
  readonly scope: string;
  /** The same value and bounds in the caller's unit, when the input was given in another unit. */
  readonly given?: RangeInCallerUnit;
}

/** An input outside the range where a model or data set is valid. */
export class OutOfRangeError extends HeatstateError {
  static override readonly kind: string = 'OutOfRangeError';
  /** The offending value and the valid range, as data. */
  readonly range: ValidRange;

  constructor(range: ValidRange, message?: string) {
    super('range.outside', message ?? describeRange(range));
    this.range = range;
  }
}

/** A number for a message: 8 significant digits, ∞ for infinities. The one formatter of messages. */
export function formatNumber(x: number): string {
  if (x === Infinity) return '∞';
  if (x === -Infinity) return '-∞';
  if (typeof x !== 'number') return String(x);
  return Number(x.toPrecision(8)).toString();
}

function describeRange(r: ValidRange): string {
  // in the caller's unit when one was given, with SI in parentheses
  const g = r.given;
  const withUnit = (x: number, unit: string): string => (unit === '1' || unit === '' ? formatNumber(x) : `${formatNumber(x)} ${unit}`);
  const show = (caller: number | undefined, si: number): string => (g === undefined ? withUnit(si, r.unit) : `${withUnit(caller!, g.unit)} (${withUnit(si, r.unit)})`);
  const v = `${r.quantity} = ${show(g?.value, r.value)}`;
  const span = g === undefined ? `${formatNumber(r.min)} to ${withUnit(r.max, r.unit)}` : `${formatNumber(g.min)} to ${withUnit(g.max, g.unit)}`;
  if (r.value < r.min) return `${v} is below the lower limit of ${r.scope} (${show(g?.min, r.min)}); valid range ${span}`;
  if (r.value > r.max) return `${v} is above the upper limit of ${r.scope} (${show(g?.max, r.max)}); valid range ${span}`;
  return `${v} is outside the valid range of ${r.scope} (${span})`;
}

/** A substance, species or other name that is not in a catalogue. */
export class UnknownNameError extends HeatstateError {
  static override readonly kind: string = 'UnknownNameError';
  /** The name as given. */
  readonly given: string;
  /** The catalogue that was searched. */
  readonly catalogue: string;
  /** The closest known names, best first. */
  readonly suggestions: readonly string[];

  constructor(given: string, catalogue: string, suggestions: readonly string[]) {
    const hint = suggestions.length > 0 ? `; did you mean ${suggestions.map((s) => `"${s}"`).join(', ')}?` : '';
    super('name.unknown', `"${given}" is not in the ${catalogue} catalogue${hint}`);
    this.given = given;
    this.catalogue = catalogue;
    this.suggestions = suggestions;
  }
}

/**
 * A property that a substance's model or data do not provide (`property.unavailable`): no viscosity
 * data for ethanol, no dilute-gas transport data for a user-defined gas. The substance and the
 * property exist; the data for this pair do not.
 */
export class UnavailablePropertyError extends HeatstateError {
  static override readonly kind: string = 'UnavailablePropertyError';
  /** The substance, species or mixture as named by the caller or the catalogue. */
  readonly substance: string;
  /** The property asked for, in words (`viscosity`, `thermal conductivity`, `transport properties`). */
  readonly property: string;
  /** Why it is not available. */
  readonly reason: string;
  /** The substances that do carry this property, when the catalogue has such a list (may be empty). */
  readonly available: readonly string[];

  constructor(substance: string, property: string, reason: string, available: readonly string[] = []) {
    const list = available.length > 0 ? `; ${property} data exist for ${available.join(', ')}` : '';
    super('property.unavailable', `${substance} has no ${property} data: ${reason}${list}`);
    this.substance = substance;
    this.property = property;
    this.reason = reason;
    this.available = available;
  }
}

/** A chemical formula that could not be read. */
export class FormulaError extends HeatstateError {
  static override readonly kind: string = 'FormulaError';
  /** The formula as given. */
  readonly formula: string;
  /** Zero-based character position of the problem. */
  readonly position: number;

  constructor(formula: string, position: number, message: string) {
    super('formula.invalid', message);
    this.formula = formula;
    this.position = position;
  }
}

/** One problem found in a user definition or table. */
export interface DefinitionIssue {
  /** Path to the offending field, for example `["c", "value"]` or `["rows", 4, "h"]`. */
  readonly path: readonly (string | number)[];
  /** What is wrong with it. */
  readonly message: string;
}

/** A substance definition, data set or table that failed validation. */
export class DefinitionError extends HeatstateError {
  static override readonly kind: string = 'DefinitionError';
  /** Every problem found, each with its path. */
  readonly issues: readonly DefinitionIssue[];

  constructor(subject: string, issues: readonly DefinitionIssue[]) {
    const list = issues.map((i) => `${i.path.length > 0 ? i.path.join('.') : '(root)'}: ${i.message}`).join('; ');
    super('definition.invalid', `invalid ${subject}: ${list}`);
    this.issues = issues;
  }
}

/** An iterative solve that did not reach its tolerance. Never returned as a value. */
export class ConvergenceError extends HeatstateError {
  static override readonly kind: string = 'ConvergenceError';
  /** Iterations performed, when the solver reports them; `undefined` when it does not. */
  readonly iterations: number | undefined;

  constructor(message: string, iterations?: number) {
    super('solve.no-convergence', message);
    this.iterations = iterations;
  }
}

/**
 * A computed value that is not a finite number (`result.not-finite`): an overflow in arithmetic or a
 * unit conversion, or a model that produced NaN or infinity. Not the caller's input at fault.
 */
export class ResultError extends HeatstateError {
  static override readonly kind: string = 'ResultError';
  /** The property whose value was not finite. */
  readonly property: string;

  constructor(property: string, message: string) {
    super('result.not-finite', message);
    this.property = property;
  }
}
