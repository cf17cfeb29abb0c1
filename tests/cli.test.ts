/**
 * The `heatstate` command: every subcommand in SI and US units (values checked against the
 * library's own functions, never hard-coded), JSON output, the help text's examples, and a
 * catalogue of malformed command lines with their exit codes and one-line messages.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { run } from '../src/cli/run.js';
import { helpText } from '../src/cli/help.js';
import { formatNumber } from '../src/errors.js';
import { fluid } from '../src/fluids/index.js';
import { humidAir } from '../src/humid-air/index.js';
import { idealGas } from '../src/ideal-gas/index.js';
import { incompressible } from '../src/incompressible/index.js';
import { Quantity, quantity } from '../src/units/quantity.js';
import { water } from '../src/water/index.js';
import { expectClose } from './helpers/tolerance.js';

function cli(...args: string[]): { code: number; out: string; err: string } {
  let out = '';
  let err = '';
  const code = run(args, (s) => (out += s), (s) => (err += s));
  return { code, out, err };
}
const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
/** The number printed in the table's row `name`. */
const field = (out: string, name: string) => Number(new RegExp(`^${escape(name)}\\s+(\\S+)`, 'm').exec(out)![1]);
/** The table's six significant digits. */
const six = (x: number) => Number(x.toPrecision(6));
type JsonValue = { value: number; unit: string } | number | string | null;
/** The command's JSON output (it must parse). */
function json(...args: string[]): Record<string, JsonValue> {
  const r = cli(...args, '--json');
  expect(r.err, args.join(' ')).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.out) as Record<string, JsonValue>;
}
const value = (v: JsonValue | undefined) => (v as { value: number }).value;
const unit = (v: JsonValue | undefined) => (v as { unit: string }).unit;

describe('heatstate water and sat', () => {
  it('a water state as an aligned table matches the library (SI)', () => {
    const r = cli('water', 'p=10 MPa', 'T=500 °C');
    expect(r.code).toBe(0);
    const st = water.state({ p: '10 MPa', T: '500 °C' });
    expect(field(r.out, 'h')).toBe(six(st.h.in('kJ/kg')));
    expect(field(r.out, 'superheat')).toBe(six(st.superheat!.in('ΔK')));
    expect(r.out).toMatch(/^phase\s+vapor$/m);
  });
  it('US units and JSON for scripts', () => {
    const body = json('water', 'p=150psig', 'x=0.95', '--units', 'us');
    expect(body.h).toEqual({ value: water.state({ p: '150 psig', x: 0.95 }).h.in('Btu/lbm'), unit: 'Btu/lbm' });
    expect(body.T).toEqual({ value: water.state({ p: '150 psig', x: 0.95 }).T.in('°F'), unit: '°F' });
    expect(body.cp).toBeNull();
  });
  it('a saturation row in SI and US', () => {
    expect(field(cli('sat', 'p=1 atm').out, 'hfg')).toBe(six(water.saturation({ p: '1 atm' }).hfg.in('kJ/kg')));
    const us = json('sat', 'T=212degF', '--units', 'us');
    expect(us.p).toEqual({ value: water.saturation({ T: '212 °F' }).p.in('psia'), unit: 'psia' });
    expect(us.sg).toEqual({ value: water.saturation({ T: '212 °F' }).vapor.s.in('Btu/(lbm·°R)'), unit: 'Btu/(lbm·°R)' });
  });
});

