/**
 * The ideal-gas facade: `idealGas()` and `mixture()`.
 *
 * @module
 */
import { MOLAR_GAS_CONSTANT, REFERENCE_TEMPERATURE_K, STANDARD_STATE_PRESSURE_PA } from '../chem/constants.js';
import { CallUnits } from '../core/call-units.js';
import { throwForStatus } from '../core/fail.js';
import { ABSOLUTE_TEMPERATURE, describeValue, rangeError, readAbsolutePressure, readChoice, readFlag, readFractions, readInput, readOptions, readPair, readTemperature, type Bounds } from '../core/read.js';
import { resultQuantity } from '../core/result.js';
import { Status } from '../core/status.js';
// OutOfRangeError and DefinitionError are named in the doc comments' links
import { DefinitionError, InvalidInputError, OutOfRangeError } from '../errors.js';
import { Quantity, type QuantityInput, type QuantityLike } from '../units/quantity.js';
import type { CheckedInputs, CheckedState, LooseQuantity } from '../core/inputs.js';
import { IdealGasSolver } from './solve.js';
import { applyOptions, fromDefinition, type Built } from './definition.js';
import { constantCpFrom, MixtureModel, mixNasa, type IdealGasModel } from './model.js';
import { speciesModel } from './species.js';
import { cpOf, cvOf, hOf, hSensibleOf, kOf, sOf, sStandardOf, uOf } from './formulas.js';
import { mixtureTransport, noTransport, speciesTransport, transportMethods, withGasTransport, type GasStateTransport, type GasTransportMethods, type TransportSource } from './transport-facade.js';

/** Mass basis (per kg, the default) or molar basis (per mol). */
export type Basis = 'mass' | 'molar';
/** Dimension of cp, cv, s and R on a basis. */
export type HeatCapacityDimension<B extends Basis> = B extends 'molar' ? 'molarHeatCapacity' : 'specificHeat';
/** Dimension of s on a basis: specific entropy per kg, molar entropy (J/(mol·K)) per mol. */
export type EntropyDimension<B extends Basis> = B extends 'molar' ? 'molarHeatCapacity' : 'specificEntropy';
/** Dimension of h and u on a basis. */
export type EnergyDimension<B extends Basis> = B extends 'molar' ? 'molarEnergy' : 'specificEnergy';

/** Options of {@link idealGas} and {@link mixture}. */
export interface IdealGasOptions<B extends Basis = Basis> {
  /** `'mass'` (default): per kg. `'molar'`: per mol. */
  readonly basis?: B;
  /**
   * `'polynomial'` (default): temperature-dependent cp from the NASA 7-coefficient data.
   * `'constant-cp'`: cp frozen at `referenceT` (default 298.15 K), or the `cp` given.
   */
  readonly model?: 'polynomial' | 'constant-cp';
  /** Reference temperature of the constant-cp model. Default 298.15 K. */
  readonly referenceT?: QuantityLike<'temperature'>;
  /** A constant cp to use instead of the polynomial value (implies `model: 'constant-cp'`). Mass basis. */
  readonly cp?: QuantityLike<'specificHeat'>;
  /**
   * Allow temperatures outside the data's interval. Results there are computed from the nearest
   * interval's polynomial and carry `extrapolated: true`. Default false: such temperatures throw.
   */
  readonly extrapolate?: boolean;
}

/** Where a gas's data come from. */
export interface GasSource {
  readonly title: string;
  readonly authors?: string;
  readonly year?: number;
  /** Table, equation or record within the source. */
  readonly table?: string;
  readonly basis: 'published' | 'computed' | 'from memory' | 'user';
  /** Starts with `fit deviation:`, `source:` or `estimate:`. */
  readonly uncertainty: string;
  /** The source in one line (with any note on the data). */
  readonly summary: string;
}

/** A state of an ideal gas: temperature and absolute pressure. */
export interface GasState {
  readonly T: QuantityLike<'temperature'>;
  readonly p: QuantityLike<'pressure'>;
}

