/**
 * Excel.ChartCollection: a worksheet's charts. Only scatter charts can be made; any other type
 * is refused with InvalidArgument, so an add-in learns at once that the preview cannot show it.
 */
import { columnLeft, ROW_HEIGHT } from '../workbook/layout';
import type { ChartBounds, RangeRef } from '../workbook/types';
import { ShimChart } from './chart';
import type { ChartTarget } from './chartTarget';
import { seriesFromColumns } from './chartSource';
import { ShimClientObject } from './clientObject';
import { splitCollectionLoad } from './collectionLoad';
import type { LoadSpec } from './loadOptions';
import { invalidArgument, itemNotFound, type OfficeExtensionError } from './officeErrors';
import { ShimRange } from './range';
import { rangeRefOf } from './rangeRef';
import type { SheetHandle, ShimRequestContext } from './requestContext';

const AUTOMATIC_SCALE = { minimum: null, maximum: null };

/** Excel's size for a new chart: 5 by 3 inches. */
const NEW_CHART_WIDTH = 360;
const NEW_CHART_HEIGHT = 216;

export class ShimChartCollection extends ShimClientObject<SheetHandle> {
  protected readonly typeName = 'ChartCollection';
  protected readonly scalarNames: readonly string[] = [];
  private loadedItems: ShimChart[] | undefined;

  constructor(
    context: ShimRequestContext,
    private readonly locator: () => SheetHandle,
  ) {
    super(context);
  }

  protected locate(): SheetHandle {
    return this.locator();
  }

  private sheetName(location: string): string {
    return this.context.liveSheet(this.target(location), location);
  }

  protected readScalar(name: string): unknown {
    throw invalidArgument(`ChartCollection.${name}`);
  }

  override applyLoad(spec: LoadSpec): void {
    const { items } = splitCollectionLoad(spec, this.scalarNames);
    if (items === undefined) return;
    const sheet = this.target('ChartCollection.items');
    const charts = this.context.model.charts(this.sheetName('ChartCollection.items'));
    this.loadedItems = charts.map((chart) => new ShimChart(this.context, () => ({ sheet, id: chart.id }), undefined));
    for (const item of this.loadedItems) item.applyLoad(items);
  }

  get items(): ShimChart[] {
    return this.loadedItems ?? this.loadedValue('items');
  }

  /** The first chart of that name, matched without regard to case as Excel matches names. */
  private find(name: unknown, location: string): ChartTarget | null {
    const sheet = this.target(location);
    const wanted = String(name).toLocaleUpperCase();
    const chart = this.context.model.charts(this.sheetName(location)).find((c) => c.name.toLocaleUpperCase() === wanted);
    return chart === undefined ? null : { sheet, id: chart.id };
  }

  getItem(name: string): ShimChart {
    const location = 'ChartCollection.getItem';
    return new ShimChart(this.context, () => this.find(name, location) ?? throwError(itemNotFound(location)), location);
  }

  getItemOrNullObject(name: string): ShimChart {
    const location = 'ChartCollection.getItemOrNullObject';
    return new ShimChart(this.context, () => this.find(name, location), location);
  }

  /**
   * Made when the batch reaches it, reading its series from the source as Excel lays them out.
   * Excel places a new chart in the middle of the window; the preview has no window to centre
   * in, so it puts the chart beside its data, one column clear of it.
   */
  add(type: string, sourceData: unknown, seriesBy?: string): ShimChart {
    const location = 'ChartCollection.add';
    return new ShimChart(
      this.context,
      () => {
        const sheet = this.target(location);
        const sheetName = this.sheetName(location);
        if (type !== 'XYScatter' || !(sourceData instanceof ShimRange)) throw invalidArgument(location);
        if (seriesBy !== 'Columns') throw onlyColumns(location, seriesBy);
        const source = rangeRefOf(this.context, sourceData.target(location), location);
        const chart = this.context.model.addChart(sheetName, {
          type: 'XYScatter',
          title: null,
          series: seriesFromColumns(source),
          axisTitles: { category: '', value: '' },
          axisScales: { category: AUTOMATIC_SCALE, value: AUTOMATIC_SCALE },
          bounds: this.besideData(sheetName, source),
        });
        return { sheet, id: chart.id };
      },
      location,
    );
  }

  private besideData(sheet: string, source: RangeRef): ChartBounds {
    const left = columnLeft((column) => this.context.model.columnWidth(sheet, column), source.right + 2);
    return { left, top: source.top * ROW_HEIGHT, width: NEW_CHART_WIDTH, height: NEW_CHART_HEIGHT };
  }
}

/**
 * Auto lays series out differently on desktop and on the web (Excel.ChartSeriesBy), and the
 * add-in only ever asks for columns, so the preview models that alone.
 */
function onlyColumns(location: string, seriesBy: string | undefined): OfficeExtensionError {
  const error = invalidArgument(location);
  const why = seriesBy === undefined || seriesBy === 'Auto' ? '; "auto" differs between Excel on the web and on desktop' : '';
  error.debugInfo.message = `${error.message} (preview: pass Excel.ChartSeriesBy.columns${why})`;
  return error;
}

function throwError(error: Error): never {
  throw error;
}
