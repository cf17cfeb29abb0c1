/**
 * The nitrogen entry of the fluid catalogue: its data file's constants and its generated kernels.
 * Named imports of the data file's top-level keys: a bundler leaves out the coefficient arrays
 * (`residual`, `ideal`, held by the generated kernels) and the verification texts.
 *
 * @module
 */
import {
  aliases as nitrogenAliases,
  ancillary as nitrogenAncillary,
  critical as nitrogenCritical,
  equation as nitrogenEquation,
  formula as nitrogenFormula,
  gasConstant as nitrogenGasConstant,
  molarMass as nitrogenMolarMass,
  name as nitrogenName,
  range as nitrogenRange,
  reducing as nitrogenReducing,
  source as nitrogenSource,
  triple as nitrogenTriple,
} from '../../../data/fluids/nitrogen.json';
import type { FluidDefinition } from '../definition.js';
import { nitrogenIdeal, nitrogenResidual } from '../kernels.generated.js';
import type { CatalogueEntry } from './entry.js';

/** nitrogen: definition, residual and ideal-gas kernels. */
export const nitrogen: CatalogueEntry = {
  definition: () =>
    ({
      aliases: nitrogenAliases,
      ancillary: nitrogenAncillary,
      critical: nitrogenCritical,
      equation: nitrogenEquation,
      formula: nitrogenFormula,
      gasConstant: nitrogenGasConstant,
      molarMass: nitrogenMolarMass,
      name: nitrogenName,
      range: nitrogenRange,
      reducing: nitrogenReducing,
      source: nitrogenSource,
      triple: nitrogenTriple,
    }) as unknown as FluidDefinition,
  residual: nitrogenResidual,
  ideal: nitrogenIdeal,
};
