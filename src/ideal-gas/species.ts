/**
 * The built-in ideal-gas species, read (from JSON text) and compiled on first use. The run-time data are generated
 * (scripts/generate-species.ts) from two data files:
 * - data/ideal-gas/janaf-fits.json: every species with a NIST-JANAF table in the repository (N2, O2,
 *   Ar, H2, CO, CO2, H2O, CH4, NH3, He, C2H4, C2H2, NO2, N2O, H2S, O3, OH, H, O, N), fitted to it in
 *   the NASA Glenn 9-constant form by scripts/fit-nasa-glenn.ts (fit errors recorded per species);
 * - data/ideal-gas/nasa7.json: the species without a table here (Ne, C2H6, C3H8, n-C4H10, NO, SO2,
 *   air) in the older NASA 7-coefficient form, recalled from memory and marked so.
 *
 * @module
 */
import { UnknownNameError } from '../errors.js';
import { closestNames, normaliseName } from '../lookup.js';
import { NasaPolynomialModel } from './model.js';
import { CITATIONS, SOURCES, SPECIES_JSON } from './species.generated.js';

/**
 * Where a data set comes from, how it was obtained, and how far to trust it.
 * `basis`: `'published'` (transcribed), `'computed'` (fitted or generated here from a published
 * source), `'from memory'` (recalled, not transcribed). `uncertainty` starts with its kind:
 * `fit deviation:` (largest deviation from the source), `source:` (the source's own statement) or
 * `estimate:` (an honest estimate, no stated figure behind it).
 */
export interface DataSource {
  readonly title: string;
  readonly authors?: string;
  readonly year?: number;
  /** Table, equation or record within the source. */
  readonly table?: string;
  readonly basis: 'published' | 'computed' | 'from memory';
  readonly uncertainty: string;
}

/** One built-in species, with its constants in the 9-constant form. */
export interface SpeciesRecord {
  /** Short identifier, usually the formula (`"N2"`, `"n-C4H10"`, `"air"`). */
  readonly id: string;
  /** Chemical formula, when the species has one. */
  readonly formula?: string;
  /** Common names (`"nitrogen"`). */
  readonly names: readonly string[];
  /** Interval limits in K: min, mid (the break), max. */
  readonly T: { readonly min: number; readonly mid: number; readonly max: number };
  /** [a1..a7, b1, b2] below T.mid, and from T.mid up. */
  readonly low: readonly number[];
  readonly high: readonly number[];
  /** Molar mass, kg/mol. */
  readonly M: number;
  /** Where the constants come from, and how they were checked (one line). */
  readonly source: string;
  /** The same, structured: title, authors, year, table, basis and stated uncertainty. */
  readonly provenance: DataSource;
  readonly note?: string;
}

/** One row of `SPECIES_JSON` (scripts/generate-species.ts). */
type SpeciesRow = readonly [string, string, readonly string[], number, number, number, readonly number[], readonly number[], number, number, string, string, string];

/** The records and their lookup maps, built from the JSON text on the first call that needs them. */
interface SpeciesIndex {
  readonly records: readonly SpeciesRecord[];
  readonly byKey: ReadonlyMap<string, SpeciesRecord>;
  readonly byFormula: ReadonlyMap<string, SpeciesRecord>;
}
let index: SpeciesIndex | undefined;

function speciesIndex(): SpeciesIndex {
  if (index) return index;
  const rows = JSON.parse(SPECIES_JSON) as readonly SpeciesRow[];
  const records: readonly SpeciesRecord[] = rows.map(([id, formula, names, min, mid, max, low, high, M, source, note, table, uncertainty]) => ({
    id,
    ...(formula === '' ? {} : { formula }),
    names,
    T: { min, mid, max },
    low,
    high,
    M,
    source: SOURCES[source]!,
    provenance: { ...CITATIONS[source]!, table, uncertainty },
    ...(note === '' ? {} : { note }),
  }));
  const byKey = new Map<string, SpeciesRecord>();
  const byFormula = new Map<string, SpeciesRecord>();
  for (const r of records) {
    byFormula.set(r.id, r);
    if (r.formula !== undefined && !byFormula.has(r.formula)) byFormula.set(r.formula, r);
    // ids that are formulas match by exact case only (CO is carbon monoxide; Co, cobalt, is not a gas
    // here); ids that are names (air) and the common names match in any case
    const idIsFormula = r.formula !== undefined && r.formula !== '' && r.id === r.formula;
    for (const n of idIsFormula ? r.names : [r.id, ...r.names]) byKey.set(normaliseName(n), r);
  }
  index = { records, byKey, byFormula };
  return index;
}
const compiled = new Map<SpeciesRecord, NasaPolynomialModel>();

/**
 * The records of all built-in species.
 * @example
 * ```ts
 * speciesRecords().length;   //=> 27
 * ```
 */
export function speciesRecords(): readonly SpeciesRecord[] {
  return speciesIndex().records;
}

/**
 * Identifiers of all built-in species.
 * @example
 * ```ts
 * speciesNames().slice(0, 3);   //=> ['N2', 'O2', 'Ar']
 * ```
 */
export function speciesNames(): string[] {
  return speciesIndex().records.map((r) => r.id);
}

/**
 * The record for a formula (exact case: `CO` is carbon monoxide, `Co` is not a gas here) or a name (any case).
 * @example
 * ```ts
 * findSpecies('nitrogen')?.id;   //=> 'N2'
 * findSpecies('Co');             //=> undefined (cobalt is not a gas here; 'CO' is carbon monoxide)
 * ```
 */
export function findSpecies(nameOrFormula: string): SpeciesRecord | undefined {
  const { byFormula, byKey } = speciesIndex();
  return byFormula.get(nameOrFormula.trim()) ?? byKey.get(normaliseName(nameOrFormula));
}

/**
 * The compiled model of a built-in species.
 * @throws {@link UnknownNameError} with the closest known names
 */
export function speciesModel(nameOrFormula: string): { record: SpeciesRecord; model: NasaPolynomialModel } {
  const record = findSpecies(nameOrFormula);
  if (!record) {
    const all = speciesIndex().records.flatMap((r) => [r.id, ...r.names]);
    throw new UnknownNameError(nameOrFormula, 'ideal-gas species', closestNames(nameOrFormula, all));
  }
  let model = compiled.get(record);
  if (!model) {
    model = new NasaPolynomialModel(record.M, record.T.min, record.T.mid, record.T.max, record.low, record.high);
    compiled.set(record, model);
  }
  return { record, model };
}
