/**
 * Excel.RangeFormat (column widths), RangeFont (bold) and RangeFill (colour) over the model's
 * cell styles and column widths. Reading a property over cells that differ gives null, as the
 * API documents.
 */
import type { CellStyle, RangeRef } from '../workbook/types';
import { ShimClientObject, type Loadable } from './clientObject';
import { normalizeColor } from './colors';
import { invalidArgument } from './officeErrors';
import type { RangeTarget } from './range';
import { rangeRefOf } from './rangeRef';
import type { ShimRequestContext } from './requestContext';
import { refuseMembers } from './unsupported';

type Locate = () => RangeTarget;

function uniform<T>(values: readonly T[]): T | null {
  return values.every((v) => v === values[0]) ? values[0] : null;
}

function styles(context: ShimRequestContext, ref: RangeRef): CellStyle[] {
  const found: CellStyle[] = [];
  for (let row = ref.top; row <= ref.bottom; row++) {
    for (let column = ref.left; column <= ref.right; column++) found.push(context.model.styleAt({ sheet: ref.sheet, row, column }));
  }
  return found;
}

/** The part every format proxy shares: a target borrowed from its range, and style reads and writes. */
abstract class RangePart extends ShimClientObject<RangeTarget> {
  constructor(
    context: ShimRequestContext,
    private readonly locator: Locate,
  ) {
    super(context);
  }

  protected locate(): RangeTarget {
    return this.locator();
  }

  protected styleValues(target: RangeTarget, location: string): CellStyle[] {
    return styles(this.context, rangeRefOf(this.context, target, location));
  }

  protected writeStyle(name: string, value: unknown, change: (location: string) => Partial<CellStyle>): void {
    this.queueWrite(name, value, (target, location) => this.context.model.setStyle(rangeRefOf(this.context, target, location), change(location)));
  }
}

export class ShimRangeFont extends RangePart {
  protected readonly typeName = 'RangeFont';
  protected readonly scalarNames: readonly string[] = ['bold'];

  protected readScalar(name: string, target: RangeTarget): unknown {
    const location = `RangeFont.${name}`;
    if (name !== 'bold') throw invalidArgument(location);
    return uniform(this.styleValues(target, location).map((s) => s.bold));
  }

  get bold(): boolean {
    return this.loadedValue('bold');
  }
  set bold(bold: boolean) {
    this.writeStyle('bold', bold, (location) => {
      if (typeof bold !== 'boolean') throw invalidArgument(location);
      return { bold };
    });
  }
}
refuseMembers(ShimRangeFont.prototype, 'RangeFont', ['color', 'italic', 'name', 'size', 'strikethrough', 'underline']);

/** A cell without fill reads as white, as in Excel. */
const NO_FILL = '#FFFFFF';

export class ShimRangeFill extends RangePart {
  protected readonly typeName = 'RangeFill';
  protected readonly scalarNames: readonly string[] = ['color'];

  protected readScalar(name: string, target: RangeTarget): unknown {
    const location = `RangeFill.${name}`;
    if (name !== 'color') throw invalidArgument(location);
    return uniform(this.styleValues(target, location).map((s) => s.fill ?? NO_FILL));
  }

  get color(): string {
    return this.loadedValue('color');
  }
  set color(color: string) {
    this.writeStyle('color', color, (location) => {
      const fill = normalizeColor(color);
      if (fill === undefined) throw invalidArgument(location);
      return { fill };
    });
  }
}
refuseMembers(ShimRangeFill.prototype, 'RangeFill', ['pattern', 'patternColor', 'patternTintAndShade', 'tintAndShade', 'clear']);

export class ShimRangeFormat extends RangePart {
  protected readonly typeName = 'RangeFormat';
  protected readonly scalarNames: readonly string[] = ['columnWidth'];
  readonly font: ShimRangeFont;
  readonly fill: ShimRangeFill;

  constructor(context: ShimRequestContext, locator: Locate) {
    super(context, locator);
    this.font = new ShimRangeFont(context, locator);
    this.fill = new ShimRangeFill(context, locator);
  }

  protected override navigation(name: string): Loadable | undefined {
    if (name === 'font') return this.font;
    if (name === 'fill') return this.fill;
    return undefined;
  }

  protected readScalar(name: string, target: RangeTarget): unknown {
    const location = `RangeFormat.${name}`;
    if (name !== 'columnWidth') throw invalidArgument(location);
    const ref = rangeRefOf(this.context, target, location);
    const widths: number[] = [];
    for (let c = ref.left; c <= ref.right; c++) widths.push(this.context.model.columnWidth(ref.sheet, c));
    return uniform(widths);
  }

  get columnWidth(): number {
    return this.loadedValue('columnWidth');
  }
  set columnWidth(points: number) {
    this.queueWrite('columnWidth', points, (target, location) => {
      if (typeof points !== 'number' || !Number.isFinite(points) || points < 0) throw invalidArgument(location);
      const ref = rangeRefOf(this.context, target, location);
      this.context.model.setColumnWidth(ref.sheet, ref.left, ref.right, points);
    });
  }
}
refuseMembers(ShimRangeFormat.prototype, 'RangeFormat', [
  'borders',
  'horizontalAlignment',
  'verticalAlignment',
  'indentLevel',
  'protection',
  'textOrientation',
  'wrapText',
  'rowHeight',
  'autofitColumns',
  'autofitRows',
]);
