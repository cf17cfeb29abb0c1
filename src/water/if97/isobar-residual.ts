/**
 * The residual of a region 3 isobar search: h or s on the isobar at T minus the target, for Brent.
 * Held by the {@link SolverContext}, so the target travels in the residual, not in module variables.
 *
 * @module
 */
import type { Residual } from '../../core/root.js';
import { Status } from '../../core/status.js';
import type { SolverContext } from './context.js';
import type { WaterProperties } from './properties.js';
import { region3 } from './region3.js';
import { region3DensityAt } from './region3-density.js';

/** Which property an isobar solve matches: enthalpy or entropy. */
export type Matched = 0 | 1;
/** Match the enthalpy h (J/kg). */
export const BY_H: Matched = 0;
/** Match the entropy s (J/(kg·K)). */
export const BY_S: Matched = 1;

/** h or s of a property set. */
export function valueOf(props: WaterProperties, by: Matched): number {
  return by === BY_H ? props.h : props.s;
}

/** The region 3 isobar at T (density by search), evaluated into `into`; false when no density is found. */
export function region3At(p: number, T: number, branch: 0 | 1 | 2, into: WaterProperties, ctx: SolverContext): boolean {
  if (region3DensityAt(p, T, branch, ctx) !== Status.ok) return false;
  region3(ctx.rho, T, into);
  into.p = p;
  return true;
}

/** h or s on a region 3 isobar minus the target, as a function of T (for Brent). */
export class Region3IsobarResidual implements Residual {
  p = 0;
  target = 0;
  by: Matched = BY_H;
  branch: 0 | 1 | 2 = 0;
  private readonly ctx: SolverContext;
  constructor(ctx: SolverContext) {
    this.ctx = ctx;
  }
  value(T: number): number {
    if (!region3At(this.p, T, this.branch, this.ctx.scratchB, this.ctx)) return NaN;
    return valueOf(this.ctx.scratchB, this.by) - this.target;
  }
}
