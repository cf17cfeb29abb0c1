/** docs/guide/humid-air.md: the model-difference table is recomputed from the library. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { humidAir } from '../../src/humid-air/index.js';
import { quantity } from '../../src/units/quantity.js';

const guide = readFileSync(new URL('../../docs/guide/humid-air.md', import.meta.url), 'utf8');

describe('docs/guide/humid-air.md', () => {
  it.each([-40, -20, 0, 20, 30, 40, 50])('the row for %d °C matches the library', (t) => {
    const T = quantity(t, '°C');
    const e = humidAir.state({ T, RH: 1 });
    const i = humidAir.state({ T, RH: 1, model: 'ideal' });
    const e5 = humidAir.state({ T, RH: 0.5 });
    const i5 = humidAir.state({ T, RH: 0.5, model: 'ideal' });
    const row = `| ${t} | ${e.W.toPrecision(5)} | ${i.W.toPrecision(5)} | ${((i.W / e.W - 1) * 100).toFixed(3)} % | ${((i.h.si - e.h.si) / 1000).toFixed(3)} | ${((i5.W / e5.W - 1) * 100).toFixed(3)} % | ${((i5.Twb!.si - e5.Twb!.si) * 1000).toFixed(1)} |`;
    expect(guide).toContain(row);
  });
  it('carries the caution', () => {
    expect(guide).toMatch(/engineering estimates.*licensed professionals/s);
  });
});
