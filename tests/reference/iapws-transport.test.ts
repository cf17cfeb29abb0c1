/**
 * IAPWS transport releases: the computer-program verification tables, all recalled from memory (the
 * coefficients too, so these checks are what admits them; see data/transport/*.json).
 * - IAPWS R12-08 (viscosity, 2008): Table 4 (μ2 = 1) and Table 5 (with μ2, T = 647.35 K).
 * - IAPWS R15-11 (thermal conductivity, 2011): Table 4 (λ2 = 0) and Table 5 (with λ2, T = 647.35 K).
 * - IAPWS R1-76(2014) (surface tension): Table 1.
 * Units as printed: μ in µPa·s, λ in mW/(m·K), σ in mN/m.
 *
 * The Table 5 values were computed in the releases with derivatives from IAPWS-95; here the derivatives
 * come from IF97 (src/water/transport/if97-inputs.ts), which is not IAPWS-95 near the critical point.
 * Those rows are checked with the difference measured here (stated beside each, rounded up): they
 * guard the implementation, they do not claim IF97-based enhancements are that accurate.
 */
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { CriticalEnhancementInputs } from '../../src/water/transport/critical.js';
import { ConductivityResult, thermalConductivity } from '../../src/water/transport/conductivity.js';
import { if97EnhancementInputs, If97InputsWork } from '../../src/water/transport/if97-inputs.js';
import { surfaceTension, SurfaceTensionResult } from '../../src/water/transport/surface-tension.js';
import { viscosity, ViscosityResult } from '../../src/water/transport/viscosity.js';
import { expectClose } from '../helpers/tolerance.js';
import { water } from '../../src/water/index.js';

/** Agreement within half a unit in the last printed decimal (and a hair for binary rounding). */
const toDecimals = (actual: number, printed: number, decimals: number) => expectClose(actual, printed, { abs: 0.5000001 * 10 ** -decimals });
/** Decimals printed in a value written as text. */
const decimalsOf = (printed: string) => (printed.includes('.') ? printed.split('.')[1]!.length : 0);

const none = new CriticalEnhancementInputs();
const inputs = new CriticalEnhancementInputs();
const work = new If97InputsWork();
const mu = new ViscosityResult();
const lambda = new ConductivityResult();

describe('IAPWS R12-08 Table 4: viscosity with μ2 = 1 (industrial use), to the printed 6 decimals', () => {
  it.each([
    [298.15, 998, '889.735100'],
    [298.15, 1200, '1437.649467'],
    [373.15, 1000, '307.883622'],
    [433.15, 1, '14.538324'],
    [433.15, 1000, '217.685358'],
    [873.15, 1, '32.619287'],
    [873.15, 100, '35.802262'],
    [873.15, 600, '77.430195'],
    [1173.15, 1, '44.217245'],
    [1173.15, 100, '47.640433'],
    [1173.15, 400, '64.154608'],
  ])('T = %d K, ρ = %d kg/m³: μ = %s µPa·s', (T, rho, printed) => {
    expect(viscosity(T, rho, false, none, mu)).toBe(Status.ok);
    expect(mu.mu2).toBe(1);
    toDecimals(mu.mu * 1e6, Number(printed), decimalsOf(printed));
  });
});

describe('IAPWS R15-11 Table 4: thermal conductivity with λ2 = 0, to the printed 9 significant digits', () => {
  it.each([
    [298.15, 0, '18.4341883'],
    [298.15, 998, '607.712868'],
    [298.15, 1200, '799.038144'],
    [873.15, 0, '79.1034659'],
  ])('T = %d K, ρ = %d kg/m³: λ = %s mW/(m·K)', (T, rho, printed) => {
    expect(thermalConductivity(T, rho, false, none, lambda)).toBe(Status.ok);
    expect(lambda.lambda2).toBe(0);
    toDecimals(lambda.lambda * 1e3, Number(printed), decimalsOf(printed));
  });
});

describe('IAPWS R12-08 Table 5: viscosity with μ2 at 647.35 K (release: IAPWS-95 derivatives; here IF97)', () => {
  // [ρ, printed μ, relative tolerance, why]
  it.each([
    [122, 25.520677, 5e-8, 'μ2 − 1 = 3e-6 here: the IF97 derivatives barely matter; agrees to the printed 6 decimals'],
    [222, 31.337589, 1e-4, 'measured +0.0072 % (IF97 vs IAPWS-95 derivatives)'],
    [272, 36.228143, 5e-3, 'measured −0.40 %'],
    [322, 42.961579, 1.6e-2, 'measured −1.51 %: at the critical density IF97 region 3 gives (∂ρ/∂p)_T = 6.93e-3 kg/(m³·Pa)'],
    [372, 45.688204, 7e-3, 'measured −0.60 %'],
    [422, 49.436256, 1e-4, 'measured −0.0039 %'],
  ])('ρ = %d kg/m³: μ = %d µPa·s within rel %d (%s)', (rho, printed, rel) => {
    expect(if97EnhancementInputs(647.35, rho, inputs, work)).toBe(Status.ok);
    expect(viscosity(647.35, rho, true, inputs, mu)).toBe(Status.ok);
    expectClose(mu.mu * 1e6, printed, { rel });
  });
  it('the enhancement is what closes the gap at 322 kg/m³: without μ2 the value is 7 % low', () => {
    viscosity(647.35, 322, false, none, mu);
    expect(mu.mu * 1e6 / 42.961579 - 1).toBeLessThan(-0.06);
  });
});

