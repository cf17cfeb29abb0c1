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
import { CallUnits } from '../core/call-units.js';
import { throwForStatus } from '../core/fail.js';
import { describeValue, rangeError, readAbsolutePressure, readChoice, readNumber, readOptions, readTemperature } from '../core/read.js';
import { resultQuantity } from '../core/result.js';
import { Status, type StatusCode } from '../core/status.js';
import { InvalidInputError, OutOfRangeError } from '../errors.js';
import type { Quantity, QuantityLike } from '../units/quantity.js';
import type { CheckedInputs, LooseQuantity } from '../core/inputs.js';
import type { Basis, EnergyDimension, IdealGas } from './gas.js';
import { isentropicTemperatureConstantCp } from './solve.js';

export { isentropicTemperatureConstantCp, IdealGasSolver } from './solve.js';

/** The inlet and outlet pressure of a process: T1, p1, p2 (absolute). */
export interface ProcessInlet {
  readonly T1: LooseQuantity<'temperature'>;
  readonly p1: LooseQuantity<'pressure'>;
  readonly p2: LooseQuantity<'pressure'>;
}

/** The dimension of each input name of a process. */
export interface ProcessDimensions {
  T1: 'temperature';
  p1: 'pressure';
  p2: 'pressure';
  referenceT: 'temperature';
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
  readonly T1: LooseQuantity<'temperature'>;
  readonly p1: LooseQuantity<'pressure'>;
  readonly p2: LooseQuantity<'pressure'>;
  /** Isentropic efficiency, 0 < η ≤ 1. Default 1. */
  readonly efficiency?: number;
}

function energyScale(gas: IdealGas<Basis>): number {
  return gas.basis === 'molar' ? MOLAR_GAS_CONSTANT : gas.core.R;
}

function energyDimension<B extends Basis>(gas: IdealGas<B>): EnergyDimension<B> {
  return (gas.basis === 'molar' ? 'molarEnergy' : 'specificEnergy') as EnergyDimension<B>;
}

/** Checks that `gas` is a gas object from idealGas() or mixture(). */
function checkGas(gas: unknown, fn: string): void {
  const g = gas as Partial<IdealGas<Basis>> | null;
  if (typeof g !== 'object' || g === null || typeof g.core !== 'object' || g.core === null || typeof g.solver !== 'object' || typeof g.bounds !== 'object') {
    throw new InvalidInputError('input.invalid', 'gas', `${fn} takes a gas from idealGas() or mixture() as its first argument; got ${describeValue(gas)}`);
  }
}

/** An isentropic efficiency, 0 < η ≤ 1 (default 1). */
function efficiencyOf(efficiency: unknown): number {
  return efficiency === undefined ? 1 : readNumber(efficiency, 'efficiency', { min: 0, max: 1, scope: 'an isentropic efficiency (0 < η ≤ 1)', minExclusive: true });
}

/** The inlet of a process: T1 in the gas's range, p1 and p2 absolute, read once in the caller's units. */
function inlet(gas: IdealGas<Basis>, input: unknown, fn: string, keys: readonly string[] = ['T1', 'p1', 'p2', 'efficiency']): { T1: number; p1: number; p2: number; units: CallUnits } {
  checkGas(gas, fn);
  const a = readOptions<Record<string, unknown>>(input, 'input', keys);
  if (input === undefined) throw new InvalidInputError('input.invalid', 'input', `${fn} takes { ${keys.join(', ')} }; got undefined`);
  const units = new CallUnits();
  const T1 = readTemperature(a.T1 as QuantityLike<'temperature'>, 'T1', gas.bounds, units);
  const p1 = readAbsolutePressure(a.p1 as QuantityLike<'pressure'>, 'p1', undefined, units);
  const p2 = readAbsolutePressure(a.p2 as QuantityLike<'pressure'>, 'p2', undefined, units);
  return { T1, p1, p2, units };
}

/** Throws for a failed temperature solve: the end temperature would leave the data. */
function failEnd(gas: IdealGas<Basis>, status: StatusCode, what: string, units: CallUnits, estimate: number): never {
  throwForStatus(status, {
    what: `the ${what} of ${gas.name}`,
    inputs: 'these inlet conditions',
    range: () => rangeError(what, estimate, 'temperature', { min: gas.core.Tmin, max: gas.core.Tmax, scope: `the data for ${gas.name} (the ${what} would fall outside it)` }, units),
    iterations: gas.solver.result.iterations,
  });
}

