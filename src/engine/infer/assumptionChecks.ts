import { normalQuantile } from '../distributions/normal';
import { studentTTwoSidedP } from '../distributions/studentT';
import { predictorValues } from '../cache/packedPredictors';
import { solveModel } from '../fitModel';
import type { FitSettings, ModelData } from '../types';
import { type BreuschPagan, type BreuschPaganReason, breuschPagan } from './breuschPagan';
import { collinearityOfFit, type CollinearityReason } from './collinearity';
import { durbinWatsonMoments } from './durbinWatson';
import { type DurbinWatsonExact, type DurbinWatsonExactReason, durbinWatsonExact } from './durbinWatsonExact';
import { equalVarianceResiduals } from './equalVarianceResiduals';
import { type ResidualDiagnostics, residualDiagnostics } from './influence';
import { type JarqueBera, jarqueBera } from './jarqueBera';
import { type LackOfFit, type LackOfFitReason, lackOfFit } from './lackOfFit';
import { bonferroniP, type OutlierTest, type OutlierTestReason, outlierTest } from './outlierTest';
import { SHAPIRO_WILK_MAX_N, type ShapiroWilk, type ShapiroWilkReason, shapiroWilk } from './shapiroWilk';

/**
 * The model's assumptions checked in one place: serial independence (Durbin–Watson, exact up to
 * EXACT_MAX_ROWS rows), constant spread (Breusch–Pagan, Koenker's form), normal residuals
 * (Shapiro–Wilk for 3 ≤ n ≤ 5000, Jarque–Bera above), the most outlying row (the Bonferroni outlier
 * test), the model's shape against pure error where settings repeat (lack of fit), each row's
 * leverage, studentized residual and Cook's distance, and collinearity (largest VIF). Each test is
 * decided at α = 1 − level and the decision returned as a verdict code; the words for it, and the
 * rule-of-thumb screens of the rows (high leverage, influential), are the presentation module's.
 *
 * Weights: the residual tests use uᵢ = √wᵢ·eᵢ, the residuals that share one variance under the model
 * (see each test); lack of fit weights its pure error alike. Known σ: the tests are free of σ and
 * ignore it (the studentized residual uses the deleted σ̂ whatever σ is); Cook's distance uses it,
 * as in residualDiagnostics.
 */
export interface AssumptionChecks {
  n: number;
  /** Parameters estimated. */
  p: number;
  alpha: number;
  /** The exact (or beta-approximated) test, with the exact null mean and variance of d. */
  durbinWatson: DurbinWatsonExact & { mean: number; variance: number; verdict: DurbinWatsonVerdict };
  breuschPagan: BreuschPagan & { verdict: BreuschPaganVerdict };
  shapiroWilk: ShapiroWilk & { verdict: ShapiroWilkVerdict };
  /** Shown for information up to SHAPIRO_WILK_MAX_N rows; the normality test above them. */
  jarqueBera: JarqueBera & { verdict: JarqueBeraVerdict };
  /** `row`: the most outlying row's number as the user knows it (see rowNumbers), or −1. */
  outlierTest: OutlierTest & { row: number; verdict: OutlierVerdict };
  lackOfFit: LackOfFit & { verdict: LackOfFitVerdict };
  /** Every residual is 0: the residual checks do not apply. */
  exactFit: boolean;
  /** NaN when no row has one (an exact fit with σ estimated, or every row at leverage 1). */
  largestCooksDistance: number;
  /** Index of that row among the rows of `data`, or −1. */
  largestCooksRow: number;
  /** Infinity when a term is constant or an exact combination of others; NaN without predictors. */
  largestVif: number;
  largestVifTerm: string | undefined;
  /** Why largestVif is infinite. */
  largestVifReason: CollinearityReason | undefined;
  /**
   * What the screens of unusual and high-leverage rows read, one array per quantity, entry i for
   * row i of `data` (see CheckedRow). `rows` gives them one object per row, built on its first read.
   */
  leverage: Float64Array;
  studentized: Float64Array;
  bonferroniP: Float64Array;
  cooksDistance: Float64Array;
  /** How the user knows each row (see rowNumbers): its worksheet row when given, else its place (1-based). */
  rowNumbers: Int32Array;
  readonly rows: readonly CheckedRow[];
}

