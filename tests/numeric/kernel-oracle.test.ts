/**
 * Every generated kernel against a plain loop over the same coefficients.
 *
 * - IF97 (src/water/if97/kernels.generated.ts, from data/if97): the term sums of the basic equations
 *   with their derivatives, the ideal-gas sums of regions 2 and 5, and every backward equation:
 *   R7-97 T(p, h) and T(p, s), SR2-01 p(h, s), SR3-03 T and v of (p, h) and (p, s), SR4-04.
 *   Oracle: tests/water/reference-sums.ts (power ladders, one loop).
 * - Fluids (src/fluids/kernels.generated.ts, from data/fluids): αʳ and α° with their derivatives.
 *   Oracle: tests/fluids/reference-helmholtz.ts (Math.pow term by term), and central differences
 *   of the generated values for the derivatives.
 *
 * Rounding is measured against the size of the terms: |kernel − loop| ≤ 1e-13·Σ|termᵢ| (the loop
 * evaluated with |nᵢ|, |x|, |y|), since single terms of these sums can be 10⁴ times their total.
 * Inputs range over the reduced variables each kernel sees in use (mapped from the physical ranges
 * of its region, stated beside each case).
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as K from '../../src/water/if97/kernels.generated.js';
import * as F from '../../src/fluids/kernels.generated.js';
import { certainlyRegion1 } from '../../src/water/if97/pt.js';
import { region1 } from '../../src/water/if97/region1.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { fluidKernelNames, readFluidCoefficients } from '../../scripts/generate-kernels.js';
import { compileTerms, sumTerms, sumValue } from '../water/reference-sums.js';
import { referenceIdeal, referenceResidual } from '../fluids/reference-helmholtz.js';

const read = (name: string) => JSON.parse(readFileSync(new URL(`../../data/if97/${name}.json`, import.meta.url), 'utf8'));
type Terms = { I: number[]; J: number[]; n: number[] };
const r2 = read('region2');
const r5 = read('region5');
const b1 = read('backward-region1');
const b2 = read('backward-region2');
const hs = read('backward-hs');
const r3b = read('backward-region3');
const sr4 = read('backward-hs-region3');
const quarter = (t: Terms): Terms => ({ I: t.I.map((i) => Math.round(4 * i)), J: t.J, n: t.n });
const abs = (t: Terms): Terms => ({ I: t.I, J: t.J, n: t.n.map(Math.abs) });

type Range = readonly [number, number];
const within = (a: number, b: number, size: number, tol = 1e-13) => {
  if (!(Math.abs(a - b) <= tol * size)) expect.fail(`kernel ${a} vs loop ${b}: difference ${a - b} exceeds ${tol} of the term size ${size}`);
};
/**
 * The fluids' residual parts: near δ = 1 the IAPWS-95 non-analytic terms (Δ^b, with Δ small) have
 * derivatives of size 1e19 and more, evaluated by different operation orders in the kernel and the
 * loop; a difference of 1.02e-13 of the term size was seen there (δ = 0.99962, τ = 2.5415). 1e-12 of
 * the term size still fails any wrong coefficient or exponent by many orders.
 */
const FLUID_TOL = 1e-12;

