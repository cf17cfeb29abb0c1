import fc from 'fast-check';
import { describe, expect, expectTypeOf, it } from 'vitest';
import { DefinitionError, InvalidInputError, OutOfRangeError } from '../../src/errors.js';
import { defineGrid, defineTable, tableFromCSV, tableFromJSON, type PropertyTable } from '../../src/tables/index.js';
import { quantity } from '../../src/units/index.js';
import { expectClose } from '../helpers/tolerance.js';

const oil = defineTable({
  name: 'thermal oil data sheet',
  // a construction for testing the mechanics, not property data: cp = 1.81 + 0.0035·t, rho = 882.5 − 0.625·t (t in °C)
  source: 'test construction: linear functions of t',
  key: 'T',
  columns: {
    T: { unit: '°C', values: [20, 60, 100, 140] },
    cp: { unit: 'kJ/(kg·K)', values: [1.88, 2.02, 2.16, 2.3] },
    rho: { unit: 'kg/m³', values: [870, 845, 820, 795] },
  },
} as const);

describe('one-dimensional tables', () => {
  it('the column names are part of the type', () => {
    expectTypeOf(oil).toEqualTypeOf<PropertyTable<'T' | 'cp' | 'rho'>>();
    // @ts-expect-error there is no column "mu"
    expect(() => oil.lookup('mu', '50 °C')).toThrow(InvalidInputError);
  });
  it('interpolating at a tabulated row returns the tabulated value bit for bit, by every method', () => {
    for (const method of ['linear', 'monotone-cubic', 'log-linear', 'log-key'] as const) {
      [20, 60, 100, 140].forEach((T, i) => {
        expect(oil.lookup('cp', quantity(T, '°C'), { method }).value.in('kJ/(kg·K)')).toBe([1.88, 2.02, 2.16, 2.3][i]);
      });
    }
  });
  it('interpolates linearly between rows and reports the rows used', () => {
    const r = oil.lookup('cp', '80 °C');
    expectClose(r.value.in('kJ/(kg·K)'), 2.09, { rel: 1e-14 });
    expect(r.rows).toEqual([1, 2]);
    expect(r.extrapolated).toBe(false);
  });
  it('takes keys in any unit of the key dimension', () => {
    expectClose(oil.lookup('cp', '176 °F').value.in('kJ/(kg·K)'), 2.09, { rel: 1e-12 });
  });
  it('outside the table: a typed error naming its range, or a flagged extrapolation on request', () => {
    try {
      oil.lookup('cp', '200 °C');
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(OutOfRangeError);
      expectClose((e as OutOfRangeError).range.max, 413.15, { rel: 1e-12 });
      // in the caller's unit, with SI in parentheses
      expect((e as Error).message).toContain('T = 200 °C (473.15 K) is above the upper limit of table "thermal oil data sheet" (140 °C (413.15 K)); valid range 20 to 140 °C; pass { extrapolate: true }');
      expect((e as OutOfRangeError).range.given).toMatchObject({ unit: '°C' });
    }
    const r = oil.lookup('cp', '180 °C', { extrapolate: true });
    expect(r.extrapolated).toBe(true);
    expect(r.value.extrapolated).toBe(true);
    expectClose(r.value.in('kJ/(kg·K)'), 2.44, { rel: 1e-12 });
  });
  it('inverse lookup: the key where a column takes a value', () => {
    const r = oil.inverse('rho', '832.5 kg/m³');
    expectClose(r.value.in('°C'), 80, { rel: 1e-12 });
    expect(r.axis).toBe('T');
    expect(r.rows).toEqual([1, 2]);
    expect(() => oil.inverse('rho', '900 kg/m³')).toThrow(OutOfRangeError);
  });
  it('log-key interpolates linearly in ln(key): a column linear in ln p is reproduced exactly between rows', () => {
    const t = defineTable({ name: 'ln p', source: 'test: y = 3·ln(p/1 Pa)', key: 'p', columns: { p: { unit: 'Pa', values: [1e3, 1e5, 1e7] }, y: { unit: 'K', values: [3 * Math.log(1e3), 3 * Math.log(1e5), 3 * Math.log(1e7)] } } } as const);
    expectClose(t.lookup('y', '1e4 Pa', { method: 'log-key' }).value.si, 3 * Math.log(1e4), { rel: 1e-14 });
    expect(Math.abs(t.lookup('y', '1e4 Pa').value.si - 3 * Math.log(1e4))).toBeGreaterThan(1);
  });
  it('descending keys work and report rows in the table’s own order', () => {
    const t = defineTable({ name: 'desc', source: 'test', key: 'p', columns: { p: { unit: 'bar', values: [10, 5, 1] }, T: { unit: 'K', values: [453, 425, 373] } } } as const);
    const r = t.lookup('T', '7.5 bar');
    expectClose(r.value.si, 439, { rel: 1e-12 });
    expect(r.rows).toEqual([1, 0]);
  });
  it('property: monotone cubic never overshoots the data between rows (Fritsch–Carlson; fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: 3, maxLength: 12 }), fc.double({ min: 0, max: 1, noNaN: true }), (ys, frac) => {
        const xs = ys.map((_, i) => i * 10 + 1);
        const t = defineTable({ name: 'random', source: 'test', key: 'x', columns: { x: { unit: 'K', values: xs }, y: { unit: 'J/kg', values: ys } } });
        const x = xs[0]! + frac * (xs[xs.length - 1]! - xs[0]!);
        const r = t.lookup('y', quantity(x, 'K'), { method: 'monotone-cubic' });
        const [i, j] = r.rows as [number, number];
        const v = r.value.si;
        return v >= Math.min(ys[i]!, ys[j]!) - 1e-9 && v <= Math.max(ys[i]!, ys[j]!) + 1e-9;
      }),
    );
  });
});

