/**
 * The fluids the library ships: each data file with its generated kernels, compiled on first use.
 * Only fluids whose coefficients reproduce their source's verification values are listed here
 * (`"loadable": true` in the data file; the kernel generator emits kernels only for those).
 *
 * @module
 */
import type { FluidDefinition } from './definition.js';
import type { CatalogueEntry } from './entries/entry.js';
import { nitrogen } from './entries/nitrogen.js';
import { water } from './entries/water.js';
import { FluidModel } from './model.js';

// an entry left out of a build (a bundle with one fluid) is undefined and skipped
const ENTRIES: Readonly<Record<string, CatalogueEntry>> = Object.fromEntries(
  Object.entries({ water, nitrogen } as Record<string, CatalogueEntry | undefined>).filter((e): e is [string, CatalogueEntry] => e[1] !== undefined),
);

/** The catalogue's fluid names. */
export const FLUID_NAMES: readonly string[] = Object.keys(ENTRIES);

/** The definition (data file contents) of a catalogue fluid, or undefined. */
export function fluidDefinition(name: string): FluidDefinition | undefined {
  return ENTRIES[name]?.definition();
}

const compiled = new Map<string, FluidModel>();

/**
 * The compiled model of a catalogue fluid (built on first use, then shared: it is immutable), or
 * undefined for a name that is not in the catalogue (catalogue names only; aliases are the facade's).
 * @example
 * ```ts
 * fluidModel('water')!.Tc;   //=> 647.096
 * fluidModel('nope');        //=> undefined
 * ```
 */
export function fluidModel(name: string): FluidModel | undefined {
  let m = compiled.get(name);
  if (m === undefined) {
    const e = ENTRIES[name];
    if (e === undefined) return undefined;
    m = new FluidModel(name, e.definition(), e.residual, e.ideal);
    compiled.set(name, m);
  }
  return m;
}

/** IAPWS-95 water, compiled. */
export function waterModel(): FluidModel {
  return fluidModel('water')!;
}
