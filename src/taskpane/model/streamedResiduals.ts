import { blockResiduals, type RowBlock } from '../../engine';
import type { ConvertedBlock } from './blockRows';
import type { StreamedAnalysis } from './paneAnalysis';

export const RESIDUAL_TABLE_HEADER = ['Row', 'Fitted', 'Residual'];

/**
 * The second pass of a streamed report: one block's rows as [row, fitted, residual], the row
 * being its worksheet row (sheet row 10 is row 10, wherever the chosen ranges start). The block's columns are in sheet order; the fit's are
 * base first and added last, so they are put in the fit's order first.
 */
export function residualRows(converted: ConvertedBlock, analysis: StreamedAnalysis): number[][] {
  const { fit, order } = analysis;
  if (fit === undefined) return [];
  const { block } = converted;
  const x = new Float64Array(block.x.length);
  order.forEach((source, k) => x.set(block.x.subarray(source * block.rows, (source + 1) * block.rows), k * block.rows));
  const reordered: RowBlock = { rows: block.rows, x, y: block.y };
  const { fitted, residuals } = blockResiduals(fit, reordered);
  return converted.usedRows.map((row, i) => [row, fitted[i], residuals[i]]);
}
