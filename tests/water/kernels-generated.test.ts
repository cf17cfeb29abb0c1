import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { KERNELS_PATH, renderKernels } from '../../scripts/generate-kernels.js';
import * as K from '../../src/water/if97/kernels.generated.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { region1, region1Enthalpy } from '../../src/water/if97/region1.js';
import { region2, region2Enthalpy } from '../../src/water/if97/region2.js';
import { compileTerms, sumTerms, sumValue } from './reference-sums.js';
import { expectClose } from '../helpers/tolerance.js';

const read = (name: string) => JSON.parse(readFileSync(new URL(`../../data/if97/${name}.json`, import.meta.url), 'utf8'));
const r2 = read('region2');
const b1 = read('backward-region1');
const b2 = read('backward-region2');

// Every kernel of this module (and of src/fluids/kernels.generated.ts) is also checked against a plain
// loop in tests/numeric/kernel-oracle.test.ts, which fails when a kernel has no case there.
describe('src/water/if97/kernels.generated.ts', () => {
  it('is current: regenerating from data/if97 gives the committed file (npm run kernels)', () => {
    expect(readFileSync(KERNELS_PATH, 'utf8')).toBe(renderKernels());
  });

  const sumsCases = [
    ['region1Sums', read('region1'), [1.05, 7.1], [1.0, 3.9]],
    ['region2ResidualSums', r2, [1e-4, 100], [0.01, 1.5]],
    ['region2MetastableSums', r2.metastable, [1e-4, 10], [0.2, 1.5]],
    ['region3Sums', read('region3'), [0.3, 2.5], [0.75, 1.04]],
    ['region5ResidualSums', read('region5'), [1e-4, 50], [0.44, 0.94]],
  ] as const;
  it.each(sumsCases)('%s agrees with a plain loop over the coefficients (to 1e-13 of the summed term sizes)', (name, data, xr, yr) => {
    const terms = compileTerms(data.I, data.J, data.n);
    // the same sums over |coefficients|: the size of the terms, against which rounding is measured
    const abs = (v: Float64Array) => v.map(Math.abs);
    const magnitude = { ...terms, n: abs(terms.n), nI: abs(terms.nI), nII: abs(terms.nII), nJ: abs(terms.nJ), nJJ: abs(terms.nJJ), nIJ: abs(terms.nIJ) };
    const a = new Float64Array(6);
    const b = new Float64Array(6);
    const m = new Float64Array(6);
    const kernel = (K as unknown as Record<string, (x: number, y: number, o: Float64Array) => void>)[name]!;
    fc.assert(
      fc.property(fc.double({ min: xr[0], max: xr[1], noNaN: true }), fc.double({ min: yr[0], max: yr[1], noNaN: true }), (x, y) => {
        kernel(x, y, a);
        sumTerms(terms, x, y, b);
        sumTerms(magnitude, x, y, m);
        for (let i = 0; i < 6; i++) expectClose(a[i]!, b[i]!, { abs: 1e-13 * Math.abs(m[i]!) });
      }),
      { numRuns: 300 },
    );
  });

  const quarter = (t: { I: number[]; J: number[]; n: number[] }) => ({ I: t.I.map((i) => Math.round(4 * i)), J: t.J, n: t.n });
  const valueCases = [
    ['backward1PH', b1.ph, [0.001, 100], [1.0, 2.6]],
    ['backward1PS', b1.ps, [0.001, 100], [1.5, 6.0]],
    ['backward2aPH', b2.ph2a, [0.001, 4], [-0.8, 0.1]],
    ['backward2bPH', b2.ph2b, [2, 98], [-0.4, 0]],
    ['backward2cPH', b2.ph2c, [31, 125], [-0.1, 0.2]],
    ['backward2aPS', quarter(b2.ps2a), [0.17, 1.42], [1.0, 3.0]],
    ['backward2bPS', b2.ps2b, [4, 100], [0.4, 2.6]],
    ['backward2cPS', b2.ps2c, [4, 100], [-0.1, 0.3]],
  ] as const;
  it.each(valueCases)('%s agrees with a plain loop over the coefficients (relative 1e-11, or 1e-9 absolute where the sum nearly cancels)', (name, data, xr, yr) => {
    const terms = compileTerms(data.I, data.J, data.n);
    const kernel = (K as unknown as Record<string, (x: number, y: number) => number>)[name]!;
    fc.assert(
      fc.property(fc.double({ min: xr[0], max: xr[1], noNaN: true }), fc.double({ min: yr[0], max: yr[1], noNaN: true }), (x, y) => {
        fc.pre(y !== 0);
        expectClose(kernel(x, y), sumValue(terms, x, y), { rel: 1e-11, abs: 1e-9 });
      }),
      { numRuns: 300 },
    );
  });
});

describe('the enthalpy-only functions (humid-air processes) against the full equations', () => {
  const out = new WaterProperties();
  // any (p, T) of the regions' ranges: 273.15–623.15 K up to 100 MPa (region 1), 273.15–1073.15 K (region 2)
  it('region1Enthalpy is bit for bit region1(p, T).h', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e3, max: 100e6, noNaN: true }), fc.double({ min: 273.15, max: 623.15, noNaN: true }), (p, T) => {
        expect(region1Enthalpy(p, T)).toBe(region1(p, T, out).h);
      }),
      { numRuns: 300 },
    );
  });
  it('region2Enthalpy is bit for bit region2(p, T).h', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 100e6, noNaN: true }), fc.double({ min: 273.15, max: 1073.15, noNaN: true }), (p, T) => {
        expect(region2Enthalpy(p, T)).toBe(region2(p, T, out).h);
      }),
      { numRuns: 300 },
    );
  });
});
