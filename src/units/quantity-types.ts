/**
 * The types of quantity inputs and operations: what unit text a dimension accepts, the generic input
 * checks for run-time text, tolerances, and the compile-time rules of the arithmetic.
 *
 * @module
 */
import type { AnyDimension, ScalarDimension } from './arithmetic.js';
import type { Dimension } from './dimensions.js';
import type { BaseQuantity, DerivedQuantity, Quantity } from './quantity.js';
import type { DimensionOfUnit, KnownUnit, TargetUnitOf, UnitOf } from './spellings.js';

/** Options for units that need more than a factor. */
export interface QuantityOptions {
  /**
   * Ambient (barometric) pressure for gauge units (`psig`, `barg`, `kPag`).
   * Default: the standard atmosphere, 101 325 Pa (14.696 psia).
   */
  readonly ambient?: QuantityLike<'pressure'>;
}

/**
 * Unit text a value of dimension `D` may be written as, checked by the compiler:
 * `"300 K"`, `"14.7 psig"`, `"2.5 kJ/(kg·K)"`.
 */
export type QuantityText<D extends Dimension> = `${number} ${UnitOf<D>}`;

/**
 * A `Quantity` of dimension `D`, or unit text of that dimension. Accepted wherever heatstate takes an input.
 *
 * Literal text is checked by the compiler (`'500 psia'` is not a `QuantityLike<'temperature'>`).
 * A plain `string` (text known only at run time) is not part of this type: no non-generic type can
 * accept `string` and still refuse a wrong literal, since every literal is a `string`. Functions
 * that take run-time text as well are generic over the input and use {@link QuantityInput}.
 */
export type QuantityLike<D extends Dimension> = Quantity<D> | QuantityText<D>;

/**
 * The input check for a generic parameter `I`: a `Quantity<D>`, literal text of dimension `D`,
 * or a plain `string` (checked at run time). A literal of another dimension is a compile error.
 *
 * ```ts
 * function boilingMargin<I extends QuantityLike<'temperature'> | string>(T: QuantityInput<'temperature', I>) { ... }
 * boilingMargin('300 K');          // compiles
 * boilingMargin(textFromAForm);    // a string: compiles, checked at run time
 * boilingMargin('500 psia');       // compile error
 * ```
 */
export type QuantityInput<D extends Dimension, I> = I & InputCheck<D, I>;

export type InputCheck<D extends Dimension, I> = I extends Quantity<Dimension> | DerivedQuantity
  ? unknown
  : string extends I
    ? unknown
    : I extends QuantityText<D>
      ? unknown
      : QuantityText<D>;

/**
 * The unit check for a generic unit parameter `U`: any run-time `string`, an unlisted literal
 * spelling (checked at run time), or a listed spelling of dimension `D`. A listed spelling of
 * another dimension (`'K'` for a pressure) is a compile error.
 */
export type UnitInput<D extends AnyDimension, U> = U & UnitCheck<D, U>;

export type UnitCheck<D extends AnyDimension, U> = string extends U
  ? unknown
  : D extends Dimension
    ? U extends KnownUnit
      ? U extends TargetUnitOf<D>
        ? unknown
        : TargetUnitOf<D>
      : unknown
    : unknown;

/** The dimension that unit text such as `"500 psia"` has, as far as the compiler can tell. */
export type DimensionOfText<T extends string> = T extends `${string} ${infer U}`
  ? U extends KnownUnit
    ? DimensionOfUnit<U>
    : Dimension
  : Dimension;

/** How {@link Quantity.eq} and {@link Quantity.compare} treat two values as equal. */
export interface Tolerance<D extends AnyDimension> {
  /** Relative tolerance, of the larger magnitude in SI (for temperatures: in kelvins). */
  readonly rel?: number;
  /** Absolute tolerance: a quantity of the same dimension (a temperature difference for temperatures). */
  readonly abs?: D extends 'temperature' ? QuantityLike<'temperatureDifference'> : D extends Dimension ? QuantityLike<D> : DerivedQuantity;
}

export type IsTemperature<D> = [D] extends ['temperature'] ? true : false;
export type IsScalar<D> = [D] extends [ScalarDimension] ? true : false;
/** Scaling an absolute temperature by a plain number depends on the scale: refused. */
export type ScaleFactor<D> = IsTemperature<D> extends true ? never : number;
export type ProductAllowed<D, O> = IsTemperature<D> extends true ? (IsScalar<O> extends true ? never : unknown) : IsScalar<D> extends true ? (IsTemperature<O> extends true ? never : unknown) : unknown;
export type QuotientAllowed<D, O> = IsTemperature<D> extends true ? (IsScalar<O> extends true ? never : unknown) : unknown;
export type MinusOperand<D extends AnyDimension> = D extends 'temperature' ? 'temperature' | 'temperatureDifference' : D;
export type MinusResult<D extends AnyDimension, O extends AnyDimension> = D extends 'temperature' ? (O extends 'temperature' ? 'temperatureDifference' : 'temperature') : D;
/** A quantity operand whose dimension `O` is inferred from its `dimension` field alone. */
export type Operand<O extends AnyDimension> = { readonly dimension: O } & BaseQuantity<NoInfer<O>>;
export type CompareOperand<D extends AnyDimension> = D extends Dimension ? QuantityLike<D> : DerivedQuantity;

/**
 * The quantity class of a dimension: `Quantity<D>` for a named one, {@link DerivedQuantity} for
 * `'derived'`, and `BaseQuantity<AnyDimension>` where the compiler cannot tell (a product off the
 * table): that one converts, takes part in arithmetic and narrows with `.as(...)`.
 */
export type QuantityOf<D extends AnyDimension> = [D] extends [Dimension] ? NamedQuantity<D> : [D] extends ['derived'] ? DerivedQuantity : BaseQuantity<D>;

export type NamedQuantity<D> = D extends Dimension ? Quantity<D> : never;

export type TargetOf<D extends AnyDimension> = D extends Dimension ? TargetUnitOf<D> : never;
