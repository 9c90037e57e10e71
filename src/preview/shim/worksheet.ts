/** Excel.Worksheet over the model: its name, ranges and charts on it, its changed event, activation, deletion. */
import { parseRange, splitSheet } from '../../addressing/a1';
import { ShimChartCollection } from './charts';
import { ShimClientObject } from './clientObject';
import { invalidArgument, invalidOperation, notInPreview } from './officeErrors';
import { rangeTarget, ShimRange, type RangeTarget } from './range';
import type { SheetHandle, ShimRequestContext } from './requestContext';
import { refuseMembers } from './unsupported';
import { ShimWorksheetChangedEvent } from './worksheetChangedEvent';

const WORKSHEET_SCALARS = ['name'] as const;

export class ShimWorksheet extends ShimClientObject<SheetHandle> {
  protected readonly typeName = 'Worksheet';
  protected readonly scalarNames: readonly string[] = WORKSHEET_SCALARS;
  private chartsProxy: ShimChartCollection | undefined;
  private changedEvent: ShimWorksheetChangedEvent | undefined;

  /** `location` undefined: the handle is already known (collection items), nothing to queue. */
  constructor(
    context: ShimRequestContext,
    private readonly locator: () => SheetHandle | null,
    location: string | undefined,
  ) {
    super(context);
    if (location === undefined) this.resolveOrNull();
    else this.queueResolve(location);
  }

  protected locate(): SheetHandle | null {
    return this.locator();
  }

  /** Like the real navigation property it needs no load itself. */
  get charts(): ShimChartCollection {
    this.chartsProxy ??= new ShimChartCollection(this.context, () => this.target('Worksheet.charts'));
    return this.chartsProxy;
  }

  /** Registering a handler needs no load; see worksheetChangedEvent.ts for what is raised. */
  get onChanged(): ShimWorksheetChangedEvent {
    this.changedEvent ??= new ShimWorksheetChangedEvent(this.context, (location) => {
      const handle = this.target(location);
      this.context.liveSheet(handle, location);
      return handle;
    });
    return this.changedEvent;
  }

  protected readScalar(name: string, handle: SheetHandle): unknown {
    const location = `Worksheet.${name}`;
    const sheet = this.context.liveSheet(handle, location);
    if (name !== 'name') throw invalidArgument(location);
    return sheet;
  }

  get name(): string {
    return this.loadedValue('name');
  }
  /** The add-in never renames a sheet, so the preview refuses to rather than model it. */
  set name(_name: string) {
    throw notInPreview('Worksheet.name (setting it)');
  }

  private rangeOn(location: string, shape: (sheet: SheetHandle) => RangeTarget | null): ShimRange {
    return new ShimRange(this.context, () => shape(this.target(location)), location);
  }

  /** A1 text, optionally sheet-qualified; a named sheet must exist. */
  getRange(address?: string): ShimRange {
    const location = 'Worksheet.getRange';
    return this.rangeOn(location, (sheet) => {
      if (typeof address !== 'string') throw invalidArgument(location);
      const named = splitSheet(address.trim()).sheet;
      const parsed = parseRange(address, this.context.liveSheet(sheet, location));
      if (!parsed) throw invalidArgument(location);
      const onSheet = named === undefined ? sheet : this.context.findSheet(named);
      if (!onSheet) throw invalidArgument(location);
      return rangeTarget(onSheet, parsed.top, parsed.left, parsed.bottom, parsed.right, location);
    });
  }

  /**
   * "Excel.Worksheet": the smallest range around every cell with a value or formatting, or with
   * `valuesOnly` around the cells with values; an empty sheet gives its top-left cell.
   */
  getUsedRange(valuesOnly?: boolean): ShimRange {
    const location = 'Worksheet.getUsedRange';
    return this.rangeOn(location, (sheet) => this.usedTarget(sheet, valuesOnly === true, location) ?? rangeTarget(sheet, 0, 0, 0, 0, location));
  }

  /** A null object when the sheet is empty (in values, with `valuesOnly`). */
  getUsedRangeOrNullObject(valuesOnly?: boolean): ShimRange {
    const location = 'Worksheet.getUsedRangeOrNullObject';
    return this.rangeOn(location, (sheet) => this.usedTarget(sheet, valuesOnly === true, location));
  }

  private usedTarget(sheet: SheetHandle, valuesOnly: boolean, location: string): RangeTarget | null {
    const area = this.context.model.usedArea(this.context.liveSheet(sheet, location), valuesOnly);
    return area === undefined ? null : rangeTarget(sheet, area.top, area.left, area.bottom, area.right, location);
  }

  activate(): void {
    const location = 'Worksheet.activate';
    this.context.enqueue(location, () => this.context.model.activateSheet(this.context.liveSheet(this.target(location), location)));
  }

  delete(): void {
    const location = 'Worksheet.delete';
    this.context.enqueue(location, () => {
      const handle = this.target(location);
      const sheet = this.context.liveSheet(handle, location);
      if (this.context.model.sheetNames().length <= 1) throw invalidOperation(location);
      this.context.model.deleteSheet(sheet);
      handle.deleted = true;
    });
  }
}
// Moving and hiding sheets are left out: touching either fails rather than being ignored.
refuseMembers(ShimWorksheet.prototype, 'Worksheet', ['position', 'visibility']);
