/**
 * Fits NASA Glenn 9-constant polynomials (the form of McBride, Zehe & Gordon, NASA/TP-2002-211556:
 * seven cp terms a1..a7 and the integration constants b1, b2, per interval) to the NIST-JANAF tables
 * held in tests/reference/data/janaf (Chase, NIST-JANAF Thermochemical Tables, 4th ed., 1998), and
 * writes data/ideal-gas/janaf-fits.json with the fit error of every species.
 *
 *   cp°/R  = a1 T⁻² + a2 T⁻¹ + a3 + a4 T + a5 T² + a6 T³ + a7 T⁴
 *   h°/RT  = −a1 T⁻² + a2 ln(T)/T + a3 + a4 T/2 + a5 T²/3 + a6 T³/4 + a7 T⁴/5 + b1/T
 *   s°/R   = −a1 T⁻²/2 − a2 T⁻¹ + a3 ln T + a4 T + a5 T²/2 + a6 T³/3 + a7 T⁴/4 + b2
 *
 * Method: weighted least squares on cp°/R (relative residuals) over the tabulated points in each
 * interval (200–1000 K and 1000–6000 K), with cp continuous at 1000 K (a Lagrange constraint);
 * b1 and b2 of the low interval reproduce ΔfH°(298.15 K) and S°(298.15 K) from the table, those of
 * the high interval make h and s continuous at 1000 K. Solved in scaled temperature t = T/1000.
 *
 * Run: `npm run fits`. tests/ideal-gas/fits-generated.test.ts fails if the committed file drifts.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const FITS_PATH = resolve(root, 'data/ideal-gas/janaf-fits.json');

/** R̄ in J/(mol·K), exact (2019 SI). */
const R = 8.31446261815324;
const T_MIN = 200;
const T_MID = 1000;
const T_MAX = 6000;

interface Row {
  T: number;
  Cp: number;
  S: number;
  dH: number;
  fH: number;
}

/** The JANAF tables to fit: species id, formula, names, table file. */
export const FITTED_SPECIES = [
  { id: 'N2', formula: 'N2', names: ['nitrogen'], file: 'N-023.txt' },
  { id: 'O2', formula: 'O2', names: ['oxygen'], file: 'O-029.txt' },
  { id: 'Ar', formula: 'Ar', names: ['argon'], file: 'Ar-001.txt' },
  { id: 'H2', formula: 'H2', names: ['hydrogen'], file: 'H-050.txt' },
  { id: 'CO', formula: 'CO', names: ['carbon monoxide'], file: 'C-093.txt' },
  { id: 'CO2', formula: 'CO2', names: ['carbon dioxide'], file: 'C-095.txt' },
  { id: 'H2O', formula: 'H2O', names: ['water vapour', 'water vapor', 'water (gas)'], file: 'H-064.txt' },
  { id: 'CH4', formula: 'CH4', names: ['methane'], file: 'C-067.txt' },
  { id: 'NH3', formula: 'NH3', names: ['ammonia'], file: 'H-083.txt' },
  { id: 'He', formula: 'He', names: ['helium'], file: 'He-001.txt' },
  { id: 'C2H4', formula: 'C2H4', names: ['ethylene', 'ethene'], file: 'C-128.txt' },
  { id: 'C2H2', formula: 'C2H2', names: ['acetylene', 'ethyne'], file: 'C-127.txt' },
  { id: 'NO2', formula: 'NO2', names: ['nitrogen dioxide'], file: 'N-007.txt' },
  { id: 'N2O', formula: 'N2O', names: ['nitrous oxide', 'dinitrogen monoxide'], file: 'N-026.txt' },
  { id: 'H2S', formula: 'H2S', names: ['hydrogen sulfide', 'hydrogen sulphide'], file: 'H-080.txt' },
  { id: 'O3', formula: 'O3', names: ['ozone'], file: 'O-056.txt' },
  { id: 'OH', formula: 'OH', names: ['hydroxyl'], file: 'H-038.txt' },
  { id: 'H', formula: 'H', names: ['atomic hydrogen'], file: 'H-001.txt' },
  { id: 'O', formula: 'O', names: ['atomic oxygen'], file: 'O-001.txt' },
  { id: 'N', formula: 'N', names: ['atomic nitrogen'], file: 'N-002.txt' },
] as const;

/**
 * What the fits cannot follow, found by comparing each table with itself (the evidence is recomputable
 * from the table; tests/reference/janaf.test.ts holds these exceptions to the 0.1 % check).
 */
