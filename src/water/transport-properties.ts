/**
 * Transport properties of water and steam, the facade: viscosity (IAPWS R12-08), thermal
 * conductivity (IAPWS R15-11), each with its critical enhancement, and surface tension (IAPWS
 * R1-76(2014)). The enhancements' thermodynamic inputs come from IAPWS-95, the equation the releases
 * use, so the functions cover each correlation's own range in (T, ρ), independent of IF97's.
 *
 * @module
 */
import { CallUnits } from '../core/call-units.js';
import { rangeError, readFlag, readOptions, readPair, readPositiveDensity, readTemperature, type Bounds } from '../core/read.js';
import { resultQuantity } from '../core/result.js';
import { Status } from '../core/status.js';
import { OutOfRangeError } from '../errors.js';
import { stateFromPT as fluidStateFromPT } from '../fluids/flash.js';
import { FluidState } from '../fluids/model.js';
import { saturationAtT as fluidSaturationAtT } from '../fluids/saturation.js';
import type { Quantity, QuantityLike } from '../units/quantity.js';
import type { CheckedInputs, LooseQuantity } from '../core/inputs.js';
import type { WaterInputDimensions } from './state-types.js';
import { T_CRITICAL } from './if97/constants.js';
import { ConductivityResult, conductivityPressureLimit, CONDUCTIVITY_T_MAX, CONDUCTIVITY_T_MIN, thermalConductivity } from './transport/conductivity.js';
import { CriticalEnhancementInputs } from './transport/critical.js';
import { iapws95EnhancementInputs, Iapws95InputsWork } from './transport/iapws95-inputs.js';
import { surfaceTension, SurfaceTensionResult, SURFACE_TENSION_T_MAX, SURFACE_TENSION_T_MIN } from './transport/surface-tension.js';
import { viscosity, viscosityPressureLimit, ViscosityResult, VISCOSITY_T_MAX, VISCOSITY_T_MIN } from './transport/viscosity.js';

/** Options of the transport functions. */
export interface TransportOptions {
  /**
   * Include the critical enhancement (μ2 of R12-08, λ2 of R15-11). Default true. The releases' tables
   * list values both ways; away from the critical point μ2 is 1 to within 2 %, while λ2 stays
   * noticeable far out (10 % of λ at 638 K and 500 kg/m³).
   */
  readonly criticalEnhancement?: boolean;
}

/** A (T, ρ) point: temperature and density. */
export interface TemperatureDensity {
  readonly T: LooseQuantity<'temperature'>;
  readonly rho: LooseQuantity<'density'>;
}

const work = new Iapws95InputsWork();
const inputs = new CriticalEnhancementInputs();
const mu = new ViscosityResult();
const lambda = new ConductivityResult();
const sigma = new SurfaceTensionResult();
const liquid = new FluidState();
const vapor = new FluidState();
const limitState = new FluidState();

const VISCOSITY: Bounds = { min: VISCOSITY_T_MIN, max: VISCOSITY_T_MAX, scope: 'IAPWS R12-08 (viscosity of water)' };
const CONDUCTIVITY: Bounds = { min: CONDUCTIVITY_T_MIN, max: CONDUCTIVITY_T_MAX, scope: 'IAPWS R15-11 (thermal conductivity of water)' };

/**
 * Reads (T, ρ) for a correlation and checks the state: single-phase (not inside the two-phase dome)
 * and within the correlation's pressure limit at T, with the pressure from IAPWS-95 at (T, ρ).
 */
