import { execFileSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { builtDist, importBuiltRoot } from './helpers/dist.js';
import { expectClose } from './helpers/tolerance.js';

const root = fileURLToPath(new URL('..', import.meta.url));
/**
 * A TypeScript example runs in one Node process with tsx's loader (`node --import tsx`, as `npm start`
 * runs it through tsx's bin, which starts a second process for the same), with tsx's settings from
 * tests/helpers/tsconfig.examples.json: without the root tsconfig's `paths` (which map `heatstate`
 * to src/ for the type check), its `import … from 'heatstate'` resolves through the package's exports
 * to this run's dist/, as in a user's project, and tsx transforms only the example itself.
 */
const run = (file: string, env: Record<string, string> = {}) =>
  execFileSync(process.execPath, file.endsWith('.ts') ? ['--import', 'tsx', file] : [file], {
    cwd: root,
    encoding: 'utf8',
    timeout: 120_000,
    env: { ...process.env, TSX_TSCONFIG_PATH: join(root, 'tests/helpers/tsconfig.examples.json'), ...env },
  });

// examples import the built package ('heatstate/...') as users do: they need this run's dist/
beforeAll(() => builtDist(), 300_000);

describe('examples/', () => {
  it('every example is covered by a test below', () => {
    const files = readdirSync(new URL('../examples/', import.meta.url), { recursive: true, withFileTypes: true })
      .filter((d) => d.isFile() && /\.(ts|mjs|html|csv)$/.test(d.name))
      .map((d) => `${d.parentPath.slice(d.parentPath.indexOf('examples') + 9)}/${d.name}`.replace(/^\//, ''))
      .sort();
    expect(files).toEqual([
      'air-handler.ts',
      'browser/index.html',
      'demo.ts',
      'metering/metering.ts',
      'metering/readings.csv',
      'node-script.ts',
      'serverless-handler.ts',
      'worker-pool/main.mjs',
      'worker-pool/worker.mjs',
    ]);
  });

  it('demo.ts (npm start) prints each result in SI and US units and the caution', async () => {
    const out = run('examples/demo.ts');
    // the printed numbers are compared with the built package's own, which the examples load
    expect(out).toMatch(/heat duty\s+402\.\d kW\s+13\d{5} Btu\/h/);
    expect(out).toMatch(/temperature rise.*30 ΔK\s+54 Δ°F/);
    // the pump step takes v at the pump's 85 °C: its Δh = v·Δp agrees with the isentropic pump of
    // IAPWS-IF97 (R7-97) within 0.1 % (v at 25 °C would make it 2.8 % low)
    const { water, quantity } = await importBuiltRoot();
    const inlet = water.state({ T: '85 °C', p: quantity(2.5, 'barg') });
    const isentropic = water.state({ p: quantity(95, 'psig'), s: inlet.s }).h.si - inlet.h.si;
    const pump = /Δh = v·Δp\s+(\d+\.\d+) kJ\/kg/.exec(out);
    expect(pump, 'the pump line').not.toBeNull();
    expectClose(Number(pump![1]) * 1e3, isentropic, { rel: 1e-3 });
    expect(out).toContain(`IAPWS-IF97, isentropic: Δh`);
    expect(out).toContain('OutOfRangeError [range.outside]');
    expect(out).toMatch(/licensed professionals/);
  });

  it('node-script.ts computes a turbine in both unit systems, matching the library', async () => {
    const out = run('examples/node-script.ts');
    const { water, quantity } = await importBuiltRoot();
    const inlet = water.state({ p: quantity(30, 'barg'), T: '400 °C' });
    expect(out).toContain(`${Number(inlet.h.in('kJ/kg').toPrecision(4))} kJ/kg`);
    expect(out).toContain(`${Number(inlet.h.in('Btu/lbm').toPrecision(4))} Btu/lbm`);
    expect(out).toMatch(/shaft power\s+\d+(\.\d+)? kW\s+\d+(\.\d+)? hp/);
  });

  it('metering/metering.ts turns the sensor CSV into heat flow with the batch API', async () => {
    const out = run('examples/metering/metering.ts');
    const { water } = await importBuiltRoot();
    // first reading: 7.9 barg, 201.5 °C, 1.42 kg/s, condensate returned at 8 barg and 60 °C
    const q = 1.42 * (water.state({ p: '7.9 barg', T: '201.5 °C' }).h.si - water.state({ p: '8 barg', T: '60 °C' }).h.si);
    expect(out).toMatch(new RegExp(`^\\s+0\\s+891\\.3\\s+201\\.5\\s+1\\.42\\s+\\d+\\.\\d\\s+${(q / 1e3).toFixed(0)}$`, 'm'));
    expect(out).toMatch(/heat delivered over 1\.17 h: \d+\.\d{3} MWh/);
  });

  it('examples resolve heatstate to the built dist/, as in a user project', () => {
    // the same settings as the examples' runs above and below
    const out = run('tests/helpers/resolve-heatstate.ts');
    expect(out.trim()).toBe(pathToFileURL(join(root, 'dist/index.js')).href);
  });

  it('air-handler.ts prints the coil and reheat loads that the facade computes, and the caution', async () => {
    const out = run('examples/air-handler.ts');
    const { humidAir } = await importBuiltRoot();
    const mixed = humidAir.mix([
      { state: humidAir.state({ T: '33 °C', RH: 0.4 }), flow: '1.2 kg/s' },
      { state: humidAir.state({ T: '24 °C', RH: 0.5 }), flow: '3.6 kg/s' },
    ]);
    const coil = humidAir.coolingCoil({ inlet: mixed.leaving, flow: mixed.flow, ADP: '9 °C', bypassFactor: 0.12 });
    expect(out).toContain(`cooling coil  ${coil.heat.in('kW').toFixed(1).padStart(8)} kW`);
    expect(out).toMatch(/reheat\s+\d+\.\d kW/);
    expect(out).toMatch(/licensed professionals/);
  });

  it('worker-pool/main.mjs spreads a batch over a piscina pool and matches one thread exactly', () => {
    const out = run('examples/worker-pool/main.mjs', { HEATSTATE_STATES: '100000' });
    expect(out).toMatch(/states: 100,000, threads: \d+/);
    expect(out).toMatch(/speed-up \d+\.\d\d×/);
    expect(out).toContain('elements with a bad status: 0; pool results differing from one thread: 0');
  });
});
