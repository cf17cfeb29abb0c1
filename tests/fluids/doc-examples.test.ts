/**
 * The `//=>` values of the doc comments of src/fluids (facade and SI core), executed: a doc comment
 * cannot go stale. Each value is also a check against its outside source where one is named.
 */
import { describe, expect, it } from 'vitest';
import { FLUID_PHASE, FluidContext, FluidState, fluidModel, propertiesAt, saturationAtP, saturationAtT, stateFromHS, stateFromPH, stateFromPS, stateFromPT, stateFromPX, stateFromTRho, stateFromTV, stateFromTX } from '../../src/fluids/core.js';
import { fluid, fluidBatch, fluidNames, saturationTable } from '../../src/fluids/index.js';
import { expectClose } from '../helpers/tolerance.js';

/** `//=> 10.0003858...`: the printed digits are a prefix of the value. */
const starts = (x: number, printed: string) => expect(String(x).startsWith(printed.replace(/\.\.\.$/, ''))).toBe(true);

describe('SI core examples (heatstate/fluids/core)', () => {
  const ctx = new FluidContext(fluidModel('water')!);
  const out = new FluidState();
  const l = new FluidState();
  const v = new FluidState();
  it('propertiesAt, saturationAtT, saturationAtP', () => {
    expect(propertiesAt(ctx, 500, 838.025, out)).toBe(0);
    starts(out.p, '10000385.80092');
    starts(out.w, '1271.28440914');
    expect(propertiesAt(ctx, 500, -1, out)).toBe(3);
    expect(saturationAtT(ctx, 450, l, v)).toBe(0);
    starts(l.p, '932203.56362');
    starts(v.rho, '4.81200360');
    expect(saturationAtT(ctx, 700, l, v)).toBe(1);
    expect(saturationAtP(ctx, 101325, l, v)).toBe(0);
    starts(l.T, '373.12429584');
    starts(v.h - l.h, '2256471.59');
  });
  it('the flashes', () => {
    expect(stateFromPT(ctx, 101325, 300, out)).toBe(0);
    starts(out.rho, '996.556935');
    expect(out.phase).toBe(FLUID_PHASE.liquid);
    expect(stateFromPT(ctx, 101325, 200, out)).toBe(1);
    expect(stateFromTX(ctx, 373.15, 0.5, out)).toBe(0);
    starts(out.p, '101417.99665');
    expect(out.cp).toBeNaN();
    expect(stateFromPX(ctx, 1e6, 1, out)).toBe(0);
    starts(out.T, '453.02800788');
    expect(stateFromTRho(ctx, 647, 358, out)).toBe(0);
    starts(out.p, '22038475.5706');
    expect(stateFromTRho(ctx, 400, 10, out)).toBe(0);
    starts(out.x, '0.13567821');
    expect(out.phase).toBe(FLUID_PHASE.twoPhase);
    expect(stateFromTV(ctx, 300, 1e-3, out)).toBe(0);
    starts(out.p, '7833001.35');
    expect(stateFromPH(ctx, 1e6, 3e6, out)).toBe(0);
    starts(out.T, '549.16849785');
    expect(out.phase).toBe(FLUID_PHASE.vapor);
    expect(stateFromPH(ctx, 101325, 1.5e6, out)).toBe(0);
    starts(out.x, '0.47904093');
    expect(stateFromPS(ctx, 1e5, 7000, out)).toBe(0);
    starts(out.T, '372.75592889');
    starts(out.x, '0.94074577');
    expect(stateFromHS(ctx, 3e6, 7000, out)).toBe(0);
    expectClose(out.p, 1075561.49511, { rel: 1e-9 });
    expectClose(out.T, 550.23690782, { rel: 1e-9 });
    expect(fluidModel('water')!.Tc).toBe(647.096);
    expect(fluidModel('nope')).toBeUndefined();
  });
});

describe('facade examples (heatstate/fluids)', () => {
  it('fluid, fluidNames', () => {
    const water = fluid('R-718');
    starts(water.state({ T: '500 K', rho: '838.025 kg/m³' }).p.in('MPa'), '10.0003858');
    starts(water.saturation({ p: '101.325 kPa' }).T.in('K'), '373.1242958');
    starts(water.state({ T: '150 °C', p: '1 bar' }).superheat!.in('K'), '50.3940');
    expect(water.state({ p: '1 bar', x: 0.5 }).cp).toBeUndefined();
    expect(() => water.state({ T: '1300 K', p: '1 bar' })).toThrow('T = 1300 K is above the upper limit of IAPWS-95 (water) (1273 K); valid range 273.16 to 1273 K');
    expect(() => fluid('R-7180')).toThrow(/did you mean "R-718", "R718"/);
    expect(fluidNames()).toEqual(['water', 'nitrogen']);
  });
  it('fluidBatch', () => {
    const r = fluidBatch('water', { p: Float64Array.of(1e5, 1e5), h: Float64Array.of(4e5, 1.5e6) }, ['T', 'x', 'cp']);
    starts(r.T[0]!, '368.601');
    starts(r.T[1]!, '372.755');
    expect(r.x[0]).toBeNaN();
    starts(r.x[1]!, '0.47952');
    expect([...r.status]).toEqual([0, 4]);
  });
  it('saturationTable', () => {
    const t = saturationTable('water', { by: 'T', from: '0.01 °C', to: '370 °C', step: '10 K' });
    starts(t.lookup('p', '100 °C').value.in('kPa'), '101.4229');
    expect(t.data.interpolationError?.hfg?.linear?.maxRelative).toBe(0.039);
    expect(t.data.interpolationError?.hfg?.linear?.at).toBe('T = 365.005 °C');
    starts(saturationTable('water', { by: 'p', from: '5 psia', to: '3000 psia', step: '5 psia', units: 'US' }).lookup('T', '14.7 psia').value.in('°F'), '211.798');
  });
});
