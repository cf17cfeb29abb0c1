/**
 * Conversion factors against NIST Special Publication 811 (2008), Appendix B.8 "Factors for units
 * listed alphabetically". Exact factors (bold in SP 811) are compared exactly; the others to the
 * seven significant digits SP 811 prints (fewer where SP 811 prints fewer). Printed values are
 * recalled (from memory) and rounded as SP 811 rounds them; exact ones follow from the defining
 * relations named beside them (1959 yard and pound, standard gravity 9.806 65 m/s², Btu_IT).
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
  // plant and HVAC units (SP 811 B.8, bold = exact)
  ['inH2O', 'Pa', 249.08891], // inch of water, conventional: 1000 kg/m³ × 9.806 65 m/s² × 0.0254 m
  ['ftH2O', 'Pa', 2989.06692], // foot of water, conventional
  ['mmH2O', 'Pa', 9.80665], // millimetre of water, conventional
  ['kgf', 'N', 9.80665], // kilogram-force
  ['kgf/cm²', 'Pa', 98066.5], // kilogram-force per square centimetre
  ['gr', 'kg', 6.479891e-5], // grain (1/7000 lb)
  ['ton_short', 'kg', 907.18474], // ton, short (2000 lb)
  ['t', 'kg', 1000], // ton, metric
  ['hp_electric', 'W', 746], // horsepower (electric)
  ['hp_metric', 'W', 735.49875], // horsepower (metric), 75 kgf·m/s
  ['St', 'm²/s', 1e-4], // stokes
  ['cSt', 'm²/s', 1e-6], // centistokes
  ['ft²/h', 'm²/s', 2.58064e-5], // square foot per hour
  ['ft²/s', 'm²/s', 0.09290304], // square foot per second
  ['P', 'Pa·s', 0.1], // poise
  ['therm', 'J', 105505585.262], // therm (EC) = 100 000 Btu_IT
  ['MMBtu', 'J', 1055055852.62], // 10^6 Btu_IT (trade usage: MM = million; common practice)
  ['gal/min', 'm³/s', 6.30901964e-5], // 231 in³ per minute
  ['ft³/min', 'm³/s', 4.719474432e-4], // cubic foot per minute
];

/** [from, to, printed factor, significant digits printed (default 7)]. */
const printed: [string, string, number, number?][] = [
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
  ['hp_boiler', 'W', 9.8095e3], // horsepower (boiler): SP 811 prints 9.809 50 E+03
  ['hp_metric', 'W', 7.354988e2], // horsepower (metric)
  ['therm', 'J', 1.05506e8, 6], // therm (EC), printed to 6 digits
  ['therm_US', 'J', 1.054804e8], // therm (U.S.) (from memory of SP 811 B.8; 100 000 Btu_59°F)
  ['ton_short', 'kg', 9.071847e2], // ton, short
  ['Btu·in/(h·ft²·°F)', 'W/(m·K)', 1.442279e-1], // Btu_IT·in/(h·ft²·°F), insulation conductivity
  ['lbm/(ft·h)', 'Pa·s', 4.133789e-4], // pound per foot hour
  ['inH2O', 'Pa', 2.490889e2], // inch of water, conventional, as printed
  ['ftH2O', 'Pa', 2.989067e3], // foot of water, conventional, as printed
  // inHg is the conventional inch of mercury (13 595.1 kg/m³ × 9.806 65 m/s² × 0.0254 m), checked above
  // against 3.386 389 E+03. The separate SP 811 entry "inch of mercury (32 °F)", recalled (from memory)
  // as 3.386 38 E+03, does not match it at the 6th digit (2.6 ppm), so no "inHg_32F" is offered until
  // someone with SP 811 at hand transcribes that entry.
  ['TR', 'Btu/h', 12000], // ton of refrigeration = 12 000 Btu_IT/h (definition in SP 811's entry)
  ['Btuh', 'W', 2.930711e-1], // Btu_IT per hour
  ['cP', 'Pa·s', 1e-3],
];

/** Not in SP 811: trade definitions, checked as the definitions they are (common practice). */
const trade: [string, string, number][] = [
  ['MMBtu/h', 'kW', 293.0710701722222], // 10^6 Btu_IT/h = 10^6 × 1055.055 852 62 J / 3600 s
  ['MBH', 'Btu/h', 1000], // thousand Btu/h (HVAC usage)
  ['quad', 'Btu', 1e15], // quad = 10^15 Btu_IT (energy statistics)
  ['cmH2O', 'mmH2O', 10], // centimetre of water, conventional, by the same definition as mmH2O
  ['gr/lbm', 'kg/kg', 1 / 7000], // 7000 grains = 1 lb (SP 811 B.8 grain entry)
  ['kWh', 'MJ', 3.6],
  ['CFM', 'ft³/min', 1],
  ['GPM', 'gal/min', 1],
];

/** [from, factor, to]: the order the test title reads in ("1 ft = 0.3048 m"). */
const titled = (rows: [string, string, number][]) => rows.map(([from, to, factor]) => [from, factor, to] as const);

describe('NIST SP 811 B.8 exact factors', () => {
  it.each(titled(exact))('1 %s = %s %s exactly', (from, factor, to) => {
    expect(quantity(1, from).in(to)).toBe(factor);
  });
});

describe('NIST SP 811 B.8 printed factors (7 significant digits)', () => {
  it.each(printed.map(([from, to, factor, digits]) => [from, factor, to, digits] as const))('1 %s ≈ %s %s', (from, factor, to, digits) => {
    if (digits === undefined) expectClose(quantity(1, from).in(to), factor, { rel: 6e-7 });
    else expectClose(quantity(1, from).in(to), factor, { abs: 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(factor))) - digits + 1) });
  });
});

describe('trade units defined through SP 811 units (common practice)', () => {
  it.each(trade)('1 %s in %s = %s', (from, to, factor) => {
    expectClose(quantity(1, from).in(to), factor, { rel: 4e-16 });
  });
});

describe('gauge forms of the plant pressure units (SP 811: 1 kgf/cm² = 98 066.5 Pa, 1 bar = 100 kPa; ambient: standard atmosphere 101 325 Pa)', () => {
  it('1 kgf/cm²g is 98 066.5 Pa above the ambient pressure', () => {
    expect(quantity(1, 'kgf/cm²g').si).toBe(98066.5 + 101325);
    expect(quantity(1, 'kgf/cm2g').si).toBe(98066.5 + 101325);
  });
  it('bar(g), barg, psi(g), MPag read as gauge pressures', () => {
    expect(quantity(1, 'bar(g)').si).toBe(201325);
    expect(quantity(1, 'barg').si).toBe(201325);
    expect(quantity(0, 'psi(g)').si).toBe(101325);
    expect(quantity(1, 'MPag').si).toBe(1101325);
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
