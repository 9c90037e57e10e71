/**
 * Reports are laid out from their sections' sizes: each section starts one empty row after the one
 * above it ends, so a section that grows moves every later one instead of running into it, in the
 * live report and the values report alike (common practice, no source). Invented data (no source).
 */
import { describe, expect, it } from 'vitest';
import { analyzeCells } from '../../../src/taskpane/model/analysis';
import { EMPTY_CHOICES, type PaneChoices, resolveRanges } from '../../../src/taskpane/model/choices';
import { SECTION_GAP, stackTops } from '../../../src/taskpane/model/reportLayout';
import { planReport, type ReportPlan } from '../../../src/taskpane/model/reportPlan';
import { planValuesReport } from '../../../src/taskpane/model/valuesReportPlan';
import { sourcesFor } from './bothSources';

const y = [3.1, 4.2, 5.0, 6.3, 6.9, 8.1, 9.2, 9.8, 11.1, 12.0, 13.2, 13.8, 15.1, 16.2];
const a = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14];
const few = ['N', 'S', 'N', 'S', 'N', 'S', 'N', 'S', 'N', 'S', 'N', 'S', 'N', 'S'];
const many = ['N', 'S', 'E', 'W', 'C', 'N', 'S', 'E', 'W', 'C', 'N', 'S', 'E', 'W'];

function plans(origin: string[]): { live: ReportPlan; values: ReportPlan } {
  const choices: PaneChoices = { ...EMPTY_CHOICES, response: 'Data!A1:A15', predictors: 'Data!B1:C15' };
  const { ranges } = resolveRanges(choices);
  if (ranges === undefined) throw new Error('bad test ranges');
  const column = (values: (string | number)[]) => values.map((v) => [v]);
  const analysis = analyzeCells(
    {
      response: column(['Yield', ...y]),
      predictorColumns: [column(['Dose', ...a]), column(['Origin', ...origin])],
      weights: undefined,
      sources: sourcesFor(2, 15),
    },
    choices,
  );
  const input = { sheetName: 'R', ranges, choices, analysis, writtenAt: new Date('2026-12-03T10:00:00Z') };
  return { live: planReport(input), values: planValuesReport(input) };
}

const headingRow = (p: ReportPlan, text: string) => {
  const cell = p.cells.find((c) => c.kind === 'label' && c.column === 0 && c.bold === true && c.text.startsWith(text));
  if (cell === undefined) throw new Error(`no section ${text}`);
  return cell.row;
};

describe('report layout', () => {
  it('stacks sections one gap apart, by their sizes', () => {
    expect(stackTops([2, 5, 3], 0)).toEqual([0, 2 + SECTION_GAP, 2 + 5 + 2 * SECTION_GAP]);
    expect(stackTops([2, 8, 3], 0)[2] - stackTops([2, 5, 3], 0)[2]).toBe(3);
  });

  // A category with five levels codes four indicator terms where two levels code one: three more term rows.
  it.each(['live', 'values'] as const)('moves every section below a longer term table down by its extra rows: %s report', (kind) => {
    const short = plans(few)[kind];
    const long = plans(many)[kind];
    for (const heading of ['Which terms matter?', 'How well does it fit?', 'Cautions']) {
      const moved = headingRow(long, heading) - headingRow(short, heading);
      expect({ heading, moved }).toEqual({ heading, moved: heading === 'Which terms matter?' ? 0 : 3 });
    }
  });

  it('leaves exactly one empty row between the values report’s sections, whatever their sizes', () => {
    const { values } = plans(many);
    const headings = values.cells.filter((c) => c.kind === 'label' && c.column === 0 && c.bold === true && c.row > 0).map((c) => c.row);
    const filled = new Set(values.cells.map((c) => c.row));
    for (const row of headings) {
      if (row === 2) continue; // the note under the title, part of the title block
      expect({ row, gapEmpty: !filled.has(row - 1), blockAbove: filled.has(row - 2) }).toEqual({ row, gapEmpty: true, blockAbove: true });
    }
  });

  it('writes no two cells of either report in the same place', () => {
    for (const p of Object.values(plans(many))) {
      const places = p.cells.map((c) => `${c.row},${c.column}`);
      expect(places.length).toBe(new Set(places).size);
    }
  });
});
