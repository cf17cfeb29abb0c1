/**
 * The water and steam facade: `water.state(pair)` and `water.saturation({ T } | { p })`.
 * Quantities in, quantities out; the IF97 SI core does the work; the facade kit reads the inputs,
 * maps core statuses to typed errors (in the caller's units) and builds the results.
 *
 * @module
 */
import { CallUnits } from '../core/call-units.js';
import { throwForStatus } from '../core/fail.js';
import { rangeError, readAbsolutePressure, readInput, readPair, readPositiveDensity, readQuality, readTemperature, type Bounds } from '../core/read.js';
import { optionalQuantity, resultQuantity } from '../core/result.js';
import { Status } from '../core/status.js';
import { formatNumber, InvalidInputError } from '../errors.js';
import { Quantity, type QuantityLike } from '../units/quantity.js';
import type { LooseQuantity } from '../core/inputs.js';
import { P_CRITICAL, P_MAX, P_MAX_5, P_SEARCH_MIN, T_CRITICAL, T_MAX_2, T_MAX_5, T_MIN } from './if97/constants.js';
import { wantsCompensated } from './accuracy.js';
import { compensateState, HELD, type Held } from './if97/compensated-state.js';
import { defaultContext, type SolverContext } from './if97/context.js';
import { stateFromHS } from './if97/hs.js';
import { stateFromPH } from './if97/ph.js';
import { stateFromPS } from './if97/ps.js';
import { stateFromPT } from './if97/pt.js';
import { WaterProperties } from './if97/properties.js';
import { stateFromPX, stateFromTX } from './if97/quality.js';
import { evaluateForward } from './if97/regions.js';
import { P_SAT_MIN, saturationAtP, saturationAtT, saturationTemperatureOnLine } from './if97/saturation.js';
import { stateFromTV } from './if97/tv.js';
import { SaturatedPhaseRecord, WaterStateRecord, type SaturatedPhaseFields, type WaterStateFields } from './state-record.js';
import { surfaceTensionAt, waterSurfaceTension, waterThermalConductivity, waterViscosity } from './transport-properties.js';
import { PHASE, WaterState } from './if97/water-state.js';
import type { CheckedWaterPair, SaturatedPhase, SaturationResult, WaterPair, WaterPhase, WaterStateOptions, WaterStateResult } from './state-types.js';

export type { WaterPhase, WaterStateResult, SaturatedPhase, SaturationResult, WaterPair, WaterInputDimensions, CheckedWaterPair, WaterAccuracy, WaterStateOptions } from './state-types.js';

const PHASES: readonly WaterPhase[] = ['liquid', 'vapor', 'two-phase', 'supercritical'];
const IF97 = 'IAPWS-IF97';
const PAIRS: readonly (readonly string[])[] = [['T', 'p'], ['p', 'h'], ['p', 's'], ['h', 's'], ['T', 'x'], ['p', 'x'], ['T', 'v'], ['T', 'rho']];

/** IF97's temperature range, 273.15 K to 2273.15 K (region 5). */
const T_RANGE: Bounds = { min: T_MIN, max: T_MAX_5, scope: IF97 };
const T_RANGE_TOP: Bounds = { ...T_RANGE, scope: `${IF97} region 5` };

/** A temperature in IF97's range; above it, the message names region 5, whose limit it is. */
function readIf97Temperature(input: unknown, units: CallUnits): number {
  const T = readTemperature(input as QuantityLike<'temperature'>, 'T', undefined, units);
  if (T > T_MAX_5) throw rangeError('T', T, 'temperature', T_RANGE_TOP, units);
  if (T < T_MIN) throw rangeError('T', T, 'temperature', T_RANGE, units);
  return T;
}
/** The saturation line, 273.15 K to the critical point. */
const T_SATURATION: Bounds = { min: T_MIN, max: T_CRITICAL, scope: 'the saturation line (a quality is defined only there)' };
const P_SATURATION: Bounds = { min: P_SAT_MIN, max: P_CRITICAL, scope: 'the saturation line (a quality is defined only there)' };

