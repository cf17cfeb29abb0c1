/**
 * The Helmholtz engine on IAPWS-95 water: thermodynamic consistency, saturation, phase choice,
 * round trips of every flash, and the distance to the project's IAPWS-IF97.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { waterModel } from '../../src/fluids/catalogue.js';
import { stateFromHS, stateFromPH, stateFromPS, stateFromPT, stateFromPX, stateFromTRho, stateFromTV, stateFromTX } from '../../src/fluids/flash.js';
import { ancillaryLiquidDensity, ancillaryPressure, ancillaryVaporDensity, FLUID_PHASE, FluidContext, FluidState, propertiesAt } from '../../src/fluids/model.js';
import { saturationAtP, saturationAtT } from '../../src/fluids/saturation.js';
import { WaterProperties } from '../../src/water/if97/properties.js';
import { region1 } from '../../src/water/if97/region1.js';
import { region2 } from '../../src/water/if97/region2.js';
import { region3 } from '../../src/water/if97/region3.js';
import { saturationPressure } from '../../src/water/if97/region4.js';
import { region5 } from '../../src/water/if97/region5.js';
import { expectClose } from '../helpers/tolerance.js';

const model = waterModel();
const ctx = new FluidContext(model);
const a = new FluidState();
const b = new FluidState();
const l = new FluidState();
const v = new FluidState();
/** Five-point derivative. */
const diff = (f: (x: number) => number, x: number, h: number) => (8 * (f(x + h) - f(x - h)) - (f(x + 2 * h) - f(x - 2 * h))) / (12 * h);

// single-phase (T, ρ) samples: liquid, vapour, supercritical
const states = fc.oneof(
  // compressed liquid: p from 1.5·p_s to 100 MPa
  fc.tuple(fc.double({ min: 280, max: 620, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })).map(([T, f]) => {
    const ps = saturationPressure(T);
    return { T, p: Math.exp(Math.log(1.5 * ps) + f * (Math.log(100e6) - Math.log(1.5 * ps))) };
  }),
  // vapour: p from 1 kPa-ish to 0.7·p_s
  fc.tuple(fc.double({ min: 300, max: 640, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })).map(([T, f]) => {
    const ps = saturationPressure(T);
    return { T, p: Math.exp(Math.log(0.01 * ps) + f * (Math.log(0.7 * ps) - Math.log(0.01 * ps))) };
  }),
  // supercritical and hot gas
  fc.tuple(fc.double({ min: 660, max: 1270, noNaN: true }), fc.double({ min: Math.log(1e4), max: Math.log(500e6), noNaN: true })).map(([T, lp]) => ({ T, p: Math.exp(lp) })),
);

describe('thermodynamic consistency (finite differences of the state functions, to 1e-7)', () => {
  it('cp = (∂h/∂T)_p, cv = (∂u/∂T)_ρ, w² = (∂p/∂ρ)_s, μ_JT = (∂T/∂p)_h', () => {
    fc.assert(
      fc.property(states, ({ T, p }) => {
        expect(stateFromPT(ctx, p, T, a)).toBe(Status.ok);
        const { rho, cp, cv, w, jouleThomson, s, h } = a;
        const hT = (x: number) => (stateFromPT(ctx, p, x, b), b.h);
        expectClose(diff(hT, T, 1e-3 * T * 0.01), cp, { rel: 1e-7 });
        const uT = (x: number) => (propertiesAt(ctx, x, rho, b), b.u);
        expectClose(diff(uT, T, 1e-4 * T), cv, { rel: 1e-7 });
        expectClose(cp - cv, (T * a.dpdT * a.dpdT) / (rho * rho * a.dpdrho), { rel: 1e-7 });
        // (∂p/∂ρ)_s along the isentrope through the state: T(ρ) from s(T, ρ) = s by Newton steps
        const along = (target: number, by: 's' | 'h') => (r: number) => {
          let t = T;
          for (let i = 0; i < 30; i++) {
            propertiesAt(ctx, t, r, b);
            t -= by === 's' ? (b.s - target) / (b.cv / t) : (b.h - target) / (b.cv + b.dpdT / r);
          }
          propertiesAt(ctx, t, r, b);
          return b;
        };
        const dr = 1e-4 * rho;
        const onS = along(s, 's');
        expectClose(diff((r) => onS(r).p, rho, dr), w * w, { rel: 1e-7 });
        // μ_JT = (∂T/∂p)_h along the isenthalp, both as functions of ρ
        const onH = along(h, 'h');
        const dT = diff((r) => onH(r).T, rho, dr);
        const dP = diff((r) => onH(r).p, rho, dr);
        expectClose(dT / dP, jouleThomson, { rel: 1e-7, abs: 1e-9 * Math.abs(T / (rho * cp)) });
      }),
      { numRuns: 60 },
    );
  });
});

