/**
 * The chunk-merge planner of the ES module build (scripts/merge-chunks.ts) on small chunk graphs:
 * what it merges, and the three things it must never do (merge an entry file, make the graph
 * cyclic, make an entry load more than `maxGrowth` extra code, counting what the merged partner
 * imports).
 */
import { describe, expect, it } from 'vitest';
import { planMerges, type MergeOptions } from '../../scripts/merge-chunks.js';

type Node = { size: number; deps: string[]; exports?: string[] };
const graph = (nodes: Record<string, Node>) => new Map(Object.entries(nodes));
const kB = 1024;
/** Files cost much more than bytes: every merge that saves a file pays, unless a rule forbids it. */
const cheapBytes: MergeOptions = { fileMs: 1.5, kBMs: 0.01, maxGrowth: 0.1 };
const sorted = (plan: string[][]) => plan.map((g) => [...g].sort()).sort();

describe('planMerges', () => {
  it('merges two small chunks that the same entries load', () => {
    const files = graph({
      'a.js': { size: 1 * kB, deps: ['c1.js', 'c2.js'] },
      'b.js': { size: 1 * kB, deps: ['c1.js', 'c2.js'] },
      'c1.js': { size: 2 * kB, deps: [], exports: ['x'] },
      'c2.js': { size: 2 * kB, deps: [], exports: ['y'] },
    });
    expect(sorted(planMerges(files, ['a.js', 'b.js'], cheapBytes))).toEqual([['c1.js', 'c2.js']]);
  });

  it('never merges an entry file', () => {
    const files = graph({
      'a.js': { size: 1 * kB, deps: ['b.js', 'c.js'] },
      'b.js': { size: 1 * kB, deps: ['c.js'] },
      'c.js': { size: 1 * kB, deps: [], exports: ['x'] },
    });
    for (const group of planMerges(files, ['a.js', 'b.js'], cheapBytes)) {
      expect(group).not.toContain('a.js');
      expect(group).not.toContain('b.js');
    }
  });

  it('never merges two chunks that export the same name', () => {
    const files = graph({
      'a.js': { size: 1 * kB, deps: ['c1.js', 'c2.js'] },
      'c1.js': { size: 1 * kB, deps: [], exports: ['x'] },
      'c2.js': { size: 1 * kB, deps: [], exports: ['x'] },
    });
    expect(planMerges(files, ['a.js'], cheapBytes)).toEqual([]);
  });

  it('never makes the chunk graph cyclic: c1 → m → c2 cannot fold c1 and c2 together around m', () => {
    // e1 loads c1, which imports m, which imports c2; e2 loads m. Merging c1 and c2 would save e1 a
    // file but make {c1, c2} → m → {c1, c2} a cycle; the other pairs share an exported name, so that
    // merge is the only candidate
    const files = graph({
      'e1.js': { size: 1 * kB, deps: ['c1.js'] },
      'e2.js': { size: 1 * kB, deps: ['m.js'] },
      'c1.js': { size: 1 * kB, deps: ['m.js'], exports: ['a', 'b'] },
      'm.js': { size: 1 * kB, deps: ['c2.js'], exports: ['b', 'c'] },
      'c2.js': { size: 1 * kB, deps: [], exports: ['c', 'd'] },
    });
    expect(planMerges(files, ['e1.js', 'e2.js'], { ...cheapBytes, maxGrowth: 10 })).toEqual([]);
  });

  it("counts the merged partner's imports against every entry that loads the merged file (the growth limit holds)", () => {
    // e1 (50 kB) loads a; e2, e3 and e4 load a and b; b imports a large chunk, big. Merging a and b
    // saves e2 to e4 a file each, but makes e1 load b and, through it, big: 100 kB more than its 51 kB,
    // far past maxGrowth. (Counting a's imports alone, e1 would grow by b's 0.1 kB only.)
    const files = graph({
      'e1.js': { size: 50 * kB, deps: ['a.js'] },
      'e2.js': { size: 1 * kB, deps: ['a.js', 'b.js'] },
      'e3.js': { size: 1 * kB, deps: ['a.js', 'b.js'] },
      'e4.js': { size: 1 * kB, deps: ['a.js', 'b.js'] },
      'a.js': { size: 1 * kB, deps: [], exports: ['x'] },
      'b.js': { size: 0.1 * kB, deps: ['big.js'], exports: ['y'] },
      'big.js': { size: 100 * kB, deps: [], exports: ['z'] },
    });
    const plan = planMerges(files, ['e1.js', 'e2.js', 'e3.js', 'e4.js'], { fileMs: 1.5, kBMs: 0.001, maxGrowth: 0.1 });
    expect(plan.some((g) => g.includes('a.js') && g.includes('b.js'))).toBe(false);
  });

  it('leaves the graph alone when no merge lowers the cost', () => {
    // one entry, one chunk: nothing to merge
    const files = graph({ 'e.js': { size: 1 * kB, deps: ['c.js'] }, 'c.js': { size: 5 * kB, deps: [], exports: ['x'] } });
    expect(planMerges(files, ['e.js'])).toEqual([]);
  });
});
