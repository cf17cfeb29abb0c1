/**
 * Water (IAPWS-IF97) cases of issue 16: the batch against single calls over the same states, region 3
 * from (p, T), the region 3 flashes, and (h, s) in every region. Targets: batch per state at most the
 * single call; (p, T) in region 3 ≤ 1 µs; region 3 (p, h), (p, s) ≤ 3 µs; (h, s) ≤ 1.5 µs everywhere.
 * The comparison with the C build of region 1 is printed by bench/run.ts (bench/c/region1.c).
 */
import { BATCH_STATES, consume, type BenchCase } from '../kit.js';
import { region1BenchInputs } from '../../scripts/generate-c-reference.js';
import { b23Pressure, b23Temperature, saturationTemperature, stateFromHS, stateFromPH, stateFromPS, stateFromPT, stateFromPX, WaterState } from '../../src/water/if97/index.js';
import { SolverContext } from '../../src/water/if97/context.js';
import { waterBatch } from '../../src/water/index.js';

const BN = BATCH_STATES;
const r1 = region1BenchInputs(BN);
const cols = () => ({ v: new Float64Array(BN), h: new Float64Array(BN), u: new Float64Array(BN), s: new Float64Array(BN), cp: new Float64Array(BN), w: new Float64Array(BN), status: new Uint8Array(BN) });
const batchOut = cols();
const singleOut = cols();
const ctx = new SolverContext();
const st = new WaterState();

/** A spread of states of one kind, with h and s from (p, T). */
function states(n: number, p: (i: number) => number, T: (i: number) => number) {
  const P = Float64Array.from({ length: n }, (_, i) => p(i));
  const TT = Float64Array.from({ length: n }, (_, i) => T(i));
  const h = new Float64Array(n);
  const s = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    if (stateFromPT(P[i]!, TT[i]!, st) !== 0) throw new Error(`bench state ${i} is not valid`);
    h[i] = st.h;
    s[i] = st.s;
  }
  return { p: P, T: TT, h, s };
}
const N = 500;
const frac = (i: number, k: number) => ((i * k) % N) / N;
// region 3: 623.15 K … 650 K above 25 MPa (liquid-like and supercritical) and 650 K … 700 K above the B23 line
const region3 = states(N, (i) => 30e6 + frac(i, 7919) * 70e6, (i) => 630 + frac(i, 104729) * 60);
const region1 = states(N, (i) => 1e6 + frac(i, 7919) * 90e6, (i) => 280 + frac(i, 104729) * 160);
const region2 = states(N, (i) => 1e4 + frac(i, 7919) * 3e6, (i) => 520 + frac(i, 104729) * 500);
// 3b: vapour-like region 3 states above s_c = 4.412 kJ/(kg·K): 650 … 700 K, up to 12 MPa above the B23 line
const region3b = (() => {
  const p: number[] = [];
  const T: number[] = [];
  for (let i = 0; p.length < N; i++) {
    const t = 650 + ((i * 104729) % 997) / 997 * 50;
    const q = b23Pressure(t) + 0.2e6 + ((i * 7919) % 991) / 991 * 12e6;
    if (stateFromPT(q, t, st) === 0 && st.region === 3 && st.s > 4.412e3) {
      p.push(q);
      T.push(t);
    }
  }
  return states(N, (i) => p[i]!, (i) => T[i]!);
})();
// region 3 below the critical pressure: 16.6 … 22 MPa, liquid and vapour sides, 0.05 K clear of T_s(p)
const region3Subcritical = (() => {
  const p: number[] = [];
  const T: number[] = [];
  for (let i = 0; p.length < N; i++) {
    const q = 16.6e6 + ((i * 7919) % 991) / 991 * 5.4e6;
    const t = 623.2 + ((i * 104729) % 997) / 997 * (b23Temperature(q) - 623.3);
    if (stateFromPT(q, t, st) === 0 && st.region === 3 && Math.abs(t - saturationTemperature(q)) > 0.05) {
      p.push(q);
      T.push(t);
    }
  }
  return states(N, (i) => p[i]!, (i) => T[i]!);
})();
// two-phase (h, s): mixtures at 0.01 … 10 MPa
const twoPhaseH = new Float64Array(N);
const twoPhaseS = new Float64Array(N);
{
  const l = new WaterState();
  const v = new WaterState();
  for (let i = 0; i < N; i++) {
    const p = 1e4 + frac(i, 7919) * 10e6;
    const x = 0.1 + 0.8 * frac(i, 104729); // quality 0.1 … 0.9 from the saturated values
    stateFromPX(p, 0, l);
    stateFromPX(p, 1, v);
    twoPhaseH[i] = l.h + x * (v.h - l.h);
    twoPhaseS[i] = l.s + x * (v.s - l.s);
  }
}

