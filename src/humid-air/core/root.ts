/**
 * The one-dimensional solves of the humid-air core: Brent's method (R. P. Brent, Algorithms for
 * Minimization without Derivatives, 1973, ch. 4) on a residual picked by a code, so that no closure
 * is created per call. Every residual takes (x, a, b, c, p) as plain numbers.
 *
 * @module
 */
import {
  humidityRatioFromVaporPressure,
  humidityRatioFromWetBulb,
  moistAirEnthalpy,
  NO_SATURATION,
  temperatureFromEnthalpy,
  vaporPressureFromHumidityRatio,
} from './relations.js';
import { waterSaturationPressure } from './saturation.js';

/** Residual codes. */
export const RESIDUAL = {
  /** x = t*: W from the wet-bulb balance at dry-bulb a, minus W = b. Increasing in x. */
  wetBulbFromTW: 0,
  /** x = T: h(T, W(T, RH = a)) minus h = b. Increasing in x. */
  enthalpyAtRH: 1,
  /** x = T: W from the wet-bulb balance at t* = b, minus W(T, RH = a). Decreasing in x. */
  wetBulbAtRH: 2,
  /**
   * x = W: along a humidifier's line h = a + x·b (a = h1 − W1·hw, b = hw, the added water's or
   * steam's enthalpy), the relative humidity minus c.
   */
  humidifierRH: 3,
} as const;

/** W at dry-bulb T and relative humidity RH, or `NO_SATURATION` when RH·p_ws ≥ p. */
export function humidityRatioAtRH(p: number, T: number, RH: number): number {
  const pw = RH * waterSaturationPressure(T);
  return pw < p ? humidityRatioFromVaporPressure(p, pw) : NO_SATURATION;
}

/** The residual `kind` at x. */
export function residual(kind: number, x: number, a: number, b: number, c: number, p: number): number {
  switch (kind) {
    case RESIDUAL.humidifierRH: {
      const T = temperatureFromEnthalpy(a + x * b, x);
      if (!(T > 0)) return NO_SATURATION;
      return vaporPressureFromHumidityRatio(p, x) / waterSaturationPressure(T) - c;
    }
    case RESIDUAL.wetBulbFromTW: {
      const W = humidityRatioFromWetBulb(p, a, x);
      return W === NO_SATURATION ? NO_SATURATION : W - b;
    }
    case RESIDUAL.enthalpyAtRH: {
      const W = humidityRatioAtRH(p, x, a);
      return W === NO_SATURATION ? NO_SATURATION : moistAirEnthalpy(x, W) - b;
    }
    default: {
      const Wrh = humidityRatioAtRH(p, x, a);
      if (Wrh === NO_SATURATION) return -NO_SATURATION;
      const Wwb = humidityRatioFromWetBulb(p, x, b);
      return Wwb === NO_SATURATION ? NO_SATURATION : Wwb - Wrh;
    }
  }
}

const MACHINE_EPSILON = 2.220446049250313e-16;

/**
 * Root of residual `kind` in [x1, x2] given its values f1, f2 there (of opposite sign or zero), to
 * |Δx| ≤ xtol + 4ε|x|. Returns −1 when the bracket holds no sign change or after 100 iterations.
 */
export function brent(kind: number, x1: number, x2: number, f1: number, f2: number, a1: number, b1: number, c1: number, p: number, xtol: number): number {
  if (f1 === 0) return x1;
  if (f2 === 0) return x2;
  if ((f1 > 0 && f2 > 0) || (f1 < 0 && f2 < 0)) return -1;
  let a = x1;
  let b = x2;
  let c = x2;
  let fa = f1;
  let fb = f2;
  let fc = f2;
  let d = b - a;
  let e = d;
  for (let iter = 0; iter < 100; iter++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol1 = 2 * MACHINE_EPSILON * Math.abs(b) + 0.5 * xtol;
    const xm = 0.5 * (c - b);
    if (Math.abs(xm) <= tol1 || fb === 0) return b;
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let pp: number;
      let q: number;
      if (a === c) {
        pp = 2 * xm * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        pp = s * (2 * xm * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (pp > 0) q = -q;
      pp = Math.abs(pp);
      const min1 = 3 * xm * q - Math.abs(tol1 * q);
      const min2 = Math.abs(e * q);
      if (2 * pp < (min1 < min2 ? min1 : min2)) {
        e = d;
        d = pp / q;
      } else {
        d = xm;
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : xm >= 0 ? tol1 : -tol1;
    fb = residual(kind, b, a1, b1, c1, p);
  }
  return -1;
}
