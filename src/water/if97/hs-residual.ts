/**
 * The residual of the bracketed (h, s) search: s of the (p, h) state at ln p, minus the target s.
 * Held by the {@link SolverContext}, so h and s travel in the residual, not in module variables.
 *
 * @module
 */
import type { Residual } from '../../core/root.js';
import { Status } from '../../core/status.js';
import type { SolverContext } from './context.js';
import { BY_H } from './isobar-residual.js';
import { stateOnIsobar } from './isobar.js';

/** s(p, h) − s at p = exp(ln p), clamped to the span [pLo, pHi]; NaN where the (p, h) flash fails. */
export class EntropyAlongEnthalpy implements Residual {
  h = 0;
  s = 0;
  pLo = 0;
  pHi = 0;
  lnLo = 0;
  lnHi = 0;
  private readonly ctx: SolverContext;
  constructor(ctx: SolverContext) {
    this.ctx = ctx;
  }
  /** Sets the span; exp(log(p)) may round outside it, so the ends are evaluated exactly. */
  setSpan(pLo: number, pHi: number): void {
    this.pLo = pLo;
    this.pHi = pHi;
    this.lnLo = Math.log(pLo);
    this.lnHi = Math.log(pHi);
  }
  pressureOf(lnp: number): number {
    return lnp <= this.lnLo ? this.pLo : lnp >= this.lnHi ? this.pHi : Math.min(this.pHi, Math.max(this.pLo, Math.exp(lnp)));
  }
  value(lnp: number): number {
    const inner = this.ctx.inner;
    if (stateOnIsobar(this.pressureOf(lnp), this.h, BY_H, inner, this.ctx) !== Status.ok) return NaN;
    return inner.s - this.s;
  }
}
