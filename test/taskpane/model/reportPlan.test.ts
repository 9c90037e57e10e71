/**
 * The report as planned data: formulas over absolute data references, labels as text, settings
 * cells referenced by every formula, and the layout for predictors that are not one block.
 * Fits use seeded random data; the statistics themselves are checked in test/engine.
 *
 * No cell of the report reads the data through a plain reference: in Excel a formula that refers
 * to an empty cell yields 0 (common practice (no source); the preview host models it), so
 * `=Data!C1:C21` would chart and fit every blank as 0. Data reach the sheet only through PLUMB
 * functions.
 */
import { describe, expect, it } from 'vitest';
import { analyzeCells } from '../../../src/taskpane/model/analysis';
import { EMPTY_CHOICES, type PaneChoices, resolveRanges } from '../../../src/taskpane/model/choices';
import { QQ_HEADER } from '../../../src/cellGrids/qqGrid';
import { RESIDUALS_HEADER } from '../../../src/cellGrids/residualsGrid';
import { decimalsFor } from '../../../src/presentation';
import { planReport, type ReportCell, type ReportPlan } from '../../../src/taskpane/model/reportPlan';
import { gaussian, mulberry32, randomProblem } from '../../support/random';

const { y, x } = randomProblem(91, 20, 3);
const column = (left: number) => ({ sheet: 'Data', top: 0, bottom: 20, left, right: left });
const data = {
  response: [['=danger'], ...y.map((v) => [v])],
  predictorColumns: [0, 1, 2].map((j) => [[['Alpha', 'Beta', '+Gamma'][j]], ...x.map((r) => [r[j]])]),
  weights: undefined,
  sources: { response: column(0), predictors: [column(1), column(2), column(3)], weights: undefined },
};

function plan(choices: PaneChoices) {
  const { ranges } = resolveRanges(choices);
  if (!ranges) throw new Error('bad test ranges');
  return planReport({ sheetName: 'Plumbline report', ranges, choices, analysis: analyzeCells(data, choices), writtenAt: new Date('2026-12-02T10:00:00Z') });
}

const choices: PaneChoices = { ...EMPTY_CHOICES, response: 'Data!A1:A21', predictors: 'Data!B1:D21', added: [2] };

/** The settings cells found by their labels (in A, the value beside them in B), as a user finds them. */
function settingsCells(p: ReportPlan) {
  const beside = (label: string) => {
    const cell = p.cells.find((c) => c.kind === 'label' && c.column === 0 && c.text.startsWith(label));
    if (cell === undefined) throw new Error(`no settings row ${label}`);
    return { row: cell.row, column: 1, address: `$B$${cell.row + 1}` };
  };
  return { level: beside('Confidence level'), intercept: beside('Intercept'), knownSigma: beside('Known sigma'), robust: beside('Standard errors (') };
}

function settingsArguments(p: ReportPlan, weights = ''): string {
  const s = settingsCells(p);
  return `${s.level.address}, ${s.intercept.address}, ${s.knownSigma.address}, ${weights}, ${s.robust.address}`;
}
const formulaCells = (cells: ReportCell[]) => cells.flatMap((c) => (c.kind === 'formula' ? [c] : []));

