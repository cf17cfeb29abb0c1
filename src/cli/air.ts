/**
 * Humid-air subcommands: `air` (a psychrometric state), `air-mix` (adiabatic mixing of streams) and
 * `coil` (a cooling coil with dehumidification), on the `humidAir` facade.
 *
 * @module
 */
import { HeatstateError } from '../errors.js';
import { humidAir, readRelativeHumidity, type HumidAirResult, type HumidAirStateInput } from '../humid-air/index.js';
import { Quantity, type QuantityLike } from '../units/quantity.js';
import { InputError, UsageError, type Args } from './args.js';
import type { Row } from './display.js';
import { chooseSet, onlyNames, readFlow, readValue, ValueError } from './inputs.js';

/** The properties a humid-air state is given by: any two. */
const PROPERTIES = ['T', 'Twb', 'Tdp', 'RH', 'W', 'h'] as const;
const ANY_TWO = 'any two of T, Twb, Tdp, RH, W, h';

function list(names: readonly string[]): string {
  return names.length === 0 ? '{ }' : `{ ${names.join(', ')} }`;
}

/** Total pressure options: p or altitude (or neither: 101.325 kPa). */
function pressureOptions(values: ReadonlyMap<string, string>, command: string): Pick<HumidAirStateInput, 'p' | 'altitude'> {
  const p = values.get('p');
  const altitude = values.get('altitude');
  if (p !== undefined && altitude !== undefined) throw new UsageError(`heatstate ${command} got both p=${p} and altitude=${altitude}: give the total pressure one way, p or altitude`);
  if (p !== undefined) {
    readValue('p', p, 'pressure');
    return { p: p as QuantityLike<'pressure'> };
  }
  if (altitude !== undefined) {
    readValue('altitude', altitude, 'length');
    return { altitude: altitude as QuantityLike<'length'> };
  }
  return {};
}

/**
 * The two properties of one state, with `suffix` on each name (`T1`, `RH1`), read through the
 * library's readers: temperatures and h as quantities, W as a humidity ratio (`0.01`, `10 g/kg`,
 * `70 gr/lbm`), RH as a fraction or percent (`0.5`, `50%`).
 */
function stateProperties(values: ReadonlyMap<string, string>, suffix: string, command: string): Partial<HumidAirStateInput> {
  const present = PROPERTIES.filter((k) => values.has(`${k}${suffix}`));
  if (present.length !== 2) {
    const names = present.map((k) => `${k}${suffix}`);
    const why = present.length > 2 ? 'that is more inputs than a state needs (over-determined)' : 'that is not enough to fix a state (under-determined)';
    throw new UsageError(`heatstate ${command} got ${list(names)}${suffix === '' ? '' : ` for stream ${suffix}`}: ${why}; it takes ${ANY_TWO}${suffix === '' ? '' : `, each with the suffix ${suffix}`}`);
  }
  const out: Record<string, unknown> = {};
  for (const k of present) {
    const name = `${k}${suffix}`;
    const text = values.get(name)!;
    switch (k) {
      case 'RH': {
        const value = /%\s*$/.test(text) ? text : readValue(name, text, 'dimensionless');
        try {
          readRelativeHumidity(value, name);
        } catch (e) {
          if (e instanceof HeatstateError) throw new ValueError(`${name}=${text}: ${e.message}`, e);
          throw e;
        }
        out.RH = value;
        break;
      }
      case 'W':
        out.W = readValue(name, text, 'humidityRatio');
        break;
      case 'h':
        readValue(name, text, 'specificEnergy');
        out.h = text;
        break;
      default:
        readValue(name, text, 'temperature');
        out[k] = text;
    }
  }
  return out as Partial<HumidAirStateInput>;
}

/** A state from the facade, with the stream named in front of its errors. */
function stateOf(input: HumidAirStateInput, stream: string | undefined): HumidAirResult {
  try {
    return humidAir.state(input);
  } catch (e) {
    if (stream !== undefined && e instanceof HeatstateError) throw new ValueError(`${stream}: ${e.message}`, e);
    throw e;
  }
}

