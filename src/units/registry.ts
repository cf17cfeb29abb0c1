/**
 * The run-time unit registry: resolves unit text to a dimension and an exact factor.
 *
 * Factors come from the generated module (exact SP 811 definitions, correctly rounded).
 * Compound spellings listed in `spellings.ts` hit a precomputed exact factor; any other
 * valid composition is multiplied out in double precision (within a few ulp).
 * Results are cached, so a unit text is parsed once per process.
 *
 * Rules beyond the grammar:
 * - A temperature scale with an offset (°C, °F) can only stand alone: `°F` is a temperature,
 *   `Δ°F` a difference, and a compound whose dimension is a bare temperature (`degF·m/m`) is
 *   refused, since the offset would be silently dropped. Inside compounds of other dimensions
 *   (`kJ/(kg·°C)`, `W/(m·K)`) a temperature unit is a degree of difference.
 * - A factor that overflows or underflows double precision (`kPa^200/Pa^199`) is refused.
 * - Names the trade uses for more than one unit (`ton`) are refused with the unambiguous spellings.
 * - Unknown names carry "did you mean" suggestions from the registry's spellings.
 *
 * @module
 */
import { DimensionError, UnitError } from '../errors.js';
import { canonicalKey, combinedDims, resolveTerms, type AtomLookup, type AtomRecord, type ResolvedTerm } from './atoms.js';
import { checkString } from './check.js';
import { DIMENSIONS, dimensionOfVector, sameShape, type Dimension, type DimensionVector } from './dimensions.js';
import { parseUnitExpression, previewText, UNIT_TEXT_MAX_LENGTH } from './expression.js';
import { AMBIGUOUS_NAMES, ATOMS, COMPOUND_FACTORS, DEFAULT_AMBIENT_PA, GAUGE_UNITS, PREFIX_FACTORS, TEMPERATURE_OFFSETS } from './factors.generated.js';
import { UNIT_SPELLINGS } from './spellings.js';

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

/** A linear unit expression of any dimension: its factor to SI and its base-quantity exponents. */
export interface ResolvedExpression {
  readonly text: string;
  readonly factor: number;
  readonly vector: DimensionVector;
  /** The named dimension of these exponents, when there is one. */
  readonly dimension: Dimension | undefined;
}

export { DEFAULT_AMBIENT_PA };

// The tables below are built on first use, not at import: loading the module does no work beyond
// defining it (a cold start pays only for parsing), and the first unit resolved pays well under a
// millisecond once.

interface AtomTables {
  /** Every symbol and alias → its atom. */
  readonly byName: Map<string, AtomRecord>;
  /** Symbol → factor to SI. */
  readonly factor: Map<string, number>;
}

let atomTables: AtomTables | undefined;

function atoms(): AtomTables {
  if (atomTables !== undefined) return atomTables;
  const byName = new Map<string, AtomRecord>();
  const factor = new Map<string, number>();
  for (const [symbol, aliases, dims, f, prefixable, scale] of ATOMS) {
    const rec: AtomRecord = { symbol, dims, prefixable, scale };
    factor.set(symbol, f);
    for (const name of [symbol, ...aliases]) byName.set(name, rec);
  }
  return (atomTables = { byName, factor });
}

/** The SI factor of an atom's symbol. */
function atomFactor(symbol: string): number {
  return atoms().factor.get(symbol)!;
}

let spellingDimensions: Map<string, Dimension> | undefined;

/** The dimension each listed spelling reads as when none is expected: the first that lists it. */
function spellingDimension(spelling: string): Dimension | undefined {
  if (spellingDimensions === undefined) {
    spellingDimensions = new Map();
    for (const [dimension, list] of Object.entries(UNIT_SPELLINGS) as [Dimension, readonly string[]][]) {
      for (const s of list) if (!spellingDimensions.has(s)) spellingDimensions.set(s, dimension);
    }
  }
  return spellingDimensions.get(spelling);
}