describe('heatstate water --transport (IAPWS R12-08, R15-11 through the water facade)', () => {
  it('liquid at 25 °C: μ, λ, ν, α and Pr as the state gives them', () => {
    const body = json('water', 'T=25 °C', 'p=1 atm', '--transport');
    const st = water.state({ T: '25 °C', p: '1 atm' });
    expect(body.mu).toEqual({ value: st.mu!.in('mPa·s'), unit: 'mPa·s' });
    expect(body.lambda).toEqual({ value: st.lambda!.in('W/(m·K)'), unit: 'W/(m·K)' });
    // identities: nu = mu/rho, alpha = lambda/(rho cp), Pr = mu cp/lambda
    expectClose(value(body.nu), st.mu!.si / st.rho.si, { rel: 1e-14 });
    expectClose(value(body.alpha), st.lambda!.si / (st.rho.si * st.cp!.si), { rel: 1e-14 });
    expectClose(body.Pr as number, (st.mu!.si * st.cp!.si) / st.lambda!.si, { rel: 1e-14 });
  });
  it('supercritical steam near the critical density: the values include the critical enhancement', () => {
    const body = json('water', 'T=650 K', 'p=25 MPa', '--transport');
    const st = water.state({ T: '650 K', p: '25 MPa' });
    expect(value(body.lambda)).toBe(st.lambda!.in('W/(m·K)'));
    const without = water.thermalConductivity({ T: st.T, rho: st.rho }, { criticalEnhancement: false });
    expect(st.lambda!.si).toBeGreaterThan(without.si * 1.05);
  });
  it('US units: lbm/(ft·h), Btu/(h·ft·°F), ft²/h; Pr is the same number', () => {
    const si = json('water', 'T=400degF', 'p=500psia', '--transport');
    const us = json('water', 'T=400degF', 'p=500psia', '--transport', '--units', 'us');
    expect(unit(us.mu)).toBe('lbm/(ft·h)');
    expect(value(us.mu)).toBe(quantity(value(si.mu), 'mPa·s').in('lbm/(ft·h)'));
    expect(value(us.lambda)).toBe(quantity(value(si.lambda), 'W/(m·K)').in('Btu/(h·ft·°F)'));
    expect(value(us.nu)).toBe(quantity(value(si.nu), 'm²/s').in('ft²/h'));
    expect(unit(us.alpha)).toBe('ft²/h');
    expect(us.Pr).toBe(si.Pr);
  });
  it('two-phase states have no single transport value; sat --transport gives both phases and σ', () => {
    const two = json('water', 'T=300 K', 'x=0.5', '--transport');
    expect(two.mu).toBeNull();
    const body = json('sat', 'T=100 °C', '--transport');
    const sat = water.saturation({ T: '100 °C' });
    expect(value(body.muf)).toBe(sat.liquid.mu!.in('mPa·s'));
    expect(value(body.lambdag)).toBe(sat.vapor.lambda!.in('W/(m·K)'));
    expect(body.sigma).toEqual({ value: sat.sigma!.in('mN/m'), unit: 'mN/m' });
    expect(json('sat', 'T=212degF', '--transport', '--units', 'us').sigma).toEqual({ value: sat.sigma!.in('lbf/ft'), unit: 'lbf/ft' });
  });
  it('outside the releases (above 1173.15 K): no transport values, and the output says why', () => {
    const body = json('water', 'T=1200 K', 'p=1 MPa', '--transport');
    expect(body.mu).toBeNull();
    expect(body.transport).toMatch(/outside IAPWS R12-08\/R15-11/);
  });
});

