/**
 * Generates the water and steam tables in data/water-tables/ from heatstate's IAPWS-IF97
 * implementation: saturation by temperature and by pressure, superheated vapour and compressed
 * liquid grids, in SI and US customary units. For every table and column it measures the largest
 * error of interpolating in the table against IF97 itself, between the grid points (seven points
 * inside each row interval of the saturation tables; cell centres and interval midpoints of the grids),
 * and writes it into the table's `interpolationError`.
 *
 * Run: `npm run tables`. tests/tables/water-tables.test.ts regenerates them and fails on any drift.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';
import { resolveUnit, toSI, fromSI, DEFAULT_AMBIENT_PA } from '../src/units/registry.js';
import { PHASE, saturationAtP, saturationAtT, Status as STATUS, stateFromPT, WaterState } from '../src/water/if97/index.js';
import { WaterProperties } from '../src/water/if97/properties.js';
import { PropertyGrid, PropertyTable, type InterpolationMethod } from '../src/tables/table.js';
import { GridValue, TableValue } from '../src/tables/core.js';

const tableOut = new TableValue();
const gridOut = new GridValue();
/** A table's SI value at x, NaN where the core reports no value (for the error survey). */
function tableAt(table: PropertyTable, column: string, x: number, method: InterpolationMethod): number {
  return table.valueAt(column, x, tableOut, method) === STATUS.ok ? tableOut.value : NaN;
}
/** A grid's SI value at (x, y), NaN where the core reports no value (a missing cell). */
function gridAt(grid: PropertyGrid, column: string, x: number, y: number, method: 'linear' | 'monotone-cubic'): number {
  return grid.valueAt(column, x, y, gridOut, method) === STATUS.ok ? gridOut.value : NaN;
}
import type { GridData, TableData } from '../src/tables/schema.js';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const TABLES_DIR = resolve(root, 'data/water-tables');
export const GENERATOR = 'scripts/generate-water-tables.ts (heatstate IAPWS-IF97 implementation)';

const SOURCE = {
  title: 'Generated from IAPWS R7-97(2012), IAPWS-IF97, by heatstate',
  year: 2026,
  generator: GENERATOR,
};

interface UnitSystem {
  readonly id: 'si' | 'us';
  readonly T: string;
  readonly p: string;
  readonly v: string;
  readonly e: string;
  readonly s: string;
}
const SI: UnitSystem = { id: 'si', T: '°C', p: 'kPa', v: 'm³/kg', e: 'kJ/kg', s: 'kJ/(kg·K)' };
const US: UnitSystem = { id: 'us', T: '°F', p: 'psia', v: 'ft³/lbm', e: 'Btu/lbm', s: 'Btu/(lbm·°R)' };

const round = (x: number): number => (x === 0 ? 0 : Number(x.toPrecision(7)));
const conv = (unit: string) => {
  const u = resolveUnit(unit);
  return { to: (si: number) => fromSI(si, u, DEFAULT_AMBIENT_PA), from: (v: number) => toSI(v, u, DEFAULT_AMBIENT_PA) };
};

const range = (a: number, b: number, step: number): number[] => {
  const out: number[] = [];
  for (let x = a; x <= b + 1e-9; x += step) out.push(Number(x.toFixed(6)));
  return out;
};

const SAT_COLUMNS = ['vf', 'vg', 'uf', 'ufg', 'ug', 'hf', 'hfg', 'hg', 'sf', 'sfg', 'sg'] as const;
type SatColumn = (typeof SAT_COLUMNS)[number];

function satRow(L: WaterProperties, V: WaterProperties): Record<SatColumn, number> {
  return { vf: L.v, vg: V.v, uf: L.u, ufg: V.u - L.u, ug: V.u, hf: L.h, hfg: V.h - L.h, hg: V.h, sf: L.s, sfg: V.s - L.s, sg: V.s };
}

function satUnit(c: SatColumn, u: UnitSystem): string {
  return c.startsWith('v') ? u.v : c.startsWith('s') ? u.s : u.e;
}

/** Saturation properties at T or p (SI), or undefined outside the line. */
function saturation(by: 'T' | 'p', x: number): { T: number; p: number; row: Record<SatColumn, number> } | undefined {
  const L = new WaterProperties();
  const V = new WaterProperties();
  const st = by === 'T' ? saturationAtT(x, L, V) : saturationAtP(x, L, V);
  if (st !== STATUS.ok) return undefined;
  return { T: L.T, p: L.p, row: satRow(L, V) };
}

/** Where errors are sampled inside each segment (fractions of its width). */
const SAMPLES = [0.125, 0.25, 0.375, 0.5, 0.625, 0.75, 0.875];

interface ErrorEntry {
  maxRelative: number;
  maxAbsolute: number;
  unit: string;
  at: string;
}

