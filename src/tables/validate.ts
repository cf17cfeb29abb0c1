/**
 * What the table and grid facades share: method names, the checks of a definition that zod's
 * shape check does not make (units, names, physical bounds), argument readers and the inverse
 * result shape.
 *
 * @module
 */
import { describeValue } from '../core/read.js';
import { formatNumber, HeatstateError, InvalidInputError, type DefinitionIssue } from '../errors.js';
import { SI_UNIT, type Dimension } from '../units/dimensions.js';
import { Quantity } from '../units/quantity.js';
import { DEFAULT_AMBIENT_PA, resolveUnit, toSI, type ResolvedUnit } from '../units/registry.js';
import { Method, type MethodCode } from './core.js';
import type { TableData } from './schema.js';

/**
 * How to interpolate between rows:
 * - `'linear'`: straight lines between rows (bilinear on grids).
 * - `'monotone-cubic'`: Fritsch–Carlson piecewise cubic; smooth and never overshoots the data.
 * - `'log-linear'`: linear in ln(value), for columns that vary exponentially with the key
 *   (saturation pressure against temperature). Values must be positive.
 * - `'log-key'`: linear in ln(key), for tables keyed by pressure, where properties vary with ln p
 *   (a saturation table by pressure). Keys must be positive.
 *
 * Interpolation runs in SI (kelvin, pascal), so the log methods mean the same whatever unit a
 * column is written in.
 */
export type InterpolationMethod = 'linear' | 'monotone-cubic' | 'log-linear' | 'log-key';

/** The methods of one-dimensional tables. */
export const TABLE_METHODS: readonly InterpolationMethod[] = ['linear', 'monotone-cubic', 'log-linear', 'log-key'];
/** The methods of grids. */
export const GRID_METHODS: readonly ('linear' | 'monotone-cubic')[] = ['linear', 'monotone-cubic'];

/** The core's code for a method name; -1 for anything else (no allocation). */
export function methodCode(method: unknown): MethodCode | -1 {
  switch (method) {
    case 'linear':
      return Method.linear;
    case 'monotone-cubic':
      return Method.monotoneCubic;
    case 'log-linear':
      return Method.logLinear;
    case 'log-key':
      return Method.logKey;
    default:
      return -1;
  }
}

/**
 * The result of an inverse lookup, the same shape for tables and grids.
 * @typeParam A the names of the axes it can solve for
 */
export interface InverseResult<A extends string = string> {
  /** The value of the solved axis (a table's key, or the free axis of a grid), in that axis's unit. */
  readonly value: Quantity;
  /** The name of the solved axis: the table's key column, or the grid axis that was not fixed. */
  readonly axis: A;
  /**
   * Indices along the solved axis of the two rows (table rows in the table's own order, or grid
   * axis values) that bracket the answer.
   */
  readonly rows: readonly [number, number];
}

/** Options of a lookup. */
export interface LookupOptions {
  /** Default `'linear'`. */
  readonly method?: InterpolationMethod;
  /** Allow keys outside the table, extending the end segment. The result is then flagged. Default false. */
  readonly extrapolate?: boolean;
}

/** The result of a lookup. */
export interface LookupResult<D extends Dimension = Dimension> {
  /** The interpolated value (its `extrapolated` flag is set when the key was outside the table). */
  readonly value: Quantity<D>;
  /** The indices (in the table's own row order) of the rows used. */
  readonly rows: readonly number[];
  /** True when the key lay outside the table and extrapolation was requested. */
  readonly extrapolated: boolean;
  /** The method used. */
  readonly method: InterpolationMethod;
}

/** Names that would collide with the properties every JavaScript object has. */
const RESERVED_NAMES = new Set(['__proto__', 'constructor', 'prototype']);

/** Issues for reserved names among `names`, and for a `columns` object that is not plain. */
export function checkNames(columns: unknown, path: (string | number)[], issues: DefinitionIssue[]): void {
  if (typeof columns !== 'object' || columns === null) return;
  const proto = Object.getPrototypeOf(columns) as unknown;
  if (proto !== Object.prototype && proto !== null && !Array.isArray(columns)) {
    issues.push({ path, message: 'columns must be a plain object (an object literal whose prototype was set, as `{ __proto__: … }` does, hides a column)' });
  }
  for (const name of Object.keys(columns)) {
    if (RESERVED_NAMES.has(name)) issues.push({ path: [...path, name], message: `column "${name}": the name is reserved (it collides with a property of every JavaScript object); rename the column` });
  }
}

/** An issue for a reserved axis name, if it is one. */
export function checkAxisName(name: string, path: (string | number)[], issues: DefinitionIssue[]): void {
  if (RESERVED_NAMES.has(name)) issues.push({ path, message: `axis "${name}": the name is reserved (it collides with a property of every JavaScript object); rename the axis` });
}

