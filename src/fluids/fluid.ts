/**
 * The real-fluid facade: `fluid(name)` gives a fluid from the catalogue with `.state(pair)` and
 * `.saturation({ T } | { p })`, quantities in and out, on the Helmholtz-energy SI core.
 *
 * @module
 */
import { Status, type StatusCode } from '../core/status.js';
import { ConvergenceError, InvalidInputError, OutOfRangeError, UnknownNameError } from '../errors.js';
import { closestNames, normaliseName } from '../lookup.js';
import { Quantity, readQuantity, type QuantityLike } from '../units/quantity.js';
import { FLUID_NAMES, fluidDefinition, fluidModel } from './catalogue.js';
import type { FluidSource } from './definition.js';
import { stateFromHS, stateFromPH, stateFromPS, stateFromPT, stateFromPX, stateFromTRho, stateFromTV, stateFromTX } from './flash.js';
import { FLUID_PHASE, FluidContext, FluidState, type FluidModel } from './model.js';
import { saturationAtP, saturationAtT } from './saturation.js';

/** The phase of a state. */
export type FluidPhase = 'liquid' | 'vapor' | 'two-phase' | 'supercritical';
const PHASES: readonly FluidPhase[] = ['liquid', 'vapor', 'two-phase', 'supercritical'];

/** A state of a real fluid, as `fluid(name).state` returns it. */
export interface FluidStateResult {
  readonly T: Quantity<'temperature'>;
  readonly p: Quantity<'pressure'>;
  /** `'liquid'`, `'vapor'`, `'two-phase'` or `'supercritical'` (T ≥ T_c and p ≥ p_c). */
  readonly phase: FluidPhase;
  /** Quality (vapour mass fraction) in two-phase states; `undefined` otherwise. */
  readonly x: number | undefined;
  readonly rho: Quantity<'density'>;
  readonly v: Quantity<'specificVolume'>;
  readonly u: Quantity<'specificEnergy'>;
  readonly h: Quantity<'specificEnergy'>;
  readonly s: Quantity<'specificHeat'>;
  /** cp, cv, w, k and the Joule–Thomson coefficient are `undefined` in two-phase states. */
  readonly cp: Quantity<'specificHeat'> | undefined;
  readonly cv: Quantity<'specificHeat'> | undefined;
  readonly w: Quantity<'velocity'> | undefined;
  readonly k: number | undefined;
  /** Joule–Thomson coefficient (∂T/∂p)_h in K/Pa (a plain number). */
  readonly jouleThomson: number | undefined;
  /** T − T_sat(p) for vapour below the critical pressure; `undefined` otherwise. */
  readonly superheat: Quantity<'temperatureDifference'> | undefined;
  /** T_sat(p) − T for liquid below the critical pressure; `undefined` otherwise. */
  readonly subcooling: Quantity<'temperatureDifference'> | undefined;
}

/** Properties of one saturated phase. */
export interface FluidSaturatedPhase {
  readonly rho: Quantity<'density'>;
  readonly v: Quantity<'specificVolume'>;
  readonly u: Quantity<'specificEnergy'>;
  readonly h: Quantity<'specificEnergy'>;
  readonly s: Quantity<'specificHeat'>;
}

/** Saturated liquid and vapour at a temperature or pressure. */
export interface FluidSaturationResult {
  readonly T: Quantity<'temperature'>;
  readonly p: Quantity<'pressure'>;
  readonly liquid: FluidSaturatedPhase;
  readonly vapor: FluidSaturatedPhase;
  /** h'' − h', the enthalpy of vaporisation. */
  readonly hfg: Quantity<'specificEnergy'>;
  readonly sfg: Quantity<'specificHeat'>;
}

/** The pairs `state` accepts. */
export type FluidPair =
  | { readonly T: QuantityLike<'temperature'>; readonly p: QuantityLike<'pressure'> }
  | { readonly T: QuantityLike<'temperature'>; readonly rho: QuantityLike<'density'> }
  | { readonly T: QuantityLike<'temperature'>; readonly v: QuantityLike<'specificVolume'> }
  | { readonly p: QuantityLike<'pressure'>; readonly h: QuantityLike<'specificEnergy'> }
  | { readonly p: QuantityLike<'pressure'>; readonly s: QuantityLike<'specificHeat'> }
  | { readonly h: QuantityLike<'specificEnergy'>; readonly s: QuantityLike<'specificHeat'> }
  | { readonly T: QuantityLike<'temperature'>; readonly x: number }
  | { readonly p: QuantityLike<'pressure'>; readonly x: number };