/**
 * The pairs `gas.state` accepts: `{ T, p }`, `{ h, p }` (T from h) or `{ s, p }` (T from s at p). For
 * the energy differences (`deltaH`, `deltaU`), which depend on T only, `{ T }` alone also fixes the state.
 */
export type GasPair<B extends Basis = 'mass'> =
  | { readonly T: LooseQuantity<'temperature'>; readonly p: LooseQuantity<'pressure'> }
  | { readonly h: LooseQuantity<EnergyDimension<B>>; readonly p: LooseQuantity<'pressure'> }
  | { readonly s: LooseQuantity<EntropyDimension<B>>; readonly p: LooseQuantity<'pressure'> };

/** The dimension of each input name of a gas state. */
export interface GasInputDimensions<B extends Basis = 'mass'> {
  T: 'temperature';
  p: 'pressure';
  h: EnergyDimension<B>;
  s: EntropyDimension<B>;
}

/** A state for an energy difference: a temperature, `{ T }`, or any {@link GasPair}. */
export type GasEnergyState<B extends Basis = 'mass'> = LooseQuantity<'temperature'> | { readonly T: LooseQuantity<'temperature'> } | GasPair<B>;

/** A state of an ideal gas as `gas.state` returns it: every property as a quantity; transport (`mu`, `lambda`, `nu`, `alpha`, `Pr`) on first access. */
export interface GasStateResult<B extends Basis = 'mass'> extends GasStateTransport {
  readonly T: Quantity<'temperature'>;
  readonly p: Quantity<'pressure'>;
  /** Specific volume RT/p (per kg, on either basis). */
  readonly v: Quantity<'specificVolume'>;
  /** Density p/(RT) (mass basis). */
  readonly rho: Quantity<'density'>;
  readonly cp: Quantity<HeatCapacityDimension<B>>;
  readonly cv: Quantity<HeatCapacityDimension<B>>;
  /** cp/cv. */
  readonly k: number;
  /** Total enthalpy (formation at 298.15 K plus sensible). */
  readonly h: Quantity<EnergyDimension<B>>;
  /** Sensible enthalpy h − h(298.15 K). */
  readonly hSensible: Quantity<EnergyDimension<B>>;
  readonly u: Quantity<EnergyDimension<B>>;
  /** s(T, p), including the entropy of mixing for a mixture. */
  readonly s: Quantity<EntropyDimension<B>>;
  /** True when T lies outside the data and extrapolation was asked for. */
  readonly extrapolated: boolean;
}

/** A user-defined species: NASA 7-coefficient data, or a constant cp. */
export type IdealGasDefinition =
  | {
      readonly name: string;
      /** Formula, for display. */
      readonly formula?: string;
      /** Molar mass; from a formula with `molarMass('C8H18')` (heatstate root entry). */
      readonly M: QuantityLike<'molarMass'>;
      /**
       * NASA polynomial constants with T in K, below `T.mid` and from `T.mid` up: nine per interval
       * (a1..a7, b1, b2: the NASA Glenn form) or seven (the older 7-coefficient form).
       */
      readonly nasa: { readonly T: { readonly min: number; readonly mid: number; readonly max: number }; readonly low: readonly number[]; readonly high: readonly number[] };
      readonly source?: string;
    }
  | {
      readonly name: string;
      /** Formula, for display. */
      readonly formula?: string;
      /** Molar mass; from a formula with `molarMass('C8H18')` (heatstate root entry). */
      readonly M: QuantityLike<'molarMass'>;
      /** Constant specific heat (mass basis). h is measured from 0 at 298.15 K. */
      readonly cp: QuantityLike<'specificHeat'>;
      /** Valid range; default: any positive temperature. */
      readonly T?: { readonly min: QuantityLike<'temperature'>; readonly max: QuantityLike<'temperature'> };
      readonly source?: string;
    };

