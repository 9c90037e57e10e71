/**
 * Full-sheet scale in the preview workbook: a 200,000-row sheet, read by the pane in blocks with
 * a progress bar, fitted by streaming, written as a values report, refreshed after an edit, and a
 * cancelled read that leaves nothing behind. Expected numbers come from the engine's in-memory
 * fit run here in Node on the same generated rows.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { fitModel } from '../../../src/engine';
import { goTo as goToAddress, sheetNames as listSheets } from '../../support/previewPage';
import { cellAddress, formatRange } from '../../../src/addressing/a1';
import { headerAddresses, pieceAddress, tablePieces } from '../../../src/taskpane/model/residualTableLayout';
import { type BrowserSession, chromiumAvailable, openPage } from '../../support/browser';

const available = chromiumAvailable();
// CI runs 200,000 rows; PLUMB_BIG_ROWS=1048575 runs a full sheet (about ten minutes), with the
// waits scaled to match.
const ROWS = Number(process.env.PLUMB_BIG_ROWS ?? 200_000);
const WAIT_MS = 40_000 * Math.max(1, ROWS / 200_000);

/**
 * Row i of the data: three predictors and a response from an integer hash, so the page and Node
 * produce the very same doubles. Self-contained, because it is also sent to the page.
 */
function generatedRow(i: number): [number, number, number, number] {
  const unit = (k: number): number => {
    let t = (Math.imul(i, 0x9e3779b1) ^ Math.imul(k + 1, 0x85ebca6b)) >>> 0;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const x1 = 10 * unit(0);
  const x2 = 5 * unit(1) - 2;
  const x3 = unit(2) + 0.5 * unit(3);
  return [3 + 0.8 * x1 - 1.5 * x2 + 2 * x3 + (unit(4) - 0.5), x1, x2, x3];
}

function engineFit(edit?: { row: number; y: number }) {
  const y: number[] = [];
  const x: number[][] = [];
  for (let i = 0; i < ROWS; i++) {
    const [r, ...xs] = generatedRow(i);
    y.push(edit?.row === i ? edit.y : r);
    x.push(xs);
  }
  return fitModel({ y, x });
}

describe.skipIf(!available)('large data in the pane', { timeout: 1.5 * WAIT_MS }, () => {
  let session: BrowserSession;
  const origin = inject('previewOrigin');
  const page = () => session.page;

  const goTo = (address: string) => goToAddress(page(), address);
  const sheetNames = () => listSheets(page());
  const reportValues = (sheet: string) =>
    page().evaluate(
      (name) =>
        Excel.run(async (context) => {
          // The report's own tables sit in A1:J80; the residual table beside them is read apart.
          const used = context.workbook.worksheets.getItem(name).getRange('A1:J80');
          used.load('values, formulas');
          await context.sync();
          return { values: used.values as unknown[][], formulas: used.formulas as unknown[][] };
        }),
      sheet,
    );
  const estimatesIn = (values: unknown[][]) => {
    const header = values.findIndex((r) => r[0] === 'Term');
    return values.slice(header + 1, header + 5).map((r) => [r[0], r[1]] as [unknown, unknown]);
  };
  const expectClose = (got: unknown, want: number) => {
    expect(typeof got).toBe('number');
    expect(Math.abs((got as number) - want)).toBeLessThanOrEqual(1e-9 * Math.abs(want));
  };

  beforeAll(async () => {
    session = await openPage(`${origin}/preview.html`);
    await page().waitForFunction(() => document.querySelector('[data-cell="A3"]')?.textContent === 'Intercept');
    // The shim copes with 20,000 rows per write; each block is its own sync, as a real add-in would write.
    await page().evaluate(
      async ({ rows, source }) => {
        const row = new Function(`return (${source})`)() as (i: number) => number[];
        await Excel.run(async (context) => {
          const sheet = context.workbook.worksheets.add('Big');
          sheet.getRange('A1:D1').values = [['y', 'x1', 'x2', 'x3']];
          await context.sync();
          for (let start = 0; start < rows; start += 20_000) {
            const count = Math.min(20_000, rows - start);
            const block = Array.from({ length: count }, (_, k) => row(start + k));
            sheet.getRange(`A${start + 2}:D${start + count + 1}`).values = block;
            await context.sync();
          }
        });
      },
      { rows: ROWS, source: generatedRow.toString() },
    );
    await goTo(`Big!A1:A${ROWS + 1}`);
    await page().getByRole('button', { name: 'Use selection for Response (one column)' }).click();
    await goTo(`Big!B1:D${ROWS + 1}`);
    await page().getByRole('button', { name: 'Use selection for Predictors' }).click();
    // As Excel writes the address: a full sheet's rows are the whole columns, "Big!B:D".
    const predictorField = formatRange({ sheet: 'Big', top: 0, left: 1, bottom: ROWS, right: 3 });
    await page().waitForFunction((wanted) => (document.querySelector('#predictors') as HTMLInputElement | null)?.value === wanted, predictorField);
  }, 4.5 * WAIT_MS);
  afterAll(async () => {
    await session?.close();
  });

  it('cancels a read from the progress bar, leaving no analysis and no new sheet', async () => {
    const before = await sheetNames();
    // Clicked from inside the page the moment the bar appears, so the read is stopped after its first block every time.
    await page().evaluate(() => {
      const observer = new MutationObserver(() => {
        const cancel = [...document.querySelectorAll('button')].find((b) => b.textContent === 'Cancel');
        if (cancel !== undefined) {
          observer.disconnect();
          cancel.click();
        }
      });
      observer.observe(document.body, { childList: true, subtree: true });
    });
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.problem[role="alert"]').allInnerTexts()).toContain('Reading cancelled');
    expect(await page().locator('.data-summary').count()).toBe(0);
    expect(await page().getByRole('button', { name: 'Write report' }).isDisabled()).toBe(true);
    expect(await sheetNames()).toEqual(before);
  });

  it('reads in blocks with progress and fits the streamed rows', async () => {
    await page().evaluate(() => {
      const seen: { value: number; max: number }[] = [];
      (window as unknown as { progressSeen: typeof seen }).progressSeen = seen;
      new MutationObserver(() => {
        const bar = document.querySelector('progress[aria-label="Rows read"]');
        if (bar instanceof HTMLProgressElement) seen.push({ value: bar.value, max: bar.max });
      }).observe(document.body, { childList: true, subtree: true, attributes: true, characterData: true });
    });
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.data-summary').innerText(), { timeout: WAIT_MS }).toContain(`Rows used: ${ROWS.toLocaleString('en-US')}`);
    const seen = await page().evaluate(() => (window as unknown as { progressSeen: { value: number; max: number }[] }).progressSeen);
    expect(seen.some((s) => s.max === ROWS + 1 && s.value > 0 && s.value < s.max)).toBe(true);
    expect(await page().locator('progress[aria-label="Rows read"]').count()).toBe(0);
    expect(await page().locator('.summary').innerText()).toContain(`Fitted on ${ROWS.toLocaleString('en-US')} rows`);
  });

  it('writes a values report whose estimates are the in-memory fit’s', async () => {
    await page().getByRole('button', { name: 'Write report' }).click();
    await expect.poll(() => page().locator('.done').innerText(), { timeout: WAIT_MS }).toContain('as values');
    const report = await reportValues('Plumbline report');
    expect(report.formulas.flat().filter((f) => typeof f === 'string' && f.startsWith('='))).toEqual([]);
    expect(report.values.flat()).toContain(
      `These results are values, not live formulas: the data (${ROWS.toLocaleString('en-US')} rows) exceed what a cell function can receive in one call (about 5 MB). Use Refresh in the Plumbline pane after the data change.`,
    );
    const fit = engineFit();
    const shown = estimatesIn(report.values);
    fit.terms.forEach((t, i) => {
      expect(shown[i][0]).toBe(t.name === 'Intercept' ? 'Intercept' : ['x1', 'x2', 'x3'][i - 1]);
      expectClose(shown[i][1], t.estimate);
    });
    // The residual table, written block by block beside the report (from column K, header in row 5,
    // a second panel past a million rows): its headers, sampled entries, and a blank after the last.
    const entries = [0, 1, 99_999, ROWS - 1, ROWS];
    const { headers, rows } = await page().evaluate(
      ({ headerRanges, entryRanges }) =>
        Excel.run(async (context) => {
          const sheet = context.workbook.worksheets.getItem('Plumbline report');
          const headerCells = headerRanges.map((a) => sheet.getRange(a).load('values'));
          const entryCells = entryRanges.map((a) => sheet.getRange(a).load('values'));
          await context.sync();
          return { headers: headerCells.map((r) => r.values[0]), rows: entryCells.map((r) => r.values[0]) };
        }),
      { headerRanges: headerAddresses(ROWS), entryRanges: entries.map((i) => pieceAddress(tablePieces(i, 1)[0])) },
    );
    headers.forEach((h) => expect(h).toEqual(['Row', 'Fitted', 'Residual']));
    expect(rows[entries.length - 1]).toEqual(['', '', '']);
    entries.slice(0, -1).forEach((i, k) => {
      expect(rows[k][0]).toBe(i + 2);
      expectClose(rows[k][2], fit.residuals[i]);
    });
  });

  it('refreshes the values report in place after the data change', async () => {
    await page().evaluate(() =>
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Big').getRange('A2').values = [[1000]];
        await context.sync();
      }),
    );
    const namesBefore = await sheetNames();
    await page().getByRole('button', { name: 'Refresh the values report "Plumbline report"' }).click();
    await expect.poll(() => page().locator('.done').innerText(), { timeout: WAIT_MS }).toContain('refreshed');
    expect(await sheetNames()).toEqual(namesBefore);
    const fit = engineFit({ row: 0, y: 1000 });
    const shown = estimatesIn((await reportValues('Plumbline report')).values);
    fit.terms.forEach((t, i) => expectClose(shown[i][1], t.estimate));
    expect(Math.abs((shown[0][1] as number) - engineFit().terms[0].estimate)).toBeGreaterThan(1e-6);
  });

  it('refuses a refresh that would write over a cell typed below the residual table, and keeps the cell', async () => {
    const setCell = (sheet: string, address: string, value: unknown) =>
      page().evaluate(
        ({ sheet, address, value }) =>
          Excel.run(async (context) => {
            context.workbook.worksheets.getItem(sheet).getRange(address).values = [[value]];
            await context.sync();
          }),
        { sheet, address, value },
      );
    const refresh = () => page().getByRole('button', { name: 'Refresh the values report "Plumbline report"' }).click();
    // A blank response drops a row, so the residual table ends one row earlier (header in row 5).
    await setCell('Big', 'A3', '');
    await refresh();
    await expect.poll(() => page().locator('.done').innerText(), { timeout: WAIT_MS }).toContain('refreshed');
    const freed = tablePieces(ROWS - 1, 1)[0];
    const freedCell = cellAddress(freed.top, freed.left);
    await setCell('Plumbline report', freedCell, 'my note');
    await setCell('Big', 'A3', 7);
    await refresh();
    await expect
      .poll(() => page().locator('.problem').innerText(), { timeout: WAIT_MS })
      .toContain(`Refresh would write over cells filled since the report was written (${pieceAddress(freed)})`);
    const kept = await page().evaluate(
      (address) =>
        Excel.run(async (context) => {
          const range = context.workbook.worksheets.getItem('Plumbline report').getRange(address).load('values');
          await context.sync();
          return range.values[0][0];
        }),
      freedCell,
    );
    expect(kept).toBe('my note');
  });
  it(
    'freezes the values report, its residual table of every row included, though it is far more than one 5 MB request',
    async () => {
      // "Resource limits and performance optimization for Office Add-ins": each request and response is capped at 5 MB.
      await page().evaluate(() =>
        Excel.run(async (context) => {
          context.workbook.worksheets.getItem('Plumbline report').activate();
          await context.sync();
        }),
      );
      await page().getByRole('button', { name: 'Freeze a copy' }).click();
      // Every cell of the report is read and the filled ones written again: the slowest step here.
      await expect.poll(() => page().locator('.done').innerText(), { timeout: 3 * WAIT_MS }).toContain('Values-only copy written to "Plumbline report values"');
      // The copy keeps every cell at its place in the report; sampled entries of the table must match the report's.
      const entries = [0, 99_999, ROWS - 2];
      const { report, copy } = await page().evaluate(
        ({ reportCells, copyCells }) =>
          Excel.run(async (context) => {
            const read = (sheet: string, addresses: string[]) => addresses.map((a) => context.workbook.worksheets.getItem(sheet).getRange(a).load('values'));
            const fromReport = read('Plumbline report', reportCells);
            const fromCopy = read('Plumbline report values', copyCells);
            await context.sync();
            return { report: fromReport.map((r) => r.values[0]), copy: fromCopy.map((r) => r.values[0]) };
          }),
        {
          reportCells: entries.map((i) => pieceAddress(tablePieces(i, 1)[0])),
          copyCells: entries.map((i) => pieceAddress(tablePieces(i, 1)[0])),
        },
      );
      expect(report.every((row) => typeof row[0] === 'number')).toBe(true);
      expect(copy).toEqual(report);
    },
    3.5 * WAIT_MS,
  );

  it('reads and fits 21 predictors over 12,000 rows, more than one 5 MB response, in blocks sized by payload', async () => {
    const rows = 12_000;
    const width = 22;
    // Long decimals, so the table is heavy: 12,000 × 22 cells of about 20 characters each.
    await page().evaluate(
      async ({ rows, width }) => {
        await Excel.run(async (context) => {
          const sheet = context.workbook.worksheets.add('Wide');
          sheet.getRange('A1:V1').values = [Array.from({ length: width }, (_, j) => (j === 0 ? 'y' : `w${j}`))];
          await context.sync();
          for (let start = 0; start < rows; start += 2_000) {
            const block = Array.from({ length: 2_000 }, (_, k) => {
              const i = start + k;
              const x = Array.from({ length: width - 1 }, (_, j) => ((i * (j + 7)) % 997) / 13 + 1 / (j + 3));
              return [x.reduce((sum, v, j) => sum + (j % 3) * v, 1) + ((i * 7919) % 101) / 101, ...x];
            });
            sheet.getRange(`A${start + 2}:V${start + 2_001}`).values = block;
            await context.sync();
          }
        });
      },
      { rows, width },
    );
    await page()
      .locator('#response')
      .fill(`Wide!A1:A${rows + 1}`);
    await page().locator('#response').dispatchEvent('change');
    await page()
      .locator('#predictors')
      .fill(`Wide!B1:V${rows + 1}`);
    await page().locator('#predictors').dispatchEvent('change');
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.data-summary').innerText(), { timeout: WAIT_MS }).toContain(`Rows used: ${rows.toLocaleString('en-US')}`);
    expect(await page().locator('.pane .problem[role="alert"]').count()).toBe(0);
  });
});
