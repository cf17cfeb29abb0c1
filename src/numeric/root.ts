/**
 * Bracketed root finding: Newton steps kept inside a shrinking bracket, with bisection whenever a
 * step would leave it or stalls. Converges wherever f changes sign on [lo, hi]; never returns an
 * unconverged value.
 *
 * @module
 */
import { ConvergenceError } from '../errors.js';

/**
 * Finds x in [lo, hi] with f(x) = 0, given f and its derivative, and a bracket where f changes sign.
 *
 * @param f function; `df` its derivative
 * @param lo lower end; `hi` upper end (f(lo)·f(hi) ≤ 0 is required)
 * @param x0 starting guess inside the bracket
 * @param tolerance stop when the step is below tolerance·max(1, |x|)
 * @returns the root
 * @throws {@link ConvergenceError} if f does not change sign on the bracket or 100 iterations pass
 */
export function solveBracketed(f: (x: number) => number, df: (x: number) => number, lo: number, hi: number, x0: number, tolerance = 1e-13): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  const fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (fa * fb > 0) throw new ConvergenceError(`no root in [${lo}, ${hi}]: f(${lo}) = ${fa} and f(${hi}) = ${fb} have the same sign`, 0);
  let x = x0 > a && x0 < b ? x0 : 0.5 * (a + b);
  for (let i = 1; i <= 100; i++) {
    const fx = f(x);
    if (fx === 0) return x;
    if (fx * fa < 0) b = x;
    else {
      a = x;
      fa = fx;
    }
    const d = df(x);
    let next = d !== 0 ? x - fx / d : NaN;
    if (!(next > a && next < b)) next = 0.5 * (a + b);
    if (Math.abs(next - x) <= tolerance * Math.max(1, Math.abs(x)) || b - a <= tolerance * Math.max(1, Math.abs(x))) return next;
    x = next;
  }
  throw new ConvergenceError(`no convergence in 100 iterations on [${lo}, ${hi}]`, 100);
}

/**
 * Brent's method (inverse quadratic interpolation with bisection safeguards) on [lo, hi] where
 * f(lo) and f(hi) differ in sign. For functions without a cheap derivative.
 *
 * @returns the root, or NaN when f does not change sign on the bracket or 200 iterations pass
 *   (callers in the SI core report NaN as a status; the facade turns it into an error)
 */
export function brentRoot(f: (x: number) => number, lo: number, hi: number, relTolerance = 1e-14): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (!(fa * fb < 0)) return NaN;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 0; i < 200; i++) {
    if (fb * fc > 0) {
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
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * relTolerance * Math.abs(b);
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
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
    fb = f(b);
  }
  return NaN;
}
