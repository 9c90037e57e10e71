import { CHECKS_LABELS, type ChecksLabel } from '../../cellGrids/checksGrid';
import { FIT_STATS_LABELS, type FitStatsLabel, fitStatsRows } from '../../cellGrids/fitStatsGrid';
import { finiteOrBlank, type Grid } from '../../cellGrids/gridCell';
import { extrapolationText, PREDICT_HEADER } from '../../cellGrids/predictGrid';
import { termsGrid } from '../../cellGrids/termsGrid';
import type { ModelFit } from '../../engine';
import { decimalsFor, fixedFormat, P_VALUE_FORMAT } from '../../presentation';
import type { LabelledPrediction } from './newRowPredictions';
import { type ReportSection, SectionWriter } from './reportLayout';
import { cautionLines, settingsRows } from './reportParts';

/**
 * The sections both reports share. Each knows its size and writes itself in one of two flavours:
 * `live`, PLUMB formulas over the data and the settings cells (the size is what the formula
 * spills), or `values`, the same grid modules' numbers written as values.
 */
export type Flavour<Live, Values> = { kind: 'live'; live: Live } | { kind: 'values'; values: Values };

export const REPORT_TITLE_PREFIX = 'Plumbline report';

/** The live report's own statements about itself, which a frozen copy rewrites (excel/freezeCopy.ts). */
export const LIVE_NOTE = 'Every number below is a live formula over those cells.';
export const LIVE_SETTINGS_HEADING = 'Settings: edit these cells and every result below recalculates';
export const LIVE_QQ_LABEL = 'Normal Q–Q points (live)';
/** The values report's statements about Refresh, which a frozen copy (never refreshed) rewrites too. */
export const REFRESH_NOTE = 'Use Refresh in the Plumbline pane after the data change.';
export const VALUES_SETTINGS_HEADING = 'Settings used (change them in the pane, then Refresh)';

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
/** NESTEDF's rows in nestedGrid's order: F, df added, df residual, p, critical F, the two RSS, the reading. */
const NESTED_FORMATS = ['0.00', '0', '0', P_VALUE_FORMAT, '0.00', 'General', 'General'];
const NESTED_ROWS = 8;

/** The live settings cells every formula reads, where the settings section put them. */
export interface SettingsCells {
  level: string;
  intercept: string;
  knownSigma: string;
  robust: string;
}

/** The settings section's rows: heading, then level, intercept, σ and standard errors (the values report adds weights). */
export function settingsCellsAt(top: number): SettingsCells {
  const at = (offset: number) => `$B$${top + offset + 1}`;
  return { level: at(1), intercept: at(2), knownSigma: at(3), robust: at(4) };
}

const plain = (absolute: string) => absolute.replace(/\$/g, '');

/**
 * Which standard errors each section uses, said beside it: only the terms follow the robust
 * setting; σ̂, the F tests and prediction intervals are classical whatever it says.
 */
export function standardErrorsNote(robustCell: string | undefined) {
  const where = robustCell === undefined ? 'the pane' : plain(robustCell);
  return {
    terms: `Standard errors: those set in ${where} (classical or robust).`,
    classical: `Classical standard errors, whatever ${where} sets: robust ones change only the terms' table.`,
    checks: 'The checks use the residuals, not the standard errors.',
  };
}

/** The same notes for a values report, whose standard errors were fixed when it was written. */
export function valuesStandardErrorsNote(kind: ModelFit['covarianceKind']) {
  return {
    terms: kind === 'classical' ? 'Standard errors: classical.' : `Standard errors: robust (${kind}).`,
    classical: kind === 'classical' ? 'Classical standard errors.' : `Classical standard errors: robust (${kind}) ones change only the terms' table.`,
  };
}

export function titleSection(sheet: string, lines: { text: string; bold: boolean }[]): ReportSection {
  return {
    rows: lines.length,
    write(top) {
      const w = new SectionWriter(sheet);
      lines.forEach((line, i) => w.label(top + i, 0, line.text, line.bold));
      return w.content();
    },
  };
}

export interface SettingsInput {
  level: number;
  intercept: boolean;
  knownSigma: number | undefined;
  robust: string;
  /** Listed in the values report, which names what it used; the live report names them with its data. */
  weights: string | undefined;
}

export function settingsSection(sheet: string, flavour: 'live' | 'values', s: SettingsInput): ReportSection {
  const live = flavour === 'live';
  return {
    rows: live ? 5 : 6,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, 0, live ? LIVE_SETTINGS_HEADING : VALUES_SETTINGS_HEADING, true);
      w.cells.push(
        ...settingsRows(top + 1, {
          level: s.level,
          intercept: s.intercept,
          knownSigma: s.knownSigma,
          // Robust errors need every row at once, so a values report's streamed fit is always classical.
          standardErrors: live ? { label: 'Standard errors (classical, HC3, HC1 or HC0)', value: s.robust } : { label: 'Standard errors', value: s.robust },
          weights: live ? undefined : (s.weights ?? 'none'),
        }),
      );
      return w.content();
    },
  };
}