describe('heatstate gas and liquid', () => {
  it('an ideal-gas property at T and a state from (h, p), SI and US', () => {
    expect(field(cli('gas', 'N2', 'T=800 K').out, 'cp')).toBe(six(idealGas('N2').cp('800 K').in('kJ/(kg·K)')));
    const air = idealGas('air');
    const body = json('gas', 'air', 'h=500 kJ/kg', 'p=1 atm');
    expect(value(body.T)).toBe(air.state({ h: '500 kJ/kg', p: '1 atm' }).T.in('K'));
    const us = json('gas', 'air', 'T=1000degF', 'p=100psia', '--units', 'us');
    expect(us.s).toEqual({ value: air.state({ T: '1000 °F', p: '100 psia' }).s.in('Btu/(lbm·°R)'), unit: 'Btu/(lbm·°R)' });
  });
  it('an incompressible Δh, SI and US', () => {
    const dh = incompressible('copper').deltaH({ T: '20 °C', p: '101.325 kPa' }, { T: '120 °C', p: '101.325 kPa' });
    expect(field(cli('liquid', 'copper', 'T1=20 °C', 'T2=120 °C').out, 'delta h')).toBe(six(dh.in('kJ/kg')));
    const us = json('liquid', 'water', 'T1=25degC', 'T2=25degC', 'p1=1 atm', 'p2=500 psia', '--units', 'us');
    expect(value(us['delta h'])).toBe(incompressible('water').deltaH({ T: '25 °C', p: '1 atm' }, { T: '25 °C', p: '500 psia' }).in('Btu/lbm'));
  });
  it('liquid --transport: μ, λ, ν, α and Pr at both states as the substance state gives them (SI and US)', () => {
    const oil = incompressible('engine oil');
    const body = json('liquid', 'engine oil', 'T1=20 °C', 'T2=60 °C', '--transport');
    for (const [k, T] of [['1', '20 °C'], ['2', '60 °C']] as const) {
      const st = oil.state({ T, p: '1 atm' });
      expect(body[`mu${k}`]).toEqual({ value: st.mu!.in('mPa·s'), unit: 'mPa·s' });
      expect(body[`lambda${k}`]).toEqual({ value: st.lambda!.in('W/(m·K)'), unit: 'W/(m·K)' });
      expect(body[`nu${k}`]).toEqual({ value: st.nu!.in('m²/s'), unit: 'm²/s' });
      expect(body[`alpha${k}`]).toEqual({ value: st.alpha!.in('m²/s'), unit: 'm²/s' });
      expect(body[`Pr${k}`]).toBe(st.Pr);
      expect(body[`transport${k}`]).toBeUndefined();
    }
    const us = json('liquid', 'water', 'T1=77degF', 'T2=190degF', '--transport', '--units', 'us');
    expect(value(us.lambda2)).toBe(incompressible('water').state({ T: '190 °F', p: '1 atm' }).lambda!.in('Btu/(h·ft·°F)'));
  });
  it('liquid --transport: a solid has λ and α only; where the data stop, a transport row says why in the caller\'s units', () => {
    const copper = json('liquid', 'copper', 'T1=20 °C', 'T2=1000 °C', '--transport');
    expect(Object.keys(copper).filter((k) => /^(mu|nu|Pr)\d/.test(k))).toEqual([]);
    expect(copper.lambda1).toEqual({ value: incompressible('copper').thermalConductivity('20 °C').in('W/(m·K)'), unit: 'W/(m·K)' });
    expect(copper.lambda2).toBeNull();
    expect(copper.transport1).toBeUndefined();
    // the facade's OutOfRangeError message, in °C as given, without the library option it suggests
    expect(copper.transport2).toMatch(/^T = 1000 °C \(1273\.15 K\) is above the upper limit of the thermal conductivity data for copper/);
    expect(copper.transport2).not.toContain('extrapolate');
    // a liquid whose data leave μ and λ out: both reasons, from the facade's UnavailablePropertyError
    const ethanol = json('liquid', 'ethanol', 'T1=20 °C', 'T2=30 °C', '--transport');
    expect(ethanol.mu1).toBeNull();
    expect(ethanol.transport1).toMatch(/^ethanol has no viscosity data.*; ethanol has no thermal conductivity data/);
  });
});

