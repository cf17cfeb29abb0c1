/**
 * What every benchmark case file shares: the case shape and the sink that keeps results alive.
 * Case files (bench/cases.ts and every bench/cases/*.ts that exports `cases`) import from here.
 */
export interface BenchCase {
  name: string;
  fn: () => void;
  perCall?: number;
  targetNs?: number;
  baseline?: string;
  baselinePerCall?: number;
}

/**
 * States per call of the batch cases: a million for figures; a few thousand in smoke mode
 * (tests/bench.test.ts), which only proves that every case runs. Figures are per state either way.
 */
export const BATCH_STATES = process.argv.includes('--smoke') ? 2_000 : 1_000_000;

let sink = 0;
/** Keeps results alive so the optimiser cannot drop the work. */
export function consume(x: number): void {
  sink += x;
}
export function sinkValue(): number {
  return sink;
}
