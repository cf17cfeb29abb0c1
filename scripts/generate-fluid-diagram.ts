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

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const FLUID_DIAGRAMS_DIR = resolve(root, 'docs/diagrams');

type Point = [number, number];
interface Series {
  readonly points: Point[][];
  readonly label: string;
  readonly color: string;
  readonly width?: number;
  readonly dash?: string;
  /** Where to put the label: the index of the run and the point. */
  readonly labelAt?: [number, number];
}
interface Axis {
  readonly label: string;
  readonly min: number;
  readonly max: number;
  readonly log?: boolean;
  readonly ticks: number[];
  readonly format?: (v: number) => string;
}

const W = 720;
const H = 480;
const M = { left: 70, right: 20, top: 40, bottom: 56 };
const n = (x: number) => (Math.round(x * 100) / 100).toString();
const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;');

function chart(title: string, x: Axis, y: Axis, series: Series[], note: string): string {
  const sx = (v: number) => M.left + ((x.log ? Math.log10(v) - Math.log10(x.min) : v - x.min) / (x.log ? Math.log10(x.max) - Math.log10(x.min) : x.max - x.min)) * (W - M.left - M.right);
  const sy = (v: number) => H - M.bottom - ((y.log ? Math.log10(v) - Math.log10(y.min) : v - y.min) / (y.log ? Math.log10(y.max) - Math.log10(y.min) : y.max - y.min)) * (H - M.top - M.bottom);
  const inside = ([a, b]: Point) => a >= x.min && a <= x.max && b >= y.min && b <= y.max;
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" font-family="system-ui, sans-serif" font-size="12">`);
  out.push(`<rect width="${W}" height="${H}" fill="#ffffff"/>`);
  out.push(`<text x="${W / 2}" y="22" text-anchor="middle" font-size="15" font-weight="600">${esc(title)}</text>`);
  for (const t of x.ticks) {
    const px = n(sx(t));
    out.push(`<line x1="${px}" y1="${M.top}" x2="${px}" y2="${H - M.bottom}" stroke="#e5e9ec"/>`);
    out.push(`<text x="${px}" y="${H - M.bottom + 16}" text-anchor="middle">${esc((x.format ?? String)(t))}</text>`);
  }
  for (const t of y.ticks) {
    const py = n(sy(t));
    out.push(`<line x1="${M.left}" y1="${py}" x2="${W - M.right}" y2="${py}" stroke="#e5e9ec"/>`);
    out.push(`<text x="${M.left - 6}" y="${py}" text-anchor="end" dominant-baseline="middle">${esc((y.format ?? String)(t))}</text>`);
  }
  out.push(`<rect x="${M.left}" y="${M.top}" width="${W - M.left - M.right}" height="${H - M.top - M.bottom}" fill="none" stroke="#5b6b76"/>`);
  out.push(`<text x="${(M.left + W - M.right) / 2}" y="${H - 14}" text-anchor="middle">${esc(x.label)}</text>`);
  out.push(`<text transform="translate(16 ${(M.top + H - M.bottom) / 2}) rotate(-90)" text-anchor="middle">${esc(y.label)}</text>`);
  for (const s of series) {
    for (const run of s.points) {
      const pts = run.filter(inside).map(([a, b]) => `${n(sx(a))},${n(sy(b))}`);
      if (pts.length < 2) continue;
      out.push(`<polyline fill="none" stroke="${s.color}" stroke-width="${s.width ?? 1.4}"${s.dash ? ` stroke-dasharray="${s.dash}"` : ''} points="${pts.join(' ')}"/>`);
    }
    const [ri, pi] = s.labelAt ?? [0, Math.floor((s.points[0]?.length ?? 1) / 2)];
    const at = s.points[ri]?.[pi];
    if (at && inside(at)) out.push(`<text x="${n(sx(at[0]) + 4)}" y="${n(sy(at[1]) - 4)}" fill="${s.color}">${esc(s.label)}</text>`);
  }
  out.push(`<text x="${W - M.right}" y="${M.top - 8}" text-anchor="end" fill="#5b6b76" font-size="10">${esc(note)}</text>`);
  out.push('</svg>');
  return `${out.join('\n')}\n`;
}


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
