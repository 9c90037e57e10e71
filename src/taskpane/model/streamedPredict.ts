import { type CellGrid, classifyCell, describeCell, EngineError, type Prediction } from '../../engine';
import type { StreamedAnalysis } from './streamedAnalysis';

export interface StreamedPredictions {
  /** Undefined where a new row has a blank and is not predicted. */
  predictions: (Prediction | undefined)[];
  /** The first new row repeated the predictors' headers and was not predicted. */
  headerRow: boolean;
}

/**
 * Predictions at new rows from the fit's covariance alone: x₀ᵀb, the mean interval
 * m·√(x₀ᵀCx₀) and the new-case interval m·√(x₀ᵀCx₀ + σ²), which is what predict() computes from
 * the factorization. With an aliased term C has NaN entries and the row is left blank.
 */
export function predictStreamed(grid: CellGrid, analysis: StreamedAnalysis): StreamedPredictions {
  const { fit, header, order } = analysis;
  if (fit === undefined) throw new EngineError('shape', 'There is no fit to predict from.');
  const names = header.predictorNames;
  if (grid.length === 0) throw new EngineError('shape', 'The new rows are empty: select the rows to predict.');
  const headerRow =
    header.hasHeader &&
    names.every((name, j) => {
      const cell = classifyCell(grid[0][j]);
      return cell.kind === 'text' && cell.text.toLowerCase() === name.toLowerCase();
    });
  const offset = fit.settings.intercept ? 1 : 0;
  const predictions = grid.slice(headerRow ? 1 : 0).map((row, k): Prediction | undefined => {
    if (row.length !== names.length) throw new EngineError('shape', `New row ${k + 1} has ${row.length} columns; the model has ${names.length} predictors.`);
    const cells = row.map(classifyCell);
    if (cells.some((c) => c.kind === 'missing')) return undefined;
    const x0 = [
      ...(offset === 1 ? [1] : []),
      ...order.map((j) => {
        const cell = cells[j];
        if (cell.kind !== 'number') {
          throw new EngineError(
            'bad-value',
            `New row ${k + (headerRow ? 2 : 1)}, column ${j + 1} ("${names[j]}") holds ${describeCell(cell)}; it needs a number.`,
          );
        }
        return cell.value;
      }),
    ];
    return intervals(x0, analysis);
  });
  return { predictions, headerRow };
}

function intervals(x0: readonly number[], analysis: StreamedAnalysis): Prediction {
  const { fit, multiplier, inferenceSigma } = analysis;
  if (fit === undefined) throw new EngineError('shape', 'There is no fit to predict from.');
  let estimate = 0;
  let quadratic = 0;
  x0.forEach((a, i) => {
    estimate += a * fit.terms[i].estimate;
    x0.forEach((b, j) => {
      quadratic += a * fit.covariance[i][j] * b;
    });
  });
  const meanHalf = multiplier * Math.sqrt(quadratic);
  const newHalf = multiplier * Math.sqrt(quadratic + inferenceSigma * inferenceSigma);
  if (!Number.isFinite(meanHalf)) return { estimate: Number.NaN, meanLow: Number.NaN, meanHigh: Number.NaN, newLow: Number.NaN, newHigh: Number.NaN };
  return { estimate, meanLow: estimate - meanHalf, meanHigh: estimate + meanHalf, newLow: estimate - newHalf, newHigh: estimate + newHalf };
}
