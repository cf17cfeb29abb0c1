/**
 * Name lookup shared by the catalogues: normalised matching and "did you mean" suggestions.
 *
 * @module
 */

/** Lower-case, with spaces, hyphens, underscores and dots removed: "Ethylene-Glycol" → "ethyleneglycol". */
export function normaliseName(name: string): string {
  return name.toLowerCase().replace(/[\s\-_.]+/g, '');
}

function editDistance(a: string, b: string): number {
  const prev = new Array<number>(b.length + 1);
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    let diag = prev[0]!;
    prev[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const up = prev[j]!;
      prev[j] = Math.min(up + 1, prev[j - 1]! + 1, diag + (a[i - 1] === b[j - 1] ? 0 : 1));
      diag = up;
    }
  }
  return prev[b.length]!;
}

/** Up to `count` known names closest to `given` (edit distance on normalised names, substring matches first). */
export function closestNames(given: string, known: readonly string[], count = 3): string[] {
  const g = normaliseName(given);
  return known
    .map((name) => {
      const n = normaliseName(name);
      const contains = g.length >= 3 && n.length >= 3 && (n.includes(g) || g.includes(n));
      return { name, score: contains ? 0 : editDistance(g, n) };
    })
    .filter((x) => x.score <= Math.max(2, Math.ceil(g.length / 2)))
    .sort((a, b) => a.score - b.score || a.name.localeCompare(b.name))
    .slice(0, count)
    .map((x) => x.name);
}
