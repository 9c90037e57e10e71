import { formatAbsolute } from '../../addressing/a1';
import { fittedEquation } from '../../cellGrids/equationGrid';
import { nestedGrid } from '../../cellGrids/nestedGrid';
import { decimalsFor, formatCount } from '../../presentation';
import type { PaneChoices, ResolvedRanges } from './choices';
import type { PaneAnalysis } from './paneAnalysis';
import { stackSections, type ReportSection } from './reportLayout';
import type { ReportPlan } from './reportPlan';
import {
  cautionsSection,
  fitSection,
  leftOutSection,
  modelSection,
  nestedSection,
  predictionsSection,
  REFRESH_NOTE,
  REPORT_TITLE_PREFIX,
  settingsSection,
  termsSection,
  titleSection,
  valuesStandardErrorsNote,
} from './reportSections';

export interface ValuesPlanInput {
  sheetName: string;
  ranges: ResolvedRanges;
  choices: PaneChoices;
  analysis: PaneAnalysis;
  writtenAt: Date;
}

export function valuesNote(dataRows: number): string {
  return (
    `These results are values, not live formulas: the data (${formatCount(dataRows)} rows) exceed what a cell function can receive in one call (about 5 MB). ` +
    REFRESH_NOTE
  );
}

export const LEFT_OUT_NOTE =
  'The fitted value and residual of every row are in the table on the right, computed block by block. Left out for data this large: leverage and the flags, ' +
  'the checks (Durbin–Watson, Breusch–Pagan, Shapiro–Wilk, the outlier test, lack of fit, Cook’s distance) and the charts, which need every row in memory at once; fit a live report on a subset of the rows to see them.';

/** Said beside the predictions when the fit's rows were not there to judge hidden extrapolation. */
export const HIDDEN_NOT_CHECKED = 'Hidden extrapolation (a mix of values unlike the data) was not checked: it needs every row at once.';

/**
 * The values report: the same sections as the live report (reportSections.ts), written from the
 * pane's analysis as values, with the settings they were computed with and a note that says why
 * they are values and how to bring them up to date.
 */
export function planValuesReport({ sheetName, ranges, choices, analysis, writtenAt }: ValuesPlanInput): ReportPlan {
  const { fit } = analysis;
  if (fit === undefined) throw new Error(analysis.fitError ?? 'There is no fit to report.');
  const dataRows = analysis.source === 'streamed' ? analysis.dataRows : analysis.rowsUsed + analysis.rowsSkipped;
  const predictorText = ranges.predictorColumns.map(formatAbsolute).join(', ');
  const specification = `${analysis.responseName} from ${formatAbsolute(ranges.response)}; predictors ${predictorText}`;
  const notes = valuesStandardErrorsNote(fit.covarianceKind);
  const sections: ReportSection[] = [
    titleSection(sheetName, [
      { text: `${REPORT_TITLE_PREFIX}: ${analysis.responseName}`, bold: true },
      { text: `Written ${writtenAt.toISOString().slice(0, 10)}. ${specification}.`, bold: false },
      { text: valuesNote(dataRows), bold: true },
    ]),
    settingsSection(sheetName, 'values', {
      level: choices.level,
      intercept: choices.intercept,
      knownSigma: analysis.settings.knownSigma,
      robust: fit.covarianceKind,
      weights: ranges.weights === undefined ? undefined : formatAbsolute(ranges.weights),
    }),
    modelSection(sheetName, {
      kind: 'values',
      values: {
        equation: fittedEquation(analysis.responseName, fit),
      },
    }),
    termsSection(sheetName, notes.terms, { kind: 'values', values: { fit } }),
    fitSection(sheetName, notes.classical, { kind: 'values', values: { fit, skipped: analysis.rowsSkipped } }),
  ];
  if (analysis.nested !== undefined || analysis.nestedError !== undefined) {
    sections.push(
      nestedSection(sheetName, analysis.addedNames, notes.classical, {
        kind: 'values',
        values: analysis.nested !== undefined ? { grid: nestedGrid(analysis.nested) } : { problem: analysis.nestedError ?? '' },
      }),
    );
  }
  if (analysis.predictionError !== undefined) throw new Error(analysis.predictionError);
  if (ranges.newRows !== undefined) {
    const hidden = analysis.source === 'streamed' ? ` ${HIDDEN_NOT_CHECKED}` : '';
    sections.push(
      predictionsSection(sheetName, `${notes.classical} Rows with a blank are left blank.${hidden}`, decimalsFor(fit.sigma), {
        kind: 'values',
        values: { predictions: analysis.predictions },
      }),
    );
  }
  if (analysis.source === 'streamed') sections.push(leftOutSection(sheetName, [LEFT_OUT_NOTE]));
  sections.push(
    cautionsSection(
      sheetName,
      'Standard errors, intervals and p-values assume independent errors with constant variance, roughly normal: with this many rows they are narrow, and only as good as those assumptions.',
    ),
  );
  const { cells, formats } = stackSections(sections);
  return { cells, formats, charts: [], specification };
}
