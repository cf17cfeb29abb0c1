/**
 * (p, h) and (p, s) flashes above the critical pressure next to the edges of IF97 region 3 (IAPWS
 * R7-97(2012) Section 4: region 3 lies between 623.15 K and the B23 line, Eq. 5): the fast path that
 * takes a region 3 answer strictly inside those edges, and the general path that places a target on
 * the edges, must each give back the state the target came from, in the region the forward equations
 * assign. (common practice: a flash reproduces the state its inputs were computed from)
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { b23Temperature } from '../../src/water/if97/b23.js';
import { SolverContext } from '../../src/water/if97/context.js';
import { stateFromPH } from '../../src/water/if97/ph.js';
import { stateFromPS } from '../../src/water/if97/ps.js';
import { stateFromPT } from '../../src/water/if97/pt.js';
import { WaterState } from '../../src/water/if97/water-state.js';

const ctx = new SolverContext();
const from = new WaterState();
const back = new WaterState();

/**
 * The state at (p, T), then the flashes from (p, h) and (p, s). Inside region 3 they must give back its
 * region and T; next to an edge, where IF97's neighbouring equations differ by up to about 50 J/kg in
 * h (Section 10: the regions' equations are not exactly continuous at their boundaries), the answer may
 * lie in either region: it must then reproduce the target through its own equation (to 1e-9, the
 * flash's bound) within 0.05 K of T.
 */
function roundTrip(p: number, T: number, edge: boolean): void {
  expect(stateFromPT(p, T, from, ctx)).toBe(Status.ok);
  const region = from.region;
  for (const [flash, key] of [
    [stateFromPH, 'h'],
    [stateFromPS, 's'],
  ] as const) {
    const target = from[key];
    expect(flash(p, target, back, ctx)).toBe(Status.ok);
    const where = `p = ${p} Pa, T = ${T} K, from ${key}`;
    if (!edge) {
      expect(back.region, where).toBe(region);
      expect(Math.abs(back.T - T), where).toBeLessThanOrEqual(1e-8 * T);
    } else {
      expect([1, 2, 3], where).toContain(back.region);
      expect(Math.abs(back[key] - target), where).toBeLessThanOrEqual(1e-9 * Math.abs(target));
      expect(Math.abs(back.T - T), where).toBeLessThanOrEqual(0.05);
    }
  }
}

describe('region 3 flashes above the critical pressure', () => {
  it.each([22.1e6, 25e6, 40e6, 70e6, 100e6])('p = %d Pa: states on either side of 623.15 K and of T_B23(p) reproduce their targets; 0.05 K inside, region 3 and T come back', (p) => {
    const TB = b23Temperature(p);
    for (const T of [623.15 - 1e-3, 623.15 - 1e-6, 623.15, 623.15 + 1e-6, 623.15 + 1e-3, TB - 1e-3, TB - 1e-6, TB, TB + 1e-6, TB + 1e-3]) roundTrip(p, T, true);
    for (const T of [623.2, 623.15 + 0.5 * (TB - 623.15), TB - 0.05]) roundTrip(p, T, false);
  });
  it('random states of region 3 at 22.1 to 100 MPa, 0.05 K inside its edges, come back from (p, h) and (p, s) (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 22.1e6, max: 100e6, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (p, f) => {
        const TB = b23Temperature(p);
        roundTrip(p, 623.2 + f * (TB - 0.05 - 623.2), false);
      }),
      { numRuns: 300 },
    );
  });
});
