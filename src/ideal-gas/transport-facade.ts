/**
 * Dilute-gas transport on the ideal-gas facade: the `viscosity`, `thermalConductivity` and `prandtl`
 * methods of a gas from `idealGas()` or `mixture()`, and the lazy `mu`, `lambda`, `nu`, `alpha` and
 * `Pr` of its states. The SI core is src/ideal-gas/transport.ts (Chapman-Enskog viscosity with
 * Lennard-Jones parameters from Svehla, NASA TR R-132 (1962), modified Eucken conductivity, Wilke and
 * Mason-Saxena mixing; sources and checks in data/ideal-gas/transport.json).
 *
 * Low-density limit: no pressure dependence. Gases without transport data (H2O, NH3, SO2, …, and
 * user-defined gases) throw {@link UnavailablePropertyError} from the methods and give `undefined` on states.
 *
 * @module
 */
import { CallUnits } from '../core/call-units.js';
import { readTemperature, type Bounds } from '../core/read.js';
import { optionalQuantity, resultQuantity } from '../core/result.js';
// OutOfRangeError is named in the doc comments' links
import { UnavailablePropertyError, type OutOfRangeError } from '../errors.js';
import type { LooseQuantity } from '../core/inputs.js';
import type { Quantity, QuantityInput } from '../units/quantity.js';
import type { IdealGasModel } from './model.js';
import { GasMixtureTransport, gasTransportIds, gasTransportModel, type GasTransportModel } from './transport.js';

/** The transport methods of an ideal gas (part of `IdealGas`). */
export interface GasTransportMethods {
  /**
   * Dynamic viscosity μ(T) of the dilute gas (Chapman-Enskog with Svehla's Lennard-Jones parameters;
   * mixtures by Wilke's rule). Independent of pressure: valid where the gas is ideal.
   * Range: the species' transport data, at most 200 K to 2000 K (He to 1022 K); uncertainty about 2 %
   * near room temperature, about 3 % at 1000 K.
   * @throws {@link UnavailablePropertyError} a gas (or mixture component) without transport data, listing those that have it
   * @throws {@link OutOfRangeError} T outside the transport data's range, in the caller's unit
   * @example
   * ```ts
   * idealGas('N2').viscosity('300 K').in('µPa·s');     //=> 17.699 (Incropera Table A.4: 17.82, from memory)
   * idealGas('air').viscosity('80 °F').in('lbm/(ft·h)'); //=> 0.04437...
   * idealGas('H2O').viscosity('400 K');   // throws UnavailablePropertyError: H2O has no dilute-gas transport data
   * idealGas('He').viscosity('1500 °F');  // throws OutOfRangeError: T = 1500 °F (1088.7056 K) is above the upper limit of the dilute-gas transport data for He (1379.93 °F (1022 K))
   * ```
   */
  viscosity<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<'dynamicViscosity'>;
  /**
   * Thermal conductivity λ(T) of the dilute gas: modified Eucken, λ M/(μ cv) = 1.32 + 1.77 R/cv, with the
   * species' temperature-dependent cv (exact Eucken 15/4 μR/M for monatomic gases); mixtures by
   * Mason-Saxena (ε = 1). Uncertainty about 2 % for monatomic gases, about 10 % for polyatomic ones
   * (it reads high). Range and errors as {@link GasTransportMethods.viscosity}.
   * @example
   * ```ts
   * idealGas('air').thermalConductivity('300 K').in('W/(m·K)');   //=> 0.026713 (Incropera Table A.4: 0.0263, from memory)
   * idealGas('H2').thermalConductivity('300 K').in('mW/(m·K)');   //=> 184.3... (Incropera Table A.4: 183, from memory)
   * ```
   */
  thermalConductivity<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): Quantity<'thermalConductivity'>;
  /**
   * Prandtl number Pr = μ cp/λ at T, with this gas's cp (the frozen value of a constant-cp gas).
   * Range and errors as {@link GasTransportMethods.viscosity}.
   * @example
   * ```ts
   * idealGas('air').prandtl('300 K');   //=> 0.690 (Incropera Table A.4: 0.707, from memory)
   * idealGas('Ar').prandtl('300 K');    //=> 0.6667 (monatomic: 2/3)
   * ```
   */
  prandtl<I extends LooseQuantity<'temperature'>>(T: QuantityInput<'temperature', I>): number;
  /** The transport SI core (plain numbers, no range checks), or `undefined` when the gas has no transport data. */
  readonly transportCore: GasTransportModel | undefined;
}

/**
 * The transport properties of a gas state, computed on first access; `undefined` without transport
 * data or outside its range (the methods of {@link GasTransportMethods} throw there instead). They
 * are getters on the state's prototype: `st.mu` and `JSON.stringify(st)` have them, `{ ...st }` does not.
 * @example
 * ```ts
 * const st = idealGas('air').state({ T: '300 K', p: '1 atm' });
 * st.mu?.in('µPa·s');    //=> 18.351 (Incropera Table A.4: 18.46, from memory)
 * st.nu?.in('m²/s');     //=> 1.5596e-5 (μ/ρ)
 * st.alpha?.in('m²/s');  //=> 2.2592e-5 (λ/(ρ cp))
 * idealGas('H2O').state({ T: '400 K', p: '1 atm' }).mu;   //=> undefined (no transport data)
 * ```
 */
export interface GasStateTransport {
  /** Dynamic viscosity of the dilute gas (no pressure dependence). */
  readonly mu: Quantity<'dynamicViscosity'> | undefined;
  /** Thermal conductivity of the dilute gas. */
  readonly lambda: Quantity<'thermalConductivity'> | undefined;
  /** Kinematic viscosity ν = μ/ρ (depends on p through ρ). */
  readonly nu: Quantity<'kinematicViscosity'> | undefined;
  /** Thermal diffusivity α = λ/(ρ cp). */
  readonly alpha: Quantity<'thermalDiffusivity'> | undefined;
  /** Prandtl number μ cp/λ. */
  readonly Pr: number | undefined;
}

