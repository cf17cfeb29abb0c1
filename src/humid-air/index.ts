/**
 * `heatstate/humid-air`: psychrometrics. Moist-air states from any two of T, Twb, Tdp, RH, W, h at a
 * total pressure or altitude, air-conditioning processes with their loads, and a batch API.
 *
 * Relations of the ASHRAE Handbook—Fundamentals (SI) ch. 1; saturation over liquid from IAPWS-IF97
 * (through water's SI core), over ice from IAPWS R14-08(2011); the default model adds Buck's (1981)
 * enhancement factor. Results are engineering estimates: defer to local codes and licensed
 * professionals for design decisions.
 *
 * The documented facade is {@link humidAir}. The plain-number SI core is the low-level entry
 * `heatstate/humid-air/core`.
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

export { HeatstateError, InvalidInputError, OutOfRangeError, ConvergenceError, DimensionError, UnitError, ResultError } from '../errors.js';
export { Status } from '../core/status.js';
export { safe } from '../core/safe.js';
export type { SafeResult } from '../core/safe.js';
export type { StatusCode } from '../core/status.js';
export { quantity, temperatureDifference, Quantity } from '../units/quantity.js';
export type { QuantityLike } from '../units/quantity.js';

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
