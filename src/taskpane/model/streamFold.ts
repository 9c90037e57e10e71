import { EngineError, RegressionAccumulator, type RowBlock, type SkippedRow } from '../../engine';
import { type BlockHeader, type BlockSources, type BlockValues, categoricalInFirstBlock, convertBlock, detectHeader } from './blockRows';
import { SKIPPED_EXAMPLES } from './paneWarnings';
import type { StreamedData } from './streamedAnalysis';

/**
 * Blocks of sheet values, in order, folded into what a streamed analysis needs: R of [1 | X | y]
 * (always with the intercept column: models without it, or in another order, come from R), each
 * predictor's range over the rows used, the skipped rows, and the first row where a header would
 * be. Each block is dropped once folded.
 */
export class StreamFold {
  private readonly accumulator: RegressionAccumulator;
  private header: BlockHeader | undefined;
  private first: BlockValues | undefined;
  private readonly min: number[];
  private readonly max: number[];
  private skipped = 0;
  private readonly skippedExamples: SkippedRow[] = [];

  constructor(
    private readonly sources: BlockSources,
    /** Rows in the chosen ranges, header included. */
    private readonly totalRows: number,
  ) {
    this.accumulator = new RegressionAccumulator(sources.predictors.length, true, sources.weights !== undefined);
    this.min = sources.predictors.map(() => Number.POSITIVE_INFINITY);
    this.max = sources.predictors.map(() => Number.NEGATIVE_INFINITY);
  }

  /** `offset`: the block's first row within the chosen ranges (0 for the first block). */
  add(values: BlockValues, offset: number): void {
    if (this.header === undefined) {
      this.header = detectHeader(values, this.sources, this.totalRows);
      const categorical = categoricalInFirstBlock(values, this.header);
      if (categorical !== undefined) throw new EngineError('bad-value', categorical);
      this.first = { response: values.response.slice(0, 1), predictors: values.predictors.map((c) => c.slice(0, 1)), weights: values.weights?.slice(0, 1) };
    }
    const converted = convertBlock(values, this.sources, this.header, offset);
    // Ranges first: the accumulator may overwrite the block it is given.
    this.foldRanges(converted.block);
    this.accumulator.addBlock(converted.block);
    this.skipped += converted.skipped;
    this.skippedExamples.push(...converted.skippedExamples.slice(0, SKIPPED_EXAMPLES - this.skippedExamples.length));
  }

  private foldRanges(block: RowBlock): void {
    this.min.forEach((_, j) => {
      for (let i = 0; i < block.rows; i++) {
        const v = block.x[j * block.rows + i];
        if (v < this.min[j]) this.min[j] = v;
        if (v > this.max[j]) this.max[j] = v;
      }
    });
  }

  result(): StreamedData {
    const accumulated = this.accumulator.result();
    if (this.first === undefined || accumulated.n === 0) {
      throw new EngineError('no-rows', 'No complete rows: every row has a blank or #N/A in the response, a predictor or a weight.');
    }
    return {
      first: this.first,
      sources: this.sources,
      totalRows: this.totalRows,
      accumulated,
      min: this.min,
      max: this.max,
      skipped: this.skipped,
      skippedExamples: this.skippedExamples,
    };
  }
}
