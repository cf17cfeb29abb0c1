/**
 * The pressure limit of a release whose range is given in temperature steps (IAPWS R12-08 and R15-11
 * state their validity as "p ≤ p_i for T ≤ T_i").
 *
 * @module
 */

/** The highest pressure (Pa) of `steps` ([T_i, p_i] by rising T_i) at T (K); 0 outside [Tmin, Tmax]. */
export function steppedPressureLimit(T: number, Tmin: number, Tmax: number, steps: readonly (readonly [number, number])[]): number {
  if (!(T >= Tmin && T <= Tmax)) return 0;
  for (const [Tband, p] of steps) if (T <= Tband) return p;
  return 0;
}
