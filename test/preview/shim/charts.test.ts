/**
 * Excel.ChartCollection, Chart and ChartSeries as the Excel JavaScript API reference describes
 * them (Microsoft Learn: Excel.ChartCollection.add, Excel.Chart.setPosition, Excel.ChartSeries
 * setXAxisValues/setValues, and "Work with charts using the Excel JavaScript API"), written
 * against @types/office-js so tsc checks the calls match the real declarations.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { plotChart } from '../../../src/preview/workbook/chartData';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { freshWorkbook, NOT_LOADED, officeError, thrownOfficeError } from './harness';

let model: PreviewWorkbook;

beforeEach(() => {
  model = freshWorkbook();
  model.addSheet('Data');
  model.setInputs('Data', 0, 0, [
    ['Steep (h)', 'Yield (%)', 'Grind'],
    [12, 17.5, 800],
    [18, 19.1, 900],
    [24, 21.4, 1000],
  ]);
});

const dataSheet = (context: Excel.RequestContext) => context.workbook.worksheets.getItem('Data');

/** Adds a scatter chart of A2:B4 (series in columns) and returns the chart's name. */
async function addChart(address = 'A2:B4', seriesBy: Excel.ChartSeriesBy = Excel.ChartSeriesBy.columns): Promise<string> {
  return Excel.run(async (context) => {
    const sheet = dataSheet(context);
    const chart = sheet.charts.add(Excel.ChartType.xyscatter, sheet.getRange(address), seriesBy);
    chart.load('name');
    await context.sync();
    return chart.name;
  });
}

/** The first series of Chart 1, reached as the add-in reaches series: through the loaded items. */
async function firstSeries(context: Excel.RequestContext): Promise<Excel.ChartSeries> {
  const series = dataSheet(context).charts.getItem('Chart 1').series.load('items/name');
  await context.sync();
  return series.items[0];
}

const only = () => {
  const charts = model.charts('Data');
  expect(charts).toHaveLength(1);
  return charts[0];
};

