/**
 * Issue #15, target 6, above the live size, in the cells: PLUMB formulas over 50,000 rows × 20
 * predictors (1,050,000 cells, where a host passes them, as Excel on the desktop does) run in the
 * formula worker (src/functions/offThread). In the built preview in Chromium their results are
 * the very numbers of the engine run in Node, and their recalculation after one data edit holds
 * the page's main thread for no task over 200 ms (W3C Long Tasks API; Excel restarts an add-in
 * unresponsive for 5 s, Microsoft Learn, "Resource limits and performance optimization for Office
 * Add-ins"). Run in place, the same two formulas took one task of 226–318 ms here. On a fresh page
 * of its own, so that the pane's work in longTasksAboveLiveSize.test.ts leaves nothing to collect.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { cellAddress, columnLetters } from '../../../src/addressing/a1';
import { fitModel } from '../../../src/engine';
import { type BrowserSession, chromiumAvailable } from '../../support/browser';
import { listed, startLongTaskRecording, stopLongTaskRecording, tooLong } from '../../support/longTasks';
import { cellValue, wideData, WIDE_PREDICTORS, WIDE_ROWS, WIDE_SHEET, openWideSheet } from '../../support/wideSheet';

const available = chromiumAvailable();
const ROWS = WIDE_ROWS;
const PREDICTORS = WIDE_PREDICTORS;
const SHEET = WIDE_SHEET;
const FORMULA_SHEET = 'Formulas';
/** Columns between formula anchors: wider than any of their results. */
const BAND = 16;

describe.skipIf(!available)('no long task above the live size, in the cells', { timeout: 240_000 }, () => {
  let session: BrowserSession;
  const origin = inject('previewOrigin');
  const page = () => session.page;
  const { x, y } = wideData();
  const cellOf = (sheet: string, row: number, column: number) => cellValue(page(), sheet, row, column);

  beforeAll(async () => {
    session = await openWideSheet(origin);
  }, 240_000);
  afterAll(async () => {
    await session?.close();
  });

  it('computes PLUMB formulas over the data in the formula worker, recalculating after an edit with no task over 200 ms', async () => {
    const last = ROWS + 1;
    const args = `${SHEET}!$A$1:$A$${last},${SHEET}!$B$1:$${columnLetters(PREDICTORS)}$${last}`;
    // The heaviest formula of a report (the diagnostics) and the one every report starts with.
    const formulas = ['CHECKS', 'TERMS'].map((name, k) => ({ address: cellAddress(0, k * BAND), formula: `=PLUMB.${name}(${args})` }));
    await page().evaluate(
      ({ sheet, formulas }) =>
        Excel.run(async (context) => {
          const added = context.workbook.worksheets.add(sheet);
          for (const f of formulas) added.getRange(f.address).formulas = [[f.formula]];
          await context.sync();
        }),
      { sheet: FORMULA_SHEET, formulas },
    );
    // TERMS' x1 estimate (grid row 3, column 2) against the engine's fit of the same numbers in
    // Node: the worker's result is the very same double.
    const rows = Array.from({ length: ROWS }, (_, i) => Array.from({ length: PREDICTORS }, (_, j) => x[j * ROWS + i]));
    const expected = fitModel({ y: Array.from(y), x: rows }).terms[1].estimate;
    const estimateCell = () => cellOf(FORMULA_SHEET, 2, BAND + 1);
    await expect.poll(estimateCell, { timeout: 60_000 }).toBe(expected);
    await expect.poll(() => cellOf(FORMULA_SHEET, 0, 0), { timeout: 60_000 }).toBe('Durbin–Watson');
    // The formulas ran in the worker, whose bundle the page fetched.
    const fetched = await page().evaluate(() => performance.getEntriesByType('resource').map((e) => e.name));
    expect(fetched.some((url) => url.endsWith('/formula-worker.js'))).toBe(true);

    // One data cell edited through the API, as another add-in or a paste would change it.
    await startLongTaskRecording(page());
    await page().evaluate(
      ({ sheet, address }) =>
        Excel.run(async (context) => {
          context.workbook.worksheets.getItem(sheet).getRange(address).values = [[0.4375]];
          await context.sync();
        }),
      { sheet: SHEET, address: cellAddress(Math.floor(ROWS / 2), 1) },
    );
    await expect.poll(estimateCell, { timeout: 60_000 }).not.toBe(expected);
    await expect.poll(() => cellOf(FORMULA_SHEET, 0, 0), { timeout: 60_000 }).toBe('Durbin–Watson');
    const durations = await stopLongTaskRecording(page());
    expect(tooLong(durations), listed(durations)).toEqual([]);
  });
});
