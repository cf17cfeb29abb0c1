/**
 * Compiling an incompressible substance definition into the SI model: unit checks, ranges,
 * monotone tables, positive c. The shape is checked first by the zod schema (schema.ts) for user
 * definitions; the built-in catalogue, whose shape the tests check against the same schema, is
 * compiled directly, so that loading it does not load zod.
 *
 * @module
 */
import { DefinitionError, HeatstateError, type DefinitionIssue } from '../errors.js';
import { Quantity, quantity } from '../units/quantity.js';
import { resolveUnit, toSI, DEFAULT_AMBIENT_PA } from '../units/registry.js';
import type { Dimension } from '../units/dimensions.js';
import { piecewiseLinear } from '../numeric/interpolate.js';
import { heatCapacityAt, type IncompressibleModel } from './model.js';
import type { IncompressibleDefinition } from './schema.js';
import { compileTransport, provenanceOf, type CompiledTransport, type TransportSource } from './transport-data.js';

/**
 * Where a substance's numbers come from, how they were obtained, and how far to trust them (the same
 * shape as the ideal-gas species' `provenance`, and the same record as each transport property's).
 */
export type SubstanceSource = TransportSource;

/** A compiled substance: the SI model plus what describes it. */
export interface CompiledSubstance {
  readonly definition: IncompressibleDefinition;
  readonly model: IncompressibleModel;
  /** The definition's source, basis and uncertainty in one object. */
  readonly provenance: SubstanceSource;
  /** Viscosity and thermal conductivity, compiled (with their own sources). */
  readonly transport: CompiledTransport;
}

/** Options of compilation. */
export interface CompileOptions {
  /** Start the range at `T.supercooledMin` (supercooled liquid) instead of `T.min`. Default false. */
  readonly supercooled?: boolean;
}


/**
 * Expands Σ aᵢ·tⁱ with t = α·T + β into coefficients in T (binomial expansion).
 */
function substituteAffine(a: readonly number[], alpha: number, beta: number): number[] {
  const out = new Array<number>(a.length).fill(0);
  for (let i = 0; i < a.length; i++) {
    // (αT + β)^i = Σ_k C(i,k) α^k β^(i−k) T^k
    let binom = 1;
    for (let k = 0; k <= i; k++) {
      out[k]! += a[i]! * binom * alpha ** k * beta ** (i - k);
      binom = (binom * (i - k)) / (k + 1);
    }
  }
  return out;
}

/**
 * Compiles a definition whose shape is already valid: checks units, ranges and monotonicity.
 * @throws {@link DefinitionError} listing every problem with its path
 */
