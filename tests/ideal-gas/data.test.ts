import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { FITS_PATH, renderFits } from '../../scripts/fit-nasa-glenn.js';
import { renderSpeciesModule, SPECIES_MODULE_PATH } from '../../scripts/generate-species.js';
import { fittedFileSchema, sevenCoefficientFileSchema } from '../../src/ideal-gas/schema.js';
import { idealGas, speciesNames, speciesRecords } from '../../src/ideal-gas/index.js';
import { findSpecies } from '../../src/ideal-gas/species.js';

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
  it('every fit is within 0.1 % of its JANAF table in cp°, S° and H° − H°(298.15 K), or records a finding (NIST-JANAF, Chase 1998)', () => {
    const fits = (read('janaf-fits.json') as { species: { id: string; finding?: string; fitError: { cpRelative: number; sRelative: number; hMinusH298Relative: number } }[] }).species;
    // the findings and their figures: H2S S° at 200 K (table H-080 inconsistent with its own cp°), NH3 cp° near 5100 K
    const excepted: Record<string, { cpRelative?: number; sRelative?: number }> = { H2S: { sRelative: 1.5e-3 }, NH3: { cpRelative: 1.4e-3 } };
    for (const f of fits) {
      const bound = excepted[f.id] ?? {};
      expect(f.fitError.cpRelative, f.id).toBeLessThan(bound.cpRelative ?? 1e-3);
      expect(f.fitError.sRelative, f.id).toBeLessThan(bound.sRelative ?? 1e-3);
      expect(f.fitError.hMinusH298Relative, f.id).toBeLessThan(1e-3);
      expect(f.finding !== undefined, f.id).toBe(f.id in excepted);
    }
  });
  it('every species carries a structured source: title, basis and a stated uncertainty of a named kind', () => {
    for (const r of speciesRecords()) {
      expect(r.provenance.title.length, r.id).toBeGreaterThan(10);
      expect(['published', 'computed', 'from memory'], r.id).toContain(r.provenance.basis);
      expect(r.provenance.uncertainty, r.id).toMatch(/^(fit deviation|source|estimate): /);
    }
    expect(findSpecies('O3')!.provenance).toMatchObject({ basis: 'computed', table: 'NIST-JANAF table O-056' });
    expect(findSpecies('C2H6')!.provenance.basis).toBe('from memory');
  });
  it('docs/guide/choosing-a-model.md tabulates every fit with the figures of janaf-fits.json', () => {
    const guide = readFileSync(new URL('../../docs/guide/choosing-a-model.md', import.meta.url), 'utf8');
    const pct = (x: number) => `${Number((x * 100).toPrecision(2))} %`;
    const fits = (read('janaf-fits.json') as { species: { id: string; janafTable: string; fitError: { cpRelative: number; sRelative: number; hMinusH298Relative: number; hMinusH298kJPerMol: number } }[] }).species;
    for (const f of fits) {
      const e = f.fitError;
      expect(guide, f.id).toContain(`| ${f.id} | ${f.janafTable} | ${pct(e.cpRelative)} | ${pct(e.sRelative)} | ${pct(e.hMinusH298Relative)} (${e.hMinusH298kJPerMol} kJ/mol) |`);
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

describe('the facade exposes each gas\'s provenance', () => {
  it("idealGas('O3').source gives title, basis and uncertainty (NIST-JANAF fit, its largest deviation stated)", async () => {
    const { idealGas } = await import('../../src/ideal-gas/index.js');
    const src = idealGas('O3').source;
    expect(src.title).toMatch(/NIST-JANAF/);
    expect(src.basis).toBe('computed');
    expect(src.uncertainty).toMatch(/^fit deviation: /);
    expect(idealGas('NO').source.basis).toBe('from memory');
    expect(idealGas({ name: 'mine', M: '30 g/mol', cp: '1 kJ/(kg·K)' }).source.basis).toBe('user');
  });
});
