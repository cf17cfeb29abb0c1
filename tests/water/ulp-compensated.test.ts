/**
 * The compensated (double-double) IF97 kernels of src/water/if97/compensated.ts:
 * - the IAPWS R7-97(2012) computer-program verification tables (Tables 5, 15, 33, 42, printed to 9
 *   significant digits), as the fast kernels are checked in tests/reference/iapws-if97.test.ts;
 * - within 16 ulp, with no exceptions, of the same equations evaluated with decimal.js at 60 digits:
 *   at every state of the stored sample (tests/water/data/if97-high-precision.json, written by
 *   scripts/ulp-report.ts, basis "computed") and at random states drawn here and evaluated live;
 * - the double-double building blocks against decimal.js at 60 digits.
 */
import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import sample from './data/if97-high-precision.json';
import { REGIONS, ulps, type Property } from '../../scripts/ulp-report.js';
import { region1Compensated, region2Compensated, region3Compensated, region5Compensated } from '../../src/water/if97/compensated.js';
import { ddDiv, ddFromDecimal, ddLog, ddMul, ddSet, ddSqrtValue, ddSub, ddValue } from '../../src/water/if97/double-double.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { expectClose } from '../helpers/tolerance.js';

const D = Decimal.clone({ precision: 60 });
const GOAL = 16;
const out = new WaterProperties();

/** Printed to 9 significant digits: agree within half a unit in the 9th digit. */
const nine = (actual: number, printed: number) => expectClose(actual, printed, { rel: 5.0001e-9 });
type Row = [number, number, number, number, number, number, number, number];

describe('compensated kernels reproduce the IF97 verification tables (IAPWS R7-97(2012))', () => {
  const gibbs = (f: (p: number, T: number, o: WaterProperties) => WaterProperties, rows: Row[]) =>
    it.each(rows)('T = %d K, p = %d MPa', (T, p, v, h, u, s, cp, w) => {
      f(p * 1e6, T, out);
      nine(out.v, v);
      nine(out.h / 1e3, h);
      nine(out.u / 1e3, u);
      nine(out.s / 1e3, s);
      nine(out.cp / 1e3, cp);
      nine(out.w, w);
    });
  describe('Table 5: region1Compensated', () => {
    gibbs(region1Compensated, [
      [300, 3, 0.100215168e-2, 0.115331273e3, 0.112324818e3, 0.392294792, 0.417301218e1, 0.150773921e4],
      [300, 80, 0.971180894e-3, 0.184142828e3, 0.106448356e3, 0.368563852, 0.401008987e1, 0.163469054e4],
      [500, 3, 0.1202418e-2, 0.975542239e3, 0.971934985e3, 0.258041912e1, 0.465580682e1, 0.124071337e4],
    ]);
  });
  describe('Table 15: region2Compensated', () => {
    gibbs(region2Compensated, [
      [300, 0.0035, 0.394913866e2, 0.254991145e4, 0.24116916e4, 0.852238967e1, 0.191300162e1, 0.427920172e3],
      [700, 0.0035, 0.923015898e2, 0.333568375e4, 0.301262819e4, 0.101749996e2, 0.208141274e1, 0.644289068e3],
      [700, 30, 0.542946619e-2, 0.263149474e4, 0.246861076e4, 0.517540298e1, 0.103505092e2, 0.480386523e3],
    ]);
  });
  describe('Table 42: region5Compensated', () => {
    gibbs(region5Compensated, [
      [1500, 0.5, 0.13845509e1, 0.521976855e4, 0.45274931e4, 0.965408875e1, 0.261609445e1, 0.91706869e3],
      [1500, 30, 0.230761299e-1, 0.516723514e4, 0.447495124e4, 0.772970133e1, 0.272724317e1, 0.928548002e3],
      [2000, 30, 0.311385219e-1, 0.657122604e4, 0.563707038e4, 0.853640523e1, 0.288569882e1, 0.106736948e4],
    ]);
  });
  describe('Table 33: region3Compensated', () => {
    it.each([
      [650, 500, 0.255837018e2, 0.186343019e4, 0.181226279e4, 0.405427273e1, 0.138935717e2, 0.502005554e3],
      [650, 200, 0.222930643e2, 0.237512401e4, 0.226365868e4, 0.485438792e1, 0.446579342e2, 0.383444594e3],
      [750, 500, 0.783095639e2, 0.225868845e4, 0.210206932e4, 0.446971906e1, 0.634165359e1, 0.760696041e3],
    ])('T = %d K, ρ = %d kg/m³', (T, rho, p, h, u, s, cp, w) => {
      region3Compensated(rho, T, out);
      nine(out.p / 1e6, p);
      nine(out.h / 1e3, h);
      nine(out.u / 1e3, u);
      nine(out.s / 1e3, s);
      nine(out.cp / 1e3, cp);
      nine(out.w, w);
    });
  });
});

