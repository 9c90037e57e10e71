import { EngineError } from '../errors';
import { foldBlock } from './triangularUpdate';

/**
 * Rows in blocks, as a sheet is read: x column-major (rows × predictors), y, and optional
 * weights. The accumulator may overwrite the arrays it is given.
 */
export interface RowBlock {
  rows: number;
  x: Float64Array;
  y: Float64Array;
  weights?: Float64Array;
}

/** What a pass over all rows leaves behind: everything the fit needs, in O(q²) memory. */
export interface AccumulatedRows {
  /** Upper-triangular R of [1 | X | y] (√w-weighted), row-major size × size, size = q + 1. */
  r: Float64Array;
  size: number;
  n: number;
  intercept: boolean;
  weightSum: number;
  /** Σ log wᵢ, for the Gaussian log-likelihood of a weighted model. */
  logWeightSum: number;
  /** Weighted mean of y and Σ w(y − ȳ)², merged block by block (Chan, Golub & LeVeque 1979). */
  yMean: number;
  ySquaredDeviations: number;
  weighted: boolean;
}

/**
 * Least squares for data too large to hold twice: each block of rows is folded into the R
 * factor of [1 | X | y] by Householder reflections (TSQR), so memory beyond the current block
 * is O(q²) whatever the number of rows.
 */
/** Rows folded at a time: small enough that a chunk of [1 | X | y] stays in the processor's cache. */
const CHUNK_ROWS = 256;

export class RegressionAccumulator {
  private readonly size: number;
  private readonly r: Float64Array;
  private n = 0;
  private weightSum = 0;
  private logWeightSum = 0;
  private yMean = 0;
  private ySquaredDeviations = 0;
  private readonly weighted: boolean;
  private work = new Float64Array(0);

  constructor(
    private readonly predictors: number,
    private readonly intercept: boolean,
    weighted = false,
  ) {
    this.size = predictors + (intercept ? 1 : 0) + 1;
    this.r = new Float64Array(this.size * this.size);
    this.weighted = weighted;
  }

  addBlock(block: RowBlock): void {
    const { rows, x, y, weights } = block;
    if (rows === 0) return;
    if (x.length !== rows * this.predictors || y.length !== rows) {
      throw new EngineError('shape', `A block of ${rows} rows needs ${rows * this.predictors} x values and ${rows} y values.`);
    }
    if (this.weighted !== (weights !== undefined)) throw new EngineError('shape', 'Either every block has weights or none has.');
    this.addMoments(block);
    for (let start = 0; start < rows; start += CHUNK_ROWS) this.foldChunk(block, start, Math.min(CHUNK_ROWS, rows - start));
    this.n += rows;
  }

  /** Weighted mean and squared deviations of y, merged with the running ones (Chan et al.). */
  private addMoments({ rows, y, weights }: RowBlock): void {
    let blockWeight = 0;
    let blockMean = 0;
    for (let i = 0; i < rows; i++) {
      const w = weights === undefined ? 1 : weights[i];
      if (!(w > 0 && Number.isFinite(w)) || !Number.isFinite(y[i])) {
        throw new EngineError(w > 0 ? 'non-finite' : 'bad-weight', `Row ${this.n + i + 1} has a weight or response that is not a positive finite number.`);
      }
      blockWeight += w;
      blockMean += w * y[i];
      if (weights !== undefined) this.logWeightSum += Math.log(w);
    }
    blockMean /= blockWeight;
    let blockDeviations = 0;
    for (let i = 0; i < rows; i++) blockDeviations += (weights === undefined ? 1 : weights[i]) * (y[i] - blockMean) ** 2;
    const total = this.weightSum + blockWeight;
    const delta = blockMean - this.yMean;
    this.ySquaredDeviations += blockDeviations + (delta * delta * this.weightSum * blockWeight) / total;
    this.yMean += (delta * blockWeight) / total;
    this.weightSum = total;
  }

  /** Copies rows [start, start + count) as √w-scaled columns of [1 | X | y] and folds them into R. */
  private foldChunk({ rows, x, y, weights }: RowBlock, start: number, count: number): void {
    const size = this.size;
    const work = this.work.length >= count * size ? this.work.subarray(0, count * size) : (this.work = new Float64Array(count * size));
    const offset = this.intercept ? 1 : 0;
    for (let i = 0; i < count; i++) {
      const root = weights === undefined ? 1 : Math.sqrt(weights[start + i]);
      if (this.intercept) work[i] = root;
      work[(size - 1) * count + i] = y[start + i] * root;
    }
    for (let j = 0; j < this.predictors; j++) {
      const source = j * rows + start;
      const target = (j + offset) * count;
      if (weights === undefined) work.set(x.subarray(source, source + count), target);
      else for (let i = 0; i < count; i++) work[target + i] = x[source + i] * Math.sqrt(weights[start + i]);
    }
    foldBlock(this.r, size, work, count);
    // A NaN or infinity anywhere in the chunk spreads into R, so one look at R replaces a check
    // of every value; the chunk's own rows are searched only to name the culprit.
    if (!isFiniteArray(this.r)) this.reportNonFinite(x, rows, start, count);
  }

  private reportNonFinite(x: Float64Array, rows: number, start: number, count: number): never {
    for (let i = 0; i < count; i++) {
      for (let j = 0; j < this.predictors; j++) {
        const v = x[j * rows + start + i];
        if (!Number.isFinite(v)) throw new EngineError('non-finite', `Row ${this.n + start + i + 1}, predictor ${j + 1} is ${v}; it must be a finite number.`);
      }
    }
    throw new EngineError('non-finite', `Rows ${this.n + start + 1} to ${this.n + start + count} overflow double precision; rescale the data.`);
  }

  result(): AccumulatedRows {
    return {
      r: Float64Array.from(this.r),
      size: this.size,
      n: this.n,
      intercept: this.intercept,
      weightSum: this.weightSum,
      logWeightSum: this.logWeightSum,
      yMean: this.yMean,
      ySquaredDeviations: this.ySquaredDeviations,
      weighted: this.weighted,
    };
  }
}

function isFiniteArray(values: Float64Array): boolean {
  for (let i = 0; i < values.length; i++) if (!Number.isFinite(values[i])) return false;
  return true;
}
