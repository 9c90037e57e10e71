import type { ModelFit } from '../types';
import type { RowBlock } from './regressionAccumulator';

/**
 * The second pass of a streamed fit: fitted values and residuals for one block of rows, from the
 * finished coefficients (aliased terms count as 0, as the fit treats them).
 */
export function blockResiduals(fit: ModelFit, block: RowBlock): { fitted: Float64Array; residuals: Float64Array } {
  const offset = fit.settings.intercept ? 1 : 0;
  const predictors = fit.terms.length - offset;
  const coefficient = (j: number) => (fit.terms[j].aliased ? 0 : fit.terms[j].estimate);
  const fitted = new Float64Array(block.rows).fill(offset === 1 ? coefficient(0) : 0);
  for (let j = 0; j < predictors; j++) {
    const b = coefficient(j + offset);
    if (b === 0) continue;
    const column = j * block.rows;
    for (let i = 0; i < block.rows; i++) fitted[i] += b * block.x[column + i];
  }
  const residuals = Float64Array.from(fitted, (f, i) => block.y[i] - f);
  return { fitted, residuals };
}
