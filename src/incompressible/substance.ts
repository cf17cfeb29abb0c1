/**
 * The incompressible facade: a substance object over the SI core (model.ts), built from the facade
 * kit. This file is the worked example of docs/guide/adding-a-model.md: readers with the model's
 * bounds, results through the result builder, a `state(pair)` with the one result shape, and the
 * energy differences between two states with the same signature as every other model.
 *
 * @module
 */
import { STANDARD_ATMOSPHERE_PA } from '../chem/constants.js';
import { CallUnits } from '../core/call-units.js';
import { ABSOLUTE_TEMPERATURE, readAbsolutePressure, readPair, readTemperature, type Bounds } from '../core/read.js';
import { resultQuantity } from '../core/result.js';
import { UnavailablePropertyError } from '../errors.js';
import { Quantity, type QuantityInput, type QuantityLike } from '../units/quantity.js';
import type { CheckedInputs, CheckedState, LooseQuantity } from '../core/inputs.js';
import type { CompiledSubstance, SubstanceSource } from './compile.js';
import { densityAt, enthalpyChange, entropyChange, heatCapacityAt, internalEnergyChange, type IncompressibleModel } from './model.js';
import type { IncompressibleDefinition } from './schema.js';
import type { CompiledTransport } from './transport-data.js';
import { curveValue, iapwsLiquidWater, LiquidWaterTransportWork, type PropertyCurve } from './transport.js';
import { Status } from '../core/status.js';
import { LiquidStateRecord, SolidStateRecord, type IncompressibleStateFields, type TransportReader } from './state-record.js';

/** A state of an incompressible substance: temperature and (absolute) pressure. */
export interface IncompressibleState {
  readonly T: LooseQuantity<'temperature'>;
  readonly p: LooseQuantity<'pressure'>;
}

/** The dimension of each input name of an incompressible state. */
export interface IncompressibleInputDimensions {
  T: 'temperature';
  p: 'pressure';
}

/** A state for `deltaU` and `deltaS`, which depend on T only: a temperature, `{ T }` or `{ T, p }`. */
export type IncompressibleThermalState = LooseQuantity<'temperature'> | { readonly T: LooseQuantity<'temperature'>; readonly p?: LooseQuantity<'pressure'> };

/** A state as `substance.state` returns it. u, h and s are measured from the substance's reference state. */
export interface IncompressibleStateResult {
  readonly T: Quantity<'temperature'>;
  readonly p: Quantity<'pressure'>;
  /** c = cp = cv. */
  readonly c: Quantity<'specificHeat'>;
  readonly cp: Quantity<'specificHeat'>;
  readonly cv: Quantity<'specificHeat'>;
  readonly rho: Quantity<'density'>;
  readonly v: Quantity<'specificVolume'>;
  /** u − u_ref = ∫c dT from the reference temperature. */
  readonly u: Quantity<'specificEnergy'>;
  /**
   * h − h_ref = ∫c dT + v(T)·(p − p_ref) from the reference state (T_ref, p_ref = 1 atm): for constant
   * density (u − u_ref) + v·(p − p_ref); with ρ(T), a function of the state whose (∂h/∂T)_p is c at
   * p_ref (model.ts explains why it is not u + p·v there).
   */
  readonly h: Quantity<'specificEnergy'>;
  /** s − s_ref = ∫c/T dT from the reference temperature. */
  readonly s: Quantity<'specificEntropy'>;
  /**
   * Dynamic viscosity μ(T), liquids only (solids have no such key). `undefined` where the data do not
   * cover T or leave μ out ({@link IncompressibleSubstance.viscosity} throws and says why). Computed on
   * first read, like every transport value here: they are getters, in the state's JSON but not in
   * `{ ...state }` or `Object.keys(state)`.
   */
  readonly mu?: Quantity<'dynamicViscosity'> | undefined;
  /** Thermal conductivity λ(T); `undefined` as for `mu`. */
  readonly lambda: Quantity<'thermalConductivity'> | undefined;
  /** Prandtl number μ·c/λ, liquids only. */
  readonly Pr?: number | undefined;
  /** Kinematic viscosity ν = μ/ρ, liquids only. */
  readonly nu?: Quantity<'kinematicViscosity'> | undefined;
  /** Thermal diffusivity α = λ/(ρ·c). */
  readonly alpha: Quantity<'thermalDiffusivity'> | undefined;
}