describe('validation names the row and column', () => {
  const bad = (columns: Record<string, { unit: string; values: (number | null)[] }>, key = 'T') => () => tableFromJSON({ name: 't', source: 's', key, columns });
  it.each([
    ['non-monotone key', { T: { unit: 'K', values: [300, 320, 310] }, h: { unit: 'kJ/kg', values: [1, 2, 3] } }, /row 3: key T = 310 breaks the ascending order/],
    ['duplicate key', { T: { unit: 'K', values: [300, 300, 310] }, h: { unit: 'kJ/kg', values: [1, 2, 3] } }, /row 2: duplicate key T = 300/],
    ['missing cell', { T: { unit: 'K', values: [300, 310, 320] }, h: { unit: 'kJ/kg', values: [1, null, 3] } }, /row 2, column "h": missing or non-numeric cell/],
    ['unknown unit', { T: { unit: 'K', values: [300, 310] }, h: { unit: 'kJ/furlong', values: [1, 2] } }, /columns\.h\.unit: column "h": unknown unit "furlong"/],
    ['ragged rows', { T: { unit: 'K', values: [300, 310, 320] }, h: { unit: 'kJ/kg', values: [1, 2] } }, /ragged rows/],
    ['empty table', { T: { unit: 'K', values: [] }, h: { unit: 'kJ/kg', values: [] } }, /the table is empty/],
  ])('%s', (_name, columns, message) => {
    expect(bad(columns)).toThrow(DefinitionError);
    expect(bad(columns)).toThrow(message);
  });
  it('a key that is not a column', () => {
    expect(bad({ T: { unit: 'K', values: [1, 2] } }, 'p')).toThrow(/key column "p" is not among the columns/);
  });
});

describe('CSV tables', () => {
  // a table built from an analytic function of our own: y = 2 + 3x + 0.5x² (x in K, y in kJ/kg)
  const f = (x: number) => 2 + 3 * x + 0.5 * x * x;
  const xs = [0, 1, 2, 3, 4, 5, 6, 7, 8];
  const csv = ['# source: analytic test function y = 2 + 3x + 0.5x²', 'x [K], y [kJ/kg]', ...xs.map((x) => `${x}, ${f(x)}`)].join('\n');
  const t = tableFromCSV(csv, { name: 'analytic' });
  it('reads the header units and the source comment', () => {
    expect(t.columnInfo('y')).toEqual({ unit: 'kJ/kg', dimension: 'specificEnergy' });
    expect(t.source).toBe('analytic test function y = 2 + 3x + 0.5x²');
  });
  it('interpolates exactly at its rows', () => {
    for (const x of xs) expect(t.lookup('y', quantity(x, 'K')).value.in('kJ/kg')).toBe(f(x));
  });
  it('stays within the analytic error bound between rows: linear h²·max|f″|/8 = 0.125 kJ/kg', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 8, noNaN: true }), (x) => Math.abs(t.lookup('y', quantity(x, 'K')).value.in('kJ/kg') - f(x)) <= 0.125 + 1e-12),
    );
  });
  it('accepts US units in the header', () => {
    const us = tableFromCSV('T [°F]; p [psia]; h [Btu/lbm]\n200; 11.5; 168\n250; 29.8; 218.6\n');
    expectClose(us.lookup('h', '225 °F').value.in('Btu/lbm'), 193.3, { rel: 1e-12 });
  });
  it.each([
    ['a header without a unit', 'T, h [kJ/kg]\n1, 2\n2, 3', /column 1 header "T" has no unit/],
    ['an unknown unit', 'T [K], h [kJ/furlong]\n1, 2\n2, 3', /unknown unit "furlong"/],
    ['a non-numeric cell', 'T [K], h [kJ/kg]\n1, 2\n2, abc', /line 3, column "h": "abc" is not a number/],
    ['a missing cell', 'T [K], h [kJ/kg]\n1, 2\n2, ', /line 3, column "h": missing cell/],
    ['a ragged row', 'T [K], h [kJ/kg]\n1, 2\n2, 3, 4', /line 3: 3 cells, but the header has 2/],
    ['no rows', 'T [K], h [kJ/kg]\n', /no data rows/],
    ['an empty file', '\n\n', /the CSV is empty/],
    ['a non-monotone key', 'T [K], h [kJ/kg]\n1, 2\n3, 3\n2, 4', /row 3: key T = 2 breaks/],
  ])('rejects %s', (_what, text, message) => {
    expect(() => tableFromCSV(text)).toThrow(DefinitionError);
    expect(() => tableFromCSV(text)).toThrow(message);
  });
});

