import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ERRORS_DOC_PATH, formatTable, renderErrorsDoc, renderWaterTables, TABLES_DIR } from '../../scripts/generate-water-tables.js';
import { GridValue } from '../../src/tables/index.js';
import { waterTables } from '../../src/tables/water.js';
import { quantity } from '../../src/units/index.js';
import { water } from '../../src/water/index.js';
import { PHASE, saturationAtT, Status as STATUS, stateFromPT, WaterState } from '../../src/water/if97/index.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { expectClose } from '../helpers/tolerance.js';

interface Recorded {
  maxRelative: number;
  maxAbsolute: number;
}
const err = (data: { interpolationError?: Record<string, Record<string, Recorded>> }, column: string, method: string): Recorded => data.interpolationError![column]![method]!;

describe('generated water tables in data/water-tables', () => {
  const rendered = renderWaterTables();
  it.each(Object.keys(rendered))('%s is current (npm run tables regenerates it)', (file) => {
    expect(readFileSync(`${TABLES_DIR}/${file}`, 'utf8')).toBe(formatTable(rendered[file]!));
  });
  it('docs/guide/water-table-errors.md is current', () => {
    expect(readFileSync(ERRORS_DOC_PATH, 'utf8')).toBe(renderErrorsDoc(rendered));
  });
  it('every table loads, passes validation and records the interpolation error of every column', () => {
    const all = [waterTables.saturationByT(), waterTables.saturationByP(), waterTables.us.saturationByT(), waterTables.us.saturationByP()];
    for (const t of all) for (const c of t.columnNames.filter((c) => c !== t.key)) expect(t.data.interpolationError?.[c]?.linear, `${t.name} ${c}`).toBeDefined();
    for (const g of [waterTables.superheated(), waterTables.compressedLiquid(), waterTables.us.superheated(), waterTables.us.compressedLiquid()]) {
      for (const c of g.columnNames) expect(g.data.interpolationError?.[c]?.bilinear, `${g.name} ${c}`).toBeDefined();
    }
  });
});

describe('interpolated values stay within the recorded error against IAPWS-IF97', () => {
  const L = new WaterProperties();
  const V = new WaterProperties();
  it('saturation by T (SI), linear and monotone cubic, random temperatures', () => {
    const t = waterTables.saturationByT();
    const cols = { hf: (l: WaterProperties) => l.h, hg: (_l: WaterProperties, v: WaterProperties) => v.h, vg: (_l: WaterProperties, v: WaterProperties) => v.v, sf: (l: WaterProperties) => l.s } as const;
    fc.assert(
      fc.property(fc.double({ min: 273.16, max: 646, noNaN: true }), (T) => {
        expect(saturationAtT(T, L, V)).toBe(STATUS.ok);
        for (const [c, f] of Object.entries(cols)) {
          for (const m of ['linear', 'monotone-cubic'] as const) {
            const v = t.lookup(c as 'hf', quantity(T, 'K'), { method: m }).value.si;
            const bound = err(t.data, c, m).maxAbsolute;
            // the bound was sampled at seven points per interval; allow a quarter more for points between them
            expect(Math.abs(v - f(L, V))).toBeLessThanOrEqual(1.25 * bound + 1e-6 * Math.abs(f(L, V)));
          }
        }
      }),
      { numRuns: 300 },
    );
  });
  it('superheated vapour (SI), bilinear, random states whose cell is complete', () => {
    const g = waterTables.superheated();
    const st = new WaterState();
    const bound = err(g.data, 'h', 'bilinear').maxAbsolute;
    const out = new GridValue();
    fc.assert(
      fc.property(fc.double({ min: 10e3, max: 60e6, noNaN: true }), fc.double({ min: 323.15, max: 1573.15, noNaN: true }), (p, T) => {
        if (g.valueAt('h', T, p, out) !== STATUS.ok || stateFromPT(p, T, st) !== STATUS.ok || st.phase === PHASE.liquid) return true;
        return Math.abs(out.value - st.h) <= 1.5 * bound;
      }),
      { numRuns: 500 },
    );
  });
  it.each([
    ['200 kPa', '2800 kJ/kg'],
    ['1 MPa', '3000 kJ/kg'],
  ] as const)('inverse: T where h = %s at %s, against the IF97 (p, h) flash', (p, h) => {
    const T = waterTables.superheated().inverse('h', h, { p }, { method: 'monotone-cubic' }).value;
    expectClose(T.in('K'), water.state({ p, h }).T.in('K'), { abs: 0.5 });
  });
  it('inverse below the first vapour cell of a row throws (h = 2800 kJ/kg at 1 MPa lies between saturation and 200 °C)', () => {
    expect(() => waterTables.superheated().inverse('h', '2800 kJ/kg', { p: '1 MPa' })).toThrow(/not reached/);
  });
});

describe('steam-table values read from the generated tables (handbook values, from memory)', () => {
  it('SI: saturated at 100 °C, p = 101.42 kPa and h_fg = 2256.5 kJ/kg', () => {
    const t = waterTables.saturationByT();
    expectClose(t.lookup('p', '100 °C').value.in('kPa'), 101.42, { abs: 0.005 });
    expectClose(t.lookup('hfg', '100 °C').value.in('kJ/kg'), 2256.5, { abs: 0.05 });
  });
  it('US: saturated vapour at 14.696 psia, h_g = 1150.3 Btu/lbm; superheated 100 psia, 500 °F: h = 1279.3 Btu/lbm', () => {
    expectClose(waterTables.us.saturationByP().lookup('hg', '14.696 psia').value.in('Btu/lbm'), 1150.3, { abs: 0.05 });
    expectClose(waterTables.us.superheated().lookup('h', { p: '100 psia', T: '500 °F' }).value.in('Btu/lbm'), 1279.3, { abs: 0.05 });
  });
  it('log-linear interpolation of p_sat(T) beats linear (the recorded errors say so too)', () => {
    const t = waterTables.saturationByT();
    expect(err(t.data, 'p', 'log-linear').maxRelative).toBeLessThan(err(t.data, 'p', 'linear').maxRelative / 3);
  });
});