describe('heatstate air, air-mix and coil (humid air)', () => {
  it('a state from T and RH: W in g/kg (SI) and gr/lbm (US), against humidAir.state', () => {
    const st = humidAir.state({ T: '30 °C', RH: 0.5 });
    const si = json('air', 'T=30 °C', 'RH=50%');
    expect(si.W).toEqual({ value: st.W.in('g/kg'), unit: 'g/kg' });
    expect(si.h).toEqual({ value: st.h.in('kJ/kg'), unit: 'kJ/kg' });
    expect(si.Twb).toEqual({ value: st.Twb!.in('K'), unit: 'K' });
    const us = json('air', 'T=30 °C', 'RH=0.5', '--units', 'us');
    expect(us.W).toEqual({ value: st.W.in('gr/lbm'), unit: 'gr/lbm' });
    expect(us.Tdp).toEqual({ value: st.Tdp!.in('°F'), unit: '°F' });
    expect(field(cli('air', 'T=30 °C', 'RH=0.5').out, 'W')).toBe(six(st.W.in('g/kg')));
  });
  it('W as a humidity ratio in any unit, and altitude', () => {
    const st = humidAir.state({ T: '24 °C', W: 0.009, p: '95 kPa' });
    // 9 g/kg and 63 gr/lbm are 0.009 kg/kg up to the conversion's rounding
    expectClose(json('air', 'T=24 °C', 'W=9 g/kg', 'p=95 kPa').RH as number, st.RH, { rel: 1e-12 });
    expectClose(json('air', 'T=24 °C', 'W=63 gr/lbm', 'p=95 kPa').RH as number, st.RH, { rel: 1e-12 });
    const alt = humidAir.state({ T: '86 °F', Twb: '70 °F', altitude: '5000 ft' });
    const us = json('air', 'T=86degF', 'Twb=70degF', 'altitude=5000 ft', '--units', 'us');
    expect(us.p).toEqual({ value: alt.p.in('psia'), unit: 'psia' });
    expect(us['p from']).toBe('altitude');
    const hot = humidAir.state({ T: '60 °C', RH: 0.2 });
    expect(json('air', 'T=60 °C', 'RH=0.2').W).toEqual({ value: hot.W.in('g/kg'), unit: 'g/kg' });
  });
  it('air-mix: the mixed state of humidAir.mix, with mass flows and with volume flows at each stream', () => {
    const a = humidAir.state({ T: '32 °C', RH: 0.5 });
    const b = humidAir.state({ T: '24 °C', RH: 0.5 });
    const mixed = humidAir.mix([{ state: a, flow: '1 kg/s' }, { state: b, flow: '3 kg/s' }]);
    const si = json('air-mix', 'T1=32 °C', 'RH1=0.5', 'flow1=1 kg/s', 'T2=24 °C', 'RH2=50%', 'flow2=3 kg/s');
    expect(si.T).toEqual({ value: mixed.leaving.T.in('K'), unit: 'K' });
    expect(si.h).toEqual({ value: mixed.leaving.h.in('kJ/kg'), unit: 'kJ/kg' });
    expect(si.flow).toEqual({ value: 4, unit: 'kg/s' });
    const o = humidAir.state({ T: '95 °F', Twb: '75 °F' });
    const r = humidAir.state({ T: '75 °F', RH: 0.5 });
    const m = (cfm: string, st: typeof o) => Quantity.fromSI(quantity(cfm).si / st.v.si, 'massFlow');
    const byVolume = humidAir.mix([{ state: o, flow: m('2000 cfm', o) }, { state: r, flow: m('6000 cfm', r) }]);
    const us = json('air-mix', 'T1=95degF', 'Twb1=75degF', 'flow1=2000 cfm', 'T2=75degF', 'RH2=50%', 'flow2=6000 cfm', '--units', 'us');
    expect(us.T).toEqual({ value: byVolume.leaving.T.in('°F'), unit: '°F' });
    expect(us.flow).toEqual({ value: byVolume.flow.in('lbm/h'), unit: 'lbm/h' });
    const three = json('air-mix', 'T1=30 °C', 'RH1=0.4', 'flow1=1 kg/s', 'T2=20 °C', 'RH2=0.5', 'flow2=1 kg/s', 'T3=25 °C', 'W3=0.01', 'flow3=2 kg/s');
    expect(three.flow).toEqual({ value: 4, unit: 'kg/s' });
  });
  it('coil from ADP and BF (SI) and from T2 and RH2 (US): loads of humidAir.coolingCoil', () => {
    const inlet = humidAir.state({ T: '26 °C', RH: 0.5 });
    const coil = humidAir.coolingCoil({ inlet, flow: '4 kg/s', ADP: '10 °C', bypassFactor: 0.15 });
    const si = json('coil', 'T1=26 °C', 'RH1=0.5', 'flow=4 kg/s', 'ADP=10 °C', 'BF=0.15');
    expect(si['coil duty']).toEqual({ value: coil.heat.negate().in('kW'), unit: 'kW' });
    expect(si.sensible).toEqual({ value: coil.sensible.in('kW'), unit: 'kW' });
    expect(si.SHR).toBe(coil.sensibleHeatRatio);
    expect(si.T2).toEqual({ value: coil.leaving.T.in('K'), unit: 'K' });
    expect(si.condensate).toEqual({ value: -coil.water!.flow.in('kg/s'), unit: 'kg/s' });
    const inletUs = humidAir.state({ T: '80 °F', Twb: '67 °F' });
    const flow = Quantity.fromSI(quantity('8000 cfm').si / inletUs.v.si, 'massFlow');
    const coilUs = humidAir.coolingCoil({ inlet: inletUs, flow, T2: '55 °F', RH2: 0.9 });
    const us = json('coil', 'T1=80degF', 'Twb1=67degF', 'flow=8000 cfm', 'T2=55degF', 'RH2=90%', '--units', 'us');
    expect(us.total).toEqual({ value: coilUs.total.in('Btu/h'), unit: 'Btu/h' });
    expect(us['coil duty (TR)']).toEqual({ value: coilUs.heat.negate().in('TR'), unit: 'TR' });
    expect(us.W2).toEqual({ value: coilUs.leaving.W.in('gr/lbm'), unit: 'gr/lbm' });
  });
});