function readPoint(at: unknown, fn: string, bounds: Bounds, pressureLimit: (T: number) => number): [number, number] {
  readPair(at, fn, [['T', 'rho']]);
  const a = at as Record<string, unknown>;
  const units = new CallUnits();
  const T = readTemperature(a.T as QuantityLike<'temperature'>, 'T', bounds, units);
  const rho = readPositiveDensity(a.rho as QuantityLike<'density'>, 'rho', units);
  const ctx = work.ctx;
  // inside the dome, with margins for states whose density came from IF97 (its saturated densities
  // differ from IAPWS-95's by up to 0.02 % on the liquid side and 0.2 % on the vapour side near T_c)
  if (T < T_CRITICAL && fluidSaturationAtT(ctx, T, liquid, vapor) === Status.ok && rho > vapor.rho * (1 + 2e-3) && rho < liquid.rho * (1 - 2e-4)) {
    const nearer = rho - vapor.rho < liquid.rho - rho;
    throw rangeError('rho', rho, 'density', nearer ? { min: 0, max: vapor.rho, scope: `${bounds.scope}: vapour at this T (densities between the saturated vapour and liquid lie inside the two-phase dome)`, minExclusive: true } : { min: liquid.rho, max: Infinity, scope: `${bounds.scope}: liquid at this T (densities between the saturated vapour and liquid lie inside the two-phase dome)` }, units);
  }
  if (iapws95EnhancementInputs(T, rho, inputs, work) === Status.ok) {
    // the releases limit the pressure; allow 0.1 % for states whose density came from IF97, whose
    // pressure at that density differs from IAPWS-95's by up to that much at the top of the range
    const pMax = pressureLimit(T);
    if (work.state.p > pMax * (1 + 1e-3)) {
      const rhoMax = fluidStateFromPT(ctx, pMax, T, limitState) === Status.ok ? limitState.rho : rho;
      throw rangeError('rho', rho, 'density', { min: 0, max: rhoMax, scope: `${bounds.scope} at this T (pressure up to ${pMax / 1e6} MPa)`, minExclusive: true }, units);
    }
  }
  return [T, rho];
}

function enhancementWanted(options: unknown): boolean {
  const o = readOptions<TransportOptions>(options, 'options', ['criticalEnhancement']);
  return o.criticalEnhancement === undefined ? true : readFlag(o.criticalEnhancement, 'options.criticalEnhancement');
}

/** Fills `inputs` at (T, ρ) for the enhancement, or throws when IAPWS-95 has none there (the critical point itself). */
function enhancementAt(T: number, rho: number): void {
  if (iapws95EnhancementInputs(T, rho, inputs, work) !== Status.ok) {
    throw new OutOfRangeError({ quantity: 'rho', value: rho, min: 0, max: Infinity, unit: 'kg/m³', scope: 'the critical enhancement (undefined at the critical point itself)' }, `the critical enhancement is not defined at T = ${T} K, ρ = ${rho} kg/m³ (the critical point, where the compressibility diverges); pass { criticalEnhancement: false }`);
  }
}

/**
 * Dynamic viscosity of water or steam at (T, ρ), IAPWS R12-08 (the 2008 formulation), with the
 * critical enhancement unless `{ criticalEnhancement: false }`.
 * Range: 273.15 K to 1173.15 K, up to the release's pressure limit at T (1000 MPa to 273.15 K… see the
 * docs), single-phase states only; ρ in any unit. Uncertainty: 1 % for the liquid at moderate
 * pressure, up to 7 % at the extremes (the release's Figure 2).
 * @throws {@link OutOfRangeError} T outside the range, ρ inside the two-phase dome or beyond the pressure limit
 * @example
 * ```ts
 * water.viscosity({ T: '298.15 K', rho: '998 kg/m³' }).in('µPa·s');   //=> 889.7351 (R12-08 Table 4)
 * water.viscosity({ T: '647.35 K', rho: '322 kg/m³' }).in('µPa·s');   //=> 42.96158 (Table 5, with μ2)
 * ```
 */
export function waterViscosity<const P extends TemperatureDensity>(at: P & CheckedInputs<P, WaterInputDimensions>, options?: TransportOptions): Quantity<'dynamicViscosity'> {
  const enhanced = enhancementWanted(options);
  const [T, rho] = readPoint(at, 'water.viscosity', VISCOSITY, viscosityPressureLimit);
  if (enhanced) enhancementAt(T, rho);
  if (viscosity(T, rho, enhanced, inputs, mu) !== Status.ok) throw rangeError('T', T, 'temperature', VISCOSITY);
  return resultQuantity(mu.mu, 'dynamicViscosity', 'mu');
}

