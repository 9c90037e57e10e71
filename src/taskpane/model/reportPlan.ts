import { columnLetters, formatAbsolute, type RangeRef } from '../../addressing/a1';
import { QQ_HEADER } from '../../cellGrids/qqGrid';
import { RESIDUALS_HEADER } from '../../cellGrids/residualsGrid';
import type { PaneChoices, ResolvedRanges } from './choices';
import type { CellsAnalysis } from './paneAnalysis';
import { decimalsFor, SCREENS_TEXT } from '../../presentation';
import { COVARIANCE_KINDS, fitModel } from '../../engine';
import { type ReportChartPlan, planReportCharts } from './reportCharts';
import { type ReportCell, type ReportFormat, type ReportSection, SectionWriter, stackSections, stackTops } from './reportLayout';
import {
  cautionsSection,
  checksSection,
  fitSection,
  LIVE_NOTE,
  LIVE_QQ_LABEL,
  type LiveLabel,
  modelSection,
  nestedSection,
  predictionsSection,
  REPORT_TITLE_PREFIX,
  settingsCellsAt,
  settingsSection,
  spillSection,
  standardErrorsNote,
  termsSection,
  titleSection,
} from './reportSections';
import { joinRuns, reportSources } from './reportSources';

export type { ReportCell, ReportFormat } from './reportLayout';
export { LIVE_NOTE, LIVE_QQ_LABEL, LIVE_SETTINGS_HEADING, REPORT_TITLE_PREFIX } from './reportSections';

export interface ReportPlan {
  cells: ReportCell[];
  formats: ReportFormat[];
  charts: ReportChartPlan[];
  /** The A1 text stamped on the sheet, so a frozen copy can repeat it. */
  specification: string;
}

/** Column T: the guide lines' block, then the normal Q–Q points (T:V), right of the charts. */
const RIGHT_COLUMN = 19;
/** Charts sit over columns K:R, one below the other, from row 4. */
const CHART_LEFT = 10;
const CHART_RIGHT = 17;
const CHART_TOP = 3;
const CHART_ROWS = 18;
const CHART_COUNT = 4;
/** The guide block planReportCharts writes: 3 columns, 10 rows. */
const GUIDE_ROWS = 10;

/** A column of a table by its header, so the charts follow the table's layout. */
function columnOf(headers: readonly string[], header: string): number {
  const column = headers.indexOf(header);
  if (column < 0) throw new Error(`unreachable: the table has no "${header}" column`);
  return column;
}

/**
 * The decimals of the term table's estimate, standard error and interval columns, one count per
 * column so that it suits whichever term a row shows: editing the intercept cell moves every term
 * up or down a row, and editing the Standard errors cell (classical, HC0, HC1, HC3) can shrink a
 * standard error. It is the most any term needs in any of those settings, so each row shows at
 * least three significant digits of its standard error whatever the cells are set to. The other
 * settings are fitted on the same coded columns; with a categorical column PLUMB.TERMS then codes
 * one level more without the intercept, whose standard error is on the scale of the intercept's.
 * A standard error another setting cannot give (NaN, e.g. HC3 of a term a leverage-1 row decides)
 * asks for no digits.
 */
function termDecimals({ frame, fit, settings }: CellsAnalysis): number {
  const standardErrors = (fit?.terms ?? []).map((t) => t.standardError);
  for (const intercept of [true, false]) {
    for (const covariance of COVARIANCE_KINDS) {
      try {
        const terms = fitModel(frame.data, { ...settings, intercept, covariance }).terms;
        standardErrors.push(...terms.map((t) => t.standardError).filter((se) => se > 0 && Number.isFinite(se)));
      } catch {
        // This setting cannot be fitted (too few rows for one more parameter): the others decide.
      }
    }
  }
  return Math.max(2, ...standardErrors.map(decimalsFor));
}

/**
 * One label per line PLUMB.PREDICT spills: a reference to the user's label cell (so it stays
 * live), else the worksheet row. When the new rows could not be read now, every row of the range
 * gets its worksheet row, so the labels are there once the cells are fixed.
 */
