/**
 * Reading the command's `name=value` inputs through the library's readers: which set of inputs was
 * given (the facade kit's `readPair`), and each value read as its dimension (`readQuantity`), so the
 * library's checks (decimal numbers only, known units, the right dimension, finite values) apply to
 * the command line as they do to code. A value error is reported with the input as written in front.
 *
 * @module
 */
import { readPair } from '../core/read.js';
import { DimensionError, HeatstateError, InvalidInputError } from '../errors.js';
import type { Dimension } from '../units/dimensions.js';
import { quantity, readQuantity } from '../units/quantity.js';
import { UsageError } from './args.js';

/** A library error on one input, with the input as the user wrote it in front of the message. */
export class ValueError extends Error {
  override readonly name = 'ValueError';
  constructor(
    message: string,
    /** The library's error. */
    override readonly cause: HeatstateError,
  ) {
    super(message);
  }
}

/** A unit to show in the hint for a bare number. */
const EXAMPLE_UNIT: Readonly<Record<string, string>> = { temperature: 'K', pressure: 'kPa', specificEnergy: 'kJ/kg', specificHeat: 'kJ/(kg·K)', specificVolume: 'm³/kg', density: 'kg/m³', length: 'm', massFlow: 'kg/s' };

/** Re-throws a library error from reading `name=text` with the input in front. */
function withInput(name: string, text: string, e: unknown, plain = false): never {
  if (e instanceof HeatstateError) {
    const what = plain ? `${name}=${text} is not a plain decimal number` : `${name}=${text}`;
    const hint = e instanceof DimensionError && e.actual === 'dimensionless' ? ` (a number needs its unit here, for example ${name}=${text.trim()}${EXAMPLE_UNIT[e.expected] ?? ''})` : '';
    throw new ValueError(`${what}: ${e.message}${hint}`, e);
  }
  throw e;
}

/** Reads `name=text` as a quantity of `dimension` through the library; returns SI. */
export function readValue(name: string, text: string, dimension: Dimension): number {
  try {
    return readQuantity<Dimension, string>(text, dimension, name);
  } catch (e) {
    return withInput(name, text, e, dimension === 'dimensionless');
  }
}

/** Reads `name=text` as a plain decimal number (a quality, a bypass factor). */
export function readPlain(name: string, text: string): number {
  return readValue(name, text, 'dimensionless');
}

/** Reads a mass flow, or a volume flow (returned as such for conversion at a state), through the library. */
export function readFlow(name: string, text: string): { massFlow: number } | { volumeFlow: number } {
  let dimension: string;
  try {
    dimension = quantity(text).dimension;
  } catch (e) {
    return withInput(name, text, e);
  }
  if (dimension === 'volumeFlow') return { volumeFlow: readValue(name, text, 'volumeFlow') };
  try {
    return { massFlow: readQuantity<'massFlow', string>(text, 'massFlow', name) };
  } catch (e) {
    if (e instanceof HeatstateError) throw new ValueError(`${name}=${text}: ${name} must be a dry-air mass flow (kg/s, lbm/h) or a volume flow (m³/s, cfm); got a ${dimension.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`)}`, e);
    throw e;
  }
}

/**
 * Which of the accepted sets of inputs the command line gave, by the facade kit's `readPair`: an
 * unknown name, too many inputs (over-determined) or too few (under-determined) is a usage error
 * naming the inputs given and the sets accepted.
 */
export function chooseSet(values: ReadonlyMap<string, string>, names: readonly string[], command: string, accepted: readonly (readonly string[])[]): string {
  const given: Record<string, string> = {};
  for (const n of names) given[n] = values.get(n)!;
  try {
    return readPair(given, `heatstate ${command}`, accepted);
  } catch (e) {
    if (e instanceof InvalidInputError) throw new UsageError(e.message);
    throw e;
  }
}

/** Refuses any input name not in `known`, listing the names the command takes. */
export function onlyNames(values: ReadonlyMap<string, string>, command: string, known: readonly string[], takes: string): void {
  const unknown = [...values.keys()].filter((k) => !known.includes(k));
  if (unknown.length > 0) {
    throw new UsageError(`${unknown.map((k) => `"${k}"`).join(', ')} ${unknown.length === 1 ? 'is' : 'are'} not an input of heatstate ${command}; it takes ${takes}`);
  }
}
