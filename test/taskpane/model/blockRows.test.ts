/**
 * One block of sheet values → the accumulator's block: the header decided as the cell functions
 * decide it, incomplete rows skipped and counted, bad cells named by their sheet address, and
 * rows numbered as the sheet numbers them (sheet row 10 is "row 10" wherever the range starts;
 * common practice (no source): a user finds a row by the number at the sheet's left edge).
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, type CellGrid, type CellValue } from '../../../src/engine';
import { type BlockSources, type BlockValues, categoricalInFirstBlock, convertBlock, detectHeader, originOf } from '../../../src/taskpane/model/blockRows';

const sources: BlockSources = {
  response: { sheet: 'Data', top: 0, bottom: 99, left: 0, right: 0 },
  predictors: [
    { sheet: 'Data', top: 0, bottom: 99, left: 1, right: 1 },
    { sheet: 'Data', top: 0, bottom: 99, left: 3, right: 3 },
  ],
  weights: undefined,
};

/** The same columns from sheet row 10 down, on a sheet whose name needs quotes. */
const lower: BlockSources = {
  response: { sheet: 'Batch log', top: 9, bottom: 108, left: 0, right: 0 },
  predictors: [
    { sheet: 'Batch log', top: 9, bottom: 108, left: 1, right: 1 },
    { sheet: 'Batch log', top: 9, bottom: 108, left: 3, right: 3 },
  ],
  weights: undefined,
};

const column = (cells: unknown[]) => cells.map((c) => [c]);
const values = (y: unknown[], a: unknown[], b: unknown[]): BlockValues => ({ response: column(y), predictors: [column(a), column(b)], weights: undefined });

describe('detectHeader', () => {
  it('takes names from a text first row, as the model frame does', () => {
    const v = values(['Yield (%)', 1, 2], ['Temp', 3, 4], ['', 5, 6]);
    expect(detectHeader(v, sources, 100)).toEqual({ hasHeader: true, responseName: 'Yield (%)', predictorNames: ['Temp', 'column D'] });
  });

  it('finds no header when the response starts with a number, and names each column by its worksheet column', () => {
    expect(detectHeader(values([1, 2], [3, 4], [5, 6]), sources, 100)).toEqual({
      hasHeader: false,
      responseName: 'column A',
      predictorNames: ['column B', 'column D'],
    });
  });

  it('rejects a numeric predictor header under a text response header, naming the cell', () => {
    expect(() => detectHeader(values(['y', 1], ['a', 2], [7, 3]), sources, 100)).toThrow(/Data!D1 holds 7/);
  });
});

