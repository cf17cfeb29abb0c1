/**
 * Aqueous glycol solutions (ethylene glycol and propylene glycol in water, 0–60 % by mass) from
 * data/incompressible/brines.json: c and ρ on a grid of mass fraction × temperature, interpolated
 * bilinearly through the typed table layer (`PropertyGrid`), and the freezing point by
 * concentration. A solution at a given concentration becomes an ordinary incompressible definition
 * (c and ρ tabulated at the grid's temperatures), so `incompressible('ethylene glycol solution',
 * { massFraction: 0.3 })` returns the same substance object as every other entry.
 *
 * Its range starts at the freezing point of that concentration, or at the first grid temperature
 * where both neighbouring concentrations have data, whichever is higher; below it the facade
 * throws an out-of-range error that names the concentration and the freezing point.
 *
 * @module
 */
import { Status } from '../core/status.js';
import { GridValue } from '../tables/core.js';
import { InvalidInputError, OutOfRangeError } from '../errors.js';
import { normaliseName } from '../lookup.js';
import { piecewiseLinear } from '../numeric/interpolate.js';
import { PropertyGrid } from '../tables/table.js';
import type { GridData } from '../tables/schema.js';
import { quantity } from '../units/quantity.js';
import { compileChecked, type CompiledSubstance } from './compile.js';
import { brinesData } from './data-files.js';
import type { IncompressibleDefinition } from './schema.js';

/** The concentration of a solution: one of the two. */
export interface SolutionOptions {
  /** Mass of glycol over mass of solution, 0 to 0.6. */
  readonly massFraction?: number;
  /**
   * Volume of glycol over the volumes of glycol and water before mixing, both at 20 °C (converted to
   * a mass fraction with the pure densities at 20 °C).
   */
  readonly volumeFraction?: number;
}

interface Solution {
  readonly name: string;
  readonly solute: string;
  readonly source: { readonly title: string; readonly authors?: string; readonly year?: number; readonly table?: string };
  readonly basis: string;
  readonly uncertainty: string;
  readonly finding: string;
  /** Why the solution's viscosity and thermal conductivity are left out. */
  readonly transportOmitted: string;
  readonly volumeFraction: { readonly convention: string; readonly pureDensity: string; readonly waterDensity: string };
  readonly freezingPoint: { readonly massFraction: readonly number[]; readonly T: readonly number[]; readonly unit: string };
  readonly grid: GridData;
}

/** The solutions of data/incompressible/brines.json, read on first use. */
const solutions = (): readonly Solution[] => brinesData().solutions as readonly Solution[];
const grids = new Map<Solution, PropertyGrid<'c' | 'rho', 'massFraction', 'T'>>();
const compiled = new Map<string, CompiledSubstance>();

/** The names of the built-in solutions. */
export function solutionNames(): string[] {
  return solutions().map((s) => s.name);
}

/** The raw data of a solution (source, freezing points, grid), or undefined. */
export function findSolution(name: string): Solution | undefined {
  const key = normaliseName(name);
  return solutions().find((s) => normaliseName(s.name) === key);
}

const fmt = (x: number, digits = 4) => String(Number(x.toPrecision(digits)));

/**
 * The mass fraction of glycol from the options (a volume fraction converted at 20 °C).
 * @throws {@link InvalidInputError} when neither or both are given, {@link OutOfRangeError} outside 0–0.6
 */
export function solutionMassFraction(solution: Solution, options: SolutionOptions | undefined): number {
  const w = options?.massFraction;
  const phi = options?.volumeFraction;
  if ((w === undefined) === (phi === undefined)) {
    throw new InvalidInputError('input.invalid', 'massFraction', `${solution.name} needs its concentration: give exactly one of { massFraction } or { volumeFraction } (0 to 0.6 by mass)`);
  }
  const given = (w ?? phi)!;
  const label = w !== undefined ? 'massFraction' : 'volumeFraction';
  if (!Number.isFinite(given)) throw new InvalidInputError('input.not-finite', label, `${label} must be a finite number; got ${given}`);
  let mass = given;
  if (phi !== undefined) {
    const rg = quantity(solution.volumeFraction.pureDensity).si;
    const rw = quantity(solution.volumeFraction.waterDensity).si;
    mass = phi >= 0 && phi <= 1 ? (phi * rg) / (phi * rg + (1 - phi) * rw) : phi;
  }
  const xs = solution.freezingPoint.massFraction;
  const max = xs[xs.length - 1]!;
  if (!(mass >= 0 && mass <= max)) {
    throw new OutOfRangeError(
      { quantity: label, value: given, min: 0, max: phi !== undefined ? (max * quantity(solution.volumeFraction.waterDensity).si) / (max * quantity(solution.volumeFraction.waterDensity).si + (1 - max) * quantity(solution.volumeFraction.pureDensity).si) : max, unit: '1', scope: `the ${solution.name} data` },
      `${label} = ${given} is outside the ${solution.name} data (0 to ${max} by mass${phi !== undefined ? `; ${fmt(mass)} by mass here` : ''})`,
    );
  }
  return mass;
}

