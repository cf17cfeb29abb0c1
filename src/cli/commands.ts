/**
 * The water, saturation, ideal-gas, incompressible and real-fluid subcommands: read the inputs
 * through the library's readers, call the facade, return rows.
 *
 * @module
 */
import { formatNumber, OutOfRangeError } from '../errors.js';
import { fluid, type FluidPairInput } from '../fluids/index.js';
import { idealGas, type GasStateResult, type IdealGas } from '../ideal-gas/gas.js';
import { gasTransportIds } from '../ideal-gas/transport.js';
import { incompressible, type IncompressibleSubstance } from '../incompressible/index.js';
import type { Dimension } from '../units/dimensions.js';
import { Quantity } from '../units/quantity.js';
import { water, type WaterPair } from '../water/state.js';
import { UsageError, type Args } from './args.js';
import type { Row, Units } from './display.js';
import { chooseSet, readPlain, readValue } from './inputs.js';

/** The pairs of a water or real-fluid state. */
export const STATE_PAIRS: readonly (readonly string[])[] = [['T', 'p'], ['p', 'h'], ['p', 's'], ['h', 's'], ['T', 'x'], ['p', 'x'], ['T', 'v'], ['T', 'rho']];

/** The dimension of each named input (x is a plain number). */
const DIMENSION: Readonly<Record<string, Dimension>> = {
  T: 'temperature',
  p: 'pressure',
  h: 'specificEnergy',
  s: 'specificHeat',
  v: 'specificVolume',
  rho: 'density',
  T1: 'temperature',
  T2: 'temperature',
  p1: 'pressure',
  p2: 'pressure',
};

/**
 * The chosen set's inputs, each read through the library (refusing non-decimal numbers, unknown
 * units, wrong dimensions, non-finite values), as the facade takes them: text for quantities (so the
 * facade's errors speak the user's units), numbers for plain values.
 */
function readInputs(values: ReadonlyMap<string, string>, set: string): Record<string, string | number> {
  const out: Record<string, string | number> = {};
  for (const name of set.split(',')) {
    const text = values.get(name)!;
    if (name === 'x') out.x = readPlain('x', text);
    else {
      readValue(name, text, DIMENSION[name]!);
      out[name] = text;
    }
  }
  return out;
}

function noNames(args: Args, command: string, example: string): void {
  if (args.positional.length > 1) throw new UsageError(`heatstate ${command} takes no names; got ${args.positional.slice(1).map((s) => `"${s}"`).join(', ')} (write inputs as name=value, for example ${example})`);
}

/** The transport rows of a state or saturated phase (the facade's μ, λ and Pr, with ν and α where the state has them). */
function transportRows(t: { mu?: unknown; lambda?: unknown; nu?: unknown; alpha?: unknown; Pr?: number | undefined }, suffix = ''): Row[] {
  const rows: Row[] = [
    [`mu${suffix}`, t.mu as Row[1]],
    [`lambda${suffix}`, t.lambda as Row[1]],
  ];
  if ('nu' in t) rows.push([`nu${suffix}`, t.nu as Row[1]], [`alpha${suffix}`, t.alpha as Row[1]]);
  rows.push([`Pr${suffix}`, t.Pr]);
  return rows;
}

/** `heatstate water <pair> [--transport]`. */
export function waterCommand(args: Args): Row[] {
  noNames(args, 'water', 'p="10 MPa" T="500 °C"');
  const set = chooseSet(args.values, [...args.values.keys()], 'water', STATE_PAIRS);
  const st = water.state(readInputs(args.values, set) as unknown as WaterPair);
  const rows: Row[] = [
    ['T', st.T], ['p', st.p], ['phase', st.phase], ['region', st.region], ['x', st.x],
    ['v', st.v], ['rho', st.rho], ['u', st.u], ['h', st.h], ['s', st.s], ['cp', st.cp], ['cv', st.cv], ['w', st.w], ['k', st.k],
    ['Tsat', st.Tsat], ['superheat', st.superheat], ['subcooling', st.subcooling],
  ];
  if (args.transport) {
    // IAPWS R12-08 and R15-11 with their critical enhancements (inputs from IAPWS-95); not defined
    // in two-phase states, above 1173.15 K or beyond the releases' pressure limits
    rows.push(...transportRows(st));
    if (st.mu === undefined) rows.push(['transport', st.phase === 'two-phase' ? 'not defined (two-phase state)' : 'outside IAPWS R12-08/R15-11 (273.15 K to 1173.15 K, their pressure limits)']);
  }
  return rows;
}