describe('convertBlock', () => {
  const header = { hasHeader: true, responseName: 'y', predictorNames: ['a', 'b'] };

  it('gives the used rows column-major, skipping blank, "" and #N/A rows and counting them', () => {
    const v = values(['y', 1, 2, '', 4, 5], ['a', 10, null, 30, 40, 50], ['b', 100, 200, 300, '#N/A', 500]);
    const { block, skipped, skippedExamples } = convertBlock(v, sources, header, 0);
    expect(block.rows).toBe(2);
    expect(Array.from(block.y)).toEqual([1, 5]);
    expect(Array.from(block.x)).toEqual([10, 50, 100, 500]);
    expect(skipped).toBe(3);
    expect(skippedExamples.map((s) => s.row)).toEqual([3, 4, 5]);
    expect(skippedExamples[2].reason).toBe('#N/A in b');
  });

  it('uses the same rows as the model frame on the same cells, numbered alike from the same origin', () => {
    const y: CellValue[] = ['y', 1, 2, '', 4, 5, 6];
    const a: CellValue[] = ['a', 10, null, 30, 40, '#N/A', 60];
    const b: CellValue[] = ['b', 100, 200, 300, 400, 500, 600];
    const origin = (column: number) => ({ sheet: 'Batch log', row: 9, column });
    const frame = buildModelFrame({
      y: y.map((v) => [v]),
      x: [a.map((v) => [v]), b.map((v) => [v])],
      intercept: true,
      origins: { y: origin(0), x: [origin(1), origin(3)] },
    });
    const { block, skipped, skippedExamples, usedRows } = convertBlock(values(y, a, b), lower, header, 0);
    expect(Array.from(block.y)).toEqual(frame.data.y);
    expect(skipped).toBe(frame.skipped.length);
    expect(skippedExamples).toEqual(frame.skipped);
    expect(usedRows).toEqual(frame.usedRows);
    // Header on sheet row 10, so the first data row is sheet row 11; rows 12 and 13 (blank, "") and 15 (#N/A) are left out.
    expect(usedRows).toEqual([11, 14, 16]);
  });

  it('numbers a range that starts below the top of the sheet by its worksheet rows', () => {
    const { usedRows, skippedExamples } = convertBlock(values([1, '', 3], [2, 3, 4], [4, 5, 6]), lower, header, 20000);
    // Block offset 20,000 within a range whose first row is sheet row 10.
    expect(usedRows).toEqual([20010, 20012]);
    expect(skippedExamples).toEqual([{ row: 20011, reason: 'blank in y' }]);
    expect(() => convertBlock(values([1, 2], [3, 'abc'], [5, 6]), lower, header, 0)).toThrow(`predictors cell 'Batch log'!B11 ("a") holds the text "abc".`);
  });

  it('treats a later block as data from its first row and numbers rows from the block offset', () => {
    const { block, skippedExamples } = convertBlock(values([1, ''], [2, 3], [4, 5]), sources, header, 20000);
    expect(block.rows).toBe(1);
    expect(skippedExamples[0].row).toBe(20002);
  });

  it('names the sheet cell of text in a numeric column', () => {
    expect(() => convertBlock(values([1, 2], [3, 'abc'], [5, 6]), sources, header, 40000)).toThrow(
      'predictors cell Data!B40002 ("a") holds the text "abc". Use a number, or leave the cell blank to skip the row.',
    );
  });

  it('words a bad cell exactly as the model frame of the cell functions does', () => {
    const engineMessage = (cells: CellGrid[]) => {
      try {
        buildModelFrame({
          y: cells[0],
          x: [cells[1], cells[2]],
          intercept: true,
          origins: { y: originOf(sources.response), x: [originOf(sources.predictors[0]), originOf(sources.predictors[1])] },
        });
      } catch (error) {
        return (error as Error).message;
      }
      return 'no error';
    };
    const streamedMessage = () => {
      try {
        convertBlock(values(['y', 1, 2, 3], ['a', 3, '1,5', 4], ['b', 5, 6, 7]), sources, header, 0);
      } catch (error) {
        return (error as Error).message;
      }
      return 'no error';
    };
    const grid = (name: string, cells: (number | string)[]): CellGrid => [[name], ...cells.map((c) => [c])];
    const expected = engineMessage([grid('y', [1, 2, 3]), grid('a', [3, '1,5', 4]), grid('b', [5, 6, 7])]);
    expect(expected).toContain('looks like a number stored as text');
    expect(streamedMessage()).toBe(expected);
  });

  it('names booleans and error values too', () => {
    expect(() => convertBlock(values([1, true], [3, 4], [5, 6]), sources, header, 0)).toThrow(/Data!A2 \("y"\) holds TRUE/);
    expect(() => convertBlock(values([1, 2], [3, 4], [5, '#DIV/0!']), sources, header, 0)).toThrow(/Data!D2 \("b"\) holds the error #DIV\/0!/);
  });

  it('keeps weights and rejects one that is not positive', () => {
    const weighted: BlockSources = { ...sources, weights: { sheet: 'Data', top: 0, bottom: 99, left: 5, right: 5 } };
    const v = { ...values([1, 2], [3, 4], [5, 6]), weights: column([2, 0.5]) };
    expect(Array.from(convertBlock(v, weighted, { ...header, hasHeader: false }, 0).block.weights ?? [])).toEqual([2, 0.5]);
    expect(() => convertBlock({ ...v, weights: column([2, -1]) }, weighted, { ...header, hasHeader: false }, 0)).toThrow(/Data!F2 is -1/);
  });
});

describe('categoricalInFirstBlock', () => {
  it('says that a text column needs a live report', () => {
    const header = { hasHeader: true, responseName: 'y', predictorNames: ['a', 'Origin'] };
    expect(categoricalInFirstBlock(values(['y', 1, 2], ['a', 1, 2], ['Origin', 'North', 'South']), header)).toMatch(
      /^Origin holds text.*categorical columns need the data to fit in a live report/,
    );
    expect(categoricalInFirstBlock(values(['y', 1, 2], ['a', 1, 2], ['Origin', 3, 'South']), header)).toBeUndefined();
  });
});
