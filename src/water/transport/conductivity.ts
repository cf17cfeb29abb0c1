/**
 * Thermal conductivity of water and steam: IAPWS R15-11, Release on the IAPWS Formulation 2011 for
 * the Thermal Conductivity of Ordinary Water Substance.
 *   λ = λ* [λ̄0(T̄) · λ̄1(T̄, ρ̄) + λ̄2(T̄, ρ̄)]                                  (Eq. 10)
 *   λ̄0 = √T̄ / Σ_{k=0..4} L_k / T̄^k                                        (Eq. 16, Table 1)
 *   λ̄1 = exp[ρ̄ Σ_{i=0..4} (1/T̄ − 1)^i Σ_{j=0..5} L_ij (ρ̄ − 1)^j]          (Eq. 17, Table 2)
 *   λ̄2 = Λ ρ̄ c̄p T̄ / μ̄ · Z(y),  y = q̄_D ξ                                  (Eqs. 18-20, Table 3)
 *   Z = 2/(π y) {[(1 − κ⁻¹) arctan y + κ⁻¹ y] − [1 − exp(−1/(y⁻¹ + y²/(3ρ̄²)))]}, Z = 0 for y < 1.2e-7
 * with T̄ = T/647.096 K, ρ̄ = ρ/322 kg/m³, λ* = 1 mW/(m·K), c̄p = cp/R (R = 461.51805 J/(kg·K)),
 * κ = cp/cv, μ̄ = μ/1 µPa·s from IAPWS R12-08 (with its μ̄2 when the enhancement is on), and ξ from
 * the shared relation in `critical.ts`. Verification: Table 4 (λ̄2 = 0) and Table 5 (T = 647.35 K,
 * with λ̄2).
 *
 * Coefficients: data/transport/water-conductivity.json (recalled; they reproduce all of Table 4).
 *
 * @module
 */
import data from '../../../data/transport/water-conductivity.json';
import { Status, type StatusCode } from '../../core/status.js';
import { steppedPressureLimit } from './pressure-steps.js';
import { correlationLength, CriticalEnhancementInputs, enhancementInputsValid } from './critical.js';
import { reducedViscosityAtLength } from './viscosity.js';

const REF = data.reference;
const L = data.dilute.L;
const L0 = L[0]!;
const L1 = L[1]!;
const L2 = L[2]!;
const L3 = L[3]!;
const L4 = L[4]!;
const ROWS = data.residual.Lij.length;
const COLS = data.residual.Lij[0]!.length;
/** L_ij row by row, i = 0..4 (powers of 1/T̄ − 1), j = 0..5 (powers of ρ̄ − 1). */
const LIJ = Float64Array.from(data.residual.Lij.flat());
const C = data.critical;
const LAMBDA_CAPITAL = C.Lambda;
const QD = 1 / C.qDInverse;
const Y_MIN = C.yMin;

/** Lower temperature limit offered here, K: the release starts at the melting line; 273.15 K is IF97's lower limit. */
export const CONDUCTIVITY_T_MIN = data.range.Tmin;
/** Upper temperature limit of IAPWS R15-11, 1173.15 K. */
export const CONDUCTIVITY_T_MAX = data.range.Tmax;
/**
 * Pressure limits of IAPWS R15-11 by temperature, [upper T of the band in K, highest p in Pa]:
 * 1000 MPa to 398.15 K, 200 MPa to 523.15 K, 150 MPa to 673.15 K, 100 MPa to 1173.15 K.
 */
export const CONDUCTIVITY_PRESSURE_LIMITS: readonly (readonly [number, number])[] = data.range.pressureSteps.map(([T, p]) => [T!, p!] as const);

/** Thermal conductivity and its parts, filled by {@link thermalConductivity}. Reuse one instance. */
export class ConductivityResult {
  /** Thermal conductivity λ, W/(m·K). */
  lambda = 0;
  /** Dilute-gas conductivity λ0(T) = λ* λ̄0, W/(m·K). */
  lambda0 = 0;
  /** Residual factor λ̄1(T, ρ), dimensionless. */
  lambda1 = 0;
  /** Critical enhancement λ2 = λ* λ̄2, W/(m·K); exactly 0 when it is left out. */
  lambda2 = 0;
}

