/**
 * Excel.Range over the model. A range is fixed to its sheet and rectangle when the batch
 * reaches it, then reads and writes cells there. Rows and columns are 0-based, as in the API.
 */
import type { CellInput, RangeRef } from '../workbook/types';
import { formatRange, MAX_COLUMNS, MAX_ROWS } from '../../addressing/a1';
import { apiFormula, apiValue, inputFromWrite, KEEP } from './cellValues';
import { ShimClientObject, type Loadable } from './clientObject';
import { invalidArgument } from './officeErrors';
import { ShimRangeFormat } from './rangeFormat';
import type { SheetHandle, ShimRequestContext } from './requestContext';
import { refuseMembers } from './unsupported';

export interface RangeTarget {
  sheet: SheetHandle;
  top: number;
  left: number;
  bottom: number;
  right: number;
}

const RANGE_SCALARS = ['address', 'columnCount', 'columnIndex', 'formulas', 'numberFormat', 'rowCount', 'rowIndex', 'values'] as const;

/** True when the rectangle lies inside Excel's grid and is not inverted. */
export function insideGrid(top: number, left: number, bottom: number, right: number): boolean {
  return (
    [top, left, bottom, right].every(Number.isInteger) && top >= 0 && left >= 0 && top <= bottom && left <= right && bottom < MAX_ROWS && right < MAX_COLUMNS
  );
}

/** The rectangle checked against the grid; outside it the real API reports InvalidArgument. */
export function rangeTarget(sheet: SheetHandle, top: number, left: number, bottom: number, right: number, location: string): RangeTarget {
  if (!insideGrid(top, left, bottom, right)) throw invalidArgument(location);
  return { sheet, top, left, bottom, right };
}

function grid<T>(target: RangeTarget, cell: (row: number, column: number) => T): T[][] {
  const rows: T[][] = [];
  for (let row = target.top; row <= target.bottom; row++) {
    const line: T[] = [];
    for (let column = target.left; column <= target.right; column++) line.push(cell(row, column));
    rows.push(line);
  }
  return rows;
}

/** A written 2-D array must have exactly the range's shape. */
function checkShape(value: unknown, target: RangeTarget, location: string): unknown[][] {
  const rows = target.bottom - target.top + 1;
  const columns = target.right - target.left + 1;
  if (!Array.isArray(value) || value.length !== rows) throw invalidArgument(location);
  const checked: unknown[][] = [];
  for (const row of value) {
    if (!Array.isArray(row) || row.length !== columns) throw invalidArgument(location);
    checked.push(row);
  }
  return checked;
}

export class ShimRange extends ShimClientObject<RangeTarget> {
  protected readonly typeName = 'Range';
  protected readonly scalarNames: readonly string[] = RANGE_SCALARS;
  private formatProxy: ShimRangeFormat | undefined;

  /** `location` undefined: the target is already known (collection items), nothing to queue. */
  constructor(
    context: ShimRequestContext,
    private readonly locator: () => RangeTarget | null,
    location: string | undefined,
  ) {
    super(context);
    if (location === undefined) this.resolveOrNull();
    else this.queueResolve(location);
  }

  protected locate(): RangeTarget | null {
    return this.locator();
  }

  protected override navigation(name: string): Loadable | undefined {
    return name === 'format' ? this.format : undefined;
  }

  private ref(target: RangeTarget, location: string): RangeRef {
    return { sheet: this.context.liveSheet(target.sheet, location), top: target.top, left: target.left, bottom: target.bottom, right: target.right };
  }

  protected readScalar(name: string, target: RangeTarget): unknown {
    const location = `Range.${name}`;
    const ref = this.ref(target, location);
    const model = this.context.model;
    const at = (row: number, column: number) => ({ sheet: ref.sheet, row, column });
    switch (name) {
      case 'address':
        return formatRange(ref);
      case 'columnCount':
        return ref.right - ref.left + 1;
      case 'columnIndex':
        return ref.left;
      case 'rowCount':
        return ref.bottom - ref.top + 1;
      case 'rowIndex':
        return ref.top;
      case 'values':
        return model.valuesIn(ref).map((row) => row.map(apiValue));
      case 'formulas':
        return grid(target, (row, column) => apiFormula(model.inputAt(at(row, column))));
      case 'numberFormat':
        return grid(target, (row, column) => model.numberFormatAt(at(row, column)));
      default:
        throw invalidArgument(location);
    }
  }

  get address(): string {
    return this.loadedValue('address');
  }
  get columnCount(): number {
    return this.loadedValue('columnCount');
  }
  get columnIndex(): number {
    return this.loadedValue('columnIndex');
  }
  get rowCount(): number {
    return this.loadedValue('rowCount');
  }
  get rowIndex(): number {
    return this.loadedValue('rowIndex');
  }

