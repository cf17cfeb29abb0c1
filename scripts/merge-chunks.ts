/**
 * Fewer, larger shared chunks for the ES module build (run by tsup.config.ts after each build).
 *
 * esbuild's code splitting gives every set of entries that share code a chunk of its own: with a
 * dozen public entries that is over twenty shared chunks, many under a kilobyte, and the root entry
 * loads all of them. Node's ES module loader pays about as much for each file (resolve, read,
 * compile, link) as for 20 kB of code (measured with bench/run.ts's cold start: about 1.5 ms a
 * file against 0.08 ms a kilobyte), so a chunk that several entries load is cheaper merged with a
 * neighbour even when some of them then load a few kilobytes they do not use.
 *
 * The plan is a greedy merge over the built chunk graph: it merges the two chunks whose merge
 * lowers the summed cost of all entries the most (cost of an entry = for each file it loads, a
 * file cost plus a cost per kilobyte), never into an entry file (their exports are the public API),
 * never when the merge would make the chunk graph cyclic, and never when an entry would load more
 * than `maxGrowth` of extra code; it stops when no merge pays. Each group is then bundled again by
 * esbuild into one file (`export *` of its members, every other file external) and the other
 * files' imports are pointed at it. The merged chunk must export exactly the names its members
 * exported; anything else stops the build.
 *
 * Only the ES module output is merged: `import` is what the cold-start figures measure; the
 * CommonJS output keeps esbuild's chunks.
 *
 * @module
 */
import { build } from 'esbuild';
import { readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join, posix, relative, resolve } from 'node:path';
import type * as TypeScript from 'typescript';

/** The cost model of one entry's cold start (milliseconds); see the module comment. */
export interface MergeOptions {
  /** Cost of one more file an entry loads. */
  readonly fileMs: number;
  /** Cost of one kilobyte of code an entry loads. */
  readonly kBMs: number;
  /** At most this share of extra code (over what it loads with esbuild's chunks) for any entry. */
  readonly maxGrowth: number;
}

export const defaultMergeOptions: MergeOptions = { fileMs: 1.5, kBMs: 0.08, maxGrowth: 0.1 };

/** One ES module file of the build: its size and the files it imports (paths relative to dist/). */
interface FileNode {
  readonly size: number;
  readonly deps: readonly string[];
  /** The names it exports (two chunks that export the same name are never merged: `export *` of both would drop it). */
  readonly exports?: readonly string[];
}

