/**
 * The objects `substance.state(...)` returns: plain fields set in the constructor, the transport
 * values as getters on the prototype, computed on first read and kept (a liquid has `mu`, `lambda`,
 * `Pr`, `nu`, `alpha`; a solid `lambda` and `alpha`). Classes rather than per-object accessor
 * definitions, which cost several µs per object (see src/water/state-record.ts). Read the getters by
 * name; `JSON.stringify(state)` has them, `{ ...state }` and `Object.keys(state)` do not.
 *
 * @module
 */
import { resultQuantity } from '../core/result.js';
import type { Quantity } from '../units/quantity.js';
import type { IncompressibleStateResult } from './substance.js';

/** A substance's transport values at T in SI (NaN where it has none), and whether T lies outside their data. */
export interface TransportReader {
  mu(T: number): number;
  lambda(T: number): number;
  muOutside(T: number): boolean;
  lambdaOutside(T: number): boolean;
}

/** The fields of a state other than its transport values. */
export type IncompressibleStateFields = Omit<IncompressibleStateResult, 'mu' | 'lambda' | 'Pr' | 'nu' | 'alpha'>;

const optional = <D extends 'dynamicViscosity' | 'thermalConductivity' | 'kinematicViscosity' | 'thermalDiffusivity'>(si: number, dimension: D, property: string, outside: boolean): Quantity<D> | undefined =>
  Number.isNaN(si) ? undefined : resultQuantity(si, dimension, property, outside);

/** A state of a solid: λ and α. */
export class SolidStateRecord implements IncompressibleStateResult {
  readonly T: IncompressibleStateResult['T'];
  readonly p: IncompressibleStateResult['p'];
  readonly c: IncompressibleStateResult['c'];
  readonly cp: IncompressibleStateResult['cp'];
  readonly cv: IncompressibleStateResult['cv'];
  readonly rho: IncompressibleStateResult['rho'];
  readonly v: IncompressibleStateResult['v'];
  readonly u: IncompressibleStateResult['u'];
  readonly h: IncompressibleStateResult['h'];
  readonly s: IncompressibleStateResult['s'];
  readonly #reader: TransportReader;
  readonly #T: number;
  readonly #c: number;
  readonly #rho: number;
  #mu: number | undefined;
  #lambda: number | undefined;

  constructor(f: IncompressibleStateFields, reader: TransportReader, T: number, c: number, rho: number) {
    this.T = f.T;
    this.p = f.p;
    this.c = f.c;
    this.cp = f.cp;
    this.cv = f.cv;
    this.rho = f.rho;
    this.v = f.v;
    this.u = f.u;
    this.h = f.h;
    this.s = f.s;
    this.#reader = reader;
    this.#T = T;
    this.#c = c;
    this.#rho = rho;
  }

  /** μ, λ (SI, NaN where none), c and ρ at the state, and whether T is outside the transport data. */
  protected muSI(): number {
    return (this.#mu ??= this.#reader.mu(this.#T));
  }
  protected lambdaSI(): number {
    return (this.#lambda ??= this.#reader.lambda(this.#T));
  }
  protected cSI(): number {
    return this.#c;
  }
  protected rhoSI(): number {
    return this.#rho;
  }
  protected muOutside(): boolean {
    return this.#reader.muOutside(this.#T);
  }
  protected lambdaOutside(): boolean {
    return this.#reader.lambdaOutside(this.#T);
  }

  /** Thermal conductivity λ(T); `undefined` where the data do not cover T or leave λ out. */
  get lambda(): Quantity<'thermalConductivity'> | undefined {
    return optional(this.lambdaSI(), 'thermalConductivity', 'lambda', this.lambdaOutside());
  }

  /** Thermal diffusivity α = λ/(ρ·c). */
  get alpha(): Quantity<'thermalDiffusivity'> | undefined {
    return optional(this.lambdaSI() / (this.rhoSI() * this.cSI()), 'thermalDiffusivity', 'alpha', this.lambdaOutside());
  }

  /** JSON of the state: its own fields and its transport values. */
  toJSON(): Record<string, unknown> {
    return { ...(this as object), lambda: this.lambda, alpha: this.alpha };
  }
}

/** A state of a liquid: μ, λ, Pr, ν and α. */
export class LiquidStateRecord extends SolidStateRecord {
  /** Dynamic viscosity μ(T); `undefined` where the data do not cover T or leave μ out. */
  get mu(): Quantity<'dynamicViscosity'> | undefined {
    return optional(this.muSI(), 'dynamicViscosity', 'mu', this.muOutside());
  }

  /** Prandtl number μ·c/λ. */
  get Pr(): number | undefined {
    const v = (this.muSI() * this.cSI()) / this.lambdaSI();
    return Number.isNaN(v) ? undefined : v;
  }

  /** Kinematic viscosity ν = μ/ρ. */
  get nu(): Quantity<'kinematicViscosity'> | undefined {
    return optional(this.muSI() / this.rhoSI(), 'kinematicViscosity', 'nu', this.muOutside());
  }

  override toJSON(): Record<string, unknown> {
    return { ...super.toJSON(), mu: this.mu, Pr: this.Pr, nu: this.nu };
  }
}