describe('saturation', () => {
  it('Gibbs energy and pressure are equal in both phases (to 1e-10) from the triple point to 0.1 mK below Tc', () => {
    const temps = [273.16, 275, 300, 373.15, 450, 550, 625, 640, 646, 647, 647.09, 647.0959, model.Tc - 1e-4];
    for (const T of temps) {
      expect(saturationAtT(ctx, T, l, v)).toBe(Status.ok);
      expectClose(l.g, v.g, { abs: 1e-10 * model.R * T });
      // the liquid's own pressure, from its density (the outputs share the vapour's)
      propertiesAt(ctx, T, l.rho, a);
      expectClose(a.p, v.p, { rel: 1e-9, abs: 1e-12 * l.rho * model.R * T });
      expect(l.rho).toBeGreaterThan(v.rho);
    }
  });

  it('saturationAtP inverts saturationAtT (fast-check, 1e-9)', () => {
    fc.assert(
      fc.property(fc.double({ min: 273.16, max: 647.09, noNaN: true }), (T) => {
        expect(saturationAtT(ctx, T, l, v)).toBe(Status.ok);
        const p = l.p;
        expect(saturationAtP(ctx, p, l, v)).toBe(Status.ok);
        expectClose(l.T, T, { rel: 1e-9 });
      }),
      { numRuns: 100 },
    );
  });

  it('the ancillary equations (Wagner & Pruß 1993) stay within their margin of the equation (measured)', () => {
    let worst = 0;
    let worstRho = 0;
    for (let T = 273.16; T < 647; T += 1.7) {
      saturationAtT(ctx, T, l, v);
      worst = Math.max(worst, Math.abs(ancillaryPressure(model, T) / l.p - 1));
      if (T < 640) worstRho = Math.max(worstRho, Math.abs(ancillaryLiquidDensity(model, T) / l.rho - 1), Math.abs(ancillaryVaporDensity(model, T) / v.rho - 1));
    }
    expect(worst).toBeLessThan(model.pressureMargin / 4);
    // measured: 0.107 % (densities, to 640 K); they only start the solves
    expect(worstRho).toBeLessThan(2e-3);
  });

  it('normal boiling point 373.124 K at 101.325 kPa (common practice, ITS-90)', () => {
    expect(saturationAtP(ctx, 101325, l, v)).toBe(Status.ok);
    expectClose(l.T, 373.124, { abs: 0.0005 });
  });

  it('triple point: p_t = 611.655 Pa, ρ′ = 999.793 kg/m³, ρ″ = 0.00485458 kg/m³ (from memory, IAPWS R6-95 Section 6)', () => {
    expect(saturationAtT(ctx, 273.16, l, v)).toBe(Status.ok);
    expectClose(l.p, 611.655, { abs: 0.001 });
    expectClose(l.rho, 999.793, { abs: 0.0005 });
    expectClose(v.rho, 0.00485458, { rel: 1e-5 });
  });

  it('critical point: p(Tc, ρc) = 22.064 MPa and (∂p/∂ρ)_T = 0 there (IAPWS R6-95 Eqs. 2a-2c)', () => {
    propertiesAt(ctx, model.Tc, model.rhoc, a);
    expectClose(a.p, 22.064e6, { rel: 5e-6 });
    const pr = (x: number) => (propertiesAt(ctx, model.Tc, x, b), b.p);
    expect(Math.abs(diff(pr, model.rhoc, 1e-3))).toBeLessThan(1e-3 * (a.p / model.rhoc));
  });
});

