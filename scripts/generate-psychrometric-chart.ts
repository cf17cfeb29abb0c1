/**
 * Renders psychrometric charts (dry-bulb against humidity ratio, at 101.325 kPa) from the library
 * itself into docs/diagrams/psychrometric-si.svg and psychrometric-us.svg: curves of constant
 * relative humidity, and lines of constant thermodynamic wet-bulb, enthalpy and specific volume.
 * heatstate's own plain layout (the house style of scripts/generate-diagrams.ts). Generated, never
 * drawn by hand.
 *
 * Run: `npx tsx scripts/generate-psychrometric-chart.ts`. tests/humid-air/chart.test.ts fails if a
 * committed chart drifts.
 */
import { writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Status } from '../src/core/status.js';
import { humidityRatioFromWetBulb, moistAirVolume } from '../src/humid-air/core/relations.js';
import { HumidAirState, humidAirState, PAIR } from '../src/humid-air/core/state.js';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const CHART_DIR = resolve(root, 'docs/diagrams');

type Point = [number, number];
interface Units {
  readonly name: 'si' | 'us';
  readonly title: string;
  readonly T: (K: number) => number;
  readonly fromT: (x: number) => number;
  readonly W: (kgPerKg: number) => number;
  readonly h: (x: number) => number;
  readonly v: (x: number) => number;
  readonly xLabel: string;
  readonly yLabel: string;
  readonly xTicks: number[];
  readonly yTicks: number[];
  readonly wetBulbs: number[];
  readonly enthalpies: number[];
  readonly volumes: number[];
  readonly hUnit: string;
  readonly vUnit: string;
  readonly tUnit: string;
}

const P = 101325;
const W_ = 760;
const H_ = 520;
const M = { left: 70, right: 24, top: 44, bottom: 56 };
const num = (x: number) => (Math.round(x * 100) / 100).toString();
const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;');
const st = new HumidAirState();

const SI: Units = {
  name: 'si',
  title: 'Moist air at 101.325 kPa: dry-bulb against humidity ratio',
  T: (K) => K - 273.15,
  fromT: (x) => x + 273.15,
  W: (w) => w * 1000,
  h: (x) => x * 1000,
  v: (x) => x,
  xLabel: 'dry-bulb temperature  [°C]',
  yLabel: 'humidity ratio W  [g water / kg dry air]',
  xTicks: [-10, 0, 10, 20, 30, 40, 50],
  yTicks: [0, 5, 10, 15, 20, 25, 30],
  wetBulbs: [0, 5, 10, 15, 20, 25, 30],
  enthalpies: [10, 20, 30, 40, 50, 60, 70, 80, 90, 100],
  volumes: [0.78, 0.8, 0.82, 0.84, 0.86, 0.88, 0.9, 0.92],
  hUnit: 'kJ/kg',
  vUnit: 'm³/kg',
  tUnit: '°C',
};

// US: °F, grains per pound (7000 gr = 1 lb), Btu/lbm on the SI reference (0 at 0 °C), ft³/lbm
const US: Units = {
  name: 'us',
  title: 'Moist air at 14.696 psia: dry-bulb against humidity ratio',
  T: (K) => (K * 9) / 5 - 459.67,
  fromT: (x) => ((x + 459.67) * 5) / 9,
  W: (w) => w * 7000,
  h: (x) => x * 2326,
  v: (x) => (x * 0.45359237) / 0.028316846592, // m³/kg to ft³/lbm (NIST SP 811: 1 lb = 0.45359237 kg, 1 ft³ = 0.028316846592 m³)
  xLabel: 'dry-bulb temperature  [°F]',
  yLabel: 'humidity ratio W  [grains water / lb dry air]',
  xTicks: [20, 30, 40, 50, 60, 70, 80, 90, 100, 110, 120],
  yTicks: [0, 25, 50, 75, 100, 125, 150, 175, 200],
  wetBulbs: [30, 40, 50, 60, 70, 80, 90],
  enthalpies: [0, 5, 10, 15, 20, 25, 30, 35, 40, 45],
  volumes: [12.5, 13, 13.5, 14, 14.5, 15],
  hUnit: 'Btu/lbm (0 at 32 °F)',
  vUnit: 'ft³/lbm',
  tUnit: '°F',
};

function ws(T: number): number {
  return humidAirState(PAIR.T_RH, T, 1, P, false, st) === Status.ok ? st.W : NaN;
}

