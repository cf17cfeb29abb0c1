/**
 * Global setup of the `integration` project: starts the one build of dist/ (`npm run build`, i.e.
 * tsup) and returns at once, so the files that need no dist/ (type check, API reference, bundles,
 * the in-process CLI tests, the unit project) run while it builds. Files that read dist/ wait for it with
 * `await builtDist()` from tests/helpers/dist.ts; nothing else builds or cleans dist/ during a run.
 *
 * The outcome is written to a status file (renamed into place when complete, so a reader never sees
 * half of it) whose path reaches the test files through vitest's provide/inject.
 *
 * It also makes the folder for the run's shared jobs (tests/helpers/shared-job.ts) and starts the
 * one typedoc run that serves the type check and the API reference (tests/helpers/api-reference.ts),
 * when the run includes either file, so that it goes from the start beside the build; it waits for
 * it at the end and removes the folder.
 *
 * HEATSTATE_SKIP_BUILD=1 keeps an existing dist/ (for rerunning one integration file while working);
 * `npm test` always builds.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { TestProject } from 'vitest/node';
import { API_REFERENCE_READERS, SINGLE_THREADED_GC, apiReference } from './api-reference.js';

declare module 'vitest' {
  export interface ProvidedContext {
    /** Path of the JSON file `{ code, output, seconds }` written when the build has finished. */
    heatstateBuildStatus: string;
    /** The folder of the run's shared jobs (tests/helpers/shared-job.ts), removed at the end of the run. */
    heatstateJobs: string;
  }
}

const root = fileURLToPath(new URL('../..', import.meta.url));

export default function setup(project: TestProject): () => Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'heatstate-build-'));
  const status = join(dir, 'build.json');
  project.provide('heatstateBuildStatus', status);
  const jobs = mkdtempSync(join(tmpdir(), 'heatstate-jobs-'));
  project.provide('heatstateJobs', jobs);
  // the file filters of the command line (vitest keeps them on its instance; none means every file):
  // a file matches a filter that is part of its path, as vitest matches them
  const filters = (project.vitest as unknown as { filenamePattern?: string[] }).filenamePattern;
  const reference = !filters || filters.some((f) => API_REFERENCE_READERS.some((file) => join(root, file).includes(f))) ? apiReference(jobs) : undefined;
  const removeJobs = async () => {
    await reference;
    rmSync(jobs, { recursive: true, force: true });
  };
  const write = (body: { code: number; output: string; seconds: number; skipped?: string }) => {
    writeFileSync(`${status}.part`, JSON.stringify(body));
    renameSync(`${status}.part`, status);
  };

  if (process.env.HEATSTATE_SKIP_BUILD === '1' && existsSync(join(root, 'dist/index.js'))) {
    write({ code: 0, output: '', seconds: 0, skipped: 'HEATSTATE_SKIP_BUILD=1: kept the existing dist/' });
    return async () => {
      rmSync(dir, { recursive: true, force: true });
      await removeJobs();
    };
  }

  // tsup's own bin, run with this Node (no shell, so the same on every platform); its garbage
  // collection on its own thread (tests/helpers/api-reference.ts says why), which changes no output
  const started = performance.now();
  const child = spawn(process.execPath, [SINGLE_THREADED_GC, join(root, 'node_modules/tsup/dist/cli-default.js')], { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
  let output = '';
  child.stdout.on('data', (d: Buffer) => (output += d.toString()));
  child.stderr.on('data', (d: Buffer) => (output += d.toString()));
  const done = new Promise<void>((resolve) => {
    child.on('error', (e) => {
      write({ code: -1, output: `${output}\n${e.message}`, seconds: (performance.now() - started) / 1e3 });
      resolve();
    });
    child.on('close', (code, signal) => {
      write({ code: code ?? -1, output: signal ? `${output}\nstopped by ${signal}` : output, seconds: (performance.now() - started) / 1e3 });
      resolve();
    });
  });

  // teardown: never leave a half-built dist/ behind (the build is short; wait for it)
  return async () => {
    await done;
    const { code, seconds } = JSON.parse(readFileSync(status, 'utf8')) as { code: number; seconds: number };
    console.log(`integration global setup: build of dist/ ${code === 0 ? 'done' : `failed (exit code ${code})`} in ${seconds.toFixed(1)} s`);
    rmSync(dir, { recursive: true, force: true });
    await removeJobs();
  };
}
