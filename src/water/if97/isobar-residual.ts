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
import { T_CRITICAL } from './constants.js';
import { region3, region3Derivatives } from './region3.js';
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

/**
 * h or s on a region 3 isobar minus the target, as a function of the density (for Brent): at each ρ
 * the temperature on the isobar solves p₃(ρ, T) = p by Newton steps in T ((∂p/∂T)_ρ > 0, so there is
 * one); the last temperature is kept in {@link T} and starts the next evaluation. Unlike the search in
 * T, this follows the isobar through a loop of the region 3 isotherms, where the root in ρ at a
 * given T changes branch and h(T) jumps.
 */
export class Region3IsobarDensityResidual implements Residual {
  p = 0;
  target = 0;
  by: Matched = BY_H;
  /** The temperature on the isobar at the last density evaluated, K. */
  T = T_CRITICAL;
  private readonly d3 = new Float64Array(9);
  value(rho: number): number {
    const d3 = this.d3;
    const k = this.by === BY_H ? 3 : 6;
    let T = this.T;
    for (let i = 0; i < 30; i++) {
      region3Derivatives(rho, T, d3);
      const dT = (d3[0]! - this.p) / d3[2]!;
      if (!(Number.isFinite(dT) && T - dT > 0)) return NaN;
      if (Math.abs(dT) <= 1e-14 * T) {
        // the last step, applied to the value to first order
        this.T = T - dT;
        return d3[k]! - d3[k + 2]! * dT - this.target;
      }
      T -= dT;
    }
    return NaN;
  }
}
