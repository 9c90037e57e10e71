import type { FieldProblem, PaneChoices } from '../model/choices';
import type { PaneData } from '../readData';
import type { SavedValuesReport } from '../valuesReport';
import type { PaneStatus, RangeFieldName } from './paneState';

/** Everything that changes the pane's state; the reducer is the only place that applies them. */
export type PaneAction =
  /** The user typed or ticked something. */
  | { type: 'edited'; patch: Partial<PaneChoices> }
  /** Use selection (or Add) put the selected areas into a field. */
  | { type: 'selected'; field: RangeFieldName; address: string; append: boolean }
  /** The selection does not suit the field; the field keeps its address. */
  | { type: 'selectionRefused'; problem: FieldProblem }
  /** Reading the data met a cell the field's range should not hold; the field shows why. */
  | { type: 'readRefused'; problem: FieldProblem }
  /** The choices with whole columns clipped to the rows in use, and what is wrong with them. */
  | { type: 'checked'; chosen: PaneChoices; problems: FieldProblem[] }
  /** A fresh read begins: nothing from the last one is shown meanwhile. */
  | { type: 'readStarted' }
  | { type: 'readProgress'; read: number; total: number }
  | { type: 'readEnded' }
  | { type: 'dataRead'; data: PaneData; chosen: PaneChoices }
  /** Cells on the data's sheets changed since the read. */
  | { type: 'dataEdited' }
  | { type: 'status'; status: PaneStatus }
  | { type: 'valuesReportSaved'; saved: SavedValuesReport };
