/**
 * The benchmark cases. Each measures one hot function on the path a caller uses.
 * `perCall` divides a case that loops internally; `baseline` names a case measured in the same run.
 */
import { idealGas, incompressible, quantity } from '../src/index.js';
import { enthalpyChange } from '../src/incompressible/model.js';
import { lookupIncompressible } from '../src/incompressible/catalogue.js';
import { fromSI, resolveUnit, toSI } from '../src/units/registry.js';

export interface BenchCase {
  name: string;
  fn: () => void;
  perCall?: number;
  targetNs?: number;
  baseline?: string;
  baselinePerCall?: number;
}

let sink = 0;
/** Keeps results alive so the optimiser cannot drop the work. */
export function consume(x: number): void {
  sink += x;
}
export function sinkValue(): number {
  return sink;
}

const psia = resolveUnit('psia');
const kPa = resolveUnit('kPa');
const water = incompressible('water');
const waterModel = lookupIncompressible('water').model;
const N = 1000;
const temps = Float64Array.from({ length: N }, (_, i) => 280 + (i % 80));
const gasTemps = Float64Array.from({ length: N }, (_, i) => 250 + ((i * 37) % 2500));
const air = idealGas('air').core;
const idealGasN2 = idealGas('N2');
const n2 = idealGasN2.core;

/** Naive baseline: the same NASA polynomial evaluated term by term with Math.pow, as often hand-written. */
const naive = (n2 as unknown as { coefficients: Float64Array }).coefficients;
function naiveCpR(T: number): number {
  const o = T < 1000 ? 0 : 9;
  let acc = 0;
  for (let i = 0; i < 7; i++) acc += naive[o + i]! * Math.pow(T, i - 2);
  return acc;
}

export const cases: BenchCase[] = [
  {
    name: 'ideal gas: naive Math.pow cp(T) of N2 (baseline)',
    fn: () => {
      for (let i = 0; i < N; i++) consume(naiveCpR(gasTemps[i]!));
    },
    perCall: N,
  },
  {
    name: 'ideal gas: N2 cp(T) core (9-constant form)',
    fn: () => {
      for (let i = 0; i < N; i++) consume(n2.R * n2.cpR(gasTemps[i]!));
    },
    perCall: N,
    targetNs: 30,
    baseline: 'ideal gas: naive Math.pow cp(T) of N2 (baseline)',
    baselinePerCall: N,
  },
  {
    name: 'ideal gas: N2 h(T) core',
    fn: () => {
      for (let i = 0; i < N; i++) consume(n2.R * gasTemps[i]! * n2.hRT(gasTemps[i]!));
    },
    perCall: N,
    targetNs: 30,
  },
  {
    name: 'ideal gas: N2 s(T, p) core',
    fn: () => {
      for (let i = 0; i < N; i++) consume(n2.R * (n2.sR(gasTemps[i]!) - Math.log(2e5 / 1e5)));
    },
    perCall: N,
    targetNs: 30,
  },
  {
    name: 'ideal gas: air (7-coefficient form) cp(T) core',
    fn: () => {
      for (let i = 0; i < N; i++) consume(air.R * air.cpR(gasTemps[i]!));
    },
    perCall: N,
    targetNs: 30,
  },
  {
    name: 'ideal gas: idealGas("N2").h("500 K") facade',
    fn: () => consume(idealGasN2.h('500 K').si),
  },
  {
    name: 'units: psia -> Pa -> kPa (resolved units, core path)',
    fn: () => {
      for (let i = 0; i < N; i++) consume(fromSI(toSI(temps[i]!, psia, 101325), kPa, 101325));
    },
    perCall: N,
  },
  {
    name: 'units: quantity("500 psia").in("kPa") (facade, cached parse)',
    fn: () => consume(quantity('500 psia').in('kPa')),
  },
  {
    name: 'incompressible: water Δh core (tabulated c, 1000 states)',
    fn: () => {
      for (let i = 0; i < N; i++) consume(enthalpyChange(waterModel, temps[i]!, 1e5, temps[i]! + 10, 5e5));
    },
    perCall: N,
  },
  {
    name: 'incompressible: water.deltaH facade with unit text',
    fn: () => consume(water.deltaH({ T: '20 °C', p: '1 bar' }, { T: '30 °C', p: '5 bar' }).si),
  },
];
