/**
 * Ideal-gas models, plain-number SI core. Every model gives, per mole and divided by R̄:
 *   cpR(T) = cp°/R̄,   hRT(T) = h°/(R̄T) (total: includes the enthalpy of formation at 298.15 K),
 *   sR(T) = s°/R̄ at p° = 100 kPa.
 * Mass-basis values follow with R = R̄/M. No range checks, no allocation: the facade checks first.
 *
 * The NASA Glenn polynomial form (McBride, Zehe & Gordon, NASA/TP-2002-211556), per interval,
 * with seven cp terms a1..a7 and integration constants b1, b2:
 *   cp°/R = a1 T⁻² + a2 T⁻¹ + a3 + a4 T + a5 T² + a6 T³ + a7 T⁴
 *   h°/(RT) = −a1 T⁻² + a2 ln(T)/T + a3 + a4 T/2 + a5 T²/3 + a6 T³/4 + a7 T⁴/5 + b1/T
 *   s°/R = −a1 T⁻²/2 − a2 T⁻¹ + a3 ln T + a4 T + a5 T²/2 + a6 T³/3 + a7 T⁴/4 + b2
 * The older 7-coefficient form (McBride, Gordon & Reno, NASA TM-4513, 1993) is the special case
 * a1 = a2 = 0: its coefficients [c1..c7] load as [0, 0, c1, c2, c3, c4, c5, c6, c7].
 *
 * @module
 */
import { MOLAR_GAS_CONSTANT, REFERENCE_TEMPERATURE_K } from '../chem/constants.js';

/** What every ideal-gas model provides to the facade and the process solvers. */
export interface IdealGasModel {
  /** Molar mass, kg/mol. */
  readonly M: number;
  /** Specific gas constant R̄/M, J/(kg·K). */
  readonly R: number;
  /** Valid temperature range, K. */
  readonly Tmin: number;
  readonly Tmax: number;
  /** cp°/R̄ at T (K). */
  cpR(T: number): number;
  /** h°/(R̄T) at T (K), including the enthalpy of formation. */
  hRT(T: number): number;
  /** s°/R̄ at T (K) and p° = 100 kPa. */
  sR(T: number): number;
}

/**
 * Converts the older 7-coefficient form [c1..c7] to the nine constants [a1..a7, b1, b2].
 * @example
 * ```ts
 * fromSevenCoefficients([3.5, 0, 0, 0, 0, -1000, 4]);   //=> [0, 0, 3.5, 0, 0, 0, 0, -1000, 4]
 * ```
 */
export function fromSevenCoefficients(c: ArrayLike<number>): number[] {
  return [0, 0, c[0]!, c[1]!, c[2]!, c[3]!, c[4]!, c[5]!, c[6]!];
}

/** A NASA Glenn polynomial model with two intervals split at Tmid. */
export class NasaPolynomialModel implements IdealGasModel {
  readonly M: number;
  readonly R: number;
  readonly Tmin: number;
  readonly Tmid: number;
  readonly Tmax: number;
  /** The nine constants [a1..a7, b1, b2]: [0..8] below Tmid, [9..17] from Tmid up. */
  readonly coefficients: Float64Array;
  // per interval, coefficients pre-divided for h and s (no division per call)
  private readonly h: Float64Array;
  private readonly s: Float64Array;
  /** Whether any interval has T⁻¹ or T⁻² terms (the 9-constant form proper). */
  private readonly inverse: boolean;

