/**
 * The two-phase (h, s) flash (src/water/if97/hs.ts: below 623.15 K secant steps in T on the saturation
 * line from SR4-04's T_sat(h, s); above, the region 3 Newton path of hs-region3.ts must hand such
 * states over). Consistency checks against IF97's own equations, no outside values: a mixture built
 * from a (p, x) or (T, x) state comes back two-phase with its pressure and quality.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { stateFromHS } from '../../src/water/if97/hs.js';
import { stateFromPX, stateFromTX } from '../../src/water/if97/quality.js';
import { WaterState } from '../../src/water/if97/water-state.js';

describe('(h, s) flash of two-phase states up to 623.15 K', () => {
  const mix = new WaterState();
  const out = new WaterState();
  it('gives back the (p, x) state, region 4: h and s to their rounding, p as sharply as s determines it', () => {
    fc.assert(
      fc.property(fc.double({ min: Math.log(700), max: Math.log(16.4e6), noNaN: true }), fc.double({ min: 0.001, max: 0.999, noNaN: true }), (lnp, x) => {
        const p = Math.exp(lnp);
        expect(stateFromPX(p, x, mix)).toBe(Status.ok);
        expect(stateFromHS(mix.h, mix.s, out)).toBe(Status.ok);
        expect(out.region).toBe(4);
        // along an isenthalp (∂s/∂ln p)_h = −p·v/T: a miss of δs in s moves ln p by δs·T/(p·v), which
        // at low quality and pressure is far more than 1e-12 (e.g. 2e-10 at 90 kPa, x = 0.002)
        const lnpTolerance = (2e-13 * (Math.abs(mix.s) + 1e3) * mix.T) / (p * mix.v) + 1e-13;
        expect(Math.abs(Math.log(out.p / p))).toBeLessThanOrEqual(lnpTolerance);
        expect(Math.abs(out.x - x)).toBeLessThan(1e-9);
        expect(Math.abs(out.h - mix.h)).toBeLessThanOrEqual(1e-9 * Math.abs(mix.h) + 1e-9);
        expect(Math.abs(out.s - mix.s)).toBeLessThanOrEqual(1e-12 * (Math.abs(mix.s) + 1e3));
      }),
      { numRuns: 2000 },
    );
  });
});

describe('(h, s) flash of two-phase states above 623.15 K (region 3 temperatures)', () => {
  const mix = new WaterState();
  const out = new WaterState();
  // the region 3 Newton path in (ρ, T) must not take a point on the region 3 equation's loop inside
  // the dome (metastable or unstable) for a single-phase answer: every such mixture comes back two-phase
  it('a mixture from (T, x) comes back two-phase with its x, up to 1 mK below T_c', () => {
    fc.assert(
      fc.property(fc.double({ min: 623.16, max: 647.095, noNaN: true }), fc.double({ min: 0.001, max: 0.999, noNaN: true }), (T, x) => {
        expect(stateFromTX(T, x, mix)).toBe(Status.ok);
        expect(stateFromHS(mix.h, mix.s, out)).toBe(Status.ok);
        expect(out.region, `T = ${T}, x = ${x}`).toBe(4);
        expect(Math.abs(out.x - x), `T = ${T}, x = ${x}`).toBeLessThan(1e-6);
      }),
      // two mixtures the region 3 path once took for single-phase vapour on the equation's loop
      { numRuns: 3000, examples: [[645.8821909032034, 0.42227967437736863], [646.5718291529645, 0.4540293887257576]] },
    );
  });
});
