/**
 * The unit spellings the compiler knows, per dimension. Any of these may be written
 * where a quantity is expected (`"300 K"`, `"2.5 kJ/(kg·K)"`), and the compiler checks
 * that the dimension fits. Other spellings of the same units parse at run time too
 * (`quantity(2.5, 'kJ kg^-1 K^-1')`); they just are not checked at compile time.
 *
 * The factor of every compound spelling here is computed exactly at build time
 * (scripts/generate-factors.ts) and stored as the correctly rounded double.
 *
 * @module
 */
import type { Dimension } from './dimensions.js';

const SPECIFIC_HEAT = [
  'J/(kg·K)', 'kJ/(kg·K)', 'J/kg/K', 'kJ/kg/K', 'kJ/(kg·°C)', 'J/(g·K)',
  'Btu/(lbm·°R)', 'Btu/(lbm·°F)', 'Btu/lbm/°R', 'Btu/lbm/°F', 'Btu/(lbm·degR)', 'Btu/(lbm·degF)',
  'kcal/(kg·K)', 'kcal/(kg·°C)', 'ft·lbf/(lbm·°R)',
] as const;

const SQUARE_METRE_PER_SECOND = ['m²/s', 'm^2/s', 'mm²/s', 'cm²/s', 'ft²/h', 'ft²/s'] as const;

/**
 * Unit spellings per dimension, as written in code and data sheets. A spelling may be listed
 * under two dimensions of the same shape (J/(kg·K) under specificHeat and specificEntropy);
 * without an expected dimension it reads as the first listed.
 */
