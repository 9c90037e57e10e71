/**
 * The live report after a settings edit, end to end in the preview host in Node with the real
 * PLUMB functions (test/support/plumbPreview.ts): setting the intercept cell to FALSE must change
 * the equation line and leave every term row formatted for the term it now shows (issue #14).
 * The data are invented, far from zero, so the intercept's standard error dwarfs the slope's; the
 * rounding rule (about three significant digits of the standard error) is the project's own,
 * common practice (no source). The statistics themselves are checked in test/engine.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { writeLiveReportFor } from '../../support/liveReport';
import { decimalsFor } from '../../../src/presentation';
import { fittedEquation } from '../../../src/cellGrids/equationGrid';
import type { PreviewWorkbook } from '../../../src/preview/workbook/workbook';
import { analyzeCells, type ReadData } from '../../../src/taskpane/model/analysis';
import { EMPTY_CHOICES, type PaneChoices } from '../../../src/taskpane/model/choices';
import type { ReportPlan } from '../../../src/taskpane/model/reportPlan';
import { plumbPreview } from '../../support/plumbPreview';
import { gaussian, mulberry32 } from '../../support/random';

const noise = gaussian(mulberry32(17));
const dose = Array.from({ length: 20 }, (_, i) => 1000 + 5 * i);
const yields = dose.map((v) => 100 + 0.5 * v + noise());
const choices: PaneChoices = { ...EMPTY_CHOICES, response: 'Data!A1:A21', predictors: 'Data!B1:B21' };

/** The data on sheet Data and the live report written for them, in a fresh preview workbook. */
async function writeLiveReport(rows: (string | number)[][]) {
  const model = await plumbPreview('Data');
  model.setInputs('Data', 0, 0, rows);
  const { sheet, plan, cells } = await writeLiveReportFor(choices);
  return { model, sheet, plan, cells };
}

/** The settings cell beside a label of the report's settings block. */
function settingsCell(plan: ReportPlan | undefined, labelled: (text: string) => boolean) {
  const label = plan?.cells.find((c) => c.kind === 'label' && c.column === 0 && labelled(c.text));
  if (label === undefined) throw new Error('no such setting');
  return { row: label.row, column: 1 };
}

/** How many decimals a cell's number format shows. */
function formatDecimals(model: PreviewWorkbook, sheet: string, row: number, column: number): number {
  return (model.numberFormatAt({ sheet, row, column }).split('.')[1] ?? '').length;
}

describe('the live report follows its settings cells', () => {
  let model: PreviewWorkbook;
  let sheet: string;
  let plan: ReportPlan | undefined;
  let cells: ReadData | undefined;

  beforeAll(async () => {
    ({ model, sheet, plan, cells } = await writeLiveReport([['Yield', 'Dose'], ...dose.map((v, i) => [yields[i], v])]));
  }, 60_000);

  const terms = () => {
    const anchor = plan?.cells.find((c) => c.kind === 'formula' && c.formula.startsWith('=PLUMB.TERMS('));
    if (anchor === undefined) throw new Error('no term table');
    const rows: { row: number; name: unknown; standardError: number }[] = [];
    for (let row = anchor.row + 1; model.valueAt({ sheet, row, column: 0 }) !== null; row++) {
      rows.push({ row, name: model.valueAt({ sheet, row, column: 0 }), standardError: Number(model.valueAt({ sheet, row, column: 2 })) });
    }
    return rows;
  };
  /** A formula's cell, found by what it computes, and the settings cell beside its label. */
  const formulaCell = (start: string) => {
    const cell = plan?.cells.find((c) => c.kind === 'formula' && c.formula.startsWith(start));
    if (cell === undefined) throw new Error(`no ${start} formula`);
    return cell;
  };
  const interceptCell = () => settingsCell(plan, (text) => text === 'Intercept');
  const equationText = () => model.valueAt({ sheet, row: formulaCell('=PLUMB.EQUATION(').row, column: 0 });
  const expected = (intercept: boolean) => fittedEquation('Yield', { terms: (cells && analyzeCells(cells, { ...choices, intercept }).fit?.terms) ?? [] });

  it('shows each term with at least three significant digits of its standard error, before and after the intercept is turned off', () => {
    const check = () => {
      for (const t of terms()) {
        for (const column of [1, 2, 5, 6]) {
          const decimals = formatDecimals(model, sheet, t.row, column);
          expect({ term: t.name, column, decimals }).toEqual({ term: t.name, column, decimals: Math.max(decimals, decimalsFor(t.standardError)) });
        }
      }
    };
    check();
    model.setInputs(sheet, interceptCell().row, interceptCell().column, [[false]]);
    expect(terms().map((t) => t.name)).toEqual(['Dose']);
    check();
    model.setInputs(sheet, interceptCell().row, interceptCell().column, [[true]]);
    expect(terms().map((t) => t.name)).toEqual(['Intercept', 'Dose']);
  });

  it('rewrites the equation line when the intercept cell changes', () => {
    expect(equationText()).toBe(expected(true));
    expect(String(equationText())).toMatch(/^Fitted \[Yield\] = \d+\.\d+ \+ 0\.\d+·\[Dose\]$/);
    model.setInputs(sheet, interceptCell().row, interceptCell().column, [[false]]);
    expect(equationText()).toBe(expected(false));
    expect(String(equationText())).toMatch(/^Fitted \[Yield\] = 0\.\d+·\[Dose\]$/);
    model.setInputs(sheet, interceptCell().row, interceptCell().column, [[true]]);
    expect(equationText()).toBe(expected(true));
  });
});

describe('the term table keeps its digits when the Standard errors cell is edited', () => {
  // Invented data, large residuals in the middle rows and small ones at both ends: the robust
  // (HC0, HC1, HC3) standard errors of the slope come out about half the classical one, below 0.01
  // where the classical one is above it, so they need one decimal more (the project's rounding
  // rule, common practice, no source; the standard errors themselves are checked in test/engine).
  const x = Array.from({ length: 20 }, (_, i) => i + 1);
  const y = x.map((v, i) => 3 + 0.2 * v + (Math.abs(v - 10.5) < 5 ? 0.45 : 0.01) * (i % 2 === 0 ? 1 : -1));

  it('formats every term for the smallest standard error of classical, HC0, HC1 and HC3', async () => {
    const { model, sheet, plan } = await writeLiveReport([['Yield', 'Dose'], ...x.map((v, i) => [y[i], v])]);
    const anchor = plan?.cells.find((c) => c.kind === 'formula' && c.formula.startsWith('=PLUMB.TERMS('));
    if (anchor === undefined) throw new Error('no term table');
    const slopeRow = anchor.row + 2;
    expect(model.valueAt({ sheet, row: slopeRow, column: 0 })).toBe('Dose');
    const classical = Number(model.valueAt({ sheet, row: slopeRow, column: 2 }));
    const robustCell = settingsCell(plan, (text) => text.startsWith('Standard errors'));
    for (const kind of ['HC0', 'HC1', 'HC3']) {
      model.setInputs(sheet, robustCell.row, robustCell.column, [[kind]]);
      const robust = Number(model.valueAt({ sheet, row: slopeRow, column: 2 }));
      // The data do what they are meant to: the robust standard error needs more decimals than the classical one.
      expect(decimalsFor(robust)).toBeGreaterThan(decimalsFor(classical));
      for (const column of [1, 2, 5, 6]) {
        expect({ kind, column, decimals: formatDecimals(model, sheet, slopeRow, column) }).toEqual({ kind, column, decimals: decimalsFor(robust) });
      }
    }
  }, 60_000);
});
