/**
 * The output object of the IF97 solvers: properties plus quality, region and phase.
 *
 * @module
 */
import { WaterProperties } from './properties.js';

/** Phase codes of {@link WaterState.phase}. */
export const PHASE = { liquid: 0, vapor: 1, twoPhase: 2, supercritical: 3 } as const;

/** A full state: properties plus quality, IF97 region and phase. In two-phase states cp, cv and w are NaN (not defined). */
export class WaterState extends WaterProperties {
  /** Vapour mass fraction; NaN outside the two-phase region. */
  x = NaN;
  /** IF97 region 1-5 (4 = two-phase). */
  region = 0;
  /** One of {@link PHASE}. */
  phase = 0;
}