const sumsCases: [string, Terms, Range, Range][] = [
  ['region1Sums', read('region1'), [1.05, 7.1], [1.0, 3.9]], // x = 7.1 − π (p ≤ 100 MPa), y = τ − 1.222 (273.15–623.15 K)
  ['region2ResidualSums', r2, [1e-4, 100], [0.01, 1.5]], // x = π (p ≤ 100 MPa), y = τ − 0.5
  ['region2MetastableSums', r2.metastable, [1e-4, 10], [0.2, 1.5]],
  ['region3Sums', read('region3'), [0.3, 2.5], [0.75, 1.04]], // x = δ, y = τ (623.15–863 K)
  ['region5ResidualSums', r5, [1e-4, 50], [0.44, 0.94]], // x = π (p ≤ 50 MPa), y = τ (1073.15–2273.15 K)
];
const idealCases: [string, { J: number[]; n: number[] }, Range][] = [
  ['region2IdealSums', { J: r2.J0, n: r2.n0 }, [0.5, 1.98]], // y = τ = 540 K/T, 273.15–1073.15 K
  ['region5IdealSums', { J: r5.J0, n: r5.n0 }, [0.44, 0.94]], // y = τ = 1000 K/T, 1073.15–2273.15 K
];
/** SR3-03: x = p/p* + shift, y = h/h* (or s/s*) + shift over 16.5–100 MPa and the subregion's h or s. */
const sr3 = (key: string, yMin: number, yMax: number, yScale: number): [string, Terms, Range, Range] => {
  const [, pStar, yStar] = r3b[key].star as number[];
  const [dx, dy] = r3b[key].shift as number[];
  return [`backward${key}`, r3b[key], [16.5 / pStar! + dx!, 100 / pStar! + dx!], [yMin / (yStar! * yScale) + dy!, yMax / (yStar! * yScale) + dy!]];
};
const valueCases: [string, Terms, Range, Range][] = [
  // IAPWS R7-97(2012) backward equations
  ['backward1PH', b1.ph, [0.001, 100], [1.0, 2.6]],
  ['backward1PS', b1.ps, [0.001, 100], [1.5, 6.0]],
  ['backward2aPH', b2.ph2a, [0.001, 4], [-0.8, 0.1]],
  ['backward2bPH', b2.ph2b, [2, 98], [-0.4, 0]],
  ['backward2cPH', b2.ph2c, [31, 125], [-0.1, 0.2]],
  ['backward2aPS', quarter(b2.ps2a), [0.17, 1.42], [1.0, 3.0]],
  ['backward2bPS', b2.ps2b, [4, 100], [0.4, 2.6]],
  ['backward2cPS', b2.ps2c, [4, 100], [-0.1, 0.3]],
  // IAPWS SR2-01(2014) p(h, s) (variables as src/water/if97/backward-hs.ts forms them)
  ['backward1HS', hs.region1, [0.05, 0.55], [0.05, 0.58]], // h 0–1700 kJ/kg, s 0–4 kJ/(kg·K)
  ['backward2aHS', hs.region2a, [0.095, 0.5], [-0.7, -0.2]], // h 2500–4200 kJ/kg, s 6–12 kJ/(kg·K)
  ['backward2bHS', hs.region2b, [0.034, 0.4], [-0.27, 0]], // h 2600–4100 kJ/kg, s 5.85–8 kJ/(kg·K)
  ['backward2cHS', hs.region2c, [0.014, 0.357], [-0.253, -0.108]], // h 2500–3700 kJ/kg, s 5–5.85 kJ/(kg·K)
  // IAPWS SR3-03(2014) region 3 backward equations
  sr3('T3aPH', 1.6e6, 2.1e6, 1e3),
  sr3('T3bPH', 2.0e6, 2.8e6, 1e3),
  sr3('v3aPH', 1.6e6, 2.1e6, 1e3),
  sr3('v3bPH', 2.0e6, 2.8e6, 1e3),
  sr3('T3aPS', 3.6e3, 4.41e3, 1e3),
  sr3('T3bPS', 4.41e3, 5.05e3, 1e3),
  sr3('v3aPS', 3.6e3, 4.41e3, 1e3),
  sr3('v3bPS', 4.41e3, 5.05e3, 1e3),
  // IAPWS SR4-04(2014) (variables as src/water/if97/backward-hs-region3.ts forms them)
  ['sr4p3a', sr4.p3a, [-0.27, 0.12], [0.023, 0.273]], // h 1700–2600 kJ/kg, s 3.4–4.5 kJ/(kg·K)
  ['sr4h1s', sr4.h1s, [-1.09, -0.095], [0.0001, 0.995]], // s 0–3.78 kJ/(kg·K)
  ['sr4h3as', sr4.h3as, [-0.095, 0.07], [0.995, 1.16]], // s 3.78–4.41 kJ/(kg·K)
  ['sr4h2abs', sr4.h2abs, [0.056, 0.378], [0.112, 0.472]], // s 5.85–9.16 kJ/(kg·K)
  ['sr4h2c3bs', sr4.h2c3bs, [-0.272, -0.028], [0.021, 0.266]], // s 4.41–5.85 kJ/(kg·K)
  ['sr4hB13s', sr4.hB13s, [0.01, 0.11], [0.03, 0.13]], // s 3.397–3.778 kJ/(kg·K)
  ['sr4TB23hs', sr4.TB23hs, [0.127, 0.21], [0.089, 0.128]], // h 2563–2812 kJ/kg, s 5.05–5.26 kJ/(kg·K)
  ['sr4Tsaths', sr4.Tsaths, [0.595, 0.881], [-0.505, -0.07]], // h 2000–2800 kJ/kg, s 5.2–9.2 kJ/(kg·K)
];