function toResult(st: WaterState): WaterStateResult {
  const two = st.phase === PHASE.twoPhase;
  const hasSat = st.p >= P_SAT_MIN && st.p <= P_CRITICAL;
  const Tsat = two ? st.T : hasSat ? saturationTemperatureOnLine(st.p) : NaN;
  const vapor = st.phase === PHASE.vapor && hasSat;
  const liquid = st.phase === PHASE.liquid && hasSat;
  const base: WaterStateFields = {
    T: resultQuantity(st.T, 'temperature', 'T'),
    p: resultQuantity(st.p, 'pressure', 'p'),
    phase: PHASES[st.phase]!,
    region: st.region as WaterStateResult['region'],
    x: two ? st.x : undefined,
    v: resultQuantity(st.v, 'specificVolume', 'v'),
    rho: resultQuantity(st.rho, 'density', 'rho'),
    u: resultQuantity(st.u, 'specificEnergy', 'u'),
    h: resultQuantity(st.h, 'specificEnergy', 'h'),
    s: resultQuantity(st.s, 'specificEntropy', 's'),
    cp: two ? undefined : resultQuantity(st.cp, 'specificHeat', 'cp'),
    cv: two ? undefined : resultQuantity(st.cv, 'specificHeat', 'cv'),
    w: two ? undefined : resultQuantity(st.w, 'velocity', 'w'),
    k: two ? undefined : st.cp / st.cv,
    Tsat: optionalQuantity(Tsat, 'temperature', 'Tsat'),
    superheat: vapor ? resultQuantity(Math.max(0, st.T - Tsat), 'temperatureDifference', 'superheat') : undefined,
    subcooling: liquid ? resultQuantity(Math.max(0, Tsat - st.T), 'temperatureDifference', 'subcooling') : undefined,
  };
  return new WaterStateRecord(base, st.T, st.rho, st.p, st.cp, !two);
}

/**
 * The result of a solved state `st`; with `compensated`, its properties are first evaluated again by
 * the compensated kernels (the solve is not repeated).
 */
function finish(st: WaterState, compensated: boolean, held: Held, ctx: SolverContext, units: CallUnits): WaterStateResult {
  if (compensated) {
    const status = compensateState(st, held, ctx);
    if (status !== Status.ok) {
      throwForStatus(status, {
        what: `the compensated evaluation of the ${IF97} state`,
        inputs: `p = ${units.describe(st.p, 'pressure', 'Pa')}, T = ${units.describe(st.T, 'temperature', 'K')}`,
        range: () => rangeError('T', st.T, 'temperature', T_RANGE, units),
      });
    }
  }
  return toResult(st);
}

/** Range checks of (p, T) with the limits of the standard, in the caller's units. */
function checkPT(p: number, T: number, units: CallUnits): void {
  if (T <= T_MAX_2 && p > P_MAX) throw rangeError('p', p, 'pressure', { min: 0, max: P_MAX, scope: `${IF97} (100 MPa for T ≤ 1073.15 K)` }, units);
  if (T > T_MAX_2 && p > P_MAX_5) throw rangeError('p', p, 'pressure', { min: 0, max: P_MAX_5, scope: `${IF97} region 5 (50 MPa for T > 1073.15 K)` }, units);
}

const probe = new WaterProperties();

/** The h or s range IF97 covers at pressure p (273.15 K to the top temperature there). */
function rangeAtPressure(p: number, key: 'h' | 's'): [number, number] {
  const lo = evaluateForward(p >= P_SAT_MIN ? 1 : 2, p, T_MIN, probe)[key];
  const hi = (p <= P_MAX_5 ? evaluateForward(5, p, T_MAX_5, probe) : evaluateForward(2, p, T_MAX_2, probe))[key];
  return [lo, hi];
}

/** The entropy range of (h, s) states at enthalpy h: s at the lowest and highest pressure where a (p, h) state exists. */
function entropyRangeAtEnthalpy(h: number): [number, number] | undefined {
  const st = new WaterState();
  const at = (p: number) => (stateFromPH(p, h, st) === Status.ok ? st.s : NaN);
  const lo = at(P_MAX);
  const hi = at(P_SEARCH_MIN);
  return Number.isFinite(lo) && Number.isFinite(hi) ? [lo, hi] : undefined;
}

/** The enthalpy range over all of IF97: liquid at 273.15 K and 611 Pa to region 5 at 2273.15 K and 1 mPa. */
function enthalpyRange(): [number, number] {
  return [evaluateForward(1, P_SAT_MIN, T_MIN, probe).h, evaluateForward(5, P_SEARCH_MIN, T_MAX_5, probe).h];
}

