/**
 * The one-dimensional solves of the humid-air core: the project's Brent solver (src/core/root.ts) on a
 * residual picked by a code, held in one reused residual object, so that no closure is created per
 * call. Every residual takes (x, a, b, c, p) as plain numbers.
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
import { brent as solveRoot, RootResult, type Residual } from '../../core/root.js';
import { Status } from '../../core/status.js';

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

/** The residual `kind` at fixed (a, b, c, p), as the shared root finder takes it. */
class HumidAirResidual implements Residual {
  kind = 0;
  a = 0;
  b = 0;
  c = 0;
  p = 0;
  value(x: number): number {
    return residual(this.kind, x, this.a, this.b, this.c, this.p);
  }
}

// scratch of brent below (one call at a time; the core is synchronous)
const scratchResidual = new HumidAirResidual();
const scratchRoot = new RootResult();

/**
 * Root of residual `kind` in [x1, x2] given its values f1, f2 there (of opposite sign or zero), to
 * |Δx| ≤ xtol/2 + 2ε|x|, by the project's Brent solver (src/core/root.ts). Returns −1 when the bracket
 * holds no sign change or the solve does not settle.
 */
export function brent(kind: number, x1: number, x2: number, f1: number, f2: number, a1: number, b1: number, c1: number, p: number, xtol: number): number {
  const f = scratchResidual;
  f.kind = kind;
  f.a = a1;
  f.b = b1;
  f.c = c1;
  f.p = p;
  return solveRoot(f, x1, x2, 0, scratchRoot, xtol, f1, f2) === Status.ok ? scratchRoot.x : -1;
}