/** Kernels of one derivative alone: bit for bit the matching output of a full kernel checked above. */
const tauSumCases: [string, string, Range, Range][] = [
  ['region1TauSum', 'region1Sums', [1.05, 7.1], [1.0, 3.9]],
  ['region2ResidualTauSum', 'region2ResidualSums', [1e-4, 100], [0.01, 1.5]],
];

describe('IF97 kernels (src/water/if97/kernels.generated.ts) against a plain loop', () => {
  it('every exported kernel has a case here', () => {
    const covered = new Set([...sumsCases, ...idealCases, ...valueCases, ...tauSumCases].map((c) => c[0]).concat('region1Rows'));
    expect(Object.keys(K).filter((k) => !covered.has(k))).toEqual([]);
    expect([...covered].filter((k) => !(k in K))).toEqual([]);
  });

  // the batch's region 1 block: its sums are region1Sums' (checked against the loop above), its relations region1's
  it('region1Rows: the elements certainlyRegion1 accepts are marked and get region1(p, T) bit for bit; the others are marked 0, their rows untouched', () => {
    const props = new WaterProperties();
    const pressure = fc.oneof(fc.double({ min: 1e6, max: 110e6, noNaN: true }), fc.constantFrom(16.6e6, 100e6, NaN, -1));
    const temperature = fc.oneof(fc.double({ min: 250, max: 700, noNaN: true }), fc.constantFrom(273.15, 623.15, NaN));
    fc.assert(
      fc.property(fc.array(fc.tuple(pressure, temperature), { minLength: 1, maxLength: 40 }), fc.boolean(), (elements, wantK) => {
        const n = elements.length + 3;
        const P = new Float64Array(n);
        const T = new Float64Array(n);
        elements.forEach(([p, t], j) => {
          P[j + 3] = p;
          T[j + 3] = t;
        });
        const mask = new Uint8Array(elements.length).fill(7);
        const rows = new Float64Array(12 * elements.length).fill(-1);
        const count = K.region1Rows(P, T, 3, n, mask, rows, wantK);
        expect(count).toBe(elements.filter(([p, t]) => certainlyRegion1(p, t)).length);
        elements.forEach(([p, t], j) => {
          const row = Array.from(rows.subarray(12 * j, 12 * j + 12));
          if (!certainlyRegion1(p, t)) {
            expect(mask[j]).toBe(0);
            return expect(row).toEqual(new Array(12).fill(-1));
          }
          expect(mask[j]).toBe(1);
          const o = region1(p, t, props);
          expect(row).toEqual([o.T, o.p, o.v, o.rho, o.u, o.h, o.s, o.cp, o.cv, o.w, wantK ? o.cp / o.cv : NaN, NaN]);
        });
      }),
      { numRuns: 100 },
    );
  });

  it.each(tauSumCases)('%s: Sy alone, bit for bit out[3] of %s', (name, full, xr, yr) => {
    const one = (K as unknown as Record<string, (x: number, y: number) => number>)[name]!;
    const all = (K as unknown as Record<string, (x: number, y: number, o: Float64Array) => void>)[full]!;
    const o = new Float64Array(6);
    fc.assert(
      fc.property(fc.double({ min: xr[0], max: xr[1], noNaN: true }), fc.double({ min: yr[0], max: yr[1], noNaN: true }), (x, y) => {
        all(x, y, o);
        expect(one(x, y)).toBe(o[3]);
      }),
      { numRuns: 200 },
    );
  });

  it.each(sumsCases)('%s: S and its five derivatives', (name, data, xr, yr) => {
    const terms = compileTerms(data.I, data.J, data.n);
    const size = compileTerms(data.I, data.J, data.n.map(Math.abs));
    const sizeOf = { ...size, nI: size.nI.map(Math.abs), nII: size.nII.map(Math.abs), nJ: size.nJ.map(Math.abs), nJJ: size.nJJ.map(Math.abs), nIJ: size.nIJ.map(Math.abs) };
    const a = new Float64Array(6);
    const b = new Float64Array(6);
    const m = new Float64Array(6);
    const kernel = (K as unknown as Record<string, (x: number, y: number, o: Float64Array) => void>)[name]!;
    fc.assert(
      fc.property(fc.double({ min: xr[0], max: xr[1], noNaN: true }), fc.double({ min: yr[0], max: yr[1], noNaN: true }), (x, y) => {
        kernel(x, y, a);
        sumTerms(terms, x, y, b);
        sumTerms(sizeOf, Math.abs(x), Math.abs(y), m);
        for (let i = 0; i < 6; i++) within(a[i]!, b[i]!, Math.abs(m[i]!));
      }),
      { numRuns: 200 },
    );
  });

  it.each(idealCases)('%s: G, Gτ, Gττ', (name, data, yr) => {
    const I = data.J.map(() => 0);
    const terms = compileTerms(I, data.J, data.n);
    const size = compileTerms(I, data.J, data.n.map(Math.abs));
    const sizeOf = { ...size, nJ: size.nJ.map(Math.abs), nJJ: size.nJJ.map(Math.abs) };
    const a = new Float64Array(3);
    const b = new Float64Array(6);
    const m = new Float64Array(6);
    const kernel = (K as unknown as Record<string, (y: number, o: Float64Array) => void>)[name]!;
    fc.assert(
      fc.property(fc.double({ min: yr[0], max: yr[1], noNaN: true }), (y) => {
        kernel(y, a);
        sumTerms(terms, 1, y, b);
        sumTerms(sizeOf, 1, y, m);
        within(a[0]!, b[0]!, m[0]!);
        within(a[1]!, b[3]!, m[3]!);
        within(a[2]!, b[4]!, m[4]!);
      }),
      { numRuns: 200 },
    );
  });

  it.each(valueCases)('%s: Σ n xᴵ yᴶ', (name, data, xr, yr) => {
    const terms = compileTerms(data.I, data.J, data.n);
    const size = compileTerms(data.I, data.J, abs(data).n);
    const kernel = (K as unknown as Record<string, (x: number, y: number) => number>)[name]!;
    fc.assert(
      fc.property(fc.double({ min: xr[0], max: xr[1], noNaN: true }), fc.double({ min: yr[0], max: yr[1], noNaN: true }), (x, y) => {
        fc.pre(x !== 0 && y !== 0);
        within(kernel(x, y), sumValue(terms, x, y), sumValue(size, Math.abs(x), Math.abs(y)));
      }),
      { numRuns: 200 },
    );
  });
});

