/**
 * Processes: conservation of dry air, water and energy (the balances of ASHRAE Fundamentals ch. 1,
 * "typical air-conditioning processes"), loads and their signs, and refusals.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { humidAir, OutOfRangeError } from '../../src/humid-air/index.js';
import { HumidAirState, humidAirStateSI, mixStreams, PAIR } from '../../src/humid-air/core/index.js';
import { water } from '../../src/water/index.js';
import { Status } from '../../src/core/status.js';
import { quantity } from '../../src/units/quantity.js';
import { expectClose } from '../helpers/tolerance.js';

const outdoor = humidAir.state({ T: '32 °C', RH: 0.5 });
const ret = humidAir.state({ T: '24 °C', RH: 0.5 });

describe('adiabatic mixing', () => {
  it('conserves W and h: flow-weighted means (mass and energy balances), for random streams', () => {
    const out = new HumidAirState();
    const a = new HumidAirState();
    const b = new HumidAirState();
    fc.assert(
      fc.property(
        fc.double({ min: 250, max: 320, noNaN: true }), fc.double({ min: 0, max: 0.9, noNaN: true }),
        fc.double({ min: 250, max: 320, noNaN: true }), fc.double({ min: 0, max: 0.9, noNaN: true }),
        fc.double({ min: 0.01, max: 10, noNaN: true }), fc.double({ min: 0.01, max: 10, noNaN: true }),
        (T1, RH1, T2, RH2, m1, m2) => {
          humidAirStateSI(PAIR.T_RH, T1, RH1, 101325, false, a);
          humidAirStateSI(PAIR.T_RH, T2, RH2, 101325, false, b);
          const s = mixStreams(101325, Float64Array.of(a.W, b.W), Float64Array.of(a.h, b.h), Float64Array.of(m1, m2), 2, true, out);
          if (s === Status.outOfRange) return; // fog: the straight line crosses the saturation curve
          expect([Status.ok, Status.undefinedProperty]).toContain(s); // dry air (W = 0) has no dew point
          expectClose((m1 + m2) * out.W, m1 * a.W + m2 * b.W, { rel: 1e-12, abs: 1e-15 });
          expectClose((m1 + m2) * out.h, m1 * a.h + m2 * b.h, { rel: 1e-12, abs: 1e-6 });
          expect(out.T).toBeGreaterThanOrEqual(Math.min(T1, T2) - 0.5);
          expect(out.T).toBeLessThanOrEqual(Math.max(T1, T2) + 0.5);
        },
      ),
      { numRuns: 200 },
    );
  });
  it('refuses a foggy mixture (cold saturated with warm saturated air)', () => {
    const cold = humidAir.state({ T: '0 °C', RH: 1 });
    const warm = humidAir.state({ T: '40 °C', RH: 1 });
    const e = (() => {
      try {
        humidAir.mix([{ state: cold, flow: '1 kg/s' }, { state: warm, flow: '1 kg/s' }]);
      } catch (x) {
        return x as OutOfRangeError;
      }
      return undefined;
    })()!;
    expect(e).toBeInstanceOf(OutOfRangeError);
    expect(e.message).toMatch(/fog/);
    // the limit is the W of saturated air with the mixture's enthalpy, below the mixture's W
    expectClose(e.range.value, (cold.W.si + warm.W.si) / 2, { rel: 1e-12 });
    expect(e.range.max).toBeLessThan(e.range.value);
    expect(e.range.max).toBeGreaterThan(0);
  });
  it('refuses streams at different pressures', () => {
    const high = humidAir.state({ T: '24 °C', RH: 0.5, p: '105 kPa' });
    expect(() => humidAir.mix([{ state: outdoor, flow: '1 kg/s' }, { state: high, flow: '1 kg/s' }])).toThrow(/same total pressure/);
  });
});

describe('sensible heating and cooling', () => {
  it('heating to T2 at constant W: sensible = total = ṁa (1006 + 1860 W) ΔT, latent 0, SHR 1', () => {
    const r = humidAir.heat({ inlet: ret, flow: '2 kg/s', T2: '35 °C' });
    expect(r.leaving.W.si).toBe(ret.W.si);
    expectClose(r.sensible.si, 2 * (1006 + 1860 * ret.W.si) * 11, { rel: 1e-9 });
    expectClose(r.total.si, r.sensible.si, { rel: 1e-12 });
    expectClose(r.latent.si, 0, { abs: 1e-6 });
    expectClose(r.sensibleHeatRatio!, 1, { rel: 1e-12 });
    expect(r.heat.si).toBe(r.total.si);
  });
  it('by a heat flow Q: h2 = h1 + Q/ṁa', () => {
    const r = humidAir.heat({ inlet: ret, flow: '2 kg/s', Q: '-10 kW' });
    expectClose(r.leaving.h.si, ret.h.si - 5000, { rel: 1e-12 });
    expectClose(r.heat.si, -10000, { rel: 1e-9 });
  });
  it('refuses sensible cooling below the dew point', () => {
    expect(() => humidAir.heat({ inlet: ret, flow: '1 kg/s', T2: '5 °C' })).toThrow(/dew point/);
    // the lowest leaving temperature is the entering dew point, in the caller's units
    expect(() => humidAir.heat({ inlet: ret, flow: '1 kg/s', T2: '40 °F' })).toThrow(new RegExp(`T2 = 40 °F .* is below the lower limit .* \\(${ret.Tdp!.in('°F').toPrecision(8).replace(/0+$/, '').replace('.', '\\.')}`));
    expect(() => humidAir.heat({ inlet: ret, flow: '1 kg/s', Q: '-100 kW' })).toThrow(/Q = -100 kW .* is below the lower limit/);
  });
});

describe('cooling coil', () => {
  const mixed = humidAir.mix([{ state: outdoor, flow: '1 kg/s' }, { state: ret, flow: '3 kg/s' }]).leaving;
  it('bypass: leaving W and h on the line to the ADP at fraction BF; water and energy balances close', () => {
    const adp = humidAir.state({ T: '10 °C', RH: 1 });
    const r = humidAir.coolingCoil({ inlet: mixed, flow: '4 kg/s', ADP: '10 °C', bypassFactor: 0.15 });
    expectClose(r.leaving.W.si, adp.W.si + 0.15 * (mixed.W.si - adp.W.si), { rel: 1e-12 });
    expectClose(r.leaving.h.si, adp.h.si + 0.15 * (mixed.h.si - adp.h.si), { rel: 1e-12 });
    // condensate: ṁw = ṁa (W1 − W2), at the ADP with its IAPWS-IF97 liquid enthalpy
    expectClose(-r.water!.flow.si, 4 * (mixed.W.si - r.leaving.W.si), { rel: 1e-12 });
    const hw = water.state({ T: '10 °C', p: '101.325 kPa' }).h.si;
    expectClose(r.water!.h.si, hw, { rel: 1e-12 });
    // energy: ṁa h1 + Q = ṁa h2 + ṁc hc
    expectClose(4 * mixed.h.si + r.heat.si, 4 * r.leaving.h.si + -r.water!.flow.si * hw, { rel: 1e-12 });
    expect(r.heat.si).toBeLessThan(0);
    expect(r.sensibleHeatRatio!).toBeGreaterThan(0.5);
    expect(r.sensibleHeatRatio!).toBeLessThan(1);
    // 1 ton of refrigeration = 12 000 Btu/h (common practice): a coil of this size is about 20 TR
    expect(-r.heat.in('TR')).toBeGreaterThan(15);
  });
  it('to a leaving state (T2, RH2)', () => {
    const r = humidAir.coolingCoil({ inlet: mixed, flow: '4 kg/s', T2: '13 °C', RH2: '90 %' });
    expectClose(r.leaving.T.in('°C'), 13, { rel: 1e-12 });
    expectClose(r.leaving.RH, 0.9, { rel: 1e-12 });
    expectClose(r.latent.si, r.total.si - r.sensible.si, { rel: 1e-12 });
  });
  it('refuses an ADP above the entering dew point (it would humidify) and BF ≥ 1', () => {
    expect(() => humidAir.coolingCoil({ inlet: mixed, flow: '1 kg/s', ADP: '20 °C', bypassFactor: 0.1 })).toThrow(/ADP = 20 °C .* is above the upper limit of a cooling coil on air with dew point/);
    expect(() => humidAir.coolingCoil({ inlet: mixed, flow: '1 kg/s', ADP: '10 °C', bypassFactor: 1 })).toThrow(/bypassFactor = 1 is outside 0 ≤ BF < 1/);
    expect(() => humidAir.coolingCoil({ inlet: mixed, flow: '1 kg/s', T2: '20 °C', RH2: 0.95 })).toThrow(/RH2 = 0\.95 is above the upper limit/);
    expect(() => humidAir.coolingCoil({ inlet: mixed, flow: '1 kg/s', T2: '30 °C', RH2: 0.5 })).toThrow(/T2 = 30 °C .* is above the upper limit/);
  });
});

describe('humidifiers', () => {
  const winter = humidAir.state({ T: '20 °C', RH: 0.2 });
  it('steam: h2 = h1 + (W2 − W1) h_steam (IF97 region 2), heat 0, to the target RH', () => {
    const r = humidAir.steamHumidifier({ inlet: winter, flow: '2 kg/s', RH2: 0.45, steam: { p: '101.325 kPa', T: '110 °C' } });
    const hs = water.state({ p: '101.325 kPa', T: '110 °C' }).h.si;
    expectClose(r.water!.h.si, hs, { rel: 1e-12 });
    expectClose(r.leaving.RH, 0.45, { rel: 1e-9 });
    expectClose(r.leaving.h.si, winter.h.si + (r.leaving.W.si - winter.W.si) * hs, { rel: 1e-12 });
    expectClose(r.heat.si, 0, { abs: 1e-6 });
    expect(r.leaving.T.si).toBeGreaterThan(winter.T.si); // steam warms the air slightly
  });
  it('steam must be vapour', () => {
    expect(() => humidAir.steamHumidifier({ inlet: winter, flow: '1 kg/s', W2: 0.008, steam: { p: '200 kPa', T: '100 °C' } })).toThrow(/steam\.T = 100 °C .* is below the lower limit of steam at 200 kPa .*vapour/);
  });
  it('evaporative: leaving state to a target T2 on the line h2 = h1 + (W2 − W1) hw; air cools toward its wet-bulb', () => {
    const hot = humidAir.state({ T: '35 °C', RH: 0.2 });
    const r = humidAir.evaporativeHumidifier({ inlet: hot, flow: '1 kg/s', T2: '25 °C' });
    expectClose(r.leaving.T.in('°C'), 25, { rel: 1e-12 });
    expectClose(r.leaving.h.si, hot.h.si + (r.leaving.W.si - hot.W.si) * r.water!.h.si, { rel: 1e-12 });
    expect(r.leaving.Twb!.si).toBeGreaterThan(hot.Twb!.si - 0.05);
    expect(r.leaving.Twb!.si).toBeLessThan(hot.Twb!.si + 0.05);
    expectClose(r.water!.T.si, hot.Twb!.si, { rel: 1e-15 }); // default water at the entering wet-bulb
    const rh = humidAir.evaporativeHumidifier({ inlet: hot, flow: quantity(1, 'kg/s'), RH2: 0.9 });
    expectClose(rh.leaving.RH, 0.9, { rel: 1e-9 });
  });
  it('refuses a target below the entering humidity or beyond saturation', () => {
    expect(() => humidAir.evaporativeHumidifier({ inlet: winter, flow: '1 kg/s', W2: 0.001 })).toThrow(/W2 = 0\.001 kg\/kg is below the lower limit of the evaporative humidifier/);
    expect(() => humidAir.evaporativeHumidifier({ inlet: winter, flow: '1 kg/s', W2: '20 g/kg' })).toThrow(/W2 = 20 g\/kg .* is above the upper limit/);
    expect(() => humidAir.evaporativeHumidifier({ inlet: winter, flow: '1 kg/s', T2: '2 °C' })).toThrow(/T2 = 2 °C .* is below the lower limit/);
  });
});

describe('flows', () => {
  it('a volume flow is converted at the stream\'s own state: ṁa = V̇/v (v per kg dry air)', () => {
    const r = humidAir.heat({ inlet: ret, flow: '2 m³/s', T2: '30 °C' });
    expectClose(r.flow.si, 2 / ret.v.si, { rel: 1e-15 });
    const cfm = humidAir.heat({ inlet: ret, flow: '4000 ft³/min', T2: '30 °C' });
    expectClose(cfm.flow.si, (4000 * 0.3048 ** 3) / 60 / ret.v.si, { rel: 1e-12 });
  });
  it('refuses a flow that is not positive, naming it', () => {
    expect(() => humidAir.heat({ inlet: ret, flow: '0 kg/s', T2: '30 °C' })).toThrow(/flow = 0 kg\/s is .*dry-air mass flow/);
    expect(() => humidAir.mix([{ state: ret, flow: '1 kg/s' }, { state: ret, flow: '-1 kg/s' }])).toThrow(/streams\[1\]\.flow/);
  });
});
