/**
 * Saturation tables of any catalogue fluid, generated from its equation of state through the typed
 * table layer (`defineTable`): rows of saturated liquid (f) and vapour (g) by temperature or by
 * pressure, in SI or US customary units, with the measured error of linear interpolation between
 * the rows (`table.data.interpolationError`, measured at every interval's midpoint).
 *
 * A separate function rather than a method of the fluid, so that a caller who never builds a table
 * does not load the table layer (and its schema validation) with `heatstate/fluids`.
 *
 * @module
 */
import { CallUnits } from '../core/call-units.js';
import { throwForStatus } from '../core/fail.js';
import { rangeError, readChoice, readInput, readOptions, type Bounds } from '../core/read.js';
import { Status } from '../core/status.js';
import { formatNumber, InvalidInputError } from '../errors.js';
import { defineTable, PropertyTable } from '../tables/table.js';
import type { TableData } from '../tables/schema.js';
import { Quantity, type QuantityInput, type QuantityLike } from '../units/quantity.js';
import { fluid, modelOf, type Fluid } from './fluid.js';
import { FluidContext, FluidState } from './model.js';
import { saturationAtP, saturationAtT } from './saturation.js';

/** Columns of a saturation table: the key, the other of T and p, and f / fg / g properties. */
export type FluidSaturationColumn = 'T' | 'p' | 'vf' | 'vg' | 'uf' | 'ufg' | 'ug' | 'hf' | 'hfg' | 'hg' | 'sf' | 'sfg' | 'sg';

/** Options of {@link saturationTable}. `from`, `to` and `step` are in the key's dimension (`step` of T is a difference). */
export interface SaturationTableOptions<I = string> {
  /** The key: `'T'` (rows by temperature) or `'p'` (rows by pressure). */
  readonly by: 'T' | 'p';
  /** First and last key (the last row is `to` even when the steps do not land on it). */
  readonly from: I;
  readonly to: I;
  /** Key step: a temperature difference (`'10 K'`, `'20 °F'`) for T, a pressure for p. */
  readonly step: I;
  /** `'SI'` (°C, kPa, m³/kg, kJ/kg, kJ/(kg·K)) or `'US'` (°F, psia, ft³/lbm, Btu/lbm, Btu/(lbm·°R)). Default SI. */
  readonly units?: 'SI' | 'US';
}

const UNITS = {
  SI: { T: '°C', p: 'kPa', v: 'm³/kg', e: 'kJ/kg', s: 'kJ/(kg·K)' },
  US: { T: '°F', p: 'psia', v: 'ft³/lbm', e: 'Btu/lbm', s: 'Btu/(lbm·°R)' },
} as const;

const COLUMNS = ['vf', 'vg', 'uf', 'ufg', 'ug', 'hf', 'hfg', 'hg', 'sf', 'sfg', 'sg'] as const;
type Column = (typeof COLUMNS)[number];

function unitOf(c: Column, u: (typeof UNITS)['SI' | 'US']): string {
  return c[0] === 'v' ? u.v : c[0] === 's' ? u.s : u.e;
}
function dimensionOf(c: Column): 'specificVolume' | 'specificEnergy' | 'specificEntropy' {
  return c[0] === 'v' ? 'specificVolume' : c[0] === 's' ? 'specificEntropy' : 'specificEnergy';
}
function valueOf(c: Column, l: FluidState, g: FluidState): number {
  switch (c) {
    case 'vf': return l.v;
    case 'vg': return g.v;
    case 'uf': return l.u;
    case 'ufg': return g.u - l.u;
    case 'ug': return g.u;
    case 'hf': return l.h;
    case 'hfg': return g.h - l.h;
    case 'hg': return g.h;
    case 'sf': return l.s;
    case 'sfg': return g.s - l.s;
    default: return g.s;
  }
}

const MAX_ROWS = 10000;

