/**
 * The pane's cards and a freshly written report describe one model, whichever input changed last.
 * Each pane input is changed in turn (ranges, weights, new rows, every setting, a data cell) and,
 * after each, the σ̂, R² and terms the cards show are compared with the numbers the new report
 * writes. Common practice (no source): a summary and the report it goes with must agree. The
 * weights and the second response column are invented here; they serve no check of the numbers.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { goTo as goToAddress, useSelectionFor } from '../../support/previewPage';
import { type BrowserSession, chromiumAvailable, openPage } from '../../support/browser';

const available = chromiumAvailable();

/** The rounding a shown number allows: half a unit in its last shown digit. */
function agrees(shown: string, value: number): boolean {
  const text = shown.replace(/,/g, '').replace('−', '-');
  const [mantissa, exponent] = text.toLowerCase().split('e');
  const decimals = mantissa.includes('.') ? mantissa.length - mantissa.indexOf('.') - 1 : 0;
  const tolerance = 0.5 * 10 ** (Number(exponent ?? 0) - decimals);
  return Math.abs(Number(text) - value) <= tolerance * (1 + 1e-9);
}

const NUMBER = '([-−]?[\\d,]*\\.?\\d+(?:e[-+]?\\d+)?)';

describe.skipIf(!available)('cards and report agree after every input change', () => {
  let session: BrowserSession;
  const origin = inject('previewOrigin');
  const page = () => session.page;
  const goTo = (address: string) => goToAddress(page(), address);

  const useSelection = (address: string, field: string) => useSelectionFor(page(), address, field);

  const reportValues = (sheet: string) =>
    page().evaluate(
      (name) =>
        Excel.run(async (context) => {
          const used = context.workbook.worksheets.getItem(name).getUsedRange(true);
          used.load('values');
          await context.sync();
          return used.values as unknown[][];
        }),
      sheet,
    );

  /** The value to the right of the first cell whose text passes `label`. */
  const beside = (values: unknown[][], label: (text: string) => boolean): number => {
    for (const row of values) {
      const j = row.findIndex((cell) => typeof cell === 'string' && label(cell));
      if (j >= 0) return row[j + 1] as number;
    }
    throw new Error('label not found in the report');
  };

  /** Writes a report and checks that its σ̂, R² and terms are the ones the cards show. */
  const expectAgreement = async (step: string) => {
    const before = (await page().locator('.done').count()) > 0 ? await page().locator('.done').innerText() : '';
    await page().getByRole('button', { name: 'Write report' }).click();
    await expect
      .poll(
        () =>
          page()
            .locator('.done')
            .count()
            .then(async (n) => (n > 0 ? page().locator('.done').innerText() : '')),
        { message: step },
      )
      .not.toBe(before);
    const done = await page().locator('.done').innerText();
    const sheet = /sheet "([^"]+)"/.exec(done)?.[1];
    expect(sheet, `${step}: ${done}`).toBeDefined();
    const values = await reportValues(sheet as string);

    const summary = await page().locator('.card.summary').innerText();
    const sigma = new RegExp(`σ̂ = ${NUMBER}`).exec(summary)?.[1];
    const rSquared = new RegExp(`R²[^=;]*= ${NUMBER}`).exec(summary)?.[1];
    expect(sigma, `${step}: ${summary}`).toBeDefined();
    expect(rSquared, `${step}: ${summary}`).toBeDefined();
    const reportSigma = beside(values, (t) => /^(sigma|σ)/i.test(t));
    const reportRSquared = beside(values, (t) => t.startsWith('R²'));
    expect(agrees(sigma as string, reportSigma), `${step}: σ̂ card ${sigma}, report ${reportSigma}`).toBe(true);
    expect(agrees(rSquared as string, reportRSquared), `${step}: R² card ${rSquared}, report ${reportRSquared}`).toBe(true);

    const termsRow = values.findIndex((r) => r[0] === 'Term');
    const header = values[termsRow] as string[];
    const [low, high] = [header.indexOf('CI low'), header.indexOf('CI high')];
    const reportTerms = [];
    for (let i = termsRow + 1; i < values.length && typeof values[i][0] === 'string' && values[i][0] !== ''; i++) reportTerms.push(values[i]);
    const cards = await page().locator('ul[aria-label="Terms"] li').allInnerTexts();
    expect(cards.length, `${step}: term cards ${cards.length}, report terms ${reportTerms.length}`).toBe(reportTerms.length);
    reportTerms.forEach((row, i) => {
      const name = String(row[0]);
      expect(cards[i].startsWith(name.split(/[ :(]/)[0]), `${step}: card ${i} "${cards[i]}" for ${name}`).toBe(true);
      const interval = new RegExp(`CI ${NUMBER} to ${NUMBER}`).exec(cards[i]);
      expect(interval, `${step}: ${cards[i]}`).not.toBeNull();
      expect(agrees((interval as RegExpExecArray)[1], row[low] as number), `${step}: ${name} CI low`).toBe(true);
      expect(agrees((interval as RegExpExecArray)[2], row[high] as number), `${step}: ${name} CI high`).toBe(true);
    });
  };

  beforeAll(async () => {
    session = await openPage(`${origin}/preview.html`);
    await page().waitForFunction(() => document.querySelector('[data-cell="A3"]')?.textContent === 'Intercept');
    // A weights column and a second response beside the demo data, as a user might add them.
    await page().evaluate(() =>
      Excel.run(async (context) => {
        const sheet = context.workbook.worksheets.getItem('Batches');
        const response = sheet.getRange('B2:B61');
        response.load('values');
        await context.sync();
        const rows = (response.values as number[][]).map(([y], i) => ({ weight: 1 + (i % 3), repeat: y + ((i % 5) - 2) / 10 }));
        sheet.getRange('J1:J61').values = [['Weight'], ...rows.map((r) => [r.weight])];
        sheet.getRange('K1:K61').values = [['Yield repeat (points)'], ...rows.map((r) => [r.repeat])];
        await context.sync();
      }),
    );
  });
  afterAll(async () => {
    await session?.close();
  });

  it('after reading, and after each range changes without a new read', async () => {
    await useSelection('Batches!B1:B61', 'Response (one column)');
    await useSelection('Batches!C1:G61', 'Predictors');
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.data-summary').innerText()).toContain('Rows used: 60');
    await expectAgreement('first read');

    await useSelection('Batches!C1:F61', 'Predictors');
    await expect.poll(() => page().locator('.stale').innerText()).toContain('the predictors changed');
    await expectAgreement('predictors');
    expect(await page().locator('.stale').count()).toBe(0);

    await useSelection("'Planned batches'!B1:E6", 'New rows (optional)');
    await expectAgreement('new rows');
    await useSelection('Batches!J1:J61', 'Weights (optional)');
    await expect.poll(() => page().locator('.stale').innerText()).toContain('the weights changed');
    await expectAgreement('weights');
    await useSelection('Batches!K1:K61', 'Response (one column)');
    await expectAgreement('response');
  });

  it('after each setting changes', async () => {
    await page().fill('#level', '0.9');
    await page().press('#level', 'Tab');
    await expectAgreement('level');
    await page().locator('#intercept').uncheck();
    await expectAgreement('intercept off');
    await page().locator('#intercept').check();
    await page().fill('#known-sigma', '0.5');
    await expectAgreement('known σ');
    await page().fill('#known-sigma', '');
    await page().locator('#robust').selectOption('HC3');
    await expectAgreement('robust');
    await page().locator('#added-0').check();
    await expectAgreement('added set');
  });

  it('after a data cell changes (Worksheet.onChanged), saying first that the results may be out of date', async () => {
    await goTo('Batches!K2');
    await page().fill('#formula-input', '31');
    await page().press('#formula-input', 'Enter');
    await expect.poll(() => page().locator('.stale').count()).toBe(1);
    expect(await page().locator('.stale').innerText()).toContain('may be out of date: cells on the data’s sheets changed');
    await expectAgreement('data cell');
    expect(await page().locator('.stale').count()).toBe(0);
  });

  it('checks known σ as it is typed, beside the field, and clears the message when fixed', async () => {
    const field = page().locator('#known-sigma');
    for (const [typed, says] of [
      ['abc', 'must be a number'],
      ['-1', 'must be positive'],
      ['0', 'cannot be 0'],
      ['0,35', 'Use a point as the decimal separator'],
    ]) {
      await field.fill(typed);
      expect(await field.getAttribute('aria-invalid'), typed).toBe('true');
      expect(await page().locator('#known-sigma-problem').innerText(), typed).toContain(says);
    }
    await field.fill('0.35');
    expect(await field.getAttribute('aria-invalid')).toBe('false');
    expect(await page().locator('#known-sigma-problem').count()).toBe(0);
  });
});
