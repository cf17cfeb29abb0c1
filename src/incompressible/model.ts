/**
 * Incompressible substance model, plain-number SI core (K, Pa, J/kg, J/(kg·K), m³/kg).
 *
 * cp = cv = c(T); ρ constant or ρ(T) piecewise linear through tabulated points, v = 1/ρ. Then
 *   Δu = ∫c dT,   Δs = ∫c/T dT,   Δh = Δu + v̄·Δp,   v̄ = (v(T1) + v(T2))/2.
 * For solids v·Δp is negligible (Δh ≈ Δu); for a liquid pumped at constant temperature Δu = 0 and Δh = v(T)·Δp.
 * c may be constant, a polynomial in T/K, or piecewise linear through tabulated points: all three
 * integrate analytically. No range checks here: the facade checks before calling.
 *
 * Why v̄ = (v(T1) + v(T2))/2 and not v(T2)·p2 − v(T1)·p1: c is the isobaric heat capacity a handbook
 * tabulates, so ∫c dT at constant pressure is already the enthalpy change (it includes the expansion
 * work p·Δv); adding Δ(p·v) would count that work twice. With v depending on T and c not on p, the
 * model is not path-independent: pumping first then heating gives v(T1)·Δp, heating first then
 * pumping gives v(T2)·Δp. v̄ is the mean of the two, so the ambiguity is ±½·|v(T2) − v(T1)|·|Δp|.
 * It keeps Δh = ∫c dT at constant pressure and Δh = v(T)·Δp at constant temperature, exactly, and
 * reduces to v·Δp for constant density. (A real liquid has (∂h/∂p)_T = v·(1 − βT), β the expansion
 * coefficient; the incompressible model ignores βT, as every incompressible model does.)
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
  /**
   * Specific volume in m³/kg: the constant value, or, when ρ depends on T (`density: 'table'`), its
   * value at 298.15 K (or at the nearer end of the range when 298.15 K lies outside it).
   */
  readonly v: number;
  /** Lower and upper temperature limits in K. */
  readonly Tmin: number;
  readonly Tmax: number;
  /** How ρ depends on T: `'constant'` (1/v) or `'table'` (piecewise linear through nodesTrho, nodesRho). */
  readonly density: 'constant' | 'table';
  /** Node temperatures of the density table in K (strictly increasing), for `density: 'table'`. */
  readonly nodesTrho: Float64Array;
  /** ρ at those nodes in kg/m³. */
  readonly nodesRho: Float64Array;
}

/**
 * ρ(T) in kg/m³: constant, or piecewise linear through the tabulated points.
 * @example
 * ```ts
 * densityAt(lookupIncompressible('water').model, 353.15);   //=> 971.78 (kg/m³, saturated liquid at 80 °C)
 * densityAt(lookupIncompressible('copper').model, 500);     //=> 8933 (constant)
 * ```
 */
export function densityAt(m: IncompressibleModel, T: number): number {
  return m.density === 'table' ? piecewiseLinear(m.nodesTrho, m.nodesRho, T) : 1 / m.v;
}

/**
 * c(T) in J/(kg·K).
 * @example
 * ```ts
 * heatCapacityAt(lookupIncompressible('water').model, 298.15);   //=> 4182.18 (J/(kg·K), IF97 saturated liquid)
 * ```
 */
export function heatCapacityAt(m: IncompressibleModel, T: number): number {
  return m.heatCapacity === 'polynomial' ? polynomialValue(m.coefficients, T) : piecewiseLinear(m.nodesT, m.nodesC, T);
}

/**
 * Δu = ∫ c dT from T1 to T2, in J/kg.
 * @example
 * ```ts
 * internalEnergyChange(lookupIncompressible('water').model, 293.15, 353.15);   //=> 251.0e3 (J/kg)
 * ```
 */
export function internalEnergyChange(m: IncompressibleModel, T1: number, T2: number): number {
  return m.heatCapacity === 'polynomial' ? polynomialIntegral(m.coefficients, T1, T2) : piecewiseLinearIntegral(m.nodesT, m.nodesC, T1, T2);
}

/**
 * Δs = ∫ c/T dT from T1 to T2, in J/(kg·K).
 * @example
 * ```ts
 * entropyChange(lookupIncompressible('water').model, 293.15, 353.15);   //=> 778.9 (J/(kg·K))
 * ```
 */
export function entropyChange(m: IncompressibleModel, T1: number, T2: number): number {
  return m.heatCapacity === 'polynomial' ? polynomialOverXIntegral(m.coefficients, T1, T2) : piecewiseLinearIntegral(m.nodesT, m.nodesC, T1, T2, true);
}

/**
 * Δh = Δu + v̄·(p2 − p1), in J/kg, with v̄ = (v(T1) + v(T2))/2 (see the module comment for why).
 * @example
 * ```ts
 * const { model } = lookupIncompressible('water');
 * enthalpyChange(model, 293.15, 1e5, 293.15, 5e6);   //=> 4909.0 (J/kg: v(20 °C)·Δp)
 * ```
 */
export function enthalpyChange(m: IncompressibleModel, T1: number, p1: number, T2: number, p2: number): number {
  const v = m.density === 'table' ? 0.5 / piecewiseLinear(m.nodesTrho, m.nodesRho, T1) + 0.5 / piecewiseLinear(m.nodesTrho, m.nodesRho, T2) : m.v;
  return internalEnergyChange(m, T1, T2) + v * (p2 - p1);
}