/**
 * The full state of water or steam from any usual pair, by IAPWS-IF97 (IAPWS R7-97(2012)):
 * `{ T, p }`, `{ p, h }`, `{ p, s }`, `{ h, s }`, `{ T, x }`, `{ p, x }`, `{ T, v }` or `{ T, rho }`.
 *
 * Range: 273.15 K ≤ T ≤ 1073.15 K at p ≤ 100 MPa, and 1073.15 K < T ≤ 2273.15 K at p ≤ 50 MPa.
 * Two-phase states (region 4) are quality-weighted mixtures of the saturated phases; cp, cv, w and k
 * are `undefined` there. A (p, T) exactly on the saturation line gives the liquid. Flashes are
 * polished on the basic equations to about 1e-12. Every state carries its saturation temperature
 * (below the critical pressure) and its superheat (vapour) or subcooling (liquid). Errors name the
 * input and the limit in the caller's units, with SI beside them.
 *
 * With `{ accuracy: 'compensated' }` the solve is the same, and the state's properties are evaluated
 * once more with the compensated (double-double) kernel of its region: within 16 ulp of the exact
 * IF97 equations, where the default (`'fast'`) misses by a few ulp typically, by thousands at the
 * 99th percentile in region 3 and by up to about 8e5 ulp (cp near the critical point); about 1 to 4 µs
 * more per call. The solve itself (T of a flash, ρ in region 3, p_s and T_s) and
 * values combined afterwards (k, superheat, subcooling, transport) are not compensated
 * (docs/guide/accuracy.md).
 *
 * @param pair the two inputs
 * @param options `{ accuracy: 'fast' | 'compensated' }` (default `'fast'`)
 * @throws {@link OutOfRangeError} outside IF97's range (the message names the limit), x outside [0, 1],
 *   (T, x) or (p, x) above the critical point, pairs with no state in range
 * @throws {@link InvalidInputError} NaN or infinite inputs, an unsupported or over-determined pair
 * @throws {@link DimensionError} a quantity of the wrong dimension
 * @throws {@link ConvergenceError} a flash that did not converge (never an unconverged value)
 * @example
 * ```ts
 * const s = water.state({ p: '10 MPa', T: '500 °C' });
 * s.h.in('kJ/kg');          //=> 3375.06...
 * s.phase;                  //=> 'vapor'
 * s.superheat?.in('K');     //=> 189.00... (T_sat(10 MPa) = 311.00 °C)
 * water.state({ p: '1 atm', h: '1500 kJ/kg' }).x;     //=> 0.47906 (two-phase)
 * water.state({ p: '150 psia', T: '400 °F' }).h.in('Btu/lbm');
 * water.state({ T: '4500 °F', p: '150 psia' });
 * // throws OutOfRangeError: T = 4500 °F (2755.3722 K) is above the upper limit of IAPWS-IF97 region 5 (3632 °F (2273.15 K))
 * water.state({ p: '3 MPa', T: '300 K' }).h.si;                               //=> 115331.27302143878 (J/kg, fast; R7-97 Table 5 prints 0.115331273e3 kJ/kg)
 * water.state({ p: '3 MPa', T: '300 K' }, { accuracy: 'compensated' }).h.si;  //=> 115331.27302143894 (J/kg, compensated: within 0.5 ulp of a 60-digit evaluation of Eq. 7)
 * water.state({ p: '3 MPa', T: '300 K' }, { accuracy: 'exact' });
 * // throws InvalidInputError: options.accuracy must be one of "fast", "compensated"; got "exact"
 * ```
 */
