/**
 * Charts and cell formatting in the real built preview, in Chromium: an add-in's Excel API calls
 * draw a scatter chart over the grid that follows its cells, and bold, fill and column widths
 * show in the grid. The chart is built as the report builds its charts, series by series
 * (Microsoft Learn, "Excel.ChartSeriesCollection class": add(name, index); "Excel.ChartSeries
 * class": delete, setXAxisValues, setValues, chartType), not left to the layout charts.add picks;
 * its axis bounds are fixed as "Excel.ChartAxis class" describes (minimum, maximum). A report
 * written from the pane then draws its guide lines as lines without markers.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { type BrowserSession, chromiumAvailable, openPage, screenshot } from '../../support/browser';
import { goTo } from '../../support/previewPage';
import { chartMarkers } from '../../support/chartMarkers';

const available = chromiumAvailable();
if (!available) console.warn('Browser tests skipped: /usr/bin/chromium is absent (apt-get install -y chromium).');

const TITLE = 'Extraction yield against steep time';

describe.skipIf(!available)('charts and formatting in the preview workbook', () => {
  let session: BrowserSession;
  const origin = inject('previewOrigin');
  const markersOf = (chartName: string) => chartMarkers(session.page, chartName);
  const markers = () => markersOf('Chart 1');
  const centre = async (index: number) => (await markers())[index];

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
          // Excel's automatic axis would start at 0 for values this far from it; fixed bounds do not.
          chart.axes.valueAxis.minimum = 10;
          chart.axes.valueAxis.maximum = 40;
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
    expect(await markers()).toHaveLength(60);
    expect(await session.page.locator('[data-chart="Chart 1"] .chart-title').textContent()).toBe(TITLE);
    // The value axis runs over its fixed bounds, away from zero, so no zero line is drawn.
    expect(await session.page.locator('[data-chart="Chart 1"] [data-axis="y"] text').allTextContents()).toEqual(['10', '20', '30', '40']);
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
    const heights = (await markers()).map((point) => point.cy);
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

  it("draws a report's guide lines as lines without markers: y = x twice and the 4/n cut-off", async () => {
    const page = session.page;
    await goTo(page, 'Batches!B1:B61');
    await page.getByRole('button', { name: 'Use selection for Response (one column)' }).click();
    await goTo(page, 'Batches!C1:G61');
    await page.getByRole('button', { name: 'Use selection for Predictors' }).click();
    await page.getByRole('button', { name: 'Read data and fit' }).click();
    await page.getByRole('button', { name: 'Write report' }).click();
    const chart = (name: string) => page.locator(`[data-chart="${name}"]`);
    await chart('CooksDistance').waitFor();
    // The guide cells are formulas over PLUMB results, so the lines appear once those have calculated.
    for (const name of ['ObservedVsFitted', 'NormalQQ', 'CooksDistance']) {
      await expect.poll(() => chart(name).locator('.chart-line polyline').count()).toBe(1);
      expect(await chart(name).locator('.chart-line .chart-markers').count()).toBe(0);
    }
    expect(await chart('ResidualsVsFitted').locator('.chart-line').count()).toBe(0);
    expect(await markersOf('ObservedVsFitted')).toHaveLength(60);
    // y = x rises from its lower left end to its upper right one (SVG's y runs downwards).
    const ends = (await chart('ObservedVsFitted').locator('.chart-line polyline').getAttribute('points'))?.split(' ').map((p) => p.split(',').map(Number));
    expect(ends).toHaveLength(2);
    const [[x1, y1], [x2, y2]] = ends ?? [];
    expect(x2).toBeGreaterThan(x1);
    expect(y2).toBeLessThan(y1);
    // The 4/n line is level.
    const cut = (await chart('CooksDistance').locator('.chart-line polyline').getAttribute('points'))?.split(' ').map((p) => p.split(',')[1]);
    expect(new Set(cut).size).toBe(1);
    await chart('NormalQQ').scrollIntoViewIfNeeded();
    await screenshot(page, 'report-guide-lines');
  });
});
