/**
 * Random-state sweeps of the other models (seeded; see helpers.ts): ideal gases (every catalogued
 * species and dry air as a mixture), incompressible substances (every catalogue entry), humid air
 * (pairs of the ASHRAE Handbook—Fundamentals ch. 1 relations, both models) and water by IAPWS-95
 * (the Helmholtz-energy engine). Every state: no unexpected throw, no NaN, and round trips that
 * reproduce the input variables to 1e-9 (relative; an absolute floor where a quantity passes through
 * zero, named at each check).
 */
import { describe, expect, it } from 'vitest';
import { Status } from '../../src/core/status.js';
import { OutOfRangeError } from '../../src/errors.js';
import { FluidContext, FluidState, fluidModel, stateFromPH, stateFromPS, stateFromPT, stateFromTRho, stateFromTX, saturationAtT } from '../../src/fluids/core.js';
import { HumidAirState, humidAirState, PAIR } from '../../src/humid-air/core/state.js';
import { dryAir, idealGas, speciesNames, type IdealGas } from '../../src/ideal-gas/index.js';
import { incompressible, incompressibleNames } from '../../src/incompressible/index.js';
import { Quantity } from '../../src/units/quantity.js';
import { Failures, Random, closeRel } from './helpers.js';

const TOL = 1e-9;

const K = (T: number) => Quantity.fromSI(T, 'temperature');
const Pa = (p: number) => Quantity.fromSI(p, 'pressure');

function noNaN(record: object, label: string, fail: Failures): void {
  for (const [k, v] of Object.entries(record)) {
    if (typeof v === 'number' && Number.isNaN(v)) fail.add(`${label}: ${k} is NaN`);
    if (v instanceof Quantity && !Number.isFinite(v.si)) fail.add(`${label}: ${k} = ${v.si}`);
  }
}

describe('ideal gases: random states of every species', () => {
  const gases: IdealGas[] = [...speciesNames().map((n) => idealGas(n)), dryAir(), idealGas('air', { model: 'constant-cp' }), idealGas('CO2', { basis: 'molar' } as never) as unknown as IdealGas];
  const perGas = 700;
  it(`${perGas} states per gas (${gases.length} gases) from (T, p), back from (h, p) and (s, p) to 1e-9`, () => {
    const r = new Random(8314);
    const fail = new Failures();
    let n = 0;
    for (const gas of gases) {
      const Tmin = gas.range.T.min.si;
      const Tmax = gas.range.T.max!.si;
      for (let i = 0; i < perGas; i++) {
        const T = r.uniform(Tmin, Tmax);
        const p = r.logUniform(1, 1e8);
        n++;
        try {
          const st = gas.state({ T: K(T), p: Pa(p) });
          noNaN(st, `${gas.name} (T ${T}, p ${p})`, fail);
          const byH = gas.state({ h: st.h, p: st.p } as never);
          // h passes through 0 at 298.15 K for elements: floor of 1e-9 of cp·T in the energy's unit
          if (!closeRel(byH.T.si, T, TOL) && !(Math.abs(byH.h.si - st.h.si) <= TOL * Math.abs(st.cp.si * T))) fail.add(`${gas.name} (h, p): T = ${byH.T.si} from ${T}`);
          const byS = gas.state({ s: st.s, p: st.p } as never);
          if (!closeRel(byS.T.si, T, TOL)) fail.add(`${gas.name} (s, p): T = ${byS.T.si} from ${T}`);
        } catch (e) {
          fail.add(`${gas.name} (T ${T}, p ${p}): ${(e as Error).name}: ${(e as Error).message}`);
        }
      }
    }
    fail.expectNone('ideal-gas sweep');
    expect(n).toBe(gases.length * perGas);
  });

  // issue 17 (fixed): h(T_max) and s(T_min, p) themselves, the ends of the range the error message
  // quotes as valid, were refused (for example O2: h = 7006988 J/kg at 6000 K)
  it('h and s exactly at the ends of the data give T_min and T_max back', () => {
    const fail = new Failures();
    for (const gas of gases) {
      for (const T of [gas.range.T.min.si, gas.range.T.max!.si]) {
        const st = gas.state({ T: K(T), p: Pa(1e5) });
        for (const [name, pair] of [['h', { h: st.h, p: st.p }], ['s', { s: st.s, p: st.p }]] as const) {
          try {
            const back = gas.state(pair as never);
            if (!closeRel(back.T.si, T, TOL)) fail.add(`${gas.name} ${name} at ${T} K: T = ${back.T.si}`);
          } catch (e) {
            fail.add(`${gas.name} ${name} = ${st[name].si} at ${T} K: ${(e as Error).message}`);
          }
        }
      }
    }
    fail.expectNone('exact range ends');
  });

  it('h and s just past the ends of the data: an OutOfRangeError, never NaN (issue 17)', () => {
    const fail = new Failures();
    for (const gas of gases.slice(0, speciesNames().length)) {
      const p = Pa(1e5);
      for (const T of [gas.range.T.min.si, gas.range.T.max!.si]) {
        const h = gas.h(K(T)).si;
        const s = gas.s(K(T), p).si;
        const above = T === gas.range.T.max!.si;
        for (const [name, value] of [['h', h], ['s', s]] as const) {
          for (const ulps of [1, 4, 1e3]) {
            const past = value + (above ? 1 : -1) * Math.abs(value || 1) * ulps * Number.EPSILON;
            try {
              const st = gas.state({ [name]: Quantity.fromSI(past, name === 'h' ? 'specificEnergy' : 'specificEntropy'), p } as never);
              if (!Number.isFinite(st.T.si) || st.T.si < gas.range.T.min.si || st.T.si > gas.range.T.max!.si) fail.add(`${gas.name} ${name} = ${past}: T = ${st.T.si}`);
            } catch (e) {
              if (!(e instanceof OutOfRangeError)) fail.add(`${gas.name} ${name} = ${past} (${ulps} ulp past ${T} K): ${(e as Error).name}: ${(e as Error).message}`);
            }
          }
        }
      }
    }
    fail.expectNone('range ends');
  });
});