/** An incompressible liquid or solid, with its property functions. Inputs take quantities or unit text. */
export interface IncompressibleSubstance {
  /** The substance's name as catalogued or defined. */
  readonly name: string;
  /** `'liquid'` or `'solid'` (the definition's `state`). */
  readonly phase: 'liquid' | 'solid';
  /** The definition it was built from. */
  readonly definition: IncompressibleDefinition;
  /** Where the numbers come from, their basis and their stated uncertainty. */
  readonly source: SubstanceSource;
  /** Valid range: the data's temperatures; any positive pressure. */
  readonly range: { readonly T: { readonly min: Quantity<'temperature'>; readonly max: Quantity<'temperature'> }; readonly p: { readonly min: Quantity<'pressure'>; readonly max: undefined } };
  /**
   * The reference state of `state(…)`'s u, h and s (u = h = s = 0 there): 25 °C (or the nearest end
   * of the range) at one standard atmosphere.
   */
  readonly reference: { readonly T: Quantity<'temperature'>; readonly p: Quantity<'pressure'> };
  /** Density ρ at the reference temperature (for liquids with ρ(T), `state({ T, p }).rho` or {@link IncompressibleSubstance.density} gives it at T). */
  readonly rho: Quantity<'density'>;
  /** Specific volume v = 1/ρ at the reference temperature. */
  readonly v: Quantity<'specificVolume'>;
  /** ρ(T): constant for solids and for liquids given with one density, tabulated otherwise. */
  density<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<'density'>;
  /** The plain-number SI core. */
  readonly core: IncompressibleModel;
  /** Whether temperatures outside the data are computed (by extending its end piece, flagged) rather than refused. */
  readonly extrapolate: boolean;
  /**
   * Dynamic viscosity μ(T) of a liquid, from the data named in `transportSource.viscosity` (liquid
   * water: IAPWS R12-08 at the IF97 saturated-liquid density).
   * @throws {@link OutOfRangeError} outside the viscosity data's range (in the caller's units)
   * @throws {@link UnavailablePropertyError} for a solid, or a liquid whose viscosity the data leave out, naming why
   * @example
   * ```ts
   * incompressible('water').viscosity('25 °C').in('mPa·s');   //=> 0.8900 (IAPWS R12-08)
   * incompressible('engine oil').viscosity('300 K').in('Pa·s');   //=> 0.486 (a tabulated node)
   * incompressible('engine oil').viscosity('500 K');   // throws OutOfRangeError: T = 500 K is above the upper limit of the data for engine oil (430 K)
   * incompressible('ethanol').viscosity('20 °C');   // throws UnavailablePropertyError: ethanol has no viscosity data
   * ```
   */
  viscosity<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<'dynamicViscosity'>;
  /**
   * Thermal conductivity λ(T), from the data named in `transportSource.thermalConductivity` (liquid
   * water: IAPWS R15-11 at the IF97 saturated-liquid density).
   * @throws {@link OutOfRangeError} outside the conductivity data's range
   * @throws {@link UnavailablePropertyError} where the data leave λ out, naming why
   * @example
   * ```ts
   * incompressible('copper').thermalConductivity('300 K').in('W/(m·K)');   //=> 401
   * incompressible('water').thermalConductivity('100 °C').in('W/(m·K)');   //=> 0.6772 (IAPWS R15-11)
   * incompressible('copper').thermalConductivity('1300 K');   // throws OutOfRangeError: … above the upper limit of the thermal conductivity data for copper (1200 K)
   * ```
   */
  thermalConductivity<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<'thermalConductivity'>;
  /** Source, basis and uncertainty of the viscosity and the thermal conductivity, each where there are data. */
  readonly transportSource: CompiledTransport['sources'];
  /** Specific heat c(T) (= cp = cv). Throws {@link OutOfRangeError} outside the range. */
  c<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<'specificHeat'>;
  /** Same as {@link IncompressibleSubstance.c}: for an incompressible substance cp = c. */
  cp<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<'specificHeat'>;
  /** Same as {@link IncompressibleSubstance.c}: for an incompressible substance cv = c. */
  cv<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<'specificHeat'>;
  /** Mean specific heat between two temperatures, Δu/ΔT (c(T1) when T1 = T2). */
  averageC<I extends LooseQuantity<'temperature'>, J extends LooseQuantity<'temperature'>>(T1: QuantityInput<'temperature', I>, T2: QuantityInput<'temperature', J>): Quantity<'specificHeat'>;
  /** The state at `{ T, p }`. */
  state<const P extends IncompressibleState>(pair: P & CheckedInputs<P, IncompressibleInputDimensions>): IncompressibleStateResult;
  /** Δu = ∫c dT from state 1 to state 2 (a temperature, `{ T }` or `{ T, p }` each). */
  deltaU<const P1 extends IncompressibleThermalState, const P2 extends IncompressibleThermalState>(state1: CheckedState<P1, IncompressibleInputDimensions, 'temperature'>, state2: CheckedState<P2, IncompressibleInputDimensions, 'temperature'>): Quantity<'specificEnergy'>;
  /** Δs = ∫c/T dT from state 1 to state 2. */
  deltaS<const P1 extends IncompressibleThermalState, const P2 extends IncompressibleThermalState>(state1: CheckedState<P1, IncompressibleInputDimensions, 'temperature'>, state2: CheckedState<P2, IncompressibleInputDimensions, 'temperature'>): Quantity<'specificEntropy'>;
  /**
   * Δh = ∫c dT + v(T2)·(p2 − p_ref) − v(T1)·(p1 − p_ref) between two states `{ T, p }`, p_ref = 1 atm
   * (Δu + v·(p2 − p1) for constant density): exactly `state(2).h − state(1).h`. Pressures are absolute.
   */
  deltaH<const P1 extends IncompressibleState, const P2 extends IncompressibleState>(state1: P1 & CheckedInputs<P1, IncompressibleInputDimensions>, state2: P2 & CheckedInputs<P2, IncompressibleInputDimensions>): Quantity<'specificEnergy'>;
}