/**
 * The exact factor of a listed compound spelling by canonical key, from the generated table. (Deriving
 * the keys from the spellings on first use instead saved 0.24 kB of a bundle but made the first unit
 * read in a process parse every listed spelling: several ms of a serverless cold call.)
 */
function compoundFactor(key: string): number | undefined {
  return Object.hasOwn(COMPOUND_FACTORS, key) ? COMPOUND_FACTORS[key] : undefined;
}

/** The spellings suggestions are drawn from, with their folded keys (built on the first unknown name). */
let suggestionPool: { readonly s: string; readonly k: string }[] | undefined;

function foldKey(name: string): string {
  return name.toLowerCase().replace(/μ/g, 'µ').replace(/°|deg|[\s_·*.]/g, '');
}

function distance(a: string, b: string, limit: number): number {
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  const prev = new Array<number>(b.length + 1);
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    let diag = prev[0]!;
    prev[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const up = prev[j]!;
      prev[j] = Math.min(up + 1, prev[j - 1]! + 1, diag + (a[i - 1] === b[j - 1] ? 0 : 1));
      diag = up;
    }
    // every later row is at least this row's minimum: past the limit, stop
    let least = prev[0]!;
    for (let j = 1; j <= b.length; j++) if (prev[j]! < least) least = prev[j]!;
    if (least > limit) return limit + 1;
  }
  return prev[b.length]!;
}

/**
 * Up to three known spellings close to an unknown unit name, best first: spellings that differ
 * only in case, a degree sign or `deg` (`C` → `°C`, `degC`; `kpa` → `kPa`), else within a small
 * edit distance.
 */
export function suggestUnits(name: string): string[] {
  if (name.length === 0 || name.length > 40) return [];
  suggestionPool ??= [...new Set([...atoms().byName.keys(), ...Object.values(UNIT_SPELLINGS).flat(), ...Object.keys(GAUGE_UNITS)])].map((s) => ({ s, k: foldKey(s) }));
  const key = foldKey(name);
  const limit = key.length <= 3 ? 1 : 2;
  const scored: { s: string; score: number }[] = [];
  for (const { s, k } of suggestionPool) {
    if (s === name) continue;
    const score = k === key ? 0 : distance(key, k, limit);
    if (score <= limit) scored.push({ s, score });
  }
  scored.sort((a, b) => a.score - b.score || a.s.length - b.s.length);
  const best = scored.length > 0 && scored[0]!.score === 0 ? scored.filter((x) => x.score === 0) : scored;
  return best.slice(0, 3).map((x) => x.s);
}

let prefixesLongestFirst: string[] | undefined;

const lookup: AtomLookup = {
  atom: (name) => atoms().byName.get(name),
  get prefixes() {
    return (prefixesLongestFirst ??= Object.keys(PREFIX_FACTORS).sort((a, b) => b.length - a.length));
  },
  suggest: suggestUnits,
};

const cache = new Map<string, ResolvedUnit>();
const CACHE_LIMIT = 512;

const ZERO: DimensionVector = [0, 0, 0, 0, 0];

function refuseAmbiguous(text: string, body: string): void {
  const entry = AMBIGUOUS_NAMES[body];
  if (entry === undefined) return;
  throw new UnitError('unit.unknown', text, `"${body}" is ambiguous: it may mean ${entry.meaning}; write ${entry.use.map((u) => `"${u}"`).join(', ')} instead`, entry.use);
}

