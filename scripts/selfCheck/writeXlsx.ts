/**
 * Writes a self-check plan as an xlsx file with exceljs, then adds what exceljs cannot write: the
 * dynamic-array marks that make Excel spill each PLUMB result instead of showing only its first
 * value behind an implicit-intersection "@". A dynamic-array formula is a cell with `cm="1"`
 * whose `<f t="array" ref="…">` holds the formula, and `cm` points at the XLDAPR cell metadata
 * in xl/metadata.xml (ECMA-376 Part 1 §18.9 metadata and §18.3.1.4 c@cm; [MS-XLSX] dynamicArrayProperties).
 * The file is built with fixed dates, so the same plan always gives the same bytes.
 */
import ExcelJS from 'exceljs';
import JSZip from 'jszip';
import { cellAddress } from '../../src/addressing/a1';
import { toStoredFormula } from './fileFormulas';
import type { CellContent, PlannedSheet, SelfCheckPlan } from './plan';

/** Written into the file's properties and every zip entry, so regenerating changes nothing. */
const FIXED_DATE = new Date(Date.UTC(2026, 0, 1));

const PASS_FILL = 'FFDCEFE4';
const FAIL_FILL = 'FFF6D5D1';

/** exceljs writes `<f t="array" ref>` for these two members; its typings leave them out. */
interface ArrayFormulaValue extends ExcelJS.CellFormulaValue {
  shareType: 'array';
  ref: string;
}

function cellValue(content: CellContent, row: number, column: number): ExcelJS.CellValue {
  if ('value' in content) return content.value;
  if ('error' in content) return { error: content.error };
  const formula = toStoredFormula(content.formula);
  if (content.spill === undefined) return { formula };
  const ref = `${cellAddress(row, column)}:${cellAddress(row + content.spill.rows - 1, column + content.spill.columns - 1)}`;
  const value: ArrayFormulaValue = { formula, shareType: 'array', ref };
  return value;
}

function addSheet(workbook: ExcelJS.Workbook, plannedSheet: PlannedSheet): void {
  const sheet = workbook.addWorksheet(plannedSheet.name);
  for (const { column, width } of plannedSheet.columnWidths) sheet.getColumn(column + 1).width = width;
  for (const planned of plannedSheet.cells) {
    const cell = sheet.getCell(planned.row + 1, planned.column + 1);
    cell.value = cellValue(planned.content, planned.row, planned.column);
    if (planned.numberFormat !== undefined) cell.numFmt = planned.numberFormat;
    if (planned.bold) cell.font = { bold: true };
  }
  // A cfRule's priority orders every rule of its sheet (ECMA-376 Part 1, cfRule), so no two share one.
  const fill = (argb: string): Partial<ExcelJS.Style> => ({ fill: { type: 'pattern', pattern: 'solid', bgColor: { argb } } });
  plannedSheet.resultCells.forEach((range, i) => {
    sheet.addConditionalFormatting({
      ref: `${cellAddress(range.top, range.column)}:${cellAddress(range.bottom, range.column)}`,
      rules: [
        { type: 'cellIs', operator: 'equal', formulae: ['"PASS"'], priority: 2 * i + 1, style: fill(PASS_FILL) },
        { type: 'cellIs', operator: 'equal', formulae: ['"FAIL"'], priority: 2 * i + 2, style: fill(FAIL_FILL) },
      ],
    });
  });
}

const METADATA_PART = 'xl/metadata.xml';
const METADATA_XML =
  '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n' +
  '<metadata xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray">' +
  '<metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" coerce="1" cellMeta="1"/></metadataTypes>' +
  '<futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}"><xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata>' +
  '<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata>' +
  '</metadata>';
const METADATA_CONTENT_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml';
const METADATA_RELATIONSHIP = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata';

/** Marks every array-formula cell of a sheet as a dynamic array (cell metadata record 1). */
function markDynamicArrays(sheetXml: string): string {
  return sheetXml.replace(/<c ([^>]*?)>(<f t="array")/g, (_, attributes: string, formula: string) => `<c ${attributes} cm="1">${formula}`);
}

async function addDynamicArrayParts(zip: JSZip): Promise<void> {
  const text = async (path: string): Promise<string> => {
    const file = zip.file(path);
    if (file === null) throw new Error(`exceljs wrote no ${path}.`);
    return file.async('string');
  };
  for (const path of Object.keys(zip.files).filter((p) => /^xl\/worksheets\/sheet\d+\.xml$/.test(p))) {
    zip.file(path, markDynamicArrays(await text(path)));
  }
  zip.file(METADATA_PART, METADATA_XML);
  const types = await text('[Content_Types].xml');
  zip.file('[Content_Types].xml', types.replace('</Types>', `<Override PartName="/${METADATA_PART}" ContentType="${METADATA_CONTENT_TYPE}"/></Types>`));
  const relsPath = 'xl/_rels/workbook.xml.rels';
  const rels = await text(relsPath);
  const ids = [...rels.matchAll(/Id="rId(\d+)"/g)].map((m) => Number(m[1]));
  const id = `rId${Math.max(0, ...ids) + 1}`;
  zip.file(relsPath, rels.replace('</Relationships>', `<Relationship Id="${id}" Type="${METADATA_RELATIONSHIP}" Target="metadata.xml"/></Relationships>`));
}

export async function writeSelfCheckXlsx(plan: SelfCheckPlan): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.title = 'Plumbline self-check';
  workbook.creator = 'Plumbline';
  workbook.lastModifiedBy = 'Plumbline';
  workbook.created = FIXED_DATE;
  workbook.modified = FIXED_DATE;
  // Excel computes every formula on opening: the file carries no cached results.
  workbook.calcProperties.fullCalcOnLoad = true;
  for (const sheet of plan.sheets) addSheet(workbook, sheet);
  const written = await JSZip.loadAsync(await workbook.xlsx.writeBuffer());
  await addDynamicArrayParts(written);

  const stable = new JSZip();
  for (const [path, entry] of Object.entries(written.files)) {
    if (entry.dir) continue;
    stable.file(path, await entry.async('uint8array'), { date: FIXED_DATE, createFolders: false });
  }
  return stable.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE', compressionOptions: { level: 9 } });
}
