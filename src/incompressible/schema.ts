/**
 * The definition of an incompressible substance (built-in or user-supplied) and its zod schema.
 * One schema serves the catalogue (checked in tests) and user definitions (checked at run time).
 *
 * @module
 */
import * as z from 'zod/mini';
import { lazySchema, safeParse } from '../validation.js';
import { DefinitionError } from '../errors.js';
import { Quantity } from '../units/quantity.js';
import { compileChecked, type CompiledSubstance } from './compile.js';

/** The schemas, built on first validation (importing this module does no zod work). */
function buildDefinitionSchema() {
  const text = z.string().check(z.minLength(1));
  const quantityInput = z.union([text, z.instanceof(Quantity)]);

  const polynomialHeatCapacity = z.strictObject({
    /** Coefficients of c = Σ aᵢ·tⁱ, ascending, with t in `temperatureUnit` and c in `unit`. */
    polynomial: z.array(z.number()).check(z.minLength(1)),
    unit: z.string(),
    temperatureUnit: z.string(),
  });

  const tabulatedHeatCapacity = z.strictObject({
    /** Node temperatures (in `temperatureUnit`, strictly increasing) and c values (in `unit`). */
    table: z.strictObject({ T: z.array(z.number()).check(z.minLength(2)), c: z.array(z.number()).check(z.minLength(2)) }),
    unit: z.string(),
    temperatureUnit: z.string(),
  });

  const tabulatedDensity = z.strictObject({
    /** Node temperatures (in `temperatureUnit`, strictly increasing) and ρ values (in `unit`); ρ is linear between nodes. */
    table: z.strictObject({ T: z.array(z.number()).check(z.minLength(2)), rho: z.array(z.number()).check(z.minLength(2)) }),
    unit: z.string(),
    temperatureUnit: z.string(),
  });

  /** Where a definition's numbers come from. */
  const sourceSchema = z.strictObject({
    title: text,
    authors: z.optional(z.string()),
    year: z.optional(z.int()),
    table: z.optional(z.string()),
  });

  const basisSchema = z.enum(['published', 'computed', 'from memory', 'common practice', 'measured', 'user']);
  const uncertaintySchema = z.string().check(z.regex(/^(fit deviation|source|estimate): /));
  /** Where a transport property's numbers come from: its own source, basis and uncertainty. */
  const transportProvenance = {
    source: z.optional(sourceSchema),
    basis: z.optional(basisSchema),
    uncertainty: z.optional(uncertaintySchema),
    note: z.optional(z.string()),
  };
  const temperatureRange = z.strictObject({ min: quantityInput, max: quantityInput });
  /** A transport property: a constant (with an optional range of its own), a table, a formulation, or left out with the reason. */
  function transportSchema<T extends z.ZodMiniType, F extends string>(table: T, formulation: F) {
    return z.union([
      z.strictObject({ value: quantityInput, T: z.optional(temperatureRange), ...transportProvenance }),
      z.strictObject({ table, unit: z.string(), temperatureUnit: z.string(), ...transportProvenance }),
      z.strictObject({ formulation: z.literal(formulation), ...transportProvenance }),
      z.strictObject({ omitted: text }),
    ]);
  }
  const nodes = z.array(z.number()).check(z.minLength(2));
  /** Node temperatures (in `temperatureUnit`, strictly increasing) and values (in `unit`). */
  const viscosityTable = z.strictObject({ T: nodes, mu: nodes });
  const conductivityTable = z.strictObject({ T: nodes, lambda: nodes });

  /** zod schema of an incompressible substance definition. */
  const definition = z.strictObject({
    name: text,
    aliases: z.optional(z.array(text)),
    state: z.enum(['liquid', 'solid']),
    /** Constant c as a quantity (`"4.18 kJ/(kg·K)"`), a polynomial, or a table. */
    c: z.union([quantityInput, polynomialHeatCapacity, tabulatedHeatCapacity]),
    /**
     * Molar mass (`"63.546 g/mol"`), when c is given per mole (a `unit` such as `J/(mol·K)`, as
     * thermochemical tables print it); c is divided by it.
     */
    molarMass: z.optional(quantityInput),
    /** Constant ρ as a quantity (`"997 kg/m³"`) or a table ρ(T). */
    density: z.union([quantityInput, tabulatedDensity]),
    /**
     * Valid temperatures. A liquid's range starts at its melting point; `supercooledMin`, when given,
     * is the lowest temperature the data reach as supercooled liquid, used only on request
     * (`incompressible(name, { supercooled: true })`).
     */
    T: z.strictObject({ min: quantityInput, max: quantityInput, supercooledMin: z.optional(quantityInput) }),
    source: z.optional(sourceSchema),
    /** `computed`: generated here from a published formulation or table (with the generator named in the source). */
    basis: z.optional(z.enum(['published', 'computed', 'from memory', 'common practice', 'measured', 'user'])),
    /**
     * The stated uncertainty of c and ρ, starting with its kind: `fit deviation:` (largest deviation of
     * the entry from its source), `source:` (the source's own statement) or `estimate:` (an honest
     * estimate with no stated figure behind it).
     */
    uncertainty: z.optional(z.string().check(z.regex(/^(fit deviation|source|estimate): /))),
    note: z.optional(z.string()),
    /** Appended to out-of-range errors: where to go instead (`"for steam and compressed liquid use heatstate/water"`). */
    rangeNote: z.optional(z.string()),
    /** Something found while checking the data that a user should know (a disagreement between sources, a value left out). */
    finding: z.optional(z.string()),
    /** Dynamic viscosity μ(T) of a liquid: a table (ln μ linear in 1/T between nodes), a constant, IAPWS R12-08 (liquid water), or `{ omitted }`. */
    viscosity: z.optional(transportSchema(viscosityTable, 'IAPWS R12-08')),
    /** Thermal conductivity λ(T): a constant, a table (linear in T), IAPWS R15-11 (liquid water), or `{ omitted }`. */
    thermalConductivity: z.optional(transportSchema(conductivityTable, 'IAPWS R15-11')),
  });
  return definition;
}

