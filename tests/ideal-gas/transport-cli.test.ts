/**
 * `heatstate gas … --transport` in-process (src/cli/run.ts, no dist/ needed): the rows are the
 * ideal-gas facade's dilute-gas values, and gases without transport data say so.
 */
import { describe, expect, it } from 'vitest';
import { run } from '../../src/cli/run.js';
import { idealGas } from '../../src/ideal-gas/gas.js';

function cli(...argv: string[]): { code: number; out: string; err: string } {
  let out = '';
  let err = '';
  const code = run(argv, (s) => (out += s), (s) => (err += s));
  return { code, out, err };
}
const json = (...argv: string[]) => JSON.parse(cli(...argv, '--json').out) as Record<string, { value: number; unit: string } | number | string | null>;

describe('heatstate gas --transport', () => {
  it('T and p: μ, λ, ν, α and Pr of the state, in SI display units', () => {
    const body = json('gas', 'N2', 'T=300 K', 'p=1 atm', '--transport');
    const st = idealGas('N2').state({ T: '300 K', p: '1 atm' });
    expect(body.mu).toEqual({ value: st.mu!.in('mPa·s'), unit: 'mPa·s' });
    expect(body.lambda).toEqual({ value: st.lambda!.in('W/(m·K)'), unit: 'W/(m·K)' });
    expect(body.nu).toEqual({ value: st.nu!.in('m²/s'), unit: 'm²/s' });
    expect(body.Pr).toBe(st.Pr);
    expect(body.transport).toBeUndefined();
  });
  it('T alone: μ, λ and Pr (no density, so no ν or α); --units us', () => {
    const body = json('gas', 'air', 'T=80degF', '--transport', '--units', 'us');
    expect(body.mu).toEqual({ value: idealGas('air').viscosity('80 °F').in('lbm/(ft·h)'), unit: 'lbm/(ft·h)' });
    expect(body.lambda).toEqual({ value: idealGas('air').thermalConductivity('80 °F').in('Btu/(h·ft·°F)'), unit: 'Btu/(h·ft·°F)' });
    expect(body.Pr).toBe(idealGas('air').prandtl('80 °F'));
    expect('nu' in body).toBe(false);
  });
  it('no transport data, or outside it: the rows are not defined and a transport row says why (exit 0)', () => {
    const none = json('gas', 'H2O', 'T=400 K', 'p=1 atm', '--transport');
    expect([none.mu, none.lambda, none.Pr]).toEqual([null, null, null]);
    expect(none.transport).toMatch(/^no dilute-gas transport data for H2O \(gases with data: N2, O2, .*air\)$/);
    const hot = cli('gas', 'He', 'T=1500 K', '--transport');
    expect(hot.code).toBe(0);
    expect(hot.out).toContain('outside the dilute-gas transport data for He (200 K to 1022 K)');
  });
  it('without --transport nothing changes; other commands still refuse it', () => {
    expect('mu' in json('gas', 'N2', 'T=300 K', 'p=1 atm')).toBe(false);
    const r = cli('air', 'T=30degC', 'RH=0.5', '--transport');
    expect(r.code).toBe(2);
    expect(r.err).toContain('--transport applies to heatstate water, sat, gas and liquid');
  });
});
