/**
 * Ideal-gas processes: isentropic end states with variable cp, compressors and turbines with an
 * isentropic efficiency, polytropic processes, and the constant-cp closed forms beside them.
 *
 * The SI core functions (`isentropicTemperature`, `temperatureAtEnthalpy`, the `…ConstantCp` closed
 * forms) take plain numbers; the facade functions take an {@link IdealGas} and quantities.
 *
 * @module
 */
import { MOLAR_GAS_CONSTANT } from '../chem/constants.js';
import { ConvergenceError, InvalidInputError, OutOfRangeError } from '../errors.js';
import { solveBracketed } from '../numeric/root.js';
import { Quantity, readQuantity, type QuantityLike } from '../units/quantity.js';
import type { Basis, EnergyDimension, IdealGas } from './gas.js';
import type { IdealGasModel } from './model.js';

/**
 * T2 with s°(T2) − s°(T1) = R ln(p2/p1) (isentropic, variable cp), in K, found by a bracketed Newton
 * solve on [Tmin, Tmax]. Returns NaN when T2 would fall outside the model's range.
 * @example
 * ```ts
 * const air = idealGas('air').core;
 * isentropicTemperature(air, 300, 100e3, 800e3);   //=> 539.6 (K)
 * ```
 */
export function isentropicTemperature(model: IdealGasModel, T1: number, p1: number, p2: number): number {
  const target = model.sR(T1) + Math.log(p2 / p1);
  const f = (T: number) => model.sR(T) - target;
  if (f(model.Tmin) > 0 || f(model.Tmax) < 0) return NaN;
  const guess = T1 * (p2 / p1) ** (1 - 1 / (model.cpR(T1) / (model.cpR(T1) - 1)));
  return solveBracketed(f, (T) => model.cpR(T) / T, model.Tmin, model.Tmax, guess);
}

/**
 * T (K) at which h°/R̄ = hOverR (K), by a bracketed Newton solve. NaN when outside the range.
 * @example
 * ```ts
 * const n2 = idealGas('N2').core;
 * temperatureAtEnthalpy(n2, 1000 * n2.hRT(1000), 900);   //=> 1000 (K)
 * ```
 */
export function temperatureAtEnthalpy(model: IdealGasModel, hOverR: number, guess: number): number {
  const f = (T: number) => T * model.hRT(T) - hOverR;
  if (f(model.Tmin) > 0 || f(model.Tmax) < 0) return NaN;
  return solveBracketed(f, (T) => model.cpR(T), model.Tmin, model.Tmax, guess);
}

/**
 * Constant-cp isentropic end temperature: T2 = T1·(p2/p1)^((k−1)/k).
 * @example
 * ```ts
 * isentropicTemperatureConstantCp(1.4, 300, 100e3, 800e3);   //=> 543.4 (K)
 * ```
 */
export function isentropicTemperatureConstantCp(k: number, T1: number, p1: number, p2: number): number {
  return T1 * (p2 / p1) ** ((k - 1) / k);
}

/** Result of a compressor or turbine calculation. Work is per unit mass (or mole on a molar basis). */
export interface MachineResult<B extends Basis = 'mass'> {
  /** Outlet temperature of the isentropic (ideal) machine. */
  readonly T2s: Quantity<'temperature'>;
  /** Actual outlet temperature. */
  readonly T2: Quantity<'temperature'>;
  /** Work of the isentropic machine: input for a compressor, output for a turbine (positive). */
  readonly workIsentropic: Quantity<EnergyDimension<B>>;
  /** Actual work: w_s/η for a compressor (input), η·w_s for a turbine (output). Positive. */
  readonly work: Quantity<EnergyDimension<B>>;
}

/** Inputs of a compressor or turbine calculation. */
export interface MachineInput {
  readonly T1: QuantityLike<'temperature'>;
  readonly p1: QuantityLike<'pressure'>;
  readonly p2: QuantityLike<'pressure'>;
  /** Isentropic efficiency, 0 < η ≤ 1. Default 1. */
  readonly efficiency?: number;
}

function energyScale(gas: IdealGas<Basis>): number {
  return gas.basis === 'molar' ? MOLAR_GAS_CONSTANT : gas.core.R;
}

function pressure(input: QuantityLike<'pressure'>, parameter: string): number {
  const p = readQuantity(input, 'pressure', parameter);
  if (!(p > 0)) throw new OutOfRangeError({ quantity: parameter, value: p, min: 0, max: Infinity, unit: 'Pa', scope: 'an ideal gas (absolute pressure must be positive)' });
  return p;
}

