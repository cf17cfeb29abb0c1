/**
 * Renders the p–h diagram of a real fluid from its reference equation of state (src/fluids) into
 * docs/diagrams/<file>.svg: the saturation dome, isotherms and isentropes, in the house style of
 * scripts/generate-diagrams.ts. Generated, never drawn by hand. No refrigerant ships yet (see
 * docs/guide/real-fluids.md), so the diagram is of water by IAPWS-95 (docs/diagrams/water-ph.svg is
 * the IF97 one).
 *
 * Run: `npx tsx scripts/generate-fluid-diagram.ts`. tests/fluids/diagram.test.ts fails if the
 * committed diagram drifts.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';
import { fluidModel } from '../src/fluids/catalogue.js';
import { stateFromPS, stateFromPT } from '../src/fluids/flash.js';
import { FluidContext, FluidState } from '../src/fluids/model.js';
import { saturationAtT } from '../src/fluids/saturation.js';
import { Status } from '../src/core/status.js';

import { chart, type Axis, type Point, type Series } from './svg-chart.js';
const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const FLUID_DIAGRAMS_DIR = resolve(root, 'docs/diagrams');



/** Pressures from 1 kPa to 100 MPa, evenly in log p. */
const PRESSURES = Array.from({ length: 121 }, (_, i) => 1e3 * 10 ** (i / 24));

/** The p–h diagram of water by IAPWS-95: dome, isotherms (°C) and isentropes (kJ/(kg·K)). */
function waterPH(): string {
  const m = fluidModel('water')!;
  const ctx = new FluidContext(m);
  const a = new FluidState();
  const l = new FluidState();
  const v = new FluidState();
  const MPa = (p: number) => p / 1e6;
  const kJ = (h: number) => h / 1e3;
  // the dome: saturated liquid up to the critical point and back down the vapour side
  const left: [number, number][] = [];
  const right: [number, number][] = [];
  for (let i = 0; i <= 80; i++) {
    const T = m.Tt + (m.Tc - m.Tt) * (1 - (1 - i / 80) ** 2);
    const st = saturationAtT(ctx, Math.min(T, m.Tc), l, v);
    if (st !== Status.ok && st !== Status.undefinedProperty) continue;
    left.push([kJ(l.h), MPa(l.p)]);
    right.push([kJ(v.h), MPa(v.p)]);
  }
  const dome = [...left, ...right.reverse()];
  const series: Series[] = [{ points: [dome], label: 'saturation', color: '#1f2a30', width: 2, labelAt: [0, 20] as [number, number] }];
  for (const TC of [25, 100, 200, 300, 374, 500, 700, 900]) {
    const T = TC + 273.15;
    const run: [number, number][] = [];
    let ps = 0;
    if (T < m.Tc && saturationAtT(ctx, T, l, v) === Status.ok) ps = l.p;
    for (const p of [...PRESSURES].reverse()) {
      if (ps > 0 && p < ps && run.length > 0 && run[run.length - 1]![1] > MPa(ps)) {
        run.push([kJ(l.h), MPa(ps)], [kJ(v.h), MPa(ps)]);
      }
      if (stateFromPT(ctx, p, T, a) === Status.ok) run.push([kJ(a.h), MPa(p)]);
    }
    series.push({ points: [run], label: `${TC} °C`, color: '#c0392b', width: 1.2, labelAt: [0, 8] });
  }
  for (const s of [2, 3, 4, 5, 6, 7, 8, 9]) {
    const run: [number, number][] = [];
    for (const p of PRESSURES) if (stateFromPS(ctx, p, s * 1e3, a) === Status.ok) run.push([kJ(a.h), MPa(p)]);
    series.push({ points: [run], label: `s = ${s}`, color: '#2471a3', width: 1, dash: '5 3', labelAt: [0, Math.min(run.length - 1, 30)] });
  }
  return chart(
    'Water (IAPWS-95): p–h diagram',
    { label: 'specific enthalpy h (kJ/kg)', min: 0, max: 4500, ticks: [0, 500, 1000, 1500, 2000, 2500, 3000, 3500, 4000, 4500] },
    { label: 'pressure p (MPa)', min: 0.001, max: 100, log: true, ticks: [0.001, 0.01, 0.1, 1, 10, 100] },
    series,
    'heatstate, IAPWS-95 (IAPWS R6-95(2018)); isotherms red, isentropes blue dashed (kJ/(kg·K))',
  );
}

/** Every fluid diagram, by file name. */
export function renderFluidDiagrams(): Record<string, string> {
  return { 'water-iapws95-ph.svg': waterPH() };
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  for (const [file, svg] of Object.entries(renderFluidDiagrams())) {
    writeFileSync(resolve(FLUID_DIAGRAMS_DIR, file), svg);
    console.log(`wrote docs/diagrams/${file}`);
  }
}
