/**
 * The SI core of property tables, on the model contract (`src/core/status.ts`): plain SI numbers in,
 * results written into a caller-owned {@link TableValue} or {@link GridValue}, a {@link StatusCode}
 * back. Never throws, never allocates per call, never returns NaN as a value.
 *
 * Every lookup goes through one search primitive (`segmentIndex` in `src/numeric/search.ts`, whose
 * inclusivity is stated there once). At a tabulated key (a grid node) the stored value is returned
 * as stored, bit for bit, by every method.
 *
 * Statuses: {@link Status.ok}; {@link Status.outOfRange} for a key outside the table (without
 * extrapolation), a grid point outside the axes or one that needs a missing cell, a value an inverse
 * does not reach; {@link Status.invalidInput} for a NaN or infinite input, an unknown column index
 * or method code, and log interpolation of data that are not all positive.
 *
 * @module
 */
import { hermite, lerp, monotoneSlopes } from '../numeric/interpolate.js';
import { segmentIndex } from '../numeric/search.js';
import { Status, type StatusCode } from '../core/status.js';

/** Interpolation method codes of the core (the facade maps its method names to these). */
export const Method = {
  /** Straight lines between rows (bilinear on grids). */
  linear: 0,
  /** Fritsch–Carlson monotone piecewise cubic (along x on grids, linear between grid rows). */
  monotoneCubic: 1,
  /** Linear in ln(value); values must be positive. Tables only. */
  logLinear: 2,
  /** Linear in ln(key); keys must be positive. Tables only. */
  logKey: 3,
} as const;

/** One of the {@link Method} codes. */
export type MethodCode = (typeof Method)[keyof typeof Method];

/** The answer of a one-dimensional lookup or inverse. Reuse one instance across calls. */
export class TableValue {
  /** The value (SI): the column's value for a lookup, the key for an inverse. */
  value = 0;
  /** The segment used: rows `segment` and `segment + 1` in ascending key order. */
  segment = 0;
  /** True when the key lay outside the table and extrapolation was requested. */
  extrapolated = false;
}

/** The answer of a grid lookup or inverse. Reuse one instance across calls. */
export class GridValue {
  /** The value (SI): the column's value for a lookup, the free axis's value for an inverse. */
  value = 0;
  /** The x segment used: x nodes `xSegment` and `xSegment + 1`. */
  xSegment = 0;
  /** The y segment used: y nodes `ySegment` and `ySegment + 1`. */
  ySegment = 0;
}

/** An interval [min, max] (SI), written by the span helpers. */
export class Span {
  min = 0;
  max = 0;
}

/** A column of a one-dimensional table, in SI, ascending key order. */
export interface TableColumn {
  readonly values: Float64Array;
  /** Fritsch–Carlson slopes, computed once when the table is built. */
  readonly slopes: Float64Array;
  /** True when every value is > 0 (log-linear interpolation is possible). */
  readonly positive: boolean;
  /** Smallest and largest value. */
  readonly min: number;
  readonly max: number;
}

/** A one-dimensional table in SI: strictly ascending keys and columns of values. */
export interface TableCore {
  readonly keys: Float64Array;
  readonly columns: readonly TableColumn[];
  /** True when every key is > 0 (log-key interpolation is possible). */
  readonly keysPositive: boolean;
}

/** A column of a grid, in SI, row-major by y: `values[j * nx + i]` at (xs[i], ys[j]); NaN where missing. */
export interface GridColumn {
  readonly values: Float64Array;
  /** Monotone-cubic slopes along x for each row, over each unbroken run of values (NaN elsewhere). */
  readonly slopes: Float64Array;
  /** Smallest and largest value present. */
  readonly min: number;
  readonly max: number;
  /** The x and y ranges of the nodes that hold a value. */
  readonly xMin: number;
  readonly xMax: number;
  readonly yMin: number;
  readonly yMax: number;
}

/** A grid table in SI: strictly ascending axes and columns of cells. */
export interface GridCore {
  readonly xs: Float64Array;
  readonly ys: Float64Array;
  readonly columns: readonly GridColumn[];
}

