/**
 * Compressed-liquid shortcuts and their error against IAPWS-IF97.
 *
 * For a liquid state (T, p) the trade uses three quick estimates:
 * - `'saturated-liquid'`: v ≈ v_f(T), u ≈ u_f(T), h ≈ h_f(T), s ≈ s_f(T);
 * - `'pressure-corrected'`: the same, but h ≈ h_f(T) + v_f(T)·(p − p_sat(T));
 * - `'incompressible'`: constant c and density (heatstate's incompressible liquid water, c at 25 °C),
 *   measured from IF97's reference state (u = s = 0 for liquid at the triple point):
 *   u = c·(T − T_t), s = c·ln(T/T_t), h = u + p·v.
 *
 * @module
 */
import { describeValue, readFlag, readOptions, readPair } from '../core/read.js';
import { InvalidInputError, OutOfRangeError } from '../errors.js';
import { heatCapacityAt } from '../incompressible/model.js';
import { compileChecked } from '../incompressible/compile.js';
import type { IncompressibleDefinition } from '../incompressible/schema.js';
// the generated liquid water alone (not the whole catalogue, which would bring every substance's data into heatstate/water)
import liquidWater from '../../data/incompressible/water.json';
import { Quantity, readQuantity, type QuantityLike } from '../units/quantity.js';
import { P_MAX, T_CRITICAL, T_MIN, T_TRIPLE } from './if97/constants.js';
import { Status } from '../core/status.js';
import { stateFromPT } from './if97/pt.js';
import { saturationAtT } from './if97/saturation.js';
import { WaterState } from './if97/water-state.js';
import { WaterProperties } from './if97/properties.js';
import { saturationPressure } from './if97/region4.js';

/** The three shortcuts. */
export type LiquidApproximation = 'saturated-liquid' | 'pressure-corrected' | 'incompressible';

/** All shortcuts, in the order results list them. */
export const LIQUID_APPROXIMATIONS: readonly LiquidApproximation[] = ['saturated-liquid', 'pressure-corrected', 'incompressible'];

/** A liquid state as (T, p), pressure absolute. */
export interface LiquidStateInput {
  readonly T: QuantityLike<'temperature'>;
  readonly p: QuantityLike<'pressure'>;
}

/** How far a shortcut's value is from IF97 at the same state. */
export interface Deviation<D extends 'specificVolume' | 'specificEnergy' | 'specificEntropy'> {
  /** shortcut − IF97. */
  readonly absolute: Quantity<D>;
  /** (shortcut − IF97)/|IF97|; NaN-free: 0 when both are 0, and omitted (undefined) when IF97's value is 0 but the shortcut's is not. */
  readonly relative: number | undefined;
}

/** A shortcut's estimate of a liquid state, with its deviation from IF97 when asked for. */
export interface ApproximateLiquid {
  readonly method: LiquidApproximation;
  readonly v: Quantity<'specificVolume'>;
  readonly u: Quantity<'specificEnergy'>;
  readonly h: Quantity<'specificEnergy'>;
  readonly s: Quantity<'specificEntropy'>;
  /** Present with `{ compare: true }`. */
  readonly deviation?: {
    readonly v: Deviation<'specificVolume'>;
    readonly u: Deviation<'specificEnergy'>;
    readonly h: Deviation<'specificEnergy'>;
    readonly s: Deviation<'specificEntropy'>;
  };
}

interface Values {
  v: number;
  u: number;
  h: number;
  s: number;
}

const sat = new WaterProperties();
const vap = new WaterProperties();
const exact = new WaterState();

let water: { c: number; v: number } | undefined;

/** The constant c (J/(kg·K)) and v (m³/kg) of incompressible liquid water: the catalogue's values at 25 °C (its entry `water`, compiled on first use). */
function incompressibleWater(): { c: number; v: number } {
  if (water === undefined) {
    const { model } = compileChecked(liquidWater.substance as unknown as IncompressibleDefinition);
    water = { c: heatCapacityAt(model, 298.15), v: model.v };
  }
  return water;
}

