/**
 * Real fluids on reference equations of state in the Helmholtz energy: the facade `fluid(name)`
 * and the SI core (model, context, properties at (T, ρ), saturation, flashes).
 *
 * @module
 */
export { fluid, fluidNames, type Fluid, type FluidPair, type FluidPhase, type FluidSaturationResult, type FluidStateResult, type SaturatedPhase } from './fluid.js';
export { FLUID_PHASE, FluidContext, FluidModel, FluidState, propertiesAt, type IdealKernel, type ResidualKernel } from './model.js';
export { saturationAtP, saturationAtT } from './saturation.js';
export { stateFromHS, stateFromPH, stateFromPS, stateFromPT, stateFromPX, stateFromTRho, stateFromTV, stateFromTX } from './flash.js';
export { fluidModel } from './catalogue.js';
export type { FluidDefinition, FluidSource } from './definition.js';
