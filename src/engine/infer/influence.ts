import { solveModel } from '../fitModel';
import type { LeastSquaresSolution } from '../fit/leastSquares';
import type { FitSettings, ModelData } from '../types';
import { equalVarianceResiduals } from './equalVarianceResiduals';
import { leverages } from './leverages';

/**
 * Residual diagnostics, row by row.
 *
 * Weights: everything is computed on the √w-scaled problem, so every formula is that of ordinary
 * least squares on √w·y and √w·X. The leverage is the hat diagonal of the weighted design, the
 * residual that is scaled is √wᵢ·eᵢ (eᵢ itself stays the unweighted y − ŷ the fit reports) and
 * RSS = Σ wᵢeᵢ². A row of weight w is then a row whose noise has variance σ²/w, which is what
 * `knownSigma` (σ for a unit-weight row) and the fit's likelihood already assume.
 *
 * Known σ: the standardized residual and Cook's distance use it (they measure a residual against
 * the noise level, and that level is given); the studentized residual and DFFITS still use the
 * deleted σ̂₍ᵢ₎, because their purpose is to judge row i against a spread that row i did not help
 * to estimate.
 *
 * Which rows these numbers make worth a look (rules of thumb such as leverage over 2p/n) is the
 * presentation's choice, not the engine's: see src/presentation/thresholds.ts.
 *
 * The diagnostics of a fit are computed once and shared by every caller: treat them as read-only.
 */
export interface RowDiagnostics {
  fitted: number;
  /** yᵢ − ŷᵢ, unweighted. */
  residual: number;
  /** hᵢ, the diagonal of the weighted design's hat matrix. */
  leverage: number;
  /** √wᵢ·eᵢ / (σ·√(1 − hᵢ)), σ the known σ or σ̂. */
  standardized: number;
  /** √wᵢ·eᵢ / (σ̂₍ᵢ₎·√(1 − hᵢ)), σ̂₍ᵢ₎² = (RSS − wᵢeᵢ²/(1 − hᵢ)) / (n − p − 1). */
  studentized: number;
  /** rᵢ²·hᵢ / (p·(1 − hᵢ)) with rᵢ the standardized residual. */
  cooksDistance: number;
  /** tᵢ·√(hᵢ / (1 − hᵢ)) with tᵢ the studentized residual. */
  dffits: number;
  /** Why some of the values above are NaN (or, for exactFit with σ known, why only some are). */
  undefinedBecause: UndefinedReason | undefined;
}

/**
 * - leverage-one: 1 − hᵢ ≤ 1e-12, the fit passes through the row; nothing can be scaled by it.
 * - exact-fit: every residual is 0 (σ̂ = 0); with σ known the standardized residual and Cook's
 *   distance are still 0, the studentized residual and DFFITS are not defined.
 * - no-deleted-df: n = p + 1, so σ̂₍ᵢ₎ has no degrees of freedom.
 * - rest-fit-exactly: without row i the other rows fit exactly, σ̂₍ᵢ₎ = 0 and tᵢ is unbounded;
 *   a screen may still mark the row as an outlier.
 */
export type UndefinedReason = 'leverage-one' | 'exact-fit' | 'no-deleted-df' | 'rest-fit-exactly';

/**
 * The diagnostics of every row, one array per quantity (entry i for row i of the data), so that a
 * large fit builds no object per row. `rows` gives the same numbers one object per row, built on
 * its first read; the cell grids and the checks read the arrays.
 */
export interface ResidualDiagnostics {
  readonly n: number;
  /** Parameters estimated (aliased terms excluded): the p of every formula. */
  readonly p: number;
  readonly sigmaKnown: boolean;
  readonly fitted: Float64Array;
  readonly residual: Float64Array;
  readonly leverage: Float64Array;
  readonly standardized: Float64Array;
  readonly studentized: Float64Array;
  readonly cooksDistance: Float64Array;
  readonly dffits: Float64Array;
  readonly undefinedBecause: readonly (UndefinedReason | undefined)[];
  readonly rows: readonly RowDiagnostics[];
}

/**
 * Below this 1 − hᵢ is rounding: a leverage of exactly 1 computes as 1 − O(ε·n), and with it
 * the residual as O(ε) noise that the formulas would blow up into arbitrary values.
 */
const LEVERAGE_ONE_TOLERANCE = 1e-12;