const FINDINGS = {
  H2S:
    'Table H-080 is not self-consistent between its 200 K and 298.15 K rows: S°(298.15 K) − S°(200 K) = 13.719 J/(mol·K) in the table, but ∫cp°/T dT over the interval is at most 13.653 J/(mol·K) even with cp° at its larger tabulated end (34.192 J/(mol·K)) throughout, and 13.48 J/(mol·K) with cp° linear in T; H° − H°(298.15 K) at 200 K (−3.310 kJ/mol) does agree with ∫cp° dT. The fit follows cp° and S°(298.15 K), so S° at 200 K is 0.14 % above the table (192.31 against 192.038 J/(mol·K)); above 298.15 K it agrees within 0.002 %. Someone with the printed JANAF table H-080 (or another compilation’s S° of H2S at 200 K) at hand should check the 200 K row.',
  NH3: 'cp° deviates by up to 0.135 % near 5100 K (80.860 against 80.751 J/(mol·K)): seven terms per interval do not follow the table’s curvature there; below 5000 K the fit is within 0.05 % in cp°.',
} as const;

function readTable(file: string): Row[] {
  const text = readFileSync(resolve(root, 'tests/reference/data/janaf', file), 'utf8');
  const rows: Row[] = [];
  for (const line of text.split('\n').slice(2)) {
    const c = line.split('\t').map(Number);
    if (c.length >= 6 && [c[0], c[1], c[2], c[4], c[5]].every(Number.isFinite)) rows.push({ T: c[0]!, Cp: c[1]!, S: c[2]!, dH: c[4]!, fH: c[5]! });
  }
  return rows;
}

/** Solves A x = b in place by Gaussian elimination with partial pivoting. */
function solve(A: number[][], b: number[]): number[] {
  const n = b.length;
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(A[i]![k]!) > Math.abs(A[p]![k]!)) p = i;
    [A[k], A[p]] = [A[p]!, A[k]!];
    [b[k], b[p]] = [b[p]!, b[k]!];
    for (let i = k + 1; i < n; i++) {
      const f = A[i]![k]! / A[k]![k]!;
      for (let j = k; j < n; j++) A[i]![j]! -= f * A[k]![j]!;
      b[i]! -= f * b[k]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < n; j++) s -= A[i]![j]! * x[j]!;
    x[i] = s / A[i]![i]!;
  }
  return x;
}

const POWERS = [-2, -1, 0, 1, 2, 3, 4];
const basis = (t: number): number[] => POWERS.map((k) => t ** k);

/** Polynomial parts (without b1, b2) of H/R (K) and S/R at T. */
function hPoly(a: readonly number[], T: number): number {
  return -a[0]! / T + a[1]! * Math.log(T) + a[2]! * T + (a[3]! * T ** 2) / 2 + (a[4]! * T ** 3) / 3 + (a[5]! * T ** 4) / 4 + (a[6]! * T ** 5) / 5;
}
function sPoly(a: readonly number[], T: number): number {
  return -a[0]! / (2 * T * T) - a[1]! / T + a[2]! * Math.log(T) + a[3]! * T + (a[4]! * T ** 2) / 2 + (a[5]! * T ** 3) / 3 + (a[6]! * T ** 4) / 4;
}
function cpPoly(a: readonly number[], T: number): number {
  return POWERS.reduce((acc, k, i) => acc + a[i]! * T ** k, 0);
}

export interface Fit {
  id: string;
  formula: string;
  names: string[];
  janafTable: string;
  T: { min: number; mid: number; max: number };
  /** a1..a7, b1, b2 for T < mid. */
  low: number[];
  /** a1..a7, b1, b2 for T ≥ mid. */
  high: number[];
  /**
   * Largest deviations from the JANAF rows in [min, max]: relative in cp° and S°; in H° − H°(298.15 K)
   * absolute (kJ/mol) and relative (over the rows where |H° − H°(298.15 K)| ≥ 1 kJ/mol, so that the
   * table's last printed digit, 0.001 kJ/mol, stays below 0.05 %).
   */
  fitError: { cpRelative: number; sRelative: number; hMinusH298kJPerMol: number; hMinusH298Relative: number; points: number };
  /** A property of the table that the fit cannot follow, with the evidence (absent when there is none). */
  finding?: string;
}

function round(x: number, digits = 3): number {
  return Number(x.toPrecision(digits));
}

