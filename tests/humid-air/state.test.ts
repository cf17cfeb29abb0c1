/**
 * humidAir.state and the SI core: identities of psychrometrics (each named), round trips between every
 * supported pair (fast-check), the wet-bulb energy balance, range and dependency errors, the batch.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { humidAir, humidAirBatch, InvalidInputError, OutOfRangeError, fromGrainsPerPound, fromGramsPerKilogram, toGramsPerKilogram } from '../../src/humid-air/index.js';
import { HumidAirState, humidAirStateSI, MODEL, PAIR, REASON, moistAirEnthalpy, saturatorWaterEnthalpy } from '../../src/humid-air/core/index.js';
import { Status } from '../../src/core/status.js';
import { quantity } from '../../src/units/quantity.js';
import { expectClose } from '../helpers/tolerance.js';

const P = 101325;
const st = new HumidAirState();
const ref = new HumidAirState();

function solve(pair: number, a: number, b: number, p: number, model: number, out = st): number {
  return humidAirStateSI(pair, a, b, p, model, true, out);
}

describe('identities', () => {
  it.each([-40, -10, 0, 0.01, 15, 30, 50])('at RH = 1 and %d °C: T = Twb = Tdp and W = Ws (definition of saturation)', (t) => {
    expect(solve(PAIR.T_RH, 273.15 + t, 1, P, MODEL.enhanced)).toBe(Status.ok);
    expect(st.Tdp).toBe(st.T);
    expectClose(st.Twb, st.T, { abs: 1e-9 });
    expect(st.W).toBe(st.Ws);
    expect(st.mu).toBe(1);
  });

  it('W(Tdp) = W, and Tdp ≤ Twb ≤ T, over random unsaturated states (definition of the dew point; wet-bulb between)', () => {
    fc.assert(
      fc.property(fc.double({ min: 193.2, max: 323.1, noNaN: true }), fc.double({ min: 0.02, max: 1, noNaN: true }), (T, RH) => {
        const s = solve(PAIR.T_RH, T, RH, P, MODEL.enhanced);
        if (s === Status.undefinedProperty) {
          // a dew point below the enhanced model's −80 °C is not defined there
          expect(st.reason).toBe(REASON.dewPointUndefined);
          return;
        }
        expect(s).toBe(Status.ok);
        const { W, Tdp, Twb } = st;
        expect(Tdp).toBeLessThanOrEqual(Twb + 1e-9);
        expect(Twb).toBeLessThanOrEqual(T);
        // skip the 59 mPa band between the ice branch's top and the liquid branch's bottom at 0 °C
        if (Math.abs(Tdp - 273.15) > 1e-6) {
          expect(solve(PAIR.T_RH, Tdp, 1, P, MODEL.enhanced, ref)).toBe(Status.ok);
          expectClose(ref.W, W, { rel: 1e-11 });
        }
      }),
      { numRuns: 300 },
    );
  });

  it('the thermodynamic wet-bulb satisfies the adiabatic-saturation balance h + (Ws* − W) hw = h(t*, Ws*) to 1e-9 (ASHRAE ch. 1)', () => {
    fc.assert(
      fc.property(fc.double({ min: 173.2, max: 473.1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (T, RH) => {
        const s = solve(PAIR.T_RH, T, RH, P, MODEL.ideal);
        if (s === Status.outOfRange) return; // above the boiling point RH·pws may exceed p
        expect([Status.ok, Status.undefinedProperty]).toContain(s);
        const { W, h, Twb } = st;
        if (Math.abs(Twb - 273.15) < 1e-6) return; // the 0 °C band where water and ice coexist in the saturator
        expect(solve(PAIR.T_RH, Twb, 1, P, MODEL.ideal, ref)).toBe(Status.ok);
        const lhs = h + (ref.W - W) * saturatorWaterEnthalpy(Twb);
        const rhs = moistAirEnthalpy(Twb, ref.W);
        expectClose(lhs, rhs, { rel: 1e-9, abs: 1e-9 * 2.5e6 * ref.W + 1e-6 });
      }),
      { numRuns: 300 },
    );
  });

  it('h is that of ASHRAE Eq. 32 and v of Eq. 28 (t = 30 °C, W = 0.015)', () => {
    solve(PAIR.T_W, 303.15, 0.015, P, MODEL.enhanced);
    expectClose(st.h, 1006 * 30 + 0.015 * (2501e3 + 1860 * 30), { rel: 1e-15 });
    expectClose(st.v, (287.042 * 303.15 * (1 + 1.607858 * 0.015)) / P, { rel: 1e-15 });
    expectClose(st.rho, 1.015 / st.v, { rel: 1e-15 });
  });
});

// every pair the core supports, with the keys of its inputs
const pairs: [string, number, keyof HumidAirState, keyof HumidAirState][] = [
  ['T_RH', PAIR.T_RH, 'T', 'RH'],
  ['T_W', PAIR.T_W, 'T', 'W'],
  ['T_h', PAIR.T_h, 'T', 'h'],
  ['T_Tdp', PAIR.T_Tdp, 'T', 'Tdp'],
  ['T_Twb', PAIR.T_Twb, 'T', 'Twb'],
  ['RH_W', PAIR.RH_W, 'RH', 'W'],
  ['RH_h', PAIR.RH_h, 'RH', 'h'],
  ['RH_Tdp', PAIR.RH_Tdp, 'RH', 'Tdp'],
  ['RH_Twb', PAIR.RH_Twb, 'RH', 'Twb'],
  ['W_h', PAIR.W_h, 'W', 'h'],
  ['W_Twb', PAIR.W_Twb, 'W', 'Twb'],
  ['h_Tdp', PAIR.h_Tdp, 'h', 'Tdp'],
  ['h_Twb', PAIR.h_Twb, 'h', 'Twb'],
  ['Tdp_Twb', PAIR.Tdp_Twb, 'Tdp', 'Twb'],
];

describe.each([
  ['enhanced', MODEL.enhanced, 193.2, 323.1, P, P],
  ['ideal', MODEL.ideal, 173.2, 400, 5e4, 1e6],
])('round trips to 1e-9, %s model', (_name, model, Tlo, Thi, plo, phi) => {
  it.each(pairs)('(T, RH) → %s → the same state', (_label, pair, ka, kb) => {
    fc.assert(
      fc.property(fc.double({ min: Tlo, max: Thi, noNaN: true }), fc.double({ min: 0.03, max: 1, noNaN: true }), fc.double({ min: plo, max: phi, noNaN: true }), (T, RH, p) => {
        const s0 = solve(PAIR.T_RH, T, RH, p, model, ref);
        if (s0 !== Status.ok) return;
        // the 0 °C seams: saturation switches from ice to liquid, the saturator's water from ice to liquid
        for (const t of [ref.T, ref.Tdp, ref.Twb]) if (Math.abs(t - 273.15) < 1e-3) return;
        if (Math.abs(ref.Tdp - Tlo) < 0.06) return; // a dew point at the floor of the range may round below it
        // (h, Twb) gives W = (h − K(t*))/hw(t*): nearly dependent where hw → 0 (t* → 0 °C over liquid);
        // the reference t* is exact to ~1e-13 K, so W keeps 1e-9 only where hw·W ≥ 1 J/kg
        if (pair === PAIR.h_Twb && Math.abs(saturatorWaterEnthalpy(ref.Twb) * ref.W) < 1) return;
        const s = solve(pair, ref[ka] as number, ref[kb] as number, p, model);
        expect(s).toBe(Status.ok);
        expectClose(st.T, ref.T, { rel: 1e-9 });
        expectClose(st.W, ref.W, { rel: 1e-9, abs: 1e-15 });
        expectClose(st.Twb, ref.Twb, { rel: 1e-9 });
        expectClose(st.Tdp, ref.Tdp, { rel: 1e-9 });
        // W is carried by h only to about 1e-16·|h|/h_g: at −100 °C, W ~ 1e-8, that is 1e-9 of W
        expectClose(st.RH, ref.RH, { rel: 1e-9, abs: (1e-15 / ref.W) * ref.RH });
        expectClose(st.h, ref.h, { rel: 1e-9, abs: 1e-6 });
      }),
      { numRuns: 60 },
    );
  });
});

describe('ranges and dependent pairs', () => {
  it('W with Tdp is a dependent pair: Status.invalidInput, REASON.dependentPair; the facade says why', () => {
    expect(solve(PAIR.W_Tdp, 0.01, 285, P, MODEL.enhanced)).toBe(Status.invalidInput);
    expect(st.reason).toBe(REASON.dependentPair);
    expect(() => humidAir.state({ W: 0.01, Tdp: '12 °C' })).toThrow(InvalidInputError);
    expect(() => humidAir.state({ W: 0.01, Tdp: '12 °C' })).toThrow(/both determine the same thing/);
  });
  it('h with Twb at exactly 0 °C (over liquid) is dependent', () => {
    expect(solve(PAIR.h_Twb, 5000, 273.15, P, MODEL.enhanced)).toBe(Status.invalidInput);
    expect(st.reason).toBe(REASON.dependentPair);
  });
  it('supersaturated (T, W) is out of range with REASON.supersaturated', () => {
    expect(solve(PAIR.T_W, 293.15, 0.02, P, MODEL.enhanced)).toBe(Status.outOfRange);
    expect(st.reason).toBe(REASON.supersaturated);
    expect(() => humidAir.state({ T: '20 °C', W: 0.02 })).toThrow(/fog or frost/);
    expect(() => humidAir.state({ W: 0.02, h: '60 kJ/kg' })).toThrow(OutOfRangeError);
  });
  it('Twb > T and Tdp > T are refused', () => {
    expect(() => humidAir.state({ T: '20 °C', Twb: '21 °C' })).toThrow(/wet-bulb temperature cannot exceed/);
    expect(() => humidAir.state({ T: '20 °C', Tdp: '21 °C' })).toThrow(/dew point cannot exceed/);
  });
  it('the enhanced model refuses 60 °C, naming its range and the ideal model; the ideal model answers', () => {
    expect(() => humidAir.state({ T: '60 °C', RH: 0.2 })).toThrow(/323\.15 K.*|pass model: 'ideal'/);
    const e = (() => { try { humidAir.state({ T: '60 °C', RH: 0.2 }); } catch (x) { return x as OutOfRangeError; } })()!;
    expect(e.range.max).toBe(323.15);
    expect(humidAir.state({ T: '60 °C', RH: 0.2, model: 'ideal' }).W).toBeGreaterThan(0.02);
  });
  it('T outside −100 °C … 200 °C, p ≤ 0 or above 1 MPa, RH outside 0–1, W < 0 are out of range', () => {
    expect(() => humidAir.state({ T: '-101 °C', RH: 0.5, model: 'ideal' })).toThrow(/below the lower limit/);
    expect(() => humidAir.state({ T: '201 °C', W: 0.1, model: 'ideal' })).toThrow(/above the upper limit/);
    expect(() => humidAir.state({ T: '20 °C', RH: 0.5, p: '2 MPa', model: 'ideal' })).toThrow(/1 MPa/);
    expect(() => humidAir.state({ T: '20 °C', RH: 1.2 })).toThrow(/outside 0 to 1/);
    expect(() => humidAir.state({ T: '20 °C', RH: 50 })).toThrow(/write 0.5 or "50 %"/);
    expect(() => humidAir.state({ T: '20 °C', W: -0.001 })).toThrow(/negative/);
    expect(solve(PAIR.T_RH, NaN, 0.5, P, MODEL.ideal)).toBe(Status.invalidInput);
  });
  it('above the boiling point at p, Ws and μ are undefined (Status.undefinedProperty) but the state is computed', () => {
    expect(solve(PAIR.T_W, 400, 0.5, P, MODEL.ideal)).toBe(Status.undefinedProperty);
    expect(st.reason).toBe(REASON.saturationUndefined);
    expect(Number.isNaN(st.Ws)).toBe(true);
    expect(st.RH).toBeLessThan(1);
    const r = humidAir.state({ T: '400 K', W: 0.5, model: 'ideal' });
    expect(r.Ws).toBeUndefined();
    expect(r.Twb!.si).toBeLessThan(373.2);
  });
  it('dry air (W = 0) has no dew point', () => {
    const r = humidAir.state({ T: '20 °C', W: 0 });
    expect(r.Tdp).toBeUndefined();
    expect(r.RH).toBe(0);
  });
  it('needs exactly two properties', () => {
    expect(() => humidAir.state({ T: '20 °C' } as never)).toThrow(/exactly two/);
    expect(() => humidAir.state({ T: '20 °C', RH: 0.5, W: 0.01 } as never)).toThrow(/exactly two/);
  });
});

describe('facade inputs', () => {
  it('RH as "50 %" equals 0.5; p default 101.325 kPa is stated; altitude gives the standard atmosphere', () => {
    const a = humidAir.state({ T: '30 °C', RH: '50 %' });
    const b = humidAir.state({ T: '30 °C', RH: 0.5, p: '101.325 kPa' });
    expect(a.W).toBe(b.W);
    expect(a.pressureFrom).toBe('default 101.325 kPa');
    expect(b.pressureFrom).toBe('given');
    const c = humidAir.state({ T: '30 °C', RH: 0.5, altitude: '1500 m' });
    expect(c.pressureFrom).toBe('altitude');
    expectClose(c.p.in('kPa'), 84.556, { abs: 0.001 });
    expect(c.W).toBeGreaterThan(a.W); // less dry air per unit vapour at altitude
  });
  it('US units in, any units out; h keeps the SI reference (0 at 0 °C), so h in Btu/lbm is not the US table value (0 at 0 °F)', () => {
    const s = humidAir.state({ T: '86 °F', Twb: quantity(70, '°F'), p: '14.696 psia' });
    expectClose(s.h.in('Btu/lbm'), s.h.si / 2326, { rel: 1e-12 });
    expectClose(s.T.in('°F'), 86, { rel: 1e-12 });
  });
  it('humidity-ratio helpers: g/kg and grains per pound (7000 gr = 1 lb)', () => {
    expect(fromGramsPerKilogram(12)).toBe(0.012);
    expect(toGramsPerKilogram(0.012)).toBe(12);
    expectClose(fromGrainsPerPound(70), 0.01, { rel: 1e-15 });
  });
  it('the facade returns the SI core\'s numbers bit for bit', () => {
    const r = humidAir.state({ T: '25 °C', Tdp: '12 °C' });
    solve(PAIR.T_Tdp, 298.15, 285.15, P, MODEL.enhanced);
    expect(r.W).toBe(st.W);
    expect(r.Twb!.si).toBe(st.Twb);
    expect(r.h.si).toBe(st.h);
  });
});

describe('humidAirBatch', () => {
  const T = Float64Array.of(303.15, 293.15, NaN, 350, 293.15);
  const RH = Float64Array.of(0.5, 1, 0.5, 0.5, 1.5);
  const p = new Float64Array(5).fill(P);
  it('one status per element, never throws per element; values equal the core', () => {
    const r = humidAirBatch({ T, RH, p }, ['Tdp', 'W', 'h']);
    expect([...r.status]).toEqual([0, 0, 3, 1, 1]);
    solve(PAIR.T_RH, 303.15, 0.5, P, MODEL.enhanced);
    expect(r.W[0]).toBe(st.W);
    expect(r.Tdp[0]).toBe(st.Tdp);
    expect(Number.isNaN(r.h[2]!)).toBe(true);
  });
  it('the ideal model accepts 350 K', () => {
    const r = humidAirBatch({ T, RH, p }, ['Twb'], undefined, { model: 'ideal' });
    expect(r.status[3]).toBe(0);
    expect(r.Twb[3]!).toBeLessThan(350);
  });
  it('checks the length of every out array and of the inputs', () => {
    expect(() => humidAirBatch({ T, RH, p }, ['W', 'h'], { h: new Float64Array(2) })).toThrow(/out\.h has 2 elements; 5 are needed/);
    expect(() => humidAirBatch({ T, RH, p }, ['W'], { status: new Uint8Array(1) })).toThrow(/out\.status/);
    expect(() => humidAirBatch({ T, RH: new Float64Array(2), p }, ['W'])).toThrow(/differ in length/);
    expect(() => humidAirBatch({ T, p } as never, ['W'])).toThrow(/exactly two/);
    expect(() => humidAirBatch({ T, RH, p }, ['x' as never])).toThrow(/unknown property/);
  });
  it('fills caller arrays in place', () => {
    const W = new Float64Array(5);
    const r = humidAirBatch({ T, RH, p }, ['W'], { W });
    expect(r.W).toBe(W);
  });
});