/** A fluid of the catalogue. */
export interface Fluid {
  readonly name: string;
  readonly formula: string;
  /** Other names and refrigerant designations it answers to (`R-718` for water). */
  readonly aliases: readonly string[];
  /** The equation of state, for example `IAPWS-95`. */
  readonly equation: string;
  readonly source: FluidSource;
  readonly critical: { readonly T: Quantity<'temperature'>; readonly p: Quantity<'pressure'>; readonly rho: Quantity<'density'> };
  readonly triple: { readonly T: Quantity<'temperature'>; readonly p: Quantity<'pressure'> };
  readonly range: { readonly T: { readonly min: Quantity<'temperature'>; readonly max: Quantity<'temperature'> }; readonly p: { readonly max: Quantity<'pressure'> } };
  /** The state at a pair of properties. */
  state(pair: FluidPair): FluidStateResult;
  /** Saturated liquid and vapour at T or p. */
  saturation(at: { readonly T: QuantityLike<'temperature'> } | { readonly p: QuantityLike<'pressure'> }): FluidSaturationResult;
}

const fmt = (x: number) => String(Number(x.toPrecision(8)));

class CatalogueFluid implements Fluid {
  readonly formula: string;
  readonly aliases: readonly string[];
  readonly equation: string;
  readonly source: FluidSource;
  readonly critical: Fluid['critical'];
  readonly triple: Fluid['triple'];
  readonly range: Fluid['range'];
  private readonly ctx: FluidContext;
  private readonly out = new FluidState();
  private readonly liquid = new FluidState();
  private readonly vapor = new FluidState();
  private readonly m: FluidModel;

  constructor(readonly name: string) {
    const d = fluidDefinition(name)!;
    this.m = fluidModel(name)!;
    this.ctx = new FluidContext(this.m);
    this.formula = d.formula;
    this.aliases = d.aliases;
    this.equation = d.equation;
    this.source = d.source;
    this.critical = { T: Quantity.fromSI(d.critical.T, 'temperature'), p: Quantity.fromSI(d.critical.p, 'pressure'), rho: Quantity.fromSI(d.critical.rho, 'density') };
    this.triple = { T: Quantity.fromSI(d.triple.T, 'temperature'), p: Quantity.fromSI(this.m.pt, 'pressure') };
    this.range = { T: { min: Quantity.fromSI(d.range.Tmin, 'temperature'), max: Quantity.fromSI(d.range.Tmax, 'temperature') }, p: { max: Quantity.fromSI(d.range.pMax, 'pressure') } };
  }

  private scope(): string {
    return `${this.equation} (${this.name})`;
  }

  private checkT(T: number, max = this.m.Tmax, maxName = 'upper limit'): void {
    if (T < this.m.Tmin || T > max)
      throw new OutOfRangeError(
        { quantity: 'T', value: T, min: this.m.Tmin, max, unit: 'K', scope: this.scope() },
        `T = ${fmt(T)} K is ${T < this.m.Tmin ? `below the lower limit of ${this.scope()} (${fmt(this.m.Tmin)} K)` : `above the ${maxName} of ${this.scope()} (${fmt(max)} K)`}`,
      );
  }

  private checkP(p: number, min = 0, max = this.m.pMax, what = 'range'): void {
    if (!(p > min) || p > max)
      throw new OutOfRangeError(
        { quantity: 'p', value: p, min, max, unit: 'Pa', scope: this.scope() },
        p <= 0 ? `p = ${fmt(p)} Pa: absolute pressure must be positive` : `p = ${fmt(p)} Pa is outside the ${what} of ${this.scope()} (${fmt(min)} to ${fmt(max)} Pa)`,
      );
  }

  private fail(status: StatusCode, what: string): never {
    if (status === Status.outOfRange) throw new OutOfRangeError({ quantity: what, value: NaN, min: NaN, max: NaN, unit: '', scope: this.scope() }, `no state of ${this.scope()} in its range for ${what}`);
    if (status === Status.noConvergence) throw new ConvergenceError(`the ${this.scope()} solve for ${what} did not converge`, 0);
    throw new InvalidInputError('input.invalid', what, `invalid input for ${what}`);
  }

  private quality(x: unknown): number {
    if (typeof x !== 'number' || !Number.isFinite(x)) throw new InvalidInputError('input.not-finite', 'x', `x (quality) must be a finite number between 0 and 1; got ${String(x)}`);
    if (x < 0 || x > 1) throw new OutOfRangeError({ quantity: 'x', value: x, min: 0, max: 1, unit: '1', scope: 'quality (vapour mass fraction)' }, `x = ${x} is outside 0 to 1 (quality is the vapour mass fraction)`);
    return x;
  }