  constructor(M: number, Tmin: number, Tmid: number, Tmax: number, low: ArrayLike<number>, high: ArrayLike<number>) {
    this.M = M;
    this.R = MOLAR_GAS_CONSTANT / M;
    this.Tmin = Tmin;
    this.Tmid = Tmid;
    this.Tmax = Tmax;
    this.coefficients = new Float64Array(18);
    this.h = new Float64Array(18);
    this.s = new Float64Array(18);
    let inverse = false;
    for (let k = 0; k < 2; k++) {
      const a = k === 0 ? low : high;
      const o = 9 * k;
      for (let i = 0; i < 9; i++) this.coefficients[o + i] = a[i]!;
      if (a[0] !== 0 || a[1] !== 0) inverse = true;
      // h: [−a1, a2, a3, a4/2, a5/3, a6/4, a7/5, b1]
      this.h[o] = -a[0]!;
      this.h[o + 1] = a[1]!;
      this.h[o + 2] = a[2]!;
      this.h[o + 3] = a[3]! / 2;
      this.h[o + 4] = a[4]! / 3;
      this.h[o + 5] = a[5]! / 4;
      this.h[o + 6] = a[6]! / 5;
      this.h[o + 7] = a[7]!;
      // s: [−a1/2, −a2, a3, a4, a5/2, a6/3, a7/4, b2]
      this.s[o] = -a[0]! / 2;
      this.s[o + 1] = -a[1]!;
      this.s[o + 2] = a[2]!;
      this.s[o + 3] = a[3]!;
      this.s[o + 4] = a[4]! / 2;
      this.s[o + 5] = a[5]! / 3;
      this.s[o + 6] = a[6]! / 4;
      this.s[o + 7] = a[8]!;
    }
    this.inverse = inverse;
  }

  cpR(T: number): number {
    const c = this.coefficients;
    const o = T < this.Tmid ? 0 : 9;
    const poly = c[o + 2]! + T * (c[o + 3]! + T * (c[o + 4]! + T * (c[o + 5]! + T * c[o + 6]!)));
    if (!this.inverse) return poly;
    const r = 1 / T;
    return poly + r * (c[o + 1]! + r * c[o]!);
  }

  hRT(T: number): number {
    const c = this.h;
    const o = T < this.Tmid ? 0 : 9;
    const r = 1 / T;
    const poly = c[o + 2]! + T * (c[o + 3]! + T * (c[o + 4]! + T * (c[o + 5]! + T * c[o + 6]!))) + c[o + 7]! * r;
    if (!this.inverse) return poly;
    return poly + r * (c[o + 1]! * Math.log(T) + r * c[o]!);
  }

  sR(T: number): number {
    const c = this.s;
    const o = T < this.Tmid ? 0 : 9;
    const poly = c[o + 2]! * Math.log(T) + T * (c[o + 3]! + T * (c[o + 4]! + T * (c[o + 5]! + T * c[o + 6]!))) + c[o + 7]!;
    if (!this.inverse) return poly;
    const r = 1 / T;
    return poly + r * (c[o + 1]! + r * c[o]!);
  }
}

/**
 * Constant cp: cp°/R̄ = cpR0; h° = h0 + cp (T − T0); s° = s0 + cp ln(T/T0), with h0 and s0 the
 * values at the reference temperature T0 (from the polynomial model it was made from, or 0).
 */
export class ConstantCpModel implements IdealGasModel {
  readonly M: number;
  readonly R: number;
  readonly Tmin: number;
  readonly Tmax: number;
  /** cp°/R̄. */
  readonly cpR0: number;
  /** Reference temperature T0, K. */
  readonly T0: number;
  private readonly h0R: number;
  private readonly s0R: number;

  constructor(M: number, cpR0: number, T0: number, h0R: number, s0R: number, Tmin: number, Tmax: number) {
    this.M = M;
    this.R = MOLAR_GAS_CONSTANT / M;
    this.cpR0 = cpR0;
    this.T0 = T0;
    this.h0R = h0R;
    this.s0R = s0R;
    this.Tmin = Tmin;
    this.Tmax = Tmax;
  }

  cpR(): number {
    return this.cpR0;
  }

  hRT(T: number): number {
    return (this.h0R + this.cpR0 * (T - this.T0)) / T;
  }

  sR(T: number): number {
    return this.s0R + this.cpR0 * Math.log(T / this.T0);
  }
}

/**
 * A constant-cp model frozen from another model at T0 (default 298.15 K): same h° and s° at T0.
 * @example
 * ```ts
 * const cold: IdealGasModel = constantCpFrom(idealGas('air').core);   // cp frozen at 298.15 K
 * cold.cpR(1000) === cold.cpR(300);                                   //=> true
 * ```
 */
