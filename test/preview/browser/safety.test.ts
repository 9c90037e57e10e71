/**
 * No data lost, nothing leaves the machine: every pane action, taken through the UI in the
 * preview workbook, must leave the user's sheets exactly as they were (formulas, values, number
 * formats, names), keep labels taken from the data as text, clean up after a failed write, and
 * never request anything from another origin.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { goTo as goToAddress, sheetNames as listSheets } from '../../support/previewPage';
import { type BrowserSession, chromiumAvailable, openPage } from '../../support/browser';

const available = chromiumAvailable();
const USER_SHEETS = ['Model', 'Batches', 'Planned batches'];

// Headers a spreadsheet would turn into formulas if they were ever written as plain input.
const RISKY_HEADERS: ReadonlyArray<{ cell: string; text: string }> = [
  // The response header: the engine trims it to "yield", and no report cell copies data cells raw
  // (the report reads the data only through PLUMB functions), so it is checked on the data sheet only.
  { cell: 'B1', text: '\tyield' },
  { cell: 'C1', text: '=1+1' },
  { cell: 'D1', text: '+grind' },
  { cell: 'E1', text: '-temp' },
  { cell: 'G1', text: '@age' },
];
/** The predictor headers: they name the terms, so the report and its copy show them as written. */
const HEADERS_IN_REPORT = RISKY_HEADERS.filter((h) => h.cell !== 'B1');

interface SheetSnapshot {
  name: string;
  address: string;
  formulas: unknown[][];
  values: unknown[][];
  numberFormat: unknown[][];
}

interface Patchable {
  add?: (...args: unknown[]) => unknown;
  activate?: () => void;
}

