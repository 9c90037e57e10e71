/**
 * Failures of reading the data routed to the field they name (issue #14: errors sit beside their
 * field and disappear when fixed). The messages are the engine's own, made by building a model
 * frame over bad cells, so a change of the engine's wording shows here; the pane's wording
 * expected is worked out by hand (common practice (no source)).
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, type CellValue, EngineError, type FrameInput } from '../../../src/engine';
import { EMPTY_CHOICES } from '../../../src/taskpane/model/choices';
import type { PaneAction } from '../../../src/taskpane/state/paneActions';
import { paneReducer } from '../../../src/taskpane/state/paneReducer';
import { INITIAL_STATE } from '../../../src/taskpane/state/paneState';
import { analysisProblemOf, fieldOfFailure, newRowsFailure } from '../../../src/taskpane/state/readFailure';
import type { PaneData } from '../../../src/taskpane/readData';

const column = (...cells: CellValue[]) => cells.map((c) => [c]);
const origin = (column: number) => ({ sheet: 'Data', row: 0, column });

function engineMessage(input: Partial<FrameInput>): string {
  try {
    buildModelFrame({
      y: column('Yield', 1, 2, 3, 4),
      x: [column('Temp', 5, 6, 7, 9)],
      intercept: true,
      origins: { y: origin(1), x: [origin(3)], weights: origin(4) },
      ...input,
    });
  } catch (error) {
    if (error instanceof EngineError) return error.message;
    throw error;
  }
  throw new Error('the frame was built');
}

describe('fieldOfFailure', () => {
  it('puts an error cell among the predictors beside Predictors, named by address and header', () => {
    const message = engineMessage({ x: [column('Temp', 5, 6, { errorCode: '#DIV/0!' }, 9)] });
    expect(message.startsWith('predictors cell Data!D4 ("Temp") holds')).toBe(true);
    const problem = fieldOfFailure(message);
    expect(problem?.field).toBe('predictors');
    expect(problem?.message.startsWith('Data!D4 (Temp) holds the error #DIV/0!')).toBe(true);
    expect(problem?.message).not.toMatch(/predictors/);
  });

  it('puts a weight that is not positive beside Weights', () => {
    const message = engineMessage({ weights: column('w', 1, -2, 1, 1) });
    const problem = fieldOfFailure(message);
    expect(problem?.field).toBe('weights');
    expect(problem?.message.startsWith('Data!E3 is -2')).toBe(true);
  });

  it('puts a text cell of the response beside Response', () => {
    const problem = fieldOfFailure(engineMessage({ y: column('Yield', 1, 'lots', 3, 4) }));
    expect(problem?.field).toBe('response');
    expect(problem?.message.startsWith('Data!B3 (Yield) holds')).toBe(true);
  });

  it('puts a number where a predictor header belongs beside Predictors, the cell the message names', () => {
    const problem = fieldOfFailure(engineMessage({ x: [column(8, 5, 6, 7, 9)] }));
    expect(problem?.field).toBe('predictors');
    expect(problem?.message.startsWith('The response starts with a header but Data!D1 holds')).toBe(true);
  });

  it('words a message that begins with the argument as plain text', () => {
    expect(fieldOfFailure('response has 2 columns; select a single column of responses.')).toEqual({
      field: 'response',
      message: 'The response has 2 columns; select a single column of responses.',
    });
    expect(fieldOfFailure('response has 30 rows but weights has 29; select the same rows for both.')).toEqual({
      field: 'weights',
      message: 'The response has 30 rows but this range has 29; select the same rows for both.',
    });
  });

  it('names a sheet with spaces by its quoted address', () => {
    const problem = fieldOfFailure(`predictors cell 'Run log'!C7 ("Temp") holds the text "hot". Use a number.`);
    expect(problem).toEqual({ field: 'predictors', message: `'Run log'!C7 (Temp) holds the text "hot". Use a number.` });
  });

  it('leaves a failure that names no field where it was', () => {
    expect(fieldOfFailure('No complete rows: every row has a blank or #N/A in Temp (4 rows).')).toBeUndefined();
  });

  it('puts every failure to predict beside New rows', () => {
    expect(newRowsFailure('New row 12 ("Temp") holds the text "x"; it needs a number.')).toEqual({
      field: 'newRows',
      message: 'New row 12 ("Temp") holds the text "x"; it needs a number.',
    });
  });
});

describe('analysisProblemOf', () => {
  const chosen = { ...EMPTY_CHOICES, response: 'Data!B1:B5', predictors: 'Data!D1:D5' };
  const someData = { kind: 'cells' } as unknown as PaneData;
  const run = (actions: PaneAction[]) => actions.reduce(paneReducer, INITIAL_STATE);
  const read = run([
    { type: 'checked', chosen, problems: [] },
    { type: 'dataRead', data: someData, chosen },
  ]);
  const failure = 'predictors cell Data!D4 ("Temp") holds the error #DIV/0!. Use a number, or leave the cell blank to skip the row.';

  it('shows the failure beside its field only', () => {
    expect(analysisProblemOf('predictors', read, failure)?.startsWith('Data!D4 (Temp)')).toBe(true);
    expect(analysisProblemOf('response', read, failure)).toBeUndefined();
  });

  it('clears it once that field changes', () => {
    const edited = paneReducer(read, { type: 'edited', patch: { predictors: 'Data!D1:E5' } });
    expect(analysisProblemOf('predictors', edited, failure)).toBeUndefined();
  });

  it('keeps a bad cell met while streaming beside its field until that field changes', () => {
    const problem = fieldOfFailure(failure);
    if (problem === undefined) throw new Error('not routed');
    const refused = paneReducer(read, { type: 'readRefused', problem });
    expect(refused.problems).toEqual([problem]);
    expect(paneReducer(refused, { type: 'edited', patch: { level: 0.9 } }).problems).toEqual([problem]);
    expect(paneReducer(refused, { type: 'edited', patch: { predictors: 'Data!D1:D5 ' } }).problems).toEqual([]);
  });
});
