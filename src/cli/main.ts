#!/usr/bin/env node
/**
 * The `heatstate` command: one state or one property from the shell, in SI or US units, as an
 * aligned table for people or JSON for scripts. Run `heatstate --help` for the syntax.
 *
 * @module
 */
import { run } from './run.js';

process.exitCode = run(process.argv.slice(2), (s) => process.stdout.write(`${s}\n`), (s) => process.stderr.write(`${s}\n`));
