/**
 * Transport properties of dilute (ideal) gases, plain-number SI core.
 *
 * Viscosity from the Chapman-Enskog first approximation for a Lennard-Jones (12-6) gas,
 *   μ = (5/16) √(π m k T) / (π σ² Ω(2,2)*(T*)),  T* = kT/ε,  m = M/N_A,
 * with Ω(2,2)* from the fit of Neufeld, Janzen & Aziz (J. Chem. Phys. 57, 1100, 1972), 0.3 ≤ T* ≤ 100,
 * and σ, ε/k from Svehla (NASA TR R-132, 1962) as reproduced in Poling, Prausnitz & O'Connell,
 * The Properties of Gases and Liquids, 5th ed. (2001), Appendix B (recalled: data/ideal-gas/transport.json).
 * Thermal conductivity by the modified Eucken factor, λ M/(μ cv) = 1.32 + 1.77/(cv/R) (Poling et al.
 * Eq. 10-3.3), with cv = cp − R from the species' ideal-gas cp(T) (src/ideal-gas/model.ts); for
 * monatomic gases this is the exact Eucken value 5/2 (λ = 15/4 μ R/M).
 * Mixtures: Wilke (J. Chem. Phys. 18, 517, 1950) for viscosity, Mason-Saxena (Phys. Fluids 1, 361,
 * 1958) with ε = 1 for conductivity. Dry air is the mixture of N2, O2, Ar and CO2.
 *
 * Low-density limit only: no pressure dependence (valid where the gas is ideal, at pressures near
 * atmospheric and below). Water vapour is not in this catalogue (a Lennard-Jones potential does not
 * describe it; see the finding in the data file): the IAPWS dilute-gas terms in
 * src/water/transport/dilute-steam.ts implement {@link GasTransportModel} for it.
 *
 * @module
 */
// named imports: a bundler keeps only these parts of the data file (not its source and finding texts)
import { collisionIntegral as CI, conductivity, mixtures, range, species as speciesData } from '../../data/ideal-gas/transport.json';
import { AVOGADRO_PER_MOL, BOLTZMANN_J_PER_K } from '../chem/constants.js';
import { Status, type StatusCode } from '../core/status.js';
import type { IdealGasModel } from './model.js';
import { speciesModel } from './species.js';

/** What every dilute-gas transport model gives (SI units); no range checks: see {@link gasTransport}. */
export interface GasTransportModel {
  /** Molar mass, kg/mol. */
  readonly M: number;
  /** Valid temperature range, K. */
  readonly Tmin: number;
  readonly Tmax: number;
  /** Dynamic viscosity at T (K), Pa·s. */
  mu(T: number): number;
  /** Thermal conductivity at T (K), W/(m·K). */
  lambda(T: number): number;
  /** Specific isobaric heat capacity of the ideal gas at T (K), J/(kg·K) (for the Prandtl number). */
  cp(T: number): number;
}

const A = CI.A;
const B = CI.B;
const C = CI.C;
const D = CI.D;
const E = CI.E;
const F = CI.F;
const EUCKEN_A = conductivity.a;
const EUCKEN_B = conductivity.b;
const T_CAP = range.Tmax;

/**
 * The collision integral Ω(2,2)*(T*) of the Lennard-Jones (12-6) potential, Neufeld, Janzen & Aziz (1972).
 * @example
 * ```ts
 * collisionIntegral22(1);     //=> 1.5925
 * collisionIntegral22(4.2);   //=> 0.9587 (N2 at 300 K)
 * ```
 */
export function collisionIntegral22(Tstar: number): number {
  // T*^(−B) as exp(−B ln T*): the same number to rounding, and about twice as fast as Math.pow in V8
  return A * Math.exp(-B * Math.log(Tstar)) + C * Math.exp(-D * Tstar) + E * Math.exp(-F * Tstar);
}

/** (5/16) √(π k / N_A) / π: μ = this · √(M T) / (σ² Ω) with M in kg/mol, σ in m. */
const CE_FACTOR = ((5 / 16) * Math.sqrt((Math.PI * BOLTZMANN_J_PER_K) / AVOGADRO_PER_MOL)) / Math.PI;

/** A Lennard-Jones gas in the Chapman-Enskog first approximation, with its ideal-gas cp model. */
export class ChapmanEnskogModel implements GasTransportModel {
  readonly M: number;
  readonly Tmin: number;
  readonly Tmax: number;
  /** Collision diameter σ, m. */
  readonly sigma: number;
  /** Well depth ε/k, K. */
  readonly epsilonOverK: number;
  private readonly thermo: IdealGasModel;
  private readonly muFactor: number;
  private readonly inverseEpsilon: number;

