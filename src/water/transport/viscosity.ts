/**
 * Viscosity of water and steam: IAPWS R12-08, Release on the IAPWS Formulation 2008 for the
 * Viscosity of Ordinary Water Substance.
 *   μ = μ* · μ̄0(T̄) · μ̄1(T̄, ρ̄) · μ̄2(T̄, ρ̄)                                    (Eq. 2)
 *   μ̄0 = 100 √T̄ / Σ_{i=0..3} H_i / T̄^i                                    (Eq. 11, Table 1)
 *   μ̄1 = exp[ρ̄ Σ_{i=0..5} (1/T̄ − 1)^i Σ_{j=0..6} H_ij (ρ̄ − 1)^j]           (Eq. 12, Table 2)
 *   μ̄2 = exp(x_μ Y(ξ))                                                    (Eqs. 14-18, Table 3)
 * with T̄ = T/647.096 K, ρ̄ = ρ/322 kg/m³, μ* = 1 µPa·s. Verification: Table 4 (μ̄2 = 1) and
 * Table 5 (near the critical point, with μ̄2). The release recommends μ̄2 = 1 for industrial use: the
 * enhancement exceeds 2 % only for 645.91 K < T < 650.77 K and 245.8 < ρ < 405.3 kg/m³.
 *
 * Coefficients: data/transport/water-viscosity.json (recalled; they reproduce all of Table 4).
 *
 * @module
 */
import data from '../../../data/transport/water-viscosity.json';
import { Status, type StatusCode } from '../../core/status.js';
import { steppedPressureLimit } from './pressure-steps.js';
import { correlationLength, CriticalEnhancementInputs, enhancementInputsValid } from './critical.js';

const REF = data.reference;
const H = data.dilute.H;
const H0 = H[0]!;
const H1 = H[1]!;
const H2 = H[2]!;
const H3 = H[3]!;
const ROWS = data.residual.Hij.length;
const COLS = data.residual.Hij[0]!.length;
/** H_ij row by row, i = 0..5 (powers of 1/T̄ − 1), j = 0..6 (powers of ρ̄ − 1). */
const HIJ = Float64Array.from(data.residual.Hij.flat());
const C = data.critical;
const X_MU = C.xMu;
const QC = 1 / C.qCInverse;
const QD = 1 / C.qDInverse;
const SERIES_LIMIT = C.seriesLimit;

/** The viscosity unit of the release's reduced values, μ* = 1 µPa·s = 1e-6 Pa·s (Eq. 4). */
export const MU_REFERENCE = REF.mu;
/** Lower temperature limit offered here, K: the release starts at the melting line; 273.15 K is IF97's lower limit. */
export const VISCOSITY_T_MIN = data.range.Tmin;
/** Upper temperature limit of IAPWS R12-08, 1173.15 K. */
export const VISCOSITY_T_MAX = data.range.Tmax;
/**
 * Pressure limits of IAPWS R12-08 by temperature, [upper T of the band in K, highest p in Pa]:
 * 1000 MPa to 433.15 K, 500 MPa to 873.15 K, 300 MPa to 1173.15 K (stable fluid states).
 */
export const VISCOSITY_PRESSURE_LIMITS: readonly (readonly [number, number])[] = data.range.pressureSteps.map(([T, p]) => [T!, p!] as const);
/**
 * The window in which μ̄2 exceeds 1.02 (as recalled from R12-08): outside it, leaving the enhancement out
 * changes μ by less than 2 %.
 */
export const VISCOSITY_ENHANCEMENT_WINDOW = C.significantRegion;

/** Viscosity and its factors, filled by {@link viscosity}. Reuse one instance. */
export class ViscosityResult {
  /** Dynamic viscosity μ, Pa·s. */
  mu = 0;
  /** Dilute-gas viscosity μ0(T) = μ* μ̄0, Pa·s. */
  mu0 = 0;
  /** Residual factor μ̄1(T, ρ), dimensionless. */
  mu1 = 0;
  /** Critical-enhancement factor μ̄2(T, ρ), dimensionless; exactly 1 when the enhancement is left out. */
  mu2 = 1;
}

/**
 * The highest pressure (Pa) at which IAPWS R12-08 is valid at T (K); 0 outside its temperature range.
 * @example
 * ```ts
 * viscosityPressureLimit(300);    //=> 1e9 (Pa)
 * viscosityPressureLimit(1000);   //=> 3e8 (Pa)
 * viscosityPressureLimit(1200);   //=> 0 (above 1173.15 K)
 * ```
 */
export function viscosityPressureLimit(T: number): number {
  return steppedPressureLimit(T, VISCOSITY_T_MIN, VISCOSITY_T_MAX, VISCOSITY_PRESSURE_LIMITS);
}

/** μ̄0(T̄) (Eq. 11). */
function dilute(t: number): number {
  const r = 1 / t;
  return (100 * Math.sqrt(t)) / (H0 + r * (H1 + r * (H2 + r * H3)));
}

/** μ̄1(T̄, ρ̄) (Eq. 12), Horner in both variables. */
function residual(t: number, d: number): number {
  const x = 1 / t - 1;
  const y = d - 1;
  let outer = 0;
  for (let i = ROWS - 1; i >= 0; i--) {
    const o = i * COLS;
    let inner = 0;
    for (let j = COLS - 1; j >= 0; j--) inner = inner * y + HIJ[o + j]!;
    outer = outer * x + inner;
  }
  return Math.exp(d * outer);
}