/**
 * The highest pressure (Pa) at which IAPWS R15-11 is valid at T (K); 0 outside its temperature range.
 * @example
 * ```ts
 * conductivityPressureLimit(300);   //=> 1e9 (Pa)
 * conductivityPressureLimit(700);   //=> 1e8 (Pa)
 * ```
 */
export function conductivityPressureLimit(T: number): number {
  return steppedPressureLimit(T, CONDUCTIVITY_T_MIN, CONDUCTIVITY_T_MAX, CONDUCTIVITY_PRESSURE_LIMITS);
}

/** λ̄0(T̄) (Eq. 16). */
function dilute(t: number): number {
  const r = 1 / t;
  return Math.sqrt(t) / (L0 + r * (L1 + r * (L2 + r * (L3 + r * L4))));
}

/** λ̄1(T̄, ρ̄) (Eq. 17), Horner in both variables. */
function residual(t: number, d: number): number {
  const x = 1 / t - 1;
  const y = d - 1;
  let outer = 0;
  for (let i = ROWS - 1; i >= 0; i--) {
    const o = i * COLS;
    let inner = 0;
    for (let j = COLS - 1; j >= 0; j--) inner = inner * y + LIJ[o + j]!;
    outer = outer * x + inner;
  }
  return Math.exp(d * outer);
}

/** λ̄2 (Eqs. 18-20), inputs checked by the caller. */
function criticalPart(T: number, rho: number, t: number, dr: number, d: CriticalEnhancementInputs): number {
  const xi = correlationLength(T, rho, d);
  const y = QD * xi;
  if (y < Y_MIN) return 0;
  const kappaInverse = d.cv / d.cp;
  const Z = (2 / (Math.PI * y)) * ((1 - kappaInverse) * Math.atan(y) + kappaInverse * y - (1 - Math.exp(-1 / (1 / y + (y * y) / (3 * dr * dr)))));
  const cpBar = d.cp / REF.R;
  return (LAMBDA_CAPITAL * dr * cpBar * t * Z) / reducedViscosityAtLength(T, rho, xi);
}

/**
 * Thermal conductivity λ (W/(m·K)) of water or steam at (T [K], ρ [kg/m³]), IAPWS R15-11, written to `out`.
 *
 * `enhancement = false` leaves the critical enhancement out (λ̄2 = 0); `derivatives` is then not read.
 * With `enhancement = true`, `derivatives` must hold cp, cv and (∂ρ/∂p)_T at (T, ρ) and (∂ρ/∂p)_T at
 * (T_R, ρ) from an equation of state; the viscosity in λ̄2 then includes its own enhancement μ̄2.
 *
 * Returns `Status.invalidInput` for non-finite or negative inputs (or unusable derivatives),
 * `Status.outOfRange` for T outside 273.15 K to 1173.15 K. The release limits pressure, not density:
 * callers with a pressure check it against {@link conductivityPressureLimit}.
 * @example
 * ```ts
 * const out = new ConductivityResult();
 * const none = new CriticalEnhancementInputs();   // not read without the enhancement
 * thermalConductivity(298.15, 998, false, none, out);   //=> 0 (Status.ok)
 * out.lambda;                                           //=> 0.607712868 (W/(m·K); R15-11 Table 4)
 * thermalConductivity(298.15, -1, false, none, out);    //=> 3 (Status.invalidInput: negative density)
 * ```
 */
export function thermalConductivity(T: number, rho: number, enhancement: boolean, derivatives: CriticalEnhancementInputs, out: ConductivityResult): StatusCode {
  if (!Number.isFinite(T) || !Number.isFinite(rho) || !(rho >= 0) || !(T > 0)) return Status.invalidInput;
  if (!(T >= CONDUCTIVITY_T_MIN && T <= CONDUCTIVITY_T_MAX)) return Status.outOfRange;
  const t = T / REF.T;
  const dr = rho / REF.rho;
  out.lambda0 = REF.lambda * dilute(t);
  out.lambda1 = residual(t, dr);
  if (enhancement) {
    if (!enhancementInputsValid(derivatives)) return Status.invalidInput;
    out.lambda2 = REF.lambda * criticalPart(T, rho, t, dr, derivatives);
  } else {
    out.lambda2 = 0;
  }
  out.lambda = out.lambda0 * out.lambda1 + out.lambda2;
  return Status.ok;
}