/** Terms, dimension vector and factor of a linear unit expression, with the registry's rules checked. */
function analyse(text: string, body: string): { terms: ResolvedTerm[]; dims: DimensionVector; factor: number; single: AtomRecord | undefined } {
  refuseAmbiguous(text, body);
  const terms = resolveTerms(parseUnitExpression(body), lookup, text);
  const single = terms.length === 1 && terms[0]!.exponent === 1 && terms[0]!.prefix === '' ? terms[0]!.atom : undefined;
  const dims = combinedDims(terms);
  if (single?.scale) return { terms, dims, factor: atomFactor(single.symbol), single };
  if (dims[0] === 0 && dims[1] === 0 && dims[2] === 0 && dims[3] === 1 && dims[4] === 0) {
    throw new UnitError(
      'unit.syntax',
      text,
      `"${previewText(text)}" is a temperature written as a compound unit; a temperature scale can only stand alone ("°F", "K"), or after Δ for a difference ("Δ°F"), so that its offset is not lost`,
    );
  }
  const key = canonicalKey(terms);
  let factor = single ? atomFactor(single.symbol) : compoundFactor(key);
  if (factor === undefined) {
    // combine exponents per prefixed name first (kPa^3/kPa^2 is kPa), then multiply out
    const exps = new Map<string, { f: number; e: number }>();
    for (const t of terms) {
      const name = t.prefix + t.atom.symbol;
      const hit = exps.get(name);
      if (hit) hit.e += t.exponent;
      else exps.set(name, { f: atomFactor(t.atom.symbol) * (t.prefix === '' ? 1 : PREFIX_FACTORS[t.prefix]!), e: t.exponent });
    }
    factor = 1;
    for (const { f, e } of exps.values()) if (e !== 0) factor *= e === 1 ? f : f ** e;
  }
  if (!Number.isFinite(factor) || factor === 0) {
    throw new UnitError('unit.syntax', text, `the factor of "${previewText(text)}" to SI ${factor === 0 ? 'underflows to 0' : 'overflows'} in double precision; no real unit is that large or small`);
  }
  return { terms, dims, factor, single };
}

function stripDelta(trimmed: string): [boolean, string] {
  if (trimmed.startsWith('Δ')) return [true, trimmed.slice(1).trim()];
  if (/^delta\s/i.test(trimmed)) return [true, trimmed.slice(6).trim()];
  return [false, trimmed];
}

function resolveUncached(text: string): ResolvedUnit {
  if (text.length > UNIT_TEXT_MAX_LENGTH) parseUnitExpression(text);
  const trimmed = text.trim();
  if (trimmed === '1' || trimmed === '-' || trimmed === '') {
    return { text, kind: 'linear', dimension: 'dimensionless', factor: 1, offset: 0 };
  }
  const [difference, body] = stripDelta(trimmed);
  const gaugeBase = GAUGE_UNITS[body];
  if (!difference && gaugeBase !== undefined) {
    const base = resolveUnit(gaugeBase);
    return { text, kind: 'gauge', dimension: 'pressure', factor: base.factor, offset: 0 };
  }
  const { dims, factor, single } = analyse(text, body);
  if (difference) {
    if (!single?.scale) {
      throw new UnitError('unit.unknown', text, `"${text}": Δ marks a temperature difference and must stand before K, °C, °F or °R`);
    }
    return { text, kind: 'difference', dimension: 'temperatureDifference', factor, offset: 0 };
  }
  if (single?.scale) {
    return { text, kind: 'temperature', dimension: 'temperature', factor, offset: TEMPERATURE_OFFSETS[single.symbol] ?? 0 };
  }
  const listed = spellingDimension(trimmed);
  const dimension = listed !== undefined && sameVector(DIMENSIONS[listed], dims) ? listed : dimensionOfVector(dims);
  if (dimension === undefined) {
    throw new UnitError('unit.unknown', text, `"${previewText(text)}" is a valid unit expression but not of a dimension heatstate names (exponents of M, L, T, Θ, N: ${dims.join(', ')})`);
  }
  return { text, kind: 'linear', dimension, factor, offset: 0 };
}

function sameVector(a: DimensionVector, b: DimensionVector): boolean {
  for (let i = 0; i < 5; i++) if (a[i] !== b[i]) return false;
  return true;
}

