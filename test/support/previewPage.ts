/** Steps the browser tests take in the preview workbook, as a user would or as the add-in does. */
import type { Page } from 'playwright-core';

/** Selects a range by typing its address into the name box, the keyboard way. */
export async function goTo(page: Page, address: string): Promise<void> {
  const box = page.getByLabel('Selected range (type an address and press Enter to select it)');
  await box.fill(address);
  await box.press('Enter');
}

/** The workbook's sheet names, read through the Excel API as the add-in reads them. */
export function sheetNames(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    Excel.run(async (context) => {
      const sheets = context.workbook.worksheets;
      sheets.load('items/name');
      await context.sync();
      return sheets.items.map((s) => s.name);
    }),
  );
}

/** Selects a range, then presses the pane's Use selection button of one field. */
export async function useSelectionFor(page: Page, address: string, field: string): Promise<void> {
  await goTo(page, address);
  await page.getByRole('button', { name: `Use selection for ${field}` }).click();
}
