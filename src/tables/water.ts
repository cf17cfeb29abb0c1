/**
 * `heatstate/tables/water`: steam tables generated from heatstate's IAPWS-IF97 implementation
 * (`npm run tables`), in SI and US customary units, each with the measured error of interpolating
 * in it (`data.interpolationError`). A separate entry, so that only callers who want the tables load
 * their data.
 *
 * In the built package (tsup.config.ts, `jsonAsText`) the eight data imports below are JSON text,
 * parsed by `JSON.parse` when a table is first asked for: V8 only scans a string at import, where
 * these 180 kB of number arrays as object literals were compiled and built on every start. Run from
 * the sources (vitest, tsx) the imports are the parsed objects already. Only this module may import
 * these files (the build refuses any other importer).
 *
 * @packageDocumentation
 */
import satTSi from '../../data/water-tables/saturation-by-T-si.json';
import satPSi from '../../data/water-tables/saturation-by-p-si.json';
import superSi from '../../data/water-tables/superheated-vapor-si.json';
import compSi from '../../data/water-tables/compressed-liquid-si.json';
import satTUs from '../../data/water-tables/saturation-by-T-us.json';
import satPUs from '../../data/water-tables/saturation-by-p-us.json';
import superUs from '../../data/water-tables/superheated-vapor-us.json';
import compUs from '../../data/water-tables/compressed-liquid-us.json';
import type { GridData, TableData } from './schema.js';
import { PropertyGrid } from './grid.js';
import { PropertyTable } from './table.js';

/** Columns of the saturation tables: the key, the other of T and p, and f/fg/g properties. */
export type SaturationColumn = 'T' | 'p' | 'vf' | 'vg' | 'uf' | 'ufg' | 'ug' | 'hf' | 'hfg' | 'hg' | 'sf' | 'sfg' | 'sg';
/** Columns of the grid tables. */
export type GridColumn = 'v' | 'u' | 'h' | 's';

/** The value of a data import: parsed from its text in the build, the object itself from the sources. */
function parsed(imported: unknown): unknown {
  return typeof imported === 'string' ? JSON.parse(imported) : imported;
}

const cache = new Map<string, PropertyTable | PropertyGrid>();
function table(id: string, data: unknown): PropertyTable<SaturationColumn> {
  let t = cache.get(id);
  if (!t) cache.set(id, (t = new PropertyTable(parsed(data) as TableData, true)));
  return t as PropertyTable<SaturationColumn>;
}
function grid(id: string, data: unknown): PropertyGrid<GridColumn, 'T', 'p'> {
  let g = cache.get(id);
  if (!g) cache.set(id, (g = new PropertyGrid(parsed(data) as GridData, true)));
  return g as PropertyGrid<GridColumn, 'T', 'p'>;
}

/**
 * The generated water tables, built on first use:
 * - `saturationByT`, `saturationByP`: saturated liquid and vapour (SI: °C, kPa, m³/kg, kJ/kg, kJ/(kg·K));
 * - `superheated`: vapour and supercritical states on a p × T grid (kPa × °C);
 * - `compressedLiquid`: liquid states on a p × T grid (MPa × °C);
 * - and the same four in US customary units (°F, psia, ft³/lbm, Btu/lbm, Btu/(lbm·°R)) under `us`.
 *
 * @example
 * ```ts
 * waterTables.saturationByP().lookup('hfg', '1 atm').value.in('kJ/kg');     //=> 2256.5 (between rows)
 * waterTables.superheated().lookup('h', { p: '1 MPa', T: '300 °C' }).value.in('kJ/kg');   //=> 3051.7
 * waterTables.us.superheated().inverse('h', '1250 Btu/lbm', { p: '100 psia' }).value.in('°F');   //=> 442.6 (IF97: 442.5)
 * ```
 */
export const waterTables = {
  saturationByT: () => table('sat-T-si', satTSi),
  saturationByP: () => table('sat-p-si', satPSi),
  superheated: () => grid('super-si', superSi),
  compressedLiquid: () => grid('comp-si', compSi),
  us: {
    saturationByT: () => table('sat-T-us', satTUs),
    saturationByP: () => table('sat-p-us', satPUs),
    superheated: () => grid('super-us', superUs),
    compressedLiquid: () => grid('comp-us', compUs),
  },
} as const;
