/**
 * Reader for the NIST Statistical Reference Datasets (StRD), linear least squares, read in place
 * from ../shared/reference/strd (never copied into this repository). The layout is NIST's: a free
 * header naming the certified and data line ranges, one line per parameter, the residual SD, R²,
 * and the ANOVA table; see SOURCE.md beside the files.
 */
import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';

export const STRD_DIR = resolve(__dirname, '..', '..', '..', 'shared', 'reference', 'strd');
export const STRD_NAMES = ['Norris', 'Pontius', 'NoInt1', 'NoInt2', 'Filip', 'Longley', 'Wampler1', 'Wampler2', 'Wampler3', 'Wampler4', 'Wampler5'] as const;
export type StrdName = (typeof STRD_NAMES)[number];

export interface StrdCertified {
  /** B0…Bk (or B1 alone without an intercept) in file order. */
  parameters: { name: string; estimate: number; standardDeviation: number }[];
  residualSd: number;
  rSquared: number;
  regression: { df: number; ss: number; ms: number; f: number };
  residual: { df: number; ss: number; ms: number };
}

export interface StrdProblem {
  name: StrdName;
  intercept: boolean;
  y: number[];
  /** Design columns without the intercept: x, x², … for the polynomial models; x1…x6 for Longley. */
  x: number[][];
  /** The raw data columns after y, as printed. */
  rawX: number[][];
  certified: StrdCertified;
}

export function strdAvailable(): boolean {
  return existsSync(resolve(STRD_DIR, 'Norris.dat'));
}

/** NIST prints Fortran-style numbers (`.11019`, `760.`, `0.4E-03`, `Infinity`); Number() accepts them all. */
function parseNumber(token: string): number {
  const value = Number(token);
  if (Number.isNaN(value)) throw new Error(`Not a number in StRD file: ${token}`);
  return value;
}

function lineRange(lines: string[], label: string): [number, number] {
  const header = lines.find((l) => l.includes(label));
  const m = header?.match(/lines\s+(\d+)\s+to\s+(\d+)/);
  if (!m) throw new Error(`No "${label}" line range in StRD header`);
  return [Number(m[1]), Number(m[2])];
}

export function readStrd(name: StrdName): StrdProblem {
  const text = readFileSync(resolve(STRD_DIR, `${name}.dat`), 'latin1');
  const lines = text.split('\n').map((l) => l.replace(/\r$/, ''));
  const [certFrom, certTo] = lineRange(lines, 'Certified Values');
  const [dataFrom, dataTo] = lineRange(lines, 'Data   ');
  const block = lines.slice(certFrom - 1, certTo).map((l) => l.trim().split(/\s+/));

  const parameters = block.filter((t) => /^B\d+$/.test(t[0])).map((t) => ({ name: t[0], estimate: parseNumber(t[1]), standardDeviation: parseNumber(t[2]) }));
  const sdRow = block.find((t) => t[0] === 'Standard' && t[1] === 'Deviation');
  const r2Row = block.find((t) => t[0] === 'R-Squared');
  const regRow = block.find((t) => t[0] === 'Regression' && t.length >= 5);
  const resRow = block.find((t) => t[0] === 'Residual' && t.length >= 4);
  if (!sdRow || !r2Row || !regRow || !resRow) throw new Error(`Incomplete certified block in ${name}`);

  const rows = lines.slice(dataFrom - 1, dataTo).map((l) => l.trim().split(/\s+/).map(parseNumber));
  const y = rows.map((r) => r[0]);
  const rawX = rows.map((r) => r.slice(1));
  const intercept = parameters.some((p) => p.name === 'B0');
  const degree = Math.max(...parameters.map((p) => Number(p.name.slice(1))));
  const x = rawX[0].length === 1 ? rawX.map(([v]) => Array.from({ length: degree }, (_, k) => v ** (k + 1))) : rawX;

  return {
    name,
    intercept,
    y,
    x,
    rawX,
    certified: {
      parameters,
      residualSd: parseNumber(sdRow[2]),
      rSquared: parseNumber(r2Row[1]),
      regression: { df: parseNumber(regRow[1]), ss: parseNumber(regRow[2]), ms: parseNumber(regRow[3]), f: parseNumber(regRow[4]) },
      residual: { df: parseNumber(resRow[1]), ss: parseNumber(resRow[2]), ms: parseNumber(resRow[3]) },
    },
  };
}

/** Log relative error, NIST's measure of correct significant digits, capped at 15. */
/**
 * NIST's log relative error, capped at 15. A certified value of exactly 0 (Wampler1's standard
 * deviations) has no relative error, so there the error is taken relative to `zeroScale`, the
 * data's scale (|est| ≤ 1e-13·scale of y reads as LRE 13).
 */
export function lre(estimate: number, certified: number, zeroScale = 1): number {
  if (estimate === certified) return 15;
  const err = certified === 0 ? Math.abs(estimate) / zeroScale : Math.abs(estimate - certified) / Math.abs(certified);
  if (!Number.isFinite(err)) return 0;
  return Math.min(15, Math.max(0, -Math.log10(err)));
}
