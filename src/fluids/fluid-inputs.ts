/**
 * The input types of the fluid facade: the pairs a state takes, with run-time text allowed and
 * literal text checked by the compiler.
 *
 * @module
 */
import type { Dimension } from '../units/dimensions.js';
import type { Quantity, QuantityInput, QuantityLike } from '../units/quantity.js';

/** An input of dimension D: a quantity, unit text, or run-time text (checked when the call runs). */
type In<D extends Dimension> = QuantityLike<D> | string;
/** An entropy input: a specific entropy, or a quantity of the same shape (a `water.state(...).s`). */
type EntropyIn = In<'specificEntropy'> | Quantity<'specificHeat'>;

/** The pairs `state` accepts, with run-time text allowed (see {@link FluidPairCheck}). Pressures are absolute. */
export type FluidPairInput =
  | { readonly T: In<'temperature'>; readonly p: In<'pressure'> }
  | { readonly p: In<'pressure'>; readonly h: In<'specificEnergy'> }
  | { readonly p: In<'pressure'>; readonly s: EntropyIn }
  | { readonly h: In<'specificEnergy'>; readonly s: EntropyIn }
  | { readonly T: In<'temperature'>; readonly x: number }
  | { readonly p: In<'pressure'>; readonly x: number }
  | { readonly T: In<'temperature'>; readonly v: In<'specificVolume'> }
  | { readonly T: In<'temperature'>; readonly rho: In<'density'> };

/** The pairs with literal unit text only (every literal checked by the compiler). */
export type FluidPair =
  | { readonly T: QuantityLike<'temperature'>; readonly p: QuantityLike<'pressure'> }
  | { readonly p: QuantityLike<'pressure'>; readonly h: QuantityLike<'specificEnergy'> }
  | { readonly p: QuantityLike<'pressure'>; readonly s: QuantityLike<'specificEntropy'> | Quantity<'specificHeat'> }
  | { readonly h: QuantityLike<'specificEnergy'>; readonly s: QuantityLike<'specificEntropy'> | Quantity<'specificHeat'> }
  | { readonly T: QuantityLike<'temperature'>; readonly x: number }
  | { readonly p: QuantityLike<'pressure'>; readonly x: number }
  | { readonly T: QuantityLike<'temperature'>; readonly v: QuantityLike<'specificVolume'> }
  | { readonly T: QuantityLike<'temperature'>; readonly rho: QuantityLike<'density'> };

interface PairDimensions {
  T: 'temperature';
  p: 'pressure';
  h: 'specificEnergy';
  s: 'specificEntropy';
  v: 'specificVolume';
  rho: 'density';
}

/**
 * The compile-time check of a pair: literal text of the wrong dimension (`{ T: '5 bar', … }`) is an
 * error, a `string` known only at run time is accepted and checked when the call runs.
 */
export type FluidPairCheck<P> = {
  readonly [K in keyof P]: K extends 'x' ? number : K extends 's' ? (P[K] extends Quantity<'specificHeat'> ? unknown : QuantityInput<'specificEntropy', P[K]>) : K extends keyof PairDimensions ? QuantityInput<PairDimensions[K], P[K]> : never;
};

/** The point where saturation is asked for: a temperature or a pressure. */
export type FluidSaturationInput = { readonly T: In<'temperature'> } | { readonly p: In<'pressure'> };

/** The compile-time check of a saturation input (as {@link FluidPairCheck}). */
export type FluidSaturationCheck<P> = { readonly [K in keyof P]: K extends 'T' ? QuantityInput<'temperature', P[K]> : K extends 'p' ? QuantityInput<'pressure', P[K]> : never };

