/**
 * `Quantity`: a number with a unit and a dimension, checked by the compiler and at run time,
 * with arithmetic and comparisons.
 *
 * @module
 */
import { DimensionError, HeatstateError, InvalidInputError, OutOfRangeError, ResultError, UnitError } from '../errors.js';
import { productDimension, quotientDimension, siUnitOfVector, vectorOf, type AnyDimension, type ProductOf, type QuotientOf, type ScalarDimension } from './arithmetic.js';
import { checkFinite, checkOptions, checkString, describeValue } from './check.js';
import { DIMENSIONS, isDimension, SI_UNIT, type Dimension, type DimensionVector } from './dimensions.js';
import { previewText, UNIT_TEXT_MAX_LENGTH, type ParseCounter } from './expression.js';
import { asDimension, DEFAULT_AMBIENT_PA, fromSI, resolveExpression, resolveUnit, toSI, type ResolvedUnit } from './registry.js';
import type { DimensionOfUnit, KnownUnit, TargetUnitOf, UnitOf } from './spellings.js';

export type { AnyDimension, DerivedDimension, ProductOf, QuotientOf, ScalarDimension } from './arithmetic.js';

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

type InputCheck<D extends Dimension, I> = I extends Quantity<Dimension> | DerivedQuantity
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

type UnitCheck<D extends AnyDimension, U> = string extends U
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

type IsTemperature<D> = [D] extends ['temperature'] ? true : false;
type IsScalar<D> = [D] extends [ScalarDimension] ? true : false;
/** Scaling an absolute temperature by a plain number depends on the scale: refused. */
type ScaleFactor<D> = IsTemperature<D> extends true ? never : number;
type ProductAllowed<D, O> = IsTemperature<D> extends true ? (IsScalar<O> extends true ? never : unknown) : IsScalar<D> extends true ? (IsTemperature<O> extends true ? never : unknown) : unknown;
type QuotientAllowed<D, O> = IsTemperature<D> extends true ? (IsScalar<O> extends true ? never : unknown) : unknown;
type MinusOperand<D extends AnyDimension> = D extends 'temperature' ? 'temperature' | 'temperatureDifference' : D;
type MinusResult<D extends AnyDimension, O extends AnyDimension> = D extends 'temperature' ? (O extends 'temperature' ? 'temperatureDifference' : 'temperature') : D;
/** A quantity operand whose dimension `O` is inferred from its `dimension` field alone. */
type Operand<O extends AnyDimension> = { readonly dimension: O } & BaseQuantity<NoInfer<O>>;
type CompareOperand<D extends AnyDimension> = D extends Dimension ? QuantityLike<D> : DerivedQuantity;

