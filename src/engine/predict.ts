import { predictorValues } from './cache/packedPredictors';
import { EngineError } from './errors';
import { columnView } from './linalg/columnMajor';
import { applyQTranspose } from './linalg/householderQr';
import { solveUpper } from './linalg/triangular';
import { solveModel } from './fitModel';
import { extrapolationFlags, fittingSpan, leverageAt } from './infer/extrapolation';
import type { LeastSquaresSolution } from './fit/leastSquares';
import type { FitSettings, ModelData, Prediction } from './types';

/**
 * Predictions at new rows: the interval for the mean response, from σ²·x₀ᵀ(XᵀWX)⁻¹x₀, and the
 * interval for one new observation, which adds σ²/w₀ (w₀ = 1 unless `newWeights` says otherwise).
 * With aliased terms a prediction exists only where it does not depend on how the aliasing is
 * resolved; elsewhere every number is NaN rather than an arbitrary one (the range flags still hold).
 * Each prediction also says where it stands against the fitting rows (infer/extrapolation.ts).
 */
export function predict(data: ModelData, xNew: number[][], settings?: FitSettings, newWeights?: number[]): Prediction[] {
  const { solution, inferenceSigma, reference, fit } = solveModel(data, settings);
  // Read from the packed predictors, so a cached fit builds no rows of its data.
  const packed = predictorValues(data);
  const p = packed.rows > 0 ? packed.p : (data.names?.length ?? 0);
  if (newWeights !== undefined && newWeights.length !== xNew.length) {
    throw new EngineError('shape', `There are ${newWeights.length} weights for ${xNew.length} new rows; they must match.`);
  }
  const multiplier = reference.multiplier(fit.settings.level);
  const hasIntercept = solution.design.hasIntercept;
  const aliasMaps = aliasCombinations(solution);
  const span = fittingSpan(data, solution);

  return xNew.map((row, i) => {
    if (row.length !== p) {
      throw new EngineError('shape', `New row ${i + 1} has ${row.length} values; the model has ${p} predictors.`);
    }
    row.forEach((v, j) => {
      if (!Number.isFinite(v)) throw new EngineError('non-finite', `New row ${i + 1}, column ${j + 1} is ${v}; it must be a finite number.`);
    });
    const w0 = newWeights === undefined ? 1 : newWeights[i];
    if (!(w0 > 0 && Number.isFinite(w0))) {
      throw new EngineError('bad-weight', `The weight of new row ${i + 1} is ${w0}; it must be a positive number.`);
    }
    const full = hasIntercept ? [1, ...row] : row;
    if (!estimable(full, solution, aliasMaps)) return notEstimable(extrapolationFlags(row, Number.NaN, span).outsideRange);

    let estimate = 0;
    for (const col of solution.qr.accepted) estimate += full[col] * solution.coefficients[col];
    const leverage = leverageAt(full, solution);
    const variance = inferenceSigma * inferenceSigma;
    return {
      ...intervalsAround(estimate, variance * leverage, variance / w0, multiplier),
      leverage,
      ...extrapolationFlags(row, leverage, span),
    };
  });
}

/**
 * The two intervals around a predicted value: for the mean response, ± m·√(var of the estimate),
 * and for one new observation, which adds the noise variance of that observation. One rule for the
 * in-memory prediction above and the pane's streamed one, which has only the covariance.
 */
export function intervalsAround(
  estimate: number,
  estimateVariance: number,
  noiseVariance: number,
  multiplier: number,
): Pick<Prediction, 'estimate' | 'meanLow' | 'meanHigh' | 'newLow' | 'newHigh'> {
  const meanHalf = multiplier * Math.sqrt(estimateVariance);
  const newHalf = multiplier * Math.sqrt(estimateVariance + noiseVariance);
  return { estimate, meanLow: estimate - meanHalf, meanHigh: estimate + meanHalf, newLow: estimate - newHalf, newHigh: estimate + newHalf };
}

function notEstimable(outsideRange: number[]): Prediction {
  const nan = Number.NaN;
  return { estimate: nan, meanLow: nan, meanHigh: nan, newLow: nan, newHigh: nan, leverage: nan, outsideRange, hiddenExtrapolation: false };
}

/** For each aliased column j, coefficients c with column j = Σₐ cₐ·(accepted column a), in data units. */
function aliasCombinations(solution: LeastSquaresSolution): Map<number, Float64Array> {
  const maps = new Map<number, Float64Array>();
  const rank = solution.qr.accepted.length;
  const { matrix } = solution.design;
  solution.qr.aliased.forEach((isAliased, j) => {
    if (!isAliased) return;
    const column = Float64Array.from(columnView(matrix, j), (v) => v / solution.columnScales[j]);
    applyQTranspose(solution.qr, column);
    const c = column.slice(0, rank);
    solveUpper(solution.qr.r, rank, c);
    maps.set(
      j,
      c.map((value, a) => (value * solution.columnScales[j]) / solution.columnScales[solution.qr.accepted[a]]),
    );
  });
  return maps;
}

/** x₀ᵀβ is estimable when x₀ respects every linear relation among the columns (to 1e-8 relative). */
function estimable(full: readonly number[], solution: LeastSquaresSolution, aliasMaps: Map<number, Float64Array>): boolean {
  for (const [j, c] of aliasMaps) {
    let implied = 0;
    let size = Math.abs(full[j]);
    solution.qr.accepted.forEach((col, a) => {
      implied += c[a] * full[col];
      size += Math.abs(c[a] * full[col]);
    });
    if (Math.abs(full[j] - implied) > 1e-8 * size) return false;
  }
  return true;
}
