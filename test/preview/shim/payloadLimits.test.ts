/**
 * Payload limits, after "Resource limits and performance optimization for Office Add-ins"
 * (Excel on the web limits requests and responses to 5 MB) and the error codes
 * RequestPayloadSizeLimitExceeded / ResponsePayloadSizeLimitExceeded from "Error handling with the
 * application-specific JavaScript APIs". Size is the UTF-8 length of the data's JSON text, a lower
 * bound of the real payload.
 */
import { describe, expect, it } from 'vitest';
import { PAYLOAD_LIMIT_BYTES, payloadBytes } from '../../../src/preview/shim/hostSettings';
import { freshHost, officeError } from './harness';

/** A rows × 1 column of equal strings, so its JSON size is easy to work out. */
const column = (rows: number, text: string) => Array.from({ length: rows }, () => [text]);

describe('request payload', () => {
  it('refuses a sync whose written values exceed 5 MB with RequestPayloadSizeLimitExceeded, writing nothing', async () => {
    const { model } = freshHost();
    // 200 rows of 25,000 characters: 200 × (25,002 + 2) + 1 bytes of JSON, just over 5,000,000.
    const values = column(200, 'x'.repeat(25_000));
    expect(payloadBytes(values)).toBeGreaterThan(PAYLOAD_LIMIT_BYTES);
    const error = await officeError(
      Excel.run(async (context) => {
        const sheet = context.workbook.worksheets.getItem('Sheet1');
        sheet.getRange('A1').values = [['first']];
        sheet.getRange('B1:B200').values = values;
        await context.sync();
      }),
    );
    expect(error.code).toBe('RequestPayloadSizeLimitExceeded');
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBeNull();
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 1 })).toBeNull();
  });

  it('accepts the same write split over two syncs', async () => {
    const { model } = freshHost();
    await Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem('Sheet1');
      sheet.getRange('B1:B100').values = column(100, 'x'.repeat(25_000));
      await context.sync();
      sheet.getRange('B101:B200').values = column(100, 'y'.repeat(25_000));
      await context.sync();
    });
    expect(model.valueAt({ sheet: 'Sheet1', row: 199, column: 1 })).toBe('y'.repeat(25_000));
  });

  it('counts bytes, not characters: non-ASCII text weighs more', () => {
    expect(payloadBytes([['é']])).toBe(payloadBytes([['e']]) + 1);
  });

  it('can be made stricter for tests, never looser than 5 MB', async () => {
    const { settings } = freshHost({ payloadLimitBytes: 1_000 });
    const refused = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Sheet1').getRange('A1:A10').values = column(10, 'z'.repeat(100));
        await context.sync();
      }),
    );
    expect(refused.code).toBe('RequestPayloadSizeLimitExceeded');
    settings.payloadLimitBytes = 50_000_000;
    const stillRefused = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Sheet1').getRange('B1:B200').values = column(200, 'x'.repeat(25_000));
        await context.sync();
      }),
    );
    expect(stillRefused.code).toBe('RequestPayloadSizeLimitExceeded');
  });
});

describe('response payload', () => {
  it('rejects a sync whose loaded values exceed 5 MB with ResponsePayloadSizeLimitExceeded', async () => {
    const { model } = freshHost();
    model.setInputs('Sheet1', 0, 0, column(200, 'x'.repeat(25_000)));
    const error = await officeError(
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Sheet1').getRange('A1:A200').load('values');
        await context.sync();
      }),
    );
    expect(error.code).toBe('ResponsePayloadSizeLimitExceeded');
  });

  // 30 cells of 100 characters are about 3,100 bytes of JSON: two such reads fit in 8,000, three do not.
  it('adds up every property read in one sync, and starts again at the next', async () => {
    const { model } = freshHost({ payloadLimitBytes: 8_000 });
    model.setInputs('Sheet1', 0, 0, column(60, 'x'.repeat(100)));
    const halves = await Excel.run(async (context) => {
      const sheet = context.workbook.worksheets.getItem('Sheet1');
      const top = sheet.getRange('A1:A30').load('values');
      await context.sync();
      const bottom = sheet.getRange('A31:A60').load('values');
      await context.sync();
      return [top.values.length, bottom.values.length];
    });
    expect(halves).toEqual([30, 30]);
    const error = await officeError(
      Excel.run(async (context) => {
        const sheet = context.workbook.worksheets.getItem('Sheet1');
        sheet.getRange('A1:A30').load('values');
        sheet.getRange('A31:A60').load('values, formulas');
        await context.sync();
      }),
    );
    expect(error.code).toBe('ResponsePayloadSizeLimitExceeded');
  });
});
