import type { AssumptionChecks, ModelFrame } from '../engine';
import {
  breuschPaganReading,
  durbinWatsonMethodText,
  durbinWatsonReading,
  highLeverageCount,
  jarqueBeraReading,
  lackOfFitReading,
  largestVifTermReading,
  outlierReading,
  overallReading,
  shapiroWilkReading,
} from '../presentation';
import { finiteOrBlank, type Grid, type GridCell } from './gridCell';

/** CHECKS' labels, in order: the grid has these rows whatever the data, so a live spill keeps its size. */
export const CHECKS_LABELS = [
  'Durbin–Watson',
  'DW expected d',
  'DW p-value (ρ > 0)',
  'DW p-value (two-sided)',
  'DW method',
  'DW reading',
  'Breusch–Pagan LM',
  'BP df',
  'BP p-value',
  'BP reading',
  'Shapiro–Wilk W',
  'SW p-value',
  'SW reading',
  'Jarque–Bera',
  'JB p-value',
  'JB reading',
  'Largest |studentized residual|',
  'at row',
  'Outlier p-value (Bonferroni)',
  'Outlier reading',
  'Lack-of-fit F',
  'LOF df',
  'Pure-error df',
  'LOF p-value',
  'LOF reading',
  "Largest Cook's distance",
  'at row',
  'High-leverage rows',
  'Largest VIF',
  'for term',
  'Overall reading',
] as const;

export type ChecksLabel = (typeof CHECKS_LABELS)[number];

/** A cell for each entry of a tuple, of the same length. */
type OnePer<Labels extends readonly string[]> = { [K in keyof Labels]: GridCell };

/** Two columns, label and value; every blank value has a reading or neighbour that says why. */
export function checksGrid(checks: AssumptionChecks, frame: ModelFrame): Grid {
  const { durbinWatson: dw, breuschPagan: bp, shapiroWilk: sw, jarqueBera: jb, outlierTest: outlier, lackOfFit: lof } = checks;
  // The pure error's degrees of freedom mean something only when the F test could be formed (or its replicates agree).
  const lofDf = lof.undefinedBecause === undefined || lof.undefinedBecause === 'replicates-agree';
  // One value per label: the mapped tuple type makes a missing or extra value a type error.
  const values: OnePer<typeof CHECKS_LABELS> = [
    finiteOrBlank(dw.statistic),
    finiteOrBlank(dw.mean),
    finiteOrBlank(dw.pPositive),
    finiteOrBlank(dw.pTwoSided),
    Number.isFinite(dw.pTwoSided) ? durbinWatsonMethodText(dw) : '',
    durbinWatsonReading(dw),
    finiteOrBlank(bp.statistic),
    finiteOrBlank(bp.df),
    finiteOrBlank(bp.pValue),
    breuschPaganReading(bp),
    finiteOrBlank(sw.statistic),
    finiteOrBlank(sw.pValue),
    shapiroWilkReading(checks),
    finiteOrBlank(jb.statistic),
    finiteOrBlank(jb.pValue),
    jarqueBeraReading(jb),
    finiteOrBlank(Math.abs(outlier.studentized)),
    outlier.index >= 0 ? frame.usedRows[outlier.index] : '',
    finiteOrBlank(outlier.bonferroniP),
    outlierReading(outlier),
    finiteOrBlank(lof.f),
    lofDf ? lof.lackDf : '',
    lofDf ? lof.pureDf : '',
    finiteOrBlank(lof.pValue),
    lackOfFitReading(lof),
    finiteOrBlank(checks.largestCooksDistance),
    cooksRow(checks, frame),
    highLeverageCount(checks),
    finiteOrBlank(checks.largestVif),
    largestVifTermReading(checks),
    overallReading(checks),
  ];
  return CHECKS_LABELS.map((label, i) => [label, values[i]]);
}

/** The row as PLUMB.RESIDUALS numbers it: its worksheet row, or its place in the input range. */
function cooksRow(checks: AssumptionChecks, frame: ModelFrame): GridCell {
  if (checks.largestCooksRow >= 0) return frame.usedRows[checks.largestCooksRow];
  return checks.exactFit ? 'none: exact fit, every residual is 0' : 'none: every row has leverage 1';
}
