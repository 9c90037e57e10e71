/** Excel.Chart: a chart on a worksheet, its name, its place over the cells, texts and series. */
import { parseRange } from '../../addressing/a1';
import { columnLeft, ROW_HEIGHT } from '../workbook/layout';
import type { ChartBounds, RangeRef } from '../workbook/types';
import { ShimClientObject, type Loadable } from './clientObject';
import { ShimChartAxes, ShimChartTitle } from './chartParts';
import { ShimChartSeriesCollection } from './chartSeries';
import { changeChart, liveChart, type ChartTarget } from './chartTarget';
import { invalidArgument } from './officeErrors';
import { ShimRange } from './range';
import { rangeRefOf } from './rangeRef';
import type { ShimRequestContext } from './requestContext';
import { refuseMembers } from './unsupported';

export class ShimChart extends ShimClientObject<ChartTarget> {
  protected readonly typeName = 'Chart';
  protected readonly scalarNames: readonly string[] = ['name'];
  readonly title: ShimChartTitle;
  readonly axes: ShimChartAxes;
  readonly series: ShimChartSeriesCollection;

  /** `location` undefined: the chart is already known (collection items), nothing to queue. */
  constructor(
    context: ShimRequestContext,
    private readonly locator: () => ChartTarget | null,
    location: string | undefined,
  ) {
    super(context);
    const part = (): ChartTarget => this.target('Chart');
    this.title = new ShimChartTitle(context, part);
    this.axes = new ShimChartAxes(context, part);
    this.series = new ShimChartSeriesCollection(context, part);
    if (location === undefined) this.resolveOrNull();
    else this.queueResolve(location);
  }

  protected locate(): ChartTarget | null {
    return this.locator();
  }

  protected override navigation(name: string): Loadable | undefined {
    switch (name) {
      case 'title':
        return this.title;
      case 'axes':
        return this.axes;
      case 'series':
        return this.series;
      default:
        return undefined;
    }
  }

  protected readScalar(name: string, target: ChartTarget): unknown {
    const location = `Chart.${name}`;
    if (name !== 'name') throw invalidArgument(location);
    return liveChart(this.context, target, location).chart.name;
  }

  get name(): string {
    return this.loadedValue('name');
  }
  set name(name: string) {
    this.queueWrite('name', name, (target, location) => {
      if (typeof name !== 'string' || name.trim() === '') throw invalidArgument(location);
      changeChart(this.context, target, location, () => ({ name }));
    });
  }

  /**
   * Moves the chart's top-left corner to the start cell, keeping its size, or makes it cover
   * everything from the start cell to the end cell. Cells are on the chart's own sheet.
   */
  setPosition(startCell: unknown, endCell?: unknown): void {
    const location = 'Chart.setPosition';
    this.context.enqueue(location, () => {
      const target = this.target(location);
      const { sheet } = liveChart(this.context, target, location);
      const start = this.cellOn(sheet, startCell, location);
      const end = endCell === undefined || endCell === null ? undefined : this.cellOn(sheet, endCell, location);
      const widthOf = (column: number) => this.context.model.columnWidth(sheet, column);
      changeChart(this.context, target, location, (chart) => {
        const left = columnLeft(widthOf, start.left);
        const top = start.top * ROW_HEIGHT;
        if (end === undefined) return { bounds: { ...chart.bounds, left, top } };
        const bounds: ChartBounds = { left, top, width: columnLeft(widthOf, end.right + 1) - left, height: (end.bottom + 1) * ROW_HEIGHT - top };
        if (bounds.width < 0 || bounds.height < 0) throw invalidArgument(location);
        return { bounds };
      });
    });
  }

  private cellOn(sheet: string, cell: unknown, location: string): RangeRef {
    const ref =
      cell instanceof ShimRange ? rangeRefOf(this.context, cell.target(location), location) : typeof cell === 'string' ? parseRange(cell, sheet) : undefined;
    if (ref === undefined || ref.sheet.toLowerCase() !== sheet.toLowerCase()) throw invalidArgument(location);
    return ref;
  }
}
refuseMembers(ShimChart.prototype, 'Chart', [
  'legend',
  'dataLabels',
  'format',
  'plotArea',
  'style',
  'setData',
  'getImage',
  'activate',
  'delete',
  'chartType',
  'id',
  'left',
  'top',
  'width',
  'height',
  'worksheet',
]);