export function waterState<const P extends WaterPair>(pair: CheckedWaterPair<P>, options?: WaterStateOptions): WaterStateResult {
  const key = readPair(pair, 'water.state', PAIRS);
  const compensated = wantsCompensated(options);
  // readPair has checked which keys are present
  const a = pair as unknown as Record<string, unknown>;
  const units = new CallUnits();
  const out = new WaterState();
  const ctx = defaultContext();
  switch (key) {
    case 'T,p': {
      const T = readIf97Temperature(a.T, units);
      const p = readAbsolutePressure(a.p as QuantityLike<'pressure'>, 'p', undefined, units);
      checkPT(p, T, units);
      const st = stateFromPT(p, T, out, ctx);
      if (st !== Status.ok) throwForStatus(st, { what: `the ${IF97} (p, T) state`, inputs: `p = ${units.describe(p, 'pressure', 'Pa')}, T = ${units.describe(T, 'temperature', 'K')}`, range: () => rangeError('p', p, 'pressure', { min: 0, max: P_MAX, scope: IF97 }, units) });
      return finish(out, compensated, HELD.pressure, ctx, units);
    }
    case 'p,h':
    case 'p,s': {
      const name = key === 'p,h' ? 'h' : 's';
      const p = readAbsolutePressure(a.p as QuantityLike<'pressure'>, 'p', { max: P_MAX, scope: `${IF97} (100 MPa)` }, units);
      const dim = name === 'h' ? 'specificEnergy' : 'specificEntropy';
      const siUnit = name === 'h' ? 'J/kg' : 'J/(kg·K)';
      const value = readInput(a[name] as QuantityLike<typeof dim>, dim, name, undefined, units);
      const st = name === 'h' ? stateFromPH(p, value, out, ctx) : stateFromPS(p, value, out, ctx);
      if (st !== Status.ok) {
        throwForStatus(st, {
          what: `the ${IF97} (p, ${name}) flash`,
          inputs: `p = ${units.describe(p, 'pressure', 'Pa')}, ${name} = ${units.describe(value, dim, siUnit)}`,
          range: () => {
            const [lo, hi] = rangeAtPressure(p, name);
            return rangeError(name, value, dim, { min: lo, max: hi, scope: `${IF97} at p = ${units.describe(p, 'pressure', 'Pa')} (273.15 K to ${p <= P_MAX_5 ? '2273.15' : '1073.15'} K)` }, units);
          },
        });
      }
      return finish(out, compensated, HELD.pressure, ctx, units);
    }
    case 'h,s': {
      const h = readInput(a.h as QuantityLike<'specificEnergy'>, 'specificEnergy', 'h', undefined, units);
      const s = readInput(a.s as QuantityLike<'specificEntropy'>, 'specificEntropy', 's', undefined, units);
      const st = stateFromHS(h, s, out, ctx);
      if (st !== Status.ok) {
        throwForStatus(st, {
          what: `the ${IF97} (h, s) flash`,
          inputs: `h = ${units.describe(h, 'specificEnergy', 'J/kg')}, s = ${units.describe(s, 'specificEntropy', 'J/(kg·K)')}`,
          range: () => {
            const span = entropyRangeAtEnthalpy(h);
            if (span === undefined) {
              const [lo, hi] = enthalpyRange();
              return rangeError('h', h, 'specificEnergy', { min: lo, max: hi, scope: `${IF97} (273.15 K ≤ T ≤ 2273.15 K, 1 mPa ≤ p ≤ 100 MPa)` }, units);
            }
            return rangeError('s', s, 'specificEntropy', { min: span[0], max: span[1], scope: `${IF97} at h = ${units.describe(h, 'specificEnergy', 'J/kg')} (1 mPa ≤ p ≤ 100 MPa)` }, units);
          },
        });
      }
      return finish(out, compensated, HELD.neither, ctx, units);
    }
    case 'T,x': {
      const T = readTemperature(a.T as QuantityLike<'temperature'>, 'T', T_SATURATION, units);
      const x = readQuality(a.x);
      const st = stateFromTX(T, x, out, ctx);
      if (st !== Status.ok) throwForStatus(st, { what: `the ${IF97} saturation`, inputs: `T = ${units.describe(T, 'temperature', 'K')}, x = ${x}`, range: () => rangeError('T', T, 'temperature', T_SATURATION, units) });
      return finish(out, compensated, HELD.temperature, ctx, units);
    }
    case 'p,x': {
      const p = readInput(a.p as QuantityLike<'pressure'>, 'pressure', 'p', P_SATURATION, units);
      const x = readQuality(a.x);
      const st = stateFromPX(p, x, out, ctx);
      if (st !== Status.ok) throwForStatus(st, { what: `the ${IF97} saturation`, inputs: `p = ${units.describe(p, 'pressure', 'Pa')}, x = ${x}`, range: () => rangeError('p', p, 'pressure', P_SATURATION, units) });
      return finish(out, compensated, HELD.pressure, ctx, units);
    }
    default: {
      // 'T,v' or 'T,rho'
      const T = readIf97Temperature(a.T, units);
      const v = key === 'T,v' ? readInput(a.v as QuantityLike<'specificVolume'>, 'specificVolume', 'v', { min: 0, max: Infinity, scope: 'a specific volume (must be positive)', minExclusive: true }, units) : 1 / readPositiveDensity(a.rho as QuantityLike<'density'>, 'rho', units);
      const st = stateFromTV(T, v, out, ctx);
      if (st !== Status.ok) {
        const name = key === 'T,v' ? 'v' : 'rho';
        throwForStatus(st, {
          what: `the ${IF97} (T, ${name}) state`,
          inputs: `T = ${units.describe(T, 'temperature', 'K')}, ${name === 'v' ? `v = ${units.describe(v, 'specificVolume', 'm³/kg')}` : `rho = ${units.describe(1 / v, 'density', 'kg/m³')}`}`,
          range: () => {
            // the volume span at T: from the 100 MPa (or 50 MPa) liquid to the 1 mPa vapour
            const top = T > T_MAX_2 ? P_MAX_5 : P_MAX;
            const probeState = new WaterState();
            const vLo = stateFromPT(top, T, probeState) === Status.ok ? probeState.v : 0;
            const vMax = stateFromPT(P_SEARCH_MIN, T, probeState) === Status.ok ? probeState.v : Infinity;
            return name === 'v'
              ? rangeError('v', v, 'specificVolume', { min: vLo, max: vMax, scope: `${IF97} at T = ${units.describe(T, 'temperature', 'K')} (p from 1 mPa to ${formatNumber(top / 1e6)} MPa)` }, units)
              : rangeError('rho', 1 / v, 'density', { min: 1 / vMax, max: 1 / vLo, scope: `${IF97} at T = ${units.describe(T, 'temperature', 'K')} (p from 1 mPa to ${formatNumber(top / 1e6)} MPa)` }, units);
          },
        });
      }
      return finish(out, compensated, HELD.temperature, ctx, units);
    }
  }
}