describe('heatstate fluid (IAPWS-95)', () => {
  it('a state and a saturation row in SI, against fluid("water")', () => {
    const f = fluid('water');
    const st = json('fluid', 'water', 'T=500 K', 'rho=838.025 kg/m³');
    expect(st.p).toEqual({ value: f.state({ T: '500 K', rho: '838.025 kg/m³' }).p.in('kPa'), unit: 'kPa' });
    expect(st.equation).toBe('IAPWS-95');
    const sat = json('fluid', 'water', 'sat', 'p=101.325 kPa');
    expect(sat.T).toEqual({ value: f.saturation({ p: '101.325 kPa' }).T.in('K'), unit: 'K' });
    expect(sat.hfg).toEqual({ value: f.saturation({ p: '101.325 kPa' }).hfg.in('kJ/kg'), unit: 'kJ/kg' });
  });
  it('US units, by refrigerant designation', () => {
    const st = fluid('R-718').state({ T: '300 °F', p: '50 psia' });
    const us = json('fluid', 'R-718', 'T=300degF', 'p=50psia', '--units', 'us');
    expect(us.h).toEqual({ value: st.h.in('Btu/lbm'), unit: 'Btu/lbm' });
    expect(us.superheat).toEqual({ value: st.superheat!.in('Δ°F'), unit: 'Δ°F' });
    expect(unit(us.muJT)).toBe('°F/psi');
    expect(json('fluid', 'water', 'sat', 'T=212degF', '--units', 'us').p).toEqual({ value: fluid('water').saturation({ T: '212 °F' }).p.in('psia'), unit: 'psia' });
  });
});

/** Splits an example line as a shell would (double quotes only). */
function words(line: string): string[] {
  const out: string[] = [];
  let cur = '';
  let open = false;
  let any = false;
  for (const c of line) {
    if (c === '"') {
      open = !open;
      any = true;
    } else if (c === ' ' && !open) {
      if (any) out.push(cur);
      cur = '';
      any = false;
    } else {
      cur += c;
      any = true;
    }
  }
  if (any) out.push(cur);
  return out;
}

describe('heatstate --help', () => {
  it('shows usage, options, exit codes and examples', () => {
    const r = cli('--help');
    expect(r.code).toBe(0);
    expect(r.out).toContain('examples:');
    expect(r.out).toContain('heatstate water p="10 MPa" T="500 °C"');
    for (const c of ['water', 'sat', 'gas', 'liquid', 'air', 'air-mix', 'coil', 'fluid', '--transport', 'Exit code']) expect(r.out).toContain(c);
    expect(cli('water', '--help').code).toBe(0);
  });
  const lines = helpText().split('\n');
  const examples = lines.slice(lines.indexOf('examples:') + 1).filter((l) => l.startsWith('  heatstate '));
  it('has examples for every subcommand, in SI and US', () => {
    for (const c of ['water', 'sat', 'gas', 'liquid', 'air', 'air-mix', 'coil', 'fluid']) {
      expect(examples.some((l) => words(l.trim())[1] === c && !l.includes('--units us')), c).toBe(true);
    }
    for (const c of ['water', 'sat', 'liquid', 'air', 'air-mix', 'coil', 'fluid']) expect(examples.some((l) => words(l.trim())[1] === c && l.includes('--units us')), c).toBe(true);
  });
  it.each(examples.map((l) => [l.trim()]))('runs: %s', (line) => {
    const r = cli(...words(line).slice(1));
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out.length).toBeGreaterThan(0);
    if (line.includes('--json')) expect(() => JSON.parse(r.out) as unknown).not.toThrow();
  });
});

