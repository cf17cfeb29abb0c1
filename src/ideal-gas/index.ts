/**
 * `heatstate/ideal-gas`: ideal gases with temperature-dependent cp from NASA polynomials
 * (fitted to NIST-JANAF, or the published 7-coefficient sets), the constant-cp model, mixtures, and process relations.
 *
 * @packageDocumentation
 */
export { idealGas, mixture, dryAir, DRY_AIR_MOLE_FRACTIONS, moleToMassFractions, massToMoleFractions } from './gas.js';
export type { IdealGas, IdealGasOptions, IdealGasDefinition, MixtureOptions, Composition, GasState, GasPair, GasEnergyState, GasStateResult, GasInputDimensions, GasSource, Basis, HeatCapacityDimension, EnergyDimension, EntropyDimension } from './gas.js';
export type { GasTransportMethods, GasStateTransport } from './transport-facade.js';
export { gasTransportModel, gasTransportIds, gasTransport, GasTransportResult, ChapmanEnskogModel, GasMixtureTransport, collisionIntegral22 } from './transport.js';
export type { GasTransportModel } from './transport.js';
export { idealGasBatch, IDEAL_GAS_BATCH_STATUS } from './batch.js';
export type { IdealGasBatchProperty } from './batch.js';
export { isentropicEnd, compressor, turbine, polytropic, constantCpDeviation } from './processes.js';
export { IdealGasSolver, isentropicTemperatureConstantCp } from './solve.js';
export { Status } from '../core/status.js';
export { safe } from '../core/safe.js';
export type { SafeResult } from '../core/safe.js';
export type { StatusCode } from '../core/status.js';
export { quantity, temperatureDifference, Quantity } from '../units/quantity.js';
export type { QuantityLike } from '../units/quantity.js';
export type { MachineInput, MachineResult, PolytropicResult, ConstantCpDeviation, ProcessInlet, ProcessDimensions } from './processes.js';
export { NasaPolynomialModel, ConstantCpModel, MixtureModel, constantCpFrom, mixNasa, fromSevenCoefficients } from './model.js';
export type { IdealGasModel } from './model.js';
export { speciesNames, speciesRecords, findSpecies } from './species.js';
export type { SpeciesRecord } from './species.js';
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError, UnavailablePropertyError, FormulaError, DefinitionError, ConvergenceError, ResultError } from '../errors.js';
