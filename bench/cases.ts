/**
 * The benchmark cases. Each measures one hot function on the path a caller uses.
 * `perCall` divides a case that loops internally; `baseline` names a case measured in the same run.
 * `cases` holds the cases of this file and of every bench/cases/*.ts file that exports `cases`.
 */
import { readdirSync } from 'node:fs';
import { idealGas, incompressible, quantity } from '../src/index.js';
import { enthalpyChange } from '../src/incompressible/model.js';
import { lookupIncompressible } from '../src/incompressible/catalogue.js';
import { fromSI, resolveUnit, toSI } from '../src/units/registry.js';
import r1data from '../data/if97/region1.json';
import { saturationAtP, stateFromHS, stateFromPH, stateFromPS, stateFromPT, WaterState } from '../src/water/if97/index.js';
import { WaterProperties } from '../src/water/if97/properties.js';
import { region1 } from '../src/water/if97/region1.js';
import { water, waterBatch } from '../src/water/index.js';
import { idealGasBatch } from '../src/ideal-gas/index.js';
import { waterTables } from '../src/tables/water.js';
import { GridValue, TableValue } from '../src/tables/index.js';

import { BATCH_STATES, consume, type BenchCase } from './kit.js';

export { consume, sinkValue, type BenchCase } from './kit.js';

const psia = resolveUnit('psia');
const kPa = resolveUnit('kPa');
const liquidWater = incompressible('water');
const waterModel = lookupIncompressible('water').model;
const N = 1000;
const temps = Float64Array.from({ length: N }, (_, i) => 280 + (i % 80));
const gasTemps = Float64Array.from({ length: N }, (_, i) => 250 + ((i * 37) % 2500));
const idealGasAir = idealGas('air');
const air = idealGasAir.core;
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

// water: a spread of liquid (region 1) and vapour (region 2) states
const WN = 1000;
const wp = new Float64Array(WN);
const wT = new Float64Array(WN);
const wh = new Float64Array(WN);
const ws = new Float64Array(WN);
{
  const st = new WaterState();
  for (let i = 0; i < WN; i++) {
    const liquid = i % 2 === 0;
    wp[i] = liquid ? 1e5 + ((i * 7919) % 997) * 5e4 : 1e4 + ((i * 104729) % 991) * 5e3;
    wT[i] = liquid ? 280 + ((i * 31) % 70) : 480 + ((i * 17) % 500);
    stateFromPT(wp[i]!, wT[i]!, st);
    wh[i] = st.h;
    ws[i] = st.s;
  }
}
const wOut = new WaterState();
const wProps = new WaterProperties();
const satL = new WaterProperties();
const satV = new WaterProperties();

/** Naive baseline: region 1 with Math.pow per term, as often hand-written from the release's tables. */
function naiveRegion1(p: number, T: number, out: WaterProperties): void {
  const pi = p / 16.53e6;
  const tau = 1386 / T;
  let g = 0, gp = 0, gpp = 0, gt = 0, gtt = 0, gpt = 0;
  for (let i = 0; i < r1data.n.length; i++) {
    const n = r1data.n[i]!;
    const I = r1data.I[i]!;
    const J = r1data.J[i]!;
    const a = 7.1 - pi;
    const b = tau - 1.222;
    g += n * Math.pow(a, I) * Math.pow(b, J);
    gp += -n * I * Math.pow(a, I - 1) * Math.pow(b, J);
    gpp += n * I * (I - 1) * Math.pow(a, I - 2) * Math.pow(b, J);
    gt += n * Math.pow(a, I) * J * Math.pow(b, J - 1);
    gtt += n * Math.pow(a, I) * J * (J - 1) * Math.pow(b, J - 2);
    gpt += -n * I * Math.pow(a, I - 1) * J * Math.pow(b, J - 1);
  }
  const RT = 461.526 * T;
  out.v = (pi * gp * RT) / p;
  out.h = RT * tau * gt;
  out.u = RT * (tau * gt - pi * gp);
  out.s = 461.526 * (tau * gt - g);
  out.cp = -461.526 * tau * tau * gtt;
  const c = gp - tau * gpt;
  out.cv = 461.526 * (-tau * tau * gtt + (c * c) / gpp);
  out.w = Math.sqrt((RT * gp * gp) / ((c * c) / (tau * tau * gtt) - gpp));
}

const satTable = waterTables.saturationByT();
const superGrid = waterTables.superheated();
const tableKeys = Float64Array.from({ length: N }, (_, i) => 280 + ((i * 7919) % 3500) / 10);
const gridT = Float64Array.from({ length: N }, (_, i) => 700 + ((i * 7919) % 5000) / 10);
const gridP = Float64Array.from({ length: N }, (_, i) => 1e5 + ((i * 104729) % 9000) * 1e3);

const BATCH = BATCH_STATES;
const batchP = new Float64Array(BATCH);
const batchT = new Float64Array(BATCH);
for (let i = 0; i < BATCH; i++) {
  batchP[i] = 2e5 + (i % 1000) * 2.3e3;
  batchT[i] = 313.15 + ((i * 7919) % 14000) / 100;
}
const batchOut = { h: new Float64Array(BATCH), rho: new Float64Array(BATCH), status: new Uint8Array(BATCH) };
const gasT = Float64Array.from({ length: BATCH }, (_, i) => 250 + (i % 2500));
const gasOut = { cp: new Float64Array(BATCH), h: new Float64Array(BATCH), status: new Uint8Array(BATCH) };

