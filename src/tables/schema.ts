/**
 * The data shapes of property tables, as zod schemas: what a table file holds before it is checked
 * for units, monotone keys and complete rows.
 *
 * @module
 */
import * as z from 'zod/mini';

const text = z.string().check(z.minLength(1));

/** Where a table's numbers come from: a citation object or free text. */
export const tableSourceSchema = z.union([
  text,
  z.strictObject({
    title: text,
    authors: z.optional(z.string()),
    year: z.optional(z.int()),
    table: z.optional(z.string()),
    generator: z.optional(z.string()),
  }),
]);

/** A column of a one-dimensional table: a unit and one value per row. */
export const columnSchema = z.strictObject({ unit: text, values: z.array(z.nullable(z.number())) });

/** The measured interpolation error of a column, written by the table generator. */
export const interpolationErrorSchema = z.record(
  z.string(),
  z.record(z.string(), z.strictObject({ maxRelative: z.number(), maxAbsolute: z.number(), unit: z.string(), at: z.string() })),
);

/** A one-dimensional table: rows keyed by one strictly monotone column. */
export const tableSchema = z.strictObject({
  kind: z.optional(z.literal('table')),
  name: text,
  source: tableSourceSchema,
  /** The key column's name. */
  key: text,
  columns: z.record(z.string(), columnSchema),
  notes: z.optional(z.string()),
  interpolationError: z.optional(interpolationErrorSchema),
});

/** An axis of a grid: a name, a unit and strictly monotone values. */
export const axisSchema = z.strictObject({ name: text, unit: text, values: z.array(z.number()) });

/** A two-dimensional grid table: values[iy][ix], `null` where the grid has no state (a liquid cell in a vapour table). */
export const gridSchema = z.strictObject({
  kind: z.literal('grid'),
  name: text,
  source: tableSourceSchema,
  x: axisSchema,
  y: axisSchema,
  columns: z.record(z.string(), z.strictObject({ unit: text, values: z.array(z.array(z.nullable(z.number()))) })),
  notes: z.optional(z.string()),
  interpolationError: z.optional(interpolationErrorSchema),
});

/** A one-dimensional table as stored. */
export type TableData = z.input<typeof tableSchema>;
/** A grid table as stored. */
export type GridData = z.input<typeof gridSchema>;
