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
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError, FormulaError, DefinitionError, ConvergenceError } from './errors.js';
export type { ErrorCode, ValidRange, DefinitionIssue } from './errors.js';
