/**
 * IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997: the computer-program
 * verification rows of the basic equations, as printed (9 significant digits). Units as printed:
 * p in MPa, T in K, v in m³/kg, h and u in kJ/kg, s and cp in kJ/(kg·K), w in m/s. One copy, read by
 * tests/reference/iapws-if97.test.ts (the fast kernels) and tests/water/ulp-compensated.test.ts (the
 * compensated kernels).
 */
import { it } from 'vitest';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { expectClose } from '../helpers/tolerance.js';

/** Printed to 9 significant digits: agree within half a unit in the 9th digit. */
export const nine = (actual: number, printed: number) => expectClose(actual, printed, { rel: 5.0001e-9 });

/** [T, p, v, h, u, s, cp, w] (Gibbs regions) or [T, ρ, p, h, u, s, cp, w] (region 3). */
export type Row = [number, number, number, number, number, number, number, number];

/** R7-97 Table 5: region 1 at (T, p). */
export const TABLE_5: Row[] = [
  [300, 3, 0.100215168e-2, 0.115331273e3, 0.112324818e3, 0.392294792, 0.417301218e1, 0.150773921e4],
  [300, 80, 0.971180894e-3, 0.184142828e3, 0.106448356e3, 0.368563852, 0.401008987e1, 0.163469054e4],
  [500, 3, 0.1202418e-2, 0.975542239e3, 0.971934985e3, 0.258041912e1, 0.465580682e1, 0.124071337e4],
];
/** R7-97 Table 15: region 2 at (T, p). */
export const TABLE_15: Row[] = [
  [300, 0.0035, 0.394913866e2, 0.254991145e4, 0.24116916e4, 0.852238967e1, 0.191300162e1, 0.427920172e3],
  [700, 0.0035, 0.923015898e2, 0.333568375e4, 0.301262819e4, 0.101749996e2, 0.208141274e1, 0.644289068e3],
  [700, 30, 0.542946619e-2, 0.263149474e4, 0.246861076e4, 0.517540298e1, 0.103505092e2, 0.480386523e3],
];
/** R7-97 Table 33: region 3 at (T, ρ): p, h, u, s, cp, w. */
export const TABLE_33: Row[] = [
  [650, 500, 0.255837018e2, 0.186343019e4, 0.181226279e4, 0.405427273e1, 0.138935717e2, 0.502005554e3],
  [650, 200, 0.222930643e2, 0.237512401e4, 0.226365868e4, 0.485438792e1, 0.446579342e2, 0.383444594e3],
  [750, 500, 0.783095639e2, 0.225868845e4, 0.210206932e4, 0.446971906e1, 0.634165359e1, 0.760696041e3],
];
/** R7-97 Table 42: region 5 at (T, p). */
export const TABLE_42: Row[] = [
  [1500, 0.5, 0.13845509e1, 0.521976855e4, 0.45274931e4, 0.965408875e1, 0.261609445e1, 0.91706869e3],
  [1500, 30, 0.230761299e-1, 0.516723514e4, 0.447495124e4, 0.772970133e1, 0.272724317e1, 0.928548002e3],
  [2000, 30, 0.311385219e-1, 0.657122604e4, 0.563707038e4, 0.853640523e1, 0.288569882e1, 0.106736948e4],
];

/** One test per row: a Gibbs region's (p, T) kernel gives the printed v, h, u, s, cp and w. */
export function checkGibbs(f: (p: number, T: number, o: WaterProperties) => WaterProperties, rows: Row[]) {
  const out = new WaterProperties();
  it.each(rows)('T = %d K, p = %d MPa', (T, p, v, h, u, s, cp, w) => {
    f(p * 1e6, T, out);
    nine(out.v, v);
    nine(out.h / 1e3, h);
    nine(out.u / 1e3, u);
    nine(out.s / 1e3, s);
    nine(out.cp / 1e3, cp);
    nine(out.w, w);
  });
}

/** One test per row: a region 3 (ρ, T) kernel gives the printed p, h, u, s, cp and w. */
export function checkRegion3(f: (rho: number, T: number, o: WaterProperties) => WaterProperties, rows: Row[]) {
  const out = new WaterProperties();
  it.each(rows)('T = %d K, ρ = %d kg/m³', (T, rho, p, h, u, s, cp, w) => {
    f(rho, T, out);
    nine(out.p / 1e6, p);
    nine(out.h / 1e3, h);
    nine(out.u / 1e3, u);
    nine(out.s / 1e3, s);
    nine(out.cp / 1e3, cp);
    nine(out.w, w);
  });
}
