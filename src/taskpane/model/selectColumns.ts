import { type AccumulatedRows, RegressionAccumulator } from '../../engine';

/**
 * The accumulated R of a different choice or order of columns, without the rows: R's own rows,
 * restricted to the chosen columns and y, have the same Gram matrix as the data's, so folding
 * them into a fresh accumulator gives a valid R for the sub-model (the column norms, and so the
 * alias decisions, are the data's too). `rows` holds [1 | X | y]; `columns` indexes R's columns
 * (0 the intercept, j the j-th predictor) and starts with 0 when `intercept` is set.
 */
export function selectColumns(rows: AccumulatedRows, columns: readonly number[], intercept: boolean): AccumulatedRows {
  const size = rows.size;
  const k = columns.length;
  const x = new Float64Array(size * k);
  const y = new Float64Array(size);
  for (let i = 0; i < size; i++) {
    columns.forEach((c, j) => {
      x[j * size + i] = rows.r[i * size + c];
    });
    y[i] = rows.r[i * size + size - 1];
  }
  // No intercept here: the intercept, when wanted, is R's column 0, carried like any other column.
  const refolded = new RegressionAccumulator(k, false);
  refolded.addBlock({ rows: size, x, y });
  const { r, size: newSize } = refolded.result();
  return { ...rows, r, size: newSize, intercept };
}

/**
 * The trailing corner of R after the first `leading` columns: the later columns and y with the
 * leading ones projected out. As rows of a no-intercept model on n − rank(leading) rows, its
 * "all slopes zero" F is the extra-sum-of-squares F of adding those columns.
 */
export function trailingCorner(rows: AccumulatedRows, leading: number, leadingRank: number): AccumulatedRows {
  const size = rows.size - leading;
  const r = new Float64Array(size * size);
  for (let i = 0; i < size; i++) for (let j = i; j < size; j++) r[i * size + j] = rows.r[(leading + i) * rows.size + leading + j];
  return { r, size, n: rows.n - leadingRank, intercept: false, weightSum: rows.weightSum, logWeightSum: 0, yMean: 0, ySquaredDeviations: 0, weighted: false };
}
