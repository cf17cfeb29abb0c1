/**
 * The species ship as JSON text (src/ideal-gas/species.generated.ts, `SPECIES_JSON`), parsed on first
 * use: what the models read must be exactly the constants of the data files.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SPECIES_JSON } from '../../src/ideal-gas/species.generated.js';
import { speciesRecords } from '../../src/ideal-gas/species.js';

interface FileSpecies {
  id: string;
  formula?: string;
  names: string[];
  T: { min: number; mid: number; max: number };
  low: number[];
  high: number[];
}
const read = (name: string) => (JSON.parse(readFileSync(new URL(`../../data/ideal-gas/${name}`, import.meta.url), 'utf8')) as { species: FileSpecies[] }).species;

describe('ideal-gas species loading', () => {
  it('the generated module holds the species as a JSON string, not as an array literal', () => {
    expect(typeof SPECIES_JSON).toBe('string');
    const source = readFileSync(new URL('../../src/ideal-gas/species.generated.ts', import.meta.url), 'utf8');
    expect(source).not.toMatch(/=\s*\[\s*\n?\s*\["N2"/);
  });
  it('the records parsed from it equal the data files: ids, formulas, names, intervals and every constant (janaf-fits.json, nasa7.json)', () => {
    const fitted = read('janaf-fits.json');
    // the 7-coefficient form is the 9-constant form with a1 = a2 = 0
    const recalled = read('nasa7.json').map((s) => ({ ...s, low: [0, 0, ...s.low], high: [0, 0, ...s.high] }));
    const expected = [...fitted, ...recalled].map((s) => ({ id: s.id, formula: s.formula, names: s.names, T: s.T, low: s.low, high: s.high }));
    const actual = speciesRecords().map((r) => ({ id: r.id, formula: r.formula, names: r.names, T: r.T, low: r.low, high: r.high }));
    expect(actual).toStrictEqual(expected);
    expect(actual).toHaveLength(27);
  });
  it('reading the records twice gives the same objects (parsed once)', () => {
    expect(speciesRecords()).toBe(speciesRecords());
  });
});
