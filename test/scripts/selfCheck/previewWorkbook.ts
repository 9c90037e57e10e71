/**
 * The self-check workbook loaded into the preview host, with the real PLUMB functions registered
 * as the build registers them (test/support/plumbPreview.ts).
 */
import type { CellInput } from '../../../src/preview/workbook/types';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { columnIndex } from '../../../src/addressing/a1';
import { NOT_AVAILABLE_CELL, plumbPreview } from '../../support/plumbPreview';
import type { FileCell, FileSheet } from './xlsxCells';

function previewInput(cell: FileCell): CellInput {
  if ('value' in cell) return cell.value;
  if ('error' in cell) {
    if (cell.error !== '#N/A') throw new Error(`The self-check holds only #N/A errors, not ${cell.error}.`);
    // The preview's formulas have no error constants: a stand-in shows #N/A as the file's value does.
    return NOT_AVAILABLE_CELL;
  }
  return `=${cell.formula}`;
}

function grid(sheet: FileSheet): CellInput[][] {
  const placed = [...sheet.cells].map(([address, cell]) => {
    const m = /^([A-Z]+)(\d+)$/.exec(address);
    if (!m) throw new Error(`${address} is not a cell address.`);
    return { row: Number(m[2]) - 1, column: columnIndex(m[1]), input: previewInput(cell) };
  });
  const rows = Math.max(...placed.map((p) => p.row)) + 1;
  const columns = Math.max(...placed.map((p) => p.column)) + 1;
  const inputs: CellInput[][] = Array.from({ length: rows }, () => Array<CellInput>(columns).fill(null));
  for (const p of placed) inputs[p.row][p.column] = p.input;
  return inputs;
}

export async function loadIntoPreview(sheets: FileSheet[]): Promise<PreviewWorkbook> {
  const model = await plumbPreview(sheets[0].name);
  for (const sheet of sheets.slice(1)) model.addSheet(sheet.name);
  for (const sheet of sheets) model.setInputs(sheet.name, 0, 0, grid(sheet));
  return model;
}
