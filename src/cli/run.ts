/**
 * The `heatstate` command's logic: parse arguments, compute, format. `main.ts` wires it to the
 * process; tests call {@link run} directly.
 *
 * @module
 */
import { HeatstateError } from '../errors.js';
import { idealGas } from '../ideal-gas/gas.js';
import { incompressible } from '../incompressible/index.js';
import { quantity, type Quantity } from '../units/quantity.js';
import { water, type WaterPair } from '../water/state.js';

const HELP = `heatstate: thermophysical properties from the shell

usage:
  heatstate water <name=value> <name=value>   a water or steam state (IAPWS-IF97)
        pairs: T,p  p,h  p,s  h,s  T,x  p,x  T,v  T,rho
  heatstate sat T=<value> | p=<value>          saturated liquid and vapour
  heatstate gas <species> T=<value> [p=<value>] ideal-gas properties (NASA polynomials)
  heatstate liquid <substance> T1=<value> T2=<value> [p1=<value> p2=<value>]
                                               incompressible Δu, Δh (and c) between two states

options:
  --units si|us    units of the output (default si: K, kPa, kJ/kg, …; us: °F, psia, Btu/lbm, …)
  --json           JSON instead of a table
  --help           this text

Values are numbers with units, quoted when they contain spaces; x is a plain number.

examples:
  heatstate water p="10 MPa" T="500 °C"
  heatstate water p=150psig x=0.95 --units us
  heatstate water p="1 atm" h="1500 kJ/kg" --json
  heatstate sat T=212degF --units us
  heatstate gas N2 T="800 K" p="5 bar"
  heatstate liquid copper T1="20 °C" T2="120 °C"
  heatstate liquid water T1=25degC T2=25degC p1="1 atm" p2="500 psia" --units us

Results are engineering estimates: defer to local codes and licensed professionals.`;

type Units = 'si' | 'us';
const DISPLAY: Record<Units, Record<string, string>> = {
  si: { temperature: 'K', pressure: 'kPa', specificEnergy: 'kJ/kg', specificHeat: 'kJ/(kg·K)', specificVolume: 'm³/kg', density: 'kg/m³', velocity: 'm/s', molarMass: 'g/mol', temperatureDifference: 'ΔK' },
  us: { temperature: '°F', pressure: 'psia', specificEnergy: 'Btu/lbm', specificHeat: 'Btu/(lbm·°R)', specificVolume: 'ft³/lbm', density: 'lbm/ft³', velocity: 'ft/s', molarMass: 'lbm/lbmol', temperatureDifference: 'Δ°F' },
};

/** A row of output: a property name and a quantity, a number, text, or nothing (not defined). */
type Row = [string, Quantity | number | string | undefined];

class UsageError extends Error {}

function parseArgs(argv: readonly string[]): { positional: string[]; values: Map<string, string>; units: Units; json: boolean; help: boolean } {
  const positional: string[] = [];
  const values = new Map<string, string>();
  let units: Units = 'si';
  let json = false;
  let help = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a === '--help' || a === '-h') help = true;
    else if (a === '--json') json = true;
    else if (a === '--units' || a.startsWith('--units=')) {
      const v = a.includes('=') ? a.slice(8) : argv[++i];
      if (v !== 'si' && v !== 'us') throw new UsageError(`--units takes si or us; got ${v ?? 'nothing'}`);
      units = v;
    } else if (a.startsWith('--')) throw new UsageError(`unknown option ${a} (see heatstate --help)`);
    else if (a.includes('=')) {
      const k = a.slice(0, a.indexOf('='));
      if (values.has(k)) throw new UsageError(`${k} is given twice`);
      values.set(k, a.slice(a.indexOf('=') + 1).trim());
    } else positional.push(a);
  }
  return { positional, values, units, json, help };
}

function show(q: Quantity, units: Units): { value: number; unit: string } {
  const unit = DISPLAY[units][q.dimension] ?? q.unit;
  return { value: q.in(unit), unit };
}

function format(rows: readonly Row[], units: Units, json: boolean): string {
  if (json) {
    const out: Record<string, unknown> = {};
    for (const [name, v] of rows) out[name] = v === undefined ? null : typeof v === 'object' ? show(v, units) : v;
    return JSON.stringify(out, null, 2);
  }
  const cells = rows.map(([name, v]) => {
    if (v === undefined) return [name, 'not defined', ''];
    if (typeof v === 'string') return [name, v, ''];
    if (typeof v === 'number') return [name, String(Number(v.toPrecision(6))), ''];
    const s = show(v, units);
    return [name, String(Number(s.value.toPrecision(6))), s.unit];
  });
  const w0 = Math.max(...cells.map((c) => c[0]!.length));
  const w1 = Math.max(...cells.map((c) => c[1]!.length));
  return cells.map(([a, b, c]) => `${a!.padEnd(w0)}  ${b!.padStart(w1)}  ${c}`.trimEnd()).join('\n');
}

