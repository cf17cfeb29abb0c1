/**
 * Two-dimensional grid tables (superheated vapour or compressed liquid by p and T): the facade over
 * the grid SI core in `core.ts`. Cells may be missing (`null`) where the grid has no state of the
 * table's phase; a lookup that needs a missing cell throws an OutOfRangeError whose bounds are where
 * the column has data along that line.
 *
 * At a grid node a lookup returns the cell as given, in the column's unit, bit for bit.
 *
 * @module
 */
import { CallUnits, describeValue, rangeError, readChoice, readInput, readOptions } from '../core/read.js';
import { Status, type StatusCode } from '../core/status.js';
import { DefinitionError, InvalidInputError, type DefinitionIssue, type OutOfRangeError } from '../errors.js';
import { SI_UNIT, type Dimension } from '../units/dimensions.js';
import { Quantity } from '../units/quantity.js';
import type { ResolvedUnit } from '../units/registry.js';
import { safeParse } from '../validation.js';
import { Axis, buildGridCore, dataSpan, GridValue, gridInverse, gridValue, lineRange, Method, Span, type GridCore } from './core.js';
import { gridSchema, type GridData } from './schema.js';
import {
  checkAxisName,
  checkNames,
  checkQuantityLike,
  columnUnit,
  describeSource,
  givenQuantity,
  GRID_METHODS,
  methodCode,
  nameOf,
  notAnObject,
  physicalSI,
  readColumn,
  zodIssues,
  type InverseResult,
  type LookupResult,
} from './validate.js';

/** Options of a grid lookup or inverse. */
export interface GridLookupOptions {
  /** `'linear'` (bilinear, the default) or `'monotone-cubic'` (along x, linear between rows). */
  readonly method?: 'linear' | 'monotone-cubic';
}

interface AxisInfo {
  readonly name: string;
  readonly unit: string;
  readonly dimension: Dimension;
  readonly given: readonly number[];
  readonly si: Float64Array;
}

interface GridColumnInfo {
  readonly name: string;
  readonly unit: string;
  readonly dimension: Dimension;
  /** Cells as given: given[j][i] at (x[i], y[j]). */
  readonly given: readonly (readonly (number | null)[])[];
}

/**
 * A two-dimensional grid table. Build it with {@link defineGrid} or load it with `gridFromJSON`.
 * The type parameters list the column names and the two axis names.
 */
export class PropertyGrid<C extends string = string, X extends string = string, Y extends string = string> {
  /** The grid's name. */
  readonly name: string;
  /** Where its numbers come from. */
  readonly source: string;
  /** The x-axis name (the grid's columns run along it). */
  readonly xName: X;
  /** The y-axis name (the grid's rows). */
  readonly yName: Y;
  /** Column names. */
  readonly columnNames: readonly C[];
  /** The stored data, as given. */
  readonly data: GridData;
  private readonly core: GridCore;
  private readonly x: AxisInfo;
  private readonly y: AxisInfo;
  private readonly columns: readonly GridColumnInfo[];
  private readonly index: ReadonlyMap<string, number>;

