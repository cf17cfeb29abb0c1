/**
 * The fused loops of `waterBatch` (src/water/batch.ts): the SI core called directly for each
 * element and the requested columns filled without a reader call per property, bit for bit the
 * generic runner's results (tests/batch/batch.test.ts). (p, T) goes block by block through the
 * generated region 1 rows; (p, h) and (p, s) through column slots or a small row buffer.
 *
 * @module
 */
import type { BatchLoop } from '../core/batch.js';
import { Status } from '../core/status.js';
import type { WaterBatchProperty, WaterTransportProperty } from './batch.js';
import type { SolverContext } from './if97/context.js';
import { region1Rows } from './if97/kernels.generated.js';
import { stateFromPH } from './if97/ph.js';
import { stateFromPS } from './if97/ps.js';
import { stateFromPT } from './if97/pt.js';
import { PHASE, WaterState } from './if97/water-state.js';

/** The input pairs of the fused loop. */
export const PAIR_PT = 0;
export const PAIR_PH = 1;
export const PAIR_PS = 2;
type Pair = typeof PAIR_PT | typeof PAIR_PH | typeof PAIR_PS;

/** Fields of a row of the fused loop, one per property (k = cp/cv is formed only when requested). */
const FIELD: { readonly [K in Exclude<WaterBatchProperty, WaterTransportProperty>]: number } = { T: 0, p: 1, v: 2, rho: 3, u: 4, h: 5, s: 6, cp: 7, cv: 8, w: 9, k: 10, x: 11 };
/** Row width: the twelve fields. */
const WIDTH = 12;
/** Requests of up to this many properties take the column-slot path; more take the block path. */
const SLOTS = 6;
/** Elements per block of the block path: the rows of a block stay in the first-level cache. */
const BLOCK = 128;

/** The fused loop's scratch: private to {@link fusedLoop}, which runs to completion without calling out. */
const st = new WaterState();
const row = new Float64Array(WIDTH);

/** The (p, T) loop's block scratch: rows, which elements region1Rows fills, and the others' codes. */
const ptRows = new Float64Array(BLOCK * WIDTH);
const ptMask = new Uint8Array(BLOCK);
const ptCodes = new Uint8Array(BLOCK);

/**
 * The fused loop for (p, T), block by block: the elements in region 1 by bounds alone (the test of
 * `certainlyRegion1`) get their rows from the generated `region1Rows`, whose loop holds the term sums
 * itself: the sums kernel is too large for the engine to inline, and calling it per element with its
 * output array, then the state object in between, cost about a fifth of a batch state (92–104 → 80–82
 * ns in same-run comparisons). The others go through `stateFromPT`. (p, T) never gives a two-phase state.
 * Then the requested columns are filled from the rows.
 */
function ptLoop(ctx: SolverContext, a: Float64Array, b: Float64Array, fields: Int32Array, wantK: boolean, columns: readonly Float64Array[], status: Uint8Array): void {
  const n = a.length;
  const slots = fields.length <= SLOTS ? slotsOf(fields, columns) : undefined;
  for (let start = 0; start < n; start += BLOCK) {
    const end = Math.min(n, start + BLOCK);
    if (region1Rows(a, b, start, end, ptMask, ptRows, wantK) < end - start) {
      for (let i = start, j = 0, r = 0; i < end; i++, j++, r += WIDTH) {
        if (ptMask[j] === 1) continue;
        const code = stateFromPT(a[i]!, b[i]!, st, ctx);
        ptCodes[j] = code;
        if (code === Status.ok) copyState(ptRows, r, wantK);
      }
    }
    if (slots !== undefined) slotsFromRows(start, end, fields, columns, slots, status);
    else columnsFromRows(start, end, fields, columns, status);
  }
}

/** Up to six requested columns and their row fields in fixed slots (slots past the request repeat the first). */
interface Slots {
  readonly c0: Float64Array;
  readonly c1: Float64Array;
  readonly c2: Float64Array;
  readonly c3: Float64Array;
  readonly c4: Float64Array;
  readonly c5: Float64Array;
  readonly f0: number;
  readonly f1: number;
  readonly f2: number;
  readonly f3: number;
  readonly f4: number;
  readonly f5: number;
}

/** The slots of a request of at most six properties (one object per batch call). */
function slotsOf(fields: Int32Array, columns: readonly Float64Array[]): Slots {
  const m = fields.length;
  const slot = (k: number) => (k < m ? k : 0);
  return {
    c0: columns[0]!,
    c1: columns[slot(1)]!,
    c2: columns[slot(2)]!,
    c3: columns[slot(3)]!,
    c4: columns[slot(4)]!,
    c5: columns[slot(5)]!,
    f0: fields[0]!,
    f1: fields[slot(1)]!,
    f2: fields[slot(2)]!,
    f3: fields[slot(3)]!,
    f4: fields[slot(4)]!,
    f5: fields[slot(5)]!,
  };
}

