import { describe, expect, it } from 'vitest';
import { parseUnitExpression } from '../../src/units/expression.js';
import { UnitError } from '../../src/errors.js';

const flat = (text: string) => parseUnitExpression(text).map((t) => `${t.name}^${t.exponent}`).join(' ');

describe('parseUnitExpression', () => {
  it('reads kJ/(kg·K) and kJ/kg/K as the same terms', () => {
    expect(flat('kJ/(kg·K)')).toBe('kJ^1 kg^-1 K^-1');
    expect(flat('kJ/kg/K')).toBe('kJ^1 kg^-1 K^-1');
  });
  it('reads exponents written with ^, superscripts and trailing digits', () => {
    expect(flat('ft^3/lbm')).toBe('ft^3 lbm^-1');
    expect(flat('ft³/lbm')).toBe('ft^3 lbm^-1');
    expect(flat('kg/m3')).toBe('kg^1 m^-3');
    expect(flat('m^-3')).toBe('m^-3');
  });
  it('reads products written with ·, *, . and spaces', () => {
    expect(flat('N·m')).toBe('N^1 m^1');
    expect(flat('N*m')).toBe('N^1 m^1');
    expect(flat('N.m')).toBe('N^1 m^1');
    expect(flat('kJ kg^-1 K^-1')).toBe('kJ^1 kg^-1 K^-1');
  });
  it('applies an exponent to a bracketed group', () => {
    expect(flat('(m/s)^2')).toBe('m^2 s^-2');
  });
  it.each(['', 'kJ/', '(kg', 'kg)', 'kg^', 'kJ/kg#K'])('throws unit.syntax for %j', (text) => {
    expect(() => parseUnitExpression(text)).toThrow(UnitError);
    try {
      parseUnitExpression(text);
    } catch (e) {
      expect((e as UnitError).code).toBe('unit.syntax');
    }
  });
});
