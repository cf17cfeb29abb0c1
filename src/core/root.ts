/**
 * Root finders on the core contract: each writes its answer into a caller-owned {@link RootResult}
 * and returns a {@link StatusCode}. They never throw and never return NaN as an answer.
 *
 * Residuals are objects (`{ value(x) }`, with `slope(x)` for Newton) owned by the caller, so a
 * solver's targets travel in the residual itself, not through module-level variables, and no
 * closure is created per call. A residual returns NaN to say "no value here" (for example an inner
 * flash failed); the finder then reports {@link Status.noConvergence}.
 *
 * @module
 */
import { Status, type StatusCode } from './status.js';

/** A function whose root is sought. */
export interface Residual {
  /** f(x); NaN when f cannot be evaluated at x. */
  value(x: number): number;
}

/** A function with its derivative, for Newton steps. */
export interface ResidualWithSlope extends Residual {
  /** f′(x). */
  slope(x: number): number;
}

/** The answer of a root finder: the root and the iterations used. Reuse one instance. */
export class RootResult {
  /** The root (valid when the status is ok). */
  x = 0;
  /** Iterations performed. */
  iterations = 0;
}

/**
 * Newton steps kept inside a shrinking bracket [lo, hi], with bisection whenever a step would leave
 * it or stalls. Converges wherever f changes sign on the bracket.
 *
 * @param tolerance stop when the step is below tolerance·max(1, |x|)
 * @returns {@link Status.ok} with `out.x`; {@link Status.outOfRange} when f does not change sign on
 *   [lo, hi] (no root there); {@link Status.invalidInput} when f is not finite at an end or the bracket
 *   is not a finite interval; {@link Status.noConvergence} after 100 iterations or when f fails inside
 * @example
 * ```ts
 * const r = new RootResult();
 * bracketedNewton({ value: (x) => x * x - 2, slope: (x) => 2 * x }, 0, 2, 1, 1e-15, r);   //=> 0
 * r.x;   //=> 1.41421356237310 (√2 to within the 1e-15 tolerance)
 * ```
 */
export function bracketedNewton(f: ResidualWithSlope, lo: number, hi: number, x0: number, tolerance: number, out: RootResult): StatusCode {
  out.iterations = 0;
  if (!(Number.isFinite(lo) && Number.isFinite(hi) && lo <= hi)) return Status.invalidInput;
  let a = lo;
  let b = hi;
  let fa = f.value(a);
  const fb = f.value(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) return Status.invalidInput;
  if (fa === 0) return done(out, a, 0);
  if (fb === 0) return done(out, b, 0);
  if ((fa > 0) === (fb > 0)) return Status.outOfRange; // signs compared: a product of tiny values underflows
  let x = x0 > a && x0 < b ? x0 : 0.5 * (a + b);
  for (let i = 1; i <= 100; i++) {
    const fx = f.value(x);
    if (!Number.isFinite(fx)) {
      out.iterations = i;
      return Status.noConvergence;
    }
    if (fx === 0) return done(out, x, i);
    if ((fx > 0) !== (fa > 0)) b = x;
    else {
      a = x;
      fa = fx;
    }
    const d = f.slope(x);
    let next = d !== 0 ? x - fx / d : a - 1;
    if (!(next > a && next < b)) next = 0.5 * (a + b);
    if (Math.abs(next - x) <= tolerance * Math.max(1, Math.abs(x)) || b - a <= tolerance * Math.max(1, Math.abs(x))) return done(out, next, i);
    x = next;
  }
  out.iterations = 100;
  return Status.noConvergence;
}

function done(out: RootResult, x: number, iterations: number): StatusCode {
  out.x = x;
  out.iterations = iterations;
  return Status.ok;
}

/**
 * Brent's method (inverse quadratic interpolation with bisection safeguards) on [lo, hi] where f(lo)
 * and f(hi) differ in sign. For functions without a cheap derivative. The root is located to
 * 2ε|x| + (relTolerance·|x| + absTolerance)/2; a caller that has already evaluated f at the ends
 * (to choose the bracket) passes those values as `fLo`, `fHi`.
 *
 * @returns {@link Status.ok} with `out.x`; {@link Status.outOfRange} when f does not change sign on
 *   the bracket; {@link Status.invalidInput} when f is not finite at an end; {@link Status.noConvergence}
 *   after 200 iterations or when f fails inside the bracket
 * @example
 * ```ts
 * const r = new RootResult();
 * brent({ value: (x) => Math.cos(x) - x }, 0, 1, 1e-15, r);   //=> 0
 * r.x;   //=> 0.739085133215161
 * ```
 */
export function brent(f: Residual, lo: number, hi: number, relTolerance: number, out: RootResult, absTolerance = 0, fLo?: number, fHi?: number): StatusCode {
  out.iterations = 0;
  let a = lo;
  let b = hi;
  let fa = fLo ?? f.value(a);
  let fb = fHi ?? f.value(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) return Status.invalidInput;
  if (fa === 0) return done(out, a, 0);
  if (fb === 0) return done(out, b, 0);
  // signs compared, not multiplied: the product of two tiny values underflows to 0
  if (!((fa < 0 && fb > 0) || (fa > 0 && fb < 0))) return Status.outOfRange;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 0; i < 200; i++) {
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
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * (relTolerance * Math.abs(b) + absTolerance);
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return done(out, b, i);
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f.value(b);
    if (!Number.isFinite(fb)) {
      out.iterations = i + 1;
      return Status.noConvergence;
    }
  }
  out.iterations = 200;
  return Status.noConvergence;
}
