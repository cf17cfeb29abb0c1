/**
 * Incompressible substance model, plain-number SI core (K, Pa, J/kg, J/(kg·K), m³/kg).
 *
 * cp = cv = c(T); ρ constant or ρ(T) piecewise linear through tabulated points, v = 1/ρ. Then
 *   Δu = ∫c dT,   Δs = ∫c/T dT,
 *   h(T, p) − h(T0, p0) = ∫c dT + v(T)·(p − p_ref) − v(T0)·(p0 − p_ref),   p_ref = 101 325 Pa.
 * For solids v·Δp is negligible (Δh ≈ Δu); for a liquid pumped at constant temperature Δu = 0 and Δh = v(T)·Δp.
 * c may be constant, a polynomial in T/K, or piecewise linear through tabulated points: all three
 * integrate analytically. No range checks here: the facade checks before calling.
 *
 * The enthalpy is a function of the state (T, p), so Δh between two states is the difference of
 * their h whatever the path, and `deltaH(1, 2)` equals `state(2).h − state(1).h`. It is the one such
 * function with the two properties the model claims: (∂h/∂T)_p = c at the reference pressure (c is
 * the isobaric heat capacity a handbook tabulates, near 1 atm, so heating at that pressure takes
 * exactly ∫c dT) and (∂h/∂p)_T = v(T) (pumping at constant temperature takes v·Δp). At another
 * pressure (∂h/∂T)_p = c + (p − p_ref)·dv/dT: the expansion against the extra pressure. For constant
 * density h reduces to the textbook u + p·v form, Δh = Δu + v·Δp.
 *
 * Why not h = u + p·v with u = ∫c dT when ρ depends on T: that adds Δ(p·v) = p·Δv at constant
 * pressure on top of ∫c dT, and c, being isobaric, already contains that expansion work, so it would
 * be counted twice. Here u keeps ∫c dT (so Δu = ∫c dT exactly), and h − p·v differs from u by
 * p_ref·(v(T) − v(T_ref)), the expansion work against p_ref: at most 75 J/kg for the catalogue's
 * liquid water over 0.01–350 °C, at most 13 J/kg for its other liquids. (A real liquid has
 * (∂h/∂p)_T = v·(1 − βT), β the expansion coefficient; the incompressible model ignores βT, as every
 * incompressible model does.)
 *
 * @module
 */
import { polynomialIntegral, polynomialOverXIntegral, polynomialValue } from '../numeric/polynomial.js';
import { piecewiseLinear, piecewiseLinearIntegral } from '../numeric/interpolate.js';
import { STANDARD_ATMOSPHERE_PA } from '../chem/constants.js';

/** The model's reference pressure p_ref, Pa: one standard atmosphere (the pressure of the handbook c and ρ). */
export const REFERENCE_PRESSURE = STANDARD_ATMOSPHERE_PA;

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
 * Δh = h(T2, p2) − h(T1, p1) in J/kg: ∫c dT + v(T2)·(p2 − p_ref) − v(T1)·(p1 − p_ref), p_ref =
 * `REFERENCE_PRESSURE` (1 atm); for constant density ∫c dT + v·(p2 − p1). A difference of one state
 * function (see the module comment), so it is additive and path-independent.
 * @example
 * ```ts
 * const { model } = lookupIncompressible('water');
 * enthalpyChange(model, 293.15, 1e5, 293.15, 5e6);   //=> 4909.0 (J/kg: v(20 °C)·Δp)
 * enthalpyChange(model, 293.15, 101325, 353.15, 101325) - internalEnergyChange(model, 293.15, 353.15);   //=> 0 (at p_ref: Δh = ∫c dT)
 * ```
 */
export function enthalpyChange(m: IncompressibleModel, T1: number, p1: number, T2: number, p2: number): number {
  const du = internalEnergyChange(m, T1, T2);
  if (m.density !== 'table') return du + m.v * (p2 - p1);
  const v1 = 1 / piecewiseLinear(m.nodesTrho, m.nodesRho, T1);
  const v2 = 1 / piecewiseLinear(m.nodesTrho, m.nodesRho, T2);
  return du + (v2 * (p2 - REFERENCE_PRESSURE) - v1 * (p1 - REFERENCE_PRESSURE));
}
