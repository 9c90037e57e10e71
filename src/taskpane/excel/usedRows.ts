import { formatRange, isWholeColumns, parseRange, type RangeRef, splitAreas } from '../../addressing/a1';
import type { PaneChoices } from '../model/choices';
import { longRun } from './longRun';

/**
 * Each area as written, except whole columns, which become their rows that lie within the used
 * range of their sheet (cells with values; formatting alone does not count, so a formatted column
 * does not drag in a million empty rows). Every column of one sheet gets the same rows, so a
 * response and predictors picked as whole columns still line up.
 */
export async function clipToUsedRows(areas: readonly string[]): Promise<string[]> {
  const parsed = areas.map((area) => parseRange(area, ''));
  const sheets = [...new Set(parsed.filter((r): r is RangeRef => r !== undefined && r.sheet !== '' && isWholeColumns(r)).map((r) => r.sheet))];
  if (sheets.length === 0) return [...areas];
  const used = await longRun(async (context) => {
    const ranges = sheets.map((sheet) => context.workbook.worksheets.getItem(sheet).getUsedRangeOrNullObject(true).load('rowIndex, rowCount'));
    await context.sync();
    return new Map(
      sheets.map((sheet, i) => [sheet, ranges[i].isNullObject ? undefined : { top: ranges[i].rowIndex, bottom: ranges[i].rowIndex + ranges[i].rowCount - 1 }]),
    );
  });
  return areas.map((area, i) => {
    const range = parsed[i];
    if (range === undefined || range.sheet === '' || !isWholeColumns(range)) return area;
    const rows = used.get(range.sheet);
    if (rows === undefined) throw new Error(`${area} is a whole column of a sheet with no data: select the cells that hold the data.`);
    return formatRange({ ...range, ...rows });
  });
}

const ADDRESS_FIELDS = ['response', 'predictors', 'weights', 'newRows'] as const;

/** The choices with every whole column clipped (clipToUsedRows); fields without one keep their text as typed. */
export async function clipChoiceAddresses(choices: PaneChoices): Promise<PaneChoices> {
  let clipped = choices;
  for (const field of ADDRESS_FIELDS) {
    const areas = splitAreas(choices[field]);
    const rows = await clipToUsedRows(areas);
    if (rows.some((area, i) => area !== areas[i])) clipped = { ...clipped, [field]: rows.join(',') };
  }
  return clipped;
}
