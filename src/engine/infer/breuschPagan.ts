import { predictorValues } from '../cache/packedPredictors';
import { chiSquareUpperTail } from '../distributions/chiSquare';
import { buildDesign } from '../fit/design';
import { frobeniusCondition, type LeastSquaresSolution, needsExtendedPrecision, solveLeastSquares } from '../fit/leastSquares';
import { stableNorm } from '../linalg/columnMajor';
import type { ModelData } from '../types';
import { designBasis } from './designBasis';
import { equalVarianceResiduals } from './equalVarianceResiduals';

/**
 * Breusch & Pagan, "A simple test for heteroscedasticity and random coefficient variation"
 * (Econometrica 47, 1979), in the studentized form of Koenker, "A note on studentizing a test for
 * heteroscedasticity" (J. Econometrics 17, 1981), which does not assume normal errors:
 * regress uᵢ² on an intercept and the model's predictors, LM = n·R² of that regression, referred
 * to χ² with df = the number of predictors it estimates (its rank − 1; for a model with an
 * intercept, the model's rank − 1).
 *
 * Weights: uᵢ = √wᵢ·eᵢ, the residuals of the √w-scaled problem, which have equal variance under
 * the model; the auxiliary regression is unweighted, on the predictors as given, so the test asks
 * whether what the weights left over still changes with the predictors. `data` is the model's
 * data, whose predictors the auxiliary regression reads.
 *
 * For an unweighted model with an intercept the auxiliary design is the model's own, so its
 * orthonormal basis is reused: the auxiliary RSS is that of u² projected off it, O(n·p) instead
 * of a second fit. The
 * same precision check as the fit's (needsExtendedPrecision) decides whether double suffices; where
 * it does not, the auxiliary regression is fitted on its own, refinement included.
 */
export interface BreuschPagan {
  statistic: number;
  df: number;
  pValue: number;
  undefinedBecause: BreuschPaganReason | undefined;
}

/**
 * - exact-fit: every residual is 0.
 * - no-predictors: the model has no predictor for the spread to depend on.
 * - equal-squares: every uᵢ² is the same, so R² is 0/0.
 * - too-few-rows: the auxiliary regression fits the squares exactly (n ≤ its rank).
 */
export type BreuschPaganReason = 'exact-fit' | 'no-predictors' | 'equal-squares' | 'too-few-rows';

/** A relative spread of the squares below this is rounding of squares that are equal. */
const EQUAL_SQUARES_TOLERANCE = 1e-9;

export function breuschPagan(solution: LeastSquaresSolution, data: ModelData): BreuschPagan {
  const n = solution.residuals.length;
  const result = (undefinedBecause: BreuschPaganReason, df = Number.NaN): BreuschPagan => ({
    statistic: Number.NaN,
    df,
    pValue: Number.NaN,
    undefinedBecause,
  });
  if (solution.perfectFit) return result('exact-fit');
  // Squares of residuals in units of yScale, so that values near 1e±300 survive squaring.
  const u = equalVarianceResiduals(solution);
  const squares = new Float64Array(n);
  for (let i = 0; i < n; i++) squares[i] = u[i] * u[i];
  const { rss, rank } = auxiliaryFit(solution, squares, data);
  const df = rank - 1;
  if (df === 0) return result('no-predictors', 0);
  if (n <= rank) return result('too-few-rows', df);

  let sum = 0;
  for (let i = 0; i < n; i++) sum += squares[i];
  const mean = sum / n;
  let total = 0;
  let correction = 0;
  for (let i = 0; i < n; i++) {
    const d = squares[i] - mean;
    total += d * d;
    correction += d;
  }
  total -= (correction * correction) / n;
  if (!(Math.sqrt(total / n) > EQUAL_SQUARES_TOLERANCE * mean)) return result('equal-squares', df);
  const statistic = Math.max(0, (n * (total - rss)) / total);
  return { statistic, df, pValue: chiSquareUpperTail(statistic, df), undefinedBecause: undefined };
}

/** RSS and rank of u² regressed on an intercept and the predictors. */
function auxiliaryFit(solution: LeastSquaresSolution, squares: Float64Array, data: ModelData): { rss: number; rank: number } {
  if (solution.design.rootWeights === undefined && solution.design.hasIntercept) {
    const reused = rssOnModelBasis(solution, squares);
    if (reused !== undefined) return reused;
  }
  const auxiliary = solveLeastSquares(buildDesign(Array.from(squares), predictorValues(data), true, undefined, undefined));
  return { rss: auxiliary.scaledRss * auxiliary.yScale ** 2, rank: auxiliary.qr.accepted.length };
}

/**
 * The auxiliary RSS from the model's basis Q₁ (designBasis.ts, which the leverages of the same
 * checks form anyway), in units of ‖u²‖ as the fit would take it: ‖b − Q₁Q₁ᵀb‖² for b = u²/‖u²‖,
 * two sweeps of n·rank instead of one per reflector and side. The residual is formed, not
 * ‖b‖² − ‖Q₁ᵀb‖², so nothing cancels; undefined when double may fall short.
 */
function rssOnModelBasis(solution: LeastSquaresSolution, squares: Float64Array): { rss: number; rank: number } | undefined {
  const { qr, rInverse } = solution;
  const rank = qr.accepted.length;
  const scale = stableNorm(squares);
  if (!(scale > 0)) return undefined;
  const b = new Float64Array(squares.length);
  for (let i = 0; i < b.length; i++) b[i] = squares[i] / scale;
  const scaledRss = projectionResidualSquares(designBasis(solution), qr.rows, rank, b);
  if (needsExtendedPrecision(frobeniusCondition(qr.r, rInverse, rank), Math.sqrt(scaledRss))) return undefined;
  return { rss: scaledRss * scale * scale, rank };
}

/** ‖b − Q₁Q₁ᵀb‖² for the n × rank column-major q, b overwritten by the residual; columns two per sweep. */
function projectionResidualSquares(q: Float64Array, n: number, rank: number, b: Float64Array): number {
  const c = new Float64Array(rank);
  for (let k = 0; k < rank; k += 2) {
    const first = k * n;
    const second = Math.min(k + 1, rank - 1) * n;
    let s = 0;
    let t = 0;
    for (let i = 0; i < n; i++) {
      const v = b[i];
      s += q[first + i] * v;
      t += q[second + i] * v;
    }
    c[k] = s;
    if (k + 1 < rank) c[k + 1] = t;
  }
  for (let k = 0; k < rank; k += 2) {
    const first = k * n;
    const second = Math.min(k + 1, rank - 1) * n;
    const s = c[k];
    // Past the last column the second is the first again, with nothing more to take off.
    const t = k + 1 < rank ? c[k + 1] : 0;
    for (let i = 0; i < n; i++) b[i] -= q[first + i] * s + q[second + i] * t;
  }
  let squares = 0;
  for (let i = 0; i < n; i++) squares += b[i] * b[i];
  return squares;
}
