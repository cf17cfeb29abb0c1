/**
 * Syntax of unit expressions, as engineers write them: `kJ/(kg·K)`, `kJ/kg/K`,
 * `Btu/(lbm·°R)`, `ft³/lbm`, `ft^3/lbm`, `kg/m3`, `W/m/K`, `lbf·s/ft²`, `inH2O`.
 *
 * This file knows only the grammar; which names are units is decided by the registry.
 *
 * Grammar: `expr := term (('·' | '*' | '.' | ' ' | '/') term)*`, `term := (name | '(' expr ')') exponent?`,
 * `exponent := '^' -?digits | superscript digits | trailing digits`. `/` divides by the next term only,
 * so `kJ/kg/K` reads as kJ·kg⁻¹·K⁻¹. A name may contain `H2O` (`inH2O`, `mmH2O`): there the digit
 * is part of the name, not an exponent.
 *
 * Limits (each refused with a {@link UnitError} of code `unit.syntax`, never a stack overflow):
 * at most {@link UNIT_TEXT_MAX_LENGTH} characters, brackets nested at most {@link UNIT_MAX_DEPTH}
 * deep, at most {@link UNIT_MAX_TERMS} terms, written exponents of at most two digits.
 * The parser reads each character once (plus one pass per enclosing bracket for a bracket's
 * exponent), so its work grows linearly with the length of the text.
 *
 * @module
 */
import { UnitError } from '../errors.js';

/** One named unit raised to a power, before the registry resolves the name. */
export interface UnitTerm {
  readonly name: string;
  readonly exponent: number;
}

/** The longest unit text the parser reads. */
export const UNIT_TEXT_MAX_LENGTH = 200;
/** The deepest nesting of brackets the parser reads. */
export const UNIT_MAX_DEPTH = 8;
/** The most terms (named units) one expression may have. */
export const UNIT_MAX_TERMS = 64;

/** A step counter: the parser adds one per unit of work, so tests can check that work grows linearly. */
export interface ParseCounter {
  steps: number;
}

const SUPERSCRIPTS: Record<string, number> = {
  '⁰': 0,
  '¹': 1,
  '²': 2,
  '³': 3,
  '⁴': 4,
  '⁵': 5,
  '⁶': 6,
  '⁷': 7,
  '⁸': 8,
  '⁹': 9,
};

function isNameChar(c: string | undefined): boolean {
  if (c === undefined) return false;
  const code = c.charCodeAt(0);
  return (code >= 65 && code <= 90) || (code >= 97 && code <= 122) || c === '_' || c === '°' || c === 'µ' || c === 'μ' || c === 'Ω' || c === '℃' || c === '℉';
}

function isDigit(c: string | undefined): boolean {
  return c !== undefined && c >= '0' && c <= '9';
}

/** A short, printable preview of unit text for error messages. */
export function previewText(text: string): string {
  return text.length <= 60 ? text : `${text.slice(0, 40)}… (${text.length} characters)`;
}

/**
 * Reads a unit expression into a flat list of named terms with their exponents.
 * Names are returned as written (prefixes not split). Throws {@link UnitError}
 * (`unit.syntax`) on malformed text or text beyond the limits above.
 */
export function parseUnitExpression(text: string, counter?: ParseCounter): UnitTerm[] {
  if (typeof text !== 'string') {
    throw new UnitError('unit.syntax', String(text), `a unit must be text (a string); got ${text === null ? 'null' : typeof text}`);
  }
  if (text.length > UNIT_TEXT_MAX_LENGTH) {
    throw new UnitError('unit.syntax', previewText(text), `unit text "${previewText(text)}" is longer than ${UNIT_TEXT_MAX_LENGTH} characters; no unit heatstate reads is that long`);
  }
  const src = text.trim();
  const shown = previewText(text);
  let pos = 0;
  let depth = 0;
  let count = 0;
  const tick = counter === undefined ? undefined : counter;
  const fail = (what: string): never => {
    throw new UnitError('unit.syntax', text, `cannot read unit "${shown}": ${what} at position ${pos + 1}`);
  };

  const skipSpaces = (): void => {
    while (src[pos] === ' ') {
      pos++;
      if (tick) tick.steps++;
    }
  };

  const readDigits = (): number => {
    let value = 0;
    let n = 0;
    while (isDigit(src[pos])) {
      value = value * 10 + (src.charCodeAt(pos) - 48);
      pos++;
      n++;
      if (tick) tick.steps++;
      if (n > 2) fail('exponent with more than two digits');
    }
    if (n === 0) fail('expected a whole-number exponent');
    return value;
  };

  const readExponent = (): number => {
    const c = src[pos];
    if (c === '^') {
      pos++;
      let sign = 1;
      if (src[pos] === '-' || src[pos] === '+') {
        if (src[pos] === '-') sign = -1;
        pos++;
      }
      return sign * readDigits();
    }
    if (c === '⁻' || (c !== undefined && SUPERSCRIPTS[c] !== undefined)) {
      let sign = 1;
      if (c === '⁻') {
        sign = -1;
        pos++;
      }
      let value = 0;
      let n = 0;
      while (src[pos] !== undefined && SUPERSCRIPTS[src[pos]!] !== undefined) {
        value = value * 10 + SUPERSCRIPTS[src[pos]!]!;
        pos++;
        n++;
        if (tick) tick.steps++;
        if (n > 2) fail('exponent with more than two digits');
      }
      if (n === 0) fail('expected superscript digits');
      return sign * value;
    }
    if (isDigit(c)) return readDigits();
    return 1;
  };

  const readTerm = (): UnitTerm[] => {
    skipSpaces();
    let terms: UnitTerm[];
    if (src[pos] === '(') {
      depth++;
      if (depth > UNIT_MAX_DEPTH) fail(`brackets nested more than ${UNIT_MAX_DEPTH} deep`);
      pos++;
      terms = readExpr();
      skipSpaces();
      if (src[pos] !== ')') fail('expected ")"');
      pos++;
      depth--;
    } else {
      const start = pos;
      for (;;) {
        if (isNameChar(src[pos])) pos++;
        else if (pos > start && src.startsWith('H2O', pos - 1) && src[pos - 1] === 'H') pos += 2;
        else break;
        if (tick) tick.steps++;
      }
      if (pos === start) fail(pos >= src.length ? 'expected a unit name' : `unexpected "${src[pos]}"`);
      count++;
      if (count > UNIT_MAX_TERMS) fail(`more than ${UNIT_MAX_TERMS} unit names`);
      terms = [{ name: src.slice(start, pos), exponent: 1 }];
    }
    const exponent = readExponent();
    if (exponent === 1) return terms;
    if (tick) tick.steps += terms.length;
    return terms.map((t) => ({ name: t.name, exponent: t.exponent * exponent }));
  };

  const readExpr = (): UnitTerm[] => {
    const out = readTerm();
    for (;;) {
      skipSpaces();
      const c = src[pos];
      if (c === undefined || c === ')') return out;
      let sign = 1;
      if (c === '/') {
        sign = -1;
        pos++;
      } else if (c === '·' || c === '*' || c === '.' || c === '⋅' || c === '×') {
        pos++;
      } else if (!isNameChar(c) && c !== '(') {
        fail(`unexpected "${c}"`);
      }
      if (tick) tick.steps++;
      for (const t of readTerm()) out.push(sign === 1 ? t : { name: t.name, exponent: -t.exponent });
    }
  };

  if (src === '') fail('empty unit');
  const terms = readExpr();
  if (pos < src.length) fail(`unexpected "${src[pos]}"`);
  return terms;
}
