/**
 * Excel.ChartType and Excel.ChartSeriesBy, with the values the add-in names: the two chart types
 * the preview draws and series in columns. Any other value is absent, so code naming it passes
 * undefined and charts.add or ChartSeries.chartType refuses it with InvalidArgument.
 */
export const ChartType = {
  xyscatterLinesNoMarkers: 'XYScatterLinesNoMarkers',
  xyscatter: 'XYScatter',
} as const;

export const ChartSeriesBy = { columns: 'Columns' } as const;
