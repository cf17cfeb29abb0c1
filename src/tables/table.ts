/**
 * Property tables: one-dimensional tables keyed by a monotone column, and two-dimensional grids,
 * with checked interpolation. Values are held in SI; lookups take and return quantities.
 *
 * Every lookup goes through one search primitive ({@link segmentIndex}); interpolating at a
 * tabulated row returns the tabulated value bit for bit.
 *
 * @module
 */
import { DefinitionError, HeatstateError, InvalidInputError, OutOfRangeError, type DefinitionIssue } from '../errors.js';
import { hermite, lerp, monotoneSlopes } from '../numeric/interpolate.js';
import { segmentIndex } from '../numeric/search.js';
import { SI_UNIT, type Dimension } from '../units/dimensions.js';
import { Quantity, quantity } from '../units/quantity.js';
import { DEFAULT_AMBIENT_PA, resolveUnit, toSI, type ResolvedUnit } from '../units/registry.js';
import { gridSchema, tableSchema, type GridData, type TableData } from './schema.js';
import { safeParse } from '../validation.js';

/**
 * How to interpolate between rows:
 * - `'linear'`: straight lines between rows (bilinear on grids).
 * - `'monotone-cubic'`: Fritsch–Carlson piecewise cubic; smooth and never overshoots the data.
 * - `'log-linear'`: linear in ln(value), for columns that vary exponentially with the key
 *   (saturation pressure against temperature). Values must be positive.
 * - `'log-key'`: linear in ln(key), for tables keyed by pressure, where properties vary with ln p
 *   (a saturation table by pressure). Keys must be positive.
 */
export type InterpolationMethod = 'linear' | 'monotone-cubic' | 'log-linear' | 'log-key';

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
  readonly method: InterpolationMethod;
}

interface Column {
  readonly name: string;
  readonly unit: string;
  readonly dimension: Dimension;
  /** SI values in ascending key order. */
  readonly si: Float64Array;
  slopes?: Float64Array;
  logSlopes?: Float64Array;
}

function describeSource(source: TableData['source']): string {
  return typeof source === 'string' ? source : [source.title, source.authors, source.year, source.table].filter((x) => x !== undefined).join(', ');
}

function zodIssues(error: { issues: readonly { path: readonly PropertyKey[]; message: string }[] }): DefinitionIssue[] {
  return error.issues.map((i) => ({ path: i.path.map((p) => (typeof p === 'symbol' ? String(p) : p)), message: i.message }));
}

function unitOf(unit: string, path: (string | number)[], issues: DefinitionIssue[]): ResolvedUnit | undefined {
  try {
    return resolveUnit(unit);
  } catch (e) {
    issues.push({ path, message: e instanceof HeatstateError ? e.message : String(e) });
    return undefined;
  }
}

function readInput(input: Quantity | string, dimension: Dimension, name: string): number {
  const q = typeof input === 'string' ? quantity(input) : input;
  if (!(q instanceof Quantity)) throw new InvalidInputError('input.invalid', name, `${name} must be a quantity or unit text`);
  if (q.dimension !== dimension) throw new InvalidInputError('input.invalid', name, `${name} must be a ${dimension}; got ${q.toString()} (${q.dimension})`);
  if (!Number.isFinite(q.si)) throw new InvalidInputError('input.not-finite', name, `${name} must be finite`);
  return q.si;
}

function fmt(x: number): string {
  return String(Number(x.toPrecision(8)));
}

