/**
 * One-dimensional property tables: rows keyed by a strictly monotone column, with checked
 * interpolation. The facade over the SI core in `core.ts`: it reads the caller's quantities once,
 * calls the core, and turns a failed status into a typed error in the caller's units.
 *
 * A table keeps the caller's numbers as given beside their SI values: a lookup at a tabulated key
 * returns the tabulated value, in the column's unit, bit for bit (°C and °F columns too).
 *
 * @module
 */
import { CallUnits, rangeError, readChoice, readFlag, readInput, readOptions } from '../core/read.js';
import { Status, type StatusCode } from '../core/status.js';
import { DefinitionError, formatNumber, InvalidInputError, type DefinitionIssue } from '../errors.js';
import { SI_UNIT, type Dimension } from '../units/dimensions.js';
import { Quantity } from '../units/quantity.js';
import type { ResolvedUnit } from '../units/registry.js';
import { safeParse } from '../validation.js';
import { buildTableCore, Method, TableValue, tableInverse, tableValue, type TableCore } from './core.js';
import { tableSchema, type TableData } from './schema.js';
import {
  checkNames,
  checkQuantityLike,
  columnUnit,
  describeSource,
  givenQuantity,
  methodCode,
  nameOf,
  notAnObject,
  physicalSI,
  readColumn,
  TABLE_METHODS,
  zodIssues,
  type InterpolationMethod,
  type InverseResult,
  type LookupOptions,
  type LookupResult,
} from './validate.js';

export { PropertyGrid, defineGrid, type GridLookupOptions } from './grid.js';
export type { InterpolationMethod, InverseResult, LookupOptions, LookupResult } from './validate.js';
export { TableValue, GridValue } from './core.js';

interface ColumnInfo {
  readonly name: string;
  readonly unit: string;
  readonly dimension: Dimension;
  /** The values as given, in ascending key order. */
  readonly given: Float64Array;
  /** SI values, ascending key order (the core's column). */
  readonly si: Float64Array;
}

/**
 * A one-dimensional property table: rows keyed by a strictly monotone column (a saturation table by
 * T, or by p). Build it with {@link defineTable} or load it with `tableFromJSON` / `tableFromCSV`.
 * The type parameter lists the column names, so `lookup('hg', …)` is checked by the compiler.
 */
export class PropertyTable<C extends string = string> {
  /** The table's name. */
  readonly name: string;
  /** Where its numbers come from. */
  readonly source: string;
  /** The key column's name. */
  readonly key: C;
  /** Column names in table order (the key first). */
  readonly columnNames: readonly C[];
  /** Number of rows. */
  readonly rowCount: number;
  /** The stored data, as given. */
  readonly data: TableData;
  private readonly core: TableCore;
  private readonly columns: readonly ColumnInfo[];
  private readonly index: ReadonlyMap<string, number>;
  private readonly keyColumn: ColumnInfo;
  /** True when the rows were given in descending key order (stored ascending). */
  private readonly descending: boolean;

