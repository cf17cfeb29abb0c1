/**
 * A command whose one result several integration test files read, run once per test run: whoever
 * asks first starts it (an exclusive lock file decides who), the others wait for its status file.
 * The global setup (tests/helpers/global-setup.ts) starts it at the beginning of a run that includes
 * those files; a file asks too, so the command also runs when the setup did not foresee it. Whoever
 * started it awaits it (the setup in its teardown), so the command never outlives the run.
 *
 * The folder comes from the integration project's global setup (`inject('heatstateJobs')` in a test
 * file), which removes it at the end of the run.
 *
 * Plain Node (no vitest import): the global setup runs it in vitest's own process.
 */
import { spawn } from 'node:child_process';
import { closeSync, existsSync, openSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

export interface JobResult {
  /** Exit code (-1 when it could not start or was stopped by a signal). */
  code: number;
  /** stdout and stderr, interleaved as they came. */
  output: string;
  seconds: number;
}

/** A command run as a shared job. */
export interface JobSpec {
  /** Names its lock and status files. */
  name: string;
  file: string;
  args: string[];
  cwd: string;
  /** How long a waiting file waits for the status before giving up. */
  timeoutMs?: number;
}

const started = new Map<string, Promise<JobResult>>();

function run({ file, args, cwd }: JobSpec, status: string): Promise<JobResult> {
  const t = performance.now();
  return new Promise((resolve) => {
    const finish = (result: JobResult) => {
      writeFileSync(`${status}.part`, JSON.stringify(result));
      renameSync(`${status}.part`, status);
      resolve(result);
    };
    const child = spawn(file, args, { cwd, stdio: ['ignore', 'pipe', 'pipe'] });
    let output = '';
    child.stdout.on('data', (d: Buffer) => (output += d.toString()));
    child.stderr.on('data', (d: Buffer) => (output += d.toString()));
    child.on('error', (e) => finish({ code: -1, output: `${output}\n${e.message}`, seconds: (performance.now() - t) / 1e3 }));
    child.on('close', (code, signal) => finish({ code: code ?? -1, output: signal ? `${output}\nstopped by ${signal}` : output, seconds: (performance.now() - t) / 1e3 }));
  });
}

async function waitFor(status: string, timeoutMs: number): Promise<JobResult> {
  const deadline = performance.now() + timeoutMs;
  while (!existsSync(status)) {
    if (performance.now() > deadline) throw new Error(`${status} did not appear within ${timeoutMs / 1e3} s`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return JSON.parse(readFileSync(status, 'utf8')) as JobResult;
}

/** The result of the job, run once per test run in the folder `dir`. */
export function sharedJob(dir: string, spec: JobSpec): Promise<JobResult> {
  if (!dir) throw new Error('no folder for shared jobs in this run: run this file in the integration project (vitest.config.ts)');
  const status = join(dir, `${spec.name}.json`);
  let job = started.get(status);
  if (job === undefined) {
    let mine = false;
    try {
      closeSync(openSync(join(dir, `${spec.name}.lock`), 'wx'));
      mine = true;
    } catch {
      // someone else holds the lock: they run the command
    }
    job = mine ? run(spec, status) : waitFor(status, spec.timeoutMs ?? 300_000);
    started.set(status, job);
  }
  return job;
}