/** Interpolates a column at key x (SI) inside segment i, by method. Exact at the rows. */
function interpolate(keys: Float64Array, col: Column, i: number, x: number, method: InterpolationMethod): number {
  const x0 = keys[i]!;
  const x1 = keys[i + 1]!;
  const y0 = col.si[i]!;
  const y1 = col.si[i + 1]!;
  if (method === 'linear') return lerp(x0, x1, y0, y1, x);
  if (method === 'log-linear') {
    if (x === x0) return y0;
    if (x === x1) return y1;
    return Math.exp(lerp(x0, x1, Math.log(y0), Math.log(y1), x));
  }
  if (method === 'log-key') return lerp(Math.log(x0), Math.log(x1), y0, y1, Math.log(x));
  col.slopes ??= monotoneSlopes(keys, col.si, new Float64Array(keys.length));
  return hermite(x0, x1, y0, y1, col.slopes[i]!, col.slopes[i + 1]!, x);
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
  private readonly keys: Float64Array;
  private readonly keyColumn: Column;
  private readonly byName: Map<string, Column>;
  /** True when the rows were given in descending key order (stored ascending). */
  private readonly descending: boolean;

  /** @internal Use {@link defineTable}. */
  constructor(data: TableData) {
    const parsed = safeParse(tableSchema, data);
    if (!parsed.success) throw new DefinitionError('table', zodIssues(parsed.error));
    const def = parsed.data;
    const issues: DefinitionIssue[] = [];
    const names = Object.keys(def.columns);
    if (!names.includes(def.key)) issues.push({ path: ['key'], message: `key column "${def.key}" is not among the columns (${names.join(', ')})` });
    const rows = def.columns[def.key]?.values.length ?? 0;
    if (rows === 0) issues.push({ path: ['columns', def.key], message: 'the table is empty: it needs at least two rows' });
    else if (rows < 2) issues.push({ path: ['columns', def.key], message: 'a table needs at least two rows to interpolate' });
    const units = new Map<string, ResolvedUnit>();
    for (const name of names) {
      const col = def.columns[name]!;
      const u = unitOf(col.unit, ['columns', name, 'unit'], issues);
      if (u) units.set(name, u);
      if (col.values.length !== rows) issues.push({ path: ['columns', name], message: `column "${name}" has ${col.values.length} values but the key has ${rows} (ragged rows)` });
      col.values.forEach((v, row) => {
        if (v === null || !Number.isFinite(v)) issues.push({ path: ['rows', row, name], message: `row ${row + 1}, column "${name}": missing or non-numeric cell` });
      });
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
    this.byName = new Map();
    for (const name of names) {
      const u = units.get(name)!;
      const values = def.columns[name]!.values as number[];
      const ordered = this.descending ? [...values].reverse() : values;
      this.byName.set(name, { name, unit: def.columns[name]!.unit, dimension: u.dimension, si: Float64Array.from(ordered, (v) => toSI(v, u, DEFAULT_AMBIENT_PA)) });
    }
    this.keyColumn = this.byName.get(def.key)!;
    this.keys = this.keyColumn.si;
  }

  private column(name: string): Column {
    const col = this.byName.get(name);
    if (!col) throw new InvalidInputError('input.invalid', 'column', `table "${this.name}" has no column "${name}"; it has ${[...this.byName.keys()].join(', ')}`);
    return col;
  }

  private originalRow(i: number): number {
    return this.descending ? this.rowCount - 1 - i : i;
  }

  /** The key's range, as quantities in the key column's unit. */
  get range(): { readonly min: Quantity; readonly max: Quantity } {
    const k = this.keyColumn;
    return { min: Quantity.fromSI(this.keys[0]!, k.dimension, k.unit), max: Quantity.fromSI(this.keys[this.keys.length - 1]!, k.dimension, k.unit) };
  }

  /** The unit and dimension of a column. */
  columnInfo(name: C): { readonly unit: string; readonly dimension: Dimension } {
    const c = this.column(name);
    return { unit: c.unit, dimension: c.dimension };
  }

  /**
   * SI core: the value of `column` at key `x` (SI), in SI, or NaN outside the table unless `extrapolate`.
   * No unit parsing and no allocation (monotone-cubic slopes are computed once per column).
   */
  valueAt(column: C, x: number, method: InterpolationMethod = 'linear', extrapolate = false): number {
    const keys = this.keys;
    if (!(x >= keys[0]! && x <= keys[keys.length - 1]!) && !extrapolate) return NaN;
    const i = segmentIndex(keys, x);
    return interpolate(keys, this.column(column), i, x, method);
  }

  /**
   * The value of `column` at a key value, interpolated between the rows that bracket it.
   *
   * @param column a column name
   * @param at the key (a quantity or unit text of the key's dimension)
   * @throws {@link OutOfRangeError} outside the table's key range, naming it (unless `extrapolate`)
   * @example
   * ```ts
   * satByT.lookup('p', '373.15 K', { method: 'log-linear' }).value.in('kPa');   //=> 101.42
   * ```
   */
  lookup(column: C, at: Quantity | string, options: LookupOptions = {}): LookupResult {
    const col = this.column(column);
    const method = options.method ?? 'linear';
    const x = readInput(at, this.keyColumn.dimension, this.key);
    const keys = this.keys;
    const lo = keys[0]!;
    const hi = keys[keys.length - 1]!;
    const outside = x < lo || x > hi;
    if (outside && !options.extrapolate) {
      throw new OutOfRangeError(
        { quantity: this.key, value: x, min: lo, max: hi, unit: resolveSIUnit(this.keyColumn.dimension), scope: `table "${this.name}"` },
        `${this.key} = ${fmt(x)} is outside table "${this.name}" (${fmt(lo)} to ${fmt(hi)} ${resolveSIUnit(this.keyColumn.dimension)}); pass { extrapolate: true } to extend its end rows (the result is flagged)`,
      );
    }
    if (method === 'log-linear' && !(col.si.every((v) => v > 0))) {
      throw new InvalidInputError('input.invalid', 'method', `log-linear interpolation needs positive values; column "${column}" has some ≤ 0`);
    }
    if (method === 'log-key' && !(keys[0]! > 0)) {
      throw new InvalidInputError('input.invalid', 'method', `log-key interpolation needs positive keys; table "${this.name}" starts at ${keys[0]}`);
    }
    const i = segmentIndex(keys, x);
    const v = interpolate(keys, col, i, x, method);
    return {
      value: Quantity.fromSI(v, col.dimension, col.unit, outside),
      rows: [this.originalRow(i), this.originalRow(i + 1)],
      extrapolated: outside,
      method,
    };
  }

  /**
   * Inverse lookup: the key at which `column` takes `value`. Searches the rows in key order and uses
   * the first pair that brackets the value (a column that is not monotone can take a value more than once).
   *
   * @throws {@link OutOfRangeError} when no pair of rows brackets the value
   * @example
   * ```ts
   * satByT.inverse('p', '1 atm').key.in('°C');   //=> 99.97 (linear between rows)
   * ```
   */
  inverse(column: C, value: Quantity | string, options: { readonly method?: InterpolationMethod } = {}): { readonly key: Quantity; readonly rows: readonly number[] } {
    const col = this.column(column);
    const method = options.method ?? 'linear';
    const y = readInput(value, col.dimension, column);
    const keys = this.keys;
    const ys = col.si;
    for (let i = 0; i + 1 < keys.length; i++) {
      const a = ys[i]!;
      const b = ys[i + 1]!;
      if ((y - a) * (y - b) > 0) continue;
      let x: number;
      if (a === b) x = keys[i]!;
      else if (method === 'linear') x = lerp(a, b, keys[i]!, keys[i + 1]!, y);
      else {
        // invert the monotone interpolant on this segment by bisection (it is monotone there)
        let lo = keys[i]!;
        let hi = keys[i + 1]!;
        const rising = b > a;
        for (let k = 0; k < 200 && hi - lo > 1e-15 * Math.abs(hi); k++) {
          const mid = 0.5 * (lo + hi);
          const v = interpolate(keys, col, i, mid, method);
          if (v < y === rising) lo = mid;
          else hi = mid;
        }
        x = 0.5 * (lo + hi);
      }
      const k = this.keyColumn;
      return { key: Quantity.fromSI(x, k.dimension, k.unit), rows: [this.originalRow(i), this.originalRow(i + 1)] };
    }
    let min = Infinity;
    let max = -Infinity;
    for (const v of ys) {
      min = Math.min(min, v);
      max = Math.max(max, v);
    }
    throw new OutOfRangeError(
      { quantity: column, value: y, min, max, unit: resolveSIUnit(col.dimension), scope: `column "${column}" of table "${this.name}"` },
      `${column} = ${fmt(y)} is not reached in table "${this.name}" (the column runs from ${fmt(min)} to ${fmt(max)} ${resolveSIUnit(col.dimension)})`,
    );
  }
}

function resolveSIUnit(dimension: Dimension): string {
  return SI_UNIT[dimension];
}

/**
 * Builds and validates a one-dimensional table. Validation names the row and column of every problem:
 * non-monotone or duplicate keys, missing or non-numeric cells, unknown units, ragged rows, an empty table.
 *
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

// ---------------------------------------------------------------- grids

interface GridColumn {
  readonly name: string;
  readonly unit: string;
  readonly dimension: Dimension;
  /** SI values, row-major by y (ascending), NaN where missing. */
  readonly si: Float64Array[];
  /** Monotone-cubic slopes along x per row, NaN where a run of values is broken. */
  slopes?: Float64Array[];
}