function extremes(values: Float64Array): [number, number] {
  let min = Infinity;
  let max = -Infinity;
  for (const v of values) {
    if (Number.isNaN(v)) continue;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  return [min, max];
}

/**
 * Builds a one-dimensional core from ascending SI keys and SI columns (construction allocates;
 * lookups do not). The caller has validated the data (finite, keys strictly ascending, ≥ 2 rows).
 */
export function buildTableCore(keys: Float64Array, columns: readonly Float64Array[]): TableCore {
  return {
    keys,
    keysPositive: keys[0]! > 0,
    columns: columns.map((values) => {
      const [min, max] = extremes(values);
      return { values, slopes: monotoneSlopes(keys, values, new Float64Array(values.length)), positive: min > 0, min, max };
    }),
  };
}

/**
 * Builds a grid core from ascending SI axes and row-major SI columns (NaN where a cell is missing).
 * The caller has validated the data (each column holds at least one value).
 */
export function buildGridCore(xs: Float64Array, ys: Float64Array, columns: readonly Float64Array[]): GridCore {
  const nx = xs.length;
  return {
    xs,
    ys,
    columns: columns.map((values) => {
      const slopes = new Float64Array(values.length).fill(NaN);
      let xMin = Infinity;
      let xMax = -Infinity;
      let yMin = Infinity;
      let yMax = -Infinity;
      for (let j = 0; j < ys.length; j++) {
        const row = values.subarray(j * nx, (j + 1) * nx);
        let start = 0;
        while (start < nx) {
          while (start < nx && Number.isNaN(row[start]!)) start++;
          let end = start;
          while (end < nx && !Number.isNaN(row[end]!)) end++;
          if (end - start >= 2) slopes.set(monotoneSlopes(xs.subarray(start, end), row.subarray(start, end), new Float64Array(end - start)), j * nx + start);
          if (end > start) {
            xMin = Math.min(xMin, xs[start]!);
            xMax = Math.max(xMax, xs[end - 1]!);
            yMin = Math.min(yMin, ys[j]!);
            yMax = Math.max(yMax, ys[j]!);
          }
          start = end;
        }
      }
      const [min, max] = extremes(values);
      return { values, slopes, min, max, xMin, xMax, yMin, yMax };
    }),
  };
}

// ---------------------------------------------------------------- one-dimensional

/** The column's value at x inside segment i (internal; exact at both ends of the segment). */
function segmentValue(t: TableCore, c: TableColumn, i: number, x: number, method: number): number {
  const keys = t.keys;
  const x0 = keys[i]!;
  const x1 = keys[i + 1]!;
  const y0 = c.values[i]!;
  const y1 = c.values[i + 1]!;
  if (x === x0) return y0;
  if (x === x1) return y1;
  switch (method) {
    case Method.linear:
      return lerp(x0, x1, y0, y1, x);
    case Method.logLinear:
      return Math.exp(lerp(x0, x1, Math.log(y0), Math.log(y1), x));
    case Method.logKey:
      return lerp(Math.log(x0), Math.log(x1), y0, y1, Math.log(x));
    default:
      return hermite(x0, x1, y0, y1, c.slopes[i]!, c.slopes[i + 1]!, x);
  }
}

/** invalidInput when `method` cannot be used on column `c` of `t` (or is unknown); ok otherwise. */
function tableMethodStatus(t: TableCore, c: TableColumn, method: number): StatusCode {
  switch (method) {
    case Method.linear:
    case Method.monotoneCubic:
      return Status.ok;
    case Method.logLinear:
      return c.positive ? Status.ok : Status.invalidInput;
    case Method.logKey:
      return t.keysPositive ? Status.ok : Status.invalidInput;
    default:
      return Status.invalidInput;
  }
}

/**
 * The value of column `column` at key `x` (SI), by `method`.
 *
 * @returns {@link Status.ok} with `out.value`, `out.segment` and `out.extrapolated`;
 *   {@link Status.outOfRange} when `x` lies outside the keys and `extrapolate` is false (or an
 *   extrapolation leaves the method's domain or overflows); {@link Status.invalidInput} for a
 *   non-finite `x`, an unknown column or method, or a log method on data that are not all positive
 * @example
 * ```ts
 * const t = buildTableCore(Float64Array.of(300, 400), [Float64Array.of(1, 3)]);
 * const out = new TableValue();
 * tableValue(t, 0, 350, Method.linear, false, out);   //=> 0 (Status.ok)
 * out.value;                                          //=> 2
 * tableValue(t, 0, 450, Method.linear, false, out);   //=> 1 (Status.outOfRange)
 * ```
 */
export function tableValue(t: TableCore, column: number, x: number, method: number, extrapolate: boolean, out: TableValue): StatusCode {
  const c = t.columns[column];
  if (c === undefined || !Number.isFinite(x)) return Status.invalidInput;
  if (method !== Method.linear && method !== Method.monotoneCubic) {
    const methodStatus = tableMethodStatus(t, c, method);
    if (methodStatus !== Status.ok) return methodStatus;
  }
  const keys = t.keys;
  const outside = x < keys[0]! || x > keys[keys.length - 1]!;
  out.extrapolated = outside;
  if (outside && !extrapolate) return Status.outOfRange;
  const i = segmentIndex(keys, x);
  out.segment = i;
  if (!outside) {
    // the hot paths: lerp and hermite return the row values exactly at the rows
    if (method === Method.linear) {
      out.value = lerp(keys[i]!, keys[i + 1]!, c.values[i]!, c.values[i + 1]!, x);
      return Status.ok;
    }
    if (method === Method.monotoneCubic) {
      out.value = hermite(keys[i]!, keys[i + 1]!, c.values[i]!, c.values[i + 1]!, c.slopes[i]!, c.slopes[i + 1]!, x);
      return Status.ok;
    }
  }
  return otherMethods(t, c, i, x, method, out);
}

/** tableValue's path for the other methods and for extrapolation (method already checked). */
function otherMethods(t: TableCore, c: TableColumn, i: number, x: number, method: number, out: TableValue): StatusCode {
  if (method === Method.logKey && !(x > 0)) return Status.outOfRange;
  const v = segmentValue(t, c, i, x, method);
  if (!Number.isFinite(v)) return Status.outOfRange;
  out.value = v;
  return Status.ok;
}

/**
 * Inverse lookup: the key (SI) at which column `column` takes `y` (SI). Searches the segments in
 * ascending key order and uses the first that brackets `y` (a column that is not monotone can take
 * a value more than once). Linear inverts the straight line; the other methods bisect the
 * interpolant on the bracketing segment (monotone there). A value equal to a row's returns that
 * row's key exactly.
 *
 * @returns {@link Status.ok} with `out.value` (the key) and `out.segment`; {@link Status.outOfRange}
 *   when no segment brackets `y`; {@link Status.invalidInput} as for {@link tableValue}
 * @example
 * ```ts
 * const t = buildTableCore(Float64Array.of(300, 400), [Float64Array.of(1, 3)]);
 * const out = new TableValue();
 * tableInverse(t, 0, 2, Method.linear, out);   //=> 0
 * out.value;                                   //=> 350
 * ```
 */
export function tableInverse(t: TableCore, column: number, y: number, method: number, out: TableValue): StatusCode {
  const c = t.columns[column];
  if (c === undefined || !Number.isFinite(y)) return Status.invalidInput;
  const methodStatus = tableMethodStatus(t, c, method);
  if (methodStatus !== Status.ok) return methodStatus;
  const keys = t.keys;
  const ys = c.values;
  out.extrapolated = false;
  for (let i = 0; i + 1 < keys.length; i++) {
    const a = ys[i]!;
    const b = ys[i + 1]!;
    if ((y - a) * (y - b) > 0) continue;
    out.segment = i;
    if (y === a) out.value = keys[i]!;
    else if (y === b) out.value = keys[i + 1]!;
    else if (method === Method.linear) out.value = lerp(a, b, keys[i]!, keys[i + 1]!, y);
    else {
      let lo = keys[i]!;
      let hi = keys[i + 1]!;
      const rising = b > a;
      for (let k = 0; k < 200 && hi - lo > 1e-15 * Math.abs(hi); k++) {
        const mid = 0.5 * (lo + hi);
        if (segmentValue(t, c, i, mid, method) < y === rising) lo = mid;
        else hi = mid;
      }
      out.value = 0.5 * (lo + hi);
    }
    return Status.ok;
  }
  return Status.outOfRange;
}

// ---------------------------------------------------------------- grids

/** Value of row j at x in x segment i (internal; NaN where a needed cell is missing). */
function rowValue(g: GridCore, c: GridColumn, j: number, i: number, x: number, method: number): number {
  const base = j * g.xs.length;
  const x0 = g.xs[i]!;
  const x1 = g.xs[i + 1]!;
  const y0 = c.values[base + i]!;
  const y1 = c.values[base + i + 1]!;
  if (x === x0) return y0;
  if (x === x1) return y1;
  if (method === Method.linear) return lerp(x0, x1, y0, y1, x);
  return hermite(x0, x1, y0, y1, c.slopes[base + i]!, c.slopes[base + i + 1]!, x);
}

/**
 * Value at (x, y) in cell (i, j) (internal; NaN where a needed cell is missing). A point on a grid
 * line uses that line alone, so it needs no cell on the far side of it.
 */
/** (Shared with core-bounds.ts.) */
export function cellValue(g: GridCore, c: GridColumn, i: number, j: number, x: number, y: number, method: number): number {
  const y0 = g.ys[j]!;
  const y1 = g.ys[j + 1]!;
  if (y === y0) return rowValue(g, c, j, i, x, method);
  if (y === y1) return rowValue(g, c, j + 1, i, x, method);
  return lerp(y0, y1, rowValue(g, c, j, i, x, method), rowValue(g, c, j + 1, i, x, method), y);
}

function gridMethodOk(method: number): boolean {
  return method === Method.linear || method === Method.monotoneCubic;
}

/** (Shared with core-bounds.ts.) */
export function inside(values: Float64Array, v: number): boolean {
  return v >= values[0]! && v <= values[values.length - 1]!;
}

/**
 * The value of column `column` at (x, y) (SI). Bilinear, or monotone cubic along x and linear
 * between rows.
 *
 * @returns {@link Status.ok} with `out.value` and the segments; {@link Status.outOfRange} outside
 *   the axes or where a needed cell is missing; {@link Status.invalidInput} for a non-finite input,
 *   an unknown column, or a method other than linear and monotone cubic
 * @example
 * ```ts
 * const g = buildGridCore(Float64Array.of(300, 400), Float64Array.of(1e6, 2e6), [Float64Array.of(1, 2, 3, NaN)]);
 * const out = new GridValue();
 * gridValue(g, 0, 350, 1e6, Method.linear, out);     //=> 0
 * out.value;                                         //=> 1.5
 * gridValue(g, 0, 350, 1.5e6, Method.linear, out);   //=> 1 (a needed cell is missing)
 * ```
 */
export function gridValue(g: GridCore, column: number, x: number, y: number, method: number, out: GridValue): StatusCode {
  const c = g.columns[column];
  if (c === undefined || !Number.isFinite(x) || !Number.isFinite(y) || !gridMethodOk(method)) return Status.invalidInput;
  if (!inside(g.xs, x) || !inside(g.ys, y)) return Status.outOfRange;
  const i = segmentIndex(g.xs, x);
  const j = segmentIndex(g.ys, y);
  out.xSegment = i;
  out.ySegment = j;
  const v = cellValue(g, c, i, j, x, y, method);
  if (Number.isNaN(v)) return Status.outOfRange;
  out.value = v;
  return Status.ok;
}

/** Which axis an inverse solves for, or a span runs along. */
export const Axis = { x: 0, y: 1 } as const;

/**
 * Inverse lookup along a grid line: with the other axis fixed at `fixed` (SI), the value of axis
 * `solveFor` at which column `column` equals `target` (SI). Uses the first bracketing segment in
 * ascending order of the free axis: linear inverts the straight line the bilinear interpolant is
 * along a grid line, monotone cubic bisects; a target equal to a node's value returns
 * that node's axis value exactly.
 *
 * @returns {@link Status.ok} with `out.value` (the free axis value) and the segments;
 *   {@link Status.outOfRange} when `fixed` lies outside its axis or the column does not reach
 *   `target` along the line; {@link Status.invalidInput} as for {@link gridValue}
 * @example
 * ```ts
 * const g = buildGridCore(Float64Array.of(300, 400), Float64Array.of(1e6, 2e6), [Float64Array.of(1, 2, 3, 4)]);
 * const out = new GridValue();
 * gridInverse(g, 0, 1.5, Axis.x, 1e6, Method.linear, out);   //=> 0
 * out.value;                                                 //=> 350
 * ```
 */
export function gridInverse(g: GridCore, column: number, target: number, solveFor: number, fixed: number, method: number, out: GridValue): StatusCode {
  const c = g.columns[column];
  if (c === undefined || !Number.isFinite(target) || !Number.isFinite(fixed) || !gridMethodOk(method) || (solveFor !== Axis.x && solveFor !== Axis.y)) return Status.invalidInput;
  const alongX = solveFor === Axis.x;
  const fixedAxis = alongX ? g.ys : g.xs;
  if (!inside(fixedAxis, fixed)) return Status.outOfRange;
  const fixedSegment = segmentIndex(fixedAxis, fixed);
  const free = alongX ? g.xs : g.ys;
  for (let k = 0; k + 1 < free.length; k++) {
    let lo = free[k]!;
    let hi = free[k + 1]!;
    const flo = (alongX ? cellValue(g, c, k, fixedSegment, lo, fixed, method) : cellValue(g, c, fixedSegment, k, fixed, lo, method)) - target;
    const fhi = (alongX ? cellValue(g, c, k, fixedSegment, hi, fixed, method) : cellValue(g, c, fixedSegment, k, fixed, hi, method)) - target;
    if (Number.isNaN(flo) || Number.isNaN(fhi) || flo * fhi > 0) continue;
    out.xSegment = alongX ? k : fixedSegment;
    out.ySegment = alongX ? fixedSegment : k;
    if (flo === 0) out.value = lo;
    else if (fhi === 0) out.value = hi;
    // along a grid line the bilinear interpolant is a straight line on each segment
    else if (method === Method.linear) out.value = lerp(flo, fhi, lo, hi, 0);
    else {
      for (let it = 0; it < 200 && hi - lo > 1e-15 * Math.abs(hi); it++) {
        const mid = 0.5 * (lo + hi);
        const fm = (alongX ? cellValue(g, c, k, fixedSegment, mid, fixed, method) : cellValue(g, c, fixedSegment, k, fixed, mid, method)) - target;
        if (fm * flo > 0) lo = mid;
        else hi = mid;
      }
      out.value = 0.5 * (lo + hi);
    }
    return Status.ok;
  }
  return Status.outOfRange;
}

export { dataSpan, lineRange } from './core-bounds.js';
