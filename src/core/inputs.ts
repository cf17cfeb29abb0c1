/**
 * Input types of the facades: each quantity field accepts a `Quantity`, unit text checked by the
 * compiler when it is a literal, or a plain `string` known only at run time (checked then).
 *
 * A function takes its input as a generic `P` and intersects it with `CheckedInputs<P, Dims>`: a
 * literal of the wrong dimension (`T: '5 bar'`) becomes `never` and does not compile; a `string`
 * passes and is read at run time like any other text.
 *
 * @module
 */
import type { Dimension } from '../units/dimensions.js';
import type { QuantityInput, QuantityLike } from '../units/quantity.js';

/** A quantity field as a facade accepts it: a Quantity, unit text, or a run-time string. */
export type LooseQuantity<D extends Dimension> = QuantityLike<D> | string;

/** Each field of `P` checked against the dimension `Dims` names for it (other fields as they are). */
export type CheckedInputs<P, Dims> = { readonly [K in keyof P]: K extends keyof Dims ? (Dims[K] extends Dimension ? QuantityInput<Dims[K], P[K]> : P[K]) : P[K] };

/**
 * A state argument that is either bare unit text of dimension `Bare` (a temperature alone) or an
 * object of fields checked as {@link CheckedInputs}.
 */
export type CheckedState<P, Dims, Bare extends Dimension> = P extends string ? QuantityInput<Bare, P> : P & CheckedInputs<P, Dims>;
