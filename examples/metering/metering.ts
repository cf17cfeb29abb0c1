/**
 * Heat metering from sensor readings (a scenario of our own with invented data): a CSV of steam
 * header pressure (gauge), temperature and mass flow becomes a heat flow against condensate returned
 * at 60 °C, with the batch API doing the water properties for all readings at once.
 *
 * Run: npx tsx examples/metering/metering.ts [readings.csv]
 */
import { readFileSync } from 'node:fs';
import { quantity, Status, tableFromCSV, TableValue } from 'heatstate';
import { water, waterBatch } from 'heatstate/water';

const file = process.argv[2] ?? new URL('./readings.csv', import.meta.url);
const log = tableFromCSV(readFileSync(file, 'utf8'), { name: 'steam header log' });
const rows = log.rowCount;

// the table holds every column in SI; read the rows at their own timestamps
const t = Float64Array.from(log.data.columns.t!.values as number[]);
const out = new TableValue();
const at = (column: 'p' | 'T' | 'm') => Float64Array.from(t, (ti) => (log.valueAt(column, ti, out) === Status.ok ? out.value : NaN));
const p = at('p');
const T = at('T');
const m = at('m');

const { h, status } = waterBatch({ p, T }, ['h']);
const hReturn = water.state({ p: '8 barg', T: '60 °C' }).h.si;

let energy = 0;
console.log(' time    p [kPa]   T [°C]   m [kg/s]   h [kJ/kg]   Q [kW]');
for (let i = 0; i < rows; i++) {
  if (status[i] !== 0) {
    console.log(`${String(t[i]).padStart(5)}   reading skipped: status ${status[i]}`);
    continue;
  }
  const q = m[i]! * (h[i]! - hReturn);
  if (i > 0) energy += q * (t[i]! - t[i - 1]!);
  console.log(
    `${String(t[i]).padStart(5)}   ${(p[i]! / 1e3).toFixed(1).padStart(7)}   ${(T[i]! - 273.15).toFixed(1).padStart(6)}   ${m[i]!.toFixed(2).padStart(8)}   ${(h[i]! / 1e3).toFixed(1).padStart(9)}   ${(q / 1e3).toFixed(0).padStart(6)}`,
  );
}
const total = quantity(energy, 'J');
console.log(`\nheat delivered over ${((t[rows - 1]! - t[0]!) / 3600).toFixed(2)} h: ${total.in('MWh').toFixed(3)} MWh (${(total.in('Btu') / 1e6).toFixed(2)} MMBtu)`);
console.log('Results are engineering estimates; meter readings for billing need a certified meter.');
