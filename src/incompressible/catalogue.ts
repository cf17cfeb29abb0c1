/**
 * The built-in catalogue of incompressible liquids and solids (data/incompressible.json, and the
 * generated liquid water of data/incompressible/water.json). Each entry is compiled on first use;
 * tests check every entry against the same zod schema as user definitions, so loading the
 * catalogue does not load zod.
 *
 * Names resolve only where they are unique: an alias two entries share resolves to neither, and a
 * word that several names contain ("steel", "glycol", "oil") is refused with those names listed,
 * never guessed.
 *
 * @module
 */
import liquidWater from '../../data/incompressible/water.json';
import { UnknownNameError } from '../errors.js';
import { closestNames, normaliseName } from '../lookup.js';
import { findSolution, solution, solutionNames, type SolutionOptions } from './brines.js';
import { compileChecked, type CompiledSubstance } from './compile.js';
import { catalogueData } from './data-files.js';
import type { IncompressibleDefinition } from './schema.js';

/** The entries and their names, built on the first call that needs them (nothing is read at import). */
interface CatalogueIndex {
  readonly entries: readonly IncompressibleDefinition[];
  readonly byName: ReadonlyMap<string, IncompressibleDefinition>;
  /** Aliases given by more than one entry: they resolve to none of them. */
  readonly shared: ReadonlyMap<string, string[]>;
}
let index: CatalogueIndex | undefined;

function catalogueIndex(): CatalogueIndex {
  if (index) return index;
  const catalogue = catalogueData();
  // the generated liquid water (its generator owns water.json) with its transport properties from the
  // catalogue: IAPWS R12-08 and R15-11 at the IF97 saturated-liquid density
  const water = { ...liquidWater.substance, viscosity: catalogue.liquidWaterTransport.viscosity, thermalConductivity: catalogue.liquidWaterTransport.thermalConductivity };
  const entries = [water, ...catalogue.substances] as unknown as readonly IncompressibleDefinition[];
  const byName = new Map<string, IncompressibleDefinition>();
  const shared = new Map<string, string[]>();
  for (const entry of entries) {
    for (const name of [entry.name, ...(entry.aliases ?? [])]) {
      const key = normaliseName(name);
      const other = byName.get(key);
      if (shared.has(key)) shared.get(key)!.push(entry.name);
      else if (other !== undefined && other !== entry) {
        shared.set(key, [other.name, entry.name]);
        byName.delete(key);
      } else byName.set(key, entry);
    }
  }
  index = { entries, byName, shared };
  return index;
}
const compiled = new Map<IncompressibleDefinition, CompiledSubstance>();
const compiledSupercooled = new Map<IncompressibleDefinition, CompiledSubstance>();

/** Options of a catalogue lookup: supercooled liquid, or the concentration of a solution. */
export interface CatalogueOptions extends SolutionOptions {
  /** Extend a liquid's range below its melting point to the supercooled data (`T.supercooledMin`). Default false. */
  readonly supercooled?: boolean;
}

/**
 * Names of the built-in substances.
 * @example
 * ```ts
 * incompressibleNames().includes('engine oil');   //=> true
 * incompressibleNames().includes('ethylene glycol solution');   //=> true (needs { massFraction } or { volumeFraction })
 * ```
 */
export function incompressibleNames(): string[] {
  return [...catalogueIndex().entries.map((e) => e.name), ...solutionNames()];
}

/**
 * The raw definitions of the built-in substances, as stored in data/.
 * @example
 * ```ts
 * incompressibleCatalogue().find((d) => d.name === 'copper')?.source?.title;   //=> 'NIST-JANAF Thermochemical Tables, 4th edition'
 * ```
 */
export function incompressibleCatalogue(): readonly IncompressibleDefinition[] {
  return catalogueIndex().entries;
}

/** The catalogue names a word or a shared alias could mean: every name containing it as a word. */
function candidates(name: string): string[] {
  const { entries, shared } = catalogueIndex();
  const key = normaliseName(name);
  const fromAlias = shared.get(key) ?? [];
  const words = name.toLowerCase().trim();
  const all = [...entries.map((e) => [e.name, ...(e.aliases ?? [])]), ...solutionNames().map((n) => [n])];
  const fromWord = words.length >= 3 ? all.filter((names) => names.some((n) => n.toLowerCase().split(/[\s,()\-]+/).includes(words))).map((names) => names[0]!) : [];
  return [...new Set([...fromAlias, ...fromWord])];
}

/**
 * The compiled built-in substance with this name or alias (case, spaces and hyphens ignored).
 * @throws {@link UnknownNameError} with the closest names; for an ambiguous name ("steel"), with
 *   every name it could mean
 * @example
 * ```ts
 * lookupIncompressible('Aluminum').definition.name;   //=> 'aluminium'
 * lookupIncompressible('steel');   // throws UnknownNameError: did you mean "carbon steel", "stainless steel"?
 * ```
 */
export function lookupIncompressible(name: string, options: CatalogueOptions = {}): CompiledSubstance {
  const brine = findSolution(name);
  if (brine) return solution(brine, options);
  const entry = catalogueIndex().byName.get(normaliseName(name));
  if (!entry) {
    const meant = candidates(name);
    if (meant.length >= 1) throw new UnknownNameError(name, 'incompressible substance', meant);
    const all = catalogueIndex().entries.flatMap((e) => [e.name, ...(e.aliases ?? [])]);
    throw new UnknownNameError(name, 'incompressible substance', closestNames(name, all));
  }
  const cache = options.supercooled === true ? compiledSupercooled : compiled;
  let c = cache.get(entry);
  if (!c) {
    c = compileChecked(entry, options.supercooled === true ? { supercooled: true } : {});
    cache.set(entry, c);
  }
  return c;
}
