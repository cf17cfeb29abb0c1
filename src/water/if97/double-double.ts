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
export const SPLIT = 134217729;

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

/**
 * Slot d = slot a × slot b (TwoProduct of the high parts by Veltkamp splitting, plus the cross terms).
 * The arithmetic of {@link ddProduct}, written out: called through it, the compensated region 1 and 3
 * kernels took about 13 % longer (same run, alternating).
 */
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

/** out[i], out[i + 1] = (ah + al)(bh + bl): the product of {@link ddMul} for pairs held anywhere (the power tables). */
export function ddProduct(out: Float64Array, i: number, ah: number, al: number, bh: number, bl: number): void {
  let t = SPLIT * ah;
  const a1 = t - (t - ah);
  const a2 = ah - a1;
  t = SPLIT * bh;
  const b1 = t - (t - bh);
  const b2 = bh - b1;
  const ph = ah * bh;
  const pl = a1 * b1 - ph + a1 * b2 + a2 * b1 + a2 * b2 + (ah * bl + al * bh);
  const zh = ph + pl;
  out[i] = zh;
  out[i + 1] = pl - (zh - ph);
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

/** Scratch of ddFromDecimal. */
const decimalW = /* @__PURE__ */ new Float64Array(4);

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

/**
 * ln c for c > 0 by the series ln c = 2 Σ z^(2i+1)/(2i+1), z = (c − 1)/(c + 1), in double-double with
 * `terms` terms (Horner): slow, used once, on the first {@link ddLog}, for its table. Writes slot d of w
 * and uses slots d + 1 … d + 3 as scratch.
 */
function logSeries(w: Float64Array, d: number, c: number, terms: number): void {
  const z = d + 1;
  const z2 = d + 2;
  const k = d + 3;
  ddSet(w, k, c + 1, 0);
  ddSet(w, z, c - 1, 0); // c − 1 is exact for the c used here (1 ≤ c ≤ 2)
  ddDiv(w, z, z, k);
  ddMul(w, z2, z, z);
  ddSet(w, d, 0, 0);
  for (let i = terms - 1; i >= 0; i--) {
    ddMul(w, d, d, z2);
    ddSet(w, k, 1, 0);
    ddSet(w, k + 1, 2 * i + 1, 0);
    ddDiv(w, k, k, k + 1);
    ddAdd(w, d, d, k);
  }
  ddMul(w, d, d, z);
  ddMulNumber(w, d, d, 2);
}

/** ln c_j for c_j = 1 + j/64 (j = 0 … 64, the last being ln 2), as double-double pairs: the table of {@link ddLog}. */
const LOG_TABLE_SIZE = 64;
/** Built on the first {@link ddLog} (about 7 ms of a cold start if it were built at import). */
let LOG_TABLE: Float64Array | undefined;
function logTable(): Float64Array {
  const w = new Float64Array(2 * (LOG_TABLE_SIZE + 6));
  // |z| ≤ 1/3 for c in [1, 2]: 3^−77 < 2^−120, so 38 terms leave no error above the double-double rounding
  for (let j = 0; j <= LOG_TABLE_SIZE; j++) {
    logSeries(w, LOG_TABLE_SIZE + 1, 1 + j / LOG_TABLE_SIZE, 38);
    ddCopy(w, j, LOG_TABLE_SIZE + 1);
  }
  return (LOG_TABLE = w.subarray(0, 2 * (LOG_TABLE_SIZE + 1)));
}
/** Scratch of ddLog. */
const logW = /* @__PURE__ */ new Float64Array(8);

/**
 * Slot d of `w` = ln(slot a of `w`) for a > 0: a = 2ᵏ m with m in [1, 2), m = c (1 + u) with
 * c = 1 + j/64 the table point just below m, ln m = ln c + 2 atanh(z), z = (m − c)/(m + c), |z| ≤ 1/129.
 * k ln 2, ln c and 2z are double-double; the rest of the series, 2z³/3 + 2z⁵/5 + … + 2z¹³/13, is
 * summed in doubles: |tail| < 3.2·10⁻⁷, so its rounding leaves an absolute error of about 2⁻⁷², far below
 * the unit in the last place of any IF97 entropy it enters (s/R > 1 there, one ulp ≥ 2⁻⁵²).
 */
export function ddLog(w: Float64Array, d: number, a: number): void {
  const ah = w[2 * a]!;
  const al = w[2 * a + 1]!;
  let k = Math.floor(Math.log2(ah));
  let scale = 2 ** -k;
  let mh = ah * scale;
  if (mh < 1) {
    k -= 1;
    scale *= 2;
    mh = ah * scale;
  } else if (mh >= 2) {
    k += 1;
    scale /= 2;
    mh = ah * scale;
  }
  const ml = al * scale;
  const j = Math.floor((mh - 1) * LOG_TABLE_SIZE);
  const c = 1 + j / LOG_TABLE_SIZE;
  // z = (m − c)/(m + c): m − c is exact (Sterbenz), m + c by TwoSum
  ddSet(logW, 0, mh - c, 0);
  ddSet(logW, 1, ml, 0);
  ddAdd(logW, 0, 0, 1);
  const sh = mh + c;
  const v = sh - mh;
  ddSet(logW, 2, sh, mh - (sh - v) + (c - v));
  ddAdd(logW, 2, 2, 1);
  ddDiv(logW, 0, 0, 2); // z
  const zh = logW[0]!;
  const z2 = zh * zh;
  const tail = 2 * zh * z2 * (1 / 3 + z2 * (1 / 5 + z2 * (1 / 7 + z2 * (1 / 9 + z2 * (1 / 11 + z2 / 13)))));
  ddMulNumber(logW, 0, 0, 2); // 2z (exact scaling)
  ddSet(logW, 1, tail, 0);
  ddAdd(logW, 0, 0, 1);
  // + ln c_j + k ln 2
  const table = LOG_TABLE ?? logTable();
  logW[6] = table[2 * j]!;
  logW[7] = table[2 * j + 1]!;
  ddAdd(logW, 0, 0, 3);
  logW[2] = table[2 * LOG_TABLE_SIZE]!;
  logW[3] = table[2 * LOG_TABLE_SIZE + 1]!;
  ddMulNumber(logW, 1, 1, k);
  ddAdd(logW, 0, 0, 1);
  w[2 * d] = logW[0]!;
  w[2 * d + 1] = logW[1]!;
}
