/**
 * The region 3b starting equation p(h, s) (data/if97/fit-region3b-hs.json, basis "computed": a fit to
 * IF97 by scripts/fit-region3b-hs.ts) against IF97 itself: at fresh region 3b states computed from
 * (p, T) with the region 3 basic equation (IAPWS R7-97(2012) Eq. 28), its pressure is within the
 * maximum relative error the data file states; and (h, s) flashes from it return the state.
 */
import { describe, expect, it } from 'vitest';
import fit from '../../data/if97/fit-region3b-hs.json';
import { region3bSample } from '../../scripts/fit-region3b-hs.js';
import { stateFromHS, WaterState } from '../../src/water/if97/index.js';
import { region3bStartPressureHS } from '../../src/water/if97/start-region3b-hs.js';
import { expectClose } from '../helpers/tolerance.js';

const back = new WaterState();
// fresh states (a seed the fit did not use): (p, T) uniform over region 3, kept where s > s_c
const states = region3bSample(3000, 4242);

describe('region 3b starting equation p(h, s)', () => {
  it(`is within its stated maximum relative error (${fit.maxRelativeError}) of IF97 at 3000 region 3b states`, () => {
    let worst = 0;
    for (const { p, h, s } of states) worst = Math.max(worst, Math.abs(region3bStartPressureHS(h, s) / p - 1));
    expect(worst).toBeLessThanOrEqual(fit.maxRelativeError);
    expect(worst).toBeGreaterThan(0);
  });
  it('(h, s) flashes started from it return the region 3b state (p to 1e-9)', () => {
    for (const { p, h, s } of states.slice(0, 300)) {
      expect(stateFromHS(h, s, back)).toBe(0);
      expectClose(back.p, p, { rel: 1e-9 });
    }
  });
});
