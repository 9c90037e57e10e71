import type { RangeRef } from '../workbook/types';
import type { RangeTarget } from './range';
import type { ShimRequestContext } from './requestContext';

/** A range proxy's rectangle on its sheet as named now; ItemNotFound once the sheet is gone. */
export function rangeRefOf(context: ShimRequestContext, target: RangeTarget, location: string): RangeRef {
  return { sheet: context.liveSheet(target.sheet, location), top: target.top, left: target.left, bottom: target.bottom, right: target.right };
}