/** Durbin–Watson read on the two-sided p at α: the sign of the autocorrelation found, or why d was not tested. */
export type DurbinWatsonVerdict = 'positive-autocorrelation' | 'negative-autocorrelation' | 'none' | DurbinWatsonExactReason;
/** Breusch–Pagan at α: the spread changes with the predictors, or not, or why it was not tested. */
export type BreuschPaganVerdict = 'uneven-spread' | 'none' | BreuschPaganReason;
/** Shapiro–Wilk at α, or why it was not computed ('too-many': Jarque–Bera decides instead). */
export type ShapiroWilkVerdict = 'non-normal' | 'none' | 'exact-fit' | ShapiroWilkReason;
/** Jarque–Bera at α above SHAPIRO_WILK_MAX_N rows; 'shapiro-wilk-decides' at or below. */
export type JarqueBeraVerdict = 'non-normal' | 'none' | 'exact-fit' | 'shapiro-wilk-decides';
/** The Bonferroni p of the most outlying row at α, or why there is no studentized residual to test. */
export type OutlierVerdict = 'outlier' | 'none' | 'exact-fit' | OutlierTestReason;
/** Lack of fit at α, or why it could not be tested (most often: no setting repeats). */
export type LackOfFitVerdict = 'lack-of-fit' | 'none' | 'exact-fit' | LackOfFitReason;

/** One row's quantities for the screens of src/presentation/thresholds.ts, and its outlier verdict at α. */
export interface CheckedRow {
  /** Index among the rows of `data`. */
  index: number;
  /** The row's number as the user knows it: its worksheet row when given, else its place (1-based). */
  row: number;
  /** hᵢ, as in residualDiagnostics. */
  leverage: number;
  /** ±Infinity for a row the other rows fit exactly. */
  studentized: number;
  /** Its Bonferroni p; NaN where not computed (no studentized residual, or |t| too small to be an outlier). */
  bonferroniP: number;
  cooksDistance: number;
  /** Its own Bonferroni p is below α, as car::outlierTest lists outliers. */
  outlier: boolean;
}

/**
 * `rowNumbers[i]` is how the user knows row i of `data` (its worksheet row); without them rows are
 * numbered by their place among the rows used.
 */
export function assumptionChecks(data: ModelData, settings?: FitSettings, rowNumbers?: readonly number[]): AssumptionChecks {
  const solved = solveModel(data, settings);
  const { fit, solution } = solved;
  const alpha = 1 - fit.settings.level;
  const numbers = userRowNumbers(fit.n, rowNumbers);
  const rowNumber = (index: number) => (index < 0 ? -1 : numbers[index]);
  const exactFit = fit.perfectFit;

  const dw = durbinWatsonExact(solution);
  const bp = breuschPagan(solution, data);
  const sw = shapiroWilk(equalVarianceResiduals(solution));
  const jb = jarqueBera(solution);
  const lof = lackOfFit(data, fit.rss, fit.rank);

  const diagnostics = residualDiagnostics(data, settings);
  const { leverage, cooksDistance } = diagnostics;
  const studentized = testedStudentized(diagnostics);
  const outliers = outlierTest(studentized, fit.n, fit.rank);
  const bonferroni = bonferroniOfRows(studentized, alpha, fit.n - fit.rank - 1, outliers.rowsTested);
  const { row: largestCooksRow, value: largestCooksDistance } = largestFinite(cooksDistance);

  const terms = predictorValues(data).p > 0 ? collinearityOfFit(data, solved).terms : [];
  // Centered VIFs only: a term standing in for the intercept has none, and its standard error is not inflated.
  const top = terms
    .filter((t) => t.undefinedBecause !== 'spans-intercept')
    .reduce<(typeof terms)[number] | undefined>((best, t) => (best === undefined || t.vif > best.vif ? t : best), undefined);

  const checks: Omit<AssumptionChecks, 'rows'> = {
    n: fit.n,
    p: fit.rank,
    alpha,
    durbinWatson: { ...dw, ...durbinWatsonMoments(solution), verdict: durbinWatsonVerdict(dw, alpha) },
    breuschPagan: { ...bp, verdict: bp.undefinedBecause ?? (bp.pValue < alpha ? 'uneven-spread' : 'none') },
    shapiroWilk: { ...sw, verdict: exactFit ? 'exact-fit' : (sw.undefinedBecause ?? (sw.pValue < alpha ? 'non-normal' : 'none')) },
    jarqueBera: {
      ...jb,
      verdict: jb.undefinedBecause ?? (fit.n <= SHAPIRO_WILK_MAX_N ? 'shapiro-wilk-decides' : jb.pValue < alpha ? 'non-normal' : 'none'),
    },
    outlierTest: {
      ...outliers,
      row: rowNumber(outliers.index),
      verdict: exactFit ? 'exact-fit' : (outliers.undefinedBecause ?? (outliers.bonferroniP < alpha ? 'outlier' : 'none')),
    },
    lackOfFit: { ...lof, verdict: exactFit ? 'exact-fit' : (lof.undefinedBecause ?? (lof.pValue < alpha ? 'lack-of-fit' : 'none')) },
    exactFit,
    largestCooksDistance,
    largestCooksRow,
    largestVif: top?.vif ?? Number.NaN,
    largestVifTerm: top?.name,
    largestVifReason: top?.undefinedBecause,
    leverage,
    studentized,
    bonferroniP: bonferroni,
    cooksDistance,
    rowNumbers: numbers,
  };
  let rows: CheckedRow[] | undefined;
  return {
    ...checks,
    get rows(): CheckedRow[] {
      rows ??= Array.from({ length: checks.n }, (_, i) => checkedRow(checks, i));
      return rows;
    },
  };
}