describe('incompressible substances: random states of every catalogue entry', () => {
  const names = incompressibleNames();
  const solutions = names.filter((n) => n.endsWith('solution'));
  const perSubstance = 400;
  it(`${perSubstance} states per substance (${names.length - solutions.length} substances, ${solutions.length} solutions at three concentrations): finite, Δu, Δh, Δs consistent`, () => {
    const r = new Random(4186);
    const fail = new Failures();
    const subs = [...names.filter((n) => !solutions.includes(n)).map((n) => incompressible(n)), ...solutions.flatMap((n) => [0.1, 0.3, 0.5].map((w) => incompressible(n, { massFraction: w })))];
    for (const sub of subs) {
      const Tmin = sub.range.T.min.si;
      const Tmax = sub.range.T.max.si;
      for (let i = 0; i < perSubstance; i++) {
        const T1 = i === 0 ? Tmin : r.uniform(Tmin, Tmax);
        const T2 = i === 0 ? Tmax : r.uniform(Tmin, Tmax);
        const p1 = r.logUniform(1e3, 1e8);
        const p2 = r.logUniform(1e3, 1e8);
        try {
          const a = sub.state({ T: K(T1), p: Pa(p1) });
          const b = sub.state({ T: K(T2), p: Pa(p2) });
          noNaN(a, `${sub.name} (${T1}, ${p1})`, fail);
          if (!(a.c.si > 0 && a.rho.si > 0)) fail.add(`${sub.name} at ${T1} K: c = ${a.c.si}, rho = ${a.rho.si}`);
          const du = sub.deltaU(K(T1), K(T2)).si;
          const ds = sub.deltaS(K(T1), K(T2)).si;
          const dh = sub.deltaH({ T: K(T1), p: Pa(p1) }, { T: K(T2), p: Pa(p2) }).si;
          // the differences are those of the states (same reference), to 1e-9 of the larger magnitude
          const floorU = TOL * Math.max(Math.abs(a.u.si), Math.abs(b.u.si), a.c.si);
          if (!(Math.abs(du - (b.u.si - a.u.si)) <= floorU)) fail.add(`${sub.name}: Δu = ${du}, u2 − u1 = ${b.u.si - a.u.si}`);
          if (!(Math.abs(ds - (b.s.si - a.s.si)) <= TOL * Math.max(Math.abs(a.s.si), Math.abs(b.s.si), 1))) fail.add(`${sub.name}: Δs = ${ds}, s2 − s1 = ${b.s.si - a.s.si}`);
          if (!Number.isFinite(dh)) fail.add(`${sub.name}: Δh = ${dh}`);
          if (Math.sign(du) !== Math.sign(T2 - T1) && du !== 0) fail.add(`${sub.name}: Δu = ${du} for T ${T1} → ${T2}`);
        } catch (e) {
          fail.add(`${sub.name} (${T1} K, ${T2} K): ${(e as Error).name}: ${(e as Error).message}`);
        }
      }
    }
    fail.expectNone('incompressible sweep');
  });
});