const importPattern = /(?:^|\n|;)\s*(?:import|export)\s*(?:[\w$*{][^;]*?from\s*)?["'](\.{1,2}\/[^"']+)["']/g;

/** The relative imports of an ES module file (static `import`/`export … from`), as dist-relative paths. */
function importsOf(dist: string, file: string, code: string): string[] {
  const out = new Set<string>();
  for (const m of code.matchAll(importPattern)) out.add(relative(dist, resolve(dist, dirname(file), m[1]!)).split('\\').join('/'));
  return [...out];
}

export function readGraph(dist: string, entries: readonly string[]): Map<string, FileNode> {
  const files = new Map<string, FileNode>();
  const visit = (file: string): void => {
    if (files.has(file)) return;
    const code = readFileSync(join(dist, file), 'utf8');
    const deps = importsOf(dist, file, code);
    files.set(file, { size: Buffer.byteLength(code), deps, exports: exportedNames(code) });
    for (const d of deps) visit(d);
  };
  for (const e of entries) visit(e);
  return files;
}

/**
 * The merge plan: groups of chunk files (dist-relative), each to become one file. Chunks left
 * alone are not listed.
 */
export function planMerges(files: ReadonlyMap<string, FileNode>, entries: readonly string[], options: MergeOptions = defaultMergeOptions): string[][] {
  // groups: entry files are fixed singletons; chunks start as singletons
  const groupOf = new Map<string, number>();
  const members: string[][] = [];
  for (const f of files.keys()) {
    groupOf.set(f, members.length);
    members.push([f]);
  }
  const isEntry = new Set(entries);
  const alive = (): number[] => members.map((m, i) => (m.length > 0 ? i : -1)).filter((i) => i >= 0);
  const namesOf = (g: number): string[] => members[g]!.flatMap((f) => files.get(f)!.exports ?? []);
  const sizeOf = (g: number): number => members[g]!.reduce((s, f) => s + files.get(f)!.size, 0);
  const edgesOf = (g: number, fs: readonly string[], assign: (f: string) => number): Set<number> => {
    const out = new Set<number>();
    for (const f of fs) for (const d of files.get(f)!.deps) if (assign(d) !== g) out.add(assign(d));
    return out;
  };
  // reach of each entry (groups it loads) and whether the group graph is acyclic, under an assignment
  // whose groups hold the files `membersOf` gives (a candidate merge: a group holds its partner's
  // files too, so that the partner's imports count for every entry that loads the merged file)
  const evaluate = (assign: (f: string) => number, groups: number[], membersOf: (g: number) => readonly string[] = (g) => members[g]!): { reach: Map<string, Set<number>>; acyclic: boolean } => {
    const edges = new Map(groups.map((g) => [g, edgesOf(g, membersOf(g), assign)]));
    const reach = new Map<string, Set<number>>();
    for (const e of entries) {
      const seen = new Set<number>();
      const stack = [assign(e)];
      while (stack.length > 0) {
        const g = stack.pop()!;
        if (seen.has(g)) continue;
        seen.add(g);
        for (const h of edges.get(g) ?? []) stack.push(h);
      }
      reach.set(e, seen);
    }
    // cycle check (depth-first, three colours)
    const colour = new Map<number, number>();
    let acyclic = true;
    const dfs = (g: number): void => {
      colour.set(g, 1);
      for (const h of edges.get(g) ?? []) {
        const c = colour.get(h) ?? 0;
        if (c === 1) acyclic = false;
        else if (c === 0) dfs(h);
        if (!acyclic) return;
      }
      colour.set(g, 2);
    };
    for (const g of groups) if (acyclic && !colour.has(g)) dfs(g);
    return { reach, acyclic };
  };
  const costOf = (reach: Map<string, Set<number>>, size: (g: number) => number): { total: number; bytes: Map<string, number> } => {
    let total = 0;
    const bytes = new Map<string, number>();
    for (const [e, gs] of reach) {
      let b = 0;
      for (const g of gs) b += size(g);
      bytes.set(e, b);
      total += gs.size * options.fileMs + (b / 1024) * options.kBMs;
    }
    return { total, bytes };
  };
  const base = costOf(evaluate((f) => groupOf.get(f)!, alive()).reach, sizeOf);
  const limit = new Map([...base.bytes].map(([e, b]) => [e, b * (1 + options.maxGrowth)]));
  let current = base.total;
  for (;;) {
    const groups = alive();
    const chunks = groups.filter((g) => !isEntry.has(members[g]![0]!));
    let best: { a: number; b: number; total: number } | undefined;
    for (let i = 0; i < chunks.length; i++) {
      for (let j = i + 1; j < chunks.length; j++) {
        const a = chunks[i]!;
        const b = chunks[j]!;
        if (namesOf(a).some((n) => namesOf(b).includes(n))) continue;
        const assign = (f: string): number => (groupOf.get(f) === b ? a : groupOf.get(f)!);
        const { reach, acyclic } = evaluate(
          assign,
          groups.filter((g) => g !== b),
          (g) => (g === a ? [...members[a]!, ...members[b]!] : members[g]!),
        );
        if (!acyclic) continue;
        const size = (g: number): number => (g === a ? sizeOf(a) + sizeOf(b) : sizeOf(g));
        const { total, bytes } = costOf(reach, size);
        if ([...bytes].some(([e, n]) => n > limit.get(e)!)) continue;
        if (total < current - 1e-9 && (best === undefined || total < best.total)) best = { a, b, total };
      }
    }
    if (best === undefined) break;
    for (const f of members[best.b]!) groupOf.set(f, best.a);
    members[best.a]!.push(...members[best.b]!);
    members[best.b] = [];
    current = best.total;
  }
  return members.filter((m) => m.length > 1).map((m) => [...m].sort((x, y) => files.get(y)!.size - files.get(x)!.size));
}

/** The names an esbuild/rollup chunk exports (its final `export { … }` statement). */
function exportedNames(code: string): string[] {
  const names: string[] = [];
  for (const m of code.matchAll(/(?:^|\n)export\s*\{([^}]*)\}\s*(?:;|\n|$)/g)) {
    for (const part of m[1]!.split(',')) {
      const p = part.trim();
      if (p === '') continue;
      const as = p.split(/\s+as\s+/);
      names.push((as[1] ?? as[0])!.trim());
    }
  }
  return names.sort();
}

/**
 * Merges the chunks of the ES module build in `dist` (entries: dist-relative `.js` paths) by the plan
 * above. Returns the plan, for the build log.
 */