/**
 * An ideal gas (a species or a mixture) with its property functions. h and u depend on T only;
 * s on T and p. Inputs take quantities or unit text; pressures are absolute.
 *
 * Enthalpy conventions, stated plainly:
 * - `h(T)` is the **total** enthalpy: the enthalpy of formation at 298.15 K plus the sensible part.
 *   It is what energy balances with reactions need. Elements in their reference state (N2, O2, Ar) have h(298.15 K) = 0.
 * - `hSensible(T)` = h(T) − h(298.15 K): the sensible enthalpy, zero at 298.15 K for every gas.
 * - Differences (`deltaH`, `deltaU`) are the same either way; for a non-reacting process use them.
 */
export interface IdealGas<B extends Basis = 'mass'> extends GasTransportMethods {
  /** Name as catalogued or defined. */
  readonly name: string;
  /** Formula, when there is one. */
  readonly formula: string | undefined;
  /** `'mass'` or `'molar'`. */
  readonly basis: B;
  /** `'polynomial'` or `'constant-cp'`. */
  readonly model: 'polynomial' | 'constant-cp';
  /**
   * Where the data come from: title, authors, year, table, basis (`published`, `computed`,
   * `from memory`, `user`) and stated uncertainty, with a one-line `summary`.
   */
  readonly source: GasSource;
  /** Molar mass. */
  readonly M: Quantity<'molarMass'>;
  /** Gas constant: R̄/M on a mass basis, R̄ on a molar basis. */
  readonly R: Quantity<HeatCapacityDimension<B>>;
  /** Valid range: the data's temperatures; any positive pressure (the ideal-gas model itself has no pressure limit, but see the docs on when a gas stops being ideal). */
  readonly range: { readonly T: { readonly min: Quantity<'temperature'>; readonly max: Quantity<'temperature'> | undefined }; readonly p: { readonly min: Quantity<'pressure'>; readonly max: undefined } };
  /** The plain-number SI core, for hot loops and batch use. */
  readonly core: IdealGasModel;
  /** Whether temperatures outside the data are computed (and flagged) rather than refused. */
  readonly extrapolate: boolean;
  /** cp(T). */
  cp<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<HeatCapacityDimension<B>>;
  /** cv(T) = cp(T) − R. */
  cv<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<HeatCapacityDimension<B>>;
  /** k(T) = cp/cv, a plain number. */
  k<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): number;
  /** Total enthalpy h(T), including the enthalpy of formation at 298.15 K. */
  h<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<EnergyDimension<B>>;
  /** Sensible enthalpy h(T) − h(298.15 K). */
  hSensible<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<EnergyDimension<B>>;
  /** Internal energy u(T) = h(T) − R·T (total, like h). */
  u<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<EnergyDimension<B>>;
  /** Entropy s(T, p) = s°(T) − R ln(p/p°), p° = 100 kPa. For a mixture, includes the ideal entropy of mixing. */
  s<I extends LooseQuantity<'temperature'>, J extends LooseQuantity<'pressure'>>(T: QuantityInput<'temperature', I>, p: QuantityInput<'pressure', J>): Quantity<EntropyDimension<B>>;
  /** Standard-state entropy s°(T) at p° = 100 kPa. */
  sStandard<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<EntropyDimension<B>>;
  /** The full state from `{ T, p }`, `{ h, p }` or `{ s, p }`. */
  state<const P extends GasPair<B>>(pair: P & CheckedInputs<P, GasInputDimensions<B>>): GasStateResult<B>;
  /** Δh = h(state2) − h(state1); a state is a temperature, `{ T }`, or any pair of {@link IdealGas.state}. */
  deltaH<const P1 extends GasEnergyState<B>, const P2 extends GasEnergyState<B>>(state1: CheckedState<P1, GasInputDimensions<B>, 'temperature'>, state2: CheckedState<P2, GasInputDimensions<B>, 'temperature'>): Quantity<EnergyDimension<B>>;
  /** Δu = u(state2) − u(state1). */
  deltaU<const P1 extends GasEnergyState<B>, const P2 extends GasEnergyState<B>>(state1: CheckedState<P1, GasInputDimensions<B>, 'temperature'>, state2: CheckedState<P2, GasInputDimensions<B>, 'temperature'>): Quantity<EnergyDimension<B>>;
  /** Δs = s(state2) − s(state1), each state a pair of {@link IdealGas.state}. */
  deltaS<const P1 extends GasPair<B>, const P2 extends GasPair<B>>(state1: P1 & CheckedInputs<P1, GasInputDimensions<B>>, state2: P2 & CheckedInputs<P2, GasInputDimensions<B>>): Quantity<EntropyDimension<B>>;
  /** The same gas with cp frozen at `referenceT` (default 298.15 K): the cold-air-standard style estimate. */
  withConstantCp<I extends LooseQuantity<'temperature'>>(referenceT?: QuantityInput<'temperature', I>): IdealGas<B>;
  /**
   * The gas's SI solvers (T from h or s, isentropic end temperatures), for the process functions
   * and hot loops.
   */
  readonly solver: IdealGasSolver;
  /** The temperature bounds inputs are checked against (the data's, or any positive T when extrapolating). */
  readonly bounds: Bounds;
}