/**
 * The isentropic end state from (T1, p1) to p2 with variable cp: solves s(T2, p2) = s(T1, p1).
 *
 * @returns T2, and Δh and Δu from state 1 to state 2
 * @throws {@link OutOfRangeError} when T2 would fall outside the data
 * @example
 * ```ts
 * isentropicEnd(idealGas('air'), { T1: '300 K', p1: '100 kPa', p2: '800 kPa' }).T2.in('K'); //=> 539.61...
 * ```
 */
export function isentropicEnd<B extends Basis, const P extends ProcessInlet>(gas: IdealGas<B>, input: P & CheckedInputs<P, ProcessDimensions>): {
  readonly T2: Quantity<'temperature'>;
  readonly deltaH: Quantity<EnergyDimension<B>>;
  readonly deltaU: Quantity<EnergyDimension<B>>;
} {
  const { T1, p1, p2, units } = inlet(gas, input, 'isentropicEnd', ['T1', 'p1', 'p2']);
  const core = gas.core;
  const status = gas.solver.isentropicTemperature(T1, p1, p2);
  if (status !== Status.ok) failEnd(gas, status, 'isentropic end temperature', units, isentropicTemperatureConstantCp(core.cpR(T1) / (core.cpR(T1) - 1), T1, p1, p2));
  const T2 = gas.solver.result.x;
  const scale = energyScale(gas);
  const en = energyDimension(gas);
  return {
    T2: resultQuantity(T2, 'temperature', 'T2'),
    deltaH: resultQuantity(scale * (T2 * core.hRT(T2) - T1 * core.hRT(T1)), en, 'deltaH'),
    deltaU: resultQuantity(scale * (T2 * (core.hRT(T2) - 1) - T1 * (core.hRT(T1) - 1)), en, 'deltaU'),
  };
}

