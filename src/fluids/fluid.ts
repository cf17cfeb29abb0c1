/**
 * The real-fluid facade: `fluid(name)` gives a fluid of the catalogue with `.state(pair)`,
 * `.saturation({ T } | { p })`, `.deltaH/.deltaU/.deltaS` between two states, `.range`,
 * `.critical`, `.triple` and `.source`, on the Helmholtz-energy SI core. Built from the facade kit
 * (src/core): inputs read with bounds in the caller's units (SI in parentheses), core statuses
 * mapped to typed errors with numeric bounds, results built as quantities.
 *
 * @module
 */
import { CallUnits } from '../core/call-units.js';
import { throwForStatus } from '../core/fail.js';
import { rangeError, readAbsolutePressure, readInput, readPair, readQuality, readTemperature, type Bounds } from '../core/read.js';
import { optionalQuantity, resultQuantity } from '../core/result.js';
import { Status, type StatusCode } from '../core/status.js';
import { InvalidInputError, UnknownNameError, type OutOfRangeError } from '../errors.js';
import { closestNames, normaliseName } from '../lookup.js';
import type { Dimension } from '../units/dimensions.js';
import { Quantity, type QuantityInput, type QuantityLike } from '../units/quantity.js';
import { FLUID_NAMES, fluidDefinition, fluidModel } from './catalogue.js';
import type { FluidSource } from './definition.js';
import { stateFromHS, stateFromPH, stateFromPS, stateFromPT, stateFromPX, stateFromTRho, stateFromTX } from './flash.js';
import { FLUID_PHASE, FluidContext, FluidState, type FluidModel } from './model.js';
import { saturationAtP, saturationAtT } from './saturation.js';

/** The phase of a state. */
export type FluidPhase = 'liquid' | 'vapor' | 'two-phase' | 'supercritical';
const PHASES: readonly FluidPhase[] = ['liquid', 'vapor', 'two-phase', 'supercritical'];

/** A state of a real fluid, as `fluid(name).state` returns it. */
export interface FluidStateResult {
  /** Temperature. */
  readonly T: Quantity<'temperature'>;
  /** Pressure (absolute). */
  readonly p: Quantity<'pressure'>;
  /** `'liquid'`, `'vapor'`, `'two-phase'` or `'supercritical'` (T ≥ T_c and p ≥ p_c). */
  readonly phase: FluidPhase;
  /** Quality (vapour mass fraction) in two-phase states; `undefined` otherwise. */
  readonly x: number | undefined;
  /** Density. */
  readonly rho: Quantity<'density'>;
  /** Specific volume. */
  readonly v: Quantity<'specificVolume'>;
  /** Specific internal energy (the reference state of the fluid's equation). */
  readonly u: Quantity<'specificEnergy'>;
  /** Specific enthalpy. */
  readonly h: Quantity<'specificEnergy'>;
  /** Specific entropy. */
  readonly s: Quantity<'specificEntropy'>;
  /** Isobaric heat capacity; `undefined` in two-phase states, where it is not defined. */
  readonly cp: Quantity<'specificHeat'> | undefined;
  /** Isochoric heat capacity; `undefined` in two-phase states. */
  readonly cv: Quantity<'specificHeat'> | undefined;
  /** Speed of sound; `undefined` in two-phase states. */
  readonly w: Quantity<'velocity'> | undefined;
  /** k = cp/cv; `undefined` in two-phase states. */
  readonly k: number | undefined;
  /** Joule–Thomson coefficient (∂T/∂p)_h in K/Pa (a plain number); `undefined` in two-phase states. */
  readonly jouleThomson: number | undefined;
  /** Saturation temperature at this pressure; `undefined` outside the triple-point to critical pressure. */
  readonly Tsat: Quantity<'temperature'> | undefined;
  /** T − T_sat(p) of a vapour below the critical pressure; `undefined` otherwise. */
  readonly superheat: Quantity<'temperatureDifference'> | undefined;
  /** T_sat(p) − T of a liquid below the critical pressure; `undefined` otherwise. */
  readonly subcooling: Quantity<'temperatureDifference'> | undefined;
}

