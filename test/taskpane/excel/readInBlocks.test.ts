/**
 * Reading the chosen columns against the strict preview host: blocks sized by payload, not rows,
 * under Excel on the web's 5 MB cap on a response ("Resource limits and performance optimization
 * for Office Add-ins"), halved when the host refuses one (ResponsePayloadSizeLimitExceeded, in
 * the table of "Error handling with the application-specific JavaScript APIs"), and held back,
 * not failed, while the user edits a cell ("Excel.RunOptions", delayForCellEdit).
 */
import { describe, expect, it } from 'vitest';
import type { RangeRef } from '../../../src/addressing/a1';
import { PAYLOAD_LIMIT_BYTES } from '../../../src/preview/shim/hostSettings';
import { readInBlocks } from '../../../src/taskpane/excel/readInBlocks';
import type { BlockValues } from '../../../src/taskpane/model/blockRows';
import { afterPendingWork, freshHost } from '../../preview/shim/harness';

const column = (left: number, rows: number): RangeRef => ({ sheet: 'Data', top: 0, left, bottom: rows - 1, right: left });

interface Seen {
  offsets: number[];
  rows: number[];
  response: unknown[];
  lastPredictor: unknown[];
}

async function readAll(columns: { response: RangeRef; predictors: RangeRef[] }, signal = new AbortController().signal): Promise<Seen> {
  const seen: Seen = { offsets: [], rows: [], response: [], lastPredictor: [] };
  await readInBlocks(
    { ...columns, weights: undefined },
    {
      block: (values: BlockValues, offset: number) => {
        seen.offsets.push(offset);
        seen.rows.push(values.response.length);
        seen.response.push(...values.response.map((r) => r[0]));
        seen.lastPredictor.push(...values.predictors[values.predictors.length - 1].map((r) => r[0]));
      },
      progress: () => undefined,
    },
    signal,
  );
  return seen;
}

describe('readInBlocks against the strict host', () => {
  it('reads 22 columns of 12,000 rows (over 5 MB of numbers) in blocks that each stay under the cap', async () => {
    const { model } = freshHost();
    const rows = 12_000;
    // Seventeen-digit numbers: about 21 bytes a cell in the response, so the whole table is over 5 MB.
    const value = (i: number, j: number) => (i * 22 + j + 1) / 7 + 1e-3;
    model.addSheet('Data');
    model.setInputs(
      'Data',
      0,
      0,
      Array.from({ length: rows }, (_, i) => Array.from({ length: 22 }, (_, j) => value(i, j))),
    );
    expect(JSON.stringify(Array.from({ length: rows }, (_, i) => Array.from({ length: 22 }, (_, j) => [value(i, j)]))).length).toBeGreaterThan(
      PAYLOAD_LIMIT_BYTES,
    );

    const seen = await readAll({ response: column(0, rows), predictors: Array.from({ length: 21 }, (_, j) => column(j + 1, rows)) });
    expect(seen.rows.length).toBeGreaterThan(1);
    expect(seen.rows.reduce((a, b) => a + b, 0)).toBe(rows);
    expect(seen.offsets).toEqual(seen.rows.map((_, k) => seen.rows.slice(0, k).reduce((a, b) => a + b, 0)));
    expect(seen.response).toEqual(Array.from({ length: rows }, (_, i) => value(i, 0)));
    expect(seen.lastPredictor).toEqual(Array.from({ length: rows }, (_, i) => value(i, 21)));
  });

  it('halves a block the host refuses as too large and reads on: 3,000 cells of 2,000 characters (6 MB) in one column', async () => {
    const { model } = freshHost();
    const rows = 3_000;
    const text = (i: number) => `${String(i).padStart(5, '0')}${'x'.repeat(1_995)}`;
    model.addSheet('Data');
    model.setInputs(
      'Data',
      0,
      0,
      Array.from({ length: rows }, (_, i) => [text(i), i]),
    );
    // One column's first guess covers all 3,000 rows (numbers are light); the text makes it 6 MB, refused, then two halves.
    const seen = await readAll({ response: column(0, rows), predictors: [column(1, rows)] });
    expect(seen.rows).toEqual([1_500, 1_500]);
    expect(seen.response).toEqual(Array.from({ length: rows }, (_, i) => text(i)));
    expect(seen.lastPredictor).toEqual(Array.from({ length: rows }, (_, i) => i));
  });

  it('takes a host whose limit is lower still: once a block is accepted, none is refused again', async () => {
    const { model } = freshHost({ payloadLimitBytes: 20_000 });
    const rows = 5_000;
    model.addSheet('Data');
    model.setInputs(
      'Data',
      0,
      0,
      Array.from({ length: rows }, (_, i) => [i / 3, i]),
    );
    const events: string[] = [];
    const run = Excel.run;
    Object.assign(Excel, {
      run: (...args: Parameters<typeof Excel.run>) =>
        (run as (...a: unknown[]) => Promise<unknown>)(...args).catch((error: unknown) => {
          events.push(`refused ${String((error as { code?: unknown }).code)}`);
          throw error;
        }),
    });
    const seen: unknown[] = [];
    await readInBlocks(
      { response: column(0, rows), predictors: [column(1, rows)], weights: undefined },
      {
        block: (values) => {
          events.push('block');
          seen.push(...values.response.map((r) => r[0]));
        },
        progress: () => undefined,
      },
      new AbortController().signal,
    );
    expect(seen).toEqual(Array.from({ length: rows }, (_, i) => i / 3));
    const firstBlock = events.indexOf('block');
    expect(events.slice(0, firstBlock).every((e) => e === 'refused ResponsePayloadSizeLimitExceeded')).toBe(true);
    expect(firstBlock).toBeGreaterThan(0);
    expect(events.slice(firstBlock).filter((e) => e !== 'block')).toEqual([]);
  });

  it('waits while the user edits a cell, reading nothing, and reads everything once the edit ends', async () => {
    const { model, settings } = freshHost();
    settings.cellEditErrorCode = 'InvalidOperationInCellEditMode';
    model.addSheet('Data');
    model.setInputs(
      'Data',
      0,
      0,
      Array.from({ length: 10 }, (_, i) => [i, 2 * i]),
    );
    model.setCellEditMode(true);
    let blocks = 0;
    const reading = readInBlocks(
      { response: column(0, 10), predictors: [column(1, 10)], weights: undefined },
      { block: () => void blocks++, progress: () => undefined },
      new AbortController().signal,
    );
    await afterPendingWork();
    expect(blocks).toBe(0);
    model.setCellEditMode(false);
    await reading;
    expect(blocks).toBe(1);
  });
});
