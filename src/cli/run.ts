/**
 * The `heatstate` command's logic: parse arguments, compute, format. `main.ts` wires it to the
 * process; tests call {@link run} directly.
 *
 * Every error is one line on stderr: exit code 1 for an input value the library or the command
 * refused, 2 for a command line of the wrong shape. Library errors carry their stable code in
 * brackets (`[range.outside]`).
 *
 * @module
 */
import { HeatstateError, OutOfRangeError } from '../errors.js';
import { airCommand, airMixCommand, coilCommand } from './air.js';
import { InputError, parseArgs, UsageError, type Args } from './args.js';
import { fluidCommand, gasCommand, liquidCommand, saturationCommand, waterCommand } from './commands.js';
import { format, usWording, type Row, type Units } from './display.js';
import { helpText } from './help.js';
import { ValueError } from './inputs.js';

/** The subcommands, with the options each takes beyond --units, --json and --help. */
const COMMANDS: Readonly<Record<string, { run: (args: Args) => Row[]; transport?: true }>> = {
  water: { run: waterCommand, transport: true },
  sat: { run: saturationCommand, transport: true },
  saturation: { run: saturationCommand, transport: true },
  gas: { run: gasCommand, transport: true },
  liquid: { run: liquidCommand, transport: true },
  air: { run: airCommand },
  'air-mix': { run: airMixCommand },
  coil: { run: coilCommand },
  fluid: { run: fluidCommand },
};
const COMMAND_LIST = 'water, sat, gas, liquid, air, air-mix, coil or fluid';

function oneLine(s: string): string {
  return s.replace(/\s*[\r\n]+\s*/g, ' ');
}

function libraryMessage(e: HeatstateError, message: string, units: Units): string {
  const us = units === 'us' && e instanceof OutOfRangeError ? usWording(e) : '';
  return `${message}${us} [${e.code}]`;
}

/** Runs the command line; returns the exit code. Output and errors go to the given writers. */
export function run(argv: readonly string[], stdout: (s: string) => void, stderr: (s: string) => void): number {
  let units: Units = 'si';
  try {
    if (!Array.isArray(argv)) throw new UsageError('arguments must be a list of strings');
    const args = parseArgs(argv);
    units = args.units;
    if (args.help) {
      stdout(helpText());
      return 0;
    }
    const command = args.positional[0];
    if (command === undefined) throw new UsageError(`no command: use ${COMMAND_LIST} (see heatstate --help)`);
    const spec = Object.hasOwn(COMMANDS, command) ? COMMANDS[command]! : undefined;
    if (spec === undefined) throw new UsageError(`unknown command "${command}": use ${COMMAND_LIST} (see heatstate --help)`);
    if (args.transport && spec.transport !== true) throw new UsageError(`--transport applies to heatstate water, sat, gas and liquid, not to ${command}`);
    const rows = spec.run(args);
    stdout(format(rows, args.units, args.json));
    return 0;
  } catch (e) {
    let message: string;
    let code = 1;
    if (e instanceof UsageError) {
      message = e.message;
      code = 2;
    } else if (e instanceof InputError) message = e.message;
    else if (e instanceof ValueError) message = libraryMessage(e.cause, e.message, units);
    else if (e instanceof HeatstateError) message = libraryMessage(e, e.message, units);
    else message = `internal error (please report it): ${e instanceof Error ? e.message : String(e)}`;
    stderr(`heatstate: ${oneLine(message)}`);
    return code;
  }
}
