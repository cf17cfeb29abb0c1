/**
 * Issue 17: every public function in src/units checks its arguments and throws a typed error naming
 * the argument, what was expected and what was given; no quantity holds NaN or infinity; the parser
 * has limits; temperature offsets cannot hide inside compound units; only decimal numbers are read.
 */
import { describe, expect, it } from 'vitest';
import { DimensionError, HeatstateError, InvalidInputError, ResultError, UnitError } from '../../src/errors.js';
import { Quantity, quantity, readQuantity, resolveUnit, resolveUnitAs, temperatureDifference } from '../../src/units/index.js';
import { UNIT_MAX_DEPTH, UNIT_MAX_TERMS, UNIT_TEXT_MAX_LENGTH } from '../../src/units/expression.js';

function caught(f: () => unknown): HeatstateError {
  try {
    f();
  } catch (e) {
    expect(e, String(e)).toBeInstanceOf(HeatstateError);
    return e as HeatstateError;
  }
  return expect.fail('no error thrown');
}

const p = quantity(1, 'kPa');
const any = (x: unknown) => x as never;

describe('arguments of the wrong type throw InvalidInputError naming the argument', () => {
  const cases: [string, () => unknown, string, RegExp][] = [
    ["quantity(1, 'kPa').in(null)", () => p.in(any(null)), 'unit', /unit must be unit text \(a string\); got null/],
    ["quantity(1, 'kPa').to(5)", () => p.to(any(5)), 'unit', /got the number 5/],
    ["quantity(1, 'kPa').in('kPa', 'x')", () => p.in('kPa', any('x')), 'options', /options must be an options object/],
    ['quantity(null)', () => quantity(any(null)), 'value', /got null/],
    ['quantity({})', () => quantity(any({})), 'value', /got an object/],
    ['quantity(1, 5)', () => quantity(1, any(5)), 'unit', /unit .*got the number 5/],
    ["quantity(1, 'kPa', 5)", () => quantity(1, 'kPa', any(5)), 'options', /got the number 5/],
    ["quantity('1 kPa', [])", () => quantity('1 kPa', any([])), 'options', /got an array/],
    ["quantity(1, 'psig', { ambient: 14.7 })", () => quantity(1, 'psig', { ambient: any(14.7) }), 'ambient', /has no unit/],
    ["as('pressur')", () => p.as(any('pressur')), 'dimension', /dimension must be one of/],
    ["Quantity.fromSI('1', 'pressure')", () => Quantity.fromSI(any('1'), 'pressure'), 'si', /got the text "1"/],
    ["Quantity.fromSI(1, 'bogus')", () => Quantity.fromSI(1, any('bogus')), 'dimension', /got the text "bogus"/],
    ["Quantity.fromSI(1, 'pressure', 5)", () => Quantity.fromSI(1, 'pressure', any(5)), 'unit', /got the number 5/],
    ["Quantity.fromSI(1, 'pressure', 'kPa', 'yes')", () => Quantity.fromSI(1, 'pressure', 'kPa', any('yes')), 'extrapolated', /boolean/],
    ["temperatureDifference('5', 'K')", () => temperatureDifference(any('5'), 'K'), 'value', /must be a number/],
    ['temperatureDifference(5, null)', () => temperatureDifference(5, any(null)), 'unit', /got null/],
    ["readQuantity('1 kPa', 'bogus', 'p')", () => readQuantity(any('1 kPa'), any('bogus'), 'p'), 'dimension', /dimension must be one of/],
    ["readQuantity('1 kPa', 'pressure', 5)", () => readQuantity('1 kPa', 'pressure', any(5)), 'parameter', /parameter must be/],
    ["readQuantity({}, 'pressure', 'p')", () => readQuantity(any({}), 'pressure', 'p'), 'p', /p must be a quantity or unit text/],
    ['resolveUnit(5)', () => resolveUnit(any(5)), 'unit', /got the number 5/],
    ["resolveUnitAs(undefined, 'pressure')", () => resolveUnitAs(any(undefined), 'pressure'), 'unit', /got undefined/],
    ["times('2')", () => p.times(any('2')), 'other', /times needs a number or a quantity/],
    ['times(NaN)', () => p.times(NaN), 'factor', /finite/],
    ['div(Infinity)', () => p.div(Infinity), 'divisor', /finite/],
    ['plus(5)', () => p.plus(any(5)), 'other', /add needs a quantity/],
    ['minus(null)', () => p.minus(any(null)), 'other', /subtract needs a quantity/],
    ['compare(5)', () => p.compare(any(5)), 'other', /compare needs a quantity or unit text/],
    ["eq(p, 'x')", () => p.eq(p, any('x')), 'tolerance', /options object/],
    ['eq(p, { rel: NaN })', () => p.eq(p, { rel: NaN }), 'tolerance.rel', /finite number ≥ 0/],
    ['toString(1.5)', () => p.toString(1.5), 'digits', /whole number from 1 to 100/],
    ['toString(0)', () => p.toString(0), 'digits', /got the number 0/],
  ];
  it.each(cases)('%s', (_label, call, parameter, message) => {
    const e = caught(call);
    expect(e).toBeInstanceOf(InvalidInputError);
    expect((e as InvalidInputError).parameter).toBe(parameter);
    expect(e.message).toMatch(message);
  });
});

