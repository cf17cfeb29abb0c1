/**
 * The explicit solver context of the IF97 solvers: the scratch objects and residuals a solve needs,
 * owned by one caller. Nothing is shared through module variables: a solver receives its context.
 * The convenience default ({@link defaultContext}) serves callers that do not manage their own; a
 * batch or a worker may create its own with `new SolverContext()`.
 *
 * @module
 */
import { RootResult } from '../../core/root.js';
import { EntropyAlongEnthalpy } from './hs-residual.js';
import { Region3IsobarDensityResidual, Region3IsobarResidual } from './isobar-residual.js';
import { WaterProperties } from './properties.js';
import { VolumeAlongIsotherm } from './tv-residual.js';
import { region3Pressure } from './region3.js';
import { WaterState } from './water-state.js';

/** p₃(ρ, T) − p_target, for the region 3 density search. */
export class DensityResidual {
  T = 0;
  target = 0;
  private readonly pr = new Float64Array(2);
  value(rho: number): number {
    region3Pressure(rho, this.T, this.pr);
    return this.pr[0]! - this.target;
  }
}

/** Scratch space of one IF97 solver: reuse one per thread of work; do not share between nested solves. */
export class SolverContext {
  /** Two scratch property sets (the saturated phases of an inner saturation call, or probes). */
  readonly scratch = new WaterProperties();
  readonly scratchB = new WaterProperties();
  /** The saturated phases of a (p, h) or (p, s) flash above 16.5 MPa. */
  readonly satLiquid = new WaterProperties();
  readonly satVapor = new WaterProperties();
  /** The inner (p, h) state of an (h, s) search. */
  readonly inner = new WaterState();
  /** Region 3 density search. */
  readonly density = new DensityResidual();
  /** The answer of the last density search, kg/m³. */
  rho = 0;
  /**
   * The saturated densities at the near-critical band's edge (T_c − 0.1 mK), kg/m³: fixed numbers,
   * solved on first use by this context (0 until then).
   */
  bandEdgeLiquidDensity = 0;
  bandEdgeVaporDensity = 0;
  /** Region 3 (ρ, T) values and derivatives for Newton steps. */
  readonly d3 = new Float64Array(9);
  /** p and (∂p/∂ρ)_T from region 3. */
  readonly pr = new Float64Array(2);
  /** The bracketed (h, s) search in ln p. */
  readonly entropyAlongEnthalpy: EntropyAlongEnthalpy = new EntropyAlongEnthalpy(this);
  /** Region 3 isobar search in T. */
  readonly isobar: Region3IsobarResidual = new Region3IsobarResidual(this);
  /** Region 3 isobar search in ρ, next to the critical point. */
  readonly isobarByDensity = new Region3IsobarDensityResidual();
  /** The (T, v) search in ln p. */
  readonly volumeAlongIsotherm = new VolumeAlongIsotherm();
  /** Root finder output. */
  readonly root = new RootResult();
}

let shared: SolverContext | undefined;

/**
 * The context used when a caller passes none (created on first use).
 * @example
 * ```ts
 * stateFromPT(1e6, 300, new WaterState(), defaultContext());   //=> 0
 * ```
 */
export function defaultContext(): SolverContext {
  return (shared ??= new SolverContext());
}
