/**
 * The data shapes of property tables, as zod schemas: what a table file holds before it is checked
 * for units, monotone keys and complete rows.
 *
 * @module
 */
import * as z from 'zod/mini';
import { lazySchema } from '../validation.js';

/** The schemas, built on first validation (importing this module does no zod work). */
function buildSchemas() {
  const text = z.string().check(z.minLength(1));

  /** Where a table's numbers come from: a citation object or free text. */
  const tableSourceSchema = z.union([
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
  const columnSchema = z.strictObject({ unit: text, values: z.array(z.nullable(z.number())) });

  /** The measured interpolation error of a column, written by the table generator. */
  const interpolationErrorSchema = z.record(
    z.string(),
    z.record(z.string(), z.strictObject({ maxRelative: z.number(), maxAbsolute: z.number(), unit: z.string(), at: z.string() })),
  );

  /** A one-dimensional table: rows keyed by one strictly monotone column. */
  const tableSchema = z.strictObject({
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
  const axisSchema = z.strictObject({ name: text, unit: text, values: z.array(z.number()) });

  /** A two-dimensional grid table: values[iy][ix], `null` where the grid has no state (a liquid cell in a vapour table). */
  const gridSchema = z.strictObject({
    kind: z.literal('grid'),
    name: text,
    source: tableSourceSchema,
    x: axisSchema,
    y: axisSchema,
    columns: z.record(z.string(), z.strictObject({ unit: text, values: z.array(z.array(z.nullable(z.number()))) })),
    notes: z.optional(z.string()),
    interpolationError: z.optional(interpolationErrorSchema),
  });
  return { tableSchema, gridSchema };
}

const schemas = lazySchema(buildSchemas);
/** The zod schema of a one-dimensional table (built on first use). */
export const tableSchema = () => schemas().tableSchema;
/** The zod schema of a two-dimensional grid table (built on first use). */
export const gridSchema = () => schemas().gridSchema;

/** Where a table's numbers come from: a citation object or free text. */
export type TableSource = string | { readonly title: string; readonly authors?: string; readonly year?: number; readonly table?: string; readonly generator?: string };

/** The measured interpolation error of each column, by method (written by the table generator). */
export type InterpolationErrors = { readonly [column: string]: { readonly [method: string]: { readonly maxRelative: number; readonly maxAbsolute: number; readonly unit: string; readonly at: string } } };

/**
 * A one-dimensional table as stored: rows keyed by one strictly monotone column. A plain type (the
 * zod schema is internal; `Same` below proves the two agree), so the published types do not
 * depend on zod.
 */
export interface TableData {
  readonly kind?: 'table';
  readonly name: string;
  readonly source: TableSource;
  /** The key column's name. */
  readonly key: string;
  readonly columns: { readonly [name: string]: { readonly unit: string; readonly values: readonly (number | null)[] } };
  readonly notes?: string;
  readonly interpolationError?: InterpolationErrors;
}

/** A grid table as stored: values[iy][ix], `null` where the grid has no state. */
export interface GridData {
  readonly kind: 'grid';
  readonly name: string;
  readonly source: TableSource;
  readonly x: { readonly name: string; readonly unit: string; readonly values: readonly number[] };
  readonly y: { readonly name: string; readonly unit: string; readonly values: readonly number[] };
  readonly columns: { readonly [name: string]: { readonly unit: string; readonly values: readonly (readonly (number | null)[])[] } };
  readonly notes?: string;
  readonly interpolationError?: InterpolationErrors;
}

/** Compile-time proof that a plain type and a schema's input type accept the same values. */
type Mutable<T> = T extends readonly (infer E)[] ? Mutable<E>[] : T extends object ? { -readonly [K in keyof T]: Mutable<T[K]> } : T;
type Same<A, B> = [Mutable<A>] extends [B] ? ([B] extends [Mutable<A>] ? true : false) : false;
// eslint-disable-next-line @typescript-eslint/no-unused-vars
const TABLE_TYPES_MATCH: [Same<TableData, z.input<ReturnType<typeof tableSchema>>>, Same<GridData, z.input<ReturnType<typeof gridSchema>>>] = [true, true];
