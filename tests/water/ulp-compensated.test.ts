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
import { checkGibbs, checkRegion3, TABLE_15, TABLE_33, TABLE_42, TABLE_5 } from '../reference/if97-verification.js';

const D = Decimal.clone({ precision: 60 });
const GOAL = 16;
const out = new WaterProperties();

describe('compensated kernels reproduce the IF97 verification tables (IAPWS R7-97(2012))', () => {
  describe('Table 5: region1Compensated', () => {
    checkGibbs(region1Compensated, TABLE_5);
  });
  describe('Table 15: region2Compensated', () => {
    checkGibbs(region2Compensated, TABLE_15);
  });
  describe('Table 42: region5Compensated', () => {
    checkGibbs(region5Compensated, TABLE_42);
  });
  describe('Table 33: region3Compensated', () => {
    checkRegion3(region3Compensated, TABLE_33);
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
