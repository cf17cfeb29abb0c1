/**
 * The catalogue's liquid water (data/incompressible/water.json) against the IAPWS-IF97 core it is
 * generated from (IAPWS R7-97(2012), saturated liquid: region 4 p_s(T), region 1 cp and ρ).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { LIQUID_WATER_PATH, nodeTemperatures, renderLiquidWater, saturatedLiquid } from '../../scripts/generate-liquid-water.js';
import { OutOfRangeError } from '../../src/errors.js';
import { densityAt, incompressible } from '../../src/incompressible/index.js';
import { lookupIncompressible } from '../../src/incompressible/catalogue.js';
import { quantity } from '../../src/units/index.js';
import { expectClose } from '../helpers/tolerance.js';

const file = JSON.parse(readFileSync(LIQUID_WATER_PATH, 'utf8')) as { interpolationError: { atNodes: { c: { maxRelative: number } }; betweenNodes: { c: { maxRelative: number }; rho: { maxRelative: number } } } };

describe('liquid water from IAPWS-IF97 (saturated liquid, 0.01–350 °C)', () => {
  const water = incompressible('water');
  const { model } = lookupIncompressible('water');
  it('data/incompressible/water.json is current: regenerating from the IF97 core gives the committed file', () => {
    expect(readFileSync(LIQUID_WATER_PATH, 'utf8')).toBe(renderLiquidWater());
  });
  it('at the nodes c and ρ are IF97 to the stored 7 digits', () => {
    for (const t of nodeTemperatures()) {
      const exact = saturatedLiquid(t + 273.15);
      expectClose(water.c(quantity(t, '°C')).si, exact.cp, { rel: 6e-7 });
      expectClose(densityAt(model, t + 273.15), exact.rho, { rel: 6e-7 });
    }
  });
  it('between the nodes linear interpolation is within 0.025 % of IF97 in c and 0.006 % in ρ (the figures the file states)', () => {
    let cErr = 0;
    let rhoErr = 0;
    const T = nodeTemperatures();
    for (let i = 0; i + 1 < T.length; i++) {
      for (const f of [0.17, 0.5, 0.83]) {
        const t = T[i]! + f * (T[i + 1]! - T[i]!) + 273.15;
        const exact = saturatedLiquid(t);
        cErr = Math.max(cErr, Math.abs(water.c(quantity(t, 'K')).si - exact.cp) / exact.cp);
        rhoErr = Math.max(rhoErr, Math.abs(densityAt(model, t) - exact.rho) / exact.rho);
      }
    }
    expect(cErr).toBeLessThan(2.5e-4);
    expect(rhoErr).toBeLessThan(6e-5);
    expect(cErr).toBeLessThanOrEqual(file.interpolationError.betweenNodes.c.maxRelative * 1.0001);
  });
  it("deltaU('50 °F', '300 °F') is ∫cp dT of IF97 saturated liquid within 0.01 % (Simpson's rule on the IF97 core)", () => {
    const a = quantity(50, '°F').si;
    const b = quantity(300, '°F').si;
    const n = 400;
    let sum = 0;
    for (let k = 0; k <= n; k++) sum += (k === 0 || k === n ? 1 : k % 2 === 1 ? 4 : 2) * saturatedLiquid(a + ((b - a) * k) / n).cp;
    expectClose(water.deltaU('50 °F', '300 °F').si, (sum * (b - a)) / n / 3, { rel: 1e-4 });
  });
  it('docs/guide/choosing-a-model.md states the interpolation error the file records', () => {
    const guide = readFileSync(new URL('../../docs/guide/choosing-a-model.md', import.meta.url), 'utf8');
    const pct = (x: number) => `${Number((x * 100).toPrecision(2))} %`;
    expect(guide).toContain(`at most ${pct(file.interpolationError.betweenNodes.c.maxRelative)} in c`);
    expect(guide).toContain(`and ${pct(file.interpolationError.betweenNodes.rho.maxRelative)} in ρ`);
  });
  it('beyond 350 °C the error points to heatstate/water', () => {
    expect(() => water.c('360 °C')).toThrow(OutOfRangeError);
    expect(() => water.c('360 °C')).toThrow(/use heatstate\/water/);
  });
  it('Δh = Δu + v(T2)·(p2 − p_ref) − v(T1)·(p1 − p_ref), p_ref = 1 atm; at constant T it is v(T)·Δp', () => {
    const dh = water.deltaH({ T: '20 °C', p: '1 bar' }, { T: '60 °C', p: '10 bar' }).si;
    const expected = water.deltaU('20 °C', '60 °C').si + (1e6 - 101325) / densityAt(model, 333.15) - (1e5 - 101325) / densityAt(model, 293.15);
    expectClose(dh, expected, { rel: 1e-14 });
    expectClose(water.deltaH({ T: '80 °C', p: '1 bar' }, { T: '80 °C', p: '11 bar' }).si, 1e6 / saturatedLiquid(353.15).rho, { rel: 1e-6 });
  });
});
