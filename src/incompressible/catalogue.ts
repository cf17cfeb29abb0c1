/**
 * The built-in catalogue of incompressible liquids and solids (data/incompressible.json).
 * Each entry is compiled on first use; tests check every entry against the same zod schema as user
 * definitions, so loading the catalogue does not load zod.
 *
 * @module
 */
import catalogue from '../../data/incompressible.json';
import { UnknownNameError } from '../errors.js';
import { closestNames, normaliseName } from '../lookup.js';
import { compileChecked, type CompiledSubstance } from './compile.js';
import type { IncompressibleDefinition } from './schema.js';

const ENTRIES = catalogue.substances as unknown as readonly IncompressibleDefinition[];
const byName = new Map<string, IncompressibleDefinition>();
for (const entry of ENTRIES) {
  for (const name of [entry.name, ...(entry.aliases ?? [])]) byName.set(normaliseName(name), entry);
}
const compiled = new Map<IncompressibleDefinition, CompiledSubstance>();

/**
 * Names of the built-in substances.
 * @example
 * ```ts
 * incompressibleNames().includes('engine oil');   //=> true
 * ```
 */
export function incompressibleNames(): string[] {
  return ENTRIES.map((e) => e.name);
}

/**
 * The raw definitions of the built-in substances, as stored in data/.
 * @example
 * ```ts
 * incompressibleCatalogue().find((d) => d.name === 'copper')?.source?.title;
 * ```
 */
export function incompressibleCatalogue(): readonly IncompressibleDefinition[] {
  return ENTRIES;
}

/**
 * The compiled built-in substance with this name or alias (case, spaces and hyphens ignored).
 * @throws {@link UnknownNameError} with the closest names
 */
export function lookupIncompressible(name: string): CompiledSubstance {
  const entry = byName.get(normaliseName(name));
  if (!entry) {
    const all = ENTRIES.flatMap((e) => [e.name, ...(e.aliases ?? [])]);
    throw new UnknownNameError(name, 'incompressible substance', closestNames(name, all));
  }
  let c = compiled.get(entry);
  if (!c) {
    c = compileChecked(entry);
    compiled.set(entry, c);
  }
  return c;
}