/**
 * Resolves unit text (`"psia"`, `"kJ/(kg·K)"`, `"Δ°F"`, `"psig"`) to its dimension and factor.
 * A spelling shared by dimensions of one shape reads as the first listed (`J/(kg·K)`: specificHeat);
 * {@link resolveUnitAs} reads it as the dimension a caller expects.
 * Throws {@link UnitError} for unknown names, bad syntax or unsupported dimensions.
 * @example
 * ```ts
 * resolveUnit('Btu/(lbm·°R)').factor;   //=> 4186.8
 * resolveUnit('°F').kind;              //=> 'temperature'
 * ```
 */
export function resolveUnit(text: string): ResolvedUnit {
  checkString(text, 'unit');
  const hit = cache.get(text);
  if (hit) return hit;
  const resolved = resolveUncached(text);
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(text, resolved);
  return resolved;
}

function describe(dimension: Dimension): string {
  return dimension.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`);
}

/**
 * Reads a resolved unit as dimension `dimension`: a unit of the same shape is relabelled
 * (`kJ/(kg·K)` as a specificEntropy, `m²/s` as a thermalDiffusivity, `g/kg` as dimensionless),
 * a bare temperature scale reads as a difference where a difference is expected (a rise of
 * 10 °F). Anything else throws {@link DimensionError} naming `parameter`.
 */
export function asDimension(u: ResolvedUnit, dimension: Dimension, parameter: string): ResolvedUnit {
  if (u.dimension === dimension) return u;
  if (dimension === 'temperatureDifference' && u.kind === 'temperature') {
    return { ...u, kind: 'difference', dimension: 'temperatureDifference', offset: 0 };
  }
  if (u.kind === 'linear' && dimension !== 'temperature' && dimension !== 'temperatureDifference' && sameShape(u.dimension, dimension)) {
    return { ...u, dimension };
  }
  throw new DimensionError(dimension, u.dimension, `"${previewText(u.text)}" is a unit of ${describe(u.dimension)}, but a ${describe(dimension)} is expected here`, parameter);
}

/**
 * {@link resolveUnit}, read as the expected dimension: a unit of the same shape is relabelled
 * (`kJ/(kg·K)` as a specificEntropy), a bare temperature scale reads as a difference where a
 * difference is expected; anything else throws {@link DimensionError} naming `parameter`.
 * @example
 * ```ts
 * resolveUnitAs('kJ/(kg·K)', 'specificEntropy').dimension;   //=> 'specificEntropy'
 * resolveUnitAs('kJ/kg', 'specificEntropy');                 // throws DimensionError
 * ```
 */
export function resolveUnitAs(text: string, dimension: Dimension, parameter = 'unit'): ResolvedUnit {
  return asDimension(resolveUnit(text), dimension, parameter);
}

/**
 * Resolves a linear unit expression of any dimension, named or not (`W/K`, `kg·m²/(s³·K)`):
 * for quantities from arithmetic whose dimension heatstate does not name. Temperature
 * scales, differences and gauge units are refused here (they are not plain factors).
 * @example
 * ```ts
 * resolveExpression('Btu/(h·°F)').factor;   //=> 0.52752792631
 * resolveExpression('W/K').dimension;       //=> undefined (heatstate names no such dimension)
 * ```
 */
export function resolveExpression(text: string): ResolvedExpression {
  checkString(text, 'unit');
  const trimmed = text.trim();
  if (trimmed === '1' || trimmed === '-' || trimmed === '') return { text, factor: 1, vector: ZERO, dimension: 'dimensionless' };
  const [difference, body] = stripDelta(trimmed);
  if (difference || GAUGE_UNITS[body] !== undefined) {
    throw new UnitError('unit.syntax', text, `"${previewText(text)}" is a temperature difference or gauge unit; a general unit expression takes plain factors only`);
  }
  const { dims, factor, single } = analyse(text, body);
  if (single?.scale) throw new UnitError('unit.syntax', text, `"${text}" is a temperature scale; a general unit expression takes plain factors only`);
  return { text, factor, vector: dims, dimension: dimensionOfVector(dims) };
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
  return [...atoms().byName.keys()];
}
