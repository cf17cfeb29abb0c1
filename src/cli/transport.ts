/**
 * Transport properties of a water state for `heatstate water … --transport`: viscosity (IAPWS
 * R12-08), thermal conductivity (IAPWS R15-11), and from them ν = μ/ρ, α = λ/(ρ cp), Pr = μ cp/λ.
 *
 * The water facade has no transport functions yet, so the command calls the transport SI core
 * (src/water/transport/) with the state's T, ρ, cp, cv and w. The critical enhancements are included
 * where their inputs exist (`enhancementInputsFromState`: up to 500 kg/m³, the densest state at which
 * the IF97 helper gives (∂ρ/∂p)_T at T_R); above that they are left out, and the output says so. For
 * dense liquid they are small (λ2 is 0.56 % of λ at 647.35 K and 750 kg/m³, R15-11 Table 5).
 *
 * @module
 */
import { CallUnits } from '../core/call-units.js';
import { throwForStatus } from '../core/fail.js';
import { rangeError } from '../core/read.js';
import { resultQuantity } from '../core/result.js';
import { Status } from '../core/status.js';
import { formatNumber } from '../errors.js';
import type { Quantity } from '../units/quantity.js';
import { WaterProperties } from '../water/if97/properties.js';
import {
  conductivityPressureLimit,
  ConductivityResult,
  CONDUCTIVITY_T_MAX,
  CONDUCTIVITY_T_MIN,
  CriticalEnhancementInputs,
  enhancementInputsFromState,
  If97InputsWork,
  thermalConductivity,
  viscosity,
  surfaceTension,
  SurfaceTensionResult,
  viscosityPressureLimit,
  ViscosityResult,
} from '../water/transport/index.js';
import { saturationAtT } from '../water/if97/saturation.js';
import type { WaterStateResult } from '../water/state.js';

/** Transport properties of one state. */
export interface WaterTransport {
  readonly mu: Quantity<'dynamicViscosity'>;
  readonly lambda: Quantity<'thermalConductivity'>;
  readonly nu: Quantity<'kinematicViscosity'>;
  readonly alpha: Quantity<'thermalDiffusivity'>;
  readonly Pr: number;
  /** Whether the critical enhancements are included, and why not when they are not. */
  readonly enhancement: string;
}

const SCOPE = 'IAPWS R12-08 viscosity and R15-11 thermal conductivity';

/**
 * μ, λ, ν, α and Pr of a single-phase IF97 state (T, p, ρ, cp, cv, w in SI), with the critical
 * enhancements where their inputs exist; `undefined` where cp, cv or w is not finite and positive.
 * @throws {@link OutOfRangeError} outside the releases' range (273.15 K to 1173.15 K, and their pressure limits)
 */
export function transportOf(props: WaterProperties, units: CallUnits): WaterTransport | undefined {
  const { T, p, rho, cp, cv, w } = props;
  if (!(cp > 0 && cp < Infinity && cv > 0 && cv < Infinity && w > 0 && w < Infinity)) return undefined;
  if (T < CONDUCTIVITY_T_MIN || T > CONDUCTIVITY_T_MAX) throw rangeError('T', T, 'temperature', { min: CONDUCTIVITY_T_MIN, max: CONDUCTIVITY_T_MAX, scope: SCOPE }, units);
  const pMax = Math.min(viscosityPressureLimit(T), conductivityPressureLimit(T));
  if (p > pMax) throw rangeError('p', p, 'pressure', { min: 0, max: pMax, scope: `${SCOPE} at this temperature` }, units);
  const d = new CriticalEnhancementInputs();
  const enhanced = enhancementInputsFromState(props, d, new If97InputsWork()) === Status.ok;
  const mu = new ViscosityResult();
  const lambda = new ConductivityResult();
  const statusMu = viscosity(T, rho, enhanced, d, mu);
  const statusLambda = thermalConductivity(T, rho, enhanced, d, lambda);
  for (const status of [statusMu, statusLambda]) {
    if (status !== Status.ok) {
      throwForStatus(status, {
        what: SCOPE,
        inputs: `T = ${units.describe(T, 'temperature', 'K')}, rho = ${formatNumber(rho)} kg/m³`,
        range: () => rangeError('T', T, 'temperature', { min: CONDUCTIVITY_T_MIN, max: CONDUCTIVITY_T_MAX, scope: SCOPE }, units),
      });
    }
  }
  return {
    mu: resultQuantity(mu.mu, 'dynamicViscosity', 'mu'),
    lambda: resultQuantity(lambda.lambda, 'thermalConductivity', 'lambda'),
    nu: resultQuantity(mu.mu / rho, 'kinematicViscosity', 'nu'),
    alpha: resultQuantity(lambda.lambda / (rho * cp), 'thermalDiffusivity', 'alpha'),
    Pr: (mu.mu * cp) / lambda.lambda,
    enhancement: enhanced ? 'included' : rho > 500 ? 'left out (above 500 kg/m³: no IF97 input at 970.644 K)' : 'left out (no input at this state)',
  };
}

/**
 * Transport properties of a state from `water.state`; `undefined` for a two-phase state (no single
 * value exists). `units` holds the units the user wrote T and p in, for errors.
 */
export function waterTransport(st: WaterStateResult, units: CallUnits): WaterTransport | undefined {
  if (st.phase === 'two-phase' || st.cp === undefined || st.cv === undefined || st.w === undefined) return undefined;
  const props = new WaterProperties();
  props.T = st.T.si;
  props.p = st.p.si;
  props.rho = st.rho.si;
  props.v = st.v.si;
  props.cp = st.cp.si;
  props.cv = st.cv.si;
  props.w = st.w.si;
  return transportOf(props, units);
}

/** Transport properties of the saturated liquid and vapour at T (K), and the surface tension (IAPWS R1-76(2014)). */
export function saturationTransport(T: number, units: CallUnits): { liquid: WaterTransport | undefined; vapor: WaterTransport | undefined; sigma: Quantity<'surfaceTension'> | undefined } {
  const liquid = new WaterProperties();
  const vapor = new WaterProperties();
  const status = saturationAtT(T, liquid, vapor);
  if (status !== Status.ok) {
    throwForStatus(status, { what: 'the IAPWS-IF97 saturation', inputs: `T = ${units.describe(T, 'temperature', 'K')}`, range: () => rangeError('T', T, 'temperature', { min: 273.15, max: 647.096, scope: 'the saturation line' }, units) });
  }
  const sigma = new SurfaceTensionResult();
  const s = surfaceTension(T, sigma);
  return {
    liquid: transportOf(liquid, units),
    vapor: transportOf(vapor, units),
    sigma: s === Status.ok ? resultQuantity(sigma.sigma, 'surfaceTension', 'sigma') : undefined,
  };
}
