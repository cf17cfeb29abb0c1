/**
 * `heatstate/tables`: typed property tables with checked interpolation (linear, monotone cubic,
 * log-linear, bilinear), inverse lookup, and loaders for JSON and CSV. The generated water tables
 * are in `heatstate/tables/water`, so this entry carries no table data.
 *
 * @packageDocumentation
 */
export { PropertyTable, defineTable } from './table.js';
export { PropertyGrid, defineGrid } from './grid.js';
export type { GridLookupOptions } from './grid.js';
export { TableValue, GridValue } from './core.js';
export { Status } from '../core/status.js';
export { safe } from '../core/safe.js';
export type { SafeResult } from '../core/safe.js';
export type { StatusCode } from '../core/status.js';
export type { InterpolationMethod, InverseResult, LookupOptions, LookupResult } from './validate.js';
export { tableFromJSON, gridFromJSON, tableFromCSV } from './load.js';
export type { CsvOptions } from './load.js';
export type { TableData, GridData, TableSource, InterpolationErrors } from './schema.js';
export { HeatstateError, UnitError, DimensionError, InvalidInputError, OutOfRangeError, UnknownNameError, UnavailablePropertyError, FormulaError, DefinitionError, ConvergenceError } from '../errors.js';
