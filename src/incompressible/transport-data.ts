/**
 * Compiling a definition's transport properties (`viscosity`, `thermalConductivity`) into the SI
 * curves of transport.ts: units, ranges, strictly increasing temperatures, positive values. Part of
 * compile.ts's checks; every problem becomes a {@link DefinitionIssue} with its path.
 *
 * @module
 */
import type { DefinitionIssue } from '../errors.js';
import type { Dimension } from '../units/dimensions.js';
import { toSI, DEFAULT_AMBIENT_PA, type ResolvedUnit } from '../units/registry.js';
import type { Quantity } from '../units/quantity.js';
import type { DefinitionSource, IncompressibleDefinition, TransportField } from './schema.js';
import { missingCurve, type PropertyCurve } from './transport.js';

/** Where a substance's or one of its transport properties' numbers come from: source, basis and uncertainty. */
export interface TransportSource {
  readonly title: string;
  readonly authors?: string;
  readonly year?: number;
  readonly table?: string;
  readonly basis: 'published' | 'computed' | 'from memory' | 'common practice' | 'measured' | 'user';
  /** Starts with its kind: `fit deviation:`, `source:` or `estimate:`; `'not stated'` when the definition gives none. */
  readonly uncertainty: string;
}

/** The compiled transport properties of a substance. */
export interface CompiledTransport {
  readonly viscosity: PropertyCurve;
  readonly thermalConductivity: PropertyCurve;
  /** Source, basis and uncertainty of each property that has data. */
  readonly sources: { readonly viscosity?: TransportSource; readonly thermalConductivity?: TransportSource };
}

/** IF97 region 1 on the saturation line: where the `formulation` curves of liquid water are defined, K. */
const IAPWS_LIQUID = { min: 273.15, max: 623.15 } as const;

type Reader = (value: string | Quantity, dimension: Dimension, path: (string | number)[]) => number | undefined;
type UnitReader = (unit: string, dimension: Dimension, path: (string | number)[]) => ResolvedUnit | undefined;

type AnyField = TransportField<{ readonly T: readonly number[]; readonly mu?: readonly number[]; readonly lambda?: readonly number[] }, string>;

function sourceOf(field: AnyField): TransportSource | undefined {
  return 'omitted' in field ? undefined : provenanceOf(field);
}

/** Source, basis and uncertainty of a definition or one of its fields, with the defaults of a user definition. */
export function provenanceOf(fields: { readonly source?: DefinitionSource; readonly basis?: TransportSource['basis']; readonly uncertainty?: string }): TransportSource {
  const s = fields.source;
  return {
    title: s?.title ?? 'user definition',
    ...(s?.authors !== undefined ? { authors: s.authors } : {}),
    ...(s?.year !== undefined ? { year: s.year } : {}),
    ...(s?.table !== undefined ? { table: s.table } : {}),
    basis: fields.basis ?? 'user',
    uncertainty: fields.uncertainty ?? 'not stated',
  };
}

