/** The pane's address checks, each message worked out by hand (common practice (no source)). */
import { describe, expect, it } from 'vitest';
import { EMPTY_CHOICES, noSuchSheetProblem, resolveRanges, sheetsNamed, singleAreaProblem } from '../../../src/taskpane/model/choices';

const base = { ...EMPTY_CHOICES, response: 'Batches!$B$1:$B$61', predictors: 'Batches!$C$1:$E$61,Batches!$G$1:$G$61' };

describe('resolveRanges', () => {
  it('splits several predictor areas into their columns, in order', () => {
    const { ranges, problems } = resolveRanges(base);
    expect(problems).toEqual([]);
    expect(ranges?.predictorColumns.map((c) => c.left)).toEqual([2, 3, 4, 6]);
    expect(ranges?.response).toEqual({ sheet: 'Batches', top: 0, left: 1, bottom: 60, right: 1 });
  });

  it("takes predictors whose sheet is named in another case as on the response's sheet", () => {
    // Excel reads sheet names regardless of case (common practice, no source).
    const { ranges, problems } = resolveRanges({ ...base, predictors: 'batches!$C$1:$E$61' });
    expect(problems).toEqual([]);
    expect(ranges?.predictorColumns.map((c) => c.left)).toEqual([2, 3, 4]);
    expect(resolveRanges({ ...base, predictors: 'Other!$C$1:$E$61' }).problems[0]).toMatchObject({ field: 'predictors' });
  });

  it('asks for missing ranges and names the field', () => {
    const { problems } = resolveRanges(EMPTY_CHOICES);
    expect(problems.map((p) => p.field)).toEqual(['response', 'predictors']);
    expect(problems[0].message).toContain('Use selection');
  });

  it('rejects predictors whose rows differ from the response, a two-column response and bad settings', () => {
    expect(resolveRanges({ ...base, predictors: 'Batches!C1:E50' }).problems[0]).toMatchObject({ field: 'predictors' });
    expect(resolveRanges({ ...base, response: 'Batches!A1:B61' }).problems[0]).toMatchObject({
      field: 'response',
      message: 'The response must be a single column.',
    });
    expect(resolveRanges({ ...base, knownSigma: '-2' }).problems[0]).toMatchObject({ field: 'knownSigma' });
    expect(resolveRanges({ ...base, level: 95 }).problems[0]).toMatchObject({ field: 'level' });
    expect(resolveRanges({ ...base, newRows: "'Planned batches'!B2:C6" }).problems[0]).toMatchObject({
      field: 'newRows',
      message: 'New rows need 4 columns, one per predictor, in the same order.',
    });
  });

  it('requires the sheet in every address', () => {
    expect(resolveRanges({ ...base, response: 'B1:B61' }).problems[0].message).toContain('with its sheet');
  });
});

describe('singleAreaProblem', () => {
  const two = ['Batches!B1:B61', 'Batches!D1:D61'];

  it('refuses several areas for the response and the weights, naming them', () => {
    expect(singleAreaProblem('response', two)).toEqual({
      field: 'response',
      message: 'The response must be one column, but the selection has 2 areas (Batches!B1:B61, Batches!D1:D61): select one column only.',
    });
    expect(singleAreaProblem('weights', two)?.field).toBe('weights');
  });

  it('takes several areas for predictors and new rows, and one area anywhere', () => {
    expect(singleAreaProblem('predictors', two)).toBeUndefined();
    expect(singleAreaProblem('newRows', two)).toBeUndefined();
    expect(singleAreaProblem('response', two.slice(0, 1))).toBeUndefined();
  });
});

describe('sheetsNamed', () => {
  it('lists each sheet once per address field, unquoted, and skips text that names none', () => {
    const choices = { ...base, weights: 'B2:B61', newRows: "'Planned batches'!B2:C6,'Planned batches'!E2:E6" };
    expect(sheetsNamed(choices)).toEqual([
      { field: 'response', sheet: 'Batches' },
      { field: 'predictors', sheet: 'Batches' },
      { field: 'newRows', sheet: 'Planned batches' },
    ]);
  });

  it('words the missing sheet on its field', () => {
    expect(noSuchSheetProblem('response', 'Dta')).toEqual({
      field: 'response',
      message: 'There is no sheet named Dta. Check the spelling, or select the range in the sheet and press "Use selection".',
    });
  });
});
