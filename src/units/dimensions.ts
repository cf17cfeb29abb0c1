/**
 * The dimensions heatstate knows, each as exponents of the SI base quantities
 * [mass, length, time, temperature, amount of substance].
 *
 * Temperature and temperature difference share exponents but are different
 * dimensions: an absolute temperature (50 °F = 283.15 K) converts with an offset,
 * a difference (a rise of 50 °F = 27.78 K) with the scale factor only.
 *
 * Some other dimensions share exponents too, and are kept apart for the same reason: the
 * compiler can tell a specific heat (cp) from a specific entropy (s), a kinematic viscosity (nu)
 * from a thermal diffusivity (alpha), a humidity ratio (kg water per kg dry air) from a plain
 * number. Their units are shared (J/(kg·K), m²/s): unit text resolves to the dimension a caller
 * expects, and to the first-listed dimension of that shape when nothing is expected.
 *
 * @module
 */

/** Exponents of [mass, length, time, temperature, amount]. */
export type DimensionVector = readonly [number, number, number, number, number];

/** Every dimension with its base-quantity exponents. */
export const DIMENSIONS = {
  dimensionless: [0, 0, 0, 0, 0],
  temperature: [0, 0, 0, 1, 0],
  temperatureDifference: [0, 0, 0, 1, 0],
  pressure: [1, -1, -2, 0, 0],
  specificEnergy: [0, 2, -2, 0, 0],
  specificHeat: [0, 2, -2, -1, 0],
  specificEntropy: [0, 2, -2, -1, 0],
  specificVolume: [-1, 3, 0, 0, 0],
  density: [1, -3, 0, 0, 0],
  molarMass: [1, 0, 0, 0, -1],
  molarEnergy: [1, 2, -2, 0, -1],
  molarHeatCapacity: [1, 2, -2, -1, -1],
  mass: [1, 0, 0, 0, 0],
  amount: [0, 0, 0, 0, 1],
  energy: [1, 2, -2, 0, 0],
  entropy: [1, 2, -2, -1, 0],
  power: [1, 2, -3, 0, 0],
  massFlow: [1, 0, -1, 0, 0],
  volume: [0, 3, 0, 0, 0],
  volumeFlow: [0, 3, -1, 0, 0],
  length: [0, 1, 0, 0, 0],
  area: [0, 2, 0, 0, 0],
  time: [0, 0, 1, 0, 0],
  velocity: [0, 1, -1, 0, 0],
  force: [1, 1, -2, 0, 0],
  dynamicViscosity: [1, -1, -1, 0, 0],
  kinematicViscosity: [0, 2, -1, 0, 0],
  thermalDiffusivity: [0, 2, -1, 0, 0],
  thermalConductivity: [1, 1, -3, -1, 0],
  surfaceTension: [1, 0, -2, 0, 0],
  humidityRatio: [0, 0, 0, 0, 0],
} as const satisfies Record<string, DimensionVector>;

/** The name of a dimension, for example `'pressure'` or `'specificHeat'`. */
export type Dimension = keyof typeof DIMENSIONS;

/** The SI unit each dimension's values are stored in. */
export const SI_UNIT: Readonly<Record<Dimension, string>> = {
  dimensionless: '1',
  temperature: 'K',
  temperatureDifference: 'ΔK',
  pressure: 'Pa',
  specificEnergy: 'J/kg',
  specificHeat: 'J/(kg·K)',
  specificEntropy: 'J/(kg·K)',
  specificVolume: 'm³/kg',
  density: 'kg/m³',
  molarMass: 'kg/mol',
  molarEnergy: 'J/mol',
  molarHeatCapacity: 'J/(mol·K)',
  mass: 'kg',
  amount: 'mol',
  energy: 'J',
  entropy: 'J/K',
  power: 'W',
  massFlow: 'kg/s',
  volume: 'm³',
  volumeFlow: 'm³/s',
  length: 'm',
  area: 'm²',
  time: 's',
  velocity: 'm/s',
  force: 'N',
  dynamicViscosity: 'Pa·s',
  kinematicViscosity: 'm²/s',
  thermalDiffusivity: 'm²/s',
  thermalConductivity: 'W/(m·K)',
  surfaceTension: 'N/m',
  humidityRatio: 'kg/kg',
};

let byVector: Map<string, Dimension> | undefined;

/**
 * The named dimension with these exponents, or `undefined`. Where several share the exponents,
 * the first listed in {@link DIMENSIONS} (a bare temperature vector is `temperature`).
 */
export function dimensionOfVector(vector: DimensionVector): Dimension | undefined {
  if (byVector === undefined) {
    // built on first use, not at import
    byVector = new Map();
    for (const [name, v] of Object.entries(DIMENSIONS) as [Dimension, DimensionVector][]) {
      // the first-listed dimension of each shape wins (temperature before temperatureDifference,
      // specificHeat before specificEntropy, dimensionless before humidityRatio, ...)
      const key = v.join(',');
      if (!byVector.has(key)) byVector.set(key, name);
    }
  }
  return byVector.get(vector.join(','));
}

/** True when two dimensions have the same base-quantity exponents (specificHeat and specificEntropy). */
export function sameShape(a: Dimension, b: Dimension): boolean {
  const va = DIMENSIONS[a];
  const vb = DIMENSIONS[b];
  for (let i = 0; i < 5; i++) if (va[i] !== vb[i]) return false;
  return true;
}

/** True for a name in {@link DIMENSIONS}. */
export function isDimension(name: unknown): name is Dimension {
  return typeof name === 'string' && DIMENSION_NAMES.has(name);
}

/** The names of {@link DIMENSIONS}, for a fast membership test (every quantity built checks one). */
const DIMENSION_NAMES: ReadonlySet<string> = new Set(Object.keys(DIMENSIONS));
