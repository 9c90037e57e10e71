/**
 * Reads one NIST StRD linear-regression file (NIST/ITL Statistical Reference Datasets) for the
 * self-check workbook: its reference line, data columns and certified values. The layout is
 * NIST's: a header naming the certified and data line ranges, one `B<k>` line per parameter, the
 * residual standard deviation, R² and the two ANOVA lines (see SOURCE.md beside the files).
 */
import { readFileSync } from 'node:fs';

export interface CertifiedParameter {
  name: string;
  estimate: number;
  standardDeviation: number;
}

export interface StrdFile {
  /** The file's `Reference:` lines, joined. */
  reference: string;
  /** From the `Data:` heading line: y first, then the predictors. */
  columns: string[];
  rows: number[][];
  parameters: CertifiedParameter[];
  residualSd: number;
  rSquared: number;
  regression: { df: number; ss: number; ms: number; f: number };
  residual: { df: number; ss: number; ms: number };
}

/** NIST prints Fortran-style numbers (`0.4E-03`, `.11019`, `760.`); Number() reads them all. */
function numberOf(token: string): number {
  const value = Number(token);
  if (!Number.isFinite(value)) throw new Error(`"${token}" is not a finite number in the StRD file.`);
  return value;
}

function lineRange(lines: string[], label: string): [number, number] {
  const match = lines.find((l) => l.includes(label))?.match(/lines\s+(\d+)\s+to\s+(\d+)/);
  if (!match) throw new Error(`The StRD header has no "${label}" line range.`);
  return [Number(match[1]), Number(match[2])];
}

function referenceOf(lines: string[]): string {
  const start = lines.findIndex((l) => l.startsWith('Reference:'));
  if (start < 0) throw new Error('The StRD header has no Reference line.');
  const parts = [lines[start].slice('Reference:'.length).trim()];
  for (let i = start + 1; i < lines.length && lines[i].trim() !== ''; i++) parts.push(lines[i].trim());
  return parts.join(' ');
}

export function readStrdFile(path: string): StrdFile {
  // The files are ASCII with CRLF line endings, kept byte for byte as NIST published them.
  const lines = readFileSync(path, 'latin1')
    .split('\n')
    .map((l) => l.replace(/\r$/, ''));
  const [certifiedFrom, certifiedTo] = lineRange(lines, 'Certified Values');
  const [dataFrom, dataTo] = lineRange(lines, 'Data   ');
  const certified = lines.slice(certifiedFrom - 1, certifiedTo).map((l) => l.trim().split(/\s+/));
  const find = (test: (tokens: string[]) => boolean, what: string): string[] => {
    const tokens = certified.find(test);
    if (!tokens) throw new Error(`The StRD certified block has no ${what}.`);
    return tokens;
  };

  const parameters = certified.filter((t) => /^B\d+$/.test(t[0])).map((t) => ({ name: t[0], estimate: numberOf(t[1]), standardDeviation: numberOf(t[2]) }));
  const sd = find((t) => t[0] === 'Standard' && t[1] === 'Deviation', 'residual standard deviation');
  const r2 = find((t) => t[0] === 'R-Squared', 'R-squared');
  const regression = find((t) => t[0] === 'Regression' && t.length >= 5, 'Regression ANOVA line');
  const residual = find((t) => t[0] === 'Residual' && t.length >= 4, 'Residual ANOVA line');
  const heading = lines[dataFrom - 2].trim().split(/\s+/);
  if (heading[0] !== 'Data:') throw new Error('The line before the StRD data is not its "Data:" heading.');

  return {
    reference: referenceOf(lines),
    columns: heading.slice(1),
    rows: lines.slice(dataFrom - 1, dataTo).map((l) => l.trim().split(/\s+/).map(numberOf)),
    parameters,
    residualSd: numberOf(sd[2]),
    rSquared: numberOf(r2[1]),
    regression: { df: numberOf(regression[1]), ss: numberOf(regression[2]), ms: numberOf(regression[3]), f: numberOf(regression[4]) },
    residual: { df: numberOf(residual[1]), ss: numberOf(residual[2]), ms: numberOf(residual[3]) },
  };
}
