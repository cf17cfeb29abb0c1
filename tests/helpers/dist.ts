/**
 * dist/ for the integration tests: built once per run by tests/helpers/global-setup.ts. A test file
 * that reads dist/ (directly, through the package name, or by packing) calls `await builtDist()`
 * in its `beforeAll` and never builds on its own.
 */
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { inject } from 'vitest';

let ready: Promise<void> | undefined;

/** Resolves when the run's build of dist/ has succeeded; rejects with tsup's output if it failed. */
export function builtDist(timeoutMs = 240_000): Promise<void> {
  ready ??= (async () => {
    const status = inject('heatstateBuildStatus');
    if (!status) throw new Error('no build of dist/ in this run: run this file in the integration project (vitest.config.ts)');
    const deadline = performance.now() + timeoutMs;
    while (!existsSync(status)) {
      if (performance.now() > deadline) throw new Error(`the build of dist/ did not finish within ${timeoutMs / 1e3} s`);
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    const result = JSON.parse(readFileSync(status, 'utf8')) as { code: number; output: string };
    if (result.code !== 0) throw new Error(`npm run build (tsup) failed with exit code ${result.code}:\n${result.output}`);
  })();
  return ready;
}

/** The built root entry (dist/index.js) as a user's `import 'heatstate'` loads it, typed as the source's; after this run's build. */
export async function importBuiltRoot(): Promise<typeof import('../../src/index.js')> {
  await builtDist();
  const file = fileURLToPath(new URL('../../dist/index.js', import.meta.url));
  return (await import(/* @vite-ignore */ pathToFileURL(file).href)) as typeof import('../../src/index.js');
}
