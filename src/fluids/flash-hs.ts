/**
 * The (h, s) flash of the Helmholtz-energy engine: Newton steps in ln p on the (p, s) flash.
 *
 * @module
 */
import { Status, type StatusCode } from '../core/status.js';
import { stateFromPS, stateFromPT } from './flash.js';
import type { FluidContext, FluidState } from './model.js';

/**
 * The state at (h [J/kg], s [J/(kg·K)]): Newton steps in ln p on h(p, s) = h, with (∂h/∂p)_s = v,
 * each step a (p, s) flash, inside a bracket from 1e-4 of the triple-point pressure to p_max.
 * @example
 * ```ts
 * const ctx = new FluidContext(fluidModel('water')!), out = new FluidState();
 * stateFromHS(ctx, 3e6, 7000, out);   //=> 0
 * out.p;   //=> 1075561.49511... (Pa)
 * out.T;   //=> 550.23690782... (K)
 * ```
 */
export function stateFromHS(ctx: FluidContext, h: number, s: number, out: FluidState): StatusCode {
  const m = ctx.model;
  if (!Number.isFinite(h) || !Number.isFinite(s)) return Status.invalidInput;
  let lo = Math.log(1e-4 * m.pt);
  let hi = Math.log(m.pMax);
  let loOk = false;
  let hiOk = false;
  let y = Math.log(m.pc * 0.1);
  const scale = Math.max(Math.abs(h), m.R * m.Tc);
  for (let i = 0; i < 100; i++) {
    // exp(log(p_max)) may round past p_max: the bracket's top end is p_max itself
    const p = Math.min(m.pMax, Math.exp(y));
    const st = stateFromPS(ctx, p, s, out);
    if (st !== Status.ok) {
      if (st !== Status.outOfRange) return st;
      // s not reachable at this pressure: above the entropy at T_max a lower pressure is needed,
      // else (below the entropy at T_min) a higher one; narrow the bracket from that side
      if (hi - lo < 1e-12 * Math.abs(hi)) return Status.outOfRange;
      const top = stateFromPT(ctx, p, m.Tmax, out);
      if (top === Status.ok && s > out.s) hi = y;
      else lo = y;
      y = 0.5 * (lo + hi);
      continue;
    }
    const f = out.h - h;
    if (f < 0) {
      lo = y;
      loOk = true;
    } else {
      hi = y;
      hiOk = true;
    }
    if (Math.abs(f) <= 1e-14 * scale) return st;
    // (∂h/∂ln p)_s = p·v
    let next = y - f / (p * out.v);
    if (Math.abs(next - y) <= 1e-15 * Math.abs(y) + 1e-15) return st;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    // a bracket closed against a range end (p_max, say) holds the answer when h matches to the flash's tolerance
    if (hi - lo < 1e-15 * Math.abs(hi)) return (loOk && hiOk) || Math.abs(f) <= 1e-9 * scale ? st : Status.outOfRange;
    y = next;
  }
  return Status.noConvergence;
}
