/**
 * Every field's problem sits beside it (aria-describedby, aria-invalid) and goes once the field is
 * changed and right, without another read (issue #14; common practice (no source): an error
 * message belongs next to what it is about and must not outlive the mistake).
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { type BrowserSession, chromiumAvailable, openPage } from '../../support/browser';

const available = chromiumAvailable();

describe.skipIf(!available)('field problems in the pane', () => {
  let session: BrowserSession;
  const origin = inject('previewOrigin');
  const page = () => session.page;
  const enter = async (selector: string, text: string) => {
    await page().fill(selector, text);
    await page().press(selector, 'Tab');
  };

  beforeAll(async () => {
    session = await openPage(`${origin}/preview.html`);
    await page().waitForFunction(() => document.querySelector('[data-cell="A3"]')?.textContent === 'Intercept');
  });
  afterAll(async () => {
    await session?.close();
  });

  it('shows a range’s problem beside it after Read, replaces it while still wrong and clears it once right', async () => {
    const response = page().locator('#response');
    await enter('#response', 'B1:B61');
    await enter('#predictors', 'Batches!C1:G61');
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('#response-problem').count()).toBe(1);
    expect(await page().locator('#response-problem').innerText()).toBe('"B1:B61" is not a range address with its sheet, such as Batches!B1:B61.');
    expect(await response.getAttribute('aria-invalid')).toBe('true');
    expect(await response.getAttribute('aria-describedby')).toBe('response-hint response-problem');

    await enter('#response', 'Batches!A1:B61');
    await expect.poll(() => page().locator('#response-problem').innerText()).toBe('The response must be a single column.');

    await enter('#response', 'Batches!B1:B61');
    await expect.poll(() => page().locator('#response-problem').count()).toBe(0);
    expect(await response.getAttribute('aria-invalid')).toBe('false');
    expect(await response.getAttribute('aria-describedby')).toBe('response-hint');
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.data-summary').innerText()).toContain('Rows used: 60');
  });

  it('names a sheet that does not exist on the field that refers to it, and clears it once right', async () => {
    await enter('#predictors', 'Bathces!C1:G61');
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('#predictors-problem').count()).toBe(1);
    expect(await page().locator('#predictors-problem').innerText()).toContain('There is no sheet named Bathces');
    expect(await page().locator('#response-problem').count()).toBe(0);
    await enter('#predictors', 'Batches!C1:G61');
    await expect.poll(() => page().locator('#predictors-problem').count()).toBe(0);
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.data-summary').innerText()).toContain('Rows used: 60');
  });

  it('checks the confidence level when it is entered, beside the field', async () => {
    const level = page().locator('#level');
    await enter('#level', '95');
    expect(await level.getAttribute('aria-invalid')).toBe('true');
    expect(await level.getAttribute('aria-describedby')).toBe('level-problem');
    expect(await page().locator('#level-problem').innerText()).toBe('The confidence level must be between 0 and 1, such as 0.95.');
    await enter('#level', '0.9');
    expect(await level.getAttribute('aria-invalid')).toBe('false');
    expect(await page().locator('#level-problem').count()).toBe(0);
    await expect.poll(() => page().locator('ul[aria-label="Terms"] li').first().innerText()).toContain('90% CI');
  });
});
