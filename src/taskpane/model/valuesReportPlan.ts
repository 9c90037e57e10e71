import { formatAbsolute } from '../../addressing/a1';
import { FIT_STATS_LABELS, fitStatsRows } from '../../cellGrids/fitStatsGrid';
import type { Grid } from '../../cellGrids/gridCell';
import { nestedGrid } from '../../cellGrids/nestedGrid';
import { predictGrid } from '../../cellGrids/predictGrid';
import { termsGrid } from '../../cellGrids/termsGrid';
import type { PaneChoices, ResolvedRanges } from './choices';
import { decimalsFor, fixedFormat } from '../../cellGrids/decimals';
import { P_VALUE_FORMAT, REPORT_TITLE_PREFIX, type ReportCell, type ReportFormat, type ReportPlan } from './reportPlan';
import { cautionLines, modelEquation, settingsRows } from './reportParts';
import type { StreamedAnalysis } from './streamedAnalysis';
import type { StreamedPredictions } from './streamedPredict';

export interface ValuesPlanInput {
  sheetName: string;
  ranges: ResolvedRanges;
  choices: PaneChoices;
  analysis: StreamedAnalysis;
  predictions: StreamedPredictions | undefined;
  /** Data rows in the chosen ranges, header excluded. */
  dataRows: number;
  writtenAt: Date;
}

export function valuesNote(dataRows: number): string {
  return (
    `These results are values, not live formulas: the data (${dataRows.toLocaleString('en-US')} rows) exceed what a cell function can receive in one call (about 5 MB). ` +
    'Use Refresh in the Plumbline pane after the data change.'
  );
}

export const LEFT_OUT_NOTE =
  'The fitted value and residual of every row are in the table on the right, computed block by block. Left out for data this large: leverage and the flags, ' +
  'the checks (Durbin–Watson, Breusch–Pagan, Jarque–Bera, Cook’s distance) and the charts, which need every row in memory at once; fit a live report on a subset of the rows to see them.';

/**
 * The report of a streamed fit, all as values: the same tables as the live report (built by the
 * same grid modules the cell functions use), the settings they were computed with, and a note
 * that says why they are values and how to bring them up to date.
 */
export function planValuesReport({ sheetName, ranges, choices, analysis, predictions, dataRows, writtenAt }: ValuesPlanInput): ReportPlan {
  const cells: ReportCell[] = [];
  const formats: ReportFormat[] = [];
  const label = (row: number, column: number, text: string, bold = false) => cells.push({ row, column, kind: 'label', text, bold });
  const put = (top: number, grid: Grid) =>
    grid.forEach((line, i) =>
      line.forEach((v, j) => (typeof v === 'number' ? cells.push({ row: top + i, column: j, kind: 'value', value: v }) : label(top + i, j, v))),
    );
  const cell = (row: number, column: number) => ({ sheet: sheetName, top: row, left: column, bottom: row, right: column });
  const { fit, header } = analysis;
  if (fit === undefined) throw new Error(analysis.fitError ?? 'There is no fit to report.');

  const predictorText = ranges.predictorColumns.map(formatAbsolute).join(', ');
  const specification = `${header.responseName} from ${formatAbsolute(ranges.response)}; predictors ${predictorText}`;
  label(0, 0, `${REPORT_TITLE_PREFIX}: ${header.responseName}`, true);
  label(1, 0, `Written ${writtenAt.toISOString().slice(0, 10)}. ${specification}.`);
  label(2, 0, valuesNote(dataRows), true);

  label(4, 0, 'Settings used (change them in the pane, then Refresh)', true);
  cells.push(
    ...settingsRows(5, {
      level: choices.level,
      intercept: choices.intercept,
      knownSigma: analysis.settings.knownSigma,
      // Robust errors need every row at once, so a streamed fit is always classical.
      standardErrors: { label: 'Standard errors', value: 'classical' },
      weights: ranges.weights === undefined ? 'none' : formatAbsolute(ranges.weights),
    }),
  );

  label(11, 0, 'The model', true);
  label(
    12,
    0,
    modelEquation(
      header.responseName,
      fit.terms.map((t) => t.name),
      choices.intercept,
    ),
  );

  let row = 14;
  label(row, 0, 'Which terms matter?', true);
  label(row, 1, 'A term is clear of zero when its interval excludes 0; roughly, when |estimate| > 2 × std error.');
  put(row + 1, termsGrid(fit));
  fit.terms.forEach((t, i) => {
    for (const c of [1, 2, 5, 6]) formats.push({ range: cell(row + 2 + i, c), numberFormat: fixedFormat(decimalsFor(t.standardError)) });
    formats.push({ range: cell(row + 2 + i, 4), numberFormat: P_VALUE_FORMAT });
  });
  row += fit.terms.length + 4;

  label(row, 0, 'How well does it fit?', true);
  put(row + 1, fitStatsRows(fit, analysis.skipped));
  formats.push({ range: cell(row + 1 + FIT_STATS_LABELS.indexOf('p-value of F'), 1), numberFormat: P_VALUE_FORMAT });
  row += FIT_STATS_LABELS.length + 3;

  if (analysis.nested !== undefined || analysis.nestedError !== undefined) {
    label(row, 0, `Does ${analysis.addedNames.join(', ')} add anything?`, true);
    if (analysis.nested !== undefined) put(row + 1, nestedGrid(analysis.nested));
    else label(row + 1, 0, analysis.nestedError ?? '');
    row += 11;
  }

  if (predictions !== undefined) {
    label(row, 0, 'What to expect for new cases', true);
    label(row, 1, 'Mean: where the average of many such cases should lie. New: where one new case should fall. Rows with a blank are left blank.');
    const grid = predictGrid(predictions.predictions, true);
    put(row + 1, grid);
    row += grid.length + 3;
  }

  label(row, 0, 'Left out', true);
  label(row + 1, 0, LEFT_OUT_NOTE);
  row += 3;
  label(row, 0, 'Cautions', true);
  cautionLines(
    'Standard errors, intervals and p-values assume independent errors with constant variance, roughly normal: with this many rows they are narrow, and only as good as those assumptions.',
  ).forEach((text, i) => label(row + 1 + i, 0, text));

  return { cells, formats, charts: [], specification };
}
