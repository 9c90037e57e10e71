/**
 * The NIST StRD sheets (Longley, Norris): the file's data and every certified value that a PLUMB
 * function returns directly: each estimate and its standard deviation, the residual standard
 * deviation, R², the residual df and sum of squares, and F with its two degrees of freedom.
 */
import { FIT_STATS_LABELS } from '../../src/cellGrids/fitStatsGrid';
import type { Check, DatasetSheetSpec } from './datasetSheet';
import type { StrdFile } from './strdFile';

export const STRD_SHEETS = ['Longley', 'Norris'] as const;
export type StrdSheetName = (typeof STRD_SHEETS)[number];

export function fitStatsRow(label: (typeof FIT_STATS_LABELS)[number]): number {
  return FIT_STATS_LABELS.indexOf(label);
}

export function strdSheetSpec(name: StrdSheetName, file: StrdFile): DatasetSheetSpec {
  const q = file.parameters.length;
  const predictors = file.columns.slice(1);
  const termOf = (k: number) => (k === 0 ? 'intercept' : predictors[k - 1]);
  if (file.parameters.some((p, k) => p.name !== `B${k}`) || q !== predictors.length + 1) {
    throw new Error(`${name}: expected B0…B${predictors.length}, a linear model with an intercept.`);
  }
  const fit = (label: (typeof FIT_STATS_LABELS)[number], expected: number, count = false): Check => ({
    label: `${label}`,
    expected,
    block: 'FITSTATS',
    row: fitStatsRow(label),
    column: 1,
    count,
  });
  const checks: Check[] = [
    ...file.parameters.map((p, k) => ({ label: `${p.name} (${termOf(k)}) estimate`, expected: p.estimate, block: 'ESTIMATES', row: k, column: 0 })),
    ...file.parameters.map((p, k) => ({
      label: `${p.name} (${termOf(k)}) standard deviation`,
      expected: p.standardDeviation,
      block: 'STDERRORS',
      row: k,
      column: 0,
    })),
    fit('Rows used', file.rows.length, true),
    fit('Parameters', q, true),
    fit('Residual df', file.residual.df, true),
    fit('RSS', file.residual.ss),
    fit('Sigma-hat', file.residualSd),
    fit('R²', file.rSquared),
    fit('F (all slopes zero)', file.regression.f),
    fit('F numerator df', file.regression.df, true),
    fit('F denominator df', file.residual.df, true),
  ];
  const model = `y = B0 + ${predictors.map((x, k) => `B${k + 1}·${x}`).join(' + ')}`;
  return {
    name,
    title: `NIST StRD ${name}: ${model}`,
    notes: [
      `Data and certified values: NIST/ITL Statistical Reference Datasets (StRD), linear least squares regression, ${name}, https://www.itl.nist.gov/div898/strd/lls/data/${name}.shtml (public domain: a work of the US government). Reference: ${file.reference}`,
      'Compared: every certified estimate and standard deviation, the residual standard deviation (Sigma-hat), R², the residual df and sum of squares (RSS), and F with its two degrees of freedom, as Plumbline returns them in columns O onwards.',
    ],
    expectedHeading: 'Certified value (NIST)',
    headers: file.columns,
    rows: file.rows,
    blocks: [
      { functionName: 'ESTIMATES', rows: q, columns: 1 },
      { functionName: 'STDERRORS', rows: q, columns: 1 },
      { functionName: 'FITSTATS', rows: FIT_STATS_LABELS.length, columns: 2 },
    ],
    checks,
  };
}
