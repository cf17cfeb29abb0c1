import { describe, expect, it } from 'vitest';
import { InvalidInputError, OutOfRangeError } from '../../src/errors.js';
import { compressor, constantCpDeviation, idealGas, isentropicEnd, polytropic, turbine } from '../../src/ideal-gas/index.js';
import { expectClose } from '../helpers/tolerance.js';

const air = idealGas('air');

describe('isentropicEnd', () => {
  it('keeps s(T2, p2) = s(T1, p1) with variable cp', () => {
    const { T2 } = isentropicEnd(air, { T1: '300 K', p1: '100 kPa', p2: '800 kPa' });
    expectClose(air.s(T2, '800 kPa').si, air.s('300 K', '100 kPa').si, { rel: 1e-12 });
  });
  it('air, 300 K, pressure ratio 8: T2 ≈ 540 K with variable cp (air tables, from memory)', () => {
    expectClose(isentropicEnd(air, { T1: '300 K', p1: '100 kPa', p2: '800 kPa' }).T2.in('K'), 540, { rel: 2e-3 });
  });
  it('with constant cp it reproduces the closed form T2 = T1 (p2/p1)^((k−1)/k)', () => {
    const cold = air.withConstantCp();
    const k = cold.k('300 K');
    expectClose(isentropicEnd(cold, { T1: '300 K', p1: '100 kPa', p2: '800 kPa' }).T2.si, 300 * 8 ** ((k - 1) / k), { rel: 1e-12 });
  });
  it('works in US units and on a molar basis', () => {
    const r = isentropicEnd(idealGas('N2', { basis: 'molar' }), { T1: '80 °F', p1: '14.7 psia', p2: '147 psia' });
    expect(r.deltaH.dimension).toBe('molarEnergy');
    expect(r.T2.in('°F')).toBeGreaterThan(500);
  });
  it('throws when T2 would leave the data', () => {
    expect(() => isentropicEnd(air, { T1: '3000 K', p1: '100 kPa', p2: '100 MPa' })).toThrow(OutOfRangeError);
  });
});

describe('compressor and turbine', () => {
  it('compressor: w = h(T2) − h(T1) = w_s/η, and T2 > T2s', () => {
    const r = compressor(air, { T1: '300 K', p1: '100 kPa', p2: '800 kPa', efficiency: 0.85 });
    expectClose(r.work.si, air.deltaH('300 K', r.T2).si, { rel: 1e-10 });
    expectClose(r.work.si * 0.85, r.workIsentropic.si, { rel: 1e-12 });
    expect(r.T2.si).toBeGreaterThan(r.T2s.si);
  });
  it('turbine: w = h(T1) − h(T2) = η·w_s, and T2 > T2s', () => {
    const r = turbine(air, { T1: '1400 K', p1: '1.6 MPa', p2: '100 kPa', efficiency: 0.9 });
    expectClose(r.work.si, -air.deltaH('1400 K', r.T2).si, { rel: 1e-10 });
    expectClose(r.work.si, 0.9 * r.workIsentropic.si, { rel: 1e-12 });
    expect(r.T2.si).toBeGreaterThan(r.T2s.si);
  });
  it('refuses an efficiency outside (0, 1] and pressures the wrong way round', () => {
    expect(() => compressor(air, { T1: '300 K', p1: '100 kPa', p2: '800 kPa', efficiency: 1.2 })).toThrow(OutOfRangeError);
    expect(() => compressor(air, { T1: '300 K', p1: '100 kPa', p2: '800 kPa', efficiency: 0 })).toThrow(OutOfRangeError);
    expect(() => compressor(air, { T1: '300 K', p1: '800 kPa', p2: '100 kPa' })).toThrow(InvalidInputError);
    expect(() => turbine(air, { T1: '900 K', p1: '100 kPa', p2: '800 kPa' })).toThrow(InvalidInputError);
  });
});

describe('constantCpDeviation', () => {
  it('gives the constant-cp closed forms with cp and k at 298.15 K', () => {
    const d = constantCpDeviation(air, { machine: 'compressor', T1: '300 K', p1: '100 kPa', p2: '800 kPa', efficiency: 0.85 });
    const k = d.constantCp.k;
    const cp = d.constantCp.cp.si;
    const T2s = 300 * 8 ** ((k - 1) / k);
    expectClose(d.constantCp.T2s.si, T2s, { rel: 1e-12 });
    expectClose(d.constantCp.work.si, (cp * (T2s - 300)) / 0.85, { rel: 1e-12 });
    expectClose(d.workRelativeDifference, (d.constantCp.work.si - d.variableCp.work.si) / d.variableCp.work.si, { rel: 1e-12 });
  });
  it('a cold compressor: the constant-cp estimate is within 1 % (common practice)', () => {
    const d = constantCpDeviation(air, { machine: 'compressor', T1: '300 K', p1: '100 kPa', p2: '400 kPa' });
    expect(Math.abs(d.workRelativeDifference)).toBeLessThan(0.01);
  });
  it('a hot turbine: constant cp at 298 K is off by several per cent (common practice)', () => {
    const d = constantCpDeviation(air, { machine: 'turbine', T1: '1400 K', p1: '1.6 MPa', p2: '100 kPa', efficiency: 0.9 });
    expect(Math.abs(d.workRelativeDifference)).toBeGreaterThan(0.03);
    expect(d.T2Difference.dimension).toBe('temperatureDifference');
  });
});

describe('polytropic', () => {
  it('n = 1 is isothermal: T2 = T1 and heat in = boundary work out (Δu = 0)', () => {
    const r = polytropic(air, { T1: '300 K', p1: '100 kPa', p2: '500 kPa', n: 1 });
    expectClose(r.T2.si, 300, { rel: 1e-15 });
    expectClose(r.heat.si, r.boundaryWork.si, { rel: 1e-12 });
    expectClose(r.boundaryWork.si, air.R.si * 300 * Math.log(1 / 5), { rel: 1e-12 });
  });
  it('n = k with constant cp is adiabatic: heat ≈ 0, and technical work = n × boundary work', () => {
    const cold = air.withConstantCp();
    const k = cold.k('300 K');
    const r = polytropic(cold, { T1: '300 K', p1: '100 kPa', p2: '500 kPa', n: k });
    expect(Math.abs(r.heat.si)).toBeLessThan(1e-9 * Math.abs(r.boundaryWork.si));
    expectClose(r.technicalWork.si, k * r.boundaryWork.si, { rel: 1e-12 });
  });
  it('p·vⁿ is constant between the two states', () => {
    const r = polytropic(air, { T1: '300 K', p1: '100 kPa', p2: '700 kPa', n: 1.3 });
    expectClose(100e3 * r.v1.si ** 1.3, 700e3 * r.v2.si ** 1.3, { rel: 1e-12 });
  });
  it('refuses a negative exponent', () => {
    expect(() => polytropic(air, { T1: '300 K', p1: '100 kPa', p2: '500 kPa', n: -1 })).toThrow(OutOfRangeError);
  });
});