/** T (K) on the saturation curve where a line W = line(T), decreasing in T, meets it; bisection. */
function meetSaturation(line: (T: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 80; i++) {
    const mid = 0.5 * (lo + hi);
    if (line(mid) > ws(mid)) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

function chart(u: Units): string {
  const xmin = u.xTicks[0]!;
  const xmax = u.xTicks[u.xTicks.length - 1]!;
  const ymax = u.yTicks[u.yTicks.length - 1]!;
  const Tlo = u.fromT(xmin);
  const Thi = u.fromT(xmax);
  const sx = (x: number) => M.left + ((x - xmin) / (xmax - xmin)) * (W_ - M.left - M.right);
  const sy = (y: number) => H_ - M.bottom - (y / ymax) * (H_ - M.top - M.bottom);
  const inside = ([x, y]: Point) => x >= xmin - 1e-9 && x <= xmax + 1e-9 && y >= -1e-9 && y <= ymax + 1e-9;
  const out: string[] = [];
  const line = (pts: Point[], color: string, width: number, dash?: string) => {
    const kept = pts.filter(inside).map(([x, y]) => `${num(sx(x))},${num(sy(y))}`);
    if (kept.length >= 2) out.push(`<polyline fill="none" stroke="${color}" stroke-width="${width}"${dash ? ` stroke-dasharray="${dash}"` : ''} points="${kept.join(' ')}"/>`);
  };
  // labels sit on a white halo (drawn under the glyphs) so that lines crossing them stay readable,
  // and are kept inside the plot frame (about 5.6 px per character at 10 px)
  const label = (at: Point, text: string, color: string, anchor = 'start', dx = 4, dy = -4) => {
    if (!inside(at)) return;
    let x = sx(at[0]) + dx;
    const w = text.length * 5.6;
    const left = anchor === 'start' ? x : anchor === 'end' ? x - w : x - w / 2;
    if (left + w > W_ - M.right - 2) x -= left + w - (W_ - M.right - 2);
    if (left < M.left + 2) x += M.left + 2 - left;
    out.push(`<text x="${num(x)}" y="${num(sy(at[1]) + dy)}" text-anchor="${anchor}" fill="${color}" font-size="10" stroke="#ffffff" stroke-width="3" stroke-linejoin="round" paint-order="stroke">${esc(text)}</text>`);
  };
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W_} ${H_}" width="${W_}" height="${H_}" font-family="system-ui, sans-serif" font-size="12">`);
  out.push(`<rect width="${W_}" height="${H_}" fill="#ffffff"/>`);
  out.push(`<text x="${W_ / 2}" y="22" text-anchor="middle" font-size="15" font-weight="600">${esc(u.title)}</text>`);
  for (const t of u.xTicks) {
    out.push(`<line x1="${num(sx(t))}" y1="${M.top}" x2="${num(sx(t))}" y2="${H_ - M.bottom}" stroke="#e5e9ec"/>`);
    out.push(`<text x="${num(sx(t))}" y="${H_ - M.bottom + 16}" text-anchor="middle">${t}</text>`);
  }
  for (const t of u.yTicks) {
    out.push(`<line x1="${M.left}" y1="${num(sy(t))}" x2="${W_ - M.right}" y2="${num(sy(t))}" stroke="#e5e9ec"/>`);
    out.push(`<text x="${M.left - 6}" y="${num(sy(t))}" text-anchor="end" dominant-baseline="middle">${t}</text>`);
  }
  out.push(`<rect x="${M.left}" y="${M.top}" width="${W_ - M.left - M.right}" height="${H_ - M.top - M.bottom}" fill="none" stroke="#5b6b76"/>`);
  out.push(`<text x="${(M.left + W_ - M.right) / 2}" y="${H_ - 14}" text-anchor="middle">${esc(u.xLabel)}</text>`);
  out.push(`<text transform="translate(18 ${(M.top + H_ - M.bottom) / 2}) rotate(-90)" text-anchor="middle">${esc(u.yLabel)}</text>`);
  const steps = 160;
  const Tat = (i: number) => Tlo + ((Thi - Tlo) * i) / steps;

  // specific volume: W = (v p/(R T) − 1)/1.607858, from saturation down to W = 0
  for (const vv of u.volumes) {
    const vSI = vv / u.v(1);
    const Wv = (T: number) => (vSI / moistAirVolume(P, T, 0) - 1) / 1.607858;
    const T0 = (vSI * P) / 287.042; // W = 0
    const Ts = meetSaturation(Wv, Tlo - 30, T0);
    const pts: Point[] = [];
    for (let i = 0; i <= 40; i++) {
      const T = Ts + ((T0 - Ts) * i) / 40;
      pts.push([u.T(T), u.W(Math.max(0, Wv(T)))]);
    }
    line(pts, '#7b2cbf', 0.8, '1 3');
    label(pts[40]!, `${u.name === 'si' ? vv.toFixed(2) : vv} ${u.vUnit}`, '#7b2cbf', 'middle', 0, -6);
  }
  // enthalpy: W = (h − 1006 t)/(2501e3 + 1860 t)
  for (const hh of u.enthalpies) {
    const hSI = hh * u.h(1);
    const Wh = (T: number) => (hSI - 1006 * (T - 273.15)) / (2501e3 + 1860 * (T - 273.15));
    const T0 = 273.15 + hSI / 1006;
    const Ts = meetSaturation(Wh, Tlo - 40, T0);
    const pts: Point[] = [];
    for (let i = 0; i <= 40; i++) {
      const T = Ts + ((T0 - Ts) * i) / 40;
      pts.push([u.T(T), u.W(Math.max(0, Wh(T)))]);
    }
    line(pts, '#e76f51', 0.8, '6 3');
    // a third of the way along the part of the line inside the chart
    const shown = pts.filter(inside);
    if (shown.length > 0) label(shown[Math.floor(shown.length / 3)]!, `h ${hh}`, '#e76f51', 'start', 3, -3);
  }
  // thermodynamic wet-bulb: W from the adiabatic-saturation balance, from t* up to W = 0
  for (const tw of u.wetBulbs) {
    const Ts = u.fromT(tw);
    const pts: Point[] = [];
    for (let i = 0; i <= 60; i++) {
      const T = Ts + (Thi + 20 - Ts) * (i / 60);
      const W = humidityRatioFromWetBulb(P, T, Ts);
      if (!(W >= 0)) break;
      pts.push([u.T(T), u.W(W)]);
    }
    line(pts, '#468faf', 0.9, '3 2');
    label(pts[0]!, `${tw} ${u.tUnit} wb`, '#2a6f97', 'end', -4, -2);
  }
  // relative humidity
  for (const rh of [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1]) {
    const pts: Point[] = [];
    for (let i = 0; i <= steps; i++) {
      if (humidAirState(PAIR.T_RH, Tat(i), rh, P, false, st) === Status.ok) pts.push([u.T(st.T), u.W(st.W)]);
    }
    line(pts, rh === 1 ? '#1d2a33' : '#61a5c2', rh === 1 ? 2 : 1);
    // label each curve where it leaves the top of the chart or at the right edge
    // curves leaving through the top are labelled just inside it, to the right of the curve (away
    // from the saturation line); the others where they meet the right edge
    const shown = pts.filter(inside);
    const last = shown[shown.length - 1];
    if (last && rh < 1) {
      const top = last[1] > ymax * 0.97;
      // alternate heights, so that neighbouring labels do not touch
      const height = Math.round(rh * 10) % 2 === 0 ? 0.93 : 0.86;
      const at = top ? shown.find((q) => q[1] >= ymax * height) ?? last : last;
      label(at, `${Math.round(rh * 100)} %`, '#2a6f97', top ? 'start' : 'end', top ? 3 : -3, top ? 4 : -3);
    }
  }
  // in the empty corner above the wet-bulb labels, left of the curve
  const Tsat = Tlo + 0.62 * (Thi - Tlo);
  label([u.T(Tsat), u.W(ws(Tsat))], 'saturation (RH 100 %)', '#1d2a33', 'end', -8, 0);
  out.push(`<text x="${W_ - M.right}" y="${M.top - 8}" text-anchor="end" fill="#5b6b76" font-size="10">${esc(`generated by scripts/generate-psychrometric-chart.ts from heatstate (ASHRAE ideal mixture; h in ${u.hUnit}, v per ${u.name === 'si' ? 'kg' : 'lb'} dry air)`)}</text>`);
  out.push('</svg>');
  return `${out.join('\n')}\n`;
}

/** Both charts: file name → SVG text. */
export function renderPsychrometricCharts(): Record<string, string> {
  return { 'psychrometric-si.svg': chart(SI), 'psychrometric-us.svg': chart(US) };
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  for (const [file, svg] of Object.entries(renderPsychrometricCharts())) {
    writeFileSync(resolve(CHART_DIR, file), svg);
    console.log(`wrote docs/diagrams/${file}`);
  }
}
