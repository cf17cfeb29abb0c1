/**
 * Benchmark cases for the transport SI cores: water viscosity and thermal conductivity at (T, ρ) with
 * and without the critical enhancement (derivative inputs precomputed, as a caller holding a state has
 * them), the IF97 helper that computes those inputs, dilute-gas μ(T), λ(T) (core and facade), and a
 * gas state with and without its transport properties. Each case loops over a spread of states and
 * reports per call.
 */
import { type BenchCase, consume } from '../kit.js';
import { idealGas } from '../../src/ideal-gas/gas.js';
import { gasTransport, gasTransportModel, GasTransportResult } from '../../src/ideal-gas/transport.js';
import { Quantity } from '../../src/units/quantity.js';
import { ConductivityResult, CriticalEnhancementInputs, if97EnhancementInputs, If97InputsWork, thermalConductivity, viscosity, ViscosityResult } from '../../src/water/transport/index.js';

const N = 1000;
// water: liquid, vapour and supercritical states across the range (no enhancement)
const wT = new Float64Array(N);
const wRho = new Float64Array(N);
for (let i = 0; i < N; i++) {
  const k = i % 4;
  wT[i] = k === 0 ? 280 + ((i * 31) % 90) : k === 1 ? 400 + ((i * 17) % 600) : k === 2 ? 650 + ((i * 13) % 400) : 300 + ((i * 7) % 300);
  wRho[i] = k === 0 ? 990 : k === 1 ? 0.5 + ((i * 7) % 20) : k === 2 ? 50 + ((i * 11) % 400) : 900 + ((i * 3) % 100);
}
// near-critical states with their IF97 derivative inputs, computed once
const CN = 200;
const cT = new Float64Array(CN);
const cRho = new Float64Array(CN);
const inputs: CriticalEnhancementInputs[] = [];
{
  const work = new If97InputsWork();
  for (let i = 0; i < CN; i++) {
    cT[i] = 648 + ((i * 7) % 40);
    cRho[i] = 150 + ((i * 13) % 300);
    const d = new CriticalEnhancementInputs();
    if (if97EnhancementInputs(cT[i]!, cRho[i]!, d, work) !== 0) throw new Error(`bench setup: no IF97 inputs at ${cT[i]} K, ${cRho[i]} kg/m³`);
    inputs.push(d);
  }
}
const none = new CriticalEnhancementInputs();
const mu = new ViscosityResult();
const lambda = new ConductivityResult();
const helperInputs = new CriticalEnhancementInputs();
const helperWork = new If97InputsWork();

const gT = Float64Array.from({ length: N }, (_, i) => 250 + ((i * 37) % 1500));
const n2 = gasTransportModel('N2')!;
const air = gasTransportModel('air')!;
const h2 = gasTransportModel('H2')!;
const gasOut = new GasTransportResult();
// the facade: quantities made once (as a caller holding them has them), the gas object built once
const FN = 200;
const gQ = Array.from({ length: FN }, (_, i) => Quantity.fromSI(gT[i]!, 'temperature'));
const n2Gas = idealGas('N2');
const airGas = idealGas('air');
const pQ = Quantity.fromSI(101325, 'pressure');

