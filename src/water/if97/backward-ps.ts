/**
 * IF97 backward equations T(p, s) for regions 1 and 2.
 * IAPWS R7-97(2012): Section 5.2.2, Eq. 13, Table 8 (region 1; verification Table 9);
 * Section 6.3.2: Eqs. 25-27 (2a, 2b, 2c; Tables 25-27; subregion boundaries p = 4 MPa and
 * s = 5.85 kJ/(kg·K); verification Table 29).
 *
 * @module
 */
import data1 from '../../../data/if97/backward-region1.json';
import data2 from '../../../data/if97/backward-region2.json';
import { compileTerms, sumValue } from './terms.js';

const R1 = compileTerms(data1.ps.I, data1.ps.J, data1.ps.n);
// 2a has exponents of π in quarters: evaluate in π^¼ with exponents 4·I
const R2A = compileTerms(
  data2.ps2a.I.map((i) => Math.round(4 * i)),
  data2.ps2a.J,
  data2.ps2a.n,
);
const R2B = compileTerms(data2.ps2b.I, data2.ps2b.J, data2.ps2b.n);
const R2C = compileTerms(data2.ps2c.I, data2.ps2c.J, data2.ps2c.n);

/** Region 1: T(p, s) in K, p in Pa, s in J/(kg·K) (Eq. 13). */
export function region1TemperaturePS(p: number, s: number): number {
  return sumValue(R1, p / 1e6, s / 1e3 + 2);
}

/** Region 2: T(p, s) in K, choosing subregion 2a (p ≤ 4 MPa), 2b (s ≥ 5.85 kJ/(kg·K)) or 2c. */
export function region2TemperaturePS(p: number, s: number): number {
  const pi = p / 1e6;
  if (p <= 4e6) return sumValue(R2A, Math.sqrt(Math.sqrt(pi)), s / 2e3 - 2);
  if (s >= 5.85e3) return sumValue(R2B, pi, 10 - s / 785.3);
  return sumValue(R2C, pi, 2 - s / 2925.1);
}