/** Rows of a psychrometric state, each name with `suffix`. Specific quantities are per kg of dry air. */
export function airRows(st: HumidAirResult, suffix = ''): Row[] {
  const n = (name: string) => `${name}${suffix}`;
  return [
    [n('T'), st.T],
    [n('Twb'), st.Twb],
    [n('Tdp'), st.Tdp],
    [n('RH'), st.RH],
    [n('W'), st.W],
    [n('Ws'), st.Ws],
    [`${n('W')}/${n('Ws')}`, st.saturationDegree],
    [n('h'), st.h],
    [n('v'), st.v],
    [n('rho'), st.rho],
    [n('cp'), st.cp],
    [n('pw'), st.pw],
    [n('pws'), st.pws],
  ];
}

function closing(st: HumidAirResult): Row[] {
  return [
    ['p', st.p],
    ['p from', st.pressureFrom],
    ['model', 'ideal mixture (ASHRAE Handbook—Fundamentals ch. 1)'],
    ['basis', 'W, h, v, cp per kg of dry air'],
  ];
}

/** `heatstate air <two of T, Twb, Tdp, RH, W, h> [p=… | altitude=…]`. */
export function airCommand(args: Args): Row[] {
  if (args.positional.length > 1) throw new UsageError(`heatstate air takes no names; got ${args.positional.slice(1).map((s) => `"${s}"`).join(', ')} (write inputs as name=value)`);
  onlyNames(args.values, 'air', [...PROPERTIES, 'p', 'altitude'], `${ANY_TWO}, with p or altitude optional`);
  const pressure = pressureOptions(args.values, 'air');
  const props = stateProperties(args.values, '', 'air');
  const st = stateOf({ ...props, ...pressure } as HumidAirStateInput, undefined);
  return [...airRows(st), ...closing(st)];
}

/** A dry-air mass flow for a stream at `state`: a mass flow as given, or a volume flow divided by the stream's v (per kg of dry air). */
function flowAt(name: string, text: string, state: HumidAirResult): QuantityLike<'massFlow'> {
  const f = readFlow(name, text);
  const given = 'massFlow' in f ? f.massFlow : f.volumeFlow;
  if (!(given > 0)) throw new InputError(`${name}=${text}: a flow must be positive`);
  if ('massFlow' in f) return text as QuantityLike<'massFlow'>;
  return Quantity.fromSI(f.volumeFlow / state.v.si, 'massFlow');
}

const STREAM_NAME = /^(T|Twb|Tdp|RH|W|h|flow)([1-9][0-9]*)$/;

/** `heatstate air-mix T1=… RH1=… flow1=… T2=… RH2=… flow2=… [p=… | altitude=…]`: adiabatic mixing. */
export function airMixCommand(args: Args): Row[] {
  if (args.positional.length > 1) throw new UsageError(`heatstate air-mix takes no names; got ${args.positional.slice(1).map((s) => `"${s}"`).join(', ')} (write inputs as name=value)`);
  const takes = 'for each stream n = 1, 2, …: two of Tn, Twbn, Tdpn, RHn, Wn, hn and flown; with p or altitude optional';
  const streams = new Set<number>();
  for (const name of args.values.keys()) {
    const m = STREAM_NAME.exec(name);
    if (m) streams.add(Number(m[2]));
    else if (name !== 'p' && name !== 'altitude') throw new UsageError(`"${name}" is not an input of heatstate air-mix; it takes ${takes}`);
  }
  const n = streams.size;
  if (n < 2) throw new UsageError(`heatstate air-mix needs at least two streams; got ${n === 0 ? 'none' : `stream ${[...streams][0]} only`} (${takes})`);
  for (let i = 1; i <= n; i++) if (!streams.has(i)) throw new UsageError(`heatstate air-mix streams are numbered 1 to ${n}; stream ${i} is missing (got streams ${[...streams].sort((a, b) => a - b).join(', ')})`);
  const pressure = pressureOptions(args.values, 'air-mix');
  const list: { state: HumidAirResult; flow: QuantityLike<'massFlow'> }[] = [];
  for (let i = 1; i <= n; i++) {
    const flowText = args.values.get(`flow${i}`);
    if (flowText === undefined) throw new UsageError(`heatstate air-mix stream ${i} has no flow${i}=<dry-air mass flow or volume flow>`);
    const props = stateProperties(args.values, String(i), 'air-mix');
    const state = stateOf({ ...props, ...pressure } as HumidAirStateInput, `stream ${i}`);
    list.push({ state, flow: flowAt(`flow${i}`, flowText, state) });
  }
  const mixed = humidAir.mix(list);
  return [...airRows(mixed.leaving), ['flow', mixed.flow], ...closing(mixed.leaving)];
}

