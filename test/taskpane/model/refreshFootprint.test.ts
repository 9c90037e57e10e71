/** What a values report's Refresh checks before writing: only cells it did not write before. */
import { describe, expect, it } from 'vitest';
import { newlyWrittenAddresses } from '../../../src/taskpane/model/refreshFootprint';
import type { ReportCell } from '../../../src/taskpane/model/reportPlan';

const label = (row: number, column: number): ReportCell => ({ row, column, kind: 'label', text: 'x' });

describe('newlyWrittenAddresses', () => {
  it('lists report cells the previous report left empty, and nothing it wrote itself', () => {
    const previous = [label(0, 0), label(1, 0), label(1, 1)];
    const next = [label(0, 0), label(1, 1), label(2, 0), label(2, 1)];
    expect(newlyWrittenAddresses(previous, next, 10, 10)).toEqual(['A3', 'B3']);
  });

  it('adds the residual table rows beyond its previous length, in blocks of 20,000 rows', () => {
    // Header in row 5; 10 rows filled rows 6–15, so growth to 45,010 starts at row 16.
    expect(newlyWrittenAddresses([], [], 10, 45_010)).toEqual(['K16:M20015', 'K20016:M40015', 'K40016:M45015']);
  });

  it('adds a new panel’s header and rows when the table passes a million rows', () => {
    expect(newlyWrittenAddresses([], [], 999_990, 1_000_005)).toEqual(['O5:Q5', 'K999996:M1000005', 'O6:Q10']);
  });

  it('adds nothing for a table that shrinks or stays', () => {
    expect(newlyWrittenAddresses([], [], 50, 50)).toEqual([]);
    expect(newlyWrittenAddresses([], [], 50, 20)).toEqual([]);
  });
});
