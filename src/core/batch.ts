/**
 * The generic batch runner every model's batch API uses: typed arrays in, the model's SI core in a
 * loop over one reused output object, one Float64Array per requested property and one status per
 * element out. A malformed call (unknown or over-determined inputs, arrays of different lengths,
 * an `out` array of the wrong length or type, an unknown property) throws before any work; a bad
 * element never throws: it gets a status and NaN outputs, and the rest are still computed.
 * A model may hand the runner a fused loop per input set ({@link BatchLoop}) that replaces the
 * per-element dispatch through `solve` and the property readers; the checks of the call run first
 * either way.
 *
 * @module
 */
import { InvalidInputError } from '../errors.js';
import { describeValue } from './read.js';
import { Status, type StatusCode } from './status.js';

/**
 * A model's own loop over a whole batch, for speed: it fills `columns[c][i]` (property `props[c]`) and
 * `status[i]` for every element i, exactly as the runner's loop over the set's `solve` would
 * (same status codes, same values bit for bit, NaN in every column of a failed element). The runner
 * calls it only after every check of the call has passed. It returns false, before writing anything,
 * to hand the batch back to the runner's loop (for a request it does not specialise).
 */
export type BatchLoop<P extends string> = (a: Float64Array, b: Float64Array | undefined, props: readonly P[], columns: readonly Float64Array[], status: Uint8Array) => boolean;

/**
 * One accepted set of batch inputs and the SI core that solves it: a `solve` per element (with an
 * optional fused loop), or a fused loop alone that handles every call ({@link CompleteBatchLoop}).
 */
export type BatchInputSet<Out, P extends string = string> =
  | {
      /** The input names, in the order `solve` takes them (`['p', 'T']`). */
      readonly keys: readonly string[];
      /** The SI core: one element's inputs (the second is 0 for a one-input set) into `out`. */
      readonly solve: (a: number, b: number, out: Out) => StatusCode;
      /** Optional fused loop equivalent to the runner's loop over `solve` (see {@link BatchLoop}). */
      readonly loop?: BatchLoop<P>;
    }
  | {
      /** The input names, in the order the loop takes them. */
      readonly keys: readonly string[];
      readonly solve?: undefined;
      /** The fused loop, for every request of this set. */
      readonly loop: CompleteBatchLoop<P>;
    };

/**
 * A {@link BatchLoop} that never hands a batch back: a set of two or more inputs whose loop handles
 * every request needs no per-element `solve` (humid air's sets: the pair and `p`).
 */
export type CompleteBatchLoop<P extends string> = (a: Float64Array, b: Float64Array | undefined, props: readonly P[], columns: readonly Float64Array[], status: Uint8Array) => true;

/** What a model tells the runner. */
export interface BatchModel<Out, P extends string> {
  /** The batch function's name, for messages. */
  readonly name: string;
  /** The accepted input sets. */
  readonly inputs: readonly BatchInputSet<Out, P>[];
  /** Each property's reader from the output object. */
  readonly properties: { readonly [K in P]: (out: Out) => number };
  /** The output object, created once per batch call. */
  readonly createOutput: () => Out;
  /**
   * True when `property` is not defined at the state in `out` (cp inside the two-phase dome): its
   * output is NaN and the element's status {@link Status.undefinedProperty}.
   */
  readonly undefinedAt?: (out: Out, property: P) => boolean;
  /**
   * Properties whose NaN means "has no meaning at this state" rather than a fault (a quality outside
   * the dome): written as NaN with the element's status unchanged.
   */
  readonly mayBeNaN?: { readonly [K in P]?: true };
  /** Properties that need particular inputs (an ideal gas's `s` needs `p`). */
  readonly requires?: { readonly [K in P]?: readonly string[] };
}

/** Batch outputs: one Float64Array per requested property, and `status` per element. */
export type BatchResult<P extends string> = { [K in P]: Float64Array } & { readonly status: Uint8Array };

/** Arrays to fill in place: one per requested property and `status`, each exactly as long as the inputs. */
export type BatchOut<P extends string> = Partial<Record<P, Float64Array>> & { status?: Uint8Array };

/**
 * Runs `model` over `inputs` for `props`.
 * @throws {@link InvalidInputError} for a malformed call only
 * @example
 * ```ts
 * const square: BatchModel<{ y: number }, 'y'> = {
 *   name: 'squares', inputs: [{ keys: ['x'], solve: (x, _, out) => ((out.y = x * x), x >= 0 ? 0 : 1) }],
 *   properties: { y: (out) => out.y }, createOutput: () => ({ y: 0 }),
 * };
 * runBatch(square, { x: Float64Array.of(2, -1) }, ['y']).status;   //=> Uint8Array [0, 1]
 * ```
 */
