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
import { previewText } from './expression.js';
import { build, readQuantity } from './construct.js';
import { splitQuantityText } from './text.js';

export { QUANTITY_TEXT_MAX_LENGTH, splitQuantityText } from './text.js';
import { asDimension, DEFAULT_AMBIENT_PA, fromSI, resolveExpression, resolveUnit, toSI, type ResolvedUnit } from './registry.js';
import type { DimensionOfUnit, KnownUnit, TargetUnitOf, UnitOf } from './spellings.js';

export type { AnyDimension, DerivedDimension, ProductOf, QuotientOf, ScalarDimension } from './arithmetic.js';

import type { QuantityOf, TargetOf, QuantityOptions, QuantityText, QuantityLike, QuantityInput, UnitInput, DimensionOfText, Tolerance, ScaleFactor, ProductAllowed, QuotientAllowed, MinusOperand, MinusResult, Operand, CompareOperand } from './quantity-types.js';
export type { QuantityOf, QuantityOptions, QuantityText, QuantityLike, QuantityInput, UnitInput, DimensionOfText, Tolerance } from './quantity-types.js';

/** A dimension's name in words, for messages. */
export function describe(dimension: AnyDimension): string {
  return dimension === 'derived' ? 'derived quantity' : dimension.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`);
}

/** The ambient pressure of the options, or `fallback`. */
export function ambientPa(options: QuantityOptions | undefined, fallback: number): number {
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

export { quantity, temperatureDifference, readQuantity } from './construct.js';
