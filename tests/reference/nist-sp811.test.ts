/**
 * Conversion factors against NIST Special Publication 811 (2008), Appendix B.8 "Factors for units
 * listed alphabetically". Exact factors (bold in SP 811) are compared exactly; the others to the
 * seven significant digits SP 811 prints. Printed values are recalled (from memory) and rounded
 * as SP 811 rounds them.
 */
import { describe, expect, it } from 'vitest';
import { quantity } from '../../src/units/index.js';
import { expectClose } from '../helpers/tolerance.js';

const exact: [string, string, number][] = [
  ['ft', 'm', 0.3048],
  ['in', 'm', 0.0254],
  ['lbm', 'kg', 0.45359237],
  ['Btu', 'J', 1055.05585262],
  ['Btu/lbm', 'J/kg', 2326],
  ['Btu/(lbm·°F)', 'J/(kg·K)', 4186.8],
  ['Btu/(lbm·°R)', 'J/(kg·K)', 4186.8],
  ['cal', 'J', 4.1868],
  ['kcal', 'J', 4186.8],
  ['atm', 'Pa', 101325],
  ['bar', 'Pa', 100000],
  ['kWh', 'J', 3.6e6],
  ['mph', 'm/s', 0.44704],
  ['dyn/cm', 'N/m', 0.001],
  ['cP', 'Pa·s', 0.001],
  ['gal', 'm³', 0.003785411784],
  ['lbf', 'N', 4.4482216152605],
  ['mi', 'm', 1609.344],
];

const printed: [string, string, number][] = [
  ['psi', 'Pa', 6.894757e3],
  ['lbf/in²', 'Pa', 6.894757e3],
  ['mmHg', 'Pa', 1.333224e2],
  ['inHg', 'Pa', 3.386389e3],
  ['torr', 'Pa', 1.333224e2],
  ['hp', 'W', 7.456999e2],
  ['TR', 'W', 3.516853e3],
  ['Btu/h', 'W', 2.930711e-1],
  ['ft³', 'm³', 2.831685e-2],
  ['ft³/lbm', 'm³/kg', 6.242796e-2],
  ['lbm/ft³', 'kg/m³', 1.601846e1],
  ['Btu/(h·ft·°F)', 'W/(m·K)', 1.730735],
  ['lbf/ft', 'N/m', 1.45939e1],
  ['lbm/(ft·s)', 'Pa·s', 1.488164],
  ['lbf·s/ft²', 'Pa·s', 4.788026e1],
  ['lbm/h', 'kg/s', 1.259979e-4],
  ['ft³/min', 'm³/s', 4.719474e-4],
  ['gal/min', 'm³/s', 6.30902e-5],
  ['ft·lbf', 'J', 1.355818],
];

/** [from, factor, to]: the order the test title reads in ("1 ft = 0.3048 m"). */
const titled = (rows: [string, string, number][]) => rows.map(([from, to, factor]) => [from, factor, to] as const);

describe('NIST SP 811 B.8 exact factors', () => {
  it.each(titled(exact))('1 %s = %s %s exactly', (from, factor, to) => {
    expect(quantity(1, from).in(to)).toBe(factor);
  });
});

describe('NIST SP 811 B.8 printed factors (7 significant digits)', () => {
  it.each(titled(printed))('1 %s ≈ %s %s', (from, factor, to) => {
    expectClose(quantity(1, from).in(to), factor, { rel: 6e-7 });
  });
});

describe('temperature scales (NIST SP 811 B.9)', () => {
  it('T/K = t/°C + 273.15 and t/°F = 1.8·t/°C + 32', () => {
    expectClose(quantity(100, '°C').in('K'), 373.15, { abs: 1e-12 });
    expectClose(quantity(212, '°F').in('°C'), 100, { abs: 1e-12 });
    expectClose(quantity(-40, '°F').in('°C'), -40, { abs: 1e-12 });
    expectClose(quantity(491.67, '°R').in('K'), 273.15, { abs: 1e-12 });
    expectClose(quantity(0, '°F').in('°R'), 459.67, { abs: 1e-12 });
  });
});
