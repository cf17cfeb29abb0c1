/**
 * Polynomial kernels (plain numbers, no allocation). Coefficients ascend: c[0] + c[1]·x + c[2]·x² + …
 *
 * @module
 */

/** Evaluates Σ c[i]·xⁱ by Horner's rule. */
export function polynomialValue(c: ArrayLike<number>, x: number): number {
  let acc = 0;
  for (let i = c.length - 1; i >= 0; i--) acc = acc * x + c[i]!;
  return acc;
}

/** ∫ from a to b of Σ c[i]·xⁱ dx, exactly (antiderivative Σ c[i]·xⁱ⁺¹/(i+1), by Horner). */
export function polynomialIntegral(c: ArrayLike<number>, a: number, b: number): number {
  return antiderivative(c, b) - antiderivative(c, a);
}

function antiderivative(c: ArrayLike<number>, x: number): number {
  let acc = 0;
  for (let i = c.length - 1; i >= 0; i--) acc = acc * x + c[i]! / (i + 1);
  return acc * x;
}

/** ∫ from a to b of (Σ c[i]·xⁱ)/x dx = c[0]·ln(b/a) + Σ_{i≥1} c[i]·(bⁱ − aⁱ)/i, for a, b > 0. */
export function polynomialOverXIntegral(c: ArrayLike<number>, a: number, b: number): number {
  let rest = 0;
  let rest0 = 0;
  for (let i = c.length - 1; i >= 1; i--) {
    rest = rest * b + c[i]! / i;
    rest0 = rest0 * a + c[i]! / i;
  }
  return (c.length > 0 ? c[0]! * Math.log(b / a) : 0) + rest * b - rest0 * a;
}
