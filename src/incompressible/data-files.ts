/**
 * The catalogue's large data files, read on first use. In the built package (tsup.config.ts,
 * `jsonAsText`) these two imports are JSON text, parsed by `JSON.parse` when a model first needs
 * them: V8 only scans a string at import, where an object literal of 60 kB is compiled and built on
 * every start. Run from the sources (vitest, tsx) the imports are the parsed objects already.
 *
 * Only this module may import these files (the build refuses any other importer: a second importer
 * would get text where it expects an object).
 *
 * @module
 * @internal
 */
import catalogueFile from '../../data/incompressible.json';
import brinesFile from '../../data/incompressible/brines.json';

/** What the catalogue reads of data/incompressible.json (typed here: declarations never refer to a JSON module). */
export interface CatalogueFile {
  readonly substances: readonly unknown[];
  readonly liquidWaterTransport: { readonly viscosity: unknown; readonly thermalConductivity: unknown };
}
/** What the solutions read of data/incompressible/brines.json. */
export interface BrinesFile {
  readonly solutions: readonly unknown[];
}

let catalogue: CatalogueFile | undefined;
let brines: BrinesFile | undefined;

/** The value of a data import: parsed from its text in the build, the object itself from the sources. */
function parsed<T>(imported: unknown): T {
  return (typeof imported === 'string' ? JSON.parse(imported) : imported) as T;
}

/** data/incompressible.json, parsed once. */
export function catalogueData(): CatalogueFile {
  return (catalogue ??= parsed<CatalogueFile>(catalogueFile));
}

/** data/incompressible/brines.json, parsed once. */
export function brinesData(): BrinesFile {
  return (brines ??= parsed<BrinesFile>(brinesFile));
}
