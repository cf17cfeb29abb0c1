/**
 * Generates data/incompressible/water.json: the catalogue's liquid water, c(T) and ρ(T) of the
 * saturated liquid from 0.01 °C to 350 °C, from heatstate's IAPWS-IF97 core (IAPWS R7-97(2012):
 * region 4 for p_s(T), region 1 at (p_s(T), T) for cp and ρ). It measures the error of the
 * catalogue's piecewise-linear interpolation against IF97 itself, at the nodes (the rounding of the
 * stored digits) and between them (nine points inside every interval, the midpoint among them), and writes both into the
 * file with the nodes.
 *
 * Saturated liquid, stated: at T the pressure is p_s(T) (below 100 °C that is below 1 atm; the
 * difference to 1 atm changes cp by less than 0.001 % and ρ by less than 0.005 %). For compressed
 * liquid, steam and every state off the saturation line use `heatstate/water`.
 *
 * Run: `npx tsx scripts/generate-liquid-water.ts`. tests/incompressible/water-data.test.ts
 * regenerates the file and fails on any drift.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';
import { saturationAtT, Status as STATUS } from '../src/water/if97/index.js';
import { WaterProperties } from '../src/water/if97/properties.js';
import { piecewiseLinear } from '../src/numeric/interpolate.js';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const LIQUID_WATER_PATH = resolve(root, 'data/incompressible/water.json');

/**
 * Node temperatures in °C: 0.01 (the triple point), then every 5 K to 200 °C, every 2.5 K to
 * 300 °C and every 1 K to 350 °C, where cp of the saturated liquid rises steeply (4.5 kJ/(kg·K) at
 * 200 °C, 5.7 at 300 °C, 10.1 at 350 °C).
 */
export function nodeTemperatures(): number[] {
  const out = [0.01];
  for (let t = 5; t <= 200; t += 5) out.push(t);
  for (let t = 202.5; t <= 300; t += 2.5) out.push(t);
  for (let t = 301; t <= 350; t += 1) out.push(t);
  return out;
}

const liquid = new WaterProperties();
const vapor = new WaterProperties();

/** cp (J/(kg·K)) and ρ (kg/m³) of the saturated liquid at T (K), from IF97. */
export function saturatedLiquid(T: number): { cp: number; rho: number } {
  if (saturationAtT(T, liquid, vapor) !== STATUS.ok) throw new Error(`IF97 saturation failed at ${T} K`);
  return { cp: liquid.cp, rho: liquid.rho };
}

const round = (x: number, digits: number) => Number(x.toPrecision(digits));

interface ErrorFigure {
  maxRelative: number;
  at: string;
}

function measure(Tc: number[], c: number[], rho: number[]) {
  const TK = Tc.map((t) => t + 273.15);
  const cSI = c.map((x) => x * 1000);
  const nodes = { c: { maxRelative: 0, at: '' } as ErrorFigure, rho: { maxRelative: 0, at: '' } as ErrorFigure };
  const between = { c: { maxRelative: 0, at: '' } as ErrorFigure, rho: { maxRelative: 0, at: '' } as ErrorFigure };
  const note = (f: ErrorFigure, err: number, t: number) => {
    if (err > f.maxRelative) {
      f.maxRelative = err;
      f.at = `${round(t, 6)} °C`;
    }
  };
  for (let i = 0; i < TK.length; i++) {
    const exact = saturatedLiquid(TK[i]!);
    note(nodes.c, Math.abs(cSI[i]! - exact.cp) / exact.cp, Tc[i]!);
    note(nodes.rho, Math.abs(rho[i]! - exact.rho) / exact.rho, Tc[i]!);
  }
  for (let i = 0; i + 1 < TK.length; i++) {
    for (let k = 1; k <= 9; k++) {
      const T = TK[i]! + ((TK[i + 1]! - TK[i]!) * k) / 10;
      const exact = saturatedLiquid(T);
      note(between.c, Math.abs(piecewiseLinear(TK, cSI, T) - exact.cp) / exact.cp, T - 273.15);
      note(between.rho, Math.abs(piecewiseLinear(TK, rho, T) - exact.rho) / exact.rho, T - 273.15);
    }
  }
  const fig = (f: ErrorFigure) => ({ maxRelative: round(f.maxRelative, 2), at: f.at });
  return { atNodes: { c: fig(nodes.c), rho: fig(nodes.rho) }, betweenNodes: { c: fig(between.c), rho: fig(between.rho) } };
}

/** The text of data/incompressible/water.json. */
export function renderLiquidWater(): string {
  const Tc = nodeTemperatures();
  const c: number[] = [];
  const rho: number[] = [];
  for (const t of Tc) {
    const { cp, rho: r } = saturatedLiquid(t + 273.15);
    c.push(round(cp / 1000, 7));
    rho.push(round(r, 7));
  }
  const error = measure(Tc, c, rho);
  const pct = (x: number) => `${Number((x * 100).toPrecision(2))} %`;
  const substance = {
    name: 'water',
    aliases: ['liquid water', 'H2O(l)'],
    state: 'liquid',
    c: { table: { T: Tc, c }, unit: 'kJ/(kg·K)', temperatureUnit: '°C' },
    density: { table: { T: Tc, rho }, unit: 'kg/m³', temperatureUnit: '°C' },
    T: { min: '0.01 °C', max: '350 °C' },
    source: {
      title: 'Saturated liquid water computed from IAPWS-IF97 (region 4 for the saturation pressure, region 1 for cp and ρ) by heatstate',
      authors: 'IAPWS (W. Wagner et al.), Revised Release on the IAPWS Industrial Formulation 1997, IAPWS R7-97(2012)',
      year: 2012,
      table: 'cp and ρ of the saturated liquid at the node temperatures; generator scripts/generate-liquid-water.ts',
    },
    basis: 'computed',
    uncertainty: `fit deviation: piecewise-linear interpolation against IF97 saturated liquid, largest between the nodes ${pct(error.betweenNodes.c.maxRelative)} in c (at ${error.betweenNodes.c.at}) and ${pct(error.betweenNodes.rho.maxRelative)} in ρ (at ${error.betweenNodes.rho.at}); at the nodes only the rounding of the stored digits. IF97 itself reproduces IAPWS-95 within its stated tolerances (from memory: about 0.1 % in cp away from the critical region)`,
    note: 'Saturated liquid: at each T the pressure is the saturation pressure p_s(T) (below 1 atm under 100 °C, 16.5 MPa at 350 °C). Δu = ∫c dT with c the saturated-liquid cp; Δh adds v̄·Δp. The constant-density fields (rho, v) give the 25 °C value.',
    rangeNote: 'for steam, compressed liquid or any state off the saturation line use heatstate/water (IAPWS-IF97), which covers 0–800 °C up to 100 MPa and 800–2000 °C up to 50 MPa',
  };
  const file = {
    generated: 'GENERATED by scripts/generate-liquid-water.ts from the IAPWS-IF97 core. Do not edit; rerun the script.',
    interpolationError: { ...error, notes: 'Largest relative error of the catalogue interpolation (linear between nodes) against IF97 saturated liquid: at the nodes (rounding of the stored 7 digits) and at nine points inside every interval (tenths, the midpoint among them).' },
    substance,
  };
  return `${JSON.stringify(file, null, 1)}\n`;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const text = renderLiquidWater();
  writeFileSync(LIQUID_WATER_PATH, text);
  console.log(JSON.stringify((JSON.parse(text) as { interpolationError: unknown }).interpolationError));
  console.log(`wrote ${LIQUID_WATER_PATH}`);
}
