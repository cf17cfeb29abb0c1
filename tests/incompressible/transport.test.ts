/**
 * Viscosity and thermal conductivity of the incompressible catalogue: data completeness and
 * provenance, liquid water against the IAPWS cores (R12-08, R15-11) as water.saturation uses them,
 * the recalled tables against their own printed Prandtl numbers, interpolation, ranges and the
 * errors for data left out.
 */
import { describe, expect, it } from 'vitest';
import { DefinitionError, OutOfRangeError, UnavailablePropertyError } from '../../src/errors.js';
import { incompressible, incompressibleCatalogue } from '../../src/incompressible/index.js';
import { incompressibleDefinitionSchema } from '../../src/incompressible/schema.js';
import { quantity } from '../../src/units/index.js';
import { water } from '../../src/water/index.js';
import { expectClose } from '../helpers/tolerance.js';

const UNCERTAINTY = /^(fit deviation|source|estimate): /;

describe('catalogue transport data', () => {
  it('every liquid names its viscosity and conductivity, every solid its conductivity: data with source, basis and uncertainty, or left out with the reason', () => {
    for (const def of incompressibleCatalogue()) {
      const fields = def.state === 'liquid' ? ([def.viscosity, def.thermalConductivity] as const) : ([def.thermalConductivity] as const);
      if (def.state === 'solid') expect(def.viscosity, def.name).toBeUndefined();
      for (const f of fields) {
        expect(f, def.name).toBeDefined();
        if ('omitted' in f!) {
          expect(f.omitted, def.name).toMatch(/^left out: .{20,}/);
          expect(def.finding, `${def.name}: a finding says what would settle it`).toMatch(/transcribe|definition/);
        } else {
          expect(f!.source?.title, def.name).toBeTruthy();
          expect(f!.basis, def.name).toBeDefined();
          expect(f!.uncertainty, def.name).toMatch(UNCERTAINTY);
        }
      }
      expect(incompressibleDefinitionSchema().safeParse(def).success, def.name).toBe(true);
    }
  });
  it('the solutions leave both out and say why', () => {
    const s = incompressible('propylene glycol solution', { massFraction: 0.3 });
    expect(() => s.viscosity('20 °C')).toThrow(/propylene glycol solution, 30 % by mass has no viscosity data.*ASHRAE/);
    expect(s.state({ T: '20 °C', p: '1 atm' }).mu).toBeUndefined();
  });
});

describe('liquid water: IAPWS R12-08 and R15-11 at the IF97 saturated-liquid density', () => {
  const w = incompressible('water');
  it('equals the saturated liquid of water.saturation (the same cores, the same density) to 1e-12', () => {
    for (const t of [0.01, 5, 25, 60, 100, 150, 200, 250, 300, 340, 350]) {
      const sat = water.saturation({ T: quantity(t, '°C') });
      expectClose(w.viscosity(quantity(t, '°C')).si, sat.liquid.mu!.si, { rel: 1e-12 });
      expectClose(w.thermalConductivity(quantity(t, '°C')).si, sat.liquid.lambda!.si, { rel: 1e-12 });
    }
  });
  it('saturated liquid water against handbook steam-table values (from memory): μ 0.890 and 0.282 mPa·s, λ 0.607 and 0.679 W/(m·K) at 25 and 100 °C', () => {
    expectClose(w.viscosity('25 °C').in('mPa·s'), 0.89, { rel: 1e-3 });
    expectClose(w.viscosity('100 °C').in('mPa·s'), 0.282, { rel: 3e-3 });
    expectClose(w.thermalConductivity('25 °C').si, 0.607, { rel: 2e-3 });
    expectClose(w.thermalConductivity('100 °C').si, 0.679, { rel: 5e-3 });
  });
  it('is not extrapolated past the saturated liquid of IF97 region 1, even with { extrapolate: true }', () => {
    const x = incompressible('water', { extrapolate: true });
    expect(() => x.viscosity('400 °C')).toThrow(OutOfRangeError);
    expect(x.c('400 °C').extrapolated).toBe(true);
  });
});

// The recalled saturated-liquid tables print cp and Pr beside μ and λ (from memory, like the rest):
// μ·cp/λ must reproduce the printed Pr to its rounding, a check that the columns were recalled together.
const PRINTED: Record<string, { T: number[]; cp: number[]; Pr: number[] }> = {
  'engine oil': {
    T: [273.15, 280, 290, 300, 310, 320, 330, 340, 350, 360, 370, 380, 390, 400, 410, 420, 430],
    cp: [1796, 1827, 1868, 1909, 1951, 1993, 2035, 2076, 2118, 2161, 2206, 2250, 2294, 2337, 2381, 2427, 2471],
    Pr: [47000, 27500, 12900, 6400, 3400, 1965, 1205, 793, 546, 395, 300, 233, 187, 152, 125, 103, 88],
  },
  'ethylene glycol': {
    T: [273.15, 280, 290, 300, 310, 320, 330, 340, 350, 360, 370, 373.15],
    cp: [2294, 2323, 2368, 2415, 2460, 2505, 2549, 2592, 2637, 2682, 2728, 2742],
    Pr: [617, 400, 236, 151, 103, 73.5, 55.0, 42.8, 34.6, 28.6, 23.7, 22.4],
  },
  glycerin: { T: [273.15, 280, 290, 300, 310, 320], cp: [2261, 2298, 2367, 2427, 2490, 2564], Pr: [85000, 43200, 15300, 6780, 3060, 1870] },
  mercury: { T: [273.15, 300, 350, 400, 450, 500, 550, 600], cp: [140.4, 139.3, 137.7, 136.5, 135.7, 135.3, 135.2, 135.5], Pr: [0.029, 0.0248, 0.0196, 0.0163, 0.014, 0.0125, 0.0114, 0.0105] },
};