function readLiquid(state: LiquidStateInput, name: string, fn: string): { T: number; p: number } {
  if (typeof state !== 'object' || state === null || Array.isArray(state)) {
    throw new InvalidInputError('input.invalid', name, `${fn}: ${name} must be a liquid state { T, p }, such as { T: '80 °C', p: '10 MPa' }; got ${describeValue(state)}`);
  }
  // exactly T and p: a third input (an h or an x) would be silently ignored otherwise
  readPair(state, `${fn} ${name}`, [['T', 'p']]);
  const T = readQuantity(state.T, 'temperature', `${name}.T`);
  const p = readQuantity(state.p, 'pressure', `${name}.p`);
  if (!(T >= T_MIN && T < T_CRITICAL)) {
    throw new OutOfRangeError({ quantity: `${name}.T`, value: T, min: T_MIN, max: T_CRITICAL, unit: 'K', scope: 'liquid water (273.15 K to the critical temperature)' });
  }
  const ps = saturationPressure(T);
  if (!(p >= ps && p <= P_MAX)) {
    throw new OutOfRangeError(
      { quantity: `${name}.p`, value: p, min: ps, max: P_MAX, unit: 'Pa', scope: `liquid water at T = ${Number(T.toPrecision(8))} K` },
      p < ps
        ? `the state T = ${Number(T.toPrecision(8))} K, p = ${Number(p.toPrecision(8))} Pa is vapour (p is below the saturation pressure ${Number(ps.toPrecision(8))} Pa): the compressed-liquid shortcuts apply to liquids only`
        : `p = ${Number(p.toPrecision(8))} Pa is above the upper limit of IAPWS-IF97 (100 MPa)`,
    );
  }
  return { T, p };
}

/** Reads the shortcut's name: one of {@link LIQUID_APPROXIMATIONS}, no default. */
function readMethod(method: unknown): LiquidApproximation {
  if (typeof method === 'string' && (LIQUID_APPROXIMATIONS as readonly string[]).includes(method)) return method as LiquidApproximation;
  throw new InvalidInputError('input.invalid', 'method', `approximateLiquid: method must be one of ${LIQUID_APPROXIMATIONS.map((m) => `"${m}"`).join(', ')}; got ${describeValue(method)}`);
}

function estimate(method: LiquidApproximation, T: number, p: number): Values {
  if (method === 'incompressible') {
    const { c, v } = incompressibleWater();
    const u = c * (T - T_TRIPLE);
    return { v, u, h: u + p * v, s: c * Math.log(T / T_TRIPLE) };
  }
  if (saturationAtT(T, sat, vap) !== Status.ok) throw new OutOfRangeError({ quantity: 'T', value: T, min: T_MIN, max: T_CRITICAL, unit: 'K', scope: 'the saturation line' });
  const h = method === 'pressure-corrected' ? sat.h + sat.v * (p - sat.p) : sat.h;
  return { v: sat.v, u: sat.u, h, s: sat.s };
}

function if97(T: number, p: number): Values {
  if (stateFromPT(p, T, exact) !== Status.ok) throw new OutOfRangeError({ quantity: 'p', value: p, min: 0, max: P_MAX, unit: 'Pa', scope: 'IAPWS-IF97' });
  return { v: exact.v, u: exact.u, h: exact.h, s: exact.s };
}

function relative(approx: number, truth: number): number | undefined {
  if (truth !== 0) return (approx - truth) / Math.abs(truth);
  return approx === 0 ? 0 : undefined;
}

/**
 * A compressed-liquid shortcut at (T, p), optionally with its deviation from IAPWS-IF97.
 *
 * @param state liquid state: 273.15 K ≤ T < 647.096 K and p_sat(T) ≤ p ≤ 100 MPa
 * @param method `'saturated-liquid'`, `'pressure-corrected'` or `'incompressible'`
 * @param options `{ compare: true }` adds `deviation` (shortcut − IF97, absolute and relative)
 * @throws {@link OutOfRangeError} for a vapour state or a state outside the liquid range
 * @throws {@link InvalidInputError} a state that is not `{ T, p }`, an unknown method, an unknown
 *   option or a `compare` that is not true or false
 * @example
 * ```ts
 * const a = approximateLiquid({ T: '80 °C', p: '10 MPa' }, 'pressure-corrected', { compare: true });
 * a.h.in('kJ/kg');              //=> 345.19 (IF97: 342.87)
 * a.deviation!.h.relative;      //=> 0.0068 (vs -0.023 for 'saturated-liquid')
 * approximateLiquid({ T: '200 °C', p: '1 bar' }, 'saturated-liquid');   // throws OutOfRangeError: … is vapour (p is below the saturation pressure
 * ```
 */
