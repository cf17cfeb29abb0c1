/**
 * A starting pressure p(h, s) for IF97 region 3b (region 3 states with s > s_c), for the (h, s) flash:
 * a polynomial in ln p fitted to IF97 itself (scripts/fit-region3b-hs.ts, data/if97/fit-region3b-hs.json,
 * basis "computed"), used where SR4-04's p_3b(h, s) coefficients are not verified. Its stated maximum
 * relative error in p over region 3b is `maxRelativeError` of the data file (0.27 %), checked by
 * tests/water/fit-region3b-hs.test.ts. A starting value only: the flash polishes it on the basic equations.
 *
 * @module
 */
import fit from '../../../data/if97/fit-region3b-hs.json';

const H0 = fit.H0;
const HW = fit.HW;
const S0 = fit.S0;
const SW = fit.SW;
const C = Float64Array.from(fit.c);
const I = Int32Array.from(fit.I);
const J = Int32Array.from(fit.J);
const DEGREE = Math.max(...fit.I, ...fit.J);
/** Power ladders, private to {@link region3bStartPressureHS}. */
const xp = new Float64Array(DEGREE + 1);
const yp = new Float64Array(DEGREE + 1);

/**
 * Starting pressure in Pa for (h [J/kg], s [J/(kg·K)]) in region 3b.
 * @example
 * ```ts
 * region3bStartPressureHS(2500e3, 5.0e3);   //=> 27.97e6 (Pa; the (h, s) flash converges to 27.976 MPa there)
 * ```
 */
export function region3bStartPressureHS(h: number, s: number): number {
  const x = (h - H0) / HW;
  const y = (s - S0) / SW;
  xp[0] = 1;
  yp[0] = 1;
  for (let k = 1; k <= DEGREE; k++) {
    xp[k] = xp[k - 1]! * x;
    yp[k] = yp[k - 1]! * y;
  }
  let sum = 0;
  for (let k = 0; k < C.length; k++) sum += C[k]! * xp[I[k]!]! * yp[J[k]!]!;
  return Math.exp(sum) * 1e6;
}