export async function mergeChunks(dist: string, entries: readonly string[], options: MergeOptions = defaultMergeOptions): Promise<string[][]> {
  const files = readGraph(dist, entries);
  const plan = planMerges(files, entries, options);
  const target = new Map<string, string>();
  for (const group of plan) for (const f of group) target.set(f, group[0]!);
  for (const group of plan) {
    const into = group[0]!;
    const members = new Set(group);
    const expected = group.flatMap((f) => exportedNames(readFileSync(join(dist, f), 'utf8'))).sort();
    if (new Set(expected).size !== expected.length) throw new Error(`merge-chunks: members of ${into} export the same name twice`);
    const result = await build({
      stdin: { contents: group.map((f) => `export * from './${f}';`).join('\n'), resolveDir: dist, loader: 'js', sourcefile: `(merged) ${into}` },
      bundle: true,
      write: false,
      format: 'esm',
      platform: 'node',
      target: 'node20',
      logLevel: 'silent',
      plugins: [
        {
          name: 'other-chunks-external',
          setup(b) {
            b.onResolve({ filter: /^\.{1,2}\// }, (args) => {
              const file = relative(dist, resolve(args.resolveDir, args.path)).split('\\').join('/');
              if (members.has(file)) return undefined;
              // another file of the build: imported from the merged chunk (which sits at `into`), or from its group's file
              const to = target.get(file) ?? file;
              let path = posix.relative(posix.dirname(into), to);
              if (!path.startsWith('.')) path = `./${path}`;
              return { path, external: true };
            });
          },
        },
      ],
    });
    const code = result.outputFiles[0]!.text;
    const got = exportedNames(code);
    if (got.join(',') !== expected.join(',')) throw new Error(`merge-chunks: ${into} exports ${got.length} names, its members ${expected.length}`);
    writeFileSync(join(dist, into), code);
    for (const f of group.slice(1)) rmSync(join(dist, f));
  }
  // point the other files' imports of a merged member at its group's file; then every file of the
  // graph ASCII only (see asciiOnly)
  for (const file of files.keys()) {
    if (target.has(file) && target.get(file) !== file) continue; // merged away
    const code = readFileSync(join(dist, file), 'utf8');
    const next = asciiOnly(
      code.replace(importPattern, (whole, spec: string) => {
        const dep = relative(dist, resolve(dist, dirname(file), spec)).split('\\').join('/');
        const to = target.get(dep);
        if (to === undefined || to === dep) return whole;
        let path = posix.relative(posix.dirname(file), to);
        if (!path.startsWith('.')) path = `./${path}`;
        return whole.replace(spec, path);
      }),
    );
    if (next !== code) writeFileSync(join(dist, file), next);
  }
  return plan;
}

/**
 * The code with every character outside ASCII written as an escape. esbuild escapes them in strings
 * but keeps them in comments and regular expressions (`°` in a unit's note, `/μ/g`); one such
 * character makes Node decode the whole file as UTF-8 into a two-byte string, which V8 then scans at
 * its slower pace (the water entry started about 5 ms faster with ASCII-only chunks). In a regular
 * expression or a string the character becomes a `\uXXXX` escape (the same pattern, with or without
 * the `u` flag; the same string); in a comment too (it is text only). Templates are left as they are
 * (their raw text would change); a non-ASCII character anywhere else (an identifier) stops the build.
 */
export function asciiOnly(code: string): string {
  if (!/[^\x00-\x7f]/.test(code)) return code;
  const ts = createRequire(import.meta.url)('typescript') as typeof TypeScript;
  const source = ts.createSourceFile('chunk.js', code, ts.ScriptTarget.Latest, true, ts.ScriptKind.JS);
  // the literals from the syntax tree; outside them, `//` and `/*` start comments
  // (with whether an escape keeps its meaning: yes in a regular expression or a string, not in a template's raw text)
  const literals: [number, number, boolean][] = [];
  const visit = (node: TypeScript.Node): void => {
    if (node.kind === ts.SyntaxKind.RegularExpressionLiteral) literals.push([node.getStart(source), node.getEnd(), true]);
    else if (ts.isStringLiteral(node)) literals.push([node.getStart(source), node.getEnd(), true]);
    else if (ts.isNoSubstitutionTemplateLiteral(node) || ts.isTemplateHead(node) || ts.isTemplateMiddle(node) || ts.isTemplateTail(node)) literals.push([node.getStart(source), node.getEnd(), false]);
    ts.forEachChild(node, visit);
  };
  visit(source);
  literals.sort((x, y) => x[0] - y[0]);
  const escape = (c: string): string => {
    let e = '';
    for (let k = 0; k < c.length; k++) e += c.charCodeAt(k) < 0x80 ? c[k] : `\\u${c.charCodeAt(k).toString(16).toUpperCase().padStart(4, '0')}`;
    return e;
  };
  let out = '';
  let i = 0;
  let next = 0; // the next literal
  while (i < code.length) {
    const lit = literals[next];
    if (lit !== undefined && i === lit[0]) {
      const text = code.slice(lit[0], lit[1]);
      if (lit[2] && /\\[^\x00-\x7f]/.test(text)) throw new Error(`merge-chunks: an escaped non-ASCII character in a regular expression: ${text}`);
      out += lit[2] ? escape(text) : text;
      i = lit[1];
      next++;
      continue;
    }
    const end = lit?.[0] ?? code.length;
    if (code.startsWith('//', i) || code.startsWith('/*', i)) {
      let stop = code.startsWith('//', i) ? code.indexOf('\n', i) : code.indexOf('*/', i + 2) + 2;
      if (stop < i + 2) stop = code.length;
      if (stop > end) throw new Error(`merge-chunks: a comment runs into a literal at ${i}`);
      out += escape(code.slice(i, stop));
      i = stop;
      continue;
    }
    if (code.charCodeAt(i) >= 0x80) throw new Error(`merge-chunks: a non-ASCII character outside comments, strings and regular expressions at ${i}: ${code.slice(Math.max(0, i - 40), i + 10)}`);
    out += code[i];
    i++;
  }
  return out;
}
