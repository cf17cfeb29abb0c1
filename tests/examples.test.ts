import { execFileSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('..', import.meta.url));
const tsx = fileURLToPath(new URL('../node_modules/.bin/tsx', import.meta.url));
const run = (file: string) => execFileSync(tsx, [file], { cwd: root, encoding: 'utf8', timeout: 60_000 });

describe('examples/', () => {
  it('every example file is covered by a test below', () => {
    expect(readdirSync(new URL('../examples/', import.meta.url)).filter((f) => f.endsWith('.ts')).sort()).toEqual(['demo.ts']);
  });

  it('demo.ts (npm start) prints each result in SI and US units and the caution', () => {
    const out = run('examples/demo.ts');
    expect(out).toMatch(/heat duty\s+402\.\d kW\s+13\d{5} Btu\/h/);
    expect(out).toMatch(/temperature rise.*30 ΔK\s+54 Δ°F/);
    expect(out).toContain('OutOfRangeError [range.outside]');
    expect(out).toMatch(/licensed professionals/);
  });
});
