/**
 * The dilute-gas transport facade (src/ideal-gas/transport-facade.ts): `gas.viscosity`,
 * `gas.thermalConductivity`, `gas.prandtl` and the lazy `mu`, `lambda`, `nu`, `alpha`, `Pr` of
 * `gas.state`, against the SI core (src/ideal-gas/transport.ts), the identities, the typed errors,
 * and air at 300 K against a handbook table.
 */
import { describe, expect, it } from 'vitest';
import { molarMass } from '../../src/chem/index.js';
import { DimensionError, InvalidInputError, OutOfRangeError, UnavailablePropertyError, UnitError } from '../../src/errors.js';
import { dryAir, idealGas, mixture, type IdealGas } from '../../src/ideal-gas/gas.js';
import { GasMixtureTransport, gasTransportIds, gasTransportModel } from '../../src/ideal-gas/transport.js';
import { expectClose } from '../helpers/tolerance.js';

describe('facade values are the SI core', () => {
  it.each(gasTransportIds())('%s: viscosity, thermalConductivity and prandtl at 300 K and 900 K', (id) => {
    const gas = idealGas(id);
    const core = gasTransportModel(id)!;
    expect(gas.transportCore).toBe(core);
    for (const T of [300, 900]) {
      if (T > core.Tmax) continue;
      expect(gas.viscosity(`${T} K`).si).toBe(core.mu(T));
      expect(gas.thermalConductivity(`${T} K`).si).toBe(core.lambda(T));
      // Pr with the gas's own cp (for 'air' the pseudo-species' cp, which differs from the components' mass-weighted cp that core.cp gives by 0.01 % at 300 K and 0.075 % at 900 K)
      expectClose(gas.prandtl(`${T} K`), (core.mu(T) * gas.cp(`${T} K`).si) / core.lambda(T), { rel: 1e-14 });
      expectClose(gas.prandtl(`${T} K`), (core.mu(T) * core.cp(T)) / core.lambda(T), { rel: 1e-3 });
    }
  });
  it('the caller\'s units: 80 °F is 299.8167 K; results are quantities of their dimensions', () => {
    const n2 = idealGas('N2');
    const core = gasTransportModel('N2')!;
    const mu = n2.viscosity('80 °F');
    expectClose(mu.si, core.mu(299.81666666666666), { rel: 1e-15 });
    expect(mu.dimension).toBe('dynamicViscosity');
    expect(n2.thermalConductivity('80 °F').dimension).toBe('thermalConductivity');
    expectClose(mu.in('cP'), mu.si * 1e3, { rel: 1e-15 });
    expect(typeof n2.prandtl('26.85 °C')).toBe('number');
  });
  it('a mixture is the Wilke / Mason-Saxena mixture of its components', () => {
    const gas = mixture({ N2: 0.79, O2: 0.21 });
    const core = new GasMixtureTransport([gasTransportModel('N2')!, gasTransportModel('O2')!], [0.79, 0.21]);
    expectClose(gas.viscosity('500 K').si, core.mu(500), { rel: 1e-15 });
    expectClose(gas.thermalConductivity('500 K').si, core.lambda(500), { rel: 1e-15 });
    // by mass fractions: the same mixture
    const byMass = mixture({ N2: 0.7671, O2: 0.2329 }, { fractions: 'mass', normalize: true });
    expectClose(byMass.viscosity('500 K').si, core.mu(500), { rel: 1e-4 });
  });
  it('dryAir() (the defined mixture) and idealGas("air") (the pseudo-species) agree', () => {
    for (const T of ['250 K', '300 K', '1200 K']) {
      expectClose(dryAir().viscosity(T).si, idealGas('air').viscosity(T).si, { rel: 1e-12 });
      expectClose(dryAir().thermalConductivity(T).si, idealGas('air').thermalConductivity(T).si, { rel: 1e-12 });
    }
  });
  it('a constant-cp gas has the same μ and λ (they use the species\' cp(T)); Pr uses its frozen cp', () => {
    const n2 = idealGas('N2');
    const frozen = n2.withConstantCp();
    expect(frozen.viscosity('800 K').si).toBe(n2.viscosity('800 K').si);
    expect(frozen.thermalConductivity('800 K').si).toBe(n2.thermalConductivity('800 K').si);
    expectClose(frozen.prandtl('800 K'), (frozen.viscosity('800 K').si * frozen.cp('800 K').si) / frozen.thermalConductivity('800 K').si, { rel: 1e-14 });
    expect(frozen.prandtl('800 K')).toBeLessThan(n2.prandtl('800 K')); // cp(298.15 K) < cp(800 K)
  });
});

