/**
 * Installs Office, Excel, OfficeExtension and CustomFunctions on globalThis, backed by the
 * preview workbook model, so the built functions and task pane bundles run unmodified. It covers
 * what the add-in and its tests use, and no more (issue #14): extend it, with a test in
 * test/preview/shim, before the add-in uses another member.
 *
 * Covered:
 * - Office.onReady(callback?) → { host: 'Excel', platform: 'OfficeOnline' }.
 * - Excel.run(batch), Excel.run(options, batch) with Excel.RunOptions delayForCellEdit, and
 *   Excel.run(contextOrObject, batch), with the final implicit sync; new Excel.RequestContext();
 *   context.sync(); Excel.ChartType.xyscatter and xyscatterLinesNoMarkers,
 *   Excel.ChartSeriesBy.columns; Excel.Range and Excel.Worksheet (tests reach their prototypes).
 * - Host behaviour (hostSettings.ts; installOfficeShim returns the live settings): a sync takes
 *   its queue at once and is processed a macrotask (plus syncDelayMs) later, so nothing is
 *   written when sync() returns; a request whose written data exceed 5 MB (UTF-8 JSON) is refused
 *   whole with RequestPayloadSizeLimitExceeded, a response that grows past 5 MB fails with
 *   ResponsePayloadSizeLimitExceeded (the limit can be lowered for tests); while the model is in
 *   cell edit mode (model.setCellEditMode) a sync fails with InvalidOperation (or
 *   InvalidOperationInCellEditMode) unless the batch was run with delayForCellEdit, which waits.
 * - The load/sync model: load('a, b'), load(['a', 'b/c']), load({ a: true }), load({ select });
 *   navigation paths such as 'format/font/bold' and 'items/name'; reading a property before load
 *   and sync throws PropertyNotLoaded; writes are queued and applied in order at the next sync; a
 *   failing operation rejects the sync and leaves the earlier ones applied. Errors are
 *   OfficeExtension.Error with code, message and debugInfo (ItemNotFound, InvalidArgument,
 *   ItemAlreadyExists, InvalidOperation, InvalidSelection, PropertyNotLoaded, GeneralException
 *   for a failure inside the model).
 * - Workbook: worksheets, getSelectedRange() (InvalidSelection when several areas are selected),
 *   getSelectedRanges() → RangeAreas with address only ("Sheet1!B2:B9, Sheet1!D:D").
 * - WorksheetCollection: getItem, getItemOrNullObject (isNullObject), add(name?) with
 *   Sheet2, Sheet3… names, getActiveWorksheet, items (load 'items' or 'items/name').
 * - Worksheet: name (read only), getRange(A1, A1:B2 or whole columns B:D, $ allowed,
 *   sheet-qualified), getUsedRange(valuesOnly?) and getUsedRangeOrNullObject(valuesOnly?) (the
 *   smallest range around cells with values, or also formats and styles without valuesOnly),
 *   activate, delete, charts, onChanged.add(handler) → EventHandlerResult.remove()
 *   (worksheetChangedEvent.ts; the arguments carry changeType and address).
 * - Range: address (sheet names quoted as Excel writes them, whole columns as "Sheet1!B:B"),
 *   values, formulas, numberFormat (read and write, 2-D arrays of the range's shape; null leaves
 *   a cell as it is), rowCount, columnCount, rowIndex, columnIndex; getCell, getResizedRange,
 *   getOffsetRange, getRow, select, clear('All' | 'Contents' | 'Formats', where formats are
 *   number formats, bold, fill and wrapping); format (below). Blank cells read "", errors read as
 *   their text; written strings are read as Excel reads typed entries ("=…", "+…", "-…" become
 *   formulas; numbers, percents and TRUE/FALSE become values; cells formatted "@" keep text).
 * - RangeFormat: columnWidth (points; read gives null when the columns differ); font.bold;
 *   fill.color ('#RRGGBB', 'RRGGBB' or a common HTML colour name; read as '#RRGGBB', '#FFFFFF'
 *   without fill). Reads over cells that differ give null.
 * - ChartCollection (worksheet.charts): add(Excel.ChartType.xyscatter, sourceData,
 *   Excel.ChartSeriesBy.columns) — only as far as the docs say: the first column is X and each
 *   further one a series of Y; seriesBy Auto or omitted is refused (InvalidArgument: it differs
 *   between desktop and web), and so is Rows; header cells are never series names (every cell is
 *   data, series are "SeriesN"); getItem(name) (case-insensitive), getItemOrNullObject, items.
 *   New charts are named "Chart N" and are 360 × 216 points.
 * - Chart: name (read/write), setPosition(startCell, endCell?) with ranges or addresses,
 *   title.text, axes.categoryAxis.title.text (the X axis of a scatter chart),
 *   axes.valueAxis.title.text; ChartAxis minimum/maximum (a number, or "" for automatic; an
 *   automatic one cannot be read); series: add(name?, index?) (no values until setValues),
 *   count, items; ChartSeries: name (read only), chartType (XYScatter or
 *   XYScatterLinesNoMarkers only), setXAxisValues(range), setValues(range), delete(). Charts
 *   read their cells live (blank and error Y cells are gaps, text Y cells plot at 0) and move
 *   and size with the cells under them.
 * - CustomFunctions.associate(id, fn) into model.registerFunction (ids upper-cased),
 *   CustomFunctions.Error(code, message?), CustomFunctions.ErrorCode. How arguments and results
 *   cross (functions.json shapes, errors, blanks, repeating parameters,
 *   invocation.parameterAddresses) is the model's: src/preview/workbook/functionArguments.ts.
 *
 * Not covered (calling one fails, or it is simply absent):
 * - Office.context (the pane's theme falls back to the stylesheet), Office.HostType and
 *   PlatformType, requirement-set checks, Office.addin, Office.actions, Office.initialize.
 * - Excel.ErrorCodes and OfficeExtension.ErrorCodes (the add-in compares codes as strings),
 *   ClientResult and every getCount(), OfficeExtension's other classes, context.trackedObjects,
 *   track/untrack, Excel.RunOptions previousObjects, sync(passThroughValue),
 *   CustomFunctions.associate(mappings), other enum values.
 * - Renaming, moving or hiding sheets, worksheet position, visibility and ids, Worksheet.getCell.
 * - Range addressLocal, cellCount, text, valueTypes, worksheet, getColumn, getLast*,
 *   Workbook.getActiveCell; RangeAreas members other than address.
 * - Other formatting: wrapText, row heights, autofit, fill.clear(), borders, alignment, indent,
 *   protection, font colour/italic/size/name, fill patterns. Touching one of these throws
 *   ApiNotFound rather than being silently ignored.
 * - Chart types other than xyscatter (add rejects them with InvalidArgument), chart id, type,
 *   top/left/width/height, worksheet and delete(), ChartCollection.getItemAt and count,
 *   ChartSeriesCollection.getItemAt, renaming a series, setData, legends, data
 *   labels, chart and series formatting, axis units, title visibility, getImage, chart events. A
 *   new chart goes beside its data rather than in the middle of the window as in Excel.
 * - Range.set(), insert, delete, getEntireRow/Column, getIntersection, getBoundingRect,
 *   getUsedRange on a range, Workbook.getRange/names/tables.
 * - The five-million-cell read limit on its own (reads that large exceed 5 MB anyway).
 * - Whole-sheet ranges (getRange() with no address), whole rows ("1:1"), Worksheet.getRanges,
 *   named items, tables, events other than Worksheet.onChanged (worksheetChangedEvent.ts),
 *   protection, calculation control, and writing a single scalar to a multi-cell range.
 * - Spilled cells other than the anchor read "" in `formulas`.
 * - Written strings are not parsed as dates, currencies or numbers with thousands separators,
 *   and "#N/A"-style text stays text.
 * - Loading a property the shim lacks rejects the sync with ApiNotFound naming it.
 */
