/**
 * zod schemas of the species data files. Used by the tests to validate data/ideal-gas/*.json on
 * load; kept out of the run-time entry so that importing `heatstate/ideal-gas` does not load zod.
 *
 * @module
 */
import * as z from 'zod/mini';

const finite = z.number().check(z.refine(Number.isFinite, { message: 'must be finite' }));
const text = z.string().check(z.minLength(1));
const interval = z
  .strictObject({ min: z.number().check(z.positive()), mid: z.number().check(z.positive()), max: z.number().check(z.positive()) })
  .check(z.refine((t) => t.min < t.mid && t.mid <= t.max, { message: 'T.min < T.mid ≤ T.max' }));
const source = z.strictObject({ title: z.string().check(z.minLength(10)), authors: z.string().check(z.minLength(3)), year: z.int(), table: z.optional(z.string()) });

/** A species in the older 7-coefficient form (data/ideal-gas/nasa7.json). */
export const sevenCoefficientSpeciesSchema = z
  .strictObject({
    id: text,
    formula: z.optional(text),
    names: z.array(text),
    T: interval,
    low: z.array(finite).check(z.length(7)),
    high: z.array(finite).check(z.length(7)),
    M: z.optional(z.number().check(z.positive())),
    note: z.optional(z.string()),
    /** Stated uncertainty: "estimate: …" for recalled sets. */
    uncertainty: z.string().check(z.regex(/^(estimate|source|fit deviation): .{20,}/)),
    /** ΔfH°(298.15 K) as the coefficients give it, and the compilation whose value it follows. */
    formationEnthalpy: z.strictObject({ kJPerMol: finite, follows: z.string().check(z.minLength(10)) }),
  })
  .check(z.refine((r) => r.formula !== undefined || r.M !== undefined, { message: 'a species needs a formula or a molar mass M' }));

/** data/ideal-gas/nasa7.json. */
export const sevenCoefficientFileSchema = z.strictObject({ source, basis: z.enum(['published', 'from memory']), notes: z.string(), species: z.array(sevenCoefficientSpeciesSchema).check(z.minLength(1)) });

/** A species fitted to JANAF in the 9-constant form (data/ideal-gas/janaf-fits.json). */
export const fittedSpeciesSchema = z.strictObject({
  id: text,
  formula: text,
  names: z.array(text),
  janafTable: z.string().check(z.regex(/^[A-Z][a-z]?-\d{3}$/)),
  T: interval,
  low: z.array(finite).check(z.length(9)),
  high: z.array(finite).check(z.length(9)),
  fitError: z.strictObject({ cpRelative: z.number().check(z.nonnegative()), sRelative: z.number().check(z.nonnegative()), hMinusH298kJPerMol: z.number().check(z.nonnegative()), hMinusH298Relative: z.number().check(z.nonnegative()), points: z.int().check(z.positive()) }),
  finding: z.optional(z.string().check(z.minLength(20))),
});

/** data/ideal-gas/janaf-fits.json. */
export const fittedFileSchema = z.strictObject({ generated: z.string(), source, basis: z.literal('computed'), notes: z.string(), species: z.array(fittedSpeciesSchema).check(z.minLength(1)) });
