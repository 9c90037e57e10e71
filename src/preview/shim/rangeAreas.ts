/**
 * Excel.RangeAreas (ExcelApi 1.9), as Workbook.getSelectedRanges returns it, with the one member
 * the add-in reads. `address` follows "Work with multiple ranges simultaneously in Excel add-ins":
 * the areas' addresses, each with its sheet, joined by ", " as that page's example shows
 * ("Sheet1!F3:F5, Sheet1!H:H").
 */
import { formatRange } from '../../addressing/a1';
import { ShimClientObject } from './clientObject';
import { invalidArgument } from './officeErrors';
import type { RangeTarget } from './range';
import { rangeRefOf } from './rangeRef';
import type { ShimRequestContext } from './requestContext';
import { refuseMembers } from './unsupported';

export class ShimRangeAreas extends ShimClientObject<RangeTarget[]> {
  protected readonly typeName = 'RangeAreas';
  protected readonly scalarNames: readonly string[] = ['address'];

  constructor(
    context: ShimRequestContext,
    private readonly locator: () => RangeTarget[],
    location: string,
  ) {
    super(context);
    this.queueResolve(location);
  }

  protected locate(): RangeTarget[] {
    return this.locator();
  }

  protected readScalar(name: string, targets: RangeTarget[]): unknown {
    const location = `RangeAreas.${name}`;
    if (name !== 'address') throw invalidArgument(location);
    return targets.map((target) => formatRange(rangeRefOf(this.context, target, location))).join(', ');
  }

  get address(): string {
    return this.loadedValue('address');
  }
}
// Read-only members the add-in does not use: reading one fails rather than giving undefined.
refuseMembers(ShimRangeAreas.prototype, 'RangeAreas', ['addressLocal', 'areaCount', 'areas', 'cellCount', 'isEntireColumn', 'worksheet']);
