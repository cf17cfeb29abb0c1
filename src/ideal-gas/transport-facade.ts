/**
 * Dilute-gas transport on the ideal-gas facade: the `viscosity`, `thermalConductivity` and `prandtl`
 * methods of a gas from `idealGas()` or `mixture()`, and the lazy `mu`, `lambda`, `nu`, `alpha` and
 * `Pr` of its states. The SI core is src/ideal-gas/transport.ts (Chapman-Enskog viscosity with
 * Lennard-Jones parameters from Svehla, NASA TR R-132 (1962), modified Eucken conductivity, Wilke and
 * Mason-Saxena mixing; sources and checks in data/ideal-gas/transport.json).
 *
 * Low-density limit: no pressure dependence. Gases without transport data (H2O, NH3, SO2, …, and
 * user-defined gases) throw {@link UnknownNameError} from the methods and give `undefined` on states.
 *
 * @module
 */
import { CallUnits } from '../core/call-units.js';
import { readTemperature, type Bounds } from '../core/read.js';
import { optionalQuantity, resultQuantity } from '../core/result.js';
// OutOfRangeError is named in the doc comments' links
import { UnknownNameError, type OutOfRangeError } from '../errors.js';
import type { LooseQuantity } from '../core/inputs.js';
import type { Quantity, QuantityInput } from '../units/quantity.js';
import type { IdealGasModel } from './model.js';
import { GasMixtureTransport, gasTransportIds, gasTransportModel, type GasTransportModel } from './transport.js';

/** The transport methods of an ideal gas (see {@link IdealGas}). */
export interface GasTransportMethods {
  /**
   * Dynamic viscosity μ(T) of the dilute gas (Chapman-Enskog with Svehla's Lennard-Jones parameters;
   * mixtures by Wilke's rule). Independent of pressure: valid where the gas is ideal.
   * Range: the species' transport data, at most 200 K to 2000 K (He to 1022 K); uncertainty about 2 %
   * near room temperature, about 3 % at 1000 K.
   * @throws {@link UnknownNameError} a gas (or mixture component) without transport data, listing those that have it
   * @throws {@link OutOfRangeError} T outside the transport data's range, in the caller's unit
   * @example
   * ```ts
   * idealGas('N2').viscosity('300 K').in('µPa·s');     //=> 17.699 (Incropera Table A.4: 17.82, from memory)
   * idealGas('air').viscosity('80 °F').in('lbm/(ft·h)'); //=> 0.04437...
   * idealGas('H2O').viscosity('400 K');   // throws UnknownNameError: "H2O" is not in the dilute-gas transport catalogue
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
 * data or outside its range (the methods of {@link GasTransportMethods} throw there instead).
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
}

/** The transport of a catalogued species, by its id. */
export function speciesTransport(id: string): TransportSource {
  return { model: gasTransportModel(id), missing: id };
}

/** The transport of a mixture: Wilke / Mason-Saxena over its components, when every one has data. */
export function mixtureTransport(ids: readonly string[], moleFractions: readonly number[]): TransportSource {
  const models: GasTransportModel[] = [];
  for (const id of ids) {
    const m = gasTransportModel(id);
    if (m === undefined) return { model: undefined, missing: id };
    models.push(m);
  }
  return { model: new GasMixtureTransport(models, moleFractions), missing: '' };
}

/** No transport (a user-defined gas). */
export function noTransport(name: string): TransportSource {
  return { model: undefined, missing: name };
}

/** The methods of {@link GasTransportMethods} for a gas of thermodynamic core `core` (mass cp = cpR·R). */
export function transportMethods(source: TransportSource, core: IdealGasModel, name: string): GasTransportMethods {
  const model = source.model;
  const bounds: Bounds | undefined = model && { min: model.Tmin, max: model.Tmax, scope: `the dilute-gas transport data for ${name}` };
  const read = (input: unknown): number => {
    if (model === undefined) throw new UnknownNameError(source.missing, 'dilute-gas transport', gasTransportIds());
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
 * Adds the transport properties of the state (T, ρ) to `target` as enumerable getters computed on
 * first access (so `gas.state` costs nothing extra unless they are read), as water's states do.
 */
export function withGasTransport<S extends object>(target: S, model: GasTransportModel | undefined, core: IdealGasModel, T: number, rho: number): S & GasStateTransport {
  const defined = model !== undefined && T >= model.Tmin && T <= model.Tmax;
  let mu: number | undefined;
  let lambda: number | undefined;
  const getMu = (): number => (mu ??= defined ? model.mu(T) : NaN);
  const getLambda = (): number => (lambda ??= defined ? model.lambda(T) : NaN);
  const cp = (): number => core.cpR(T) * core.R;
  const getters: Record<keyof GasStateTransport, () => unknown> = {
    mu: () => optionalQuantity(getMu(), 'dynamicViscosity', 'mu'),
    lambda: () => optionalQuantity(getLambda(), 'thermalConductivity', 'lambda'),
    nu: () => optionalQuantity(getMu() / rho, 'kinematicViscosity', 'nu'),
    alpha: () => optionalQuantity(getLambda() / (rho * cp()), 'thermalDiffusivity', 'alpha'),
    Pr: () => {
      const v = (getMu() * cp()) / getLambda();
      return Number.isNaN(v) ? undefined : v;
    },
  };
  for (const [key, fn] of Object.entries(getters)) Object.defineProperty(target, key, { get: fn, enumerable: true, configurable: false });
  return target as S & GasStateTransport;
}
