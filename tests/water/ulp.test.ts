/**
 * The float IF97 kernels against the same equations evaluated with decimal.js at 60 digits
 * (scripts/ulp-report.ts; the stored sample tests/water/data/if97-high-precision.json, 40 random states
 * per region, basis "computed"). The goal is 16 ulp for every property. Regions 2 and 5, and v of
 * region 3, meet it at every stored state; region 1 (u and s near their zero at the triple point) and
 * region 3 (p, h, u, s, cp, cv, w: cancellation in the Helmholtz sums and, near the critical point, in
 * the cp and w relations) do not yet: for those the ceilings below are the errors measured on this
 * sample when it was stored, so that no change makes them worse unnoticed. Full distributions over
 * 1000 states per region: `npx tsx scripts/ulp-report.ts`. The compensated kernels of the same equations
 * (src/water/if97/compensated.ts) meet 16 ulp everywhere, with no ceilings: tests/water/ulp-compensated.test.ts.
 */
import Decimal from 'decimal.js';
import { describe, expect, it } from 'vitest';
import sample from './data/if97-high-precision.json';
import { REGIONS, ulps, type Property } from '../../scripts/ulp-report.js';
import { WaterProperties } from '../../src/water/if97/properties.js';

const D = Decimal.clone({ precision: 60 });
const GOAL = 16;
/** Measured ceilings (ulp) where the goal is not met yet (region property). */
const NOT_YET: Record<string, number> = { '1 u': 31, '1 s': 25, '3 p': 834, '3 h': 200, '3 u': 162, '3 s': 113, '3 cp': 5532, '3 cv': 3473, '3 w': 1326 };
const out = new WaterProperties();

describe('IF97 kernels within 16 ulp of a 60-digit evaluation (stored sample)', () => {
  it.each(REGIONS.map((r) => [r.id, r] as const))('region %d', (id, region) => {
    const states = sample.states.filter((s) => s.region === id);
    expect(states.length).toBe(40);
    for (const st of states) {
      region.float(st.x, st.y, out);
      for (const [prop, value] of Object.entries(st.values)) {
        const error = ulps(out[prop as Property], new D(value));
        const ceiling = NOT_YET[`${id} ${prop}`] ?? GOAL;
        expect(error, `region ${id} ${prop} at (${st.x}, ${st.y})`).toBeLessThanOrEqual(ceiling);
      }
    }
  });
});
