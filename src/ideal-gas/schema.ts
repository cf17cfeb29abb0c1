/**
 * zod schemas of the species data files. Used by the tests to validate data/ideal-gas/*.json on
 * load; kept out of the run-time entry so that importing `heatstate/ideal-gas` does not load zod.
 *
 * @module
 */
import { z } from 'zod';

const finite = z.number().refine(Number.isFinite, 'must be finite');
const interval = z
  .object({ min: z.number().positive(), mid: z.number().positive(), max: z.number().positive() })
  .strict()
  .refine((t) => t.min < t.mid && t.mid <= t.max, 'T.min < T.mid ≤ T.max');
const source = z.object({ title: z.string().min(10), authors: z.string().min(3), year: z.number().int(), table: z.string().optional() }).strict();

/** A species in the older 7-coefficient form (data/ideal-gas/nasa7.json). */
export const sevenCoefficientSpeciesSchema = z
  .object({
    id: z.string().min(1),
    formula: z.string().min(1).optional(),
    names: z.array(z.string().min(1)),
    T: interval,
    low: z.array(finite).length(7),
    high: z.array(finite).length(7),
    M: z.number().positive().optional(),
    note: z.string().optional(),
  })
  .strict()
  .refine((r) => r.formula !== undefined || r.M !== undefined, 'a species needs a formula or a molar mass M');

/** data/ideal-gas/nasa7.json. */
export const sevenCoefficientFileSchema = z
  .object({ source, basis: z.enum(['published', 'from memory']), notes: z.string(), species: z.array(sevenCoefficientSpeciesSchema).min(1) })
  .strict();

/** A species fitted to JANAF in the 9-constant form (data/ideal-gas/janaf-fits.json). */
export const fittedSpeciesSchema = z
  .object({
    id: z.string().min(1),
    formula: z.string().min(1),
    names: z.array(z.string().min(1)),
    janafTable: z.string().regex(/^[A-Z][a-z]?-\d{3}$/),
    T: interval,
    low: z.array(finite).length(9),
    high: z.array(finite).length(9),
    fitError: z.object({ cpRelative: z.number().nonnegative(), sRelative: z.number().nonnegative(), hMinusH298kJPerMol: z.number().nonnegative(), points: z.number().int().positive() }).strict(),
  })
  .strict();

/** data/ideal-gas/janaf-fits.json. */
export const fittedFileSchema = z
  .object({ generated: z.string(), source, basis: z.literal('published'), notes: z.string(), species: z.array(fittedSpeciesSchema).min(1) })
  .strict();
