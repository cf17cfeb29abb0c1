/**
 * Physical constants, each with its defining relation and source.
 *
 * @module
 */

/**
 * Avogadro constant N_A = 6.022 140 76 × 10²³ mol⁻¹, exact by definition in the 2019 SI
 * (26th CGPM; CODATA 2018).
 */
export const AVOGADRO_PER_MOL = 6.02214076e23;

/**
 * Boltzmann constant k = 1.380 649 × 10⁻²³ J/K, exact by definition in the 2019 SI (CODATA 2018).
 */
export const BOLTZMANN_J_PER_K = 1.380649e-23;

/**
 * Molar gas constant R̄ = N_A·k = 8.314 462 618 153 24 J/(mol·K), exact in the 2019 SI
 * (the product of two exact constants; CODATA 2018 lists it as exact). Stored as the nearest double;
 * tests/reference/codata.test.ts checks it equals the rounded product.
 */
export const MOLAR_GAS_CONSTANT = 8.31446261815324;

/** Standard atmosphere, 101 325 Pa (exact; 10th CGPM 1954, NIST SP 811 B.8). */
export const STANDARD_ATMOSPHERE_PA = 101325;

/** Standard acceleration of gravity g_n = 9.806 65 m/s² (exact; 3rd CGPM 1901, NIST SP 811 B.8). */
export const STANDARD_GRAVITY = 9.80665;

/** Standard-state pressure p° = 100 kPa (1 bar), used by the JANAF and NASA Glenn tables (IUPAC 1982). */
export const STANDARD_STATE_PRESSURE_PA = 100000;

/** Thermochemical reference temperature T_ref = 298.15 K (JANAF, NASA Glenn). */
export const REFERENCE_TEMPERATURE_K = 298.15;
