/**
 * Every `@example` in src/units runs here: a line `expr; //=> value` must give exactly that value,
 * a line `expr; // throws SomeError` must throw that error class, other lines run as written.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import * as errors from '../../src/errors.js';
import * as units from '../../src/units/index.js';

const dir = new URL('../../src/units/', import.meta.url);
const files = readdirSync(dir).filter((f) => f.endsWith('.ts') && !f.endsWith('.generated.ts'));

interface Example {
  file: string;
  code: string[];
}

function examplesOf(file: string): Example[] {
  const text = readFileSync(new URL(file, dir), 'utf8');
  const out: Example[] = [];
  for (const m of text.matchAll(/@example\s*\n\s*\*\s*```ts\n([\s\S]*?)\n\s*\*\s*```/g)) {
    out.push({ file, code: m[1]!.split('\n').map((l) => l.replace(/^\s*\*\s?/, '')) });
  }
  return out;
}

const all = files.flatMap(examplesOf);
const scope = { ...units, ...errors };

function run(example: Example): number {
  let checks = 0;
  const statements: string[] = [];
  for (const line of example.code) {
    const value = /^(.*?);?\s*\/\/=>\s*(.*?)(?:\s+\(.*\))?\s*$/.exec(line);
    const throws = /^(.*?);?\s*\/\/\s*throws\s+(\w+)/.exec(line);
    if (value) {
      statements.push(`__check(${JSON.stringify(line)}, () => (${value[1]}), () => (${value[2]}));`);
      checks++;
    } else if (throws) {
      statements.push(`__throws(${JSON.stringify(line)}, () => { ${throws[1]}; }, ${JSON.stringify(throws[2])});`);
      checks++;
    } else {
      statements.push(line);
    }
  }
  const check = (line: string, actual: () => unknown, expected: () => unknown) => expect(actual(), line).toStrictEqual(expected());
  const expectThrow = (line: string, f: () => void, name: string) => {
    const cls = (scope as Record<string, unknown>)[name] as new (...a: never[]) => Error;
    expect(cls, `${line}: ${name} is an error class`).toBeTypeOf('function');
    expect(f, line).toThrow(cls);
  };
  // eslint-disable-next-line @typescript-eslint/no-implied-eval
  new Function('__scope', '__check', '__throws', `const { ${Object.keys(scope).join(', ')} } = __scope;\n${statements.join('\n')}`)(scope, check, expectThrow);
  return checks;
}

describe('doc examples in src/units are real', () => {
  it('there are examples to check', () => {
    expect(all.length).toBeGreaterThan(10);
  });
  it.each(all.map((e, i) => [`${e.file} #${i}: ${e.code[0]}`, e] as const))('%s', (_name, example) => {
    expect(run(example)).toBeGreaterThan(0);
  });
});