const GAS_PAIRS: readonly (readonly string[])[] = [['T', 'p'], ['h', 'p'], ['s', 'p']];
const ENERGY_PAIRS: readonly (readonly string[])[] = [['T'], ...GAS_PAIRS];

function wrap<B extends Basis>(built: Built, basis: B, extrapolate: boolean, transport: TransportSource): IdealGas<B> {
  const core = built.core;
  const molar = basis === 'molar';
  const scale = molar ? MOLAR_GAS_CONSTANT : core.R; // J/(mol·K) or J/(kg·K) per unit of cpR
  const hc = (molar ? 'molarHeatCapacity' : 'specificHeat') as HeatCapacityDimension<B>;
  const sd = (molar ? 'molarHeatCapacity' : 'specificEntropy') as EntropyDimension<B>;
  const en = (molar ? 'molarEnergy' : 'specificEnergy') as EnergyDimension<B>;
  const scope = `the data for ${built.name}`;
  const solver = new IdealGasSolver(core);
  const bounds: Bounds = extrapolate
    ? ABSOLUTE_TEMPERATURE
    : { min: core.Tmin, max: core.Tmax, scope, hint: '; pass { extrapolate: true } to compute outside it (results are then flagged)' };

  const outside = (T: number): boolean => T < core.Tmin || T > core.Tmax;
  /** Reads a temperature and checks it against the data's interval (unless extrapolating). */
  const temperature = (input: unknown, parameter = 'T', units?: CallUnits): number => readTemperature(input as QuantityLike<'temperature'>, parameter, bounds, units);
  /** A result, flagged as extrapolated when any of the temperatures it used lies outside the data. */
  const result = <D extends HeatCapacityDimension<B> | EnergyDimension<B> | EntropyDimension<B>>(si: number, dim: D, name: string, T1: number, T2 = T1): Quantity<D> => resultQuantity(si, dim, name, outside(T1) || outside(T2));
  const single = <D extends HeatCapacityDimension<B> | EnergyDimension<B> | EntropyDimension<B>>(f: (core: IdealGasModel, scale: number, T: number) => number, dim: D, name: string) => (input: unknown): Quantity<D> => {
    const T = temperature(input);
    return result(f(core, scale, T), dim, name, T);
  };
  /** T and p (p NaN when not given) of a state pair, solving T from h or s; `prefix` names the inputs in messages. */
  const resolve = (state: unknown, prefix: string, pairs: readonly (readonly string[])[]): [number, number] => {
    const fn = `${built.name} state${prefix === '' ? '' : ` ${prefix.replace(/\.$/, '')}`}`;
    if (typeof state === 'string' || state instanceof Quantity) {
      if (pairs === GAS_PAIRS) readPair(state, fn, pairs); // a temperature alone does not fix s
      return [temperature(state as QuantityLike<'temperature'>, prefix === '' ? 'T' : prefix.replace(/\.$/, '')), NaN];
    }
    const key = readPair(state, fn, pairs);
    const a = state as Record<string, unknown>;
    const units = new CallUnits();
    const p = key === 'T' ? NaN : readAbsolutePressure(a.p as QuantityLike<'pressure'>, `${prefix}p`, undefined, units);
    if (key === 'T' || key === 'T,p') return [temperature(a.T as QuantityLike<'temperature'>, `${prefix}T`, units), p];
    const isH = key === 'h,p';
    const value = readInput(a[isH ? 'h' : 's'] as QuantityLike<EnergyDimension<B> | EntropyDimension<B>>, isH ? en : sd, `${prefix}${isH ? 'h' : 's'}`, undefined, units);
    // per R̄ or R: h/R in K, s°/R at p° from s(T, p) = R (s°/R − ln(p/p°)), less the mixing term
    const target = isH ? value / scale : value / scale + Math.log(p / STANDARD_STATE_PRESSURE_PA);
    const status = isH ? solver.temperatureAtEnthalpy(target, 0.5 * (core.Tmin + Math.min(core.Tmax, 3000))) : solver.temperatureAtStandardEntropy(target, 0.5 * (core.Tmin + Math.min(core.Tmax, 3000)));
    if (status !== Status.ok) {
      const name = isH ? 'h' : 's';
      const lo = isH ? hOf(core, scale, core.Tmin) : sOf(core, scale, core.Tmin, p);
      const hi = isH ? hOf(core, scale, core.Tmax) : sOf(core, scale, core.Tmax, p);
      const dim = isH ? en : sd;
      throwForStatus(status, {
        what: `the temperature of ${built.name} from ${name}`,
        inputs: `${prefix}${name} = ${units.describe(value, dim, molar ? (isH ? 'J/mol' : 'J/(mol·K)') : isH ? 'J/kg' : 'J/(kg·K)')}`,
        range: () => rangeError(`${prefix}${name}`, value, dim, { min: lo, max: hi, scope: `${scope} (${core.Tmin} to ${core.Tmax} K${isH ? '' : ' at this pressure'})` }, units),
        iterations: solver.result.iterations,
      });
    }
    return [solver.result.x, p];
  };
  const gas: IdealGas<B> = {
    name: built.name,
    formula: built.formula,
    basis,
    model: built.model,
    source: built.source,
    M: Quantity.fromSI(core.M, 'molarMass', 'g/mol'),
    R: Quantity.fromSI(scale, hc),
    range: { T: { min: Quantity.fromSI(core.Tmin, 'temperature'), max: Number.isFinite(core.Tmax) ? Quantity.fromSI(core.Tmax, 'temperature') : undefined }, p: { min: Quantity.fromSI(Number.MIN_VALUE, 'pressure'), max: undefined } },
    core,
    extrapolate,
    solver,
    bounds,
    ...transportMethods(transport, core, built.name),
    cp: single(cpOf, hc, 'cp'),
    cv: single(cvOf, hc, 'cv'),
    k: (T) => kOf(core, temperature(T)),
    h: single(hOf, en, 'h'),
    hSensible: single(hSensibleOf, en, 'hSensible'),
    u: single(uOf, en, 'u'),
    s: (T, p) => {
      const units = new CallUnits();
      const t = temperature(T, 'T', units);
      return result(sOf(core, scale, t, readAbsolutePressure(p, 'p', undefined, units)), sd, 's', t);
    },
    sStandard: single(sStandardOf, sd, 'sStandard'),
    state: (pair) => {
      const [T, p] = resolve(pair, '', GAS_PAIRS);
      const flag = outside(T);
      return withGasTransport({
        T: resultQuantity(T, 'temperature', 'T', flag),
        p: resultQuantity(p, 'pressure', 'p'),
        v: resultQuantity((core.R * T) / p, 'specificVolume', 'v', flag),
        rho: resultQuantity(p / (core.R * T), 'density', 'rho', flag),
        cp: result(cpOf(core, scale, T), hc, 'cp', T),
        cv: result(cvOf(core, scale, T), hc, 'cv', T),
        k: kOf(core, T),
        h: result(hOf(core, scale, T), en, 'h', T),
        hSensible: result(hSensibleOf(core, scale, T), en, 'hSensible', T),
        u: result(uOf(core, scale, T), en, 'u', T),
        s: result(sOf(core, scale, T, p), sd, 's', T),
        extrapolated: flag,
      }, transport.model, core, T, p / (core.R * T));
    },
    deltaH: (state1, state2) => {
      const [a] = resolve(state1, 'state1.', ENERGY_PAIRS);
      const [b] = resolve(state2, 'state2.', ENERGY_PAIRS);
      return result(hOf(core, scale, b) - hOf(core, scale, a), en, 'deltaH', a, b);
    },
    deltaU: (state1, state2) => {
      const [a] = resolve(state1, 'state1.', ENERGY_PAIRS);
      const [b] = resolve(state2, 'state2.', ENERGY_PAIRS);
      return result(uOf(core, scale, b) - uOf(core, scale, a), en, 'deltaU', a, b);
    },
    deltaS: (state1, state2) => {
      const [a, p1] = resolve(state1, 'state1.', GAS_PAIRS);
      const [b, p2] = resolve(state2, 'state2.', GAS_PAIRS);
      return result(scale * (core.sR(b) - core.sR(a) - Math.log(p2 / p1)), sd, 'deltaS', a, b);
    },
    withConstantCp: (referenceT) => {
      const T0 = referenceT === undefined ? REFERENCE_TEMPERATURE_K : temperature(referenceT, 'referenceT');
      return wrap({ ...built, core: constantCpFrom(core, T0), model: 'constant-cp' }, basis, extrapolate, transport);
    },
  };
  return gas;
}