/** `heatstate sat T=… | p=… [--transport]`. */
export function saturationCommand(args: Args): Row[] {
  noNames(args, 'sat', 'T=212degF');
  const set = chooseSet(args.values, [...args.values.keys()], 'sat', [['T'], ['p']]);
  const at = readInputs(args.values, set);
  const sat = water.saturation(at as { T: `${number} K` } | { p: `${number} Pa` });
  const rows: Row[] = [
    ['T', sat.T], ['p', sat.p],
    ['vf', sat.liquid.v], ['vg', sat.vapor.v], ['uf', sat.liquid.u], ['ufg', sat.ufg], ['ug', sat.vapor.u],
    ['hf', sat.liquid.h], ['hfg', sat.hfg], ['hg', sat.vapor.h], ['sf', sat.liquid.s], ['sfg', sat.sfg], ['sg', sat.vapor.s],
  ];
  if (args.transport) {
    rows.push(...transportRows(sat.liquid, 'f'), ...transportRows(sat.vapor, 'g'), ['sigma', sat.sigma ?? 'outside IAPWS R1-76(2014) (273.16 K to 647.096 K)']);
  }
  return rows;
}

/** `heatstate gas <species> T=… [p=…] | h=… p=… | s=… p=… [--transport]`. */
export function gasCommand(args: Args): Row[] {
  const species = args.positional.slice(1);
  if (species.length === 0) throw new UsageError('heatstate gas needs a species, for example: heatstate gas N2 T="500 K"');
  if (species.length > 1) throw new UsageError(`heatstate gas takes one species; got ${species.map((s) => `"${s}"`).join(', ')} (mixtures are not offered on the command line)`);
  const gas = idealGas(species[0]!);
  const set = chooseSet(args.values, [...args.values.keys()], 'gas', [['T'], ['T', 'p'], ['h', 'p'], ['s', 'p']]);
  const inputs = readInputs(args.values, set);
  const head: Row[] = [['gas', gas.name], ['M', gas.M], ['R', gas.R]];
  if (set === 'T') {
    const T = inputs.T as `${number} K`;
    const rows: Row[] = [...head, ['T', Quantity.fromSI(readValue('T', T, 'temperature'), 'temperature')], ['cp', gas.cp(T)], ['cv', gas.cv(T)], ['k', gas.k(T)], ['h', gas.h(T)], ['h - h(298.15 K)', gas.hSensible(T)], ['u', gas.u(T)], ['s° (at 100 kPa)', gas.sStandard(T)]];
    if (args.transport) rows.push(...gasTransportRows(gas, readValue('T', T, 'temperature')));
    return rows;
  }
  const st = gas.state(inputs as unknown as Parameters<typeof gas.state>[0]);
  const rows: Row[] = [...head, ['T', st.T], ['p', st.p], ['v', st.v], ['rho', st.rho], ['cp', st.cp], ['cv', st.cv], ['k', st.k], ['h', st.h], ['h - h(298.15 K)', st.hSensible], ['u', st.u], ['s', st.s]];
  if (args.transport) rows.push(...gasTransportRows(gas, st.T.si, st));
  return rows;
}

/**
 * The dilute-gas transport rows of `heatstate gas … --transport`: μ, λ and Pr (with ν and α for a
 * state), from the ideal-gas facade (dilute gas: no pressure dependence in μ and λ); a `transport` row
 * says why they are not defined when the gas has no transport data or T lies outside it.
 */
function gasTransportRows(gas: IdealGas, T: number, st?: GasStateResult): Row[] {
  const core = gas.transportCore;
  const inRange = core !== undefined && T >= core.Tmin && T <= core.Tmax;
  const at = Quantity.fromSI(T, 'temperature');
  const rows = st ? transportRows(st) : transportRows(inRange ? { mu: gas.viscosity(at), lambda: gas.thermalConductivity(at), Pr: gas.prandtl(at) } : {});
  if (core === undefined) rows.push(['transport', `no dilute-gas transport data for ${gas.name} (gases with data: ${gasTransportIds().join(', ')})`]);
  else if (!inRange) rows.push(['transport', `outside the dilute-gas transport data for ${gas.name} (${formatNumber(core.Tmin)} K to ${formatNumber(core.Tmax)} K)`]);
  return rows;
}

/** `heatstate liquid <substance> T1=… T2=… [p1=…] [p2=…] [--transport]`. */
export function liquidCommand(args: Args): Row[] {
  const names = args.positional.slice(1);
  if (names.length === 0) throw new UsageError('heatstate liquid needs a substance, for example: heatstate liquid copper T1="20 °C" T2="120 °C"');
  if (names.length > 1) throw new UsageError(`heatstate liquid takes one substance; got ${names.map((s) => `"${s}"`).join(', ')}`);
  const sub = incompressible(names[0]!);
  const set = chooseSet(args.values, [...args.values.keys()], 'liquid', [['T1', 'T2'], ['T1', 'T2', 'p1'], ['T1', 'T2', 'p2'], ['T1', 'T2', 'p1', 'p2']]);
  const inputs = readInputs(args.values, set) as Record<string, `${number} K` | `${number} Pa`>;
  const T1 = inputs.T1 as `${number} K`;
  const T2 = inputs.T2 as `${number} K`;
  const p1 = (inputs.p1 ?? '101.325 kPa') as `${number} Pa`;
  const p2 = (inputs.p2 ?? p1) as `${number} Pa`;
  const rows: Row[] = [
    ['substance', sub.name], ['c (mean)', sub.averageC(T1, T2)], ['rho', sub.rho],
    ['delta u', sub.deltaU(T1, T2)], ['delta h', sub.deltaH({ T: T1, p: p1 }, { T: T2, p: p2 })], ['delta s', sub.deltaS(T1, T2)],
  ];
  if (args.transport) rows.push(...liquidTransportRows(sub, T1, p1, '1'), ...liquidTransportRows(sub, T2, p2, '2'));
  return rows;
}

