/**
 * Unit-string fuzzing (fast-check): random unit text and random arguments never produce anything but
 * a result or a heatstate error, results are finite, and the parser's work grows linearly with the
 * length of the text. Work is counted in parser steps, never timed.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { HeatstateError } from '../../src/errors.js';
import { parseUnitExpression, UNIT_MAX_DEPTH, UNIT_TEXT_MAX_LENGTH, type ParseCounter } from '../../src/units/expression.js';
import { splitQuantityText } from '../../src/units/quantity.js';
import { resolveExpression } from '../../src/units/registry.js';
import { DIMENSIONS, Quantity, quantity, readQuantity, resolveUnit, temperatureDifference, UNIT_SPELLINGS, type Dimension } from '../../src/units/index.js';

/** Characters unit text is made of, plus a few that it is not. */
const UNIT_CHARS = [
  ...'kKmMgGsSPaJWNLlbftinhrCFR°µΔ_H2O0123456789',
  '^', '·', '*', '.', '/', '(', ')', ' ', '-', '+', '²', '³', '⁻', '¹', '×', '⋅', '#', '\t', 'é', '\u0000', '😀',
];
const spellings = [...new Set(Object.values(UNIT_SPELLINGS).flat() as string[])];
const unitChar = fc.constantFrom(...UNIT_CHARS);
const unitText = fc.oneof(
  fc.array(unitChar, { maxLength: 60 }).map((cs) => cs.join('')),
  fc.array(fc.oneof(fc.constantFrom(...spellings), unitChar), { maxLength: 12 }).map((ps) => ps.join('')),
  fc.array(fc.constantFrom(...spellings), { minLength: 1, maxLength: 4 }).chain((ps) =>
    fc.array(fc.constantFrom('/', '·', ' ', '*'), { minLength: ps.length - 1, maxLength: ps.length - 1 }).map((ops) => ps.map((p, i) => (i === 0 ? p : ops[i - 1] + p)).join('')),
  ),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'grapheme', maxLength: 20 }),
);

function onlyHeatstateErrors(f: () => void): boolean {
  try {
    f();
    return true;
  } catch (e) {
    if (e instanceof HeatstateError) return true;
    throw e;
  }
}

describe('random unit text', () => {
  it('resolveUnit returns a finite, positive factor of a named dimension, or throws a heatstate error', () => {
    fc.assert(
      fc.property(unitText, (text) =>
        onlyHeatstateErrors(() => {
          const u = resolveUnit(text);
          expect(Object.keys(DIMENSIONS)).toContain(u.dimension);
          expect(Number.isFinite(u.factor) && u.factor > 0, text).toBe(true);
        }),
      ),
      { numRuns: 3000 },
    );
  });
  it('resolveExpression (units of any shape) likewise', () => {
    fc.assert(
      fc.property(unitText, (text) =>
        onlyHeatstateErrors(() => {
          const e = resolveExpression(text);
          expect(Number.isFinite(e.factor) && e.factor > 0, text).toBe(true);
        }),
      ),
      { numRuns: 2000 },
    );
  });
  it('quantity("<number> <unit>") holds finite numbers or throws a heatstate error', () => {
    const number = fc.oneof(fc.double({ noNaN: false }).map(String), fc.constantFrom('0x10', '1e999', '-0', '.5', '1e-330', 'Infinity', '+', ''));
    fc.assert(
      fc.property(number, fc.constantFrom(' ', '', '  ', '\t'), unitText, (n, sep, u) =>
        onlyHeatstateErrors(() => {
          const q = quantity(`${n}${sep}${u}`);
          expect(Number.isFinite(q.si) && Number.isFinite(q.value), `${n}${sep}${u}`).toBe(true);
        }),
      ),
      { numRuns: 3000 },
    );
  });
  it('readQuantity of random text for every dimension returns a finite SI number or throws a heatstate error', () => {
    const dims = Object.keys(DIMENSIONS) as Dimension[];
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), unitText, fc.constantFrom(...dims), (x, u, d) =>
        onlyHeatstateErrors(() => {
          expect(Number.isFinite(readQuantity(`${x} ${u}` as never, d, 'x'))).toBe(true);
        }),
      ),
      { numRuns: 2000 },
    );
  });
});

