/**
 * `heatstate/incompressible`: liquids and solids with cp = cv = c and constant density.
 *
 * @packageDocumentation
 */
import { OutOfRangeError } from '../errors.js';
import { Quantity, readQuantity, type QuantityLike } from '../units/quantity.js';
import { lookupIncompressible, type CatalogueOptions } from './catalogue.js';
import { enthalpyChange, entropyChange, heatCapacityAt, internalEnergyChange, type IncompressibleModel } from './model.js';
import { compileDefinition, type IncompressibleDefinition } from './schema.js';

export { incompressibleNames, incompressibleCatalogue } from './catalogue.js';
export { incompressibleDefinitionSchema, sourceSchema, compileDefinition } from './schema.js';
export type { IncompressibleDefinition } from './schema.js';
export type { CompiledSubstance } from './compile.js';
export { heatCapacityAt, internalEnergyChange, entropyChange, enthalpyChange, densityAt } from './model.js';
export type { IncompressibleModel } from './model.js';

/** A state of an incompressible substance: temperature and (absolute) pressure. */
export interface IncompressibleState {
  readonly T: QuantityLike<'temperature'>;
  readonly p: QuantityLike<'pressure'>;
}

/** An incompressible liquid or solid, with its property functions. Inputs take quantities or unit text. */
export interface IncompressibleSubstance {
  /** The substance's name as catalogued or defined. */
  readonly name: string;
  /** `'liquid'` or `'solid'`. */
  readonly state: 'liquid' | 'solid';
  /** The definition it was built from, with its source. */
  readonly definition: IncompressibleDefinition;
  /** Valid temperature range. */
  readonly range: { readonly T: { readonly min: Quantity<'temperature'>; readonly max: Quantity<'temperature'> } };
  /** Density ρ (constant). */
  readonly rho: Quantity<'density'>;
  /** Specific volume v = 1/ρ (constant). */
  readonly v: Quantity<'specificVolume'>;
  /** Specific heat c(T) (= cp = cv), in J/(kg·K). Throws {@link OutOfRangeError} outside the range. */
  c(T: QuantityLike<'temperature'>): Quantity<'specificHeat'>;
  /** Same as {@link IncompressibleSubstance.c}: for an incompressible substance cp = c. */
  cp(T: QuantityLike<'temperature'>): Quantity<'specificHeat'>;
  /** Same as {@link IncompressibleSubstance.c}: for an incompressible substance cv = c. */
  cv(T: QuantityLike<'temperature'>): Quantity<'specificHeat'>;
  /** Mean specific heat between two temperatures, Δu/ΔT (c(T1) when T1 = T2). */
  averageC(T1: QuantityLike<'temperature'>, T2: QuantityLike<'temperature'>): Quantity<'specificHeat'>;
  /** Δu = ∫c dT from T1 to T2, in J/kg. */
  deltaU(T1: QuantityLike<'temperature'>, T2: QuantityLike<'temperature'>): Quantity<'specificEnergy'>;
  /** Δs = ∫c/T dT from T1 to T2, in J/(kg·K). */
  deltaS(T1: QuantityLike<'temperature'>, T2: QuantityLike<'temperature'>): Quantity<'specificHeat'>;
  /** Δh = Δu + v·(p2 − p1) between two states, in J/kg. Pressures are absolute. */
  deltaH(state1: IncompressibleState, state2: IncompressibleState): Quantity<'specificEnergy'>;
}

function checkT(model: IncompressibleModel, name: string, T: number, parameter: string, rangeNote?: string): void {
  if (T < model.Tmin || T > model.Tmax) {
    const range = { quantity: parameter, value: T, min: model.Tmin, max: model.Tmax, unit: 'K', scope: `the data for ${name}` };
    throw new OutOfRangeError(range, rangeNote === undefined ? undefined : `${new OutOfRangeError(range).message}; ${rangeNote}`);
  }
}

/** Options of {@link incompressible}: `{ supercooled: true }`, or a solution's `{ massFraction }` / `{ volumeFraction }`. */
export type IncompressibleOptions = CatalogueOptions;