function liveLabels(analysis: CellsAnalysis, newRows: RangeRef): LiveLabel[] {
  const labelColumn = newRows.left - 1;
  if (analysis.predictionError !== undefined || analysis.predictions.length === 0) {
    return Array.from({ length: newRows.bottom - newRows.top + 1 }, (_, i) => ({ reference: undefined, text: `Row ${newRows.top + i + 1}` }));
  }
  return analysis.predictions.map((p) => ({
    reference: p.labelFromCell
      ? formatAbsolute({ sheet: newRows.sheet, top: p.sheetRow - 1, bottom: p.sheetRow - 1, left: labelColumn, right: labelColumn })
      : undefined,
    text: p.label,
  }));
}

export interface PlanInput {
  sheetName: string;
  ranges: ResolvedRanges;
  choices: PaneChoices;
  analysis: CellsAnalysis;
  writtenAt: Date;
}

/**
 * The live report as data, written by one adapter and checked by tests without Excel: its
 * sections (reportSections.ts) stacked down the left by their sizes, the charts over K:R, and the
 * charts' guide lines and the Q–Q points down column T.
 */
export function planReport({ sheetName, ranges, choices, analysis, writtenAt }: PlanInput): ReportPlan {
  const { frame, fit } = analysis;
  const l = reportSources(sheetName, ranges, choices.added);
  const predictorText = joinRuns(ranges.predictorColumns).map(formatAbsolute).join(', ');
  // The weights range is written into every formula, so it belongs with the data, not with the cells to edit.
  const weightsText =
    ranges.weights === undefined ? 'no weights' : `weights ${formatAbsolute(ranges.weights)} (fixed in this report: write a new one to change them)`;
  const specification = `${frame.responseName} from ${l.y}; predictors ${predictorText}; ${weightsText}`;

  const title = titleSection(sheetName, [
    { text: `${REPORT_TITLE_PREFIX}: ${frame.responseName}`, bold: true },
    { text: `Written ${writtenAt.toISOString().slice(0, 10)}. ${specification}. ${LIVE_NOTE}`, bold: false },
  ]);
  const settingsBlock = settingsSection(sheetName, 'live', {
    level: choices.level,
    intercept: choices.intercept,
    knownSigma: analysis.settings.knownSigma,
    robust: choices.robust,
    weights: undefined,
  });
  // The settings follow the title; every formula reads them where that puts them.
  const cells = settingsCellsAt(stackTops([title.rows, settingsBlock.rows])[1]);
  // Weights sit between σ and the robust option; without them the argument is left empty.
  const weights = ranges.weights === undefined ? '' : formatAbsolute(ranges.weights);
  const settings = `${cells.level}, ${cells.intercept}, ${cells.knownSigma}, ${weights}, ${cells.robust}`;
  const plumb = (name: string, ...data: string[]) => `=PLUMB.${name}(${[...data, settings].join(', ')})`;
  const notes = standardErrorsNote(cells.robust);
  // The tables spill one line per row used; the charts cover every data row, so a later edit that
  // brings a skipped row back still shows, and lines the tables leave empty are gaps.
  const dataRows = ranges.response.bottom - ranges.response.top + 1 - (frame.hasHeader ? 1 : 0);

  const sections: ReportSection[] = [
    title,
    settingsBlock,
    modelSection(sheetName, { kind: 'live', live: { formula: plumb('EQUATION', l.y, l.x) } }),
    termsSection(sheetName, notes.terms, {
      kind: 'live',
      live: { formula: plumb('TERMS', l.y, l.x), terms: frame.termNames.length, decimals: termDecimals(analysis) },
    }),
    fitSection(sheetName, notes.classical, { kind: 'live', live: { formula: plumb('FITSTATS', l.y, l.x) } }),
  ];
  if (l.added !== undefined) {
    sections.push(nestedSection(sheetName, analysis.addedNames, notes.classical, { kind: 'live', live: { formula: plumb('NESTEDF', l.y, l.base, l.added) } }));
  }
  if (ranges.newRows !== undefined && l.newRows !== undefined) {
    sections.push(
      predictionsSection(sheetName, notes.classical, decimalsFor(fit?.sigma ?? 1), {
        kind: 'live',
        live: { formula: plumb('PREDICT', l.y, l.x, l.newRows), labels: liveLabels(analysis, ranges.newRows[0]) },
      }),
    );
  }
  const residualsHeading = `Every row used, with its residual and screening flags (${SCREENS_TEXT})`;
  const residuals = spillSection(sheetName, residualsHeading, true, plumb('RESIDUALS', l.y, l.x), 1 + dataRows);
  sections.push(
    checksSection(sheetName, `Each check is read at 1 − level. The charts on the right show the same residuals. ${notes.checks}`, plumb('CHECKS', l.y, l.x)),
    cautionsSection(
      sheetName,
      'Standard errors, intervals and p-values assume independent errors with constant variance, roughly normal, and no single row steering the fit: read the checks and the charts before relying on them.',
    ),
    residuals,
  );
  const left = stackSections(sections);
  const residualsTop = stackTops(sections.map((s) => s.rows)).at(-1) ?? 0;

  // Down column T: the charts' guide block, then the Q–Q points.
  const [guidesTop, qqTop] = stackTops([GUIDE_ROWS, 1 + 1 + dataRows]);
  const qq = spillSection(sheetName, LIVE_QQ_LABEL, false, plumb('QQPOINTS', l.y, l.x), 1 + dataRows, RIGHT_COLUMN).write(qqTop);
  const under = (top: number, column: number): RangeRef => ({ sheet: sheetName, top: top + 2, bottom: top + 1 + dataRows, left: column, right: column });
  const residualColumn = (header: string) => under(residualsTop, columnOf(RESIDUALS_HEADER, header));
  const qqColumn = (header: string) => under(qqTop, RIGHT_COLUMN + columnOf(QQ_HEADER, header));
  const chartTops = stackTops(
    Array.from({ length: CHART_COUNT }, () => CHART_ROWS),
    CHART_TOP,
  );
  const charts = planReportCharts(
    {
      responseName: frame.responseName,
      residuals: {
        row: residualColumn('Row'),
        observed: residualColumn('Observed'),
        fitted: residualColumn('Fitted'),
        residual: residualColumn('Residual'),
        cooksDistance: residualColumn("Cook's distance"),
      },
      qq: { normalQuantile: qqColumn('Normal quantile'), studentized: qqColumn('Studentized residual') },
      dataRows: { first: ranges.response.top + 1 + (frame.hasHeader ? 1 : 0), last: ranges.response.bottom + 1 },
      now: { observed: frame.data.y, fitted: fit?.fitted ?? [] },
    },
    {
      guides: { sheet: sheetName, row: guidesTop, column: RIGHT_COLUMN },
      corners: (index) => ({
        topLeft: `${columnLetters(CHART_LEFT)}${chartTops[index] + 1}`,
        bottomRight: `${columnLetters(CHART_RIGHT)}${chartTops[index] + CHART_ROWS}`,
      }),
    },
  );

  const gathers = new SectionWriter(sheetName);
  for (const { areas, block: gathered } of l.gathers) {
    gathers.formula(gathered.top, gathered.left, `=PLUMB.GATHER(${areas.map(formatAbsolute).join(', ')})`);
    gathers.label(
      gathered.top,
      gathered.left - 1,
      `Gathered at the data's own rows (${columnLetters(gathered.left)} onwards): ${areas.map(formatAbsolute).join(', ')}`,
    );
  }

  return {
    cells: [...left.cells, ...qq.cells, ...charts.cells, ...gathers.cells],
    formats: [...left.formats, ...qq.formats],
    charts: charts.charts,
    specification,
  };
}
