/**
 * One data sheet of the self-check: title and sources, the data under a header row, the PLUMB
 * formulas over them (each spilling its block), and one check row per compared value. A check
 * row holds the certified or reference value, a reference to the PLUMB result's cell, Excel's
 * LRE of the two and PASS or FAIL.
 */
import { absolute, CHECK_COLUMNS, DATA_HEADER_ROW, OUTPUT_COLUMN, relative } from './layout';
import { checkRowFormulas } from './checkFormulas';
import { formulaCell, type DataCell, type PlannedCell, type PlannedSheet, valueCell } from './plan';

/** A PLUMB function called on the sheet's data, and the size of the block it returns. */
export interface OutputBlock {
  functionName: string;
  rows: number;
  columns: number;
}

export interface Check {
  label: string;
  expected: number;
  /** The cell of one output block this check reads, 0-based within the block. */
  block: string;
  row: number;
  column: number;
  /** Counts show as integers, other values with 15 significant digits. */
  count?: boolean;
}

export interface DatasetSheetSpec {
  name: string;
  title: string;
  /** Lines under the title: the data's source and what the expected values are. */
  notes: string[];
  /** 'Certified value' (NIST) or 'Reference value (R)'. */
  expectedHeading: string;
  headers: string[];
  /** Data rows; the first column is the response, the rest the predictors. */
  rows: DataCell[][];
  blocks: OutputBlock[];
  checks: Check[];
}

export interface DatasetSheet {
  sheet: PlannedSheet;
  checkCount: number;
  /** 0-based rows of the first and last check. */
  firstCheckRow: number;
  lastCheckRow: number;
}

const FIFTEEN_DIGITS = '0.00000000000000E+00';
const GAP = 1;

/** The 0-based worksheet row of data row `index` (0-based, header excluded). */
export function worksheetRowOf(index: number): number {
  return DATA_HEADER_ROW + 1 + index;
}

function dataCell(row: number, column: number, cell: DataCell): PlannedCell[] {
  if (cell === null) return [];
  if (typeof cell === 'object') return [{ row, column, content: { error: cell.error } }];
  return [valueCell(row, column, cell)];
}

export function buildDatasetSheet(spec: DatasetSheetSpec): DatasetSheet {
  const lastDataRow = worksheetRowOf(spec.rows.length - 1);
  const lastColumn = spec.headers.length - 1;
  if (lastColumn + 1 >= CHECK_COLUMNS.label) throw new Error(`${spec.name}: the data would run into the check table.`);
  const y = `${absolute(DATA_HEADER_ROW, 0)}:${absolute(lastDataRow, 0)}`;
  const x = `${absolute(DATA_HEADER_ROW, 1)}:${absolute(lastDataRow, lastColumn)}`;

  const cells: PlannedCell[] = [
    valueCell(0, 0, spec.title, { bold: true }),
    ...spec.notes.map((note, i) => valueCell(1 + i, 0, note)),
    ...spec.headers.map((h, j) => valueCell(DATA_HEADER_ROW, j, h, { bold: true })),
    ...spec.rows.flatMap((r, i) => r.flatMap((cell, j) => dataCell(worksheetRowOf(i), j, cell))),
  ];
  if (1 + spec.notes.length >= DATA_HEADER_ROW) throw new Error(`${spec.name}: too many notes above the data.`);

  // Each block: its function's name in a label row, then the formula whose result spills below it.
  const anchors = new Map<string, { row: number; column: number; block: OutputBlock }>();
  let next = DATA_HEADER_ROW;
  for (const block of spec.blocks) {
    cells.push(valueCell(next, OUTPUT_COLUMN, `PLUMB.${block.functionName}`, { bold: true }));
    const anchor = { row: next + 1, column: OUTPUT_COLUMN, block };
    const formula = `PLUMB.${block.functionName}(${y},${x})`;
    cells.push({ row: anchor.row, column: anchor.column, content: { formula, spill: { rows: block.rows, columns: block.columns } } });
    anchors.set(block.functionName, anchor);
    next = anchor.row + block.rows + GAP;
  }

  const c = CHECK_COLUMNS;
  const headings: [number, string][] = [
    [c.label, 'Check'],
    [c.expected, spec.expectedHeading],
    [c.plumbline, 'Plumbline'],
    [c.lre, 'LRE'],
    [c.result, 'Result'],
  ];
  cells.push(...headings.map(([column, text]) => valueCell(DATA_HEADER_ROW, column, text, { bold: true })));
  const firstCheckRow = DATA_HEADER_ROW + 1;
  spec.checks.forEach((check, i) => {
    const row = firstCheckRow + i;
    const anchor = anchors.get(check.block);
    if (anchor === undefined) throw new Error(`${spec.name}: check "${check.label}" reads ${check.block}, which the sheet does not call.`);
    if (check.row >= anchor.block.rows || check.column >= anchor.block.columns)
      throw new Error(`${spec.name}: check "${check.label}" reads outside ${check.block}'s block.`);
    const format = check.count ? '0' : FIFTEEN_DIGITS;
    const formulas = checkRowFormulas(row, c);
    cells.push(
      valueCell(row, c.label, check.label),
      valueCell(row, c.expected, check.expected, { numberFormat: format }),
      formulaCell(row, c.plumbline, relative(anchor.row + check.row, anchor.column + check.column), { numberFormat: format }),
      formulaCell(row, c.lre, formulas.lre, { numberFormat: '0.0' }),
      formulaCell(row, c.result, formulas.result, { bold: true }),
    );
  });
  const lastCheckRow = firstCheckRow + spec.checks.length - 1;

  return {
    sheet: {
      name: spec.name,
      cells,
      columnWidths: [
        { column: c.label, width: 34 },
        { column: c.expected, width: 24 },
        { column: c.plumbline, width: 24 },
        { column: c.lre, width: 7 },
        { column: c.result, width: 8 },
        { column: OUTPUT_COLUMN, width: 22 },
      ],
      resultCells: [{ top: firstCheckRow, bottom: lastCheckRow, column: c.result }],
    },
    checkCount: spec.checks.length,
    firstCheckRow,
    lastCheckRow,
  };
}
