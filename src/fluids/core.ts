/**
 * `heatstate/fluids/core`: the plain-number SI core of the Helmholtz-energy engine (K, Pa, kg/m³,
 * J/kg, J/(kg·K)): fluid models, their context, properties at (T, ρ), saturation and flashes, on the
 * library's model contract (caller-owned outputs, a status per call). The facade is `heatstate/fluids`.
 *
 * @packageDocumentation
 */
export { Status, statusName } from '../core/status.js';
export type { StatusCode } from '../core/status.js';
export { FLUID_PHASE, FluidContext, FluidModel, FluidState, propertiesAt, type IdealKernel, type ResidualKernel } from './model.js';
export { saturationAtP, saturationAtT } from './saturation.js';
export { stateFromHS, stateFromPH, stateFromPS, stateFromPT, stateFromPX, stateFromTRho, stateFromTV, stateFromTX } from './flash.js';
export { fluidModel } from './catalogue.js';
export type { FluidDefinition, FluidSource } from './definition.js';
