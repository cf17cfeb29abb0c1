/**
 * `heatstate/water`: water and steam by IAPWS-IF97 (IAPWS R7-97(2012)).
 *
 * The documented facade is {@link water}: `water.state(pair)` and `water.saturation({ T } | { p })`.
 * The plain-number SI core (Pa, K, J/kg, J/(kg·K), m³/kg; caller-owned output objects; status codes
 * instead of exceptions) is exported for hot loops.
 *
 * @packageDocumentation
 */
export { water, waterState, waterSaturation } from './state.js';
export type { WaterStateResult, SaturationResult, WaterPair, WaterPhase } from './state.js';
export { waterBatch, WATER_BATCH_STATUS } from './batch.js';
export type { WaterBatchProperty, WaterBatchInputs, WaterBatchResult } from './batch.js';
export { approximateLiquid, compareLiquidProcess, LIQUID_APPROXIMATIONS } from './approximations.js';
export type { LiquidApproximation, LiquidStateInput, ApproximateLiquid, Deviation, ProcessEstimate } from './approximations.js';
export {
  STATUS,
  PHASE,
  WaterState,
  stateFromPT,
  stateFromPH,
  stateFromPS,
  stateFromHS,
  stateFromTV,
  stateFromTX,
  stateFromPX,
  saturationAtT,
  saturationAtP,
  regionOfPT,
  region3Density,
  P_SAT_MIN,
} from './if97/flash.js';
export { WaterProperties } from './if97/properties.js';
export { region1 } from './if97/region1.js';
export { region2, region2Metastable } from './if97/region2.js';
export { region3 } from './if97/region3.js';
export { region5 } from './if97/region5.js';
export { saturationPressure, saturationTemperature } from './if97/region4.js';
export { b23Pressure, b23Temperature } from './if97/b23.js';
export { region1TemperaturePH, region2TemperaturePH, b2bcEnthalpy, b2bcPressure } from './if97/backward-ph.js';
export { region1TemperaturePS, region2TemperaturePS } from './if97/backward-ps.js';
export * from './if97/constants.js';
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError, FormulaError, DefinitionError, ConvergenceError } from '../errors.js';