export const cases: BenchCase[] = [
  {
    name: 'transport: water viscosity (T, ρ), no enhancement',
    fn: () => {
      for (let i = 0; i < N; i++) {
        viscosity(wT[i]!, wRho[i]!, false, none, mu);
        consume(mu.mu);
      }
    },
    perCall: N,
    targetNs: 150,
  },
  {
    name: 'transport: water conductivity (T, ρ), no enhancement',
    fn: () => {
      for (let i = 0; i < N; i++) {
        thermalConductivity(wT[i]!, wRho[i]!, false, none, lambda);
        consume(lambda.lambda);
      }
    },
    perCall: N,
    targetNs: 150,
  },
  {
    name: 'transport: water viscosity (T, ρ), with enhancement (inputs given)',
    fn: () => {
      for (let i = 0; i < CN; i++) {
        viscosity(cT[i]!, cRho[i]!, true, inputs[i]!, mu);
        consume(mu.mu);
      }
    },
    perCall: CN,
    targetNs: 1000,
  },
  {
    name: 'transport: water conductivity (T, ρ), with enhancement (inputs given)',
    fn: () => {
      for (let i = 0; i < CN; i++) {
        thermalConductivity(cT[i]!, cRho[i]!, true, inputs[i]!, lambda);
        consume(lambda.lambda);
      }
    },
    perCall: CN,
    targetNs: 1000,
  },
  {
    name: 'transport: IF97 enhancement inputs at (T, ρ) (state search + reference derivative)',
    fn: () => {
      for (let i = 0; i < CN; i++) {
        if97EnhancementInputs(cT[i]!, cRho[i]!, helperInputs, helperWork);
        consume(helperInputs.dRhoDp);
      }
    },
    perCall: CN,
  },
  {
    name: 'transport: gas μ(T), N2 (Chapman-Enskog)',
    fn: () => {
      for (let i = 0; i < N; i++) consume(n2.mu(gT[i]!));
    },
    perCall: N,
    targetNs: 50,
  },
  {
    name: 'transport: gas λ(T), N2 (modified Eucken)',
    fn: () => {
      for (let i = 0; i < N; i++) consume(n2.lambda(gT[i]!));
    },
    perCall: N,
    targetNs: 50,
  },
  {
    name: 'transport: gas μ(T), H2 (Chapman-Enskog)',
    fn: () => {
      for (let i = 0; i < N; i++) consume(h2.mu(gT[i]!));
    },
    perCall: N,
    targetNs: 50,
  },
  {
    name: 'transport: gas μ, λ, cp, Pr of N2 (gasTransport: range-checked SI core)',
    fn: () => {
      for (let i = 0; i < N; i++) {
        gasTransport(n2, gT[i]!, gasOut);
        consume(gasOut.Pr);
      }
    },
    perCall: N,
  },
  {
    name: 'transport: idealGas("N2").viscosity(T) facade (Quantity in, Quantity out)',
    fn: () => {
      for (let i = 0; i < FN; i++) consume(n2Gas.viscosity(gQ[i]!).si);
    },
    perCall: FN,
  },
  {
    name: 'transport: idealGas("air").state({ T, p }) without transport (baseline)',
    fn: () => {
      for (let i = 0; i < FN; i++) consume(airGas.state({ T: gQ[i]!, p: pQ }).h.si);
    },
    perCall: FN,
  },
  {
    name: 'transport: idealGas("air").state({ T, p }) with mu, lambda, Pr read',
    fn: () => {
      for (let i = 0; i < FN; i++) {
        const st = airGas.state({ T: gQ[i]!, p: pQ });
        consume(st.h.si + st.mu!.si + st.lambda!.si + st.Pr!);
      }
    },
    perCall: FN,
    baseline: 'transport: idealGas("air").state({ T, p }) without transport (baseline)',
    baselinePerCall: FN,
  },
  {
    name: 'transport: gas μ(T), air (Wilke, 4 components)',
    fn: () => {
      for (let i = 0; i < N; i++) consume(air.mu(gT[i]!));
    },
    perCall: N,
  },
  {
    name: 'transport: gas λ(T), air (Mason-Saxena, 4 components)',
    fn: () => {
      for (let i = 0; i < N; i++) consume(air.lambda(gT[i]!));
    },
    perCall: N,
  },
];

// ---- waterBatch with transport properties (kept apart from the cases above) ----
// The same 1000 (p, T) states with and without mu, lambda, Pr: the transport request runs the runner's
// loop with an IAPWS-95 evaluation at (T, ρ) and (T_R, ρ) per element for the enhancement inputs.
import { waterBatch } from '../../src/water/batch.js';

const bN = 1000;
const bp = Float64Array.from({ length: bN }, (_, i) => [101325, 1e6, 10e6, 30e6][i % 4]!);
const bT = Float64Array.from({ length: bN }, (_, i) => 280 + ((i * 37) % 800));
cases.push(
  {
    name: 'transport: waterBatch (p, T) → h, rho, cp (no transport)',
    fn: () => consume(waterBatch({ p: bp, T: bT }, ['h', 'rho', 'cp']).h[0]!),
    perCall: bN,
  },
  {
    name: 'transport: waterBatch (p, T) → mu, lambda, Pr',
    fn: () => consume(waterBatch({ p: bp, T: bT }, ['mu', 'lambda', 'Pr']).Pr[0]!),
    perCall: bN,
    baseline: 'transport: waterBatch (p, T) → h, rho, cp (no transport)',
    baselinePerCall: bN,
  },
);
