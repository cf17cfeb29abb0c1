/**
 * The API reference builds (typedoc, as `npm run docs` does), and every export of the documented
 * entries has a summary; every exported function also shows an example.
 *
 * typedoc runs with --skipErrorChecking: it would otherwise type-check the whole tree a second time,
 * which tests/package/typecheck.test.ts already does in the same run. Links, comments and the HTML
 * output are checked as `npm run docs` makes them.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCommand } from '../helpers/run.js';

interface Reflection {
  name: string;
  kind: number;
  comment?: { summary?: { text: string }[]; blockTags?: { tag: string }[] };
  signatures?: Reflection[];
  children?: Reflection[];
}

const KIND = { function: 64, class: 128, interface: 256, typeAlias: 2097152, variable: 32, enum: 8 };
const hasSummary = (c: Reflection['comment']) => (c?.summary ?? []).some((p) => p.text.trim() !== '');

describe('API reference (typedoc)', () => {
  const root = fileURLToPath(new URL('../..', import.meta.url));
  let log = '';
  let project: Reflection = { name: '', kind: 0 };
  let dir = '';
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'heatstate-docs-'));
    const out = join(dir, 'api.json');
    const { stdout, stderr } = await runCommand(join(root, 'node_modules/.bin/typedoc'), ['--json', out, '--out', join(dir, 'html'), '--skipErrorChecking'], { cwd: root, timeout: 240_000, background: true });
    log = stdout + stderr;
    project = JSON.parse(readFileSync(out, 'utf8')) as Reflection;
  }, 300_000);
  afterAll(() => {
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('builds without errors or broken links', () => {
    expect(log).not.toMatch(/\[(warning|error)\]/);
    expect(log).toMatch(/html generated/);
  });
  it('every export has a summary; every function an example', () => {
    expect(project.children?.length, 'documented entries').toBeGreaterThan(0);
    const missing: string[] = [];
    const noExample: string[] = [];
    for (const mod of project.children ?? []) {
      for (const r of mod.children ?? []) {
        const name = `${mod.name}.${r.name}`;
        if (r.kind === KIND.function) {
          const c = r.signatures?.[0]?.comment ?? r.comment;
          if (!hasSummary(c)) missing.push(name);
          else if (!(c?.blockTags ?? []).some((t) => t.tag === '@example')) noExample.push(name);
        } else if (Object.values(KIND).includes(r.kind) && !hasSummary(r.comment)) missing.push(name);
      }
    }
    expect(missing).toEqual([]);
    expect(noExample).toEqual([]);
  });
}, 300_000);