  /**
   * @internal Use {@link defineGrid}. `trusted`: data the library itself generated or ships, checked
   * against the schema by its tests (tests/tables/schema-builtin.test.ts): the schema's shape check
   * (zod, with the schema built on first use) is skipped, every other check runs. The first lookup
   * of a built-in steam table in a process took 60–75 ms of CPU with it, 22–24 ms without.
   */
  constructor(data: GridData, trusted = false) {
    const shape = notAnObject(data, 'grid table');
    if (shape) throw new DefinitionError('grid table', shape);
    const early: DefinitionIssue[] = [];
    checkNames((data as { columns?: unknown }).columns, ['columns'], early);
    if (early.length > 0) throw new DefinitionError(nameOf(data, 'grid table'), early);
    const parsed = trusted ? undefined : safeParse(gridSchema(), data);
    if (parsed !== undefined && !parsed.success) throw new DefinitionError('grid table', zodIssues(parsed.error));
    const def = parsed === undefined ? data : parsed.data;
    const issues: DefinitionIssue[] = [];
    const axes = (['x', 'y'] as const).map((axis) => {
      const a = def[axis];
      checkAxisName(a.name, [axis, 'name'], issues);
      const u = columnUnit(a.name, a.unit, [axis, 'unit'], issues, 'axis');
      if (a.values.length < 2) issues.push({ path: [axis, 'values'], message: `axis ${a.name} needs at least two values` });
      for (let i = 1; i < a.values.length; i++) {
        if (!(a.values[i]! > a.values[i - 1]!)) issues.push({ path: [axis, 'values', i], message: `axis ${a.name}: value ${i + 1} (${a.values[i]}) does not exceed value ${i} (${a.values[i - 1]}); axes must increase strictly` });
      }
      const si = u ? a.values.map((v, i) => physicalSI(v, u, true, `axis ${a.name}, value ${i + 1}`, [axis, 'values', i], issues) ?? NaN) : [];
      return { u, si };
    });
    if (def.x.name === def.y.name) issues.push({ path: ['y', 'name'], message: `both axes are named "${def.x.name}"` });
    const nx = def.x.values.length;
    const ny = def.y.values.length;
    const units = new Map<string, ResolvedUnit>();
    const cells = new Map<string, Float64Array>();
    for (const [name, col] of Object.entries(def.columns)) {
      const u = columnUnit(name, col.unit, ['columns', name, 'unit'], issues);
      if (u) units.set(name, u);
      if (col.values.length !== ny) issues.push({ path: ['columns', name], message: `column "${name}" has ${col.values.length} rows but axis ${def.y.name} has ${ny}` });
      const si = new Float64Array(nx * ny).fill(NaN);
      let present = 0;
      col.values.forEach((row, r) => {
        if (row.length !== nx) issues.push({ path: ['columns', name, r], message: `column "${name}", row ${r + 1} has ${row.length} cells but axis ${def.x.name} has ${nx} (ragged rows)` });
        row.forEach((v, i) => {
          if (v === null || !u || r >= ny || i >= nx) return;
          present++;
          si[r * nx + i] = physicalSI(v, u, false, `column "${name}", row ${r + 1}, cell ${i + 1}`, ['columns', name, r, i], issues) ?? NaN;
        });
      });
      if (present === 0 && u) issues.push({ path: ['columns', name], message: `column "${name}" holds no values (every cell is null)` });
      cells.set(name, si);
    }
    if (Object.keys(def.columns).length === 0) issues.push({ path: ['columns'], message: 'the grid has no columns' });
    if (issues.length > 0) throw new DefinitionError(`grid table "${def.name}"`, issues);

    this.name = def.name;
    this.source = describeSource(def.source);
    this.xName = def.x.name as X;
    this.yName = def.y.name as Y;
    this.columnNames = Object.keys(def.columns) as C[];
    this.data = data;
    const axis = (a: typeof def.x, k: 0 | 1): AxisInfo => ({ name: a.name, unit: a.unit, dimension: axes[k]!.u!.dimension, given: a.values, si: Float64Array.from(axes[k]!.si) });
    this.x = axis(def.x, 0);
    this.y = axis(def.y, 1);
    this.columns = this.columnNames.map((name) => ({ name, unit: def.columns[name]!.unit, dimension: units.get(name)!.dimension, given: def.columns[name]!.values }));
    this.index = new Map(this.columnNames.map((n, i) => [n, i]));
    this.core = buildGridCore(this.x.si, this.y.si, this.columnNames.map((n) => cells.get(n)!));
  }

  private columnOf(column: unknown): number {
    return readColumn(column, this.columnNames, this.index, `grid "${this.name}"`);
  }