function need(values: Map<string, string>, name: string): string {
  const v = values.get(name);
  if (v === undefined) throw new UsageError(`${name}=<value> is required (see heatstate --help)`);
  return v;
}

function waterRows(values: Map<string, string>): Row[] {
  const pair: Record<string, unknown> = {};
  for (const [k, v] of values) pair[k] = k === 'x' ? Number(v) : v;
  if (values.size !== 2) throw new UsageError(`water takes two properties, for example p="10 MPa" T="500 °C"; got ${values.size}`);
  const st = water.state(pair as WaterPair);
  return [
    ['T', st.T], ['p', st.p], ['phase', st.phase], ['region', st.region], ['x', st.x],
    ['v', st.v], ['rho', st.rho], ['u', st.u], ['h', st.h], ['s', st.s], ['cp', st.cp], ['cv', st.cv], ['w', st.w], ['k', st.k],
  ];
}

function saturationRows(values: Map<string, string>): Row[] {
  const at = values.has('T') ? { T: values.get('T') as `${number} K` } : { p: need(values, 'p') as `${number} Pa` };
  const sat = water.saturation(at);
  return [
    ['T', sat.T], ['p', sat.p],
    ['vf', sat.liquid.v], ['vg', sat.vapor.v], ['uf', sat.liquid.u], ['ufg', sat.ufg], ['ug', sat.vapor.u],
    ['hf', sat.liquid.h], ['hfg', sat.hfg], ['hg', sat.vapor.h], ['sf', sat.liquid.s], ['sfg', sat.sfg], ['sg', sat.vapor.s],
  ];
}

function gasRows(species: string | undefined, values: Map<string, string>): Row[] {
  if (species === undefined) throw new UsageError('gas needs a species, for example: heatstate gas N2 T="500 K"');
  const gas = idealGas(species);
  const T = need(values, 'T') as `${number} K`;
  const rows: Row[] = [['gas', gas.name], ['M', gas.M], ['R', gas.R], ['T', quantity(T)], ['cp', gas.cp(T)], ['cv', gas.cv(T)], ['k', gas.k(T)], ['h', gas.h(T)], ['h - h(298.15 K)', gas.hSensible(T)], ['u', gas.u(T)]];
  const p = values.get('p');
  rows.push(p === undefined ? ['s° (at 100 kPa)', gas.sStandard(T)] : ['s', gas.s(T, p as `${number} Pa`)]);
  return rows;
}

function liquidRows(name: string | undefined, values: Map<string, string>): Row[] {
  if (name === undefined) throw new UsageError('liquid needs a substance, for example: heatstate liquid copper T1="20 °C" T2="120 °C"');
  const sub = incompressible(name);
  const T1 = need(values, 'T1') as `${number} K`;
  const T2 = need(values, 'T2') as `${number} K`;
  const p1 = (values.get('p1') ?? '101.325 kPa') as `${number} Pa`;
  const p2 = (values.get('p2') ?? p1) as `${number} Pa`;
  return [
    ['substance', sub.name], ['c (mean)', sub.averageC(T1, T2)], ['rho', sub.rho],
    ['delta u', sub.deltaU(T1, T2)], ['delta h', sub.deltaH({ T: T1, p: p1 }, { T: T2, p: p2 })], ['delta s', sub.deltaS(T1, T2)],
  ];
}

/** Runs the command line; returns the exit code. Output and errors go to the given writers. */
export function run(argv: readonly string[], stdout: (s: string) => void, stderr: (s: string) => void): number {
  try {
    const { positional, values, units, json, help } = parseArgs(argv);
    if (help || positional.length === 0) {
      stdout(HELP);
      return help ? 0 : 2;
    }
    const [command, name] = positional;
    let rows: Row[];
    switch (command) {
      case 'water':
        rows = waterRows(values);
        break;
      case 'sat':
      case 'saturation':
        rows = saturationRows(values);
        break;
      case 'gas':
        rows = gasRows(name, values);
        break;
      case 'liquid':
        rows = liquidRows(name, values);
        break;
      default:
        throw new UsageError(`unknown command "${command}": use water, sat, gas or liquid (see heatstate --help)`);
    }
    stdout(format(rows, units, json));
    return 0;
  } catch (e) {
    const message = e instanceof HeatstateError ? `${e.message} [${e.code}]` : e instanceof UsageError ? e.message : `unexpected failure: ${(e as Error).message}`;
    stderr(`heatstate: ${message.split('\n')[0]}`);
    return e instanceof UsageError ? 2 : 1;
  }
}
