/**
 * The residual of the (T, v) search: ln v(p, T) − ln v on one region's isotherm, as a function of ln p.
 * Held by the {@link SolverContext}.
 *
 * @module
 */
import type { Residual } from '../../core/root.js';
import { WaterProperties } from './properties.js';
import { evaluateForward } from './regions.js';

/** ln v(p, T) − ln v at p = exp(ln p) on region `region`'s isotherm T. */
export class VolumeAlongIsotherm implements Residual {
  region = 1;
  T = 0;
  lnv = 0;
  private readonly probe = new WaterProperties();
  value(lnp: number): number {
    return Math.log(evaluateForward(this.region, Math.exp(lnp), this.T, this.probe).v) - this.lnv;
  }
}
