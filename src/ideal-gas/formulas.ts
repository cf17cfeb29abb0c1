/**
 * The property formulas of an ideal gas on a mass or molar basis, shared by the facade and the batch
 * API so that both give the same numbers bit for bit. `scale` is R̄ (molar basis) or R = R̄/M (mass
 * basis); the model gives cp°/R̄, h°/(R̄T) and s°/R̄.
 *
 * @module
 */
import { REFERENCE_TEMPERATURE_K, STANDARD_STATE_PRESSURE_PA } from '../chem/constants.js';
import type { IdealGasModel } from './model.js';

export function cpOf(core: IdealGasModel, scale: number, T: number): number {
  return scale * core.cpR(T);
}
export function cvOf(core: IdealGasModel, scale: number, T: number): number {
  return scale * (core.cpR(T) - 1);
}
export function kOf(core: IdealGasModel, T: number): number {
  const cpR = core.cpR(T);
  return cpR / (cpR - 1);
}
export function hOf(core: IdealGasModel, scale: number, T: number): number {
  return scale * T * core.hRT(T);
}
export function hSensibleOf(core: IdealGasModel, scale: number, T: number): number {
  return hOf(core, scale, T) - hOf(core, scale, REFERENCE_TEMPERATURE_K);
}
export function uOf(core: IdealGasModel, scale: number, T: number): number {
  return scale * T * (core.hRT(T) - 1);
}
export function sOf(core: IdealGasModel, scale: number, T: number, p: number): number {
  return scale * (core.sR(T) - Math.log(p / STANDARD_STATE_PRESSURE_PA));
}
export function sStandardOf(core: IdealGasModel, scale: number, T: number): number {
  return scale * core.sR(T);
}
