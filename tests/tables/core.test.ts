/**
 * The tables' SI core on the model contract: statuses for in-range, out-of-range, NaN, missing-cell
 * and log-of-non-positive inputs; values never NaN when the status is ok. Test constructions only
 * (linear functions chosen here), no property data.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { Axis, buildGridCore, buildTableCore, dataSpan, GridValue, gridInverse, gridValue, lineRange, Method, Span, TableValue, tableInverse, tableValue } from '../../src/tables/core.js';
import { defineGrid, defineTable } from '../../src/tables/index.js';

// y = 2x + 1 on keys 1..4; z = −x (not positive, for the log methods)
const keys = Float64Array.of(1, 2, 3, 4);
const t = buildTableCore(keys, [Float64Array.of(3, 5, 7, 9), Float64Array.of(-1, -2, -3, -4)]);
// keys not positive, for log-key
const tNeg = buildTableCore(Float64Array.of(-1, 0, 1), [Float64Array.of(1, 2, 3)]);
// grid z = x + 10y at x = 1, 2, 3 and y = 0, 1; the cell (x 2..3, y 0..1) misses its corner (3, 0)
const g = buildGridCore(Float64Array.of(1, 2, 3), Float64Array.of(0, 1), [Float64Array.of(1, 2, NaN, 11, 12, 13)]);

describe('one-dimensional core: tableValue', () => {
  const out = new TableValue();
  it('in range: ok, the value and the segment', () => {
    expect(tableValue(t, 0, 2.5, Method.linear, false, out)).toBe(Status.ok);
    expect(out.value).toBe(6);
    expect(out.segment).toBe(1);
    expect(out.extrapolated).toBe(false);
  });
  it('at a row: the stored value bit for bit, by every method', () => {
    for (const m of [Method.linear, Method.monotoneCubic, Method.logLinear, Method.logKey]) {
      keys.forEach((k, i) => {
        expect(tableValue(t, 0, k, m, false, out)).toBe(Status.ok);
        expect(out.value).toBe([3, 5, 7, 9][i]);
      });
    }
  });
  it('outside the keys: outOfRange, or ok and flagged with extrapolate', () => {
    expect(tableValue(t, 0, 5, Method.linear, false, out)).toBe(Status.outOfRange);
    expect(tableValue(t, 0, 0.5, Method.linear, false, out)).toBe(Status.outOfRange);
    expect(tableValue(t, 0, 5, Method.linear, true, out)).toBe(Status.ok);
    expect(out.value).toBe(11);
    expect(out.extrapolated).toBe(true);
  });
  it('NaN and infinite keys: invalidInput', () => {
    for (const x of [NaN, Infinity, -Infinity]) expect(tableValue(t, 0, x, Method.linear, true, out)).toBe(Status.invalidInput);
  });
  it('log-linear of values ≤ 0 and log-key of keys ≤ 0: invalidInput', () => {
    expect(tableValue(t, 1, 2.5, Method.logLinear, false, out)).toBe(Status.invalidInput);
    expect(tableValue(tNeg, 0, 0.5, Method.logKey, false, out)).toBe(Status.invalidInput);
    // log-key extrapolated to a key ≤ 0 cannot be reached
    expect(tableValue(t, 0, -1, Method.logKey, true, out)).toBe(Status.outOfRange);
  });
  it('an unknown column index or method code: invalidInput', () => {
    expect(tableValue(t, 2, 2, Method.linear, false, out)).toBe(Status.invalidInput);
    expect(tableValue(t, -1, 2, Method.linear, false, out)).toBe(Status.invalidInput);
    expect(tableValue(t, 0, 2, 9, false, out)).toBe(Status.invalidInput);
  });
  it('property: an ok status never comes with a NaN or infinite value (fast-check)', () => {
    fc.assert(
      fc.property(fc.double(), fc.integer({ min: 0, max: 3 }), fc.boolean(), fc.integer({ min: 0, max: 1 }), (x, m, extrapolate, c) => {
        const s = tableValue(t, c, x, m, extrapolate, out);
        return s !== Status.ok || Number.isFinite(out.value);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('one-dimensional core: tableInverse', () => {
  const out = new TableValue();
  it('the key where a column takes a value; exact at the rows', () => {
    expect(tableInverse(t, 0, 6, Method.linear, out)).toBe(Status.ok);
    expect(out.value).toBe(2.5);
    expect(out.segment).toBe(1);
    expect(tableInverse(t, 0, 7, Method.monotoneCubic, out)).toBe(Status.ok);
    expect(out.value).toBe(3);
  });
  it('bisects the interpolant for the other methods', () => {
    expect(tableInverse(t, 0, 6, Method.monotoneCubic, out)).toBe(Status.ok);
    const k = out.value;
    expect(tableValue(t, 0, k, Method.monotoneCubic, false, new TableValue())).toBe(Status.ok);
    expect(Math.abs(k - 2.5)).toBeLessThan(1e-12);
  });
  it('a value not reached: outOfRange; NaN: invalidInput; log-linear of values ≤ 0: invalidInput', () => {
    expect(tableInverse(t, 0, 10, Method.linear, out)).toBe(Status.outOfRange);
    expect(tableInverse(t, 0, NaN, Method.linear, out)).toBe(Status.invalidInput);
    expect(tableInverse(t, 1, -2.5, Method.logLinear, out)).toBe(Status.invalidInput);
  });
});

describe('grid core', () => {
  const out = new GridValue();
  it('in range: ok, bilinear, exact at nodes', () => {
    expect(gridValue(g, 0, 1.5, 0.5, Method.linear, out)).toBe(Status.ok);
    expect(out.value).toBe(6.5);
    expect([out.xSegment, out.ySegment]).toEqual([0, 0]);
    expect(gridValue(g, 0, 2, 1, Method.monotoneCubic, out)).toBe(Status.ok);
    expect(out.value).toBe(12);
  });
  it('a cell with a missing corner: outOfRange; its edges on complete lines still answer', () => {
    expect(gridValue(g, 0, 2.5, 0.5, Method.linear, out)).toBe(Status.outOfRange);
    expect(gridValue(g, 0, 2.5, 1, Method.linear, out)).toBe(Status.ok);
    expect(out.value).toBe(12.5);
    expect(gridValue(g, 0, 2, 0.5, Method.linear, out)).toBe(Status.ok);
    expect(out.value).toBe(7);
  });
  it('outside the axes: outOfRange; NaN: invalidInput; log methods and unknown columns: invalidInput', () => {
    expect(gridValue(g, 0, 4, 0.5, Method.linear, out)).toBe(Status.outOfRange);
    expect(gridValue(g, 0, 1.5, -1, Method.linear, out)).toBe(Status.outOfRange);
    expect(gridValue(g, 0, NaN, 0.5, Method.linear, out)).toBe(Status.invalidInput);
    expect(gridValue(g, 0, 1.5, Infinity, Method.linear, out)).toBe(Status.invalidInput);
    expect(gridValue(g, 0, 1.5, 0.5, Method.logLinear, out)).toBe(Status.invalidInput);
    expect(gridValue(g, 1, 1.5, 0.5, Method.linear, out)).toBe(Status.invalidInput);
  });
  it('inverse along x and along y; not reached and NaN', () => {
    expect(gridInverse(g, 0, 6.5, Axis.x, 0.5, Method.linear, out)).toBe(Status.ok);
    expect(Math.abs(out.value - 1.5)).toBeLessThan(1e-14);
    expect(gridInverse(g, 0, 12, Axis.x, 1, Method.linear, out)).toBe(Status.ok);
    expect(out.value).toBe(2);
    expect(gridInverse(g, 0, 6, Axis.y, 1, Method.linear, out)).toBe(Status.ok);
    expect(Math.abs(out.value - 0.5)).toBeLessThan(1e-14);
    expect(gridInverse(g, 0, 50, Axis.x, 0.5, Method.linear, out)).toBe(Status.outOfRange);
    expect(gridInverse(g, 0, 6, Axis.x, 2, Method.linear, out)).toBe(Status.outOfRange);
    expect(gridInverse(g, 0, NaN, Axis.x, 0.5, Method.linear, out)).toBe(Status.invalidInput);
    expect(gridInverse(g, 0, 6, 7, 0.5, Method.linear, out)).toBe(Status.invalidInput);
  });
  it('data spans and line ranges: numbers, or a status', () => {
    const s = new Span();
    expect(dataSpan(g, 0, Axis.x, 0.5, 2.5, s)).toBe(Status.ok);
    expect([s.min, s.max]).toEqual([1, 2]);
    expect(dataSpan(g, 0, Axis.x, 1, 2.5, s)).toBe(Status.ok);
    expect([s.min, s.max]).toEqual([1, 3]);
    expect(dataSpan(g, 0, Axis.y, 3, 0.5, s)).toBe(Status.ok);
    expect([s.min, s.max]).toEqual([1, 1]);
    expect(dataSpan(g, 0, Axis.x, 5, 2.5, s)).toBe(Status.outOfRange);
    expect(lineRange(g, 0, Axis.x, 0.5, s)).toBe(Status.ok);
    expect([s.min, s.max]).toEqual([6, 7]);
    expect(lineRange(g, 0, Axis.x, NaN, s)).toBe(Status.invalidInput);
  });
  it('property: an ok status never comes with a NaN value (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 4 }), fc.double({ min: -0.5, max: 1.5 }), fc.integer({ min: 0, max: 1 }), (x, y, m) => {
        const s = gridValue(g, 0, x, y, m, out);
        return s !== Status.ok || Number.isFinite(out.value);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('the classes’ valueAt is the core contract', () => {
  const table = defineTable({ name: 'c', source: 'test construction', key: 'x', columns: { x: { unit: 'kPa', values: [1, 2, 3] }, y: { unit: 'kJ/kg', values: [10, 20, 30] } } } as const);
  const grid = defineGrid({ kind: 'grid', name: 'g', source: 'test construction', x: { name: 'T', unit: 'K', values: [300, 400] }, y: { name: 'p', unit: 'kPa', values: [1, 2] }, columns: { h: { unit: 'kJ/kg', values: [[1, 2], [3, null]] } } } as const);
  it('table: SI in and out, statuses for out of range, NaN, unknown column and method', () => {
    const out = new TableValue();
    expect(table.valueAt('y', 1500, out)).toBe(Status.ok);
    expect(out.value).toBe(15000);
    expect(table.valueAt('y', 1500, out, 'monotone-cubic')).toBe(Status.ok);
    expect(table.valueAt('y', 5000, out)).toBe(Status.outOfRange);
    expect(table.valueAt('y', 5000, out, 'linear', true)).toBe(Status.ok);
    expect(out.value).toBe(50000);
    expect(table.valueAt('y', NaN, out)).toBe(Status.invalidInput);
    // @ts-expect-error not a column
    expect(table.valueAt('z', 1500, out)).toBe(Status.invalidInput);
    // @ts-expect-error not a method
    expect(table.valueAt('y', 1500, out, 'cubic')).toBe(Status.invalidInput);
  });
  it('grid: SI in and out, missing cell', () => {
    const out = new GridValue();
    expect(grid.valueAt('h', 350, 1000, out)).toBe(Status.ok);
    expect(out.value).toBe(1500);
    expect(grid.valueAt('h', 350, 1500, out)).toBe(Status.outOfRange);
    expect(grid.valueAt('h', 300, 2000, out)).toBe(Status.ok);
    expect(out.value).toBe(3000);
    expect(grid.valueAt('h', NaN, 1500, out)).toBe(Status.invalidInput);
  });
});
