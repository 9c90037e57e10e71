/**
 * A failure injected into the residual table's writes, for the tests of what a failed write
 * leaves: the preview Range's values setter throws at the chosen write of table entries.
 */
import { RESIDUAL_TABLE_HEADER } from '../../../src/taskpane/model/streamedResiduals';

const isTableWrite = (values: unknown): boolean =>
  Array.isArray(values) && Array.isArray(values[0]) && values[0].length === RESIDUAL_TABLE_HEADER.length && typeof values[0][0] === 'number';

/**
 * Makes the `failAt`-th write of table entries throw, and counts the entry writes and data reads
 * tried after it. The preview's classes outlive one test's workbook: call `restore` afterwards.
 */
export function injectTableWriteFailure(failAt: number) {
  const proto = Excel.Range.prototype;
  const descriptor = Object.getOwnPropertyDescriptor(proto, 'values');
  if (descriptor?.set === undefined) throw new Error('the preview Range has no values setter');
  const setter = descriptor.set;
  const load = proto.load;
  const counts = {
    writes: 0,
    writesAfterFailure: 0,
    loadsAfterFailure: 0,
    failed: false,
    restore: () => {
      Object.defineProperty(proto, 'values', descriptor);
      proto.load = load;
    },
  };
  Object.defineProperty(proto, 'values', {
    ...descriptor,
    set(this: Excel.Range, values: unknown[][]) {
      if (isTableWrite(values)) {
        counts.writes++;
        if (counts.failed) counts.writesAfterFailure++;
        if (counts.writes === failAt) {
          counts.failed = true;
          throw new Error('injected failure of a table write');
        }
      }
      setter.call(this, values);
    },
  });
  proto.load = function (this: Excel.Range, ...args: unknown[]) {
    if (counts.failed) counts.loadsAfterFailure++;
    return (load as (...a: unknown[]) => Excel.Range).apply(this, args);
  } as typeof proto.load;
  return counts;
}
