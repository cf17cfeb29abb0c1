/**
 * Transport properties of the incompressible substances, plain-number SI core (K, Pa·s, W/(m·K)):
 * viscosity μ(T) of liquids and thermal conductivity λ(T) of liquids and solids, each compiled from
 * its definition into a {@link PropertyCurve}:
 * - `constant`: one value over its range;
 * - `table`: through tabulated (T, value) nodes, exact at the nodes; conductivity linear in T,
 *   viscosity with ln μ linear in 1/T between nodes (μ of a liquid falls roughly as exp(B/T), so a
 *   straight line in T would overshoot between widely spaced nodes by tens of per cent);
 * - `iapws`: liquid water, IAPWS R12-08 (viscosity) and R15-11 (thermal conductivity) with their
 *   critical enhancements, at the IF97 saturated-liquid density ρ(p_s(T), T) (IAPWS R7-97(2012),
 *   regions 4 and 1), the enhancements' inputs from IAPWS-95 at that (T, ρ), as on the states of
 *   `water.state` (the SI cores of src/water/transport/, never their facade);
 * - `none`: left out (the reason is in `reason`): the facade throws.
 * No range checks here: the facade checks before calling.
 *
 * @module
 */
import { saturationPressure } from '../water/if97/region4.js';
import { region1 } from '../water/if97/region1.js';
import { WaterProperties } from '../water/if97/properties.js';
import { ConductivityResult, thermalConductivity } from '../water/transport/conductivity.js';
import { CriticalEnhancementInputs } from '../water/transport/critical.js';
import { iapws95EnhancementInputs, Iapws95InputsWork } from '../water/transport/iapws95-inputs.js';
import { viscosity, ViscosityResult } from '../water/transport/viscosity.js';
import { segmentIndex } from '../numeric/search.js';
import { Status, type StatusCode } from '../core/status.js';

/** One compiled transport property of a substance, SI. */
export interface PropertyCurve {
  readonly form: 'constant' | 'table' | 'iapws' | 'none';
  /** Valid temperatures of these data, K (NaN for `none`). */
  readonly Tmin: number;
  readonly Tmax: number;
  /** The value of a `constant`, SI. */
  readonly value: number;
  /** Node temperatures, K, strictly increasing (`table`). */
  readonly nodesT: Float64Array;
  /** Values at the nodes, SI (`table`). */
  readonly nodes: Float64Array;
  /** `table` only: ln(value) linear in 1/T between nodes (viscosity) rather than value linear in T. */
  readonly logarithmic: boolean;
  /** Why the data were left out (`none`), for the facade's error. */
  readonly reason: string;
}

/** A curve with no data, and why. */
export function missingCurve(reason: string): PropertyCurve {
  return { form: 'none', Tmin: NaN, Tmax: NaN, value: NaN, nodesT: new Float64Array(0), nodes: new Float64Array(0), logarithmic: false, reason };
}

/** Scratch of {@link iapwsLiquidWater}: IF97 state, enhancement inputs and the correlations' results. Reuse one. */
export class LiquidWaterTransportWork {
  readonly state = new WaterProperties();
  readonly inputs = new CriticalEnhancementInputs();
  readonly fluid = new Iapws95InputsWork();
  readonly mu = new ViscosityResult();
  readonly lambda = new ConductivityResult();
}

/**
 * μ (Pa·s) or λ (W/(m·K)) of saturated liquid water at T (K), written to `work.mu.mu` or
 * `work.lambda.lambda`: IAPWS R12-08 / R15-11 with the critical enhancement at the IF97
 * saturated-liquid density. `Status.outOfRange` outside 273.15 K to 623.15 K (IF97 region 1 on the
 * saturation line).
 * @example
 * ```ts
 * const work = new LiquidWaterTransportWork();
 * iapwsLiquidWater(298.15, 'viscosity', work);   //=> 0 (Status.ok)
 * work.mu.mu;                                   //=> 890.04e-6 (Pa·s, at the saturated-liquid ρ = 997.0 kg/m³)
 * iapwsLiquidWater(298.15, 'conductivity', work);   //=> 0
 * work.lambda.lambda;                               //=> 0.6065 (W/(m·K))
 * iapwsLiquidWater(700, 'viscosity', work);     //=> 1 (Status.outOfRange)
 * ```
 */
export function iapwsLiquidWater(T: number, property: 'viscosity' | 'conductivity', work: LiquidWaterTransportWork): StatusCode {
  if (!(T >= 273.15 && T <= 623.15)) return Status.outOfRange;
  const st = work.state;
  region1(saturationPressure(T), T, st);
  // the enhancement inputs exist for every liquid state; without them the result would not be the release's
  if (iapws95EnhancementInputs(T, st.rho, work.inputs, work.fluid) !== Status.ok) return Status.undefinedProperty;
  return property === 'viscosity' ? viscosity(T, st.rho, true, work.inputs, work.mu) : thermalConductivity(T, st.rho, true, work.inputs, work.lambda);
}

/**
 * The value of a `constant` or `table` curve at T (K), SI; for a table outside its nodes, the end
 * piece extended (the facade allows that only with `extrapolate`, flagged).
 * @example
 * ```ts
 * const oil = lookupIncompressible('engine oil').transport.viscosity;
 * curveValue(oil, 300);   //=> 0.486 (Pa·s, the tabulated node)
 * curveValue(oil, 305);   //=> 0.3488 (Pa·s: ln μ linear in 1/T between 300 K and 310 K; 0.3695 linear in T)
 * ```
 */
export function curveValue(c: PropertyCurve, T: number): number {
  if (c.form === 'constant') return c.value;
  const xs = c.nodesT;
  const ys = c.nodes;
  const i = segmentIndex(xs, T);
  const T0 = xs[i]!;
  const T1 = xs[i + 1]!;
  const y0 = ys[i]!;
  const y1 = ys[i + 1]!;
  if (!c.logarithmic) {
    const t = (T - T0) / (T1 - T0);
    return y0 * (1 - t) + y1 * t;
  }
  // ln y linear in 1/T; from the nearer node, so the nodes come back exactly
  const t = (1 / T - 1 / T0) / (1 / T1 - 1 / T0);
  const ratio = y1 / y0;
  return t <= 0.5 ? y0 * Math.pow(ratio, t) : y1 * Math.pow(ratio, t - 1);
}