  state(pair: FluidPair): FluidStateResult {
    if (typeof pair !== 'object' || pair === null) throw new InvalidInputError('input.invalid', 'pair', `${this.name}.state needs a pair such as { T, p }`);
    const q = pair as Record<string, unknown>;
    const has = (k: string) => q[k] !== undefined;
    const keys = Object.keys(q).filter(has).sort().join(',');
    const ctx = this.ctx;
    const out = this.out;
    let st: StatusCode;
    let what: string;
    switch (keys) {
      case 'T,p': {
        const T = readQuantity(q.T as QuantityLike<'temperature'>, 'temperature', 'T');
        const p = readQuantity(q.p as QuantityLike<'pressure'>, 'pressure', 'p');
        this.checkT(T);
        this.checkP(p);
        st = stateFromPT(ctx, p, T, out);
        what = `p = ${fmt(p)} Pa, T = ${fmt(T)} K`;
        break;
      }
      case 'T,rho':
      case 'T,v': {
        const T = readQuantity(q.T as QuantityLike<'temperature'>, 'temperature', 'T');
        const rho = keys === 'T,rho' ? readQuantity(q.rho as QuantityLike<'density'>, 'density', 'rho') : 1 / readQuantity(q.v as QuantityLike<'specificVolume'>, 'specificVolume', 'v');
        this.checkT(T);
        if (!(rho > 0 && rho <= this.m.rhoMax)) throw new OutOfRangeError({ quantity: 'rho', value: rho, min: 0, max: this.m.rhoMax, unit: 'kg/m³', scope: this.scope() });
        st = stateFromTRho(ctx, T, rho, out);
        what = `T = ${fmt(T)} K, rho = ${fmt(rho)} kg/m³`;
        break;
      }
      case 'h,p':
      case 'p,s': {
        const p = readQuantity(q.p as QuantityLike<'pressure'>, 'pressure', 'p');
        this.checkP(p);
        if (keys === 'h,p') {
          const h = readQuantity(q.h as QuantityLike<'specificEnergy'>, 'specificEnergy', 'h');
          st = stateFromPH(ctx, p, h, out);
          what = `p = ${fmt(p)} Pa, h = ${fmt(h)} J/kg`;
        } else {
          const s = readQuantity(q.s as QuantityLike<'specificHeat'>, 'specificHeat', 's');
          st = stateFromPS(ctx, p, s, out);
          what = `p = ${fmt(p)} Pa, s = ${fmt(s)} J/(kg·K)`;
        }
        break;
      }
      case 'h,s': {
        const h = readQuantity(q.h as QuantityLike<'specificEnergy'>, 'specificEnergy', 'h');
        const s = readQuantity(q.s as QuantityLike<'specificHeat'>, 'specificHeat', 's');
        st = stateFromHS(ctx, h, s, out);
        what = `h = ${fmt(h)} J/kg, s = ${fmt(s)} J/(kg·K)`;
        break;
      }
      case 'T,x': {
        const T = readQuantity(q.T as QuantityLike<'temperature'>, 'temperature', 'T');
        const x = this.quality(q.x);
        this.checkT(T, this.m.Tc, 'critical temperature');
        st = stateFromTX(ctx, T, x, out);
        what = `T = ${fmt(T)} K, x = ${x}`;
        break;
      }
      case 'p,x': {
        const p = readQuantity(q.p as QuantityLike<'pressure'>, 'pressure', 'p');
        const x = this.quality(q.x);
        this.checkP(p, this.m.pt * (1 - 1e-12), this.m.pc, 'saturation range (triple-point to critical pressure)');
        st = stateFromPX(ctx, Math.max(p, this.m.pt), x, out);
        what = `p = ${fmt(p)} Pa, x = ${x}`;
        break;
      }
      default:
        throw new InvalidInputError('input.invalid', 'pair', `${this.name}.state takes one of { T, p }, { T, rho }, { T, v }, { p, h }, { p, s }, { h, s }, { T, x }, { p, x }; got { ${keys} }`);
    }
    if (st !== Status.ok && st !== Status.undefinedProperty) this.fail(st, what);
    return this.result(out);
  }

