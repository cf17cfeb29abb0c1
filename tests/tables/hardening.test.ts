/**
 * Bad input to every public table function: a typed error with its stable code, whose message names
 * the input, never a plain TypeError; and (fast-check) error data never hold NaN or null.
 * Test constructions only.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DefinitionError, DimensionError, HeatstateError, InvalidInputError, OutOfRangeError, UnitError } from '../../src/errors.js';
import { defineGrid, defineTable, gridFromJSON, tableFromCSV, tableFromJSON, type GridData, type TableData } from '../../src/tables/index.js';

const oil = defineTable({
  name: 'oil',
  source: 'test construction',
  key: 'T',
  columns: { T: { unit: '°C', values: [20, 60, 100] }, cp: { unit: 'kJ/(kg·K)', values: [1.88, 2.02, 2.16] }, z: { unit: 'kJ/kg', values: [-1, 0, 1] } },
} as const);
const grid = defineGrid({
  kind: 'grid',
  name: 'grid',
  source: 'test construction',
  x: { name: 'T', unit: 'K', values: [300, 400, 500] },
  y: { name: 'p', unit: 'MPa', values: [1, 2] },
  columns: { h: { unit: 'kJ/kg', values: [[301, 401, null], [302, 402, 502]] } },
} as const);
const csv = 'T [K], h [kJ/kg]\n300, 1\n310, 2\n';
const json = (columns: Record<string, unknown>, key = 'T'): string => JSON.stringify({ name: 't', source: 's', key, columns });
const K = (values: number[]) => ({ unit: 'K', values });
const H = (values: number[]) => ({ unit: 'kJ/kg', values });
const csvCell = (cell: string) => `T [K], h [kJ/kg]\n300, 1\n310, ${cell}\n`;
const gridWith = (over: Partial<Record<string, unknown>>): GridData => ({ kind: 'grid', name: 'g', source: 's', x: { name: 'T', unit: 'K', values: [300, 400] }, y: { name: 'p', unit: 'MPa', values: [1, 2] }, columns: { h: { unit: 'kJ/kg', values: [[1, 2], [3, 4]] } }, ...over }) as GridData;

type Case = [string, () => unknown, new (...args: never[]) => HeatstateError, string, string | RegExp];
const cases: Case[] = [
  // loaders: argument types
  ['tableFromCSV(null)', () => tableFromCSV(null as never), InvalidInputError, 'input.invalid', 'text must be a string of CSV; got null'],
  ['tableFromCSV(5)', () => tableFromCSV(5 as never), InvalidInputError, 'input.invalid', 'text must be a string'],
  ['tableFromCSV options as a string', () => tableFromCSV(csv, 'name' as never), InvalidInputError, 'input.invalid', 'options must be an object'],
  ['tableFromCSV unknown option', () => tableFromCSV(csv, { nam: 'x' } as never), InvalidInputError, 'input.invalid', 'unknown option "nam"'],
  ['tableFromCSV options.name a number', () => tableFromCSV(csv, { name: 5 } as never), InvalidInputError, 'input.invalid', 'options.name must be a non-empty string'],
  ['tableFromCSV options.key empty', () => tableFromCSV(csv, { key: '' }), InvalidInputError, 'input.invalid', 'options.key must be a non-empty string'],
  ['tableFromCSV options.key not a column', () => tableFromCSV(csv, { key: 'p' }), DefinitionError, 'definition.invalid', 'key column "p"'],
  ['tableFromJSON(5)', () => tableFromJSON(5 as never), InvalidInputError, 'input.invalid', 'json must be JSON text or a parsed object; got 5'],
  ['tableFromJSON(null)', () => tableFromJSON(null as never), InvalidInputError, 'input.invalid', 'json must be'],
  ['tableFromJSON([])', () => tableFromJSON([]), InvalidInputError, 'input.invalid', 'got an array of 0'],
  ['gridFromJSON(true)', () => gridFromJSON(true as never), InvalidInputError, 'input.invalid', 'gridFromJSON: json must be'],
  ['tableFromJSON(broken text)', () => tableFromJSON('{"name": '), DefinitionError, 'definition.invalid', 'table JSON'],
  ['tableFromJSON("5")', () => tableFromJSON('5'), DefinitionError, 'definition.invalid', 'a table definition must be an object; got 5'],
  ['defineTable(5)', () => defineTable(5 as never), DefinitionError, 'definition.invalid', 'a table definition must be an object'],
  // CSV cells: decimal numbers only, named by line and column
  ['CSV cell 0x10', () => tableFromCSV(csvCell('0x10')), DefinitionError, 'definition.invalid', 'line 3, column "h": "0x10" is not a decimal number'],
  ['CSV cell 0b1', () => tableFromCSV(csvCell('0b1')), DefinitionError, 'definition.invalid', 'line 3, column "h": "0b1" is not a decimal number'],
  ['CSV cell 0o7', () => tableFromCSV(csvCell('0o7')), DefinitionError, 'definition.invalid', 'line 3, column "h": "0o7"'],
  ['CSV cell 1_000', () => tableFromCSV(csvCell('1_000')), DefinitionError, 'definition.invalid', 'line 3, column "h": "1_000" is not a decimal number'],
  ['CSV cell Infinity', () => tableFromCSV(csvCell('Infinity')), DefinitionError, 'definition.invalid', 'line 3, column "h": "Infinity" is not a decimal number'],
  ['CSV cell -Infinity', () => tableFromCSV(csvCell('-Infinity')), DefinitionError, 'definition.invalid', 'line 3, column "h": "-Infinity"'],
  ['CSV cell NaN', () => tableFromCSV(csvCell('NaN')), DefinitionError, 'definition.invalid', 'line 3, column "h": "NaN" is not a decimal number'],
  ['CSV key cell 0x136', () => tableFromCSV('T [K], h [kJ/kg]\n300, 1\n0x136, 2\n'), DefinitionError, 'definition.invalid', 'line 3, column "T": "0x136"'],
  // physical bounds of keys
  ['temperature key −10 K', () => tableFromJSON(json({ T: K([-10, 10]), h: H([1, 2]) })), DefinitionError, 'definition.invalid', 'row 1, column "T": -10 K is below absolute zero'],
  ['temperature key −300 °C (CSV)', () => tableFromCSV('T [°C], h [kJ/kg]\n-300, 1\n0, 2\n'), DefinitionError, 'definition.invalid', 'row 1, column "T": -300 °C is below absolute zero'],
  ['pressure key −20 psig', () => tableFromJSON(json({ p: { unit: 'psig', values: [-20, 0] }, h: H([1, 2]) }, 'p')), DefinitionError, 'definition.invalid', 'row 1, column "p": -20 psig is below vacuum'],
  ['pressure key 0 psia', () => tableFromJSON(json({ p: { unit: 'psia', values: [0, 10] }, h: H([1, 2]) }, 'p')), DefinitionError, 'definition.invalid', 'row 1, column "p": 0 psia is not a positive absolute pressure'],
  ['grid temperature axis −10 K', () => gridFromJSON(gridWith({ x: { name: 'T', unit: 'K', values: [-10, 400] } })), DefinitionError, 'definition.invalid', 'axis T, value 1: -10 K is below absolute zero'],
  // reserved names
  ['CSV column __proto__', () => tableFromCSV('T [K], __proto__ [kJ/kg]\n300, 1\n310, 2\n'), DefinitionError, 'definition.invalid', 'column "__proto__": the name is reserved'],
  ['JSON text column __proto__', () => tableFromJSON('{"name": "t", "source": "s", "key": "T", "columns": {"T": {"unit": "K", "values": [300, 310]}, "__proto__": {"unit": "kJ/kg", "values": [1, 2]}}}'), DefinitionError, 'definition.invalid', 'columns.__proto__: column "__proto__": the name is reserved'],
  ['defineTable computed column __proto__', () => defineTable({ name: 't', source: 's', key: 'T', columns: { T: K([300, 310]), ['__proto__' as string]: H([1, 2]) } } as TableData), DefinitionError, 'definition.invalid', 'column "__proto__": the name is reserved'],
  ['JSON column constructor', () => tableFromJSON(json({ T: K([300, 310]), constructor: H([1, 2]) })), DefinitionError, 'definition.invalid', 'column "constructor": the name is reserved'],
  ['defineTable column prototype', () => defineTable({ name: 't', source: 's', key: 'T', columns: { T: K([300, 310]), prototype: H([1, 2]) } }), DefinitionError, 'definition.invalid', 'column "prototype"'],
  // an object literal's `__proto__: …` sets the prototype: the column would vanish silently
  ['defineTable columns with a prototype set', () => defineTable({ name: 't', source: 's', key: 'T', columns: { T: K([300, 310]), __proto__: H([1, 2]) } } as TableData), DefinitionError, 'definition.invalid', 'columns must be a plain object'],
  ['grid axis named constructor', () => gridFromJSON(gridWith({ x: { name: 'constructor', unit: 'K', values: [300, 400] } })), DefinitionError, 'definition.invalid', 'axis "constructor": the name is reserved'],
  // units in headers name the column
  ['compound temperature unit in a header', () => tableFromCSV('T [degF·m/m], h [kJ/kg]\n300, 1\n310, 2\n'), DefinitionError, 'definition.invalid', /columns\.T\.unit: column "T": "degF·m\/m" is a temperature written as a compound unit/],
  ['unknown unit in a header', () => tableFromCSV('T [K], h [kJ/furlong]\n300, 1\n310, 2\n'), DefinitionError, 'definition.invalid', 'column "h": unknown unit "furlong"'],
  ['grid column all null', () => gridFromJSON(gridWith({ columns: { h: { unit: 'kJ/kg', values: [[null, null], [null, null]] } } })), DefinitionError, 'definition.invalid', 'column "h" holds no values'],
  // lookups
  ['lookup(null)', () => oil.lookup(null as never, '50 °C'), InvalidInputError, 'input.invalid', 'column must be a column of table "oil": one of "T", "cp", "z"; got null'],
  ['lookup of an unknown column', () => oil.lookup('mu' as never, '50 °C'), InvalidInputError, 'input.invalid', 'got "mu"'],
  ['lookup at null', () => oil.lookup('cp', null as never), InvalidInputError, 'input.invalid', 'T must be a quantity or unit text'],
  ['lookup at a bare number', () => oil.lookup('cp', 300 as never), InvalidInputError, 'input.invalid', 'T = 300 has no unit'],
  ['lookup at a pressure', () => oil.lookup('cp', '300 Pa'), DimensionError, 'dimension.mismatch', 'T must be a temperature'],
  ['lookup at an unknown unit', () => oil.lookup('cp', '300 furlong'), UnitError, 'unit.unknown', 'furlong'],
  ['lookup options as a string', () => oil.lookup('cp', '50 °C', 'linear' as never), InvalidInputError, 'input.invalid', 'options must be an object; got "linear"'],
  ['lookup method cubic', () => oil.lookup('cp', '50 °C', { method: 'cubic' as never }), InvalidInputError, 'input.invalid', 'options.method must be one of "linear", "monotone-cubic", "log-linear", "log-key"; got "cubic"'],
  ['lookup extrapolate "yes"', () => oil.lookup('cp', '50 °C', { extrapolate: 'yes' as never }), InvalidInputError, 'input.invalid', 'options.extrapolate must be true or false'],
  ['lookup unknown option', () => oil.lookup('cp', '50 °C', { methd: 'linear' } as never), InvalidInputError, 'input.invalid', 'unknown option "methd"'],
  ['lookup log-linear of values ≤ 0', () => oil.lookup('z', '50 °C', { method: 'log-linear' }), InvalidInputError, 'input.invalid', 'column "z" of table "oil" has values ≤ 0'],
  ['lookup outside the table', () => oil.lookup('cp', '150 °C'), OutOfRangeError, 'range.outside', 'T = 150 °C (423.15 K) is above the upper limit of table "oil"'],
  ['columnInfo of an unknown column', () => oil.columnInfo('nope' as never), InvalidInputError, 'input.invalid', 'name must be a column of table "oil"'],
  // inverses
  ['inverse of a temperature where a density is', () => oil.inverse('cp', '1 K'), DimensionError, 'dimension.mismatch', 'cp must be a specific heat'],
  ['inverse method spline', () => oil.inverse('cp', '2 kJ/(kg·K)', { method: 'spline' as never }), InvalidInputError, 'input.invalid', 'options.method must be one of'],
  ['inverse not reached', () => oil.inverse('cp', '3 kJ/(kg·K)'), OutOfRangeError, 'range.outside', 'cp = 3 kJ/(kg·K) (3000 J/(kg·K)) is not reached in table "oil"'],
  // grids
  ['grid lookup at null', () => grid.lookup('h', null as never), InvalidInputError, 'input.invalid', 'lookup of grid "grid" needs at = { p, T }; got null'],
  ['grid lookup without T', () => grid.lookup('h', { p: '1 MPa' } as never), InvalidInputError, 'input.invalid', 'needs at = { p, T }; got { p }'],
  ['grid lookup with an unknown axis', () => grid.lookup('h', { P: '1 MPa', T: '300 K' } as never), InvalidInputError, 'input.invalid', '"P" is not an axis of grid "grid"'],
  ['grid lookup T as a pressure', () => grid.lookup('h', { p: '1 MPa', T: '1 MPa' as never }), DimensionError, 'dimension.mismatch', 'T must be a temperature'],
  ['grid lookup method log-key', () => grid.lookup('h', { p: '1 MPa', T: '300 K' }, { method: 'log-key' as never }), InvalidInputError, 'input.invalid', 'options.method must be one of "linear", "monotone-cubic"'],
  ['grid lookup of a missing cell', () => grid.lookup('h', { p: '1.5 MPa', T: '450 K' }), OutOfRangeError, 'range.outside', 'grid "grid" has no h data at p = 1.5 MPa'],
  ['grid inverse with both axes fixed', () => grid.inverse('h', '350 kJ/kg', { p: '1 MPa', T: '300 K' }), InvalidInputError, 'input.invalid', 'needs at = exactly one of p or T'],
  ['grid inverse of an unknown column', () => grid.inverse('v' as never, '1 m³/kg', { p: '1 MPa' }), InvalidInputError, 'input.invalid', 'column must be a column of grid "grid"'],
  ['grid inverse fixed outside its axis', () => grid.inverse('h', '350 kJ/kg', { p: '5 MPa' }), OutOfRangeError, 'range.outside', 'p = 5 MPa (5000000 Pa) is above the upper limit of grid "grid"'],
];

describe('bad input: a typed error, its code, a message naming the input', () => {
  it('covers at least 30 cases', () => expect(cases.length).toBeGreaterThanOrEqual(30));
  it.each(cases)('%s', (_name, call, type, code, text) => {
    let thrown: unknown;
    try {
      call();
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(type);
    expect((thrown as HeatstateError).code).toBe(code);
    if (typeof text === 'string') expect((thrown as Error).message).toContain(text);
    else expect((thrown as Error).message).toMatch(text);
  });
});

/** Every NaN or null in an error's own data (not its message or stack), as paths. */
function badData(value: unknown, path: string, seen = new Set<unknown>()): string[] {
  if (typeof value === 'number') return Number.isNaN(value) ? [path] : [];
  if (value === null) return [path];
  if (typeof value !== 'object' || seen.has(value)) return [];
  seen.add(value);
  return Object.entries(value).flatMap(([k, v]) => (k === 'stack' ? [] : badData(v, `${path}.${k}`, seen)));
}