/**
 * An ideal gas from the built-in species data (by formula or common name) or from your own definition.
 *
 * Models: NASA polynomials (two intervals, 200–1000–6000 K), or a
 * constant cp (`{ model: 'constant-cp' }` freezes cp at 298.15 K or `referenceT`; `{ cp }` sets it).
 * cv = cp − R, k = cp/cv, h and u depend on T only, s(T, p) = s°(T) − R ln(p/p°) with p° = 100 kPa.
 * Mass basis by default; `{ basis: 'molar' }` for per-mole values.
 *
 * Species: N2, O2, Ar, He, Ne, H2, CO, CO2, H2O, CH4, C2H6, C3H8, n-C4H10, C2H4, C2H2, NH3, NO, NO2,
 * N2O, SO2, H2S (to 1000 K), O3, OH, H, O, N, and dry air as one pseudo-species (`"air"`);
 * see {@link dryAir} for air as a defined mixture. Dilute-gas transport (`viscosity`, `thermalConductivity`,
 * `prandtl`, and `mu`, `lambda`, `nu`, `alpha`, `Pr` on states) for the species in data/ideal-gas/transport.json.
 *
 * @throws {@link UnknownNameError} unknown species, with the closest names
 * @throws {@link OutOfRangeError} temperatures outside the data (unless `extrapolate`), p ≤ 0
 * @throws {@link DefinitionError} an invalid user definition
 * @example
 * ```ts
 * const air = idealGas('air');
 * air.cp('300 K').in('kJ/(kg·K)');     //=> 1.0049...
 * air.k('300 K');                      //=> 1.3998...
 * idealGas('nitrogen').deltaH('300 K', '1000 K').in('Btu/lbm');  //=> 328.5...
 * idealGas('CO2', { basis: 'molar' }).h('298.15 K').in('kJ/mol');  //=> -393.5... (formation)
 * idealGas('N2').cp('7000 K');   // throws OutOfRangeError: T = 7000 K is above the upper limit of the data for N2 (6000 K); valid range 200 to 6000 K
 * ```
 */
