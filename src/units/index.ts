/**
 * `heatstate/units`: quantities with units and dimensions, checked by the compiler and at run time.
 *
 * @packageDocumentation
 */
export { Quantity, BaseQuantity, DerivedQuantity, quantity, temperatureDifference, readQuantity } from './quantity.js';
export type { QuantityLike, QuantityText, QuantityOptions, DimensionOfText, QuantityInput, UnitInput, Tolerance, QuantityOf } from './quantity.js';
export { PRODUCTS, QUOTIENTS } from './arithmetic.js';
export type { AnyDimension, DerivedDimension, ProductOf, QuotientOf, ScalarDimension } from './arithmetic.js';
export { DIMENSIONS, SI_UNIT } from './dimensions.js';
export type { Dimension, DimensionVector } from './dimensions.js';
export { UNIT_SPELLINGS } from './spellings.js';
export type { UnitOf, KnownUnit, DimensionOfUnit, TargetUnitOf } from './spellings.js';
export { resolveUnit, resolveUnitAs, resolveExpression, DEFAULT_AMBIENT_PA } from './registry.js';
export type { ResolvedUnit, ResolvedExpression, UnitKind } from './registry.js';
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError } from '../errors.js';
