/**
 * Package hygiene: the packed tarball holds only what users need, passes publint and
 * @arethetypeswrong/cli, installs into a fresh consumer project, loads with ESM import and CommonJS
 * require, and its types check with tsc.
 *
 * The tarball is packed from this run's dist/ (tests/helpers/global-setup.ts builds it once) into a
 * temporary folder; this file never builds, cleans or writes inside the repository.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readManifest } from '../../scripts/entries.js';
import { builtDist } from '../helpers/dist.js';
import { runCommand as run } from '../helpers/run.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
/** A dev tool's bin script (from the dev dependencies), run with this Node. */
const bin = (pkg: string, path: string) => join(root, 'node_modules', pkg, path);
let files: string[] = [];
let dir = '';
let tarball = '';
let consumer = '';
/** The checks that need only the tarball or only the installed package, started as soon as they can. */
let lint: Promise<[{ stdout: string }, { stdout: string }]>;
let consumerTypes: Promise<unknown>;
/** A promise whose rejection is reported by the test that awaits it, not as an unhandled rejection before. */
const started = <T>(p: Promise<T>): Promise<T> => {
  p.catch(() => {});
  return p;
};

beforeAll(async () => {
  await builtDist();
  dir = mkdtempSync(join(tmpdir(), 'heatstate-pack-'));
  const packed = JSON.parse(execFileSync('npm', ['pack', '--json', '--pack-destination', dir], { cwd: root, encoding: 'utf8' })) as { filename: string; files: { path: string }[] }[];
  files = packed[0]!.files.map((f) => f.path).sort();
  tarball = join(dir, packed[0]!.filename);
  // publint and attw read the tarball: they run while the consumer project installs it
  lint = started(
    Promise.all([
      run(process.execPath, [bin('publint', 'src/cli.js'), 'run', tarball, '--strict'], { cwd: root }),
      run(process.execPath, [bin('@arethetypeswrong/cli', 'dist/index.js'), tarball, '--profile', 'node16', '--format', 'json'], { cwd: root }),
    ]),
  );
  consumer = join(dir, 'consumer');
  mkdirSync(consumer);
  writeFileSync(join(consumer, 'package.json'), JSON.stringify({ name: 'consumer', private: true, type: 'module' }));
  await run('npm', ['install', '--no-audit', '--no-fund', '--prefer-offline', '--no-package-lock', tarball], { cwd: consumer, timeout: 240_000 });
  // the consumer's type check starts once the package is installed; its test below awaits it
  writeFileSync(
    join(consumer, 'check.ts'),
    [
      "import { quantity, water } from 'heatstate';",
      "import { idealGas } from 'heatstate/ideal-gas';",
      "const h: number = water.state({ p: '1 MPa', T: '500 K' }).h.in('kJ/kg');",
      "const k: number = idealGas('air').k('300 K');",
      '// @ts-expect-error a pressure is not a temperature',
      "idealGas('air').cp(quantity(1, 'bar'));",
      'export { h, k };',
    ].join('\n'),
  );
  // skipLibCheck false: the package's own .d.ts/.d.cts files are checked; only TypeScript's
  // bundled lib.*.d.ts are skipped (skipDefaultLibCheck), which say nothing about this package.
  // lib ES2022 alone, as the package's own tsconfig: the DOM declarations a bare target brings in
  // (40 000 lines) cost about a second of the check and are not what a Node consumer compiles with
  writeFileSync(join(consumer, 'tsconfig.json'), JSON.stringify({ compilerOptions: { strict: true, module: 'node16', moduleResolution: 'node16', target: 'es2022', lib: ['es2022'], noEmit: true, skipLibCheck: false, skipDefaultLibCheck: true, types: [] }, files: ['check.ts'] }));
  consumerTypes = started(run(process.execPath, [bin('typescript', 'bin/tsc'), '-p', consumer], { cwd: consumer }));
}, 300_000);

afterAll(async () => {
  // the checks started above have finished before their folder goes
  await Promise.allSettled([lint, consumerTypes]);
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('the packed package', () => {
  it('holds only dist, README, LICENSE, CHANGELOG and package.json', () => {
    const outside = files.filter((f) => !/^(dist\/.+|README\.md|LICENSE|CHANGELOG\.md|package\.json)$/.test(f));
    expect(outside).toEqual([]);
    for (const needed of ['dist/index.js', 'dist/index.cjs', 'dist/index.d.ts', 'dist/index.d.cts', 'dist/water/index.js', 'dist/tables/water/index.js', 'dist/cli.js', 'LICENSE']) expect(files).toContain(needed);
    expect(files.some((f) => f.startsWith('src/') || f.startsWith('tests/') || f.startsWith('data/'))).toBe(false);
  });
  it('passes publint --strict and @arethetypeswrong/cli (node16 profile) on the same tarball', async () => {
    // a finding makes either tool exit non-zero, which rejects here with its report
    const [publint, types] = await lint;
    expect(publint.stdout).toContain('All good!');
    const report = JSON.parse(types.stdout) as { analysis: { entrypoints: Record<string, unknown> }; problems?: Record<string, { entrypoint: string; resolutionKind: string }[]> };
    // every entry of the manifest, and package.json
    expect(Object.keys(report.analysis.entrypoints).sort()).toEqual([...readManifest().entries.map((e) => e.subpath), './package.json'].sort());
    // the only problems left are for node10 resolution (no `exports` support), which the node16 profile ignores
    const counted = Object.values(report.problems ?? {}).flat().filter((p) => p.resolutionKind !== 'node10');
    expect(counted).toEqual([]);
  });
  it('loads with ESM import in a consumer project', () => {
    const out = execFileSync(process.execPath, ['--input-type=module', '-e', "import { water } from 'heatstate'; import { idealGas } from 'heatstate/ideal-gas'; import { waterTables } from 'heatstate/tables/water'; console.log(water.state({ p: '1 MPa', T: '500 K' }).phase, idealGas('N2').k('300 K').toFixed(3), waterTables.saturationByT().rowCount)"], { cwd: consumer, encoding: 'utf8' });
    expect(out.trim()).toBe('vapor 1.400 76');
  });
  it('loads with CommonJS require in a consumer project', () => {
    const out = execFileSync(process.execPath, ['-e', "const { quantity } = require('heatstate/units'); const { incompressible } = require('heatstate/incompressible'); console.log(quantity('1 Btu/lbm').in('kJ/kg'), incompressible('copper').name)"], { cwd: consumer, encoding: 'utf8' });
    expect(out.trim()).toBe('2.326 copper');
  });
  it('ships types that tsc checks, dimension errors included', async () => {
    // tsc -p on the consumer's check.ts (written in beforeAll): any error, or an expected error
    // that does not occur, makes it exit non-zero, which rejects here with its report
    await consumerTypes;
  });
  it('installs the heatstate command', () => {
    const out = execFileSync(join(consumer, 'node_modules/.bin/heatstate'), ['water', 'p=1 atm', 'T=25 °C', '--json'], { cwd: consumer, encoding: 'utf8' });
    expect((JSON.parse(out) as { phase: string }).phase).toBe('liquid');
  });
});
