/**
 * Nitrogen by Span, Lemmon, Jacobsen, Wagner & Yokozeki, J. Phys. Chem. Ref. Data 29 (2000)
 * 1361, with coefficients recalled from memory (data/fluids/nitrogen.json). It ships because it
 * reproduces the checks below; each names its source.
 */
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { fluidModel } from '../../src/fluids/catalogue.js';
import { stateFromHS, stateFromPH, stateFromPS, stateFromPT, stateFromTRho, stateFromTX } from '../../src/fluids/flash.js';
import { fluid } from '../../src/fluids/index.js';
import { ancillaryLiquidDensity, ancillaryPressure, ancillaryVaporDensity, FluidContext, FluidState, propertiesAt } from '../../src/fluids/model.js';
import { saturationAtP, saturationAtT, solveSaturationDensities } from '../../src/fluids/saturation.js';
import { expectClose } from '../helpers/tolerance.js';
import { idealCp, readFluidFile } from '../fluids/unverified.js';

const m = fluidModel('nitrogen')!;
const ctx = new FluidContext(m);
const a = new FluidState();
const b = new FluidState();
const l = new FluidState();
const v = new FluidState();

describe('nitrogen, Span et al. 2000 (from memory): the checks it ships on', () => {
  it('critical point: p(Tc, ρc) = 3.3958 MPa (Table 5, from memory) and (∂p/∂ρ)_T = 0 there', () => {
    expect(propertiesAt(ctx, 126.192, 313.3, a)).not.toBe(Status.invalidInput);
    expectClose(a.p, 3.3958e6, { rel: 5e-7 }); // 3395800.44 Pa: the source's 5 digits
    // (∂p/∂ρ)_T/(RT) against its size away from the critical point (about 1 at low density)
    expect(Math.abs(a.dpdrho / (m.R * 126.192))).toBeLessThan(1e-6);
  });

  it('normal boiling point 77.355 K at 101.325 kPa (common practice)', () => {
    expect(saturationAtP(ctx, 101325, l, v)).toBe(Status.ok);
    expectClose(l.T, 77.355, { abs: 5e-4 });
    expect(saturationAtT(ctx, 77.355, l, v)).toBe(Status.ok);
    expectClose(l.p, 101325, { rel: 2e-6 });
  });

  it('triple point: 63.151 K, 12.5198 kPa (Table 5, from memory)', () => {
    expect(saturationAtT(ctx, 63.151, l, v)).toBe(Status.ok);
    expectClose(l.p, 12519.8, { rel: 5e-6 });
    expectClose(l.rho, 867.22, { rel: 1e-5 }); // the equation's (data file, computed)
  });

  it('saturation at 100 K: 0.77827 MPa (from memory)', () => {
    expect(saturationAtT(ctx, 100, l, v)).toBe(Status.ok);
    expectClose(l.p, 0.77827e6, { rel: 2e-5 });
  });

  it('ideal-gas part: cp° within 1.2e-4 of NIST-JANAF N-023 (100–1000 K)', () => {
    const janaf = readFileSync(new URL('./data/janaf/N-023.txt', import.meta.url), 'utf8').split('\n');
    const f = readFluidFile('nitrogen');
    for (const T of [100, 200, 300, 500, 1000]) {
      const row = janaf.find((line) => line.split('\t')[0] === String(T))!.split('\t');
      const cp = Number(row[1]) / 0.02801348;
      expect(Math.abs(idealCp(f, T) / cp - 1)).toBeLessThan(1.2e-4);
    }
  });

  it('the facade: R-728, saturation, superheat', () => {
    const n2 = fluid('R-728');
    expect(n2).toBe(fluid('nitrogen'));
    expectClose(n2.saturation({ p: '1 atm' }).T.in('K'), 77.355, { abs: 5e-4 });
    const gas = n2.state({ T: '300 K', p: '1 bar' });
    expect(gas.phase).toBe('vapor'); // T > Tc but p < pc
    expect(n2.state({ T: '80 K', p: '1 bar' }).superheat!.si).toBeGreaterThan(2);
    expect(n2.state({ T: '70 K', p: '1 MPa' }).phase).toBe('liquid');
  });
});

