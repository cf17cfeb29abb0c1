/**
 * The `accuracy` option shared by `water.state` and `waterBatch`: `'fast'` (the default) or
 * `'compensated'` (the compensated IF97 kernels at the solved state, docs/guide/accuracy.md).
 *
 * @module
 * @internal
 */
import { readChoice, readOptions } from '../core/read.js';
import type { WaterAccuracy } from './state-types.js';

const ACCURACIES: readonly WaterAccuracy[] = ['fast', 'compensated'];

/**
 * True when `options` (undefined, or `{ accuracy }`) asks for the compensated kernels; checks the
 * options (known keys, a known accuracy) and throws the facade's InvalidInputError otherwise.
 * @example
 * ```ts
 * wantsCompensated(undefined);                          //=> false
 * wantsCompensated({ accuracy: 'compensated' });        //=> true
 * wantsCompensated({ accuracy: 'exact' });
 * // throws InvalidInputError: options.accuracy must be one of "fast", "compensated"; got "exact"
 * ```
 */
export function wantsCompensated(options: unknown): boolean {
  if (options === undefined) return false;
  const o = readOptions<{ readonly accuracy?: WaterAccuracy }>(options, 'options', ['accuracy']);
  return readChoice(o.accuracy, 'options.accuracy', ACCURACIES, 'fast') === 'compensated';
}
