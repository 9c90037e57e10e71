/**
 * The cells of an xlsx file as plain data, read with exceljs (the library that wrote it), and
 * the same shape built from a self-check plan, so the committed file and a fresh generation can
 * be compared cell by cell. Formulas are given as a user types them (`PLUMB.ESTIMATES(…)`).
 */
import ExcelJS from 'exceljs';
import { cellAddress } from '../../../src/addressing/a1';
import { toTypedFormula } from '../../../scripts/selfCheck/fileFormulas';
import type { CellContent, SelfCheckPlan } from '../../../scripts/selfCheck/plan';

export type FileCell = { value: number | string } | { error: string } | { formula: string; spill?: string };

export interface FileSheet {
  name: string;
  /** Keyed by A1 address. */
  cells: Map<string, FileCell>;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null;
}

function fileCell(value: ExcelJS.CellValue, address: string): FileCell {
  if (typeof value === 'number' || typeof value === 'string') return { value };
  if (isRecord(value) && typeof value.error === 'string') return { error: value.error };
  if (isRecord(value) && typeof value.formula === 'string') {
    const formula = toTypedFormula(value.formula);
    return value.shareType === 'array' && typeof value.ref === 'string' ? { formula, spill: value.ref } : { formula };
  }
  throw new Error(`${address} holds a value the self-check never writes: ${JSON.stringify(value)}`);
}

export async function readXlsxCells(bytes: Buffer): Promise<FileSheet[]> {
  const workbook = new ExcelJS.Workbook();
  // exceljs types its input as an ArrayBuffer (its own `Buffer`), which JSZip reads as it reads a Node Buffer.
  await workbook.xlsx.load(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
  return workbook.worksheets.map((sheet) => {
    const cells = new Map<string, FileCell>();
    sheet.eachRow((row) => row.eachCell((cell) => void cells.set(cell.address, fileCell(cell.value, cell.address))));
    return { name: sheet.name, cells };
  });
}

function plannedCell(content: CellContent, row: number, column: number): FileCell {
  if ('value' in content) return { value: content.value };
  if ('error' in content) return { error: content.error };
  if (content.spill === undefined) return { formula: content.formula };
  const end = cellAddress(row + content.spill.rows - 1, column + content.spill.columns - 1);
  return { formula: content.formula, spill: `${cellAddress(row, column)}:${end}` };
}

export function planCells(plan: SelfCheckPlan): FileSheet[] {
  return plan.sheets.map((sheet) => ({
    name: sheet.name,
    cells: new Map(sheet.cells.map((c) => [cellAddress(c.row, c.column), plannedCell(c.content, c.row, c.column)])),
  }));
}