function track(errors: Map<string, ErrorEntry>, key: string, interp: number, truth: number, unit: string, where: string, scale: number): void {
  const abs = Math.abs(interp - truth);
  const rel = Math.abs(truth) > 1e-6 * scale ? abs / Math.abs(truth) : 0;
  const e = errors.get(key) ?? { maxRelative: 0, maxAbsolute: 0, unit, at: '' };
  if (rel > e.maxRelative) {
    e.maxRelative = rel;
    e.at = where;
  }
  e.maxAbsolute = Math.max(e.maxAbsolute, abs);
  errors.set(key, e);
}

function finishErrors(errors: Map<string, ErrorEntry>): Record<string, Record<string, ErrorEntry>> {
  const out: Record<string, Record<string, ErrorEntry>> = {};
  for (const [key, e] of [...errors.entries()].sort(([a], [b]) => (a < b ? -1 : 1))) {
    const [column, method] = key.split('|') as [string, string];
    out[column] ??= {};
    out[column]![method] = { maxRelative: Number(e.maxRelative.toPrecision(2)), maxAbsolute: Number(e.maxAbsolute.toPrecision(2)), unit: e.unit, at: e.at };
  }
  return out;
}

function saturationTable(by: 'T' | 'p', u: UnitSystem, keys: number[]): TableData {
  const keyUnit = by === 'T' ? u.T : u.p;
  const kc = conv(keyUnit);
  const other = by === 'T' ? 'p' : 'T';
  const oc = conv(by === 'T' ? u.p : u.T);
  const columns: Record<string, { unit: string; values: number[] }> = { [by]: { unit: keyUnit, values: [] }, [other]: { unit: by === 'T' ? u.p : u.T, values: [] } };
  for (const c of SAT_COLUMNS) columns[c] = { unit: satUnit(c, u), values: [] };
  const rows: { key: number; sat: NonNullable<ReturnType<typeof saturation>> }[] = [];
  for (const k of keys) {
    const sat = saturation(by, kc.from(k));
    if (!sat) throw new Error(`no saturation state at ${by} = ${k} ${keyUnit}`);
    rows.push({ key: k, sat });
    columns[by]!.values.push(k);
    columns[other]!.values.push(round(oc.to(by === 'T' ? sat.p : sat.T)));
    for (const c of SAT_COLUMNS) columns[c]!.values.push(round(conv(satUnit(c, u)).to(sat.row[c])));
  }
  const data: TableData = {
    name: `water-saturation-by-${by}-${u.id}`,
    source: SOURCE,
    key: by,
    columns,
    notes: `Saturated liquid (f) and vapour (g) of water by ${by === 'T' ? 'temperature' : 'pressure'}, ${u.id === 'si' ? 'SI' : 'US customary'} units, 7 significant digits. fg = g − f. The last row is the critical point. IF97 reference state: u = s = 0 for saturated liquid at the triple point.`,
  };
  // interpolation error between rows, against IF97
  const table = new PropertyTable(data);
  const errors = new Map<string, ErrorEntry>();
  const methods: InterpolationMethod[] = ['linear', 'monotone-cubic'];
  for (let i = 0; i + 1 < rows.length; i++) for (const frac of SAMPLES) {
    const mid = rows[i]!.key + frac * (rows[i + 1]!.key - rows[i]!.key);
    const sat = saturation(by, kc.from(mid));
    if (!sat) continue;
    const where = `${by} = ${round(mid)} ${keyUnit}`;
    const x = kc.from(mid);
    const truthOther = by === 'T' ? sat.p : sat.T;
    // the interval next to the critical point dominates the maximum: record the rest separately
    const last = i + 2 === rows.length;
    const both = (key: string, method: string, v: number, truth: number, unit: string, scale: number) => {
      track(errors, `${key}|${method}`, v, truth, unit, where, scale);
      if (!last) track(errors, `${key}|${method}, below the critical interval`, v, truth, unit, where, scale);
    };
    // by T, p_sat(T) varies exponentially (log-linear); by p, everything varies with ln p (log-key)
    const extra: InterpolationMethod[] = by === 'T' ? [] : ['log-key'];
    for (const m of [...methods, ...extra, ...(by === 'T' ? (['log-linear'] as const) : [])]) {
      both(other, m, tableAt(table, other, x, m), truthOther, by === 'T' ? 'Pa' : 'K', 1);
    }
    for (const c of SAT_COLUMNS) {
      const scale = Math.max(...table.data.columns[c]!.values.map((v) => Math.abs(conv(satUnit(c, u)).from(v as number))));
      for (const m of [...methods, ...extra]) both(c, m, tableAt(table, c, x, m), sat.row[c], siUnit(c), scale);
    }
  }
  return { ...data, interpolationError: finishErrors(errors) };
}

