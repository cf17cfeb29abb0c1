/**
 * Where a grid column has data: the spans its errors report as numeric bounds (the part of an axis a
 * lookup can use along a grid line, and the column's range along it). SI core, on the contract of
 * core.ts.
 *
 * @module
 */
import { segmentIndex } from '../numeric/search.js';
import { Status, type StatusCode } from '../core/status.js';
import { Axis, cellValue, inside, Method, Span, type GridColumn, type GridCore } from './core.js';

/** The column's value at node k of the line (internal; NaN where missing). */
function nodeOnLine(g: GridCore, c: GridColumn, alongX: boolean, k: number, fixedSegment: number, fixed: number): number {
  return alongX ? cellValue(g, c, k === g.xs.length - 1 ? k - 1 : k, fixedSegment, g.xs[k]!, fixed, Method.linear) : cellValue(g, c, fixedSegment, k === g.ys.length - 1 ? k - 1 : k, fixed, g.ys[k]!, Method.linear);
}

/**
 * Where the column has data along a grid line: with the other axis at `fixed` (SI), the span of
 * axis `along` covered by the run of nodes holding a value that contains `near` (or, when `near`
 * lies in a gap, the run nearest to it).
 *
 * @returns {@link Status.ok} with `out.min`, `out.max`; {@link Status.outOfRange} when `fixed` lies
 *   outside its axis or no node on the line holds a value; {@link Status.invalidInput} for a
 *   non-finite input or unknown column
 * @example
 * ```ts
 * const g = buildGridCore(Float64Array.of(300, 400, 500), Float64Array.of(1e6, 2e6), [Float64Array.of(1, 2, NaN, 3, 4, 5)]);
 * const out = new Span();
 * dataSpan(g, 0, Axis.x, 1.5e6, 450, out);   //=> 0
 * [out.min, out.max];                        //=> [300, 400]
 * ```
 */
export function dataSpan(g: GridCore, column: number, along: number, fixed: number, near: number, out: Span): StatusCode {
  const c = g.columns[column];
  if (c === undefined || !Number.isFinite(fixed) || !Number.isFinite(near) || (along !== Axis.x && along !== Axis.y)) return Status.invalidInput;
  const alongX = along === Axis.x;
  const fixedAxis = alongX ? g.ys : g.xs;
  if (!inside(fixedAxis, fixed)) return Status.outOfRange;
  const fixedSegment = segmentIndex(fixedAxis, fixed);
  const line = alongX ? g.xs : g.ys;
  let best = Infinity;
  let k = 0;
  while (k < line.length) {
    while (k < line.length && Number.isNaN(nodeOnLine(g, c, alongX, k, fixedSegment, fixed))) k++;
    if (k === line.length) break;
    const start = k;
    while (k < line.length && !Number.isNaN(nodeOnLine(g, c, alongX, k, fixedSegment, fixed))) k++;
    const lo = line[start]!;
    const hi = line[k - 1]!;
    const distance = near < lo ? lo - near : near > hi ? near - hi : 0;
    if (distance < best) {
      best = distance;
      out.min = lo;
      out.max = hi;
    }
  }
  return best === Infinity ? Status.outOfRange : Status.ok;
}

/**
 * The smallest and largest value of the column at the nodes of a grid line (the other axis at
 * `fixed`, SI): what an inverse along that line can reach between nodes.
 *
 * @returns {@link Status.ok} with `out.min`, `out.max`; {@link Status.outOfRange} when `fixed` lies
 *   outside its axis or no node on the line holds a value; {@link Status.invalidInput} for a
 *   non-finite input or unknown column
 * @example
 * ```ts
 * const g = buildGridCore(Float64Array.of(300, 400), Float64Array.of(1e6, 2e6), [Float64Array.of(1, 2, 3, 4)]);
 * const out = new Span();
 * lineRange(g, 0, Axis.x, 1.5e6, out);   //=> 0
 * [out.min, out.max];                    //=> [2, 3]
 * ```
 */
export function lineRange(g: GridCore, column: number, along: number, fixed: number, out: Span): StatusCode {
  const c = g.columns[column];
  if (c === undefined || !Number.isFinite(fixed) || (along !== Axis.x && along !== Axis.y)) return Status.invalidInput;
  const alongX = along === Axis.x;
  const fixedAxis = alongX ? g.ys : g.xs;
  if (!inside(fixedAxis, fixed)) return Status.outOfRange;
  const fixedSegment = segmentIndex(fixedAxis, fixed);
  const n = alongX ? g.xs.length : g.ys.length;
  let min = Infinity;
  let max = -Infinity;
  for (let k = 0; k < n; k++) {
    const v = nodeOnLine(g, c, alongX, k, fixedSegment, fixed);
    if (Number.isNaN(v)) continue;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  if (min === Infinity) return Status.outOfRange;
  out.min = min;
  out.max = max;
  return Status.ok;
}