const COIL_ENTERING = PROPERTIES.map((k) => `${k}1`);
const COIL_LEAVING = ['ADP', 'BF', 'T2', 'RH2'];

/**
 * `heatstate coil <two of T1, Twb1, Tdp1, RH1, W1, h1> flow=… (ADP=… BF=… | T2=… RH2=…) [Tcondensate=…]`:
 * cooling with dehumidification, the leaving state and the loads (negative: heat leaves the air).
 */
export function coilCommand(args: Args): Row[] {
  if (args.positional.length > 1) throw new UsageError(`heatstate coil takes no names; got ${args.positional.slice(1).map((s) => `"${s}"`).join(', ')} (write inputs as name=value)`);
  const takes = `two of ${COIL_ENTERING.join(', ')} (entering air), flow, and { ADP, BF } or { T2, RH2 } (leaving), with Tcondensate, p or altitude optional`;
  onlyNames(args.values, 'coil', [...COIL_ENTERING, ...COIL_LEAVING, 'flow', 'Tcondensate', 'p', 'altitude'], takes);
  const leavingNames = COIL_LEAVING.filter((k) => args.values.has(k));
  const set = chooseSet(args.values, leavingNames, 'coil (leaving air)', [['ADP', 'BF'], ['T2', 'RH2']]);
  const flowText = args.values.get('flow');
  if (flowText === undefined) throw new UsageError(`heatstate coil needs flow=<dry-air mass flow or volume flow at the entering state>; it takes ${takes}`);
  const pressure = pressureOptions(args.values, 'coil');
  const props = stateProperties(args.values, '1', 'coil');
  const inlet = stateOf({ ...props, ...pressure } as HumidAirStateInput, 'entering air');
  const flow = flowAt('flow', flowText, inlet);
  const Tc = args.values.get('Tcondensate');
  if (Tc !== undefined) readValue('Tcondensate', Tc, 'temperature');
  const condensate = Tc === undefined ? {} : { Tcondensate: Tc as QuantityLike<'temperature'> };
  let result;
  if (set === 'ADP,BF') {
    const ADP = args.values.get('ADP')!;
    readValue('ADP', ADP, 'temperature');
    const BF = readValue('BF', args.values.get('BF')!, 'dimensionless');
    result = humidAir.coolingCoil({ inlet, flow, ADP: ADP as QuantityLike<'temperature'>, bypassFactor: BF, ...condensate });
  } else {
    const T2 = args.values.get('T2')!;
    readValue('T2', T2, 'temperature');
    const RH2text = args.values.get('RH2')!;
    const RH2 = /%\s*$/.test(RH2text) ? (RH2text as `${number}%`) : readValue('RH2', RH2text, 'dimensionless');
    result = humidAir.coolingCoil({ inlet, flow, T2: T2 as QuantityLike<'temperature'>, RH2, ...condensate });
  }
  const duty = result.heat.negate();
  const rows: Row[] = [
    ...airRows(result.leaving, '2'),
    ['flow', result.flow],
    ['sensible', result.sensible],
    ['latent', result.latent],
    ['total', result.total],
    ['coil duty', duty],
    ['coil duty (TR)', { value: duty.in('TR'), unit: 'TR' }],
    ['SHR', result.sensibleHeatRatio],
    ['condensate', result.water === undefined ? undefined : result.water.flow.negate()],
    ['condensate h', result.water?.h],
    ['condensate T', result.water?.T],
    ...closing(result.leaving),
  ];
  return rows;
}