export function idealGas(nameOrDefinition: string | IdealGasDefinition, options?: IdealGasOptions<'mass'>): IdealGas<'mass'>;
export function idealGas(nameOrDefinition: string | IdealGasDefinition, options: IdealGasOptions<'molar'> & { readonly basis: 'molar' }): IdealGas<'molar'>;
export function idealGas(nameOrDefinition: string | IdealGasDefinition, options?: IdealGasOptions): IdealGas<Basis> {
  const o = readGasOptions(options, 'options', GAS_OPTIONS);
  let built: Built;
  if (typeof nameOrDefinition === 'string') {
    const { record, model } = speciesModel(nameOrDefinition);
    built = { name: record.id, formula: record.formula, source: { ...record.provenance, summary: `${record.source}${record.note ? `; ${record.note}` : ''}` }, core: model, model: 'polynomial' };
  } else {
    built = fromDefinition(nameOrDefinition);
  }
  const transport = typeof nameOrDefinition === 'string' ? speciesTransport(built.name) : noTransport(built.name);
  return wrap(applyOptions(built, o), o.basis ?? 'mass', o.extrapolate === true, transport);
}

const GAS_OPTIONS = ['basis', 'model', 'referenceT', 'cp', 'extrapolate'] as const;
const MIXTURE_OPTIONS = [...GAS_OPTIONS, 'fractions', 'normalize', 'name'] as const;

