/**
 * The figures of docs/guide/real-fluids.md that this library computes, recomputed: the ideal-gas
 * compressibility table and the measured interpolation errors of the water saturation table.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fluid, saturationTable } from '../../src/fluids/index.js';

const guide = readFileSync(new URL('../../docs/guide/real-fluids.md', import.meta.url), 'utf8');

describe('docs/guide/real-fluids.md', () => {
  it('the ideal-gas table: Z = pv/(RT) of IAPWS-95 steam and the ideal-gas error (1/Z − 1)', () => {
    const w = fluid('water');
    const R = 461.51805;
    for (const [pMPa, T] of [[0.1, 400], [0.1, 1000], [1, 500], [10, 600], [25, 700]] as const) {
      const s = w.state({ p: `${pMPa} MPa`, T: `${T} K` });
      const Z = (pMPa * 1e6 * s.v.si) / (R * T);
      const err = 1 / Z - 1;
      const pct = err >= 0.1 ? `${Math.round(err * 100)} %` : `${Number((err * 100).toPrecision(2))} %`;
      expect(guide).toContain(`| ${pMPa} MPa | ${T} K | ${Z.toFixed(4)} | ${pct} |`);
    }
  });

  it('the saturation table errors quoted (0.01–370 °C in 10 K steps)', () => {
    const e = saturationTable('water', { by: 'T', from: '0.01 °C', to: '370 °C', step: '10 K' }).data.interpolationError!;
    expect(guide).toContain(`p (${(e.p!.linear!.maxRelative * 100).toPrecision(2)} % at ${e.p!.linear!.at.replace('T = ', '')}`);
    expect(guide).toContain(`hfg (${(e.hfg!.linear!.maxRelative * 100).toPrecision(2)} % at 365 °C`);
  });
});
