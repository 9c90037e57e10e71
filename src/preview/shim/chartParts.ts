/** Excel.ChartTitle, ChartAxes, ChartAxis and ChartAxisTitle: the texts around a chart. */
import { chartTitle } from '../workbook/chartData';
import { ShimClientObject, type Loadable } from './clientObject';
import { changeChart, liveChart, type ChartTarget } from './chartTarget';
import { invalidArgument } from './officeErrors';
import type { ShimRequestContext } from './requestContext';
import { refuseMembers } from './unsupported';

type Locate = () => ChartTarget;

/** Parts have no identity of their own: they borrow their chart's, found when first used. */
abstract class ChartPart extends ShimClientObject<ChartTarget> {
  constructor(
    context: ShimRequestContext,
    protected readonly locator: Locate,
  ) {
    super(context);
  }

  protected locate(): ChartTarget {
    return this.locator();
  }
}

export class ShimChartTitle extends ChartPart {
  protected readonly typeName = 'ChartTitle';
  protected readonly scalarNames: readonly string[] = ['text'];

  protected readScalar(name: string, target: ChartTarget): unknown {
    const location = `ChartTitle.${name}`;
    if (name !== 'text') throw invalidArgument(location);
    return chartTitle(this.context.model, liveChart(this.context, target, location).chart);
  }

  get text(): string {
    return this.loadedValue('text');
  }
  set text(text: string) {
    this.queueWrite('text', text, (target, location) => {
      if (typeof text !== 'string') throw invalidArgument(location);
      changeChart(this.context, target, location, () => ({ title: text }));
    });
  }
}
refuseMembers(ShimChartTitle.prototype, 'ChartTitle', ['format', 'visible', 'overlay', 'position', 'horizontalAlignment']);

export type AxisKind = 'category' | 'value';

export class ShimChartAxisTitle extends ChartPart {
  protected readonly typeName = 'ChartAxisTitle';
  protected readonly scalarNames: readonly string[] = ['text'];

  constructor(
    context: ShimRequestContext,
    locator: Locate,
    private readonly axis: AxisKind,
  ) {
    super(context, locator);
  }

  /** '' while the axis has no title; Excel shows the title once text is set. */
  protected readScalar(name: string, target: ChartTarget): unknown {
    const location = `ChartAxisTitle.${name}`;
    if (name !== 'text') throw invalidArgument(location);
    return liveChart(this.context, target, location).chart.axisTitles[this.axis];
  }

  get text(): string {
    return this.loadedValue('text');
  }
  set text(text: string) {
    this.queueWrite('text', text, (target, location) => {
      if (typeof text !== 'string') throw invalidArgument(location);
      changeChart(this.context, target, location, (chart) => ({ axisTitles: { ...chart.axisTitles, [this.axis]: text } }));
    });
  }
}
refuseMembers(ShimChartAxisTitle.prototype, 'ChartAxisTitle', ['format', 'visible', 'textOrientation']);

type Bound = 'minimum' | 'maximum';

export class ShimChartAxis extends ChartPart {
  protected readonly typeName = 'ChartAxis';
  protected readonly scalarNames: readonly string[] = ['minimum', 'maximum'];
  readonly title: ShimChartAxisTitle;

  constructor(
    context: ShimRequestContext,
    locator: Locate,
    private readonly axis: AxisKind,
  ) {
    super(context, locator);
    this.title = new ShimChartAxisTitle(context, locator, axis);
  }

  /**
   * A fixed bound reads back as set. Excel returns its automatic value as a number too ("The
   * returned value is always a number"), computed by rules the API docs do not give, so the
   * preview refuses that read rather than invent a number.
   */
  protected readScalar(name: string, target: ChartTarget): unknown {
    const location = `ChartAxis.${name}`;
    if (name !== 'minimum' && name !== 'maximum') throw invalidArgument(location);
    const bound = liveChart(this.context, target, location).chart.axisScales[this.axis][name];
    if (bound !== null) return bound;
    const error = invalidArgument(location);
    error.debugInfo.message = `${error.message} (preview: an automatic axis value is Excel's own and not modelled)`;
    throw error;
  }

  get minimum(): number {
    return this.loadedValue('minimum');
  }
  set minimum(value: number | '') {
    this.writeBound('minimum', value);
  }
  get maximum(): number {
    return this.loadedValue('maximum');
  }
  set maximum(value: number | '') {
    this.writeBound('maximum', value);
  }

  /**
   * "Excel.ChartAxis" minimum and maximum (ExcelApi 1.1): "a numeric value or an empty string
   * (for automatic axis values)". The docs do not say what Excel does with a minimum at or above
   * the maximum; the preview refuses it.
   */
  private writeBound(name: Bound, value: unknown): void {
    this.queueWrite(name, value, (target, location) => {
      if (value !== '' && (typeof value !== 'number' || !Number.isFinite(value))) throw invalidArgument(location);
      const bound = value === '' ? null : value;
      changeChart(this.context, target, location, (chart) => {
        const scale = { ...chart.axisScales[this.axis], [name]: bound };
        if (scale.minimum !== null && scale.maximum !== null && scale.minimum >= scale.maximum) throw invalidArgument(location);
        return { axisScales: { ...chart.axisScales, [this.axis]: scale } };
      });
    });
  }

  protected override navigation(name: string): Loadable | undefined {
    return name === 'title' ? this.title : undefined;
  }
}
refuseMembers(ShimChartAxis.prototype, 'ChartAxis', ['majorUnit', 'minorUnit', 'format', 'majorGridlines', 'numberFormat', 'visible']);

/** For a scatter chart the category axis is the horizontal (X) axis and the value axis the vertical one. */
export class ShimChartAxes extends ChartPart {
  protected readonly typeName = 'ChartAxes';
  protected readonly scalarNames: readonly string[] = [];
  readonly categoryAxis: ShimChartAxis;
  readonly valueAxis: ShimChartAxis;

  constructor(context: ShimRequestContext, locator: Locate) {
    super(context, locator);
    this.categoryAxis = new ShimChartAxis(context, locator, 'category');
    this.valueAxis = new ShimChartAxis(context, locator, 'value');
  }

  protected readScalar(name: string): unknown {
    throw invalidArgument(`ChartAxes.${name}`);
  }

  protected override navigation(name: string): Loadable | undefined {
    if (name === 'categoryAxis') return this.categoryAxis;
    if (name === 'valueAxis') return this.valueAxis;
    return undefined;
  }
}
refuseMembers(ShimChartAxes.prototype, 'ChartAxes', ['seriesAxis']);
