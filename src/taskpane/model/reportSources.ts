import { columnCount, formatAbsolute, type RangeRef, sameSheet } from '../../addressing/a1';
import type { ResolvedRanges } from './choices';

/** Column Y: where PLUMB.GATHER blocks start on the report sheet, clear of the tables and the Q–Q points. */
export const GATHER_COLUMN = 24;

/** One PLUMB.GATHER formula on the report sheet and the block it fills there. */
export interface GatherCell {
  areas: RangeRef[];
  block: RangeRef;
}

/** The range text each PLUMB formula of the report reads, and the gathers that fill any of them. */
export interface ReportSources {
  y: string;
  x: string;
  base: string;
  added: string | undefined;
  newRows: string | undefined;
  gathers: GatherCell[];
}

/** Neighbouring columns (same sheet and rows, next column along) joined into one area each. */
export function joinRuns(columns: readonly RangeRef[]): RangeRef[] {
  const runs: RangeRef[] = [];
  for (const column of columns) {
    const last = runs[runs.length - 1];
    const continues =
      last !== undefined && sameSheet(last.sheet, column.sheet) && last.top === column.top && last.bottom === column.bottom && column.left === last.right + 1;
    if (continues) runs[runs.length - 1] = { ...last, right: column.right };
    else runs.push(column);
  }
  return runs;
}

/**
 * The report-sheet column each predictor (columns in fit order) is gathered into, or undefined for
 * every one when they form one block the report reads where it is. Gathered columns keep their
 * blank or missing headers, and the cell functions see only the report sheet, so a column without
 * a header reads there as, say, "column Y"; the pane names it so too, and pane and report agree.
 */
export function gatheredColumns(ordered: readonly RangeRef[]): (number | undefined)[] {
  if (joinRuns(ordered).length <= 1) return ordered.map(() => undefined);
  let next = GATHER_COLUMN;
  return ordered.map((column) => {
    const at = next;
    next += columnCount(column);
    return at;
  });
}

/** "$Y$1:$AA$61": a block of the report sheet, named without its sheet as formulas on that sheet do. */
function onReportSheet(block: RangeRef): string {
  const text = formatAbsolute(block);
  return text.slice(text.lastIndexOf('!') + 1);
}

/**
 * The report's formulas read the data where it is when the predictors, base ones then added ones,
 * are one block. Otherwise PLUMB.GATHER brings the areas side by side on the report sheet, at the
 * worksheet rows they come from: a plain `=Data!C2:C61` would turn every blank into 0 (a formula
 * that refers to an empty cell yields 0), and the same rows let the cell functions name rows as
 * the data sheet numbers them. Several areas of new rows are gathered the same way.
 */
export function reportSources(sheet: string, ranges: ResolvedRanges, added: readonly number[]): ReportSources {
  const columns = ranges.predictorColumns;
  const isAdded = (j: number) => added.includes(j);
  const order = columns.map((_, j) => j).sort((a, b) => Number(isAdded(a)) - Number(isAdded(b)));
  const ordered = order.map((j) => columns[j]);
  const k = added.length;
  const n = ordered.length;
  const gathers: GatherCell[] = [];
  let nextColumn = GATHER_COLUMN;
  const gather = (areas: RangeRef[]): RangeRef => {
    const width = areas.reduce((sum, area) => sum + columnCount(area), 0);
    const block: RangeRef = { sheet, top: areas[0].top, bottom: areas[0].bottom, left: nextColumn, right: nextColumn + width - 1 };
    gathers.push({ areas, block });
    // An empty column between blocks keeps each gather's label beside it.
    nextColumn += width + 1;
    return block;
  };

  const runs = joinRuns(ordered);
  let x: string;
  let base: string;
  let addedText: string | undefined;
  if (runs.length === 1) {
    const block = runs[0];
    x = formatAbsolute(block);
    base = formatAbsolute({ ...block, right: block.right - k });
    addedText = k > 0 ? formatAbsolute({ ...block, left: block.right - k + 1 }) : undefined;
  } else {
    const block = gather(runs);
    x = onReportSheet(block);
    base = onReportSheet({ ...block, right: block.left + n - k - 1 });
    addedText = k > 0 ? onReportSheet({ ...block, left: block.left + n - k }) : undefined;
  }

  let newRows: string | undefined;
  if (ranges.newRows !== undefined) {
    const areas = joinRuns(ranges.newRows);
    newRows = areas.length === 1 ? formatAbsolute(areas[0]) : onReportSheet(gather(areas));
  }
  return { y: formatAbsolute(ranges.response), x, base, added: addedText, newRows, gathers };
}