describe('random arguments of any type', () => {
  const p = quantity(1, 'kPa');
  const T = quantity(300, 'K');
  const calls: [string, (x: unknown) => unknown][] = [
    ['quantity(x)', (x) => quantity(x as never)],
    ["quantity(1, x)", (x) => quantity(1, x as never)],
    ["quantity(x, 'kPa')", (x) => quantity(x as never, 'kPa')],
    ["quantity(1, 'psig', x)", (x) => quantity(1, 'psig', x as never)],
    ['in(x)', (x) => p.in(x as never)],
    ["in('kPa', x)", (x) => p.in('kPa', x as never)],
    ['to(x)', (x) => p.to(x as never)],
    ['as(x)', (x) => p.as(x as never)],
    ['plus(x)', (x) => p.plus(x as never)],
    ['minus(x)', (x) => T.minus(x as never)],
    ['times(x)', (x) => p.times(x as never)],
    ['div(x)', (x) => p.div(x as never)],
    ['compare(x)', (x) => p.compare(x as never)],
    ['eq(p, x)', (x) => p.eq(p, x as never)],
    ['toString(x)', (x) => p.toString(x as never)],
    ['Quantity.fromSI(x, pressure)', (x) => Quantity.fromSI(x as never, 'pressure')],
    ['Quantity.fromSI(1, x)', (x) => Quantity.fromSI(1, x as never)],
    ["Quantity.fromSI(1, 'pressure', x)", (x) => Quantity.fromSI(1, 'pressure', x as never)],
    ["temperatureDifference(x, 'K')", (x) => temperatureDifference(x as never, 'K')],
    ['temperatureDifference(1, x)', (x) => temperatureDifference(1, x as never)],
    ["readQuantity(x, 'pressure', 'p')", (x) => readQuantity(x as never, 'pressure', 'p')],
    ["readQuantity('1 kPa', x, 'p')", (x) => readQuantity('1 kPa' as never, x as never, 'p')],
    ['resolveUnit(x)', (x) => resolveUnit(x as never)],
  ];
  it.each(calls)('%s never throws anything but a heatstate error', (_label, call) => {
    fc.assert(
      fc.property(fc.oneof(fc.anything(), fc.constantFrom(p, T, NaN, Infinity, -0, 1e308, '', '1 kPa', { rel: 1 }, { ambient: '1 bar' })), (x) => onlyHeatstateErrors(() => call(x))),
      { numRuns: 300 },
    );
  });
});

describe('work grows linearly with the length of the text (counted in parser steps, not timed)', () => {
  const steps = (f: (c: ParseCounter) => void): number => {
    const c: ParseCounter = { steps: 0 };
    try {
      f(c);
    } catch (e) {
      if (!(e instanceof HeatstateError)) throw e;
    }
    return c.steps;
  };
  it('the unit parser takes at most a few steps per character, on any text up to its length limit', () => {
    fc.assert(
      fc.property(fc.array(unitChar, { maxLength: UNIT_TEXT_MAX_LENGTH }).map((cs) => cs.join('')), (text) => {
        // one step per character, plus one per term for each enclosing bracket's exponent
        return steps((c) => parseUnitExpression(text, c)) <= (UNIT_MAX_DEPTH + 2) * text.length + 2;
      }),
      { numRuns: 2000 },
    );
  });
  it('on the patterns that make naive parsers quadratic, doubling the length at most doubles the work', () => {
    const patterns: ((n: number) => string)[] = [
      (n) => 'm'.repeat(n),
      (n) => `${' '.repeat(n)}m`,
      (n) => 'm·'.repeat(n) + 'm',
      (n) => 'm²/'.repeat(n) + 's',
      (n) => `${'('.repeat(Math.min(n, 8))}m^2${')^2'.repeat(Math.min(n, 8))}${'·m'.repeat(n)}`,
    ];
    for (const make of patterns) {
      const n = 40;
      const a = steps((c) => parseUnitExpression(make(n), c));
      const b = steps((c) => parseUnitExpression(make(2 * n), c));
      expect(a, make(n)).toBeGreaterThan(0);
      expect(b / a, make(n)).toBeLessThanOrEqual(2.2);
    }
  });
  it('splitting number from unit is one pass: at most one step per character, including long runs of spaces', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 250 }), (text) => steps((c) => splitQuantityText(text, c)) <= text.length),
      { numRuns: 2000 },
    );
    const a = steps((c) => splitQuantityText(`1${' '.repeat(100)}x`, c));
    const b = steps((c) => splitQuantityText(`1${' '.repeat(200)}x`, c));
    expect(b / a).toBeLessThanOrEqual(2.01);
  });
  it('a 40 000-character text is refused before any parsing step', () => {
    const long = `1 ${' '.repeat(20000)}${'m'.repeat(20000)}`;
    expect(steps((c) => splitQuantityText(long, c))).toBe(0);
    expect(steps((c) => parseUnitExpression('m'.repeat(40000), c))).toBe(0);
  });
});
