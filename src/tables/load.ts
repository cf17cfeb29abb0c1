/**
 * Loading user tables from JSON and CSV.
 *
 * CSV: a header row names each column with its unit in brackets (`T [°F]`, `p [psia]`,
 * `h [Btu/lbm]`; parentheses work too), then one row per key value. Commas, semicolons or tabs
 * separate cells; lines starting with `#` are comments, and `# source: …` names the source.
 *
 * @module
 */
import { DefinitionError, type DefinitionIssue } from '../errors.js';
import { PropertyGrid, PropertyTable } from './table.js';
import type { GridData, TableData } from './schema.js';

/**
 * A one-dimensional table from JSON text or an already-parsed object (see `tableSchema`).
 * @throws {@link DefinitionError} naming the row and column of each problem
 * @example
 * ```ts
 * tableFromJSON(readFileSync('pump-curve.json', 'utf8')).lookup('head', '120 m³/h');
 * ```
 */
export function tableFromJSON(json: string | object): PropertyTable {
  const data = typeof json === 'string' ? parseJSON(json) : json;
  return new PropertyTable(data as TableData);
}

/**
 * A grid table from JSON text or an already-parsed object (see `gridSchema`).
 * @example
 * ```ts
 * gridFromJSON(readFileSync('superheated.json', 'utf8')).lookup('h', { p: '1 MPa', T: '300 °C' });
 * ```
 */
export function gridFromJSON(json: string | object): PropertyGrid {
  const data = typeof json === 'string' ? parseJSON(json) : json;
  return new PropertyGrid(data as GridData);
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
 * A one-dimensional table from CSV text with a header of `name [unit]` cells.
 *
 * @throws {@link DefinitionError} naming the row and column of each problem (header without a unit,
 *   unknown unit, non-numeric or missing cell, ragged row, non-monotone or duplicate key, empty table)
 * @example
 * ```ts
 * const t = tableFromCSV('T [°F], cp [Btu/(lbm·°F)]\n100, 0.45\n200, 0.48\n', { name: 'thermal oil' });
 * t.lookup('cp', '150 °F').value.in('Btu/(lbm·°F)');   //=> 0.465
 * ```
 */
export function tableFromCSV(text: string, options: CsvOptions = {}): PropertyTable {
  const lines = text.split(/\r?\n/);
  let source = options.source;
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
    const m = /^(.+?)\s*[[(]\s*(.+?)\s*[\])]\s*$/.exec(h);
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
      const v = cell === '' ? NaN : Number(cell);
      if (!Number.isFinite(v)) {
        issues.push({ path: ['rows', line, names[c]!], message: `line ${line}, column "${names[c]}": ${cell === '' ? 'missing cell' : `"${cell}" is not a number`}` });
        values[c]!.push(null);
      } else values[c]!.push(v);
    });
  }
  if (content.length === 1) issues.push({ path: ['rows'], message: 'the CSV has a header but no data rows' });
  if (issues.length > 0) throw new DefinitionError(`CSV table "${options.name ?? 'CSV table'}"`, issues);
  const columns: Record<string, { unit: string; values: (number | null)[] }> = {};
  names.forEach((n, c) => {
    columns[n] = { unit: units[c]!, values: values[c]! };
  });
  return new PropertyTable({ name: options.name ?? 'CSV table', source: source ?? 'user CSV', key: options.key ?? names[0]!, columns });
}