const own: BenchCase[] = [
  {
    name: 'batch: waterBatch (p, T) → h, ρ, 10⁶ states (per state)',
    fn: () => {
      waterBatch({ p: batchP, T: batchT }, ['h', 'rho'], batchOut);
      consume(batchOut.h[7]!);
    },
    perCall: BATCH,
    targetNs: 200,
  },
  {
    name: 'batch: idealGasBatch air cp, h, 10⁶ states (per state)',
    fn: () => {
      idealGasBatch(idealGasAir, { T: gasT }, ['cp', 'h'], gasOut);
      consume(gasOut.h[7]!);
    },
    perCall: BATCH,
    targetNs: 30,
  },
  {
    name: 'tables: 1-D lookup, saturation by T, linear (core valueAt)',
    fn: () => {
      const out = new TableValue();
      for (let i = 0; i < N; i++) consume(satTable.valueAt('hg', tableKeys[i]!, out) + out.value);
    },
    perCall: N,
    targetNs: 60,
  },
  {
    name: 'tables: 1-D lookup, monotone cubic (core valueAt)',
    fn: () => {
      const out = new TableValue();
      for (let i = 0; i < N; i++) consume(satTable.valueAt('hg', tableKeys[i]!, out, 'monotone-cubic') + out.value);
    },
    perCall: N,
    targetNs: 60,
  },
  {
    name: 'tables: 2-D lookup, superheated grid, bilinear (core valueAt)',
    fn: () => {
      const out = new GridValue();
      for (let i = 0; i < N; i++) consume(superGrid.valueAt('h', gridT[i]!, gridP[i]!, out) + out.value);
    },
    perCall: N,
    targetNs: 150,
  },
  {
    name: 'water: naive Math.pow region 1, full set (baseline)',
    fn: () => {
      for (let i = 0; i < WN; i += 2) {
        naiveRegion1(wp[i]!, wT[i]!, wProps);
        consume(wProps.h);
      }
    },
    perCall: WN / 2,
  },
  {
    name: 'water: region 1 (p, T) full set, core',
    fn: () => {
      for (let i = 0; i < WN; i += 2) {
        region1(wp[i]!, wT[i]!, wProps);
        consume(wProps.h);
      }
    },
    perCall: WN / 2,
    targetNs: 250,
    baseline: 'water: naive Math.pow region 1, full set (baseline)',
    baselinePerCall: WN / 2,
  },
  {
    name: 'water: (p, T) full set with region selection, core (liquid and vapour)',
    fn: () => {
      for (let i = 0; i < WN; i++) {
        stateFromPT(wp[i]!, wT[i]!, wOut);
        consume(wOut.h);
      }
    },
    perCall: WN,
    targetNs: 250,
  },
  {
    name: 'water: (p, h) flash, core',
    fn: () => {
      for (let i = 0; i < WN; i++) {
        stateFromPH(wp[i]!, wh[i]!, wOut);
        consume(wOut.T);
      }
    },
    perCall: WN,
    targetNs: 2000,
  },
  {
    name: 'water: (p, s) flash, core',
    fn: () => {
      for (let i = 0; i < WN; i++) {
        stateFromPS(wp[i]!, ws[i]!, wOut);
        consume(wOut.T);
      }
    },
    perCall: WN,
    targetNs: 2000,
  },
  {
    name: 'water: (h, s) flash, core',
    fn: () => {
      for (let i = 0; i < 50; i++) {
        stateFromHS(wh[i]!, ws[i]!, wOut);
        consume(wOut.p);
      }
    },
    perCall: 50,
    targetNs: 5000,
  },
  {
    name: 'water: saturation at p, core',
    fn: () => {
      for (let i = 0; i < WN; i += 2) {
        saturationAtP(1e3 + wp[i]! * 0.15, satL, satV);
        consume(satV.h);
      }
    },
    perCall: WN / 2,
  },
  {
    name: 'water: water.state({ p, T }) facade with unit text',
    fn: () => consume(water.state({ p: '10 MPa', T: '500 °C' }).h.si),
  },
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
    fn: () => consume(liquidWater.deltaH({ T: '20 °C', p: '1 bar' }, { T: '30 °C', p: '5 bar' }).si),
  },
];

/** The cases of every bench/cases/*.ts file that exports `cases`, in file-name order. */
async function caseFiles(): Promise<BenchCase[]> {
  const dir = new URL('./cases/', import.meta.url);
  const files = readdirSync(dir).filter((f) => f.endsWith('.ts') && !f.endsWith('.d.ts')).sort();
  const found: BenchCase[] = [];
  for (const file of files) {
    const mod = (await import(new URL(file, dir).href)) as { cases?: unknown };
    if (Array.isArray(mod.cases)) found.push(...(mod.cases as BenchCase[]));
  }
  return found;
}

export const cases: BenchCase[] = [...own, ...(await caseFiles())];