function gridOf(solution: Solution): PropertyGrid<'c' | 'rho', 'massFraction', 'T'> {
  let g = grids.get(solution);
  if (!g) {
    g = new PropertyGrid(solution.grid) as PropertyGrid<'c' | 'rho', 'massFraction', 'T'>;
    grids.set(solution, g);
  }
  return g;
}

/**
 * The definition of a solution at one concentration: c and ρ at the grid temperatures (bilinear in
 * mass fraction and T), the range from the freezing point (or the first temperature with data).
 */
export function solutionDefinition(solution: Solution, massFraction: number): IncompressibleDefinition {
  const grid = gridOf(solution);
  const cell = new GridValue();
  const Tc = solution.grid.y.values;
  const freezeC = piecewiseLinear(solution.freezingPoint.massFraction, solution.freezingPoint.T, massFraction);
  const T: number[] = [];
  const c: number[] = [];
  const rho: number[] = [];
  for (const t of Tc) {
    const TK = t + 273.15;
    let cv = grid.valueAt('c', massFraction, TK, cell) === Status.ok ? cell.value : NaN;
    let rv = grid.valueAt('rho', massFraction, TK, cell) === Status.ok ? cell.value : NaN;
    // at the last tabulated concentration the grid's bilinear weight of the empty neighbour is 0 but
    // its NaN still spoils the sum: read the node itself (what interpolation at a node returns)
    const column = solution.grid.x.values.indexOf(massFraction);
    if (Number.isNaN(cv) && column >= 0) cv = (solution.grid.columns.c!.values[Tc.indexOf(t)]![column] ?? NaN) * 1000;
    if (Number.isNaN(rv) && column >= 0) rv = solution.grid.columns.rho!.values[Tc.indexOf(t)]![column] ?? NaN;
    if (Number.isNaN(cv) || Number.isNaN(rv)) continue;
    T.push(t);
    c.push(Number((cv / 1000).toPrecision(12)));
    rho.push(Number(rv.toPrecision(12)));
  }
  const percent = `${fmt(massFraction * 100)} % by mass`;
  const start = Math.max(freezeC, T[0]!);
  const startsAtFreezing = start === freezeC;
  return {
    name: `${solution.name}, ${percent}`,
    state: 'liquid',
    c: { table: { T, c }, unit: 'kJ/(kg·K)', temperatureUnit: '°C' },
    density: { table: { T, rho }, unit: 'kg/m³', temperatureUnit: '°C' },
    T: { min: `${start} °C`, max: `${T[T.length - 1]} °C` },
    source: solution.source,
    basis: solution.basis as IncompressibleDefinition['basis'],
    uncertainty: solution.uncertainty,
    finding: solution.finding,
    viscosity: { omitted: solution.transportOmitted },
    thermalConductivity: { omitted: solution.transportOmitted },
    note: `${solution.solute} in water, ${percent} at 1 atm; c and ρ interpolated bilinearly in mass fraction and temperature. ${solution.volumeFraction.convention}.`,
    rangeNote: startsAtFreezing
      ? `at ${percent} the solution freezes at ${fmt(freezeC, 3)} °C`
      : `at ${percent} the solution freezes at ${fmt(freezeC, 3)} °C, but the tabulated data at this concentration start at ${fmt(start, 3)} °C`,
  };
}

/**
 * The compiled solution at the concentration given in the options.
 * @throws {@link InvalidInputError} without a concentration, {@link OutOfRangeError} outside 0–60 % by mass
 * @example
 * ```ts
 * solution(findSolution('ethylene glycol solution')!, { massFraction: 0.3 }).definition.name;   //=> 'ethylene glycol solution, 30 % by mass'
 * ```
 */
export function solution(s: Solution, options: SolutionOptions | undefined): CompiledSubstance {
  const w = solutionMassFraction(s, options);
  const key = `${s.name}|${w}`;
  let c = compiled.get(key);
  if (!c) {
    c = compileChecked(solutionDefinition(s, w));
    compiled.set(key, c);
  }
  return c;
}