/** Row `index` of the checks as one object. */
export function checkedRow(checks: Omit<AssumptionChecks, 'rows'>, index: number): CheckedRow {
  const bonferroni = checks.bonferroniP[index];
  return {
    index,
    row: checks.rowNumbers[index],
    leverage: checks.leverage[index],
    studentized: checks.studentized[index],
    bonferroniP: bonferroni,
    cooksDistance: checks.cooksDistance[index],
    outlier: bonferroni < checks.alpha,
  };
}

/** How the user knows each of `n` rows: `rowNumbers[i]` when given, else its place (1-based). */
function userRowNumbers(n: number, rowNumbers: readonly number[] | undefined): Int32Array {
  const numbers = new Int32Array(n);
  for (let i = 0; i < n; i++) numbers[i] = rowNumbers?.[i] ?? i + 1;
  return numbers;
}

/**
 * Each row's Bonferroni p (NaN where not computed) over `rowsTested` rows, t on `df` degrees of
 * freedom. P(|T| > t) ≥ P(|Z| > t): a row inside the normal's Bonferroni bound at α cannot be an
 * outlier, so only the rows past it pay for a t tail. A loop of its own, so that V8 optimizes it
 * apart from the long function around it.
 */
function bonferroniOfRows(studentized: Float64Array, alpha: number, df: number, rowsTested: number): Float64Array {
  const candidateBound = -normalQuantile(alpha / (2 * Math.max(1, rowsTested)));
  const bonferroni = new Float64Array(studentized.length).fill(Number.NaN);
  for (let i = 0; i < studentized.length; i++) {
    const t = studentized[i];
    if (Math.abs(t) > candidateBound) bonferroni[i] = bonferroniP(studentTTwoSidedP(t, df), rowsTested);
  }
  return bonferroni;
}

/** The largest finite value and its row (the first of equals), or NaN and −1 when none is finite. */
function largestFinite(values: Float64Array): { row: number; value: number } {
  let row = -1;
  let value = Number.NaN;
  for (let i = 0; i < values.length; i++) {
    const d = values[i];
    if (Number.isFinite(d) && (row < 0 || d > value)) {
      row = i;
      value = d;
    }
  }
  return { row, value };
}

/** The studentized residuals the outlier test reads: ±Infinity for a row the other rows fit exactly. */
function testedStudentized(diagnostics: ResidualDiagnostics): Float64Array {
  const { studentized, undefinedBecause, residual } = diagnostics;
  const tested = new Float64Array(studentized);
  for (let i = 0; i < tested.length; i++) {
    if (undefinedBecause[i] === 'rest-fit-exactly') tested[i] = residual[i] < 0 ? Number.NEGATIVE_INFINITY : Number.POSITIVE_INFINITY;
  }
  return tested;
}

/** Autocorrelation of either sign is a concern, so d is decided on the two-sided p; its side gives the sign. */
function durbinWatsonVerdict(dw: DurbinWatsonExact, alpha: number): DurbinWatsonVerdict {
  if (dw.undefinedBecause !== undefined) return dw.undefinedBecause;
  if (!(dw.pTwoSided < alpha)) return 'none';
  return dw.pPositive < dw.pNegative ? 'positive-autocorrelation' : 'negative-autocorrelation';
}
