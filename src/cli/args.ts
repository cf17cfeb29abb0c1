/**
 * The `heatstate` command line, read into its parts: the positional words (command, names), the
 * `name=value` inputs and the options. Every shape error is a {@link UsageError} (exit code 2); an
 * input with no value is an {@link InputError} (exit code 1). Values themselves are read later, by
 * the library's readers, where the dimension of each input is known.
 *
 * @module
 */
import { InvalidInputError } from '../errors.js';
import { readChoice } from '../core/read.js';

/** A command line of the wrong shape: unknown command, option or name, wrong set of inputs (exit code 2). */
export class UsageError extends Error {
  override readonly name = 'UsageError';
}

/** An input value the command cannot use, found by the command line itself (exit code 1). */
export class InputError extends Error {
  override readonly name = 'InputError';
}

/** Options that take a value, with the values each accepts. */
export const VALUE_OPTIONS = {
  '--units': ['si', 'us'],
} as const;

/** Options that take no value. */
export const SWITCHES = ['--json', '--transport', '--help', '-h'] as const;

/** The option list as shown in messages. */
export const OPTION_LIST = '--units si|us, --transport, --json, --help';

/** A command line, read. */
export interface Args {
  /** Words that are neither options nor `name=value`: the command, a species, a fluid, `sat`. */
  readonly positional: readonly string[];
  /** `name=value` inputs in the order given (names unique, values trimmed and non-empty). */
  readonly values: ReadonlyMap<string, string>;
  /** `--units`: `si` (default) or `us`. */
  readonly units: 'si' | 'us';
  readonly json: boolean;
  readonly transport: boolean;
  readonly help: boolean;
}

const NAME = /^[A-Za-z][A-Za-z0-9]*$/;

function quoted(s: string): string {
  return JSON.stringify(s.length > 60 ? `${s.slice(0, 60)}…` : s);
}

/**
 * Reads the command line. Refuses unknown options (listing the valid ones), option values outside
 * their list, options or names given twice, names that are not names, and empty values.
 */
export function parseArgs(argv: readonly string[]): Args {
  const positional: string[] = [];
  const values = new Map<string, string>();
  const seen = new Set<string>();
  const chosen: Record<string, string> = {};
  let json = false;
  let transport = false;
  let help = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (typeof a !== 'string') throw new UsageError(`arguments must be text; argument ${i + 1} is not`);
    if (a.startsWith('-')) {
      const eq = a.indexOf('=');
      const option = eq >= 0 ? a.slice(0, eq) : a;
      const canonical = option === '-h' ? '--help' : option;
      if (Object.hasOwn(VALUE_OPTIONS, option)) {
        const allowed = VALUE_OPTIONS[option as keyof typeof VALUE_OPTIONS];
        let value: string | undefined;
        if (eq >= 0) value = a.slice(eq + 1);
        else {
          value = argv[i + 1];
          if (value === undefined || value.startsWith('-')) throw new UsageError(`${option} needs a value: ${allowed.join(' or ')}`);
          i++;
        }
        if (seen.has(option)) throw new UsageError(`${option} is given twice; give it once`);
        seen.add(option);
        try {
          chosen[option] = readChoice<string>(value, option, allowed, allowed[0]);
        } catch (e) {
          if (e instanceof InvalidInputError) throw new UsageError(`${e.message} (see heatstate --help)`);
          throw e;
        }
      } else if ((SWITCHES as readonly string[]).includes(option)) {
        if (eq >= 0) throw new UsageError(`${option} takes no value; got ${quoted(a)}`);
        if (seen.has(canonical)) throw new UsageError(`${option} is given twice; give it once`);
        seen.add(canonical);
        if (canonical === '--json') json = true;
        else if (canonical === '--transport') transport = true;
        else help = true;
      } else {
        throw new UsageError(`unknown option ${quoted(option)}; the options are ${OPTION_LIST}`);
      }
    } else if (a.includes('=')) {
      const eq = a.indexOf('=');
      const name = a.slice(0, eq);
      const value = a.slice(eq + 1).trim();
      if (name === '') throw new UsageError(`${quoted(a)} has no name before "="; write name=value, for example T=300K`);
      if (!NAME.test(name)) throw new UsageError(`${quoted(name)} is not an input name (in ${quoted(a)}); names are letters and digits, such as T, p, RH, T1`);
      if (values.has(name)) throw new UsageError(`${name} is given twice (${name}=${values.get(name)} and ${name}=${value}); give each input once`);
      if (value === '') throw new InputError(`${name} is empty (${quoted(a)}); give a value, such as ${name}=<number with its unit> (see heatstate --help)`);
      values.set(name, value);
    } else {
      positional.push(a);
    }
  }
  return {
    positional,
    values,
    units: (chosen['--units'] ?? 'si') as Args['units'],
    json,
    transport,
    help,
  };
}
