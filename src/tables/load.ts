/**
 * Loading user tables from JSON and CSV.
 *
 * CSV: a header row names each column with its unit in brackets (`T [°F]`, `p [psia]`,
 * `h [Btu/lbm]`; parentheses work too), then one row per key value. Commas, semicolons or tabs
 * separate cells; lines starting with `#` are comments, and `# source: …` names the source.
 *
 * @module
 */
import { describeValue, readOptions } from '../core/read.js';
import { DefinitionError, InvalidInputError, type DefinitionIssue } from '../errors.js';
import { PropertyGrid } from './grid.js';
import type { GridData, TableData } from './schema.js';
import { PropertyTable } from './table.js';
import { UNIT_TEXT_MAX_LENGTH } from '../units/expression.js';

/** The largest text a loader reads (characters): a guard against a wrong file, not a limit of tables. */
const MAX_TEXT = 50_000_000;

/**
 * The longest CSV header cell read (characters): a name of up to 60 characters, its unit (at most
 * {@link UNIT_TEXT_MAX_LENGTH}) in brackets, and spacing.
 */
const HEADER_CELL_MAX_LENGTH = 64 + UNIT_TEXT_MAX_LENGTH;

/** A decimal number as a CSV cell may hold it: sign, digits, point, exponent; nothing else. */
const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** Reads the `json` argument of a loader: JSON text, or an already-parsed object. */
function readJSON(json: unknown, fn: string): unknown {
  if (typeof json === 'string') {
    if (json.length > MAX_TEXT) throw new InvalidInputError('input.invalid', 'json', `${fn}: json is ${json.length} characters long, more than ${MAX_TEXT}`);
    return parseJSON(json);
  }
  if (typeof json === 'object' && json !== null && !Array.isArray(json)) return json;
  throw new InvalidInputError('input.invalid', 'json', `${fn}: json must be JSON text or a parsed object; got ${describeValue(json)}`);
}

/** Reads an optional non-empty string option. */
function readText(value: unknown, parameter: string): string | undefined {
  if (value === undefined) return undefined;
  if (typeof value === 'string' && value.trim() !== '') return value;
  throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a non-empty string; got ${describeValue(value)}`);
}

/**
 * A one-dimensional table from JSON text or an already-parsed object (the shape of {@link TableData}).
 * @throws {@link InvalidInputError} when `json` is neither text nor an object
 * @throws {@link DefinitionError} naming the row and column of each problem
 * @example
 * ```ts
 * // the text would usually come from a file: readFileSync('pump-curve.json', 'utf8')
 * const text = '{ "name": "pump curve", "source": "vendor sheet", "key": "Q", "columns": { "Q": { "unit": "m³/h", "values": [100, 150] }, "head": { "unit": "m", "values": [52, 44] } } }';
 * tableFromJSON(text).lookup('head', '120 m³/h').value.in('m');   //=> 48.8
 * ```
 */
export function tableFromJSON(json: string | object): PropertyTable {
  return new PropertyTable(readJSON(json, 'tableFromJSON') as TableData);
}

/**
 * A grid table from JSON text or an already-parsed object (the shape of {@link GridData}).
 * @throws {@link InvalidInputError} when `json` is neither text nor an object
 * @throws {@link DefinitionError} naming the axis, row and cell of each problem
 * @example
 * ```ts
 * // four IF97 enthalpies of superheated steam, as a file would hold them
 * const grid = gridFromJSON({
 *   kind: 'grid', name: 'superheated steam', source: 'IAPWS-IF97 via heatstate',
 *   x: { name: 'T', unit: '°C', values: [250, 350] }, y: { name: 'p', unit: 'MPa', values: [0.5, 1.5] },
 *   columns: { h: { unit: 'kJ/kg', values: [[2961.1, 3168.1], [2924.0, 3148.0]] } },
 * });
 * grid.lookup('h', { p: '1 MPa', T: '300 °C' }).value.in('kJ/kg');   //=> 3050.3 (bilinear; IF97 gives 3051.7)
 * ```
 */
export function gridFromJSON(json: string | object): PropertyGrid {
  return new PropertyGrid(readJSON(json, 'gridFromJSON') as GridData);
}

function parseJSON(text: string): unknown {
  try {
    return JSON.parse(text) as unknown;
  } catch (e) {
    throw new DefinitionError('table JSON', [{ path: [], message: (e as Error).message }]);
  }
}

function splitLine(line: string, separator: string): string[] {
  const cells: string[] = [];
  let cur = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i]!;
    if (c === '"') {
      if (quoted && line[i + 1] === '"') {
        cur += '"';
        i++;
      } else quoted = !quoted;
    } else if (c === separator && !quoted) {
      cells.push(cur.trim());
      cur = '';
    } else cur += c;
  }
  cells.push(cur.trim());
  return cells;
}

/** Options of {@link tableFromCSV}. */
export interface CsvOptions {
  /** The table's name (default `"CSV table"`). */
  readonly name?: string;
  /** The key column (default: the first). */
  readonly key?: string;
  /** Where the numbers come from (default: a `# source:` comment, else `"user CSV"`). */
  readonly source?: string;
}