describe('nitrogen: consistency and solvers over the range', () => {
  it('Gibbs energy and pressure equal in both phases (to 1e-10) from the triple point to 1 mK below Tc', () => {
    for (let i = 0; i <= 60; i++) {
      const T = m.Tt + (m.Tc - 1e-3 - m.Tt) * (i / 60);
      expect(saturationAtT(ctx, T, l, v)).toBe(Status.ok);
      expectClose(l.g / (m.R * T), v.g / (m.R * T), { abs: 1e-10 });
      expectClose(l.p, v.p, { rel: 1e-10 });
    }
  });

  it('the ancillaries stay within their margins of the equation (measured)', () => {
    for (let i = 0; i <= 200; i++) {
      const T = m.Tt + (m.Tc - 1e-3 - m.Tt) * (i / 200);
      saturationAtT(ctx, T, l, v);
      expect(Math.abs(ancillaryPressure(m, T) / l.p - 1)).toBeLessThan(m.pressureMargin / 5);
      expect(Math.abs(ancillaryLiquidDensity(m, T) / l.rho - 1)).toBeLessThan(0.01);
      expect(Math.abs(ancillaryVaporDensity(m, T) / v.rho - 1)).toBeLessThan(0.01);
    }
  });

  it('the computed vapour-density ancillary is the least-squares fit its data file describes (reproduced)', () => {
    const f = readFluidFile('nitrogen') as unknown as { ancillary: { vaporDensity: { n: number[]; t: number[] } } };
    const t = f.ancillary.vaporDensity.t;
    const rows: [number, number][] = [];
    for (let i = 1; i <= 400; i++) {
      const T = m.Tc - (m.Tc - m.Tt) * (i / 400) ** 1.5 * 0.99999 - 1e-3;
      const first = i === 1;
      const dL = ancillaryLiquidDensity(m, m.Tc * 0.9999) / m.rhor;
      expect(solveSaturationDensities(ctx, T, first ? dL : ctx.satDL, first ? 2 - dL : ctx.satDV)).toBe(Status.ok);
      rows.push([1 - T / m.Tc, Math.log((ctx.satDV * m.rhor) / m.rhoc)]);
    }
    const k = t.length;
    const A = Array.from({ length: k }, () => new Array<number>(k).fill(0));
    const r = new Array<number>(k).fill(0);
    for (const [th, y] of rows) {
      const g = t.map((e) => th ** e);
      for (let i = 0; i < k; i++) {
        r[i]! += g[i]! * y;
        for (let j = 0; j < k; j++) A[i]![j]! += g[i]! * g[j]!;
      }
    }
    for (let i = 0; i < k; i++)
      for (let q = i + 1; q < k; q++) {
        const c = A[q]![i]! / A[i]![i]!;
        for (let j = i; j < k; j++) A[q]![j]! -= c * A[i]![j]!;
        r[q]! -= c * r[i]!;
      }
    const n = new Array<number>(k).fill(0);
    for (let i = k - 1; i >= 0; i--) {
      let s = r[i]!;
      for (let j = i + 1; j < k; j++) s -= A[i]![j]! * n[j]!;
      n[i] = s / A[i]![i]!;
    }
    n.forEach((x, i) => expectClose(f.ancillary.vaporDensity.n[i]!, x, { rel: 1e-6 }));
  });

  it('round trips of the flashes (fast-check, 1e-9), liquid, vapour and supercritical', () => {
    const states = fc.oneof(
      fc.tuple(fc.double({ min: 64, max: 124, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })).map(([T, f]) => {
        const ps = ancillaryPressure(m, T);
        return { T, p: Math.min(100e6, Math.exp(Math.log(1.05 * ps) + f * (Math.log(100e6) - Math.log(1.05 * ps)))) };
      }),
      fc.tuple(fc.double({ min: 66, max: 125, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })).map(([T, f]) => {
        const ps = ancillaryPressure(m, T);
        return { T, p: Math.exp(Math.log(0.01 * ps) + f * (Math.log(0.9 * ps) - Math.log(0.01 * ps))) };
      }),
      fc.tuple(fc.double({ min: 130, max: 1000, noNaN: true }), fc.double({ min: Math.log(1e3), max: Math.log(100e6), noNaN: true })).map(([T, lp]) => ({ T, p: Math.min(100e6, Math.exp(lp)) })),
    );
    fc.assert(
      fc.property(states, ({ T, p }) => {
        expect(stateFromPT(ctx, p, T, a)).toBe(Status.ok);
        const pTol = { rel: 1e-9, abs: 1e-13 * a.rho * a.dpdrho };
        expect(stateFromTRho(ctx, T, a.rho, b)).toBe(Status.ok);
        expectClose(b.p, p, pTol);
        expect(stateFromPH(ctx, p, a.h, b)).toBe(Status.ok);
        expectClose(b.T, T, { rel: 1e-9 });
        expect(stateFromPS(ctx, p, a.s, b)).toBe(Status.ok);
        expectClose(b.T, T, { rel: 1e-9 });
        expect(stateFromHS(ctx, a.h, a.s, b)).toBe(Status.ok);
        expectClose(b.T, T, { rel: 1e-9 });
      }),
      { numRuns: 150 },
    );
    fc.assert(
      fc.property(fc.double({ min: 63.2, max: 126, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), (T, x) => {
        expect(stateFromTX(ctx, T, x, a)).toBe(Status.ok);
        expect(stateFromPH(ctx, a.p, a.h, b)).toBe(Status.ok);
        expectClose(b.x, x, { abs: 1e-9 });
        expectClose(b.T, T, { rel: 1e-9 });
      }),
      { numRuns: 80 },
    );
  });

  it('cp − cv and w agree with finite differences (1e-7)', () => {
    for (const [T, p] of [[80, 5e6], [100, 2e5], [300, 1e7], [130, 4e6]] as const) {
      expect(stateFromPT(ctx, p, T, a)).toBe(Status.ok);
      expectClose(a.cp - a.cv, (T * a.dpdT * a.dpdT) / (a.rho * a.rho * a.dpdrho), { rel: 1e-7 });
      const hT = (x: number) => (stateFromPT(ctx, p, x, b), b.h);
      const dT = 1e-4 * T;
      expectClose((8 * (hT(T + dT) - hT(T - dT)) - (hT(T + 2 * dT) - hT(T - 2 * dT))) / (12 * dT), a.cp, { rel: 1e-7 });
    }
  });
});
