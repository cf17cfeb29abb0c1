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

let sink = 0;
/** Keeps results alive so the optimiser cannot drop the work. */
export function consume(x: number): void {
  sink += x;
}
export function sinkValue(): number {
  return sink;
}
