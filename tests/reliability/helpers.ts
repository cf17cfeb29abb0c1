/**
 * Shared pieces of the reliability suite (issue 17): the bad-input case shape and its check, and a
 * small seeded generator for the random-state sweeps (deterministic, so a failure names its state
 * and reproduces).
 */
import { expect } from 'vitest';
import { HeatstateError, type ErrorCode } from '../../src/errors.js';

/** The classes of bad input of issue 17. */
export type FaultClass = 'plain-error' | 'non-finite' | 'guessed' | 'unnamed';

/** An error class of heatstate (for `instanceof`). */
export type ErrorClass = abstract new (...args: never[]) => HeatstateError;

/** One bad input: the call, and the typed error it must end in. */
export interface BadInput {
  /** Which class of issue 17 it belongs to. */
  readonly kind: FaultClass;
  /** The public function called (`water.saturation`), for the per-entry count. */
  readonly fn: string;
  /** What is wrong with the call, as the test name. */
  readonly label: string;
  readonly call: () => unknown;
  /** The error class expected. */
  readonly error: ErrorClass;
  readonly code: ErrorCode;
  /** The message must contain at least one of these (the parameter name or the value as given). */
  readonly names: readonly string[];
  /**
   * A known library fault, not yet fixed: the case runs under `it.fails` (it must still fail; when
   * the library is fixed, the mark comes off). The text says what happens today.
   */
  readonly fault?: string;
}

const WORD = /[A-Za-z0-9_]/;

/**
 * True when `message` names `name`: short names made of letters and digits (≤ 3 characters: `h`,
 * `T`, `p`) only as a whole word, so that the `h` of "the" does not count; others anywhere.
 */
export function names(message: string, name: string): boolean {
  if (name.length > 3 || !/^\w+$/.test(name)) return message.includes(name);
  for (let i = message.indexOf(name); i >= 0; i = message.indexOf(name, i + 1)) {
    const before = i === 0 ? '' : message[i - 1]!;
    const after = message[i + name.length] ?? '';
    if (!WORD.test(before) && !WORD.test(after)) return true;
  }
  return false;
}

/** Runs a case: it must throw `error` with `code`, and the message must name the input. */
export function expectRefused(c: BadInput): void {
  let thrown: unknown;
  let value: unknown;
  try {
    value = c.call();
  } catch (e) {
    thrown = e;
  }
  if (thrown === undefined) expect.fail(`${c.fn}: ${c.label}: no error; returned ${describeResult(value)}`);
  if (!(thrown instanceof HeatstateError)) expect.fail(`${c.fn}: ${c.label}: a plain ${(thrown as Error)?.name ?? typeof thrown}: ${(thrown as Error)?.message ?? String(thrown)}`);
  expect(thrown, `${c.fn}: ${c.label}: ${thrown.name} ${thrown.code}: ${thrown.message}`).toBeInstanceOf(c.error);
  expect(thrown.code, thrown.message).toBe(c.code);
  expect(
    c.names.some((n) => names(thrown.message, n)),
    `message should name one of ${c.names.map((n) => `"${n}"`).join(', ')}: ${thrown.message}`,
  ).toBe(true);
}

function describeResult(v: unknown): string {
  if (v === null || typeof v !== 'object') return String(v);
  if (ArrayBuffer.isView(v)) return `a ${v.constructor.name}`;
  return `an object with ${Object.keys(v).slice(0, 6).join(', ')}`;
}

/**
 * A seeded pseudo-random generator (mulberry32): deterministic across runs and machines, so a
 * sweep is the same set of states every time and a failure reproduces from its seed.
 */
export class Random {
  private a: number;
  constructor(seed: number) {
    this.a = seed >>> 0;
  }
  /** Uniform in [0, 1). */
  next(): number {
    let t = (this.a = (this.a + 0x6d2b79f5) >>> 0);
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  }
  /** Uniform in [lo, hi]. */
  uniform(lo: number, hi: number): number {
    return lo + (hi - lo) * this.next();
  }
  /** Log-uniform in [lo, hi] (both > 0). */
  logUniform(lo: number, hi: number): number {
    return Math.exp(Math.log(lo) + (Math.log(hi) - Math.log(lo)) * this.next());
  }
  /** An integer in [0, n). */
  int(n: number): number {
    return Math.floor(this.next() * n);
  }
}

/** |a − b| ≤ rel·max(|a|, |b|, floor): the sweeps' one round-trip test. */
export function closeRel(a: number, b: number, rel: number, floor = 0): boolean {
  return Math.abs(a - b) <= rel * Math.max(Math.abs(a), Math.abs(b), floor);
}

/** Failures of a sweep: counted, the first dozen kept for the message. */
export class Failures {
  readonly list: string[] = [];
  count = 0;
  add(what: string): void {
    this.count++;
    if (this.list.length < 12) this.list.push(what);
  }
  expectNone(label: string): void {
    expect(this.count, `${label}: ${this.count} failures, first ones:\n${this.list.join('\n')}`).toBe(0);
  }
}
