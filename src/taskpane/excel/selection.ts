import { splitAreas } from '../../addressing/a1';
import { clipToUsedRows } from './usedRows';

/**
 * Codes a batch fails with while the user edits a cell: "Delay execution while cell is being
 * edited" names InvalidOperation, the error table of "Error handling with the
 * application-specific JavaScript APIs" InvalidOperationInCellEditMode.
 */
const CELL_EDIT_CODES: ReadonlySet<string> = new Set(['InvalidOperation', 'InvalidOperationInCellEditMode']);

/**
 * The areas of the user's current selection, each with its sheet, as Excel writes them; whole
 * columns come back clipped to the rows in use. `getSelectedRanges` (ExcelApi 1.9) because
 * `getSelectedRange` throws when several areas are selected ("Excel.Workbook": "If there are
 * multiple ranges selected, this method will throw an error"). Unlike the long work this does not
 * wait for a cell edit to end: Enter would move the selection before it is read.
 */
export async function selectedAreas(): Promise<string[]> {
  let address: string;
  try {
    address = await Excel.run(async (context) => {
      const selected = context.workbook.getSelectedRanges();
      selected.load('address');
      await context.sync();
      return selected.address;
    });
  } catch (error) {
    const code = typeof error === 'object' && error !== null && 'code' in error ? String(error.code) : '';
    if (!CELL_EDIT_CODES.has(code)) throw error;
    throw new Error(
      `Excel could not read the selection (${code}). If a cell is being edited, finish it with Enter or Esc, select the range again and press Use selection.`,
      { cause: error },
    );
  }
  return clipToUsedRows(splitAreas(address));
}
