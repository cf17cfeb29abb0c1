import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fromSI, registryNames, resolveUnit, resolveUnitAs, toSI } from '../../src/units/registry.js';
import { DIMENSIONS, SI_UNIT, UNIT_SPELLINGS, type Dimension } from '../../src/units/index.js';
import { ulpDistance } from '../helpers/tolerance.js';

const data = JSON.parse(readFileSync(new URL('../../data/units.json', import.meta.url), 'utf8')) as {
  source: { title: string };
  atoms: { symbol: string; definition: string; factor: string }[];
};
const spellings = Object.entries(UNIT_SPELLINGS) as [Dimension, readonly string[]][];

describe('unit registry invariants', () => {
  it('the factor data names its source (NIST SP 811)', () => {
    expect(data.source.title).toMatch(/SP 811|Special Publication 811/);
  });
  it('every atom has a symbol, a factor expression and a stated definition', () => {
    for (const atom of data.atoms) {
      expect(atom.symbol.length, JSON.stringify(atom)).toBeGreaterThan(0);
      expect(atom.factor, atom.symbol).toMatch(/^[\d.e*/^+-]+$/);
      expect(atom.definition.length, atom.symbol).toBeGreaterThan(5);
    }
  });
  it('every registry name resolves', () => {
    for (const name of registryNames()) expect(() => resolveUnit(name), name).not.toThrow();
  });
  it.each(spellings)('every %s spelling resolves to its own dimension where that is expected', (dimension, list) => {
    for (const s of list) expect(resolveUnitAs(s, dimension).dimension, s).toBe(dimension);
  });
  it('without an expected dimension, a spelling resolves to the first dimension that lists it (J/(kg·K): specificHeat, m²/s: kinematicViscosity)', () => {
    for (const [dimension, list] of spellings) {
      for (const s of list) {
        const first = spellings.find(([, l]) => l.includes(s))![0];
        expect(resolveUnit(s).dimension, `${s} (listed under ${dimension})`).toBe(first);
      }
    }
    expect(resolveUnit('kJ/(kg·K)').dimension).toBe('specificHeat');
    expect(resolveUnit('cSt').dimension).toBe('kinematicViscosity');
    expect(resolveUnit('g/kg').dimension).toBe('humidityRatio');
  });
  it('every dimension has an SI unit that resolves to it with factor 1', () => {
    for (const d of Object.keys(DIMENSIONS) as Dimension[]) {
      const u = resolveUnitAs(SI_UNIT[d], d);
      expect(u.dimension, d).toBe(d);
      expect(u.factor, d).toBe(1);
    }
  });
});

describe('round trips through SI', () => {
  const linear = spellings.flatMap(([, list]) => list).filter((s) => resolveUnit(s).kind === 'linear' || resolveUnit(s).kind === 'difference');
  it('every linear unit round-trips within 1 ulp', () => {
    fc.assert(
      fc.property(fc.constantFrom(...linear), fc.double({ min: 1e-6, max: 1e9, noNaN: true }), (unit, x) => {
        const u = resolveUnit(unit);
        return ulpDistance(fromSI(toSI(x, u, 101325), u, 101325), x) <= 1;
      }),
      { numRuns: 5000 },
    );
  });
  it('affine units (°C, °F, psig) round-trip within 1 ulp of the value shifted to the absolute scale', () => {
    // x → SI → x loses at most the rounding of x + offset; near zero on a relative scale that is
    // not 1 ulp of x itself (cancellation), so the bound is stated on the absolute scale.
    for (const unit of ['°C', '°F', 'degF', 'psig', 'barg', 'kPag']) {
      const u = resolveUnit(unit);
      fc.assert(
        fc.property(fc.double({ min: 0, max: 5000, noNaN: true }), (x) => {
          const back = fromSI(toSI(x, u, 101325), u, 101325);
          const shift = u.kind === 'gauge' ? 101325 / u.factor : u.offset;
          return Math.abs(back - x) <= 2 * 2 ** (Math.floor(Math.log2(Math.abs(x) + shift)) - 52);
        }),
        { numRuns: 2000 },
      );
    }
  });
});