function efficiencyOf(efficiency: number | undefined): number {
  const eta = efficiency ?? 1;
  if (!Number.isFinite(eta) || !(eta > 0 && eta <= 1)) {
    throw new OutOfRangeError({ quantity: 'efficiency', value: eta, min: 0, max: 1, unit: '1', scope: 'an isentropic efficiency (0 < η ≤ 1)' });
  }
  return eta;
}

function outsideRange(gas: IdealGas<Basis>, what: string): never {
  throw new OutOfRangeError(
    { quantity: what, value: NaN, min: gas.core.Tmin, max: gas.core.Tmax, unit: 'K', scope: `the data for ${gas.name}` },
    `the ${what} would fall outside the data for ${gas.name} (${gas.core.Tmin} to ${gas.core.Tmax} K)`,
  );
}

/**
 * The isentropic end state from (T1, p1) to p2 with variable cp: solves s(T2, p2) = s(T1, p1).
 *
 * @returns T2, and Δh and Δu from state 1 to state 2
 * @throws {@link OutOfRangeError} when T2 would fall outside the data
 * @example
 * ```ts
 * isentropicEnd(idealGas('air'), { T1: '300 K', p1: '100 kPa', p2: '800 kPa' }).T2.in('K'); //=> 539.8...
 * ```
 */
export function isentropicEnd<B extends Basis>(gas: IdealGas<B>, input: { readonly T1: QuantityLike<'temperature'>; readonly p1: QuantityLike<'pressure'>; readonly p2: QuantityLike<'pressure'> }): {
  readonly T2: Quantity<'temperature'>;
  readonly deltaH: Quantity<EnergyDimension<B>>;
  readonly deltaU: Quantity<EnergyDimension<B>>;
} {
  const T1 = gas.readTemperature(input.T1, 'T1');
  const T2 = isentropicTemperature(gas.core, T1, pressure(input.p1, 'p1'), pressure(input.p2, 'p2'));
  if (Number.isNaN(T2)) outsideRange(gas, 'isentropic end temperature');
  const T2q = Quantity.fromSI(T2, 'temperature');
  return { T2: T2q, deltaH: gas.deltaH(T1q(T1), T2q), deltaU: gas.deltaU(T1q(T1), T2q) };
}

function T1q(T: number): Quantity<'temperature'> {
  return Quantity.fromSI(T, 'temperature');
}

function machine<B extends Basis>(gas: IdealGas<B>, input: MachineInput, kind: 'compressor' | 'turbine'): MachineResult<B> {
  const T1 = gas.readTemperature(input.T1, 'T1');
  const p1 = pressure(input.p1, 'p1');
  const p2 = pressure(input.p2, 'p2');
  if (kind === 'compressor' ? !(p2 > p1) : !(p2 < p1)) {
    throw new InvalidInputError('input.invalid', 'p2', `a ${kind} needs p2 ${kind === 'compressor' ? '>' : '<'} p1; got p1 = ${p1} Pa, p2 = ${p2} Pa`);
  }
  const eta = efficiencyOf(input.efficiency);
  const core = gas.core;
  const T2s = isentropicTemperature(core, T1, p1, p2);
  if (Number.isNaN(T2s)) outsideRange(gas, 'isentropic outlet temperature');
  const h1 = T1 * core.hRT(T1);
  const h2s = T2s * core.hRT(T2s);
  const ws = kind === 'compressor' ? h2s - h1 : h1 - h2s; // per R̄ or R, in K
  const w = kind === 'compressor' ? ws / eta : ws * eta;
  const h2 = kind === 'compressor' ? h1 + w : h1 - w;
  const T2 = temperatureAtEnthalpy(core, h2, T2s);
  if (Number.isNaN(T2)) outsideRange(gas, 'outlet temperature');
  const scale = energyScale(gas);
  const en = (gas.basis === 'molar' ? 'molarEnergy' : 'specificEnergy') as EnergyDimension<B>;
  return {
    T2s: Quantity.fromSI(T2s, 'temperature'),
    T2: Quantity.fromSI(T2, 'temperature'),
    workIsentropic: Quantity.fromSI(scale * ws, en),
    work: Quantity.fromSI(scale * w, en),
  };
}

