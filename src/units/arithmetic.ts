/**
 * The dimensions of products and quotients: a table the compiler reads (so the products
 * engineers write have a known dimension) and the run time reads (so both agree), and a
 * general rule on base-quantity exponents for every other product.
 *
 * Rules, in order (the same at compile time and at run time):
 * 1. A quotient of a dimension by itself is `dimensionless` (T2/T1, Pa/Pa, nu/alpha is not this: see 3).
 * 2. A plain number (`dimensionless`, or a `humidityRatio`, kg per kg) scales: X × scalar = X, X / scalar = X.
 * 3. The table below ({@link PRODUCTS}, {@link QUOTIENTS}; products in either order).
 * 4. Otherwise the exponents are added (subtracted) and the result is the first-listed named
 *    dimension of that shape; a bare temperature shape is a `temperatureDifference` (a product
 *    is linear: it has no offset), and a shape heatstate does not name is `'derived'`, a quantity
 *    that still converts to any unit expression of its shape and reports its SI unit.
 *    The compiler does not follow rule 4: such results are typed `Quantity<AnyDimension>` and
 *    narrowed with `.as(...)`.
 *
 * @module
 */
import { DIMENSIONS, dimensionOfVector, type Dimension, type DimensionVector } from './dimensions.js';

/** The dimension of a quantity from arithmetic whose base-quantity exponents heatstate does not name. */
export type DerivedDimension = 'derived';

/** A named dimension, or `'derived'`. */
export type AnyDimension = Dimension | DerivedDimension;

/** Dimensions that scale another quantity without changing its dimension. */
export type ScalarDimension = 'dimensionless' | 'humidityRatio';

/** Products engineers write, by `'a*b'` (looked up in either order). */
export const PRODUCTS = {
  'massFlow*specificEnergy': 'power',
  'massFlow*time': 'mass',
  'massFlow*specificVolume': 'volumeFlow',
  'volumeFlow*density': 'massFlow',
  'volumeFlow*time': 'volume',
  'volumeFlow*pressure': 'power',
  'power*time': 'energy',
  'mass*specificEnergy': 'energy',
  'mass*specificHeat': 'entropy',
  'mass*specificEntropy': 'entropy',
  'mass*specificVolume': 'volume',
  'volume*density': 'mass',
  'volume*pressure': 'energy',
  'entropy*temperatureDifference': 'energy',
  'entropy*temperature': 'energy',
  'specificHeat*temperatureDifference': 'specificEnergy',
  'specificHeat*temperature': 'specificEnergy',
  'specificEntropy*temperature': 'specificEnergy',
  'specificEntropy*temperatureDifference': 'specificEnergy',
  'molarHeatCapacity*temperature': 'molarEnergy',
  'molarHeatCapacity*temperatureDifference': 'molarEnergy',
  'pressure*specificVolume': 'specificEnergy',
  'pressure*area': 'force',
  'force*length': 'energy',
  'force*velocity': 'power',
  'length*length': 'area',
  'area*length': 'volume',
  'velocity*time': 'length',
  'velocity*area': 'volumeFlow',
  'velocity*velocity': 'specificEnergy',
  'amount*molarMass': 'mass',
  'amount*molarEnergy': 'energy',
  'amount*molarHeatCapacity': 'entropy',
  'specificHeat*molarMass': 'molarHeatCapacity',
  'specificEnergy*molarMass': 'molarEnergy',
  'density*specificVolume': 'dimensionless',
  'density*kinematicViscosity': 'dynamicViscosity',
  'dynamicViscosity*specificVolume': 'kinematicViscosity',
  'surfaceTension*length': 'force',
} as const satisfies Record<string, Dimension>;

/** Quotients engineers write, by `'a/b'`. */
export const QUOTIENTS = {
  'specificEnergy/specificHeat': 'temperatureDifference',
  'specificEnergy/specificEntropy': 'temperatureDifference',
  'specificEnergy/temperatureDifference': 'specificHeat',
  'specificEnergy/temperature': 'specificEntropy',
  'specificEnergy/specificVolume': 'pressure',
  'specificEnergy/pressure': 'specificVolume',
  'energy/temperatureDifference': 'entropy',
  'energy/temperature': 'entropy',
  'energy/entropy': 'temperatureDifference',
  'energy/time': 'power',
  'energy/power': 'time',
  'energy/mass': 'specificEnergy',
  'energy/specificEnergy': 'mass',
  'energy/amount': 'molarEnergy',
  'energy/volume': 'pressure',
  'entropy/mass': 'specificEntropy',
  'entropy/amount': 'molarHeatCapacity',
  'power/massFlow': 'specificEnergy',
  'power/specificEnergy': 'massFlow',
  'power/volumeFlow': 'pressure',
  'power/pressure': 'volumeFlow',
  'mass/volume': 'density',
  'mass/density': 'volume',
  'mass/time': 'massFlow',
  'mass/massFlow': 'time',
  'mass/amount': 'molarMass',
  'mass/molarMass': 'amount',
  'volume/mass': 'specificVolume',
  'volume/time': 'volumeFlow',
  'volume/volumeFlow': 'time',
  'volume/area': 'length',
  'massFlow/density': 'volumeFlow',
  'massFlow/volumeFlow': 'density',
  'volumeFlow/massFlow': 'specificVolume',
  'volumeFlow/area': 'velocity',
  'length/time': 'velocity',
  'length/velocity': 'time',
  'area/length': 'length',
  'force/area': 'pressure',
  'force/length': 'surfaceTension',
  'molarEnergy/molarMass': 'specificEnergy',
  'molarHeatCapacity/molarMass': 'specificHeat',
  'molarEnergy/temperatureDifference': 'molarHeatCapacity',
  'specificHeat/specificEntropy': 'dimensionless',
  'specificEntropy/specificHeat': 'dimensionless',
  'kinematicViscosity/thermalDiffusivity': 'dimensionless',
  'thermalDiffusivity/kinematicViscosity': 'dimensionless',
  'temperature/temperatureDifference': 'dimensionless',
  'temperatureDifference/temperature': 'dimensionless',
  'dynamicViscosity/density': 'kinematicViscosity',
  'dimensionless/density': 'specificVolume',
  'dimensionless/specificVolume': 'density',
} as const satisfies Record<string, Dimension>;