export function constantCpFrom(model: IdealGasModel, T0 = REFERENCE_TEMPERATURE_K): ConstantCpModel {
  return new ConstantCpModel(model.M, model.cpR(T0), T0, model.hRT(T0) * T0, model.sR(T0), model.Tmin, model.Tmax);
}

/**
 * An ideal mixture, per mole of mixture: cp = Σ yᵢ cpᵢ, h = Σ yᵢ hᵢ, s° = Σ yᵢ sᵢ° − R̄ Σ yᵢ ln yᵢ
 * (the ideal entropy of mixing at the mixture pressure is included in s°).
 * Used when components split their intervals at different temperatures; otherwise
 * {@link mixNasa} folds the mixture into one polynomial model.
 */
export class MixtureModel implements IdealGasModel {
  readonly M: number;
  readonly R: number;
  readonly Tmin: number;
  readonly Tmax: number;
  private readonly parts: readonly IdealGasModel[];
  private readonly y: Float64Array;
  private readonly mixingR: number;

  constructor(parts: readonly IdealGasModel[], moleFractions: ArrayLike<number>) {
    this.parts = parts;
    this.y = Float64Array.from(moleFractions);
    let M = 0;
    let mixing = 0;
    let Tmin = -Infinity;
    let Tmax = Infinity;
    parts.forEach((p, i) => {
      const yi = this.y[i]!;
      M += yi * p.M;
      if (yi > 0) mixing -= yi * Math.log(yi);
      Tmin = Math.max(Tmin, p.Tmin);
      Tmax = Math.min(Tmax, p.Tmax);
    });
    this.M = M;
    this.R = MOLAR_GAS_CONSTANT / M;
    this.mixingR = mixing;
    this.Tmin = Tmin;
    this.Tmax = Tmax;
  }

  cpR(T: number): number {
    let acc = 0;
    for (let i = 0; i < this.parts.length; i++) acc += this.y[i]! * this.parts[i]!.cpR(T);
    return acc;
  }

  hRT(T: number): number {
    let acc = 0;
    for (let i = 0; i < this.parts.length; i++) acc += this.y[i]! * this.parts[i]!.hRT(T);
    return acc;
  }

  sR(T: number): number {
    let acc = this.mixingR;
    for (let i = 0; i < this.parts.length; i++) acc += this.y[i]! * this.parts[i]!.sR(T);
    return acc;
  }
}

/**
 * Folds an ideal mixture of NASA polynomial models that share Tmid into one model: the constants
 * are mole-fraction averages, and −Σ yᵢ ln yᵢ is added to b2 (entropy of mixing). Returns
 * `undefined` when the components split at different temperatures.
 * @example
 * ```ts
 * const n2 = idealGas('N2').core as NasaPolynomialModel;
 * const o2 = idealGas('O2').core as NasaPolynomialModel;
 * mixNasa([n2, o2], [0.79, 0.21])?.M;   //=> 0.028851 (kg/mol)
 * ```
 */
export function mixNasa(parts: readonly NasaPolynomialModel[], moleFractions: ArrayLike<number>): NasaPolynomialModel | undefined {
  const Tmid = parts[0]!.Tmid;
  if (parts.some((p) => p.Tmid !== Tmid)) return undefined;
  const low = new Float64Array(9);
  const high = new Float64Array(9);
  let M = 0;
  let Tmin = -Infinity;
  let Tmax = Infinity;
  parts.forEach((p, k) => {
    const y = moleFractions[k]!;
    for (let i = 0; i < 9; i++) {
      low[i]! += y * p.coefficients[i]!;
      high[i]! += y * p.coefficients[9 + i]!;
    }
    if (y > 0) {
      low[8]! -= y * Math.log(y);
      high[8]! -= y * Math.log(y);
    }
    M += y * p.M;
    Tmin = Math.max(Tmin, p.Tmin);
    Tmax = Math.min(Tmax, p.Tmax);
  });
  return new NasaPolynomialModel(M, Tmin, Tmid, Tmax, low, high);
}
