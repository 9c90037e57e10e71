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

export class ShimChartAxis extends ChartPart {
  protected readonly typeName = 'ChartAxis';
  protected readonly scalarNames: readonly string[] = [];
  readonly title: ShimChartAxisTitle;

  constructor(context: ShimRequestContext, locator: Locate, axis: AxisKind) {
    super(context, locator);
    this.title = new ShimChartAxisTitle(context, locator, axis);
  }

  protected readScalar(name: string): unknown {
    throw invalidArgument(`ChartAxis.${name}`);
  }

  protected override navigation(name: string): Loadable | undefined {
    return name === 'title' ? this.title : undefined;
  }
}
refuseMembers(ShimChartAxis.prototype, 'ChartAxis', ['minimum', 'maximum', 'majorUnit', 'minorUnit', 'format', 'majorGridlines', 'numberFormat', 'visible']);

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
