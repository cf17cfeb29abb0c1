/**
 * Global setup of the `integration` project: starts the one build of dist/ (`npm run build`, i.e.
 * tsup) and returns at once, so the files that need no dist/ (type check, API reference, bundles,
 * serverless, the unit project) run while it builds. Files that read dist/ wait for it with
 * `await builtDist()` from tests/helpers/dist.ts; nothing else builds or cleans dist/ during a run.
 *
 * The outcome is written to a status file (renamed into place when complete, so a reader never sees
 * half of it) whose path reaches the test files through vitest's provide/inject.
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

declare module 'vitest' {
  export interface ProvidedContext {
    /** Path of the JSON file `{ code, output, seconds }` written when the build has finished. */
    heatstateBuildStatus: string;
  }
}

const root = fileURLToPath(new URL('../..', import.meta.url));

export default function setup(project: TestProject): () => Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'heatstate-build-'));
  const status = join(dir, 'build.json');
  project.provide('heatstateBuildStatus', status);
  const write = (body: { code: number; output: string; seconds: number; skipped?: string }) => {
    writeFileSync(`${status}.part`, JSON.stringify(body));
    renameSync(`${status}.part`, status);
  };

  if (process.env.HEATSTATE_SKIP_BUILD === '1' && existsSync(join(root, 'dist/index.js'))) {
    write({ code: 0, output: '', seconds: 0, skipped: 'HEATSTATE_SKIP_BUILD=1: kept the existing dist/' });
    return async () => rmSync(dir, { recursive: true, force: true });
  }

  // tsup's own bin, run with this Node (no shell, so the same on every platform)
  const started = performance.now();
  const child = spawn(process.execPath, [join(root, 'node_modules/tsup/dist/cli-default.js')], { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
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
  };
}
