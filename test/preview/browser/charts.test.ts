/**
 * Charts and cell formatting in the real built preview, in Chromium: an add-in's Excel API calls
 * draw a scatter chart over the grid that follows its cells, and bold, fill and column widths
 * show in the grid. The chart is built as the report builds its charts, series by series
 * (Microsoft Learn, "Excel.ChartSeriesCollection class": add(name, index); "Excel.ChartSeries
 * class": delete, setXAxisValues, setValues), not left to the layout charts.add picks.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { type BrowserSession, chromiumAvailable, openPage, screenshot } from '../../support/browser';

const available = chromiumAvailable();
if (!available) console.warn('Browser tests skipped: /usr/bin/chromium is absent (apt-get install -y chromium).');

const TITLE = 'Extraction yield against steep time';

describe.skipIf(!available)('charts and formatting in the preview workbook', () => {
  let session: BrowserSession;
  const origin = inject('previewOrigin');
  const circles = () => session.page.locator('[data-chart="Chart 1"] .chart-series circle');
  const centre = async (index: number) => {
    const circle = circles().nth(index);
    return { cx: Number(await circle.getAttribute('cx')), cy: Number(await circle.getAttribute('cy')) };
  };

  beforeAll(async () => {
    session = await openPage(`${origin}/preview.html`);
    await session.page.waitForFunction(() => document.querySelector('[data-cell="A3"]')?.textContent === 'Intercept');
  });
  afterAll(async () => {
    await session?.close();
  });

  it('draws a scatter chart added through the Excel API, over the cells it was placed on', async () => {
    const name = await session.page.evaluate(
      (title) =>
        Excel.run(async (context) => {
          const sheet = context.workbook.worksheets.getItem('Batches');
          const chart = sheet.charts.add(Excel.ChartType.xyscatter, sheet.getRange('B1:C61'), Excel.ChartSeriesBy.columns);
          chart.series.load('items');
          await context.sync();
          // Whatever charts.add laid out goes; the one series wanted is added with steep time as X.
          for (const made of [...chart.series.items].reverse()) made.delete();
          const series = chart.series.add('Extraction yield (%)');
          series.setXAxisValues(sheet.getRange('C2:C61'));
          series.setValues(sheet.getRange('B2:B61'));
          chart.title.text = title;
          chart.axes.categoryAxis.title.text = 'Steep time (h)';
          chart.axes.valueAxis.title.text = 'Extraction yield (%)';
          chart.setPosition('H2', 'K20');
          sheet.activate();
          chart.load('name');
          chart.series.load('count');
          await context.sync();
          return `${chart.name}: ${chart.series.count} series`;
        }),
      TITLE,
    );
    expect(name).toBe('Chart 1: 1 series');
    const figure = session.page.getByRole('img', { name: TITLE });
    await figure.waitFor();
    expect(await circles().count()).toBe(60);
    expect(await session.page.locator('[data-chart="Chart 1"] .chart-title').textContent()).toBe(TITLE);
    // Yields lie far from zero, so no zero line is drawn.
    expect(await session.page.locator('[data-chart="Chart 1"] .chart-zero').count()).toBe(0);
    const chartBox = await session.page.locator('[data-chart="Chart 1"]').boundingBox();
    const cellBox = await session.page.locator('[data-cell="H2"]').boundingBox();
    expect(chartBox).not.toBeNull();
    expect(cellBox).not.toBeNull();
    expect(Math.abs((chartBox?.x ?? 0) - (cellBox?.x ?? 0))).toBeLessThan(1);
    expect(Math.abs((chartBox?.y ?? 0) - (cellBox?.y ?? 0))).toBeLessThan(1);
  });

  it('moves a point when its cell is edited', async () => {
    const before = await centre(0);
    await session.page.locator('[data-cell="B2"]').click();
    await session.page.fill('#formula-input', '30');
    await session.page.press('#formula-input', 'Enter');
    await expect.poll(async () => (await centre(0)).cy).not.toBe(before.cy);
    const after = await centre(0);
    // Steep time is unchanged, and 30 % is now the highest yield, so the point is the topmost.
    expect(after.cx).toBe(before.cx);
    const heights = await circles().evaluateAll((nodes) => nodes.map((n) => Number(n.getAttribute('cy'))));
    expect(Math.min(...heights)).toBe(after.cy);
  });

  it('shows bold, fill and column widths set through the Excel API', async () => {
    await session.page.evaluate(() =>
      Excel.run(async (context) => {
        const header = context.workbook.worksheets.getItem('Batches').getRange('A1:G1');
        header.format.font.bold = true;
        header.format.fill.color = '#CCFBF1';
        header.getCell(0, 0).format.columnWidth = 60;
        await context.sync();
      }),
    );
    const a1 = session.page.locator('[data-cell="A1"]');
    await expect.poll(() => a1.evaluate((el) => getComputedStyle(el).fontWeight)).toBe('700');
    expect(await a1.evaluate((el) => getComputedStyle(el).backgroundColor)).toBe('rgb(204, 251, 241)');
    // 60 points at 96 dpi is 80 pixels.
    expect((await a1.boundingBox())?.width).toBe(80);
    expect(await session.page.locator('[data-cell="A2"]').evaluate((el) => getComputedStyle(el).fontWeight)).toBe('400');
    await screenshot(session.page, 'charts');
  });
});
