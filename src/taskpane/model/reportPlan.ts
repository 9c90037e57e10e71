import { cellAddress, columnLetters, formatAbsolute, type RangeRef } from '../../addressing/a1';
import { FIT_STATS_LABELS, type FitStatsLabel } from '../../cellGrids/fitStatsGrid';
import { QQ_HEADER } from '../../cellGrids/qqGrid';
import { RESIDUALS_HEADER } from '../../cellGrids/residualsGrid';
import type { PaneChoices, ResolvedRanges } from './choices';
import type { PaneAnalysis } from './analysis';
import { decimalsFor, fixedFormat } from '../../cellGrids/decimals';
import { fitModel } from '../../engine';
import { cautionLines, settingsRows } from './reportParts';
import { joinRuns, reportSources } from './reportSources';
import { splitUnit } from './sentences';

/** One cell the report writes. Labels are always written as text, never as formulas. */
export type ReportCell =
  | { row: number; column: number; kind: 'label'; text: string; bold?: boolean }
  | { row: number; column: number; kind: 'value'; value: number | boolean | '' }
  | { row: number; column: number; kind: 'formula'; formula: string };

export interface ReportFormat {
  range: RangeRef;
  numberFormat: string;
}

export interface ReportChart {
  name: string;
  title: string;
  x: RangeRef;
  y: RangeRef;
  xTitle: string;
  yTitle: string;
  topLeft: string;
  bottomRight: string;
}

export interface ReportPlan {
  cells: ReportCell[];
  formats: ReportFormat[];
  charts: ReportChart[];
  /** The A1 text stamped on the sheet, so a frozen copy can repeat it. */
  specification: string;
}

export const REPORT_TITLE_PREFIX = 'Plumbline report';
/** p-values: four decimals, and "<0.0001" rather than a row of zeros. */
export const P_VALUE_FORMAT = '[<0.0001]"<0.0001";0.0000';
/** The number format of each FITSTATS row, by label so that it follows the rows wherever they sit. */
const FIT_STATS_FORMATS: Record<FitStatsLabel, string> = {
  'Rows used': '0',
  'Rows skipped': '0',
  Parameters: '0',
  'Sigma-hat': 'General',
  'Residual df': '0',
  RSS: 'General',
  'R²': '0.0000',
  'Adjusted R²': '0.0000',
  'F (all slopes zero)': '0.00',
  'F numerator df': '0',
  'F denominator df': '0',
  'p-value of F': P_VALUE_FORMAT,
  'Log-likelihood': '0.00',
  AIC: '0.00',
  BIC: '0.00',
};
/** The live report's own statements about itself, which a frozen copy rewrites (excel/freezeCopy.ts). */
export const LIVE_NOTE = 'Every number below is a live formula over those cells.';
export const LIVE_SETTINGS_HEADING = 'Settings: edit these cells and every result below recalculates';
export const LIVE_QQ_LABEL = 'Normal Q–Q points (live)';
const EQUATION_NOTE = 'Each coefficient rounded to about three significant digits of its standard error; the Estimates in the next table carry every digit.';
export const SETTINGS_CELLS = { level: '$B$5', intercept: '$B$6', knownSigma: '$B$7', robust: '$B$8' } as const;

/** Column T: the normal Q–Q points (T:V), right of the charts. */
const QQ_COLUMN = 19;
/** Charts sit over columns K:R, one below the other, 19 rows apart. */
const CHART_LEFT = 10;
const CHART_RIGHT = 17;
const CHART_STRIDE = 19;

/** A column of PLUMB.RESIDUALS' table by its header, so the charts follow the table's layout. */
function residualsColumn(header: string): number {
  const column = RESIDUALS_HEADER.indexOf(header);
  if (column < 0) throw new Error(`unreachable: the residual table has no "${header}" column`);
  return column;
}

function qqColumn(header: string): number {
  const column = QQ_HEADER.indexOf(header);
  if (column < 0) throw new Error(`unreachable: the Q–Q table has no "${header}" column`);
  return QQ_COLUMN + column;
}

/**
 * The decimals of the term table's estimate, standard error and interval columns, one count per
 * column so that it suits whichever term a row shows: editing the intercept cell moves every term
 * up or down a row. It is the most any term needs in either intercept setting, so each row shows
 * at least three significant digits of its standard error. The other setting is fitted on the
 * same coded columns; with a categorical column PLUMB.TERMS then codes one level more, whose
 * standard error is on the scale of the intercept's.
 */
function termDecimals({ frame, fit, settings }: PaneAnalysis): number {
  const standardErrors = (fit?.terms ?? []).map((t) => t.standardError);
  try {
    standardErrors.push(...fitModel(frame.data, { ...settings, intercept: !settings.intercept }).terms.map((t) => t.standardError));
  } catch {
    // The other setting cannot be fitted (too few rows for one more parameter): the current one decides.
  }
  return Math.max(2, ...standardErrors.map(decimalsFor));
}

export interface PlanInput {
  sheetName: string;
  ranges: ResolvedRanges;
  choices: PaneChoices;
  analysis: PaneAnalysis;
  writtenAt: Date;
}

