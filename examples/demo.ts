/**
 * heatstate demo: the hot-water loop of a small dairy (a scenario of our own; the plant
 * figures are invented, the properties are heatstate's).
 *
 * Run: npm start
 */
import { gasConstant, incompressible, molarMass, quantity, temperatureDifference, water as if97, type Quantity } from 'heatstate';

const line = (label: string, si: string, us: string) => console.log(`  ${label.padEnd(52)} ${si.padStart(22)}   ${us.padStart(22)}`);
const fmt = (q: Quantity, unit: string, digits = 4) => `${Number(q.in(unit).toPrecision(digits))} ${unit}`;

console.log('heatstate demo: Alder Creek Dairy, pasteuriser hot-water loop\n');
console.log(`  ${'step'.padEnd(52)} ${'SI'.padStart(22)}   ${'US customary'.padStart(22)}`);

// 1. Heating the loop water from 55 °C to 85 °C (incompressible liquid, tabulated c(T))
const water = incompressible('water');
const flow = quantity(3.2, 'kg/s');
const T1 = quantity(55, '°C');
const T2 = quantity(85, '°C');
const du = water.deltaU(T1, T2);
const heatRate = quantity(du.si * flow.si, 'W');
console.log('\n1. Heat the loop water 55 °C -> 85 °C at 3.2 kg/s');
line('mean specific heat c_avg', fmt(water.averageC(T1, T2), 'kJ/(kg·K)'), fmt(water.averageC(T1, T2), 'Btu/(lbm·°F)'));
line('temperature rise (a difference, not a temperature)', fmt(T2.minus(T1), 'ΔK', 3), fmt(T2.minus(T1), 'Δ°F', 3));
line('Δu = ∫c dT', fmt(du, 'kJ/kg'), fmt(du, 'Btu/lbm'));
line('heat duty', fmt(heatRate, 'kW'), fmt(heatRate, 'Btu/h'));

// 2. The circulation pump: liquid at constant temperature, Δh = v·Δp with v at the pump's temperature
//    (85 °C water is 2.8 % less dense than at 25 °C), checked against IAPWS-IF97's isentropic pump
const suction = { T: T2, p: quantity(2.5, 'barg') };
const discharge = { T: T2, p: quantity(95, 'psig') };
const dh = water.deltaH(suction, discharge);
const inlet = if97.state(suction);
const dhIF97 = if97.state({ p: discharge.p, s: inlet.s }).h.minus(inlet.h);
console.log('\n2. Circulation pump, 2.5 barg -> 95 psig at 85 °C (ideal, no temperature rise)');
line('suction / discharge pressure (absolute)', `${fmt(suction.p, 'kPa')} / ${fmt(discharge.p, 'kPa')}`, `${fmt(suction.p, 'psia')} / ${fmt(discharge.p, 'psia')}`);
line('density at 85 °C', fmt(water.density(T2), 'kg/m³'), fmt(water.density(T2), 'lbm/ft³'));
line('Δh = v·Δp', fmt(dh, 'kJ/kg'), fmt(dh, 'Btu/lbm'));
line('IAPWS-IF97, isentropic: Δh', fmt(dhIF97, 'kJ/kg'), fmt(dhIF97, 'Btu/lbm'));
line('ideal pump power', fmt(quantity(dh.si * flow.si, 'W'), 'kW'), fmt(quantity(dh.si * flow.si, 'W'), 'hp'));

// 3. Warming the stainless-steel plate pack at start-up (solid: Δh ≈ Δu)
const steel = incompressible('stainless steel');
const plateMass = quantity(420, 'kg');
const warm = steel.deltaU('15 °C', '85 °C');
console.log('\n3. Start-up: warm 420 kg of AISI 304 plates 15 °C -> 85 °C');
line('Δu = ∫c dT (c from the table)', fmt(warm, 'kJ/kg'), fmt(warm, 'Btu/lbm'));
line('energy to warm the plates', fmt(quantity(warm.si * plateMass.si, 'J'), 'MJ'), fmt(quantity(warm.si * plateMass.si, 'J'), 'Btu'));

// 4. A few facts the burner calculation needs
console.log('\n4. Burner side');
line('molar mass of methane', fmt(molarMass('CH4'), 'g/mol', 5), fmt(molarMass('CH4'), 'lbm/lbmol', 5));
line('gas constant of methane R = R̄/M', fmt(gasConstant('CH4'), 'kJ/(kg·K)'), fmt(gasConstant('CH4'), 'Btu/(lbm·°R)'));
line('flue-gas cooling of 150 °F is', fmt(temperatureDifference(150, '°F'), 'ΔK', 4), fmt(temperatureDifference(150, '°F'), 'Δ°F', 4));

// 5. What bad input looks like
console.log('\n5. Bad input throws a typed error instead of returning NaN:');
try {
  steel.c('1200 K');
} catch (e) {
  console.log(`  ${(e as Error).name} [${(e as { code: string }).code}]: ${(e as Error).message}`);
}
console.log('\nResults are engineering estimates. Defer to local codes and licensed professionals for design of pressure equipment.');