/**
 * The columns and statuses of a (p, T) block from its rows, for up to six properties: fixed slots (slots
 * past the request repeat the first column), each element's values read once and written once.
 */
function slotsFromRows(start: number, end: number, fields: Int32Array, columns: readonly Float64Array[], slots: Slots, status: Uint8Array): void {
  const m = fields.length;
  const { c0, c1, c2, c3, c4, c5, f0, f1, f2, f3, f4, f5 } = slots;
  for (let i = start, j = 0, r = 0; i < end; i++, j++, r += WIDTH) {
    let code: number = ptMask[j] === 1 ? Status.ok : ptCodes[j]!;
    if (code === Status.ok) {
      const v0 = ptRows[r + f0]!;
      const v1 = ptRows[r + f1]!;
      const v2 = ptRows[r + f2]!;
      const v3 = ptRows[r + f3]!;
      const v4 = ptRows[r + f4]!;
      const v5 = ptRows[r + f5]!;
      const sum = v0 + v1 + (v2 + v3) + (v4 + v5);
      if (sum - sum === 0 || okStatus(sum, ptRows, r, fields, false, false) === Status.ok) {
        c0[i] = v0;
        c1[i] = v1;
        c2[i] = v2;
        c3[i] = v3;
        c4[i] = v4;
        c5[i] = v5;
        status[i] = Status.ok;
        continue;
      }
      code = Status.invalidInput;
    }
    for (let c = 0; c < m; c++) columns[c]![i] = NaN;
    status[i] = code;
  }
}

/** The columns and statuses of a (p, T) block from its rows, for any number of properties: column by column. */
function columnsFromRows(start: number, end: number, fields: Int32Array, columns: readonly Float64Array[], status: Uint8Array): void {
  const m = fields.length;
  let failed = 0;
  for (let i = start, j = 0, r = 0; i < end; i++, j++, r += WIDTH) {
    let code: number = ptMask[j] === 1 ? Status.ok : ptCodes[j]!;
    if (code === Status.ok) {
      let sum = 0;
      for (let c = 0; c < m; c++) sum += ptRows[r + fields[c]!]!;
      code = okStatus(sum, ptRows, r, fields, false, false);
    }
    status[i] = code;
    if (code !== Status.ok) failed++;
  }
  for (let c = 0; c < m; c++) {
    const col = columns[c]!;
    for (let i = start, r = fields[c]!; i < end; i++, r += WIDTH) col[i] = ptRows[r]!;
  }
  if (failed > 0) {
    for (let i = start; i < end; i++) if (status[i] !== Status.ok) for (let c = 0; c < m; c++) columns[c]![i] = NaN;
  }
}

/** Solves element i into {@link st}: the (p, h) or (p, s) SI core, as the runner's `solve` does ((p, T) has {@link ptLoop}). */
function solveInto(pair: typeof PAIR_PH | typeof PAIR_PS, x: number, y: number, ctx: SolverContext): number {
  return pair === PAIR_PH ? stateFromPH(x, y, st, ctx) : stateFromPS(x, y, st, ctx);
}

/** Copies {@link st} into `rows` at r (k only when wanted: the runner's reader forms it as cp / cv). */
function copyState(rows: Float64Array, r: number, wantK: boolean): void {
  rows[r] = st.T;
  rows[r + 1] = st.p;
  rows[r + 2] = st.v;
  rows[r + 3] = st.rho;
  rows[r + 4] = st.u;
  rows[r + 5] = st.h;
  rows[r + 6] = st.s;
  // cp, cv and w are NaN in the dome (WaterState), and so is k: not defined there
  rows[r + 7] = st.cp;
  rows[r + 8] = st.cv;
  rows[r + 9] = st.w;
  rows[r + 10] = wantK ? st.cp / st.cv : NaN;
  rows[r + 11] = st.x;
}

/** True when every requested value of the row at r is finite (the quality may be NaN; cp, cv, w, k are not counted in the dome). */
function requestedFinite(rows: Float64Array, r: number, fields: Int32Array, dome: boolean): boolean {
  for (let c = 0; c < fields.length; c++) {
    const f = fields[c]!;
    const value = rows[r + f]!;
    if (f === FIELD.x) {
      if (value === Infinity || value === -Infinity) return false;
    } else if (!(dome && f >= FIELD.cp && f <= FIELD.k) && !Number.isFinite(value)) return false;
  }
  return true;
}

/**
 * The runner's element rule for a state computed `ok`: `invalidInput` when a requested value is not
 * finite (the quality excepted), else `undefinedProperty` in the dome when cp, cv, w or k is requested.
 * `sum` is the sum of the requested values: when finite, every one of them is (a sum that overflows
 * or meets an allowed NaN only sends the element to the exact test).
 */
