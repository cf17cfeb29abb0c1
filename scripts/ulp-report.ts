/**
 * How many units in the last place the float IF97 kernels are from the same equations evaluated
 * exactly: the basic equations of regions 1, 2, 3 and 5 (IAPWS R7-97(2012) Eqs. 7, 15-17, 28, 32-34
 * with the relations of Tables 3, 12, 31 and 39) evaluated with decimal.js at 60 digits from the
 * coefficients in data/if97 (a private clone; dev only), at the exact binary values of the inputs.
 *
 * Reports, per region and property (v, h, u, s, cp, cv, w; p for region 3), the median, 99th
 * percentile and maximum error in ulp over random states of each region (deterministic seed), for the
 * fast kernels and for the compensated double-double kernels (src/water/if97/compensated.ts), as a
 * markdown table (docs/guide/accuracy.md quotes it).
 *
 * Run: `npx tsx scripts/ulp-report.ts [states per region, default 1000] [--write]`. With --write it
 * stores a fixed sample (40 states per region) with the 60-digit values in
 * tests/water/data/if97-high-precision.json, which tests/water/ulp.test.ts checks.
 */
import Decimal from 'decimal.js';
import { readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { b23Pressure, b23Temperature } from '../src/water/if97/b23.js';
import { WaterProperties } from '../src/water/if97/properties.js';
import { region1 } from '../src/water/if97/region1.js';
import { region2 } from '../src/water/if97/region2.js';
import { region3 } from '../src/water/if97/region3.js';
import { saturationPressure } from '../src/water/if97/region4.js';
import { region5 } from '../src/water/if97/region5.js';
import { region1Compensated, region2Compensated, region3Compensated, region5Compensated } from '../src/water/if97/compensated.js';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const SAMPLE_PATH = resolve(root, 'tests/water/data/if97-high-precision.json');
const D = Decimal.clone({ precision: 60 });
type Dec = InstanceType<typeof D>;
const read = (name: string) => JSON.parse(readFileSync(resolve(root, 'data/if97', `${name}.json`), 'utf8'));

/** The exact value of a double as a decimal (a double has fewer than 100 significant decimal digits here). */
const exact = (x: number): Dec => new D(x.toPrecision(100));
const R = exact(461.526);

interface Terms {
  I: number[];
  J: number[];
  n: number[];
}
/** Σ n xᴵ yᴶ and its derivatives [S, Sx, Sxx, Sy, Syy, Sxy], exactly. */
function sums(t: Terms, x: Dec, y: Dec): Dec[] {
  const out = [0, 0, 0, 0, 0, 0].map(() => new D(0));
  for (let k = 0; k < t.n.length; k++) {
    const n = exact(t.n[k]!);
    const I = t.I[k]!;
    const J = t.J[k]!;
    const xi = x.pow(I);
    const yj = y.pow(J);
    out[0] = out[0]!.plus(n.mul(xi).mul(yj));
    if (I !== 0) out[1] = out[1]!.plus(n.mul(I).mul(x.pow(I - 1)).mul(yj));
    if (I !== 0 && I !== 1) out[2] = out[2]!.plus(n.mul(I * (I - 1)).mul(x.pow(I - 2)).mul(yj));
    if (J !== 0) out[3] = out[3]!.plus(n.mul(J).mul(xi).mul(y.pow(J - 1)));
    if (J !== 0 && J !== 1) out[4] = out[4]!.plus(n.mul(J * (J - 1)).mul(xi).mul(y.pow(J - 2)));
    if (I !== 0 && J !== 0) out[5] = out[5]!.plus(n.mul(I * J).mul(x.pow(I - 1)).mul(y.pow(J - 1)));
  }
  return out;
}

export type Property = 'p' | 'v' | 'h' | 'u' | 's' | 'cp' | 'cv' | 'w';
type Values = Partial<Record<Property, Dec>>;

/** Properties from γ(π, τ) with γ, γπ, γππ, γτ, γττ, γπτ (R7-97 Tables 3, 12, 39). */
function fromGibbs(p: Dec, T: Dec, pi: Dec, tau: Dec, g: Dec[]): Values {
  const [gamma, gPi, gPiPi, gTau, gTauTau, gPiTau] = g as [Dec, Dec, Dec, Dec, Dec, Dec];
  const RT = R.mul(T);
  const a = gPi.minus(tau.mul(gPiTau));
  const t2 = tau.mul(tau).mul(gTauTau);
  return {
    v: pi.mul(gPi).mul(RT).div(p),
    h: RT.mul(tau).mul(gTau),
    u: RT.mul(tau.mul(gTau).minus(pi.mul(gPi))),
    s: R.mul(tau.mul(gTau).minus(gamma)),
    cp: R.neg().mul(t2),
    cv: R.mul(t2.neg().plus(a.mul(a).div(gPiPi))),
    w: RT.mul(gPi).mul(gPi).div(a.mul(a).div(t2).minus(gPiPi)).sqrt(),
  };
}

const r1 = read('region1');
const r2 = read('region2');
const r3 = read('region3');
const r5 = read('region5');

/** Region 1 exactly at the double inputs (p [Pa], T [K]). */
export function exactRegion1(pIn: number, TIn: number): Values {
  const p = exact(pIn);
  const T = exact(TIn);
  const pi = p.div(r1.pStar);
  const tau = new D(r1.TStar).div(T);
  const s = sums(r1, new D('7.1').minus(pi), tau.minus('1.222'));
  return fromGibbs(p, T, pi, tau, [s[0]!, s[1]!.neg(), s[2]!, s[3]!, s[4]!, s[5]!.neg()]);
}

/** Regions 2 and 5 (ideal part ln π + Σ n° τ^J°, residual in (π, τ − shift)). */
function exactIdealResidual(data: { pStar: number; TStar: number; J0: number[]; n0: number[] } & Terms, shift: string, pIn: number, TIn: number): Values {
  const p = exact(pIn);
  const T = exact(TIn);
  const pi = p.div(data.pStar);
  const tau = new D(data.TStar).div(T);
  const zeros = data.J0.map(() => 0);
  const ideal = sums({ I: zeros, J: data.J0, n: data.n0 }, new D(1), tau);
  const res = sums(data, pi, tau.minus(shift));
  const g = [pi.ln().plus(ideal[0]!).plus(res[0]!), new D(1).div(pi).plus(res[1]!), new D(-1).div(pi.mul(pi)).plus(res[2]!), ideal[3]!.plus(res[3]!), ideal[4]!.plus(res[4]!), res[5]!];
  return fromGibbs(p, T, pi, tau, g);
}
export const exactRegion2 = (p: number, T: number) => exactIdealResidual(r2, '0.5', p, T);
export const exactRegion5 = (p: number, T: number) => exactIdealResidual(r5, '0', p, T);

/** Region 3 exactly at (ρ [kg/m³], T [K]) (R7-97 Table 31). */
export function exactRegion3(rhoIn: number, TIn: number): Values {
  const rho = exact(rhoIn);
  const T = exact(TIn);
  const delta = rho.div(r3.rhoStar);
  const tau = new D(r3.TStar).div(T);
  const f = sums(r3, delta, tau);
  const n1 = exact(r3.n1);
  const phi = n1.mul(delta.ln()).plus(f[0]!);
  const pD = n1.div(delta).plus(f[1]!);
  const pDD = n1.neg().div(delta.mul(delta)).plus(f[2]!);
  const [pT, pTT, pDT] = [f[3]!, f[4]!, f[5]!];
  const RT = R.mul(T);
  const a = delta.mul(pD).minus(delta.mul(tau).mul(pDT));
  const b = delta.mul(pD).mul(2).plus(delta.mul(delta).mul(pDD));
  const t2 = tau.mul(tau).mul(pTT);
  return {
    p: rho.mul(RT).mul(delta).mul(pD),
    v: new D(1).div(rho),
    u: RT.mul(tau).mul(pT),
    h: RT.mul(tau.mul(pT).plus(delta.mul(pD))),
    s: R.mul(tau.mul(pT).minus(phi)),
    cv: R.neg().mul(t2),
    cp: R.mul(t2.neg().plus(a.mul(a).div(b))),
    w: RT.mul(b.minus(a.mul(a).div(t2))).sqrt(),
  };
}

/** Error of x in units in the last place of the reference value. */
export function ulps(x: number, ref: Dec): number {
  const r = ref.toNumber();
  const e = Math.floor(Math.log2(Math.abs(r)));
  const ulp = 2 ** (e - 52);
  return exact(x).minus(ref).abs().div(ulp).toNumber();
}

function random(seed: number): () => number {
  let x = seed >>> 0 || 1;
  return () => {
    x ^= x << 13;
    x >>>= 0;
    x ^= x >>> 17;
    x ^= x << 5;
    x >>>= 0;
    return x / 4294967296;
  };
}

export interface Region {
  readonly id: 1 | 2 | 3 | 5;
  /** A random state (x, y): (p, T) for 1, 2, 5; (ρ, T) for region 3. */
  draw(rnd: () => number): [number, number];
  float(x: number, y: number, out: WaterProperties): WaterProperties;
  /** The compensated (double-double) kernel of the same equation (src/water/if97/compensated.ts). */
  compensated(x: number, y: number, out: WaterProperties): WaterProperties;
  exact(x: number, y: number): Values;
  properties: Property[];
}

const gibbs: Property[] = ['v', 'h', 'u', 's', 'cp', 'cv', 'w'];
export const REGIONS: Region[] = [
  {
    id: 1,
    draw: (rnd) => {
      const T = 273.15 + rnd() * 350;
      const ps = saturationPressure(T);
      return [ps + rnd() * (100e6 - ps), T];
    },
    float: region1,
    compensated: region1Compensated,
    exact: exactRegion1,
    properties: gibbs,
  },
  {
    id: 2,
    draw: (rnd) => {
      const T = 273.15 + rnd() * 800;
      const top = T <= 623.15 ? saturationPressure(T) : T <= 863.15 ? b23Pressure(T) : 100e6;
      return [Math.exp(Math.log(611) + rnd() * (Math.log(top) - Math.log(611))), T];
    },
    float: region2,
    compensated: region2Compensated,
    exact: exactRegion2,
    properties: gibbs,
  },
  {
    id: 3,
    // (ρ, T) over the densities of region 3 at 623.15 K … T_B23(100 MPa)
    draw: (rnd) => [100 + rnd() * 660, 623.15 + rnd() * (b23Temperature(100e6) - 623.15)],
    float: region3,
    compensated: region3Compensated,
    exact: exactRegion3,
    properties: ['p', 'v', 'h', 'u', 's', 'cp', 'cv', 'w'],
  },
  { id: 5, draw: (rnd) => [Math.exp(Math.log(1e3) + rnd() * (Math.log(50e6) - Math.log(1e3))), 1073.15 + rnd() * 1200], float: region5, compensated: region5Compensated, exact: exactRegion5, properties: gibbs },
];

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const n = Number(process.argv.find((a) => /^\d+$/.test(a)) ?? 1000);
  const write = process.argv.includes('--write');
  const out = new WaterProperties();
  const q = (xs: number[], f: number) => xs[Math.min(xs.length - 1, Math.floor(f * xs.length))]!;
  const sample: { region: number; x: number; y: number; values: Record<string, string> }[] = [];
  console.log(`ulp error of the IF97 kernels (fast, and compensated) against a 60-digit evaluation of the same equations, ${n} random states per region`);
  console.log('| region | property | fast median | fast p99 | fast max | compensated median | compensated p99 | compensated max |');
  console.log('|---|---|---|---|---|---|---|---|');
  const table: string[] = [];
  for (const region of REGIONS) {
    const rnd = random(1000 + region.id);
    const errors: Record<string, number[]> = {};
    const compensated: Record<string, number[]> = {};
    for (let k = 0; k < n; k++) {
      const [x, y] = region.draw(rnd);
      const ref = region.exact(x, y);
      region.float(x, y, out);
      for (const prop of region.properties) (errors[prop] ??= []).push(ulps(out[prop], ref[prop]!));
      region.compensated(x, y, out);
      for (const prop of region.properties) (compensated[prop] ??= []).push(ulps(out[prop], ref[prop]!));
      if (write && k < 40) sample.push({ region: region.id, x, y, values: Object.fromEntries(region.properties.map((prop) => [prop, ref[prop]!.toString()])) });
    }
    for (const prop of region.properties) {
      const e = errors[prop]!.sort((a, b) => a - b);
      const c = compensated[prop]!.sort((a, b) => a - b);
      const f = (xs: number[]) => [q(xs, 0.5), q(xs, 0.99), xs[xs.length - 1]!].map((v) => v.toFixed(1));
      table.push(`| ${region.id} | ${prop} | ${f(e).join(' | ')} | ${f(c).join(' | ')} |`);
    }
  }
  console.log(table.join('\n'));
  if (write) {
    writeFileSync(SAMPLE_PATH, `${JSON.stringify({ source: 'scripts/ulp-report.ts: IAPWS R7-97(2012) basic equations of regions 1, 2, 3, 5 from data/if97, evaluated with decimal.js at 60 digits at the exact binary inputs (x = p in Pa, y = T in K; region 3: x = ρ in kg/m³)', basis: 'computed', uncertainty: 'the 60-digit evaluation is exact to far below one ulp of a double', states: sample }, null, 1)}\n`);
    console.log(`wrote ${SAMPLE_PATH}`);
  }
}
