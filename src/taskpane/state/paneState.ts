import { EMPTY_CHOICES, type FieldProblem, type PaneChoices } from '../model/choices';
import type { PaneData } from '../readData';
import type { SavedValuesReport } from '../valuesReport';

/** What the pane is doing or last did, said in the report section. */
export type PaneStatus = { kind: 'idle' } | { kind: 'busy'; what: string } | { kind: 'done'; message: string } | { kind: 'failed'; message: string };

/** The fields whose address can come from the sheet's selection. */
export type RangeFieldName = 'response' | 'predictors' | 'weights' | 'newRows';

export interface ReadCount {
  read: number;
  total: number;
}

/**
 * The pane's whole state. The analysis is not kept here: it is derived from `data` and `choices`
 * on every render, so a changed setting refits at once and the cards never show an older model.
 */
export interface PaneState {
  choices: PaneChoices;
  /** Problems of the range fields found on Use selection or Read; σ and the level are checked as typed. */
  problems: FieldProblem[];
  data: PaneData | undefined;
  /** The (clipped) choices the data were read with: a later change of a range makes the results stale. */
  readChoices: PaneChoices | undefined;
  /** Cells on the data's sheets changed after the read. */
  dataChanged: boolean;
  status: PaneStatus;
  /** Present while a block read runs. */
  reading: ReadCount | undefined;
  /** The last values report written, which Refresh rewrites. */
  saved: SavedValuesReport | undefined;
}

export const INITIAL_STATE: PaneState = {
  choices: EMPTY_CHOICES,
  problems: [],
  data: undefined,
  readChoices: undefined,
  dataChanged: false,
  status: { kind: 'idle' },
  reading: undefined,
  saved: undefined,
};