describe('incompressible substances: deltaH against the states', () => {
  // fixed: h is one function of the state, h(T, p) = ∫c dT + v(T)·(p − p_ref) (src/incompressible/model.ts),
  // and deltaH is its difference, also for liquids with ρ(T)
  it('deltaH equals state(2).h − state(1).h to 1e-9 for every substance, liquids with ρ(T) included', () => {
    const fail = new Failures();
    for (const name of incompressibleNames().filter((n) => !n.endsWith('solution'))) {
      const sub = incompressible(name);
      const s1 = { T: sub.range.T.min, p: Pa(1e3) };
      const s2 = { T: sub.range.T.max, p: Pa(1e8) };
      const dh = sub.deltaH(s1, s2).si;
      const diff = sub.state(s2).h.si - sub.state(s1).h.si;
      if (!closeRel(dh, diff, TOL)) fail.add(`${name}: deltaH = ${dh}, h2 − h1 = ${diff}`);
    }
    fail.expectNone('deltaH');
  });
});

describe('humid air: random states and their pairs (SI core)', () => {
  const pairs: [string, number, (st: HumidAirState) => [number, number]][] = [
    ['T, W', PAIR.T_W, (st) => [st.T, st.W]],
    ['T, h', PAIR.T_h, (st) => [st.T, st.h]],
    ['T, Twb', PAIR.T_Twb, (st) => [st.T, st.Twb]],
    ['T, Tdp', PAIR.T_Tdp, (st) => [st.T, st.Tdp]],
    ['RH, W', PAIR.RH_W, (st) => [st.RH, st.W]],
    ['W, h', PAIR.W_h, (st) => [st.W, st.h]],
  ];
  // the one shipped model: ASHRAE ideal mixture, −100 °C to 200 °C, up to 1 MPa; two seeds
  for (const [seed, name, Tlo, Thi, plo, phi] of [
    [1013, 'ideal (near ambient)', 233.15, 323.15, 3e4, 1.1e5],
    [1014, 'ideal (full range)', 173.15, 473.15, 1e4, 1e6],
  ] as const) {
    const N = 3000;
    it(`${N} ${name}-model states from (T, RH): finite; (T, W), (T, h), (T, Twb), (T, Tdp), (RH, W), (W, h) give T and W back to 1e-9`, () => {
      const r = new Random(seed);
      const fail = new Failures();
      const a = new HumidAirState();
      const b = new HumidAirState();
      let done = 0;
      for (let i = 0; i < N; i++) {
        const T = r.uniform(Tlo, Thi);
        const RH = r.uniform(0.01, 1);
        const p = r.uniform(plo, phi);
        const st = humidAirState(PAIR.T_RH, T, RH, p, true, a);
        // a state where the vapour pressure reaches the total pressure does not exist: the core says so
        if (st === Status.outOfRange) continue;
        // status 4: computed, one property not defined there (a dew point or saturation ratio beyond its range)
        if (st !== Status.ok && st !== Status.undefinedProperty) {
          fail.add(`(T ${T}, RH ${RH}, p ${p}): status ${st}, reason ${a.reason}`);
          continue;
        }
        done++;
        for (const f of ['T', 'W', 'h', 'v', 'rho', 'pw', 'cp'] as const) if (!Number.isFinite(a[f])) fail.add(`(T ${T}, RH ${RH}, p ${p}): ${f} = ${a[f]}`);
        if (st === Status.ok) for (const f of ['Twb', 'Tdp', 'pws'] as const) if (!Number.isFinite(a[f])) fail.add(`(T ${T}, RH ${RH}, p ${p}): status 0 with ${f} = ${a[f]}`);
        for (const [label, code, inputs] of pairs) {
          const [x, y] = inputs(a);
          // inputs outside the model's temperature range (a wet-bulb or dew point below it) are refused, rightly
          if ((label.includes('Twb') && !(a.Twb >= Tlo)) || (label.includes('Tdp') && !(a.Tdp >= Tlo))) continue;
          const s2 = humidAirState(code, x, y, p, true, b);
          if (s2 !== Status.ok && s2 !== Status.undefinedProperty) {
            fail.add(`(${label}) = (${x}, ${y}) of (T ${T}, RH ${RH}, p ${p}): status ${s2}, reason ${b.reason}`);
            continue;
          }
          // W passes through 0 for dry air: floor 1e-9 kg/kg of saturation's order (1e-3)
          if (!closeRel(b.T, T, TOL) || !(Math.abs(b.W - a.W) <= TOL * Math.max(a.W, 1e-3))) fail.add(`(${label}) of (T ${T}, RH ${RH}, p ${p}): T = ${b.T}, W = ${b.W} (from ${a.W})`);
        }
      }
      fail.expectNone(`humid air (${name})`);
      expect(done).toBeGreaterThan(N / 2);
    });
  }
});

