import { expect } from 'vitest';

/** The one tolerance assertion: |actual − expected| ≤ abs + rel·|expected|. */
export function expectClose(actual: number, expected: number, tol: { rel?: number; abs?: number } = {}): void {
  const rel = tol.rel ?? 0;
  const abs = tol.abs ?? 0;
  const bound = abs + rel * Math.abs(expected);
  if (!(Math.abs(actual - expected) <= bound)) {
    expect.fail(`expected ${actual} to be within ${bound} of ${expected} (rel ${rel}, abs ${abs}); difference ${actual - expected}`);
  }
}

/** Distance between two doubles in units in the last place of the larger. */
export function ulpDistance(a: number, b: number): number {
  if (a === b) return 0;
  const scale = Math.max(Math.abs(a), Math.abs(b));
  const ulp = scale === 0 ? Number.MIN_VALUE : 2 ** (Math.floor(Math.log2(scale)) - 52);
  return Math.abs(a - b) / ulp;
}