describe('compensated kernels within 16 ulp of a 60-digit evaluation, no exceptions', () => {
  it.each(REGIONS.map((r) => [r.id, r] as const))('region %d: every stored state (tests/water/data/if97-high-precision.json)', (id, region) => {
    const states = sample.states.filter((s) => s.region === id);
    expect(states.length).toBe(40);
    for (const st of states) {
      region.compensated(st.x, st.y, out);
      for (const [prop, value] of Object.entries(st.values)) {
        expect(ulps(out[prop as Property], new D(value)), `region ${id} ${prop} at (${st.x}, ${st.y})`).toBeLessThanOrEqual(GOAL);
      }
    }
  });

  it.each(REGIONS.map((r) => [r.id, r] as const))('region %d: random states evaluated live', (id, region) => {
    // states drawn by the region's own sampler from a fast-check seed (a different stream from the stored sample)
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2 ** 31 - 1 }), (seed) => {
        let x = seed;
        const rnd = () => {
          x = (Math.imul(x, 48271) >>> 0) % 2147483647;
          return x / 2147483647;
        };
        const [a, b] = region.draw(rnd);
        const ref = region.exact(a, b);
        region.compensated(a, b, out);
        for (const prop of region.properties) expect(ulps(out[prop], ref[prop]!), `region ${id} ${prop} at (${a}, ${b})`).toBeLessThanOrEqual(GOAL);
      }),
      { numRuns: 25, seed: 16 + id },
    );
  });
});

describe('double-double building blocks against decimal.js at 60 digits', () => {
  const w = new Float64Array(16);
  const exact = (x: number) => new D(x.toPrecision(100));
  const value = (slot: number) => exact(w[2 * slot]!).plus(exact(w[2 * slot + 1]!));
  /** Relative error of slot `slot` against `ref`, in units of 2⁻¹⁰⁶. */
  const err = (slot: number, ref: Decimal) => value(slot).minus(ref).div(ref).abs().mul(new D(2).pow(106)).toNumber();

  it('ddFromDecimal holds 647.096 and 7.1 to 106 bits (IF97 writes them as decimals)', () => {
    ddFromDecimal(w, 0, '647.096');
    expect(err(0, new D('647.096'))).toBeLessThan(16);
    expect(w[0]).toBe(647.096);
    ddFromDecimal(w, 0, '7.1');
    expect(err(0, new D('7.1'))).toBeLessThan(16);
  });

  it('products, quotients and differences are double-double accurate (random operands)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e3, noNaN: true }), fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (a, b) => {
        ddSet(w, 1, a, 0);
        ddSet(w, 2, b, 0);
        ddDiv(w, 3, 1, 2); // a/b, not exact in doubles
        ddMul(w, 4, 3, 3);
        const q = exact(a).div(exact(b));
        expect(err(3, q)).toBeLessThan(16);
        expect(err(4, value(3).mul(value(3)))).toBeLessThan(16);
        ddSub(w, 5, 3, 1); // a/b − a
        const d = value(3).minus(exact(a));
        if (!d.isZero()) expect(value(5).minus(d).abs().div(value(3).abs().plus(exact(a))).mul(new D(2).pow(106)).toNumber()).toBeLessThan(16);
      }),
      { numRuns: 200, seed: 7 },
    );
  });

  it('ddLog and ddSqrtValue: ln to 2⁻⁷² absolute (its documented bound), √ to half an ulp', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 1e4, noNaN: true }), fc.double({ min: 0.5, max: 2, noNaN: true }), (a, b) => {
        ddSet(w, 1, a, 0);
        ddSet(w, 2, b, 0);
        ddDiv(w, 3, 1, 2);
        ddLog(w, 4, 3);
        const ln = value(3).ln();
        expect(value(4).minus(ln).abs().toNumber()).toBeLessThan(2 ** -72);
        const root = value(3).sqrt();
        expect(ulps(ddSqrtValue(w, 3), root)).toBeLessThanOrEqual(0.5001);
        expect(ulps(ddValue(w, 3), value(3))).toBeLessThanOrEqual(0.5);
      }),
      { numRuns: 200, seed: 11 },
    );
  });
});
