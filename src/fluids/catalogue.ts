/**
 * The fluids the library ships: each data file with its generated kernels, compiled on first use.
 * Only fluids whose coefficients reproduce their source's verification values are listed here
 * (`"loadable": true` in the data file; the kernel generator emits kernels only for those).
 *
 * @module
 */
// named imports of the top-level keys the library reads: a bundler leaves out the coefficient
// arrays (`residual`, `ideal`), which live in the generated kernels
import {
  aliases as waterAliases,
  ancillary as waterAncillary,
  basis as waterBasis,
  critical as waterCritical,
  equation as waterEquation,
  formula as waterFormula,
  gasConstant as waterGasConstant,
  loadable as waterLoadable,
  molarMass as waterMolarMass,
  name as waterName,
  range as waterRange,
  reducing as waterReducing,
  source as waterSource,
  triple as waterTriple,
  uncertainty as waterUncertainty,
  verification as waterVerification,
} from '../../data/fluids/water.json';
import type { FluidDefinition } from './definition.js';
import { waterIdeal, waterResidual } from './kernels.generated.js';
import { FluidModel, type IdealKernel, type ResidualKernel } from './model.js';

interface Entry {
  readonly definition: () => FluidDefinition;
  readonly residual: ResidualKernel;
  readonly ideal: IdealKernel;
}

const ENTRIES: Readonly<Record<string, Entry>> = {
  water: {
    definition: () =>
      ({
        name: waterName,
        formula: waterFormula,
        aliases: waterAliases,
        equation: waterEquation,
        source: waterSource,
        basis: waterBasis,
        verification: waterVerification,
        uncertainty: waterUncertainty,
        loadable: waterLoadable,
        molarMass: waterMolarMass,
        gasConstant: waterGasConstant,
        reducing: waterReducing,
        critical: waterCritical,
        triple: waterTriple,
        range: waterRange,
        ancillary: waterAncillary,
      }) as unknown as FluidDefinition,
    residual: waterResidual,
    ideal: waterIdeal,
  },
};

/** The catalogue's fluid names. */
export const FLUID_NAMES: readonly string[] = Object.keys(ENTRIES);

/** The definition (data file contents) of a catalogue fluid, or undefined. */
export function fluidDefinition(name: string): FluidDefinition | undefined {
  return ENTRIES[name]?.definition();
}

const compiled = new Map<string, FluidModel>();

/**
 * The compiled model of a catalogue fluid (built on first use, then shared: it is immutable), or
 * undefined for a name that is not in the catalogue (catalogue names only; aliases are the facade's).
 * @example
 * ```ts
 * fluidModel('water')!.Tc;   //=> 647.096
 * fluidModel('nope');        //=> undefined
 * ```
 */
export function fluidModel(name: string): FluidModel | undefined {
  let m = compiled.get(name);
  if (m === undefined) {
    const e = ENTRIES[name];
    if (e === undefined) return undefined;
    m = new FluidModel(name, e.definition(), e.residual, e.ideal);
    compiled.set(name, m);
  }
  return m;
}

/** IAPWS-95 water, compiled. */
export function waterModel(): FluidModel {
  return fluidModel('water')!;
}
