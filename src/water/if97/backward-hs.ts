/**
 * IF97 backward equations p(h, s) for regions 1 and 2.
 * IAPWS SR2-01(2014): Eq. 1 with Table 2 (region 1), Eq. 5 with Table 6 (the B2ab boundary h_2ab(s)),
 * Eqs. 6-8 with Tables 7-9 (subregions 2a, 2b, 2c; 2a/2b by h_2ab(s), 2b/2c at s = 5.85 kJ/(kg·K)).
 * Verification: Tables 3 and 10. Used as starting values of the (h, s) flash.
 *
 * @module
 */
import data from '../../../data/if97/backward-hs.json';
import { backward1HS, backward2aHS, backward2bHS, backward2cHS } from './kernels.generated.js';

const [n1, n2, n3, n4] = data.b2ab as [number, number, number, number];

/**
 * Region 1: p(h, s) in Pa, h in J/kg, s in J/(kg·K) (SR2-01 Eq. 1).
 * @example
 * ```ts
 * region1PressureHS(0.001e3, 0);   //=> 980.0980612 (Pa; SR2-01 Table 3 gives 9.800980612e-4 MPa)
 * ```
 */
export function region1PressureHS(h: number, s: number): number {
  return backward1HS(h / 3400e3 + 0.05, s / 7.6e3 + 0.05) * 100e6;
}

/** B2ab: enthalpy on the 2a/2b boundary at s, in J/kg (SR2-01 Eq. 5). */
export function b2abEnthalpy(s: number): number {
  const x = s / 1e3;
  return (n1 + x * (n2 + x * (n3 + x * n4))) * 1e3;
}

/**
 * Region 2: p(h, s) in Pa, choosing 2a (h ≤ h_2ab(s)), 2b (s ≥ 5.85 kJ/(kg·K)) or 2c (SR2-01 Eqs. 6-8).
 * @example
 * ```ts
 * region2PressureHS(2800e3, 6.5e3);   //=> 1371012.767 (Pa; SR2-01 Table 10)
 * ```
 */
export function region2PressureHS(h: number, s: number): number {
  if (h <= b2abEnthalpy(s)) {
    const q = backward2aHS(h / 4200e3 - 0.5, s / 12e3 - 1.2);
    return q * q * q * q * 4e6;
  }
  if (s >= 5.85e3) {
    const q = backward2bHS(h / 4100e3 - 0.6, s / 7.9e3 - 1.01);
    return q * q * q * q * 100e6;
  }
  const q = backward2cHS(h / 3500e3 - 0.7, s / 5.9e3 - 1.1);
  return q * q * q * q * 100e6;
}
