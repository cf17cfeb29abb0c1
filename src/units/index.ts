/**
 * `heatstate/units`: quantities with units and dimensions, checked by the compiler and at run time.
 *
 * @packageDocumentation
 */
export { Quantity, quantity, temperatureDifference, readQuantity } from './quantity.js';
export type { QuantityLike, QuantityText, QuantityOptions, DimensionOfText } from './quantity.js';
export { DIMENSIONS, SI_UNIT } from './dimensions.js';
export type { Dimension, DimensionVector } from './dimensions.js';
export { UNIT_SPELLINGS } from './spellings.js';
export type { UnitOf, KnownUnit, DimensionOfUnit, TargetUnitOf } from './spellings.js';
export { resolveUnit, DEFAULT_AMBIENT_PA } from './registry.js';
export type { ResolvedUnit, UnitKind } from './registry.js';
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError } from '../errors.js';
