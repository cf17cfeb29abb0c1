/**
 * The built `heatstate` bin (dist/cli.js, the file package.json's `bin` names) runs from the shell
 * with the exit codes of tests/cli.test.ts (which runs the same command in process, on the source).
 * Integration project: it waits for the run's one build of dist/.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { builtDist } from './helpers/dist.js';

const root = fileURLToPath(new URL('..', import.meta.url));

describe('the built bin (dist/cli.js)', () => {
  beforeAll(() => builtDist(), 300_000);
  it('runs from the shell with exit codes', () => {
    const ok = spawnSync(process.execPath, ['dist/cli.js', 'water', 'p=1 atm', 'T=25 °C'], { cwd: root, encoding: 'utf8' });
    expect(ok.status).toBe(0);
    expect(ok.stdout).toMatch(/^phase\s+liquid$/m);
    const bad = spawnSync(process.execPath, ['dist/cli.js', 'water', 'p=1 atm', 'T=-500 K'], { cwd: root, encoding: 'utf8' });
    expect(bad.status).toBe(1);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
    const usage = spawnSync(process.execPath, ['dist/cli.js', 'water', 'p=1 atm', '--units', 'imperial'], { cwd: root, encoding: 'utf8' });
    expect(usage.status).toBe(2);
    expect(usage.stderr.trim().split('\n')).toHaveLength(1);
  });
});
