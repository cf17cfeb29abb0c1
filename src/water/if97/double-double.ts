/**
 * Double-double arithmetic for the compensated IF97 kernels: a value is an unevaluated sum hi + lo of
 * two doubles with |lo| ≤ ulp(hi)/2, about 106 significant bits. Built on the error-free
 * transformations TwoSum (Knuth 1969; Møller 1965), Fast2Sum (Dekker 1971) and TwoProduct by
 * Veltkamp splitting (Dekker 1971, "A floating-point technique for extending the available
 * precision", Numer. Math. 18), since JavaScript has no fused multiply-add. Addition, multiplication
 * and division follow the algorithms analysed by M. Joldes, J.-M. Muller, V. Popescu, "Tight and
 * rigorous error bounds for basic building blocks of double-word arithmetic", ACM TOMS 44 (2017):
 * AccurateDWPlusDW (relative error ≤ 3u²), DWTimesDW1 without FMA (≤ 7u²), DWDivDW2 (≤ 15u²), with
 * u = 2⁻⁵³.
 *
 * Values live in slots of a caller-owned Float64Array workspace (slot i = elements 2i, 2i + 1), so
 * that no operation allocates: `ddMul(w, 3, 1, 2)` sets slot 3 to slot 1 × slot 2. A destination may
 * equal an operand.
 *
 * @module
 */

/** Veltkamp's splitting constant 2²⁷ + 1: splits a double into two halves of 26 bits. */
const SPLIT = 134217729;

/** Sets slot d to hi + lo (hi + lo must already be normalised: |lo| ≤ ulp(hi)/2, or lo = 0). */
export function ddSet(w: Float64Array, d: number, hi: number, lo: number): void {
  w[2 * d] = hi;
  w[2 * d + 1] = lo;
}

/** Copies slot a to slot d. */
export function ddCopy(w: Float64Array, d: number, a: number): void {
  w[2 * d] = w[2 * a]!;
  w[2 * d + 1] = w[2 * a + 1]!;
}

/** Slot d = −slot a (exact). */
export function ddNeg(w: Float64Array, d: number, a: number): void {
  w[2 * d] = -w[2 * a]!;
  w[2 * d + 1] = -w[2 * a + 1]!;
}

/** Slot d = slot a + slot b (AccurateDWPlusDW). */
export function ddAdd(w: Float64Array, d: number, a: number, b: number): void {
  addParts(w, d, w[2 * a]!, w[2 * a + 1]!, w[2 * b]!, w[2 * b + 1]!);
}

/** Slot d = slot a − slot b. */
export function ddSub(w: Float64Array, d: number, a: number, b: number): void {
  addParts(w, d, w[2 * a]!, w[2 * a + 1]!, -w[2 * b]!, -w[2 * b + 1]!);
}

function addParts(w: Float64Array, d: number, ah: number, al: number, bh: number, bl: number): void {
  // TwoSum of the high parts and of the low parts
  const sh = ah + bh;
  let v = sh - ah;
  const sl = ah - (sh - v) + (bh - v);
  const th = al + bl;
  v = th - al;
  const tl = al - (th - v) + (bl - v);
  const c = sl + th;
  const vh = sh + c;
  const vl = c - (vh - sh);
  const x = tl + vl;
  const zh = vh + x;
  w[2 * d] = zh;
  w[2 * d + 1] = x - (zh - vh);
}

/** Slot d = slot a × slot b (TwoProduct of the high parts by Veltkamp splitting, plus the cross terms). */
export function ddMul(w: Float64Array, d: number, a: number, b: number): void {
  const ah = w[2 * a]!;
  const al = w[2 * a + 1]!;
  const bh = w[2 * b]!;
  const bl = w[2 * b + 1]!;
  let t = SPLIT * ah;
  const a1 = t - (t - ah);
  const a2 = ah - a1;
  t = SPLIT * bh;
  const b1 = t - (t - bh);
  const b2 = bh - b1;
  const ph = ah * bh;
  const pl = a1 * b1 - ph + a1 * b2 + a2 * b1 + a2 * b2 + (ah * bl + al * bh);
  const zh = ph + pl;
  w[2 * d] = zh;
  w[2 * d + 1] = pl - (zh - ph);
}

/** Slot d = slot a × b for a double b (DWTimesFP1). */
export function ddMulNumber(w: Float64Array, d: number, a: number, b: number): void {
  const ah = w[2 * a]!;
  const al = w[2 * a + 1]!;
  let t = SPLIT * ah;
  const a1 = t - (t - ah);
  const a2 = ah - a1;
  t = SPLIT * b;
  const b1 = t - (t - b);
  const b2 = b - b1;
  const ph = ah * b;
  const pl = a1 * b1 - ph + a1 * b2 + a2 * b1 + a2 * b2 + al * b;
  const zh = ph + pl;
  w[2 * d] = zh;
  w[2 * d + 1] = pl - (zh - ph);
}

/** Slot d = slot a / slot b (DWDivDW2). */
export function ddDiv(w: Float64Array, d: number, a: number, b: number): void {
  const ah = w[2 * a]!;
  const al = w[2 * a + 1]!;
  const bh = w[2 * b]!;
  const bl = w[2 * b + 1]!;
  const th = ah / bh;
  // r = b × th (DWTimesFP1)
  let t = SPLIT * bh;
  const b1 = t - (t - bh);
  const b2 = bh - b1;
  t = SPLIT * th;
  const t1 = t - (t - th);
  const t2 = th - t1;
  const ph = bh * th;
  const pl = b1 * t1 - ph + b1 * t2 + b2 * t1 + b2 * t2 + bl * th;
  const rh = ph + pl;
  const rl = pl - (rh - ph);
  const tl = (ah - rh + (al - rl)) / bh;
  const zh = th + tl;
  w[2 * d] = zh;
  w[2 * d + 1] = tl - (zh - th);
}