  /**
   * SI core: the value of `column` at (x, y) (SI), written to `out.value` (SI) with the segments.
   * Never throws, never allocates.
   *
   * @returns `Status.ok`; `Status.outOfRange` outside the grid or where a needed cell is
   *   missing; `Status.invalidInput` for a NaN input, an unknown column or method
   * @example
   * ```ts
   * const g = defineGrid({ kind: 'grid', name: 'test grid', source: 'test', x: { name: 'T', unit: 'K', values: [300, 400] }, y: { name: 'p', unit: 'MPa', values: [1, 2] },
   *   columns: { h: { unit: 'kJ/kg', values: [[301, 401], [302, 402]] } } } as const);
   * const out = new GridValue();
   * g.valueAt('h', 350, 1.5e6, out);   //=> 0 (Status.ok)
   * out.value;                         //=> 351500 (J/kg)
   * ```
   */
  valueAt(column: C, x: number, y: number, out: GridValue, method?: 'linear' | 'monotone-cubic'): StatusCode {
    const i = typeof column === 'string' ? this.index.get(column) : undefined;
    if (i === undefined) return Status.invalidInput;
    return gridValue(this.core, i, x, y, method === undefined ? Method.linear : methodCode(method), out);
  }

  /** Reads the point `at` ({ p, T }: both axes, or with `one`, exactly one of them). */
  private readPoint(at: unknown, fn: string, one: boolean): { x?: unknown; y?: unknown } {
    const want = one ? `exactly one of ${this.yName} or ${this.xName}` : `{ ${this.yName}, ${this.xName} }`;
    if (typeof at !== 'object' || at === null || Array.isArray(at) || at instanceof Quantity) {
      throw new InvalidInputError('input.invalid', 'at', `${fn} of grid "${this.name}" needs at = ${want}; got ${describeValue(at)}`);
    }
    const given = Object.keys(at).filter((k) => (at as Record<string, unknown>)[k] !== undefined);
    for (const k of given) {
      if (k !== this.xName && k !== this.yName) throw new InvalidInputError('input.invalid', `at.${k}`, `"${k}" is not an axis of grid "${this.name}"; ${fn} needs at = ${want}`);
    }
    const hasX = given.includes(this.xName);
    const hasY = given.includes(this.yName);
    if (one ? hasX === hasY : !(hasX && hasY)) throw new InvalidInputError('input.invalid', 'at', `${fn} of grid "${this.name}" needs at = ${want}; got { ${given.join(', ')} }`);
    const point = at as Record<string, unknown>;
    return { ...(hasX ? { x: point[this.xName] } : {}), ...(hasY ? { y: point[this.yName] } : {}) };
  }

  private readAxis(a: AxisInfo, input: unknown, units: CallUnits): number {
    checkQuantityLike(input, a.name, a.dimension);
    return readInput(input as Quantity, a.dimension, a.name, undefined, units);
  }

  private axisError(a: AxisInfo, v: number, units: CallUnits): OutOfRangeError {
    return rangeError(a.name, v, a.dimension, { min: a.si[0]!, max: a.si[a.si.length - 1]!, scope: `grid "${this.name}"` }, units);
  }

  /**
   * The value of `column` at a point of the grid: `{ p: '1 MPa', T: '300 °C' }` (keys are the axis
   * names). Bilinear by default; `'monotone-cubic'` interpolates along the x-axis by Fritsch–Carlson
   * and linearly between rows. At a node it is the cell as given.
   *
   * @returns the value, the rows used (`[j, j + 1, i, i + 1]`: y indices, then x indices), the method
   * @throws {@link OutOfRangeError} outside the grid, or where a needed cell has no data (its bounds:
   *   where the column has data along that line); {@link DimensionError} an axis value of the wrong
   *   dimension; {@link InvalidInputError} an unknown column, a malformed point or bad options
   * @example
   * ```ts
   * // no h at (500 K, 2 MPa): that cell is empty (null)
   * const g = defineGrid({ kind: 'grid', name: 'test grid', source: 'test', x: { name: 'T', unit: 'K', values: [300, 400, 500] }, y: { name: 'p', unit: 'MPa', values: [1, 2] },
   *   columns: { h: { unit: 'kJ/kg', values: [[301, 401, 501], [302, 402, null]] } } } as const);
   * g.lookup('h', { T: '350 K', p: '1.5 MPa' }).value.in('kJ/kg');   //=> 351.5
   * g.lookup('h', { T: '450 K', p: '1.5 MPa' });   // throws OutOfRangeError: grid "test grid" has no h data at p = 1.5 MPa … its h data cover T = 300 K to 400 K
   * ```
   */
  lookup(column: C, at: Readonly<Record<X | Y, Quantity | string>>, options?: GridLookupOptions): LookupResult {
    const c = this.columnOf(column);
    const opts = readOptions<GridLookupOptions>(options, 'options', ['method']);
    const method = readChoice(opts.method, 'options.method', GRID_METHODS, 'linear');
    const point = this.readPoint(at, 'lookup', false);
    const units = new CallUnits();
    const y = this.readAxis(this.y, point.y, units);
    const x = this.readAxis(this.x, point.x, units);
    const out = new GridValue();
    const status = gridValue(this.core, c, x, y, methodCode(method), out);
    const col = this.columns[c]!;
    if (status !== Status.ok) {
      if (!(x >= this.x.si[0]! && x <= this.x.si[this.x.si.length - 1]!)) throw this.axisError(this.x, x, units);
      if (!(y >= this.y.si[0]! && y <= this.y.si[this.y.si.length - 1]!)) throw this.axisError(this.y, y, units);
      throw this.missingCell(c, x, y, units);
    }
    const i = out.xSegment;
    const j = out.ySegment;
    const xi = x === this.x.si[i] ? i : x === this.x.si[i + 1] ? i + 1 : -1;
    const yj = y === this.y.si[j] ? j : y === this.y.si[j + 1] ? j + 1 : -1;
    const given = xi >= 0 && yj >= 0 ? col.given[yj]![xi] : undefined;
    const value = typeof given === 'number' ? givenQuantity(col.dimension, out.value, given, col.unit) : Quantity.fromSI(out.value, col.dimension, col.unit);
    return { value, rows: [j, j + 1, i, i + 1], extrapolated: false, method };
  }