/** Properties of one saturated phase. */
export interface FluidSaturatedPhase {
  readonly v: Quantity<'specificVolume'>;
  readonly rho: Quantity<'density'>;
  readonly u: Quantity<'specificEnergy'>;
  readonly h: Quantity<'specificEnergy'>;
  readonly s: Quantity<'specificEntropy'>;
}

/** Saturated liquid and vapour at a temperature or pressure (the shape of `water.saturation`). */
export interface FluidSaturationResult {
  readonly T: Quantity<'temperature'>;
  readonly p: Quantity<'pressure'>;
  readonly liquid: FluidSaturatedPhase;
  readonly vapor: FluidSaturatedPhase;
  /** h'' − h', the enthalpy of vaporisation. */
  readonly hfg: Quantity<'specificEnergy'>;
  /** s'' − s'. */
  readonly sfg: Quantity<'specificEntropy'>;
  /** u'' − u'. */
  readonly ufg: Quantity<'specificEnergy'>;
}

import type { FluidPairCheck, FluidPairInput, FluidSaturationCheck, FluidSaturationInput } from './fluid-inputs.js';
export type { FluidPair, FluidPairCheck, FluidPairInput, FluidSaturationCheck, FluidSaturationInput } from './fluid-inputs.js';

/** The range of a fluid's equation, as quantities. */
export interface FluidRange {
  readonly T: { readonly min: Quantity<'temperature'>; readonly max: Quantity<'temperature'> };
  readonly p: { readonly max: Quantity<'pressure'> };
  readonly rho: { readonly max: Quantity<'density'> };
}

/** A fluid of the catalogue. */
export interface Fluid {
  /** The catalogue name (`water`). */
  readonly name: string;
  readonly formula: string;
  /** Other names and refrigerant designations it answers to (`R-718` for water). */
  readonly aliases: readonly string[];
  /** The equation of state, for example `IAPWS-95`. */
  readonly equation: string;
  /** The equation's source (title, authors, year, tables). */
  readonly source: FluidSource;
  /** The critical point of the equation's source. */
  readonly critical: { readonly T: Quantity<'temperature'>; readonly p: Quantity<'pressure'>; readonly rho: Quantity<'density'> };
  /** The triple point (the equation's values: pressure and the densities of both phases). */
  readonly triple: { readonly T: Quantity<'temperature'>; readonly p: Quantity<'pressure'>; readonly rhoLiquid: Quantity<'density'>; readonly rhoVapor: Quantity<'density'> };
  /** The range of validity the library enforces. */
  readonly range: FluidRange;
  /** The state at a pair of properties. */
  state<const P extends FluidPairInput>(pair: P & FluidPairCheck<P>): FluidStateResult;
  /** Saturated liquid and vapour at T or p. */
  saturation<const P extends FluidSaturationInput>(at: P & FluidSaturationCheck<P>): FluidSaturationResult;
  /** Δh = h(state2) − h(state1). */
  deltaH<const A extends FluidPairInput, const B extends FluidPairInput>(state1: A & FluidPairCheck<A>, state2: B & FluidPairCheck<B>): Quantity<'specificEnergy'>;
  /** Δu = u(state2) − u(state1). */
  deltaU<const A extends FluidPairInput, const B extends FluidPairInput>(state1: A & FluidPairCheck<A>, state2: B & FluidPairCheck<B>): Quantity<'specificEnergy'>;
  /** Δs = s(state2) − s(state1). */
  deltaS<const A extends FluidPairInput, const B extends FluidPairInput>(state1: A & FluidPairCheck<A>, state2: B & FluidPairCheck<B>): Quantity<'specificEntropy'>;
}

/** Relative rounding a limit admits (a few units in the last place of a converted input). */
const ROUNDING = 1e-14;
/**
 * `x` (SI) checked against `bounds`: raised to the lower limit when it lies below it by rounding only,
 * else a range error in the caller's units with the true limits.
 */
