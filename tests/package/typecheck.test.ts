/**
 * The whole tree type-checks: `npm run typecheck` (tsc --noEmit over src, tests, scripts, examples
 * and bench, as tsconfig.json includes them). This is also what proves that every `@ts-expect-error`
 * line in the tests still meets an error, i.e. that the dimension checks still reject what they must.
 * It runs in the integration project, beside the build, rather than before everything else.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCommand } from '../helpers/run.js';

const root = fileURLToPath(new URL('../..', import.meta.url));

describe('npm run typecheck', () => {
  it('tsc --noEmit reports no errors', async () => {
    // tsc exits non-zero on any error, which rejects here with its report in the message
    // tsc itself (the command `npm run typecheck` runs), so that its priority can be lowered
    const script = (JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { scripts: Record<string, string> }).scripts.typecheck!;
    const [command, ...args] = script.split(' ');
    expect(command).toBe('tsc');
    const { stdout, stderr } = await runCommand(process.execPath, [join(root, 'node_modules/typescript/bin/tsc'), ...args], { cwd: root, background: true });
    expect(`${stdout}${stderr}`.trim()).toBe('');
  }, 300_000);
});
