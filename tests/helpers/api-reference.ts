/**
 * One typedoc run per test run, shared by two files: tests/docs/api.test.ts (the API reference builds,
 * every export documented) and tests/package/typecheck.test.ts (the whole tree type-checks).
 *
 * typedoc builds one TypeScript program from tsconfig.json (the same root files and compiler options
 * as `npm run typecheck`, i.e. src, tests, scripts, examples and bench) and, unless told to skip it,
 * reports that program's diagnostics before it documents anything, exiting non-zero on any error. So
 * one compiler program serves both checks instead of two (tsc, then typedoc again). It runs as
 * `npm run docs` does (typedoc's command-line module, run by this Node), with typedoc.json, writing
 * only its JSON into the run's folder for shared jobs: giving an output on the command line replaces
 * typedoc.json's `outputs` (the HTML of `npm run docs`). Comments and links are resolved and
 * validated while the project is converted, before any output is written, so the JSON run reports
 * every warning the HTML run does; the HTML rendering itself (about 2 s of a core) is left to
 * `npm run docs`.
 *
 * It runs at normal priority: it is the longest single job of the run (about half a minute of one
 * core), started at the beginning beside the build.
 *
 * Plain Node (no vitest import): the global setup starts it; a test file passes
 * `inject('heatstateJobs')` as `dir`.
 */
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { sharedJob, type JobResult, type JobSpec } from './shared-job.js';

const root = fileURLToPath(new URL('../..', import.meta.url));

/**
 * V8's flag for garbage collection on the isolate's own thread, for the run's two long compiler jobs
 * (this typedoc run and the build): they allocate heavily (typedoc's program holds about 600 MB), and
 * the helper threads of concurrent collection compete with the rest of the run for the machine's two
 * cores. Measured alone, each job took the same wall time and 7 % less CPU with it (typedoc about
 * 27 → 24 s, the build 15 → 14 s of a core). Results are the same either way.
 */
export const SINGLE_THREADED_GC = '--single-threaded-gc';

/** The two test files that read the result (the global setup starts the job when a run includes them). */
export const API_REFERENCE_READERS = ['tests/docs/api.test.ts', 'tests/package/typecheck.test.ts'];

export interface ApiReference extends JobResult {
  /** typedoc's command-line arguments. */
  args: string[];
  /** The project as JSON (typedoc --json). */
  json: string;
}

function spec(dir: string): JobSpec & { json: string; typedocArgs: string[] } {
  const json = join(dir, 'api.json');
  const typedocArgs = ['--json', json];
  return { name: 'api-reference', file: process.execPath, args: [SINGLE_THREADED_GC, join(root, 'node_modules/typedoc/dist/cli.js'), ...typedocArgs], cwd: root, json, typedocArgs };
}

/** The run's typedoc result (started by whoever asks first); typedoc's colours are stripped from its output. */
export async function apiReference(dir: string): Promise<ApiReference> {
  const { json, typedocArgs, ...job } = spec(dir);
  const result = await sharedJob(dir, job);
  // eslint-disable-next-line no-control-regex
  return { ...result, output: result.output.replace(/\x1b\[[0-9;]*m/g, ''), args: typedocArgs, json };
}
