/**
 * The benchmark cases. Each measures one hot function on the path a caller uses.
 * `perCall` divides a case that loops internally; `baseline` names a case measured in the same run.
 */
import { incompressible, quantity } from '../src/index.js';
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

export const cases: BenchCase[] = [
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
