/**
 * Transport properties on water states and saturation results: the identities Pr = μ·cp/λ, ν = μ/ρ,
 * α = λ/(ρ·cp) (common practice definitions), agreement with the (T, ρ) functions, two-phase and
 * out-of-range states, and the errors of the (T, ρ) functions.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DimensionError, InvalidInputError, OutOfRangeError } from '../../src/errors.js';
import { water } from '../../src/water/index.js';
import { expectClose } from '../helpers/tolerance.js';

describe('transport on water.state', () => {
  it('Pr, ν and α follow from μ, λ, ρ and cp on random single-phase states (1 kPa to 100 MPa, 0 to 800 °C)', () => {
    fc.assert(
      fc.property(fc.double({ min: Math.log(1e3), max: Math.log(100e6), noNaN: true }), fc.double({ min: 273.16, max: 1073, noNaN: true }), (lnp, T) => {
        const s = water.state({ p: `${Math.min(100e6, Math.exp(lnp))} Pa`, T: `${T} K` });
        const mu = s.mu!.si;
        const lambda = s.lambda!.si;
        expectClose(s.Pr!, (mu * s.cp!.si) / lambda, { rel: 1e-15 });
        expectClose(s.nu!.si, mu / s.rho.si, { rel: 1e-15 });
        expectClose(s.alpha!.si, lambda / (s.rho.si * s.cp!.si), { rel: 1e-15 });
        expect(s.mu!.si).toBe(water.viscosity({ T: s.T, rho: s.rho }).si);
        expect(s.lambda!.si).toBe(water.thermalConductivity({ T: s.T, rho: s.rho }).si);
      }),
      { numRuns: 60 },
    );
  });
  it('is undefined in two-phase states and above 1173.15 K, where the releases end', () => {
    const wet = water.state({ p: '1 MPa', x: 0.5 });
    expect(wet.mu).toBeUndefined();
    expect(wet.Pr).toBeUndefined();
    const hot = water.state({ p: '1 MPa', T: '1500 K' });
    expect(hot.mu).toBeUndefined();
    expect(hot.lambda).toBeUndefined();
  });
  it('liquid water at 25 °C and 1 atm: μ ≈ 0.890 mPa·s, λ ≈ 0.607 W/(m·K), Pr ≈ 6.1 (handbook values, from memory)', () => {
    const s = water.state({ T: '25 °C', p: '1 atm' });
    expectClose(s.mu!.in('mPa·s'), 0.89, { rel: 2e-3 });
    expectClose(s.lambda!.in('W/(m·K)'), 0.607, { rel: 2e-3 });
    expectClose(s.Pr!, 6.13, { rel: 1e-2 });
  });
  it('the transport values are getters read by name and are in the JSON of states and saturated phases', () => {
    const st = water.state({ T: '300 K', p: '1 MPa' });
    const json = JSON.parse(JSON.stringify(st));
    expect(Object.keys(json)).toEqual(expect.arrayContaining(['T', 'p', 'h', 'mu', 'lambda', 'nu', 'alpha', 'Pr']));
    expect(json.mu).toEqual(JSON.parse(JSON.stringify(st.mu)));
    // the plain fields are own properties; the transport getters are not (computed on first read)
    expect(Object.keys(st)).toContain('h');
    expect(Object.keys(st)).not.toContain('mu');
    const liquid = water.saturation({ T: '100 °C' }).liquid;
    expect(Object.keys(JSON.parse(JSON.stringify(liquid)))).toEqual(expect.arrayContaining(['h', 'mu', 'lambda', 'nu', 'alpha', 'Pr']));
    // ν = μ/ρ and α = λ/(ρ·cp) on the saturated phase too (identities)
    expect(liquid.nu!.si).toBe(liquid.mu!.si / liquid.rho.si);
  });
});

describe('transport on water.saturation', () => {
  it('carries liquid and vapour values and σ; σ vanishes at the critical point', () => {
    const sat = water.saturation({ T: '100 °C' });
    expectClose(sat.sigma!.in('mN/m'), 58.91, { abs: 0.005 }); // IAPWS R1-76(2014) Table 1: 58.91 mN/m at 100 °C
    expect(sat.liquid.mu!.si).toBeGreaterThan(sat.vapor.mu!.si);
    expect(sat.liquid.lambda!.si).toBeGreaterThan(sat.vapor.lambda!.si);
    expect(water.saturation({ T: '647.096 K' }).sigma!.si).toBe(0);
  });
});

describe('water.viscosity, water.thermalConductivity and water.surfaceTension refuse bad input', () => {
  it.each([
    ['a density inside the dome', () => water.viscosity({ T: '500 K', rho: '100 kg/m³' }), OutOfRangeError, /rho = 100 kg\/m³/],
    ['beyond the pressure limit', () => water.viscosity({ T: '300 K', rho: '1300 kg/m³' }), OutOfRangeError, /1000 MPa/],
    ['above 1173.15 K', () => water.thermalConductivity({ T: '1200 K', rho: '1 kg/m³' }), OutOfRangeError, /T = 1200 K/],
    ['in °F, with the limit in °F', () => water.viscosity({ T: '2200 °F', rho: '1 kg/m³' }), OutOfRangeError, /2200 °F .* °F/],
    ['a pressure for ρ', () => water.viscosity({ T: '300 K', rho: '1 MPa' as never }), DimensionError, /rho/],
    ['an extra input', () => water.viscosity({ T: '300 K', rho: '1000 kg/m³', p: '1 MPa' } as never), InvalidInputError, /"p" is not an input of water.viscosity/],
    ['an unknown option', () => water.viscosity({ T: '300 K', rho: '1000 kg/m³' }, { enhancement: false } as never), InvalidInputError, /unknown option "enhancement"/],
    ['σ above the critical point', () => water.surfaceTension({ T: '700 K' }), OutOfRangeError, /647.096 K/],
  ])('%s', (_, f, cls, message) => {
    expect(f).toThrow(cls);
    expect(f).toThrow(message);
  });
});
