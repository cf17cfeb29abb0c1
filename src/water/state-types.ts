/**
 * The types of the water and steam facade (src/water/state.ts): the pairs `water.state` takes, the
 * records it returns, its options.
 *
 * @module
 */
import type { CheckedInputs, LooseQuantity } from '../core/inputs.js';
import type { Quantity } from '../units/quantity.js';

/** The phase of a state. */
export type WaterPhase = 'liquid' | 'vapor' | 'two-phase' | 'supercritical';

/** A state of water or steam, as `water.state` returns it. */
export interface WaterStateResult {
  /** Temperature. */
  readonly T: Quantity<'temperature'>;
  /** Pressure (absolute). */
  readonly p: Quantity<'pressure'>;
  /** `'liquid'`, `'vapor'`, `'two-phase'` or `'supercritical'` (T ≥ 647.096 K and p ≥ 22.064 MPa). */
  readonly phase: WaterPhase;
  /** IAPWS-IF97 region: 1 (liquid), 2 (vapour), 3 (near-critical), 4 (two-phase), 5 (above 1073.15 K). */
  readonly region: 1 | 2 | 3 | 4 | 5;
  /** Quality (vapour mass fraction) in two-phase states; `undefined` in single-phase states. */
  readonly x: number | undefined;
  /** Specific volume. */
  readonly v: Quantity<'specificVolume'>;
  /** Density. */
  readonly rho: Quantity<'density'>;
  /** Specific internal energy (IF97 reference: u = s = 0 for saturated liquid at the triple point). */
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
  /** Saturation temperature at this pressure, T_s(p); `undefined` below 611.213 Pa and above the critical pressure (22.064 MPa). */
  readonly Tsat: Quantity<'temperature'> | undefined;
  /** Superheat T − T_s(p) of a vapour; `undefined` for other phases. */
  readonly superheat: Quantity<'temperatureDifference'> | undefined;
  /** Subcooling T_s(p) − T of a liquid; `undefined` for other phases. */
  readonly subcooling: Quantity<'temperatureDifference'> | undefined;
  /**
   * Dynamic viscosity (IAPWS R12-08, with its critical enhancement); `undefined` in two-phase states
   * and outside the release's range (T above 1173.15 K, p above its limit). Computed on first access,
   * like `lambda`, `nu`, `alpha` and `Pr`: they are getters, read by name; `JSON.stringify(state)` has
   * them, `{ ...state }` and `Object.keys(state)` do not.
   */
  readonly mu: Quantity<'dynamicViscosity'> | undefined;
  /** Thermal conductivity (IAPWS R15-11, with its critical enhancement); `undefined` as for `mu`. */
  readonly lambda: Quantity<'thermalConductivity'> | undefined;
  /** Kinematic viscosity ν = μ/ρ. */
  readonly nu: Quantity<'kinematicViscosity'> | undefined;
  /** Thermal diffusivity α = λ/(ρ·cp). */
  readonly alpha: Quantity<'thermalDiffusivity'> | undefined;
  /** Prandtl number Pr = μ·cp/λ. */
  readonly Pr: number | undefined;
}

/** One saturated phase. */
export interface SaturatedPhase {
  readonly v: Quantity<'specificVolume'>;
  readonly rho: Quantity<'density'>;
  readonly u: Quantity<'specificEnergy'>;
  readonly h: Quantity<'specificEnergy'>;
  readonly s: Quantity<'specificEntropy'>;
  /**
   * Dynamic viscosity (IAPWS R12-08); `undefined` at the critical point itself. Computed on first
   * access, like the other transport values (getters: read by name; JSON has them, `{ ...phase }` not).
   */
  readonly mu: Quantity<'dynamicViscosity'> | undefined;
  /** Thermal conductivity (IAPWS R15-11); `undefined` at the critical point itself. */
  readonly lambda: Quantity<'thermalConductivity'> | undefined;
  /** Kinematic viscosity ν = μ/ρ. */
  readonly nu: Quantity<'kinematicViscosity'> | undefined;
  /** Thermal diffusivity α = λ/(ρ·cp). */
  readonly alpha: Quantity<'thermalDiffusivity'> | undefined;
  /** Prandtl number μ·cp/λ. */
  readonly Pr: number | undefined;
}

/** Saturated liquid (f) and vapour (g) at a temperature or pressure. */
export interface SaturationResult {
  readonly T: Quantity<'temperature'>;
  readonly p: Quantity<'pressure'>;
  readonly liquid: SaturatedPhase;
  readonly vapor: SaturatedPhase;
  /** h_g − h_f, the enthalpy of vaporisation. */
  readonly hfg: Quantity<'specificEnergy'>;
  /** s_g − s_f. */
  readonly sfg: Quantity<'specificEntropy'>;
  /** u_g − u_f. */
  readonly ufg: Quantity<'specificEnergy'>;
  /** Surface tension (IAPWS R1-76(2014)); 0 at the critical point; `undefined` below the triple point (273.16 K). */
  readonly sigma: Quantity<'surfaceTension'> | undefined;
}

/**
 * The pairs `water.state` accepts. Pressures are absolute; gauge units (`psig`) are converted with the
 * ambient. Each quantity is a `Quantity`, unit text (checked by the compiler when it is a literal) or a
 * run-time `string` (checked when read).
 */
export type WaterPair =
  | { readonly T: LooseQuantity<'temperature'>; readonly p: LooseQuantity<'pressure'> }
  | { readonly p: LooseQuantity<'pressure'>; readonly h: LooseQuantity<'specificEnergy'> }
  | { readonly p: LooseQuantity<'pressure'>; readonly s: LooseQuantity<'specificEntropy'> }
  | { readonly h: LooseQuantity<'specificEnergy'>; readonly s: LooseQuantity<'specificEntropy'> }
  | { readonly T: LooseQuantity<'temperature'>; readonly x: number }
  | { readonly p: LooseQuantity<'pressure'>; readonly x: number }
  | { readonly T: LooseQuantity<'temperature'>; readonly v: LooseQuantity<'specificVolume'> }
  | { readonly T: LooseQuantity<'temperature'>; readonly rho: LooseQuantity<'density'> };

/** The dimension of each input name of water. */
export interface WaterInputDimensions {
  T: 'temperature';
  p: 'pressure';
  h: 'specificEnergy';
  s: 'specificEntropy';
  v: 'specificVolume';
  rho: 'density';
}

/** A pair with its literal unit texts checked against {@link WaterInputDimensions}. */
export type CheckedWaterPair<P> = P & CheckedInputs<P, WaterInputDimensions>;

/** How the properties of a state are evaluated: see {@link WaterStateOptions}. */
export type WaterAccuracy = 'fast' | 'compensated';

/** Options of {@link waterState}. */
export interface WaterStateOptions {
  /**
   * `'fast'` (the default): the IF97 kernels in double arithmetic, a few ulp off the exact equations
   * typically (thousands at the 99th percentile in region 3, up to about 8e5 ulp for cp near the
   * critical point, tens of thousands near the zeros of u and s). `'compensated'`: the same solve,
   * then the state's properties evaluated once more with the compensated (double-double) kernel of
   * its region (two-phase: of both saturated phases, then mixed), within 16 ulp of the exact
   * equations, for about 1 to 4 µs more per call (docs/guide/accuracy.md).
   */
  readonly accuracy?: WaterAccuracy;
}