/**
 * A two-dimensional grid table (superheated vapour or compressed liquid by p and T). Cells may be
 * missing (`null`) where the grid has no state of the table's phase; lookups that need a missing
 * cell throw.
 */
export class PropertyGrid<C extends string = string, X extends string = string, Y extends string = string> {
  readonly name: string;
  readonly source: string;
  /** The x-axis (columns of the grid) and y-axis (rows) names. */
  readonly xName: X;
  readonly yName: Y;
  readonly columnNames: readonly C[];
  readonly data: GridData;
  private readonly xs: Float64Array;
  private readonly ys: Float64Array;
  private readonly xUnit: ResolvedUnit;
  private readonly yUnit: ResolvedUnit;
  private readonly byName: Map<string, GridColumn>;

  /** @internal Use {@link defineGrid}. */
  constructor(data: GridData) {
    const parsed = safeParse(gridSchema, data);
    if (!parsed.success) throw new DefinitionError('grid table', zodIssues(parsed.error));
    const def = parsed.data;
    const issues: DefinitionIssue[] = [];
    const xu = unitOf(def.x.unit, ['x', 'unit'], issues);
    const yu = unitOf(def.y.unit, ['y', 'unit'], issues);
    for (const [axis, a] of [['x', def.x], ['y', def.y]] as const) {
      if (a.values.length < 2) issues.push({ path: [axis, 'values'], message: `axis ${a.name} needs at least two values` });
      for (let i = 1; i < a.values.length; i++) {
        if (!(a.values[i]! > a.values[i - 1]!)) issues.push({ path: [axis, 'values', i], message: `axis ${a.name}: value ${i + 1} (${a.values[i]}) does not exceed value ${i} (${a.values[i - 1]}); axes must increase strictly` });
      }
    }
    const units = new Map<string, ResolvedUnit>();
    for (const [name, col] of Object.entries(def.columns)) {
      const u = unitOf(col.unit, ['columns', name, 'unit'], issues);
      if (u) units.set(name, u);
      if (col.values.length !== def.y.values.length) issues.push({ path: ['columns', name], message: `column "${name}" has ${col.values.length} rows but axis ${def.y.name} has ${def.y.values.length}` });
      col.values.forEach((row, r) => {
        if (row.length !== def.x.values.length) issues.push({ path: ['columns', name, r], message: `column "${name}", row ${r + 1} has ${row.length} cells but axis ${def.x.name} has ${def.x.values.length} (ragged rows)` });
      });
    }
    if (issues.length > 0) throw new DefinitionError(`grid table "${def.name}"`, issues);
    this.name = def.name;
    this.source = describeSource(def.source);
    this.xName = def.x.name as X;
    this.yName = def.y.name as Y;
    this.columnNames = Object.keys(def.columns) as C[];
    this.data = data;
    this.xUnit = xu!;
    this.yUnit = yu!;
    this.xs = Float64Array.from(def.x.values, (v) => toSI(v, xu!, DEFAULT_AMBIENT_PA));
    this.ys = Float64Array.from(def.y.values, (v) => toSI(v, yu!, DEFAULT_AMBIENT_PA));
    this.byName = new Map();
    for (const [name, col] of Object.entries(def.columns)) {
      const u = units.get(name)!;
      this.byName.set(name, {
        name,
        unit: col.unit,
        dimension: u.dimension,
        si: col.values.map((row) => Float64Array.from(row, (v) => (v === null ? NaN : toSI(v, u, DEFAULT_AMBIENT_PA)))),
      });
    }
  }

