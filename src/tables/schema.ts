/**
 * The data shapes of property tables, as zod schemas: what a table file holds before it is checked
 * for units, monotone keys and complete rows.
 *
 * @module
 */
import { z } from 'zod';

/** Where a table's numbers come from: a citation object or free text. */
export const tableSourceSchema = z.union([
  z.string().min(1),
  z
    .object({
      title: z.string().min(1),
      authors: z.string().optional(),
      year: z.number().int().optional(),
      table: z.string().optional(),
      generator: z.string().optional(),
    })
    .strict(),
]);

/** A column of a one-dimensional table: a unit and one value per row. */
export const columnSchema = z.object({ unit: z.string().min(1), values: z.array(z.number().nullable()) }).strict();

/** The measured interpolation error of a column, written by the table generator. */
export const interpolationErrorSchema = z.record(
  z.string(),
  z.record(z.string(), z.object({ maxRelative: z.number(), maxAbsolute: z.number(), unit: z.string(), at: z.string() }).strict()),
);

/** A one-dimensional table: rows keyed by one strictly monotone column. */
export const tableSchema = z
  .object({
    kind: z.literal('table').optional(),
    name: z.string().min(1),
    source: tableSourceSchema,
    /** The key column's name. */
    key: z.string().min(1),
    columns: z.record(z.string(), columnSchema),
    notes: z.string().optional(),
    interpolationError: interpolationErrorSchema.optional(),
  })
  .strict();

/** An axis of a grid: a name, a unit and strictly monotone values. */
export const axisSchema = z.object({ name: z.string().min(1), unit: z.string().min(1), values: z.array(z.number()) }).strict();

/** A two-dimensional grid table: values[iy][ix], `null` where the grid has no state (a liquid cell in a vapour table). */
export const gridSchema = z
  .object({
    kind: z.literal('grid'),
    name: z.string().min(1),
    source: tableSourceSchema,
    x: axisSchema,
    y: axisSchema,
    columns: z.record(z.string(), z.object({ unit: z.string().min(1), values: z.array(z.array(z.number().nullable())) }).strict()),
    notes: z.string().optional(),
    interpolationError: interpolationErrorSchema.optional(),
  })
  .strict();

/** A one-dimensional table as stored. */
export type TableData = z.input<typeof tableSchema>;
/** A grid table as stored. */
export type GridData = z.input<typeof gridSchema>;
