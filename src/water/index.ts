/**
 * `heatstate/water`: water and steam by IAPWS-IF97 (IAPWS R7-97(2012)).
 *
 * The documented facade is {@link water}: `water.state(pair)` and `water.saturation({ T } | { p })`,
 * the batch API {@link waterBatch} over typed arrays, and the compressed-liquid shortcuts with their
 * error. The plain-number SI core (region equations, backward equations, solvers by input pair) is
 * the low-level entry `heatstate/water/if97`.
 *
 * Results are engineering estimates: for pressure equipment, boilers and steam systems, defer to
 * the applicable codes and to licensed professionals.
 *
 * @packageDocumentation
 */
export { water, waterState, waterSaturation, waterDeltaH, waterDeltaU, waterDeltaS, WATER_RANGE } from './state.js';
export type { WaterStateResult, WaterStateOptions, WaterAccuracy, SaturationResult, SaturatedPhase, WaterPair, WaterPhase } from './state.js';
export { waterBatch, WATER_BATCH_STATUS } from './batch.js';
export type { WaterBatchProperty, WaterBatchInputs, WaterBatchResult, WaterBatchOptions } from './batch.js';
export { approximateLiquid, compareLiquidProcess, LIQUID_APPROXIMATIONS } from './approximations.js';
export type { LiquidApproximation, LiquidStateInput, ApproximateLiquid, Deviation, ProcessEstimate } from './approximations.js';
export { Status } from '../core/status.js';
export { safe } from '../core/safe.js';
export type { SafeResult } from '../core/safe.js';
export type { StatusCode } from '../core/status.js';
export { quantity, temperatureDifference, Quantity } from '../units/quantity.js';
export type { QuantityLike } from '../units/quantity.js';
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError, UnavailablePropertyError, FormulaError, DefinitionError, ConvergenceError, ResultError } from '../errors.js';
