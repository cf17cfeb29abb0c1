/**
 * data/if97/backward-pt-region3.json: the recalled SR5-05(2016) equations are kept as a record (not
 * used by the library, see its "finding"). Each entry marked verified reproduces the release's
 * verification value (Table 3 for the boundaries, Table 5 for v_3a; values from memory) to the ten
 * printed digits; the entry marked not verified does not, as the finding says.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const data = JSON.parse(readFileSync(new URL('../../data/if97/backward-pt-region3.json', import.meta.url), 'utf8'));
type Boundary = { form: 'power' | 'log' | 'line'; n: number[]; check: { p_MPa: number; T_K: number }; verified: boolean };
const boundary = (b: Boundary, pi: number): number => {
  if (b.form === 'line') return b.n[0]! * (pi - b.n[1]!) + b.n[2]!;
  if (b.form === 'power') return b.n.reduce((s, c, i) => s + c * pi ** i, 0);
  const l = Math.log(pi);
  return b.n[0]! + b.n[1]! * l + b.n[2]! * l * l + b.n[3]! / l + b.n[4]! / (l * l);
};
const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('SR5-05 record (data/if97/backward-pt-region3.json)', () => {
  it('states a finding, and the library does not use it', () => {
    expect(data.finding).toMatch(/Not wired/);
  });
  const entries = Object.entries(data.boundaries).filter(([k]) => k !== 'note') as [string, Boundary][];
  it.each(entries)('boundary T_%s: reproduces SR5-05 Table 3 exactly when marked verified', (_name, b) => {
    const miss = rel(boundary(b, b.check.p_MPa), b.check.T_K);
    if (b.verified) expect(miss).toBeLessThan(5.0001e-10);
    else expect(miss).toBeGreaterThan(5e-10);
  });
  it('v_3a reproduces SR5-05 Table 5 (two points, ten digits)', () => {
    const s = data.subregions['3a'];
    for (const c of s.checks) {
      const pi = c.p_MPa / s.pStar_MPa;
      const th = c.T_K / s.TStar_K;
      let sum = 0;
      for (let i = 0; i < s.n.length; i++) sum += s.n[i] * (pi - s.a) ** s.I[i] * (th - s.b) ** s.J[i];
      expect(rel(sum * s.vStar, c.v)).toBeLessThan(5.0001e-10);
    }
  });
});
