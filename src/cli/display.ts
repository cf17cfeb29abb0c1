/**
 * Output of the `heatstate` command: the display unit of each dimension in SI and US units, the
 * aligned table and the JSON form, and the US wording added to range errors.
 *
 * @module
 */
import { formatNumber, type OutOfRangeError } from '../errors.js';
import { SI_UNIT, type Dimension } from '../units/dimensions.js';
import { Quantity } from '../units/quantity.js';

/** The two display systems. */
export type Units = 'si' | 'us';

/**
 * Display unit of every dimension the command prints, per system. Entropy and specific heat share
 * their units; kinematic viscosity and thermal diffusivity share theirs.
 */
export const DISPLAY: Readonly<Record<Units, Partial<Record<Dimension, string>>>> = {
  si: {
    temperature: 'K',
    temperatureDifference: 'ΔK',
    pressure: 'kPa',
    specificEnergy: 'kJ/kg',
    specificHeat: 'kJ/(kg·K)',
    specificEntropy: 'kJ/(kg·K)',
    specificVolume: 'm³/kg',
    density: 'kg/m³',
    velocity: 'm/s',
    molarMass: 'g/mol',
    humidityRatio: 'g/kg',
    dynamicViscosity: 'mPa·s',
    kinematicViscosity: 'm²/s',
    thermalConductivity: 'W/(m·K)',
    thermalDiffusivity: 'm²/s',
    surfaceTension: 'mN/m',
    power: 'kW',
    massFlow: 'kg/s',
    volumeFlow: 'm³/s',
    length: 'm',
  },
  us: {
    temperature: '°F',
    temperatureDifference: 'Δ°F',
    pressure: 'psia',
    specificEnergy: 'Btu/lbm',
    specificHeat: 'Btu/(lbm·°R)',
    specificEntropy: 'Btu/(lbm·°R)',
    specificVolume: 'ft³/lbm',
    density: 'lbm/ft³',
    velocity: 'ft/s',
    molarMass: 'lbm/lbmol',
    humidityRatio: 'gr/lbm',
    dynamicViscosity: 'lbm/(ft·h)',
    kinematicViscosity: 'ft²/h',
    thermalConductivity: 'Btu/(h·ft·°F)',
    thermalDiffusivity: 'ft²/h',
    surfaceTension: 'lbf/ft',
    power: 'Btu/h',
    massFlow: 'lbm/h',
    volumeFlow: 'ft³/min',
    length: 'ft',
  },
};

/** A value shown in a unit of its own choosing (a coil duty in TR), not the system's. */
export interface Fixed {
  readonly value: number;
  readonly unit: string;
}

/** A row of output: a property name and a quantity, a number, text, a fixed-unit value, or nothing (not defined). */
export type Row = readonly [string, Quantity | number | string | Fixed | undefined];

/** A quantity in the display unit of its dimension. */
export function show(q: Quantity, units: Units): Fixed {
  const unit = DISPLAY[units][q.dimension] ?? q.unit;
  return { value: q.in(unit), unit };
}

/** Six significant digits; exponent form below 1e-4 and from 1e9 (no long runs of zeros). */
function sixDigits(x: number): string {
  const t = Number(x.toPrecision(6));
  if (t !== 0 && Number.isFinite(t) && (Math.abs(t) < 1e-4 || Math.abs(t) >= 1e9)) return t.toExponential(5).replace(/\.?0+e/, 'e').replace('e+', 'e');
  return String(t);
}

/** Rows as an aligned table (six significant digits) or as JSON (full precision). */
export function format(rows: readonly Row[], units: Units, json: boolean): string {
  if (json) {
    const out: Record<string, unknown> = {};
    for (const [name, v] of rows) out[name] = v === undefined ? null : v instanceof Quantity ? show(v, units) : v;
    return JSON.stringify(out, null, 2);
  }
  const cells = rows.map(([name, v]): [string, string, string] => {
    if (v === undefined) return [name, 'not defined', ''];
    if (typeof v === 'string') return [name, v, ''];
    if (typeof v === 'number') return [name, sixDigits(v), ''];
    const s = v instanceof Quantity ? show(v, units) : v;
    return [name, sixDigits(s.value), s.unit];
  });
  // numbers right-aligned in one column; text as wide as the numbers, longer text runs on
  const w0 = Math.max(...cells.map((c) => c[0].length));
  const w1 = Math.max(0, ...rows.map(([, v], i) => (typeof v === 'string' ? 0 : cells[i]![1].length)));
  return cells.map(([a, b, c]) => `${a.padEnd(w0)}  ${b.padStart(w1)}  ${c}`.trimEnd()).join('\n');
}

/** SI unit text → dimension, for the range data of errors (temperature before difference, specific heat before entropy). */
function dimensionOfSiUnit(unit: string): Dimension | undefined {
  for (const [d, u] of Object.entries(SI_UNIT) as [Dimension, string][]) if (u === unit && DISPLAY.us[d] !== undefined) return d;
  return undefined;
}

/**
 * The US wording added to a range error under `--units us`, or '' when none is needed: the library
 * words its errors in the unit the input was written in (SI beside it). When that was not a US unit
 * (SI input, or a model that words its errors in SI), the value and the limits are added in the US
 * display unit of their dimension. Nothing is added for plain numbers or for errors without numeric data.
 */
export function usWording(e: OutOfRangeError): string {
  const r = e.range;
  if (r === undefined || !Number.isFinite(r.value) || Number.isNaN(r.min) || Number.isNaN(r.max)) return '';
  const dimension = dimensionOfSiUnit(r.unit);
  if (dimension === undefined) return '';
  const unit = DISPLAY.us[dimension]!;
  const inUs = (si: number): number => (Number.isFinite(si) ? Quantity.fromSI(si, dimension).in(unit) : si);
  const value = inUs(r.value);
  if (r.given !== undefined && Math.abs(r.given.value - value) <= 1e-9 * Math.max(1, Math.abs(value))) return '';
  const lo = Number.isFinite(r.min) ? `${formatNumber(inUs(r.min))}` : formatNumber(r.min);
  const hi = Number.isFinite(r.max) ? `${formatNumber(inUs(r.max))}` : formatNumber(r.max);
  return `; in US units ${r.quantity} = ${formatNumber(value)} ${unit}, valid range ${lo} to ${hi} ${unit}`;
}
