/**
 * The API reference builds (typedoc, as `npm run docs` does), and every export of the documented
 * entries has a summary; every exported function also shows an example.
 *
 * typedoc runs once per test run (tests/helpers/api-reference.ts), with its type check, whose result
 * tests/package/typecheck.test.ts reads. Links and comments are checked as `npm run docs` resolves
 * them (typedoc validates them before it writes any output; this run writes only the JSON).
 */
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { apiReference } from '../helpers/api-reference.js';

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
  let log = '';
  let project: Reflection = { name: '', kind: 0 };
  beforeAll(async () => {
    const reference = await apiReference(inject('heatstateJobs'));
    if (reference.code !== 0) throw new Error(`typedoc ${reference.args.join(' ')} failed (exit code ${reference.code}):\n${reference.output}`);
    log = reference.output;
    project = JSON.parse(readFileSync(reference.json, 'utf8')) as Reflection;
  }, 300_000);

  it('builds without errors or broken links', () => {
    expect(log).not.toMatch(/\[(warning|error)\]/);
    expect(log).toMatch(/json generated/);
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