describe('IAPWS R15-11 Table 5: thermal conductivity with λ2 at 647.35 K (release: IAPWS-95 derivatives; here IF97)', () => {
  it.each([
    [1, 51.9298924, 2e-8, 'λ2 is 1e-4 mW/(m·K) here; agrees to 8 of the 9 printed digits (the 9th digit moves with the derivatives)'],
    [122, 130.922885, 3e-4, 'measured −0.023 %'],
    [222, 367.787459, 5e-3, 'measured −0.44 %'],
    [272, 757.959776, 0.11, 'measured −9.9 %: λ2 is 68 % of λ here and scales with cp and ξ, where IF97 and IAPWS-95 differ most'],
    [322, 1443.75556, 0.2, 'measured −18.8 %: at the critical density λ2 is 78 % of λ'],
    [372, 650.319402, 6e-2, 'measured −5.3 %'],
    [422, 448.883487, 2.5e-3, 'measured −0.19 %'],
  ])('ρ = %d kg/m³: λ = %d mW/(m·K) within rel %d (%s)', (rho, printed, rel) => {
    expect(if97EnhancementInputs(647.35, rho, inputs, work)).toBe(Status.ok);
    expect(thermalConductivity(647.35, rho, true, inputs, lambda)).toBe(Status.ok);
    expectClose(lambda.lambda * 1e3, printed, { rel });
  });
  it('ρ = 750 kg/m³ is left out: IF97 has no state there (p ≈ 118 MPa > 100 MPa), so the helper says outOfRange', () => {
    expect(if97EnhancementInputs(647.35, 750, inputs, work)).toBe(Status.outOfRange);
    // without λ2 the correlation still answers, 0.56 % below the printed 600.961346 (λ2 is that part)
    expect(thermalConductivity(647.35, 750, false, none, lambda)).toBe(Status.ok);
    expectClose(lambda.lambda * 1e3, 600.961346, { rel: 7e-3 });
    expect(lambda.lambda * 1e3).toBeLessThan(600.961346);
  });
});

describe('IAPWS R1-76(2014) Table 1: surface tension, to the printed 0.01 mN/m', () => {
  const out = new SurfaceTensionResult();
  // three recalled rows (150, 250, 300 °C) disagree with Eq. 1 and are left out: see the finding in
  // data/transport/water-surface-tension.json
  it.each([
    [0.01, 75.65], [10, 74.22], [20, 72.74], [25, 71.97], [30, 71.19], [40, 69.6], [50, 67.94], [60, 66.24],
    [70, 64.48], [80, 62.67], [90, 60.82], [100, 58.91], [200, 37.67], [350, 3.67], [370, 0.39],
  ])('t = %d °C: σ = %d mN/m', (t, printed) => {
    const T = Math.round((t + 273.15) * 100) / 100; // 0.01 °C is 273.16 K exactly, not 273.15999…
    expect(surfaceTension(T, out)).toBe(Status.ok);
    toDecimals(out.sigma * 1e3, printed, 2);
  });
});

describe('IAPWS R12-08 and R15-11 Table 5 with the releases\' own IAPWS-95 derivatives, through water.viscosity and water.thermalConductivity', () => {
  // the releases computed Table 5 with IAPWS-95: with its derivatives (src/water/transport/iapws95-inputs.ts)
  // every printed digit comes out, which checks the enhancement coefficients and the IAPWS-95 code together
  it.each([
    [122, '25.520677'], [222, '31.337589'], [272, '36.228143'], [322, '42.961579'], [372, '45.688204'], [422, '49.436256'],
  ])('R12-08 Table 5: T = 647.35 K, ρ = %d kg/m³: μ = %s µPa·s', (rho, printed) => {
    toDecimals(water.viscosity({ T: '647.35 K', rho: `${rho} kg/m³` }).in('µPa·s'), Number(printed), decimalsOf(printed));
  });
  it.each([
    [1, '51.9298924'], [122, '130.922885'], [222, '367.787459'], [272, '757.959776'], [322, '1443.75556'], [372, '650.319402'], [422, '448.883487'], [750, '600.961346'],
  ])('R15-11 Table 5: T = 647.35 K, ρ = %d kg/m³: λ = %s mW/(m·K)', (rho, printed) => {
    toDecimals(water.thermalConductivity({ T: '647.35 K', rho: `${rho} kg/m³` }).in('mW/(m·K)'), Number(printed), decimalsOf(printed));
  });
  it('R12-08 Table 4 through the facade without the enhancement, to the printed 6 decimals', () => {
    toDecimals(water.viscosity({ T: '298.15 K', rho: '998 kg/m³' }, { criticalEnhancement: false }).in('µPa·s'), 889.7351, 6);
    toDecimals(water.viscosity({ T: '873.15 K', rho: '600 kg/m³' }, { criticalEnhancement: false }).in('µPa·s'), 77.430195, 6);
  });
  it('R1-76(2014) Table 1 through water.surfaceTension: 25 °C gives 71.97 mN/m', () => {
    toDecimals(water.surfaceTension({ T: '25 °C' }).in('mN/m'), 71.97, 2);
  });
});
