/**
 * What chart proxies point at: a chart by its id on a sheet handle, so that renaming the chart or
 * its sheet keeps every proxy on it, as object identity does in Excel.
 */
import type { ChartChange, ChartSpec } from '../workbook/types';
import { itemNotFound } from './officeErrors';
import type { SheetHandle, ShimRequestContext } from './requestContext';

export interface ChartTarget {
  sheet: SheetHandle;
  id: string;
}

export interface LiveChart {
  sheet: string;
  chart: ChartSpec;
}

/** The chart as it is now, or ItemNotFound once it (or its sheet) was deleted. */
export function liveChart(context: ShimRequestContext, target: ChartTarget, location: string): LiveChart {
  const sheet = context.liveSheet(target.sheet, location);
  const chart = context.model.charts(sheet).find((c) => c.id === target.id);
  if (chart === undefined) throw itemNotFound(location);
  return { sheet, chart };
}

export function changeChart(context: ShimRequestContext, target: ChartTarget, location: string, change: (chart: ChartSpec) => ChartChange): void {
  const { sheet, chart } = liveChart(context, target, location);
  context.model.updateChart(sheet, chart.id, change(chart));
}
