/**
 * The ideal-gas SI core solvers: temperature from enthalpy or entropy, and isentropic end states, on
 * the core contract (a status, a caller-owned result, no throw, no NaN answer). Each solve is a
 * bracketed Newton iteration on [Tmin, Tmax] of the model: dh/dT = cp, ds°/dT = cp/T.
 *
 * @module
 */
import { bracketedNewton, RootResult, type ResidualWithSlope } from '../core/root.js';
import { Status, type StatusCode } from '../core/status.js';
import type { IdealGasModel } from './model.js';

/** h°/R̄ (K) at T minus the target. */
class EnthalpyResidual implements ResidualWithSlope {
  target = 0;
  constructor(private readonly model: IdealGasModel) {}
  value(T: number): number {
    return T * this.model.hRT(T) - this.target;
  }
  slope(T: number): number {
    return this.model.cpR(T);
  }
}

/** s°/R̄ at T minus the target. */
class EntropyResidual implements ResidualWithSlope {
  target = 0;
  constructor(private readonly model: IdealGasModel) {}
  value(T: number): number {
    return this.model.sR(T) - this.target;
  }
  slope(T: number): number {
    return this.model.cpR(T) / T;
  }
}

/**
 * The solver of one gas model: holds its residuals and result, so that solves allocate nothing.
 * One per model (the facade keeps one per gas object).
 */
export class IdealGasSolver {
  /** The last answer, K (valid when the status was ok). */
  readonly result = new RootResult();
  private readonly enthalpy: EnthalpyResidual;
  private readonly entropy: EntropyResidual;

  constructor(readonly model: IdealGasModel) {
    this.enthalpy = new EnthalpyResidual(model);
    this.entropy = new EntropyResidual(model);
  }

  /**
   * T (K) where h°/R̄ = hOverR (K), into `result.x`.
   * @returns {@link Status.ok}; {@link Status.outOfRange} when the root lies outside [Tmin, Tmax];
   *   {@link Status.invalidInput} for a non-finite target
   * @example
   * ```ts
   * const n2 = idealGas('N2').core;
   * const solver = new IdealGasSolver(n2);
   * solver.temperatureAtEnthalpy(1000 * n2.hRT(1000), 900);   //=> 0
   * solver.result.x;                                          //=> 1000.000000 (K)
   * ```
   */
  temperatureAtEnthalpy(hOverR: number, guess: number): StatusCode {
    if (!Number.isFinite(hOverR)) return Status.invalidInput;
    this.enthalpy.target = hOverR;
    return bracketedNewton(this.enthalpy, this.model.Tmin, this.model.Tmax, guess, 1e-13, this.result);
  }

  /**
   * T (K) where s°/R̄ = sOverR, into `result.x` (s° at p° = 100 kPa).
   * @returns as {@link IdealGasSolver.temperatureAtEnthalpy}
   */
  temperatureAtStandardEntropy(sOverR: number, guess: number): StatusCode {
    if (!Number.isFinite(sOverR)) return Status.invalidInput;
    this.entropy.target = sOverR;
    return bracketedNewton(this.entropy, this.model.Tmin, this.model.Tmax, guess, 1e-13, this.result);
  }

  /**
   * T2 (K) with s°(T2) − s°(T1) = R ln(p2/p1): the isentropic end temperature with variable cp, into
   * `result.x`. Starts from the constant-cp estimate at T1.
   * @returns {@link Status.ok}; {@link Status.outOfRange} when T2 falls outside the data;
   *   {@link Status.invalidInput} for non-finite or non-positive inputs
   * @example
   * ```ts
   * const solver = new IdealGasSolver(idealGas('air').core);
   * solver.isentropicTemperature(300, 100e3, 800e3);   //=> 0
   * solver.result.x;                                   //=> 539.61 (K)
   * ```
   */
  isentropicTemperature(T1: number, p1: number, p2: number): StatusCode {
    if (!(T1 > 0 && p1 > 0 && p2 > 0) || !Number.isFinite(T1) || !Number.isFinite(p1) || !Number.isFinite(p2)) return Status.invalidInput;
    const cpR = this.model.cpR(T1);
    const guess = T1 * (p2 / p1) ** (1 - 1 / (cpR / (cpR - 1)));
    return this.temperatureAtStandardEntropy(this.model.sR(T1) + Math.log(p2 / p1), guess);
  }
}

/**
 * Constant-cp isentropic end temperature: T2 = T1·(p2/p1)^((k−1)/k).
 * @example
 * ```ts
 * isentropicTemperatureConstantCp(1.4, 300, 100e3, 800e3);   //=> 543.4 (K)
 * ```
 */
export function isentropicTemperatureConstantCp(k: number, T1: number, p1: number, p2: number): number {
  return T1 * (p2 / p1) ** ((k - 1) / k);
}