/**
 * Thermal conductivity of water or steam at (T, ρ), IAPWS R15-11 (the 2011 formulation), with the
 * critical enhancement unless `{ criticalEnhancement: false }`.
 * Range: 273.15 K to 1173.15 K, up to the release's pressure limit at T, single-phase states only.
 * @throws {@link OutOfRangeError} as {@link waterViscosity}
 * @example
 * ```ts
 * water.thermalConductivity({ T: '298.15 K', rho: '998 kg/m³' }).in('mW/(m·K)');   //=> 607.7... (with λ2)
 * water.thermalConductivity({ T: '647.35 K', rho: '322 kg/m³' }).in('mW/(m·K)');   //=> 1443.756 (R15-11 Table 5)
 * ```
 */
export function waterThermalConductivity<const P extends TemperatureDensity>(at: P & CheckedInputs<P, WaterInputDimensions>, options?: TransportOptions): Quantity<'thermalConductivity'> {
  const enhanced = enhancementWanted(options);
  const [T, rho] = readPoint(at, 'water.thermalConductivity', CONDUCTIVITY, conductivityPressureLimit);
  if (enhanced) enhancementAt(T, rho);
  if (thermalConductivity(T, rho, enhanced, inputs, lambda) !== Status.ok) throw rangeError('T', T, 'temperature', CONDUCTIVITY);
  return resultQuantity(lambda.lambda, 'thermalConductivity', 'lambda');
}

const SURFACE: Bounds = { min: SURFACE_TENSION_T_MIN, max: SURFACE_TENSION_T_MAX, scope: 'IAPWS R1-76(2014) (surface tension: triple point to critical point)' };

/**
 * Surface tension of water against its vapour, IAPWS R1-76(2014): σ = B τ^μ (1 + b τ), τ = 1 − T/Tc,
 * from the triple point (273.16 K) to the critical point (647.096 K), where it vanishes.
 * @throws {@link OutOfRangeError} T outside 273.16 K to 647.096 K
 * @example
 * ```ts
 * water.surfaceTension({ T: '25 °C' }).in('mN/m');   //=> 71.97... (R1-76 Table 1: 71.97)
 * water.surfaceTension({ T: '700 K' });              // throws OutOfRangeError: T = 700 K is above the upper limit of IAPWS R1-76(2014) … (647.096 K)
 * ```
 */
export function waterSurfaceTension<const P extends { readonly T: LooseQuantity<'temperature'> }>(at: P & CheckedInputs<P, WaterInputDimensions>): Quantity<'surfaceTension'> {
  readPair(at, 'water.surfaceTension', [['T']]);
  const units = new CallUnits();
  const T = readTemperature((at as { T: QuantityLike<'temperature'> }).T, 'T', SURFACE, units);
  if (surfaceTension(T, sigma) !== Status.ok) throw rangeError('T', T, 'temperature', SURFACE, units);
  return resultQuantity(sigma.sigma, 'surfaceTension', 'sigma');
}

/** Transport values of a state, SI (NaN where not defined: outside a correlation's range, two-phase, the critical point). */
export interface TransportValues {
  mu: number;
  lambda: number;
}

/**
 * The SI transport values at a single-phase state (T, ρ, p) with the critical enhancements, NaN
 * where a correlation does not cover the state. For the state objects of `water.state`.
 */
export function transportAt(T: number, rho: number, p: number, out: TransportValues): TransportValues {
  out.mu = NaN;
  out.lambda = NaN;
  if (!(T >= VISCOSITY_T_MIN && T <= VISCOSITY_T_MAX) || iapws95EnhancementInputs(T, rho, inputs, work) !== Status.ok) return out;
  if (p <= viscosityPressureLimit(T) && viscosity(T, rho, true, inputs, mu) === Status.ok) out.mu = mu.mu;
  if (p <= conductivityPressureLimit(T) && thermalConductivity(T, rho, true, inputs, lambda) === Status.ok) out.lambda = lambda.lambda;
  return out;
}

/** Surface tension in N/m at T, NaN outside 273.16 K to T_c. */
export function surfaceTensionAt(T: number): number {
  return surfaceTension(T, sigma) === Status.ok ? sigma.sigma : NaN;
}
