/**
 * `Quantity`: a number with a unit and a dimension, checked by the compiler and at run time.
 *
 * @module
 */
import { DimensionError, InvalidInputError, OutOfRangeError, UnitError } from '../errors.js';
import { SI_UNIT, type Dimension } from './dimensions.js';
import { DEFAULT_AMBIENT_PA, fromSI, resolveUnit, toSI, type ResolvedUnit } from './registry.js';
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

/** A `Quantity` of dimension `D`, or unit text of that dimension. Accepted wherever heatstate takes an input. */
export type QuantityLike<D extends Dimension> = Quantity<D> | QuantityText<D>;

/** The dimension that unit text such as `"500 psia"` has, as far as the compiler can tell. */
export type DimensionOfText<T extends string> = T extends `${string} ${infer U}`
  ? U extends KnownUnit
    ? DimensionOfUnit<U>
    : Dimension
  : Dimension;

const NUMBER_AND_UNIT = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*?)\s*$/;

function describe(dimension: Dimension): string {
  return dimension.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`);
}

function ambientPa(options: QuantityOptions | undefined, fallback: number): number {
  if (options?.ambient === undefined) return fallback;
  return readQuantity(options.ambient, 'pressure', 'ambient');
}

/**
 * A value with a unit. The value is held both as given (`value`, in `unit`) and in SI (`si`),
 * so reading it back in the unit it was given in is exact.
 *
 * @example
 * ```ts
 * const p = quantity(500, 'psia');
 * p.in('kPa');            //=> 3447.3786465841806
 * quantity('50 °F').in('K');                 //=> 283.15
 * temperatureDifference(50, '°F').in('K');   //=> 27.77777777777778 (a rise, not a temperature)
 * quantity('14.7 psig').in('psia');          //=> 29.39594... (ambient: standard atmosphere)
 * ```
 */
export class Quantity<D extends Dimension = Dimension> {
  /** The dimension, for example `'pressure'`. */
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

  /** @internal Use {@link quantity} or {@link Quantity.fromSI}. */
  constructor(dimension: D, si: number, value: number, unit: string, ambient: number, extrapolated = false) {
    this.dimension = dimension;
    this.si = si;
    this.value = value;
    this.unit = unit;
    this.ambientPa = ambient;
    this.extrapolated = extrapolated;
  }

  /**
   * Wraps an SI value (as the SI core returns it) in a quantity, shown in `unit` (default: the SI unit).
   * Checks that the value is finite and that `unit` has dimension `dimension`.
   */
  static fromSI<D extends Dimension>(si: number, dimension: D, unit?: string, extrapolated = false): Quantity<D> {
    if (!Number.isFinite(si)) throw new InvalidInputError('input.not-finite', describe(dimension), `${describe(dimension)} must be a finite number; got ${si}`);
    const u = unit ?? SI_UNIT[dimension];
    if (unit === undefined) return new Quantity(dimension, si, si, u, DEFAULT_AMBIENT_PA, extrapolated);
    const resolved = expectDimension(resolveUnit(u), dimension, 'unit');
    return new Quantity(dimension, si, fromSI(si, resolved, DEFAULT_AMBIENT_PA), u, DEFAULT_AMBIENT_PA, extrapolated);
  }

  /**
   * The value in another unit of the same dimension.
   * Throws {@link DimensionError} if `unit` has another dimension, {@link UnitError} if it is unknown.
   */
  in(unit: TargetUnitOf<D> | (string & {}), options?: QuantityOptions): number {
    if (unit === this.unit && options === undefined) return this.value;
    const resolved = expectDimension(resolveUnit(unit), this.dimension, 'unit');
    return fromSI(this.si, resolved, ambientPa(options, this.ambientPa));
  }

  /** The same quantity held in another unit. */
  to(unit: TargetUnitOf<D> | (string & {}), options?: QuantityOptions): Quantity<D> {
    const amb = ambientPa(options, this.ambientPa);
    const resolved = expectDimension(resolveUnit(unit), this.dimension, 'unit');
    return new Quantity(this.dimension, this.si, fromSI(this.si, resolved, amb), unit, amb, this.extrapolated);
  }

  /**
   * Narrows a quantity of unknown dimension (from run-time text) to `dimension`,
   * or throws {@link DimensionError}.
   */
  as<E extends Dimension>(dimension: E): Quantity<E> {
    if ((this.dimension as Dimension) !== dimension) {
      throw new DimensionError(dimension, this.dimension, `expected a ${describe(dimension)}, got ${this.toString()} (a ${describe(this.dimension)})`);
    }
    return this as unknown as Quantity<E>;
  }

  /**
   * Adds a quantity. A temperature plus a temperature difference is a temperature;
   * two temperatures cannot be added. Otherwise both must have the same dimension.
   * The result is held in this quantity's unit.
   */
  plus(other: D extends 'temperature' ? Quantity<'temperatureDifference'> : Quantity<D>): Quantity<D> {
    const o = other as Quantity;
    const ok = this.dimension === 'temperature' ? o.dimension === 'temperatureDifference' : o.dimension === this.dimension;
    if (!ok) throw new DimensionError(this.dimension === 'temperature' ? 'temperatureDifference' : this.dimension, o.dimension, `cannot add ${o.toString()} to ${this.toString()}`);
    return this.withSI(this.si + o.si);
  }

  /**
   * Subtracts a quantity. Temperature minus temperature is a temperature difference;
   * temperature minus a difference is a temperature. Otherwise dimensions must match.
   */
  minus<O extends Quantity>(other: O): D extends 'temperature' ? (O extends Quantity<'temperature'> ? Quantity<'temperatureDifference'> : Quantity<'temperature'>) : Quantity<D> {
    const o = other as Quantity;
    type R = D extends 'temperature' ? (O extends Quantity<'temperature'> ? Quantity<'temperatureDifference'> : Quantity<'temperature'>) : Quantity<D>;
    if (this.dimension === 'temperature' && o.dimension === 'temperature') {
      const diff = this.si - o.si;
      const unit = resolveUnit(this.unit);
      return new Quantity('temperatureDifference', diff, diff / unit.factor, `Δ${this.unit}`, this.ambientPa) as unknown as R;
    }
    const ok = this.dimension === 'temperature' ? o.dimension === 'temperatureDifference' : o.dimension === this.dimension;
    if (!ok) throw new DimensionError(this.dimension, o.dimension, `cannot subtract ${o.toString()} from ${this.toString()}`);
    return this.withSI(this.si - o.si) as unknown as R;
  }

  private withSI(si: number): Quantity<D> {
    const resolved = resolveUnit(this.unit);
    return new Quantity(this.dimension, si, fromSI(si, resolved, this.ambientPa), this.unit, this.ambientPa);
  }

  /** `"500 psia"`; with `digits`, the value is shown to that many significant digits. */
  toString(digits?: number): string {
    const v = digits === undefined ? String(this.value) : String(Number(this.value.toPrecision(digits)));
    return this.unit === '1' ? v : `${v} ${this.unit}`;
  }

  /** JSON form: `{ value, unit, dimension }`. */
  toJSON(): { value: number; unit: string; dimension: D } {
    return { value: this.value, unit: this.unit, dimension: this.dimension };
  }
}

function expectDimension(u: ResolvedUnit, dimension: Dimension, parameter: string): ResolvedUnit {
  if (u.dimension === dimension) return u;
  // a temperature difference may be expressed in a bare scale: a rise of 10 °F
  if (dimension === 'temperatureDifference' && u.kind === 'temperature') {
    return { ...u, kind: 'difference', dimension: 'temperatureDifference', offset: 0 };
  }
  throw new DimensionError(dimension, u.dimension, `"${u.text}" is a unit of ${describe(u.dimension)}, but a ${describe(dimension)} is expected here`, parameter);
}

function build(value: number, unit: string, options: QuantityOptions | undefined, forced?: Dimension): Quantity {
  if (!Number.isFinite(value)) {
    throw new InvalidInputError('input.not-finite', 'value', `a quantity needs a finite number; got ${value} ${unit}`);
  }
  let resolved = resolveUnit(unit);
  if (forced !== undefined) resolved = expectDimension(resolved, forced, 'unit');
  const amb = ambientPa(options, DEFAULT_AMBIENT_PA);
  const si = toSI(value, resolved, amb);
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

/** Splits `"500 psia"` into number and unit, or throws {@link UnitError}. */
function splitText(text: string): [number, string] {
  const m = NUMBER_AND_UNIT.exec(text);
  if (!m) throw new UnitError('unit.syntax', text, `cannot read "${text}" as a quantity: expected a number followed by a unit, like "500 psia" or "300 °F"`);
  return [Number(m[1]), m[2] === '' ? '1' : m[2]!];
}

/**
 * Makes a quantity from a number and a unit, or from text such as `"500 psia"`.
 *
 * Units: SI with prefixes, US customary, and bar, atm, mmHg, inHg, kcal, kWh; compound units
 * as written in data sheets (`kJ/(kg·K)`, `kJ/kg/K`, `Btu/(lbm·°R)`, `ft³/lbm`). Factors are the
 * exact NIST SP 811 definitions. `°F`, `°C` alone are absolute temperatures; prefix `Δ` for a
 * difference (`Δ°F`). Gauge units (`psig`, `barg`, `kPag`) add the ambient pressure
 * (default 101 325 Pa; set `options.ambient`).
 *
 * @throws {@link UnitError} unknown unit or unreadable text
 * @throws {@link InvalidInputError} NaN or infinite value
 * @throws {@link OutOfRangeError} a temperature below absolute zero, a gauge pressure below vacuum
 *
 * @example
 * ```ts
 * quantity(500, 'psia').in('MPa');      //=> 3.4473786465841806
 * quantity('300 °F').in('K');           //=> 422.0388888888889
 * quantity('2.5 kJ/kg/K').in('Btu/(lbm·°R)'); //=> 0.5971147415687399
 * quantity('-500 °F');                  // throws OutOfRangeError: below absolute zero
 * ```
 */
export function quantity<U extends KnownUnit>(value: number, unit: U, options?: QuantityOptions): Quantity<DimensionOfUnit<U>>;
export function quantity<T extends string>(text: T, options?: QuantityOptions): Quantity<DimensionOfText<T>>;
export function quantity(value: number, unit: string, options?: QuantityOptions): Quantity;
export function quantity(a: number | string, b?: string | QuantityOptions, c?: QuantityOptions): Quantity {
  if (typeof a === 'string') {
    const [value, unit] = splitText(a);
    return build(value, unit, b as QuantityOptions | undefined);
  }
  if (typeof b !== 'string') throw new InvalidInputError('input.invalid', 'unit', `quantity(${a}, …) needs a unit string as its second argument`);
  return build(a, b, c);
}

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
export function temperatureDifference(value: number, unit: UnitOf<'temperature'> | UnitOf<'temperatureDifference'>): Quantity<'temperatureDifference'> {
  return build(value, unit, undefined, 'temperatureDifference') as Quantity<'temperatureDifference'>;
}

/**
 * Reads an input of an expected dimension and returns its SI value: the single entry point of
 * every facade function. Accepts a `Quantity` or unit text. A bare number is refused, since
 * its unit would be a guess.
 *
 * @param input the caller's value
 * @param dimension what it must be
 * @param parameter its name in the caller's API, for messages (`T`, `p`, `T1`)
 * @throws {@link DimensionError} wrong dimension; {@link InvalidInputError} NaN, infinity, bare number
 * @example
 * ```ts
 * readQuantity('14.7 psig', 'pressure', 'p');   //=> 202677.9 (Pa)
 * readQuantity('300 K', 'pressure', 'p');      // throws DimensionError: p must be a pressure
 * ```
 */
export function readQuantity<D extends Dimension>(input: QuantityLike<D>, dimension: D, parameter: string): number {
  let q: Quantity;
  if (input instanceof Quantity) {
    q = input;
  } else if (typeof input === 'string') {
    const [value, unit] = splitText(input);
    q = build(value, unit, undefined, dimension === 'temperatureDifference' ? dimension : undefined);
  } else if (typeof input === 'number') {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} = ${input} has no unit; pass a quantity or text such as "${exampleOf(dimension)}"`);
  } else {
    throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a quantity or unit text such as "${exampleOf(dimension)}"; got ${String(input)}`);
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
