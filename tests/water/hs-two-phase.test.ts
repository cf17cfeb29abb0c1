/**
 * The two-phase (h, s) flash below 623.15 K (src/water/if97/hs.ts, secant steps in T on the saturation
 * line from SR4-04's T_sat(h, s)). A consistency check against IF97's own equations, no outside
 * values: a mixture built from the (p, x) state comes back as the same pressure and quality, in
 * region 4, to the rounding of the mixture's h and s.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { stateFromHS } from '../../src/water/if97/hs.js';
import { stateFromPX } from '../../src/water/if97/quality.js';
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
