/**
 * Reading quantity text (`"500 psia"`): one left-to-right scan that splits the number from the unit,
 * decimal numbers only, with a length limit. Linear in the length of the text.
 *
 * @module
 */
import { InvalidInputError, UnitError } from '../errors.js';
import { previewText, UNIT_TEXT_MAX_LENGTH, type ParseCounter } from './expression.js';

/** The longest quantity text read: a number (up to 64 characters) and a unit. */
export const QUANTITY_TEXT_MAX_LENGTH = UNIT_TEXT_MAX_LENGTH + 64;

function isSpace(code: number): boolean {
  return code === 32 || (code >= 9 && code <= 13) || code === 0xa0 || code === 0x202f || code === 0x2009;
}

function isDigitCode(code: number): boolean {
  return code >= 48 && code <= 57;
}

/**
 * Splits `"500 psia"` into number and unit, or throws {@link UnitError} (`unit.syntax`).
 * The number is decimal (`12`, `-0.5`, `.5`, `1.2e5`); hexadecimal, octal and binary forms
 * (`0x10`), `Infinity` and `NaN` are refused. One left-to-right pass: linear in the length.
 * (Exported for the tests and the construction module.)
 */
export function splitQuantityText(text: string, counter?: ParseCounter): [number, string] {
  if (text.length > QUANTITY_TEXT_MAX_LENGTH) {
    throw new UnitError('unit.syntax', previewText(text), `quantity text "${previewText(text)}" is longer than ${QUANTITY_TEXT_MAX_LENGTH} characters`);
  }
  // no closures here: this runs on every quantity read from text
  const n = text.length;
  let i = 0;
  while (i < n && isSpace(text.charCodeAt(i))) i++;
  const start = i;
  if (text[i] === '+' || text[i] === '-') i++;
  if (text[i] === '0' && /[xXbBoO]/.test(text[i + 1] ?? '')) failQuantity(text, 'hexadecimal, octal and binary numbers are not accepted', counter, i);
  let digits = 0;
  while (i < n && isDigitCode(text.charCodeAt(i))) {
    i++;
    digits++;
  }
  if (text[i] === '.') {
    i++;
    while (i < n && isDigitCode(text.charCodeAt(i))) {
      i++;
      digits++;
    }
  }
  if (digits === 0) failQuantity(text, 'no number', counter, i);
  if (text[i] === 'e' || text[i] === 'E') {
    let j = i + 1;
    if (text[j] === '+' || text[j] === '-') j++;
    if (isDigitCode(text.charCodeAt(j))) {
      i = j;
      while (i < n && isDigitCode(text.charCodeAt(i))) i++;
    }
  }
  const numberText = text.slice(start, i);
  if (numberText.length > 64) failQuantity(text, 'a number of more than 64 characters', counter, i);
  const unit = text.slice(i).trim();
  // one step per character: the number's characters scanned, the unit's handed on
  if (counter) counter.steps += n;
  const value = Number(numberText);
  if (value === 0 && /[1-9]/.test(numberText.split(/[eE]/)[0]!)) {
    throw new InvalidInputError('input.invalid', 'value', `${numberText} underflows to 0 in double precision; no measurement is that small`);
  }
  return [value, unit === '' ? '1' : unit];
}

/** The syntax error of {@link splitQuantityText}, after `scanned` characters. */
function failQuantity(text: string, why: string, counter: ParseCounter | undefined, scanned: number): never {
  if (counter) counter.steps += scanned;
  throw new UnitError('unit.syntax', text, `cannot read "${previewText(text)}" as a quantity: ${why}; write a number followed by a unit, like "500 psia" or "300 °F"`);
}