describe('recalled liquid tables', () => {
  for (const [name, t] of Object.entries(PRINTED)) {
    it(`${name}: μ·cp/λ at the nodes reproduces the table's printed Pr within 1.5 % (from memory)`, () => {
      const s = incompressible(name, name === 'glycerin' ? { supercooled: true } : {});
      t.T.forEach((T, i) => {
        const K = quantity(T, 'K');
        expectClose((s.viscosity(K).si * t.cp[i]!) / s.thermalConductivity(K).si, t.Pr[i]!, { rel: 0.015 });
      });
    });
  }
  it('the state Pr uses the entry c: engine oil at 350 K gives 546.4 against the printed 546', () => {
    expectClose(incompressible('engine oil').state({ T: '350 K', p: '1 atm' }).Pr!, 546, { rel: 2e-3 });
  });
});

describe('interpolation', () => {
  const oil = incompressible('engine oil');
  it('returns the tabulated node bit for bit', () => {
    expect(oil.viscosity('300 K').si).toBe(0.486);
    expect(oil.viscosity('310 K').si).toBe(0.253);
    expect(oil.thermalConductivity('320 K').si).toBe(0.143);
    expect(incompressible('copper').thermalConductivity('1200 K').si).toBe(339);
  });
  it('viscosity: ln μ linear in 1/T between nodes; conductivity: linear in T', () => {
    const T = 305;
    const t = (1 / T - 1 / 300) / (1 / 310 - 1 / 300);
    expectClose(oil.viscosity(quantity(T, 'K')).si, Math.exp(Math.log(0.486) * (1 - t) + Math.log(0.253) * t), { rel: 1e-14 });
    expectClose(incompressible('copper').thermalConductivity('350 K').si, 397, { rel: 1e-14 });
  });
  it('a constant holds over its own range only: ice 2.22 W/(m·K) from 250 K, though c reaches 200 K', () => {
    const ice = incompressible('ice');
    expect(ice.thermalConductivity('260 K').si).toBe(2.22);
    expect(() => ice.thermalConductivity('220 K')).toThrow(/below the lower limit of the thermal conductivity data for ice \(250 K\)/);
    expect(ice.state({ T: '220 K', p: '1 atm' }).lambda).toBeUndefined();
    expect(ice.state({ T: '220 K', p: '1 atm' }).c.si).toBeGreaterThan(0);
  });
});

