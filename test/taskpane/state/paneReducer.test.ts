/**
 * The pane's reducer and what the pane derives from its state. The rules checked are the pane's
 * own (issue #14: never stale, problems beside their field and gone once fixed); every message
 * expected is worked out by hand from src/taskpane/model/choices.ts (common practice (no source)).
 */
import { describe, expect, it } from 'vitest';
import { EMPTY_CHOICES } from '../../../src/taskpane/model/choices';
import { noiseSdProblem } from '../../../src/taskpane/model/noiseSdField';
import type { PaneData } from '../../../src/taskpane/readData';
import type { PaneAction } from '../../../src/taskpane/state/paneActions';
import { paneReducer } from '../../../src/taskpane/state/paneReducer';
import { INITIAL_STATE, type PaneState } from '../../../src/taskpane/state/paneState';
import { problemOf } from '../../../src/taskpane/state/fieldProblems';
import { isReading, staleNotice } from '../../../src/taskpane/state/selectors';

const run = (actions: PaneAction[], from: PaneState = INITIAL_STATE) => actions.reduce(paneReducer, from);
const chosen = { ...EMPTY_CHOICES, response: 'Batches!B1:B61', predictors: 'Batches!C1:G61' };
// The reducer stores the data it is given and never looks inside them.
const someData = { kind: 'cells' } as unknown as PaneData;
const afterRead = run([
  { type: 'checked', chosen, problems: [] },
  { type: 'dataRead', data: someData, chosen },
]);

describe('choices', () => {
  it('applies an edit to the choices and leaves the data read, so the analysis refits at once', () => {
    const state = run([{ type: 'edited', patch: { level: 0.9, robust: 'HC3' } }], afterRead);
    expect(state.choices).toEqual({ ...chosen, level: 0.9, robust: 'HC3' });
    expect(state.data).toBe(someData);
    expect(staleNotice(state)).toBeUndefined();
  });

  it('forgets the added set when the predictors change, and keeps it for any other edit', () => {
    const ticked = run([{ type: 'edited', patch: { added: [1, 3] } }], afterRead);
    expect(run([{ type: 'edited', patch: { level: 0.99 } }], ticked).choices.added).toEqual([1, 3]);
    expect(run([{ type: 'edited', patch: { predictors: 'Batches!C1:F61' } }], ticked).choices.added).toEqual([]);
    expect(run([{ type: 'selected', field: 'predictors', address: 'Batches!C1:F61', append: false }], ticked).choices.added).toEqual([]);
  });

  it('puts a selection into its field, or after what is there for Add', () => {
    const once = run([{ type: 'selected', field: 'predictors', address: 'Batches!C1:E61', append: false }]);
    expect(once.choices.predictors).toBe('Batches!C1:E61');
    const twice = run([{ type: 'selected', field: 'predictors', address: 'Batches!G1:G61', append: true }], once);
    expect(twice.choices.predictors).toBe('Batches!C1:E61,Batches!G1:G61');
    expect(run([{ type: 'selected', field: 'response', address: 'Batches!B1:B61', append: true }]).choices.response).toBe('Batches!B1:B61');
  });
});