export function runBatch<Out, P extends string>(model: BatchModel<Out, P>, inputs: unknown, props: unknown, out?: unknown): BatchResult<P> {
  const name = model.name;
  const list = model.inputs.map((s) => `{ ${s.keys.join(', ')} }`).join(', ');
  if (typeof inputs !== 'object' || inputs === null || Array.isArray(inputs) || ArrayBuffer.isView(inputs)) {
    throw new InvalidInputError('input.invalid', 'inputs', `${name} takes ${list} as Float64Arrays in SI units; got ${describeValue(inputs)}`);
  }
  const record = inputs as Record<string, unknown>;
  const given = Object.keys(record).filter((k) => record[k] !== undefined);
  const set = model.inputs.find((s) => s.keys.length === given.length && s.keys.every((k) => given.includes(k)));
  if (set === undefined) {
    const unknown = given.filter((k) => !model.inputs.some((s) => s.keys.includes(k)));
    const why = unknown.length > 0 ? `${unknown.map((k) => `"${k}"`).join(', ')} is not an input of ${name}` : 'that is not one of the accepted sets (over- or under-determined)';
    throw new InvalidInputError('input.invalid', 'inputs', `${name} got { ${given.join(', ')} }: ${why}; it takes ${list}`);
  }
  const arrays = set.keys.map((k) => record[k]);
  arrays.forEach((a, i) => {
    if (!(a instanceof Float64Array)) throw new InvalidInputError('input.invalid', `inputs.${set.keys[i]}`, `inputs.${set.keys[i]} must be a Float64Array (SI units); got ${describeValue(a)}`);
  });
  const columnsIn = arrays as Float64Array[];
  const n = columnsIn[0]!.length;
  columnsIn.forEach((a, i) => {
    if (a.length !== n) throw new InvalidInputError('input.invalid', `inputs.${set.keys[i]}`, `input arrays differ in length (inputs.${set.keys[0]} has ${n}, inputs.${set.keys[i]} has ${a.length})`);
  });

  if (!Array.isArray(props)) throw new InvalidInputError('input.invalid', 'props', `${name}: props must be a list of properties such as [${Object.keys(model.properties).slice(0, 3).map((p) => `'${p}'`).join(', ')}]; got ${describeValue(props)}`);
  const known = Object.keys(model.properties);
  for (const prop of props) {
    if (typeof prop !== 'string' || !known.includes(prop)) throw new InvalidInputError('input.invalid', 'props', `unknown property ${describeValue(prop)}; choose from ${known.join(', ')}`);
    const needs = model.requires?.[prop as P];
    if (needs !== undefined && !needs.every((k) => set.keys.includes(k))) {
      throw new InvalidInputError('input.invalid', 'props', `${prop} needs ${needs.map((k) => `inputs.${k}`).join(' and ')} (as a Float64Array as long as the others)`);
    }
  }
  const wanted = props as P[];

  let outRecord: Record<string, unknown> = {};
  if (out !== undefined) {
    if (typeof out !== 'object' || out === null || Array.isArray(out)) throw new InvalidInputError('input.invalid', 'out', `out must be an object of arrays to fill; got ${describeValue(out)}`);
    outRecord = out as Record<string, unknown>;
    for (const key of Object.keys(outRecord)) {
      if (outRecord[key] === undefined) continue;
      if (key !== 'status' && !wanted.includes(key as P)) throw new InvalidInputError('input.invalid', `out.${key}`, `out.${key} is not a requested property; requested: ${wanted.join(', ') || 'none'}`);
    }
  }
  const result: Record<string, Float64Array | Uint8Array> = {};
  const columns: Float64Array[] = [];
  const readers: ((o: Out) => number)[] = [];
  const nanAllowed: boolean[] = [];
  for (const prop of wanted) {
    const given = outRecord[prop];
    if (given !== undefined && !(given instanceof Float64Array)) throw new InvalidInputError('input.invalid', `out.${prop}`, `out.${prop} must be a Float64Array; got ${describeValue(given)}`);
    if (given !== undefined && given.length !== n) throw new InvalidInputError('input.invalid', `out.${prop}`, `out.${prop} has ${given.length} elements; exactly ${n} are needed`);
    const arr = (given as Float64Array | undefined) ?? new Float64Array(n);
    result[prop] = arr;
    columns.push(arr);
    readers.push(model.properties[prop]);
    nanAllowed.push(model.mayBeNaN?.[prop] === true);
  }
  const givenStatus = outRecord.status;
  if (givenStatus !== undefined && !(givenStatus instanceof Uint8Array)) throw new InvalidInputError('input.invalid', 'out.status', `out.status must be a Uint8Array; got ${describeValue(givenStatus)}`);
  if (givenStatus !== undefined && givenStatus.length !== n) throw new InvalidInputError('input.invalid', 'out.status', `out.status has ${givenStatus.length} elements; exactly ${n} are needed`);
  const status = (givenStatus as Uint8Array | undefined) ?? new Uint8Array(n);
  result.status = status;

  const a = columnsIn[0]!;
  const b = columnsIn.length > 1 ? columnsIn[1]! : undefined;
  if (set.loop !== undefined && set.loop(a, b, wanted, columns, status)) return result as BatchResult<P>;
  // a set without solve has a loop that returned true above
  const solve = set.solve!;
  const state = model.createOutput();
  const undefinedAt = model.undefinedAt;
  const m = wanted.length;
  for (let i = 0; i < n; i++) {
    let code: number = solve(a[i]!, b === undefined ? 0 : b[i]!, state);
    if (code === Status.ok) {
      for (let c = 0; c < m; c++) {
        let v = readers[c]!(state);
        if (undefinedAt !== undefined && undefinedAt(state, wanted[c]!)) {
          v = NaN;
          code = Status.undefinedProperty;
        } else if (!Number.isFinite(v) && !(Number.isNaN(v) && nanAllowed[c])) {
          // a core that answered ok with a non-finite value (a denormal input overflowing): not a result
          code = Status.invalidInput;
          break;
        }
        columns[c]![i] = v;
      }
    }
    if (code !== Status.ok && code !== Status.undefinedProperty) for (let c = 0; c < m; c++) columns[c]![i] = NaN;
    status[i] = code;
  }
  return result as BatchResult<P>;
}