function within(x: number, bounds: Bounds, name: string, dimension: Dimension, units: CallUnits): number {
  if (x < bounds.min && x >= bounds.min * (1 - ROUNDING)) return bounds.min;
  if (!(x >= bounds.min && x <= bounds.max)) throw rangeError(name, x, dimension, bounds, units);
  return x;
}

const PAIRS: readonly (readonly string[])[] = [['T', 'p'], ['p', 'h'], ['p', 's'], ['h', 's'], ['T', 'x'], ['p', 'x'], ['T', 'v'], ['T', 'rho']];

/** Reads an entropy: a specific entropy, or a quantity of the same shape (J/(kg·K)). */
function readEntropy(input: unknown, units: CallUnits): number {
  if (input instanceof Quantity && input.dimension === 'specificHeat') {
    units.note(input, 'specificEntropy');
    return readInput(input as Quantity<'specificHeat'>, 'specificHeat', 's');
  }
  return readInput(input as QuantityLike<'specificEntropy'>, 'specificEntropy', 's', undefined, units);
}

class CatalogueFluid implements Fluid {
  readonly formula: string;
  readonly aliases: readonly string[];
  readonly equation: string;
  readonly source: FluidSource;
  readonly critical: Fluid['critical'];
  readonly triple: Fluid['triple'];
  readonly range: FluidRange;
  /** @internal The compiled model (the batch reads it). */
  readonly model: FluidModel;
  private readonly ctx: FluidContext;
  private readonly probe = new FluidState();
  private readonly scope: string;
  private readonly tRange: Bounds;
  private readonly tSaturation: Bounds;
  private readonly pSaturation: Bounds;

  constructor(readonly name: string) {
    const d = fluidDefinition(name)!;
    const m = fluidModel(name)!;
    this.model = m;
    this.ctx = new FluidContext(m);
    this.formula = d.formula;
    this.aliases = d.aliases;
    this.equation = d.equation;
    this.source = d.source;
    this.scope = `${d.equation} (${name})`;
    this.critical = { T: Quantity.fromSI(d.critical.T, 'temperature'), p: Quantity.fromSI(d.critical.p, 'pressure'), rho: Quantity.fromSI(d.critical.rho, 'density') };
    this.triple = {
      T: Quantity.fromSI(d.triple.T, 'temperature'),
      p: Quantity.fromSI(d.triple.p, 'pressure'),
      rhoLiquid: Quantity.fromSI(d.triple.rhoLiquid, 'density'),
      rhoVapor: Quantity.fromSI(d.triple.rhoVapor, 'density'),
    };
    this.range = {
      T: { min: Quantity.fromSI(m.Tmin, 'temperature'), max: Quantity.fromSI(m.Tmax, 'temperature') },
      p: { max: Quantity.fromSI(m.pMax, 'pressure') },
      rho: { max: Quantity.fromSI(m.rhoMax, 'density') },
    };
    // a value below a lower limit by the rounding of a unit conversion only ('0.01 °C' is
    // 273.15999999999997 K) is raised to the limit (see `within`)
    this.tRange = { min: m.Tmin, max: m.Tmax, scope: this.scope };
    this.tSaturation = { min: m.Tt, max: m.Tc, scope: `the saturation line of ${this.scope} (triple point to critical point)` };
    this.pSaturation = { min: m.pt, max: m.pc, scope: `the saturation line of ${this.scope} (triple-point to critical pressure)` };
  }

  /** h or s at (p, T) on the isobar, NaN where there is no state. */
  private at(p: number, T: number, key: 'h' | 's'): number {
    return stateFromPT(this.ctx, p, T, this.probe) === Status.ok ? this.probe[key] : NaN;
  }

  /** Finite bounds for a message: where a bound could not be computed, the other bound stands for both. */
  private static bounds(lo: number, hi: number, scope: string): Bounds {
    const a = Number.isFinite(lo) ? lo : Number.isFinite(hi) ? hi : 0;
    const b = Number.isFinite(hi) ? hi : a;
    return { min: Math.min(a, b), max: Math.max(a, b), scope };
  }

