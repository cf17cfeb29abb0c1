/**
 * The thermodynamic inputs of the critical enhancements of IAPWS R12-08 (viscosity, μ2) and
 * IAPWS R15-11 (thermal conductivity, λ2), and the correlation length ξ both releases share.
 *
 * Both releases compute ξ from the same relation (R12-08 Eqs. 19-21, R15-11 Eqs. 21-23):
 *   Δχ̄ = ρ̄ [ζ(T̄, ρ̄) − ζ(T̄_R, ρ̄) T̄_R/T̄],  ζ = (∂ρ̄/∂p̄)_T̄ = (p* / ρ*) (∂ρ/∂p)_T,
 *   ξ = ξ0 (Δχ̄/Γ0)^(ν/γ),  Δχ̄ < 0 taken as 0,
 * with ξ0 = 0.13 nm, Γ0 = 0.06, ν = 0.630, γ = 1.239 and T̄_R = 1.5 (T_R = 970.644 K) in both.
 * The derivatives come from an equation of state the caller chooses (the releases used IAPWS-95;
 * `if97-inputs.ts` fills them from IF97): this module takes them as plain numbers.
 *
 * @module
 */
import data from '../../../data/transport/water-viscosity.json';

const C = data.critical;
const REF = data.reference;
/** Reference temperature of the critical enhancements, T_R = 1.5 T* = 970.644 K (R12-08 Table 3). */
export const T_REFERENCE = C.TRbar * REF.T;
/** p* / ρ*, Pa·m³/kg: converts (∂ρ/∂p)_T in kg/(m³·Pa) to ζ = (∂ρ̄/∂p̄)_T̄. */
const ZETA_SCALE = REF.p / REF.rho;
const XI0 = C.xi0;
const GAMMA0 = C.Gamma0;
const EXPONENT = C.nu / C.gamma;

/**
 * What the critical enhancement needs from an equation of state at (T, ρ), SI units. Fill it once
 * per state (from IF97 with `if97EnhancementInputs`, or from any other equation of state) and pass it
 * to `viscosity` and `thermalConductivity`; reuse one instance in loops.
 */
export class CriticalEnhancementInputs {
  /** Specific isobaric heat capacity cp at (T, ρ), J/(kg·K). */
  cp = 0;
  /** Specific isochoric heat capacity cv at (T, ρ), J/(kg·K). */
  cv = 0;
  /** Isothermal derivative (∂ρ/∂p)_T at (T, ρ), kg/(m³·Pa) (= s²/m²). */
  dRhoDp = 0;
  /** Isothermal derivative (∂ρ/∂p)_T at the reference temperature T_R = 970.644 K and the same ρ, kg/(m³·Pa). */
  dRhoDpReference = 0;
}

/**
 * Whether the derivative inputs are usable numbers (cp, cv, (∂ρ/∂p)_T positive and finite; the reference value finite).
 * @example
 * ```ts
 * enhancementInputsValid(new CriticalEnhancementInputs());   //=> false (all zero)
 * ```
 */
export function enhancementInputsValid(d: CriticalEnhancementInputs): boolean {
  return d.cp > 0 && d.cp < Infinity && d.cv > 0 && d.cv < Infinity && d.dRhoDp > 0 && d.dRhoDp < Infinity && Number.isFinite(d.dRhoDpReference);
}

/**
 * The correlation length ξ in m at (T [K], ρ [kg/m³]) from the derivative inputs (R12-08 Eqs. 19-21,
 * R15-11 Eqs. 21-23); 0 where Δχ̄ ≤ 0. The caller has checked the inputs.
 * @example
 * ```ts
 * const d = new CriticalEnhancementInputs();
 * d.dRhoDp = 474.6166 / (22.064e6 / 322);   // ζ = 474.6 (IF97, 647.35 K, 322 kg/m³)
 * d.dRhoDpReference = 0.191361 / (22.064e6 / 322);
 * correlationLength(647.35, 322, d);           //=> 1.2472e-8 (m, 12.5 nm)
 * ```
 */
export function correlationLength(T: number, rho: number, d: CriticalEnhancementInputs): number {
  const zeta = d.dRhoDp * ZETA_SCALE;
  const zetaR = d.dRhoDpReference * ZETA_SCALE;
  const deltaChi = (rho / REF.rho) * (zeta - (zetaR * T_REFERENCE) / T);
  if (!(deltaChi > 0)) return 0;
  return XI0 * Math.exp(EXPONENT * Math.log(deltaChi / GAMMA0));
}
