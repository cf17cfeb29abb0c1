import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { FLUID_DIAGRAMS_DIR, renderFluidDiagrams } from '../../scripts/generate-fluid-diagram.js';

describe('docs/diagrams/*-ph.svg of real fluids (generated from src/fluids)', () => {
  const rendered = renderFluidDiagrams();
  it.each(Object.keys(rendered))('%s is current (npx tsx scripts/generate-fluid-diagram.ts regenerates it)', (file) => {
    expect(readFileSync(`${FLUID_DIAGRAMS_DIR}/${file}`, 'utf8')).toBe(rendered[file]);
  });
  it('draws the dome, eight isotherms and eight isentropes', () => {
    const svg = rendered['water-iapws95-ph.svg']!;
    expect(svg.match(/<polyline/g)!.length).toBe(17);
    expect(svg).toContain('>374 °C<');
    expect(svg).toContain('>s = 8<');
  });
});