type Products = typeof PRODUCTS;
type Quotients = typeof QUOTIENTS;

type ProductLookup<A extends AnyDimension, B extends AnyDimension> = B extends ScalarDimension
  ? A
  : A extends ScalarDimension
    ? B
    : `${A}*${B}` extends keyof Products
      ? Products[`${A}*${B}`]
      : `${B}*${A}` extends keyof Products
        ? Products[`${B}*${A}`]
        : AnyDimension;

type QuotientLookup<A extends AnyDimension, B extends AnyDimension> = [A] extends [B]
  ? [B] extends [A]
    ? A extends DerivedDimension
      ? AnyDimension
      : 'dimensionless'
    : never
  : B extends ScalarDimension
    ? A
    : `${A}/${B}` extends keyof Quotients
      ? Quotients[`${A}/${B}`]
      : AnyDimension;

/** The dimension of `a × b` as the compiler knows it (`AnyDimension` where it cannot tell). */
export type ProductOf<A extends AnyDimension, B extends AnyDimension> = A extends AnyDimension ? (B extends AnyDimension ? ProductLookup<A, B> : never) : never;

/** The dimension of `a / b` as the compiler knows it (`AnyDimension` where it cannot tell). */
export type QuotientOf<A extends AnyDimension, B extends AnyDimension> = A extends AnyDimension ? (B extends AnyDimension ? QuotientLookup<A, B> : never) : never;

const ZERO: DimensionVector = [0, 0, 0, 0, 0];

/** Exponents of a named dimension (or of a derived quantity, given). */
export function vectorOf(dimension: AnyDimension, derived: DimensionVector | undefined): DimensionVector {
  return dimension === 'derived' ? (derived ?? ZERO) : DIMENSIONS[dimension];
}

function isScalar(d: AnyDimension): boolean {
  return d === 'dimensionless' || d === 'humidityRatio';
}

function named(v: DimensionVector): AnyDimension {
  if (v[0] === 0 && v[1] === 0 && v[2] === 0 && v[3] === 1 && v[4] === 0) return 'temperatureDifference';
  return dimensionOfVector(v) ?? 'derived';
}

function combine(va: DimensionVector, vb: DimensionVector, sign: 1 | -1): DimensionVector {
  return [va[0] + sign * vb[0], va[1] + sign * vb[1], va[2] + sign * vb[2], va[3] + sign * vb[3], va[4] + sign * vb[4]];
}

/** The dimension and exponents of `a × b` (the run-time side of {@link ProductOf}). */
export function productDimension(a: AnyDimension, va: DimensionVector, b: AnyDimension, vb: DimensionVector): [AnyDimension, DimensionVector] {
  const v = combine(va, vb, 1);
  if (isScalar(b)) return [a, va];
  if (isScalar(a)) return [b, vb];
  const hit = (PRODUCTS as Record<string, Dimension>)[`${a}*${b}`] ?? (PRODUCTS as Record<string, Dimension>)[`${b}*${a}`];
  return [hit ?? named(v), v];
}

/** The dimension and exponents of `a / b` (the run-time side of {@link QuotientOf}). */
export function quotientDimension(a: AnyDimension, va: DimensionVector, b: AnyDimension, vb: DimensionVector): [AnyDimension, DimensionVector] {
  const v = combine(va, vb, -1);
  if (a === b && a !== 'derived') return ['dimensionless', ZERO];
  if (isScalar(b)) return [a, va];
  const hit = (QUOTIENTS as Record<string, Dimension>)[`${a}/${b}`];
  return [hit ?? named(v), v];
}

const SUPER: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻' };
const BASE_UNITS = ['kg', 'm', 's', 'K', 'mol'] as const;

function power(symbol: string, e: number): string {
  return e === 1 ? symbol : symbol + [...String(e)].map((c) => SUPER[c]!).join('');
}

/** The SI unit of base-quantity exponents, as unit text the parser reads back: `kg·m²/(s³·K)`. */
export function siUnitOfVector(v: DimensionVector): string {
  const up: string[] = [];
  const down: string[] = [];
  for (let i = 0; i < 5; i++) {
    const e = v[i]!;
    if (e > 0) up.push(power(BASE_UNITS[i]!, e));
    else if (e < 0) down.push(power(BASE_UNITS[i]!, -e));
  }
  if (up.length === 0 && down.length === 0) return '1';
  if (up.length === 0) return v.map((e, i) => (e === 0 ? '' : power(BASE_UNITS[i]!, e))).filter((s) => s !== '').join('·');
  if (down.length === 0) return up.join('·');
  return `${up.join('·')}/${down.length === 1 ? down[0] : `(${down.join('·')})`}`;
}