describe('charts.add', () => {
  it('makes a scatter chart with X from the first column and Y from the second, named Series1', async () => {
    const name = await addChart();
    expect(name).toBe('Chart 1');
    const chart = only();
    expect(chart.type).toBe('XYScatter');
    expect(chart.series).toEqual([
      {
        name: 'Series1',
        x: { sheet: 'Data', top: 1, left: 0, bottom: 3, right: 0 },
        y: { sheet: 'Data', top: 1, left: 1, bottom: 3, right: 1 },
        chartType: 'XYScatter',
      },
    ]);
    await Excel.run(async (context) => {
      const loaded = dataSheet(context).charts.getItem('Chart 1');
      loaded.title.load('text');
      const series = await firstSeries(context);
      // Excel titles a one-series chart with the series name until the title is set.
      expect(loaded.title.text).toBe('Series1');
      expect(series.name).toBe('Series1');
    });
  });

  // Header rows as series names are Excel's own rule: the preview plots every source cell, so a
  // report that relies on them shows wrong series here instead of passing.
  it('never takes a text first row as series names: every cell of the source is data', async () => {
    await addChart('A1:C4', Excel.ChartSeriesBy.columns);
    const { series } = only();
    expect(series.map((s) => s.name)).toEqual(['Series1', 'Series2']);
    expect(series.map((s) => s.x)).toEqual([
      { sheet: 'Data', top: 0, left: 0, bottom: 3, right: 0 },
      { sheet: 'Data', top: 0, left: 0, bottom: 3, right: 0 },
    ]);
    expect(series[1].y).toEqual({ sheet: 'Data', top: 0, left: 2, bottom: 3, right: 2 });
    await Excel.run(async (context) => {
      const title = dataSheet(context).charts.getItem('Chart 1').title.load('text');
      await context.sync();
      expect(title.text).toBe('Chart Title');
    });
  });

  // Excel.ChartSeriesBy: "auto" guesses from the shape on desktop and means columns on the web.
  it.each([[undefined], ['Auto' as Excel.ChartSeriesBy]])(
    'refuses seriesBy %s with InvalidArgument, since its layout differs by platform',
    async (seriesBy) => {
      const error = await officeError(
        Excel.run(async (context) => {
          const sheet = dataSheet(context);
          sheet.charts.add(Excel.ChartType.xyscatter, sheet.getRange('A2:B4'), seriesBy);
          await context.sync();
        }),
      );
      expect(error.code).toBe('InvalidArgument');
      expect(model.charts('Data')).toEqual([]);
    },
  );

  it('numbers new charts on and sizes them 360 by 216 points', async () => {
    await addChart();
    await addChart();
    await Excel.run(async (context) => {
      const charts = dataSheet(context).charts.load('items/name');
      await context.sync();
      expect(charts.items.map((c) => c.name)).toEqual(['Chart 1', 'Chart 2']);
    });
    expect(model.charts('Data').map((c) => [c.bounds.width, c.bounds.height])).toEqual([
      [360, 216],
      [360, 216],
    ]);
  });

  it.each([['Line'], ['ColumnClustered'], ['Pie']])('rejects chart type %s with InvalidArgument and adds nothing', async (type) => {
    const error = await officeError(
      Excel.run(async (context) => {
        const sheet = dataSheet(context);
        sheet.charts.add(type as Excel.ChartType, sheet.getRange('A1:B4'));
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
    expect(error.debugInfo.errorLocation).toBe('ChartCollection.add');
    expect(model.charts('Data')).toEqual([]);
  });

  it.each([['Rows'], ['Diagonal']])('rejects seriesBy %s: only columns are modelled', async (seriesBy) => {
    const error = await officeError(
      Excel.run(async (context) => {
        const sheet = dataSheet(context);
        sheet.charts.add('XYScatter', sheet.getRange('A1:B4'), seriesBy as Excel.ChartSeriesBy);
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
  });
});

describe('reading chart properties', () => {
  it('throws PropertyNotLoaded before load and sync, as every proxy does', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const chart = dataSheet(context).charts.getItem('Chart 1');
      await context.sync();
      const error = thrownOfficeError(() => chart.title.text);
      expect(error.code).toBe('PropertyNotLoaded');
      expect(error.message).toBe(NOT_LOADED('text'));
      chart.title.load('text');
      expect(thrownOfficeError(() => chart.title.text).code).toBe('PropertyNotLoaded');
      await context.sync();
      expect(chart.title.text).toBe('Series1');
    });
  });

  it('loads navigation paths from the chart', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const chart = dataSheet(context).charts.getItem('Chart 1');
      chart.load('title/text, axes/valueAxis/title/text, series/items/name');
      await context.sync();
      expect(chart.title.text).toBe('Series1');
      expect(chart.axes.valueAxis.title.text).toBe('');
      expect(chart.series.items.map((s) => s.name)).toEqual(['Series1']);
    });
  });

  it('plots its cells live: an edited Y cell shows in the chart without re-adding it', async () => {
    await addChart();
    model.setInputs('Data', 1, 1, [[99]]);
    expect(plotChart(model, only()).series[0].points[0]).toEqual({ x: 12, y: 99 });
  });
});

describe('titles', () => {
  it('writes the chart title and both axis titles; the category axis is X', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const chart = dataSheet(context).charts.getItem('Chart 1');
      chart.title.text = 'Yield against steep time';
      chart.axes.categoryAxis.title.text = 'Steep time (h)';
      chart.axes.valueAxis.title.text = 'Yield (%)';
      await context.sync();
    });
    const chart = only();
    expect(chart.title).toBe('Yield against steep time');
    expect(chart.axisTitles).toEqual({ category: 'Steep time (h)', value: 'Yield (%)' });
  });
});