function phaseOf(w: WaterProperties): SaturatedPhase {
  const base: SaturatedPhaseFields = {
    v: resultQuantity(w.v, 'specificVolume', 'v'),
    rho: resultQuantity(w.rho, 'density', 'rho'),
    u: resultQuantity(w.u, 'specificEnergy', 'u'),
    h: resultQuantity(w.h, 'specificEnergy', 'h'),
    s: resultQuantity(w.s, 'specificEntropy', 's'),
  };
  return new SaturatedPhaseRecord(base, w.T, w.rho, w.p, w.cp, Number.isFinite(w.cp) && w.cp > 0);
}

/**
 * Saturated liquid and vapour at a temperature or a pressure, by IAPWS-IF97 (region 4 for p_s(T)
 * and T_s(p); regions 1 and 2 below 623.15 K, region 3 above), with h_fg, s_fg and u_fg.
 * Range: triple point (273.15 K in IF97; 611.213 Pa) to the critical point (647.096 K, 22.064 MPa),
 * where both phases meet.
 *
 * @throws {@link OutOfRangeError} outside the saturation line
 * @throws {@link InvalidInputError} neither or both of T and p, or another input
 * @example
 * ```ts
 * const sat = water.saturation({ p: '1 atm' });
 * sat.T.in('°C');            //=> 99.97...
 * sat.hfg.in('kJ/kg');       //=> 2256.5...
 * water.saturation({ T: '212 °F' }).p.in('psia');  //=> 14.70...
 * ```
 */
export function waterSaturation<const P extends { readonly T: LooseQuantity<'temperature'> } | { readonly p: LooseQuantity<'pressure'> }>(at: CheckedWaterPair<P>): SaturationResult {
  const key = readPair(at, 'water.saturation', [['T'], ['p']]);
  const a = at as unknown as Record<string, unknown>;
  const units = new CallUnits();
  const liquid = new WaterProperties();
  const vapor = new WaterProperties();
  let status: number;
  let inputs: string;
  let range: () => ReturnType<typeof rangeError>;
  if (key === 'T') {
    const bounds: Bounds = { min: T_MIN, max: T_CRITICAL, scope: 'the saturation line (273.15 K to the critical point, 647.096 K)' };
    const T = readTemperature(a.T as QuantityLike<'temperature'>, 'T', bounds, units);
    status = saturationAtT(T, liquid, vapor);
    inputs = `T = ${units.describe(T, 'temperature', 'K')}`;
    range = () => rangeError('T', T, 'temperature', bounds, units);
  } else {
    const bounds: Bounds = { min: P_SAT_MIN, max: P_CRITICAL, scope: 'the saturation line (611.213 Pa to the critical point, 22.064 MPa)' };
    const p = readInput(a.p as QuantityLike<'pressure'>, 'pressure', 'p', bounds, units);
    status = saturationAtP(p, liquid, vapor);
    inputs = `p = ${units.describe(p, 'pressure', 'Pa')}`;
    range = () => rangeError('p', p, 'pressure', bounds, units);
  }
  if (status !== Status.ok) throwForStatus(status, { what: `the ${IF97} saturation`, inputs, range });
  return {
    T: resultQuantity(liquid.T, 'temperature', 'T'),
    p: resultQuantity(liquid.p, 'pressure', 'p'),
    liquid: phaseOf(liquid),
    vapor: phaseOf(vapor),
    hfg: resultQuantity(vapor.h - liquid.h, 'specificEnergy', 'hfg'),
    sfg: resultQuantity(vapor.s - liquid.s, 'specificEntropy', 'sfg'),
    ufg: resultQuantity(vapor.u - liquid.u, 'specificEnergy', 'ufg'),
    sigma: optionalQuantity(surfaceTensionAt(liquid.T), 'surfaceTension', 'sigma'),
  };
}