describe('water by IAPWS-95: random states (the Helmholtz-energy engine)', () => {
  const model = fluidModel('water')!;
  const ctx = new FluidContext(model);
  const a = new FluidState();
  const b = new FluidState();
  const N = 1500;
  const pResidual = new Failures();
  /** Relative p residuals above 1e-9 that lie within the equation's own rounding scatter (reported by the test below). */
  const pScattered: number[] = [];
  const c = new FluidState();
  /**
   * How far the evaluated p(T, ρ) itself moves over the 16 doubles of ρ around the answer (±8 ulp):
   * the rounding noise of the equation at that state, within which no density can do better. The
   * exact equation changes there by about 16 ulp × ρ(∂p/∂ρ), far below 1e-9 of p at these states.
   */
  const pScatter = (T: number, rho: number, p0: number): number => {
    let lo = p0;
    let hi = p0;
    for (let k = -8; k <= 8; k++) {
      if (k === 0 || stateFromTRho(ctx, T, rho * (1 + k * Number.EPSILON), c) !== Status.ok) continue;
      lo = Math.min(lo, c.p);
      hi = Math.max(hi, c.p);
    }
    return hi - lo;
  };
  it(`${N} (p, T) states over 273.16 K to 1273 K and 1 kPa to 100 MPa: finite; (T, ρ) computed, (p, h), (p, s) back to 1e-9`, () => {
    const r = new Random(95);
    const fail = new Failures();
    for (let i = 0; i < N; i++) {
      const T = r.uniform(Math.max(model.Tmin, 273.16), Math.min(model.Tmax, 1273));
      const p = r.logUniform(1e3, Math.min(model.pMax, 1e8));
      const st = stateFromPT(ctx, p, T, a);
      if (st !== Status.ok) {
        fail.add(`stateFromPT(${p}, ${T}): status ${st}`);
        continue;
      }
      for (const f of ['T', 'p', 'rho', 'u', 'h', 's', 'cp', 'cv', 'w'] as const) if (!Number.isFinite(a[f])) fail.add(`stateFromPT(${p}, ${T}): ${f} = ${a[f]}`);
      if (stateFromTRho(ctx, T, a.rho, b) !== Status.ok || !Number.isFinite(b.p)) fail.add(`(T, ρ) of (p ${p}, T ${T}): p = ${b.p}`);
      else if (!closeRel(b.p, p, TOL)) {
        const scatter = pScatter(T, a.rho, b.p);
        if (!(Math.abs(b.p - p) <= scatter)) pResidual.add(`stateFromPT(${p}, ${T}): ρ = ${a.rho} gives back p = ${b.p} (${((b.p - p) / p).toExponential(2)}; the equation's own scatter there ${(scatter / p).toExponential(2)})`);
        else pScattered.push((b.p - p) / p);
      }
      if (stateFromPH(ctx, p, a.h, b) !== Status.ok || !closeRel(b.h, a.h, TOL, 1e4) || !closeRel(b.T, T, 1e-8)) fail.add(`(p, h) of (${p}, ${T}): T = ${b.T}, h = ${b.h} (from ${a.h})`);
      if (stateFromPS(ctx, p, a.s, b) !== Status.ok || !closeRel(b.s, a.s, TOL, 10) || !closeRel(b.T, T, 1e-8)) fail.add(`(p, s) of (${p}, ${T}): T = ${b.T}, s = ${b.s} (from ${a.s})`);
    }
    fail.expectNone('IAPWS-95 sweep');
  });
  // In a compressed liquid at a few kPa, p = ρRT(1 + δαʳ_δ) with 1 + δαʳ_δ ≈ 1e-5 left from terms whose
  // magnitudes sum to about 1500 (at 285 K, 999.4 kg/m³; the largest 465): the evaluated p(T, ρ)
  // scatters by up to 2e-8 (relative) between adjacent doubles of ρ, so 1e-9 in p is below what the
  // equation resolves in double precision there (one more Newton step leaves 617 of 3000 such states
  // above 1e-9). The density is held instead to the equation's own scatter at the answer: 1e-9, or
  // the spread of p over ±8 ulp of ρ where that is larger (a density off by more than the rounding
  // noise, i.e. a solver fault, still fails).
  it('the (p, T) flash density reproduces p to 1e-9, or within the evaluated equation\'s own scatter at that density', () => {
    expect(pResidual.count + pScattered.length, 'the sweep above has run').toBeGreaterThanOrEqual(0);
    pResidual.expectNone('IAPWS-95 (p, T) density residual');
    // the states where the scatter applies are liquids (ρ above the critical density), and few
    expect(pScattered.length).toBeLessThan(N / 50);
    for (const r of pScattered) expect(Math.abs(r)).toBeLessThan(1e-7);
  });
  it(`${N / 3} two-phase (T, x) states: finite; saturation ρ_f > ρ_g, h_fg > 0`, () => {
    const r = new Random(96);
    const fail = new Failures();
    const l = new FluidState();
    const v = new FluidState();
    for (let i = 0; i < N / 3; i++) {
      const T = r.uniform(273.16, model.Tc - 0.01);
      const x = r.next();
 // status 4: two-phase, cp, cv and w not defined there
      const sx = stateFromTX(ctx, T, x, a);
      if ((sx !== Status.ok && sx !== Status.undefinedProperty) || !['T', 'p', 'rho', 'u', 'h', 's'].every((f) => Number.isFinite(a[f as 'T']))) fail.add(`stateFromTX(${T}, ${x}) failed or not finite`);
      if (saturationAtT(ctx, T, l, v) !== Status.ok || !(l.rho > v.rho) || !(v.h > l.h)) fail.add(`saturationAtT(${T}): ρ_f ${l.rho}, ρ_g ${v.rho}, h_fg ${v.h - l.h}`);
    }
    fail.expectNone('IAPWS-95 two-phase');
  });
});