  get values(): unknown[][] {
    return this.loadedValue('values');
  }
  set values(values: unknown[][]) {
    this.queueWrite('values', values, (target, location) => this.writeInputs(target, values, location));
  }

  get formulas(): unknown[][] {
    return this.loadedValue('formulas');
  }
  set formulas(formulas: unknown[][]) {
    this.queueWrite('formulas', formulas, (target, location) => this.writeInputs(target, formulas, location));
  }

  get numberFormat(): unknown[][] {
    return this.loadedValue('numberFormat');
  }
  set numberFormat(formats: unknown[][]) {
    this.queueWrite('numberFormat', formats, (target, location) => {
      const rows = checkShape(formats, target, location);
      const ref = this.ref(target, location);
      const model = this.context.model;
      const cells = rows.map((row, i) =>
        row.map((format, j) => {
          if (format === null || format === undefined) return model.numberFormatAt({ sheet: ref.sheet, row: ref.top + i, column: ref.left + j });
          if (typeof format === 'string') return format;
          if (typeof format === 'number') return String(format);
          throw invalidArgument(location);
        }),
      );
      model.setNumberFormats(ref.sheet, ref.top, ref.left, cells);
    });
  }

  private writeInputs(target: RangeTarget, written: unknown, location: string): void {
    const rows = checkShape(written, target, location);
    const ref = this.ref(target, location);
    const model = this.context.model;
    const inputs: CellInput[][] = rows.map((row, i) =>
      row.map((value, j) => {
        const position = { sheet: ref.sheet, row: ref.top + i, column: ref.left + j };
        const input = inputFromWrite(value, model.numberFormatAt(position).trim() === '@');
        if (input === undefined) throw invalidArgument(location);
        return input === KEEP ? model.inputAt(position) : input;
      }),
    );
    model.setInputs(ref.sheet, ref.top, ref.left, inputs);
  }

  /** Bold, fill colour and column widths; like the real navigation property it needs no load itself. */
  get format(): ShimRangeFormat {
    this.formatProxy ??= new ShimRangeFormat(this.context, () => this.target('Range.format'));
    return this.formatProxy;
  }

  private derived(location: string, shape: (target: RangeTarget) => [number, number, number, number]): ShimRange {
    return new ShimRange(
      this.context,
      () => {
        const target = this.target(location);
        const [top, left, bottom, right] = shape(target);
        return rangeTarget(target.sheet, top, left, bottom, right, location);
      },
      location,
    );
  }

  /** Relative to the range's top-left cell; may lie outside the range, as in Excel. */
  getCell(row: number, column: number): ShimRange {
    return this.derived('Range.getCell', (t) => [t.top + row, t.left + column, t.top + row, t.left + column]);
  }

  getResizedRange(deltaRows: number, deltaColumns: number): ShimRange {
    return this.derived('Range.getResizedRange', (t) => [t.top, t.left, t.bottom + deltaRows, t.right + deltaColumns]);
  }

  getOffsetRange(rowOffset: number, columnOffset: number): ShimRange {
    return this.derived('Range.getOffsetRange', (t) => [t.top + rowOffset, t.left + columnOffset, t.bottom + rowOffset, t.right + columnOffset]);
  }

  getRow(row: number): ShimRange {
    return this.derived('Range.getRow', (t) => [t.top + row, t.left, t.top + row, t.right]);
  }

  /** Selecting a range on another sheet brings that sheet to the front, as clicking would. */
  select(): void {
    const location = 'Range.select';
    this.context.enqueue(location, () => {
      const ref = this.ref(this.target(location), location);
      this.context.model.activateSheet(ref.sheet);
      this.context.model.select(ref);
    });
  }

  /** 'All' (default), 'Contents' or 'Formats'; formats are number formats, bold, fill and wrapping (widths stay, as in Excel). */
  clear(applyTo?: string): void {
    const location = 'Range.clear';
    const mode = applyTo ?? 'All';
    this.context.enqueue(location, () => {
      if (!['All', 'Contents', 'Formats'].includes(mode)) throw invalidArgument(location);
      const target = this.target(location);
      const ref = this.ref(target, location);
      if (mode !== 'Formats')
        this.context.model.setInputs(
          ref.sheet,
          ref.top,
          ref.left,
          grid(target, () => null),
        );
      if (mode !== 'Contents') {
        this.context.model.setNumberFormats(
          ref.sheet,
          ref.top,
          ref.left,
          grid(target, () => 'General'),
        );
        this.context.model.clearStyles(ref);
      }
    });
  }
}
// Read-only members the add-in does not use: reading one fails rather than giving undefined.
refuseMembers(ShimRange.prototype, 'Range', ['addressLocal', 'cellCount', 'text', 'valueTypes', 'worksheet']);
