/**
 * heatstate: thermophysical properties for engineering software.
 *
 * The root entry re-exports the documented facade of every subpath. Import a subpath
 * (`heatstate/units`, `heatstate/incompressible`) to load only what you use.
 *
 * @packageDocumentation
 */
export * from './units/index.js';
export { molarMass, gasConstant, parseFormula, atomicWeight, knownElements } from './chem/index.js';
export {
  MOLAR_GAS_CONSTANT,
  AVOGADRO_PER_MOL,
  BOLTZMANN_J_PER_K,
  STANDARD_ATMOSPHERE_PA,
  STANDARD_GRAVITY,
  STANDARD_STATE_PRESSURE_PA,
  REFERENCE_TEMPERATURE_K,
} from './chem/constants.js';
export { incompressible, incompressibleNames, incompressibleCatalogue, incompressibleDefinitionSchema } from './incompressible/index.js';
export type { IncompressibleSubstance, IncompressibleState, IncompressibleDefinition } from './incompressible/index.js';
export {
  idealGas,
  mixture,
  dryAir,
  DRY_AIR_MOLE_FRACTIONS,
  moleToMassFractions,
  massToMoleFractions,
  isentropicEnd,
  compressor,
  turbine,
  polytropic,
  constantCpDeviation,
  speciesNames,
  idealGasBatch,
} from './ideal-gas/index.js';
export type { IdealGas, IdealGasOptions, IdealGasDefinition, MixtureOptions, Composition, GasState, MachineInput, MachineResult, PolytropicResult, ConstantCpDeviation } from './ideal-gas/index.js';
export { water, approximateLiquid, compareLiquidProcess, waterBatch } from './water/index.js';
export type { WaterStateResult, SaturationResult, WaterPair, WaterPhase } from './water/index.js';
export { defineTable, defineGrid, tableFromCSV, tableFromJSON, gridFromJSON, PropertyTable, PropertyGrid } from './tables/index.js';
export type { InterpolationMethod, LookupOptions, LookupResult, TableData, GridData } from './tables/index.js';
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError, FormulaError, DefinitionError, ConvergenceError } from './errors.js';
export type { ErrorCode, ValidRange, DefinitionIssue } from './errors.js';
