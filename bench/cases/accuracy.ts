/**
 * The cost of accuracy (issue 16): each IF97 basic equation's full property set from the fast kernel
 * (the default) and from the compensated double-double kernel (src/water/if97/compensated.ts, within
 * 0.5 ulp of a 60-digit evaluation where the fast one misses by up to 10⁵ ulp in region 3), over the
 * same states; the fast kernel is the baseline, so the printed ratio is the price of the last digits.
 * Then the facade: `water.state(pair)` against `water.state(pair, { accuracy: 'compensated' })` (the
 * same solve, the compensated kernel once at the end) for (p, T) and (p, h) over the same states, and
 * `waterBatch` likewise; the default is the baseline, so the ratio is what the option costs a caller.
 */
import { consume, type BenchCase } from '../kit.js';
import { b23Pressure, b23Temperature, saturationPressure } from '../../src/water/if97/index.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { region1 } from '../../src/water/if97/region1.js';
import { region2 } from '../../src/water/if97/region2.js';
import { region3 } from '../../src/water/if97/region3.js';
import { region5 } from '../../src/water/if97/region5.js';
import { region1Compensated, region2Compensated, region3Compensated, region5Compensated } from '../../src/water/if97/compensated.js';
import { stateFromPT, WaterState } from '../../src/water/if97/index.js';
import { Quantity } from '../../src/units/quantity.js';
import { water } from '../../src/water/state.js';
import { waterBatch } from '../../src/water/batch.js';

const N = 500;
const frac = (i: number, k: number) => ((i * k) % N) / N;
const out = new WaterProperties();

/** N states (x, y) of a region: (p, T), or (ρ, T) for region 3, spread as scripts/ulp-report.ts draws them. */
function states(x: (i: number) => number, y: (i: number) => number) {
  const X = new Float64Array(N);
  const Y = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    Y[i] = y(i);
    X[i] = x(i);
  }
  return { X, Y };
}
const T1 = (i: number) => 273.15 + frac(i, 104729) * 350;
const s1 = states((i) => saturationPressure(T1(i)) + frac(i, 7919) * (100e6 - saturationPressure(T1(i))), T1);
const T2 = (i: number) => 273.15 + frac(i, 104729) * 800;
const s2 = states((i) => Math.exp(Math.log(611) + frac(i, 7919) * (Math.log(T2(i) <= 623.15 ? saturationPressure(T2(i)) : T2(i) <= 863.15 ? b23Pressure(T2(i)) : 100e6) - Math.log(611))), T2);
const s3 = states((i) => 100 + frac(i, 7919) * 660, (i) => 623.15 + frac(i, 104729) * (b23Temperature(100e6) - 623.15));
const s5 = states((i) => Math.exp(Math.log(1e3) + frac(i, 7919) * (Math.log(50e6) - Math.log(1e3))), (i) => 1073.15 + frac(i, 104729) * 1200);

type Kernel = (x: number, y: number, o: WaterProperties) => WaterProperties;
const run = (f: Kernel, s: { X: Float64Array; Y: Float64Array }) => () => {
  let acc = 0;
  for (let i = 0; i < N; i++) {
    f(s.X[i]!, s.Y[i]!, out);
    acc += out.v + out.h + out.u + out.s + out.cp + out.cv + out.w + out.p;
  }
  consume(acc);
};

const pair = (region: string, fast: Kernel, compensated: Kernel, s: { X: Float64Array; Y: Float64Array }): BenchCase[] => {
  const base = `accuracy: region ${region} full set, fast kernel`;
  return [
    { name: base, fn: run(fast, s), perCall: N },
    { name: `accuracy: region ${region} full set, compensated kernel (≤ 0.5 ulp)`, fn: run(compensated, s), perCall: N, baseline: base, baselinePerCall: N },
  ];
};

export const cases: BenchCase[] = [
  ...pair('1 (p, T)', region1, region1Compensated, s1),
  ...pair('3 (ρ, T)', region3, region3Compensated, s3),
  ...pair('2 (p, T)', region2, region2Compensated, s2),
  ...pair('5 (p, T)', region5, region5Compensated, s5),
];

// the facade: 100 (p, T) states of each of regions 1, 2, 3 (from the (ρ, T) sample: p₃(ρ, T) where in
// region 3 by (p, T)) and 5, as Quantities (unit parsing is not what is measured), with their h
const facade = (() => {
  const p: number[] = [];
  const T: number[] = [];
  const st = new WaterState();
  const take = (s: { X: Float64Array; Y: Float64Array }, isRho: boolean) => {
    for (let i = 0, k = 0; i < N && k < 100; i++) {
      const q = isRho ? (region3(s.X[i]!, s.Y[i]!, out), out.p) : s.X[i]!;
      if (stateFromPT(q, s.Y[i]!, st) !== 0 || (isRho && st.region !== 3)) continue;
      p.push(q);
      T.push(s.Y[i]!);
      k++;
    }
  };
  take(s1, false);
  take(s2, false);
  take(s3, true);
  take(s5, false);
  const h = p.map((q, i) => (stateFromPT(q, T[i]!, st), st.h));
  return {
    n: p.length,
    pt: p.map((q, i) => ({ p: Quantity.fromSI(q, 'pressure'), T: Quantity.fromSI(T[i]!, 'temperature') })),
    ph: p.map((q, i) => ({ p: Quantity.fromSI(q, 'pressure'), h: Quantity.fromSI(h[i]!, 'specificEnergy') })),
    P: Float64Array.from(p),
    T: Float64Array.from(T),
  };
})();
const COMPENSATED = { accuracy: 'compensated' } as const;
type Pair = Parameters<typeof water.state>[0];
const facadeStates = (pairs: readonly Pair[], options?: typeof COMPENSATED) => () => {
  let acc = 0;
  for (const pair of pairs) {
    const r = water.state(pair, options);
    acc += r.h.si + r.s.si;
  }
  consume(acc);
};
const batchOut = { h: new Float64Array(facade.n), s: new Float64Array(facade.n), w: new Float64Array(facade.n), status: new Uint8Array(facade.n) };
const batch = (options?: typeof COMPENSATED) => () => {
  waterBatch({ p: facade.P, T: facade.T }, ['h', 's', 'w'], batchOut, options);
  consume(batchOut.h[0]! + batchOut.w[facade.n - 1]!);
};
const facadeBase = (what: string) => `accuracy: ${what}, default (fast), regions 1, 2, 3, 5`;

cases.push(
  { name: facadeBase('water.state (p, T)'), fn: facadeStates(facade.pt), perCall: facade.n },
  { name: "accuracy: water.state (p, T), { accuracy: 'compensated' }", fn: facadeStates(facade.pt, COMPENSATED), perCall: facade.n, baseline: facadeBase('water.state (p, T)'), baselinePerCall: facade.n },
  { name: facadeBase('water.state (p, h)'), fn: facadeStates(facade.ph), perCall: facade.n },
  { name: "accuracy: water.state (p, h), { accuracy: 'compensated' }", fn: facadeStates(facade.ph, COMPENSATED), perCall: facade.n, baseline: facadeBase('water.state (p, h)'), baselinePerCall: facade.n },
  { name: facadeBase('waterBatch (p, T) → h, s, w'), fn: batch(), perCall: facade.n },
  { name: "accuracy: waterBatch (p, T) → h, s, w, { accuracy: 'compensated' }", fn: batch(COMPENSATED), perCall: facade.n, baseline: facadeBase('waterBatch (p, T) → h, s, w'), baselinePerCall: facade.n },
);