  /**
   * @internal Use {@link defineTable}. `trusted`: data the library itself generated or ships, checked
   * against the schema by its tests (tests/tables/schema-builtin.test.ts): the schema's shape check
   * (zod, with the schema built on first use) is skipped, every other check runs. The first lookup
   * of a built-in steam table in a process took 60–75 ms of CPU with it, 22–24 ms without.
   */
  constructor(data: TableData, trusted = false) {
    const shape = notAnObject(data, 'table');
    if (shape) throw new DefinitionError('table', shape);
    const early: DefinitionIssue[] = [];
    checkNames((data as { columns?: unknown }).columns, ['columns'], early);
    if (early.length > 0) throw new DefinitionError(nameOf(data, 'table'), early);
    const parsed = trusted ? undefined : safeParse(tableSchema(), data);
    if (parsed !== undefined && !parsed.success) throw new DefinitionError('table', zodIssues(parsed.error));
    const def = parsed === undefined ? data : parsed.data;
    const issues: DefinitionIssue[] = [];
    const names = Object.keys(def.columns);
    if (!names.includes(def.key)) issues.push({ path: ['key'], message: `key column "${def.key}" is not among the columns (${names.join(', ')})` });
    const rows = def.columns[def.key]?.values.length ?? 0;
    if (rows === 0) issues.push({ path: ['columns', def.key], message: 'the table is empty: it needs at least two rows' });
    else if (rows < 2) issues.push({ path: ['columns', def.key], message: 'a table needs at least two rows to interpolate' });
    const units = new Map<string, ResolvedUnit>();
    const si = new Map<string, number[]>();
    for (const name of names) {
      const col = def.columns[name]!;
      const u = columnUnit(name, col.unit, ['columns', name, 'unit'], issues);
      if (u) units.set(name, u);
      if (col.values.length !== rows) issues.push({ path: ['columns', name], message: `column "${name}" has ${col.values.length} values but the key has ${rows} (ragged rows)` });
      const values: number[] = [];
      col.values.forEach((v, row) => {
        const where = `row ${row + 1}, column "${name}"`;
        if (v === null || !Number.isFinite(v)) issues.push({ path: ['rows', row, name], message: `${where}: missing or non-numeric cell` });
        else if (u) values.push(physicalSI(v, u, name === def.key, where, ['rows', row, name], issues) ?? NaN);
      });
      si.set(name, values);
    }
    const keyValues = def.columns[def.key]?.values ?? [];
    const ascending = rows >= 2 && (keyValues[1] ?? 0) > (keyValues[0] ?? 0);
    for (let r = 1; r < keyValues.length; r++) {
      const a = keyValues[r - 1];
      const b = keyValues[r];
      if (a === null || b === null || a === undefined || b === undefined) continue;
      if (a === b) issues.push({ path: ['rows', r, def.key], message: `row ${r + 1}: duplicate key ${def.key} = ${b} (also in row ${r})` });
      else if (ascending !== b > a) issues.push({ path: ['rows', r, def.key], message: `row ${r + 1}: key ${def.key} = ${b} breaks the ${ascending ? 'ascending' : 'descending'} order of the key column (row ${r} has ${a}); keys must be strictly monotone` });
    }
    if (issues.length > 0) throw new DefinitionError(`table "${def.name}"`, issues);

    this.name = def.name;
    this.source = describeSource(def.source);
    this.key = def.key as C;
    this.columnNames = [def.key, ...names.filter((n) => n !== def.key)] as C[];
    this.rowCount = rows;
    this.data = data;
    this.descending = !ascending;
    const order = (values: readonly number[]) => Float64Array.from(this.descending ? [...values].reverse() : values);
    this.columns = this.columnNames.map((name) => ({
      name,
      unit: def.columns[name]!.unit,
      dimension: units.get(name)!.dimension,
      given: order(def.columns[name]!.values as number[]),
      si: order(si.get(name)!),
    }));
    this.index = new Map(this.columnNames.map((n, i) => [n, i]));
    this.keyColumn = this.columns[0]!;
    this.core = buildTableCore(this.keyColumn.si, this.columns.map((c) => c.si));
  }

  private originalRow(i: number): number {
    return this.descending ? this.rowCount - 1 - i : i;
  }

  private columnOf(column: unknown, parameter = 'column'): number {
    return readColumn(column, this.columnNames, this.index, `table "${this.name}"`, parameter);
  }

  /** The key's range, as quantities in the key column's unit (the first and last keys as given). */
  get range(): { readonly min: Quantity; readonly max: Quantity } {
    const k = this.keyColumn;
    const n = this.rowCount - 1;
    return { min: givenQuantity(k.dimension, k.si[0]!, k.given[0]!, k.unit), max: givenQuantity(k.dimension, k.si[n]!, k.given[n]!, k.unit) };
  }

  /**
   * The unit and dimension of a column.
   * @throws {@link InvalidInputError} for a name that is not a column
   */
  columnInfo(name: C): { readonly unit: string; readonly dimension: Dimension } {
    const c = this.columns[this.columnOf(name, 'name')]!;
    return { unit: c.unit, dimension: c.dimension };
  }

