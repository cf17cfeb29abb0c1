/**
 * Name resolution shared by the run-time registry and the factor generator:
 * a written name (`kPa`, `degF`, `lb`) becomes a prefix and a registry atom.
 *
 * @module
 */
import { UnitError } from '../errors.js';
import type { DimensionVector } from './dimensions.js';
import { parseUnitExpression, type UnitTerm } from './expression.js';

/** A unit the registry defines directly (not by prefix or composition). */
export interface AtomRecord {
  readonly symbol: string;
  readonly dims: DimensionVector;
  readonly prefixable: boolean;
  /** True for temperature scales (K, °C, °F, °R). */
  readonly scale: boolean;
}

/** What name resolution needs from a registry. */
export interface AtomLookup {
  /** The atom with this symbol or alias. */
  atom(name: string): AtomRecord | undefined;
  /** Known SI prefixes, longest first. */
  readonly prefixes: readonly string[];
  /** Known spellings close to an unknown name, for the error's "did you mean". */
  suggest?(name: string): readonly string[];
}

/** A resolved term: prefix + atom, raised to a power. */
export interface ResolvedTerm {
  readonly prefix: string;
  readonly atom: AtomRecord;
  readonly exponent: number;
}

/** Normalises the two micro signs to one. */
function normaliseName(name: string): string {
  return name.replace(/μ/g, 'µ');
}

/**
 * Resolves written names to atoms: an exact symbol or alias first, then an SI prefix
 * on a prefixable atom (`kPa`, `mbar`, `kmol`). Throws `unit.unknown` otherwise.
 */
export function resolveTerms(terms: readonly UnitTerm[], lookup: AtomLookup, text: string): ResolvedTerm[] {
  return terms.map((t) => {
    const name = normaliseName(t.name);
    const direct = lookup.atom(name);
    if (direct) return { prefix: '', atom: direct, exponent: t.exponent };
    for (const p of lookup.prefixes) {
      if (name.length > p.length && name.startsWith(p)) {
        const base = lookup.atom(name.slice(p.length));
        if (base && base.prefixable) return { prefix: p, atom: base, exponent: t.exponent };
      }
    }
    const suggestions = lookup.suggest?.(t.name) ?? [];
    const hint = suggestions.length > 0 ? `; did you mean ${suggestions.map((x) => `"${x}"`).join(' or ')}?` : '';
    const where = t.name === text.trim() ? '' : ` in "${text}"`;
    throw new UnitError('unit.unknown', text, `unknown unit "${t.name}"${where}${hint}`, suggestions);
  });
}

/**
 * The canonical key of a product of terms: prefixed symbols sorted, exponents combined,
 * zero exponents dropped (`kJ/kg/K` and `kJ/(kg·K)` both give `K^-1·kJ·kg^-1`).
 */
export function canonicalKey(terms: readonly ResolvedTerm[]): string {
  const exps = new Map<string, number>();
  for (const t of terms) {
    const key = t.prefix + t.atom.symbol;
    exps.set(key, (exps.get(key) ?? 0) + t.exponent);
  }
  return [...exps.entries()]
    .filter(([, e]) => e !== 0)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([k, e]) => (e === 1 ? k : `${k}^${e}`))
    .join('·');
}

/** Sum of the terms' dimension vectors. */
export function combinedDims(terms: readonly ResolvedTerm[]): DimensionVector {
  const v = [0, 0, 0, 0, 0];
  for (const t of terms) for (let i = 0; i < 5; i++) v[i]! += t.atom.dims[i]! * t.exponent;
  return v as unknown as DimensionVector;
}

/**
 * The compound spellings that carry a precomputed factor, in one fixed order: each listed spelling
 * (dimension by dimension, as listed) that is not `1`, a difference (`Δ…`, `delta …`), a gauge unit or
 * a single unprefixed atom, once per canonical key. `each` receives the key and the resolved terms.
 *
 * The factor generator (scripts/generate-factors.ts) writes their exact factors by key
 * (`COMPOUND_FACTORS`), which the registry looks up.
 */
export function forEachCompoundSpelling(
  spellings: Readonly<Record<string, readonly string[]>>,
  gaugeUnits: Readonly<Record<string, string>>,
  lookup: AtomLookup,
  each: (key: string, terms: readonly ResolvedTerm[]) => void,
): void {
  const seen = new Set<string>();
  for (const list of Object.values(spellings)) {
    for (const spelling of list) {
      if (spelling === '1' || spelling.startsWith('Δ') || spelling.startsWith('delta ') || Object.hasOwn(gaugeUnits, spelling)) continue;
      const terms = resolveTerms(parseUnitExpression(spelling), lookup, spelling);
      if (terms.length === 1 && terms[0]!.prefix === '' && terms[0]!.exponent === 1) continue;
      const key = canonicalKey(terms);
      if (seen.has(key)) continue;
      seen.add(key);
      each(key, terms);
    }
  }
}
