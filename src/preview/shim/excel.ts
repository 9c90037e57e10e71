/** The Excel global: `Excel.run`, the request context class and the enums add-in code reads. */
import type { WorkbookModel } from '../workbook/types';
import { ShimChart } from './chart';
import { ChartSeriesBy, ChartType } from './chartEnums';
import { ShimChartCollection } from './charts';
import { ShimClientObject } from './clientObject';
import { ExcelErrorCodes, OfficeExtensionError } from './officeErrors';
import { ShimRange } from './range';
import { ShimRequestContext } from './requestContext';
import { ShimWorkbook } from './workbook';
import { ShimWorksheet } from './worksheet';
import { ShimWorksheetCollection } from './worksheets';

export const RangeValueType = {
  unknown: 'Unknown',
  empty: 'Empty',
  string: 'String',
  integer: 'Integer',
  double: 'Double',
  boolean: 'Boolean',
  error: 'Error',
  richValue: 'RichValue',
} as const;

export const ClearApplyTo = {
  all: 'All',
  formats: 'Formats',
  contents: 'Contents',
  hyperlinks: 'Hyperlinks',
  removeHyperlinks: 'RemoveHyperlinks',
} as const;

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

export function createExcel(model: WorkbookModel) {
  class RequestContext extends ShimRequestContext {
    constructor() {
      super(model);
    }
  }

  /**
   * Excel.run(batch), or Excel.run(object, batch) to continue with the context of an existing
   * context or proxy. Writes still queued when the batch settles are synced, as in Excel.
   */
  async function run(...args: unknown[]): Promise<unknown> {
    const batch = args[args.length - 1];
    if (typeof batch !== 'function') throw new TypeError('Excel.run needs a batch function.');
    const first = args.length > 1 ? args[0] : undefined;
    const context =
      first instanceof ShimRequestContext ? first : first instanceof ShimClientObject ? first.context : new RequestContext();
    const returned = (batch as Batch)(context);
    if (!isThenable(returned)) throw runMustReturnPromise();
    const result = await returned;
    await context.sync();
    return result;
  }

  return {
    run,
    RequestContext,
    ErrorCodes: ExcelErrorCodes,
    RangeValueType,
    ClearApplyTo,
    ChartType,
    ChartSeriesBy,
    Range: ShimRange,
    Chart: ShimChart,
    ChartCollection: ShimChartCollection,
    Worksheet: ShimWorksheet,
    WorksheetCollection: ShimWorksheetCollection,
    Workbook: ShimWorkbook,
  };
}
