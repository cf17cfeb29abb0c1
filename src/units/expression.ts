/**
 * Syntax of unit expressions, as engineers write them: `kJ/(kg·K)`, `kJ/kg/K`,
 * `Btu/(lbm·°R)`, `ft³/lbm`, `ft^3/lbm`, `kg/m3`, `W/m/K`, `lbf·s/ft²`.
 *
 * This file knows only the grammar; which names are units is decided by the registry.
 *
 * Grammar: `expr := term (('·' | '*' | '.' | ' ' | '/') term)*`, `term := (name | '(' expr ')') exponent?`,
 * `exponent := '^' -?digits | superscript digits | trailing digits`. `/` divides by the next term only,
 * so `kJ/kg/K` reads as kJ·kg⁻¹·K⁻¹.
 *
 * @module
 */
import { UnitError } from '../errors.js';

/** One named unit raised to a power, before the registry resolves the name. */
export interface UnitTerm {
  readonly name: string;
  readonly exponent: number;
}

const SUPERSCRIPTS: Record<string, string> = {
  '⁰': '0',
  '¹': '1',
  '²': '2',
  '³': '3',
  '⁴': '4',
  '⁵': '5',
  '⁶': '6',
  '⁷': '7',
  '⁸': '8',
  '⁹': '9',
  '⁻': '-',
};

const NAME_CHAR = /[A-Za-z°µμΩ℃℉_]/;

/**
 * Reads a unit expression into a flat list of named terms with their exponents.
 * Names are returned as written (prefixes not split). Throws {@link UnitError}
 * (`unit.syntax`) on malformed text.
 */
export function parseUnitExpression(text: string): UnitTerm[] {
  const src = text.trim();
  let pos = 0;
  const fail = (what: string): never => {
    throw new UnitError('unit.syntax', text, `cannot read unit "${text}": ${what} at position ${pos + 1}`);
  };

  const skipSpaces = (): void => {
    while (pos < src.length && src[pos] === ' ') pos++;
  };

  const readExponent = (): number => {
    let digits = '';
    if (src[pos] === '^') {
      pos++;
      if (src[pos] === '-' || src[pos] === '+') digits += src[pos++];
      while (pos < src.length && /[0-9]/.test(src[pos]!)) digits += src[pos++];
      if (!/[0-9]/.test(digits)) fail('expected a whole-number exponent after "^"');
    } else if (src[pos] !== undefined && SUPERSCRIPTS[src[pos]!] !== undefined) {
      while (pos < src.length && SUPERSCRIPTS[src[pos]!] !== undefined) digits += SUPERSCRIPTS[src[pos++]!];
      if (!/[0-9]/.test(digits)) fail('expected superscript digits');
    } else if (src[pos] !== undefined && /[0-9]/.test(src[pos]!)) {
      while (pos < src.length && /[0-9]/.test(src[pos]!)) digits += src[pos++];
    } else {
      return 1;
    }
    return Number.parseInt(digits, 10);
  };

  const readTerm = (): UnitTerm[] => {
    skipSpaces();
    let terms: UnitTerm[];
    if (src[pos] === '(') {
      pos++;
      terms = readExpr();
      skipSpaces();
      if (src[pos] !== ')') fail('expected ")"');
      pos++;
    } else {
      let name = '';
      while (pos < src.length && NAME_CHAR.test(src[pos]!)) name += src[pos++];
      if (name === '') fail(pos >= src.length ? 'expected a unit name' : `unexpected "${src[pos]}"`);
      terms = [{ name, exponent: 1 }];
    }
    const exponent = readExponent();
    return exponent === 1 ? terms : terms.map((t) => ({ name: t.name, exponent: t.exponent * exponent }));
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
      } else if (!NAME_CHAR.test(c) && c !== '(') {
        fail(`unexpected "${c}"`);
      }
      for (const t of readTerm()) out.push(sign === 1 ? t : { name: t.name, exponent: -t.exponent });
    }
  };

  if (src === '') fail('empty unit');
  const terms = readExpr();
  if (pos < src.length) fail(`unexpected "${src[pos]}"`);
  return terms;
}