function okStatus(sum: number, rows: Float64Array, r: number, fields: Int32Array, dome: boolean, wantDomeUndefined: boolean): number {
  if (!(sum - sum === 0) && !requestedFinite(rows, r, fields, dome)) return Status.invalidInput;
  return dome && wantDomeUndefined ? Status.undefinedProperty : Status.ok;
}

/**
 * The fused loop of {@link waterBatch} for one input pair: the SI core called directly (no closure per
 * element), each state copied into a row, and the requested columns filled from it, with no reader
 * call per property and element. Up to six properties go through fixed column slots (slots past the
 * request repeat the first column, so every slot is a real array); more go block by block through a
 * small row buffer. The runner's element rules are applied as it would: a state computed `ok` whose
 * requested values are not all finite is `invalidInput` (the quality excepted: NaN in single-phase
 * states); cp, cv, w, k are NaN in two-phase states, which are `undefinedProperty`; a failed element
 * is NaN in every column. Gives the runner's results bit for bit (tests/batch/batch.test.ts); hands a
 * request that names a property twice back to the runner.
 */
function fusedLoop(pair: Pair, ctx: SolverContext, a: Float64Array, b: Float64Array | undefined, props: readonly WaterBatchProperty[], columns: readonly Float64Array[], status: Uint8Array): boolean {
  const m = props.length;
  if (m === 0) return false;
  const fields = new Int32Array(m);
  let wantK = false;
  let wantDomeUndefined = false;
  for (let c = 0; c < m; c++) {
    for (let d = 0; d < c; d++) if (props[d] === props[c]) return false;
    const f = (FIELD as Readonly<Record<string, number>>)[props[c]!];
    if (f === undefined) return false;
    fields[c] = f;
    if (f === FIELD.k) wantK = true;
    if (f >= FIELD.cp && f <= FIELD.k) wantDomeUndefined = true;
  }
  const second = b!;
  if (pair === PAIR_PT) {
    ptLoop(ctx, a, second, fields, wantK, columns, status);
    return true;
  }
  const n = a.length;
  if (m <= SLOTS) {
    const { c0, c1, c2, c3, c4, c5, f0, f1, f2, f3, f4, f5 } = slotsOf(fields, columns);
    for (let i = 0; i < n; i++) {
      const x = a[i]!;
      const y = second[i]!;
      let code: number;
      code = pair === PAIR_PH ? stateFromPH(x, y, st, ctx) : stateFromPS(x, y, st, ctx);
      if (code === Status.ok) {
        copyState(row, 0, wantK);
        const v0 = row[f0]!;
        const v1 = row[f1]!;
        const v2 = row[f2]!;
        const v3 = row[f3]!;
        const v4 = row[f4]!;
        const v5 = row[f5]!;
        const dome = st.phase === PHASE.twoPhase;
        const sum = v0 + v1 + (v2 + v3) + (v4 + v5);
        code = sum - sum === 0 ? (dome && wantDomeUndefined ? Status.undefinedProperty : Status.ok) : okStatus(sum, row, 0, fields, dome, wantDomeUndefined);
        if (code !== Status.invalidInput) {
          c0[i] = v0;
          c1[i] = v1;
          c2[i] = v2;
          c3[i] = v3;
          c4[i] = v4;
          c5[i] = v5;
          status[i] = code;
          continue;
        }
      }
      for (let c = 0; c < m; c++) columns[c]![i] = NaN;
      status[i] = code;
    }
    return true;
  }
  const rows = new Float64Array(Math.min(n, BLOCK) * WIDTH);
  for (let start = 0; start < n; start += BLOCK) {
    const end = Math.min(n, start + BLOCK);
    let failed = 0;
    for (let i = start, r = 0; i < end; i++, r += WIDTH) {
      let code = solveInto(pair, a[i]!, second[i]!, ctx);
      if (code === Status.ok) {
        copyState(rows, r, wantK);
        let sum = 0;
        for (let c = 0; c < m; c++) sum += rows[r + fields[c]!]!;
        code = okStatus(sum, rows, r, fields, st.phase === PHASE.twoPhase, wantDomeUndefined);
      }
      status[i] = code;
      if (code !== Status.ok && code !== Status.undefinedProperty) failed++;
    }
    for (let c = 0; c < m; c++) {
      const col = columns[c]!;
      for (let i = start, r = fields[c]!; i < end; i++, r += WIDTH) col[i] = rows[r]!;
    }
    if (failed > 0) {
      for (let i = start; i < end; i++) {
        const code = status[i]!;
        if (code !== Status.ok && code !== Status.undefinedProperty) for (let c = 0; c < m; c++) columns[c]![i] = NaN;
      }
    }
  }
  return true;
}

/** The runner's hook for one pair: a small closure per batch call around the one shared {@link fusedLoop} (so its optimised code is reused). */
export function loopFor(pair: Pair, ctx: SolverContext): BatchLoop<WaterBatchProperty> {
  return (a, b, props, columns, status) => fusedLoop(pair, ctx, a, b, props, columns, status);
}