  /**
   * SI core: the value of `column` at key `x` (SI), written to `out.value` (SI), with the segment
   * (rows in ascending key order) and the extrapolation flag. Never throws, never allocates.
   *
   * @returns `Status.ok`; `Status.outOfRange` outside the table unless `extrapolate`;
   *   `Status.invalidInput` for a NaN key, an unknown column or method, log-linear on a column
   *   with values ≤ 0 or log-key on keys ≤ 0
   * @example
   * ```ts
   * const oil = defineTable({ name: 'thermal oil data sheet', source: 'vendor sheet rev. B', key: 'T',
   *   columns: { T: { unit: '°C', values: [20, 80, 140] }, cp: { unit: 'kJ/(kg·K)', values: [1.88, 2.09, 2.3] } } } as const);
   * const out = new TableValue();
   * oil.valueAt('cp', 353.15, out);   //=> 0 (Status.ok)
   * out.value;                        //=> 2090 (J/(kg·K), SI)
   * ```
   */
  valueAt(column: C, x: number, out: TableValue, method?: InterpolationMethod, extrapolate?: boolean): StatusCode {
    const i = typeof column === 'string' ? this.index.get(column) : undefined;
    if (i === undefined) return Status.invalidInput;
    const code = method === undefined ? Method.linear : methodCode(method);
    return tableValue(this.core, i, x, code, extrapolate === true, out);
  }

  /**
   * The value of `column` at a key value, interpolated between the rows that bracket it. At a
   * tabulated key it is the tabulated value as given, in the column's unit.
   *
   * @param column a column name
   * @param at the key (a quantity or unit text of the key's dimension)
   * @throws {@link OutOfRangeError} outside the table's key range, in the caller's unit (unless `extrapolate`)
   * @throws {@link DimensionError} a key of the wrong dimension; {@link InvalidInputError} an unknown
   *   column, a key that is not a quantity, bad options, a log method on data that are not positive
   * @example
   * ```ts
   * const oil = defineTable({ name: 'thermal oil data sheet', source: 'vendor sheet rev. B', key: 'T',
   *   columns: { T: { unit: '°C', values: [20, 80, 140] }, cp: { unit: 'kJ/(kg·K)', values: [1.88, 2.09, 2.3] } } } as const);
   * oil.lookup('cp', '80 °C').value.in('kJ/(kg·K)');   //=> 2.09
   * oil.lookup('cp', '200 °C');   // throws OutOfRangeError: T = 200 °C (473.15 K) is above the upper limit of table "thermal oil data sheet" (140 °C (413.15 K)); …
   * ```
   */
  lookup(column: C, at: Quantity | string, options?: LookupOptions): LookupResult {
    const c = this.columnOf(column);
    const opts = readOptions<LookupOptions>(options, 'options', ['method', 'extrapolate']);
    const method = readChoice(opts.method, 'options.method', TABLE_METHODS, 'linear');
    const extrapolate = readFlag(opts.extrapolate, 'options.extrapolate');
    const key = this.keyColumn;
    checkQuantityLike(at, this.key, key.dimension);
    const units = new CallUnits();
    const x = readInput(at as Quantity, key.dimension, this.key, undefined, units);
    const out = new TableValue();
    const status = tableValue(this.core, c, x, methodCode(method), extrapolate, out);
    const col = this.columns[c]!;
    if (status !== Status.ok) this.fail(status, method, col, x, units, extrapolate);
    const i = out.segment;
    const keys = key.si;
    const row = x === keys[i] ? i : x === keys[i + 1] ? i + 1 : -1;
    const value = row >= 0 ? givenQuantity(col.dimension, col.si[row]!, col.given[row]!, col.unit) : Quantity.fromSI(out.value, col.dimension, col.unit, out.extrapolated);
    return { value, rows: [this.originalRow(i), this.originalRow(i + 1)], extrapolated: out.extrapolated, method };
  }

  private fail(status: StatusCode, method: InterpolationMethod, col: ColumnInfo, x: number, units: CallUnits, extrapolate: boolean): never {
    const key = this.keyColumn;
    const n = this.rowCount - 1;
    if (status === Status.invalidInput && method === 'log-linear') {
      throw new InvalidInputError('input.invalid', 'options.method', `log-linear interpolation needs positive values; column "${col.name}" of table "${this.name}" has values ≤ 0 (it runs from ${formatNumber(this.core.columns[this.index.get(col.name)!]!.min)} ${SI_UNIT[col.dimension]})`);
    }
    if (status === Status.invalidInput && method === 'log-key') {
      throw new InvalidInputError('input.invalid', 'options.method', `log-key interpolation needs positive keys; table "${this.name}" starts at ${this.key} = ${formatNumber(key.given[0]!)} ${key.unit}`);
    }
    if (status === Status.invalidInput) throw new InvalidInputError('input.invalid', this.key, `table "${this.name}" cannot use ${this.key} = ${units.describe(x, key.dimension, SI_UNIT[key.dimension])}`);
    const hint = extrapolate ? ` (extrapolation by ${method} cannot reach it)` : '; pass { extrapolate: true } to extend its end rows (the result is flagged)';
    throw rangeError(this.key, x, key.dimension, { min: key.si[0]!, max: key.si[n]!, scope: `table "${this.name}"`, hint }, units);
  }

