/** examples/air-handler.ts runs and prints the library's own numbers. */
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { humidAir } from '../../src/humid-air/index.js';

const root = fileURLToPath(new URL('../..', import.meta.url));

describe('examples/air-handler.ts', () => {
  it('prints the coil and reheat loads that the facade computes, and the caution', () => {
    const out = execFileSync(process.execPath, ['--import', 'tsx', 'examples/air-handler.ts'], { cwd: root, encoding: 'utf8', timeout: 120_000 });
    const mixed = humidAir.mix([
      { state: humidAir.state({ T: '33 °C', RH: 0.4 }), flow: '1.2 kg/s' },
      { state: humidAir.state({ T: '24 °C', RH: 0.5 }), flow: '3.6 kg/s' },
    ]);
    const coil = humidAir.coolingCoil({ inlet: mixed.leaving, flow: mixed.flow, ADP: '9 °C', bypassFactor: 0.12 });
    expect(out).toContain(`cooling coil  ${coil.heat.in('kW').toFixed(1).padStart(8)} kW`);
    expect(out).toMatch(/reheat\s+\d+\.\d kW/);
    expect(out).toMatch(/licensed professionals/);
  });
});