/** The double nearest to slot a's value (the one rounding of a compensated result). */
export function ddValue(w: Float64Array, a: number): number {
  return w[2 * a]! + w[2 * a + 1]!;
}

/**
 * The square root of slot a (a > 0) as a double: one Newton correction of Math.sqrt(hi) with the
 * exact residual hi − s² (TwoProduct), so the result is within about half an ulp of the exact root.
 */
export function ddSqrtValue(w: Float64Array, a: number): number {
  const ah = w[2 * a]!;
  const al = w[2 * a + 1]!;
  const s = Math.sqrt(ah);
  const t = SPLIT * s;
  const s1 = t - (t - s);
  const s2 = s - s1;
  const ph = s * s;
  const pl = s1 * s1 - ph + 2 * s1 * s2 + s2 * s2;
  return s + (ah - ph - pl + al) / (2 * s);
}

/**
 * Sets slot d to the decimal number `text` (digits with an optional point, such as '647.096') to
 * double-double accuracy: the integer of its digits divided by the power of ten, both exact doubles.
 * For the decimal constants of the equations (IF97 writes T* = 647.096 K and 7.1 − π exactly).
 */
export function ddFromDecimal(w: Float64Array, d: number, text: string): void {
  const point = text.indexOf('.');
  const digits = point < 0 ? text : text.slice(0, point) + text.slice(point + 1);
  const scale = point < 0 ? 0 : text.length - point - 1;
  const mantissa = Number(digits);
  if (!Number.isSafeInteger(mantissa) || scale > 22) throw new Error(`ddFromDecimal: ${text} is not an exact ratio of doubles`);
  ddSet(decimalW, 0, mantissa, 0);
  ddSet(decimalW, 1, 10 ** scale, 0);
  ddDiv(decimalW, 0, 0, 1);
  w[2 * d] = decimalW[0]!;
  w[2 * d + 1] = decimalW[1]!;
}
const decimalW = new Float64Array(4);

/** Terms of 2 atanh(z) = ln((1 + z)/(1 − z)) = 2 Σ z^(2i+1)/(2i+1) used by {@link ddLog}: |z| ≤ 0.172 needs 22. */
const LOG_TERMS = 22;
/** Workspace of ddLog: slots 0 … 2 scratch, 3 … the coefficients 1/(2i+1), then ln 2. */
const logW = new Float64Array(2 * (4 + LOG_TERMS + 2));
const LN2 = 3 + LOG_TERMS;
for (let i = 0; i < LOG_TERMS; i++) {
  ddSet(logW, 0, 1, 0);
  ddSet(logW, 1, 2 * i + 1, 0);
  ddDiv(logW, 3 + i, 0, 1);
}
// ln 2 = 2 atanh(1/3), summed once at load with enough terms for |z| = 1/3 (3⁻⁷⁵ < 2⁻¹¹⁰)
{
  ddSet(logW, 0, 1, 0);
  ddSet(logW, 1, 3, 0);
  ddDiv(logW, 0, 0, 1); // z = 1/3
  ddMul(logW, 1, 0, 0); // z²
  ddSet(logW, LN2, 0, 0);
  for (let i = 37; i >= 0; i--) {
    ddMul(logW, LN2, LN2, 1);
    ddSet(logW, 2, 1, 0);
    ddSet(logW, LN2 + 1, 2 * i + 1, 0);
    ddDiv(logW, 2, 2, LN2 + 1);
    ddAdd(logW, LN2, LN2, 2);
  }
  ddMul(logW, LN2, LN2, 0);
  ddMulNumber(logW, LN2, LN2, 2);
}

/**
 * Slot d of `w` = ln(slot a of `w`) for a > 0, to double-double accuracy: a = 2ᵏ m with m in [√½, √2],
 * ln m = 2 atanh((m − 1)/(m + 1)) by its series (Horner, 22 terms), plus k ln 2.
 */
export function ddLog(w: Float64Array, d: number, a: number): void {
  const ah = w[2 * a]!;
  const k = Math.round(Math.log2(ah));
  const scale = 2 ** -k;
  // m − 1 and m + 1 (the scaling by 2⁻ᵏ is exact)
  ddSet(logW, 0, ah * scale, w[2 * a + 1]! * scale);
  ddSet(logW, 1, 1, 0);
  ddAdd(logW, 2, 0, 1);
  ddSub(logW, 0, 0, 1);
  ddDiv(logW, 0, 0, 2); // z
  ddMul(logW, 1, 0, 0); // z²
  ddCopy(logW, 2, 3 + LOG_TERMS - 1);
  for (let i = LOG_TERMS - 2; i >= 0; i--) {
    ddMul(logW, 2, 2, 1);
    ddAdd(logW, 2, 2, 3 + i);
  }
  ddMul(logW, 2, 2, 0);
  ddMulNumber(logW, 2, 2, 2);
  ddMulNumber(logW, 0, LN2, k);
  ddAdd(logW, 2, 2, 0);
  w[2 * d] = logW[4]!;
  w[2 * d + 1] = logW[5]!;
}
