/**
 * The run-time unit registry: resolves unit text to a dimension and an exact factor.
 *
 * Factors come from the generated module (exact SP 811 definitions, correctly rounded).
 * Compound spellings listed in `spellings.ts` hit a precomputed exact factor; any other
 * valid composition is multiplied out in double precision (within a few ulp).
 * Results are cached, so a unit text is parsed once per process.
 *
 * @module
 */
import { UnitError } from '../errors.js';
import { canonicalKey, combinedDims, resolveTerms, type AtomLookup, type AtomRecord } from './atoms.js';
import { dimensionOfVector, type Dimension } from './dimensions.js';
import { parseUnitExpression } from './expression.js';
import { ATOMS, COMPOUND_FACTORS, DEFAULT_AMBIENT_PA, GAUGE_UNITS, PREFIX_FACTORS, TEMPERATURE_OFFSETS } from './factors.generated.js';

/** How values in a unit convert to SI. */
export type UnitKind = 'linear' | 'temperature' | 'difference' | 'gauge';

/** A unit text resolved against the registry. */
export interface ResolvedUnit {
  /** The text as given. */
  readonly text: string;
  readonly kind: UnitKind;
  readonly dimension: Dimension;
  /** SI value of one unit (one degree, for temperature scales). */
  readonly factor: number;
  /** For `temperature`: the scale's offset in its own degrees (°C 273.15, °F 459.67); otherwise 0. */
  readonly offset: number;
}

export { DEFAULT_AMBIENT_PA };

const atomsByName = new Map<string, AtomRecord>();
const atomFactor = new Map<string, number>();
for (const [symbol, aliases, dims, factor, prefixable, scale] of ATOMS) {
  const rec: AtomRecord = { symbol, dims, prefixable, scale };
  atomFactor.set(symbol, factor);
  for (const name of [symbol, ...aliases]) atomsByName.set(name, rec);
}

const lookup: AtomLookup = {
  atom: (name) => atomsByName.get(name),
  prefixes: Object.keys(PREFIX_FACTORS).sort((a, b) => b.length - a.length),
};

const cache = new Map<string, ResolvedUnit>();
const CACHE_LIMIT = 512;

function resolveUncached(text: string): ResolvedUnit {
  const trimmed = text.trim();
  if (trimmed === '1' || trimmed === '-' || trimmed === '') {
    return { text, kind: 'linear', dimension: 'dimensionless', factor: 1, offset: 0 };
  }
  let difference = false;
  let body = trimmed;
  if (body.startsWith('Δ')) {
    difference = true;
    body = body.slice(1).trim();
  } else if (/^delta\s/i.test(body)) {
    difference = true;
    body = body.slice(6).trim();
  }
  const gaugeBase = GAUGE_UNITS[body];
  if (!difference && gaugeBase !== undefined) {
    const base = resolveUnit(gaugeBase);
    return { text, kind: 'gauge', dimension: 'pressure', factor: base.factor, offset: 0 };
  }
  const terms = resolveTerms(parseUnitExpression(body), lookup, text);
  const single = terms.length === 1 && terms[0]!.exponent === 1 && terms[0]!.prefix === '' ? terms[0]!.atom : undefined;
  if (difference) {
    if (!single?.scale) {
      throw new UnitError('unit.unknown', text, `"${text}": Δ marks a temperature difference and must stand before K, °C, °F or °R`);
    }
    return { text, kind: 'difference', dimension: 'temperatureDifference', factor: atomFactor.get(single.symbol)!, offset: 0 };
  }
  if (single?.scale) {
    return { text, kind: 'temperature', dimension: 'temperature', factor: atomFactor.get(single.symbol)!, offset: TEMPERATURE_OFFSETS[single.symbol] ?? 0 };
  }
  const dims = combinedDims(terms);
  const dimension = dimensionOfVector(dims);
  if (dimension === undefined) {
    throw new UnitError('unit.unknown', text, `"${text}" is a valid unit expression but not of a dimension heatstate uses (exponents of M, L, T, Θ, N: ${dims.join(', ')})`);
  }
  const key = canonicalKey(terms);
  let factor = single ? atomFactor.get(single.symbol)! : COMPOUND_FACTORS[key];
  if (factor === undefined) {
    factor = 1;
    for (const t of terms) {
      const f = atomFactor.get(t.atom.symbol)! * (t.prefix === '' ? 1 : PREFIX_FACTORS[t.prefix]!);
      factor *= t.exponent === 1 ? f : f ** t.exponent;
    }
  }
  return { text, kind: 'linear', dimension, factor, offset: 0 };
}

/**
 * Resolves unit text (`"psia"`, `"kJ/(kg·K)"`, `"Δ°F"`, `"psig"`) to its dimension and factor.
 * Throws {@link UnitError} for unknown names, bad syntax or unsupported dimensions.
 * @example
 * ```ts
 * resolveUnit('Btu/(lbm·°R)').factor;   //=> 4186.8
 * resolveUnit('°F').kind;              //=> 'temperature'
 * ```
 */
export function resolveUnit(text: string): ResolvedUnit {
  const hit = cache.get(text);
  if (hit) return hit;
  const resolved = resolveUncached(text);
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(text, resolved);
  return resolved;
}

/** Converts a value in unit `u` to SI. `ambientPa` is used only by gauge units. */
export function toSI(value: number, u: ResolvedUnit, ambientPa: number): number {
  switch (u.kind) {
    case 'temperature':
      return u.offset === 0 ? value * u.factor : (value + u.offset) * u.factor;
    case 'gauge':
      return value * u.factor + ambientPa;
    default:
      return value * u.factor;
  }
}

/** Converts an SI value to unit `u`. `ambientPa` is used only by gauge units. */
export function fromSI(si: number, u: ResolvedUnit, ambientPa: number): number {
  switch (u.kind) {
    case 'temperature':
      return u.offset === 0 ? si / u.factor : si / u.factor - u.offset;
    case 'gauge':
      return (si - ambientPa) / u.factor;
    default:
      return si / u.factor;
  }
}

/** Every unit name in the registry (symbols and aliases), for error hints and invariants. */
export function registryNames(): string[] {
  return [...atomsByName.keys()];
}