describe('grid tables', () => {
  const g = defineGrid({
    kind: 'grid',
    name: 'test grid',
    source: 'test: z = x + 10·y (exactly bilinear)',
    x: { name: 'T', unit: 'K', values: [300, 400, 500] },
    y: { name: 'p', unit: 'MPa', values: [1, 2] },
    columns: { h: { unit: 'kJ/kg', values: [[301, 401, null], [302, 402, 502]] } },
  } as const);
  it('bilinear: exact at the nodes and for a bilinear function', () => {
    expect(g.lookup('h', { T: '300 K', p: '1 MPa' }).value.in('kJ/kg')).toBe(301);
    expectClose(g.lookup('h', { T: '350 K', p: '1.5 MPa' }).value.in('kJ/kg'), 351.5, { rel: 1e-14 });
  });
  it('a lookup that needs an empty cell throws', () => {
    expect(() => g.lookup('h', { T: '450 K', p: '1.5 MPa' })).toThrow(/empty/);
    // its bounds are where h has data at p = 1.5 MPa: T from 300 to 400 K (numbers, never NaN)
    try {
      g.lookup('h', { T: '450 K', p: '1.5 MPa' });
    } catch (e) {
      expect((e as OutOfRangeError).range).toMatchObject({ quantity: 'T', value: 450, min: 300, max: 400, unit: 'K' });
    }
  });
  it('outside the grid throws with its range', () => {
    expect(() => g.lookup('h', { T: '350 K', p: '3 MPa' })).toThrow(OutOfRangeError);
    expect(() => g.lookup('h', { T: '350 K', p: '3 MPa' })).toThrow('p = 3 MPa (3000000 Pa) is above the upper limit of grid "test grid" (2 MPa (2000000 Pa))');
  });
  it('a point on the first grid row needs no cell of the row above (cells missing there)', () => {
    const h = defineGrid({
      kind: 'grid', name: 'edge', source: 'test construction',
      x: { name: 'T', unit: 'K', values: [300, 400, 500] }, y: { name: 'p', unit: 'MPa', values: [1, 2] },
      columns: { h: { unit: 'kJ/kg', values: [[301, 401, 501], [null, null, 502]] } },
    } as const);
    expectClose(h.lookup('h', { T: '350 K', p: '1 MPa' }).value.in('kJ/kg'), 351, { rel: 1e-14 });
    expect(h.lookup('h', { T: '400 K', p: '1 MPa' }).value.in('kJ/kg')).toBe(401);
    expect(() => h.lookup('h', { T: '350 K', p: '1.5 MPa' })).toThrow(OutOfRangeError);
  });
  it('inverse that is not reached: bounds are the column\'s range on that line', () => {
    try {
      g.inverse('h', '900 kJ/kg', { p: '1 MPa' });
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(OutOfRangeError);
      expect((e as OutOfRangeError).range).toMatchObject({ quantity: 'h', value: 900e3, min: 301e3, max: 401e3, unit: 'J/kg' });
      expect((e as Error).message).toContain('h = 900 kJ/kg (900000 J/kg) is not reached along p = 1 MPa (1000000 Pa) in grid "test grid"');
    }
  });
  it('inverse along an axis', () => {
    const r = g.inverse('h', '351.5 kJ/kg', { p: '1.5 MPa' });
    expectClose(r.value.in('K'), 350, { rel: 1e-12 });
    expect(r.axis).toBe('T');
    expect(r.rows).toEqual([0, 1]);
    // along T at fixed p, and along p at fixed T: the same shape
    const q = g.inverse('h', '351.5 kJ/kg', { T: '350 K' });
    expectClose(q.value.in('MPa'), 1.5, { rel: 1e-12 });
    expect(q.axis).toBe('p');
    expect(q.rows).toEqual([0, 1]);
  });
});
