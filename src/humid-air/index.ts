/**
 * `heatstate/humid-air`: psychrometrics. Moist-air states from any two of T, Twb, Tdp, RH, W, h at a
 * total pressure or altitude, air-conditioning processes with their loads, and a batch API.
 *
 * Relations of the ASHRAE Handbook—Fundamentals (SI) ch. 1; saturation over liquid from IAPWS-IF97
 * (through water's SI core), over ice from IAPWS R14-08(2011); the default model adds Buck's (1981)
 * enhancement factor. Results are engineering estimates: defer to local codes and licensed
 * professionals for design decisions.
 *
 * The documented facade is {@link humidAir}. The plain-number SI core is exported for hot loops.
 *
 * @packageDocumentation
 */
import { humidAirState, pressureAtAltitude } from './state.js';
import { coolingCoil, evaporativeHumidifier, heat, mix, steamHumidifier } from './processes.js';

export {
  humidAirState,
  pressureAtAltitude,
  readRelativeHumidity,
  toGramsPerKilogram,
  fromGramsPerKilogram,
  toGrainsPerPound,
  fromGrainsPerPound,
} from './state.js';
export type { HumidAirModel, HumidAirInputs, HumidAirOptions, HumidAirStateInput, HumidAirResult, RelativeHumidityInput } from './state.js';
export { mix, heat, coolingCoil, steamHumidifier, evaporativeHumidifier } from './processes.js';
export type { AirStream, ProcessResult, SensibleInput, CoolingCoilInput, SteamHumidifierInput, EvaporativeHumidifierInput } from './processes.js';
export { humidAirBatch, HUMID_AIR_BATCH_STATUS } from './batch.js';
export type { HumidAirBatchProperty, HumidAirBatchInputs, HumidAirBatchResult } from './batch.js';

// the SI core
export { HumidAirState, humidAirState as humidAirStateSI, PAIR, REASON, T_MIN, T_MAX, P_MAX, saturationHumidityRatioAt } from './core/state.js';
export {
  MODEL,
  waterSaturationPressure,
  sublimationPressure,
  enhancementFactor,
  enhancementInRange,
  saturationTemperatureAt,
  ENHANCED_T_MIN,
  ENHANCED_T_MAX,
  ENHANCED_P_MIN,
  ENHANCED_P_MAX,
} from './core/saturation.js';
export {
  humidityRatioFromVaporPressure,
  vaporPressureFromHumidityRatio,
  moistAirEnthalpy,
  moistAirVolume,
  temperatureFromEnthalpy,
  humidityRatioFromWetBulb,
  saturatorWaterEnthalpy,
} from './core/relations.js';
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
} from './core/processes.js';
export { standardAtmospherePressure, altitudePressureStatus, ALTITUDE_MIN, ALTITUDE_MAX } from './core/altitude.js';
export { HeatstateError, InvalidInputError, OutOfRangeError, ConvergenceError, DimensionError, UnitError } from '../errors.js';

/**
 * Psychrometrics: `humidAir.state({ T: '30 °C', RH: 0.5 })`, processes (`mix`, `heat`,
 * `coolingCoil`, `steamHumidifier`, `evaporativeHumidifier`) and `pressureAtAltitude`.
 * @example
 * ```ts
 * humidAir.state({ T: '30 °C', RH: '50 %', p: '101.325 kPa' }).h.in('kJ/kg');   //=> 64.373 (per kg dry air)
 * ```
 */
export const humidAir = {
  state: humidAirState,
  mix,
  heat,
  coolingCoil,
  steamHumidifier,
  evaporativeHumidifier,
  pressureAtAltitude,
} as const;
