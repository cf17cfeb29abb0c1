import { readFileSync } from 'node:fs';
import Decimal from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { evaluateExact, nearestDouble, OUTPUT_PATH, renderFactorsModule } from '../../scripts/generate-factors.js';
import { COMPOUND_FACTORS } from '../../src/units/factors.generated.js';

describe('src/units/factors.generated.ts', () => {
  it('is current: regenerating from data/units.json gives the committed file (run `npm run factors` to update)', () => {
    expect(readFileSync(OUTPUT_PATH, 'utf8')).toBe(renderFactorsModule());
  });
  it('holds correctly rounded factors: Btu/lbm = 2326 J/kg and Btu/(lbm·°R) = 4186.8 J/(kg·K) exactly (NIST SP 811 B.8, exact)', () => {
    expect(COMPOUND_FACTORS['Btu·lbm^-1']).toBe(2326);
    expect(COMPOUND_FACTORS['Btu·lbm^-1·°R^-1']).toBe(4186.8);
  });
  it('nearestDouble picks the nearest double, not a double-rounded one', () => {
    const E = Decimal.clone({ precision: 120 });
    // 0.1 is not a double; its nearest double is the literal 0.1
    expect(nearestDouble(new E('0.1'))).toBe(0.1);
    expect(nearestDouble(evaluateExact('5/9'))).toBe(5 / 9);
    expect(nearestDouble(evaluateExact('0.45359237*9.80665/0.0254^2'))).toBe(6894.757293168362);
  });
});
