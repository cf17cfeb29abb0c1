/**
 * `heatstate/humid-air`: psychrometrics. Moist-air states from any two of T, Twb, Tdp, RH, W, h at a
 * total pressure or altitude, air-conditioning processes with their loads, and a batch API.
 *
 * The model is the ideal-mixture relations of the ASHRAE Handbook—Fundamentals (SI) ch. 1, with the
 * saturation pressure of pure water over liquid from IAPWS-IF97 (through water's SI core) and over
 * ice from IAPWS R14-08(2011); −100 °C to 200 °C, 0 < p ≤ 1 MPa. Results are engineering estimates:
 * defer to local codes and licensed professionals for design decisions.
 *
 * The documented facade is {@link humidAir}. The plain-number SI core is the low-level entry
 * `heatstate/humid-air/core`.
 *
 * @packageDocumentation
 */
import { coolingCoil, evaporativeHumidifier, heat, mix, steamHumidifier } from './processes.js';
import { humidAirState, pressureAtAltitude } from './state.js';

export { humidAirState, pressureAtAltitude } from './state.js';
export type { HumidAirInputs, HumidAirPressure, HumidAirStateInput, HumidAirInputsLoose, HumidAirStateKey, HumidAirResult } from './state.js';
export { readRelativeHumidity, readHumidityRatio } from './inputs.js';
export type { RelativeHumidityInput, HumidityRatioInput, Checked } from './inputs.js';
export { mix, heat, coolingCoil, steamHumidifier, evaporativeHumidifier } from './processes.js';
export type {
  AirFlowInput,
  AirStream,
  AirStreamLoose,
  ProcessResult,
  SensibleInput,
  SensibleInputLoose,
  CoolingCoilInput,
  CoolingCoilInputLoose,
  SteamHumidifierInput,
  SteamHumidifierInputLoose,
  EvaporativeHumidifierInput,
  EvaporativeHumidifierInputLoose,
} from './processes.js';
export { humidAirBatch, HUMID_AIR_BATCH_STATUS } from './batch.js';
export type { HumidAirBatchProperty, HumidAirBatchInputs, HumidAirBatchResult, HumidAirBatchOut } from './batch.js';

export { HeatstateError, InvalidInputError, OutOfRangeError, ConvergenceError, DimensionError, UnitError, ResultError } from '../errors.js';
export { Status } from '../core/status.js';
export { safe } from '../core/safe.js';
export type { SafeResult } from '../core/safe.js';
export type { StatusCode } from '../core/status.js';
export { quantity, temperatureDifference, Quantity } from '../units/quantity.js';
export type { QuantityLike, QuantityInput } from '../units/quantity.js';

/**
 * Psychrometrics: `humidAir.state({ T: '30 °C', RH: 0.5 })`, processes (`mix`, `heat`,
 * `coolingCoil`, `steamHumidifier`, `evaporativeHumidifier`) and `pressureAtAltitude`.
 * @example
 * ```ts
 * humidAir.state({ T: '30 °C', RH: '50 %', p: '101.325 kPa' }).h.in('kJ/kg');   //=> 64.217... (per kg dry air)
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