  state<const P extends FluidPairInput>(pair: P & FluidPairCheck<P>): FluidStateResult {
    const key = readPair(pair, `fluid('${this.name}').state`, PAIRS);
    const a = pair as unknown as Record<string, unknown>;
    const units = new CallUnits();
    const m = this.model;
    const ctx = this.ctx;
    const out = new FluidState();
    const what = `the ${this.scope}`;
    const pMaxBounds = { max: m.pMax, scope: this.scope };
    let st: StatusCode;
    switch (key) {
      case 'T,p': {
        const T = within(readTemperature(a.T as QuantityLike<'temperature'>, 'T', undefined, units), this.tRange, 'T', 'temperature', units);
        const p = readAbsolutePressure(a.p as QuantityLike<'pressure'>, 'p', pMaxBounds, units);
        st = stateFromPT(ctx, p, T, out);
        if (st !== Status.ok) throwForStatus(st, { what: `${what} (p, T) state`, inputs: `p = ${units.describe(p, 'pressure', 'Pa')}, T = ${units.describe(T, 'temperature', 'K')}`, range: () => rangeError('p', p, 'pressure', { min: 0, max: m.pMax, scope: this.scope, minExclusive: true }, units) });
        break;
      }
      case 'p,h':
      case 'p,s': {
        const p = readAbsolutePressure(a.p as QuantityLike<'pressure'>, 'p', pMaxBounds, units);
        const name = key === 'p,h' ? 'h' : 's';
        const dim = name === 'h' ? 'specificEnergy' : 'specificEntropy';
        const value = name === 'h' ? readInput(a.h as QuantityLike<'specificEnergy'>, 'specificEnergy', 'h', undefined, units) : readEntropy(a.s, units);
        st = name === 'h' ? stateFromPH(ctx, p, value, out) : stateFromPS(ctx, p, value, out);
        if (st !== Status.ok) {
          throwForStatus(st, {
            what: `${what} (p, ${name}) flash`,
            inputs: `p = ${units.describe(p, 'pressure', 'Pa')}, ${name} = ${units.describe(value, dim, name === 'h' ? 'J/kg' : 'J/(kg·K)')}`,
            range: () => rangeError(name, value, dim, CatalogueFluid.bounds(this.at(p, m.Tmin, name), this.at(p, m.Tmax, name), `${this.scope} at p = ${units.describe(p, 'pressure', 'Pa')} (T from ${m.Tmin} K to ${m.Tmax} K)`), units),
          });
        }
        break;
      }
      case 'h,s': {
        const h = readInput(a.h as QuantityLike<'specificEnergy'>, 'specificEnergy', 'h', undefined, units);
        const s = readEntropy(a.s, units);
        st = stateFromHS(ctx, h, s, out);
        if (st !== Status.ok) {
          throwForStatus(st, {
            what: `${what} (h, s) flash`,
            inputs: `h = ${units.describe(h, 'specificEnergy', 'J/kg')}, s = ${units.describe(s, 'specificEntropy', 'J/(kg·K)')}`,
            range: () => {
              // the entropy span at h: from the highest pressure to the triple-point pressure
              const probe = this.probe;
              const sHi = stateFromPH(ctx, m.pt, h, probe) === Status.ok ? probe.s : NaN;
              const sLo = stateFromPH(ctx, m.pMax, h, probe) === Status.ok ? probe.s : NaN;
              if (Number.isFinite(sHi) || Number.isFinite(sLo)) return rangeError('s', s, 'specificEntropy', CatalogueFluid.bounds(sLo, sHi, `${this.scope} at h = ${units.describe(h, 'specificEnergy', 'J/kg')} (p from the triple-point pressure to ${m.pMax} Pa)`), units);
              return rangeError('h', h, 'specificEnergy', CatalogueFluid.bounds(Math.min(this.at(m.pMax, m.Tmin, 'h'), this.at(Math.min(m.pc, 100 * m.pt), m.Tmin, 'h')), this.at(m.pt, m.Tmax, 'h'), this.scope), units);
            },
          });
        }
        break;
      }
      case 'T,x': {
        const T = within(readTemperature(a.T as QuantityLike<'temperature'>, 'T', undefined, units), this.tSaturation, 'T', 'temperature', units);
        const x = readQuality(a.x);
        st = stateFromTX(ctx, T, x, out);
        if (st !== Status.ok) throwForStatus(st, { what: `${what} saturation`, inputs: `T = ${units.describe(T, 'temperature', 'K')}, x = ${x}`, range: () => rangeError('T', T, 'temperature', this.tSaturation, units) });
        break;
      }
      case 'p,x': {
        const p = within(readInput(a.p as QuantityLike<'pressure'>, 'pressure', 'p', undefined, units), this.pSaturation, 'p', 'pressure', units);
        const x = readQuality(a.x);
        st = stateFromPX(ctx, p, x, out);
        if (st !== Status.ok) throwForStatus(st, { what: `${what} saturation`, inputs: `p = ${units.describe(p, 'pressure', 'Pa')}, x = ${x}`, range: () => rangeError('p', p, 'pressure', this.pSaturation, units) });
        break;
      }
      default: {
        // 'T,v' or 'T,rho'
        const T = within(readTemperature(a.T as QuantityLike<'temperature'>, 'T', undefined, units), this.tRange, 'T', 'temperature', units);
        const byV = key === 'T,v';
        const rho = byV
          ? 1 / readInput(a.v as QuantityLike<'specificVolume'>, 'specificVolume', 'v', { min: 1 / m.rhoMax, max: Infinity, scope: `${this.scope} (ρ ≤ ${m.rhoMax} kg/m³)` }, units)
          : readInput(a.rho as QuantityLike<'density'>, 'density', 'rho', { min: 0, max: m.rhoMax, scope: this.scope, minExclusive: true }, units);
        st = stateFromTRho(ctx, T, rho, out);
        if (st !== Status.ok && st !== Status.undefinedProperty) {
          throwForStatus(st, {
            what: `${what} (T, ${byV ? 'v' : 'rho'}) state`,
            inputs: `T = ${units.describe(T, 'temperature', 'K')}, ${byV ? `v = ${units.describe(1 / rho, 'specificVolume', 'm³/kg')}` : `rho = ${units.describe(rho, 'density', 'kg/m³')}`}`,
            range: () => {
              // the density at the pressure limit bounds the states at T
              const top = stateFromPT(ctx, m.pMax, T, this.probe) === Status.ok ? this.probe.rho : m.rhoMax;
              return byV
                ? rangeError('v', 1 / rho, 'specificVolume', { min: 1 / top, max: Number.MAX_VALUE, scope: `${this.scope} at T = ${units.describe(T, 'temperature', 'K')} (p ≤ ${m.pMax} Pa)` }, units)
                : rangeError('rho', rho, 'density', { min: 0, max: top, scope: `${this.scope} at T = ${units.describe(T, 'temperature', 'K')} (p ≤ ${m.pMax} Pa)`, minExclusive: true }, units);
            },
          });
        }
      }
    }
    return this.result(out);
  }

