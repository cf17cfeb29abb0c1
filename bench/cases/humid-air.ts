/**
 * Humid-air benchmark cases: the SI core on the paths a caller uses, and the batch.
 * Targets: (T, RH, p) without wet-bulb ≤ 200 ns, with wet-bulb ≤ 1 µs, (T, Twb) ≤ 1 µs,
 * batch (T, RH, p) → Tdp, W, h at ≥ 3 M states/s (≤ 333 ns per state).
 */
import { BATCH_STATES, consume, type BenchCase } from '../kit.js';
import { HumidAirState, humidAirState, PAIR } from '../../src/humid-air/core/state.js';
import { humidAir, humidAirBatch } from '../../src/humid-air/index.js';

const N = 1000;
const T = new Float64Array(N);
const RH = new Float64Array(N);
const Twb = new Float64Array(N);
const p = new Float64Array(N).fill(101325);
{
  const s = new HumidAirState();
  for (let i = 0; i < N; i++) {
    // a spread of building and weather states, −20 °C … 45 °C, 10 % … 100 %
    T[i] = 253.15 + ((i * 37) % 650) / 10;
    RH[i] = 0.1 + ((i * 53) % 91) / 100;
    humidAirState(PAIR.T_RH, T[i]!, RH[i]!, 101325, true, s);
    Twb[i] = s.Twb;
  }
}
const out = new HumidAirState();
const BN = Math.min(100_000, BATCH_STATES);
const bT = Float64Array.from({ length: BN }, (_, i) => T[i % N]!);
const bRH = Float64Array.from({ length: BN }, (_, i) => RH[i % N]!);
const bp = new Float64Array(BN).fill(101325);
const bOut = { Tdp: new Float64Array(BN), W: new Float64Array(BN), h: new Float64Array(BN), status: new Uint8Array(BN) };

export const cases: BenchCase[] = [
  {
    name: 'humid air: (T, RH, p) without wet-bulb, core',
    targetNs: 200,
    perCall: N,
    fn: () => {
      for (let i = 0; i < N; i++) {
        humidAirState(PAIR.T_RH, T[i]!, RH[i]!, 101325, false, out);
        consume(out.h);
      }
    },
  },
  {
    name: 'humid air: (T, RH, p) with wet-bulb, core',
    targetNs: 1000,
    perCall: N,
    fn: () => {
      for (let i = 0; i < N; i++) {
        humidAirState(PAIR.T_RH, T[i]!, RH[i]!, 101325, true, out);
        consume(out.Twb);
      }
    },
  },
  {
    name: 'humid air: (T, Twb, p), core',
    targetNs: 1000,
    perCall: N,
    fn: () => {
      for (let i = 0; i < N; i++) {
        humidAirState(PAIR.T_Twb, T[i]!, Twb[i]!, 101325, true, out);
        consume(out.W);
      }
    },
  },
  {
    name: 'humid air: humidAirBatch (T, RH, p) → Tdp, W, h, 10⁵ states (per state)',
    targetNs: 333,
    perCall: BN,
    fn: () => {
      humidAirBatch({ T: bT, RH: bRH, p: bp }, ['Tdp', 'W', 'h'], bOut);
      consume(bOut.W[7]!);
    },
  },
  {
    name: 'humid air: humidAir.state({ T, RH }) facade with unit text',
    fn: () => consume(humidAir.state({ T: '30 °C', RH: 0.5 }).W.si),
  },
];
