/**
 * Chemical formulas: parsing and molar mass from the CIAAW standard atomic weights.
 *
 * Accepted forms: `C3H8`, `CH3OH`, `Ca(OH)2`, `[Co(NH3)6]Cl3`, `CuSO4·5H2O` (also `*` or `.` for the dot),
 * decimal subscripts for surrogate fuels (`C7.8H15.6`).
 *
 * @module
 */
import atomicWeights from '../../data/atomic-weights.json';
import { FormulaError, InvalidInputError } from '../errors.js';

const WEIGHTS: Readonly<Record<string, number>> = atomicWeights.elements;

/** Brackets nested deeper than this are refused (no real formula comes near; it bounds the recursion). */
export const FORMULA_MAX_DEPTH = 16;
/** Formulas longer than this (characters) are refused before parsing. */
export const FORMULA_MAX_LENGTH = 1000;

/**
 * Standard atomic weight (g/mol) of an element symbol, or `undefined` if heatstate has none.
 * @example
 * ```ts
 * atomicWeight('C');    //=> 12.011
 * atomicWeight('Sn');   //=> undefined (not in heatstate's list)
 * ```
 */
export function atomicWeight(symbol: string): number | undefined {
  return Object.prototype.hasOwnProperty.call(WEIGHTS, symbol) ? WEIGHTS[symbol] : undefined;
}

/**
 * Element symbols heatstate has atomic weights for.
 * @example
 * ```ts
 * knownElements().length;   //=> 41
 * ```
 */
export function knownElements(): string[] {
  return Object.keys(WEIGHTS);
}

/**
 * Counts the atoms of each element in a formula.
 * @throws {@link FormulaError} with the position of the first problem (also for brackets nested more
 *   than `FORMULA_MAX_DEPTH` deep, a formula longer than `FORMULA_MAX_LENGTH` characters,
 *   and counts too large for double precision)
 * @throws {@link InvalidInputError} when `formula` is not a string
 * @example
 * ```ts
 * parseFormula('Ca(OH)2');      //=> { Ca: 1, O: 2, H: 2 }
 * parseFormula('CuSO4·5H2O');   //=> { Cu: 1, S: 1, O: 9, H: 10 }
 * ```
 */
export function parseFormula(formula: string): Record<string, number> {
  if (typeof formula !== 'string') {
    const given = formula === null ? 'null' : Array.isArray(formula) ? 'an array' : typeof formula === 'object' ? 'an object' : `${typeof formula} ${String(formula)}`;
    throw new InvalidInputError('input.invalid', 'formula', `formula must be a string such as "C3H8"; got ${given}`);
  }
  const shown = formula.length > 60 ? `${formula.slice(0, 60)}…` : formula;
  if (formula.length > FORMULA_MAX_LENGTH) throw new FormulaError(formula, 0, `formula "${shown}" is ${formula.length} characters long, more than ${FORMULA_MAX_LENGTH}`);
  const s = formula.trim();
  if (s === '') throw new FormulaError(formula, 0, 'empty formula');
  let pos = 0;
  let depth = 0;
  const fail = (what: string): never => {
    throw new FormulaError(formula, pos, `cannot read formula "${formula}": ${what} at position ${pos + 1}`);
  };
  const readNumber = (): number | undefined => {
    const m = /^\d+(?:\.\d+)?/.exec(s.slice(pos));
    if (!m) return undefined;
    const n = Number(m[0]);
    if (n === 0) fail('a count of zero');
    if (!Number.isFinite(n)) fail('a count too large for double precision');
    pos += m[0].length;
    return n;
  };
  const add = (into: Record<string, number>, from: Record<string, number>, times: number): void => {
    for (const [el, n] of Object.entries(from)) {
      into[el] = (into[el] ?? 0) + n * times;
      if (!Number.isFinite(into[el])) fail(`a count of ${el} too large for double precision`);
    }
  };
  const readGroup = (closing: string | undefined): Record<string, number> => {
    const counts: Record<string, number> = {};
    while (pos < s.length) {
      const c = s[pos]!;
      if (c === ')' || c === ']') {
        if (closing !== c) fail(`unexpected "${c}"`);
        return counts;
      }
      if (c === '(' || c === '[') {
        if (++depth > FORMULA_MAX_DEPTH) fail(`brackets nested more than ${FORMULA_MAX_DEPTH} deep`);
        pos++;
        const inner = readGroup(c === '(' ? ')' : ']');
        if (s[pos] === undefined) fail(`missing "${c === '(' ? ')' : ']'}"`);
        pos++;
        depth--;
        add(counts, inner, readNumber() ?? 1);
        continue;
      }
      if (c === '·' || c === '*' || c === '.' || c === '•') {
        if (closing !== undefined) fail('a hydrate dot inside brackets');
        return counts;
      }
      const m = /^[A-Z][a-z]?/.exec(s.slice(pos));
      if (!m) fail(`unexpected "${c}" (element symbols start with a capital letter)`);
      // a lower-case letter always belongs to the capital before it: "Co" is cobalt, "CO" carbon + oxygen
      const el = m![0];
      if (atomicWeight(el) === undefined) fail(`unknown element "${el}" (heatstate has atomic weights for H to Kr, I, Xe, Hg, Pb and U)`);
      pos += el.length;
      counts[el] = (counts[el] ?? 0) + (readNumber() ?? 1);
    }
    if (closing !== undefined) fail(`missing "${closing}"`);
    return counts;
  };

  const total: Record<string, number> = {};
  let first = true;
  while (pos < s.length || first) {
    if (!first) pos++; // the dot
    const multiplier = first ? 1 : (readNumber() ?? 1);
    const start = pos;
    const part = readGroup(undefined);
    if (pos === start) fail('an empty part');
    add(total, part, multiplier);
    first = false;
  }
  return total;
}

/**
 * Molar mass of a formula in kg/mol (SI core; see `molarMass` for the quantity form).
 * @throws {@link FormulaError} (also when the molar mass overflows double precision)
 */
export function formulaMolarMass(formula: string): number {
  let grams = 0;
  for (const [el, n] of Object.entries(parseFormula(formula))) grams += WEIGHTS[el]! * n;
  if (!Number.isFinite(grams)) throw new FormulaError(formula, 0, `the molar mass of "${formula.length > 60 ? `${formula.slice(0, 60)}…` : formula}" overflows double precision`);
  return grams / 1000;
}
