import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { run } from '../src/cli/run.js';
import { idealGas } from '../src/ideal-gas/index.js';
import { incompressible } from '../src/incompressible/index.js';
import { water } from '../src/water/index.js';
import { builtDist } from './helpers/dist.js';

const root = fileURLToPath(new URL('..', import.meta.url));
function cli(...args: string[]): { code: number; out: string; err: string } {
  let out = '';
  let err = '';
  const code = run(args, (s) => (out += s), (s) => (err += s));
  return { code, out, err };
}
const field = (out: string, name: string) => Number(new RegExp(`^${name}\\s+(\\S+)`, 'm').exec(out)![1]);

describe('heatstate command line', () => {
  it('a water state as an aligned table matches the library', () => {
    const r = cli('water', 'p=10 MPa', 'T=500 °C');
    expect(r.code).toBe(0);
    const st = water.state({ p: '10 MPa', T: '500 °C' });
    expect(field(r.out, 'h')).toBe(Number(st.h.in('kJ/kg').toPrecision(6)));
    expect(r.out).toMatch(/^phase\s+vapor$/m);
  });
  it('US units and JSON for scripts', () => {
    const r = cli('water', 'p=150psig', 'x=0.95', '--units', 'us', '--json');
    const body = JSON.parse(r.out) as Record<string, { value: number; unit: string } | null | string>;
    expect(body.h).toEqual({ value: water.state({ p: '150 psig', x: 0.95 }).h.in('Btu/lbm'), unit: 'Btu/lbm' });
    expect(body.cp).toBeNull();
  });
  it('a saturation row, an ideal-gas property and an incompressible Δh', () => {
    expect(field(cli('sat', 'p=1 atm').out, 'hfg')).toBe(Number(water.saturation({ p: '1 atm' }).hfg.in('kJ/kg').toPrecision(6)));
    expect(field(cli('gas', 'N2', 'T=800 K').out, 'cp')).toBe(Number(idealGas('N2').cp('800 K').in('kJ/(kg·K)').toPrecision(6)));
    const dh = incompressible('copper').deltaH({ T: '20 °C', p: '101.325 kPa' }, { T: '120 °C', p: '101.325 kPa' });
    expect(field(cli('liquid', 'copper', 'T1=20 °C', 'T2=120 °C').out, 'delta h')).toBe(Number(dh.in('kJ/kg').toPrecision(6)));
  });
  it('bad input gives a one-line error and a non-zero exit code', () => {
    for (const args of [['water', 'p=10 MPa', 'T=5000 K'], ['water', 'p=10 MPa'], ['gas', 'unobtainium', 'T=300 K'], ['frobnicate'], ['water', 'p=1 MPa', 'T=300 K', '--units', 'metric']]) {
      const r = cli(...args);
      expect(r.code, args.join(' ')).not.toBe(0);
      expect(r.err, args.join(' ')).toMatch(/^heatstate: [^\n]+$/);
      expect(r.out).toBe('');
    }
  });
  it('--help shows examples', () => {
    const r = cli('--help');
    expect(r.code).toBe(0);
    expect(r.out).toContain('examples:');
    expect(r.out).toContain('heatstate water p="10 MPa" T="500 °C"');
  });
});

describe('the built bin (dist/cli.js)', () => {
  beforeAll(() => builtDist(), 300_000);
  it('runs from the shell with exit codes', () => {
    const ok = spawnSync(process.execPath, ['dist/cli.js', 'water', 'p=1 atm', 'T=25 °C'], { cwd: root, encoding: 'utf8' });
    expect(ok.status).toBe(0);
    expect(ok.stdout).toMatch(/^phase\s+liquid$/m);
    const bad = spawnSync(process.execPath, ['dist/cli.js', 'water', 'p=1 atm', 'T=-500 K'], { cwd: root, encoding: 'utf8' });
    expect(bad.status).not.toBe(0);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
  });
});
