/**
 * IAPWS R6-95(2018), Revised Release on the IAPWS Formulation 1995 for the Thermodynamic Properties
 * of Ordinary Water Substance for General and Scientific Use: the computer-program verification
 * tables, every value to its printed 9 significant digits. Units as printed: p in MPa, ρ in kg/m³,
 * cv, s in kJ/(kg·K), w in m/s, h in kJ/kg.
 *
 * The table values below were recalled from memory (the release was not at hand), like the
 * coefficients in data/fluids/water.json; agreement of the two recollections to every printed digit
 * at 27 states is the check that both are right.
 */
import { describe, expect, it } from 'vitest';
import { waterModel } from '../../src/fluids/catalogue.js';
import { FluidContext, FluidState, propertiesAt } from '../../src/fluids/model.js';
import { saturationAtT } from '../../src/fluids/saturation.js';
import { Status } from '../../src/core/status.js';
import { expectClose } from '../helpers/tolerance.js';

/** Printed to 9 significant digits: agree within half a unit in the 9th digit. */
const nine = (actual: number, printed: number) => expectClose(actual, printed, { rel: 5.0001e-9 });
const model = waterModel();
const ctx = new FluidContext(model);

describe('Table 6: ideal-gas and residual parts at T = 500 K, ρ = 838.025 kg/m³ (from memory)', () => {
  const delta = 838.025 / 322;
  const tau = 647.096 / 500;
  const r = new Float64Array(6);
  const o = new Float64Array(3);
  model.residual(delta, tau, r);
  model.ideal(tau, o);
  it.each([
    ['φ°', Math.log(delta) + o[0]!, 0.204797733e1],
    ['φ°_δ', 1 / delta, 0.384236747],
    ['φ°_δδ', -1 / (delta * delta), -0.147637878],
    ['φ°_τ', o[1]!, 0.904611106e1],
    ['φ°_ττ', o[2]!, -0.193249185e1],
    ['φʳ', r[0]!, -0.342693206e1],
    ['φʳ_δ', r[1]!, -0.364366650],
    ['φʳ_δδ', r[2]!, 0.856063701],
    ['φʳ_τ', r[3]!, -0.581403435e1],
    ['φʳ_ττ', r[4]!, -0.223440737e1],
    ['φʳ_δτ', r[5]!, -0.112176915e1],
  ])('%s', (_name, actual, printed) => nine(actual, printed));
});

describe('Table 7: single-phase states (from memory)', () => {
  const out = new FluidState();
  it.each([
    [300, 0.9965560e3, 0.992418352e-1, 0.413018112e1, 0.150151914e4, 0.393062643],
    [300, 0.1005308e4, 0.200022515e2, 0.406798347e1, 0.153492501e4, 0.387405401],
    [300, 0.1188202e4, 0.700004704e3, 0.346135580e1, 0.244357992e4, 0.132609616],
    [500, 0.4350000, 0.999679423e-1, 0.150817541e1, 0.548314253e3, 0.794488271e1],
    [500, 0.4532000e1, 0.999938125, 0.166991025e1, 0.535739001e3, 0.682502725e1],
    [500, 0.8380250e3, 0.100003858e2, 0.322106219e1, 0.127128441e4, 0.256690919e1],
    [500, 0.1084564e4, 0.700000405e3, 0.307437693e1, 0.241200877e4, 0.203237509e1],
    [647, 0.3580000e3, 0.220384756e2, 0.618315728e1, 0.252145078e3, 0.432092307e1],
    [900, 0.2410000, 0.100062559, 0.175890657e1, 0.724027147e3, 0.916653194e1],
    [900, 0.5261500e2, 0.200000690e2, 0.193510526e1, 0.698445674e3, 0.659070225e1],
    [900, 0.8707690e3, 0.700000006e3, 0.266422350e1, 0.201933608e4, 0.417223802e1],
  ])('T = %d K, ρ = %d kg/m³', (T, rho, p, cv, w, s) => {
    expect(propertiesAt(ctx, T, rho, out)).toBe(Status.ok);
    nine(out.p / 1e6, p);
    nine(out.cv / 1e3, cv);
    nine(out.w, w);
    nine(out.s / 1e3, s);
  });
});

describe('Table 8: saturation (from memory)', () => {
  const l = new FluidState();
  const v = new FluidState();
  it.each([
    [275, 0.698451167e-3, 0.999887406e3, 0.550664919e-2, 0.775972202e1, 0.250428995e4, 0.283094670e-1, 0.910660121e1],
    [450, 0.932203564, 0.890341250e3, 0.481200360e1, 0.749161585e3, 0.277441078e4, 0.210865845e1, 0.660921221e1],
    [625, 0.169082693e2, 0.567090385e3, 0.118290280e3, 0.168626976e4, 0.255071625e4, 0.380194683e1, 0.518506121e1],
  ])('T = %d K', (T, p, rhoL, rhoV, hL, hV, sL, sV) => {
    expect(saturationAtT(ctx, T, l, v)).toBe(Status.ok);
    nine(l.p / 1e6, p);
    nine(v.p / 1e6, p);
    nine(l.rho, rhoL);
    nine(v.rho, rhoV);
    nine(l.h / 1e3, hL);
    nine(v.h / 1e3, hV);
    nine(l.s / 1e3, sL);
    nine(v.s / 1e3, sV);
  });
});