  /** The error for a point that needs a missing cell, bounded by where the column has data. */
  private missingCell(c: number, x: number, y: number, units: CallUnits): OutOfRangeError {
    const col = this.columns[c]!;
    const span = new Span();
    const at = (a: AxisInfo, v: number) => `${a.name} = ${units.describe(v, a.dimension, SI_UNIT[a.dimension])}`;
    const why = `grid "${this.name}" has no ${col.name} data at ${at(this.y, y)}, ${at(this.x, x)}: a cell it needs is empty (no state of this table's phase there)`;
    if (dataSpan(this.core, c, Axis.x, y, x, span) === Status.ok) {
      return rangeError(this.x.name, x, this.x.dimension, { min: span.min, max: span.max, scope: `the ${col.name} data of grid "${this.name}" at ${at(this.y, y)}` }, units,
        `${why}; at ${at(this.y, y)} its ${col.name} data cover ${this.x.name} = ${units.describe(span.min, this.x.dimension, SI_UNIT[this.x.dimension])} to ${units.describe(span.max, this.x.dimension, SI_UNIT[this.x.dimension])}`);
    }
    if (dataSpan(this.core, c, Axis.y, x, y, span) === Status.ok) {
      return rangeError(this.y.name, y, this.y.dimension, { min: span.min, max: span.max, scope: `the ${col.name} data of grid "${this.name}" at ${at(this.x, x)}` }, units,
        `${why}; at ${at(this.x, x)} its ${col.name} data cover ${this.y.name} = ${units.describe(span.min, this.y.dimension, SI_UNIT[this.y.dimension])} to ${units.describe(span.max, this.y.dimension, SI_UNIT[this.y.dimension])}`);
    }
    const k = this.core.columns[c]!;
    return rangeError(this.x.name, x, this.x.dimension, { min: k.xMin, max: k.xMax, scope: `the ${col.name} data of grid "${this.name}"` }, units,
      `${why}; along neither axis through this point does the column hold a value (its data span ${this.x.name} = ${units.describe(k.xMin, this.x.dimension, SI_UNIT[this.x.dimension])} to ${units.describe(k.xMax, this.x.dimension, SI_UNIT[this.x.dimension])})`);
  }