const fluids = readFluidCoefficients().filter((f) => f.data.loadable === true);
describe('Fluid kernels (src/fluids/kernels.generated.ts) against a plain loop', () => {
  it('every exported kernel belongs to a loadable fluid file, and every loadable fluid has both kernels', () => {
    const expected = fluids.flatMap((f) => Object.values(fluidKernelNames(f.file)));
    expect(Object.keys(F).sort()).toEqual(expected.sort());
  });

  // δ over 1e-4…4.5 (dilute gas to compressed liquid), τ over 0.3…3 (about 2.2·Tc down to the triple point)
  it.each(fluids.map((f) => [f.file, f] as const))('%s: αʳ, α° and their derivatives', (_file, f) => {
    const names = fluidKernelNames(f.file);
    const residual = (F as unknown as Record<string, (d: number, t: number, o: Float64Array) => void>)[names.residual]!;
    const ideal = (F as unknown as Record<string, (t: number, o: Float64Array) => void>)[names.ideal]!;
    const a = new Float64Array(6);
    const b = [0, 0, 0, 0, 0, 0];
    const m = [0, 0, 0, 0, 0, 0];
    const ai = new Float64Array(3);
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 4.5, noNaN: true }), fc.double({ min: 0.3, max: 3, noNaN: true }), (delta, tau) => {
        fc.pre(Math.abs(delta - 1) > 1e-6);
        residual(delta, tau, a);
        referenceResidual(f.data, delta, tau, b, m);
        for (let i = 0; i < 6; i++) within(a[i]!, b[i]!, m[i]!, FLUID_TOL);
        ideal(tau, ai);
        referenceIdeal(f.data, tau, b, m);
        for (let i = 0; i < 3; i++) within(ai[i]!, b[i]!, m[i]!);
      }),
      { numRuns: 300, examples: [[0.9996175612588436, 2.5415271816758302]] }, // the case the note on FLUID_TOL quotes
    );
  });

  it.each(fluids.map((f) => [f.file, f] as const))('%s: derivatives agree with five-point differences of the kernel values', (_file, f) => {
    const names = fluidKernelNames(f.file);
    const residual = (F as unknown as Record<string, (d: number, t: number, o: Float64Array) => void>)[names.residual]!;
    const ideal = (F as unknown as Record<string, (t: number, o: Float64Array) => void>)[names.ideal]!;
    const c = new Float64Array(6);
    const w = new Float64Array(6);
    const o = new Float64Array(3);
    const m = [0, 0, 0, 0, 0, 0];
    const b = [0, 0, 0, 0, 0, 0];
    /** d/dx of output `i` by the five-point stencil (error O(h⁴)). */
    const diff = (at: (x: number) => number, x: number, h: number) => (8 * (at(x + h) - at(x - h)) - (at(x + 2 * h) - at(x - 2 * h))) / (12 * h);
    const inDelta = (tau: number, i: number) => (x: number) => (residual(x, tau, w), w[i]!);
    const inTau = (delta: number, i: number) => (x: number) => (residual(delta, x, w), w[i]!);
    const idealTau = (i: number) => (x: number) => (ideal(x, w), w[i]!);
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 4, noNaN: true }), fc.double({ min: 0.35, max: 2.5, noNaN: true }), (delta, tau) => {
        fc.pre(Math.abs(delta - 1) > 1e-2 && Math.abs(tau - 1) > 1e-2);
        residual(delta, tau, c);
        referenceResidual(f.data, delta, tau, b, m);
        const hd = 1e-4 * delta;
        const ht = 1e-4 * tau;
        const near = (x: number, i: number, what: string) => {
          if (!(Math.abs(x - c[i]!) <= 1e-8 * m[i]! + 1e-12)) expect.fail(`${what} = ${c[i]} vs difference ${x} (δ = ${delta}, τ = ${tau})`);
        };
        near(diff(inDelta(tau, 0), delta, hd), 1, 'αʳ_δ');
        near(diff(inDelta(tau, 1), delta, hd), 2, 'αʳ_δδ');
        near(diff(inDelta(tau, 3), delta, hd), 5, 'αʳ_δτ');
        near(diff(inTau(delta, 0), tau, ht), 3, 'αʳ_τ');
        near(diff(inTau(delta, 3), tau, ht), 4, 'αʳ_ττ');
        near(diff(inTau(delta, 1), tau, ht), 5, 'αʳ_δτ');
        ideal(tau, o);
        const i1 = diff(idealTau(0), tau, ht);
        const i2 = diff(idealTau(1), tau, ht);
        if (!(Math.abs(i1 - o[1]!) <= 1e-9 * Math.abs(o[1]!) + 1e-12)) expect.fail(`α°_τ = ${o[1]} vs difference ${i1}`);
        if (!(Math.abs(i2 - o[2]!) <= 1e-9 * Math.abs(o[2]!) + 1e-12)) expect.fail(`α°_ττ = ${o[2]} vs difference ${i2}`);
      }),
      { numRuns: 200 },
    );
  });
});
