/**
 * The shape of one catalogue entry (src/fluids/entries/<fluid>.ts).
 *
 * @module
 */
import type { FluidDefinition } from '../definition.js';
import type { IdealKernel, ResidualKernel } from '../model.js';

/** A fluid of the catalogue: its definition (data file) and its generated kernels. */
export interface CatalogueEntry {
  readonly definition: () => FluidDefinition;
  readonly residual: ResidualKernel;
  readonly ideal: IdealKernel;
}
