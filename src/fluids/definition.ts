/**
 * The shape of a fluid file (data/fluids/<fluid>.json): a reference equation of state in the
 * reduced Helmholtz energy α(δ, τ) = α°(δ, τ) + αʳ(δ, τ), δ = ρ/ρᵣ, τ = Tᵣ/T, with its source,
 * constants, ancillary equations for starting values and its range of validity.
 *
 * @module
 */

/** Where a fluid's numbers come from. */
export interface FluidSource {
  readonly title: string;
  readonly authors: string;
  readonly year: number;
  readonly table: string;
}

/** Terms Σ nᵢ ϑ^tᵢ of an ancillary equation, ϑ = 1 − T/T_c. */
export interface AncillaryTerms {
  readonly form: string;
  /** The saturated liquid density in the form ln(ρ'/ρc) = Σ n ϑ^t instead of ρ'/ρc = 1 + Σ n ϑ^t. */
  readonly logarithmic?: boolean;
  readonly n: readonly number[];
  readonly t: readonly number[];
}

/** A fluid file. Units: K, Pa, kg/m³, kg/mol, J/(kg·K). */
export interface FluidDefinition {
  readonly name: string;
  readonly formula: string;
  readonly aliases: readonly string[];
  readonly equation: string;
  readonly source: FluidSource;
  /** Provenance and checks (in the data file; not read at run time). */
  readonly basis?: 'published' | 'from memory' | 'computed';
  readonly verification?: string;
  readonly uncertainty?: string;
  /** Only fluids whose coefficients reproduce their source's verification values are loadable. */
  readonly loadable?: boolean;
  readonly finding?: string;
  readonly molarMass: { readonly value: number; readonly unit: 'kg/mol'; readonly source: string };
  /** The specific gas constant the equation uses (the source's molar R over its M). */
  readonly gasConstant: { readonly value: number; readonly unit: 'J/(kg·K)'; readonly source: string };
  readonly reducing: { readonly T: number; readonly rho: number };
  readonly critical: { readonly T: number; readonly p: number; readonly rho: number; readonly source: string };
  readonly triple: { readonly T: number; readonly p: number; readonly rhoLiquid: number; readonly rhoVapor: number; readonly source: string };
  readonly range: { readonly Tmin: number; readonly Tmax: number; readonly pMax: number; readonly rhoMax: number; readonly source: string };
  readonly ancillary: {
    readonly source: FluidSource;
    readonly vaporPressure: AncillaryTerms;
    readonly liquidDensity: AncillaryTerms;
    readonly vaporDensity: AncillaryTerms;
    /** The ancillary vapour pressure's largest relative deviation from the equation of state (computed), with margin. */
    readonly pressureMargin: number;
  };
}
