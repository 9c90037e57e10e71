import { solveModel } from '../fitModel';
import type { LeastSquaresSolution } from '../fit/leastSquares';
import { applyQ } from '../linalg/householderQr';
import type { FitSettings, ModelData } from '../types';

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

export interface ResidualDiagnostics {
  rows: RowDiagnostics[];
  n: number;
  /** Parameters estimated (aliased terms excluded): the p of every formula. */
  p: number;
  sigmaKnown: boolean;
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
  const n = fit.n;
  const p = fit.rank;
  const sigmaKnown = fit.settings.knownSigma !== undefined;
  const { yScale, scaledRss, perfectFit } = solution;

  // Scaled units (divided by yScale) throughout, so data near 1e±300 neither overflow nor underflow.
  const sigmaScaled = sigmaKnown ? (fit.settings.knownSigma as number) / yScale : Math.sqrt(scaledRss / (n - p));
  const deletedDf = n - p - 1;
  const leverages = hatDiagonal(solution);

  const rows = leverages.map((h, i): RowDiagnostics => {
    const root = solution.design.rootWeights === undefined ? 1 : solution.design.rootWeights[i];
    const u = (root * solution.residuals[i]) / yScale;
    const oneMinusH = 1 - h;
    const row: RowDiagnostics = {
      fitted: solution.fitted[i],
      residual: solution.residuals[i],
      leverage: h,
      standardized: Number.NaN,
      studentized: Number.NaN,
      cooksDistance: Number.NaN,
      dffits: Number.NaN,
      undefinedBecause: undefined,
    };
    if (oneMinusH <= LEVERAGE_ONE_TOLERANCE) {
      row.undefinedBecause = 'leverage-one';
    } else {
      if (!(perfectFit && !sigmaKnown)) {
        row.standardized = u / (sigmaScaled * Math.sqrt(oneMinusH));
        row.cooksDistance = (row.standardized ** 2 * h) / (p * oneMinusH);
      }
      const deletedRss = scaledRss - (u * u) / oneMinusH;
      if (perfectFit) row.undefinedBecause = 'exact-fit';
      else if (deletedDf <= 0) row.undefinedBecause = 'no-deleted-df';
      else if (deletedRss <= DELETED_RSS_TOLERANCE * scaledRss) row.undefinedBecause = 'rest-fit-exactly';
      else {
        row.studentized = u / (Math.sqrt(deletedRss / deletedDf) * Math.sqrt(oneMinusH));
        row.dffits = row.studentized * Math.sqrt(h / oneMinusH);
      }
    }
    return row;
  });
  return { rows, n, p, sigmaKnown };
}

/**
 * hᵢ = ‖row i of Q₁‖², Q₁ the first p columns of the QR's Q, each made by applying the stored
 * reflectors to a unit vector: O(n·p²) time, O(n) extra memory, never the n×n hat matrix. Q₁ is
 * orthonormal to rounding however ill-conditioned the design, which X·R⁻¹ would not be.
 */
function hatDiagonal(solution: LeastSquaresSolution): number[] {
  const { qr } = solution;
  const n = qr.rows;
  const h = new Array<number>(n).fill(0);
  const column = new Float64Array(n);
  for (let k = 0; k < qr.accepted.length; k++) {
    column.fill(0);
    column[k] = 1;
    applyQ(qr, column);
    for (let i = 0; i < n; i++) h[i] += column[i] * column[i];
  }
  return h;
}

/** The largest finite Cook's distance, or NaN when no row has one. */
export function maxCooksDistance(diagnostics: ResidualDiagnostics): number {
  return diagnostics.rows.reduce(
    (max, row) => (Number.isFinite(row.cooksDistance) && (Number.isNaN(max) || row.cooksDistance > max) ? row.cooksDistance : max),
    Number.NaN,
  );
}