  /** `sigma` in m, `epsilonOverK` in K; the range is the collision-integral fit's (0.3 ≤ T* ≤ 100) within the cp model's and 2000 K. */
  constructor(thermo: IdealGasModel, sigma: number, epsilonOverK: number) {
    this.thermo = thermo;
    this.M = thermo.M;
    this.sigma = sigma;
    this.epsilonOverK = epsilonOverK;
    this.Tmin = Math.max(thermo.Tmin, CI.TstarMin * epsilonOverK);
    this.Tmax = Math.min(thermo.Tmax, CI.TstarMax * epsilonOverK, T_CAP);
    this.inverseEpsilon = 1 / epsilonOverK;
    this.muFactor = (CE_FACTOR * Math.sqrt(thermo.M)) / (sigma * sigma);
  }

  mu(T: number): number {
    return (this.muFactor * Math.sqrt(T)) / collisionIntegral22(T * this.inverseEpsilon);
  }

  lambda(T: number): number {
    return this.lambdaFromMu(T, this.mu(T));
  }

  /** λ at T from μ at T (Pa·s), for a caller that has μ already (the mixtures). */
  lambdaFromMu(T: number, mu: number): number {
    // λ = μ cv (1.32 + 1.77 R/cv) per kg = μ R (1.32 (cp/R − 1) + 1.77)
    return mu * this.thermo.R * (EUCKEN_A * (this.thermo.cpR(T) - 1) + EUCKEN_B);
  }

  cp(T: number): number {
    return this.thermo.cpR(T) * this.thermo.R;
  }
}

/**
 * A dilute-gas mixture: Wilke's rule for viscosity, Mason-Saxena (ε = 1) for conductivity, cp by mass
 * fractions. Holds per-instance scratch for the components' values: one instance per thread of use.
 */
export class GasMixtureTransport implements GasTransportModel {
  readonly M: number;
  readonly Tmin: number;
  readonly Tmax: number;
  private readonly parts: readonly GasTransportModel[];
  private readonly y: Float64Array;
  private readonly muScratch: Float64Array;
  private readonly phiSum: Float64Array;
  /** (Mⱼ/Mᵢ)^¼ and 1/√(8(1 + Mᵢ/Mⱼ)) for every pair, row i. */
  private readonly massRatio: Float64Array;
  private readonly massDenominator: Float64Array;

  /** `moleFractions` are normalised to sum 1; parts with zero fraction are kept (they do not contribute). */
  constructor(parts: readonly GasTransportModel[], moleFractions: ArrayLike<number>) {
    const n = parts.length;
    this.parts = parts;
    let sum = 0;
    for (let i = 0; i < n; i++) sum += moleFractions[i]!;
    this.y = new Float64Array(n);
    let M = 0;
    let Tmin = -Infinity;
    let Tmax = Infinity;
    for (let i = 0; i < n; i++) {
      this.y[i] = moleFractions[i]! / sum;
      M += this.y[i]! * parts[i]!.M;
      Tmin = Math.max(Tmin, parts[i]!.Tmin);
      Tmax = Math.min(Tmax, parts[i]!.Tmax);
    }
    this.M = M;
    this.Tmin = Tmin;
    this.Tmax = Tmax;
    this.muScratch = new Float64Array(n);
    this.phiSum = new Float64Array(n);
    this.massRatio = new Float64Array(n * n);
    this.massDenominator = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const Mi = parts[i]!.M;
        const Mj = parts[j]!.M;
        this.massRatio[i * n + j] = Math.pow(Mj / Mi, 0.25);
        this.massDenominator[i * n + j] = 1 / Math.sqrt(8 * (1 + Mi / Mj));
      }
    }
  }

  /** Fills muScratch with the components' viscosities and phiSum with Σⱼ yⱼ φᵢⱼ (Wilke's φ). */
  private prepare(T: number): void {
    const n = this.parts.length;
    const mu = this.muScratch;
    for (let i = 0; i < n; i++) mu[i] = this.parts[i]!.mu(T);
    for (let i = 0; i < n; i++) {
      let sum = 0;
      for (let j = 0; j < n; j++) {
        const root = 1 + Math.sqrt(mu[i]! / mu[j]!) * this.massRatio[i * n + j]!;
        sum += this.y[j]! * root * root * this.massDenominator[i * n + j]!;
      }
      this.phiSum[i] = sum;
    }
  }

  /** Wilke: μ = Σᵢ yᵢ μᵢ / Σⱼ yⱼ φᵢⱼ. */
  mu(T: number): number {
    this.prepare(T);
    let total = 0;
    for (let i = 0; i < this.parts.length; i++) total += (this.y[i]! * this.muScratch[i]!) / this.phiSum[i]!;
    return total;
  }

  /** Mason-Saxena with ε = 1: λ = Σᵢ yᵢ λᵢ / Σⱼ yⱼ φᵢⱼ. */
  lambda(T: number): number {
    this.prepare(T);
    let total = 0;
    for (let i = 0; i < this.parts.length; i++) {
      if (this.y[i] === 0) continue;
      const part = this.parts[i]!;
      // a Lennard-Jones part's λ from the μ prepare() just computed (the same number, one evaluation fewer)
      const lambda = part instanceof ChapmanEnskogModel ? part.lambdaFromMu(T, this.muScratch[i]!) : part.lambda(T);
      total += (this.y[i]! * lambda) / this.phiSum[i]!;
    }
    return total;
  }

  cp(T: number): number {
    let massWeighted = 0;
    for (let i = 0; i < this.parts.length; i++) massWeighted += this.y[i]! * this.parts[i]!.M * this.parts[i]!.cp(T);
    return massWeighted / this.M;
  }
}

