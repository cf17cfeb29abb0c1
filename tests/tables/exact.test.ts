/**
 * Exact at the rows, for every unit: a table keeps the caller's numbers as given, so a °C or °F
 * column (and key) comes back bit for bit at every row, although °C → K → °C does not round-trip
 * in binary floating point. Between rows, against a hand computation. Test constructions only.
 */
import { describe, expect, it } from 'vitest';
import { defineGrid, defineTable, tableFromCSV } from '../../src/tables/index.js';
import { quantity } from '../../src/units/index.js';
import { DEFAULT_AMBIENT_PA, fromSI, resolveUnit, toSI } from '../../src/units/registry.js';
import { expectClose } from '../helpers/tolerance.js';

const tenths = Array.from({ length: 11 }, (_, i) => i / 10); // 0, 0.1, …, 1 (°C)
const fahrenheit = [32, 32.18, 32.36, 32.54, 32.72, 32.9, 33.08, 33.26, 33.44, 33.62, 33.8];

describe('the round trip the table avoids', () => {
  it('°C → K → °C changes most of 0.1, 0.2, …, 1 (so the tests below can fail)', () => {
    const c = resolveUnit('°C');
    const changed = tenths.filter((v) => fromSI(toSI(v, c, DEFAULT_AMBIENT_PA), c, DEFAULT_AMBIENT_PA) !== v);
    expect(changed.length).toBeGreaterThanOrEqual(8);
  });
});

describe('°C and °F columns and keys, bit for bit at every row', () => {
  // key in °F, columns in °C and °F and K: the same temperatures written three ways
  const t = defineTable({
    name: 'three scales',
    source: 'test construction',
    key: 'TF',
    columns: {
      TF: { unit: '°F', values: fahrenheit },
      TC: { unit: '°C', values: tenths },
      TF2: { unit: '°F', values: fahrenheit },
      TK: { unit: 'K', values: tenths.map((c) => c + 273.15) },
    },
  } as const);
  it('lookup at each row, key given as a quantity in °F and as text', () => {
    fahrenheit.forEach((f, i) => {
      for (const at of [quantity(f, '°F'), `${f} °F`]) {
        for (const method of ['linear', 'monotone-cubic', 'log-linear', 'log-key'] as const) {
          const r = t.lookup('TC', at, { method });
          expect(r.value.in('°C')).toBe(tenths[i]);
          expect(r.value.value).toBe(tenths[i]);
          expect(r.value.unit).toBe('°C');
          expect(t.lookup('TF2', at, { method }).value.in('°F')).toBe(f);
          expect(t.lookup('TF', at, { method }).value.in('°F')).toBe(f);
        }
      }
    });
  });
  it('inverse at each row returns the key as given', () => {
    tenths.forEach((c, i) => {
      expect(t.inverse('TC', quantity(c, '°C')).value.in('°F')).toBe(fahrenheit[i]);
      expect(t.inverse('TF2', quantity(fahrenheit[i]!, '°F')).value.in('°F')).toBe(fahrenheit[i]);
    });
  });
  it('the range is the first and last key as given', () => {
    expect(t.range.min.in('°F')).toBe(32);
    expect(t.range.max.in('°F')).toBe(33.8);
  });
  it('descending °C keys, °F column: bit for bit at every row', () => {
    const d = defineTable({ name: 'desc', source: 'test construction', key: 'T', columns: { T: { unit: '°C', values: [...tenths].reverse() }, F: { unit: '°F', values: [...fahrenheit].reverse() } } } as const);
    tenths.forEach((c, i) => {
      const r = d.lookup('F', quantity(c, '°C'));
      expect(r.value.in('°F')).toBe(fahrenheit[i]);
    });
  });
  it('CSV with a °F key and a °C column', () => {
    const csv = ['T [°F], t [°C]', ...fahrenheit.map((f, i) => `${f}, ${tenths[i]}`)].join('\n');
    const c = tableFromCSV(csv);
    fahrenheit.forEach((f, i) => expect(c.lookup('t', `${f} °F`).value.in('°C')).toBe(tenths[i]));
  });
});

describe('between rows, against a hand computation', () => {
  // key 50 °F and 60 °F; column 10.0 °C and 15.5 °C. At 55 °F, halfway: 10 + 0.5·5.5 = 12.75 °C.
  const t = defineTable({ name: 'hand', source: 'test construction', key: 'T', columns: { T: { unit: '°F', values: [50, 60] }, t: { unit: '°C', values: [10, 15.5] }, f: { unit: '°F', values: [40, 49] } } } as const);
  it('linear: 55 °F → 12.75 °C and 44.5 °F (hand computation)', () => {
    expectClose(t.lookup('t', '55 °F').value.in('°C'), 12.75, { abs: 1e-12 });
    expectClose(t.lookup('f', '55 °F').value.in('°F'), 44.5, { abs: 1e-12 });
  });
  it('linear: 52.5 °F → 10 + 0.25·5.5 = 11.375 °C; key in K (283.7055… K = 51 °F) → 10.55 °C', () => {
    expectClose(t.lookup('t', '52.5 °F').value.in('°C'), 11.375, { abs: 1e-12 });
    expectClose(t.lookup('t', quantity((51 + 459.67) * (5 / 9), 'K')).value.in('°C'), 10.55, { abs: 1e-12 });
  });
  it('inverse: 12.75 °C → 55 °F (hand computation)', () => {
    expectClose(t.inverse('t', '12.75 °C').value.in('°F'), 55, { abs: 1e-12 });
  });
});

describe('grids: cells and axes as given at every node', () => {
  const Tc = [0.1, 0.2, 0.3, 0.7];
  const pg = [0, 10, 20.5];
  const cells = pg.map((p, j) => Tc.map((c, i) => 32 + 1.8 * c + 0.1 * j + 0.01 * i));
  const g = defineGrid({ kind: 'grid', name: 'nodes', source: 'test construction', x: { name: 'T', unit: '°C', values: Tc }, y: { name: 'p', unit: 'psig', values: pg }, columns: { f: { unit: '°F', values: cells } } } as const);
  it('lookup at each node returns the cell bit for bit', () => {
    pg.forEach((p, j) =>
      Tc.forEach((c, i) => {
        expect(g.lookup('f', { T: quantity(c, '°C'), p: quantity(p, 'psig') }).value.in('°F')).toBe(cells[j]![i]);
        expect(g.lookup('f', { T: `${c} °C`, p: `${p} psig` }, { method: 'monotone-cubic' }).value.in('°F')).toBe(cells[j]![i]);
      }),
    );
  });
  it('inverse at a node returns the axis value as given (°C, psig)', () => {
    expect(g.inverse('f', quantity(cells[1]![2]!, '°F'), { p: '10 psig' }).value.in('°C')).toBe(0.3);
    expect(g.inverse('f', quantity(cells[2]![0]!, '°F'), { T: '0.1 °C' }).value.in('psig')).toBe(20.5);
  });
  it('between nodes on a grid line: hand computation', () => {
    // at p = 0 psig, T halfway between 0.1 and 0.2 °C: the mean of the two cells
    expectClose(g.lookup('f', { T: '0.15 °C', p: '0 psig' }).value.in('°F'), (cells[0]![0]! + cells[0]![1]!) / 2, { abs: 1e-12 });
  });
});