describe('range errors under --units us', () => {
  it('SI input: the library wording, then the value and the limits in US units', () => {
    const r = cli('water', 'T=5000 K', 'p=1 MPa', '--units', 'us');
    expect(r.code).toBe(1);
    expect(r.err).toContain('T = 5000 K is above the upper limit of IAPWS-IF97 region 5 (2273.15 K)');
    expect(r.err).toContain(`in US units T = ${formatNumber(quantity('5000 K').in('°F'))} °F, valid range ${formatNumber(quantity('273.15 K').in('°F'))} to ${formatNumber(quantity('2273.15 K').in('°F'))} °F`);
  });
  it('US input: the library already speaks the user’s unit, nothing is added', () => {
    const r = cli('water', 'T=5000degF', 'p=100psia', '--units', 'us');
    expect(r.err).toContain('T = 5000 degF');
    expect(r.err).not.toContain('in US units');
  });
  it('humid-air errors speak the unit the user wrote, with SI beside it', () => {
    const r = cli('air', 'T=500degF', 'RH=0.5', '--units', 'us');
    expect(r.code).toBe(1);
    expect(r.err).toContain('T = 500 degF');
    expect(r.err).not.toContain('in US units');
  });
  it('SI output keeps the library wording alone', () => {
    expect(cli('water', 'T=5000 K', 'p=1 MPa').err).not.toContain('US units');
  });
});