const EQUATION_NOTE = 'Each coefficient rounded to about three significant digits of its standard error; the Estimates in the next table carry every digit.';

/** The model: a live PLUMB.EQUATION, or the equation's text. */
export function modelSection(sheet: string, flavour: Flavour<{ formula: string }, { equation: string }>): ReportSection {
  return {
    rows: flavour.kind === 'live' ? 3 : 2,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, 0, 'The model', true);
      if (flavour.kind === 'live') {
        w.formula(top + 1, 0, flavour.live.formula);
        w.label(top + 2, 0, EQUATION_NOTE);
      } else {
        w.label(top + 1, 0, flavour.values.equation);
      }
      return w.content();
    },
  };
}

const TERMS_NOTE = 'A term is clear of zero when its interval excludes 0; roughly, when |estimate| > 2 × std error.';

/**
 * Which terms matter. Live: the formula spills a header and one row per term, and editing the
 * intercept cell can add one term, so a row more is kept and formatted; the formats go by column
 * with `decimals` that suit every term in either setting. Values: the fit's own table, each row
 * formatted for its own term.
 */
export function termsSection(
  sheet: string,
  note: string,
  flavour: Flavour<{ formula: string; terms: number; decimals: number }, { fit: ModelFit }>,
): ReportSection {
  const tableRows = flavour.kind === 'live' ? flavour.live.terms + 2 : flavour.values.fit.terms.length + 1;
  return {
    rows: 1 + tableRows,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, 0, 'Which terms matter?', true);
      w.label(top, 1, `${TERMS_NOTE}${note === '' ? '' : ` ${note}`}`);
      if (flavour.kind === 'live') {
        const { formula, terms, decimals } = flavour.live;
        w.formula(top + 1, 0, formula);
        const estimate = fixedFormat(decimals);
        for (const c of [1, 2, 5, 6]) w.format(top + 2, c, terms + 1, 1, estimate);
        w.format(top + 2, 3, terms + 1, 1, '0.00');
        w.format(top + 2, 4, terms + 1, 1, P_VALUE_FORMAT);
        w.format(top + 2, 7, terms + 1, 1, '0.0');
      } else {
        const { fit } = flavour.values;
        w.grid(top + 1, 0, termsGrid(fit));
        fit.terms.forEach((t, i) => {
          for (const c of [1, 2, 5, 6]) w.format(top + 2 + i, c, 1, 1, fixedFormat(decimalsFor(t.standardError)));
          w.format(top + 2 + i, 4, 1, 1, P_VALUE_FORMAT);
        });
      }
      return w.content();
    },
  };
}

/** How well it fits: FITSTATS's rows (no header), each formatted by its label. */
export function fitSection(sheet: string, note: string, flavour: Flavour<{ formula: string }, { fit: ModelFit; skipped: number }>): ReportSection {
  return {
    rows: 1 + FIT_STATS_LABELS.length,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, 0, 'How well does it fit?', true);
      if (note !== '') w.label(top, 1, note);
      if (flavour.kind === 'live') w.formula(top + 1, 0, flavour.live.formula);
      else w.grid(top + 1, 0, fitStatsRows(flavour.values.fit, flavour.values.skipped));
      FIT_STATS_LABELS.forEach((name, i) => w.format(top + 1 + i, 1, 1, 1, FIT_STATS_FORMATS[name]));
      return w.content();
    },
  };
}

/** Does the added set add anything: NESTEDF's rows, or the reason there is no test. */
export function nestedSection(
  sheet: string,
  addedNames: readonly string[],
  note: string,
  flavour: Flavour<{ formula: string }, { grid: Grid } | { problem: string }>,
): ReportSection {
  return {
    rows: 1 + NESTED_ROWS,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, 0, `Does ${addedNames.join(', ')} add anything?`, true);
      if (note !== '') w.label(top, 1, note);
      if (flavour.kind === 'live') w.formula(top + 1, 0, flavour.live.formula);
      else if ('grid' in flavour.values) w.grid(top + 1, 0, flavour.values.grid);
      else w.label(top + 1, 0, flavour.values.problem);
      NESTED_FORMATS.forEach((f, i) => w.format(top + 1 + i, 1, 1, 1, f));
      return w.content();
    },
  };
}

const PREDICTIONS_NOTE = 'Mean: where the average of many such cases should lie. New: where one new case should fall.';
/** The label column's heading, left of PREDICT's table. */
export const NEW_ROW_LABEL_HEADER = 'New row';

/** A live label: a reference to the user's label cell, so a renamed row follows; else the worksheet row. */
export interface LiveLabel {
  /** An absolute reference to the label cell, or undefined when the row is named by its worksheet row. */
  reference: string | undefined;
  text: string;
}

/**
 * What to expect for new cases: each new row's label in column A, then PREDICT's table (the
 * prediction, both intervals and the extrapolation flag) from column B. Live: the labels refer to
 * the label cells and PREDICT spills beside them. Values: the same columns from the pane's
 * labelled predictions.
 */
