import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lerp, piecewiseLinear, piecewiseLinearIntegral } from '../../src/numeric/interpolate.js';
import { polynomialIntegral, polynomialOverXIntegral, polynomialValue } from '../../src/numeric/polynomial.js';
import { segmentIndex } from '../../src/numeric/search.js';
import { expectClose } from '../helpers/tolerance.js';

/** Composite Simpson rule, an independent check of the analytic integrals. */
function simpson(f: (x: number) => number, a: number, b: number, n = 2000): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += f(a + i * h) * (i % 2 === 1 ? 4 : 2);
  return (s * h) / 3;
}

describe('segmentIndex', () => {
  const xs = [1, 2, 4, 8, 16];
  it('puts a node in the segment to its right, and the last node in the last segment', () => {
    expect(segmentIndex(xs, 1)).toBe(0);
    expect(segmentIndex(xs, 2)).toBe(1);
    expect(segmentIndex(xs, 8)).toBe(3);
    expect(segmentIndex(xs, 16)).toBe(3);
    expect(segmentIndex(xs, 3.9)).toBe(1);
  });
  it('always returns a segment holding x', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 16, noNaN: true }), (x) => {
        const i = segmentIndex(xs, x);
        return xs[i]! <= x && x <= xs[i + 1]!;
      }),
    );
  });
});

describe('interpolation is exact at the nodes', () => {
  it('lerp returns the end values bit for bit', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: -1e6, max: 1e6, noNaN: true }), (y0, y1) => {
        return lerp(0.3, 0.7, y0, y1, 0.3) === y0 && lerp(0.3, 0.7, y0, y1, 0.7) === y1;
      }),
    );
  });
  it('piecewiseLinear returns every tabulated value bit for bit', () => {
    const xs = [200, 300, 400, 600, 800];
    const ys = [798.1, 903.3, 949.7, 1033.9, 1146.2];
    xs.forEach((x, i) => expect(piecewiseLinear(xs, ys, x)).toBe(ys[i]));
  });
});

describe('analytic integrals agree with Simpson quadrature', () => {
  it('polynomial ∫c dT and ∫c/T dT', () => {
    const c = [1.2, 3.4e-3, -2.1e-6, 4.0e-10];
    expectClose(polynomialIntegral(c, 250, 900), simpson((x) => polynomialValue(c, x), 250, 900), { rel: 1e-12 });
    expectClose(polynomialOverXIntegral(c, 250, 900), simpson((x) => polynomialValue(c, x) / x, 250, 900), { rel: 1e-10 });
  });
  it('piecewise-linear ∫y dx and ∫y/x dx, including partial end segments and reversed limits', () => {
    const xs = [200, 300, 400, 600, 800];
    const ys = [798, 903, 949, 1033, 1146];
    const f = (x: number) => piecewiseLinear(xs, ys, x);
    for (const [a, b] of [[210, 790], [300, 400], [250, 260], [200, 800]] as const) {
      // Simpson is exact on each linear piece only when nodes fall on grid points, so compare piecewise
      let ref = 0;
      let refOverX = 0;
      const cuts = [a, ...xs.filter((x) => x > a && x < b), b];
      for (let k = 0; k + 1 < cuts.length; k++) {
        ref += simpson(f, cuts[k]!, cuts[k + 1]!, 200);
        refOverX += simpson((x) => f(x) / x, cuts[k]!, cuts[k + 1]!, 2000);
      }
      expectClose(piecewiseLinearIntegral(xs, ys, a, b), ref, { rel: 1e-12 });
      expectClose(piecewiseLinearIntegral(xs, ys, a, b, true), refOverX, { rel: 1e-10 });
      expectClose(piecewiseLinearIntegral(xs, ys, b, a), -ref, { rel: 1e-12 });
    }
  });
});