describe.skipIf(!available)('no data lost and nothing leaves the machine, in the preview workbook', () => {
  let session: BrowserSession;
  let userSnapshot: SheetSnapshot[];
  const origin = inject('previewOrigin');
  const page = () => session.page;
  const goTo = (address: string) => goToAddress(page(), address);
  const sheetNames = () => listSheets(page());

  const snapshot = (names: string[]) =>
    page().evaluate(
      (list) =>
        Excel.run(async (context) => {
          const ranges = list.map((name) => {
            const used = context.workbook.worksheets.getItem(name).getUsedRange();
            used.load('address, formulas, values, numberFormat');
            return { name, used };
          });
          await context.sync();
          return ranges.map(({ name, used }) => ({
            name,
            address: used.address,
            formulas: used.formulas as unknown[][],
            values: used.values as unknown[][],
            numberFormat: used.numberFormat as unknown[][],
          }));
        }),
      names,
    );

  /** Every user sheet still there, in its order, not renamed, and cell for cell as it was. */
  const expectUserSheetsUnchanged = async (after: string) => {
    const names = await sheetNames();
    expect(
      names.filter((n) => USER_SHEETS.includes(n)),
      `sheets after ${after}`,
    ).toEqual(USER_SHEETS);
    expect(names.slice(0, USER_SHEETS.length), `sheets after ${after}`).toEqual(USER_SHEETS);
    expect(await snapshot(USER_SHEETS), `user sheets after ${after}`).toEqual(userSnapshot);
  };

  const statusText = async () => {
    const status = page().locator('.done, .pane .problem[role="alert"]');
    return (await status.count()) === 0 ? '' : status.first().innerText();
  };

  beforeAll(async () => {
    session = await openPage(`${origin}/preview.html`);
    await page().waitForFunction(() => document.querySelector('[data-cell="A3"]')?.textContent === 'Intercept');
    // Text format first, then the value: the way a user's text header that merely looks like a formula is stored.
    await page().evaluate(
      (headers) =>
        Excel.run(async (context) => {
          const sheet = context.workbook.worksheets.getItem('Batches');
          for (const { cell, text } of headers) {
            const range = sheet.getRange(cell);
            range.numberFormat = [['@']];
            range.values = [[text]];
          }
          await context.sync();
        }),
      RISKY_HEADERS,
    );
    userSnapshot = await snapshot(USER_SHEETS);
  });
  afterAll(async () => {
    await session?.close();
  });

  it('starts from the demo workbook, with the risky headers stored as text', async () => {
    expect(await sheetNames()).toEqual(USER_SHEETS);
    const batches = userSnapshot.find((s) => s.name === 'Batches');
    const header = batches?.values[0] ?? [];
    expect(header[1]).toBe('\tyield');
    expect(header[2]).toBe('=1+1');
    expect(header[6]).toBe('@age');
    for (const s of userSnapshot) expect(s.values.length, s.name).toBeGreaterThan(1);
  });

  it('leaves every user sheet unchanged through Use selection and Read data and fit', async () => {
    await goTo('Batches!B1:B61');
    await page().getByRole('button', { name: 'Use selection for Response (one column)' }).click();
    await expect.poll(() => page().locator('#response').inputValue()).toBe('Batches!B1:B61');
    await expectUserSheetsUnchanged('Use selection (response)');
    await goTo('Batches!C1:G61');
    await page().getByRole('button', { name: 'Use selection for Predictors' }).click();
    await expect.poll(() => page().locator('#predictors').inputValue()).toBe('Batches!C1:G61');
    // Without its header row: the planned sheet still carries the original names, which no longer match.
    await goTo("'Planned batches'!B2:F6");
    await page().getByRole('button', { name: 'Use selection for New rows (optional)' }).click();
    await expect.poll(() => page().locator('#new-rows').inputValue()).toBe("'Planned batches'!B2:F6");
    await expectUserSheetsUnchanged('Use selection (predictors, new rows)');
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.data-summary').innerText()).toContain('Rows used: 60');
    await expectUserSheetsUnchanged('Read data and fit');
  });

  it('leaves every user sheet unchanged while settings and the added set change', async () => {
    const cards = page().locator('ul[aria-label="Terms"] li');
    await expect.poll(() => cards.count()).toBe(7);
    const withIntercept = await page().locator('.results').innerText();
    await page().locator('#intercept').uncheck();
    await expect.poll(() => page().locator('.results').innerText()).not.toBe(withIntercept);
    await expectUserSheetsUnchanged('unticking the intercept');
    await page().locator('#intercept').check();
    await expect.poll(() => page().locator('.results').innerText()).toBe(withIntercept);
    await page().locator('#robust').selectOption('HC3');
    await expect.poll(() => page().locator('.results').innerText()).toContain('robust (HC3)');
    await expectUserSheetsUnchanged('choosing HC3');
    await page().locator('#robust').selectOption('classical');
    await page().locator('input[id^="added-"]').last().check();
    await expect.poll(() => page().locator('.verdict').count()).toBeGreaterThan(0);
    await expectUserSheetsUnchanged('ticking an added predictor');
  });

  let reportName = '';

  it('writes the report on a new sheet only, with the risky headers as text', async () => {
    const before = await sheetNames();
    await page().getByRole('button', { name: 'Write report' }).click();
    await expect.poll(statusText).toContain('Report written to the new sheet');
    const after = await sheetNames();
    expect(after.slice(0, before.length)).toEqual(before);
    expect(after).toHaveLength(before.length + 1);
    reportName = after[after.length - 1];
    expect(reportName.startsWith('Plumbline report')).toBe(true);
    await expectUserSheetsUnchanged('Write report');

    const [report] = await snapshot([reportName]);
    const values = report.values.flat();
    // Read back as the header's own text: a formula would read back as its result (2, or an error).
    for (const { text } of HEADERS_IN_REPORT) expect(values, JSON.stringify(text)).toContain(text);
    expect(values.filter((v) => typeof v === 'string' && v.startsWith('#'))).toEqual([]);
  });

  it('freezes a copy on a new sheet only, keeping the risky headers as text', async () => {
    const before = await sheetNames();
    await page().getByRole('button', { name: 'Freeze a copy' }).click();
    await expect.poll(statusText).toContain('Values-only copy');
    const after = await sheetNames();
    expect(after.slice(0, before.length)).toEqual(before);
    expect(after).toHaveLength(before.length + 1);
    await expectUserSheetsUnchanged('Freeze a copy');
    const [frozen] = await snapshot([after[after.length - 1]]);
    const values = frozen.values.flat();
    for (const { text } of HEADERS_IN_REPORT) expect(values, JSON.stringify(text)).toContain(text);
    // Stored under the text format, so editing the copy in Excel cannot turn them into formulas either.
    const risky: unknown[] = [];
    frozen.values.forEach((row, r) =>
      row.forEach((v, c) => {
        if (HEADERS_IN_REPORT.some((h) => h.text === v)) risky.push(frozen.numberFormat[r][c]);
      }),
    );
    expect(risky.length).toBeGreaterThanOrEqual(HEADERS_IN_REPORT.length);
    expect(risky.filter((f) => f !== '@')).toEqual([]);
    // The earlier report keeps every cell it had.
    expect((await snapshot([reportName]))[0].values.flat()).toContain('=1+1');
  });

  it('clicks Refresh, when the pane offers it, without touching user sheets', async () => {
    const refresh = page().getByRole('button', { name: /^Refresh the values report/ });
    // Small data get a live report, so the pane must not offer Refresh here; large data are covered by bigData.test.ts.
    expect(await refresh.count()).toBe(0);
    await expectUserSheetsUnchanged('the Refresh check');
  });

  it('leaves no half-written report when a chart cannot be added mid-write', async () => {
    const before = await sheetNames();
    // A chart type the preview cannot draw makes the batch that writes the cells and charts fail at sync.
    await page().evaluate(() =>
      Excel.run(async (context) => {
        const proto = Object.getPrototypeOf(context.workbook.worksheets.getActiveWorksheet().charts) as Patchable;
        const original = proto.add;
        if (original === undefined) throw new Error('the preview chart collection has no add');
        Object.assign(window, { plumblineOriginalChartAdd: original });
        proto.add = function (this: unknown, ...args: unknown[]) {
          return original.call(this, 'Line', ...args.slice(1));
        };
        await context.sync();
      }),
    );
    try {
      await page().getByRole('button', { name: 'Write report' }).click();
      await expect.poll(statusText).toContain('No report was written');
    } finally {
      await page().evaluate(() =>
        Excel.run(async (context) => {
          const proto = Object.getPrototypeOf(context.workbook.worksheets.getActiveWorksheet().charts) as Patchable;
          proto.add = (window as unknown as { plumblineOriginalChartAdd: Patchable['add'] }).plumblineOriginalChartAdd;
          await context.sync();
        }),
      );
    }
    expect(await sheetNames()).toEqual(before);
    await expectUserSheetsUnchanged('a failed Write report');
  });

  it('leaves no half-written copy when freezing fails after the cells are queued', async () => {
    await page().evaluate(
      (name) =>
        Excel.run(async (context) => {
          context.workbook.worksheets.getItem(name).activate();
          await context.sync();
        }),
      reportName,
    );
    const before = await sheetNames();
    await page().evaluate(() =>
      Excel.run(async (context) => {
        const proto = Object.getPrototypeOf(context.workbook.worksheets.getActiveWorksheet()) as Patchable;
        Object.assign(window, { plumblineOriginalActivate: proto.activate });
        proto.activate = () => {
          throw new Error('simulated failure while freezing');
        };
        await context.sync();
      }),
    );
    try {
      await page().getByRole('button', { name: 'Freeze a copy' }).click();
      await expect.poll(statusText).toContain('simulated failure while freezing');
    } finally {
      await page().evaluate(() =>
        Excel.run(async (context) => {
          const proto = Object.getPrototypeOf(context.workbook.worksheets.getActiveWorksheet()) as Patchable;
          proto.activate = (window as unknown as { plumblineOriginalActivate: Patchable['activate'] }).plumblineOriginalActivate;
          await context.sync();
        }),
      );
    }
    expect(await sheetNames()).toEqual(before);
    await expectUserSheetsUnchanged('a failed Freeze a copy');
  });

  it('takes a two-area selection as two predictor areas, refuses it for the response, and clips a whole column to the rows in use', async () => {
    // "Excel.Workbook": getSelectedRange throws when several areas are selected; getSelectedRanges gives them all.
    const selectTwoAreas = () =>
      page().evaluate(() => {
        const preview = (window as unknown as { plumblinePreview: { workbook: { selectAreas(areas: object[]): void } } }).plumblinePreview;
        preview.workbook.selectAreas([
          { sheet: 'Batches', top: 0, left: 2, bottom: 60, right: 5 },
          { sheet: 'Batches', top: 0, left: 6, bottom: 60, right: 6 },
        ]);
      });
    await selectTwoAreas();
    await page().getByRole('button', { name: 'Use selection for Predictors' }).click();
    await expect.poll(() => page().locator('#predictors').inputValue()).toBe('Batches!C1:F61,Batches!G1:G61');
    await page().getByRole('button', { name: 'Use selection for Response (one column)' }).click();
    await expect
      .poll(() => page().locator('#response-problem').innerText())
      .toBe('The response must be one column, but the selection has 2 areas (Batches!C1:F61, Batches!G1:G61): select one column only.');
    expect(await page().locator('#response').inputValue()).toBe('Batches!B1:B61');
    // A column header selects the whole column; the pane takes the rows the sheet uses (its header and 60 batches).
    await goTo('Batches!B:B');
    await page().getByRole('button', { name: 'Use selection for Response (one column)' }).click();
    await expect.poll(() => page().locator('#response').inputValue()).toBe('Batches!B1:B61');
    // The field held this address already, so wait for the click's effect: the problem cleared.
    await expect.poll(() => page().locator('#response-problem').count()).toBe(0);
    await page().getByRole('button', { name: 'Read data and fit' }).click();
    await expect.poll(() => page().locator('.data-summary').innerText()).toContain('Rows used: 60');
    await expect.poll(() => page().locator('ul[aria-label="Terms"] li').count()).toBe(7);
    await expectUserSheetsUnchanged('multi-area and whole-column selections');
  });

  it('holds Read data and fit while a cell is being edited, and reads once the edit ends', async () => {
    // "Excel.RunOptions": without delayForCellEdit a batch fails while the user edits a cell; with it, it waits.
    const editing = page().getByLabel('Editing a cell (batches fail unless they wait for the edit)');
    await editing.check();
    try {
      await page().getByRole('button', { name: 'Read data and fit' }).click();
      await expect.poll(() => page().locator('.data-summary').count()).toBe(0);
      expect(await page().locator('.pane .problem[role="alert"]').count()).toBe(0);
    } finally {
      await editing.uncheck();
    }
    await expect.poll(() => page().locator('ul[aria-label="Terms"] li').count()).toBe(7);
    expect(await page().locator('.pane .problem[role="alert"]').count()).toBe(0);
    await expectUserSheetsUnchanged('a read held back by a cell edit');
  });

  it('requested nothing from any other origin during the whole session', () => {
    expect(session.requests.length).toBeGreaterThan(0);
    expect(session.requests.filter((url) => new URL(url).origin !== origin)).toEqual([]);
  });
});