describe('(p, T): the stable phase', () => {
  it('is the root of lower Gibbs energy where both branches have one (near saturation)', () => {
    fc.assert(
      fc.property(fc.double({ min: 280, max: 640, noNaN: true }), fc.double({ min: -0.02, max: 0.02, noNaN: true }), (T, f) => {
        fc.pre(Math.abs(f) > 1e-9);
        saturationAtT(ctx, T, l, v);
        const p = l.p * (1 + f);
        expect(stateFromPT(ctx, p, T, a)).toBe(Status.ok);
        // the other (metastable) branch: Newton on p(ρ) from the other saturated density
        let rho = f > 0 ? v.rho : l.rho;
        for (let i = 0; i < 50; i++) {
          propertiesAt(ctx, T, rho, b);
          rho -= (b.p - p) / b.dpdrho;
        }
        propertiesAt(ctx, T, rho, b);
        // where the other branch has a root of its own (not beyond its spinodal), it lies higher in g
        if (Math.abs(b.p / p - 1) < 1e-10 && b.dpdrho > 0 && Math.abs(b.rho / a.rho - 1) > 1e-3) expect(a.g).toBeLessThan(b.g);
        expect(a.phase).toBe(f > 0 ? FLUID_PHASE.liquid : FLUID_PHASE.vapor);
      }),
      { numRuns: 100 },
    );
  });
});