describe('no quantity holds NaN or infinity', () => {
  it('a value that overflows in SI throws input.not-finite: 1e308 MPa', () => {
    expect(caught(() => quantity('1e308 MPa')).code).toBe('input.not-finite');
    expect(caught(() => quantity(1e308, 'MPa')).code).toBe('input.not-finite');
    expect(caught(() => quantity('1e999 K')).code).toBe('input.not-finite');
  });
  it('a conversion out that overflows throws result.not-finite: 1e308 Pa in µPa', () => {
    expect(caught(() => quantity('1e308 Pa').in('µPa')).code).toBe('result.not-finite');
  });
  it('a value that underflows to zero is refused, not silently zeroed', () => {
    expect(caught(() => quantity('1e-330 MPa')).code).toBe('input.invalid');
    expect(caught(() => quantity('1e-320 µPa')).code).toBe('input.invalid');
    expect(quantity('0 MPa').si).toBe(0);
  });
  it('unit factors that overflow or underflow are refused: kPa^200/Pa^199, (kPa^60)^2, (mPa^60)^2', () => {
    for (const u of ['kPa^200/Pa^199', '(kPa^60)^2', '(mPa^60)^2', '(GJ^40)^9/J^359']) {
      const e = caught(() => quantity(1, u));
      expect(e, u).toBeInstanceOf(UnitError);
      expect(e.code, u).toBe('unit.syntax');
    }
  });
  it('exponents that cancel are combined before multiplying out: (kPa^60)^2/(kPa^59)^2/kPa is kPa', () => {
    expect(quantity(1, '(kPa^60)^2/(kPa^59)^2/kPa').si).toBe(1000);
  });
  it('Quantity.fromSI of a model result that is not finite throws result.not-finite, distinct from bad input', () => {
    for (const v of [NaN, Infinity, -Infinity]) {
      const e = caught(() => Quantity.fromSI(v, 'specificEnergy'));
      expect(e).toBeInstanceOf(ResultError);
      expect(e.code).toBe('result.not-finite');
    }
    expect(caught(() => quantity(NaN, 'K')).code).toBe('input.not-finite');
  });
});

describe('temperature offsets never hide inside compound units', () => {
  it.each(['degF·m/m', '°C·kg/kg', '°F^2/°F', 'K·s/s'])('%s is refused (its offset would be dropped)', (u) => {
    const e = caught(() => quantity(1, u));
    expect(e).toBeInstanceOf(UnitError);
    expect(e.message).toMatch(/can only stand alone/);
  });
  it('temperature units inside compounds of other dimensions are degrees of difference (SP 811: 1 Btu/(lbm·°F) = 4186.8 J/(kg·K))', () => {
    expect(quantity(1, 'Btu/(lbm·°F)').si).toBe(4186.8);
    expect(quantity(1, 'W/(m·°C)').si).toBe(1);
  });
});

describe('numbers in quantity text are decimal', () => {
  it.each(['0x10 K', '0X10 K', '0b101 K', '0o17 K', '-0x1 K', '+0b1 kPa'])('%s is refused', (text) => {
    const e = caught(() => quantity(text));
    expect(e).toBeInstanceOf(UnitError);
    expect(e.code).toBe('unit.syntax');
    expect(e.message).toMatch(/hexadecimal, octal and binary/);
  });
  it.each(['Infinity K', 'NaN K', '- 5 K', '. K', 'e5 K', '1,5 kPa'])('%s is refused with a typed error', (text) => {
    expect(caught(() => quantity(text))).toBeInstanceOf(HeatstateError);
  });
  it('decimal forms are read: 5, -0.5, .5, 1.2e5, 5kPa, 1e-3 MPa, 0.1e1 K', () => {
    expect(quantity('5 K').si).toBe(5);
    expect(quantity('-0.5 Δ°C').si).toBe(-0.5);
    expect(quantity('.5 kPa').si).toBe(500);
    expect(quantity('1.2e5 Pa').si).toBe(1.2e5);
    expect(quantity('5kPa').si).toBe(5000);
    expect(quantity('1e-3 MPa').si).toBe(1000);
    expect(quantity('0.1e1 K').si).toBe(1);
  });
});

