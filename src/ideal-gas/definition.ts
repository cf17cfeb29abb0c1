/**
 * Building an ideal gas from a user definition (NASA polynomial constants or a constant cp) and
 * applying the model options (`cp`, `model: 'constant-cp'`, `referenceT`). Every problem of a
 * definition is reported by path in one DefinitionError.
 *
 * @module
 */
import { MOLAR_GAS_CONSTANT, REFERENCE_TEMPERATURE_K } from '../chem/constants.js';
import { DefinitionError, HeatstateError, OutOfRangeError, type DefinitionIssue } from '../errors.js';
import { readQuantity } from '../units/quantity.js';
import type { GasSource, IdealGasDefinition, IdealGasOptions } from './gas.js';
import { ConstantCpModel, constantCpFrom, fromSevenCoefficients, NasaPolynomialModel, type IdealGasModel } from './model.js';

/** A gas before the facade wraps it: its name, formula, source and SI core. */
export interface Built {
  readonly name: string;
  readonly formula: string | undefined;
  readonly source: GasSource;
  readonly core: IdealGasModel;
  readonly model: 'polynomial' | 'constant-cp';
}

/** The SI core of a user definition. @throws {@link DefinitionError} naming every bad field */
export function fromDefinition(def: IdealGasDefinition): Built {
  const issues: DefinitionIssue[] = [];
  const guard = <T>(path: (string | number)[], f: () => T): T | undefined => {
    try {
      return f();
    } catch (e) {
      issues.push({ path, message: e instanceof HeatstateError ? e.message : String(e) });
      return undefined;
    }
  };
  if (typeof def !== 'object' || def === null) throw new DefinitionError('ideal-gas definition', [{ path: [], message: 'expected an object' }]);
  if (typeof def.name !== 'string' || def.name === '') issues.push({ path: ['name'], message: 'a name is required' });
  let M: number | undefined;
  if (def.M !== undefined) M = guard(['M'], () => readQuantity(def.M, 'molarMass', 'M'));
  else issues.push({ path: ['M'], message: "a molar mass M is required (from a formula: M: molarMass('C8H18'))" });
  if (M !== undefined && !(M > 0)) issues.push({ path: ['M'], message: 'molar mass must be positive' });

  let core: IdealGasModel | undefined;
  let model: Built['model'] = 'polynomial';
  if ('nasa' in def && def.nasa !== undefined) {
    const { T, low, high } = def.nasa;
    if (!T || !(T.min > 0 && T.min < T.mid && T.mid <= T.max)) issues.push({ path: ['nasa', 'T'], message: 'need 0 < T.min < T.mid ≤ T.max (K)' });
    for (const [key, arr] of [['low', low], ['high', high]] as const) {
      if (!Array.isArray(arr) || (arr.length !== 7 && arr.length !== 9)) issues.push({ path: ['nasa', key], message: 'need 9 constants (a1..a7, b1, b2) or 7 coefficients (older form)' });
      else arr.forEach((a, i) => Number.isFinite(a) || issues.push({ path: ['nasa', key, i], message: `constant ${i + 1} must be a finite number` }));
    }
    if (issues.length === 0 && low.length !== high.length) issues.push({ path: ['nasa'], message: 'low and high must use the same form (both 9 or both 7 numbers)' });
    if (issues.length === 0) {
      const nine = (a: readonly number[]) => (a.length === 7 ? fromSevenCoefficients(a) : a);
      const m = new NasaPolynomialModel(M!, T.min, T.mid, T.max, nine(low), nine(high));
      for (let i = 0; i <= 50; i++) {
        const t = T.min + ((T.max - T.min) * i) / 50;
        if (!(m.cpR(t) > 1)) {
          issues.push({ path: ['nasa'], message: `cp°/R must exceed 1 (so that cv > 0); it is ${m.cpR(t)} at ${t} K` });
          break;
        }
      }
      core = m;
    }
  } else if ('cp' in def && def.cp !== undefined) {
    model = 'constant-cp';
    const cp = guard(['cp'], () => readQuantity(def.cp, 'specificHeat', 'cp'));
    const Tmin = def.T ? guard(['T', 'min'], () => readQuantity(def.T!.min, 'temperature', 'T.min')) : Number.MIN_VALUE;
    const Tmax = def.T ? guard(['T', 'max'], () => readQuantity(def.T!.max, 'temperature', 'T.max')) : Infinity;
    if (cp !== undefined && M !== undefined && !(cp * M > MOLAR_GAS_CONSTANT)) issues.push({ path: ['cp'], message: `cp must exceed R = ${MOLAR_GAS_CONSTANT / M} J/(kg·K) so that cv > 0` });
    if (Tmin !== undefined && Tmax !== undefined && !(Tmin < Tmax)) issues.push({ path: ['T'], message: 'T.min must be below T.max' });
    if (issues.length === 0) core = new ConstantCpModel(M!, (cp! * M!) / MOLAR_GAS_CONSTANT, REFERENCE_TEMPERATURE_K, 0, 0, Tmin!, Tmax!);
  } else {
    issues.push({ path: [], message: 'give either nasa polynomial constants or a constant cp' });
  }
  if (issues.length > 0 || !core) throw new DefinitionError(`ideal-gas definition${typeof def.name === 'string' ? ` "${def.name}"` : ''}`, issues);
  const summary = def.source ?? 'user definition';
  return { name: def.name, formula: def.formula, source: { title: summary, basis: 'user', uncertainty: 'estimate: not stated (a user definition)', summary }, core, model };
}

/** The gas with the model options applied (a constant cp, frozen or given). */
export function applyOptions(built: Built, options: IdealGasOptions | undefined): Built {
  if (options?.cp !== undefined) {
    const cp = readQuantity(options.cp, 'specificHeat', 'cp');
    const core = built.core;
    if (!(cp > core.R)) throw new OutOfRangeError({ quantity: 'cp', value: cp, min: core.R, max: Infinity, unit: 'J/(kg·K)', scope: `${built.name} (cp must exceed R)` });
    const T0 = REFERENCE_TEMPERATURE_K;
    return { ...built, model: 'constant-cp', core: new ConstantCpModel(core.M, cp / core.R, T0, core.hRT(T0) * T0, core.sR(T0), core.Tmin, core.Tmax) };
  }
  if (options?.model === 'constant-cp') {
    const T0 = options.referenceT === undefined ? REFERENCE_TEMPERATURE_K : readQuantity(options.referenceT, 'temperature', 'referenceT');
    if (T0 < built.core.Tmin || T0 > built.core.Tmax) {
      throw new OutOfRangeError({ quantity: 'referenceT', value: T0, min: built.core.Tmin, max: built.core.Tmax, unit: 'K', scope: `the data for ${built.name}` });
    }
    return { ...built, model: 'constant-cp', core: constantCpFrom(built.core, T0) };
  }
  return built;
}

