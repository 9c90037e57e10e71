/**
 * Worksheet.onChanged, as "Work with events using the Excel JavaScript API" and the
 * "Excel.WorksheetChangedEventArgs interface" page describe it: add(handler) registers at the
 * next sync and returns an EventHandlerResult whose remove() also takes effect at a sync; the
 * handler runs after cells of that sheet are entered or cleared, by the user or through the API
 * (recalculation raises no changed event), with the changed area's address without the sheet.
 * The arguments carry only changeType ("RangeEdited") and address, what the add-in and its tests
 * read; type, source, worksheetId, details and getRange() are absent rather than imitated.
 */
import { formatRange } from '../../addressing/a1';
import { invalidArgument } from './officeErrors';
import type { SheetHandle, ShimRequestContext } from './requestContext';

export interface ShimWorksheetChangedArgs {
  changeType: 'RangeEdited';
  address: string;
}

type ChangedHandler = (args: ShimWorksheetChangedArgs) => Promise<unknown>;

export class ShimEventHandlerResult {
  private detach: (() => void) | undefined;

  constructor(readonly context: ShimRequestContext) {}

  attach(detach: () => void): void {
    this.detach = detach;
  }

  remove(): void {
    this.context.enqueue('EventHandlerResult.remove', () => {
      this.detach?.();
      this.detach = undefined;
    });
  }
}

export class ShimWorksheetChangedEvent {
  constructor(
    private readonly context: ShimRequestContext,
    private readonly sheet: (location: string) => SheetHandle,
  ) {}

  add(handler: ChangedHandler): ShimEventHandlerResult {
    const location = 'Worksheet.onChanged.add';
    if (typeof handler !== 'function') throw invalidArgument(location);
    const result = new ShimEventHandlerResult(this.context);
    this.context.enqueue(location, () => {
      const handle = this.sheet(location);
      const model = this.context.model;
      result.attach(
        model.onCellsEdited((edited) => {
          if (handle.deleted || edited.sheet !== handle.name) return;
          // Events reach the add-in after the change, never inside the edit that caused it.
          setTimeout(() => void handler({ changeType: 'RangeEdited', address: formatRange(edited, false) }), 0);
        }),
      );
    });
    return result;
  }
}
