// `npm run screenshots`: after the build (run by the npm script), drives the preview workbook in
// Chromium as a user would, on the invented demo, and saves the README's three pictures to
// assets/screenshots. Run it whenever the pane or the report changes what they show.
import { copyFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { openPage, screenshot } from '../test/support/browser';
import { goTo } from '../test/support/previewPage';
import { startServer } from './staticServer';

const ROOT = join(__dirname, '..');
const OUT = join(ROOT, 'assets', 'screenshots');

async function main(): Promise<void> {
  const running = await startServer(join(ROOT, 'dist'), 0, false);
  const session = await openPage(`${running.origin}/preview.html`);
  const { page } = session;
  const save = async (name: string) => {
    mkdirSync(OUT, { recursive: true });
    copyFileSync(await screenshot(page, name), join(OUT, `${name}.png`));
  };
  try {
    await page.waitForFunction(() => document.querySelector('[data-cell="A3"]')?.textContent === 'Intercept');
    await save('preview-workbook');

    await goTo(page, 'Batches!B1:B61');
    await page.getByRole('button', { name: 'Use selection for Response (one column)' }).click();
    await goTo(page, 'Batches!C1:G61');
    await page.getByRole('button', { name: 'Use selection for Predictors' }).click();
    await goTo(page, "'Planned batches'!B1:F6");
    await page.getByRole('button', { name: 'Use selection for New rows (optional)' }).click();
    await page.getByRole('button', { name: 'Read data and fit' }).click();
    await page.getByLabel('Bean age (days)').check();
    await page.locator('ul[aria-label="Terms"] li').first().waitFor();
    await page.locator('ul[aria-label="Terms"]').scrollIntoViewIfNeeded();
    await save('pane');

    await page.getByRole('button', { name: 'Write report' }).click();
    // The guide lines appear once their MIN/MAX cells have calculated.
    await page.locator('[data-chart="ObservedVsFitted"] .chart-line polyline').waitFor();
    await page.locator('.grid-scroller').evaluate((el) => {
      el.scrollLeft = 700;
    });
    await save('report');
  } finally {
    await session.close();
    await running.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
