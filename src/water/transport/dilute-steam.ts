/**
 * Water vapour as a dilute gas: the zero-density terms of the IAPWS transport releases, μ0(T) of
 * IAPWS R12-08 (Eq. 11) and λ0(T) of IAPWS R15-11 (Eq. 16), as a {@link GasTransportModel} for the
 * ideal-gas mixtures of src/ideal-gas/transport.ts (humid air, flue gas), with cp from the ideal-gas
 * H2O species. Range 273.15 K to 1173.15 K (the releases' temperature range).
 *
 * @module
 */
import type { GasTransportModel } from '../../ideal-gas/transport.js';
import type { IdealGasModel } from '../../ideal-gas/model.js';
import { CriticalEnhancementInputs } from './critical.js';
import { ConductivityResult, CONDUCTIVITY_T_MAX, thermalConductivity } from './conductivity.js';
import { MU_REFERENCE, reducedViscosity, VISCOSITY_T_MIN } from './viscosity.js';

const unused = new CriticalEnhancementInputs();

/**
 * Dilute water vapour from the IAPWS zero-density terms.
 * @example
 * ```ts
 * const steam = new SteamDiluteTransport(speciesModel('H2O').model);
 * steam.mu(300);       //=> 9.7684e-6 (Pa·s)
 * steam.lambda(298.15); //=> 0.0184341883 (W/(m·K); R15-11 Table 4, ρ = 0)
 * ```
 */
export class SteamDiluteTransport implements GasTransportModel {
  readonly M: number;
  readonly Tmin = VISCOSITY_T_MIN;
  readonly Tmax = CONDUCTIVITY_T_MAX;
  private readonly thermo: IdealGasModel;
  private readonly result = new ConductivityResult();

  /** `thermo` supplies cp (the ideal-gas H2O species model). */
  constructor(thermo: IdealGasModel) {
    this.thermo = thermo;
    this.M = thermo.M;
  }

  mu(T: number): number {
    return MU_REFERENCE * reducedViscosity(T, 0, false, unused);
  }

  lambda(T: number): number {
    thermalConductivity(T, 0, false, unused, this.result);
    return this.result.lambda;
  }

  cp(T: number): number {
    return this.thermo.cpR(T) * this.thermo.R;
  }
}
