/** Excel.Chart: a chart on a worksheet, its name, position in points, texts and series. */
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
import { ShimWorksheet } from './worksheet';

const CHART_SCALARS = ['chartType', 'height', 'id', 'left', 'name', 'top', 'width'] as const;
type Side = 'left' | 'top' | 'width' | 'height';

export class ShimChart extends ShimClientObject<ChartTarget> {
  protected readonly typeName = 'Chart';
  protected readonly scalarNames: readonly string[] = CHART_SCALARS;
  readonly title: ShimChartTitle;
  readonly axes: ShimChartAxes;
  readonly series: ShimChartSeriesCollection;
  private worksheetProxy: ShimWorksheet | undefined;

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
      case 'worksheet':
        return this.worksheet;
      default:
        return undefined;
    }
  }

  protected readScalar(name: string, target: ChartTarget): unknown {
    const location = `Chart.${name}`;
    const { chart } = liveChart(this.context, target, location);
    switch (name) {
      case 'chartType':
        return chart.type;
      case 'id':
        return chart.id;
      case 'name':
        return chart.name;
      case 'left':
      case 'top':
      case 'width':
      case 'height':
        return chart.bounds[name];
      default:
        throw invalidArgument(location);
    }
  }

  get worksheet(): ShimWorksheet {
    this.worksheetProxy ??= new ShimWorksheet(this.context, () => this.target('Chart.worksheet').sheet, 'Chart.worksheet');
    return this.worksheetProxy;
  }

  get chartType(): string {
    return this.loadedValue('chartType');
  }
  get id(): string {
    return this.loadedValue('id');
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

  get left(): number {
    return this.loadedValue('left');
  }
  set left(points: number) {
    this.writeSide('left', points);
  }
  get top(): number {
    return this.loadedValue('top');
  }
  set top(points: number) {
    this.writeSide('top', points);
  }
  get width(): number {
    return this.loadedValue('width');
  }
  set width(points: number) {
    this.writeSide('width', points);
  }
  get height(): number {
    return this.loadedValue('height');
  }
  set height(points: number) {
    this.writeSide('height', points);
  }

  private writeSide(side: Side, points: number): void {
    this.queueWrite(side, points, (target, location) => {
      if (typeof points !== 'number' || !Number.isFinite(points) || points < 0) throw invalidArgument(location);
      changeChart(this.context, target, location, (chart) => ({ bounds: { ...chart.bounds, [side]: points } }));
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

  delete(): void {
    const location = 'Chart.delete';
    this.context.enqueue(location, () => {
      const { sheet, chart } = liveChart(this.context, this.target(location), location);
      this.context.model.removeChart(sheet, chart.id);
    });
  }
}
refuseMembers(ShimChart.prototype, 'Chart', ['legend', 'dataLabels', 'format', 'plotArea', 'style', 'setData', 'getImage', 'activate']);