const catalogue = new Map<string, GasTransportModel>();

/**
 * The dilute-gas transport model of a catalogued gas: N2, O2, Ar, CO2, He, CH4, H2, CO, NO, N2O, C2H6,
 * C3H8, C2H4, n-C4H10 (Chapman-Enskog) and `air` (the Wilke / Mason-Saxena mixture of N2, O2, Ar, CO2);
 * `undefined` for others (the data file's finding says why each was left out). Built on first use, then shared
 * (the mixture's scratch makes `air` one instance per thread of use).
 * @example
 * ```ts
 * gasTransportModel('N2')?.mu(300);     //=> 1.7699e-5 (Pa·s)
 * gasTransportModel('air')?.lambda(300); //=> 0.026713 (W/(m·K))
 * gasTransportModel('H2O');             //=> undefined (see src/water/transport/dilute-steam.ts)
 * ```
 */
export function gasTransportModel(id: string): GasTransportModel | undefined {
  const known = catalogue.get(id);
  if (known) return known;
  const species = (speciesData as Record<string, { sigma: number; epsilonOverK: number } | undefined>)[id];
  if (species) {
    const model = new ChapmanEnskogModel(speciesModel(id).model, species.sigma * 1e-10, species.epsilonOverK);
    catalogue.set(id, model);
    return model;
  }
  const mixture = (mixtures as Record<string, Record<string, number | string> | undefined>)[id];
  if (mixture) {
    const ids = Object.keys(mixture).filter((k) => typeof mixture[k] === 'number');
    const model = new GasMixtureTransport(ids.map((k) => gasTransportModel(k)!), ids.map((k) => mixture[k] as number));
    catalogue.set(id, model);
    return model;
  }
  return undefined;
}

/**
 * The identifiers {@link gasTransportModel} knows.
 * @example
 * ```ts
 * gasTransportIds();   //=> ['N2', 'O2', 'Ar', 'CO2', 'He', 'CH4', 'H2', 'CO', 'NO', 'N2O', 'C2H6', 'C3H8', 'C2H4', 'n-C4H10', 'air']
 * ```
 */
export function gasTransportIds(): string[] {
  return [...Object.keys(speciesData), ...Object.keys(mixtures)];
}

/** Transport properties of a dilute gas at one temperature, filled by {@link gasTransport}. */
export class GasTransportResult {
  /** Dynamic viscosity μ, Pa·s. */
  mu = 0;
  /** Thermal conductivity λ, W/(m·K). */
  lambda = 0;
  /** Ideal-gas cp, J/(kg·K). */
  cp = 0;
  /** Prandtl number Pr = μ cp / λ. */
  Pr = 0;
}

/**
 * μ, λ, cp and Pr = μ cp/λ of a dilute gas at T (K), written to `out`. `Status.outOfRange` outside the
 * model's [Tmin, Tmax], `Status.invalidInput` for NaN.
 * @example
 * ```ts
 * const out = new GasTransportResult();
 * gasTransport(gasTransportModel('air')!, 300, out);    //=> 0 (Status.ok)
 * out.mu;                                               //=> 1.8351e-5 (Pa·s)
 * out.Pr;                                               //=> 0.690
 * gasTransport(gasTransportModel('He')!, 1500, out);    //=> 1 (Status.outOfRange: above 100 ε/k = 1022 K)
 * ```
 */
export function gasTransport(model: GasTransportModel, T: number, out: GasTransportResult): StatusCode {
  if (!Number.isFinite(T)) return Status.invalidInput;
  if (!(T >= model.Tmin && T <= model.Tmax)) return Status.outOfRange;
  out.mu = model.mu(T);
  out.lambda = model.lambda(T);
  out.cp = model.cp(T);
  out.Pr = (out.mu * out.cp) / out.lambda;
  return Status.ok;
}
