import { EngineError } from '../errors';
import { INTERCEPT_NAME, type WeightedDesign } from '../fit/design';
import { solveLeastSquares } from '../fit/leastSquares';
import { assembleFit, type SolvedModel } from '../fitModel';
import { stableNorm } from '../linalg/columnMajor';
import { resolveSettings } from '../settings';
import type { FitSettings } from '../types';
import type { AccumulatedRows } from './regressionAccumulator';

/**
 * The fit of streamed rows. The accumulated R of [1 | X | y] is itself a least-squares problem
 * with the same solution: its first q+1 rows, as a design [R_xx; 0] with response [c; ρ], have
 * XᵀX and Xᵀy equal to the full data's, the same column norms (so the same scale-invariant alias
 * decisions) and the same ‖y‖. Solving that small problem with the ordinary path and supplying
 * the rows' totals gives every estimate, standard error and test the in-memory fit gives; only
 * the per-row fitted values and residuals need a second pass.
 */
export function fitAccumulated(rows: AccumulatedRows, settings?: FitSettings, names?: readonly string[]): SolvedModel {
  const resolved = resolveSettings(settings);
  if (resolved.covariance !== 'classical') {
    throw new EngineError('bad-setting', 'Robust standard errors need every row at hand; a streamed fit gives the classical ones.');
  }
  if (resolved.intercept !== rows.intercept) throw new EngineError('bad-setting', 'The rows were accumulated with a different intercept setting.');
  const q = rows.size - 1;
  const pseudoRows = q + 1;
  const data = new Float64Array(pseudoRows * q);
  const y = new Float64Array(pseudoRows);
  for (let i = 0; i < pseudoRows; i++) {
    for (let j = 0; j < q; j++) data[j * pseudoRows + i] = rows.r[i * rows.size + j];
    y[i] = rows.r[i * rows.size + q];
  }
  const predictors = q - (rows.intercept ? 1 : 0);
  const predictorNames = names ?? Array.from({ length: predictors }, (_, j) => `x${j + 1}`);
  const design: WeightedDesign = {
    names: rows.intercept ? [INTERCEPT_NAME, ...predictorNames] : [...predictorNames],
    hasIntercept: rows.intercept,
    matrix: { rows: pseudoRows, cols: q, data },
    y,
    response: y,
    rootWeights: undefined,
  };
  const solution = solveLeastSquares(design);
  const yNorm = stableNorm(y);
  const yScale = yNorm > 0 ? yNorm : 1;
  const scaledTss = rows.intercept ? rows.ySquaredDeviations / (yScale * yScale) : 1;
  return assembleFit(solution, resolved, { n: rows.n, hasIntercept: rows.intercept, scaledTss, logWeightSum: rows.logWeightSum }, [], []);
}