/**
 * A compressor from (T1, p1) to p2 with isentropic efficiency η, variable cp:
 * T2s from s(T2s, p2) = s(T1, p1); w_s = h(T2s) − h(T1); w = w_s/η; h(T2) = h(T1) + w.
 *
 * @throws {@link InvalidInputError} p2 ≤ p1; {@link OutOfRangeError} η outside (0, 1], temperatures outside the data
 * @example
 * ```ts
 * compressor(idealGas('air'), { T1: '300 K', p1: '100 kPa', p2: '800 kPa', efficiency: 0.85 }).work.in('kJ/kg'); //=> 287...
 * ```
 */
export function compressor<B extends Basis>(gas: IdealGas<B>, input: MachineInput): MachineResult<B> {
  return machine(gas, input, 'compressor');
}

/**
 * A turbine (expander) from (T1, p1) to p2 with isentropic efficiency η, variable cp:
 * w_s = h(T1) − h(T2s); w = η·w_s; h(T2) = h(T1) − w.
 *
 * @throws {@link InvalidInputError} p2 ≥ p1; {@link OutOfRangeError} η outside (0, 1], temperatures outside the data
 * @example
 * ```ts
 * turbine(idealGas('air'), { T1: '1400 K', p1: '1.6 MPa', p2: '100 kPa', efficiency: 0.9 }).work.in('kJ/kg');   //=> 725.7
 * ```
 */
export function turbine<B extends Basis>(gas: IdealGas<B>, input: MachineInput): MachineResult<B> {
  return machine(gas, input, 'turbine');
}

/** Result of {@link polytropic}. Work and heat per unit mass (or mole); signs as stated. */
export interface PolytropicResult<B extends Basis = 'mass'> {
  readonly T2: Quantity<'temperature'>;
  /** Specific (or molar) volumes at the two states. */
  readonly v1: Quantity<'specificVolume'>;
  readonly v2: Quantity<'specificVolume'>;
  /** Closed-system boundary work done BY the gas, ∫p dv = R(T2 − T1)/(1 − n) (R T ln(p1/p2) for n = 1). */
  readonly boundaryWork: Quantity<EnergyDimension<B>>;
  /** Steady-flow technical work done BY the gas, −∫v dp = n·R(T1 − T2)/(n − 1) (R T ln(p1/p2) for n = 1). */
  readonly technicalWork: Quantity<EnergyDimension<B>>;
  /** Heat INTO the gas in the closed process, q = Δu + boundary work (Δu with variable cp). */
  readonly heat: Quantity<EnergyDimension<B>>;
}

/**
 * A polytropic process p·vⁿ = const from (T1, p1) to p2: T2 = T1 (p2/p1)^((n−1)/n) (ideal gas,
 * any cp), with boundary work, technical work and heat (Δu from the gas's cp model).
 * n = 0 is isobaric, n = 1 isothermal, n = k isentropic for constant cp; n → ∞ is isochoric (not accepted).
 *
 * @param input T1, p1, p2 and the exponent n (finite, ≥ 0)
 * @throws {@link OutOfRangeError} n outside [0, ∞) or T2 outside the data
 * @example
 * ```ts
 * polytropic(idealGas('air'), { T1: '300 K', p1: '100 kPa', p2: '500 kPa', n: 1.3 }).T2.in('K');   //=> 434.9
 * ```
 */
export function polytropic<B extends Basis>(gas: IdealGas<B>, input: { readonly T1: QuantityLike<'temperature'>; readonly p1: QuantityLike<'pressure'>; readonly p2: QuantityLike<'pressure'>; readonly n: number }): PolytropicResult<B> {
  const n = input.n;
  if (!Number.isFinite(n) || n < 0) throw new OutOfRangeError({ quantity: 'n', value: n, min: 0, max: Infinity, unit: '1', scope: 'a polytropic exponent' });
  const T1 = gas.readTemperature(input.T1, 'T1');
  const p1 = pressure(input.p1, 'p1');
  const p2 = pressure(input.p2, 'p2');
  if (n === 0 && p1 !== p2) throw new InvalidInputError('input.invalid', 'p2', 'n = 0 is a constant-pressure process: p2 must equal p1 (give T2 to another function)');
  const T2 = n === 0 ? T1 : T1 * (p2 / p1) ** ((n - 1) / n);
  const T2q = gas.readTemperature(Quantity.fromSI(T2, 'temperature'), 'T2');
  const scale = energyScale(gas);
  const Rmass = gas.core.R;
  const en = (gas.basis === 'molar' ? 'molarEnergy' : 'specificEnergy') as EnergyDimension<B>;
  const isothermal = n === 1;
  const wb = isothermal ? T1 * Math.log(p1 / p2) : (T2q - T1) / (1 - n); // per R
  const wt = isothermal ? T1 * Math.log(p1 / p2) : (n * (T1 - T2q)) / (n - 1);
  const du = T2q * (gas.core.hRT(T2q) - 1) - T1 * (gas.core.hRT(T1) - 1);
  return {
    T2: Quantity.fromSI(T2q, 'temperature'),
    v1: Quantity.fromSI((Rmass * T1) / p1, 'specificVolume'),
    v2: Quantity.fromSI((Rmass * T2q) / p2, 'specificVolume'),
    boundaryWork: Quantity.fromSI(scale * wb, en),
    technicalWork: Quantity.fromSI(scale * wt, en),
    heat: Quantity.fromSI(scale * (du + wb), en),
  };
}