describe('facade', () => {
  it('states carry mu, lambda, Pr, nu, alpha (liquids) and lambda, alpha (solids), with the identities', () => {
    const st = incompressible('ethylene glycol').state({ T: '40 °C', p: '2 bar' });
    expectClose(st.Pr!, (st.mu!.si * st.c.si) / st.lambda!.si, { rel: 1e-15 });
    expectClose(st.nu!.si, st.mu!.si / st.rho.si, { rel: 1e-15 });
    expectClose(st.alpha!.si, st.lambda!.si / (st.rho.si * st.c.si), { rel: 1e-15 });
    const cu = incompressible('copper').state({ T: '300 K', p: '1 atm' });
    // transport values are getters read by name, in the JSON of the state (not own keys)
    expect(Object.keys(JSON.parse(JSON.stringify(cu)))).toEqual(expect.arrayContaining(['T', 'h', 'lambda', 'alpha']));
    expect(Object.keys(JSON.parse(JSON.stringify(st)))).toEqual(expect.arrayContaining(['mu', 'lambda', 'Pr', 'nu', 'alpha']));
    expect('mu' in cu || 'Pr' in cu || 'nu' in cu).toBe(false);
    expectClose(cu.alpha!.si, 401 / (8933 * cu.c.si), { rel: 1e-15 });
  });
  it('out of the data: the range error in the caller units; extrapolate extends the end piece, flagged', () => {
    const oil = incompressible('engine oil');
    expect(() => oil.viscosity('350 °F')).toThrow(/T = 350 °F .* above the upper limit of the data for engine oil/);
    const x = incompressible('engine oil', { extrapolate: true });
    expect(x.viscosity('440 K').extrapolated).toBe(true);
    expect(x.viscosity('420 K').extrapolated).toBe(false);
    expect(x.viscosity('440 K').si).toBeLessThan(x.viscosity('430 K').si);
  });
  it('data left out: UnavailablePropertyError naming the substance and the property; the state getters are undefined', () => {
    const check = (fn: () => unknown, pattern: RegExp) => {
      expect(fn).toThrow(UnavailablePropertyError);
      expect(fn).toThrow(pattern);
    };
    check(() => incompressible('ethanol').viscosity('20 °C'), /ethanol has no viscosity data: left out/);
    check(() => incompressible('seawater').thermalConductivity('20 °C'), /seawater has no thermal conductivity data/);
    check(() => incompressible('copper').viscosity('300 K'), /copper has no viscosity data: copper is a solid/);
    const st = incompressible('methanol').state({ T: '20 °C', p: '1 atm' });
    expect([st.mu, st.lambda, st.Pr, st.nu, st.alpha]).toEqual([undefined, undefined, undefined, undefined, undefined]);
    // light fuel oil: conductivity from the recalled petroleum correlation, viscosity left out
    const fuel = incompressible('light fuel oil');
    expectClose(fuel.thermalConductivity('50 °C').si, (0.138 + 0.1305) / 2, { rel: 1e-14 });
    expect(() => fuel.viscosity('50 °C')).toThrow(/grade/);
  });
  it('user definitions: a constant, a table, and each bad field named by its path', () => {
    const oil = incompressible({
      name: 'test oil', state: 'liquid', c: '2 kJ/(kg·K)', density: '900 kg/m³', T: { min: '0 °C', max: '100 °C' },
      viscosity: { table: { T: [0, 100], mu: [100, 5] }, unit: 'mPa·s', temperatureUnit: '°C' },
      thermalConductivity: { value: '0.14 W/(m·K)' },
    });
    expect(oil.viscosity('100 °C').si).toBe(0.005);
    expect(oil.state({ T: '50 °C', p: '1 atm' }).lambda!.si).toBe(0.14);
    expect(oil.transportSource.thermalConductivity).toEqual({ title: 'user definition', basis: 'user', uncertainty: 'not stated' });
    const bad = () =>
      incompressible({
        name: 'bad', state: 'solid', c: '500 J/(kg·K)', density: '8000 kg/m³', T: { min: '300 K', max: '400 K' },
        viscosity: { value: '1 Pa·s' },
        thermalConductivity: { table: { T: [300, 300], lambda: [10, -1] }, unit: 'W/(m·K)', temperatureUnit: 'K' },
      });
    expect(bad).toThrow(DefinitionError);
    try {
      bad();
    } catch (e) {
      const paths = (e as DefinitionError).issues.map((i) => i.path.join('.'));
      expect(paths).toEqual(expect.arrayContaining(['viscosity', 'thermalConductivity.table.T.1', 'thermalConductivity.table.lambda.1']));
    }
    expect(() => incompressible({ name: 'u', state: 'liquid', c: '2 kJ/(kg·K)', density: '900 kg/m³', T: { min: '0 °C', max: '50 °C' }, thermalConductivity: { value: '0.1 Pa·s' } })).toThrow(/thermalConductivity.value/);
  });
});

describe('figures stated in docs/guide/transport.md (liquids and solids)', async () => {
  const { readFileSync } = await import('node:fs');
  const guide = readFileSync(new URL('../../docs/guide/transport.md', import.meta.url), 'utf8');
  const { saturationPressure } = await import('../../src/water/if97/region4.js');
  const { region1 } = await import('../../src/water/if97/region1.js');
  const { WaterProperties } = await import('../../src/water/if97/properties.js');
  const t = await import('../../src/water/transport/index.js');
  /** λ2/λ of the saturated liquid at T (K), with the IAPWS-95 enhancement inputs. */
  const share = (T: number) => {
    const st = region1(saturationPressure(T), T, new WaterProperties());
    const d = new t.CriticalEnhancementInputs();
    t.iapws95EnhancementInputs(T, st.rho, d, new t.Iapws95InputsWork());
    const out = new t.ConductivityResult();
    t.thermalConductivity(T, st.rho, true, d, out);
    return out.lambda2 / out.lambda;
  };
  it.each([
    [573.15, '1.2 %'],
    [620.65, '3.8 %'],
    [473.15, '0.2 %'],
  ])('the λ enhancement of the saturated liquid at %d K is %s of λ', (T, stated) => {
    expect(guide).toContain(stated);
    expect(`${(share(T) * 100).toFixed(1)} %`).toBe(stated);
  });
  it('nothing at 150 °C and below (the release sets λ2 = 0 there)', () => {
    expect(guide).toContain('nothing below about 150 °C');
    expect(share(423.15)).toBe(0);
    expect(share(373.15)).toBe(0);
  });
  it('engine oil at 305 K: 0.349 Pa·s (ln μ in 1/T) against 0.3695 Pa·s for a straight line', () => {
    expect(guide).toContain('0.349 Pa·s');
    expect(guide).toContain('0.3695 Pa·s');
    expect(incompressible('engine oil').viscosity('305 K').si.toFixed(3)).toBe('0.349');
    expectClose(incompressible('engine oil', { extrapolate: false }).viscosity('300 K').si / 2 + 0.253 / 2, 0.3695, { rel: 1e-12 });
  });
});