/** The zod schema of an incompressible definition (built on first use). */
export const incompressibleDefinitionSchema = lazySchema(buildDefinitionSchema);

/** A quantity in a definition: unit text or a Quantity. */
type QuantityField = string | Quantity;

/** The provenance fields of a transport property. */
interface TransportProvenance {
  readonly source?: DefinitionSource;
  readonly basis?: 'published' | 'computed' | 'from memory' | 'common practice' | 'measured' | 'user';
  /** Starts with `fit deviation: `, `source: ` or `estimate: `. */
  readonly uncertainty?: string;
  readonly note?: string;
}

/**
 * A transport property in a definition: a constant (optionally with its own temperature range), a
 * table through (T, value) nodes, a named formulation, or `{ omitted: reason }` (the property
 * functions then throw, naming the reason).
 */
export type TransportField<Table, F extends string> =
  | (TransportProvenance & { readonly value: QuantityField; readonly T?: { readonly min: QuantityField; readonly max: QuantityField } })
  | (TransportProvenance & { readonly table: Table; readonly unit: string; readonly temperatureUnit: string })
  | (TransportProvenance & { readonly formulation: F })
  | { readonly omitted: string };

/** Where a definition's numbers come from. */
export interface DefinitionSource {
  readonly title: string;
  readonly authors?: string;
  readonly year?: number;
  readonly table?: string;
}

/**
 * A substance definition, as accepted by `incompressible()`. A plain type (the zod schema that
 * checks it is internal; `Same` below proves the two agree), so the published types do not depend on zod.
 */
export interface IncompressibleDefinition {
  readonly name: string;
  readonly aliases?: readonly string[];
  readonly state: 'liquid' | 'solid';
  /** Constant c as a quantity (`"4.18 kJ/(kg·K)"`), a polynomial in T, or a table c(T). */
  readonly c:
    | QuantityField
    | { readonly polynomial: readonly number[]; readonly unit: string; readonly temperatureUnit: string }
    | { readonly table: { readonly T: readonly number[]; readonly c: readonly number[] }; readonly unit: string; readonly temperatureUnit: string };
  /** Molar mass, when c is given per mole. */
  readonly molarMass?: QuantityField;
  /** Constant ρ as a quantity (`"997 kg/m³"`) or a table ρ(T). */
  readonly density: QuantityField | { readonly table: { readonly T: readonly number[]; readonly rho: readonly number[] }; readonly unit: string; readonly temperatureUnit: string };
  /** Valid temperatures; `supercooledMin` is the lowest supercooled-liquid temperature, used on request. */
  readonly T: { readonly min: QuantityField; readonly max: QuantityField; readonly supercooledMin?: QuantityField };
  readonly source?: DefinitionSource;
  readonly basis?: 'published' | 'computed' | 'from memory' | 'common practice' | 'measured' | 'user';
  /** Starts with `fit deviation: `, `source: ` or `estimate: `. */
  readonly uncertainty?: string;
  readonly note?: string;
  /** Appended to out-of-range errors. */
  readonly rangeNote?: string;
  /** Something found while checking the data that a user should know. */
  readonly finding?: string;
  /** Dynamic viscosity μ(T) of a liquid (a table's ln μ is linear in 1/T between nodes). */
  readonly viscosity?: TransportField<{ readonly T: readonly number[]; readonly mu: readonly number[] }, 'IAPWS R12-08'>;
  /** Thermal conductivity λ(T) (a table's λ is linear in T between nodes). */
  readonly thermalConductivity?: TransportField<{ readonly T: readonly number[]; readonly lambda: readonly number[] }, 'IAPWS R15-11'>;
}

type Mutable<T> = T extends Quantity ? T : T extends readonly (infer E)[] ? Mutable<E>[] : T extends object ? { -readonly [K in keyof T]: Mutable<T[K]> } : T;
type Same<A, B> = [Mutable<A>] extends [B] ? ([B] extends [Mutable<A>] ? true : false) : false;
// compile-time proof that the plain type and the schema accept the same definitions
// eslint-disable-next-line @typescript-eslint/no-unused-vars
const DEFINITION_TYPES_MATCH: Same<IncompressibleDefinition, z.input<ReturnType<typeof incompressibleDefinitionSchema>>> = true;

/**
 * Validates a definition (shape with zod, then units, ranges and monotonicity) and compiles it.
 * @throws {@link DefinitionError} listing every problem with its path
 * @example
 * ```ts
 * compileDefinition({ name: 'brine', state: 'liquid', c: '3.6 kJ/(kg·K)', density: '1180 kg/m³', T: { min: '-20 °C', max: '40 °C' } }).model.v;   //=> 0.000847 (m³/kg)
 * compileDefinition({ name: 'x', state: 'gas' });   // throws DefinitionError: invalid incompressible substance "x": state: … c: … density: … T: …
 * ```
 */
export function compileDefinition(input: unknown): CompiledSubstance {
  const parsed = safeParse(incompressibleDefinitionSchema(), input);
  if (!parsed.success) {
    const label = typeof input === 'object' && input !== null && typeof (input as { name?: unknown }).name === 'string' ? `incompressible substance "${(input as { name: string }).name}"` : 'incompressible substance definition';
    throw new DefinitionError(label, parsed.error.issues.map((i) => ({ path: i.path.map((p) => (typeof p === 'symbol' ? String(p) : p)), message: i.message })));
  }
  return compileChecked(parsed.data);
}
