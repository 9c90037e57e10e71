import type { Dispatch } from 'preact/hooks';
import type { PaneAnalysis } from '../model/paneAnalysis';
import type { PaneChoices } from '../model/choices';
import { problemOf, RANGE_FIELDS } from '../state/fieldProblems';
import { analysisProblemOf } from '../state/readFailure';
import type { PaneAction } from '../state/paneActions';
import type { PaneState } from '../state/paneState';
import type { PaneCommands } from '../state/usePaneCommands';

/** What every section of the pane is drawn from and acts through. */
export interface SectionProps {
  state: PaneState;
  /** The analysis of the data read under the current choices, a failure message, or none before a read. */
  analysis: PaneAnalysis | string | undefined;
  dispatch: Dispatch<PaneAction>;
  commands: PaneCommands;
}

/**
 * Binds the shared helpers a section's fields use. A field's problem is the one found in its
 * address, else the one the analysis of the data read found in its cells (given `analysis`).
 */
export function fieldTools({ state, analysis, dispatch }: Pick<SectionProps, 'state' | 'dispatch'> & Partial<Pick<SectionProps, 'analysis'>>) {
  return {
    problem: (field: keyof PaneChoices) => {
      const rangeField = RANGE_FIELDS.find((f) => f === field);
      return problemOf(field, state.choices, state.problems) ?? (rangeField === undefined ? undefined : analysisProblemOf(rangeField, state, analysis));
    },
    edit: (patch: Partial<PaneChoices>) => dispatch({ type: 'edited', patch }),
  };
}