/**
 * A one-dimensional table from CSV text with a header of `name [unit]` cells. Cells are decimal
 * numbers (`12`, `-0.5`, `1.2e5`); hexadecimal, binary, octal, digit separators (`1_000`) and
 * `Infinity` are refused.
 *
 * @throws {@link InvalidInputError} when `text` is not a string or `options` is malformed
 * @throws {@link DefinitionError} naming the row and column of each problem (header without a unit,
 *   unknown unit, non-numeric or missing cell, ragged row, non-monotone or duplicate key, empty table,
 *   reserved column name, a value outside its quantity's physical bounds)
 * @example
 * ```ts
 * const t = tableFromCSV('T [°F], cp [Btu/(lbm·°R)]\n100, 0.45\n200, 0.48\n', { name: 'thermal oil' });
 * t.lookup('cp', '150 °F').value.in('Btu/(lbm·°R)');   //=> 0.465
 * ```
 */
export function tableFromCSV(text: string, options?: CsvOptions): PropertyTable {
  if (typeof text !== 'string') throw new InvalidInputError('input.invalid', 'text', `tableFromCSV: text must be a string of CSV; got ${describeValue(text)}`);
  if (text.length > MAX_TEXT) throw new InvalidInputError('input.invalid', 'text', `tableFromCSV: text is ${text.length} characters long, more than ${MAX_TEXT}`);
  const opts = readOptions<CsvOptions>(options, 'options', ['name', 'key', 'source']);
  const name = readText(opts.name, 'options.name') ?? 'CSV table';
  const key = readText(opts.key, 'options.key');
  const lines = text.split(/\r?\n/);
  let source = readText(opts.source, 'options.source');
  const content: { line: number; text: string }[] = [];
  lines.forEach((raw, i) => {
    const t = raw.trim();
    if (t === '') return;
    if (t.startsWith('#')) {
      const m = /^#\s*source\s*:\s*(.+)$/i.exec(t);
      if (m && source === undefined) source = m[1]!.trim();
      return;
    }
    content.push({ line: i + 1, text: raw });
  });
  const issues: DefinitionIssue[] = [];
  if (content.length === 0) throw new DefinitionError('CSV table', [{ path: [], message: 'the CSV is empty: expected a header row and data rows' }]);
  const header = content[0]!.text;
  const separator = header.includes('\t') ? '\t' : header.includes(';') && !header.includes(',') ? ';' : ',';
  const heads = splitLine(header, separator);
  const names: string[] = [];
  const units: string[] = [];
  heads.forEach((h, c) => {
    if (h.length > HEADER_CELL_MAX_LENGTH) {
      // refused by its length before it is read: no header a table needs is this long
      issues.push({ path: ['header', c], message: `column ${c + 1} header "${h.slice(0, 40)}…" is ${h.length} characters long, longer than ${HEADER_CELL_MAX_LENGTH} (a name and a unit in brackets)` });
      names.push(`column ${c + 1}`);
      units.push('');
      return;
    }
    const m = splitHeader(h);
    if (!m) {
      issues.push({ path: ['header', c], message: `column ${c + 1} header "${h}" has no unit: write it as "name [unit]", for example "T [°F]"` });
      names.push(h);
      units.push('');
    } else {
      names.push(m[1]!.trim());
      units.push(m[2]!.trim());
    }
  });
  const dup = names.find((n, i) => names.indexOf(n) !== i);
  if (dup !== undefined) issues.push({ path: ['header'], message: `column name "${dup}" appears twice` });
  const values: (number | null)[][] = names.map(() => []);
  for (const { line, text: rowText } of content.slice(1)) {
    const cells = splitLine(rowText, separator);
    if (cells.length !== names.length) {
      issues.push({ path: ['rows', line], message: `line ${line}: ${cells.length} cells, but the header has ${names.length} (ragged row)` });
      continue;
    }
    cells.forEach((cell, c) => {
      const v = DECIMAL.test(cell) ? Number(cell) : NaN;
      if (!Number.isFinite(v)) {
        const shown = cell.length > 40 ? `${cell.slice(0, 40)}…` : cell;
        const why = cell === '' ? 'missing cell' : /^[+-]?(?:\d|\.\d|inf|nan)/i.test(cell) ? `"${shown}" is not a decimal number (hexadecimal, binary, octal, digit separators, Infinity and NaN are refused)` : `"${shown}" is not a number`;
        issues.push({ path: ['rows', line, names[c]!], message: `line ${line}, column "${names[c]}": ${why}` });
        values[c]!.push(null);
      } else values[c]!.push(v);
    });
  }
  if (content.length === 1) issues.push({ path: ['rows'], message: 'the CSV has a header but no data rows' });
  if (issues.length > 0) throw new DefinitionError(`CSV table "${name}"`, issues);
  // own properties for every name (an assignment to "__proto__" would set the prototype instead),
  // so the table's check refuses reserved names by name
  const columns = Object.fromEntries(names.map((n, c) => [n, { unit: units[c]!, values: values[c]! }])) as Record<string, { unit: string; values: (number | null)[] }>;
  return new PropertyTable({ name, source: source ?? 'user CSV', key: key ?? names[0]!, columns });
}

/**
 * A header cell "name [unit]" (or "name (unit)") split without a regular expression, in one pass
 * over the text. Returns undefined when the cell
 * has no bracketed unit after a name. The unit starts after the first opening bracket of the kind
 * that closes the cell, so brackets inside a unit (`kJ/(kg·K)`) stay in the unit.
 */
function splitHeader(cell: string): [string, string, string] | undefined {
  const text = cell.trim();
  const close = text[text.length - 1];
  if (close !== ']' && close !== ')') return undefined;
  const open = text.indexOf(close === ']' ? '[' : '(');
  if (open <= 0) return undefined;
  const name = text.slice(0, open).trim();
  const unit = text.slice(open + 1, -1).trim();
  if (name === '' || unit === '') return undefined;
  return [text, name, unit];
}
