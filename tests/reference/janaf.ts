/**
 * Reader for the NIST-JANAF tables in tests/reference/data/janaf (copied from the shared reference
 * data with its README). Chase, NIST-JANAF Thermochemical Tables, 4th ed., J. Phys. Chem. Ref.
 * Data Monograph 9 (1998). Columns: T (K); Cp, S, −[G − H(Tr)]/T in J/(mol·K); H − H(Tr), ΔfH,
 * ΔfG in kJ/mol; log Kf. Tr = 298.15 K, p° = 1 bar.
 */
import { readFileSync } from 'node:fs';

export interface JanafRow {
  readonly T: number;
  readonly Cp: number;
  readonly S: number;
  /** H − H(298.15 K), kJ/mol. */
  readonly dH: number;
  /** ΔfH, kJ/mol. */
  readonly fH: number;
}

export function readJanaf(file: string): JanafRow[] {
  const text = readFileSync(new URL(`./data/janaf/${file}`, import.meta.url), 'utf8');
  const rows: JanafRow[] = [];
  for (const line of text.split('\n').slice(2)) {
    const cells = line.split('\t');
    if (cells.length < 6) continue;
    const [T, Cp, S, , dH, fH] = cells.map((c) => Number(c));
    if ([T, Cp, S, dH, fH].every((x) => Number.isFinite(x))) rows.push({ T: T!, Cp: Cp!, S: S!, dH: dH!, fH: fH! });
  }
  return rows;
}

export function janafAt(file: string, T: number): JanafRow {
  const row = readJanaf(file).find((r) => Math.abs(r.T - T) < 1e-9);
  if (!row) throw new Error(`${file} has no row at ${T} K`);
  return row;
}

/** A row of a condensed-phase table, transition rows included (their ΔfH cell holds the transition's name). */
export interface JanafPhaseRow {
  readonly T: number;
  readonly Cp: number;
  readonly S: number;
  /** H − H(298.15 K), kJ/mol. */
  readonly dH: number;
  /** The text of the sixth cell on a transition row (`CRYSTAL <--> LIQUID`), else undefined. */
  readonly transition?: string;
}

/**
 * Every row with T, Cp, S and H − H(298.15 K), transition rows included: at a phase change the table
 * prints two rows at the same T, the lower phase first.
 */
export function readJanafPhases(file: string): JanafPhaseRow[] {
  const text = readFileSync(new URL(`./data/janaf/${file}`, import.meta.url), 'utf8');
  const rows: JanafPhaseRow[] = [];
  for (const line of text.split('\n').slice(2)) {
    const cells = line.split('\t');
    if (cells.length < 5) continue;
    const [T, Cp, S, , dH] = cells.slice(0, 5).map((c) => Number(c));
    const sixth = cells[5]?.trim();
    if (![T, Cp, S, dH].every((x) => Number.isFinite(x))) continue;
    rows.push({ T: T!, Cp: Cp!, S: S!, dH: dH!, ...(sixth !== undefined && !Number.isFinite(Number(sixth)) ? { transition: sixth } : {}) });
  }
  return rows;
}