export const UNIT_SPELLINGS = {
  dimensionless: ['1'],
  temperature: ['K', '°C', '°F', '°R', 'degC', 'degF', 'degR'],
  temperatureDifference: ['ΔK', 'Δ°C', 'Δ°F', 'Δ°R', 'delta K', 'delta degC', 'delta degF', 'delta degR'],
  pressure: [
    'Pa', 'kPa', 'MPa', 'GPa', 'hPa', 'bar', 'bara', 'mbar', 'atm', 'psi', 'psia', 'lbf/in²', 'lbf/in^2', 'lbf/ft²',
    'psig', 'psi(g)', 'barg', 'bar(g)', 'kPag', 'kPa(g)', 'MPag', 'MPa(g)', 'kgf/cm²g', 'kgf/cm2g',
    'kgf/cm²', 'kgf/cm2', 'mmHg', 'inHg', 'torr', 'inH2O', 'inWC', 'ftH2O', 'mmH2O', 'cmH2O',
  ],
  specificEnergy: ['J/kg', 'kJ/kg', 'MJ/kg', 'Btu/lbm', 'Btu/lb', 'kcal/kg', 'kWh/kg', 'ft·lbf/lbm'],
  specificHeat: SPECIFIC_HEAT,
  specificEntropy: SPECIFIC_HEAT,
  specificVolume: ['m³/kg', 'm^3/kg', 'm3/kg', 'L/kg', 'cm³/g', 'ft³/lbm', 'ft^3/lbm', 'ft3/lbm'],
  density: ['kg/m³', 'kg/m^3', 'kg/m3', 'g/cm³', 'g/cm^3', 'kg/L', 'g/L', 'lbm/ft³', 'lbm/ft^3', 'lbm/ft3', 'lbm/gal'],
  molarMass: ['g/mol', 'kg/kmol', 'kg/mol', 'lbm/lbmol'],
  molarEnergy: ['J/mol', 'kJ/mol', 'kJ/kmol', 'MJ/kmol', 'Btu/lbmol'],
  molarHeatCapacity: ['J/(mol·K)', 'kJ/(kmol·K)', 'J/mol/K', 'kJ/kmol/K', 'Btu/(lbmol·°R)', 'Btu/(lbmol·°F)', 'Btu/lbmol/°R'],
  mass: ['kg', 'g', 'mg', 't', 'tonne', 'lbm', 'lb', 'gr', 'ton_short'],
  amount: ['mol', 'kmol', 'lbmol'],
  energy: ['J', 'kJ', 'MJ', 'GJ', 'Wh', 'kWh', 'MWh', 'cal', 'kcal', 'Btu', 'MMBtu', 'therm', 'therm_US', 'quad', 'ft·lbf'],
  entropy: ['J/K', 'kJ/K', 'Btu/°R'],
  power: [
    'W', 'kW', 'MW', 'GW', 'Btu/h', 'Btu/hr', 'Btuh', 'MBH', 'MMBtu/h', 'MMBtu/hr', 'hp', 'hp_boiler', 'hp_electric', 'hp_metric',
    'TR', 'ton_refrigeration', 'kcal/h', 'ft·lbf/s',
  ],
  massFlow: ['kg/s', 'kg/h', 'kg/min', 't/h', 'lbm/s', 'lbm/h', 'lbm/min'],
  volume: ['m³', 'm^3', 'm3', 'L', 'mL', 'cm³', 'gal', 'ft³', 'ft^3', 'ft3', 'in³'],
  volumeFlow: ['m³/s', 'm³/h', 'm^3/s', 'm^3/h', 'L/s', 'L/min', 'gal/min', 'gpm', 'GPM', 'ft³/s', 'ft³/min', 'cfm', 'CFM'],
  length: ['m', 'km', 'cm', 'mm', 'µm', 'in', 'ft', 'yd', 'mi'],
  area: ['m²', 'm^2', 'cm²', 'mm²', 'in²', 'ft²'],
  time: ['s', 'ms', 'min', 'h'],
  velocity: ['m/s', 'km/h', 'ft/s', 'ft/min', 'mph'],
  force: ['N', 'kN', 'lbf'],
  dynamicViscosity: ['Pa·s', 'mPa·s', 'µPa·s', 'cP', 'P', 'lbm/(ft·s)', 'lbm/(ft·h)', 'lbf·s/ft²'],
  kinematicViscosity: [...SQUARE_METRE_PER_SECOND, 'cSt', 'St'],
  thermalDiffusivity: SQUARE_METRE_PER_SECOND,
  thermalConductivity: ['W/(m·K)', 'W/m/K', 'W/(m·°C)', 'mW/(m·K)', 'Btu/(h·ft·°F)', 'Btu/(h·ft·°R)', 'Btu·in/(h·ft²·°F)'],
  surfaceTension: ['N/m', 'mN/m', 'dyn/cm', 'lbf/ft'],
  humidityRatio: ['kg/kg', 'g/kg', 'gr/lbm', 'gr/lb', 'lbm/lbm', 'lb/lb'],
} as const satisfies Record<Dimension, readonly string[]>;

/** The unit spellings the compiler knows for dimension `D`. */
export type UnitOf<D extends Dimension> = (typeof UNIT_SPELLINGS)[D][number];

/** Every unit spelling the compiler knows. */
export type KnownUnit = UnitOf<Dimension>;

type ListingDimensions<U extends string> = {
  [D in Dimension]: U extends UnitOf<D> ? D : never;
}[Dimension];

/** Dimensions listed after another of the same shape that shares their spellings. */
type SecondListed = 'specificEntropy' | 'thermalDiffusivity';

/**
 * The dimension a known unit spelling belongs to (temperature scales read as absolute
 * temperatures; a spelling shared by two dimensions of one shape reads as the first listed:
 * `J/(kg·K)` is a specific heat, `m²/s` a kinematic viscosity).
 */
export type DimensionOfUnit<U extends string> = [Exclude<ListingDimensions<U>, SecondListed>] extends [never]
  ? ListingDimensions<U>
  : Exclude<ListingDimensions<U>, SecondListed>;

/** Units a value of dimension `D` may be converted to: temperature differences also accept bare scales (`'°F'`). */
export type TargetUnitOf<D extends Dimension> = D extends 'temperatureDifference' ? UnitOf<'temperatureDifference'> | UnitOf<'temperature'> : UnitOf<D>;
