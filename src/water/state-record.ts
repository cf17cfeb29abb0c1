/**
 * The objects `water.state` and `water.saturation` return: plain fields set in the constructor, and the
 * transport properties (IAPWS R12-08 viscosity, R15-11 thermal conductivity) as getters on the
 * prototype, computed on first read and kept.
 *
 * Classes rather than per-object property definitions: defining five accessors on each result object
 * measured 5 to 9 µs per object on this project's 2-core machine (more than the IF97 flash itself),
 * building one of these about 0.1 µs. The getters are read by name (`st.mu`); `JSON.stringify(st)`
 * has them (through `toJSON`), `{ ...st }` and `Object.keys(st)` see only the plain fields.
 *
 * @module
 */
import { optionalQuantity } from '../core/result.js';
import type { Quantity } from '../units/quantity.js';
import type { SaturatedPhase, WaterPhase, WaterStateResult } from './state.js';
import { transportAt, type TransportValues } from './transport-properties.js';

/** The transport part of a result: μ and λ at (T, ρ) on first read, with ν, α and Pr from them. */
class TransportOnRead {
  readonly #T: number;
  readonly #rho: number;
  readonly #p: number;
  readonly #cp: number;
  readonly #defined: boolean;
  #values: TransportValues | undefined;

  constructor(T: number, rho: number, p: number, cp: number, defined: boolean) {
    this.#T = T;
    this.#rho = rho;
    this.#p = p;
    this.#cp = cp;
    this.#defined = defined;
  }

  #get(): TransportValues {
    return (this.#values ??= this.#defined ? transportAt(this.#T, this.#rho, this.#p, { mu: NaN, lambda: NaN }) : { mu: NaN, lambda: NaN });
  }

  /** Dynamic viscosity (IAPWS R12-08, with its critical enhancement); `undefined` where not defined. */
  get mu(): Quantity<'dynamicViscosity'> | undefined {
    return optionalQuantity(this.#get().mu, 'dynamicViscosity', 'mu');
  }

  /** Thermal conductivity (IAPWS R15-11, with its critical enhancement); `undefined` where not defined. */
  get lambda(): Quantity<'thermalConductivity'> | undefined {
    return optionalQuantity(this.#get().lambda, 'thermalConductivity', 'lambda');
  }

  /** Kinematic viscosity ν = μ/ρ. */
  get nu(): Quantity<'kinematicViscosity'> | undefined {
    return optionalQuantity(this.#get().mu / this.#rho, 'kinematicViscosity', 'nu');
  }

  /** Thermal diffusivity α = λ/(ρ·cp). */
  get alpha(): Quantity<'thermalDiffusivity'> | undefined {
    return optionalQuantity(this.#get().lambda / (this.#rho * this.#cp), 'thermalDiffusivity', 'alpha');
  }

  /** Prandtl number μ·cp/λ. */
  get Pr(): number | undefined {
    const v = (this.#get().mu * this.#cp) / this.#get().lambda;
    return Number.isNaN(v) ? undefined : v;
  }

  /** JSON of the result: its own fields and the five transport values. */
  toJSON(): Record<string, unknown> {
    return { ...(this as object), mu: this.mu, lambda: this.lambda, nu: this.nu, alpha: this.alpha, Pr: this.Pr };
  }
}

/** The fields of a water state other than its transport properties. */
export type WaterStateFields = Omit<WaterStateResult, 'mu' | 'lambda' | 'nu' | 'alpha' | 'Pr'>;

/** A state from `water.state`. */
export class WaterStateRecord extends TransportOnRead implements WaterStateResult {
  readonly T: WaterStateResult['T'];
  readonly p: WaterStateResult['p'];
  readonly phase: WaterPhase;
  readonly region: WaterStateResult['region'];
  readonly x: number | undefined;
  readonly v: WaterStateResult['v'];
  readonly rho: WaterStateResult['rho'];
  readonly u: WaterStateResult['u'];
  readonly h: WaterStateResult['h'];
  readonly s: WaterStateResult['s'];
  readonly cp: WaterStateResult['cp'];
  readonly cv: WaterStateResult['cv'];
  readonly w: WaterStateResult['w'];
  readonly k: number | undefined;
  readonly Tsat: WaterStateResult['Tsat'];
  readonly superheat: WaterStateResult['superheat'];
  readonly subcooling: WaterStateResult['subcooling'];

  /** `f` the fields; (T, ρ, p, cp) in SI for the transport values; `defined` false for two-phase states. */
  constructor(f: WaterStateFields, T: number, rho: number, p: number, cp: number, defined: boolean) {
    super(T, rho, p, cp, defined);
    this.T = f.T;
    this.p = f.p;
    this.phase = f.phase;
    this.region = f.region;
    this.x = f.x;
    this.v = f.v;
    this.rho = f.rho;
    this.u = f.u;
    this.h = f.h;
    this.s = f.s;
    this.cp = f.cp;
    this.cv = f.cv;
    this.w = f.w;
    this.k = f.k;
    this.Tsat = f.Tsat;
    this.superheat = f.superheat;
    this.subcooling = f.subcooling;
  }
}

/** The fields of a saturated phase other than its transport properties. */
export type SaturatedPhaseFields = Omit<SaturatedPhase, 'mu' | 'lambda' | 'nu' | 'alpha' | 'Pr'>;

/** One saturated phase of `water.saturation`. */
export class SaturatedPhaseRecord extends TransportOnRead implements SaturatedPhase {
  readonly v: SaturatedPhase['v'];
  readonly rho: SaturatedPhase['rho'];
  readonly u: SaturatedPhase['u'];
  readonly h: SaturatedPhase['h'];
  readonly s: SaturatedPhase['s'];

  constructor(f: SaturatedPhaseFields, T: number, rho: number, p: number, cp: number, defined: boolean) {
    super(T, rho, p, cp, defined);
    this.v = f.v;
    this.rho = f.rho;
    this.u = f.u;
    this.h = f.h;
    this.s = f.s;
  }
}