export function fitSpecies(spec: (typeof FITTED_SPECIES)[number]): Fit {
  const rows = readTable(spec.file).filter((r) => r.T >= T_MIN && r.T <= T_MAX);
  const lowRows = rows.filter((r) => r.T <= T_MID);
  const highRows = rows.filter((r) => r.T >= T_MID);
  // normal equations for 14 unknowns (scaled coefficients) + 1 multiplier
  const n = 15;
  const M = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const v = new Array<number>(n).fill(0);
  for (const [offset, set] of [[0, lowRows], [7, highRows]] as const) {
    for (const r of set) {
      const y = r.Cp / R;
      const w = 1 / (y * y);
      const phi = basis(r.T / 1000);
      for (let i = 0; i < 7; i++) {
        v[offset + i]! += w * phi[i]! * y;
        for (let j = 0; j < 7; j++) M[offset + i]![offset + j]! += w * phi[i]! * phi[j]!;
      }
    }
  }
  const c = basis(T_MID / 1000);
  for (let i = 0; i < 7; i++) {
    M[i]![14] = c[i]!;
    M[14]![i] = c[i]!;
    M[7 + i]![14] = -c[i]!;
    M[14]![7 + i] = -c[i]!;
  }
  const x = solve(M, v);
  const unscale = (scaled: number[]) => scaled.map((s, i) => s / 1000 ** POWERS[i]!);
  const aLow = unscale(x.slice(0, 7));
  const aHigh = unscale(x.slice(7, 14));
  const ref = rows.find((r) => Math.abs(r.T - 298.15) < 1e-9)!;
  const b1Low = (ref.fH * 1000) / R - hPoly(aLow, 298.15);
  const b2Low = ref.S / R - sPoly(aLow, 298.15);
  const b1High = hPoly(aLow, T_MID) + b1Low - hPoly(aHigh, T_MID);
  const b2High = sPoly(aLow, T_MID) + b2Low - sPoly(aHigh, T_MID);
  // published precision (as NASA/TP-2002-211556 prints them): 10 significant digits, far below the fit error
  const low = [...aLow, b1Low, b2Low].map((x) => Number(x.toPrecision(10)));
  const high = [...aHigh, b1High, b2High].map((x) => Number(x.toPrecision(10)));

  let cpErr = 0;
  let sErr = 0;
  let hErr = 0;
  let hRel = 0;
  const h298 = (ref.fH * 1000) / R;
  for (const r of rows) {
    const k = r.T < T_MID ? low : high;
    const cp = cpPoly(k, r.T) * R;
    const s = (sPoly(k, r.T) + k[8]!) * R;
    const dH = ((hPoly(k, r.T) + k[7]! - h298) * R) / 1000;
    cpErr = Math.max(cpErr, Math.abs(cp - r.Cp) / r.Cp);
    sErr = Math.max(sErr, Math.abs(s - r.S) / r.S);
    hErr = Math.max(hErr, Math.abs(dH - r.dH));
    if (Math.abs(r.dH) >= 1) hRel = Math.max(hRel, Math.abs(dH - r.dH) / Math.abs(r.dH));
  }
  return {
    id: spec.id,
    formula: spec.formula,
    names: [...spec.names],
    janafTable: spec.file.replace('.txt', ''),
    T: { min: T_MIN, mid: T_MID, max: T_MAX },
    low,
    high,
    fitError: { cpRelative: round(cpErr), sRelative: round(sErr), hMinusH298kJPerMol: round(hErr), hMinusH298Relative: round(hRel), points: rows.length },
    ...(spec.id in FINDINGS ? { finding: FINDINGS[spec.id as keyof typeof FINDINGS] } : {}),
  };
}

/** The text of data/ideal-gas/janaf-fits.json. */
export function renderFits(): string {
  const doc = {
    generated: 'GENERATED by scripts/fit-nasa-glenn.ts from tests/reference/data/janaf. Do not edit; run `npm run fits`.',
    source: {
      title: 'NIST-JANAF Thermochemical Tables, 4th edition (fitted here in the NASA Glenn 9-constant polynomial form of NASA/TP-2002-211556)',
      authors: 'M. W. Chase Jr. (tables); B. J. McBride, M. J. Zehe and S. Gordon (polynomial form)',
      year: 1998,
      table: 'J. Phys. Chem. Ref. Data Monograph 9; one table per species (janafTable)',
    },
    basis: 'computed',
    notes: 'Coefficients a1..a7, b1, b2 per interval, T in K, p° = 1 bar, h° including ΔfH°(298.15 K) as tabulated by JANAF. fitError: largest deviation from every JANAF row between T.min and T.max (cp° and S° relative; H° − H°(298.15 K) in kJ/mol and relative where |H° − H°(298.15 K)| ≥ 1 kJ/mol). The uncertainty of each species is its fitError: the deviation from the table; the tables’ own uncertainty (stated per species in the printed JANAF tables, not in the text files used here) is not included.',
    species: FITTED_SPECIES.map(fitSpecies),
  };
  return `${JSON.stringify(doc, null, 1)}\n`;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  writeFileSync(FITS_PATH, renderFits());
  for (const f of FITTED_SPECIES.map(fitSpecies)) console.log(f.id.padEnd(5), JSON.stringify(f.fitError));
  console.log(`wrote ${FITS_PATH}`);
}