function errorOf(call: () => unknown): unknown {
  try {
    call();
    return undefined;
  } catch (e) {
    return e;
  }
}

describe('property: errors of every table function are typed and their data hold no NaN or null (fast-check)', () => {
  const units = ['K', '°C', '°F', 'Pa', 'MPa', 'psig', 'kJ/kg', 'kJ/(kg·K)', 'furlong', '', 'Δ°F'];
  const text = fc.oneof(
    fc.string(),
    fc.tuple(fc.oneof(fc.double(), fc.integer()), fc.constantFrom(...units)).map(([v, u]) => `${v} ${u}`),
    fc.constantFrom('NaN K', 'Infinity K', '1e999 K', '-500 °F', '-20 psig', '0x10 K'),
  );
  const anyInput = fc.oneof(fc.anything(), text);
  const check = (e: unknown) => {
    if (e === undefined) return;
    expect(e).toBeInstanceOf(HeatstateError);
    expect(badData(e, 'error')).toEqual([]);
  };
  it('table lookup and inverse', () => {
    fc.assert(
      fc.property(fc.oneof(fc.constantFrom('T', 'cp', 'z'), fc.anything()), anyInput, fc.oneof(fc.constant(undefined), fc.anything(), fc.record({ method: fc.oneof(fc.constantFrom('linear', 'monotone-cubic', 'log-linear', 'log-key'), fc.anything()), extrapolate: fc.anything() })), (column, at, options) => {
        check(errorOf(() => oil.lookup(column as never, at as never, options as never)));
        check(errorOf(() => oil.inverse(column as never, at as never, options as never)));
      }),
      { numRuns: 400 },
    );
  });
  it('grid lookup and inverse', () => {
    fc.assert(
      fc.property(fc.oneof(fc.constant('h'), fc.anything()), fc.oneof(fc.anything(), fc.record({ T: anyInput, p: anyInput }, { requiredKeys: [] })), anyInput, (column, at, value) => {
        check(errorOf(() => grid.lookup(column as never, at as never)));
        check(errorOf(() => grid.inverse(column as never, value as never, at as never)));
      }),
      { numRuns: 400 },
    );
  });
  it('loaders', () => {
    const cells = fc.array(fc.oneof(fc.double().map(String), fc.string(), fc.constantFrom('0x1', '1_0', '', 'Infinity')), { minLength: 2, maxLength: 2 });
    const csvText = fc.tuple(fc.constantFrom('T [K], h [kJ/kg]', 'p [psig], h [kJ/kg]', 'T [°C]; __proto__ [K]', 'x, y'), fc.array(cells, { maxLength: 4 })).map(([h, rows]) => [h, ...rows.map((r) => r.join(', '))].join('\n'));
    fc.assert(
      fc.property(fc.oneof(csvText, fc.anything()), fc.oneof(fc.constant(undefined), fc.anything()), fc.anything(), (csvIn, options, jsonIn) => {
        check(errorOf(() => tableFromCSV(csvIn as never, options as never)));
        check(errorOf(() => tableFromJSON(jsonIn as never)));
        check(errorOf(() => gridFromJSON(jsonIn as never)));
        check(errorOf(() => tableFromJSON({ name: 't', source: 's', key: 'T', columns: jsonIn } as never)));
        check(errorOf(() => gridFromJSON({ ...gridWith({}), x: jsonIn } as never)));
      }),
      { numRuns: 400 },
    );
  });
});
