/**
 * An air-handling unit for the (invented) Larchmont library reading room on a summer design day:
 * 1.2 kg/s of outdoor air at 33 °C and 40 % is mixed with 3.6 kg/s of return air at 24 °C and 50 %,
 * cooled and dehumidified on a chilled-water coil (apparatus dew point 9 °C, bypass factor 0.12),
 * then reheated to 15 °C supply. The loads are printed in SI and US units.
 *
 * Results are engineering estimates; defer to local codes and licensed professionals for design.
 *
 * Run: npx tsx examples/air-handler.ts
 */
import { humidAir, type HumidAirResult, type ProcessResult } from 'heatstate/humid-air';

const outdoor = humidAir.state({ T: '33 °C', RH: 0.4 });
const returnAir = humidAir.state({ T: '24 °C', RH: '50 %' });

const mixed = humidAir.mix([
  { state: outdoor, flow: '1.2 kg/s' },
  { state: returnAir, flow: '3.6 kg/s' },
]);
const coil = humidAir.coolingCoil({ inlet: mixed.leaving, flow: mixed.flow, ADP: '9 °C', bypassFactor: 0.12 });
const reheat = humidAir.heat({ inlet: coil.leaving, flow: mixed.flow, T2: '15 °C' });

function row(name: string, s: HumidAirResult): string {
  return `${name.padEnd(14)}${s.T.in('°C').toFixed(1).padStart(7)} °C${(s.RH * 100).toFixed(0).padStart(5)} %${s.W.in('g/kg').toFixed(2).padStart(8)} g/kg${s.W.in('gr/lbm').toFixed(1).padStart(8)} gr/lb${s.h.in('kJ/kg').toFixed(1).padStart(8)} kJ/kg${s.Tdp!.in('°C').toFixed(1).padStart(7)} °C dp`;
}
function load(name: string, r: ProcessResult): string {
  return `${name.padEnd(14)}${r.heat.in('kW').toFixed(1).padStart(8)} kW${r.heat.in('Btu/h').toFixed(0).padStart(10)} Btu/h${r.heat.in('TR').toFixed(2).padStart(8)} TR   sensible ${r.sensible.in('kW').toFixed(1)} kW, latent ${r.latent.in('kW').toFixed(1)} kW, SHR ${r.sensibleHeatRatio?.toFixed(2)}`;
}

console.log(`pressure: ${outdoor.p.in('kPa')} kPa (${outdoor.pressureFrom}); model: ASHRAE ideal mixture (IAPWS-IF97 and R14-08 saturation)`);
console.log(row('outdoor', outdoor));
console.log(row('return', returnAir));
console.log(row('mixed', mixed.leaving));
console.log(row('off coil', coil.leaving));
console.log(row('supply', reheat.leaving));
console.log(load('cooling coil', coil));
console.log(load('reheat', reheat));
console.log(`condensate    ${(-coil.water!.flow.in('kg/h')).toFixed(1)} kg/h at ${coil.water!.T.in('°C').toFixed(1)} °C`);
console.log('Results are engineering estimates; defer to local codes and licensed professionals for design.');
