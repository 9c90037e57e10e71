/**
 * The self-check workbook loaded into the preview host, with the real PLUMB functions registered
 * as the build registers them: functions.json generated from src/functions/functions.ts by
 * custom-functions-metadata and post-processed as the build does (scripts/build), and one
 * CustomFunctions.associate per function the generator lists.
 */
import { resolve } from 'node:path';
import { generateCustomFunctionsMetadata } from 'custom-functions-metadata';
import { allowErrorsAsInput } from '../../../scripts/build/functionsMetadata';
import * as cellFunctions from '../../../src/functions/functions';
import { installOfficeShim } from '../../../src/preview/shim/install';
import type { CellInput } from '../../../src/preview/workbook/types';
import { createWorkbook, type PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { columnIndex } from '../../../src/addressing/a1';
import type { FileCell, FileSheet } from './xlsxCells';

/**
 * The preview's formulas have no error constants, so a cell that holds the error value #N/A in
 * the file becomes a call to this stand-in, which shows #N/A in its cell as Excel shows the
 * constant ("Handle and return errors from your custom function": a thrown
 * CustomFunctions.Error with code #N/A shows #N/A).
 */
const NOT_AVAILABLE_STAND_IN = 'SELFCHECK_NOT_AVAILABLE';

async function plumbFunctionsMetadata(): Promise<{ metadata: unknown; associate: { id: string; functionName: string }[] }> {
  const generated = await generateCustomFunctionsMetadata(resolve(__dirname, '../../../src/functions/functions.ts'));
  if (generated.errors.length > 0) throw new Error(generated.errors.join('\n'));
  return { metadata: JSON.parse(allowErrorsAsInput(generated.metadataJson)), associate: generated.associate };
}

function previewInput(cell: FileCell): CellInput {
  if ('value' in cell) return cell.value;
  if ('error' in cell) {
    if (cell.error !== '#N/A') throw new Error(`The self-check holds only #N/A errors, not ${cell.error}.`);
    return `=PLUMB.${NOT_AVAILABLE_STAND_IN}()`;
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
  const { metadata, associate } = await plumbFunctionsMetadata();
  const model = createWorkbook(sheets[0].name);
  installOfficeShim(model);
  model.loadFunctionMetadata(metadata);
  const exported = cellFunctions as Record<string, unknown>;
  for (const { id, functionName } of associate) CustomFunctions.associate(id, exported[functionName] as (...args: unknown[]) => unknown);
  model.registerFunction(NOT_AVAILABLE_STAND_IN, () => {
    throw new CustomFunctions.Error(CustomFunctions.ErrorCode.notAvailable);
  });
  for (const sheet of sheets.slice(1)) model.addSheet(sheet.name);
  for (const sheet of sheets) model.setInputs(sheet.name, 0, 0, grid(sheet));
  return model;
}
