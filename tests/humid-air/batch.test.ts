/**
 * humidAirBatch on the generic batch runner: one status per element, results bit for bit those of
 * humidAir.state (fast-check), malformed calls refused before any work.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { humidAir, humidAirBatch, InvalidInputError } from '../../src/humid-air/index.js';
import { HumidAirState, humidAirStateSI, PAIR } from '../../src/humid-air/core/index.js';
import { runBatch, type BatchModel } from '../../src/core/batch.js';
import { Status } from '../../src/core/status.js';
import { quantity } from '../../src/units/quantity.js';

const P = 101325;

describe('humidAirBatch', () => {
  const T = Float64Array.of(303.15, 293.15, NaN, 350, 293.15, 400);
  const RH = Float64Array.of(0.5, 1, 0.5, 0.5, 1.5, 0.5);
  const p = new Float64Array(6).fill(P);
  it('one status per element, never throws per element; values equal the core', () => {
    const r = humidAirBatch({ T, RH, p }, ['Tdp', 'W', 'h']);
    // 350 K at RH 0.5 is fine; RH 1.5 is out of range; at 400 K, 50 % is a vapour pressure above p (pws = 246 kPa)
    expect([...r.status]).toEqual([0, 0, 3, 0, 1, 1]);
    const st = new HumidAirState();
    humidAirStateSI(PAIR.T_RH, 303.15, 0.5, P, false, st);
    expect(r.W[0]).toBe(st.W);
    expect(r.Tdp[0]).toBe(st.Tdp);
    expect(Number.isNaN(r.h[2]!)).toBe(true);
    expect(Number.isNaN(r.W[4]!)).toBe(true);
  });
  it('a requested property not defined at a state is NaN with status undefinedProperty; the others are valid', () => {
    const r = humidAirBatch({ T: Float64Array.of(390, 300), W: Float64Array.of(0.5, 0), p: Float64Array.of(P, P) }, ['Ws', 'h', 'Tdp']);
    expect([...r.status]).toEqual([4, 4]); // Ws above the boiling point; Tdp of dry air
    expect(Number.isNaN(r.Ws[0]!)).toBe(true);
    expect(r.h[0]).toBe(humidAir.state({ T: '390 K', W: 0.5 }).h.si);
    expect(Number.isNaN(r.Tdp[1]!)).toBe(true);
    // without the undefined property, the same elements are ok
    expect([...humidAirBatch({ T: Float64Array.of(390, 300), W: Float64Array.of(0.5, 0), p: Float64Array.of(P, P) }, ['h']).status]).toEqual([0, 0]);
  });
  it('results equal humidAir.state bit for bit, for random states and every property (fast-check)', () => {
    const props = ['T', 'Twb', 'Tdp', 'RH', 'W', 'h', 'v', 'rho', 'pw', 'pws', 'Ws', 'saturationDegree', 'cp'] as const;
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: 173.2, max: 400, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 5e4, max: 1e6, noNaN: true })), { minLength: 1, maxLength: 20 }),
        (rows) => {
          const r = humidAirBatch({ T: Float64Array.from(rows, (x) => x[0]), RH: Float64Array.from(rows, (x) => x[1]), p: Float64Array.from(rows, (x) => x[2]) }, props);
          rows.forEach(([t, rh, pp], i) => {
            let s;
            try {
              s = humidAir.state({ T: quantity(t, 'K'), RH: rh, p: quantity(pp, 'Pa') });
            } catch {
              expect([Status.outOfRange, Status.noConvergence]).toContain(r.status[i]);
              return;
            }
            expect(r.T[i]).toBe(s.T.si);
            expect(r.W[i]).toBe(s.W.si);
            expect(r.h[i]).toBe(s.h.si);
            expect(r.v[i]).toBe(s.v.si);
            expect(r.rho[i]).toBe(s.rho.si);
            expect(r.pw[i]).toBe(s.pw.si);
            expect(r.pws[i]).toBe(s.pws.si);
            expect(r.cp[i]).toBe(s.cp.si);
            expect(r.RH[i]).toBe(s.RH);
            expect(Object.is(r.Tdp[i], s.Tdp?.si ?? NaN)).toBe(true);
            expect(Object.is(r.Twb[i], s.Twb?.si ?? NaN)).toBe(true);
            expect(Object.is(r.Ws[i], s.Ws?.si ?? NaN)).toBe(true);
            expect(Object.is(r.saturationDegree[i], s.saturationDegree ?? NaN)).toBe(true);
          });
        },
      ),
      { numRuns: 100 },
    );
  });
  it('other input pairs: (W, h) and (T, Twb) as the state allows', () => {
    const s = humidAir.state({ T: '30 °C', Twb: '20 °C' });
    const r = humidAirBatch({ W: Float64Array.of(s.W.si), h: Float64Array.of(s.h.si), p: Float64Array.of(P) }, ['T', 'Twb']);
    expect(r.status[0]).toBe(0);
    expect(Math.abs(r.T[0]! - 303.15)).toBeLessThan(1e-9);
    const q = humidAirBatch({ T: Float64Array.of(303.15), Twb: Float64Array.of(293.15), p: Float64Array.of(P) }, ['W']);
    expect(q.W[0]).toBe(s.W.si);
  });
  it('checks the length of every out array and of the inputs; refuses over-determined, unknown, dependent inputs and unknown properties', () => {
    expect(() => humidAirBatch({ T, RH, p }, ['W', 'h'], { h: new Float64Array(2) })).toThrow(/out\.h has 2 elements; exactly 6 are needed/);
    expect(() => humidAirBatch({ T, RH, p }, ['W', 'h'], { W: new Float64Array(7) })).toThrow(/out\.W has 7 elements/);
    expect(() => humidAirBatch({ T, RH, p }, ['W'], { status: new Uint8Array(1) })).toThrow(/out\.status/);
    expect(() => humidAirBatch({ T, RH: new Float64Array(2), p }, ['W'])).toThrow(/differ in length/);
    expect(() => humidAirBatch({ T, RH, p: new Float64Array(3) }, ['W'])).toThrow(/differ in length/);
    expect(() => humidAirBatch({ T, RH, W: T, p } as never, ['W'])).toThrow(/humidAirBatch got \{ T, RH, W, p \}/);
    expect(() => humidAirBatch({ T, RH } as never, ['W'])).toThrow(/it takes \{ T, RH, p \}/);
    expect(() => humidAirBatch({ T, RH, x: T, p } as never, ['W'])).toThrow(/"x" is not an input of humidAirBatch/);
    expect(() => humidAirBatch({ W: T, Tdp: T, p }, ['h'])).toThrow(InvalidInputError);
    expect(() => humidAirBatch({ W: T, Tdp: T, p }, ['h'])).toThrow(/each fixes the vapour pressure/);
    expect(() => humidAirBatch({ T, RH, p }, ['x' as never])).toThrow(/unknown property/);
    expect(() => humidAirBatch({ T, RH: [0.5] as never, p }, ['W'])).toThrow(/must be a Float64Array/);
  });
  it('fills caller arrays in place', () => {
    const W = new Float64Array(6);
    const r = humidAirBatch({ T, RH, p }, ['W'], { W });
    expect(r.W).toBe(W);
  });
});

describe('humidAirBatch fused loop', () => {
  // the oracle: the generic runner's own loop (no fused loop) over the SI core, with the readers and
  // the undefined-property rule the batch documents (NaN where not defined, status undefinedProperty)
  const props = ['T', 'Twb', 'Tdp', 'RH', 'W', 'h', 'v', 'rho', 'pw', 'pws', 'Ws', 'saturationDegree', 'cp'] as const;
  type Prop = (typeof props)[number];
  const readers: { [K in Prop]: (o: HumidAirState) => number } = {
    T: (o) => o.T, Twb: (o) => o.Twb, Tdp: (o) => o.Tdp, RH: (o) => o.RH, W: (o) => o.W, h: (o) => o.h, v: (o) => o.v,
    rho: (o) => o.rho, pw: (o) => o.pw, pws: (o) => o.pws, Ws: (o) => o.Ws, saturationDegree: (o) => o.mu, cp: (o) => o.cp,
  };
  const mayBeUndefined = new Set<Prop>(['Tdp', 'Twb', 'Ws', 'saturationDegree']);
  function generic(pair: number, a: Float64Array, b: Float64Array, p: Float64Array, wanted: readonly Prop[]) {
    let i = 0;
    const wetBulb = wanted.includes('Twb');
    const model: BatchModel<HumidAirState, Prop> = {
      name: 'oracle',
      inputs: [{ keys: ['a', 'b'], solve: (x, y, out) => { const s = humidAirStateSI(pair, x, y, p[i++]!, wetBulb, out); return s === Status.undefinedProperty ? Status.ok : s; } }],
      properties: readers,
      createOutput: () => new HumidAirState(),
      undefinedAt: (out, prop) => out.reason !== 0 && mayBeUndefined.has(prop) && Number.isNaN(readers[prop](out)),
    };
    return runBatch(model, { a, b }, wanted);
  }
  const range: Record<string, [number, number]> = { T: [150, 500], Twb: [150, 500], Tdp: [150, 500], RH: [-0.1, 1.1], W: [-0.01, 0.3], h: [-2e5, 8e5] };
  const pairs: [string, string, number][] = [
    ['T', 'RH', PAIR.T_RH], ['T', 'W', PAIR.T_W], ['T', 'h', PAIR.T_h], ['T', 'Tdp', PAIR.T_Tdp], ['T', 'Twb', PAIR.T_Twb],
    ['RH', 'W', PAIR.RH_W], ['RH', 'h', PAIR.RH_h], ['RH', 'Tdp', PAIR.RH_Tdp], ['RH', 'Twb', PAIR.RH_Twb],
    ['W', 'h', PAIR.W_h], ['W', 'Twb', PAIR.W_Twb], ['h', 'Tdp', PAIR.h_Tdp], ['h', 'Twb', PAIR.h_Twb], ['Tdp', 'Twb', PAIR.Tdp_Twb],
  ];
  const value = (key: string) => fc.oneof({ weight: 20, arbitrary: fc.double({ min: range[key]![0], max: range[key]![1], noNaN: true }) }, { weight: 1, arbitrary: fc.constantFrom(NaN, 0, 1, 273.15) });
  it.each(pairs)('(%s, %s): statuses and values equal the generic runner over the core, bit for bit, for every property and for the batch path (Tdp, W, h) (fast-check)', (k1, k2, pair) => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(value(k1), value(k2), fc.oneof({ weight: 20, arbitrary: fc.double({ min: 1e3, max: 1.2e6, noNaN: true }) }, { weight: 1, arbitrary: fc.constant(101325) })), { minLength: 1, maxLength: 30 }),
        (rows) => {
          const a = Float64Array.from(rows, (r) => r[0]);
          const b = Float64Array.from(rows, (r) => r[1]);
          const p = Float64Array.from(rows, (r) => r[2]);
          for (const wanted of [props, ['Tdp', 'W', 'h'] as const]) {
            const fused = humidAirBatch({ [k1]: a, [k2]: b, p } as never, wanted) as unknown as Record<string, Float64Array> & { status: Uint8Array };
            const oracle = generic(pair, a, b, p, wanted) as unknown as Record<string, Float64Array> & { status: Uint8Array };
            expect([...fused.status]).toEqual([...oracle.status]);
            // every element compared, the differing ones listed (one assertion per property, not per element)
            for (const prop of wanted) {
              const differ: string[] = [];
              for (let i = 0; i < rows.length; i++) if (!Object.is(fused[prop]![i], oracle[prop]![i])) differ.push(`${i}: ${fused[prop]![i]} vs ${oracle[prop]![i]}`);
              expect(differ, prop).toEqual([]);
            }
          }
        },
      ),
      { numRuns: 30, endOnFailure: true }, // no shrinking: a failing array of states shrinks for minutes
    );
  });
});
