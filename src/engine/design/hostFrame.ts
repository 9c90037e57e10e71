/**
 * A host's ranges read into a model frame as the host hands them over, without first turning
 * every cell into a CellValue: when every cell is a number, a blank or #N/A (the common case)
 * that is the one pass over the cells. Anything else (text, another error, a row that is no
 * array, ragged or mismatched ranges, a bad header) leaves the ranges to the general read of
 * their CellValues, which the host makes only then and which alone words what is wrong.
 */
import type { HostGrid } from './cells';
import { frameNames, primitiveCell } from './frameNames';
import type { FrameInput, ModelFrame } from './modelFrame';
import { readNumericCells, type ObjectErrorCode } from './numericCells';
import { numericFrame } from './numericFrame';
import { recentFrame, rememberFrame } from './recentFrames';
import { rowNumber } from './origin';

export interface HostFrameInput extends Omit<FrameInput, 'y' | 'x' | 'weights'> {
  y: HostGrid;
  x: readonly HostGrid[];
  weights?: HostGrid;
  /** The error code of an object cell (the host's error value), or undefined for any other object. */
  errorCodeOf: ObjectErrorCode;
  /** The same ranges as CellValues, for the general read; called only when the one pass cannot take them. */
  asCells: () => FrameInput;
}

/** The frame of all-numeric host ranges, or undefined for the general read. Throws nothing. */
export function hostNumericFrame(input: HostFrameInput): ModelFrame | undefined {
  const rowCount = input.y.length;
  const yFirst: unknown = input.y[0];
  if (!Array.isArray(yFirst) || yFirst.length !== 1) return undefined;
  const widths: number[] = [];
  for (const block of input.x) {
    const header: unknown = block[0];
    if (!Array.isArray(header)) return undefined;
    widths.push(header.length);
  }
  const responseFirst = primitiveCell(yFirst[0]);
  if (responseFirst === undefined) return undefined;
  const origins = input.origins ?? {};
  const naming = frameNames(
    {
      rowCount,
      responseFirst,
      widths,
      headerCell: (b, j) => primitiveCell((input.x[b][0] as readonly unknown[])[j]),
      xArguments: input.xArguments,
      origins,
    },
    false,
  );
  if (naming === undefined) return undefined;
  const { hasHeader, responseName, names, columnBlocks } = naming;
  const firstRow = rowNumber(origins.y, 0);
  // Everything but the cells that decides the frame (the reasons' wording follows from the names).
  const signature = JSON.stringify([rowCount, widths, input.weights !== undefined, input.intercept, firstRow, hasHeader, responseName, names]);
  const expected = recentFrame(signature);
  const columnNames = [responseName, ...names, 'weight'];
  const cells = readNumericCells(input.y, input.x, input.weights, naming.firstData, columnNames, firstRow, input.errorCodeOf, expected?.cells);
  if (cells === undefined) return undefined;
  if (expected !== undefined && cells === expected.cells) return expected.frame;
  const frame = numericFrame(cells, { hasHeader, responseName, names, columnBlocks, intercept: input.intercept });
  rememberFrame(signature, { cells, frame });
  return frame;
}