function siUnit(c: SatColumn | 'v' | 'u' | 'h' | 's'): string {
  return c.startsWith('v') ? 'm³/kg' : c.startsWith('s') ? 'J/(kg·K)' : 'J/kg';
}

const GRID_COLUMNS = ['v', 'u', 'h', 's'] as const;

function gridTable(kind: 'superheated' | 'compressed', u: UnitSystem, pValues: number[], TValues: number[], pUnit: string): GridData {
  const pc = conv(pUnit);
  const tc = conv(u.T);
  const st = new WaterState();
  const want = (phase: number) => (kind === 'superheated' ? phase === PHASE.vapor || phase === PHASE.supercritical : phase === PHASE.liquid);
  const state = (pSI: number, TSI: number): WaterState | undefined => {
    const status = stateFromPT(pSI, TSI, st);
    return status === STATUS.ok && want(st.phase) ? st : undefined;
  };
  const columns: Record<string, { unit: string; values: (number | null)[][] }> = {};
  for (const c of GRID_COLUMNS) columns[c] = { unit: c === 'v' ? u.v : c === 's' ? u.s : u.e, values: [] };
  for (const p of pValues) {
    const rows: Record<string, (number | null)[]> = { v: [], u: [], h: [], s: [] };
    for (const T of TValues) {
      const s = state(pc.from(p), tc.from(T));
      for (const c of GRID_COLUMNS) rows[c]!.push(s ? round(conv(columns[c]!.unit).to(s[c])) : null);
    }
    for (const c of GRID_COLUMNS) columns[c]!.values.push(rows[c]!);
  }
  const data: GridData = {
    kind: 'grid',
    name: `water-${kind === 'superheated' ? 'superheated-vapor' : 'compressed-liquid'}-${u.id}`,
    source: SOURCE,
    x: { name: 'T', unit: u.T, values: TValues },
    y: { name: 'p', unit: pUnit, values: pValues },
    columns,
    notes: `${kind === 'superheated' ? 'Superheated (and supercritical) vapour' : 'Compressed liquid'} by pressure (rows) and temperature (columns), ${u.id === 'si' ? 'SI' : 'US customary'} units, 7 significant digits; null where the state is not ${kind === 'superheated' ? 'vapour' : 'liquid'} or lies outside IF97.`,
  };
  const grid = new PropertyGrid(data);
  const errors = new Map<string, ErrorEntry>();
  for (let j = 0; j + 1 < pValues.length; j++) {
    for (let i = 0; i + 1 < TValues.length; i++) {
      const pm = 0.5 * (pValues[j]! + pValues[j + 1]!);
      const Tm = 0.5 * (TValues[i]! + TValues[i + 1]!);
      const truth = state(pc.from(pm), tc.from(Tm));
      const where = `p = ${round(pm)} ${pUnit}, T = ${round(Tm)} ${u.T}`;
      // along T at a tabulated pressure (1-D: linear and monotone cubic), and at cell centres (bilinear)
      const alongT = state(pc.from(pValues[j]!), tc.from(Tm));
      for (const c of GRID_COLUMNS) {
        if (truth) {
          const v = gridAt(grid, c, tc.from(Tm), pc.from(pm), 'linear');
          if (!Number.isNaN(v)) track(errors, `${c}|bilinear`, v, truth[c], siUnit(c), where, 1);
        }
        if (alongT) {
          const truthAlong = alongT[c];
          for (const m of ['linear', 'monotone-cubic'] as const) {
            const v = gridAt(grid, c, tc.from(Tm), pc.from(pValues[j]!), m);
            if (!Number.isNaN(v)) track(errors, `${c}|${m === 'linear' ? 'linear-along-T' : 'monotone-cubic-along-T'}`, v, truthAlong, siUnit(c), `p = ${pValues[j]} ${pUnit}, T = ${round(Tm)} ${u.T}`, 1);
          }
        }
      }
    }
  }
  return { ...data, interpolationError: finishErrors(errors) };
}

