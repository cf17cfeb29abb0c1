/**
 * The one search primitive every table lookup goes through.
 *
 * @module
 */

/**
 * Index of the segment [xs[i], xs[i+1]] that holds `x`, for strictly increasing `xs`
 * searched between `lo` and `hi` (inclusive node indices, default the whole array).
 *
 * Inclusivity, stated once: a segment holds its left node and excludes its right node,
 * except the last segment, which holds both. So a value equal to a node `xs[k]` (k < n−1)
 * lands in segment k, and interpolation there returns the node's value exactly.
 * The caller checks the range first; `x` outside [xs[lo], xs[hi]] is clamped to the end segments.
 */
export function segmentIndex(xs: ArrayLike<number>, x: number, lo = 0, hi = xs.length - 1): number {
  let a = lo;
  let b = hi - 1;
  if (x >= xs[b]!) return b;
  while (a < b) {
    const mid = (a + b + 1) >>> 1;
    if (xs[mid]! <= x) a = mid;
    else b = mid - 1;
  }
  return a;
}
