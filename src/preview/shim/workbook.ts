/** Excel.Workbook: the sheets and the selection. */
import { ShimClientObject } from './clientObject';
import { invalidArgument, invalidSelection, itemNotFound } from './officeErrors';
import { rangeTarget, ShimRange, type RangeTarget } from './range';
import { ShimRangeAreas } from './rangeAreas';
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

  private areaTargets(location: string): RangeTarget[] {
    return this.context.model.selectedAreas().map((area) => {
      const sheet = this.context.findSheet(area.sheet);
      if (!sheet) throw itemNotFound(location);
      return rangeTarget(sheet, area.top, area.left, area.bottom, area.right, location);
    });
  }

  /**
   * The selection as it is when the batch reaches this call. "Work with workbooks using the
   * Excel JavaScript API": if multiple ranges are selected, it throws InvalidSelection.
   */
  getSelectedRange(): ShimRange {
    const location = 'Workbook.getSelectedRange';
    return new ShimRange(
      this.context,
      () => {
        const areas = this.areaTargets(location);
        if (areas.length > 1) throw invalidSelection(location);
        return areas[0];
      },
      location,
    );
  }

  /** ExcelApi 1.9: every selected area, as one RangeAreas. */
  getSelectedRanges(): ShimRangeAreas {
    const location = 'Workbook.getSelectedRanges';
    return new ShimRangeAreas(this.context, () => this.areaTargets(location), location);
  }
}