  private result(st: FluidState): FluidStateResult {
    const m = this.model;
    const two = st.phase === FLUID_PHASE.twoPhase;
    const defined = !two && Number.isFinite(st.cp) && Number.isFinite(st.cv) && Number.isFinite(st.w);
    let Tsat = NaN;
    if (two) Tsat = st.T;
    else if (st.p >= m.pt && st.p <= m.pc) {
      const l = this.ctx.liquid;
      if (saturationAtP(this.ctx, st.p, l, this.ctx.vapor) !== Status.noConvergence) Tsat = l.T;
    }
    const hasSat = Number.isFinite(Tsat) && !two;
    return {
      T: resultQuantity(st.T, 'temperature', 'T'),
      p: resultQuantity(st.p, 'pressure', 'p'),
      phase: PHASES[st.phase]!,
      x: two ? st.x : undefined,
      rho: resultQuantity(st.rho, 'density', 'rho'),
      v: resultQuantity(st.v, 'specificVolume', 'v'),
      u: resultQuantity(st.u, 'specificEnergy', 'u'),
      h: resultQuantity(st.h, 'specificEnergy', 'h'),
      s: resultQuantity(st.s, 'specificEntropy', 's'),
      cp: defined ? resultQuantity(st.cp, 'specificHeat', 'cp') : undefined,
      cv: defined ? resultQuantity(st.cv, 'specificHeat', 'cv') : undefined,
      w: defined ? resultQuantity(st.w, 'velocity', 'w') : undefined,
      k: defined ? st.cp / st.cv : undefined,
      jouleThomson: defined && Number.isFinite(st.jouleThomson) ? st.jouleThomson : undefined,
      Tsat: optionalQuantity(Tsat, 'temperature', 'Tsat'),
      superheat: hasSat && st.phase === FLUID_PHASE.vapor ? resultQuantity(Math.max(0, st.T - Tsat), 'temperatureDifference', 'superheat') : undefined,
      subcooling: hasSat && st.phase === FLUID_PHASE.liquid ? resultQuantity(Math.max(0, Tsat - st.T), 'temperatureDifference', 'subcooling') : undefined,
    };
  }