describe('field problems', () => {
  const refused = {
    type: 'selectionRefused',
    problem: { field: 'response', message: 'The response must be one column, but the selection has 2 areas (A, B): select one column only.' },
  } as const;

  it('keeps the field’s address when a selection is refused, and shows why beside it', () => {
    const state = run([{ type: 'edited', patch: { response: 'Batches!B1:B61' } }, refused]);
    expect(state.choices.response).toBe('Batches!B1:B61');
    expect(problemOf('response', state.choices, state.problems)).toBe(refused.problem.message);
  });

  it('clears a problem once the field is changed and right, even when the picked address is the one it held', () => {
    const state = run([{ type: 'edited', patch: chosen }, refused, { type: 'selected', field: 'response', address: 'Batches!B1:B61', append: false }]);
    expect(problemOf('response', state.choices, state.problems)).toBeUndefined();
  });

  it('replaces the message when the field is changed but still wrong, and leaves other fields’ problems alone', () => {
    const found = run([
      {
        type: 'checked',
        chosen: { ...chosen, response: 'Batches!A1:B61', weights: 'Batches!J1:J10' },
        problems: [
          { field: 'response', message: 'The response must be a single column.' },
          { field: 'weights', message: 'Weights must be one column with the same rows as the response.' },
        ],
      },
    ]);
    const edited = run([{ type: 'edited', patch: { response: 'B1:B61' } }], found);
    expect(problemOf('response', edited.choices, edited.problems)).toBe('"B1:B61" is not a range address with its sheet, such as Batches!B1:B61.');
    expect(problemOf('weights', edited.choices, edited.problems)).toBe('Weights must be one column with the same rows as the response.');
    const fixed = run([{ type: 'edited', patch: { weights: 'Batches!J1:J61' } }], edited);
    expect(problemOf('weights', fixed.choices, fixed.problems)).toBeUndefined();
  });

  it('does not judge a field that showed nothing while the user is still choosing', () => {
    const state = run([{ type: 'edited', patch: { response: 'not an address' } }]);
    expect(state.problems).toEqual([]);
  });

  it('judges known σ and the level as they are typed, by the rules of the cells and of the read', () => {
    const typed = run([{ type: 'edited', patch: { knownSigma: '0,35', level: 95 } }]);
    // The field's words are noise_sd's (src/taskpane/model/noiseSdField.ts, tested there).
    expect(problemOf('knownSigma', typed.choices, typed.problems)).toBe(noiseSdProblem('0,35'));
    expect(noiseSdProblem('0,35')).toBeDefined();
    expect(problemOf('level', typed.choices, typed.problems)).toBe('The confidence level must be between 0 and 1, such as 0.95.');
    const fixed = run([{ type: 'edited', patch: { knownSigma: '0.35', level: 0.95 } }], typed);
    expect(problemOf('knownSigma', fixed.choices, fixed.problems)).toBeUndefined();
    expect(problemOf('level', fixed.choices, fixed.problems)).toBeUndefined();
  });

  it('keeps only the range fields’ problems from a check, so σ and the level are never shown twice', () => {
    const state = run([
      {
        type: 'checked',
        chosen: { ...chosen, knownSigma: '-1' },
        problems: [
          { field: 'knownSigma', message: 'a message of the read' },
          { field: 'newRows', message: 'New rows need 5 columns, one per predictor, in the same order.' },
        ],
      },
    ]);
    expect(state.problems.map((p) => p.field)).toEqual(['newRows']);
    expect(problemOf('knownSigma', state.choices, state.problems)).toBe(noiseSdProblem('-1'));
  });
});

describe('reading and staleness', () => {
  it('shows nothing of the last read while a new one runs, and tracks its progress', () => {
    const started = run([{ type: 'status', status: { kind: 'done', message: 'Report written' } }, { type: 'readStarted' }], afterRead);
    expect(started.data).toBeUndefined();
    expect(started.readChoices).toBeUndefined();
    expect(started.status).toEqual({ kind: 'idle' });
    const reading = run([{ type: 'readProgress', read: 100, total: 400 }], started);
    expect(isReading(reading)).toBe(true);
    expect(reading.reading).toEqual({ read: 100, total: 400 });
    expect(isReading(run([{ type: 'readEnded' }], reading))).toBe(false);
  });

  it('marks the results out of date when a range changes after the read, and current again when it is changed back', () => {
    const moved = run([{ type: 'edited', patch: { predictors: 'Batches!C1:F61', weights: 'Batches!J1:J61' } }], afterRead);
    expect(staleNotice(moved)).toBe(
      'Out of date: the predictors and the weights changed since the data were read. Press Read data and fit to update these results (Write report reads the data again first).',
    );
    expect(staleNotice(run([{ type: 'edited', patch: { predictors: chosen.predictors, weights: '' } }], moved))).toBeUndefined();
  });

  it('says the results may be out of date after a data edit, until the data are read again', () => {
    const edited = run([{ type: 'dataEdited' }], afterRead);
    expect(staleNotice(edited)).toContain('may be out of date: cells on the data’s sheets changed');
    expect(staleNotice(run([{ type: 'dataRead', data: someData, chosen }], edited))).toBeUndefined();
  });

  it('says nothing is stale before any read', () => {
    expect(staleNotice(run([{ type: 'dataEdited' }, { type: 'edited', patch: { response: 'Batches!K1:K61' } }]))).toBeUndefined();
  });
});