/** Checks the options object: known keys, and each value of its kind (unknown values refused with the valid ones). */
function readGasOptions(options: unknown, parameter: string, known: readonly string[]): MixtureOptions {
  const o = readOptions<MixtureOptions>(options, parameter, known);
  return {
    ...o,
    basis: readChoice<Basis>(o.basis, `${parameter}.basis`, ['mass', 'molar'], 'mass'),
    model: readChoice<'polynomial' | 'constant-cp'>(o.model, `${parameter}.model`, ['polynomial', 'constant-cp'], 'polynomial'),
    extrapolate: readFlag(o.extrapolate, `${parameter}.extrapolate`),
    fractions: readChoice<'mole' | 'mass'>(o.fractions, `${parameter}.fractions`, ['mole', 'mass'], 'mole'),
    normalize: readFlag(o.normalize, `${parameter}.normalize`),
    ...(o.name === undefined ? {} : { name: readName(o.name, `${parameter}.name`) }),
  };
}

function readName(name: unknown, parameter: string): string {
  if (typeof name === 'string' && name.trim() !== '') return name;
  throw new InvalidInputError('input.invalid', parameter, `${parameter} must be a non-empty string; got ${describeValue(name)}`);
}

/** Composition: species name or formula → fraction. */
export type Composition = Readonly<Record<string, number>>;

/** Options of {@link mixture}. */
export interface MixtureOptions<B extends Basis = Basis> extends IdealGasOptions<B> {
  /** Whether the fractions are mole (default) or mass fractions. */
  readonly fractions?: 'mole' | 'mass';
  /** Scale fractions that do not sum to 1 instead of throwing. */
  readonly normalize?: boolean;
  /** A name for the mixture (default: its composition). */
  readonly name?: string;
}

function checkFractions(composition: Composition, normalize: boolean): [string[], number[]] {
  return readFractions(composition, 'composition', normalize);
}

/**
 * Converts mole fractions to mass fractions: wᵢ = yᵢ Mᵢ / Σ yⱼ Mⱼ. Keys are species names or formulas.
 * @example
 * ```ts
 * moleToMassFractions({ N2: 0.79, O2: 0.21 }); //=> { N2: 0.7671..., O2: 0.2329... }
 * ```
 */
export function moleToMassFractions(composition: Composition, options?: { readonly normalize?: boolean }): Record<string, number> {
  const o = readOptions<{ normalize?: boolean }>(options, 'options', ['normalize']);
  const [names, y] = checkFractions(composition, readFlag(o.normalize, 'options.normalize'));
  const M = names.map((n) => speciesModel(n).model.M);
  const total = y.reduce((acc, yi, i) => acc + yi * M[i]!, 0);
  return Object.fromEntries(names.map((n, i) => [n, (y[i]! * M[i]!) / total]));
}

/**
 * Converts mass fractions to mole fractions: yᵢ = (wᵢ/Mᵢ) / Σ (wⱼ/Mⱼ).
 * @example
 * ```ts
 * massToMoleFractions({ N2: 0.767, O2: 0.233 });   //=> { N2: 0.7899…, O2: 0.2101… }
 * ```
 */
