import { solveModel } from '../fitModel';
import type { FitSettings, ModelData } from '../types';
import { type BreuschPagan, breuschPagan } from './breuschPagan';
import {
  unusualRowsReading,
  breuschPaganReading,
  COLLINEARITY_REASON_TEXT,
  durbinWatsonReading,
  jarqueBeraReading,
  LARGE_COOKS_DISTANCE,
  LARGE_VIF,
} from './checkReadings';
import { collinearity } from './collinearity';
import { type DurbinWatson, durbinWatson } from './durbinWatson';
import { highLeverageCount, residualDiagnostics } from './influence';
import { type JarqueBera, jarqueBera } from './jarqueBera';

/**
 * The model's assumptions checked in one place: serial independence (Durbin–Watson), constant
 * spread (Breusch–Pagan, Koenker's form), normal residuals (Jarque–Bera), influential and
 * high-leverage rows, and collinearity (largest VIF). Each test is read at α = 1 − level.
 *
 * Weights: the three tests use uᵢ = √wᵢ·eᵢ, the residuals that share one variance under the model
 * (see each test). Known σ: the three tests are free of σ and ignore it; Cook's distance uses it,
 * as in residualDiagnostics.
 */
export interface AssumptionChecks {
  n: number;
  /** Parameters estimated. */
  p: number;
  alpha: number;
  durbinWatson: DurbinWatson & { reading: string };
  breuschPagan: BreuschPagan & { reading: string };
  jarqueBera: JarqueBera & { reading: string };
  /** NaN when no row has one (an exact fit with σ estimated, or every row at leverage 1). */
  largestCooksDistance: number;
  /** Index of that row among the rows of `data`, or −1. */
  largestCooksRow: number;
  /** Rows with leverage above 2p/n. */
  highLeverageRows: number;
  /** Infinity when a term is constant or an exact combination of others; NaN without predictors. */
  largestVif: number;
  largestVifTerm: string | undefined;
  /** Why largestVif is infinite, in words. */
  largestVifReason: string | undefined;
  /**
   * Rows that are outliers (|studentized residual| above 3) or influential (Cook's distance above
   * 1), most extreme first. One such row can by itself produce the autocorrelation, uneven spread
   * or non-normal shape the tests report, so the overall reading names them first.
   */
  unusualRows: UnusualRow[];
  overall: string;
}

export interface UnusualRow {
  /** Index among the rows of `data`. */
  index: number;
  /** The row's number as the user knows it: its worksheet row when given, else its place (1-based). */
  row: number;
  studentized: number;
  cooksDistance: number;
  outlier: boolean;
  influential: boolean;
}

/**
 * `rowNumbers[i]` is how the user knows row i of `data` (its worksheet row); without them rows are
 * numbered by their place among the rows used.
 */
export function assumptionChecks(data: ModelData, settings?: FitSettings, rowNumbers?: readonly number[]): AssumptionChecks {
  const { fit, solution } = solveModel(data, settings);
  const alpha = 1 - fit.settings.level;
  const dw = durbinWatson(solution);
  const bp = breuschPagan(solution, data.x);
  const jb = jarqueBera(solution);

  const diagnostics = residualDiagnostics(data, settings);
  let largestCooksRow = -1;
  diagnostics.rows.forEach((row, i) => {
    if (Number.isFinite(row.cooksDistance) && (largestCooksRow < 0 || row.cooksDistance > diagnostics.rows[largestCooksRow].cooksDistance)) {
      largestCooksRow = i;
    }
  });
  const largestCooksDistance = largestCooksRow < 0 ? Number.NaN : diagnostics.rows[largestCooksRow].cooksDistance;
  const unusualRows = diagnostics.rows
    .map((d, index): UnusualRow => ({
      index,
      row: rowNumbers?.[index] ?? index + 1,
      studentized: d.studentized,
      cooksDistance: d.cooksDistance,
      outlier: d.flags.includes('outlier'),
      influential: d.cooksDistance > LARGE_COOKS_DISTANCE,
    }))
    .filter((u) => u.outlier || u.influential)
    .sort((a, b) => extremity(b) - extremity(a));

  const terms = (data.x[0]?.length ?? 0) > 0 ? collinearity(data.x, data.names, data.weights, fit.settings).terms : [];
  // Centered VIFs only: a term standing in for the intercept has none, and its standard error is not inflated.
  const top = terms
    .filter((t) => t.undefinedBecause !== 'spans-intercept')
    .reduce<(typeof terms)[number] | undefined>((best, t) => (best === undefined || t.vif > best.vif ? t : best), undefined);

  const checks: AssumptionChecks = {
    n: fit.n,
    p: fit.rank,
    alpha,
    durbinWatson: { ...dw, reading: durbinWatsonReading(dw, alpha) },
    breuschPagan: { ...bp, reading: breuschPaganReading(bp, alpha) },
    jarqueBera: { ...jb, reading: jarqueBeraReading(jb, alpha) },
    largestCooksDistance,
    largestCooksRow,
    highLeverageRows: highLeverageCount(diagnostics),
    largestVif: top?.vif ?? Number.NaN,
    largestVifTerm: top?.name,
    largestVifReason: top?.undefinedBecause === undefined ? undefined : COLLINEARITY_REASON_TEXT[top.undefinedBecause],
    unusualRows,
    overall: '',
  };
  checks.overall = overallReading(checks, fit.perfectFit);
  return checks;
}

function overallReading(c: AssumptionChecks, perfectFit: boolean): string {
  const concerns: string[] = [];
  if (c.durbinWatson.pTwoSided < c.alpha)
    concerns.push(c.durbinWatson.statistic < c.durbinWatson.mean ? 'positive autocorrelation' : 'negative autocorrelation');
  if (c.breuschPagan.pValue < c.alpha) concerns.push('uneven residual spread');
  if (c.jarqueBera.pValue < c.alpha) concerns.push('non-normal residuals');
  // Named rows already cover an influential row; without them (Cook's distance of a row the
  // studentized residual cannot judge) the concern is still said.
  if (c.largestCooksDistance > LARGE_COOKS_DISTANCE && c.unusualRows.length === 0) concerns.push("an influential row (Cook's distance above 1)");
  if (c.largestVif === Number.POSITIVE_INFINITY) concerns.push('terms that are exact combinations of others');
  else if (c.largestVif > LARGE_VIF) concerns.push('strong collinearity (a VIF above 10)');
  if (perfectFit) {
    return ['exact fit: every residual is 0, so the residual checks do not apply', ...concerns].join('; ');
  }
  if (c.unusualRows.length > 0) {
    const then = concerns.length > 0 ? `; then ${concerns.join(', ')}` : '';
    return `worth a look first: ${unusualRowsReading(c.unusualRows)}${then}`;
  }
  if (concerns.length === 0) return `nothing stands out at the ${formatLevel(1 - c.alpha)} level`;
  return `worth a look: ${concerns.join(', ')}`;
}

/** How far out a row is: its studentized residual, or for a row only Cook's distance flags, that distance. */
function extremity(u: UnusualRow): number {
  const t = Math.abs(u.studentized);
  return Number.isFinite(t) ? t : u.outlier ? Number.POSITIVE_INFINITY : u.cooksDistance;
}

function formatLevel(level: number): string {
  return `${Number((100 * level).toPrecision(6))}%`;
}