describe('round trips of every flash (fast-check, 1e-9)', () => {
  it('(p, T) → (T, ρ), (T, v), (p, h), (p, s), (h, s)', () => {
    fc.assert(
      fc.property(states, ({ T, p }) => {
        expect(stateFromPT(ctx, p, T, a)).toBe(Status.ok);
        // p from ρ is as good as ρ: (∂p/∂ρ)·ρ·1e-13 (the liquid at low pressure is stiff)
        const pTol = { rel: 1e-9, abs: 1e-13 * a.rho * a.dpdrho };
        expect(stateFromTRho(ctx, T, a.rho, b)).toBe(Status.ok);
        expectClose(b.p, p, pTol);
        expect(stateFromTV(ctx, T, a.v, b)).toBe(Status.ok);
        expectClose(b.p, p, pTol);
        expect(stateFromPH(ctx, p, a.h, b)).toBe(Status.ok);
        expectClose(b.T, T, { rel: 1e-9 });
        expect(stateFromPS(ctx, p, a.s, b)).toBe(Status.ok);
        expectClose(b.T, T, { rel: 1e-9 });
        expect(stateFromHS(ctx, a.h, a.s, b)).toBe(Status.ok);
        expectClose(b.p, p, pTol);
        expectClose(b.T, T, { rel: 1e-9 });
      }),
      { numRuns: 100 },
    );
  });

  it('two-phase: (T, x) → (p, h), (p, s), (p, x), (T, v), (h, s)', () => {
    fc.assert(
      fc.property(fc.double({ min: 274, max: 645, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), (T, x) => {
        expect(stateFromTX(ctx, T, x, a)).toBe(Status.ok);
        expect(Number.isNaN(a.cp) && Number.isNaN(a.cv) && Number.isNaN(a.w)).toBe(true); // IF97 convention: computed, cp, cv, w not defined
        expect(a.phase).toBe(FLUID_PHASE.twoPhase);
        const { p, h, s } = a;
        expect(stateFromPH(ctx, p, h, b)).toBe(Status.ok);
        expectClose(b.x, x, { abs: 1e-9 });
        expectClose(b.T, T, { rel: 1e-9 });
        expect(stateFromPS(ctx, p, s, b)).toBe(Status.ok);
        expectClose(b.x, x, { abs: 1e-9 });
        expect(stateFromPX(ctx, p, x, b)).toBe(Status.ok);
        expectClose(b.T, T, { rel: 1e-9 });
        expectClose(b.h, h, { rel: 1e-9 });
        expect(stateFromTV(ctx, T, a.v, b)).toBe(Status.ok);
        expectClose(b.x, x, { abs: 1e-9 });
        expect(stateFromHS(ctx, h, s, b)).toBe(Status.ok);
        expectClose(b.T, T, { rel: 1e-9 });
        expectClose(b.x, x, { abs: 1e-8 });
      }),
      { numRuns: 60 },
    );
  });
});

describe('bad input gives a status, never NaN', () => {
  it.each([
    ['T below the triple point', () => stateFromPT(ctx, 1e5, 250, a), Status.outOfRange],
    ['T above 1273 K', () => stateFromPT(ctx, 1e5, 1300, a), Status.outOfRange],
    ['p above 1000 MPa', () => stateFromPT(ctx, 1.1e9, 300, a), Status.outOfRange],
    ['p = 0', () => stateFromPT(ctx, 0, 300, a), Status.outOfRange],
    ['NaN', () => stateFromPT(ctx, NaN, 300, a), Status.invalidInput],
    ['x > 1', () => stateFromTX(ctx, 300, 1.5, a), Status.outOfRange],
    ['saturation above Tc', () => saturationAtT(ctx, 650, l, v), Status.outOfRange],
    ['h far above the range', () => stateFromPH(ctx, 1e5, 1e8, a), Status.outOfRange],
  ])('%s', (_name, call, status) => expect(call()).toBe(status));
});

/**
 * IAPWS-IF97 against IAPWS-95. Limits, from memory (the permissible differences set for IF97's
 * development, W. Wagner et al., J. Eng. Gas Turbines Power 122 (2000) 150, Table 3, as recalled):
 * |Δv/v| ≤ 0.05 %, |Δcp/cp| ≤ 1 %, |Δw/w| ≤ 1 % in regions 1, 2 and 5; |Δp_s/p_s| ≤ 0.05 %.
 * For h, s and the region 3 pressure no stated figure could be recalled with confidence: the bounds
 * there are this code's measured maxima (3000 random states per region) rounded up, a regression
 * bound, not a published one (measured: region 1 |Δh| 0.24 kJ/kg, |Δs| 0.43 J/(kg·K); region 2
 * 0.40 kJ/kg, 0.39 J/(kg·K); region 5 0.27 kJ/kg, 0.17 J/(kg·K); region 3 |Δp/p| 0.105 %).
 */
describe('IAPWS-IF97 (src/water/if97) stays within its stated distance of IAPWS-95', () => {
  const w = new WaterProperties();
  const compare = (p: number, T: number, f: (p: number, T: number, o: WaterProperties) => WaterProperties, dh = 500, ds = 0.5) => {
    expect(stateFromPT(ctx, p, T, a)).toBe(Status.ok);
    f(p, T, w);
    expectClose(w.v, a.v, { rel: 5e-4 });
    expectClose(w.h, a.h, { abs: dh });
    expectClose(w.s, a.s, { abs: ds });
    expectClose(w.cp, a.cp, { rel: 0.01 });
    expectClose(w.w, a.w, { rel: 0.01 });
  };
  it('region 1: 273.16–623.15 K, p_s(T) to 100 MPa', () => {
    fc.assert(
      fc.property(fc.double({ min: 273.16, max: 623.15, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (T, f) => {
        const ps = saturationPressure(T) * 1.001;
        compare(ps + f * (100e6 - ps), T, region1, 300, 0.5);
      }),
      { numRuns: 200 },
    );
  });
  it('region 2: below p_s(T) to 623.15 K, to 16.5 MPa to 863.15 K, to 100 MPa to 1073.15 K', () => {
    fc.assert(
      fc.property(fc.double({ min: 273.16, max: 1073.15, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (T, f) => {
        const top = T <= 623.15 ? saturationPressure(T) * 0.999 : T <= 863.15 ? 16.5e6 : 100e6;
        compare(Math.exp(Math.log(611) + f * (Math.log(top) - Math.log(611))), T, region2);
      }),
      { numRuns: 200 },
    );
  });
  it('region 5: 1073.15–1273 K to 50 MPa', () => {
    fc.assert(
      fc.property(fc.double({ min: 1073.15, max: 1273, noNaN: true }), fc.double({ min: Math.log(611), max: Math.log(50e6), noNaN: true }), (T, lp) => compare(Math.exp(lp), T, region5, 300, 0.2)),
      { numRuns: 100 },
    );
  });
  it('region 3: pressure at (ρ, T), 623.15–660 K, 23–100 MPa', () => {
    fc.assert(
      fc.property(fc.double({ min: 623.15, max: 660, noNaN: true }), fc.double({ min: 200, max: 750, noNaN: true }), (T, rho) => {
        region3(rho, T, w);
        fc.pre(w.p >= 23e6 && w.p <= 100e6);
        propertiesAt(ctx, T, rho, a);
        expectClose(w.p, a.p, { rel: 1.2e-3 });
      }),
      { numRuns: 200 },
    );
  });
  it('saturation pressure (region 4), 273.16–647 K', () => {
    for (let T = 273.16; T < 647; T += 3.3) {
      saturationAtT(ctx, T, l, v);
      expectClose(saturationPressure(T), l.p, { rel: 5e-4 });
    }
  });
});
