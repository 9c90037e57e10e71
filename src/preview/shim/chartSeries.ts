/** Excel.ChartSeriesCollection and ChartSeries: which cells each series of a chart reads. */
import { seriesName } from '../workbook/chartData';
import type { ChartSeriesSource, RangeRef, SeriesChartType } from '../workbook/types';
import { ChartType } from './chartEnums';
import { ShimClientObject } from './clientObject';
import { changeChart, liveChart, type ChartTarget } from './chartTarget';
import { splitCollectionLoad } from './collectionLoad';
import type { LoadSpec } from './loadOptions';
import { invalidArgument, itemNotFound, notInPreview } from './officeErrors';
import { ShimRange } from './range';
import { rangeRefOf } from './rangeRef';
import type { ShimRequestContext } from './requestContext';
import { refuseMembers } from './unsupported';

interface SeriesTarget {
  chart: ChartTarget;
  index: number;
}

export class ShimChartSeries extends ShimClientObject<SeriesTarget> {
  protected readonly typeName = 'ChartSeries';
  protected readonly scalarNames: readonly string[] = ['name', 'chartType'];

  constructor(
    context: ShimRequestContext,
    private readonly locator: () => SeriesTarget,
    location: string | undefined,
  ) {
    super(context);
    if (location === undefined) this.resolveOrNull();
    else this.queueResolve(location);
  }

  protected locate(): SeriesTarget {
    return this.locator();
  }

  private source(target: SeriesTarget, location: string): ChartSeriesSource {
    const series = liveChart(this.context, target.chart, location).chart.series[target.index];
    if (series === undefined) throw itemNotFound(location);
    return series;
  }

  private change(location: string, edit: (series: ChartSeriesSource) => ChartSeriesSource): void {
    const target = this.target(location);
    this.source(target, location);
    changeChart(this.context, target.chart, location, (chart) => ({ series: chart.series.map((s, i) => (i === target.index ? edit(s) : s)) }));
  }

  protected readScalar(name: string, target: SeriesTarget): unknown {
    const location = `ChartSeries.${name}`;
    if (name === 'chartType') return this.source(target, location).chartType;
    if (name !== 'name') throw invalidArgument(location);
    return seriesName(this.context.model, this.source(target, location));
  }

  get chartType(): string {
    return this.loadedValue('chartType');
  }
  /**
   * "Excel.ChartSeries" chartType (ExcelApi 1.7): one series of a chart drawn as another type.
   * The preview draws only scatter points and straight lines without markers; any other type
   * is refused with InvalidArgument and a note saying so.
   */
  set chartType(type: string) {
    this.queueWrite('chartType', type, (_target, location) => {
      if (!isSeriesChartType(type)) {
        const error = invalidArgument(location);
        error.debugInfo.message = `${error.message} (preview: a series can be XYScatter or XYScatterLinesNoMarkers only)`;
        throw error;
      }
      this.change(location, (s) => ({ ...s, chartType: type }));
    });
  }

  get name(): string {
    return this.loadedValue('name');
  }
  /** The add-in names series as it adds them, so renaming one is refused rather than modelled. */
  set name(_name: string) {
    throw notInPreview('ChartSeries.name (setting it)');
  }

  /** A one-row or one-column range; the chart keeps reading it, so later edits show. */
  private sourceRange(range: unknown, location: string): RangeRef {
    if (!(range instanceof ShimRange)) throw invalidArgument(location);
    const ref = rangeRefOf(this.context, range.target(location), location);
    if (ref.top !== ref.bottom && ref.left !== ref.right) throw invalidArgument(location);
    return ref;
  }

  setXAxisValues(sourceData: unknown): void {
    const location = 'ChartSeries.setXAxisValues';
    this.context.enqueue(location, () => {
      const x = this.sourceRange(sourceData, location);
      this.change(location, (s) => ({ ...s, x }));
    });
  }

  /** For a scatter chart these are the Y values. */
  setValues(sourceData: unknown): void {
    const location = 'ChartSeries.setValues';
    this.context.enqueue(location, () => {
      const y = this.sourceRange(sourceData, location);
      this.change(location, (s) => ({ ...s, y }));
    });
  }

  delete(): void {
    const location = 'ChartSeries.delete';
    this.context.enqueue(location, () => {
      const target = this.target(location);
      this.source(target, location);
      changeChart(this.context, target.chart, location, (chart) => ({ series: chart.series.filter((_, i) => i !== target.index) }));
    });
  }
}
refuseMembers(ShimChartSeries.prototype, 'ChartSeries', [
  'format',
  'markerStyle',
  'markerSize',
  'markerBackgroundColor',
  'markerForegroundColor',
  'trendlines',
  'points',
]);

const SERIES_CHART_TYPES: readonly string[] = [ChartType.xyscatter, ChartType.xyscatterLinesNoMarkers] satisfies SeriesChartType[];

function isSeriesChartType(type: unknown): type is SeriesChartType {
  return typeof type === 'string' && SERIES_CHART_TYPES.includes(type);
}

export class ShimChartSeriesCollection extends ShimClientObject<ChartTarget> {
  protected readonly typeName = 'ChartSeriesCollection';
  protected readonly scalarNames: readonly string[] = ['count'];
  private loadedItems: ShimChartSeries[] | undefined;

  constructor(
    context: ShimRequestContext,
    private readonly locator: () => ChartTarget,
  ) {
    super(context);
  }

  protected locate(): ChartTarget {
    return this.locator();
  }

  protected readScalar(name: string, target: ChartTarget): unknown {
    const location = `ChartSeriesCollection.${name}`;
    if (name !== 'count') throw invalidArgument(location);
    return liveChart(this.context, target, location).chart.series.length;
  }

  /** As for other collections, member names without 'items/' mean those members of each item. */
  override applyLoad(spec: LoadSpec): void {
    const { scalars, items } = splitCollectionLoad(spec, this.scalarNames);
    if (scalars.length > 0) super.applyLoad({ all: false, members: new Map(scalars.map((s) => [s, { all: true }])) });
    if (items === undefined) return;
    const target = this.target('ChartSeriesCollection.items');
    const count = liveChart(this.context, target, 'ChartSeriesCollection.items').chart.series.length;
    this.loadedItems = Array.from({ length: count }, (_, index) => new ShimChartSeries(this.context, () => ({ chart: target, index }), undefined));
    for (const item of this.loadedItems) item.applyLoad(items);
  }

  get items(): ShimChartSeries[] {
    return this.loadedItems ?? this.loadedValue('items');
  }

  get count(): number {
    return this.loadedValue('count');
  }

  /**
   * "Excel.ChartSeriesCollection" add(name?, index?): a series with no values yet, not shown until
   * setValues gives it some; named "SeriesN" unless named; at `index` (zero-based) or last.
   */
  add(name?: string, index?: number): ShimChartSeries {
    const location = 'ChartSeriesCollection.add';
    return new ShimChartSeries(
      this.context,
      () => {
        const chart = this.target(location);
        if (name !== undefined && typeof name !== 'string') throw invalidArgument(location);
        let at = 0;
        changeChart(this.context, chart, location, (c) => {
          at = index ?? c.series.length;
          if (!Number.isInteger(at) || at < 0 || at > c.series.length) throw invalidArgument(location);
          // A new series takes its chart's type.
          const added: ChartSeriesSource = { name: name ?? `Series${c.series.length + 1}`, x: null, y: null, chartType: c.type };
          return { series: [...c.series.slice(0, at), added, ...c.series.slice(at)] };
        });
        return { chart, index: at };
      },
      location,
    );
  }
}