describe('planReport', () => {
  it('writes every PLUMB formula over absolute data ranges and the settings cells', () => {
    const p = plan(choices);
    const formulas = p.cells.flatMap((c) => (c.kind === 'formula' ? [c.formula] : []));
    const settings = settingsArguments(p);
    expect(formulas).toContain(`=PLUMB.TERMS(Data!$A$1:$A$21, Data!$B$1:$D$21, ${settings})`);
    expect(formulas).toContain(`=PLUMB.FITSTATS(Data!$A$1:$A$21, Data!$B$1:$D$21, ${settings})`);
    expect(formulas).toContain(`=PLUMB.NESTEDF(Data!$A$1:$A$21, Data!$B$1:$C$21, Data!$D$1:$D$21, ${settings})`);
    expect(formulas).toContain(`=PLUMB.RESIDUALS(Data!$A$1:$A$21, Data!$B$1:$D$21, ${settings})`);
    expect(formulas).toContain(`=PLUMB.CHECKS(Data!$A$1:$A$21, Data!$B$1:$D$21, ${settings})`);
    expect(formulas).toContain(`=PLUMB.QQPOINTS(Data!$A$1:$A$21, Data!$B$1:$D$21, ${settings})`);
  });

  it('writes headers from the data only as text labels, never as formulas', () => {
    const p = plan(choices);
    const labels = p.cells.flatMap((c) => (c.kind === 'label' ? [c.text] : []));
    expect(labels.some((t) => t.includes('=danger'))).toBe(true);
    const formulas = p.cells.flatMap((c) => (c.kind === 'formula' ? [c.formula] : []));
    // Only PLUMB functions read the data; the charts' guide lines read PLUMB results on the report sheet.
    expect(formulas.filter((f) => !/^=PLUMB\./.test(f) && f.includes('Data!'))).toEqual([]);
    expect(formulas.filter((f) => !/^=PLUMB\./.test(f) && f.replace(/'Plumbline report'!/g, '').includes('!'))).toEqual([]);
    expect(labels.some((t) => t.startsWith('Does +Gamma add anything?'))).toBe(true);
  });

  // Under HC3 only the coefficients' covariance changes (MacKinnon & White 1985); the F tests and
  // prediction intervals stay classical, so each section says which standard errors it uses.
  it('labels every section with the standard errors it uses', () => {
    const p = plan({ ...choices, robust: 'HC3', newRows: 'Data!B2:D3' });
    const beside = (heading: string) => {
      const head = p.cells.find((c) => c.kind === 'label' && c.column === 0 && c.text.startsWith(heading));
      if (head === undefined) throw new Error(`no section ${heading}`);
      return p.cells.flatMap((c) => (c.kind === 'label' && c.row === head.row && c.column === 1 ? [c.text] : [])).join(' ');
    };
    const robust = settingsCells(p).robust.address.replace(/\$/g, '');
    expect(beside('Which terms matter?')).toContain(`Standard errors: those set in ${robust} (classical or robust).`);
    for (const heading of ['How well does it fit?', 'Does +Gamma add anything?', 'What to expect for new cases']) {
      expect(beside(heading)).toContain(`Classical standard errors, whatever ${robust} sets: robust ones change only the terms' table.`);
    }
    expect(beside('Can these numbers be trusted?')).toContain('The checks use the residuals, not the standard errors.');
  });

  it('puts the settings block where the formulas look for it', () => {
    const p = plan({ ...choices, robust: 'HC3' });
    const s = settingsCells(p);
    expect(p.cells.filter((c) => c.kind === 'value')).toEqual([
      { row: s.level.row, column: 1, kind: 'value', value: 0.95 },
      { row: s.intercept.row, column: 1, kind: 'value', value: true },
      { row: s.knownSigma.row, column: 1, kind: 'value', value: '' },
    ]);
    expect(p.cells).toContainEqual({ row: s.robust.row, column: 1, kind: 'label', text: 'HC3', bold: false });
    // Every formula reads them there.
    for (const c of formulaCells(p.cells).filter((f) => !f.formula.startsWith('=PLUMB.GATHER') && f.formula.startsWith('=PLUMB.'))) {
      expect(c.formula).toContain(settingsArguments(p));
    }
  });

  // A weights range is written into every formula, so no cell can switch it: it is named with the
  // data as fixed, never listed among the cells to edit (issue #14).
  it('names the weights with the data as fixed, not among the settings to edit', () => {
    const { ranges } = resolveRanges({ ...choices, weights: 'Data!E1:E21' });
    if (!ranges) throw new Error('bad test ranges');
    const weighted = { ...data, weights: [['w'], ...y.map(() => [1])], sources: { ...data.sources, weights: column(4) } };
    const p = planReport({ sheetName: 'R', ranges, choices, analysis: analyzeCells(weighted, choices), writtenAt: new Date() });
    const labels = p.cells.flatMap((c) => (c.kind === 'label' ? [c] : []));
    expect(labels.filter((c) => c.text === 'Weights')).toEqual([]);
    const heading = labels.find((c) => c.text.startsWith('Settings'));
    const model = labels.find((c) => c.text === 'The model');
    const editable = p.cells.filter((c) => heading !== undefined && model !== undefined && c.row > heading.row && c.row < model.row);
    expect(editable.some((c) => (c.kind === 'label' ? c.text : '').includes('E1'))).toBe(false);
    expect(p.specification).toContain('weights Data!$E$1:$E$21 (fixed in this report');
    expect(labels[1].text).toContain(p.specification);
  });

  it('writes the equation as a live PLUMB.EQUATION formula over the same data and settings cells', () => {
    const p = plan(choices);
    const model = p.cells.find((c) => c.kind === 'label' && c.text === 'The model');
    expect(formulaCells(p.cells)).toContainEqual({
      row: (model?.row ?? -9) + 1,
      column: 0,
      kind: 'formula',
      formula: `=PLUMB.EQUATION(Data!$A$1:$A$21, Data!$B$1:$D$21, ${settingsArguments(p)})`,
    });
    expect(plan(choices).cells.some((c) => c.kind === 'label' && c.text.includes('b0'))).toBe(false);
  });

  // Editing the intercept cell moves every term a row up or down, so the term table's formats go
  // by column: each must show at least three significant digits of the standard error of any term
  // a row can hold in either setting (the project's rounding rule, common practice (no source)).
  // Invented data far from zero, so the intercept's standard error is thousands of times the slope's.
  it('formats the term table by column, to suit every row in either intercept setting', () => {
    const noise = gaussian(mulberry32(5));
    const xs = Array.from({ length: 20 }, (_, i) => 1000 + 5 * i);
    const far = {
      response: [['Yield'], ...xs.map((v) => [100 + 0.5 * v + noise()])],
      predictorColumns: [[['Dose'], ...xs.map((v) => [v])]],
      weights: undefined,
      sources: { response: column(0), predictors: [column(1)], weights: undefined },
    };
    const farChoices: PaneChoices = { ...EMPTY_CHOICES, response: 'Data!A1:A21', predictors: 'Data!B1:B21' };
    const { ranges } = resolveRanges(farChoices);
    if (!ranges) throw new Error('bad test ranges');
    const p = planReport({ sheetName: 'R', ranges, choices: farChoices, analysis: analyzeCells(far, farChoices), writtenAt: new Date() });
    const top = (formulaCells(p.cells).find((c) => c.formula.startsWith('=PLUMB.TERMS'))?.row ?? -99) + 1;
    const formatAt = (row: number, column: number) =>
      p.formats.filter((f) => f.range.top <= row && row <= f.range.bottom && f.range.left <= column && column <= f.range.right).map((f) => f.numberFormat);
    const decimalsOf = (format: string) => (format.split('.')[1] ?? '').length;
    const fits = [true, false].map((intercept) => analyzeCells(far, { ...farChoices, intercept }).fit?.terms ?? []);
    expect(decimalsFor(fits[0][0].standardError)).toBeLessThan(decimalsFor(fits[1][0].standardError));
    for (const terms of fits) {
      terms.forEach((t, i) => {
        for (const c of [1, 2, 5, 6]) {
          const shown = formatAt(top + i, c);
          expect(shown).toHaveLength(1);
          expect(decimalsOf(shown[0])).toBeGreaterThanOrEqual(decimalsFor(t.standardError));
        }
      });
    }
  });

  it('passes the weights column between σ and the robust cell when there is one', () => {
    const { ranges } = resolveRanges({ ...choices, weights: 'Data!E1:E21' });
    if (!ranges) throw new Error('bad test ranges');
    const withWeights = planReport({
      sheetName: 'R',
      ranges,
      choices,
      analysis: analyzeCells({ ...data, weights: [['w'], ...y.map(() => [1])], sources: { ...data.sources, weights: column(4) } }, choices),
      writtenAt: new Date(),
    });
    const terms = withWeights.cells.find((c) => c.kind === 'formula' && c.formula.startsWith('=PLUMB.TERMS'));
    expect(terms).toMatchObject({ formula: `=PLUMB.TERMS(Data!$A$1:$A$21, Data!$B$1:$D$21, ${settingsArguments(withWeights, 'Data!$E$1:$E$21')})` });
  });

  it('gathers the columns, base then added, with PLUMB.GATHER when the added set is not at the right end', () => {
    const p = plan({ ...choices, added: [0] });
    const gathers = formulaCells(p.cells).filter((c) => c.formula.startsWith('=PLUMB.GATHER'));
    // Neighbouring columns travel as one area; the block sits at the data's own rows, from column Y.
    expect(gathers).toEqual([{ row: 0, column: 24, kind: 'formula', formula: '=PLUMB.GATHER(Data!$C$1:$D$21, Data!$B$1:$B$21)' }]);
    const nested = formulaCells(p.cells).find((c) => c.formula.startsWith('=PLUMB.NESTEDF'));
    expect(nested?.formula).toContain('Data!$A$1:$A$21, $Y$1:$Z$21, $AA$1:$AA$21,');
    const terms = formulaCells(p.cells).find((c) => c.formula.startsWith('=PLUMB.TERMS'));
    expect(terms?.formula).toContain('Data!$A$1:$A$21, $Y$1:$AA$21,');
  });

  it('places gathered areas at the worksheet rows they come from, so rows keep their sheet numbers', () => {
    const lower: PaneChoices = { ...EMPTY_CHOICES, response: 'Data!A5:A25', predictors: 'Data!B5:B25,Data!D5:E25', added: [] };
    const p = plan(lower);
    const gathers = formulaCells(p.cells).filter((c) => c.formula.startsWith('=PLUMB.GATHER'));
    expect(gathers).toEqual([{ row: 4, column: 24, kind: 'formula', formula: '=PLUMB.GATHER(Data!$B$5:$B$25, Data!$D$5:$E$25)' }]);
    const residuals = formulaCells(p.cells).find((c) => c.formula.startsWith('=PLUMB.RESIDUALS'));
    expect(residuals?.formula).toContain('Data!$A$5:$A$25, $Y$5:$AA$25,');
    // The gathered block (rows 5–25, Y:AA) holds nothing else of the report.
    const inBlock = p.cells.filter((c) => c.row >= 4 && c.row <= 24 && c.column >= 24 && c.column <= 26);
    expect(inBlock).toEqual(gathers);
    expect(p.specification).toContain('predictors Data!$B$5:$B$25, Data!$D$5:$E$25');
  });

  it('gathers several areas of new rows beside the predictors, and passes one area as it is', () => {
    const two = plan({ ...choices, added: [0], newRows: 'Plan!B2:C4,Plan!E2:E4' });
    const gathers = formulaCells(two.cells).filter((c) => c.formula.startsWith('=PLUMB.GATHER'));
    expect(gathers.map((c) => [c.row, c.column, c.formula])).toEqual([
      [0, 24, '=PLUMB.GATHER(Data!$C$1:$D$21, Data!$B$1:$B$21)'],
      [1, 28, '=PLUMB.GATHER(Plan!$B$2:$C$4, Plan!$E$2:$E$4)'],
    ]);
    expect(formulaCells(two.cells).find((c) => c.formula.startsWith('=PLUMB.PREDICT'))?.formula).toContain('$Y$1:$AA$21, $AC$2:$AE$4,');
    const one = plan({ ...choices, newRows: 'Plan!B2:D4' });
    expect(formulaCells(one.cells).filter((c) => c.formula.startsWith('=PLUMB.GATHER'))).toEqual([]);
    expect(formulaCells(one.cells).find((c) => c.formula.startsWith('=PLUMB.PREDICT'))?.formula).toContain('Data!$B$1:$D$21, Plan!$B$2:$D$4,');
  });

  it('binds every chart to PLUMB results: observed and fitted from the residual table, never to the data', () => {
    const p = plan(choices);
    const [observed, residuals, qq, cooks] = p.charts.map((chart) => chart.series[0]);
    const table = formulaCells(p.cells).find((c) => c.formula.startsWith('=PLUMB.RESIDUALS'));
    const points = formulaCells(p.cells).find((c) => c.formula.startsWith('=PLUMB.QQPOINTS'));
    if (table === undefined || points === undefined) throw new Error('the report has no residual table or Q–Q points');
    // Under each table's header row, one line per data row (20 rows below the header).
    const under = (cell: ReportCell, headers: readonly string[], header: string) => ({
      sheet: 'Plumbline report',
      left: cell.column + headers.indexOf(header),
      right: cell.column + headers.indexOf(header),
      top: cell.row + 1,
      bottom: cell.row + 20,
    });
    expect(RESIDUALS_HEADER).toContain('Observed');
    expect(observed.x).toEqual(under(table, RESIDUALS_HEADER, 'Fitted'));
    expect(observed.y).toEqual(under(table, RESIDUALS_HEADER, 'Observed'));
    expect(residuals.x).toEqual(under(table, RESIDUALS_HEADER, 'Fitted'));
    expect(residuals.y).toEqual(under(table, RESIDUALS_HEADER, 'Residual'));
    expect(cooks.x).toEqual(under(table, RESIDUALS_HEADER, 'Row'));
    expect(cooks.y).toEqual(under(table, RESIDUALS_HEADER, "Cook's distance"));
    expect(qq.x).toEqual(under(points, QQ_HEADER, 'Normal quantile'));
    expect(qq.y).toEqual(under(points, QQ_HEADER, 'Studentized residual'));
  });

  it('keeps the charts clear of the tables they read', () => {
    const p = plan({ ...choices, added: [0] });
    const table = formulaCells(p.cells).find((c) => c.formula.startsWith('=PLUMB.RESIDUALS'));
    const points = formulaCells(p.cells).find((c) => c.formula.startsWith('=PLUMB.QQPOINTS'));
    // Charts cover K:R (columns 10–17); the residual table ends at J, the Q–Q points start at T.
    expect((table?.column ?? 99) + RESIDUALS_HEADER.length - 1).toBeLessThan(10);
    expect(points?.column).toBeGreaterThan(17);
    for (const chart of p.charts) expect([chart.topLeft.replace(/\d+/, ''), chart.bottomRight.replace(/\d+/, '')]).toEqual(['K', 'R']);
  });
});
