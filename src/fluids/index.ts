/**
 * `heatstate/fluids`: real fluids from reference equations of state in the Helmholtz energy: water by
 * IAPWS-95 and nitrogen by Span et al. (2000); fluidBatch over typed arrays; saturationTable through
 * the typed table layer. The facade is {@link fluid}; the SI core (model, context, properties at
 * (T, ρ), saturation, flashes) is the low-level entry `heatstate/fluids/core`.
 *
 * Results are engineering estimates: for pressure equipment, refrigerating systems and steam, defer
 * to the applicable codes and to licensed professionals.
 *
 * @packageDocumentation
 */
export {
  fluid,
  fluidNames,
  type Fluid,
  type FluidPair,
  type FluidPairInput,
  type FluidPairCheck,
  type FluidPhase,
  type FluidRange,
  type FluidSaturationCheck,
  type FluidSaturationInput,
  type FluidSaturationResult,
  type FluidStateResult,
  type FluidSaturatedPhase,
} from './fluid.js';
export { fluidBatch, type FluidBatchInputs, type FluidBatchProperty } from './batch.js';
export { saturationTable, type FluidSaturationColumn, type SaturationTableOptions } from './tables.js';
export type { FluidSource } from './definition.js';
export { HeatstateError, InvalidInputError, OutOfRangeError, ConvergenceError, DimensionError, UnitError, UnknownNameError, UnavailablePropertyError, ResultError } from '../errors.js';
export { Status } from '../core/status.js';
export { safe } from '../core/safe.js';
export type { SafeResult } from '../core/safe.js';
export type { StatusCode } from '../core/status.js';
export { quantity, temperatureDifference, Quantity } from '../units/quantity.js';
export type { QuantityInput, QuantityLike } from '../units/quantity.js';
