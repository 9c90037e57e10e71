/**
 * A1 addresses as Excel writes them. Whole columns and multi-area addresses follow "Work with
 * multiple ranges simultaneously in Excel add-ins" (its example address "Sheet1!F3:F5, Sheet1!H:H");
 * sheet quoting and the grid size are common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import {
  cellAddress,
  columnCount,
  columnIndex,
  columnLetters,
  columnsOf,
  formatAbsolute,
  formatRange,
  isWholeColumns,
  MAX_ROWS,
  parseAreas,
  parseRange,
  quoteSheetName,
  rangeContains,
  rangesOverlap,
  rowCount,
  splitAreas,
  splitSheet,
} from '../../src/addressing/a1';

describe('cells and ranges', () => {
  it('converts column letters both ways across the one-, two- and three-letter boundaries', () => {
    for (const [letters, index] of [
      ['A', 0],
      ['Z', 25],
      ['AA', 26],
      ['AZ', 51],
      ['ZZ', 701],
      ['AAA', 702],
      ['XFD', 16383],
    ] as const) {
      expect(columnLetters(index)).toBe(letters);
      expect(columnIndex(letters)).toBe(index);
    }
  });

  it('parses cells and ranges with $ anchors, in either corner order, with or without a sheet', () => {
    expect(parseRange('$C$5:B2', 'Data')).toEqual({ sheet: 'Data', top: 1, left: 1, bottom: 4, right: 2 });
    expect(parseRange("'Bob''s data'!A1", 'Data')).toEqual({ sheet: "Bob's data", top: 0, left: 0, bottom: 0, right: 0 });
    expect(parseRange('XFD1048576', 'S')).toEqual({ sheet: 'S', top: MAX_ROWS - 1, left: 16383, bottom: MAX_ROWS - 1, right: 16383 });
  });

  it('rejects addresses outside the grid and malformed text', () => {
    for (const bad of ['A0', 'XFE1', 'A1048577', 'A1:B2:C3', 'B1:C', 'B:C5', '1:1', '', 'Data!']) expect(parseRange(bad, 'S')).toBeUndefined();
  });

  it('writes one cell without a colon and quotes sheet names that are not plain words', () => {
    expect(formatRange({ sheet: 'Data', top: 1, left: 1, bottom: 1, right: 1 })).toBe('Data!B2');
    expect(formatRange({ sheet: 'Planned batches', top: 0, left: 0, bottom: 9, right: 2 })).toBe("'Planned batches'!A1:C10");
    expect(quoteSheetName('AB12')).toBe("'AB12'");
    expect(formatAbsolute({ sheet: 'Data', top: 0, left: 1, bottom: 60, right: 1 })).toBe('Data!$B$1:$B$61');
  });
});

describe('whole columns', () => {
  it('parses "B:B", "$B:$D" and "Sheet1!D:B" as every row of those columns', () => {
    expect(parseRange('B:B', 'Sheet1')).toEqual({ sheet: 'Sheet1', top: 0, left: 1, bottom: MAX_ROWS - 1, right: 1 });
    expect(parseRange('$B:$D', 'Sheet1')).toEqual({ sheet: 'Sheet1', top: 0, left: 1, bottom: MAX_ROWS - 1, right: 3 });
    expect(parseRange('Data!D:B', 'Sheet1')).toEqual({ sheet: 'Data', top: 0, left: 1, bottom: MAX_ROWS - 1, right: 3 });
  });

  it('writes whole columns as Excel does ("Sheet1!H:H"), and round-trips them', () => {
    const column = parseRange('Sheet1!H:H', 'x');
    expect(column && isWholeColumns(column)).toBe(true);
    expect(column && formatRange(column)).toBe('Sheet1!H:H');
    expect(formatRange({ sheet: 'Sheet1', top: 0, left: 1, bottom: MAX_ROWS - 1, right: 3 }, false)).toBe('B:D');
    expect(formatRange({ sheet: 'Sheet1', top: 1, left: 1, bottom: MAX_ROWS - 1, right: 1 }, false)).toBe('B2:B1048576');
  });
});

describe('multi-area addresses', () => {
  it('splits at commas outside quoted sheet names and trims the space Excel may put after them', () => {
    expect(splitAreas('Sheet1!F3:F5, Sheet1!H:H')).toEqual(['Sheet1!F3:F5', 'Sheet1!H:H']);
    expect(splitAreas("'a, b'!A1,'a, b'!C1")).toEqual(["'a, b'!A1", "'a, b'!C1"]);
  });

  it('parses every area or none', () => {
    expect(parseAreas('Sheet1!F3:F5, Sheet1!H:H', 'x')).toEqual([
      { sheet: 'Sheet1', top: 2, left: 5, bottom: 4, right: 5 },
      { sheet: 'Sheet1', top: 0, left: 7, bottom: MAX_ROWS - 1, right: 7 },
    ]);
    expect(parseAreas('B2:B9,D2', 'Data')?.map((r) => r.sheet)).toEqual(['Data', 'Data']);
    expect(parseAreas('B2:B9,nonsense', 'Data')).toBeUndefined();
    expect(parseAreas('', 'Data')).toBeUndefined();
  });
});

describe('parts of an address', () => {
  it('writes a cell from 0-based row and column', () => {
    expect(cellAddress(0, 0)).toBe('A1');
    expect(cellAddress(9, 27)).toBe('AB10');
  });

  it('splits off the sheet, unquoting a quoted one and keeping a "!" inside the quotes', () => {
    expect(splitSheet('Data!B2:C9')).toEqual({ sheet: 'Data', address: 'B2:C9' });
    expect(splitSheet("'Bob''s data'!A1")).toEqual({ sheet: "Bob's data", address: 'A1' });
    expect(splitSheet("'Wow!'!C3")).toEqual({ sheet: 'Wow!', address: 'C3' });
    expect(splitSheet('B2')).toEqual({ sheet: undefined, address: 'B2' });
  });
});

describe('range arithmetic', () => {
  const block = { sheet: 'Data', top: 1, left: 1, bottom: 4, right: 3 };

  it('counts rows and columns inclusively', () => {
    expect(rowCount(block)).toBe(4);
    expect(columnCount(block)).toBe(3);
  });

  it('splits a block into its single columns, in order', () => {
    expect(columnsOf(block)).toEqual([
      { sheet: 'Data', top: 1, left: 1, bottom: 4, right: 1 },
      { sheet: 'Data', top: 1, left: 2, bottom: 4, right: 2 },
      { sheet: 'Data', top: 1, left: 3, bottom: 4, right: 3 },
    ]);
  });

  it('contains a cell on its own sheet and within its corners only', () => {
    expect(rangeContains(block, 'Data', 1, 1)).toBe(true);
    expect(rangeContains(block, 'Data', 4, 3)).toBe(true);
    expect(rangeContains(block, 'Data', 5, 3)).toBe(false);
    expect(rangeContains(block, 'Data', 2, 0)).toBe(false);
    expect(rangeContains(block, 'Other', 2, 2)).toBe(false);
    // Sheet names are compared regardless of case, as Excel compares them (common practice, no source).
    expect(rangeContains(block, 'DATA', 1, 1)).toBe(true);
  });

  it('overlaps a range sharing a cell, not one that only touches it or sits on another sheet', () => {
    expect(rangesOverlap(block, { sheet: 'Data', top: 4, left: 3, bottom: 8, right: 8 })).toBe(true);
    expect(rangesOverlap(block, { sheet: 'Data', top: 5, left: 1, bottom: 8, right: 3 })).toBe(false);
    expect(rangesOverlap(block, { sheet: 'Data', top: 0, left: 4, bottom: 9, right: 4 })).toBe(false);
    expect(rangesOverlap(block, { ...block, sheet: 'Other' })).toBe(false);
    expect(rangesOverlap(block, { ...block, sheet: 'data' })).toBe(true);
  });
});