describe('parser limits', () => {
  it(`unit text longer than ${UNIT_TEXT_MAX_LENGTH} characters is refused: a 40 000-character unit`, () => {
    const long = 'm'.repeat(40000);
    for (const call of [() => quantity(1, long), () => quantity(`1 ${long}`), () => resolveUnit(long), () => readQuantity(`1 ${long}`, 'length', 'L')]) {
      const e = caught(call);
      expect(e).toBeInstanceOf(UnitError);
      expect(e.code).toBe('unit.syntax');
      expect(e.message.length).toBeLessThan(300);
    }
  });
  it(`brackets nested more than ${UNIT_MAX_DEPTH} deep are refused`, () => {
    expect(quantity(1, `${'('.repeat(UNIT_MAX_DEPTH)}m${')'.repeat(UNIT_MAX_DEPTH)}`).si).toBe(1);
    expect(caught(() => quantity(1, `${'('.repeat(UNIT_MAX_DEPTH + 1)}m${')'.repeat(UNIT_MAX_DEPTH + 1)}`)).message).toMatch(/nested more than/);
  });
  it(`more than ${UNIT_MAX_TERMS} names, or exponents of three digits, are refused`, () => {
    expect(caught(() => quantity(1, Array.from({ length: UNIT_MAX_TERMS + 1 }, () => 'm').join('·'))).message).toMatch(/more than 64 unit names/);
    expect(caught(() => quantity(1, 'm^100')).message).toMatch(/more than two digits/);
  });
});

describe('unknown units suggest the closest spellings', () => {
  it('"C" → did you mean "°C" or "degC"?', () => {
    const e = caught(() => quantity(1, 'C')) as UnitError;
    expect(e).toBeInstanceOf(UnitError);
    expect(e.code).toBe('unit.unknown');
    expect(e.suggestions).toEqual(['°C', 'degC']);
    expect(e.message).toBe('unknown unit "C"; did you mean "°C" or "degC"?');
  });
  it.each([
    ['kpa', 'kPa'],
    ['Mpa', 'MPa'],
    ['degc', '°C'],
    ['F', '°F'],
    ['cst', 'cSt'],
    ['kJ/kg/R', '°R'],
  ])('"%s" suggests "%s"', (given, expected) => {
    expect((caught(() => quantity(1, given)) as UnitError).suggestions).toContain(expected);
  });
  it('a name far from every spelling gets no suggestion', () => {
    expect((caught(() => quantity(1, 'furlong')) as UnitError).suggestions).toEqual([]);
  });
  it('"ton" is refused as ambiguous and names TR, t and ton_short (decision: a ton is never guessed)', () => {
    const e = caught(() => quantity(1, 'ton')) as UnitError;
    expect(e.code).toBe('unit.unknown');
    expect(e.suggestions).toEqual(['TR', 't', 'ton_short']);
    expect(e.message).toMatch(/ambiguous/);
    expect(quantity(1, 'TR').in('Btu/h')).toBeCloseTo(12000, 9);
  });
});

describe('shared units resolve by the expected dimension', () => {
  it('readQuantity with specificEntropy accepts "6.5 kJ/(kg·K)"; with thermalDiffusivity accepts "1.4e-7 m²/s"', () => {
    expect(readQuantity('6.5 kJ/(kg·K)', 'specificEntropy', 's')).toBe(6500);
    expect(readQuantity('1.4e-7 m²/s', 'thermalDiffusivity', 'alpha')).toBe(1.4e-7);
    expect(readQuantity('7 g/kg', 'humidityRatio', 'W')).toBe(0.007);
    expect(readQuantity('49 gr/lbm', 'humidityRatio', 'W')).toBe(0.007);
  });
  it('Quantity.fromSI and in() read shared units as the quantity dimension', () => {
    const s = Quantity.fromSI(6500, 'specificEntropy', 'kJ/(kg·K)');
    expect(s.value).toBe(6.5);
    expect(s.in('Btu/(lbm·°R)')).toBe(6500 / 4186.8);
    expect(Quantity.fromSI(1e-6, 'kinematicViscosity', 'cSt').value).toBe(1);
  });
  it('a unit of another shape is still a DimensionError naming the parameter', () => {
    const e = caught(() => readQuantity('6.5 kJ/kg' as never, 'specificEntropy', 's'));
    expect(e).toBeInstanceOf(DimensionError);
    expect((e as DimensionError).parameter).toBe('s');
    expect(e.message).toBe('s must be a specific entropy; got 6.5 kJ/kg (a specific energy)');
  });
});
