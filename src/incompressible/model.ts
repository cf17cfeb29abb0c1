/**
 * Incompressible substance model, plain-number SI core (K, Pa, J/kg, J/(kg·K), m³/kg).
 *
 * cp = cv = c(T); v = 1/ρ constant. Then
 *   Δu = ∫c dT,   Δs = ∫c/T dT,   Δh = Δu + v·Δp.
 * For solids v·Δp is negligible (Δh ≈ Δu); for a liquid pumped at constant temperature Δu = 0 and Δh = v·Δp.
 * c may be constant, a polynomial in T/K, or piecewise linear through tabulated points: all three
 * integrate analytically. No range checks here: the facade checks before calling.
 *
 * @module
 */
import { polynomialIntegral, polynomialOverXIntegral, polynomialValue } from '../numeric/polynomial.js';
import { piecewiseLinear, piecewiseLinearIntegral } from '../numeric/interpolate.js';

/** A compiled incompressible substance: everything in SI, ready for the kernels. */
export interface IncompressibleModel {
  /** How c depends on T. A constant is a one-term polynomial. */
  readonly heatCapacity: 'polynomial' | 'table';
  /** Polynomial coefficients of c in J/(kg·K) with T in K (ascending powers), for `polynomial`. */
  readonly coefficients: Float64Array;
  /** Node temperatures in K (strictly increasing), for `table`. */
  readonly nodesT: Float64Array;
  /** c at the nodes in J/(kg·K), for `table`. */
  readonly nodesC: Float64Array;
  /** Specific volume in m³/kg. */
  readonly v: number;
  /** Lower and upper temperature limits in K. */
  readonly Tmin: number;
  readonly Tmax: number;
}

/**
 * c(T) in J/(kg·K).
 * @example
 * ```ts
 * heatCapacityAt(lookupIncompressible('water').model, 298.15);   //=> 4182.25 (J/(kg·K))
 * ```
 */
export function heatCapacityAt(m: IncompressibleModel, T: number): number {
  return m.heatCapacity === 'polynomial' ? polynomialValue(m.coefficients, T) : piecewiseLinear(m.nodesT, m.nodesC, T);
}

/**
 * Δu = ∫ c dT from T1 to T2, in J/kg.
 * @example
 * ```ts
 * internalEnergyChange(lookupIncompressible('water').model, 293.15, 353.15);   //=> 251.1e3 (J/kg)
 * ```
 */
export function internalEnergyChange(m: IncompressibleModel, T1: number, T2: number): number {
  return m.heatCapacity === 'polynomial' ? polynomialIntegral(m.coefficients, T1, T2) : piecewiseLinearIntegral(m.nodesT, m.nodesC, T1, T2);
}

/**
 * Δs = ∫ c/T dT from T1 to T2, in J/(kg·K).
 * @example
 * ```ts
 * entropyChange(lookupIncompressible('water').model, 293.15, 353.15);   //=> 779 (J/(kg·K))
 * ```
 */
export function entropyChange(m: IncompressibleModel, T1: number, T2: number): number {
  return m.heatCapacity === 'polynomial' ? polynomialOverXIntegral(m.coefficients, T1, T2) : piecewiseLinearIntegral(m.nodesT, m.nodesC, T1, T2, true);
}

/**
 * Δh = Δu + v·(p2 − p1), in J/kg.
 * @example
 * ```ts
 * const { model } = lookupIncompressible('water');
 * enthalpyChange(model, 293.15, 1e5, 293.15, 5e6);   //=> 4914.7 (J/kg: v·Δp)
 * ```
 */
export function enthalpyChange(m: IncompressibleModel, T1: number, p1: number, T2: number, p2: number): number {
  return internalEnergyChange(m, T1, T2) + m.v * (p2 - p1);
}