import type { WorkbookModel } from '../workbook/types';
import { createAssociate, CustomFunctionsError, CustomFunctionsErrorCode, type FunctionRegistrationHost } from './customFunctions';
import { createExcel } from './excel';
import { defaultSettings, type ShimSettings } from './hostSettings';
import { createOffice } from './office';
import { OfficeExtensionError } from './officeErrors';

interface ShimGlobals {
  Office: typeof Office;
  Excel: typeof Excel;
  OfficeExtension: typeof OfficeExtension;
  CustomFunctions: typeof CustomFunctions;
}

export interface ShimHost extends FunctionRegistrationHost {
  settings?: Partial<ShimSettings>;
}

/** Returns the live settings: changing a member changes the host from the next sync on. */
export function installOfficeShim(model: WorkbookModel, host?: ShimHost): ShimSettings {
  const settings: ShimSettings = { ...defaultSettings(), ...host?.settings };
  const office = createOffice();
  const excel = createExcel(model, settings);
  const officeExtension = { Error: OfficeExtensionError };
  const customFunctions = {
    associate: createAssociate(model, host),
    Error: CustomFunctionsError,
    ErrorCode: CustomFunctionsErrorCode,
  };

  // The shim implements a subset of the @types/office-js and custom-functions-runtime surface,
  // so it cannot satisfy those declarations structurally. This is the single point where it is
  // presented as the real API; code elsewhere is typed against the real declarations.
  const globals = globalThis as unknown as ShimGlobals;
  globals.Office = office as unknown as typeof Office;
  globals.Excel = excel as unknown as typeof Excel;
  globals.OfficeExtension = officeExtension as unknown as typeof OfficeExtension;
  globals.CustomFunctions = customFunctions as unknown as typeof CustomFunctions;
  return settings;
}
