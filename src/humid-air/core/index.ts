/**
 * `heatstate/humid-air/core`: the plain-number SI core of the humid-air model (K, Pa, kg/kg,
 * J/kg dry air), on the library's model contract: caller-owned output objects and a status code
 * per call, no throwing. The model is the ideal-mixture relations of the ASHRAE Handbook—
 * Fundamentals ch. 1 with IAPWS-IF97 (liquid) and IAPWS R14-08 (ice) saturation pressures,
 * −100 °C to 200 °C, 0 < p ≤ 1 MPa. The documented facade is `heatstate/humid-air`.
 *
 * @packageDocumentation
 */
export { Status, statusName } from '../../core/status.js';
export type { StatusCode } from '../../core/status.js';
export { HumidAirState, humidAirState as humidAirStateSI, PAIR, REASON, T_MIN, T_MAX, P_MAX, saturationHumidityRatioAt } from './state.js';
export { waterSaturationPressure, sublimationPressure, saturationTemperatureAt, T_ICE } from './saturation.js';
export {
  humidityRatioFromVaporPressure,
  vaporPressureFromHumidityRatio,
  moistAirEnthalpy,
  moistAirVolume,
  temperatureFromEnthalpy,
  humidityRatioFromWetBulb,
  saturatorWaterEnthalpy,
  saturationHumidityRatio,
  saturatorConstant,
} from './relations.js';
export {
  ProcessLoads,
  PROCESS_REASON,
  TARGET,
  mixStreams,
  sensibleToTemperature,
  sensibleByHeat,
  coolingCoilBypass,
  coolingCoilToState,
  steamHumidifier as steamHumidifierSI,
  evaporativeHumidifier as evaporativeHumidifierSI,
} from './processes.js';
export { standardAtmospherePressure, altitudePressureStatus, ALTITUDE_MIN, ALTITUDE_MAX } from './altitude.js';
