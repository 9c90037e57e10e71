import { cellAddress, columnLetters, formatAbsolute, type RangeRef } from '../../addressing/a1';
import type { PaneChoices, ResolvedRanges } from './choices';
import type { PaneAnalysis } from './analysis';
import { cautionLines, modelEquation, settingsRows } from './reportParts';
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
export const SETTINGS_CELLS = { level: '$B$5', intercept: '$B$6', knownSigma: '$B$7', robust: '$B$8' } as const;

const CHART_DATA_COLUMN = 19; // T: observed, then U..Y: fitted rows from PREDICT
const QQ_COLUMN = 26; // AA..AC: the normal Q–Q points
const GATHER_COLUMN = 36; // AK..: predictor columns gathered when they are not one block

interface Layout {
  y: string;
  x: string;
  base: string;
  added: string | undefined;
  gathered: { column: number; source: RangeRef }[];
}

function sameBlock(columns: RangeRef[]): boolean {
  return columns.every((c, j) => j === 0 || (c.sheet === columns[0].sheet && c.left === columns[0].left + j));
}

/**
 * Formulas read the data directly when the predictors are one block with any added set at its
 * right end; otherwise the report first gathers the columns, base ones then added ones, with plain
 * reference formulas, so every PLUMB formula still reads one contiguous, live range.
 */
function layout(sheet: string, ranges: ResolvedRanges, added: readonly number[]): Layout {
  const columns = ranges.predictorColumns;
  const k = added.length;
  const addedAtEnd = added.every((j) => j >= columns.length - k);
  const y = formatAbsolute(ranges.response);
  const block = (cols: RangeRef[]): RangeRef => ({ ...cols[0], right: cols[cols.length - 1].right });
  if (sameBlock(columns) && addedAtEnd) {
    return {
      y,
      x: formatAbsolute(block(columns)),
      base: formatAbsolute(block(columns.slice(0, columns.length - k))),
      added: k > 0 ? formatAbsolute(block(columns.slice(columns.length - k))) : undefined,
      gathered: [],
    };
  }
  const order = columns.map((_, j) => j).sort((a, b) => Number(added.includes(a)) - Number(added.includes(b)));
  const rows = ranges.response.bottom - ranges.response.top;
  const here = (left: number, right: number): RangeRef => ({ sheet, top: 0, bottom: rows, left, right });
  const n = columns.length;
  return {
    y,
    x: formatAbsolute(here(GATHER_COLUMN, GATHER_COLUMN + n - 1)).replace(/^.*!/, ''),
    base: formatAbsolute(here(GATHER_COLUMN, GATHER_COLUMN + n - k - 1)).replace(/^.*!/, ''),
    added: k > 0 ? formatAbsolute(here(GATHER_COLUMN + n - k, GATHER_COLUMN + n - 1)).replace(/^.*!/, '') : undefined,
    gathered: order.map((j, position) => ({ column: GATHER_COLUMN + position, source: columns[j] })),
  };
}

/** Decimals that show a quantity to about three significant digits of its standard error. */
export function decimalsFor(standardError: number): number {
  if (!(standardError > 0) || !Number.isFinite(standardError)) return 4;
  return Math.min(10, Math.max(2, 2 - Math.floor(Math.log10(standardError))));
}

const fixed = (decimals: number): string => (decimals <= 0 ? '0' : `0.${'0'.repeat(decimals)}`);

export interface PlanInput {
  sheetName: string;
  ranges: ResolvedRanges;
  choices: PaneChoices;
  analysis: PaneAnalysis;
  writtenAt: Date;
}