  saturation<const P extends FluidSaturationInput>(at: P & FluidSaturationCheck<P>): FluidSaturationResult {
    const key = readPair(at, `fluid('${this.name}').saturation`, [['T'], ['p']]);
    const a = at as unknown as Record<string, unknown>;
    const units = new CallUnits();
    const l = new FluidState();
    const v = new FluidState();
    let st: StatusCode;
    let inputs: string;
    let range: () => OutOfRangeError;
    if (key === 'T') {
      const T = within(readTemperature(a.T as QuantityLike<'temperature'>, 'T', undefined, units), this.tSaturation, 'T', 'temperature', units);
      st = saturationAtT(this.ctx, T, l, v);
      inputs = `T = ${units.describe(T, 'temperature', 'K')}`;
      range = () => rangeError('T', T, 'temperature', this.tSaturation, units);
    } else {
      const p = within(readInput(a.p as QuantityLike<'pressure'>, 'pressure', 'p', undefined, units), this.pSaturation, 'p', 'pressure', units);
      st = saturationAtP(this.ctx, p, l, v);
      inputs = `p = ${units.describe(p, 'pressure', 'Pa')}`;
      range = () => rangeError('p', p, 'pressure', this.pSaturation, units);
    }
    // at the critical point itself both phases are the critical state (cp diverges: not reported here)
    if (st !== Status.ok && st !== Status.undefinedProperty) throwForStatus(st, { what: `the ${this.scope} saturation`, inputs, range });
    return {
      T: resultQuantity(l.T, 'temperature', 'T'),
      p: resultQuantity(l.p, 'pressure', 'p'),
      liquid: phaseOf(l),
      vapor: phaseOf(v),
      hfg: resultQuantity(v.h - l.h, 'specificEnergy', 'hfg'),
      sfg: resultQuantity(v.s - l.s, 'specificEntropy', 'sfg'),
      ufg: resultQuantity(v.u - l.u, 'specificEnergy', 'ufg'),
    };
  }

  deltaH<const A extends FluidPairInput, const B extends FluidPairInput>(state1: A & FluidPairCheck<A>, state2: B & FluidPairCheck<B>): Quantity<'specificEnergy'> {
    return resultQuantity(this.named(state2, 'state2').h.si - this.named(state1, 'state1').h.si, 'specificEnergy', 'deltaH');
  }

  deltaU<const A extends FluidPairInput, const B extends FluidPairInput>(state1: A & FluidPairCheck<A>, state2: B & FluidPairCheck<B>): Quantity<'specificEnergy'> {
    return resultQuantity(this.named(state2, 'state2').u.si - this.named(state1, 'state1').u.si, 'specificEnergy', 'deltaU');
  }

