import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { FITS_PATH, renderFits } from '../../scripts/fit-nasa-glenn.js';
import { renderSpeciesModule, SPECIES_MODULE_PATH } from '../../scripts/generate-species.js';
import { fittedFileSchema, sevenCoefficientFileSchema } from '../../src/ideal-gas/schema.js';
import { idealGas, speciesNames, speciesRecords } from '../../src/ideal-gas/index.js';

const read = (name: string) => JSON.parse(readFileSync(new URL(`../../data/ideal-gas/${name}`, import.meta.url), 'utf8')) as unknown;

const REQUIRED = ['N2', 'O2', 'Ar', 'He', 'Ne', 'H2', 'CO', 'CO2', 'H2O', 'CH4', 'C2H6', 'C3H8', 'n-C4H10', 'C2H4', 'C2H2', 'NH3', 'NO', 'NO2', 'N2O', 'SO2', 'H2S', 'O3', 'OH', 'H', 'O', 'N', 'air'];

describe('ideal-gas species data', () => {
  it('data/ideal-gas/nasa7.json passes its zod schema and names its source', () => {
    const parsed = sevenCoefficientFileSchema.safeParse(read('nasa7.json'));
    expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
  });
  it('data/ideal-gas/janaf-fits.json passes its zod schema and names its source', () => {
    const parsed = fittedFileSchema.safeParse(read('janaf-fits.json'));
    expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
  });
  it('janaf-fits.json is current: refitting from the JANAF tables gives the committed file (npm run fits)', () => {
    expect(readFileSync(FITS_PATH, 'utf8')).toBe(renderFits());
  });
  it('src/ideal-gas/species.generated.ts is current (npm run species)', () => {
    expect(readFileSync(SPECIES_MODULE_PATH, 'utf8')).toBe(renderSpeciesModule());
  });
  it('every fit stays within 0.15 % in cp and 0.01 % in S° of every JANAF row it was fitted to (NIST-JANAF, Chase 1998)', () => {
    const fits = (read('janaf-fits.json') as { species: { id: string; fitError: { cpRelative: number; sRelative: number } }[] }).species;
    for (const f of fits) {
      expect(f.fitError.cpRelative, f.id).toBeLessThan(1.5e-3);
      expect(f.fitError.sRelative, f.id).toBeLessThan(1e-4);
    }
  });
  it('holds every required species, each found by formula and by name', () => {
    expect(speciesNames()).toEqual(expect.arrayContaining(REQUIRED));
    expect(idealGas('nitrogen').name).toBe('N2');
    expect(idealGas('N2').name).toBe('N2');
    expect(idealGas('Carbon Dioxide').name).toBe('CO2');
    expect(idealGas('butane').name).toBe('n-C4H10');
    expect(idealGas('C4H10').name).toBe('n-C4H10');
    expect(idealGas('dry air').name).toBe('air');
  });
  it('no two species share a name', () => {
    const seen = new Map<string, string>();
    for (const r of speciesRecords()) {
      for (const n of [r.id, ...r.names].map((x) => x.toLowerCase())) {
        expect(seen.get(n), `${n} in ${r.id} and ${seen.get(n)}`).toBeUndefined();
        seen.set(n, r.id);
      }
    }
  });
});
