/**
 * waterBatch with transport properties (mu, lambda, Pr, nu, alpha): against the states of
 * `water.state` (IAPWS R12-08 and R15-11 with their critical enhancements, inputs from IAPWS-95), and
 * the marking of elements the correlations do not cover.
 */
import { describe, expect, it } from 'vitest';
import { Quantity, quantity } from '../../src/units/index.js';
import { water, waterBatch } from '../../src/water/index.js';
import { Status } from '../../src/water/if97/index.js';
import { expectClose } from '../helpers/tolerance.js';

// (p [Pa], T [K]) over liquid, vapour, supercritical and near-critical states, region 5 below 1173.15 K
const STATES: readonly (readonly [number, number])[] = [
  [101325, 298.15],
  [101325, 373.15],
  [1e6, 453.0],
  [5e3, 320],
  [10e6, 550],
  [22.064e6, 647.096],
  [22.5e6, 650],
  [30e6, 700],
  [100e6, 300],
  [100e6, 1000],
  [20e6, 1100],
  [1e5, 1173],
  [611.657, 273.16],
];
const p = Float64Array.from(STATES, (s) => s[0]);
const T = Float64Array.from(STATES, (s) => s[1]);

describe('waterBatch: transport properties', () => {
  it('mu, lambda, Pr, nu and alpha equal water.state(...) to 1e-12 relative at every state', () => {
    const r = waterBatch({ p, T }, ['mu', 'lambda', 'Pr', 'nu', 'alpha']);
    STATES.forEach(([pi, Ti], i) => {
      const st = water.state({ p: quantity(pi, 'Pa'), T: quantity(Ti, 'K') });
      expect(r.status[i], `status at (${pi} Pa, ${Ti} K)`).toBe(Status.ok);
      expectClose(r.mu[i]!, st.mu!.si, { rel: 1e-12 });
      expectClose(r.lambda[i]!, st.lambda!.si, { rel: 1e-12 });
      expectClose(r.Pr[i]!, st.Pr!, { rel: 1e-12 });
      expectClose(r.nu[i]!, st.nu!.si, { rel: 1e-12 });
      expectClose(r.alpha[i]!, st.alpha!.si, { rel: 1e-12 });
    });
  });
  it('(p, h) and (p, s) batches give the same transport values as the states they flash to', () => {
    const ref = waterBatch({ p, T }, ['h', 's', 'mu', 'lambda']);
    const ph = waterBatch({ p, h: ref.h }, ['mu', 'lambda', 'Pr']);
    const ps = waterBatch({ p, s: ref.s }, ['mu', 'lambda']);
    STATES.forEach(([pi], i) => {
      const st = water.state({ p: quantity(pi, 'Pa'), h: quantity(ref.h[i]!, 'J/kg') });
      expectClose(ph.mu[i]!, st.mu!.si, { rel: 1e-12 });
      expectClose(ph.Pr[i]!, st.Pr!, { rel: 1e-12 });
      const sts = water.state({ p: quantity(pi, 'Pa'), s: Quantity.fromSI(ref.s[i]!, 'specificEntropy') });
      expectClose(ps.lambda[i]!, sts.lambda!.si, { rel: 1e-12 });
      expectClose(ps.mu[i]!, sts.mu!.si, { rel: 1e-12 });
    });
  });
  it('the thermodynamic columns of a transport request equal those of a plain request bit for bit', () => {
    const plain = waterBatch({ p, T }, ['h', 'rho', 'cp']);
    const mixed = waterBatch({ p, T }, ['h', 'rho', 'cp', 'mu']);
    expect(Array.from(mixed.h)).toEqual(Array.from(plain.h));
    expect(Array.from(mixed.rho)).toEqual(Array.from(plain.rho));
    expect(Array.from(mixed.cp)).toEqual(Array.from(plain.cp));
  });
  it('identities on every element: Pr = mu·cp/lambda, nu = mu/rho, alpha = lambda/(rho·cp)', () => {
    const r = waterBatch({ p, T }, ['mu', 'lambda', 'Pr', 'nu', 'alpha', 'rho', 'cp']);
    for (let i = 0; i < p.length; i++) {
      expectClose(r.Pr[i]!, (r.mu[i]! * r.cp[i]!) / r.lambda[i]!, { rel: 1e-15 });
      expectClose(r.nu[i]!, r.mu[i]! / r.rho[i]!, { rel: 1e-15 });
      expectClose(r.alpha[i]!, r.lambda[i]! / (r.rho[i]! * r.cp[i]!), { rel: 1e-15 });
    }
  });
  it('liquid water at 25 °C and 1 atm: mu = 890.0 µPa·s, lambda = 0.6065 W/(m·K) (from memory: handbook tables print 0.890 mPa·s and 0.607 W/(m·K))', () => {
    const r = waterBatch({ p: Float64Array.of(101325), T: Float64Array.of(298.15) }, ['mu', 'lambda']);
    expectClose(r.mu[0]!, 890.0e-6, { rel: 1e-3 });
    expectClose(r.lambda[0]!, 0.607, { rel: 2e-3 });
  });
  it('marks bad elements and carries on: above 1173.15 K out of range, two-phase undefined, NaN invalid', () => {
    const sat = water.saturation({ p: '1 MPa' });
    const hMid = 0.5 * (sat.liquid.h.si + sat.vapor.h.si);
    const r = waterBatch({ p: Float64Array.of(1e5, 1e5, NaN, 1e5, 40e6), T: Float64Array.of(300, 1200, 300, 1173.15, 1200) }, ['mu', 'h']);
    expect(Array.from(r.status)).toEqual([Status.ok, Status.outOfRange, Status.invalidInput, Status.ok, Status.outOfRange]);
    expect(Number.isNaN(r.mu[1]!) && Number.isNaN(r.h[1]!)).toBe(true);
    expect(r.mu[0]! > 0 && r.mu[3]! > 0).toBe(true);
    // a two-phase state: h is computed, mu (like cp) is not defined there
    const two = waterBatch({ p: Float64Array.of(1e6, 1e6), h: Float64Array.of(hMid, 3e6) }, ['h', 'lambda', 'Pr']);
    expect(two.status[0]).toBe(Status.undefinedProperty);
    expect(two.h[0]).toBe(hMid);
    expect(Number.isNaN(two.lambda[0]!) && Number.isNaN(two.Pr[0]!)).toBe(true);
    expect(two.status[1]).toBe(Status.ok);
    // the same 1200 K state without a transport property is fine: the range is the correlation's
    expect(waterBatch({ p: Float64Array.of(1e5), T: Float64Array.of(1200) }, ['h']).status[0]).toBe(Status.ok);
  });
});