  deltaS<const A extends FluidPairInput, const B extends FluidPairInput>(state1: A & FluidPairCheck<A>, state2: B & FluidPairCheck<B>): Quantity<'specificEntropy'> {
    return resultQuantity(this.named(state2, 'state2').s.si - this.named(state1, 'state1').s.si, 'specificEntropy', 'deltaS');
  }

  private named(pair: unknown, name: string): FluidStateResult {
    if (typeof pair !== 'object' || pair === null) throw new InvalidInputError('input.invalid', name, `${name} must be a pair such as { p: '1 MPa', T: '300 °C' }; got ${String(pair)}`);
    return this.state(pair as never);
  }
}

function phaseOf(st: FluidState): FluidSaturatedPhase {
  return {
    v: resultQuantity(st.v, 'specificVolume', 'v'),
    rho: resultQuantity(st.rho, 'density', 'rho'),
    u: resultQuantity(st.u, 'specificEnergy', 'u'),
    h: resultQuantity(st.h, 'specificEnergy', 'h'),
    s: resultQuantity(st.s, 'specificEntropy', 's'),
  };
}

/** Normalised name or alias → catalogue name. */
let index: Map<string, string> | undefined;
function catalogueIndex(): Map<string, string> {
  if (index === undefined) {
    const m = new Map<string, string>();
    for (const name of FLUID_NAMES) {
      m.set(normaliseName(name), name);
      for (const a of fluidDefinition(name)!.aliases) m.set(normaliseName(a), name);
    }
    index = m;
  }
  return index;
}
const fluids = new Map<string, CatalogueFluid>();

/** @internal The compiled model behind a fluid of the catalogue (for the batch and the tables). */
export function modelOf(f: Fluid): FluidModel {
  if (f instanceof CatalogueFluid) return f.model;
  return (fluid(f.name) as CatalogueFluid).model;
}

/**
 * A real fluid by name, alias or refrigerant designation, on its reference equation of state.
 * The fluid's data are compiled on first use. Inputs are quantities or unit text (`'300 K'`,
 * `'14.7 psia'`); errors name the input and the limit in the caller's units, with SI beside them.
 * Results are engineering estimates: for pressure equipment, steam and refrigerant systems defer to
 * the applicable codes and licensed professionals.
 *
 * @throws {@link UnknownNameError} with the closest names, for a fluid not in the catalogue
 * @example
 * ```ts
 * const water = fluid('R-718');                                          // IAPWS-95
 * water.state({ T: '500 K', rho: '838.025 kg/m³' }).p.in('MPa');         //=> 10.0003858... (IAPWS-95 Table 7)
 * water.saturation({ p: '101.325 kPa' }).T.in('K');                      //=> 373.1242958...
 * water.state({ T: '150 °C', p: '1 bar' }).superheat?.in('K');           //=> 50.3940...
 * water.state({ p: '1 bar', x: 0.5 }).cp;                                //=> undefined (two-phase)
 * water.state({ T: '1300 K', p: '1 bar' });
 * // throws OutOfRangeError: T = 1300 K is above the upper limit of IAPWS-95 (water) (1273 K); valid range 273.16 to 1273 K
 * fluid('R-7180');   // throws UnknownNameError: … did you mean "R-718", "R718", …
 * ```
 */
export function fluid(name: string): Fluid {
  const key = typeof name === 'string' ? catalogueIndex().get(normaliseName(name)) : undefined;
  if (key === undefined) {
    const known = [...FLUID_NAMES, ...FLUID_NAMES.flatMap((n) => fluidDefinition(n)!.aliases)];
    throw new UnknownNameError(String(name), 'real fluids', closestNames(String(name), known));
  }
  let f = fluids.get(key);
  if (f === undefined) {
    f = new CatalogueFluid(key);
    fluids.set(key, f);
  }
  return f;
}

/**
 * The names of the catalogue's fluids (the ones whose equations passed their checks).
 * @example
 * ```ts
 * fluidNames();   //=> ['water', 'nitrogen']
 * ```
 */
export function fluidNames(): readonly string[] {
  return FLUID_NAMES;
}
