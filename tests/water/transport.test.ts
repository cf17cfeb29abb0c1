/**
 * Water transport SI core: identities, status codes, the IF97 helper's states and derivatives, and the
 * values quoted in the doc comments' examples. Outside reference values are in
 * tests/reference/iapws-transport.test.ts.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { stateFromPT, WaterState } from '../../src/water/if97/index.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { region1 } from '../../src/water/if97/region1.js';
import { region2 } from '../../src/water/if97/region2.js';
import { region3, region3Pressure } from '../../src/water/if97/region3.js';
import {
  conductivityPressureLimit,
  ConductivityResult,
  correlationLength,
  CriticalEnhancementInputs,
  enhancementInputsFromState,
  if97EnhancementInputs,
  If97InputsWork,
  if97StateAtDensity,
  reducedViscosity,
  reducedViscosityAtLength,
  referenceDensityDerivative,
  REFERENCE_RHO_REGION2_MAX,
  surfaceTension,
  SurfaceTensionResult,
  SURFACE_TENSION_T_MAX,
  SURFACE_TENSION_T_MIN,
  T_REFERENCE,
  thermalConductivity,
  viscosity,
  viscosityEnhancement,
  viscosityPressureLimit,
  ViscosityResult,
} from '../../src/water/transport/index.js';
import { enhancementInputsValid } from '../../src/water/transport/critical.js';
import { expectClose } from '../helpers/tolerance.js';

const none = new CriticalEnhancementInputs();
const d = new CriticalEnhancementInputs();
const work = new If97InputsWork();
const mu = new ViscosityResult();
const lam = new ConductivityResult();
const sigma = new SurfaceTensionResult();

describe('surfaceTension (IAPWS R1-76(2014) Eq. 1)', () => {
  it('is exactly 0 at the critical temperature', () => {
    expect(surfaceTension(SURFACE_TENSION_T_MAX, sigma)).toBe(Status.ok);
    expect(sigma.sigma).toBe(0);
  });
  it('falls strictly with T from the triple point to the critical point', () => {
    fc.assert(
      fc.property(fc.double({ min: SURFACE_TENSION_T_MIN, max: SURFACE_TENSION_T_MAX, noNaN: true }), fc.double({ min: SURFACE_TENSION_T_MIN, max: SURFACE_TENSION_T_MAX, noNaN: true }), (a, b) => {
        // strictly for temperatures 1 µK apart or more; within rounding of each other, not increasing
        fc.pre(a < b);
        surfaceTension(a, sigma);
        const sa = sigma.sigma;
        surfaceTension(b, sigma);
        return (b - a >= 1e-6 ? sa > sigma.sigma : sa >= sigma.sigma) && sigma.sigma >= 0;
      }),
    );
  });
  it('says outOfRange outside 273.16 K to 647.096 K and invalidInput for NaN', () => {
    expect(surfaceTension(273.15, sigma)).toBe(Status.outOfRange);
    expect(surfaceTension(647.1, sigma)).toBe(Status.outOfRange);
    expect(surfaceTension(NaN, sigma)).toBe(Status.invalidInput);
  });
});

describe('viscosity and thermalConductivity: status codes', () => {
  it.each([
    [NaN, 1, Status.invalidInput],
    [300, Infinity, Status.invalidInput],
    [300, -1, Status.invalidInput],
    [273.1, 1, Status.outOfRange],
    [1173.2, 1, Status.outOfRange],
    [1173.15, 1, Status.ok],
  ])('T = %d K, ρ = %d kg/m³ → %d', (T, rho, status) => {
    expect(viscosity(T, rho, false, none, mu)).toBe(status);
    expect(thermalConductivity(T, rho, false, none, lam)).toBe(status);
  });
  it('with the enhancement on, unusable derivatives are invalidInput, never NaN', () => {
    expect(viscosity(647.35, 322, true, none, mu)).toBe(Status.invalidInput);
    expect(thermalConductivity(647.35, 322, true, none, lam)).toBe(Status.invalidInput);
    expect(enhancementInputsValid(none)).toBe(false);
  });
  it('pressure limits by band (R12-08, R15-11 Section 3, from memory)', () => {
    expect(viscosityPressureLimit(433.15)).toBe(1000e6);
    expect(viscosityPressureLimit(433.16)).toBe(500e6);
    expect(viscosityPressureLimit(873.16)).toBe(300e6);
    expect(conductivityPressureLimit(398.16)).toBe(200e6);
    expect(conductivityPressureLimit(600)).toBe(150e6);
    expect(conductivityPressureLimit(1173.2)).toBe(0);
  });
});

describe('critical enhancements: limits', () => {
  it('ρ → 0: ξ = 0, so μ2 = 1 and λ2 = 0 exactly', () => {
    d.cp = 2000; d.cv = 1500; d.dRhoDp = 1e-5; d.dRhoDpReference = 1e-5;
    expect(correlationLength(700, 0, d)).toBe(0);
    expect(viscosity(700, 0, true, d, mu)).toBe(Status.ok);
    expect(mu.mu2).toBe(1);
    expect(thermalConductivity(700, 0, true, d, lam)).toBe(Status.ok);
    expect(lam.lambda2).toBe(0);
  });
  it('Δχ̄ ≤ 0 (the reference compressibility dominates) gives no enhancement', () => {
    d.cp = 4000; d.cv = 3000; d.dRhoDp = 1e-7; d.dRhoDpReference = 1e-6;
    expect(correlationLength(600, 400, d)).toBe(0);
    expect(viscosityEnhancement(600, 400, d)).toBe(1);
  });
  it('both enhancements grow towards the critical density on the 647.35 K isotherm and are positive', () => {
    let lastMu = 0;
    let lastLambda = 0;
    for (const rho of [122, 222, 272, 322]) {
      expect(if97EnhancementInputs(647.35, rho, d, work)).toBe(Status.ok);
      viscosity(647.35, rho, true, d, mu);
      thermalConductivity(647.35, rho, true, d, lam);
      expect(mu.mu2).toBeGreaterThan(Math.max(1, lastMu));
      expect(lam.lambda2).toBeGreaterThan(lastLambda);
      lastMu = mu.mu2;
      lastLambda = lam.lambda2;
    }
  });
  it('outside the R12-08 significance window μ2 stays below 1.02 (sampled with IF97 derivatives)', () => {
    for (const [T, rho] of [[640, 150], [655, 322], [647.35, 222], [647.35, 422], [700, 300], [800, 200]] as const) {
      expect(if97EnhancementInputs(T, rho, d, work)).toBe(Status.ok);
      expect(viscosityEnhancement(T, rho, d)).toBeLessThan(1.02);
    }
  });
  it('the enhancement is insensitive to the reference compressibility near the critical point: 2 % in it moves λ by < 0.05 % on the 647.35 K isotherm', () => {
    for (const rho of [122, 222, 272, 322, 372, 422]) {
      if97EnhancementInputs(647.35, rho, d, work);
      thermalConductivity(647.35, rho, true, d, lam);
      const base = lam.lambda;
      d.dRhoDpReference *= 1.02;
      thermalConductivity(647.35, rho, true, d, lam);
      expectClose(lam.lambda, base, { rel: 5e-4 });
    }
  });
});

describe('IF97 helper: the state at (T, ρ)', () => {
  const st = new WaterState();
  it.each([
    [3e6, 300], [80e6, 500], [3500, 700], [30e6, 700], [25e6, 650], [20e6, 640], [21e6, 645], [17e6, 630], [18e6, 630], [0.5e6, 1100], [30e6, 1150], [101325, 450], [16e6, 620], [100e6, 1000], [1000, 273.15],
  ])('p = %d Pa, T = %d K: same region as stateFromPT, p recovered to 1e-9', (p, T) => {
    expect(stateFromPT(p, T, st)).toBe(Status.ok);
    expect(if97StateAtDensity(T, st.rho, work)).toBe(Status.ok);
    expect(work.region).toBe(st.region);
    expectClose(work.state.p, p, { rel: 1e-9 });
  });
  it('inside the dome, above 100 MPa and outside the temperature range: outOfRange', () => {
    expect(if97StateAtDensity(373.15, 10, work)).toBe(Status.outOfRange);
    expect(if97StateAtDensity(640, 322, work)).toBe(Status.outOfRange);
    expect(if97StateAtDensity(300, 1100, work)).toBe(Status.outOfRange);
    expect(if97StateAtDensity(1200, 1, work)).toBe(Status.outOfRange);
    expect(if97StateAtDensity(300, 0, work)).toBe(Status.outOfRange);
    expect(if97StateAtDensity(300, NaN, work)).toBe(Status.invalidInput);
  });
});

describe('IF97 helper: (∂ρ/∂p)_T', () => {
  it('equals a central difference of ρ(p) in regions 1 and 2, and 1/(∂p/∂ρ)_T of f(ρ, T) in region 3', () => {
    const a = new WaterProperties();
    const b = new WaterProperties();
    for (const [p, T, f] of [[5e6, 350, region1], [0.2e6, 500, region2], [30e6, 900, region2]] as const) {
      const st = new WaterState();
      stateFromPT(p, T, st);
      // the liquid (976 kg/m³) has no reference value from IF97 (above 500 kg/m³), but its own inputs are filled
      expect(enhancementInputsFromState(st, d, work)).toBe(st.rho > 500 ? Status.outOfRange : Status.ok);
      const h = p * 1e-5;
      f(p + h, T, a);
      f(p - h, T, b);
      expectClose(d.dRhoDp, (a.rho - b.rho) / (2 * h), { rel: 1e-7 });
    }
    const st = new WaterProperties();
    region3(400, 660, st);
    enhancementInputsFromState(st, d, work);
    const pr = new Float64Array(2);
    region3Pressure(400, 660, pr);
    expectClose(d.dRhoDp, 1 / pr[1]!, { rel: 1e-11 });
  });
  it('at T_R it comes from region 2 up to 283.7 kg/m³ and from the region 3 equation above; the two agree within 1.5 % near the seam', () => {
    expectClose(T_REFERENCE, 970.644, { rel: 1e-15 });
    expectClose(REFERENCE_RHO_REGION2_MAX, 283.68, { abs: 0.01 });
    const pr = new Float64Array(2);
    for (const rho of [100, 200, 280]) {
      expect(referenceDensityDerivative(rho, d, work)).toBe(Status.ok);
      region3Pressure(rho, T_REFERENCE, pr);
      expectClose(d.dRhoDpReference, 1 / pr[1]!, { rel: 0.015 });
    }
    expect(referenceDensityDerivative(500, d, work)).toBe(Status.ok);
    expect(referenceDensityDerivative(500.1, d, work)).toBe(Status.outOfRange);
  });
  it('two-phase states have no derivative inputs (undefinedProperty)', () => {
    const st = new WaterState();
    st.rho = 10; st.cp = NaN; st.cv = NaN; st.w = NaN;
    expect(enhancementInputsFromState(st, d, work)).toBe(Status.undefinedProperty);
  });
});

describe('values quoted in the doc comments', () => {
  it('viscosity, conductivity, surface tension, limits', () => {
    expect(viscosity(298.15, 998, false, none, mu)).toBe(0);
    expectClose(mu.mu, 889.7351e-6, { rel: 1e-9 });
    expect(viscosity(1200, 1, false, none, mu)).toBe(1);
    expectClose(reducedViscosity(298.15, 998, false, none), 889.7351, { rel: 1e-9 });
    expectClose(reducedViscosityAtLength(647.35, 322, 0), 39.3455, { rel: 2e-6 });
    if97EnhancementInputs(647.35, 322, d, work);
    expect(reducedViscosityAtLength(647.35, 322, correlationLength(647.35, 322, d))).toBe(reducedViscosity(647.35, 322, true, d));
    expect(thermalConductivity(298.15, 998, false, none, lam)).toBe(0);
    expectClose(lam.lambda, 0.607712868, { rel: 1e-9 });
    expect(thermalConductivity(298.15, -1, false, none, lam)).toBe(3);
    expect(surfaceTension(373.15, sigma)).toBe(0);
    expectClose(sigma.sigma, 0.0589119, { rel: 1e-6 });
    expect(viscosityPressureLimit(300)).toBe(1e9);
    expect(viscosityPressureLimit(1000)).toBe(3e8);
    expect(viscosityPressureLimit(1200)).toBe(0);
    expect(conductivityPressureLimit(300)).toBe(1e9);
    expect(conductivityPressureLimit(700)).toBe(1e8);
  });
  it('the IF97 helper and the enhancement at (647.35 K, 322 kg/m³)', () => {
    expect(if97EnhancementInputs(647.35, 322, d, work)).toBe(0);
    expectClose(d.cp, 3.1209e6, { rel: 5e-5 });
    expectClose(work.state.p, 22.132e6, { rel: 5e-5 });
    expect(work.region).toBe(3);
    expectClose(d.dRhoDp, 6.9265e-3, { rel: 1e-4 });
    expectClose(d.dRhoDpReference, 2.7927e-6, { rel: 1e-4 });
    expectClose(viscosityEnhancement(647.35, 322, d), 1.0754, { rel: 1e-4 });
    const e = new CriticalEnhancementInputs();
    e.dRhoDp = 474.6166 / (22.064e6 / 322);
    e.dRhoDpReference = 0.191361 / (22.064e6 / 322);
    expectClose(correlationLength(647.35, 322, e), 1.2472e-8, { rel: 1e-4 });
    expect(referenceDensityDerivative(750, d, work)).toBe(1);
  });
});

describe('figures stated in docs/guide/transport.md', () => {
  const pct = (x: number, digits: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x * 100).toFixed(digits)} %`;
  it.each([
    [640, 500, '10 %', 0.095, 0.105],
    [700, 300, '14 %', 0.135, 0.145],
    [700, 100, '3 % to 4 %', 0.03, 0.04],
    [800, 200, '3 % to 4 %', 0.03, 0.04],
  ])('λ2 share at %d K, %d kg/m³ is about %s', (T, rho, _stated, lo, hi) => {
    expect(if97EnhancementInputs(T, rho, d, work)).toBe(Status.ok);
    thermalConductivity(T, rho, true, d, lam);
    expect(lam.lambda2 / lam.lambda).toBeGreaterThan(lo);
    expect(lam.lambda2 / lam.lambda).toBeLessThan(hi);
  });
  it.each([
    [222, 367.787459, '−0.44 %', 2],
    [272, 757.959776, '−9.9 %', 1],
    [322, 1443.75556, '−18.8 %', 1],
    [372, 650.319402, '−5.3 %', 1],
    [422, 448.883487, '−0.19 %', 2],
  ])('λ at 647.35 K, %d kg/m³ against R15-11 Table 5 (%d): %s', (rho, printed, stated, digits) => {
    if97EnhancementInputs(647.35, rho, d, work);
    thermalConductivity(647.35, rho, true, d, lam);
    expect(pct(lam.lambda * 1e3 / printed - 1, digits)).toBe(stated);
  });
  it.each([
    [272, 36.228143, '−0.40 %', 2],
    [322, 42.961579, '−1.5 %', 1],
    [372, 45.688204, '−0.60 %', 2],
  ])('μ at 647.35 K, %d kg/m³ against R12-08 Table 5 (%d): %s', (rho, printed, stated, digits) => {
    if97EnhancementInputs(647.35, rho, d, work);
    viscosity(647.35, rho, true, d, mu);
    expect(pct(mu.mu * 1e6 / printed - 1, digits)).toBe(stated);
  });
});

describe('one correlation length for both releases', () => {
  it('R12-08 and R15-11 give the same ξ0, Γ0, ν, γ and T̄_R (critical.ts reads them once)', async () => {
    const v = (await import('../../data/transport/water-viscosity.json')).default.critical;
    const c = (await import('../../data/transport/water-conductivity.json')).default.critical;
    expect([c.xi0, c.Gamma0, c.nu, c.gamma, c.TRbar]).toEqual([v.xi0, v.Gamma0, v.nu, v.gamma, v.TRbar]);
  });
});
