/** Excel.Workbook: the sheets and the selection. */
import { ShimClientObject, type Loadable } from './clientObject';
import { invalidArgument, itemNotFound } from './officeErrors';
import { rangeTarget, ShimRange, type RangeTarget } from './range';
import type { ShimRequestContext } from './requestContext';
import { ShimWorksheetCollection } from './worksheets';

export class ShimWorkbook extends ShimClientObject<true> {
  protected readonly typeName = 'Workbook';
  protected readonly scalarNames: readonly string[] = [];
  readonly worksheets: ShimWorksheetCollection;

  constructor(context: ShimRequestContext) {
    super(context);
    this.worksheets = new ShimWorksheetCollection(context);
    this.resolveOrNull();
  }

  protected locate(): true {
    return true;
  }

  protected readScalar(name: string): unknown {
    throw invalidArgument(`Workbook.${name}`);
  }

  protected override navigation(name: string): Loadable | undefined {
    return name === 'worksheets' ? this.worksheets : undefined;
  }

  private selectionTarget(location: string): RangeTarget {
    const selection = this.context.model.selection();
    const sheet = this.context.findSheet(selection.sheet);
    if (!sheet) throw itemNotFound(location);
    return rangeTarget(sheet, selection.top, selection.left, selection.bottom, selection.right, location);
  }

  /** The selection as it is when the batch reaches this call. */
  getSelectedRange(): ShimRange {
    const location = 'Workbook.getSelectedRange';
    return new ShimRange(this.context, () => this.selectionTarget(location), location);
  }

  /** The model keeps no separate active cell: it is the selection's top-left cell. */
  getActiveCell(): ShimRange {
    const location = 'Workbook.getActiveCell';
    return new ShimRange(
      this.context,
      () => {
        const selection = this.selectionTarget(location);
        return rangeTarget(selection.sheet, selection.top, selection.left, selection.top, selection.left, location);
      },
      location,
    );
  }
}
