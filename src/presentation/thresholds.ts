import { type AssumptionChecks, type CheckedRow, checkedRow, type RowDiagnostics } from '../engine';

/**
 * Rule-of-thumb cut-offs that decide only how a result is worded. Statistical decisions at
 * α = 1 − level are the engine's (its verdict codes); these are conventions for the words.
 */

/** A VIF above 10 is the usual rule of thumb for a term whose estimate collinearity degrades (common practice, no source). */
export const LARGE_VIF = 10;

/**
 * Condition-number bands after Belsley, Kuh & Welsch (Regression Diagnostics, 1980), who read
 * indexes of the unit-scaled design from about 30 up as moderate to strong dependencies and from
 * about 100 as serious ones (from memory); below 10 is taken as no sign of harm.
 */
export const CONDITION_BANDS = { mild: 10, moderate: 30, serious: 100 } as const;

/**
 * Which way a non-normal shape departs is named only past round cut-offs of our own (no source):
 * |skewness| from 0.5, kurtosis outside 2.5 to 3.5.
 */
export const NOTABLE_SKEWNESS = 0.5;
export const NORMAL_KURTOSIS = { low: 2.5, high: 3.5 } as const;

/**
 * The screens of single rows, one definition for every surface: the Flag column of PLUMB.RESIDUALS,
 * the report's residuals heading and its Cook's distance guide line, CHECKS' high-leverage count
 * and unusual rows, and the pane's warnings. The engine gives the quantities (leverage, studentized
 * residual, Cook's distance, the Bonferroni p at α); these rules of thumb only mark rows worth a
 * look. Common practice, no single source: leverage above twice its average p/n, a deleted
 * studentized residual beyond ±3, Cook's distance above 4/n.
 */
export const HIGH_LEVERAGE_MULTIPLE = 2;
export const LARGE_STUDENTIZED = 3;
export const COOKS_NUMERATOR = 4;

/**
 * Cook & Weisberg (Residuals and Influence in Regression, 1982): a Cook's distance above 1 marks a
 * row that moves the fit, and puts it among CHECKS' unusual rows (from memory).
 */
export const UNUSUAL_COOKS_DISTANCE = 1;

/** The cut-offs as they are written: "2p/n" and "4/n". */
export const LEVERAGE_RULE = `${HIGH_LEVERAGE_MULTIPLE}p/n`;
export const COOKS_RULE = `${COOKS_NUMERATOR}/n`;

/** What the screens of PLUMB.RESIDUALS raise for a row. */
export type ResidualFlag = 'high-leverage' | 'outlier' | 'influential';

/**
 * Each flag worded by the rule that raised it: PLUMB.CHECKS names outliers by the Bonferroni test
 * and influential rows at Cook's distance above 1, so these words must not claim more than the
 * screen found.
 */
export const FLAG_TEXT: Record<ResidualFlag, string> = {
  'high-leverage': `high leverage (over ${LEVERAGE_RULE})`,
  outlier: `large residual (|t| over ${LARGE_STUDENTIZED})`,
  influential: `Cook's over ${COOKS_RULE}`,
};

/** The three screens in one line, for the heading above the residual table. */
export const SCREENS_TEXT = `high leverage: h > ${LEVERAGE_RULE}; large residual: |studentized| > ${LARGE_STUDENTIZED}; ${FLAG_TEXT.influential}`;

/** n rows used, p parameters estimated: the n and p of the rules. */
interface ModelSize {
  n: number;
  p: number;
}

/** The cut-offs of the three screens for a model of one size. */
export interface ScreenCutoffs {
  leverage: number;
  studentized: number;
  cooksDistance: number;
}

/** The cut-offs for a model of that size. */
export function screenCutoffs({ n, p }: ModelSize): ScreenCutoffs {
  return { leverage: (HIGH_LEVERAGE_MULTIPLE * p) / n, studentized: LARGE_STUDENTIZED, cooksDistance: COOKS_NUMERATOR / n };
}

/** A row's flags, in the Flag column's order; a row the other rows fit exactly (t unbounded) is an outlier. */
export function residualFlags(row: RowDiagnostics, size: ModelSize): ResidualFlag[] {
  return flagsOf(flagBitsAt(screenCutoffs(size), row.leverage, row.studentized, row.cooksDistance, row.undefinedBecause));
}

/** The flags in the Flag column's order; flag k is bit k of flagBitsAt. */
const FLAG_ORDER: readonly ResidualFlag[] = ['high-leverage', 'outlier', 'influential'];

/**
 * residualFlags as bits (bit k for FLAG_ORDER[k]), from a row's values and the cut-offs worked out
 * once: a table of many rows then builds no array per row.
 */
export function flagBitsAt(
  cutoffs: ScreenCutoffs,
  leverage: number,
  studentized: number,
  cooksDistance: number,
  undefinedBecause: RowDiagnostics['undefinedBecause'],
): number {
  let bits = 0;
  if (leverage > cutoffs.leverage) bits |= 1;
  if (Math.abs(studentized) > cutoffs.studentized || undefinedBecause === 'rest-fit-exactly') bits |= 2;
  if (cooksDistance > cutoffs.cooksDistance) bits |= 4;
  return bits;
}

/** Every combination of flags worded as the Flag column writes it, indexed by flagBitsAt's bits: "" for none. */
export const FLAG_TEXTS: readonly string[] = Array.from({ length: 1 << FLAG_ORDER.length }, (_, bits) =>
  flagsOf(bits)
    .map((flag) => FLAG_TEXT[flag])
    .join(', '),
);

/** The flags whose bits are set, in the Flag column's order. */
function flagsOf(bits: number): ResidualFlag[] {
  return FLAG_ORDER.filter((_, k) => (bits & (1 << k)) !== 0);
}

/** How many rows have leverage above 2p/n. */
export function highLeverageCount({ leverage, n, p }: ModelSize & { leverage: ArrayLike<number> }): number {
  const cutoff = screenCutoffs({ n, p }).leverage;
  let count = 0;
  for (let i = 0; i < leverage.length; i++) if (leverage[i] > cutoff) count++;
  return count;
}

/** A row CHECKS names first: an outlier by the Bonferroni test at α, or influential by Cook's distance above 1. */
export interface UnusualRow extends CheckedRow {
  influential: boolean;
}

/**
 * The unusual rows, most extreme first. One such row can by itself produce the autocorrelation,
 * uneven spread or non-normal shape the tests report, so readings name them first.
 */
export function unusualRows(checks: Omit<AssumptionChecks, 'rows'>): UnusualRow[] {
  const unusual: UnusualRow[] = [];
  for (let i = 0; i < checks.n; i++) {
    const influential = checks.cooksDistance[i] > UNUSUAL_COOKS_DISTANCE;
    if (influential || checks.bonferroniP[i] < checks.alpha) unusual.push({ ...checkedRow(checks, i), influential });
  }
  return unusual.sort((a, b) => extremity(b) - extremity(a));
}

/** How far out a row is: its studentized residual, or for a row only Cook's distance marks, that distance. */
function extremity(u: UnusualRow): number {
  const t = Math.abs(u.studentized);
  return Number.isNaN(t) ? u.cooksDistance : t;
}