function describe(dimension: AnyDimension): string {
  return dimension === 'derived' ? 'derived quantity' : dimension.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`);
}

function ambientPa(options: QuantityOptions | undefined, fallback: number): number {
  checkOptions(options, 'options');
  if (options?.ambient === undefined) return fallback;
  return readQuantity(options.ambient, 'pressure', 'ambient');
}

function notFinite(what: string, message: string): ResultError {
  return new ResultError(what, message);
}

/**
 * What every quantity has, named ({@link Quantity}) or derived ({@link DerivedQuantity}).
 *
 * Arithmetic:
 * - `plus`, `minus` take a quantity of the same dimension; a temperature plus a difference is a
 *   temperature, a temperature minus a temperature is a difference, two temperatures cannot be
 *   added. When both are held in units of the same size (300 °F and 50 °F, or 300 °F and 50 Δ°R)
 *   the result is computed in that unit and held in it, so `value` is exact; otherwise through SI,
 *   held in this quantity's unit.
 * - `times`, `div` by a plain number keep the unit (and an exact `value`); by a quantity they give
 *   the product's dimension (see `arithmetic.ts` for the table the compiler knows), held in SI.
 *   An absolute temperature enters a product or quotient as its value in kelvins (T·s, R·T, T2/T1);
 *   scaling it by a plain number (`times(2)`) is refused, since "twice 50 °F" depends on the scale.
 * - `abs`, `negate` keep the unit; both are refused (at run time) for absolute temperatures.
 * - `compare`, `lt`, `le`, `gt`, `ge`, `eq` (the last two with an optional tolerance) take a quantity
 *   or text of the same dimension.
 * No result holds NaN or infinity: an overflow throws {@link InvalidInputError} (`result.not-finite`).
 *
 * @example
 * ```ts
 * quantity('300 °F').minus(quantity('50 °F')).in('Δ°F');   //=> 250
 * quantity('2 kg/s').times(quantity('100 kJ/kg')).in('kW'); //=> 200 (a Quantity<'power'>)
 * ```
 */
export class BaseQuantity<out D extends AnyDimension> {
  /** The dimension, for example `'pressure'`; `'derived'` for a product heatstate does not name. */
  readonly dimension: D;
  /** The value in SI (see {@link SI_UNIT}: K, Pa, J/kg, J/(kg·K), m³/kg, …). */
  readonly si: number;
  /** The value in `unit`. */
  readonly value: number;
  /** The unit the value is held in. */
  readonly unit: string;
  /** Ambient pressure in Pa used for gauge units. */
  readonly ambientPa: number;
  /**
   * True when the value comes from outside a model's or table's valid range because the caller
   * asked for extrapolation. Never true unless extrapolation was requested.
   */
  readonly extrapolated: boolean;
  readonly #vector: DimensionVector | undefined;

  /** @internal Use {@link quantity} or {@link Quantity.fromSI}. */
  constructor(dimension: D, si: number, value: number, unit: string, ambient: number, extrapolated = false, vector?: DimensionVector) {
    if (!Number.isFinite(si) || !Number.isFinite(value)) {
      throw notFinite(describe(dimension), `a ${describe(dimension)} must be finite; got ${Number.isFinite(si) ? value : si} (an overflow in a conversion or in arithmetic)`);
    }
    this.dimension = dimension;
    this.si = si;
    this.value = value;
    this.unit = unit;
    this.ambientPa = ambient;
    this.extrapolated = extrapolated;
    this.#vector = dimension === 'derived' ? vector : undefined;
  }

  /** Exponents of [mass, length, time, temperature, amount] of this quantity's dimension. */
  private get vector(): DimensionVector {
    return vectorOf(this.dimension, this.#vector);
  }

  /**
   * The value in another unit of the same dimension (a unit shared by a dimension of the same
   * shape reads as this one: a specific entropy in `kJ/(kg·K)`). A derived quantity converts to
   * any unit expression of its shape (`W/K`, `Btu/(h·°F)`).
   * Throws {@link DimensionError} if `unit` has another dimension, {@link UnitError} if it is unknown.
   */
  in(unit: TargetOf<D> | (string & {}), options?: QuantityOptions): number {
    if (unit === this.unit && options === undefined) return this.value;
    checkString(unit, 'unit');
    const out = this.convert(unit, ambientPa(options, this.ambientPa));
    if (!Number.isFinite(out)) throw notFinite(describe(this.dimension), `${this.toString()} in ${previewText(unit)} overflows double precision`);
    return out;
  }

  /** The same quantity held in another unit. */
  to(unit: TargetOf<D> | (string & {}), options?: QuantityOptions): QuantityOf<D> {
    checkString(unit, 'unit');
    const amb = ambientPa(options, this.ambientPa);
    return make(this.dimension, this.si, this.convert(unit, amb), unit, amb, this.extrapolated, this.#vector);
  }

  private convert(unit: string, amb: number): number {
    if (this.dimension === 'derived') {
      const e = resolveExpression(unit);
      const v = this.vector;
      if (e.vector.some((x, i) => x !== v[i])) {
        throw new DimensionError(siUnitOfVector(v), e.dimension ?? siUnitOfVector(e.vector), `"${previewText(unit)}" is not a unit of ${this.toString()} (SI unit ${siUnitOfVector(v)})`, 'unit');
      }
      return this.si / e.factor;
    }
    return fromSI(this.si, asDimension(resolveUnit(unit), this.dimension as Dimension, 'unit'), amb);
  }

  /**
   * Narrows a quantity of unknown dimension (from run-time text or arithmetic) to `dimension`,
   * or throws {@link DimensionError}. A dimension of the same shape relabels the quantity
   * (a specific heat as a specific entropy, a plain number as a humidity ratio).
   */
  as<E extends Dimension>(dimension: E): Quantity<E> {
    if (!isDimension(dimension)) throw new InvalidInputError('input.invalid', 'dimension', `dimension must be one of ${Object.keys(DIMENSIONS).join(', ')}; got ${describeValue(dimension)}`);
    if ((this.dimension as AnyDimension) === dimension) return this as unknown as Quantity<E>;
    const d = this.dimension as AnyDimension;
    const relabel = d !== 'derived' && d !== 'temperature' && d !== 'temperatureDifference' && dimension !== 'temperature' && dimension !== 'temperatureDifference';
    if (relabel && this.vector.every((x, i) => x === DIMENSIONS[dimension][i])) {
      return new Quantity(dimension, this.si, this.value, this.unit, this.ambientPa, this.extrapolated);
    }
    throw new DimensionError(dimension, this.dimension, `expected a ${describe(dimension)}, got ${this.toString()} (a ${describe(this.dimension)})`);
  }

  /**
   * Adds a quantity. A temperature plus a temperature difference is a temperature;
   * two temperatures cannot be added. Otherwise both must have the same dimension.
   * The result is held in this quantity's unit.
   * @example
   * ```ts
   * quantity('300 °F').plus(quantity('50 Δ°F')).value;   //=> 350
   * ```
   */
  plus(other: D extends 'temperature' ? Quantity<'temperatureDifference'> : QuantityOf<D>): QuantityOf<D> {
    return this.sum(other as unknown as BaseQuantity<AnyDimension>, 1, 'add') as QuantityOf<D>;
  }

  /**
   * Subtracts a quantity. Temperature minus temperature is a temperature difference (held in
   * `Δ` of this unit); temperature minus a difference is a temperature. Otherwise dimensions must match.
   * @example
   * ```ts
   * quantity('300 °F').minus(quantity('50 °F')).in('Δ°F');   //=> 250
   * ```
   */
  minus<O extends MinusOperand<D>>(other: Operand<O>): QuantityOf<MinusResult<D, O>> {
    return this.sum(other as unknown as BaseQuantity<AnyDimension>, -1, 'subtract') as unknown as QuantityOf<MinusResult<D, O>>;
  }

  private sum(other: BaseQuantity<AnyDimension>, sign: 1 | -1, verb: string): BaseQuantity<AnyDimension> {
    if (!(other instanceof BaseQuantity)) throw new InvalidInputError('input.invalid', 'other', `${verb} needs a quantity; got ${describeValue(other)}`);
    const a = this.dimension as AnyDimension;
    const b = other.dimension as AnyDimension;
    const into = sign === 1 ? 'to' : 'from';
    if (a === 'temperature' && b === 'temperature') {
      if (sign === 1) throw new DimensionError('temperatureDifference', b, `cannot add two temperatures (${other.toString()} to ${this.toString()}): add a temperature difference ("Δ°F", temperatureDifference()) instead`);
      return this.temperatureDifferenceTo(other) as unknown as BaseQuantity<AnyDimension>;
    }
    const ok = a === 'temperature' ? b === 'temperatureDifference' : a === b && (a !== 'derived' || sameVector(this.vector, other.vector));
    if (!ok) {
      const expected = a === 'temperature' ? 'temperatureDifference' : a;
      throw new DimensionError(expected, b, `cannot ${verb} ${other.toString()} ${into} ${this.toString()} (a ${describe(b)} and a ${describe(a)})`);
    }
    const mine = this.unitFactor();
    const theirs = other.unitFactor();
    let si: number;
    let value: number;
    if (mine.kind !== 'gauge' && theirs.kind !== 'gauge' && mine.factor === theirs.factor) {
      value = this.value + sign * other.value;
      si = mine.kind === 'temperature' ? (value + mine.offset) * mine.factor : value * mine.factor;
    } else {
      si = this.si + sign * other.si;
      value = mine.kind === 'derived' ? si / mine.factor : fromSI(si, mine.unit!, this.ambientPa);
    }
    if (a === 'temperature' && si < 0) {
      throw new OutOfRangeError(
        { quantity: 'T', value: si, min: 0, max: Infinity, unit: 'K', scope: 'absolute temperature' },
        `${this.toString()} ${sign === 1 ? '+' : '−'} ${other.toString()} is below absolute zero (${si.toPrecision(6)} K)`,
      );
    }
    return make(a, si, value, this.unit, this.ambientPa, this.extrapolated || other.extrapolated, this.#vector) as unknown as BaseQuantity<AnyDimension>;
  }

  private temperatureDifferenceTo(other: BaseQuantity<AnyDimension>): Quantity<'temperatureDifference'> {
    const mine = this.unitFactor();
    const theirs = other.unitFactor();
    const unit = `Δ${this.unit}`;
    if (mine.factor === theirs.factor && mine.offset === theirs.offset) {
      const value = this.value - other.value;
      return new Quantity('temperatureDifference', value * mine.factor, value, unit, this.ambientPa, this.extrapolated || other.extrapolated);
    }
    const diff = this.si - other.si;
    return new Quantity('temperatureDifference', diff, diff / mine.factor, unit, this.ambientPa, this.extrapolated || other.extrapolated);
  }

  /** The unit this quantity is held in, resolved: kind, factor, offset. */
  private unitFactor(): { kind: ResolvedUnit['kind'] | 'derived'; factor: number; offset: number; unit: ResolvedUnit | undefined } {
    if (this.dimension === 'derived') return { kind: 'derived', factor: resolveExpression(this.unit).factor, offset: 0, unit: undefined };
    const u = asDimension(resolveUnit(this.unit), this.dimension as Dimension, 'unit');
    return { kind: u.kind, factor: u.factor, offset: u.offset, unit: u };
  }

  private scaled(value: number, what: string): QuantityOf<D> {
    // callers refuse absolute temperatures and route gauge units through SI first
    const u = this.unitFactor();
    if (!Number.isFinite(value)) throw notFinite(describe(this.dimension), `${what} overflows double precision`);
    return make(this.dimension, value * u.factor, value, this.unit, this.ambientPa, this.extrapolated, this.#vector);
  }

  private refuseTemperature(what: string): void {
    if (this.dimension === 'temperature') {
      throw new DimensionError(
        'temperatureDifference',
        'temperature',
        `cannot ${what} the absolute temperature ${this.toString()}: the result would depend on the scale; use a temperature difference (Δ°F, temperatureDifference()), or the value in kelvins`,
      );
    }
  }

  /**
   * Multiplies by a plain number (the unit is kept) or by a quantity (the result has the product's
   * dimension and is held in SI).
   * @example
   * ```ts
   * quantity('2 kg/s').times(quantity('100 kJ/kg')).in('kW');   //=> 200
   * quantity('10 Δ°F').times(3).toString();                      //=> '30 Δ°F'
   * ```
   */
  times(factor: ScaleFactor<D>): QuantityOf<D>;
  times<O extends AnyDimension>(other: Operand<O> & ProductAllowed<D, O>): QuantityOf<ProductOf<D, O>>;
  times(x: number | BaseQuantity<AnyDimension>): unknown {
    if (typeof x === 'number') {
      checkFinite(x, 'factor');
      this.refuseTemperature('scale');
      if (this.unitFactor().kind === 'gauge') return this.withSIValue(this.si * x, 'the product');
      return this.scaled(this.value * x, `${this.toString()} × ${x}`);
    }
    if (!(x instanceof BaseQuantity)) throw new InvalidInputError('input.invalid', 'other', `times needs a number or a quantity; got ${describeValue(x)}`);
    if (isScalarDimension(x.dimension)) this.refuseTemperature('scale');
    if (isScalarDimension(this.dimension as AnyDimension) && x.dimension === 'temperature') x.refuseTemperature('scale');
    const [dimension, vector] = productDimension(this.dimension, this.vector, x.dimension, x.vector);
    return fromProduct(dimension, vector, this.si * x.si, `${this.toString()} × ${x.toString()}`, this.extrapolated || x.extrapolated);
  }

  /**
   * Divides by a plain number (the unit is kept) or by a quantity (the result has the quotient's
   * dimension and is held in SI). Dividing by zero throws {@link InvalidInputError}.
   * @example
   * ```ts
   * quantity('200 kW').div(quantity('2 kg/s')).in('kJ/kg');                       //=> 100
   * quantity('41.868 kJ/kg').div(quantity('4.1868 kJ/(kg·K)')).in('ΔK');         //=> 10
   * ```
   */
  div(divisor: ScaleFactor<D>): QuantityOf<D>;
  div<O extends AnyDimension>(other: Operand<O> & QuotientAllowed<D, O>): QuantityOf<QuotientOf<D, O>>;
  div(x: number | BaseQuantity<AnyDimension>): unknown {
    if (typeof x === 'number') {
      checkFinite(x, 'divisor');
      if (x === 0) throw new InvalidInputError('input.invalid', 'divisor', `cannot divide ${this.toString()} by zero`);
      this.refuseTemperature('scale');
      if (this.unitFactor().kind === 'gauge') return this.withSIValue(this.si / x, 'the quotient');
      return this.scaled(this.value / x, `${this.toString()} / ${x}`);
    }
    if (!(x instanceof BaseQuantity)) throw new InvalidInputError('input.invalid', 'other', `div needs a number or a quantity; got ${describeValue(x)}`);
    if (x.si === 0) throw new InvalidInputError('input.invalid', 'divisor', `cannot divide ${this.toString()} by zero (${x.toString()})`);
    if (isScalarDimension(x.dimension)) this.refuseTemperature('scale');
    const [dimension, vector] = quotientDimension(this.dimension, this.vector, x.dimension, x.vector);
    return fromProduct(dimension, vector, this.si / x.si, `${this.toString()} / ${x.toString()}`, this.extrapolated || x.extrapolated);
  }

  private withSIValue(si: number, what: string): QuantityOf<D> {
    if (!Number.isFinite(si)) throw notFinite(describe(this.dimension), `${what} of ${this.toString()} overflows double precision`);
    const u = this.unitFactor();
    const value = u.kind === 'derived' ? si / u.factor : fromSI(si, u.unit!, this.ambientPa);
    return make(this.dimension, si, value, this.unit, this.ambientPa, this.extrapolated, this.#vector);
  }

  /**
   * The quantity with its sign flipped, in the same unit. Refused at run time for an absolute
   * temperature, which has no sign (the compiler does not refuse it: see `abs`).
   * @example
   * ```ts
   * quantity('3 Δ°F').negate().toString();   //=> '-3 Δ°F'
   * quantity('300 K').negate();               // throws DimensionError
   * ```
   */
  negate(): QuantityOf<D> {
    this.refuseTemperature('negate');
    if (this.unitFactor().kind === 'gauge') return this.withSIValue(-this.si, 'the negation') as QuantityOf<D>;
    return this.scaled(-this.value, `−${this.toString()}`) as QuantityOf<D>;
  }

  /**
   * The magnitude, in the same unit. Refused at run time for an absolute temperature. (A compile-time
   * refusal, typing the result `never`, would make every temperature quantity unassignable to
   * `BaseQuantity<AnyDimension>`, so it is left to the run time.)
   * @example
   * ```ts
   * quantity('-3 Δ°F').abs().toString();   //=> '3 Δ°F'
   * ```
   */
  abs(): QuantityOf<D> {
    this.refuseTemperature('take the absolute value of');
    if (this.unitFactor().kind === 'gauge') return this.withSIValue(Math.abs(this.si), 'the magnitude') as QuantityOf<D>;
    return this.scaled(Math.abs(this.value), `|${this.toString()}|`) as QuantityOf<D>;
  }

  /**
   * −1, 0 or 1 as this quantity is less than, equal to (within `tolerance`, if given) or greater
   * than `other`. Both must have the same dimension. Quantities held in the same unit compare by
   * `value`, others in SI.
   * @example
   * ```ts
   * quantity('1 atm').compare('14.7 psia');                                  //=> -1
   * quantity('1 atm').compare('14.7 psia', { rel: 1e-3 });                   //=> 0
   * ```
   */
  compare(other: CompareOperand<D>, tolerance?: Tolerance<D>): -1 | 0 | 1 {
    const o = this.operand(other);
    if (tolerance !== undefined) {
      checkOptions(tolerance, 'tolerance');
      const rel = tolerance.rel ?? 0;
      if (typeof rel !== 'number' || !(rel >= 0) || !Number.isFinite(rel)) {
        throw new InvalidInputError('input.invalid', 'tolerance.rel', `tolerance.rel must be a finite number ≥ 0; got ${describeValue(rel)}`);
      }
      let abs = 0;
      if (tolerance.abs !== undefined) {
        const diff: Dimension = this.dimension === 'temperature' ? 'temperatureDifference' : (this.dimension as Dimension);
        if (this.dimension === 'derived') {
          const t = tolerance.abs as unknown;
          if (!(t instanceof BaseQuantity) || !sameVector(t.vector, this.vector)) throw new InvalidInputError('input.invalid', 'tolerance.abs', `tolerance.abs must be a quantity of the same dimension as ${this.toString()}`);
          abs = Math.abs(t.si);
        } else {
          abs = Math.abs(readQuantity(tolerance.abs as QuantityLike<Dimension>, diff, 'tolerance.abs'));
        }
      }
      const gap = Math.abs(this.si - o.si);
      if (gap <= abs + rel * Math.max(Math.abs(this.si), Math.abs(o.si))) return 0;
    }
    // same unit (and, for gauge units, the same ambient pressure): compare the values as given
    const [x, y] = o.unit === this.unit && o.ambientPa === this.ambientPa ? [this.value, o.value] : [this.si, o.si];
    return x < y ? -1 : x > y ? 1 : 0;
  }

  /** True when equal, exactly or within `tolerance` (see {@link Quantity.compare}). */
  eq(other: CompareOperand<D>, tolerance?: Tolerance<D>): boolean {
    return this.compare(other, tolerance) === 0;
  }

  /** True when less than `other` (same dimension). */
  lt(other: CompareOperand<D>): boolean {
    return this.compare(other) < 0;
  }

  /** True when less than or equal to `other` (same dimension). */
  le(other: CompareOperand<D>): boolean {
    return this.compare(other) <= 0;
  }

  /** True when greater than `other` (same dimension). */
  gt(other: CompareOperand<D>): boolean {
    return this.compare(other) > 0;
  }

  /** True when greater than or equal to `other` (same dimension). */
  ge(other: CompareOperand<D>): boolean {
    return this.compare(other) >= 0;
  }

  private operand(other: unknown): BaseQuantity<AnyDimension> {
    if (other instanceof BaseQuantity) {
      const o = other as BaseQuantity<AnyDimension>;
      if (o.dimension !== this.dimension || (o.dimension === 'derived' && !sameVector(o.vector, this.vector))) {
        throw new DimensionError(this.dimension, o.dimension, `cannot compare ${o.toString()} (a ${describe(o.dimension)}) with ${this.toString()} (a ${describe(this.dimension)})`, 'other');
      }
      return o;
    }
    if (typeof other === 'string' && this.dimension !== 'derived') {
      const [value, unit] = splitQuantityText(other);
      return build(value, unit, undefined, this.dimension as Dimension, 'other') as unknown as BaseQuantity<AnyDimension>;
    }
    throw new InvalidInputError('input.invalid', 'other', `compare needs a quantity${this.dimension === 'derived' ? '' : ' or unit text'} of ${describe(this.dimension)}; got ${describeValue(other)}`);
  }

  /** `"500 psia"`; with `digits` (1 to 100), the value is shown to that many significant digits. */
  toString(digits?: number): string {
    if (digits !== undefined && (typeof digits !== 'number' || !Number.isInteger(digits) || digits < 1 || digits > 100)) {
      throw new InvalidInputError('input.invalid', 'digits', `digits must be a whole number from 1 to 100; got ${describeValue(digits)}`);
    }
    const v = digits === undefined ? String(this.value) : String(Number(this.value.toPrecision(digits)));
    return this.unit === '1' ? v : `${v} ${this.unit}`;
  }

  /** JSON form: `{ value, unit, dimension }`. */
  toJSON(): { value: number; unit: string; dimension: D } {
    return { value: this.value, unit: this.unit, dimension: this.dimension };
  }
}

/**
 * A value with a unit, of a named dimension (see {@link DIMENSIONS}). The value is held both as
 * given (`value`, in `unit`) and in SI (`si`), so reading it back in the unit it was given in is exact.
 * Arithmetic, conversion and comparison are described on {@link BaseQuantity}.
 *
 * @example
 * ```ts
 * const p = quantity(500, 'psia');
 * p.in('kPa');            //=> 3447.378646584181
 * quantity('50 °F').in('K');                 //=> 283.15000000000003
 * temperatureDifference(50, '°F').in('K');   //=> 27.77777777777778 (a rise, not a temperature)
 * quantity('14.7 psig').in('psia');          //=> 29.395948775513446 (ambient: standard atmosphere)
 * ```
 */
export class Quantity<out D extends Dimension = Dimension> extends BaseQuantity<D> {
  /**
   * Wraps an SI value (as the SI core returns it) in a quantity, shown in `unit` (default: the SI unit).
   * Checks that the value is finite and that `unit` has dimension `dimension`.
   * @throws {@link InvalidInputError} `result.not-finite` for a NaN or infinite SI value (a model's
   *   result, not the caller's input); `input.invalid` for arguments of the wrong type
   */
  static fromSI<D extends Dimension>(si: number, dimension: D, unit?: string, extrapolated = false): Quantity<D> {
    if (!isDimension(dimension)) throw new InvalidInputError('input.invalid', 'dimension', `dimension must be one of ${Object.keys(DIMENSIONS).join(', ')}; got ${describeValue(dimension)}`);
    if (typeof si !== 'number') throw new InvalidInputError('input.invalid', 'si', `the SI value of a ${describe(dimension)} must be a number; got ${describeValue(si)}`);
    if (!Number.isFinite(si)) throw notFinite(describe(dimension), `${describe(dimension)} must be a finite number; got ${si}`);
    if (unit !== undefined) checkString(unit, 'unit');
    if (typeof extrapolated !== 'boolean') throw new InvalidInputError('input.invalid', 'extrapolated', `extrapolated must be a boolean; got ${describeValue(extrapolated)}`);
    const u = unit ?? SI_UNIT[dimension];
    if (unit === undefined) return new Quantity(dimension, si, si, u, DEFAULT_AMBIENT_PA, extrapolated);
    const resolved = asDimension(resolveUnit(u), dimension, 'unit');
    return new Quantity(dimension, si, fromSI(si, resolved, DEFAULT_AMBIENT_PA), u, DEFAULT_AMBIENT_PA, extrapolated);
  }

}

/**
 * A quantity from arithmetic whose dimension heatstate does not name (a thermal conductance in
 * W/K, a heat-transfer coefficient): it reports its SI unit (`unit`, for example `kg·m²/(s³·K)`),
 * converts with `.in(...)` to any unit expression of its shape (`W/K`, `Btu/(h·°F)`), takes part in
 * further arithmetic, and is not accepted where a named dimension is expected.
 *
 * @example
 * ```ts
 * const UA = quantity('2 kg/s').times(quantity('4.2 kJ/(kg·K)'));   // a DerivedQuantity
 * UA.unit;          //=> 'kg·m²/(s³·K)'
 * UA.in('kW/K');    //=> 8.4
 * ```
 */
export class DerivedQuantity extends BaseQuantity<'derived'> {}

/**
 * The quantity class of a dimension: `Quantity<D>` for a named one, {@link DerivedQuantity} for
 * `'derived'`, and `BaseQuantity<AnyDimension>` where the compiler cannot tell (a product off the
 * table): that one converts, takes part in arithmetic and narrows with `.as(...)`.
 */
export type QuantityOf<D extends AnyDimension> = [D] extends [Dimension] ? NamedQuantity<D> : [D] extends ['derived'] ? DerivedQuantity : BaseQuantity<D>;

type NamedQuantity<D> = D extends Dimension ? Quantity<D> : never;

type TargetOf<D extends AnyDimension> = D extends Dimension ? TargetUnitOf<D> : never;

function make<D extends AnyDimension>(dimension: D, si: number, value: number, unit: string, ambient: number, extrapolated: boolean, vector: DimensionVector | undefined): QuantityOf<D> {
  return (dimension === 'derived'
    ? new DerivedQuantity('derived', si, value, unit, ambient, extrapolated, vector)
    : new Quantity(dimension as Dimension, si, value, unit, ambient, extrapolated)) as QuantityOf<D>;
}

function isScalarDimension(d: AnyDimension): boolean {
  return d === 'dimensionless' || d === 'humidityRatio';
}

function sameVector(a: DimensionVector, b: DimensionVector): boolean {
  for (let i = 0; i < 5; i++) if (a[i] !== b[i]) return false;
  return true;
}

function fromProduct(dimension: AnyDimension, vector: DimensionVector, si: number, what: string, extrapolated: boolean): BaseQuantity<AnyDimension> {
  if (!Number.isFinite(si)) throw notFinite(describe(dimension), `${what} overflows double precision`);
  const unit = dimension === 'derived' ? siUnitOfVector(vector) : SI_UNIT[dimension];
  return make(dimension, si, si, unit, DEFAULT_AMBIENT_PA, extrapolated, vector) as unknown as BaseQuantity<AnyDimension>;
}

function build(value: number, unit: string, options: QuantityOptions | undefined, forced?: Dimension, parameter = 'unit'): Quantity {
  if (!Number.isFinite(value)) {
    throw new InvalidInputError('input.not-finite', 'value', `a quantity needs a finite number; got ${value} ${previewText(unit)}`);
  }
  let resolved = resolveUnit(unit);
  if (forced !== undefined) resolved = asDimension(resolved, forced, parameter);
  const amb = ambientPa(options, DEFAULT_AMBIENT_PA);
  const si = toSI(value, resolved, amb);
  if (!Number.isFinite(si)) {
    throw new InvalidInputError('input.not-finite', 'value', `${value} ${unit} overflows double precision in SI (${SI_UNIT[resolved.dimension]})`);
  }
  if (si === 0 && value !== 0 && resolved.kind !== 'temperature' && resolved.kind !== 'gauge') {
    throw new InvalidInputError('input.invalid', 'value', `${value} ${unit} underflows to 0 in SI (${SI_UNIT[resolved.dimension]}); no measurement is that small`);
  }
  if (resolved.dimension === 'temperature' && si < 0) {
    throw new OutOfRangeError(
      { quantity: 'T', value: si, min: 0, max: Infinity, unit: 'K', scope: 'absolute temperature' },
      `${value} ${unit} is below absolute zero (${si.toPrecision(6)} K); if you meant a temperature difference, write it as "Δ${unit}" or use temperatureDifference()`,
    );
  }
  if (resolved.kind === 'gauge' && si < 0) {
    throw new OutOfRangeError(
      { quantity: 'p', value: si, min: 0, max: Infinity, unit: 'Pa', scope: 'absolute pressure' },
      `${value} ${unit} is below vacuum (absolute ${si.toPrecision(6)} Pa with ambient ${amb} Pa)`,
    );
  }
  return new Quantity(resolved.dimension, si, value, unit, amb);
}

/** The longest quantity text read: a number (up to 64 characters) and a unit. */
export const QUANTITY_TEXT_MAX_LENGTH = UNIT_TEXT_MAX_LENGTH + 64;

function isSpace(code: number): boolean {
  return code === 32 || (code >= 9 && code <= 13) || code === 0xa0 || code === 0x202f || code === 0x2009;
}

function isDigitCode(code: number): boolean {
  return code >= 48 && code <= 57;
}

/**
 * Splits `"500 psia"` into number and unit, or throws {@link UnitError} (`unit.syntax`).
 * The number is decimal (`12`, `-0.5`, `.5`, `1.2e5`); hexadecimal, octal and binary forms
 * (`0x10`), `Infinity` and `NaN` are refused. One left-to-right pass: linear in the length.
 * @internal exported for tests
 */
export function splitQuantityText(text: string, counter?: ParseCounter): [number, string] {
  if (text.length > QUANTITY_TEXT_MAX_LENGTH) {
    throw new UnitError('unit.syntax', previewText(text), `quantity text "${previewText(text)}" is longer than ${QUANTITY_TEXT_MAX_LENGTH} characters`);
  }
  const fail = (why: string): never => {
    throw new UnitError('unit.syntax', text, `cannot read "${previewText(text)}" as a quantity: ${why}; write a number followed by a unit, like "500 psia" or "300 °F"`);
  };
  const n = text.length;
  let i = 0;
  const step = (): void => {
    i++;
    if (counter) counter.steps++;
  };
  while (i < n && isSpace(text.charCodeAt(i))) step();
  const start = i;
  if (text[i] === '+' || text[i] === '-') step();
  if (text[i] === '0' && /[xXbBoO]/.test(text[i + 1] ?? '')) fail('hexadecimal, octal and binary numbers are not accepted');
  let digits = 0;
  while (i < n && isDigitCode(text.charCodeAt(i))) {
    step();
    digits++;
  }
  if (text[i] === '.') {
    step();
    while (i < n && isDigitCode(text.charCodeAt(i))) {
      step();
      digits++;
    }
  }
  if (digits === 0) fail('no number');
  if (text[i] === 'e' || text[i] === 'E') {
    let j = i + 1;
    if (text[j] === '+' || text[j] === '-') j++;
    if (isDigitCode(text.charCodeAt(j))) {
      while (i < j) step();
      while (i < n && isDigitCode(text.charCodeAt(i))) step();
    }
  }
  const numberText = text.slice(start, i);
  if (numberText.length > 64) fail('a number of more than 64 characters');
  const unit = text.slice(i).trim();
  if (counter) counter.steps += n - i;
  const value = Number(numberText);
  if (value === 0 && /[1-9]/.test(numberText.split(/[eE]/)[0]!)) {
    throw new InvalidInputError('input.invalid', 'value', `${numberText} underflows to 0 in double precision; no measurement is that small`);
  }
  return [value, unit === '' ? '1' : unit];
}

/**
 * Makes a quantity from a number and a unit, or from text such as `"500 psia"`.
 *
 * Units: SI with prefixes, US customary, and bar, atm, mmHg, inHg, inH2O, kgf/cm², kcal, kWh, therm,
 * MMBtu, TR; compound units as written in data sheets (`kJ/(kg·K)`, `kJ/kg/K`, `Btu/(lbm·°R)`,
 * `ft³/lbm`). Factors are the exact NIST SP 811 definitions. `°F`, `°C` alone are absolute
 * temperatures; prefix `Δ` for a difference (`Δ°F`). Gauge units (`psig`, `barg`, `kPag`,
 * `kgf/cm²g`) add the ambient pressure (default 101 325 Pa; set `options.ambient`).
 * `ton` is refused as ambiguous: write `TR` (refrigeration), `t` (metric) or `ton_short`.
 *
 * Unit text known only at run time (a `string`) is accepted and checked at run time; the result's
 * dimension is then unknown to the compiler until narrowed with `.as(...)`.
 *
 * @throws {@link UnitError} unknown unit (with suggestions) or unreadable text
 * @throws {@link InvalidInputError} NaN, infinite or overflowing value; arguments of the wrong type
 * @throws {@link OutOfRangeError} a temperature below absolute zero, a gauge pressure below vacuum
 *
 * @example
 * ```ts
 * quantity(500, 'psia').in('MPa');      //=> 3.4473786465841805
 * quantity('300 °F').in('K');           //=> 422.03888888888895
 * quantity('2.5 kJ/kg/K').in('Btu/(lbm·°R)'); //=> 0.5971147415687398
 * quantity('-500 °F');                  // throws OutOfRangeError: below absolute zero
 * quantity(1, 'C');                     // throws UnitError: unknown unit "C"; did you mean "°C" or "degC"?
 * ```
 */
export function quantity<U extends KnownUnit>(value: number, unit: U, options?: QuantityOptions): Quantity<DimensionOfUnit<U>>;
export function quantity<T extends string>(text: T, options?: QuantityOptions): Quantity<DimensionOfText<T>>;
export function quantity(value: number, unit: string, options?: QuantityOptions): Quantity;
export function quantity(a: number | string, b?: string | QuantityOptions, c?: QuantityOptions): Quantity {
  if (typeof a === 'string') {
    checkOptions(b, 'options');
    const [value, unit] = splitQuantityText(a);
    return build(value, unit, b as QuantityOptions | undefined);
  }
  if (typeof a !== 'number') {
    throw new InvalidInputError('input.invalid', 'value', `quantity() needs a number and a unit, or text such as "500 psia"; got ${describeValue(a)}`);
  }
  checkString(b, 'unit', `a unit (a string such as "kPa") after the number ${a}`);
  checkOptions(c, 'options');
  return build(a, b, c);
}

type DifferenceUnit = UnitOf<'temperature'> | UnitOf<'temperatureDifference'>;
/** A literal must be a temperature or difference spelling; a run-time string is checked at run time. */
type DifferenceUnitCheck<U> = string extends U ? unknown : U extends DifferenceUnit ? unknown : DifferenceUnit;

/**
 * A temperature difference (a rise or a drop), in K, °C, °F or °R degrees.
 * A difference of 50 °F is 27.78 K; compare `quantity(50, '°F')`, the temperature 283.15 K.
 *
 * @example
 * ```ts
 * temperatureDifference(50, '°F').in('K');   //=> 27.77777777777778
 * temperatureDifference(10, 'K').in('Δ°F');  //=> 18
 * ```
 */
export function temperatureDifference<U extends DifferenceUnit | (string & {})>(value: number, unit: U & DifferenceUnitCheck<U>): Quantity<'temperatureDifference'> {
  checkFinite(value, 'value');
  checkString(unit, 'unit');
  return build(value, unit, undefined, 'temperatureDifference') as Quantity<'temperatureDifference'>;
}

/**
 * Reads an input of an expected dimension and returns its SI value: the single entry point of
 * every facade function. Accepts a `Quantity` or unit text (literal text is checked by the
 * compiler; a run-time `string` is checked here). Text in a unit shared by dimensions of one
 * shape reads as the expected one (`"6.5 kJ/(kg·K)"` as a specificEntropy). A bare number is
 * refused, since its unit would be a guess.
 *
 * @param input the caller's value
 * @param dimension what it must be
 * @param parameter its name in the caller's API, for messages (`T`, `p`, `T1`)
 * @throws {@link DimensionError} wrong dimension; {@link InvalidInputError} NaN, infinity, bare number
 * @example
 * ```ts
 * readQuantity('14.7 psig', 'pressure', 'p');   //=> 202677.9322095749 (Pa)
 * // @ts-expect-error: unit text of a temperature where a pressure belongs does not compile
 * readQuantity('300 K', 'pressure', 'p');      // throws DimensionError: p must be a pressure
 * ```
 */
export function readQuantity<D extends Dimension, I extends QuantityLike<D> | string = QuantityLike<D>>(input: QuantityInput<D, I>, dimension: D, parameter: string): number {
  if (typeof parameter !== 'string') throw new InvalidInputError('input.invalid', 'parameter', `readQuantity: parameter must be the input's name (a string); got ${describeValue(parameter)}`);
  if (!isDimension(dimension)) throw new InvalidInputError('input.invalid', 'dimension', `readQuantity: dimension must be one of ${Object.keys(DIMENSIONS).join(', ')}; got ${describeValue(dimension)}`);
  let q: Quantity;
  const given = input as unknown;
  if (given instanceof Quantity) {
    q = given;
  } else if (typeof given === 'string') {
    const [value, unit] = splitQuantityText(given);
    const u = resolveUnit(unit);
    let fits = true;
    try {
      asDimension(u, dimension, parameter);
    } catch (e) {
      if (!(e instanceof HeatstateError)) throw e;
      fits = false;
    }
    if (!fits) {
      throw new DimensionError(dimension, u.dimension, `${parameter} must be a ${describe(dimension)}; got ${previewText(given.trim())} (a ${describe(u.dimension)})`, parameter);
    }
    q = build(value, unit, undefined, dimension, parameter);
  } else if (typeof given === 'number') {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} = ${given} has no unit; pass a quantity or text such as "${exampleOf(dimension)}"`);
  } else {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a quantity or unit text such as "${exampleOf(dimension)}"; got ${describeValue(given)}`);
  }
  if (q.dimension !== dimension) {
    throw new DimensionError(dimension, q.dimension, `${parameter} must be a ${describe(dimension)}; got ${q.toString()} (a ${describe(q.dimension)})`, parameter);
  }
  if (!Number.isFinite(q.si)) throw new InvalidInputError('input.not-finite', parameter, `${parameter} must be finite; got ${q.toString()}`);
  return q.si;
}

function exampleOf(dimension: Dimension): string {
  return `1 ${SI_UNIT[dimension]}`;
}
