/**
 * The one status every SI core returns.
 *
 * The model contract (see `src/core/README.md`): an SI core function takes plain SI numbers
 * (K, Pa, J/kg, J/(kg·K), m³/kg, kg/m³, m/s, Pa·s, W/(m·K), N/m, fractions 0–1), writes its
 * results into a caller-owned output object, and returns a {@link Status}. It never throws,
 * never allocates per call and never returns NaN as a value: when it cannot answer, the status
 * says why and the output object's contents are unspecified.
 *
 * @module
 */

/** Status codes of every SI core, root finder and batch element. */
export const Status = {
  /** The result was computed. */
  ok: 0,
  /** The inputs are valid numbers, but outside the model's range (or no state exists for them). */
  outOfRange: 1,
  /** An iteration did not reach its tolerance. */
  noConvergence: 2,
  /** NaN, infinite, or otherwise unusable input (a denormal pressure, a negative density). */
  invalidInput: 3,
  /**
   * The state was computed, but a requested property is not defined there (cp, cv, w, k inside
   * the two-phase dome); that property's output is NaN, every other output is valid.
   */
  undefinedProperty: 4,
} as const;

/** One of the {@link Status} codes. */
export type StatusCode = (typeof Status)[keyof typeof Status];

/**
 * The name of a status code, for messages: `statusName(1)` → `'outOfRange'`.
 * @example
 * ```ts
 * statusName(1);   //=> 'outOfRange'
 * ```
 */
export function statusName(code: number): keyof typeof Status | 'unknown' {
  for (const [name, value] of Object.entries(Status)) if (value === code) return name as keyof typeof Status;
  return 'unknown';
}