  /**
   * Inverse lookup: the key at which `column` takes `value`. Searches the rows in key order and uses
   * the first pair that brackets the value (a column that is not monotone can take a value more than
   * once). At a tabulated value it is the tabulated key as given.
   *
   * @returns the key (`value`, in the key column's unit), the key's name (`axis`) and the rows used
   * @throws {@link OutOfRangeError} when no pair of rows brackets the value, naming the column's range
   * @example
   * ```ts
   * const oil = defineTable({ name: 'thermal oil data sheet', source: 'vendor sheet rev. B', key: 'T',
   *   columns: { T: { unit: '°C', values: [20, 80, 140] }, rho: { unit: 'kg/m³', values: [870, 832.5, 795] } } } as const);
   * oil.inverse('rho', '832.5 kg/m³').value.in('°C');   //=> 80
   * oil.inverse('rho', '900 kg/m³');   // throws OutOfRangeError: rho = 900 kg/m³ is not reached in table "thermal oil data sheet": the column runs from 795 kg/m³ to 870 kg/m³
   * ```
   */
  inverse(column: C, value: Quantity | string, options?: { readonly method?: InterpolationMethod }): InverseResult<C> {
    const c = this.columnOf(column);
    const opts = readOptions<{ method: InterpolationMethod }>(options, 'options', ['method']);
    const method = readChoice(opts.method, 'options.method', TABLE_METHODS, 'linear');
    const col = this.columns[c]!;
    checkQuantityLike(value, col.name, col.dimension);
    const units = new CallUnits();
    const y = readInput(value as Quantity, col.dimension, col.name, undefined, units);
    const out = new TableValue();
    const status = tableInverse(this.core, c, y, methodCode(method), out);
    if (status === Status.outOfRange) {
      const { min, max } = this.core.columns[c]!;
      const siUnit = SI_UNIT[col.dimension];
      throw rangeError(col.name, y, col.dimension, { min, max, scope: `column "${col.name}" of table "${this.name}"` }, units,
        `${col.name} = ${units.describe(y, col.dimension, siUnit)} is not reached in table "${this.name}": the column runs from ${units.describe(min, col.dimension, siUnit)} to ${units.describe(max, col.dimension, siUnit)}`);
    }
    if (status !== Status.ok) this.fail(status, method, col, y, units, false);
    const key = this.keyColumn;
    const i = out.segment;
    const row = out.value === key.si[i] ? i : out.value === key.si[i + 1] ? i + 1 : -1;
    const k = row >= 0 ? givenQuantity(key.dimension, key.si[row]!, key.given[row]!, key.unit) : Quantity.fromSI(out.value, key.dimension, key.unit);
    return { value: k, axis: this.key, rows: [this.originalRow(i), this.originalRow(i + 1)] };
  }
}

/**
 * Builds and validates a one-dimensional table. Validation names the row and column of every problem:
 * non-monotone or duplicate keys, missing or non-numeric cells, unknown units, ragged rows, an empty
 * table, reserved column names (`__proto__`, `constructor`, `prototype`), and values outside their
 * quantity's physical bounds (a temperature below 0 K, a gauge pressure below vacuum, a pressure key ≤ 0 Pa).
 *
 * @throws {@link DefinitionError} with one issue per problem
 * @example
 * ```ts
 * const t = defineTable({
 *   name: 'oil heater data sheet', source: 'vendor sheet rev. B', key: 'T',
 *   columns: { T: { unit: '°C', values: [20, 60, 100] }, cp: { unit: 'kJ/(kg·K)', values: [1.88, 2.02, 2.16] } },
 * } as const);
 * t.lookup('cp', '80 °C').value.in('kJ/(kg·K)');   //=> 2.09
 * ```
 */
export function defineTable<const D extends TableData>(data: D): PropertyTable<Extract<keyof D['columns'], string>> {
  return new PropertyTable(data) as PropertyTable<Extract<keyof D['columns'], string>>;
}