/** [command line, exit code, text the message must contain (the offending input)]. */
type Case = readonly [readonly string[], 1 | 2, string];
const CATALOGUE: Record<string, readonly Case[]> = {
  'over- or under-determined input, unknown names': [
    [['sat', 'T=300K', 'p=1MPa'], 2, '{ T, p }'],
    [['water', 'T=300K', 'p=1MPa', 'h=100kJ/kg'], 2, '{ T, p, h }'],
    [['gas', 'N2', 'O2', 'T=300K'], 2, '"N2", "O2"'],
    [['water', 'p=10 MPa'], 2, '{ p }'],
    [['water', 'T=300K', 'h=100kJ/kg'], 2, '{ T, h }'],
    [['air', 'T=30degC'], 2, '{ T }'],
    [['air', 'T=30degC', 'RH=0.5', 'W=0.01'], 2, '{ T, RH, W }'],
    [['air', 'T=30degC', 'RH=0.5', 'p=1atm', 'altitude=100m'], 2, 'p=1atm and altitude=100m'],
    [['air-mix', 'T1=30degC', 'RH1=0.5', 'flow1=1kg/s'], 2, 'stream 1 only'],
    [['air-mix', 'T1=30degC', 'RH1=0.5', 'flow1=1kg/s', 'T3=20degC', 'RH3=0.5', 'flow3=1kg/s'], 2, 'stream 2 is missing'],
    [['air-mix', 'T1=30degC', 'RH1=0.5', 'flow1=1kg/s', 'T2=20degC', 'RH2=0.5'], 2, 'flow2'],
    [['air-mix', 'T1=30degC', 'RH1=0.5', 'W1=0.01', 'flow1=1kg/s', 'T2=20degC', 'RH2=0.5', 'flow2=1kg/s'], 2, '{ T1, RH1, W1 }'],
    [['coil', 'T1=26degC', 'RH1=0.5', 'flow=4kg/s', 'ADP=10degC'], 2, '{ ADP }'],
    [['coil', 'T1=26degC', 'RH1=0.5', 'flow=4kg/s', 'ADP=10degC', 'BF=0.1', 'T2=15degC', 'RH2=0.9'], 2, '{ ADP, BF, T2, RH2 }'],
    [['coil', 'T1=26degC', 'RH1=0.5', 'ADP=10degC', 'BF=0.1'], 2, 'flow='],
    [['fluid', 'water', 'sat', 'T=300K', 'p=1MPa'], 2, '{ T, p }'],
    [['fluid', 'water', 'T=300K'], 2, '{ T }'],
    [['liquid', 'copper', 'T1=20degC'], 2, '{ T1 }'],
    [['water', 't=300K', 'p=1MPa'], 2, '"t"'],
    [['air', 'T=30degC', 'RH=0.5', 'Tw=20degC'], 2, '"Tw"'],
    [['gas', 'N2'], 2, 'under-determined'],
    [['sat'], 2, 'under-determined'],
  ],
  'empty values': [
    [['water', 'p=1MPa', 'x='], 1, 'x is empty'],
    [['water', 'T=', 'p=1MPa'], 1, 'T is empty'],
    [['air', 'T=30degC', 'RH='], 1, 'RH is empty'],
    [['water', 'T=   ', 'p=1MPa'], 1, 'T is empty'],
  ],
  'non-decimal and malformed numbers': [
    [['water', 'p=1MPa', 'x=0x1'], 1, 'x=0x1'],
    [['water', 'p=1MPa', 'x=1e'], 1, 'x=1e'],
    [['water', 'p=1MPa', 'x=0b1'], 1, 'x=0b1'],
    [['water', 'p=1MPa', 'x=0o7'], 1, 'x=0o7'],
    [['water', 'T=0x12C K', 'p=1MPa'], 1, 'T=0x12C K'],
    [['water', 'p=1MPa', 'x=1_0'], 1, 'x=1_0'],
    [['water', 'p=1MPa', 'x=0,5'], 1, 'x=0,5'],
    [['water', 'p=1MPa', 'x=Infinity'], 1, 'x=Infinity'],
    [['water', 'p=1MPa', 'x=NaN'], 1, 'x=NaN'],
    [['water', 'T=1e400K', 'p=1MPa'], 1, 'T=1e400K'],
    [['water', 'p=1MPa', 'x=١'], 1, 'x=١'],
    [['air', 'T=30degC', 'RH=0x32%'], 1, 'RH=0x32%'],
    [['coil', 'T1=26degC', 'RH1=0.5', 'flow=4kg/s', 'ADP=10degC', 'BF=1e+'], 1, 'BF=1e+'],
    [['water', 'p=1MPa', 'x=--1'], 1, 'x=--1'],
    [['water', 'p=1MPa', 'x=1.2.3'], 1, 'x=1.2.3'],
  ],
  'options and their values': [
    [['water', 'T=300K', 'p=1MPa', '--units', 'imperial'], 2, '"imperial"'],
    [['water', 'T=300K', 'p=1MPa', '--units=metric'], 2, '"metric"'],
    [['water', 'T=300K', 'p=1MPa', '--units'], 2, '--units needs a value'],
    [['water', 'T=300K', 'p=1MPa', '--frob'], 2, '"--frob"'],
    [['water', 'T=300K', 'p=1MPa', '--json=yes'], 2, '--json=yes'],
    [['water', 'T=300K', 'p=1MPa', '--units', 'si', '--units', 'us'], 2, '--units is given twice'],
    [['air', 'T=30degC', 'RH=0.5', '--model', 'fancy'], 2, '"--model"'],
    [['air', 'T=30degC', 'RH=0.5', '--transport'], 2, '--transport applies to heatstate water, sat, gas and liquid'],
    [['water', 'T=300K', 'p=1MPa', '--model', 'ideal'], 2, '--model'],
    [['water', 'T=300K', 'p=1MPa', '-x'], 2, '"-x"'],
  ],
  'names given twice, names that are not names': [
    [['water', 'p=1MPa', 'T=1K', 'T=2K'], 2, 'T is given twice (T=1K and T=2K)'],
    [['air', 'T=30degC', 'T=31degC', 'RH=0.5'], 2, 'T is given twice'],
    [['water', '=5', 'p=1MPa'], 2, '"=5"'],
    [['water', 'T K=5', 'p=1MPa'], 2, '"T K"'],
  ],
  'commands and words': [
    [['frobnicate'], 2, '"frobnicate"'],
    [[], 2, 'no command'],
    [['water', 'extra', 'p=1MPa', 'T=300K'], 2, '"extra"'],
    [['fluid', 'water', 'saturated', 'T=300K'], 2, '"saturated"'],
    [['gas', 'T=300K'], 2, 'species'],
  ],
  'values the library refuses': [
    [['water', 'p=10 MPa', 'T=5000 K'], 1, 'T = 5000 K'],
    [['water', 'T=300', 'p=1MPa'], 1, 'T=300'],
    [['water', 'T=300K', 'p=1 kg'], 1, 'p=1 kg'],
    [['water', 'T=300 °X', 'p=1MPa'], 1, '°X'],
    [['water', 'T=300K', 'p=-50psig'], 1, '-50 psig'],
    [['water', 'T=-500K', 'p=1MPa'], 1, '-500'],
    [['gas', 'unobtainium', 'T=300 K'], 1, '"unobtainium"'],
    [['fluid', 'steam', 'T=300K', 'p=1MPa'], 1, '"steam"'],
    [['air', 'T=30degC', 'RH=1.5'], 1, 'RH = 1.5'],
    [['air', 'W=0.01', 'Tdp=10degC'], 1, '{ W, Tdp }'],
    [['coil', 'T1=26degC', 'RH1=0.5', 'flow=4kg/s', 'ADP=10degC', 'BF=1.5'], 1, 'BF < 1'],
    [['coil', 'T1=26degC', 'RH1=0.5', 'flow=4K', 'ADP=10degC', 'BF=0.1'], 1, 'flow=4K'],
    [['water', 'p=1MPa', 'x=1.5'], 1, 'x = 1.5'],
    [['air-mix', 'T1=30degC', 'RH1=0.5', 'flow1=1kg/s', 'T2=20degC', 'RH2=0.5', 'flow2=0kg/s'], 1, 'flow2=0kg/s'],
    [['fluid', 'water', 'T=300K', 'x=-0.1'], 1, 'x = -0.1'],
  ],
};

