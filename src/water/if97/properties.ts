/**
 * The output object every IF97 kernel fills: reuse one instance in hot loops (no allocation).
 * All values SI: K, Pa, kg/m³, m³/kg, J/kg, J/(kg·K), m/s.
 *
 * @module
 */
/**
 * Properties of one water state in SI units, filled by the IF97 kernels (`region1`, `region2`, …) and
 * the saturation functions. Create one and reuse it: the kernels write into it without allocating.
 */
export class WaterProperties {
  /** Temperature, K. */
  T = 0;
  /** Pressure, Pa. */
  p = 0;
  /** Density, kg/m³. */
  rho = 0;
  /** Specific volume, m³/kg. */
  v = 0;
  /** Specific internal energy, J/kg. */
  u = 0;
  /** Specific enthalpy, J/kg. */
  h = 0;
  /** Specific entropy, J/(kg·K). */
  s = 0;
  /** Specific isobaric heat capacity, J/(kg·K). */
  cp = 0;
  /** Specific isochoric heat capacity, J/(kg·K). */
  cv = 0;
  /** Speed of sound, m/s. */
  w = 0;
}
