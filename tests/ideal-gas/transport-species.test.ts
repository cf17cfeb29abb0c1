/**
 * The species added to the dilute-gas transport data (data/ideal-gas/transport.json) after the first
 * six: each checked at 300 K and 1 atm against a handbook value recalled from memory, source beside
 * it, within the methods' stated uncertainty (viscosity 2 %; conductivity 10 % for polyatomic gases,
 * modified Eucken). The parameters σ, ε/k are Svehla's (NASA TR R-132, 1962) as reproduced in Poling,
 * Prausnitz & O'Connell, 5th ed. (2001), Appendix B, recalled; they were not adjusted to these values.
 * The refused species (NH3, SO2, H2S, Ne, C2H2) are recorded in the data file's finding and checked
 * here to stay out.
 */
import { describe, expect, it } from 'vitest';
import { idealGas } from '../../src/ideal-gas/gas.js';
import { gasTransportIds } from '../../src/ideal-gas/transport.js';
import { UnavailablePropertyError } from '../../src/errors.js';
import { expectClose } from '../helpers/tolerance.js';

const MU_TOL = 0.02;
const LAMBDA_POLYATOMIC_TOL = 0.1;

describe('handbook values at 300 K, 1 atm (from memory), through idealGas(name)', () => {
  // [id, μ µPa·s, λ mW/(m·K), source]
  it.each([
    ['H2', 8.96, 183, 'Incropera et al., Fundamentals of Heat and Mass Transfer, Table A.4, from memory'],
    ['CO', 17.5, 25.0, 'Incropera et al., Table A.4, from memory'],
    ['NO', 19.2, 25.9, 'CRC Handbook of Chemistry and Physics, viscosity and thermal conductivity of gases, from memory'],
    ['N2O', 15.0, 17.4, 'CRC Handbook, from memory'],
    ['C2H6', 9.5, 21.3, 'CRC Handbook, from memory'],
    ['C3H8', 8.2, 18.0, 'CRC Handbook, from memory'],
    ['C2H4', 10.4, 20.5, 'CRC Handbook, from memory'],
    ['n-C4H10', 7.5, 16.4, 'CRC Handbook, from memory'],
  ] as const)('%s: μ = %d µPa·s, λ = %d mW/(m·K) (%s)', (id, mu, lambda, _source) => {
    const gas = idealGas(id);
    expectClose(gas.viscosity('300 K').in('µPa·s'), mu, { rel: MU_TOL });
    expectClose(gas.thermalConductivity('300 K').in('mW/(m·K)'), lambda, { rel: LAMBDA_POLYATOMIC_TOL });
  });
});

describe('species that did not check stay out (finding in data/ideal-gas/transport.json)', () => {
  it.each(['NH3', 'SO2', 'H2S', 'Ne', 'C2H2', 'H2O', 'NO2', 'O3', 'OH'])('%s has no transport data: the methods throw UnavailablePropertyError', (id) => {
    expect(gasTransportIds()).not.toContain(id);
    expect(() => idealGas(id).viscosity('300 K')).toThrow(UnavailablePropertyError);
  });
});