describe('series', () => {
  it('setXAxisValues and setValues point the series at other cells, keeping its name', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const sheet = dataSheet(context);
      const series = await firstSeries(context);
      series.setXAxisValues(sheet.getRange('C2:C4'));
      series.setValues(sheet.getRange('A2:A4'));
      await context.sync();
    });
    expect(only().series[0]).toEqual({
      name: 'Series1',
      x: { sheet: 'Data', top: 1, left: 2, bottom: 3, right: 2 },
      y: { sheet: 'Data', top: 1, left: 0, bottom: 3, right: 0 },
      chartType: 'XYScatter',
    });
  });

  it('rejects a two-dimensional range for values', async () => {
    await addChart();
    const error = await officeError(
      Excel.run(async (context) => {
        const sheet = dataSheet(context);
        (await firstSeries(context)).setValues(sheet.getRange('A2:B4'));
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
    expect(error.debugInfo.errorLocation).toBe('ChartSeries.setValues');
  });

  it('adds and deletes series, and counts them', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const sheet = dataSheet(context);
      const chart = sheet.charts.getItem('Chart 1');
      const added = chart.series.add('Planned');
      added.setXAxisValues(sheet.getRange('A2:A3'));
      added.setValues(sheet.getRange('C2:C3'));
      chart.series.load('count');
      await context.sync();
      expect(chart.series.count).toBe(2);
      chart.series.load('items');
      await context.sync();
      chart.series.items[0].delete();
      chart.series.load('count');
      await context.sync();
      expect(chart.series.count).toBe(1);
    });
    expect(only().series).toEqual([
      {
        name: 'Planned',
        x: { sheet: 'Data', top: 1, left: 0, bottom: 2, right: 0 },
        y: { sheet: 'Data', top: 1, left: 2, bottom: 2, right: 2 },
        chartType: 'XYScatter',
      },
    ]);
  });
});

