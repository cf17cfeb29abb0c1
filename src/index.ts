/**
 * heatstate: thermophysical properties for engineering software.
 *
 * The root entry re-exports the documented facade of every model subpath (generated from
 * entries.json by `npm run entries`; do not edit by hand). Import a subpath (`heatstate/units`,
 * `heatstate/water`) to load only what you use; low-level SI cores have entries of their own
 * (`heatstate/water/if97`) and are not re-exported here.
 *
 * Results are engineering estimates: for pressure equipment, steam, refrigerants and heating
 * systems, defer to the applicable codes and to licensed professionals.
 *
 * @packageDocumentation
 */
export * from './units/index.js';
export * from './incompressible/index.js';
export * from './ideal-gas/index.js';
export * from './water/index.js';
export * from './humid-air/index.js';
export * from './fluids/index.js';
export * from './tables/index.js';
export { molarMass, gasConstant, parseFormula, atomicWeight, knownElements } from './chem/index.js';
export { MOLAR_GAS_CONSTANT, AVOGADRO_PER_MOL, BOLTZMANN_J_PER_K, STANDARD_ATMOSPHERE_PA, STANDARD_GRAVITY, STANDARD_STATE_PRESSURE_PA, REFERENCE_TEMPERATURE_K } from './chem/constants.js';