/**
 * Resolves the unit of column `name`, pushing an issue that names the column when the unit is
 * unknown, unreadable, or a temperature written as a compound unit (whose offset would be lost).
 */
export function columnUnit(name: string, unit: string, path: (string | number)[], issues: DefinitionIssue[], what = 'column'): ResolvedUnit | undefined {
  try {
    const u = resolveUnit(unit);
    if (u.dimension === 'temperature' && u.kind !== 'temperature') {
      issues.push({ path, message: `${what} "${name}": unit "${unit}" is a temperature written as a compound unit; a temperature scale stands alone ("°F", "K") so that its offset is kept` });
      return undefined;
    }
    return u;
  } catch (e) {
    issues.push({ path, message: `${what} "${name}": ${e instanceof HeatstateError ? e.message : String(e)}` });
    return undefined;
  }
}

/**
 * Checks a value against the physical bounds of its quantity: any temperature ≥ 0 K, a gauge
 * pressure not below vacuum, and (for keys and axes, `absolute`) a pressure > 0 Pa.
 * Returns the SI value, or undefined after pushing an issue.
 */
export function physicalSI(value: number, u: ResolvedUnit, absolute: boolean, where: string, path: (string | number)[], issues: DefinitionIssue[]): number | undefined {
  const si = toSI(value, u, DEFAULT_AMBIENT_PA);
  if (u.dimension === 'temperature' && !(si >= 0)) {
    issues.push({ path, message: `${where}: ${formatNumber(value)} ${u.text} is below absolute zero (${formatNumber(si)} K)` });
    return undefined;
  }
  if (u.dimension === 'pressure' && u.kind === 'gauge' && !(si >= 0)) {
    issues.push({ path, message: `${where}: ${formatNumber(value)} ${u.text} is below vacuum (absolute ${formatNumber(si)} Pa with the standard atmosphere as ambient)` });
    return undefined;
  }
  if (u.dimension === 'pressure' && absolute && !(si > 0)) {
    issues.push({ path, message: `${where}: ${formatNumber(value)} ${u.text} is not a positive absolute pressure (${formatNumber(si)} Pa); a key or axis of pressure must be > 0 Pa absolute` });
    return undefined;
  }
  return si;
}

/** The source of a table, as text. */
export function describeSource(source: TableData['source']): string {
  return typeof source === 'string' ? source : [source.title, source.authors, source.year, source.table].filter((x) => x !== undefined).join(', ');
}

/** zod issues as definition issues. */
export function zodIssues(error: { issues: readonly { path: readonly PropertyKey[]; message: string }[] }): DefinitionIssue[] {
  return error.issues.map((i) => ({ path: i.path.map((p) => (typeof p === 'symbol' ? String(p) : p)), message: i.message }));
}

/** `table "name"` for messages, from a definition not yet checked. */
export function nameOf(data: unknown, what: string): string {
  const name = (data as { name?: unknown }).name;
  return typeof name === 'string' ? `${what} "${name.length > 60 ? `${name.slice(0, 60)}…` : name}"` : what;
}

/** A definition must be an object: the issue when it is not. */
export function notAnObject(data: unknown, what: string): DefinitionIssue[] | undefined {
  if (typeof data === 'object' && data !== null && !Array.isArray(data)) return undefined;
  return [{ path: [], message: `a ${what} definition must be an object; got ${describeValue(data)}` }];
}

/** Reads a column name: one of `names`, or an InvalidInputError listing them. */
export function readColumn(column: unknown, names: readonly string[], index: ReadonlyMap<string, number>, owner: string, parameter = 'column'): number {
  const i = typeof column === 'string' ? index.get(column) : undefined;
  if (i === undefined) {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a column of ${owner}: one of ${names.map((n) => `"${n}"`).join(', ')}; got ${describeValue(column)}`);
  }
  return i;
}

/** Refuses an input that is neither a Quantity nor unit text, before the unit reader sees it. */
export function checkQuantityLike(input: unknown, parameter: string, dimension: Dimension): void {
  if (typeof input === 'string' || input instanceof Quantity) return;
  const hint = typeof input === 'number' ? `${parameter} = ${input} has no unit` : `${parameter} must be a quantity or unit text`;
  throw new InvalidInputError('input.invalid', parameter, `${hint}; pass a quantity or text such as "1 ${SI_UNIT[dimension]}"; got ${describeValue(input)}`);
}

/** A quantity holding `given` in `unit` exactly (a tabulated value), with `si` beside it. */
export function givenQuantity(dimension: Dimension, si: number, given: number, unit: string): Quantity {
  return new Quantity(dimension, si, given, unit, DEFAULT_AMBIENT_PA);
}
