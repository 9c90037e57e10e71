/**
 * Sizing by payload: the byte count, the rows per read block and the pieces of a write. The 5 MB
 * cap per request and per response is from "Resource limits and performance optimization for
 * Office Add-ins" (Excel add-ins section); the UTF-8 lengths are from RFC 3629, section 3.
 */
import { describe, expect, it } from 'vitest';
import { BlockSizer, FIRST_GUESS_CELL_BYTES, isPayloadLimit, jsonBytes, PAYLOAD_BUDGET_BYTES, piecesWithin } from '../../../src/taskpane/excel/payload';

const FIVE_MB = 5 * 1024 * 1024;

describe('jsonBytes', () => {
  it('counts the JSON text in UTF-8: 1 byte below U+0080, 2 below U+0800, 3 in the rest of the BMP, 4 for a surrogate pair (RFC 3629)', () => {
    expect(jsonBytes([[1.5], [null]])).toBe('[[1.5],[null]]'.length);
    expect(jsonBytes(['é'])).toBe(2 + 2 + 2); // brackets, quotes, then é as 2 bytes
    expect(jsonBytes(['σ℃'])).toBe(4 + 2 + 3);
    expect(jsonBytes(['😀'])).toBe(4 + 4);
  });
});

describe('isPayloadLimit', () => {
  it('knows both codes the docs list for the 5 MB cap, and nothing else ("Error handling with the application-specific JavaScript APIs", error codes table)', () => {
    expect(isPayloadLimit({ code: 'ResponsePayloadSizeLimitExceeded' })).toBe(true);
    expect(isPayloadLimit({ code: 'RequestPayloadSizeLimitExceeded' })).toBe(true);
    expect(isPayloadLimit({ code: 'InvalidArgument' })).toBe(false);
    expect(isPayloadLimit(new Error('ResponsePayloadSizeLimitExceeded'))).toBe(false);
    expect(isPayloadLimit(undefined)).toBe(false);
  });
});

describe('BlockSizer', () => {
  it('keeps the budget well under the 5 MB cap', () => {
    expect(PAYLOAD_BUDGET_BYTES).toBeLessThanOrEqual(0.8 * FIVE_MB);
  });

  it('sizes the first block by columns: twenty predictors, a response and weights get a twenty-second of one column’s rows', () => {
    const one = new BlockSizer(1).rows;
    const wide = new BlockSizer(22).rows;
    expect(wide * 22 * FIRST_GUESS_CELL_BYTES).toBeLessThanOrEqual(PAYLOAD_BUDGET_BYTES);
    expect(Math.abs(one / wide - 22)).toBeLessThan(0.01 * 22);
    // The 20,000 rows read at every width before: about 12 MB of numbers at 22 columns.
    expect(wide).toBeLessThan(20_000);
  });

  it('learns from what came back, at most doubling, halves a block that was refused and then asks for no more bytes than were accepted', () => {
    const sizer = new BlockSizer(4, 1_000);
    expect(sizer.rows).toBe(Math.floor(1_000 / (4 * FIRST_GUESS_CELL_BYTES)));
    sizer.measured(8, 80); // 10 bytes a row: room for 100, but no more than twice the 8 just read
    expect(sizer.rows).toBe(16);
    sizer.measured(16, 800); // 50 bytes a row
    expect(sizer.rows).toBe(20);
    expect(sizer.rejected(20)).toBe(true);
    expect(sizer.rows).toBe(10);
    // Accepted at 10 rows of 50 bytes: 500 bytes is now the most it asks for, though rows get lighter.
    sizer.measured(10, 500);
    expect(sizer.rows).toBe(10);
    sizer.measured(10, 250);
    expect(sizer.rows).toBe(20);
    sizer.measured(20, 250);
    expect(sizer.rows).toBe(40);
    expect(sizer.rejected(1)).toBe(false);
  });
});

describe('piecesWithin', () => {
  it('cuts consecutive units where the next would pass the budget, and lets an over-heavy unit stand alone', () => {
    const bytes = [40, 40, 30, 120, 10, 10];
    expect(piecesWithin(bytes.length, (i) => bytes[i], 100)).toEqual([
      { start: 0, count: 2 },
      { start: 2, count: 1 },
      { start: 3, count: 1 },
      { start: 4, count: 2 },
    ]);
    expect(piecesWithin(0, () => 1, 100)).toEqual([]);
  });
});