const loop = (n: number, f: (i: number) => void) => () => {
  for (let i = 0; i < n; i++) f(i);
};

export const cases: BenchCase[] = [
  {
    name: 'water: region 1 (p, T) → v, h, u, s, cp, w, single calls into arrays, 10⁶ states (per state)',
    fn: () => {
      for (let i = 0; i < BN; i++) {
        singleOut.status[i] = stateFromPT(r1.p[i]!, r1.T[i]!, st, ctx);
        singleOut.v[i] = st.v;
        singleOut.h[i] = st.h;
        singleOut.u[i] = st.u;
        singleOut.s[i] = st.s;
        singleOut.cp[i] = st.cp;
        singleOut.w[i] = st.w;
      }
      consume(singleOut.h[7]!);
    },
    perCall: BN,
  },
  {
    name: 'batch: waterBatch region 1 (p, T) → v, h, u, s, cp, w, 10⁶ states (per state)',
    fn: () => {
      waterBatch({ p: r1.p, T: r1.T }, ['v', 'h', 'u', 's', 'cp', 'w'], batchOut);
      consume(batchOut.h[7]!);
    },
    perCall: BN,
    baseline: 'water: region 1 (p, T) → v, h, u, s, cp, w, single calls into arrays, 10⁶ states (per state)',
    baselinePerCall: BN,
  },
  { name: 'water: (p, T) in region 3, core', fn: loop(N, (i) => consume(stateFromPT(region3.p[i]!, region3.T[i]!, st, ctx) + st.h)), perCall: N, targetNs: 1000 },
  { name: 'water: (p, h) in region 3, core', fn: loop(N, (i) => consume(stateFromPH(region3.p[i]!, region3.h[i]!, st, ctx) + st.T)), perCall: N, targetNs: 3000 },
  { name: 'water: (p, h) in region 3 below p_c (16.6 to 22 MPa), core', fn: loop(N, (i) => consume(stateFromPH(region3Subcritical.p[i]!, region3Subcritical.h[i]!, st, ctx) + st.T)), perCall: N, targetNs: 3000 },
  { name: 'water: (p, s) in region 3, core', fn: loop(N, (i) => consume(stateFromPS(region3.p[i]!, region3.s[i]!, st, ctx) + st.T)), perCall: N, targetNs: 3000 },
  { name: 'water: (h, s) in region 1, core', fn: loop(N, (i) => consume(stateFromHS(region1.h[i]!, region1.s[i]!, st, ctx) + st.p)), perCall: N, targetNs: 1500 },
  { name: 'water: (h, s) in region 2, core', fn: loop(N, (i) => consume(stateFromHS(region2.h[i]!, region2.s[i]!, st, ctx) + st.p)), perCall: N, targetNs: 1500 },
  { name: 'water: (h, s) in region 3 (3a and 3b), core', fn: loop(N, (i) => consume(stateFromHS(region3.h[i]!, region3.s[i]!, st, ctx) + st.p)), perCall: N, targetNs: 1500 },
  { name: 'water: (h, s) in region 3b, core', fn: loop(N, (i) => consume(stateFromHS(region3b.h[i]!, region3b.s[i]!, st, ctx) + st.p)), perCall: N, targetNs: 1500 },
  { name: 'water: (h, s) two-phase, core', fn: loop(N, (i) => consume(stateFromHS(twoPhaseH[i]!, twoPhaseS[i]!, st, ctx) + st.p)), perCall: N, targetNs: 1500 },
];