  /**
   * Inverse lookup at a fixed value of one axis: the other axis's value where `column` equals `value`,
   * for example T where h = 2800 kJ/kg at 1 MPa: `grid.inverse('h', '2800 kJ/kg', { p: '1 MPa' })`.
   * Uses the first bracketing segment in ascending order of the free axis.
   *
   * @returns the free axis's value (`value`, in its unit), its name (`axis`) and the indices along it
   *   of the two grid lines that bracket the answer (`rows`)
   * @throws {@link OutOfRangeError} when the fixed value lies outside its axis, or the column does not
   *   reach the value along that line (its bounds: the column's smallest and largest value on the line)
   * @example
   * ```ts
   * const g = defineGrid({ kind: 'grid', name: 'test grid', source: 'test', x: { name: 'T', unit: 'K', values: [300, 400] }, y: { name: 'p', unit: 'MPa', values: [1, 2] },
   *   columns: { h: { unit: 'kJ/kg', values: [[301, 401], [302, 402]] } } } as const);
   * g.inverse('h', '351.5 kJ/kg', { p: '1.5 MPa' }).value.in('K');   //=> 350
   * ```
   */
  inverse(column: C, value: Quantity | string, at: Partial<Readonly<Record<X | Y, Quantity | string>>>, options?: GridLookupOptions): InverseResult<X | Y> {
    const c = this.columnOf(column);
    const opts = readOptions<GridLookupOptions>(options, 'options', ['method']);
    const method = readChoice(opts.method, 'options.method', GRID_METHODS, 'linear');
    const col = this.columns[c]!;
    checkQuantityLike(value, col.name, col.dimension);
    const units = new CallUnits();
    const target = readInput(value as Quantity, col.dimension, col.name, undefined, units);
    const point = this.readPoint(at, 'inverse', true);
    const fixY = point.y !== undefined;
    const fixedAxis = fixY ? this.y : this.x;
    const freeAxis = fixY ? this.x : this.y;
    const fixed = this.readAxis(fixedAxis, fixY ? point.y : point.x, units);
    const out = new GridValue();
    const status = gridInverse(this.core, c, target, fixY ? Axis.x : Axis.y, fixed, methodCode(method), out);
    if (status !== Status.ok) {
      if (!(fixed >= fixedAxis.si[0]! && fixed <= fixedAxis.si[fixedAxis.si.length - 1]!)) throw this.axisError(fixedAxis, fixed, units);
      throw this.notReached(c, target, fixedAxis, fixed, units);
    }
    const k = fixY ? out.xSegment : out.ySegment;
    const row = out.value === freeAxis.si[k] ? k : out.value === freeAxis.si[k + 1] ? k + 1 : -1;
    const v = row >= 0 ? givenQuantity(freeAxis.dimension, out.value, freeAxis.given[row]!, freeAxis.unit) : Quantity.fromSI(out.value, freeAxis.dimension, freeAxis.unit);
    return { value: v, axis: freeAxis.name as X | Y, rows: [k, k + 1] };
  }

  private notReached(c: number, target: number, fixedAxis: AxisInfo, fixed: number, units: CallUnits): OutOfRangeError {
    const col = this.columns[c]!;
    const siUnit = SI_UNIT[col.dimension];
    const line = `${fixedAxis.name} = ${units.describe(fixed, fixedAxis.dimension, SI_UNIT[fixedAxis.dimension])}`;
    const span = new Span();
    const onLine = lineRange(this.core, c, fixedAxis === this.y ? Axis.x : Axis.y, fixed, span) === Status.ok;
    const k = this.core.columns[c]!;
    const min = onLine ? span.min : k.min;
    const max = onLine ? span.max : k.max;
    const given = `${col.name} = ${units.describe(target, col.dimension, siUnit)}`;
    const message = onLine
      ? `${given} is not reached along ${line} in grid "${this.name}": the column runs from ${units.describe(min, col.dimension, siUnit)} to ${units.describe(max, col.dimension, siUnit)} on that line`
      : `${given} is not reached along ${line} in grid "${this.name}": the column has no data on that line (over the whole grid it runs from ${units.describe(min, col.dimension, siUnit)} to ${units.describe(max, col.dimension, siUnit)})`;
    return rangeError(col.name, target, col.dimension, { min, max, scope: `grid "${this.name}" along ${line}` }, units, message);
  }
}

/**
 * Builds and validates a grid table; the type parameters follow from its columns and axes.
 * Validation names the axis, row and cell of every problem (see {@link defineTable} for the checks).
 *
 * @throws {@link DefinitionError} with one issue per problem
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
