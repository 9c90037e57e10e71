import type { RangeRef } from '../../addressing/a1';
import { type FieldProblem, noSuchSheetProblem, type PaneChoices, sheetsNamed } from '../model/choices';
import { longRun } from './longRun';
import { readRowBlocks } from './readRowBlocks';

/** Values of several ranges, each read in blocks sized by payload and joined again. */
export async function readRanges(ranges: readonly RangeRef[]): Promise<unknown[][][]> {
  const grids: unknown[][][] = [];
  for (const range of ranges) {
    const rows: unknown[][] = [];
    await readRowBlocks([range], ({ values }) => {
      for (const row of values[0]) rows.push(row);
    });
    grids.push(rows);
  }
  return grids;
}

/**
 * A problem on each address field that names a sheet the workbook does not have, found in one
 * batch before anything is read: reading such a range would fail with Excel's ItemNotFound, which
 * says neither which field nor which sheet. Names are matched as Excel matches them, without case.
 */
export async function missingSheetProblems(choices: PaneChoices): Promise<FieldProblem[]> {
  const named = sheetsNamed(choices);
  if (named.length === 0) return [];
  const sheets = [...new Set(named.map((n) => n.sheet))];
  const missing = await longRun(async (context) => {
    // "WorksheetCollection.getItemOrNullObject": a missing sheet gives an object whose isNullObject
    // is true, readable after the sync ("OfficeExtension.ClientObject", isNullObject).
    const found = sheets.map((sheet) => context.workbook.worksheets.getItemOrNullObject(sheet));
    await context.sync();
    return new Set(sheets.filter((_, i) => found[i].isNullObject));
  });
  return named.filter((n) => missing.has(n.sheet)).map((n) => noSuchSheetProblem(n.field, n.sheet));
}
