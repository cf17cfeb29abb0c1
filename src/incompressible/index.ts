/**
 * `heatstate/incompressible`: liquids and solids with cp = cv = c and constant density.
 *
 * @packageDocumentation
 */
import { describeValue, readFlag, readOptions } from '../core/read.js';
import { InvalidInputError } from '../errors.js';
import { lookupIncompressible, type CatalogueOptions } from './catalogue.js';
import { compileDefinition, type IncompressibleDefinition } from './schema.js';
import { substanceFacade, type IncompressibleSubstance } from './substance.js';

export { incompressibleNames, incompressibleCatalogue } from './catalogue.js';
export { compileDefinition } from './schema.js';
export type { IncompressibleDefinition, DefinitionSource } from './schema.js';
export type { CompiledSubstance } from './compile.js';
export { heatCapacityAt, internalEnergyChange, entropyChange, enthalpyChange, densityAt } from './model.js';
export type { IncompressibleModel } from './model.js';
export type { TransportSource, CompiledTransport } from './transport-data.js';
/** Options of {@link incompressible}: `{ supercooled: true }`, or a solution's `{ massFraction }` / `{ volumeFraction }`. */
export type IncompressibleOptions = CatalogueOptions & {
  /**
   * Compute outside the data's temperature range by extending its end piece (results carry
   * `extrapolated: true`). Default false: such temperatures throw.
   */
  readonly extrapolate?: boolean;
};
export type { IncompressibleSubstance, IncompressibleState, IncompressibleThermalState, IncompressibleStateResult } from './substance.js';
export { incompressibleBatch, INCOMPRESSIBLE_BATCH_STATUS } from './batch.js';
export type { IncompressibleBatchProperty } from './batch.js';

/**
 * An incompressible substance from the catalogue (by name or alias) or from your own definition.
 *
 * The model: cp = cv = c(T), density constant or ρ(T). Δu = ∫c dT; Δs = ∫c/T dT; h is a function of
 * the state, h(T, p) = ∫c dT + v(T)·(p − p_ref) with p_ref = 1 atm (for constant density Δh = Δu + v·Δp),
 * so `deltaH` is the difference of `state(…).h` (model.ts explains the choice).
 * For solids, v·Δp is tiny and Δh ≈ Δu. For a liquid pumped at constant temperature, Δu = 0
 * and Δh = v·Δp. Each catalogue entry carries its source and valid temperature range; values
 * outside the range throw rather than extrapolate.
 *
 * @param nameOrDefinition a catalogue name (`"water"`, `"copper"`, `"engine oil"`) or a definition
 *   (checked field by field; a bad one throws {@link DefinitionError} naming it)
 * @throws {@link UnknownNameError} unknown name, with the closest names
 * @throws {@link DefinitionError} invalid definition, naming each bad field
 * @example
 * ```ts
 * const copper = incompressible('copper');
 * copper.deltaU('20 °C', '120 °C').in('kJ/kg');   //=> 39.14... (c from 383.6 to 397.7 J/(kg·K))
 * const water = incompressible('water');
 * water.deltaH({ T: '20 °C', p: '1 atm' }, { T: '20 °C', p: '500 psia' }).in('kJ/kg'); //=> 3.352... (v(20 °C)·Δp)
 * copper.c('1400 K');  // throws OutOfRangeError: T = 1400 K is above the upper limit of the data for copper (1358 K)
 * const oil = incompressible('engine oil').state({ T: '350 K', p: '1 atm' });
 * oil.Pr;   //=> 546.4 (μ·c/λ from the tabulated μ, c and λ; the table prints 546)
 * oil.mu?.in('mPa·s');   //=> 35.6
 * ```
 */
export function incompressible(nameOrDefinition: string | IncompressibleDefinition, options?: IncompressibleOptions): IncompressibleSubstance {
  const { extrapolate, ...lookup } = readOptions<IncompressibleOptions>(options, 'options', ['supercooled', 'massFraction', 'volumeFraction', 'extrapolate']);
  if (lookup.supercooled !== undefined) readFlag(lookup.supercooled, 'options.supercooled');
  for (const key of ['massFraction', 'volumeFraction'] as const) {
    const v = lookup[key];
    if (v !== undefined && typeof v !== 'number') throw new InvalidInputError('input.invalid', `options.${key}`, `options.${key} must be a number from 0 to 1; got ${describeValue(v)}`);
  }
  const compiled = typeof nameOrDefinition === 'string' ? lookupIncompressible(nameOrDefinition, lookup) : compileDefinition(nameOrDefinition);
  return substanceFacade(compiled, readFlag(extrapolate, 'options.extrapolate'));
}
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError, UnavailablePropertyError, FormulaError, DefinitionError, ConvergenceError, ResultError } from '../errors.js';
export { Status } from '../core/status.js';
export { safe } from '../core/safe.js';
export type { SafeResult } from '../core/safe.js';
export type { StatusCode } from '../core/status.js';
export { quantity, temperatureDifference, Quantity } from '../units/quantity.js';
export type { QuantityLike } from '../units/quantity.js';
