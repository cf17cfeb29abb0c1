/**
 * The facade kit's status mapper: turns an SI core's {@link Status} into the typed error the facade
 * throws. Range errors always carry numeric bounds (the caller supplies them, lazily, since working
 * them out may take a model evaluation); convergence errors carry the iterations when known.
 *
 * @module
 */
import { ConvergenceError, HeatstateError, InvalidInputError, type OutOfRangeError } from '../errors.js';
import { Status, statusName } from './status.js';

/** What the mapper needs to word an error. */
export interface FailureContext {
  /** The model or solve, for messages: `the IAPWS-IF97 (p, h) flash`. */
  readonly what: string;
  /** The inputs as the caller wrote them: `p = 20 psia (137 895 Pa), h = 5000 Btu/lbm (…)`. */
  readonly inputs: string;
  /** The range error for an out-of-range status, with numeric bounds. */
  readonly range: () => OutOfRangeError;
  /** The parameter named for an invalid-input status. */
  readonly parameter?: string;
  /** Iterations the solver used, when it reports them. */
  readonly iterations?: number;
}

/**
 * Throws the typed error for a failed core status. Never returns.
 * @example
 * ```ts
 * const range = () => new OutOfRangeError({ quantity: 'h', value: 1, unit: 'J/kg', min: 0, max: 4e6, scope: 'the (h, s) flash' });
 * throwForStatus(Status.noConvergence, { what: 'the (h, s) flash', inputs: 'h = 1 J/kg, s = 2 J/(kg·K)', range });
 * // throws ConvergenceError: the (h, s) flash did not converge for h = 1 J/kg, s = 2 J/(kg·K)
 * ```
 */
export function throwForStatus(status: number, context: FailureContext): never {
  switch (status) {
    case Status.outOfRange:
      throw context.range();
    case Status.noConvergence:
      throw new ConvergenceError(`${context.what} did not converge for ${context.inputs}`, context.iterations);
    case Status.invalidInput:
      throw new InvalidInputError('input.invalid', context.parameter ?? 'input', `${context.what} cannot use ${context.inputs}`);
    default:
      throw new HeatstateError('input.invalid', `${context.what} failed with status ${status} (${statusName(status)}) for ${context.inputs}`);
  }
}