function machine<B extends Basis>(gas: IdealGas<B>, input: MachineInput, kind: 'compressor' | 'turbine'): MachineResult<B> {
  const { T1, p1, p2, units } = inlet(gas, input, kind);
  if (kind === 'compressor' ? !(p2 > p1) : !(p2 < p1)) {
    throw new InvalidInputError('input.invalid', 'p2', `a ${kind} needs p2 ${kind === 'compressor' ? '>' : '<'} p1; got p1 = ${units.describe(p1, 'pressure', 'Pa')}, p2 = ${units.describe(p2, 'pressure', 'Pa')}`);
  }
  const eta = efficiencyOf(input.efficiency);
  const core = gas.core;
  const solver = gas.solver;
  let status = solver.isentropicTemperature(T1, p1, p2);
  if (status !== Status.ok) failEnd(gas, status, 'isentropic outlet temperature', units, isentropicTemperatureConstantCp(core.cpR(T1) / (core.cpR(T1) - 1), T1, p1, p2));
  const T2s = solver.result.x;
  const h1 = T1 * core.hRT(T1);
  const h2s = T2s * core.hRT(T2s);
  const ws = kind === 'compressor' ? h2s - h1 : h1 - h2s; // per R̄ or R, in K
  const w = kind === 'compressor' ? ws / eta : ws * eta;
  const h2 = kind === 'compressor' ? h1 + w : h1 - w;
  status = solver.temperatureAtEnthalpy(h2, T2s);
  if (status !== Status.ok) failEnd(gas, status, 'outlet temperature', units, T1 + (h2 - h1) / core.cpR(T1));
  const T2 = solver.result.x;
  const scale = energyScale(gas);
  const en = energyDimension(gas);
  return {
    T2s: resultQuantity(T2s, 'temperature', 'T2s'),
    T2: resultQuantity(T2, 'temperature', 'T2'),
    workIsentropic: resultQuantity(scale * ws, en, 'workIsentropic'),
    work: resultQuantity(scale * w, en, 'work'),
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
export function compressor<B extends Basis, const P extends MachineInput>(gas: IdealGas<B>, input: P & CheckedInputs<P, ProcessDimensions>): MachineResult<B> {
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
export function turbine<B extends Basis, const P extends MachineInput>(gas: IdealGas<B>, input: P & CheckedInputs<P, ProcessDimensions>): MachineResult<B> {
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
export function polytropic<B extends Basis, const P extends ProcessInlet & { readonly n: number }>(gas: IdealGas<B>, input: P & CheckedInputs<P, ProcessDimensions>): PolytropicResult<B> {
  const { T1, p1, p2, units } = inlet(gas, input, 'polytropic', ['T1', 'p1', 'p2', 'n']);
  const n = readNumber(input.n, 'n', { min: 0, max: Infinity, scope: 'a polytropic exponent (n ≥ 0; n → ∞, isochoric, is not accepted)' });
  if (n === 0 && p1 !== p2) throw new InvalidInputError('input.invalid', 'p2', 'n = 0 is a constant-pressure process: p2 must equal p1 (give T2 to another function)');
  const T2 = n === 0 ? T1 : T1 * (p2 / p1) ** ((n - 1) / n);
  const b = gas.bounds;
  if (!(T2 >= b.min && T2 <= b.max)) throw rangeError('T2', T2, 'temperature', b, units);
  const scale = energyScale(gas);
  const Rmass = gas.core.R;
  const en = energyDimension(gas);
  const isothermal = n === 1;
  const wb = isothermal ? T1 * Math.log(p1 / p2) : (T2 - T1) / (1 - n); // per R
  const wt = isothermal ? T1 * Math.log(p1 / p2) : (n * (T1 - T2)) / (n - 1);
  const du = T2 * (gas.core.hRT(T2) - 1) - T1 * (gas.core.hRT(T1) - 1);
  return {
    T2: resultQuantity(T2, 'temperature', 'T2'),
    v1: resultQuantity((Rmass * T1) / p1, 'specificVolume', 'v1'),
    v2: resultQuantity((Rmass * T2) / p2, 'specificVolume', 'v2'),
    boundaryWork: resultQuantity(scale * wb, en, 'boundaryWork'),
    technicalWork: resultQuantity(scale * wt, en, 'technicalWork'),
    heat: resultQuantity(scale * (du + wb), en, 'heat'),
  };
}

function missingMachine(): never {
  throw new InvalidInputError('input.invalid', 'machine', `constantCpDeviation needs machine: "compressor" or "turbine"`);
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
 * d.workRelativeDifference;   //=> -0.046 (cp frozen at 298 K under-predicts this hot expansion by 4.6 %)
 * ```
 */
export function constantCpDeviation<B extends Basis, const P extends MachineInput & { readonly machine: 'compressor' | 'turbine'; readonly referenceT?: LooseQuantity<'temperature'> }>(gas: IdealGas<B>, input: P & CheckedInputs<P, ProcessDimensions>): ConstantCpDeviation<B> {
  checkGas(gas, 'constantCpDeviation');
  const kind = input === null || typeof input !== 'object' || input.machine === undefined ? missingMachine() : readChoice<'compressor' | 'turbine'>(input.machine, 'machine', ['compressor', 'turbine'], 'turbine');
  const { T1, p1, p2, units } = inlet(gas, input, 'constantCpDeviation', ['T1', 'p1', 'p2', 'efficiency', 'machine', 'referenceT']);
  const variableCp = machine(gas, { T1: input.T1, p1: input.p1, p2: input.p2, efficiency: input.efficiency } as MachineInput, kind);
  const T0 = input.referenceT === undefined ? 298.15 : readTemperature(input.referenceT, 'referenceT', gas.bounds, units);
  const cpR = gas.core.cpR(T0);
  const c = machineConstantCp(cpR, T1, p1, p2, efficiencyOf(input.efficiency), kind);
  if (!(c.T2 > 0 && c.T2s > 0)) throw rangeError('T2', c.T2, 'temperature', { min: 0, max: Infinity, scope: 'the constant-cp closed form (it gives a non-positive temperature here)', minExclusive: true }, units);
  const scale = energyScale(gas);
  const en = energyDimension(gas);
  const constantCp = {
    k: c.k,
    cp: resultQuantity(gas.core.R * cpR, 'specificHeat', 'cp'),
    T2s: resultQuantity(c.T2s, 'temperature', 'T2s'),
    T2: resultQuantity(c.T2, 'temperature', 'T2'),
    workIsentropic: resultQuantity(scale * c.ws, en, 'workIsentropic'),
    work: resultQuantity(scale * c.w, en, 'work'),
  };
  return {
    variableCp,
    constantCp,
    T2Difference: resultQuantity(c.T2 - variableCp.T2.si, 'temperatureDifference', 'T2Difference'),
    workRelativeDifference: (constantCp.work.si - variableCp.work.si) / variableCp.work.si,
  };
}
