/**
 * `heatstate/water/if97`: the low-level IAPWS-IF97 SI core, for hot loops and for building on.
 *
 * Plain SI numbers (Pa, K, J/kg, J/(kg·K), m³/kg, kg/m³, m/s); caller-owned output objects
 * ({@link WaterProperties}, {@link WaterState}); every solver returns a {@link Status} code instead
 * of throwing. The region functions evaluate the basic equations of IAPWS R7-97(2012) directly,
 * without range checks: callers check first (or use the solvers, which do). The documented facade
 * with units and typed errors is `heatstate/water`.
 *
 * @packageDocumentation
 */
export { Status, statusName } from '../../core/status.js';
export type { StatusCode } from '../../core/status.js';
export { WaterProperties } from './properties.js';
export { WaterState, PHASE } from './water-state.js';
export { SolverContext, defaultContext } from './context.js';
export { REGIONS, REGION_1, REGION_2, REGION_3, REGION_5, evaluateForward } from './regions.js';
export type { GibbsRegion, HelmholtzRegion, RegionBounds } from './regions.js';
export { regionOfPT, phaseOf } from './classify.js';
export { stateFromPT, region3Density, DensityResult } from './pt.js';
export { region3DensityAt } from './region3-density.js';
export { stateFromPH } from './ph.js';
export { stateFromPS } from './ps.js';
export { stateFromHS } from './hs.js';
export { stateFromTX, stateFromPX } from './quality.js';
export { stateFromTV } from './tv.js';
export { saturationAtT, saturationAtP, saturationLinePressure, saturationTemperatureOnLine, P_SAT_MIN, P_SAT_13 } from './saturation.js';
export { region1, region1Enthalpy } from './region1.js';
export { region2, region2Enthalpy, region2Metastable } from './region2.js';
export { region3, region3Pressure, region3Derivatives } from './region3.js';
export { region5 } from './region5.js';
// the compensated (double-double) basic equations: within 0.5 ulp of the exact equations, 20-40× the cost (docs/guide/accuracy.md)
export { region1Compensated, region2Compensated, region3Compensated, region5Compensated } from './compensated.js';
// a solved state re-evaluated by them in place (what `water.state(pair, { accuracy: 'compensated' })` does after its solve)
export { compensateState, HELD, type Held } from './compensated-state.js';
export { saturationPressure, saturationTemperature } from './region4.js';
export { b23Pressure, b23Temperature } from './b23.js';
export { region1TemperaturePH, region2TemperaturePH, b2bcEnthalpy, b2bcPressure } from './backward-ph.js';
export { region1TemperaturePS, region2TemperaturePS } from './backward-ps.js';
export { region1PressureHS, region2PressureHS } from './backward-hs.js';
export { region3aPressureHS, saturatedLiquidEnthalpyHS, saturatedVaporEnthalpyHS, b13EnthalpyHS, b23TemperatureHS, saturationTemperatureHS } from './backward-hs-region3.js';
export { region3TemperaturePH, region3TemperaturePS, region3VolumePH, region3VolumePS } from './backward-region3.js';
export * from './constants.js';
