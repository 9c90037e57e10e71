/**
 * The report as planned data: formulas over absolute data references, labels as text, settings
 * cells referenced by every formula, and the layout for predictors that are not one block.
 * Fits use seeded random data; the statistics themselves are checked in test/engine.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../../src/taskpane/model/analysis';
import { EMPTY_CHOICES, type PaneChoices, resolveRanges } from '../../../src/taskpane/model/choices';
import { planReport, SETTINGS_CELLS } from '../../../src/taskpane/model/reportPlan';
import { randomProblem } from '../../support/random';

const { y, x } = randomProblem(91, 20, 3);
const data = {
  response: [['=danger'], ...y.map((v) => [v])],
  predictorColumns: [0, 1, 2].map((j) => [[['Alpha', 'Beta', '+Gamma'][j]], ...x.map((r) => [r[j]])]),
  weights: undefined,
};

function plan(choices: PaneChoices) {
  const { ranges } = resolveRanges(choices);
  if (!ranges) throw new Error('bad test ranges');
  return planReport({ sheetName: 'Plumbline report', ranges, choices, analysis: analyze(data, choices), writtenAt: new Date('2026-12-02T10:00:00Z') });
}

const choices: PaneChoices = { ...EMPTY_CHOICES, response: 'Data!A1:A21', predictors: 'Data!B1:D21', added: [2] };

describe('planReport', () => {
  it('writes every PLUMB formula over absolute data ranges and the settings cells', () => {
    const formulas = plan(choices).cells.flatMap((c) => (c.kind === 'formula' ? [c.formula] : []));
    const settings = `${SETTINGS_CELLS.level}, ${SETTINGS_CELLS.intercept}, ${SETTINGS_CELLS.knownSigma}, , ${SETTINGS_CELLS.robust}`;
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
    expect(formulas.every((f) => /^=(PLUMB\.|Data!)/.test(f))).toBe(true);
    expect(labels.some((t) => t.startsWith('Does +Gamma add anything?'))).toBe(true);
  });

  it('puts the settings block where the formulas look for it', () => {
    const p = plan({ ...choices, robust: 'HC3' });
    expect(p.cells.filter((c) => c.kind === 'value')).toEqual([
      { row: 4, column: 1, kind: 'value', value: 0.95 },
      { row: 5, column: 1, kind: 'value', value: true },
      { row: 6, column: 1, kind: 'value', value: '' },
    ]);
    expect(p.cells).toContainEqual({ row: 7, column: 1, kind: 'label', text: 'HC3', bold: false });
  });

  it('passes the weights column between σ and the robust cell when there is one', () => {
    const { ranges } = resolveRanges({ ...choices, weights: 'Data!E1:E21' });
    if (!ranges) throw new Error('bad test ranges');
    const withWeights = planReport({ sheetName: 'R', ranges, choices, analysis: analyze({ ...data, weights: [['w'], ...y.map(() => [1])] }, choices), writtenAt: new Date() });
    const terms = withWeights.cells.find((c) => c.kind === 'formula' && c.formula.startsWith('=PLUMB.TERMS'));
    expect(terms).toMatchObject({ formula: '=PLUMB.TERMS(Data!$A$1:$A$21, Data!$B$1:$D$21, $B$5, $B$6, $B$7, Data!$E$1:$E$21, $B$8)' });
  });

  it('gathers the columns, base then added, when the added set is not at the right end', () => {
    const p = plan({ ...choices, added: [0] });
    const gathered = p.cells.filter((c) => c.kind === 'formula' && c.row === 0);
    expect(gathered.map((c) => (c.kind === 'formula' ? c.formula : ''))).toEqual(['=Data!$C$1:$C$21', '=Data!$D$1:$D$21', '=Data!$B$1:$B$21']);
    const nested = p.cells.find((c) => c.kind === 'formula' && c.formula.startsWith('=PLUMB.NESTEDF'));
    expect(nested).toMatchObject({ formula: expect.stringContaining('$AK$1:$AL$21, $AM$1:$AM$21') });
  });

  it('binds the four charts to the report cells that the live formulas fill', () => {
    const p = plan(choices);
    const [observed, residuals, qq, cooks] = p.charts;
    expect(observed.x).toMatchObject({ sheet: 'Plumbline report', left: 20, right: 20, top: 4, bottom: 23 });
    expect(observed.y).toMatchObject({ left: 19, top: 4, bottom: 23 });
    const residualTable = p.cells.find((c) => c.kind === 'formula' && c.formula.startsWith('=PLUMB.RESIDUALS'));
    expect(residuals.x).toMatchObject({ left: 1, top: (residualTable?.row ?? -1) + 1, bottom: (residualTable?.row ?? -1) + 20 });
    expect(residuals.y.left).toBe(2);
    expect(cooks.x.left).toBe(0);
    expect(cooks.y.left).toBe(6);
    expect(qq.x).toMatchObject({ left: 26, top: 4, bottom: 23 });
  });
});