/** Where a gas's transport comes from: its model, or the name of the gas (or component) that has none. */
export interface TransportSource {
  readonly model: GasTransportModel | undefined;
  /** The gas or component without transport data (named in the error). */
  readonly missing: string;
  /** Why it has none (for the error). */
  readonly reason?: string;
}

/** The transport of a catalogued species, by its id. */
export function speciesTransport(id: string): TransportSource {
  return { model: gasTransportModel(id), missing: id, reason: 'not in the dilute-gas transport catalogue (data/ideal-gas/transport.json says why for the species left out)' };
}

/** The transport of a mixture: Wilke / Mason-Saxena over its components, when every one has data. */
export function mixtureTransport(ids: readonly string[], moleFractions: readonly number[]): TransportSource {
  const models: GasTransportModel[] = [];
  for (const id of ids) {
    const m = gasTransportModel(id);
    if (m === undefined) return { model: undefined, missing: id, reason: `the mixture's component ${id} is not in the dilute-gas transport catalogue` };
    models.push(m);
  }
  return { model: new GasMixtureTransport(models, moleFractions), missing: '' };
}

/** No transport (a user-defined gas). */
export function noTransport(name: string): TransportSource {
  return { model: undefined, missing: name, reason: 'a user-defined gas carries no transport data' };
}

/** The methods of {@link GasTransportMethods} for a gas of thermodynamic core `core` (mass cp = cpR·R). */
export function transportMethods(source: TransportSource, core: IdealGasModel, name: string): GasTransportMethods {
  const model = source.model;
  const bounds: Bounds | undefined = model && { min: model.Tmin, max: model.Tmax, scope: `the dilute-gas transport data for ${name}` };
  const read = (input: unknown): number => {
    if (model === undefined) throw new UnavailablePropertyError(source.missing, 'dilute-gas transport', source.reason ?? 'no transport data', gasTransportIds());
    return readTemperature(input, 'T', bounds, new CallUnits());
  };
  return {
    transportCore: model,
    viscosity: (T) => {
      const t = read(T);
      return resultQuantity(model!.mu(t), 'dynamicViscosity', 'mu');
    },
    thermalConductivity: (T) => {
      const t = read(T);
      return resultQuantity(model!.lambda(t), 'thermalConductivity', 'lambda');
    },
    prandtl: (T) => {
      const t = read(T);
      const Pr = (model!.mu(t) * core.cpR(t) * core.R) / model!.lambda(t);
      return resultQuantity(Pr, 'dimensionless', 'Pr').si;
    },
  };
}

/**
 * The transport part of a gas state: getters on the prototype, computed on first access and kept.
 * A class rather than per-state property definitions: defining five getters on each state object
 * measured 8 to 25 µs per state (a loaded 2-core machine), building this object about 0.3 µs.
 */
class GasStateWithTransport implements GasStateTransport {
  readonly #model: GasTransportModel | undefined;
  readonly #core: IdealGasModel;
  readonly #T: number;
  readonly #rho: number;
  #mu = NaN;
  #lambda = NaN;
  #done = false;

  constructor(model: GasTransportModel | undefined, core: IdealGasModel, T: number, rho: number) {
    this.#model = model !== undefined && T >= model.Tmin && T <= model.Tmax ? model : undefined;
    this.#core = core;
    this.#T = T;
    this.#rho = rho;
  }

  #values(): void {
    if (this.#done) return;
    this.#done = true;
    if (this.#model === undefined) return;
    this.#mu = this.#model.mu(this.#T);
    this.#lambda = this.#model.lambda(this.#T);
  }

  #cp(): number {
    return this.#core.cpR(this.#T) * this.#core.R;
  }

  get mu(): Quantity<'dynamicViscosity'> | undefined {
    this.#values();
    return optionalQuantity(this.#mu, 'dynamicViscosity', 'mu');
  }

  get lambda(): Quantity<'thermalConductivity'> | undefined {
    this.#values();
    return optionalQuantity(this.#lambda, 'thermalConductivity', 'lambda');
  }

  get nu(): Quantity<'kinematicViscosity'> | undefined {
    this.#values();
    return optionalQuantity(this.#mu / this.#rho, 'kinematicViscosity', 'nu');
  }

  get alpha(): Quantity<'thermalDiffusivity'> | undefined {
    this.#values();
    return optionalQuantity(this.#lambda / (this.#rho * this.#cp()), 'thermalDiffusivity', 'alpha');
  }

  get Pr(): number | undefined {
    this.#values();
    const v = (this.#mu * this.#cp()) / this.#lambda;
    return Number.isNaN(v) ? undefined : v;
  }

  /** JSON of the state: its own fields and the five transport values. */
  toJSON(): Record<string, unknown> {
    return { ...(this as object), mu: this.mu, lambda: this.lambda, nu: this.nu, alpha: this.alpha, Pr: this.Pr };
  }
}

/**
 * The state `fields` with the transport properties of (T, ρ) as getters computed on first access
 * (so `gas.state` costs nothing extra unless they are read). The getters live on the prototype: read
 * them by name (`st.mu`); `{ ...st }` and `Object.keys(st)` see only the thermodynamic fields, JSON
 * has all.
 */
export function withGasTransport<S extends object>(fields: S, model: GasTransportModel | undefined, core: IdealGasModel, T: number, rho: number): S & GasStateTransport {
  return Object.assign(new GasStateWithTransport(model, core, T, rho), fields);
}