/**
 * A saturation table of a fluid, computed from its equation of state at every row, as a
 * `PropertyTable` (lookup, inverse, interpolation, exact at the rows). A cell is the saturation
 * result at its key converted to the column's unit, unrounded: a lookup at a row gives exactly what
 * `fluid(name).saturation` gives there, in that unit.
 *
 * @param f a fluid or its name
 * @throws {@link OutOfRangeError} a key outside the saturation line (triple point to critical point), in the caller's units
 * @throws {@link InvalidInputError} bad options, a step that is not positive, more than 10 000 rows
 * @example
 * ```ts
 * const t = saturationTable('water', { by: 'T', from: '0.01 °C', to: '370 °C', step: '10 K' });
 * t.lookup('p', '100 °C').value.in('kPa');      //=> 101.4229... (a row: as fluid('water').saturation gives it)
 * t.data.interpolationError?.hfg?.linear?.maxRelative;   //=> 0.039 (at 365.005 °C, next to the critical point)
 * saturationTable('water', { by: 'p', from: '5 psia', to: '3000 psia', step: '5 psia', units: 'US' }).lookup('T', '14.7 psia').value.in('°F');   //=> 211.798... (between rows 10 and 15 psia; the saturation call gives 211.9676 °F)
 * ```
 */
export function saturationTable<I extends QuantityLike<'temperature'> | QuantityLike<'pressure'> | QuantityLike<'temperatureDifference'> | string>(
  f: Fluid | string,
  options: SaturationTableOptions<QuantityInput<'temperature', I> | QuantityInput<'pressure', I> | QuantityInput<'temperatureDifference', I>>,
): PropertyTable<FluidSaturationColumn> {
  const fl = typeof f === 'string' ? fluid(f) : f;
  const m = modelOf(fl);
  const opts = readOptions<SaturationTableOptions>(options, 'options', ['by', 'from', 'to', 'step', 'units']);
  const by = readChoice(opts.by, 'options.by', ['T', 'p'], 'T');
  if (opts.by === undefined) throw new InvalidInputError('input.invalid', 'options.by', "saturationTable needs options.by: 'T' or 'p'");
  const system = readChoice(opts.units, 'options.units', ['SI', 'US'], 'SI');
  const u = UNITS[system];
  const units = new CallUnits();
  const scope = `the saturation line of ${fl.equation} (${fl.name})`;
  const bounds: Bounds = by === 'T' ? { min: m.Tt, max: m.Tc, scope } : { min: m.pt, max: m.pc, scope };
  const dim = by === 'T' ? 'temperature' : 'pressure';
  // the lower limit admits the rounding of a unit conversion ('0.01 °C' is 273.15999999999997 K)
  const admit: Bounds = { ...bounds, min: bounds.min * (1 - 1e-14) };
  const from = Math.max(readInput(opts.from as QuantityLike<typeof dim>, dim, 'options.from', admit, units), bounds.min);
  const to = readInput(opts.to as QuantityLike<typeof dim>, dim, 'options.to', admit, units);
  const stepSI = by === 'T' ? readInput(opts.step as QuantityLike<'temperatureDifference'>, 'temperatureDifference', 'options.step') : readInput(opts.step as QuantityLike<'pressure'>, 'pressure', 'options.step');
  if (!(stepSI > 0)) throw new InvalidInputError('input.invalid', 'options.step', `options.step must be positive; got ${formatNumber(stepSI)} ${by === 'T' ? 'K' : 'Pa'}`);
  if (!(to > from)) throw new InvalidInputError('input.invalid', 'options.to', `options.to must be above options.from (${units.describe(from, dim, by === 'T' ? 'K' : 'Pa')}); got ${units.describe(to, dim, by === 'T' ? 'K' : 'Pa')}`);
  const count = Math.floor((to - from) / stepSI + 1e-9);
  if (count + 2 > MAX_ROWS) throw new InvalidInputError('input.invalid', 'options.step', `the table would have ${count + 2} rows; at most ${MAX_ROWS} are allowed (take a larger step)`);
  // keys in the table's unit: from + i·step there, the last one `to`
  const keyUnit = by === 'T' ? u.T : u.p;
  const inUnit = (si: number) => Quantity.fromSI(si, dim).in(keyUnit);
  const fromU = inUnit(from);
  const toU = inUnit(to);
  const stepU = inUnit(from + stepSI) - fromU;
  const keys: number[] = [];
  for (let i = 0; i <= count; i++) {
    const k = Number((fromU + i * stepU).toPrecision(12));
    if (k < toU - 1e-9 * Math.abs(stepU)) keys.push(k);
  }
  keys.push(toU);

  const ctx = new FluidContext(m);
  const l = new FluidState();
  const g = new FluidState();
  const solve = (si: number): void => {
    const st = by === 'T' ? saturationAtT(ctx, si, l, g) : saturationAtP(ctx, si, l, g);
    if (st !== Status.ok && st !== Status.undefinedProperty) {
      throwForStatus(st, { what: `the ${fl.equation} saturation`, inputs: `${by} = ${formatNumber(si)} ${by === 'T' ? 'K' : 'Pa'}`, range: () => rangeError(by, si, dim, bounds, units) });
    }
  };
  const other = by === 'T' ? 'p' : 'T';
  const columns: Record<string, { unit: string; values: number[] }> = { [by]: { unit: keyUnit, values: [] }, [other]: { unit: by === 'T' ? u.p : u.T, values: [] } };
  for (const c of COLUMNS) columns[c] = { unit: unitOf(c, u), values: [] };
  const siKeys = keys.map((k) => readInput(`${k} ${keyUnit}` as never, dim, by));
  siKeys.forEach((si, i) => {
    // the last key is `to` itself (in SI as given), so a critical-point row is exactly at T_c or p_c
    const key = Math.max(Math.min(si, bounds.max), bounds.min);
    solve(key);
    columns[by]!.values.push(keys[i]!);
    columns[other]!.values.push(Quantity.fromSI(by === 'T' ? l.p : l.T, by === 'T' ? 'pressure' : 'temperature').in(by === 'T' ? u.p : u.T));
    for (const c of COLUMNS) columns[c]!.values.push(Quantity.fromSI(valueOf(c, l, g), dimensionOf(c)).in(unitOf(c, u)));
  });
  const data: TableData = {
    name: `${fl.name} saturation by ${by} (${system})`,
    source: { title: fl.source.title, authors: fl.source.authors, year: fl.source.year, generator: `heatstate saturationTable (${fl.equation})` },
    key: by,
    columns,
    notes: `Saturated liquid (f) and vapour (g) of ${fl.name} by ${by === 'T' ? 'temperature' : 'pressure'} from ${fl.equation}, ${system === 'SI' ? 'SI' : 'US customary'} units, unrounded; fg = g − f.`,
  };
  const table = defineTable(data);
  // the error of linear interpolation, measured at each interval's midpoint
  const errors: Record<string, { linear: { maxRelative: number; maxAbsolute: number; unit: string; at: string } }> = {};
  const track = (name: string, interp: number, truth: number, unit: string, at: string) => {
    const e = (errors[name] ??= { linear: { maxRelative: 0, maxAbsolute: 0, unit, at: '' } }).linear;
    const abs = Math.abs(interp - truth);
    const rel = truth === 0 ? 0 : abs / Math.abs(truth);
    if (rel > e.maxRelative) {
      e.maxRelative = rel;
      e.at = at;
    }
    if (abs > e.maxAbsolute) e.maxAbsolute = abs;
  };
  for (let i = 0; i + 1 < siKeys.length; i++) {
    const mid = 0.5 * (siKeys[i]! + siKeys[i + 1]!);
    solve(mid);
    const at = `${by} = ${formatNumber(inUnit(mid))} ${keyUnit}`;
    const look = (c: FluidSaturationColumn) => table.lookup(c, Quantity.fromSI(mid, dim)).value;
    track(other, look(other).si, by === 'T' ? l.p : l.T, by === 'T' ? 'Pa' : 'K', at);
    for (const c of COLUMNS) track(c, look(c).si, valueOf(c, l, g), c[0] === 'v' ? 'm³/kg' : c[0] === 's' ? 'J/(kg·K)' : 'J/kg', at);
  }
  for (const e of Object.values(errors)) {
    e.linear.maxRelative = Number(e.linear.maxRelative.toPrecision(2));
    e.linear.maxAbsolute = Number(e.linear.maxAbsolute.toPrecision(2));
  }
  return new PropertyTable<FluidSaturationColumn>({ ...data, interpolationError: errors });
}
