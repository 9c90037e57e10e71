/**
 * The Excel formulas of one check row: its LRE and its verdict. They use only functions every
 * Excel with custom functions has (IF, ISNUMBER, NOT, ABS, LOG10, MIN, MAX), so the check is
 * Excel's own arithmetic on the cells, not Plumbline's.
 */
import { absolute, LRE_CAP, relative, SUMMARY, SUMMARY_SHEET } from './layout';

/**
 * LRE = −log10(|x − c| / |c|), capped to [0, LRE_CAP]; for a certified c = 0 the absolute error
 * −log10(|x|) (McCullough 1998, "Assessing the reliability of statistical software", Part I).
 * A Plumbline cell that is not a number (an error, a blank, a text) scores 0. Equal values, and a
 * difference Excel rounds to 0, score the cap instead of LOG10(0)'s #NUM!.
 */
export function lreFormula(plumbline: string, expected: string): string {
  const x = plumbline;
  const c = expected;
  const capped = (error: string) => `IF(${error}=0,${LRE_CAP},MIN(${LRE_CAP},MAX(0,-LOG10(${error}))))`;
  return `IF(NOT(ISNUMBER(${x})),0,IF(${c}=0,${capped(`ABS(${x})`)},${capped(`ABS(${x}-${c})/ABS(${c})`)}))`;
}

export function resultFormula(lre: string): string {
  return `IF(${lre}>=${thresholdReference()},"PASS","FAIL")`;
}

export function thresholdReference(): string {
  return `${SUMMARY_SHEET}!${absolute(SUMMARY.threshold.row, SUMMARY.threshold.column)}`;
}

/** The formulas of the check in worksheet row `row` (0-based), from the columns of its table. */
export function checkRowFormulas(row: number, columns: { expected: number; plumbline: number; lre: number }): { lre: string; result: string } {
  const lre = lreFormula(relative(row, columns.plumbline), relative(row, columns.expected));
  return { lre, result: resultFormula(relative(row, columns.lre)) };
}
