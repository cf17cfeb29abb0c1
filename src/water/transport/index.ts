/**
 * Transport properties of water and steam, SI core: IAPWS R12-08 viscosity, IAPWS R15-11 thermal
 * conductivity (each with its optional critical enhancement), IAPWS R1-76(2014) surface tension, and
 * the IF97 helper that supplies the enhancements' thermodynamic inputs.
 *
 * @module
 */
export { CriticalEnhancementInputs, correlationLength, T_REFERENCE } from './critical.js';
export { MU_REFERENCE, reducedViscosity, reducedViscosityAtLength, viscosity, viscosityEnhancement, viscosityPressureLimit, ViscosityResult, VISCOSITY_ENHANCEMENT_WINDOW, VISCOSITY_PRESSURE_LIMITS, VISCOSITY_T_MAX, VISCOSITY_T_MIN } from './viscosity.js';
export { conductivityPressureLimit, ConductivityResult, thermalConductivity, CONDUCTIVITY_PRESSURE_LIMITS, CONDUCTIVITY_T_MAX, CONDUCTIVITY_T_MIN } from './conductivity.js';
export { surfaceTension, SurfaceTensionResult, SURFACE_TENSION_T_MAX, SURFACE_TENSION_T_MIN } from './surface-tension.js';
export { enhancementInputsFromState, if97EnhancementInputs, if97StateAtDensity, If97InputsWork, IF97_INPUTS_T_MAX, referenceDensityDerivative, REFERENCE_RHO_MAX, REFERENCE_RHO_REGION2_MAX } from './if97-inputs.js';
export { SteamDiluteTransport } from './dilute-steam.js';
export { iapws95EnhancementInputs, Iapws95InputsWork } from './iapws95-inputs.js';