  private column(name: string): GridColumn {
    const col = this.byName.get(name);
    if (!col) throw new InvalidInputError('input.invalid', 'column', `grid "${this.name}" has no column "${name}"; it has ${[...this.byName.keys()].join(', ')}`);
    return col;
  }

  private rangeError(axis: string, v: number, values: Float64Array, dimension: Dimension): OutOfRangeError {
    const lo = values[0]!;
    const hi = values[values.length - 1]!;
    const unit = resolveSIUnit(dimension);
    return new OutOfRangeError({ quantity: axis, value: v, min: lo, max: hi, unit, scope: `grid "${this.name}"` }, `${axis} = ${fmt(v)} is outside grid "${this.name}" (${fmt(lo)} to ${fmt(hi)} ${unit})`);
  }

  private rowValue(col: GridColumn, j: number, i: number, x: number, method: InterpolationMethod): number {
    const row = col.si[j]!;
    if (method !== 'monotone-cubic') return lerp(this.xs[i]!, this.xs[i + 1]!, row[i]!, row[i + 1]!, x);
    if (!col.slopes) {
      col.slopes = col.si.map((r) => {
        // slopes over each unbroken run of values
        const out = new Float64Array(r.length).fill(NaN);
        let start = 0;
        while (start < r.length) {
          while (start < r.length && Number.isNaN(r[start]!)) start++;
          let end = start;
          while (end < r.length && !Number.isNaN(r[end]!)) end++;
          if (end - start >= 2) out.set(monotoneSlopes(this.xs.subarray(start, end), r.subarray(start, end), new Float64Array(end - start)), start);
          start = end;
        }
        return out;
      });
    }
    const m = col.slopes[j]!;
    return hermite(this.xs[i]!, this.xs[i + 1]!, row[i]!, row[i + 1]!, m[i]!, m[i + 1]!, x);
  }