/** The facade object of a compiled substance. */
export function substanceFacade(compiled: CompiledSubstance, extrapolate = false): IncompressibleSubstance {
  const { definition, model } = compiled;
  const name = definition.name;
  const hint = `${definition.rangeNote === undefined ? '' : `; ${definition.rangeNote}`}; pass { extrapolate: true } to compute outside it (results are then flagged)`;
  const bounds: Bounds = extrapolate ? ABSOLUTE_TEMPERATURE : { min: model.Tmin, max: model.Tmax, scope: `the data for ${name}`, hint };
  /** Whether any of the temperatures lies outside the data (so the result is an extrapolation). */
  const outside = (...Ts: number[]): boolean => Ts.some((T) => T < model.Tmin || T > model.Tmax);
  const temperature = (input: unknown, parameter: string, units?: CallUnits): number => readTemperature(input, parameter, bounds, units);
  /** T (and p, NaN when not given) of a state; `prefix` names its inputs. */
  const resolve = (state: unknown, prefix: string, needP: boolean): [number, number] => {
    const units = new CallUnits();
    if (!needP && (typeof state === 'string' || state instanceof Quantity)) return [temperature(state as QuantityLike<'temperature'>, prefix === '' ? 'T' : prefix.slice(0, -1), units), NaN];
    const key = readPair(state, `${name} ${prefix === '' ? 'state' : prefix.slice(0, -1)}`, needP ? [['T', 'p']] : [['T'], ['T', 'p']]);
    const a = state as Record<string, unknown>;
    const T = temperature(a.T as QuantityLike<'temperature'>, `${prefix}T`, units);
    const p = key === 'T' ? NaN : readAbsolutePressure(a.p as QuantityLike<'pressure'>, `${prefix}p`, undefined, units);
    return [T, p];
  };
  const Tref = Math.min(model.Tmax, Math.max(model.Tmin, 298.15));
  const pRef = STANDARD_ATMOSPHERE_PA;
  const { transport } = compiled;
  let waterWork: LiquidWaterTransportWork | undefined;
  /** The bounds of a transport property: its data's range within the substance's (both lifted by `extrapolate`, except IAPWS water's). */
  const curveBounds = (curve: PropertyCurve, what: string): Bounds => {
    if (extrapolate && curve.form !== 'iapws') return ABSOLUTE_TEMPERATURE;
    const lo = extrapolate ? curve.Tmin : Math.max(model.Tmin, curve.Tmin);
    const hi = extrapolate ? curve.Tmax : Math.min(model.Tmax, curve.Tmax);
    const own = lo > model.Tmin || hi < model.Tmax;
    return { min: lo, max: hi, scope: own ? `the ${what} data for ${name}` : `the data for ${name}`, hint: curve.form === 'iapws' ? `; ${definition.rangeNote ?? 'the formulation is evaluated on the saturated liquid only'}` : hint };
  };
  /** The SI value of a curve at T (in its bounds), NaN where it has none. */
  const curveAt = (curve: PropertyCurve, T: number): number => {
    if (curve.form === 'none') return NaN;
    if (curve.form !== 'iapws') return curveValue(curve, T);
    const work = (waterWork ??= new LiquidWaterTransportWork());
    const key = curve === transport.viscosity ? 'viscosity' : 'conductivity';
    if (iapwsLiquidWater(T, key, work) !== Status.ok) return NaN;
    return key === 'viscosity' ? work.mu.mu : work.lambda.lambda;
  };
  const inCurve = (curve: PropertyCurve, T: number, what: string): boolean => {
    if (curve.form === 'none') return false;
    const b = curveBounds(curve, what);
    return T >= b.min && T <= b.max;
  };
  const flagged = (curve: PropertyCurve, T: number): boolean => outside(T) || T < curve.Tmin || T > curve.Tmax;
  /** μ or λ at T for the property functions: throws for missing data or T outside the data. */
  const transportValue = (key: 'viscosity' | 'thermalConductivity', input: unknown) => {
    const curve = transport[key];
    const what = key === 'viscosity' ? 'viscosity' : 'thermal conductivity';
    if (curve.form === 'none' || (key === 'viscosity' && definition.state === 'solid')) {
      throw new UnavailablePropertyError(name, what, definition.state === 'solid' && key === 'viscosity' ? `${name} is a solid` : curve.reason);
    }
    const T = readTemperature(input, 'T', curveBounds(curve, what), new CallUnits());
    return [curveAt(curve, T), flagged(curve, T)] as const;
  };
  /** The transport values of the states (NaN where the data have none at T). */
  const reader: TransportReader = {
    mu: (T) => (inCurve(transport.viscosity, T, 'viscosity') ? curveAt(transport.viscosity, T) : NaN),
    lambda: (T) => (inCurve(transport.thermalConductivity, T, 'thermal conductivity') ? curveAt(transport.thermalConductivity, T) : NaN),
    muOutside: (T) => flagged(transport.viscosity, T),
    lambdaOutside: (T) => flagged(transport.thermalConductivity, T),
  };
  const Record_ = definition.state === 'liquid' ? LiquidStateRecord : SolidStateRecord;
  const c = (T: unknown): Quantity<'specificHeat'> => {
    const t = temperature(T, 'T');
    return resultQuantity(heatCapacityAt(model, t), 'specificHeat', 'c', outside(t));
  };
  return {
    name,
    phase: definition.state,
    definition,
    source: compiled.provenance,
    core: model,
    extrapolate,
    range: { T: { min: Quantity.fromSI(model.Tmin, 'temperature'), max: Quantity.fromSI(model.Tmax, 'temperature') }, p: { min: Quantity.fromSI(Number.MIN_VALUE, 'pressure'), max: undefined } },
    reference: { T: Quantity.fromSI(Tref, 'temperature'), p: Quantity.fromSI(pRef, 'pressure') },
    rho: Quantity.fromSI(1 / model.v, 'density'),
    v: Quantity.fromSI(model.v, 'specificVolume'),
    c,
    cp: c,
    cv: c,
    transportSource: transport.sources,
    viscosity(T) {
      const [v, x] = transportValue('viscosity', T);
      return resultQuantity(v, 'dynamicViscosity', 'mu', x);
    },
    thermalConductivity(T) {
      const [v, x] = transportValue('thermalConductivity', T);
      return resultQuantity(v, 'thermalConductivity', 'lambda', x);
    },
    density: (T) => {
      const t = temperature(T, 'T');
      return resultQuantity(densityAt(model, t), 'density', 'rho', outside(t));
    },
    averageC(T1, T2) {
      const units = new CallUnits();
      const a = temperature(T1, 'T1', units);
      const b = temperature(T2, 'T2', units);
      return resultQuantity(a === b ? heatCapacityAt(model, a) : internalEnergyChange(model, a, b) / (b - a), 'specificHeat', 'averageC', outside(a, b));
    },
    state(pair) {
      const [T, p] = resolve(pair, '', true);
      const cT = heatCapacityAt(model, T);
      const rhoT = densityAt(model, T);
      const x = outside(T);
      const result: IncompressibleStateFields = {
        T: resultQuantity(T, 'temperature', 'T'),
        p: resultQuantity(p, 'pressure', 'p'),
        c: resultQuantity(cT, 'specificHeat', 'c', x),
        cp: resultQuantity(cT, 'specificHeat', 'cp', x),
        cv: resultQuantity(cT, 'specificHeat', 'cv', x),
        rho: resultQuantity(rhoT, 'density', 'rho', x),
        v: resultQuantity(1 / rhoT, 'specificVolume', 'v', x),
        u: resultQuantity(internalEnergyChange(model, Tref, T), 'specificEnergy', 'u', x),
        h: resultQuantity(enthalpyChange(model, Tref, pRef, T, p), 'specificEnergy', 'h', x),
        s: resultQuantity(entropyChange(model, Tref, T), 'specificEntropy', 's', x),
      };
      return new Record_(result, reader, T, cT, rhoT);
    },
    deltaU(state1, state2) {
      const [a] = resolve(state1, 'state1.', false);
      const [b] = resolve(state2, 'state2.', false);
      return resultQuantity(internalEnergyChange(model, a, b), 'specificEnergy', 'deltaU', outside(a, b));
    },
    deltaS(state1, state2) {
      const [a] = resolve(state1, 'state1.', false);
      const [b] = resolve(state2, 'state2.', false);
      return resultQuantity(entropyChange(model, a, b), 'specificEntropy', 'deltaS', outside(a, b));
    },
    deltaH(state1, state2) {
      const [T1, p1] = resolve(state1, 'state1.', true);
      const [T2, p2] = resolve(state2, 'state2.', true);
      return resultQuantity(enthalpyChange(model, T1, p1, T2, p2), 'specificEnergy', 'deltaH', outside(T1, T2));
    },
  };
}
