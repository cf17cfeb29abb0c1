/**
 * Package hygiene: the packed tarball holds only what users need, installs into a fresh consumer
 * project, loads with ESM import and CommonJS require, and its types check with tsc.
 * (publint and @arethetypeswrong/cli run in `npm run check:package`.)
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
const tsc = fileURLToPath(new URL('../../node_modules/.bin/tsc', import.meta.url));
let files: string[] = [];
let consumer = '';

beforeAll(() => {
  execFileSync('npm', ['run', 'build'], { cwd: root, stdio: 'pipe' });
  const dir = mkdtempSync(join(tmpdir(), 'heatstate-pack-'));
  const packed = JSON.parse(execFileSync('npm', ['pack', '--json', '--pack-destination', dir], { cwd: root, encoding: 'utf8' })) as { filename: string; files: { path: string }[] }[];
  files = packed[0]!.files.map((f) => f.path).sort();
  consumer = join(dir, 'consumer');
  execFileSync('mkdir', ['-p', consumer]);
  writeFileSync(join(consumer, 'package.json'), JSON.stringify({ name: 'consumer', private: true, type: 'module' }));
  execFileSync('npm', ['install', '--no-audit', '--no-fund', '--prefer-offline', join(dir, packed[0]!.filename)], { cwd: consumer, stdio: 'pipe', timeout: 240_000 });
}, 300_000);

describe('the packed package', () => {
  it('holds only dist, README, LICENSE, CHANGELOG and package.json', () => {
    const outside = files.filter((f) => !/^(dist\/.+|README\.md|LICENSE|CHANGELOG\.md|package\.json)$/.test(f));
    expect(outside).toEqual([]);
    for (const needed of ['dist/index.js', 'dist/index.cjs', 'dist/index.d.ts', 'dist/index.d.cts', 'dist/water/index.js', 'dist/tables/water/index.js', 'dist/cli.js', 'LICENSE']) expect(files).toContain(needed);
    expect(files.some((f) => f.startsWith('src/') || f.startsWith('tests/') || f.startsWith('data/'))).toBe(false);
  });
  it('loads with ESM import in a consumer project', () => {
    const out = execFileSync(process.execPath, ['--input-type=module', '-e', "import { water } from 'heatstate'; import { idealGas } from 'heatstate/ideal-gas'; import { waterTables } from 'heatstate/tables/water'; console.log(water.state({ p: '1 MPa', T: '500 K' }).phase, idealGas('N2').k('300 K').toFixed(3), waterTables.saturationByT().rowCount)"], { cwd: consumer, encoding: 'utf8' });
    expect(out.trim()).toBe('vapor 1.400 76');
  });
  it('loads with CommonJS require in a consumer project', () => {
    const out = execFileSync(process.execPath, ['-e', "const { quantity } = require('heatstate/units'); const { incompressible } = require('heatstate/incompressible'); console.log(quantity('1 Btu/lbm').in('kJ/kg'), incompressible('copper').name)"], { cwd: consumer, encoding: 'utf8' });
    expect(out.trim()).toBe('2.326 copper');
  });
  it('ships types that tsc checks, dimension errors included', () => {
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
    writeFileSync(join(consumer, 'tsconfig.json'), JSON.stringify({ compilerOptions: { strict: true, module: 'node16', moduleResolution: 'node16', target: 'es2022', noEmit: true, skipLibCheck: false, types: [] }, files: ['check.ts'] }));
    execFileSync(tsc, ['-p', consumer], { cwd: consumer, encoding: 'utf8' });
  });
  it('installs the heatstate command', () => {
    const out = execFileSync(join(consumer, 'node_modules/.bin/heatstate'), ['water', 'p=1 atm', 'T=25 °C', '--json'], { cwd: consumer, encoding: 'utf8' });
    expect((JSON.parse(out) as { phase: string }).phase).toBe('liquid');
  });
});
