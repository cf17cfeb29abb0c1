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
  | 'formula.invalid'
  | 'definition.invalid'
  | 'solve.no-convergence';

/** Base class of every error heatstate throws on purpose. */
export class HeatstateError extends Error {
  /** A stable, machine-readable code. */
  readonly code: ErrorCode;

  constructor(code: ErrorCode, message: string) {
    super(message);
    this.code = code;
    this.name = new.target.name;
  }
}

/** A unit text that could not be read, or a unit that is not in the registry. */
export class UnitError extends HeatstateError {
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

/**
 * A NaN or infinite number, or an input of the wrong shape (`input.not-finite`, `input.invalid`);
 * or a computed result that is not finite (`result.not-finite`: an overflow in arithmetic or a
 * conversion, or a model that produced NaN or infinity), which is not the caller's input at fault.
 */
export class InvalidInputError extends HeatstateError {
  /** The parameter or field that was wrong (for `result.not-finite`: the quantity computed). */
  readonly parameter: string;

  constructor(code: 'input.not-finite' | 'input.invalid' | 'result.not-finite', parameter: string, message: string) {
    super(code, message);
    this.parameter = parameter;
  }
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
}

/** An input outside the range where a model or data set is valid. */
export class OutOfRangeError extends HeatstateError {
  /** The offending value and the valid range, as data. */
  readonly range: ValidRange;

  constructor(range: ValidRange, message?: string) {
    super('range.outside', message ?? describeRange(range));
    this.range = range;
  }
}

function formatNumber(x: number): string {
  if (x === Infinity) return '∞';
  if (x === -Infinity) return '-∞';
  return Number(x.toPrecision(8)).toString();
}

function describeRange(r: ValidRange): string {
  const v = `${r.quantity} = ${formatNumber(r.value)} ${r.unit}`;
  if (r.value < r.min) {
    return `${v} is below the lower limit of ${r.scope} (${formatNumber(r.min)} ${r.unit}); valid range ${formatNumber(r.min)} to ${formatNumber(r.max)} ${r.unit}`;
  }
  if (r.value > r.max) {
    return `${v} is above the upper limit of ${r.scope} (${formatNumber(r.max)} ${r.unit}); valid range ${formatNumber(r.min)} to ${formatNumber(r.max)} ${r.unit}`;
  }
  return `${v} is outside the valid range of ${r.scope} (${formatNumber(r.min)} to ${formatNumber(r.max)} ${r.unit})`;
}

/** A substance, species or other name that is not in a catalogue. */
export class UnknownNameError extends HeatstateError {
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

/** A chemical formula that could not be read. */
export class FormulaError extends HeatstateError {
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
  /** Iterations performed. */
  readonly iterations: number;

  constructor(message: string, iterations: number) {
    super('solve.no-convergence', message);
    this.iterations = iterations;
  }
}
