/**
 * The real built bundles in a real browser (Debian's Chromium through playwright-core), running
 * in the preview workbook. Expected numbers come from the engine run here in Node on the same
 * cells, so these tests check that the preview host delivers the engine's results intact; the
 * engine's own correctness is checked against outside sources in test/engine.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { buildModelFrame, fitModel } from '../../../src/engine';
import { BATCH_HEADERS, generateBatchLog } from '../../../src/preview/demo/batchLog';
import { type BrowserSession, chromiumAvailable, openPage, screenshot } from '../../support/browser';

const available = chromiumAvailable();
if (!available) console.warn('Browser tests skipped: /usr/bin/chromium is absent (apt-get install -y chromium).');

function engineEstimates(rows: (string | number)[][]): number[] {
  const grid = [BATCH_HEADERS, ...rows];
  const frame = buildModelFrame({ y: grid.map((r) => [r[1]]), x: [grid.map((r) => r.slice(2))], intercept: true });
  return fitModel(frame.data).terms.map((t) => t.estimate);
}

describe.skipIf(!available)('preview workbook in Chromium', () => {
  let session: BrowserSession;
  const origin = inject('previewOrigin');

  const cellText = (address: string) => session.page.locator(`[data-cell="${address}"]`).innerText();
  /** Values as the add-in itself would read them, through the Excel API shim. */
  const rangeValues = (sheet: string, address: string) =>
    session.page.evaluate(
      ([s, a]) =>
        Excel.run(async (context) => {
          const range = context.workbook.worksheets.getItem(s).getRange(a);
          range.load('values');
          await context.sync();
          return range.values as unknown[][];
        }),
      [sheet, address] as const,
    );
  const selectSheet = (name: string) => session.page.getByRole('tab', { name, exact: true }).click();
  const enter = async (address: string, text: string) => {
    await session.page.locator(`[data-cell="${address}"]`).click();
    await session.page.fill('#formula-input', text);
    await session.page.press('#formula-input', 'Enter');
  };

  beforeAll(async () => {
    session = await openPage(`${origin}/preview.html`);
    await session.page.waitForFunction(() => document.querySelector('[data-cell="A3"]')?.textContent === 'Intercept');
  });
  afterAll(async () => {
    await session?.close();
  });

  it('opens on the Model sheet with the demo formulas live', async () => {
    expect(await cellText('A2')).toBe('Term');
    expect(await cellText('B2')).toBe('Estimate');
    expect(await cellText('A9')).toBe('Bean age (days)');
    await screenshot(session.page, 'preview-model');
  });

  it('spills a typed PLUMB formula with the engine’s values', async () => {
    await enter('K2', '=PLUMB.ESTIMATES(Batches!$B$1:$B$61, Batches!$C$1:$G$61)');
    const expected = engineEstimates(generateBatchLog());
    const values = await rangeValues('Model', `K2:K${1 + expected.length + 1}`);
    expected.forEach((e, i) => expect(values[i][0]).toBe(e));
    expect(values[expected.length][0]).toBe('');
    for (let i = 0; i < expected.length; i++) {
      const shown = Number(await cellText(`K${2 + i}`));
      expect(Math.abs(shown - expected[i])).toBeLessThanOrEqual(1e-5 * Math.abs(expected[i]));
    }
  });

  it('recalculates dependent results when a data cell is edited', async () => {
    const before = await cellText('K2');
    await selectSheet('Batches');
    await enter('B2', '25');
    await selectSheet('Model');
    const rows = generateBatchLog();
    rows[0][1] = 25;
    const expected = engineEstimates(rows);
    await session.page.waitForFunction((b) => document.querySelector('[data-cell="K2"]')?.textContent !== b, before);
    const [[spilled], [live]] = [await rangeValues('Model', 'K2'), await rangeValues('Model', 'B3')];
    expect(spilled[0]).toBe(expected[0]);
    expect(live[0]).toBe(expected[0]);
    expect(Math.abs(Number(await cellText('B3')) - expected[0])).toBeLessThanOrEqual(1e-5 * Math.abs(expected[0]));
  });

  it('shows #VALUE! and its message for a bad range', async () => {
    await enter('K12', '=PLUMB.TERMS(Batches!B1:B61, Batches!C1:G50)');
    expect(await cellText('K12')).toBe('#VALUE!');
    await session.page.locator('[data-cell="K12"]').click();
    await expect
      .poll(() => session.page.locator('.status-line').innerText())
      .toContain('response has 61 rows but predictors has 50; select the same rows for both.');
    await screenshot(session.page, 'preview-error');
  });

  it('makes no network request beyond its own localhost origin', () => {
    expect(session.requests.length).toBeGreaterThan(0);
    expect(session.requests.filter((url) => !url.startsWith(origin))).toEqual([]);
  });
});
