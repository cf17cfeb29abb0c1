/**
 * Benchmark cases of the Helmholtz-energy engine on IAPWS-95 water (SI core, caller-owned outputs).
 * Targets: full property set at (T, ρ) ≤ 1 µs (≤ 0.5 µs for a 20–30-term equation; nitrogen has 36), (p, T) ≤ 3 µs,
 * saturation by T ≤ 5 µs, (p, h) ≤ 10 µs.
 */
import { consume, type BenchCase } from '../kit.js';
import { fluidModel, waterModel } from '../../src/fluids/catalogue.js';
import { stateFromPH, stateFromPT } from '../../src/fluids/flash.js';
import { FluidContext, FluidState, propertiesAt } from '../../src/fluids/model.js';
import { saturationAtP, saturationAtT } from '../../src/fluids/saturation.js';

const ctx = new FluidContext(waterModel());
const nitrogen = new FluidContext(fluidModel('nitrogen')!);
const out = new FluidState();
const liquid = new FluidState();
const vapor = new FluidState();
const N = 1000;
const T = new Float64Array(N);
const rho = new Float64Array(N);
const p = new Float64Array(N);
const h = new Float64Array(N);
const Tsat = new Float64Array(N);
for (let i = 0; i < N; i++) {
  const liquidState = i % 2 === 0;
  p[i] = liquidState ? 1e5 + ((i * 7919) % 997) * 5e4 : 1e4 + ((i * 104729) % 991) * 5e3;
  T[i] = liquidState ? 280 + ((i * 31) % 70) : 480 + ((i * 17) % 500);
  stateFromPT(ctx, p[i]!, T[i]!, out);
  rho[i] = out.rho;
  h[i] = out.h;
  Tsat[i] = 275 + ((i * 37) % 370);
}
const psat = new Float64Array(N);
const Tn = new Float64Array(N);
const rhoN = new Float64Array(N);
for (let i = 0; i < N; i++) {
  psat[i] = 1e3 + ((i * 7919) % 997) * 2e4;
  Tn[i] = 70 + ((i * 13) % 400);
  rhoN[i] = 1 + ((i * 29) % 800);
}

export const cases: BenchCase[] = [
  {
    name: 'IAPWS-95 properties at (T, rho), per call',
    perCall: N,
    targetNs: 1000,
    fn: () => {
      for (let i = 0; i < N; i++) {
        propertiesAt(ctx, T[i]!, rho[i]!, out);
        consume(out.w);
      }
    },
  },
  {
    name: 'IAPWS-95 state from (p, T), per call',
    perCall: N,
    targetNs: 3000,
    fn: () => {
      for (let i = 0; i < N; i++) {
        stateFromPT(ctx, p[i]!, T[i]!, out);
        consume(out.h);
      }
    },
  },
  {
    name: 'IAPWS-95 saturation by T, per call',
    perCall: N,
    targetNs: 5000,
    fn: () => {
      for (let i = 0; i < N; i++) {
        saturationAtT(ctx, Tsat[i]!, liquid, vapor);
        consume(liquid.p);
      }
    },
  },
  {
    name: 'IAPWS-95 state from (p, h), per call',
    perCall: N,
    targetNs: 10000,
    fn: () => {
      for (let i = 0; i < N; i++) {
        stateFromPH(ctx, p[i]!, h[i]!, out);
        consume(out.T);
      }
    },
  },
  {
    name: 'IAPWS-95 saturation by p, per call',
    perCall: N,
    fn: () => {
      for (let i = 0; i < N; i++) {
        saturationAtP(ctx, psat[i]!, liquid, vapor);
        consume(liquid.T);
      }
    },
  },
  {
    name: 'nitrogen (Span et al. 2000, 36 terms) properties at (T, rho), per call',
    perCall: N,
    targetNs: 500,
    fn: () => {
      for (let i = 0; i < N; i++) {
        propertiesAt(nitrogen, Tn[i]!, rhoN[i]!, out);
        consume(out.w);
      }
    },
  },
];