describe('malformed command lines: one line on stderr, exit 1 (input) or 2 (usage), the input named, no stack trace', () => {
  const all = Object.values(CATALOGUE).flat();
  it('the catalogue holds at least 40 lines', () => {
    expect(all.length).toBeGreaterThanOrEqual(40);
  });
  for (const [group, cases] of Object.entries(CATALOGUE)) {
    it.each(cases.map((c) => [c[0].join(' '), c] as const))(`${group}: %s`, (_, [args, code, names]) => {
      const r = cli(...args);
      expect(r.code).toBe(code);
      expect(r.out).toBe('');
      expect(r.err).toMatch(/^heatstate: [^\n]+$/);
      expect(r.err).toContain(names);
      expect(r.err).not.toMatch(/\bat .+:\d+:\d+|internal error|TypeError|RangeError|ReferenceError|undefined|NaN K/);
    });
  }
});

describe('random command lines (fast-check)', () => {
  const heads = [['water'], ['sat'], ['gas', 'N2'], ['liquid', 'copper'], ['air'], ['air-mix'], ['coil'], ['fluid', 'water'], ['fluid', 'water', 'sat'], ['frobnicate']];
  const names = ['T', 'p', 'h', 's', 'x', 'v', 'rho', 'RH', 'W', 'Twb', 'Tdp', 'altitude', 'T1', 'T2', 'RH1', 'RH2', 'W1', 'flow', 'flow1', 'flow2', 'ADP', 'BF', 'p1', 'p2'];
  const values = ['300K', '1MPa', '0.5', '50%', '10 g/kg', '-40degF', '1e-300 Pa', '0x1', '1e', '5000 K', '22.064 MPa', '647.096 K', '1 kg/s', '2000 cfm', '0', '-1', '1e308 MPa', '273.15 K', '3000 kJ/kg', '7 kJ/(kg·K)', '322 kg/m³', '10 °C', '0.15'];
  it('end with exit code 0 and output, or 1 or 2 and one line on stderr; never an internal error, NaN or a stack trace', () => {
    fc.assert(
      fc.property(fc.constantFrom(...heads), fc.uniqueArray(fc.constantFrom(...names), { maxLength: 5 }), fc.array(fc.constantFrom(...values), { minLength: 5, maxLength: 5 }), fc.subarray(['--units=us', '--json', '--transport']), (head, keys, vals, options) => {
        const r = cli(...head, ...keys.map((k, i) => `${k}=${vals[i]}`), ...options);
        if (r.code === 0) return r.err === '' && r.out.length > 0 && !/NaN|Infinity/.test(r.out);
        return (r.code === 1 || r.code === 2) && r.out === '' && /^heatstate: [^\n]+$/.test(r.err) && !/internal error|NaN|\bat .+:\d+:\d+/.test(r.err);
      }),
      { numRuns: 1500 },
    );
  });
});
