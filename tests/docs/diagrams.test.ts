import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DIAGRAMS_DIR, renderDiagrams } from '../../scripts/generate-diagrams.js';

describe('docs/diagrams (generated from the library)', () => {
  const rendered = renderDiagrams();
  it.each(Object.keys(rendered))('%s is current (npm run diagrams regenerates it)', (file) => {
    expect(readFileSync(`${DIAGRAMS_DIR}/${file}`, 'utf8')).toBe(rendered[file]);
  });
  it('the README shows at least one of them', () => {
    const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
    expect(readme).toMatch(/!\[[^\]]+\]\(docs\/diagrams\/[\w-]+\.svg\)/);
  });
});