export function massToMoleFractions(composition: Composition, options?: { readonly normalize?: boolean }): Record<string, number> {
  const o = readOptions<{ normalize?: boolean }>(options, 'options', ['normalize']);
  const [names, w] = checkFractions(composition, readFlag(o.normalize, 'options.normalize'));
  const M = names.map((n) => speciesModel(n).model.M);
  const total = w.reduce((acc, wi, i) => acc + wi / M[i]!, 0);
  return Object.fromEntries(names.map((n, i) => [n, w[i]! / M[i]! / total]));
}

/**
 * An ideal-gas mixture that behaves like a gas (same interface as {@link idealGas}). Per mole of
 * mixture, cp = Σ yᵢ cpᵢ and h = Σ yᵢ hᵢ; s includes the ideal entropy of mixing −R̄ Σ yᵢ ln yᵢ.
 * The valid range is the overlap of the components' ranges.
 *
 * @param composition species name or formula → fraction, summing to 1 within 1e-6
 * @param options `fractions: 'mole' | 'mass'` (default mole), `normalize`, and the {@link IdealGasOptions}
 * @throws {@link OutOfRangeError} fractions that do not sum to 1 (unless `normalize`)
 * @throws {@link UnknownNameError} an unknown component
 * @example
 * ```ts
 * const flue = mixture({ N2: 0.72, CO2: 0.09, H2O: 0.17, O2: 0.02 });
 * flue.cp('600 K').in('kJ/(kg·K)');   //=> 1.1768...
 * mixture({ N2: 0.8, O2: 0.3 });      // throws OutOfRangeError: fractions sum to 1.1
 * ```
 */
export function mixture(composition: Composition, options?: MixtureOptions<'mass'>): IdealGas<'mass'>;
export function mixture(composition: Composition, options: MixtureOptions<'molar'> & { readonly basis: 'molar' }): IdealGas<'molar'>;
export function mixture(composition: Composition, options?: MixtureOptions): IdealGas<Basis> {
  options = readGasOptions(options, 'options', MIXTURE_OPTIONS);
  const normalize = options.normalize === true;
  const moleFractions = options?.fractions === 'mass' ? massToMoleFractions(composition, { normalize }) : Object.fromEntries(zip(...checkFractions(composition, normalize)));
  const names = Object.keys(moleFractions);
  const y = names.map((n) => moleFractions[n]!);
  const parts = names.map((n) => speciesModel(n).model);
  const core = mixNasa(parts, y) ?? new MixtureModel(parts, y);
  const name = options?.name ?? names.map((n, i) => `${n} ${Number((y[i]! * 100).toPrecision(4))}%`).join(', ');
  const ids = names.map((n) => speciesModel(n).record.id);
  const summary = `ideal mixture of ${ids.join(', ')}`;
  const built: Built = { name, formula: undefined, source: { title: summary, basis: 'computed', uncertainty: 'estimate: that of its components (ideal mixing adds none)', summary }, core, model: 'polynomial' };
  return wrap(applyOptions(built, options), options?.basis ?? 'mass', options?.extrapolate === true, mixtureTransport(ids, y));
}

function zip(names: string[], values: number[]): [string, number][] {
  return names.map((n, i) => [n, values[i]!]);
}

/** Dry air by mole fraction: N2 78.08 %, O2 20.95 %, Ar 0.93 %, CO2 0.04 % (common practice; sums to 1). */
export const DRY_AIR_MOLE_FRACTIONS: Composition = Object.freeze({ N2: 0.7808, O2: 0.2095, Ar: 0.0093, CO2: 0.0004 });

/**
 * Dry air as a defined mixture of N2, O2, Ar and CO2 ({@link DRY_AIR_MOLE_FRACTIONS}).
 * Compare `idealGas('air')`, the same air as one pseudo-species.
 * @example
 * ```ts
 * dryAir().M.in('g/mol');   //=> 28.966
 * ```
 */
export function dryAir(options?: IdealGasOptions<'mass'>): IdealGas<'mass'> {
  return mixture(DRY_AIR_MOLE_FRACTIONS, { ...options, name: 'dry air (mixture)' });
}