/** Y(ξ) of Eqs. 15-18 (ξ in m). */
function enhancementY(xi: number): number {
  if (xi <= 0) return 0;
  const a = QC * xi;
  const b = QD * xi;
  if (xi <= SERIES_LIMIT) {
    const b2 = b * b;
    return 0.2 * a * b2 * b2 * b * (1 - a + a * a - (765 / 504) * b2);
  }
  const psi = Math.acos(1 / Math.sqrt(1 + b * b));
  const w = Math.sqrt(Math.abs((a - 1) / (a + 1))) * Math.tan(psi / 2);
  const L = a > 1 ? Math.log((1 + w) / (1 - w)) : 2 * Math.atan(Math.abs(w));
  const a2 = a * a;
  return (
    Math.sin(3 * psi) / 12 -
    Math.sin(2 * psi) / (4 * a) +
    ((1 - 1.25 * a2) * Math.sin(psi)) / a2 -
    ((1 - 1.5 * a2) * psi - Math.pow(Math.abs(a2 - 1), 1.5) * L) / (a2 * a)
  );
}

/**
 * The critical-enhancement factor μ̄2 at (T, ρ) from the derivative inputs (Eq. 14), inputs checked
 * by the caller.
 * @example
 * ```ts
 * const d = new CriticalEnhancementInputs();
 * if97EnhancementInputs(647.35, 322, d, new If97InputsWork());
 * viscosityEnhancement(647.35, 322, d);   //=> 1.0754 (IF97 derivatives; 7.5 % at the critical density)
 * ```
 */
export function viscosityEnhancement(T: number, rho: number, d: CriticalEnhancementInputs): number {
  return Math.exp(X_MU * enhancementY(correlationLength(T, rho, d)));
}

/**
 * Reduced viscosity μ̄ = μ/μ* at (T, ρ), with or without μ̄2, inputs checked by the caller (the
 * thermal-conductivity enhancement divides by it).
 * @example
 * ```ts
 * reducedViscosity(298.15, 998, false, new CriticalEnhancementInputs());   //=> 889.7351 (µPa·s / 1 µPa·s)
 * ```
 */
export function reducedViscosity(T: number, rho: number, enhancement: boolean, d: CriticalEnhancementInputs): number {
  const t = T / REF.T;
  const m = dilute(t) * residual(t, rho / REF.rho);
  return enhancement ? m * viscosityEnhancement(T, rho, d) : m;
}

/**
 * Reduced viscosity μ̄ = μ̄0 μ̄1 μ̄2 at (T, ρ) with μ̄2 from a correlation length ξ (m) the caller has
 * already computed (the conductivity enhancement shares it).
 * @example
 * ```ts
 * reducedViscosityAtLength(647.35, 322, 0);   //=> 39.3455 (μ̄2 = 1 when ξ = 0)
 * ```
 */
export function reducedViscosityAtLength(T: number, rho: number, xi: number): number {
  const t = T / REF.T;
  return dilute(t) * residual(t, rho / REF.rho) * Math.exp(X_MU * enhancementY(xi));
}

/**
 * Viscosity μ (Pa·s) of water or steam at (T [K], ρ [kg/m³]), IAPWS R12-08, written to `out`.
 *
 * `enhancement = false` leaves the critical enhancement out (μ̄2 = 1, the release's recommendation for
 * industrial use); `derivatives` is then not read. With `enhancement = true`, `derivatives` must hold
 * cp, cv and (∂ρ/∂p)_T at (T, ρ) and (∂ρ/∂p)_T at (T_R, ρ) from an equation of state.
 *
 * Returns `Status.invalidInput` for non-finite or negative inputs (or unusable derivatives),
 * `Status.outOfRange` for T outside 273.15 K to 1173.15 K. The release limits pressure, not density,
 * and this function cannot know the pressure: callers with a pressure check it against
 * {@link viscosityPressureLimit}.
 * @example
 * ```ts
 * const out = new ViscosityResult();
 * const none = new CriticalEnhancementInputs();   // not read without the enhancement
 * viscosity(298.15, 998, false, none, out);   //=> 0 (Status.ok); out.mu = 889.7351e-6 Pa·s (R12-08 Table 4)
 * viscosity(1200, 1, false, none, out);       //=> 1 (Status.outOfRange: above 1173.15 K)
 * ```
 */
export function viscosity(T: number, rho: number, enhancement: boolean, derivatives: CriticalEnhancementInputs, out: ViscosityResult): StatusCode {
  if (!Number.isFinite(T) || !Number.isFinite(rho) || !(rho >= 0) || !(T > 0)) return Status.invalidInput;
  if (!(T >= VISCOSITY_T_MIN && T <= VISCOSITY_T_MAX)) return Status.outOfRange;
  const t = T / REF.T;
  const d = rho / REF.rho;
  out.mu0 = REF.mu * dilute(t);
  out.mu1 = residual(t, d);
  if (enhancement) {
    if (!enhancementInputsValid(derivatives)) return Status.invalidInput;
    out.mu2 = viscosityEnhancement(T, rho, derivatives);
  } else {
    out.mu2 = 1;
  }
  out.mu = out.mu0 * out.mu1 * out.mu2;
  return Status.ok;
}