  /** SI core: the value at (x, y) in SI; NaN outside the grid or where a needed cell is missing. */
  valueAt(column: C, x: number, y: number, method: InterpolationMethod = 'linear'): number {
    const xs = this.xs;
    const ys = this.ys;
    if (!(x >= xs[0]! && x <= xs[xs.length - 1]! && y >= ys[0]! && y <= ys[ys.length - 1]!)) return NaN;
    const col = this.column(column);
    let i = segmentIndex(xs, x);
    let j = segmentIndex(ys, y);
    let v = this.cellValue(col, i, j, x, y, method);
    // a point on a grid line needs only one side of it: if the cells to the right (or above) are
    // empty, use the segment to the left (or below)
    if (Number.isNaN(v) && x === xs[i] && i > 0) v = this.cellValue(col, --i, j, x, y, method);
    if (Number.isNaN(v) && y === ys[j] && j > 0) v = this.cellValue(col, i, --j, x, y, method);
    return v;
  }

  private cellValue(col: GridColumn, i: number, j: number, x: number, y: number, method: InterpolationMethod): number {
    const a = this.rowValue(col, j, i, x, method);
    const b = this.rowValue(col, j + 1, i, x, method);
    return lerp(this.ys[j]!, this.ys[j + 1]!, a, b, y);
  }

  /**
   * The value of `column` at a point of the grid: `{ p: '1 MPa', T: '300 °C' }` (keys are the axis
   * names). Bilinear by default; `'monotone-cubic'` interpolates along the x-axis by Fritsch–Carlson
   * and linearly between rows.
   *
   * @throws {@link OutOfRangeError} outside the grid, or where a needed cell has no data
   */
  lookup(column: C, at: Readonly<Record<X | Y, Quantity | string>>, options: { readonly method?: 'linear' | 'monotone-cubic' } = {}): LookupResult {
    const col = this.column(column);
    const method = options.method ?? 'linear';
    const point = at as Record<string, Quantity | string>;
    if (point[this.xName] === undefined || point[this.yName] === undefined) {
      throw new InvalidInputError('input.invalid', 'at', `grid "${this.name}" needs { ${this.yName}, ${this.xName} }`);
    }
    const x = readInput(point[this.xName]!, this.xUnit.dimension, this.xName);
    const y = readInput(point[this.yName]!, this.yUnit.dimension, this.yName);
    if (!(x >= this.xs[0]! && x <= this.xs[this.xs.length - 1]!)) throw this.rangeError(this.xName, x, this.xs, this.xUnit.dimension);
    if (!(y >= this.ys[0]! && y <= this.ys[this.ys.length - 1]!)) throw this.rangeError(this.yName, y, this.ys, this.yUnit.dimension);
    const v = this.valueAt(column, x, y, method);
    const i = segmentIndex(this.xs, x);
    const j = segmentIndex(this.ys, y);
    if (Number.isNaN(v)) {
      throw new OutOfRangeError(
        { quantity: column, value: NaN, min: NaN, max: NaN, unit: resolveSIUnit(col.dimension), scope: `grid "${this.name}"` },
        `grid "${this.name}" has no ${column} data around ${this.yName} = ${fmt(y)}, ${this.xName} = ${fmt(x)} (SI): a cell it needs is empty (no state of this table's phase there)`,
      );
    }
    return {
      value: Quantity.fromSI(v, col.dimension, col.unit),
      rows: [j, j + 1, i, i + 1],
      extrapolated: false,
      method,
    };
  }

