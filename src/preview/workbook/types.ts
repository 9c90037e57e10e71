/**
 * The preview workbook's model, shared by its grid UI and by the Office.js shim. Rows and
 * columns are 0-based here; A1 text appears only at the edges (formulas, addresses).
 */
import type { RangeRef } from '../../addressing/a1';

/** What a cell holds as entered: a constant, or formula text starting with "=". */
export type CellInput = number | string | boolean | null;

/** An error shown in a cell, with the message a user sees when they hover it. */
export interface CellError {
  error: string;
  message?: string;
}

/** What a cell shows: its constant, a formula's result, a value spilled into it, or an error. */
export type CellValue = number | string | boolean | null | CellError;

export interface CellPosition {
  sheet: string;
  row: number;
  column: number;
}

export type { RangeRef };

export type CustomFunction = (...args: unknown[]) => unknown;

/** The cell formatting the preview keeps besides number formats. */
export interface CellStyle {
  bold: boolean;
  /** '#RRGGBB' in capitals, or null for no fill. */
  fill: string | null;
  wrap: boolean;
}

/** Where a chart sits, in points from the sheet's top-left corner, as Excel's API measures it. */
export interface ChartBounds {
  left: number;
  top: number;
  width: number;
  height: number;
}

export interface ChartSeriesSource {
  /** Literal text, or the cell the name is read from (a header), which Excel keeps live. */
  name: string | RangeRef;
  /** Null: points are numbered 1, 2, 3… as Excel plots a series without X values. */
  x: RangeRef | null;
  /** Null only for a series added without values yet. */
  y: RangeRef | null;
  /**
   * The series' own chart type (ChartSeries.chartType): a new series takes its chart's; the
   * preview draws points ('XYScatter') or straight lines through them without markers.
   */
  chartType: SeriesChartType;
}

export type SeriesChartType = 'XYScatter' | 'XYScatterLinesNoMarkers';

/** An axis's fixed bounds (ChartAxis.minimum, maximum); null where Excel scales it automatically. */
export interface AxisScale {
  minimum: number | null;
  maximum: number | null;
}

export interface ChartSpec {
  /** Unique in the workbook and never reused; the name can change, the id cannot. */
  id: string;
  name: string;
  type: 'XYScatter';
  /** Null: the automatic title, the series name when there is exactly one series. */
  title: string | null;
  series: ChartSeriesSource[];
  /** For a scatter chart the category axis is the horizontal (X) one; '' means no title. */
  axisTitles: { category: string; value: string };
  axisScales: { category: AxisScale; value: AxisScale };
  bounds: ChartBounds;
}

export type NewChart = Omit<ChartSpec, 'id' | 'name'> & { name?: string };
export type ChartChange = Partial<Omit<ChartSpec, 'id' | 'type'>>;

export interface WorkbookModel {
  sheetNames(): string[];
  hasSheet(name: string): boolean;
  /** Adds an empty sheet at the end; throws when the name is taken or invalid. */
  addSheet(name: string): void;
  /** Renames a sheet; throws when the new name is taken or invalid. */
  renameSheet(from: string, to: string): void;
  /** Removes a sheet; throws when it does not exist or is the last one. */
  deleteSheet(name: string): void;
  activeSheet(): string;
  activateSheet(name: string): void;

  inputAt(position: CellPosition): CellInput;
  valueAt(position: CellPosition): CellValue;
  /** Every value of a range, row by row, as valueAt gives them, with the sheet looked up once. */
  valuesIn(range: RangeRef): CellValue[][];
  /** Sets inputs starting at the range's top-left cell and recalculates once afterwards. */
  setInputs(sheet: string, top: number, left: number, inputs: readonly (readonly CellInput[])[]): void;
  /** Number formats are kept per cell; "General" when never set. */
  numberFormatAt(position: CellPosition): string;
  setNumberFormats(sheet: string, top: number, left: number, formats: readonly (readonly string[])[]): void;

  /** Bold, fill and wrapping; all off when never set. */
  styleAt(position: CellPosition): CellStyle;
  /** Changes the given style members on every cell of the range, keeping the others. */
  setStyle(range: RangeRef, change: Partial<CellStyle>): void;
  /** Resets bold, fill and wrapping on the range; number formats are separate. */
  clearStyles(range: RangeRef): void;
  /** In points; STANDARD_COLUMN_WIDTH when never set. */
  columnWidth(sheet: string, column: number): number;
  setColumnWidth(sheet: string, left: number, right: number, points: number): void;
  /** In points; the preview keeps every row at one height. */
  rowHeight(sheet: string): number;

  /** The sheet's charts, front-most last; positions follow column widths, as charts move with their cells in Excel. */
  charts(sheet: string): ChartSpec[];
  /** Adds a chart named "Chart N" unless named; returns it with its id. */
  addChart(sheet: string, chart: NewChart): ChartSpec;
  /** Throws when no chart on the sheet has the id. */
  updateChart(sheet: string, id: string, change: ChartChange): void;
  removeChart(sheet: string, id: string): void;

  /** Rows and columns from A1 to the last non-empty input or spilled value; {0, 0} when empty. */
  usedExtent(sheet: string): { rows: number; columns: number };
  /**
   * The smallest rectangle holding every cell with a value (an input, a formula or a spilled
   * value), and unless `valuesOnly` every cell with a number format or style; undefined when none.
   */
  usedArea(sheet: string, valuesOnly: boolean): RangeRef | undefined;

  /** The active area of the selection (the first one when several are selected). */
  selection(): RangeRef;
  /** Every selected area, on the active sheet; one unless several were selected together. */
  selectedAreas(): RangeRef[];
  select(range: RangeRef): void;
  /** Selects several areas at once (as with Ctrl+click), all on one sheet. */
  selectAreas(areas: readonly RangeRef[]): void;

  /** True while the user is editing a cell; Excel then fails or delays add-in batches. */
  cellEditMode(): boolean;
  setCellEditMode(editing: boolean): void;

  registerFunction(id: string, fn: CustomFunction): void;

  /** Called after every change (edit, recalculation, formatting, charts, sheet added/removed, selection). */
  subscribe(listener: () => void): () => void;

  /** Called after cells are entered or cleared (by the user or through the API, never by recalculation), with the area. */
  onCellsEdited(listener: (edited: RangeRef) => void): () => void;
}