/**
 * RSS − wᵢeᵢ²/(1 − hᵢ) is a difference of two numbers of size RSS, so it carries an error of a
 * few ε·n·RSS; below this fraction of RSS it cannot be told from 0.
 */
const DELETED_RSS_TOLERANCE = 1e-10;

export function residualDiagnostics(data: ModelData, settings?: FitSettings): ResidualDiagnostics {
  const { solution, fit } = solveModel(data, settings);
  const knownSigma = fit.settings.knownSigma;
  if (last?.solution !== solution || last.knownSigma !== knownSigma)
    last = { solution, knownSigma, diagnostics: diagnosticsOf(solution, fit.rank, knownSigma) };
  return last.diagnostics;
}

/**
 * The last diagnostics computed, with the solution and known σ they are of (nothing else in the
 * settings changes them): CHECKS, RESIDUALS and QQPOINTS of one fit then compute them once. One is
 * kept, as they are several numbers per row.
 */
let last: { solution: LeastSquaresSolution; knownSigma: number | undefined; diagnostics: ResidualDiagnostics } | undefined;

/** Forgets the last diagnostics, to free their memory (a new fit computes its own anyway). */
export function resetResidualDiagnostics(): void {
  last = undefined;
}

function diagnosticsOf(solution: LeastSquaresSolution, p: number, knownSigma: number | undefined): ResidualDiagnostics {
  const { yScale, scaledRss, perfectFit } = solution;
  const u = equalVarianceResiduals(solution);
  const leverage = leverages(solution);
  const n = leverage.length;
  const sigmaKnown = knownSigma !== undefined;
  // Scaled units (divided by yScale) throughout, so data near 1e±300 neither overflow nor underflow.
  const sigmaScaled = sigmaKnown ? knownSigma / yScale : Math.sqrt(scaledRss / (n - p));
  const deletedDf = n - p - 1;
  const standardized = new Float64Array(n).fill(Number.NaN);
  const studentized = new Float64Array(n).fill(Number.NaN);
  const cooksDistance = new Float64Array(n).fill(Number.NaN);
  const dffits = new Float64Array(n).fill(Number.NaN);
  const undefinedBecause = new Array<UndefinedReason | undefined>(n).fill(undefined);
  for (let i = 0; i < n; i++) {
    const h = leverage[i];
    const oneMinusH = 1 - h;
    if (oneMinusH <= LEVERAGE_ONE_TOLERANCE) {
      undefinedBecause[i] = 'leverage-one';
      continue;
    }
    if (!(perfectFit && !sigmaKnown)) {
      standardized[i] = u[i] / (sigmaScaled * Math.sqrt(oneMinusH));
      cooksDistance[i] = (standardized[i] ** 2 * h) / (p * oneMinusH);
    }
    const deletedRss = scaledRss - (u[i] * u[i]) / oneMinusH;
    if (perfectFit) undefinedBecause[i] = 'exact-fit';
    else if (deletedDf <= 0) undefinedBecause[i] = 'no-deleted-df';
    else if (deletedRss <= DELETED_RSS_TOLERANCE * scaledRss) undefinedBecause[i] = 'rest-fit-exactly';
    else {
      studentized[i] = u[i] / (Math.sqrt(deletedRss / deletedDf) * Math.sqrt(oneMinusH));
      dffits[i] = studentized[i] * Math.sqrt(h / oneMinusH);
    }
  }
  const columns = {
    n,
    p,
    sigmaKnown,
    fitted: solution.fitted,
    residual: solution.residuals,
    leverage,
    standardized,
    studentized,
    cooksDistance,
    dffits,
    undefinedBecause,
  };
  let rows: RowDiagnostics[] | undefined;
  return {
    ...columns,
    get rows(): RowDiagnostics[] {
      rows ??= Array.from({ length: n }, (_, i) => ({
        fitted: columns.fitted[i],
        residual: columns.residual[i],
        leverage: leverage[i],
        standardized: standardized[i],
        studentized: studentized[i],
        cooksDistance: cooksDistance[i],
        dffits: dffits[i],
        undefinedBecause: undefinedBecause[i],
      }));
      return rows;
    },
  };
}

/** The largest finite Cook's distance, or NaN when no row has one. */
export function maxCooksDistance(diagnostics: ResidualDiagnostics): number {
  let max = Number.NaN;
  for (const d of diagnostics.cooksDistance) if (Number.isFinite(d) && (Number.isNaN(max) || d > max)) max = d;
  return max;
}
