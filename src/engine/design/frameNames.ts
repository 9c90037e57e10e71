/**
 * The header and the names of a frame's columns, decided once for both reads of the cells (the
 * one-pass numeric read and the general one): row 1 is a header when response's first cell is
 * text, every predictor column then needs a text header (or a blank one), and a column without
 * one is named by its worksheet column.
 */
import { EngineError } from '../errors';
import { type Cell, classifyCell, describeCell, shortName } from './cells';
import type { FrameOrigins } from './modelFrame';
import { cellPlace, columnLetters } from './origin';

export interface FrameNames {
  hasHeader: boolean;
  /** The position of the first row of data: 1 after a header, else 0. */
  firstData: number;
  responseName: string;
  /** Each predictor column's name, across blocks. */
  names: string[];
  /** For each predictor column, the index of its x block. */
  columnBlocks: number[];
  /** For each predictor column, its 0-based place within its block. */
  columnWithinBlock: number[];
}

export interface NamingInput {
  rowCount: number;
  /** response's first cell, as a Cell. */
  responseFirst: Cell;
  /** Each x block's width. */
  widths: readonly number[];
  /** The first-row cell of block b's column j; undefined when it is no cell value yet (a host's object). */
  headerCell: (b: number, j: number) => Cell | undefined;
  xArguments?: readonly string[];
  origins: FrameOrigins;
}

/**
 * strict: a predictor header that is neither text nor blank throws its message (the general
 * read); otherwise it, or a header cell that is no cell value, gives undefined, for the general
 * read to word.
 */
export function frameNames(input: NamingInput, strict: true): FrameNames;
export function frameNames(input: NamingInput, strict: false): FrameNames | undefined;
export function frameNames(input: NamingInput, strict: boolean): FrameNames | undefined {
  const { origins } = input;
  const columnBlocks = input.widths.flatMap((width, b) => Array.from({ length: width }, () => b));
  const columnWithinBlock = input.widths.flatMap((width) => Array.from({ length: width }, (_, j) => j));
  const first = input.responseFirst;
  const hasHeader = input.rowCount > 1 && first.kind === 'text';
  const responseName = first.kind === 'text' && hasHeader ? shortName(first.text) : worksheetColumnName(origins.y?.column, 0, 'y');
  const names: string[] = [];
  for (let j = 0; j < columnBlocks.length; j++) {
    const block = columnBlocks[j];
    const within = columnWithinBlock[j];
    const unnamed = worksheetColumnName(origins.xNamedAt?.[block] ?? origins.x?.[block]?.column, within, `x${j + 1}`);
    const cell = hasHeader ? input.headerCell(block, within) : undefined;
    if (!hasHeader || cell?.kind === 'missing') names.push(unnamed);
    else if (cell?.kind === 'text') names.push(shortName(cell.text));
    else if (!strict || cell === undefined) return undefined;
    else {
      const place = cellPlace(input.xArguments?.[block] ?? 'predictors', origins.x?.[block], 0, within, false);
      throw new EngineError(
        'bad-value',
        `response starts with a header but ${place} holds ${describeCell(cell)}: ` +
          'give every predictor column a text header, or select the ranges without headers.',
      );
    }
  }
  return { hasHeader, firstData: hasHeader ? 1 : 0, responseName, names, columnBlocks, columnWithinBlock };
}

/** A cell as the engine reads it, or undefined for an object that is no CellValue (a host's own). */
export function primitiveCell(value: unknown): Cell | undefined {
  if (value === null || value === undefined || typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean') {
    return classifyCell(value);
  }
  return undefined;
}

/**
 * A column without a header is named as the user finds it on the sheet, "column C", when its
 * range's worksheet column is known; only without one (an array constant, a direct call) by its
 * place in the fit, `fallback` ("y", "x1", …).
 */
export function worksheetColumnName(firstColumn: number | undefined, within: number, fallback: string): string {
  return firstColumn === undefined ? fallback : `column ${columnLetters(firstColumn + within)}`;
}