/** Constant-cp machine by the closed forms, for {@link constantCpDeviation}. */
function machineConstantCp(cpR: number, T1: number, p1: number, p2: number, eta: number, kind: 'compressor' | 'turbine') {
  const k = cpR / (cpR - 1);
  const T2s = isentropicTemperatureConstantCp(k, T1, p1, p2);
  const ws = kind === 'compressor' ? cpR * (T2s - T1) : cpR * (T1 - T2s);
  const w = kind === 'compressor' ? ws / eta : ws * eta;
  const T2 = kind === 'compressor' ? T1 + w / cpR : T1 - w / cpR;
  return { k, T2s, T2, ws, w };
}

/** How far the constant-cp estimate is from the variable-cp result for the same machine. */
export interface ConstantCpDeviation<B extends Basis = 'mass'> {
  /** The variable-cp result (NASA polynomials). */
  readonly variableCp: MachineResult<B>;
  /** The constant-cp closed forms with cp and k at `referenceT`. */
  readonly constantCp: MachineResult<B> & { readonly k: number; readonly cp: Quantity<'specificHeat'> };
  /** T2(constant cp) − T2(variable cp). */
  readonly T2Difference: Quantity<'temperatureDifference'>;
  /** (w(constant cp) − w(variable cp)) / w(variable cp). */
  readonly workRelativeDifference: number;
}

/**
 * Runs a compressor or turbine both ways: with variable cp, and with the constant-cp closed forms
 * T2s = T1 (p2/p1)^((k−1)/k), w = cp ΔT, cp and k taken at `referenceT` (default 298.15 K, the
 * cold-air-standard choice). Reports the difference in outlet temperature and the relative work error.
 *
 * @example
 * ```ts
 * const d = constantCpDeviation(idealGas('air'), { machine: 'turbine', T1: '1400 K', p1: '1.6 MPa', p2: '100 kPa', efficiency: 0.9 });
 * d.workRelativeDifference;   //=> −0.046: cp frozen at 298 K under-predicts this hot expansion by 4.6 %
 * ```
 */
export function constantCpDeviation<B extends Basis>(gas: IdealGas<B>, input: MachineInput & { readonly machine: 'compressor' | 'turbine'; readonly referenceT?: QuantityLike<'temperature'> }): ConstantCpDeviation<B> {
  const variableCp = machine(gas, input, input.machine);
  const T0 = input.referenceT === undefined ? 298.15 : gas.readTemperature(input.referenceT, 'referenceT');
  const cpR = gas.core.cpR(T0);
  const T1 = gas.readTemperature(input.T1, 'T1');
  const c = machineConstantCp(cpR, T1, pressure(input.p1, 'p1'), pressure(input.p2, 'p2'), efficiencyOf(input.efficiency), input.machine);
  if (!(c.T2 > 0 && c.T2s > 0)) throw new ConvergenceError('the constant-cp closed form gives a non-positive temperature', 0);
  const scale = energyScale(gas);
  const en = (gas.basis === 'molar' ? 'molarEnergy' : 'specificEnergy') as EnergyDimension<B>;
  const constantCp = {
    k: c.k,
    cp: Quantity.fromSI(gas.core.R * cpR, 'specificHeat'),
    T2s: Quantity.fromSI(c.T2s, 'temperature'),
    T2: Quantity.fromSI(c.T2, 'temperature'),
    workIsentropic: Quantity.fromSI(scale * c.ws, en),
    work: Quantity.fromSI(scale * c.w, en),
  };
  return {
    variableCp,
    constantCp,
    T2Difference: Quantity.fromSI(c.T2 - variableCp.T2.si, 'temperatureDifference'),
    workRelativeDifference: (constantCp.work.si - variableCp.work.si) / variableCp.work.si,
  };
}
