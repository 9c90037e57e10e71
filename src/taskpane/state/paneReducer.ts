import type { PaneChoices } from '../model/choices';
import { rangeProblems, RANGE_FIELDS, recheckFields } from './fieldProblems';
import type { PaneAction } from './paneActions';
import type { PaneState, RangeFieldName } from './paneState';

function withChoices(state: PaneState, choices: PaneChoices, touched: readonly RangeFieldName[]): PaneState {
  return { ...state, choices, problems: recheckFields(state.problems, touched, choices) };
}

/** Applies one action. Pure: every effect (reading, writing, watching) happens outside, in the commands. */
export function paneReducer(state: PaneState, action: PaneAction): PaneState {
  switch (action.type) {
    case 'edited': {
      // A new set of predictor columns makes the old "added" ticks meaningless.
      const resetAdded = action.patch.predictors !== undefined && action.patch.predictors !== state.choices.predictors;
      const choices = { ...state.choices, ...action.patch, ...(resetAdded ? { added: [] } : {}) };
      const changed = RANGE_FIELDS.filter((field) => choices[field] !== state.choices[field]);
      return withChoices(state, choices, changed);
    }
    case 'selected': {
      const current = state.choices[action.field];
      const address = action.append && current.trim() !== '' ? `${current},${action.address}` : action.address;
      const choices = { ...state.choices, [action.field]: address, ...(action.field === 'predictors' ? { added: [] } : {}) };
      // Picking is a change of the field even when the address is the same as before.
      return withChoices(state, choices, [action.field]);
    }
    case 'selectionRefused':
    case 'readRefused':
      return { ...state, problems: [...state.problems.filter((p) => p.field !== action.problem.field), action.problem] };
    case 'checked':
      return { ...state, choices: action.chosen, problems: rangeProblems(action.problems) };
    case 'readStarted':
      return { ...state, data: undefined, readChoices: undefined, status: { kind: 'idle' } };
    case 'readProgress':
      return { ...state, reading: { read: action.read, total: action.total } };
    case 'readEnded':
      return { ...state, reading: undefined };
    case 'dataRead':
      return { ...state, data: action.data, readChoices: action.chosen, dataChanged: false };
    case 'dataEdited':
      return { ...state, dataChanged: true };
    case 'status':
      return { ...state, status: action.status };
    case 'valuesReportSaved':
      return { ...state, saved: action.saved };
  }
}
