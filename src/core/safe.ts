/**
 * Non-throwing calls: `safe(fn)` turns any heatstate function into one that returns
 * `{ ok: true, value }` or `{ ok: false, error }` instead of throwing.
 *
 * @module
 */
import { HeatstateError, InvalidInputError } from '../errors.js';

/** The outcome of a call made through {@link safe}. */
export type SafeResult<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly error: HeatstateError };

/**
 * Wraps `fn` so that it never throws: its value comes back as `{ ok: true, value }`, an error as
 * `{ ok: false, error }` (always a {@link HeatstateError}; anything else that escapes, which would be
 * a fault of the library, arrives as one with code `internal.unexpected` and the original as `cause`).
 * For an overloaded function the last overload's types apply; wrap an arrow function to pick another.
 *
 * @example
 * ```ts
 * const state = safe(water.state);
 * const r = state({ T: '5000 K', p: '1 MPa' });
 * r.ok;                  //=> false
 * r.ok || r.error.code;  //=> 'range.outside'
 * safe(water.state)({ T: '300 K', p: '1 MPa' }).ok;   //=> true
 * ```
 */
export function safe<A extends unknown[], R>(fn: (...args: A) => R): (...args: A) => SafeResult<R> {
  if (typeof fn !== 'function') throw new InvalidInputError('input.invalid', 'fn', `safe takes a function to wrap, such as water.state; got ${fn === null ? 'null' : typeof fn}`);
  return (...args: A): SafeResult<R> => {
    try {
      return { ok: true, value: fn(...args) };
    } catch (e) {
      if (e instanceof HeatstateError) return { ok: false, error: e };
      const error = new HeatstateError('internal.unexpected', `unexpected error inside heatstate: ${e instanceof Error ? e.message : String(e)}`);
      (error as { cause?: unknown }).cause = e;
      return { ok: false, error };
    }
  };
}
