/**
 * The water entry of the fluid catalogue: its data file's constants and its generated kernels.
 * Named imports of the data file's top-level keys: a bundler leaves out the coefficient arrays
 * (`residual`, `ideal`, held by the generated kernels) and the verification texts.
 *
 * @module
 */
import {
  aliases as waterAliases,
  ancillary as waterAncillary,
  critical as waterCritical,
  equation as waterEquation,
  formula as waterFormula,
  gasConstant as waterGasConstant,
  molarMass as waterMolarMass,
  name as waterName,
  range as waterRange,
  reducing as waterReducing,
  source as waterSource,
  triple as waterTriple,
} from '../../../data/fluids/water.json';
import type { FluidDefinition } from '../definition.js';
import { waterIdeal, waterResidual } from '../kernels.generated.js';
import type { CatalogueEntry } from './entry.js';

/** water: definition, residual and ideal-gas kernels. */
export const water: CatalogueEntry = {
  definition: () =>
    ({
      aliases: waterAliases,
      ancillary: waterAncillary,
      critical: waterCritical,
      equation: waterEquation,
      formula: waterFormula,
      gasConstant: waterGasConstant,
      molarMass: waterMolarMass,
      name: waterName,
      range: waterRange,
      reducing: waterReducing,
      source: waterSource,
      triple: waterTriple,
    }) as unknown as FluidDefinition,
  residual: waterResidual,
  ideal: waterIdeal,
};
