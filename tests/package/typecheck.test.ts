/**
 * The whole tree type-checks: `npm run typecheck` (tsc --noEmit over src, tests, scripts, examples
 * and bench, as tsconfig.json includes them). This is also what proves that every `@ts-expect-error`
 * line in the tests still meets an error, i.e. that the dimension checks still reject what they must.
 * It runs in the integration project, beside the build, rather than before everything else.
 */
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCommand } from '../helpers/run.js';

const root = fileURLToPath(new URL('../..', import.meta.url));

describe('npm run typecheck', () => {
  it('tsc --noEmit reports no errors', async () => {
    // tsc exits non-zero on any error, which rejects here with its report in the message
    const { stdout, stderr } = await runCommand('npm', ['run', '--silent', 'typecheck'], { cwd: root });
    expect(`${stdout}${stderr}`.trim()).toBe('');
  }, 300_000);
});