// "Excel.ChartSeries" (Microsoft Learn): chartType, "the chart type of a series" (ExcelApi 1.7),
// which lets one series of a scatter chart be drawn as a line.
describe('a series chart type', () => {
  it('starts as its chart type, and turns a series into a line without markers', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const sheet = dataSheet(context);
      const chart = sheet.charts.getItem('Chart 1');
      const guide = chart.series.add('Guide');
      guide.setXAxisValues(sheet.getRange('A2:A3'));
      guide.setValues(sheet.getRange('A2:A3'));
      guide.load('chartType');
      await context.sync();
      expect(guide.chartType).toBe('XYScatter');
      guide.chartType = Excel.ChartType.xyscatterLinesNoMarkers;
      await context.sync();
    });
    expect(only().series.map((s) => s.chartType)).toEqual(['XYScatter', 'XYScatterLinesNoMarkers']);
    const plotted = plotChart(model, only()).series[1];
    expect(plotted.drawn).toBe('lines');
    expect(plotted.runs).toEqual([
      [
        { x: 12, y: 12 },
        { x: 18, y: 18 },
      ],
    ]);
  });

  it.each([['Line'], ['XYScatterSmooth'], ['Diagonal']])('refuses %s, which the preview cannot draw, with InvalidArgument', async (type) => {
    await addChart();
    const error = await officeError(
      Excel.run(async (context) => {
        (await firstSeries(context)).chartType = type as Excel.ChartType;
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
    expect(error.debugInfo.errorLocation).toBe('ChartSeries.chartType');
    expect(only().series[0].chartType).toBe('XYScatter');
  });
});

// "Excel.ChartAxis" (Microsoft Learn): minimum and maximum "can be set to a numeric value or an
// empty string (for automatic axis values). The returned value is always a number." (ExcelApi 1.1)
describe('axis bounds', () => {
  it('fixes an axis minimum and maximum, reads them back, and returns to automatic with ""', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const axes = dataSheet(context).charts.getItem('Chart 1').axes;
      axes.categoryAxis.minimum = 10;
      axes.categoryAxis.maximum = 30;
      axes.valueAxis.minimum = 15;
      await context.sync();
      const x = axes.categoryAxis.load('minimum, maximum');
      await context.sync();
      expect([x.minimum, x.maximum]).toEqual([10, 30]);
    });
    expect(only().axisScales).toEqual({ category: { minimum: 10, maximum: 30 }, value: { minimum: 15, maximum: null } });
    expect(plotChart(model, only()).xScale).toEqual({ minimum: 10, maximum: 30 });
    await Excel.run(async (context) => {
      dataSheet(context).charts.getItem('Chart 1').axes.valueAxis.minimum = '';
      await context.sync();
    });
    expect(only().axisScales.value).toEqual({ minimum: null, maximum: null });
  });

  it('refuses to invent the number Excel reads back for an automatic bound', async () => {
    await addChart();
    const error = await officeError(
      Excel.run(async (context) => {
        dataSheet(context).charts.getItem('Chart 1').axes.valueAxis.load('maximum');
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
  });

  it.each([[Number.NaN], ['ten'], [40]])('refuses a bound of %s (40: at or above the maximum of 30)', async (bound) => {
    await addChart();
    const error = await officeError(
      Excel.run(async (context) => {
        const axis = dataSheet(context).charts.getItem('Chart 1').axes.categoryAxis;
        axis.maximum = 30;
        axis.minimum = bound as number;
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
    expect(error.debugInfo.errorLocation).toBe('ChartAxis.minimum');
  });
});

describe('position', () => {
  it('setPosition covers the start cell to the end cell, in points', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const sheet = dataSheet(context);
      const chart = sheet.charts.getItem('Chart 1');
      chart.setPosition('E2', sheet.getRange('J12'));
      await context.sync();
    });
    // Columns are 78 points wide and rows 18 points high until changed.
    expect(only().bounds).toEqual({ left: 4 * 78, top: 18, width: 6 * 78, height: 11 * 18 });
  });

  it('setPosition without an end cell moves the chart and keeps its size', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const chart = dataSheet(context).charts.getItem('Chart 1');
      chart.setPosition('B3');
      await context.sync();
    });
    expect(only().bounds).toEqual({ left: 78, top: 36, width: 360, height: 216 });
  });

  it('rejects a start cell on another sheet', async () => {
    await addChart();
    const error = await officeError(
      Excel.run(async (context) => {
        dataSheet(context).charts.getItem('Chart 1').setPosition('Sheet1!A1');
        await context.sync();
      }),
    );
    expect(error.code).toBe('InvalidArgument');
  });

  it('moves with the cells under it when a column to its left widens', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const sheet = dataSheet(context);
      sheet.charts.getItem('Chart 1').setPosition('C1', 'F10');
      sheet.getRange('A1').format.columnWidth = 100;
      await context.sync();
    });
    expect(only().bounds).toMatchObject({ left: 100 + 78, width: 4 * 78 });
  });
});

describe('the collection', () => {
  it('finds charts by name without regard to case, and reports a missing one', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const charts = dataSheet(context).charts;
      const found = charts.getItem('CHART 1').load('name');
      const missing = charts.getItemOrNullObject('Chart 9');
      await context.sync();
      expect(found.name).toBe('Chart 1');
      expect(missing.isNullObject).toBe(true);
    });
    const error = await officeError(
      Excel.run(async (context) => {
        dataSheet(context).charts.getItem('Chart 9').load('name');
        await context.sync();
      }),
    );
    expect(error.code).toBe('ItemNotFound');
  });

  it('renames a chart, after which its new name finds it', async () => {
    await addChart();
    await Excel.run(async (context) => {
      dataSheet(context).charts.getItem('Chart 1').name = 'Yield by steep';
      await context.sync();
      const renamed = dataSheet(context).charts.getItem('Yield by steep').load('name');
      await context.sync();
      expect(renamed.name).toBe('Yield by steep');
    });
  });

  it('keeps charts to their own sheet', async () => {
    await addChart();
    await Excel.run(async (context) => {
      const other = context.workbook.worksheets.getItem('Sheet1').charts.load('items');
      await context.sync();
      expect(other.items).toEqual([]);
    });
  });
});
