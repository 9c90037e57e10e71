import { chiSquareUpperTail } from '../distributions/chiSquare';
import { buildDesign } from '../fit/design';
import { type LeastSquaresSolution, solveLeastSquares } from '../fit/leastSquares';

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
 * whether what the weights left over still changes with the predictors.
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

export function breuschPagan(solution: LeastSquaresSolution, x: readonly (readonly number[])[]): BreuschPagan {
  const n = solution.residuals.length;
  const result = (undefinedBecause: BreuschPaganReason, df = Number.NaN): BreuschPagan => ({
    statistic: Number.NaN,
    df,
    pValue: Number.NaN,
    undefinedBecause,
  });
  if (solution.perfectFit) return result('exact-fit');
  // Squares of residuals in units of yScale, so that values near 1e±300 survive squaring.
  const squares = Array.from(solution.residuals, (e, i) => (((solution.design.rootWeights?.[i] ?? 1) * e) / solution.yScale) ** 2);
  const auxiliary = solveLeastSquares(buildDesign(squares, x, true, undefined, undefined));
  const rank = auxiliary.qr.accepted.length;
  const df = rank - 1;
  if (df === 0) return result('no-predictors', 0);
  if (n <= rank) return result('too-few-rows', df);

  const mean = squares.reduce((s, v) => s + v, 0) / n;
  let total = 0;
  let correction = 0;
  for (const v of squares) {
    total += (v - mean) ** 2;
    correction += v - mean;
  }
  total -= (correction * correction) / n;
  if (!(Math.sqrt(total / n) > EQUAL_SQUARES_TOLERANCE * mean)) return result('equal-squares', df);
  const rss = auxiliary.scaledRss * auxiliary.yScale ** 2;
  const statistic = Math.max(0, (n * (total - rss)) / total);
  return { statistic, df, pValue: chiSquareUpperTail(statistic, df), undefinedBecause: undefined };
}
