/**
 * The critical-enhancement inputs of IAPWS R12-08 and R15-11 from IAPWS-95 (the equation the
 * releases use for them): cp, cv and (∂ρ/∂p)_T at (T, ρ), and (∂ρ/∂p)_T at T_R = 970.644 K and the
 * same ρ. With these inputs the releases' Table 5 values (647.35 K, with the enhancements) come out to
 * every printed digit (tests/reference/iapws-transport.test.ts), at any density the transport
 * correlations cover, independent of IF97's range.
 *
 * @module
 */
import { Status, type StatusCode } from '../../core/status.js';
// the water entry alone, not the fluid catalogue (which would bring every fluid's data into heatstate/water)
import { water } from '../../fluids/entries/water.js';
import { FluidContext, FluidModel, FluidState, propertiesAt } from '../../fluids/model.js';
import { CriticalEnhancementInputs, T_REFERENCE } from './critical.js';

/** Scratch of {@link iapws95EnhancementInputs}: the IAPWS-95 context and two states. Reuse one. */
export class Iapws95InputsWork {
  /** The IAPWS-95 state at (T, ρ) after a call (p, cp, cv, w, …). */
  readonly state = new FluidState();
  readonly reference = new FluidState();
  private context: FluidContext | undefined;
  /** The IAPWS-95 context, built on first use (loads the water equation). */
  get ctx(): FluidContext {
    return (this.context ??= new FluidContext((iapws95 ??= new FluidModel('water', water.definition(), water.residual, water.ideal))));
  }
}

/** IAPWS-95 water, compiled on first use and shared by every work object (a model is immutable). */
let iapws95: FluidModel | undefined;

/**
 * Fills `out` with the enhancement inputs at (T [K], ρ [kg/m³]) from IAPWS-95; the state at (T, ρ) is
 * left in `work.state`.
 * @returns `Status.ok`; `Status.invalidInput` for non-finite or non-positive inputs;
 *   `Status.undefinedProperty` where IAPWS-95 gives no finite positive cp, cv or (∂p/∂ρ)_T (the
 *   critical point itself, or a mechanically unstable (T, ρ) inside the dome)
 * @example
 * ```ts
 * const d = new CriticalEnhancementInputs();
 * iapws95EnhancementInputs(647.35, 322, d, new Iapws95InputsWork());   //=> 0
 * ```
 */
export function iapws95EnhancementInputs(T: number, rho: number, out: CriticalEnhancementInputs, work: Iapws95InputsWork): StatusCode {
  if (!(T > 0 && rho > 0 && T < Infinity && rho < Infinity)) return Status.invalidInput;
  const ctx = work.ctx;
  const st = work.state;
  if (propertiesAt(ctx, T, rho, st) !== Status.ok) return Status.undefinedProperty;
  if (propertiesAt(ctx, T_REFERENCE, rho, work.reference) !== Status.ok) return Status.undefinedProperty;
  const dRhoDp = 1 / st.dpdrho;
  if (!(st.cp > 0 && st.cp < Infinity && st.cv > 0 && st.cv < Infinity && dRhoDp > 0 && dRhoDp < Infinity && work.reference.dpdrho !== 0)) return Status.undefinedProperty;
  out.cp = st.cp;
  out.cv = st.cv;
  out.dRhoDp = dRhoDp;
  out.dRhoDpReference = 1 / work.reference.dpdrho;
  return Status.ok;
}
