/**
 * docs/guide/humid-air.md: the table of the ideal model against the ASHRAE Handbook's real-gas
 * Table 2 (from memory) is recomputed here from the library; the enhancement-factor column from the
 * recalled (unverified, not shipped) Buck (1981) coefficients in data/humid-air/enhancement-buck-1981.json.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import buck from '../../data/humid-air/enhancement-buck-1981.json';
import { humidAir } from '../../src/humid-air/index.js';
import { quantity } from '../../src/units/quantity.js';

const guide = readFileSync(new URL('../../docs/guide/humid-air.md', import.meta.url), 'utf8');

// ASHRAE Handbook—Fundamentals (SI) ch. 1 Table 2, Ws at 101.325 kPa (from memory; also in tests/reference/ashrae-psychrometrics.test.ts)
const table2: [number, number][] = [
  [-40, 0.0000793],
  [-20, 0.0006373],
  [0, 0.0037895],
  [10, 0.0076634],
  [20, 0.0147603],
  [30, 0.027344],
  [40, 0.049136],
  [50, 0.086858],
];

/** Buck's f at 101.325 kPa from the recalled coefficients (over ice below 0 °C). */
function recalledEnhancement(t: number): number {
  const c = t < 0 ? buck.ice : buck.water;
  return 1 + 1e-4 * (c.A + 1013.25 * (c.B + c.C * t * t));
}

describe('docs/guide/humid-air.md', () => {
  it.each(table2)('the row for %d °C matches the library and the data file', (t, Ws) => {
    const s = humidAir.state({ T: quantity(t, '°C'), RH: 1 });
    const row = `| ${t} | ${s.W.si.toPrecision(5)} | ${Ws} | ${((s.W.si / Ws - 1) * 100).toFixed(2)} % | ${((recalledEnhancement(t) - 1) * 100).toFixed(2)} % |`;
    expect(guide).toContain(row);
  });
  it('carries the caution', () => {
    expect(guide).toMatch(/engineering estimates.*licensed professionals/s);
  });
});
