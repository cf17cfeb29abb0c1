/**
 * The caller's units of one facade call: which unit the caller wrote each dimension in, so that range
 * errors and messages speak the caller's units (`T = 500 °F …`, `p = 20 psia …`) with SI beside them.
 *
 * @module
 */
import { formatNumber, type RangeInCallerUnit } from '../errors.js';
import type { Dimension } from '../units/dimensions.js';
import { Quantity } from '../units/quantity.js';
import { DEFAULT_AMBIENT_PA, fromSI, resolveUnit } from '../units/registry.js';
import { splitQuantityText } from '../units/text.js';

/** The unit text of an input (a Quantity's unit, or the unit part of unit text); undefined otherwise. */
export function unitOfInput(input: unknown): string | undefined {
  if (input instanceof Quantity) return input.unit;
  if (typeof input !== 'string') return undefined;
  try {
    // the same scanner that reads the text as a quantity
    const unit = splitQuantityText(input)[1];
    return unit === '' || unit === '1' ? undefined : unit;
  } catch {
    return undefined;
  }
}

/** The units one call's inputs were written in, by dimension (the first input of a dimension decides). */
export class CallUnits {
  private readonly units = new Map<Dimension, { unit: string; ambient: number }>();

  /** Records the unit `input` was written in, for `dimension`. */
  note(input: unknown, dimension: Dimension): void {
    if (this.units.has(dimension)) return;
    const unit = unitOfInput(input);
    if (unit === undefined) return;
    const ambient = input instanceof Quantity ? input.ambientPa : DEFAULT_AMBIENT_PA;
    this.units.set(dimension, { unit, ambient });
  }

  /** The caller's unit for `dimension`, if one was noted. */
  unitOf(dimension: Dimension): string | undefined {
    return this.units.get(dimension)?.unit;
  }

  /** An SI value in the caller's unit for `dimension` (SI when the caller used none). */
  display(si: number, dimension: Dimension): { value: number; unit: string } | undefined {
    const u = this.units.get(dimension);
    if (u === undefined) return undefined;
    try {
      const resolved = resolveUnit(u.unit);
      if (resolved.dimension !== dimension && !(dimension === 'temperatureDifference' && resolved.kind === 'temperature')) return undefined;
      return { value: convert(si, resolved, u.ambient), unit: u.unit };
    } catch {
      return undefined;
    }
  }

  /** Value and bounds in the caller's unit, or undefined when the caller wrote SI (or no unit). */
  range(value: number, min: number, max: number, dimension: Dimension): RangeInCallerUnit | undefined {
    const v = this.display(value, dimension);
    if (v === undefined) return undefined;
    const lo = this.display(min, dimension)!;
    const hi = this.display(max, dimension)!;
    return { unit: v.unit, value: v.value, min: lo.value, max: hi.value };
  }

  /** `500 °F (533.15 K)` in the caller's unit with SI in parentheses, or `533.15 K`. */
  describe(si: number, dimension: Dimension, siUnit: string): string {
    const d = this.display(si, dimension);
    const siText = `${formatNumber(si)} ${siUnit}`;
    return d === undefined || d.unit === siUnit ? siText : `${formatNumber(d.value)} ${d.unit} (${siText})`;
  }
}

function convert(si: number, resolved: ReturnType<typeof resolveUnit>, ambient: number): number {
  if (!Number.isFinite(si)) return si;
  return fromSI(si, resolved, ambient);
}