/** Every generated table: file name → data. */
export function renderWaterTables(): Record<string, TableData | GridData> {
  const satTSI = [0.01, ...range(5, 370, 5), 373.946];
  const satPSI = [0.6117, 1, 1.5, 2, 2.5, 3, 4, 5, 7.5, 10, 15, 20, 25, 30, 40, 50, 75, 100, 101.325, 125, 150, 175, 200, 225, 250, 275, 300, 325, 350, 375, 400, 450, 500, 550, 600, 650, 700, 750, 800, 850, 900, 950, 1000, 1100, 1200, 1300, 1400, 1500, 1750, 2000, 2250, 2500, 3000, 3500, 4000, 5000, 6000, 7000, 8000, 9000, 10000, 11000, 12000, 13000, 14000, 15000, 16000, 17000, 18000, 19000, 20000, 21000, 22000, 22064];
  const satTUS = [32.018, 35, ...range(40, 700, 10), 705.1];
  const satPUS = [0.1, 0.2, 0.4, 0.6, 0.8, 1, 2, 3, 4, 5, 6, 8, 10, 14.696, 15, 20, 25, 30, 35, 40, 45, 50, 55, 60, 65, 70, 75, 80, 85, 90, 95, 100, 110, 120, 130, 140, 150, 160, 170, 180, 190, 200, 250, 300, 350, 400, 450, 500, 600, 700, 800, 900, 1000, 1100, 1200, 1300, 1400, 1500, 1750, 2000, 2250, 2500, 2750, 3000, 3200];
  const shPSI = [10, 50, 100, 200, 300, 400, 500, 600, 800, 1000, 1200, 1400, 1600, 1800, 2000, 2500, 3000, 3500, 4000, 4500, 5000, 6000, 7000, 8000, 9000, 10000, 12500, 15000, 17500, 20000, 25000, 30000, 35000, 40000, 50000, 60000];
  const shTSI = range(50, 1300, 50);
  const clPSI = [5, 10, 15, 20, 30, 50, 75, 100];
  const clTSI = [0.01, ...range(20, 380, 20)];
  const shPUS = [1, 5, 10, 14.696, 20, 40, 60, 80, 100, 120, 140, 160, 180, 200, 250, 300, 350, 400, 450, 500, 600, 700, 800, 1000, 1250, 1500, 1750, 2000, 2500, 3000, 3500, 4000, 5000, 6000];
  const shTUS = range(100, 1500, 50);
  const clPUS = [500, 1000, 1500, 2000, 3000, 5000, 7500, 10000, 14500];
  const clTUS = [32.018, ...range(50, 700, 50)];
  return {
    'saturation-by-T-si.json': saturationTable('T', SI, satTSI),
    'saturation-by-p-si.json': saturationTable('p', SI, satPSI),
    'superheated-vapor-si.json': gridTable('superheated', SI, shPSI, shTSI, 'kPa'),
    'compressed-liquid-si.json': gridTable('compressed', SI, clPSI, clTSI, 'MPa'),
    'saturation-by-T-us.json': saturationTable('T', US, satTUS),
    'saturation-by-p-us.json': saturationTable('p', US, satPUS),
    'superheated-vapor-us.json': gridTable('superheated', US, shPUS, shTUS, 'psia'),
    'compressed-liquid-us.json': gridTable('compressed', US, clPUS, clTUS, 'psia'),
  };
}

/** The text of a table file (stable formatting: one row of numbers per line). */
export function formatTable(data: TableData | GridData): string {
  return `${JSON.stringify(data, (_k, v: unknown) => v, 1).replace(/\[\s+([-\d.e+,\s]*?|[-\d.e+,\snul]*?)\s+\]/g, (_m, inner: string) => `[${inner.replace(/\s+/g, ' ').trim()}]`)}\n`;
}

export const ERRORS_DOC_PATH = resolve(root, 'docs/guide/water-table-errors.md');

/** docs/guide/water-table-errors.md: the recorded interpolation errors as tables. */
export function renderErrorsDoc(tables: Record<string, TableData | GridData>): string {
  const lines = [
    '<!-- GENERATED by scripts/generate-water-tables.ts; do not edit. -->',
    '# Interpolation error of the generated water tables',
    '',
    'Each generated table in `data/water-tables/` (and `heatstate/tables/water`) records how far interpolating in it can be from IAPWS-IF97 itself:',
    'saturation tables at seven points inside every row interval, grids at cell centres (bilinear) and at interval midpoints along T at tabulated pressures.',
    'The largest relative error almost always sits in the interval next to the critical point, where properties change fastest; `at` says where, and the rows marked "below the critical interval" give the maximum over the rest of the table.',
    'Where the error matters, compute the state with `water.state` instead of reading a table.',
    '',
  ];
  for (const [file, data] of Object.entries(tables)) {
    lines.push(`## ${data.name} (\`${file}\`)`, '', '| column | method | max relative error | max absolute error | where |', '|---|---|---|---|---|');
    for (const [column, methods] of Object.entries(data.interpolationError ?? {})) {
      for (const [method, e] of Object.entries(methods)) lines.push(`| ${column} | ${method} | ${(e.maxRelative * 100).toPrecision(2)} % | ${e.maxAbsolute} ${e.unit} | ${e.at} |`);
    }
    lines.push('');
  }
  return `${lines.join('\n')}`;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const tables = renderWaterTables();
  for (const [file, data] of Object.entries(tables)) {
    writeFileSync(resolve(TABLES_DIR, file), formatTable(data));
    console.log(`wrote data/water-tables/${file}`);
  }
  writeFileSync(ERRORS_DOC_PATH, renderErrorsDoc(tables));
  console.log('wrote docs/guide/water-table-errors.md');
}