  /**
   * Inverse lookup at a fixed value of one axis: the other axis's value where `column` equals `value`,
   * for example T where h = 2800 kJ/kg at 1 MPa: `grid.inverse('h', '2800 kJ/kg', { p: '1 MPa' })`.
   *
   * @throws {@link OutOfRangeError} when the column does not reach the value along that line
   */
  inverse(column: C, value: Quantity | string, at: Partial<Readonly<Record<X | Y, Quantity | string>>>, options: { readonly method?: 'linear' | 'monotone-cubic' } = {}): { readonly value: Quantity; readonly axis: string } {
    const col = this.column(column);
    const method = options.method ?? 'linear';
    const point = at as Record<string, Quantity | string | undefined>;
    const fixY = point[this.yName] !== undefined;
    if (fixY === (point[this.xName] !== undefined)) throw new InvalidInputError('input.invalid', 'at', `give exactly one of ${this.yName} or ${this.xName}`);
    const target = readInput(value, col.dimension, column);
    const fixed = fixY ? readInput(point[this.yName]!, this.yUnit.dimension, this.yName) : readInput(point[this.xName]!, this.xUnit.dimension, this.xName);
    const free = fixY ? this.xs : this.ys;
    const f = (t: number) => (fixY ? this.valueAt(column, t, fixed, method) : this.valueAt(column, fixed, t, method)) - target;
    for (let k = 0; k + 1 < free.length; k++) {
      let lo = free[k]!;
      let hi = free[k + 1]!;
      const flo = f(lo);
      const fhi = f(hi);
      if (Number.isNaN(flo) || Number.isNaN(fhi) || flo * fhi > 0) continue;
      for (let it = 0; it < 200 && hi - lo > 1e-15 * Math.abs(hi); it++) {
        const mid = 0.5 * (lo + hi);
        if (f(mid) * flo > 0) lo = mid;
        else hi = mid;
      }
      const axisUnit = fixY ? this.xUnit : this.yUnit;
      return { value: Quantity.fromSI(0.5 * (lo + hi), axisUnit.dimension, fixY ? this.data.x.unit : this.data.y.unit), axis: fixY ? this.xName : this.yName };
    }
    throw new OutOfRangeError(
      { quantity: column, value: target, min: NaN, max: NaN, unit: resolveSIUnit(col.dimension), scope: `grid "${this.name}"` },
      `${column} = ${fmt(target)} is not reached along ${fixY ? this.yName : this.xName} = ${fmt(fixed)} in grid "${this.name}"`,
    );
  }
}

/**
 * Builds and validates a grid table; the type parameters follow from its columns and axes.
 * @example
 * ```ts
 * const g = defineGrid({ kind: 'grid', name: 'g', source: 'test', x: { name: 'T', unit: 'K', values: [300, 400] }, y: { name: 'p', unit: 'MPa', values: [1, 2] },
 *   columns: { h: { unit: 'kJ/kg', values: [[301, 401], [302, 402]] } } } as const);
 * g.lookup('h', { T: '350 K', p: '1.5 MPa' }).value.in('kJ/kg');   //=> 351.5
 * ```
 */
export function defineGrid<const D extends GridData>(data: D): PropertyGrid<Extract<keyof D['columns'], string>, D['x']['name'], D['y']['name']> {
  return new PropertyGrid(data) as PropertyGrid<Extract<keyof D['columns'], string>, D['x']['name'], D['y']['name']>;
}
