/**
 * The guided pane end to end, in the preview workbook in Chromium: pick the demo ranges through
 * the UI, read and fit, write the live report, edit data, write a second report, freeze a copy.
 * Expected numbers come from the engine run here in Node on the same cells (the engine itself is
 * checked against outside sources in test/engine).
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { buildModelFrame, fitModel } from '../../../src/engine';
import { BATCH_HEADERS, generateBatchLog } from '../../../src/preview/demo/batchLog';
import { termSentence } from '../../../src/taskpane/model/sentences';
import { goTo as goToAddress, sheetNames as listSheets } from '../../support/previewPage';
import { type BrowserSession, chromiumAvailable, openPage, screenshot } from '../../support/browser';
import { chartMarkerCount } from '../../support/chartMarkers';

const available = chromiumAvailable();

function engineFit(rows: (string | number)[][]) {
  const grid = [BATCH_HEADERS, ...rows];
  const frame = buildModelFrame({ y: grid.map((r) => [r[1]]), x: [grid.map((r) => r.slice(2))], intercept: true });
  return fitModel(frame.data);
}

describe.skipIf(!available)('guided pane in the preview workbook', () => {
  let session: BrowserSession;
  const origin = inject('previewOrigin');

  const page = () => session.page;
  const goTo = (address: string) => goToAddress(page(), address);
  const sheetSnapshot = (sheet: string) =>
    page().evaluate(
      (name) =>
        Excel.run(async (context) => {
          const used = context.workbook.worksheets.getItem(name).getUsedRange(true);
          used.load('formulas, values, address');
          await context.sync();
          return { address: used.address, formulas: used.formulas as unknown[][], values: used.values as unknown[][] };
        }),
      sheet,
    );
  const sheetNames = () => listSheets(page());

  beforeAll(async () => {
    session = await openPage(`${origin}/preview.html`);
    await page().waitForFunction(() => document.querySelector('[data-cell="A3"]')?.textContent === 'Intercept');
  });
  afterAll(async () => {
    await session?.close();
  });

  it('takes the demo ranges from the selection and reads them', async () => {
    await goTo('Batches!B1:B61');
    await page().getByRole('button', { name: 'Use selection for Response (one column)' }).click();
    await expect.poll(() => page().locator('#response').inputValue()).toBe('Batches!B1:B61');
    await goTo('Batches!C1:G61');
    await page().getByRole('button', { name: 'Use selection for Predictors' }).click();
    await goTo("'Planned batches'!B1:F6");
    await page().getByRole('button', { name: 'Use selection for New rows (optional)' }).click();
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.data-summary').innerText()).toContain('Rows used: 60');
    expect(await page().locator('.data-summary').innerText()).toContain('Categorical: Origin (3 levels, compared with Alta Verde)');
  });

  it('shows one card per term and the nested verdict for bean age', async () => {
    await page().getByLabel('Bean age (days)').check();
    const cards = page().locator('ul[aria-label="Terms"] li');
    await expect.poll(() => cards.count()).toBe(7);
    const grid = [BATCH_HEADERS, ...generateBatchLog()];
    const frame = buildModelFrame({ y: grid.map((r) => [r[1]]), x: [grid.map((r) => r.slice(2))], intercept: true });
    const fit = fitModel(frame.data);
    for (let i = 0; i < fit.terms.length; i++) expect(await cards.nth(i).innerText()).toBe(termSentence(fit.terms[i], frame, 0.95));
    expect(await cards.nth(1).innerText()).toMatch(
      /^Steep time: each extra hour is associated with \+0\.\d+ points of extraction yield, other predictors held fixed \(95% CI /,
    );
    expect(await page().locator('.verdict').innerText()).toContain('No evidence that Bean age (days) adds anything');
    // Every check in words, as PLUMB.CHECKS reads it (test/presentation/checkList.test.ts checks the wording).
    expect(await page().locator('details.checks dt').allTextContents()).toEqual([
      'A row far off the others?',
      'Neighbouring rows related?',
      'Spread changing?',
      'Roughly normal?',
      'Straight enough where settings repeat?',
    ]);
    await screenshot(page(), 'pane-results');
  });

  let firstReport: Awaited<ReturnType<typeof sheetSnapshot>>;

  it('writes a live report of PLUMB formulas over the data, with the engine’s values', async () => {
    await page().getByRole('button', { name: 'Write report' }).click();
    await expect.poll(() => page().locator('.done').innerText()).toContain('Plumbline report');
    expect(await sheetNames()).toContain('Plumbline report');
    firstReport = await sheetSnapshot('Plumbline report');
    const flat = firstReport.formulas.flat().filter((f): f is string => typeof f === 'string' && f.startsWith('=PLUMB.'));
    expect(flat).toContain('=PLUMB.TERMS(Batches!$B$1:$B$61, Batches!$C$1:$G$61, $B$5, $B$6, $B$7, , $B$8)');
    expect(flat).toContain('=PLUMB.NESTEDF(Batches!$B$1:$B$61, Batches!$C$1:$F$61, Batches!$G$1:$G$61, $B$5, $B$6, $B$7, , $B$8)');
    expect(flat).toContain('=PLUMB.CHECKS(Batches!$B$1:$B$61, Batches!$C$1:$G$61, $B$5, $B$6, $B$7, , $B$8)');
    expect(flat.some((f) => f.startsWith("=PLUMB.PREDICT(Batches!$B$1:$B$61, Batches!$C$1:$G$61, 'Planned batches'!$B$1:$F$6"))).toBe(true);
    const fit = engineFit(generateBatchLog());
    const termsRow = firstReport.values.findIndex((r) => r[0] === 'Term');
    fit.terms.forEach((t, i) => expect(firstReport.values[termsRow + 1 + i][1]).toBe(t.estimate));
    expect(await chartMarkerCount(page(), 'ObservedVsFitted')).toBe(60);
    for (const chart of ['ResidualsVsFitted', 'NormalQQ', 'CooksDistance']) {
      expect(await chartMarkerCount(page(), chart), chart).toBe(60);
    }
    expect(firstReport.values.flat()).toContain('Durbin–Watson');
    await screenshot(page(), 'report');
    await page()
      .locator('.grid-scroller')
      .evaluate((el) => {
        el.scrollLeft = 760;
      });
    await screenshot(page(), 'report-charts');
  });

  it('recalculates the report when a data cell changes', async () => {
    await goTo('Batches!B2');
    await page().fill('#formula-input', '23');
    await page().press('#formula-input', 'Enter');
    const rows = generateBatchLog();
    rows[0][1] = 23;
    const fit = engineFit(rows);
    const after = await sheetSnapshot('Plumbline report');
    const termsRow = after.values.findIndex((r) => r[0] === 'Term');
    expect(after.values[termsRow + 1][1]).toBe(fit.terms[0].estimate);
    expect(after.values[termsRow + 1][1]).not.toBe(firstReport.values[termsRow + 1][1]);
    firstReport = after;
  });

  it('writes a second report, with robust standard errors, on a new sheet and leaves the first untouched', async () => {
    await page().locator('#robust').selectOption('HC3');
    await expect.poll(() => page().locator('.results').innerText()).toContain('robust (HC3)');
    await page().getByRole('button', { name: 'Write report' }).click();
    await expect.poll(() => page().locator('.done').innerText()).toContain('Plumbline report 2');
    expect(await sheetSnapshot('Plumbline report')).toEqual(firstReport);
    const second = await sheetSnapshot('Plumbline report 2');
    expect(second.values.flat()).toContain('Std error (HC3)');
  });

  it('freezes the active report into a values-only copy', async () => {
    await page().getByRole('button', { name: 'Freeze a copy' }).click();
    await expect.poll(() => page().locator('.done').innerText()).toContain('Values-only copy');
    const names = await sheetNames();
    const frozen = names.find((n) => n.startsWith('Plumbline report 2 values'));
    expect(frozen).toBeDefined();
    const copy = await sheetSnapshot(frozen as string);
    const formulas = copy.formulas.flat().filter((f) => typeof f === 'string' && f.startsWith('='));
    expect(formulas).toEqual([]);
    expect(String(copy.values[0][0])).toMatch(/^Plumbline report: .*: frozen copy of "Plumbline report 2", values as of /);
    expect(copy.values.flat()).toContain('Term');
  });

  it('names a blanked row by its worksheet row, in the pane and in the live report', async () => {
    // Sheet row 10 is "row 10" (common practice (no source): the number at the sheet's left edge).
    await goTo('Batches!B10');
    await page().fill('#formula-input', '');
    await page().press('#formula-input', 'Enter');
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.data-summary').innerText()).toContain('Rows skipped: 1 (row 10: blank in Extraction yield (%))');
    const report = await sheetSnapshot('Plumbline report');
    const header = report.values.findIndex((r) => r[0] === 'Row' && r[1] === 'Observed');
    expect(header).toBeGreaterThan(0);
    const rows = report.values
      .slice(header + 1)
      .map((r) => r[0])
      .filter((v) => typeof v === 'number');
    expect(rows).toEqual([...Array.from({ length: 8 }, (_, i) => i + 2), ...Array.from({ length: 51 }, (_, i) => i + 11)]);
    // The observed-vs-fitted chart reads the residual table, so the blanked response is a gap; a plain
    // reference to the data would show it as 0 (in Excel a formula referring to an empty cell yields 0).
    await page().evaluate(() =>
      Excel.run(async (context) => {
        context.workbook.worksheets.getItem('Plumbline report').activate();
        await context.sync();
      }),
    );
    await expect.poll(() => chartMarkerCount(page(), 'ObservedVsFitted')).toBe(59);
    expect(await chartMarkerCount(page(), 'CooksDistance')).toBe(59);
  });
});
