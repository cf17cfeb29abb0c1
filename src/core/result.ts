/**
 * The facade kit's result builder: SI core outputs to quantities. A non-finite value here is the
 * model's failure (an overflow inside it), never the caller's input, and is reported as such.
 *
 * @module
 */
import { ResultError } from '../errors.js';
import type { Dimension } from '../units/dimensions.js';
import { Quantity } from '../units/quantity.js';

/**
 * A quantity of `dimension` from an SI core output.
 * @throws {@link ResultError} when the value is not finite
 * @example
 * ```ts
 * resultQuantity(373.15, 'temperature', 'T').in('°C');   //=> 100
 * ```
 */
export function resultQuantity<D extends Dimension>(si: number, dimension: D, property: string, extrapolated = false): Quantity<D> {
  if (!Number.isFinite(si)) throw new ResultError(property, `the model produced a non-finite ${property} (${si}); this is a fault of the model at this state, not of the input`);
  return Quantity.fromSI(si, dimension, undefined, extrapolated);
}

/** A quantity, or `undefined` when the property is not defined (NaN from the core by contract). */
export function optionalQuantity<D extends Dimension>(si: number, dimension: D, property: string): Quantity<D> | undefined {
  return Number.isNaN(si) ? undefined : resultQuantity(si, dimension, property);
}