/** The whole report sheet as data: written by one adapter, checked by tests without Excel. */
export function planReport({ sheetName, ranges, choices, analysis, writtenAt }: PlanInput): ReportPlan {
  const cells: ReportCell[] = [];
  const formats: ReportFormat[] = [];
  const charts: ReportChart[] = [];
  const at = (row: number, column: number): RangeRef => ({ sheet: sheetName, top: row, left: column, bottom: row, right: column });
  const block = (top: number, left: number, rows: number, columns: number): RangeRef => ({ sheet: sheetName, top, left, bottom: top + rows - 1, right: left + columns - 1 });
  const label = (row: number, column: number, text: string, bold = false) => cells.push({ row, column, kind: 'label', text, bold });

  const { frame, fit } = analysis;
  const l = layout(sheetName, ranges, choices.added);
  // Weights sit between σ and the robust option; without them the argument is left empty.
  const weights = ranges.weights === undefined ? '' : formatAbsolute(ranges.weights);
  const settings = `${SETTINGS_CELLS.level}, ${SETTINGS_CELLS.intercept}, ${SETTINGS_CELLS.knownSigma}, ${weights}, ${SETTINGS_CELLS.robust}`;
  const predictorText = sameBlock(ranges.predictorColumns)
    ? formatAbsolute({ ...ranges.predictorColumns[0], right: ranges.predictorColumns[ranges.predictorColumns.length - 1].right })
    : ranges.predictorColumns.map(formatAbsolute).join(', ');
  const specification = `${frame.responseName} from ${l.y}; predictors ${predictorText}`;
  const date = writtenAt.toISOString().slice(0, 10);

  label(0, 0, `${REPORT_TITLE_PREFIX}: ${frame.responseName}`, true);
  label(1, 0, `Written ${date}. ${specification}. Every number below is a live formula over those cells.`);
  label(3, 0, 'Settings: edit these cells and every result below recalculates', true);
  cells.push(
    ...settingsRows(4, {
      level: choices.level,
      intercept: choices.intercept,
      knownSigma: analysis.settings.knownSigma,
      standardErrors: { label: 'Standard errors (classical, HC3, HC1 or HC0)', value: choices.robust },
      weights: ranges.weights === undefined ? 'none' : formatAbsolute(ranges.weights),
    }),
  );

  label(10, 0, 'The model', true);
  label(11, 0, modelEquation(frame.responseName, frame.termNames, choices.intercept));
  label(12, 0, 'The b values are the Estimates in the next table, in the same order.');

  let row = 14;
  const termRows = frame.termNames.length;
  label(row, 0, 'Which terms matter?', true);
  label(row, 1, 'A term is clear of zero when its interval excludes 0; roughly, when |estimate| > 2 × std error.');
  cells.push({ row: row + 1, column: 0, kind: 'formula', formula: `=PLUMB.TERMS(${l.y}, ${l.x}, ${settings})` });
  (fit?.terms ?? []).forEach((t, i) => {
    const decimals = fixed(decimalsFor(t.standardError));
    for (const c of [1, 2, 5, 6]) formats.push({ range: at(row + 2 + i, c), numberFormat: decimals });
  });
  formats.push({ range: block(row + 2, 3, termRows, 1), numberFormat: '0.00' });
  formats.push({ range: block(row + 2, 4, termRows, 1), numberFormat: P_VALUE_FORMAT });
  formats.push({ range: block(row + 2, 7, termRows, 1), numberFormat: '0.0' });
  row += termRows + 4;

  label(row, 0, 'How well does it fit?', true);
  cells.push({ row: row + 1, column: 0, kind: 'formula', formula: `=PLUMB.FITSTATS(${l.y}, ${l.x}, ${settings})` });
  const statFormats = ['0', '0', '0', '0', 'General', 'General', '0.0000', '0.0000', '0.00', P_VALUE_FORMAT, '0.00', '0.00', '0.00'];
  statFormats.forEach((f, i) => formats.push({ range: at(row + 1 + i, 1), numberFormat: f }));
  row += statFormats.length + 3;

  if (l.added !== undefined) {
    label(row, 0, `Does ${analysis.addedNames.join(', ')} add anything?`, true);
    cells.push({ row: row + 1, column: 0, kind: 'formula', formula: `=PLUMB.NESTEDF(${l.y}, ${l.base}, ${l.added}, ${settings})` });
    ['0.00', '0', '0', P_VALUE_FORMAT, '0.00', 'General', 'General'].forEach((f, i) => formats.push({ range: at(row + 1 + i, 1), numberFormat: f }));
    row += 11;
  }

  if (ranges.newRows !== undefined) {
    const newRows = ranges.newRows[0];
    label(row, 0, 'What to expect for new cases', true);
    label(row, 1, 'Mean: where the average of many such cases should lie. New: where one new case should fall.');
    cells.push({ row: row + 1, column: 0, kind: 'formula', formula: `=PLUMB.PREDICT(${l.y}, ${l.x}, ${formatAbsolute(newRows)}, ${settings})` });
    const decimals = fixed(decimalsFor(fit?.sigma ?? 1));
    formats.push({ range: block(row + 1, 0, newRows.bottom - newRows.top + 2, 5), numberFormat: decimals });
    row += newRows.bottom - newRows.top + 5;
  }

  const dataRows = ranges.response.bottom - ranges.response.top + 1;
  const first = frame.hasHeader ? 1 : 0;
  const usedRows = dataRows - first;

  label(row, 0, 'Can these numbers be trusted?', true);
  label(row, 1, 'Each check is read at 1 − level. The charts on the right show the same residuals.');
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
  const residualColumn = (offset: number) => block(residualsTop + 1, offset, usedRows, 1);

  const chartTop = 3;
  label(chartTop - 1, CHART_DATA_COLUMN, 'Chart data (live): observed and fitted for every data row');
  cells.push({ row: chartTop, column: CHART_DATA_COLUMN, kind: 'formula', formula: `=${l.y}` });
  cells.push({ row: chartTop, column: CHART_DATA_COLUMN + 1, kind: 'formula', formula: `=PLUMB.PREDICT(${l.y}, ${l.x}, ${l.x}, ${settings})` });
  label(chartTop - 1, QQ_COLUMN, 'Normal Q–Q points (live)');
  cells.push({ row: chartTop, column: QQ_COLUMN, kind: 'formula', formula: `=PLUMB.QQPOINTS(${l.y}, ${l.x}, ${settings})` });

  const response = splitUnit(frame.responseName).name.toLowerCase();
  const place = (index: number) => ({ topLeft: cellAddress(3 + index * 19, 10), bottomRight: cellAddress(20 + index * 19, 17) });
  charts.push({
    name: 'ObservedVsFitted',
    title: `Observed vs fitted ${response}`,
    x: block(chartTop + first, CHART_DATA_COLUMN + 1, usedRows, 1),
    y: block(chartTop + first, CHART_DATA_COLUMN, usedRows, 1),
    xTitle: 'Fitted',
    yTitle: 'Observed',
    ...place(0),
  });
  charts.push({ name: 'ResidualsVsFitted', title: 'Residuals vs fitted: look for curves, funnels and lone points', x: residualColumn(1), y: residualColumn(2), xTitle: 'Fitted', yTitle: 'Residual', ...place(1) });
  charts.push({
    name: 'NormalQQ',
    title: 'Normal Q–Q of studentized residuals: a straight line means roughly normal',
    x: block(chartTop + 1, QQ_COLUMN, usedRows, 1),
    y: block(chartTop + 1, QQ_COLUMN + 1, usedRows, 1),
    xTitle: 'Normal quantile',
    yTitle: 'Studentized residual',
    ...place(2),
  });
  charts.push({ name: 'CooksDistance', title: "Cook's distance by row: tall points steer the fit", x: residualColumn(0), y: residualColumn(6), xTitle: 'Row', yTitle: "Cook's distance", ...place(3) });

  for (const g of l.gathered) {
    cells.push({ row: 0, column: g.column, kind: 'formula', formula: `=${formatAbsolute(g.source)}` });
  }
  if (l.gathered.length > 0) label(0, GATHER_COLUMN - 1, `Model columns gathered from the data (${columnLetters(GATHER_COLUMN)} onwards)`);

  return { cells, formats, charts, specification };
}