/**
 * Δh = h(state2) − h(state1) between two states given by any {@link WaterPair}.
 * @example
 * ```ts
 * water.deltaH({ p: '10 MPa', T: '500 °C' }, { p: '10 kPa', x: 0.9 }).in('kJ/kg');   //=> -1030.37...
 * ```
 */
export function waterDeltaH<const P1 extends WaterPair, const P2 extends WaterPair>(state1: CheckedWaterPair<P1>, state2: CheckedWaterPair<P2>): Quantity<'specificEnergy'> {
  return resultQuantity(stateOrNamed(state2, 'state2').h.si - stateOrNamed(state1, 'state1').h.si, 'specificEnergy', 'deltaH');
}

/**
 * Δu = u(state2) − u(state1) between two states given by any {@link WaterPair}.
 * @example
 * ```ts
 * water.deltaU({ p: '10 MPa', T: '500 °C' }, { p: '10 kPa', x: 0.9 }).in('kJ/kg');   //=> -834.286
 * ```
 */
export function waterDeltaU<const P1 extends WaterPair, const P2 extends WaterPair>(state1: CheckedWaterPair<P1>, state2: CheckedWaterPair<P2>): Quantity<'specificEnergy'> {
  return resultQuantity(stateOrNamed(state2, 'state2').u.si - stateOrNamed(state1, 'state1').u.si, 'specificEnergy', 'deltaU');
}

/**
 * Δs = s(state2) − s(state1) between two states given by any {@link WaterPair}.
 * @example
 * ```ts
 * water.deltaS({ p: '10 MPa', T: '500 °C' }, { p: '10 kPa', x: 0.9 }).in('kJ/(kg·K)');   //=> 0.799603
 * ```
 */
export function waterDeltaS<const P1 extends WaterPair, const P2 extends WaterPair>(state1: CheckedWaterPair<P1>, state2: CheckedWaterPair<P2>): Quantity<'specificEntropy'> {
  return resultQuantity(stateOrNamed(state2, 'state2').s.si - stateOrNamed(state1, 'state1').s.si, 'specificEntropy', 'deltaS');
}

/** A state, with the argument's name put in front of an input error's message. */
function stateOrNamed(pair: WaterPair, name: string): WaterStateResult {
  if (typeof pair !== 'object' || pair === null) throw new InvalidInputError('input.invalid', name, `${name} must be a pair such as { p: '1 MPa', T: '300 °C' }; got ${String(pair)}`);
  return waterState(pair as CheckedWaterPair<WaterPair>);
}

/** The range of IAPWS-IF97 (R7-97(2012) Section 3). */
export const WATER_RANGE = {
  T: { min: Quantity.fromSI(T_MIN, 'temperature'), max: Quantity.fromSI(T_MAX_5, 'temperature') },
  p: { min: Quantity.fromSI(P_SEARCH_MIN, 'pressure'), max: Quantity.fromSI(P_MAX, 'pressure') },
  /** Above 1073.15 K (region 5) the pressure limit is 50 MPa. */
  pAboveT1073: { max: Quantity.fromSI(P_MAX_5, 'pressure') },
} as const;

/**
 * Water and steam by IAPWS-IF97: `water.state(pair)`, `water.saturation({ T } | { p })`, the
 * differences `deltaH`, `deltaU`, `deltaS` between two states, and `range`.
 */
export const water = {
  state: waterState,
  saturation: waterSaturation,
  deltaH: waterDeltaH,
  deltaU: waterDeltaU,
  deltaS: waterDeltaS,
  range: WATER_RANGE,
  viscosity: waterViscosity,
  thermalConductivity: waterThermalConductivity,
  surfaceTension: waterSurfaceTension,
} as const;
