/**
 * Plain evaluations over a fluid file that does not ship (`"loadable": false`): pressure at (T, ρ),
 * saturation by the Maxwell condition, and the ideal-gas cp°, from the term-by-term oracle in
 * reference-helmholtz.ts. Used by tests/reference/<fluid>.test.ts to reproduce a recorded finding.
 *
 * @module
 */
import { readFileSync } from 'node:fs';
import type { FluidCoefficients } from '../../scripts/generate-kernels.js';
import { referenceIdeal, referenceResidual } from './reference-helmholtz.js';

/** A fluid file with the constants the checks need. */
export interface FluidFile extends FluidCoefficients {
  readonly loadable: boolean;
  readonly finding?: string;
  readonly gasConstant: { readonly value: number };
  readonly reducing: { readonly T: number; readonly rho: number };
  readonly critical: { readonly T: number; readonly p: number; readonly rho: number };
}

/** data/fluids/<file>.json. */
export function readFluidFile(file: string): FluidFile {
  return JSON.parse(readFileSync(new URL(`../../data/fluids/${file}.json`, import.meta.url), 'utf8')) as FluidFile;
}

const out = [0, 0, 0, 0, 0, 0];
const size = [0, 0, 0, 0, 0, 0];

/** p (Pa) and (∂p/∂ρ)_T at (T, ρ). */
export function pressure(f: FluidFile, T: number, rho: number): [number, number] {
  const d = rho / f.reducing.rho;
  referenceResidual(f, d, f.reducing.T / T, out, size);
  const RT = f.gasConstant.value * T;
  return [rho * RT * (1 + d * out[1]!), RT * (1 + 2 * d * out[1]! + d * d * out[2]!)];
}

/** g/(RT) less the ideal-gas terms equal in both phases. */
function gibbs(f: FluidFile, T: number, rho: number): [number, number] {
  const d = rho / f.reducing.rho;
  referenceResidual(f, d, f.reducing.T / T, out, size);
  return [out[0]! + d * out[1]! + Math.log(d), (2 * out[1]! + d * out[2]! + 1 / d) / f.reducing.rho];
}

/** Saturation at T by Newton's method on (ρ', ρ'') for equal p and g, from the given densities. */
export function saturation(f: FluidFile, T: number, rhoL: number, rhoV: number): { p: number; rhoL: number; rhoV: number } {
  let l = rhoL;
  let v = rhoV;
  for (let i = 0; i < 100; i++) {
    const [pl, dpl] = pressure(f, T, l);
    const [pv, dpv] = pressure(f, T, v);
    const [gl, dgl] = gibbs(f, T, l);
    const [gv, dgv] = gibbs(f, T, v);
    const f1 = pl - pv;
    const f2 = gl - gv;
    const det = dpl * -dgv + dpv * dgl;
    const sl = -(f1 * -dgv + dpv * f2) / det;
    const sv = -(dpl * f2 - dgl * f1) / det;
    l += sl;
    v += sv;
    if (Math.abs(sl) < 1e-12 * l && Math.abs(sv) < 1e-12 * v) break;
  }
  return { p: pressure(f, T, v)[0], rhoL: l, rhoV: v };
}

/** Ideal-gas cp° (J/(kg·K)) at T. */
export function idealCp(f: FluidFile, T: number): number {
  const tau = f.reducing.T / T;
  referenceIdeal(f, tau, out, size);
  return f.gasConstant.value * (1 - tau * tau * out[2]!);
}