export function compileChecked(def: IncompressibleDefinition, options: CompileOptions = {}): CompiledSubstance {
  const label = `incompressible substance "${def.name}"`;
  const issues: DefinitionIssue[] = [];

  const read = (value: string | Quantity, dimension: Dimension, path: (string | number)[]): number | undefined => {
    try {
      const q = typeof value === 'string' ? quantity(value) : value;
      if (q.dimension !== dimension) {
        issues.push({ path, message: `expected a ${dimension} such as "${dimension === 'temperature' ? '300 K' : dimension === 'density' ? '1000 kg/m³' : '4.18 kJ/(kg·K)'}"; got ${q.toString()} (${q.dimension})` });
        return undefined;
      }
      return q.si;
    } catch (e) {
      issues.push({ path, message: e instanceof HeatstateError ? e.message : String(e) });
      return undefined;
    }
  };
  const unitOf = (unit: string, dimension: Dimension, path: (string | number)[]) => {
    try {
      const u = resolveUnit(unit);
      if (u.dimension !== dimension) {
        issues.push({ path, message: `"${unit}" is a unit of ${u.dimension}; expected a unit of ${dimension}` });
        return undefined;
      }
      return u;
    } catch (e) {
      issues.push({ path, message: e instanceof HeatstateError ? e.message : String(e) });
      return undefined;
    }
  };

  const meltingMin = read(def.T.min, 'temperature', ['T', 'min']);
  const supercooledMin = def.T.supercooledMin === undefined ? undefined : read(def.T.supercooledMin, 'temperature', ['T', 'supercooledMin']);
  if (options.supercooled === true && def.T.supercooledMin === undefined) {
    issues.push({ path: ['T', 'supercooledMin'], message: `${def.name} has no supercooled-liquid data (no T.supercooledMin); its range starts at T.min` });
  }
  if (supercooledMin !== undefined && meltingMin !== undefined && !(supercooledMin < meltingMin)) {
    issues.push({ path: ['T', 'supercooledMin'], message: `T.supercooledMin must be below T.min; got ${supercooledMin} K and ${meltingMin} K` });
  }
  const Tmin = options.supercooled === true ? supercooledMin : meltingMin;
  const Tmax = read(def.T.max, 'temperature', ['T', 'max']);
  if (Tmin !== undefined && Tmax !== undefined && !(Tmin < Tmax)) issues.push({ path: ['T'], message: `T.min must be below T.max; got ${Tmin} K and ${Tmax} K` });

  let rho: number | undefined;
  let densityForm: IncompressibleModel['density'] = 'constant';
  let nodesTrho = new Float64Array(0);
  let nodesRho = new Float64Array(0);
  if (typeof def.density === 'string' || def.density instanceof Quantity) {
    rho = read(def.density, 'density', ['density']);
    if (rho !== undefined && !(rho > 0)) issues.push({ path: ['density'], message: `density must be positive; got ${rho} kg/m³` });
  } else {
    densityForm = 'table';
    const { T, rho: values } = def.density.table;
    if (T.length !== values.length) issues.push({ path: ['density', 'table'], message: `T has ${T.length} values but rho has ${values.length}` });
    const du = unitOf(def.density.unit, 'density', ['density', 'unit']);
    const tu = unitOf(def.density.temperatureUnit, 'temperature', ['density', 'temperatureUnit']);
    if (du && tu) {
      nodesTrho = Float64Array.from(T, (t) => toSI(t, tu, DEFAULT_AMBIENT_PA));
      nodesRho = Float64Array.from(values, (x) => x * du.factor);
      for (let i = 1; i < nodesTrho.length; i++) {
        if (!(nodesTrho[i]! > nodesTrho[i - 1]!)) issues.push({ path: ['density', 'table', 'T', i], message: `temperatures must increase strictly; row ${i} (${T[i]}) does not exceed row ${i - 1} (${T[i - 1]})` });
      }
      nodesRho.forEach((x, i) => {
        if (!(x > 0)) issues.push({ path: ['density', 'table', 'rho', i], message: `density must be positive; got ${values[i]}` });
      });
      if (Tmin !== undefined && Tmax !== undefined && nodesTrho.length >= 2 && (Tmin < nodesTrho[0]! - 1e-9 || Tmax > nodesTrho[nodesTrho.length - 1]! + 1e-9)) {
        issues.push({ path: ['T'], message: `the valid range ${Tmin}–${Tmax} K reaches beyond the density table (${nodesTrho[0]}–${nodesTrho[nodesTrho.length - 1]} K)` });
      }
      if (issues.length === 0 && Tmin !== undefined && Tmax !== undefined) {
        // the reference value behind the constant-density fields: ρ at 298.15 K, or at the nearer range end
        rho = piecewiseLinear(nodesTrho, nodesRho, Math.min(Math.max(298.15, Tmin), Tmax));
      }
    }
  }

  // c per mole (thermochemical tables) needs the molar mass; then the factor divides by it
  let perMole = 1;
  const cUnit = typeof def.c === 'object' && !(def.c instanceof Quantity) ? def.c.unit : undefined;
  let cDimension: Dimension = 'specificHeat';
  if (def.molarMass !== undefined) {
    const M = read(def.molarMass, 'molarMass', ['molarMass']);
    if (M !== undefined && !(M > 0)) issues.push({ path: ['molarMass'], message: `molarMass must be positive; got ${M} kg/mol` });
    if (cUnit === undefined) issues.push({ path: ['molarMass'], message: 'molarMass applies to a polynomial or tabulated c with a molar unit such as J/(mol·K)' });
    else cDimension = 'molarHeatCapacity';
    perMole = 1 / (M ?? NaN);
  }

  let coefficients = new Float64Array(0);
  let nodesT = new Float64Array(0);
  let nodesC = new Float64Array(0);
  let heatCapacity: IncompressibleModel['heatCapacity'] = 'polynomial';

  if (typeof def.c === 'string' || def.c instanceof Quantity) {
    const c = read(def.c, 'specificHeat', ['c']);
    if (c !== undefined && !(c > 0)) issues.push({ path: ['c'], message: `c must be positive; got ${c} J/(kg·K)` });
    coefficients = Float64Array.of(c ?? NaN);
  } else if ('polynomial' in def.c) {
    const cu = unitOf(def.c.unit, cDimension, ['c', 'unit']);
    const tu = unitOf(def.c.temperatureUnit, 'temperature', ['c', 'temperatureUnit']);
    if (cu && tu) {
      // t = T/factor − offset, so the coefficients in T follow by substitution
      const inT = substituteAffine(def.c.polynomial, 1 / tu.factor, -tu.offset);
      coefficients = Float64Array.from(inT, (a) => a * cu.factor * perMole);
    }
  } else {
    heatCapacity = 'table';
    const { T, c } = def.c.table;
    if (T.length !== c.length) issues.push({ path: ['c', 'table'], message: `T has ${T.length} values but c has ${c.length}` });
    const cu = unitOf(def.c.unit, cDimension, ['c', 'unit']);
    const tu = unitOf(def.c.temperatureUnit, 'temperature', ['c', 'temperatureUnit']);
    if (cu && tu) {
      nodesT = Float64Array.from(T, (t) => toSI(t, tu, DEFAULT_AMBIENT_PA));
      nodesC = Float64Array.from(c, (x) => x * cu.factor * perMole);
      for (let i = 1; i < nodesT.length; i++) {
        if (!(nodesT[i]! > nodesT[i - 1]!)) issues.push({ path: ['c', 'table', 'T', i], message: `temperatures must increase strictly; row ${i} (${T[i]}) does not exceed row ${i - 1} (${T[i - 1]})` });
      }
      nodesC.forEach((x, i) => {
        if (!(x > 0)) issues.push({ path: ['c', 'table', 'c', i], message: `c must be positive; got ${c[i]}` });
      });
      if (Tmin !== undefined && Tmax !== undefined && nodesT.length >= 2 && (Tmin < nodesT[0]! - 1e-9 || Tmax > nodesT[nodesT.length - 1]! + 1e-9)) {
        issues.push({ path: ['T'], message: `the valid range ${Tmin}–${Tmax} K reaches beyond the table (${nodesT[0]}–${nodesT[nodesT.length - 1]} K)` });
      }
    }
  }

  const model: IncompressibleModel = { heatCapacity, coefficients, nodesT, nodesC, v: 1 / (rho ?? NaN), Tmin: Tmin ?? NaN, Tmax: Tmax ?? NaN, density: densityForm, nodesTrho, nodesRho };
  if (issues.length === 0 && heatCapacity === 'polynomial' && coefficients.length > 1) {
    for (let k = 0; k <= 64; k++) {
      const T = model.Tmin + ((model.Tmax - model.Tmin) * k) / 64;
      if (!(heatCapacityAt(model, T) > 0)) {
        issues.push({ path: ['c', 'polynomial'], message: `c(T) must be positive over the valid range; it is ${heatCapacityAt(model, T)} J/(kg·K) at ${T} K` });
        break;
      }
    }
  }
  const transport = compileTransport(def, Tmin, Tmax, read, unitOf, issues);
  if (issues.length > 0) throw new DefinitionError(label, issues);
  return { definition: def, model, provenance: provenanceOf(def), transport };
}
