/**
 * The open-data sheet: R's ToothGrowth with blank and #N/A cells, len ~ supp + dose, where supp
 * is a text (categorical) column. The data and the reference values come from toothGrowth.json,
 * written by toothGrowth.R (R's lm() on the complete rows); this module only lays them out.
 */
import { readFileSync } from 'node:fs';
import { FIT_STATS_LABELS, type FitStatsLabel } from '../../src/cellGrids/fitStatsGrid';
import { RESIDUALS_HEADER } from '../../src/cellGrids/residualsGrid';
import { TERMS_HEADER } from '../../src/cellGrids/termsGrid';
import { type Check, type DatasetSheetSpec, worksheetRowOf } from './datasetSheet';
import type { DataCell } from './plan';
import { fitStatsRow } from './strdSheets';

export const TOOTH_GROWTH_SHEET = 'ToothGrowth';

export interface ToothGrowthReference {
  computedBy: string;
  columns: string[];
  rows: DataCell[][];
  /** 1-based positions in ToothGrowth of the rows R used. */
  usedRows: number[];
  terms: string[];
  estimates: number[];
  standardErrors: number[];
  tValues: number[];
  pValues: number[];
  ciLow: number[];
  ciHigh: number[];
  rowsUsed: number;
  rowsSkipped: number;
  parameters: number;
  residualDf: number;
  rss: number;
  sigma: number;
  rSquared: number;
  adjustedRSquared: number;
  f: number;
  fPValue: number;
  logLikelihood: number;
  aic: number;
  bic: number;
}

/** R's coefficient names, and the names Plumbline gives the same terms (the README's coding). */
const R_TERMS = ['(Intercept)', 'suppVC', 'dose'];
const TERMS = ['Intercept', 'supp: VC', 'dose'];

/**
 * The reference value of each FITSTATS row. R's summary.lm reports the overall F test's degrees
 * of freedom as (parameters − 1, residual df) for a model with an intercept, so those two rows
 * are checked against the counts R gave.
 */
const FIT_STATS_REFERENCE: Record<FitStatsLabel, (reference: ToothGrowthReference) => number> = {
  'Rows used': (r) => r.rowsUsed,
  'Rows skipped': (r) => r.rowsSkipped,
  Parameters: (r) => r.parameters,
  'Sigma-hat': (r) => r.sigma,
  'Residual df': (r) => r.residualDf,
  RSS: (r) => r.rss,
  'R²': (r) => r.rSquared,
  'Adjusted R²': (r) => r.adjustedRSquared,
  'F (all slopes zero)': (r) => r.f,
  'F numerator df': (r) => r.parameters - 1,
  'F denominator df': (r) => r.residualDf,
  'p-value of F': (r) => r.fPValue,
  'Log-likelihood': (r) => r.logLikelihood,
  AIC: (r) => r.aic,
  BIC: (r) => r.bic,
};
const COUNTS = new Set<string>(['Rows used', 'Rows skipped', 'Parameters', 'Residual df', 'F numerator df', 'F denominator df']);

export function readToothGrowthReference(path: string): ToothGrowthReference {
  const reference = JSON.parse(readFileSync(path, 'utf8')) as ToothGrowthReference;
  if (reference.terms.join('|') !== R_TERMS.join('|'))
    throw new Error(`toothGrowth.json has terms ${reference.terms.join(', ')}; expected ${R_TERMS.join(', ')}.`);
  if (reference.rows.length !== 60 || reference.usedRows.length !== reference.rowsUsed)
    throw new Error('toothGrowth.json does not hold the 60 rows and the rows used.');
  return reference;
}

function fitStatsChecks(reference: ToothGrowthReference): Check[] {
  return FIT_STATS_LABELS.map((label) => {
    const expected = FIT_STATS_REFERENCE[label](reference);
    if (!Number.isFinite(expected)) throw new Error(`toothGrowth.json has no number for ${label}.`);
    return { label, expected, block: 'FITSTATS', row: fitStatsRow(label), column: 1, count: COUNTS.has(label) };
  });
}

export function toothGrowthSheetSpec(reference: ToothGrowthReference): DatasetSheetSpec {
  const perTerm = (what: string, values: number[], block: string, column: number, headerRows = 0): Check[] =>
    TERMS.map((term, k) => ({ label: `${term}: ${what}`, expected: values[k], block, row: headerRows + k, column }));
  const rowColumn = RESIDUALS_HEADER.indexOf('Row');
  const used = reference.usedRows.length;
  const checks: Check[] = [
    ...perTerm('estimate', reference.estimates, 'ESTIMATES', 0),
    ...perTerm('standard error', reference.standardErrors, 'STDERRORS', 0),
    ...perTerm('t', reference.tValues, 'TERMS', TERMS_HEADER.indexOf('t'), 1),
    ...perTerm('p-value', reference.pValues, 'TERMS', TERMS_HEADER.indexOf('p-value'), 1),
    ...perTerm('95% CI low', reference.ciLow, 'INTERVALS', 0),
    ...perTerm('95% CI high', reference.ciHigh, 'INTERVALS', 1),
    ...fitStatsChecks(reference),
    // Row names each used row by its worksheet row, so these also show which rows were skipped.
    ...reference.usedRows.map((position, i) => ({
      label: `Used row ${i + 1} of ${used}: worksheet row`,
      expected: worksheetRowOf(position - 1) + 1,
      block: 'RESIDUALS',
      row: 1 + i,
      column: rowColumn,
      count: true,
    })),
  ];
  const skipped = reference.rows.flatMap((r, i) => (r.some((c) => c === null || typeof c === 'object') ? [worksheetRowOf(i) + 1] : []));
  return {
    name: TOOTH_GROWTH_SHEET,
    title: 'ToothGrowth: len ~ supp + dose, with blank and #N/A cells',
    notes: [
      "Data: ToothGrowth from R's datasets package (R Core Team, The R Project for Statistical Computing; source C. I. Bliss (1952), The Statistics of Bioassay; Crampton (1947), The Journal of Nutrition 33(5):491–504): odontoblast length len in 60 guinea pigs by supplement supp (OJ or VC, a text column) and dose (mg/day).",
      `Worksheet rows ${skipped.join(', ')} hold a blank or #N/A cell and must be skipped. Reference values: ${reference.computedBy} (scripts/selfCheck/toothGrowth.R), with supp coded against its first level, OJ.`,
    ],
    expectedHeading: 'Reference value (R)',
    headers: reference.columns,
    rows: reference.rows,
    blocks: [
      { functionName: 'ESTIMATES', rows: TERMS.length, columns: 1 },
      { functionName: 'STDERRORS', rows: TERMS.length, columns: 1 },
      { functionName: 'TERMS', rows: 1 + TERMS.length, columns: TERMS_HEADER.length },
      { functionName: 'INTERVALS', rows: TERMS.length, columns: 2 },
      { functionName: 'FITSTATS', rows: FIT_STATS_LABELS.length, columns: 2 },
      { functionName: 'RESIDUALS', rows: 1 + used, columns: RESIDUALS_HEADER.length },
    ],
    checks,
  };
}