function readPressure(input: QuantityLike<'pressure'>, parameter: string): number {
  const p = readQuantity(input, 'pressure', parameter);
  if (!(p > 0)) throw new OutOfRangeError({ quantity: parameter, value: p, min: 0, max: Infinity, unit: 'Pa', scope: 'absolute pressure' }, `${parameter} = ${p} Pa: absolute pressure must be positive (write gauge pressures as "psig", "barg" or "kPag")`);
  return p;
}

/**
 * An incompressible substance from the catalogue (by name or alias) or from your own definition.
 *
 * The model: cp = cv = c(T), density constant. Δu = ∫c dT; Δh = Δu + v·Δp; Δs = ∫c/T dT.
 * For solids, v·Δp is tiny and Δh ≈ Δu. For a liquid pumped at constant temperature, Δu = 0
 * and Δh = v·Δp. Each catalogue entry carries its source and valid temperature range; values
 * outside the range throw rather than extrapolate.
 *
 * @param nameOrDefinition a catalogue name (`"water"`, `"copper"`, `"engine oil"`) or a definition
 *   validated by {@link incompressibleDefinitionSchema}
 * @throws {@link UnknownNameError} unknown name, with the closest names
 * @throws {@link DefinitionError} invalid definition, naming each bad field
 * @example
 * ```ts
 * const copper = incompressible('copper');
 * copper.deltaU('20 °C', '120 °C').in('kJ/kg');   //=> 38.9... (c from 385 to 394 J/(kg·K))
 * const water = incompressible('water');
 * water.deltaH({ T: '20 °C', p: '1 atm' }, { T: '20 °C', p: '500 psia' }).in('kJ/kg'); //=> 3.356...
 * copper.c('900 K');   // throws OutOfRangeError: T = 900 K is above the upper limit of the data for copper (800 K)
 * ```
 */
export function incompressible(nameOrDefinition: string | IncompressibleDefinition, options?: IncompressibleOptions): IncompressibleSubstance {
  const { definition, model } = typeof nameOrDefinition === 'string' ? lookupIncompressible(nameOrDefinition, options) : compileDefinition(nameOrDefinition);
  const name = definition.name;
  const temperature = (input: QuantityLike<'temperature'>, parameter: string): number => {
    const T = readQuantity(input, 'temperature', parameter);
    checkT(model, name, T, parameter, definition.rangeNote);
    return T;
  };
  const c = (T: QuantityLike<'temperature'>): Quantity<'specificHeat'> => Quantity.fromSI(heatCapacityAt(model, temperature(T, 'T')), 'specificHeat');
  return {
    name,
    state: definition.state,
    definition,
    range: { T: { min: Quantity.fromSI(model.Tmin, 'temperature'), max: Quantity.fromSI(model.Tmax, 'temperature') } },
    rho: Quantity.fromSI(1 / model.v, 'density'),
    v: Quantity.fromSI(model.v, 'specificVolume'),
    c,
    cp: c,
    cv: c,
    averageC(T1, T2) {
      const a = temperature(T1, 'T1');
      const b = temperature(T2, 'T2');
      return Quantity.fromSI(a === b ? heatCapacityAt(model, a) : internalEnergyChange(model, a, b) / (b - a), 'specificHeat');
    },
    deltaU(T1, T2) {
      return Quantity.fromSI(internalEnergyChange(model, temperature(T1, 'T1'), temperature(T2, 'T2')), 'specificEnergy');
    },
    deltaS(T1, T2) {
      return Quantity.fromSI(entropyChange(model, temperature(T1, 'T1'), temperature(T2, 'T2')), 'specificHeat');
    },
    deltaH(state1, state2) {
      const T1 = temperature(state1.T, 'state1.T');
      const T2 = temperature(state2.T, 'state2.T');
      return Quantity.fromSI(enthalpyChange(model, T1, readPressure(state1.p, 'state1.p'), T2, readPressure(state2.p, 'state2.p')), 'specificEnergy');
    },
  };
}
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError, FormulaError, DefinitionError, ConvergenceError } from '../errors.js';