  private result(st: FluidState): FluidStateResult {
    const two = st.phase === FLUID_PHASE.twoPhase;
    const defined = !two && Number.isFinite(st.cp);
    let superheat: Quantity<'temperatureDifference'> | undefined;
    let subcooling: Quantity<'temperatureDifference'> | undefined;
    if (!two && st.p < this.m.pc && st.p >= this.m.pt && (st.phase === FLUID_PHASE.vapor || st.phase === FLUID_PHASE.liquid)) {
      const T = st.T;
      const p = st.p;
      const phase = st.phase;
      if (saturationAtP(this.ctx, p, this.liquid, this.vapor) === Status.ok) {
        const Ts = this.liquid.T;
        if (phase === FLUID_PHASE.vapor) superheat = Quantity.fromSI(T - Ts, 'temperatureDifference');
        else subcooling = Quantity.fromSI(Ts - T, 'temperatureDifference');
      }
    }
    return {
      T: Quantity.fromSI(st.T, 'temperature'),
      p: Quantity.fromSI(st.p, 'pressure'),
      phase: PHASES[st.phase]!,
      x: two ? st.x : undefined,
      rho: Quantity.fromSI(st.rho, 'density'),
      v: Quantity.fromSI(st.v, 'specificVolume'),
      u: Quantity.fromSI(st.u, 'specificEnergy'),
      h: Quantity.fromSI(st.h, 'specificEnergy'),
      s: Quantity.fromSI(st.s, 'specificHeat'),
      cp: defined ? Quantity.fromSI(st.cp, 'specificHeat') : undefined,
      cv: defined ? Quantity.fromSI(st.cv, 'specificHeat') : undefined,
      w: defined ? Quantity.fromSI(st.w, 'velocity') : undefined,
      k: defined ? st.cp / st.cv : undefined,
      jouleThomson: defined ? st.jouleThomson : undefined,
      superheat,
      subcooling,
    };
  }

  saturation(at: { readonly T: QuantityLike<'temperature'> } | { readonly p: QuantityLike<'pressure'> }): FluidSaturationResult {
    const l = this.liquid;
    const v = this.vapor;
    let st: StatusCode;
    let what: string;
    if (typeof at === 'object' && at !== null && 'T' in at && at.T !== undefined) {
      const T = readQuantity(at.T, 'temperature', 'T');
      this.checkT(T, this.m.Tc, 'critical temperature');
      st = saturationAtT(this.ctx, T, l, v);
      what = `T = ${fmt(T)} K`;
    } else if (typeof at === 'object' && at !== null && 'p' in at && at.p !== undefined) {
      const p = readQuantity(at.p, 'pressure', 'p');
      this.checkP(p, this.m.pt * (1 - 1e-12), this.m.pc, 'saturation range (triple-point to critical pressure)');
      st = saturationAtP(this.ctx, Math.max(p, this.m.pt), l, v);
      what = `p = ${fmt(p)} Pa`;
    } else throw new InvalidInputError('input.invalid', 'at', `${this.name}.saturation takes { T } or { p }`);
    if (st !== Status.ok && st !== Status.undefinedProperty) this.fail(st, what);
    const phase = (x: FluidState): FluidSaturatedPhase => ({
      rho: Quantity.fromSI(x.rho, 'density'),
      v: Quantity.fromSI(x.v, 'specificVolume'),
      u: Quantity.fromSI(x.u, 'specificEnergy'),
      h: Quantity.fromSI(x.h, 'specificEnergy'),
      s: Quantity.fromSI(x.s, 'specificHeat'),
    });
    return {
      T: Quantity.fromSI(l.T, 'temperature'),
      p: Quantity.fromSI(l.p, 'pressure'),
      liquid: phase(l),
      vapor: phase(v),
      hfg: Quantity.fromSI(v.h - l.h, 'specificEnergy'),
      sfg: Quantity.fromSI(v.s - l.s, 'specificHeat'),
    };
  }
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
const fluids = new Map<string, Fluid>();

/**
 * A real fluid by name, alias or refrigerant designation, on its reference equation of state.
 * The fluid's data are compiled on first use. Results are engineering estimates: for pressure
 * equipment, steam and refrigerant systems defer to the applicable codes and licensed professionals.
 *
 * @throws {@link UnknownNameError} with the closest names, for a fluid not in the catalogue
 * @example
 * ```ts
 * const water = fluid('R-718');                                          // IAPWS-95
 * water.state({ T: '500 K', rho: '838.025 kg/m³' }).p.to('MPa').value;   //=> 10.0003858 (IAPWS-95 Table 7)
 * water.saturation({ p: '101.325 kPa' }).T.si;                            //=> 373.1243
 * water.state({ T: '150 °C', p: '1 bar' }).superheat?.si;                 //=> 50.394
 * fluid('R-744');   // throws UnknownNameError: "R-744" is not in the real fluids catalogue; did you mean "R-718", "R718"?
 * ```
 */
export function fluid(name: string): Fluid {
  const key = catalogueIndex().get(normaliseName(String(name)));
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

/** The names of the catalogue's fluids. */
export function fluidNames(): readonly string[] {
  return FLUID_NAMES;
}