describe('identities on states: Pr = μ cp/λ, ν = μ/ρ, α = λ/(ρ cp)', () => {
  const cases = [
    ['air', { T: '300 K', p: '1 atm' }],
    ['N2', { T: '1200 K', p: '5 bar' }],
    ['He', { T: '-40 °F', p: '14.7 psia' }],
    ['CH4', { h: '500 kJ/kg', p: '2 MPa' }],
    ['CO2', { s: '5 kJ/(kg·K)', p: '100 kPa' }],
    ['n-C4H10', { T: '400 K', p: '50 kPa' }],
  ] as const;
  it.each(cases)('%s at %o', (id, pair) => {
    const st = idealGas(id).state(pair as never);
    const mu = st.mu!.si;
    const lambda = st.lambda!.si;
    const cp = st.cp.si;
    const rho = st.rho.si;
    expectClose(st.Pr!, (mu * cp) / lambda, { rel: 1e-15 });
    expectClose(st.nu!.si, mu / rho, { rel: 1e-15 });
    expectClose(st.alpha!.si, lambda / (rho * cp), { rel: 1e-15 });
    // and they are the methods' values at the state's temperature
    expect(mu).toBe(idealGas(id).viscosity(st.T).si);
    expect(lambda).toBe(idealGas(id).thermalConductivity(st.T).si);
  });
  it('on a molar basis the identities use the mass cp (cp_molar / M)', () => {
    const st = idealGas('O2', { basis: 'molar' }).state({ T: '600 K', p: '1 atm' });
    const cpMass = st.cp.si / molarMass('O2').si;
    expectClose(st.Pr!, (st.mu!.si * cpMass) / st.lambda!.si, { rel: 1e-14 });
    expectClose(st.alpha!.si, st.lambda!.si / (st.rho.si * cpMass), { rel: 1e-14 });
    expectClose(st.Pr!, idealGas('O2').prandtl('600 K'), { rel: 1e-14 });
  });
  it('μ and λ do not depend on pressure; ν and α fall as 1/p', () => {
    const gas = idealGas('air');
    const a = gas.state({ T: '400 K', p: '100 kPa' });
    const b = gas.state({ T: '400 K', p: '1 MPa' });
    expect(b.mu!.si).toBe(a.mu!.si);
    expectClose(b.nu!.si, a.nu!.si / 10, { rel: 1e-14 });
    expectClose(b.alpha!.si, a.alpha!.si / 10, { rel: 1e-14 });
  });
  it('the transport values are getters read by name (on the prototype), the same on every read; JSON has them, a spread has only the thermodynamic fields', () => {
    const st = idealGas('N2').state({ T: '300 K', p: '1 atm' });
    for (const key of ['mu', 'lambda', 'nu', 'alpha', 'Pr']) expect(key in st).toBe(true);
    expect(Object.keys(st)).toEqual(['T', 'p', 'v', 'rho', 'cp', 'cv', 'k', 'h', 'hSensible', 'u', 's', 'extrapolated']);
    expect(st.mu!.si).toBe(st.mu!.si);
    expect(st.Pr).toBe(st.Pr);
    const json = JSON.parse(JSON.stringify(st)) as Record<string, unknown>;
    expect(json.Pr).toBe(st.Pr);
    expect(json.mu).toEqual(JSON.parse(JSON.stringify(st.mu)));
    expect(json.h).toEqual(JSON.parse(JSON.stringify(st.h)));
    expect('mu' in { ...st }).toBe(false);
  });
  it('undefined on states without transport data or outside its range (the state itself is fine)', () => {
    const none = [
      idealGas('H2O').state({ T: '400 K', p: '1 atm' }),
      mixture({ N2: 0.72, CO2: 0.09, H2O: 0.17, O2: 0.02 }).state({ T: '600 K', p: '1 atm' }),
      idealGas({ name: 'my gas', M: '44 g/mol', cp: '0.9 kJ/(kg·K)' }).state({ T: '300 K', p: '1 atm' }),
      idealGas('He').state({ T: '1500 K', p: '1 atm' }), // above 100 ε/k = 1022 K
      idealGas('N2').state({ T: '3000 K', p: '1 atm' }), // above the 2000 K cap
      idealGas('N2', { extrapolate: true }).state({ T: '150 K', p: '1 atm' }), // below 200 K
    ];
    for (const st of none) {
      expect(st.h.si).toBeTypeOf('number');
      expect([st.mu, st.lambda, st.nu, st.alpha, st.Pr]).toEqual([undefined, undefined, undefined, undefined, undefined]);
    }
  });
});