export function predictionsSection(
  sheet: string,
  note: string,
  decimals: number,
  flavour: Flavour<{ formula: string; labels: LiveLabel[] }, { predictions: readonly LabelledPrediction[] }>,
): ReportSection {
  const lines = flavour.kind === 'live' ? flavour.live.labels.length : flavour.values.predictions.length;
  return {
    rows: 2 + lines,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, 0, 'What to expect for new cases', true);
      w.label(top, 1, [PREDICTIONS_NOTE, note].filter((t) => t !== '').join(' '));
      w.label(top + 1, 0, NEW_ROW_LABEL_HEADER);
      if (flavour.kind === 'live') {
        w.formula(top + 1, 1, flavour.live.formula);
        flavour.live.labels.forEach((l, i) => (l.reference === undefined ? w.label(top + 2 + i, 0, l.text) : w.formula(top + 2 + i, 0, `=${l.reference}`)));
      } else {
        w.grid(top + 1, 1, [[...PREDICT_HEADER]]);
        flavour.values.predictions.forEach((p, i) => {
          w.label(top + 2 + i, 0, p.label);
          w.grid(top + 2 + i, 1, [[...[p.estimate, p.meanLow, p.meanHigh, p.newLow, p.newHigh].map(finiteOrBlank), extrapolationWords(p)]]);
        });
      }
      w.format(top + 2, 1, Math.max(1, lines), 5, fixedFormat(decimals));
      return w.content();
    },
  };
}

/** The extrapolation column in PREDICT's own words, from a prediction whose flags are already names. */
function extrapolationWords(p: LabelledPrediction): string {
  if (p.notPredicted !== undefined) return '';
  return extrapolationText({ ...p, leverage: Number.NaN, outsideRange: p.outsideRange.map((_, i) => i) }, p.outsideRange);
}

/** The number format of each CHECKS row: statistics to a few decimals, p-values by the one p-value rule, rows and counts whole. */
const CHECKS_FORMATS: Record<ChecksLabel, string> = {
  'Durbin–Watson': '0.000',
  'DW expected d': '0.000',
  'DW p-value (ρ > 0)': P_VALUE_FORMAT,
  'DW p-value (two-sided)': P_VALUE_FORMAT,
  'DW method': 'General',
  'DW reading': 'General',
  'Breusch–Pagan LM': '0.00',
  'BP df': '0',
  'BP p-value': P_VALUE_FORMAT,
  'BP reading': 'General',
  'Shapiro–Wilk W': '0.0000',
  'SW p-value': P_VALUE_FORMAT,
  'SW reading': 'General',
  'Jarque–Bera': '0.00',
  'JB p-value': P_VALUE_FORMAT,
  'JB reading': 'General',
  'Largest |studentized residual|': '0.00',
  'at row': '0',
  'Outlier p-value (Bonferroni)': P_VALUE_FORMAT,
  'Outlier reading': 'General',
  'Lack-of-fit F': '0.00',
  'LOF df': '0',
  'Pure-error df': '0',
  'LOF p-value': P_VALUE_FORMAT,
  'LOF reading': 'General',
  "Largest Cook's distance": '0.000',
  'High-leverage rows': '0',
  'Largest VIF': '0.00',
  'for term': 'General',
  'Overall reading': 'General',
};

/** Can these numbers be trusted: CHECKS's rows, each value under its own number format. */
export function checksSection(sheet: string, note: string, formula: string): ReportSection {
  return {
    rows: 1 + CHECKS_LABELS.length,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, 0, 'Can these numbers be trusted?', true);
      w.label(top, 1, note);
      w.formula(top + 1, 0, formula);
      CHECKS_LABELS.forEach((name, i) => w.format(top + 1 + i, 1, 1, 1, CHECKS_FORMATS[name]));
      return w.content();
    },
  };
}

/** What a values report leaves out, and why. */
export function leftOutSection(sheet: string, lines: readonly string[]): ReportSection {
  return {
    rows: 1 + lines.length,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, 0, 'Left out', true);
      lines.forEach((text, i) => w.label(top + 1 + i, 0, text));
      return w.content();
    },
  };
}

export function cautionsSection(sheet: string, assumptions: string): ReportSection {
  const lines = cautionLines(assumptions);
  return {
    rows: 1 + lines.length,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, 0, 'Cautions', true);
      lines.forEach((text, i) => w.label(top + 1 + i, 0, text));
      return w.content();
    },
  };
}

/** A heading over one formula that spills `rows` rows (header included) from the row below it. */
export function spillSection(sheet: string, heading: string, headingBold: boolean, formula: string, rows: number, column = 0): ReportSection {
  return {
    rows: 1 + rows,
    write(top) {
      const w = new SectionWriter(sheet);
      w.label(top, column, heading, headingBold);
      w.formula(top + 1, column, formula);
      return w.content();
    },
  };
}
