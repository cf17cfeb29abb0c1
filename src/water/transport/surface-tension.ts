/**
 * Surface tension of water against its vapour: IAPWS R1-76(2014), Revised Release on Surface
 * Tension of Ordinary Water Substance, Eq. 1:
 *   σ = B τ^μ (1 + b τ),  τ = 1 − T/Tc,  B = 235.8 mN/m, b = −0.625, μ = 1.256, Tc = 647.096 K,
 * valid along the saturation line from the triple point (273.16 K) to the critical point, where σ = 0.
 * Verification: the release's Table 1 (σ at whole degrees Celsius, computed from Eq. 1).
 *
 * Constants: data/transport/water-surface-tension.json.
 *
 * @module
 */
import data from '../../../data/transport/water-surface-tension.json';
import { Status, type StatusCode } from '../../core/status.js';

const B = data.B;
const SMALL_B = data.b;
const EXPONENT = data.mu;
/** Lower limit of IAPWS R1-76(2014): the triple point, 273.16 K. */
export const SURFACE_TENSION_T_MIN = data.Tmin;
/** Upper limit of IAPWS R1-76(2014): the critical temperature, 647.096 K (σ = 0 there). */
export const SURFACE_TENSION_T_MAX = data.Tc;

/** The surface tension, filled by {@link surfaceTension}. Reuse one instance. */
export class SurfaceTensionResult {
  /** Surface tension σ, N/m. */
  sigma = 0;
}

/**
 * Surface tension σ (N/m) of water against its saturated vapour at T (K), IAPWS R1-76(2014) Eq. 1,
 * written to `out`. `Status.outOfRange` outside 273.16 K to 647.096 K, `Status.invalidInput` for NaN.
 * @example
 * ```ts
 * const out = new SurfaceTensionResult();
 * surfaceTension(373.15, out);   //=> 0 (Status.ok)
 * out.sigma;                     //=> 0.0589119 (N/m: 58.91 mN/m, R1-76 Table 1)
 * surfaceTension(647.096, out);  //=> 0 (Status.ok)
 * out.sigma;                     //=> 0 (at the critical point)
 * surfaceTension(273.15, out);   //=> 1 (Status.outOfRange: below the triple point)
 * ```
 */
export function surfaceTension(T: number, out: SurfaceTensionResult): StatusCode {
  if (!Number.isFinite(T)) return Status.invalidInput;
  if (!(T >= SURFACE_TENSION_T_MIN && T <= SURFACE_TENSION_T_MAX)) return Status.outOfRange;
  const tau = 1 - T / SURFACE_TENSION_T_MAX;
  out.sigma = B * Math.pow(tau, EXPONENT) * (1 + SMALL_B * tau);
  return Status.ok;
}