describe('typed errors', () => {
  it('a gas without transport data: UnavailablePropertyError naming it and listing the gases that have data', () => {
    for (const call of [(g: IdealGas) => g.viscosity('300 K'), (g: IdealGas) => g.thermalConductivity('300 K'), (g: IdealGas) => g.prandtl('300 K')]) {
      let error: unknown;
      try {
        call(idealGas('NH3'));
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(UnavailablePropertyError);
      const e = error as UnavailablePropertyError;
      expect(e.code).toBe('property.unavailable');
      expect(e.substance).toBe('NH3');
      expect(e.available).toEqual(gasTransportIds());
      expect(e.message).toMatch(/^NH3 has no dilute-gas transport data: not in the dilute-gas transport catalogue/);
      expect(e.message).toContain('CO2');
      expect(e.message).toContain('air');
    }
  });
  it('a user-defined gas names itself; a mixture names the component without data', () => {
    expect(() => idealGas({ name: 'octane vapour', M: molarMass('C8H18'), cp: '1.7 kJ/(kg·K)' }).viscosity('400 K')).toThrow(/octane vapour has no dilute-gas transport data: a user-defined gas carries no transport data/);
    expect(() => mixture({ N2: 0.72, CO2: 0.09, H2O: 0.17, O2: 0.02 }).thermalConductivity('600 K')).toThrow(/H2O has no dilute-gas transport data: the mixture's component H2O/);
    expect(() => dryAir().withConstantCp().viscosity('300 K')).not.toThrow();
  });
  it('above the range, called in °F: the message and the data give the °F limits', () => {
    let error: unknown;
    try {
      idealGas('He').viscosity('1500 °F');
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(OutOfRangeError);
    const e = error as OutOfRangeError;
    expect(e.range.quantity).toBe('T');
    expect(e.range.max).toBeCloseTo(1022, 9); // 100 ε/k for He, K
    expect(e.range.given?.unit).toBe('°F');
    expectClose(e.range.given!.max, 1022 * 1.8 - 459.67, { rel: 1e-12 });
    expectClose(e.range.given!.min, 200 * 1.8 - 459.67, { rel: 1e-12 });
    expect(e.message).toContain('T = 1500 °F');
    expect(e.message).toContain('the dilute-gas transport data for He');
    expect(e.message).toContain('1379.93 °F');
    expect(e.message).toContain('valid range -99.67 to 1379.93 °F');
  });
  it('below the range in °C, above in K (the 2000 K cap of the data)', () => {
    expect(() => idealGas('N2').thermalConductivity('-100 °C')).toThrow(/T = -100 °C \(173\.15 K\) is below the lower limit of the dilute-gas transport data for N2 \(-73\.15 °C \(200 K\)\)/);
    expect(() => idealGas('air').prandtl('2500 K')).toThrow(/T = 2500 K is above the upper limit of the dilute-gas transport data for air \(2000 K\)/);
    // the gas's own data reach 6000 K; the transport data do not, and extrapolation does not extend them
    expect(() => idealGas('N2', { extrapolate: true }).viscosity('3000 K')).toThrow(OutOfRangeError);
  });
  it('bad temperatures: a bare number, a pressure, text that is no quantity', () => {
    expect(() => idealGas('N2').viscosity(300 as never)).toThrow(InvalidInputError);
    expect(() => idealGas('N2').viscosity('1 bar' as never)).toThrow(DimensionError);
    expect(() => idealGas('N2').viscosity('NaN K' as never)).toThrow(UnitError);
  });
});

describe('air at 300 K and 1 atm against Incropera et al., Fundamentals of Heat and Mass Transfer, Table A.4 (from memory)', () => {
  // Table A.4, air at 300 K: μ = 184.6e-7 N·s/m², ν = 15.89e-6 m²/s, k = 26.3e-3 W/(m·K), α = 22.5e-6 m²/s, Pr = 0.707
  const st = idealGas('air').state({ T: '300 K', p: '1 atm' });
  it('μ within 2 % (the viscosity method\'s uncertainty)', () => expectClose(st.mu!.si, 184.6e-7, { rel: 0.02 }));
  it('ν within 2 % (μ\'s uncertainty; ρ of an ideal gas at 1 atm is exact to 0.1 %)', () => expectClose(st.nu!.si, 15.89e-6, { rel: 0.02 }));
  it('λ within 10 % (modified Eucken, polyatomic)', () => expectClose(st.lambda!.si, 26.3e-3, { rel: 0.1 }));
  it('α within 10 % (λ\'s uncertainty)', () => expectClose(st.alpha!.si, 22.5e-6, { rel: 0.1 }));
  it('Pr within 12 % (μ and λ combined)', () => expectClose(st.Pr!, 0.707, { rel: 0.12 }));
});

describe('nitrogen at 800 K and 1 atm against Incropera et al., Table A.4 (from memory)', () => {
  // Table A.4, nitrogen at 800 K: μ = 335.8e-7 N·s/m², k = 54.8e-3 W/(m·K), Pr = 0.687; the data file
  // states about 3 % for μ away from room temperature, 10 % for λ of a polyatomic gas
  const st = idealGas('N2').state({ T: '800 K', p: '1 atm' });
  it('μ within 3 %', () => expectClose(st.mu!.si, 335.8e-7, { rel: 0.03 }));
  it('λ within 10 %', () => expectClose(st.lambda!.si, 54.8e-3, { rel: 0.1 }));
  it('Pr within 12 %', () => expectClose(st.Pr!, 0.687, { rel: 0.12 }));
});
