/**
 * Renders diagrams from the library itself into docs/diagrams/ as SVG: a T–s and a p–h diagram of
 * water (IAPWS-IF97) with the saturation dome, isobars and isotherms, and a cp(T) chart of a few
 * ideal gases. Generated, never drawn by hand.
 *
 * Run: `npm run diagrams`. tests/docs/diagrams.test.ts fails if a committed diagram drifts.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';
import { idealGas } from '../src/ideal-gas/index.js';
import { P_CRITICAL, saturationAtT, Status as STATUS, stateFromPT, T_CRITICAL, WaterState } from '../src/water/if97/index.js';
import { WaterProperties } from '../src/water/if97/properties.js';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const DIAGRAMS_DIR = resolve(root, 'docs/diagrams');

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

const st = new WaterState();
const L = new WaterProperties();
const V = new WaterProperties();

/** The saturation dome: (liquid, vapour) points of key(x) against T or p. */
function dome(fx: (w: WaterProperties) => number, fy: (w: WaterProperties) => number): Point[] {
  const left: Point[] = [];
  const right: Point[] = [];
  for (let i = 0; i <= 200; i++) {
    const T = 273.16 + (T_CRITICAL - 273.16) * (1 - (1 - i / 200) ** 2);
    if (saturationAtT(Math.min(T, T_CRITICAL), L, V) !== STATUS.ok) continue;
    left.push([fx(L), fy(L)]);
    right.push([fx(V), fy(V)]);
  }
  return [...left, ...right.reverse()];
}

function waterTs(): string {
  const isobars = [0.01e6, 0.1e6, 1e6, 10e6, P_CRITICAL, 50e6];
  const series: Series[] = [{ points: [dome((w) => w.s / 1e3, (w) => w.T - 273.15)], label: 'saturation', color: '#1d2a33', width: 2, labelAt: [0, 120] }];
  const colors = ['#2a6f97', '#468faf', '#61a5c2', '#c1121f', '#7b2cbf', '#e76f51'];
  isobars.forEach((p, k) => {
    const run: Point[] = [];
    for (let i = 0; i <= 240; i++) {
      const T = 273.16 + ((1073.15 - 273.16) * i) / 240;
      if (stateFromPT(p, T, st) === STATUS.ok) run.push([st.s / 1e3, T - 273.15]);
    }
    // through the dome the isobar is the horizontal two-phase line
    if (p < P_CRITICAL) {
      const lo = run.findIndex((q, i) => i > 0 && q[0] - run[i - 1]![0] > 0.5);
      if (lo > 0) run.splice(lo, 0, [run[lo - 1]![0], run[lo - 1]![1]], [run[lo]![0], run[lo - 1]![1]]);
    }
    // label each isobar where it crosses a temperature of its own, so the labels do not overlap
    const labelT = k === 0 ? 350 : 720 - 60 * k;
    const at = Math.max(0, run.findIndex((q) => q[1] >= labelT));
    series.push({ points: [run], label: `${p / 1e6} MPa`, color: colors[k]!, labelAt: [0, at] });
  });
  return chart('Water: temperature–entropy (IAPWS-IF97)', { label: 's  [kJ/(kg·K)]', min: 0, max: 10, ticks: [0, 2, 4, 6, 8, 10] }, { label: 'T  [°C]', min: 0, max: 800, ticks: [0, 100, 200, 300, 400, 500, 600, 700, 800] }, series, 'generated by scripts/generate-diagrams.ts from heatstate');
}

function waterPh(): string {
  const series: Series[] = [{ points: [dome((w) => w.h / 1e3, (w) => w.p / 1e6)], label: 'saturation', color: '#1d2a33', width: 2, labelAt: [0, 60] }];
  const isotherms = [25, 100, 200, 300, 373.946, 500, 700];
  const colors = ['#2a6f97', '#468faf', '#61a5c2', '#89c2d9', '#c1121f', '#f4a261', '#e76f51'];
  isotherms.forEach((tc, k) => {
    const T = tc + 273.15;
    const run: Point[] = [];
    for (let i = 0; i <= 240; i++) {
      const p = 10 ** (3 + (5 * i) / 240);
      if (stateFromPT(p, T, st) === STATUS.ok) run.push([st.h / 1e3, p / 1e6]);
    }
    run.sort((a, b) => b[1] - a[1]);
    series.push({ points: [run], label: `${tc} °C`, color: colors[k]!, labelAt: [0, Math.floor(run.length * 0.15)] });
  });
  return chart('Water: pressure–enthalpy (IAPWS-IF97)', { label: 'h  [kJ/kg]', min: 0, max: 4000, ticks: [0, 500, 1000, 1500, 2000, 2500, 3000, 3500, 4000] }, { label: 'p  [MPa]', min: 0.001, max: 100, log: true, ticks: [0.001, 0.01, 0.1, 1, 10, 100] }, series, 'generated by scripts/generate-diagrams.ts from heatstate');
}

function gasCp(): string {
  const gases = [['N2', '#2a6f97'], ['O2', '#61a5c2'], ['air', '#1d2a33'], ['CO2', '#c1121f'], ['H2O', '#7b2cbf'], ['CH4', '#e76f51']] as const;
  const series: Series[] = gases.map(([name, color], index) => {
    const gas = idealGas(name);
    const run: Point[] = [];
    for (let T = 250; T <= 3000; T += 25) run.push([T, (gas.core.R * gas.core.cpR(T)) / 1e3]);
    // stagger the labels along T so that the close curves (N2, O2, air) stay readable
    return { points: [run], label: name, color, labelAt: [0, Math.floor(run.length * (0.35 + 0.1 * index))] };
  });
  return chart('Ideal-gas cp(T) (NASA polynomials)', { label: 'T  [K]', min: 200, max: 3000, ticks: [200, 500, 1000, 1500, 2000, 2500, 3000] }, { label: 'cp  [kJ/(kg·K)]', min: 0.8, max: 7, ticks: [1, 2, 3, 4, 5, 6, 7] }, series, 'generated by scripts/generate-diagrams.ts from heatstate');
}

/** Every diagram: file name → SVG text. */
export function renderDiagrams(): Record<string, string> {
  return { 'water-ts.svg': waterTs(), 'water-ph.svg': waterPh(), 'gas-cp.svg': gasCp() };
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  for (const [file, svg] of Object.entries(renderDiagrams())) {
    writeFileSync(resolve(DIAGRAMS_DIR, file), svg);
    console.log(`wrote docs/diagrams/${file}`);
  }
}
