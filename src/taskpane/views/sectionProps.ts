import type { Dispatch } from 'preact/hooks';
import type { PaneAnalysis } from '../model/paneAnalysis';
import type { PaneChoices } from '../model/choices';
import { problemOf } from '../state/fieldProblems';
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

/** Binds the shared helpers a section's fields use. */
export function fieldTools({ state, dispatch }: Pick<SectionProps, 'state' | 'dispatch'>) {
  return {
    problem: (field: keyof PaneChoices) => problemOf(field, state.choices, state.problems),
    edit: (patch: Partial<PaneChoices>) => dispatch({ type: 'edited', patch }),
  };
}
