/**
 * The ideal-gas SI core solvers: temperature from enthalpy or entropy, and isentropic end states, on
 * the core contract (a status, a caller-owned result, no throw, no NaN answer). Each solve is a
 * bracketed Newton iteration on [Tmin, Tmax] of the model: dh/dT = cp, ds°/dT = cp/T. A target at
 * an end of the data, within one unit in the last place of the end's value (the rounding a caller's
 * unit conversion leaves, such as h/R of an h computed as R·(h/R)), gives the end temperature itself;
 * beyond that it is out of range.
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
   * const end = n2.Tmax * n2.hRT(n2.Tmax);                     // h°/R̄ at the top of the data
   * solver.temperatureAtEnthalpy(end, 900);                    //=> 0 (the end itself)
   * solver.result.x;                                           //=> 6000
   * solver.temperatureAtEnthalpy(end * (1 + 2 ** -49), 900);   //=> 1 (Status.outOfRange: 8 ulps past it)
   * ```
   */
  temperatureAtEnthalpy(hOverR: number, guess: number): StatusCode {
    if (!Number.isFinite(hOverR)) return Status.invalidInput;
    this.enthalpy.target = hOverR;
    return this.solve(this.enthalpy, hOverR, guess);
  }

  /**
   * T (K) where s°/R̄ = sOverR, into `result.x` (s° at p° = 100 kPa).
   * @returns as {@link IdealGasSolver.temperatureAtEnthalpy}
   */
  temperatureAtStandardEntropy(sOverR: number, guess: number): StatusCode {
    if (!Number.isFinite(sOverR)) return Status.invalidInput;
    this.entropy.target = sOverR;
    return this.solve(this.entropy, sOverR, guess);
  }

  /** The bracketed solve on [Tmin, Tmax]; a target within one ulp past an end is that end. */
  private solve(f: ResidualWithSlope, target: number, guess: number): StatusCode {
    const { Tmin, Tmax } = this.model;
    const status = bracketedNewton(f, Tmin, Tmax, guess, 1e-13, this.result);
    if (status !== Status.outOfRange) return status;
    return this.atEnd(f, target, Tmin) || this.atEnd(f, target, Tmax) ? Status.ok : status;
  }

  /** True (with result.x = T) when the end value at T misses the target by at most its last-place unit. */
  private atEnd(f: ResidualWithSlope, target: number, T: number): boolean {
    // f at an end is the end's value minus the target
    const miss = f.value(T);
    if (!(Math.abs(miss) <= ulp(miss + target))) return false;
    this.result.x = T;
    this.result.iterations = 0;
    return true;
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

/** One unit in the last place of a finite x ≠ 0 (the spacing of doubles at |x|); the smallest double at 0. */
function ulp(x: number): number {
  const a = Math.abs(x);
  if (!(a >= 2 ** -1022)) return Number.MIN_VALUE;
  let e = Math.floor(Math.log2(a));
  if (2 ** e > a) e--;
  else if (2 ** (e + 1) <= a) e++;
  return 2 ** (e - 52);
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