/**
 * Which standard errors each section uses, said beside it: only the terms follow the robust
 * setting; σ̂, the F tests and prediction intervals are classical whatever it says.
 */
export const STANDARD_ERRORS_NOTE = {
  terms: `Standard errors: those set in ${SETTINGS_CELLS.robust.replace(/\$/g, '')} (classical or robust).`,
  classical: `Classical standard errors, whatever ${SETTINGS_CELLS.robust.replace(/\$/g, '')} sets: robust ones change only the terms' table.`,
  checks: 'The checks use the residuals, not the standard errors.',
} as const;

/** The whole report sheet as data: written by one adapter, checked by tests without Excel. */
export function planReport({ sheetName, ranges, choices, analysis, writtenAt }: PlanInput): ReportPlan {
  const cells: ReportCell[] = [];
  const formats: ReportFormat[] = [];
  const charts: ReportChart[] = [];
  const at = (row: number, column: number): RangeRef => ({ sheet: sheetName, top: row, left: column, bottom: row, right: column });
  const block = (top: number, left: number, rows: number, columns: number): RangeRef => ({
    sheet: sheetName,
    top,
    left,
    bottom: top + rows - 1,
    right: left + columns - 1,
  });
  const label = (row: number, column: number, text: string, bold = false) => cells.push({ row, column, kind: 'label', text, bold });

  const { frame, fit } = analysis;
  const l = reportSources(sheetName, ranges, choices.added);
  // Weights sit between σ and the robust option; without them the argument is left empty.
  const weights = ranges.weights === undefined ? '' : formatAbsolute(ranges.weights);
  const settings = `${SETTINGS_CELLS.level}, ${SETTINGS_CELLS.intercept}, ${SETTINGS_CELLS.knownSigma}, ${weights}, ${SETTINGS_CELLS.robust}`;
  const predictorText = joinRuns(ranges.predictorColumns).map(formatAbsolute).join(', ');
  // The weights range is written into every formula, so it belongs with the data, not with the cells to edit.
  const weightsText =
    ranges.weights === undefined ? 'no weights' : `weights ${formatAbsolute(ranges.weights)} (fixed in this report: write a new one to change them)`;
  const specification = `${frame.responseName} from ${l.y}; predictors ${predictorText}; ${weightsText}`;
  const date = writtenAt.toISOString().slice(0, 10);

  label(0, 0, `${REPORT_TITLE_PREFIX}: ${frame.responseName}`, true);
  label(1, 0, `Written ${date}. ${specification}. ${LIVE_NOTE}`);
  label(3, 0, LIVE_SETTINGS_HEADING, true);
  cells.push(
    ...settingsRows(4, {
      level: choices.level,
      intercept: choices.intercept,
      knownSigma: analysis.settings.knownSigma,
      standardErrors: { label: 'Standard errors (classical, HC3, HC1 or HC0)', value: choices.robust },
    }),
  );

  label(10, 0, 'The model', true);
  // A live formula, so the equation follows the settings cells and the data as the tables do.
  cells.push({ row: 11, column: 0, kind: 'formula', formula: `=PLUMB.EQUATION(${l.y}, ${l.x}, ${settings})` });
  label(12, 0, EQUATION_NOTE);

  let row = 14;
  const termRows = frame.termNames.length;
  // Formats reach one row past the table: the other intercept setting can show one term more.
  const formattedRows = termRows + 1;
  label(row, 0, 'Which terms matter?', true);
  label(row, 1, `A term is clear of zero when its interval excludes 0; roughly, when |estimate| > 2 × std error. ${STANDARD_ERRORS_NOTE.terms}`);
  cells.push({ row: row + 1, column: 0, kind: 'formula', formula: `=PLUMB.TERMS(${l.y}, ${l.x}, ${settings})` });
  const estimateFormat = fixedFormat(termDecimals(analysis));
  for (const c of [1, 2, 5, 6]) formats.push({ range: block(row + 2, c, formattedRows, 1), numberFormat: estimateFormat });
  formats.push({ range: block(row + 2, 3, formattedRows, 1), numberFormat: '0.00' });
  formats.push({ range: block(row + 2, 4, formattedRows, 1), numberFormat: P_VALUE_FORMAT });
  formats.push({ range: block(row + 2, 7, formattedRows, 1), numberFormat: '0.0' });
  row += termRows + 4;

  label(row, 0, 'How well does it fit?', true);
  label(row, 1, STANDARD_ERRORS_NOTE.classical);
  cells.push({ row: row + 1, column: 0, kind: 'formula', formula: `=PLUMB.FITSTATS(${l.y}, ${l.x}, ${settings})` });
  FIT_STATS_LABELS.forEach((name, i) => formats.push({ range: at(row + 1 + i, 1), numberFormat: FIT_STATS_FORMATS[name] }));
  row += FIT_STATS_LABELS.length + 3;

  if (l.added !== undefined) {
    label(row, 0, `Does ${analysis.addedNames.join(', ')} add anything?`, true);
    label(row, 1, STANDARD_ERRORS_NOTE.classical);
    cells.push({ row: row + 1, column: 0, kind: 'formula', formula: `=PLUMB.NESTEDF(${l.y}, ${l.base}, ${l.added}, ${settings})` });
    ['0.00', '0', '0', P_VALUE_FORMAT, '0.00', 'General', 'General'].forEach((f, i) => formats.push({ range: at(row + 1 + i, 1), numberFormat: f }));
    row += 11;
  }

  if (ranges.newRows !== undefined && l.newRows !== undefined) {
    const newRows = ranges.newRows[0];
    label(row, 0, 'What to expect for new cases', true);
    label(row, 1, `Mean: where the average of many such cases should lie. New: where one new case should fall. ${STANDARD_ERRORS_NOTE.classical}`);
    cells.push({ row: row + 1, column: 0, kind: 'formula', formula: `=PLUMB.PREDICT(${l.y}, ${l.x}, ${l.newRows}, ${settings})` });
    const decimals = fixedFormat(decimalsFor(fit?.sigma ?? 1));
    formats.push({ range: block(row + 1, 0, newRows.bottom - newRows.top + 2, 5), numberFormat: decimals });
    row += newRows.bottom - newRows.top + 5;
  }

  // The tables spill one line per row used; the charts cover every data row, so a later edit that
  // brings a skipped row back still shows, and lines the tables leave empty are gaps.
  const dataRows = ranges.response.bottom - ranges.response.top + 1 - (frame.hasHeader ? 1 : 0);

  label(row, 0, 'Can these numbers be trusted?', true);
  label(row, 1, `Each check is read at 1 − level. The charts on the right show the same residuals. ${STANDARD_ERRORS_NOTE.checks}`);
  cells.push({ row: row + 1, column: 0, kind: 'formula', formula: `=PLUMB.CHECKS(${l.y}, ${l.x}, ${settings})` });
  row += 22;

  label(row, 0, 'Cautions', true);
  cautionLines(
    'Standard errors, intervals and p-values assume independent errors with constant variance, roughly normal, and no single row steering the fit: read the checks and the charts before relying on them.',
  ).forEach((text, i) => label(row + 1 + i, 0, text));
  row += 5;

  label(row, 0, 'Every row used, with its residual and flags (high leverage: h > 2p/n; outlier: |studentized| > 3; influential: Cook > 4/n)', true);
  const residualsTop = row + 1;
  cells.push({ row: residualsTop, column: 0, kind: 'formula', formula: `=PLUMB.RESIDUALS(${l.y}, ${l.x}, ${settings})` });
  const residuals = (header: string) => block(residualsTop + 1, residualsColumn(header), dataRows, 1);

  const qqTop = 3;
  label(qqTop - 1, QQ_COLUMN, LIVE_QQ_LABEL);
  cells.push({ row: qqTop, column: QQ_COLUMN, kind: 'formula', formula: `=PLUMB.QQPOINTS(${l.y}, ${l.x}, ${settings})` });
  const qq = (header: string) => block(qqTop + 1, qqColumn(header), dataRows, 1);

  // Every chart reads PLUMB results only: they skip blank and #N/A rows as the fit does, where
  // a plain reference to the data would chart each blank as 0.
  const response = splitUnit(frame.responseName).name.toLowerCase();
  const place = (index: number) => ({
    topLeft: cellAddress(3 + index * CHART_STRIDE, CHART_LEFT),
    bottomRight: cellAddress(20 + index * CHART_STRIDE, CHART_RIGHT),
  });
  charts.push({
    name: 'ObservedVsFitted',
    title: `Observed vs fitted ${response}`,
    x: residuals('Fitted'),
    y: residuals('Observed'),
    xTitle: 'Fitted',
    yTitle: 'Observed',
    ...place(0),
  });
  charts.push({
    name: 'ResidualsVsFitted',
    title: 'Residuals vs fitted: look for curves, funnels and lone points',
    x: residuals('Fitted'),
    y: residuals('Residual'),
    xTitle: 'Fitted',
    yTitle: 'Residual',
    ...place(1),
  });
  charts.push({
    name: 'NormalQQ',
    title: 'Normal Q–Q of studentized residuals: a straight line means roughly normal',
    x: qq('Normal quantile'),
    y: qq('Studentized residual'),
    xTitle: 'Normal quantile',
    yTitle: 'Studentized residual',
    ...place(2),
  });
  charts.push({
    name: 'CooksDistance',
    title: "Cook's distance by row: tall points steer the fit",
    x: residuals('Row'),
    y: residuals("Cook's distance"),
    xTitle: 'Row',
    yTitle: "Cook's distance",
    ...place(3),
  });

  for (const { areas, block: gathered } of l.gathers) {
    cells.push({ row: gathered.top, column: gathered.left, kind: 'formula', formula: `=PLUMB.GATHER(${areas.map(formatAbsolute).join(', ')})` });
    label(
      gathered.top,
      gathered.left - 1,
      `Gathered at the data's own rows (${columnLetters(gathered.left)} onwards): ${areas.map(formatAbsolute).join(', ')}`,
    );
  }

  return { cells, formats, charts, specification };
}