function compileOne(
  def: IncompressibleDefinition,
  key: 'viscosity' | 'thermalConductivity',
  Tmin: number | undefined,
  Tmax: number | undefined,
  read: Reader,
  unitOf: UnitReader,
  issues: DefinitionIssue[],
): PropertyCurve {
  const field = def[key] as AnyField | undefined;
  const what = key === 'viscosity' ? 'viscosity' : 'thermal conductivity';
  if (field === undefined) return missingCurve(`the definition of ${def.name} gives no ${what}`);
  if ('omitted' in field) return missingCurve(field.omitted);
  if (key === 'viscosity' && def.state === 'solid') {
    issues.push({ path: [key], message: 'a solid has no viscosity; give viscosity for liquids only' });
    return missingCurve('a solid has no viscosity');
  }
  const dimension: Dimension = key === 'viscosity' ? 'dynamicViscosity' : 'thermalConductivity';
  const column = key === 'viscosity' ? 'mu' : 'lambda';
  const empty = new Float64Array(0);
  if ('formulation' in field) {
    const lo = Math.max(Tmin ?? NaN, IAPWS_LIQUID.min);
    const hi = Math.min(Tmax ?? NaN, IAPWS_LIQUID.max);
    if (def.state !== 'liquid' || !(lo < hi)) {
      issues.push({ path: [key, 'formulation'], message: `${field.formulation} is offered for liquid water only, within ${IAPWS_LIQUID.min}–${IAPWS_LIQUID.max} K (IF97 region 1 on the saturation line)` });
    }
    return { form: 'iapws', Tmin: lo, Tmax: hi, value: NaN, nodesT: empty, nodes: empty, logarithmic: false, reason: '' };
  }
  if ('value' in field) {
    const value = read(field.value, dimension, [key, 'value']);
    if (value !== undefined && !(value > 0)) issues.push({ path: [key, 'value'], message: `${what} must be positive; got ${value}` });
    const lo = field.T === undefined ? Tmin : read(field.T.min, 'temperature', [key, 'T', 'min']);
    const hi = field.T === undefined ? Tmax : read(field.T.max, 'temperature', [key, 'T', 'max']);
    if (lo !== undefined && hi !== undefined && !(lo < hi)) issues.push({ path: [key, 'T'], message: `T.min must be below T.max; got ${lo} K and ${hi} K` });
    return { form: 'constant', Tmin: lo ?? NaN, Tmax: hi ?? NaN, value: value ?? NaN, nodesT: empty, nodes: empty, logarithmic: false, reason: '' };
  }
  const { T } = field.table;
  const values = field.table[column];
  if (values === undefined) {
    issues.push({ path: [key, 'table', column], message: `the table needs a ${column} column beside T` });
    return missingCurve(`the ${what} table of ${def.name} is malformed`);
  }
  if (T.length !== values.length) issues.push({ path: [key, 'table'], message: `T has ${T.length} values but ${column} has ${values.length}` });
  const vu = unitOf(field.unit, dimension, [key, 'unit']);
  const tu = unitOf(field.temperatureUnit, 'temperature', [key, 'temperatureUnit']);
  if (!vu || !tu) return missingCurve(`the ${what} table of ${def.name} has a bad unit`);
  const nodesT = Float64Array.from(T, (t) => toSI(t, tu, DEFAULT_AMBIENT_PA));
  const nodes = Float64Array.from(values, (x) => x * vu.factor);
  for (let i = 1; i < nodesT.length; i++) {
    if (!(nodesT[i]! > nodesT[i - 1]!)) issues.push({ path: [key, 'table', 'T', i], message: `temperatures must increase strictly; row ${i} (${T[i]}) does not exceed row ${i - 1} (${T[i - 1]})` });
  }
  nodes.forEach((x, i) => {
    if (!(x > 0)) issues.push({ path: [key, 'table', column, i], message: `${what} must be positive; got ${values[i]}` });
  });
  return { form: 'table', Tmin: nodesT[0]!, Tmax: nodesT[nodesT.length - 1]!, value: NaN, nodesT, nodes, logarithmic: key === 'viscosity', reason: '' };
}

/** Compiles both transport properties of a definition, adding any problem to `issues`. */
export function compileTransport(def: IncompressibleDefinition, Tmin: number | undefined, Tmax: number | undefined, read: Reader, unitOf: UnitReader, issues: DefinitionIssue[]): CompiledTransport {
  const viscosity = compileOne(def, 'viscosity', Tmin, Tmax, read, unitOf, issues);
  const thermalConductivity = compileOne(def, 'thermalConductivity', Tmin, Tmax, read, unitOf, issues);
  const mu = def.viscosity === undefined ? undefined : sourceOf(def.viscosity as AnyField);
  const lambda = def.thermalConductivity === undefined ? undefined : sourceOf(def.thermalConductivity as AnyField);
  return { viscosity, thermalConductivity, sources: { ...(mu ? { viscosity: mu } : {}), ...(lambda ? { thermalConductivity: lambda } : {}) } };
}
