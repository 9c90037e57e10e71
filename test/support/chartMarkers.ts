/** A preview chart's markers as the page draws them: one path per marker series (src/preview/ui/markerPath.ts). */
import type { Page } from 'playwright-core';
import { markerCentres } from '../../src/preview/ui/markerPath';

/** The marker centres of a chart's first marker series, in point order; none when it has no such series. */
export async function chartMarkers(page: Page, chartName: string): Promise<{ cx: number; cy: number }[]> {
  const paths = page.locator(`[data-chart="${chartName}"] .chart-series .chart-markers`);
  if ((await paths.count()) === 0) return [];
  return markerCentres((await paths.first().getAttribute('d')) ?? '');
}

export async function chartMarkerCount(page: Page, chartName: string): Promise<number> {
  return (await chartMarkers(page, chartName)).length;
}