/**
 * The transport rows of `heatstate liquid … --transport` at one of the two states: μ, λ, ν, α and Pr
 * of a liquid (λ and α of a solid) as the substance's state gives them, and a `transport` row with
 * the facade's reason where its data leave a value out or do not reach T.
 */
function liquidTransportRows(sub: IncompressibleSubstance, T: `${number} K`, p: `${number} Pa`, suffix: string): Row[] {
  const st = sub.state({ T, p });
  const liquid = 'mu' in st;
  const rows: Row[] = liquid ? transportRows(st, suffix) : [[`lambda${suffix}`, st.lambda], [`alpha${suffix}`, st.alpha]];
  // the facade's message, without the library option it suggests for going outside the data
  const why = (read: () => unknown): string[] => {
    try {
      read();
      return [];
    } catch (e) {
      return [e instanceof OutOfRangeError ? new OutOfRangeError(e.range).message : (e as Error).message];
    }
  };
  const reasons = [...(liquid && st.mu === undefined ? why(() => sub.viscosity(T)) : []), ...(st.lambda === undefined ? why(() => sub.thermalConductivity(T)) : [])];
  if (reasons.length > 0) rows.push([`transport${suffix}`, reasons.join('; ')]);
  return rows;
}

/** The Joule–Thomson coefficient (K/Pa) in K/MPa or °F/psi, by the library's conversions. */
function jouleThomson(jt: number | undefined, units: Units): Row[1] {
  if (jt === undefined) return undefined;
  const [dT, dp, unit] = units === 'us' ? ['Δ°F', 'psi', '°F/psi'] : ['ΔK', 'MPa', 'K/MPa'];
  return { value: (jt * Quantity.fromSI(1, 'temperatureDifference').in(dT)) / Quantity.fromSI(1, 'pressure').in(dp), unit };
}

/** `heatstate fluid <name> <pair>` and `heatstate fluid <name> sat T=… | p=…`. */
export function fluidCommand(args: Args): Row[] {
  const words = args.positional.slice(1);
  if (words.length === 0) throw new UsageError('heatstate fluid needs a fluid name, for example: heatstate fluid water T="500 K" p="10 MPa"');
  if (words.length > 2 || (words.length === 2 && words[1] !== 'sat')) {
    throw new UsageError(`heatstate fluid takes a fluid name and optionally "sat"; got ${words.map((s) => `"${s}"`).join(', ')}`);
  }
  const f = fluid(words[0]!);
  const head: Row[] = [['fluid', f.name], ['equation', f.equation]];
  if (words.length === 2) {
    const set = chooseSet(args.values, [...args.values.keys()], `fluid ${words[0]} sat`, [['T'], ['p']]);
    const sat = f.saturation(readInputs(args.values, set) as { T: `${number} K` } | { p: `${number} Pa` });
    return [
      ...head, ['T', sat.T], ['p', sat.p],
      ['rhof', sat.liquid.rho], ['rhog', sat.vapor.rho], ['vf', sat.liquid.v], ['vg', sat.vapor.v], ['uf', sat.liquid.u], ['ug', sat.vapor.u],
      ['hf', sat.liquid.h], ['hfg', sat.hfg], ['hg', sat.vapor.h], ['sf', sat.liquid.s], ['sfg', sat.sfg], ['sg', sat.vapor.s],
    ];
  }
  const set = chooseSet(args.values, [...args.values.keys()], `fluid ${words[0]}`, STATE_PAIRS);
  const st = f.state(readInputs(args.values, set) as unknown as FluidPairInput);
  return [
    ...head, ['T', st.T], ['p', st.p], ['phase', st.phase], ['x', st.x],
    ['v', st.v], ['rho', st.rho], ['u', st.u], ['h', st.h], ['s', st.s], ['cp', st.cp], ['cv', st.cv], ['w', st.w], ['k', st.k],
    ['muJT', jouleThomson(st.jouleThomson, args.units)], ['superheat', st.superheat], ['subcooling', st.subcooling],
  ];
}
