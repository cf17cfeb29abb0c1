/**
 * A small process calculation in both unit systems (a scenario of our own; the plant figures are
 * invented): the back-pressure turbine of the Cedar Ridge paper mill takes 5 t/h of steam at 30 barg
 * and 400 °C, exhausts at 4 barg to the drying cylinders, with an isentropic efficiency of 0.76.
 *
 * Run: npx tsx examples/node-script.ts
 */
import { quantity, water } from 'heatstate';

const flow = quantity(5, 't/h');
const inlet = water.state({ p: quantity(30, 'barg'), T: '400 °C' });
const exhaustPressure = quantity(4, 'barg');
const efficiency = 0.76;

// ideal expansion at constant entropy, then the real exhaust from the enthalpy balance
const ideal = water.state({ p: exhaustPressure, s: inlet.s });
const hOut = inlet.h.si - efficiency * (inlet.h.si - ideal.h.si);
const exhaust = water.state({ p: exhaustPressure, h: quantity(hOut, 'J/kg') });
const power = quantity((inlet.h.si - hOut) * flow.si, 'W');

const row = (label: string, si: string, us: string) => console.log(`${label.padEnd(30)}${si.padStart(22)}${us.padStart(24)}`);
const f = (x: number, d = 4) => String(Number(x.toPrecision(d)));

console.log('Cedar Ridge mill: back-pressure turbine\n');
row('', 'SI', 'US customary');
row('inlet pressure (absolute)', `${f(inlet.p.in('kPa'))} kPa`, `${f(inlet.p.in('psia'))} psia`);
row('inlet enthalpy', `${f(inlet.h.in('kJ/kg'))} kJ/kg`, `${f(inlet.h.in('Btu/lbm'))} Btu/lbm`);
row('inlet entropy', `${f(inlet.s.in('kJ/(kg·K)'))} kJ/(kg·K)`, `${f(inlet.s.in('Btu/(lbm·°R)'))} Btu/(lbm·°R)`);
row('isentropic exhaust T', `${f(ideal.T.in('°C'))} °C`, `${f(ideal.T.in('°F'))} °F`);
row('actual exhaust T', `${f(exhaust.T.in('°C'))} °C`, `${f(exhaust.T.in('°F'))} °F`);
row('exhaust phase', exhaust.phase, exhaust.phase);
row('shaft power', `${f(power.in('kW'))} kW`, `${f(power.in('hp'))} hp`);
row('steam to the dryers', `${f(flow.in('kg/s'))} kg/s`, `${f(flow.in('lbm/h'))} lbm/h`);
console.log('\nResults are engineering estimates; defer to local codes and licensed professionals.');