export function approximateLiquid(state: LiquidStateInput, method: LiquidApproximation, options?: { readonly compare?: boolean }): ApproximateLiquid {
  const { T, p } = readLiquid(state, 'state', 'approximateLiquid');
  method = readMethod(method);
  const compare = readFlag(readOptions<{ compare: boolean }>(options, 'options', ['compare']).compare, 'options.compare');
  const a = estimate(method, T, p);
  const result: ApproximateLiquid = {
    method,
    v: Quantity.fromSI(a.v, 'specificVolume'),
    u: Quantity.fromSI(a.u, 'specificEnergy'),
    h: Quantity.fromSI(a.h, 'specificEnergy'),
    s: Quantity.fromSI(a.s, 'specificEntropy'),
  };
  if (!compare) return result;
  const e = if97(T, p);
  return {
    ...result,
    deviation: {
      v: { absolute: Quantity.fromSI(a.v - e.v, 'specificVolume'), relative: relative(a.v, e.v) },
      u: { absolute: Quantity.fromSI(a.u - e.u, 'specificEnergy'), relative: relative(a.u, e.u) },
      h: { absolute: Quantity.fromSI(a.h - e.h, 'specificEnergy'), relative: relative(a.h, e.h) },
      s: { absolute: Quantity.fromSI(a.s - e.s, 'specificEntropy'), relative: relative(a.s, e.s) },
    },
  };
}

/** Δu and Δh of a liquid process by one method, with its relative error against IF97. */
export interface ProcessEstimate {
  readonly deltaU: Quantity<'specificEnergy'>;
  readonly deltaH: Quantity<'specificEnergy'>;
  /** (Δu − Δu_IF97)/|Δu_IF97|; undefined when Δu_IF97 = 0. */
  readonly deltaURelativeError: number | undefined;
  /** (Δh − Δh_IF97)/|Δh_IF97|; undefined when Δh_IF97 = 0. */
  readonly deltaHRelativeError: number | undefined;
}

/**
 * Δu and Δh of a liquid process from state 1 to state 2, by IAPWS-IF97 and by each shortcut side by
 * side, with the relative error of each: the numbers to decide whether a quick method is good enough.
 * For the incompressible model, Δu = c·ΔT and Δh = c·ΔT + v·Δp.
 *
 * @throws {@link OutOfRangeError} if either state is not liquid
 * @throws {@link InvalidInputError} a state that is not `{ T, p }`
 * @example
 * ```ts
 * // a boiler feed pump: 40 °C, 10 kPa → 41 °C, 15 MPa
 * const r = compareLiquidProcess({ T: '40 °C', p: '10 kPa' }, { T: '41 °C', p: '15 MPa' });
 * r.if97.deltaH.in('kJ/kg');                          //=> 17.38
 * r.methods['saturated-liquid'].deltaHRelativeError;  //=> -0.76 (it ignores the pump work)
 * ```
 */
export function compareLiquidProcess(state1: LiquidStateInput, state2: LiquidStateInput): {
  readonly if97: { readonly deltaU: Quantity<'specificEnergy'>; readonly deltaH: Quantity<'specificEnergy'> };
  readonly methods: Readonly<Record<LiquidApproximation, ProcessEstimate>>;
} {
  const s1 = readLiquid(state1, 'state1', 'compareLiquidProcess');
  const s2 = readLiquid(state2, 'state2', 'compareLiquidProcess');
  const e1 = if97(s1.T, s1.p);
  const e2 = if97(s2.T, s2.p);
  const du = e2.u - e1.u;
  const dh = e2.h - e1.h;
  const methods = {} as Record<LiquidApproximation, ProcessEstimate>;
  for (const m of LIQUID_APPROXIMATIONS) {
    const a1 = estimate(m, s1.T, s1.p);
    const a2 = estimate(m, s2.T, s2.p);
    const mu = a2.u - a1.u;
    const mh = a2.h - a1.h;
    methods[m] = {
      deltaU: Quantity.fromSI(mu, 'specificEnergy'),
      deltaH: Quantity.fromSI(mh, 'specificEnergy'),
      deltaURelativeError: du === 0 ? undefined : (mu - du) / Math.abs(du),
      deltaHRelativeError: dh === 0 ? undefined : (mh - dh) / Math.abs(dh),
    };
  }
  return { if97: { deltaU: Quantity.fromSI(du, 'specificEnergy'), deltaH: Quantity.fromSI(dh, 'specificEnergy') }, methods };
}
