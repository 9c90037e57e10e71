/** The Excel global: `Excel.run`, the request context class and the enums add-in code reads. */
import type { WorkbookModel } from '../workbook/types';
import type { ShimSettings } from './hostSettings';
import { ChartSeriesBy, ChartType } from './chartEnums';
import { ShimClientObject } from './clientObject';
import { OfficeExtensionError } from './officeErrors';
import { ShimRange } from './range';
import { ShimRequestContext } from './requestContext';
import { ShimWorksheet } from './worksheet';

// Message from memory, not checked against a live host.
function runMustReturnPromise(): OfficeExtensionError {
  return new OfficeExtensionError(
    'RunMustReturnPromise',
    'The batch function passed to the ".run" method didn\'t return a promise. The function must return a promise, so that any automatically-tracked objects can be released at the completion of the batch operation.',
    'Excel.run',
  );
}

function isThenable(value: unknown): value is PromiseLike<unknown> {
  return typeof value === 'object' && value !== null && typeof (value as { then?: unknown }).then === 'function';
}

type Batch = (context: ShimRequestContext) => unknown;

function contextOf(previous: unknown): ShimRequestContext | undefined {
  if (previous instanceof ShimRequestContext) return previous;
  if (previous instanceof ShimClientObject) return previous.context;
  if (Array.isArray(previous) && previous[0] instanceof ShimClientObject) return previous[0].context;
  return undefined;
}

export function createExcel(model: WorkbookModel, settings: ShimSettings) {
  class RequestContext extends ShimRequestContext {
    constructor() {
      super(model, settings);
    }
  }

  /**
   * Excel.run(batch); Excel.run(contextOrObjectOrObjects, batch) to continue with an existing
   * context; Excel.run(options, batch) with Excel.RunOptions (delayForCellEdit, previousObjects).
   * Writes still queued when the batch settles are synced, as in Excel.
   */
  async function run(...args: unknown[]): Promise<unknown> {
    const batch = args[args.length - 1];
    if (typeof batch !== 'function') throw new TypeError('Excel.run needs a batch function.');
    const first = args.length > 1 ? args[0] : undefined;
    const previous = contextOf(first);
    const options =
      previous === undefined && typeof first === 'object' && first !== null ? (first as { delayForCellEdit?: unknown; previousObjects?: unknown }) : undefined;
    const context = previous ?? contextOf(options?.previousObjects) ?? new RequestContext();
    if (options !== undefined) context.delayForCellEdit = options.delayForCellEdit === true;
    const returned = (batch as Batch)(context);
    if (!isThenable(returned)) throw runMustReturnPromise();
    const result = await returned;
    await context.sync();
    return result;
  }

  return {
    run,
    RequestContext,
    ChartType,
    ChartSeriesBy,
    // Exposed as in Office.js, where tests reach the classes' prototypes to inject failures.
    Range: ShimRange,
    Worksheet: ShimWorksheet,
  };
}
