import type { RangeRef } from '../../addressing/a1';
import type { Grid } from '../../cellGrids/gridCell';

/** One cell the report writes. Labels are always written as text, never as formulas. */
export type ReportCell =
  | { row: number; column: number; kind: 'label'; text: string; bold?: boolean }
  | { row: number; column: number; kind: 'value'; value: number | boolean | '' }
  | { row: number; column: number; kind: 'formula'; formula: string };

export interface ReportFormat {
  range: RangeRef;
  numberFormat: string;
}

/** What a section writes, at the rows it was given. */
export interface SectionContent {
  cells: ReportCell[];
  formats: ReportFormat[];
}

/**
 * One part of a report: how many rows it takes (its heading included) and what it writes once it
 * knows its first row. A report is its sections stacked by these sizes, so a section that grows
 * moves every section below it instead of running into it.
 */
export interface ReportSection {
  rows: number;
  write(top: number): SectionContent;
}

/** Rows left empty between two sections. */
export const SECTION_GAP = 1;

/** The first row of each section when they are stacked from `top` down, one gap apart. */
export function stackTops(sizes: readonly number[], top = 0): number[] {
  const tops: number[] = [];
  let row = top;
  for (const rows of sizes) {
    tops.push(row);
    row += rows + SECTION_GAP;
  }
  return tops;
}

/** The sections' cells and formats, each section at its stacked row. */
export function stackSections(sections: readonly ReportSection[], top = 0): SectionContent {
  const tops = stackTops(
    sections.map((s) => s.rows),
    top,
  );
  const content: SectionContent = { cells: [], formats: [] };
  sections.forEach((section, i) => {
    const written = section.write(tops[i]);
    content.cells.push(...written.cells);
    content.formats.push(...written.formats);
  });
  return content;
}

/** A small writer of one section's cells, for the sheet the report goes on. */
export class SectionWriter {
  readonly cells: ReportCell[] = [];
  readonly formats: ReportFormat[] = [];

  constructor(private readonly sheet: string) {}

  label(row: number, column: number, text: string, bold = false): void {
    this.cells.push({ row, column, kind: 'label', text, bold });
  }

  formula(row: number, column: number, formula: string): void {
    this.cells.push({ row, column, kind: 'formula', formula });
  }

  /** A grid of values and text, its top-left cell at (top, left). */
  grid(top: number, left: number, grid: Grid): void {
    grid.forEach((line, i) =>
      line.forEach((v, j) => {
        if (typeof v === 'number') this.cells.push({ row: top + i, column: left + j, kind: 'value', value: v });
        else this.label(top + i, left + j, v);
      }),
    );
  }

  format(top: number, left: number, rows: number, columns: number, numberFormat: string): void {
    this.formats.push({ range: { sheet: this.sheet, top, left, bottom: top + rows - 1, right: left + columns - 1 }, numberFormat });
  }

  content(): SectionContent {
    return { cells: this.cells, formats: this.formats };
  }
}
