/**
 * The definition of an incompressible substance (built-in or user-supplied) and its zod schema.
 * One schema serves the catalogue (checked in tests) and user definitions (checked at run time).
 *
 * @module
 */
import { z } from 'zod';
import { DefinitionError } from '../errors.js';
import { Quantity } from '../units/quantity.js';
import { compileChecked, type CompiledSubstance } from './compile.js';

const quantityInput = z.union([z.string().min(1), z.instanceof(Quantity)]);

const polynomialHeatCapacity = z
  .object({
    /** Coefficients of c = Σ aᵢ·tⁱ, ascending, with t in `temperatureUnit` and c in `unit`. */
    polynomial: z.array(z.number()).min(1),
    unit: z.string(),
    temperatureUnit: z.string(),
  })
  .strict();

const tabulatedHeatCapacity = z
  .object({
    /** Node temperatures (in `temperatureUnit`, strictly increasing) and c values (in `unit`). */
    table: z.object({ T: z.array(z.number()).min(2), c: z.array(z.number()).min(2) }).strict(),
    unit: z.string(),
    temperatureUnit: z.string(),
  })
  .strict();

/** Where a definition's numbers come from. */
export const sourceSchema = z
  .object({
    title: z.string().min(1),
    authors: z.string().optional(),
    year: z.number().int().optional(),
    table: z.string().optional(),
  })
  .strict();

/** zod schema of an incompressible substance definition. */
export const incompressibleDefinitionSchema = z
  .object({
    name: z.string().min(1),
    aliases: z.array(z.string().min(1)).optional(),
    state: z.enum(['liquid', 'solid']),
    /** Constant c as a quantity (`"4.18 kJ/(kg·K)"`), a polynomial, or a table. */
    c: z.union([quantityInput, polynomialHeatCapacity, tabulatedHeatCapacity]),
    density: quantityInput,
    T: z.object({ min: quantityInput, max: quantityInput }).strict(),
    source: sourceSchema.optional(),
    basis: z.enum(['published', 'from memory', 'common practice', 'measured', 'user']).optional(),
    note: z.string().optional(),
  })
  .strict();

/** A substance definition, as accepted by `incompressible()`. */
export type IncompressibleDefinition = z.input<typeof incompressibleDefinitionSchema>;

/**
 * Validates a definition (shape with zod, then units, ranges and monotonicity) and compiles it.
 * @throws {@link DefinitionError} listing every problem with its path
 * @example
 * ```ts
 * compileDefinition({ name: 'brine', state: 'liquid', c: '3.6 kJ/(kg·K)', density: '1180 kg/m³', T: { min: '-20 °C', max: '40 °C' } }).model.v;   //=> 0.000847 (m³/kg)
 * compileDefinition({ name: 'x', state: 'gas' });   // throws DefinitionError naming each bad field
 * ```
 */
export function compileDefinition(input: unknown): CompiledSubstance {
  const parsed = incompressibleDefinitionSchema.safeParse(input);
  if (!parsed.success) {
    const label = typeof input === 'object' && input !== null && typeof (input as { name?: unknown }).name === 'string' ? `incompressible substance "${(input as { name: string }).name}"` : 'incompressible substance definition';
    throw new DefinitionError(label, parsed.error.issues.map((i) => ({ path: i.path.map((p) => (typeof p === 'symbol' ? String(p) : p)), message: i.message })));
  }
  return compileChecked(parsed.data);
}
